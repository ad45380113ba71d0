package io.geotick.transforms.projection;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Random;
import org.hipparchus.dfp.Dfp;
import org.hipparchus.dfp.DfpField;
import org.hipparchus.dfp.DfpMath;
import org.junit.jupiter.api.Test;

/**
 * The small-argument series that replace the logarithm and the arc tangent in the forward Transverse
 * Mercator, against 40-digit values of the functions themselves.
 *
 * <p>Source of the reference: Hipparchus {@link Dfp} at 40 significant digits, asinh x = ln(x + √(1 + x²))
 * and atan from {@link DfpMath#atan}; the functions' definitions are common practice.
 */
class ConformalSeriesTest {
    private static final DfpField F = new DfpField(40);

    @Test
    void asinhSeriesIsWithinOneUlp() {
        Random r = new Random(7);
        for (int i = 0; i < 20_000; i++) {
            double x = (2 * r.nextDouble() - 1) * Conformal.SERIES_LIMIT;
            Dfp dx = F.newDfp(x);
            double exact = DfpMath.log(dx.add(dx.multiply(dx).add(1).sqrt())).toDouble();
            // Source: Dfp 40-digit asinh (definition, common practice).
            assertThat(Math.abs(Conformal.asinhSmall(x) - exact)).as("asinh(%s)", x)
                .isLessThanOrEqualTo(Math.ulp(exact));
        }
        assertThat(Conformal.asinhSmall(0.0)).isEqualTo(0.0);
        assertThat(Conformal.asinhSmall(-0.1)).isEqualTo(-Conformal.asinhSmall(0.1));
    }

    @Test
    void atanSeriesIsWithinOneUlp() {
        Random r = new Random(8);
        for (int i = 0; i < 20_000; i++) {
            double x = (2 * r.nextDouble() - 1) * Conformal.SERIES_LIMIT;
            double exact = DfpMath.atan(F.newDfp(x)).toDouble();
            // Source: Dfp 40-digit atan (definition, common practice).
            assertThat(Math.abs(Conformal.atanSmall(x) - exact)).as("atan(%s)", x)
                .isLessThanOrEqualTo(Math.ulp(exact));
        }
        assertThat(Conformal.atanSmall(0.0)).isEqualTo(0.0);
    }

    @Test
    void seriesJoinTheLibraryFunctionsAtTheLimit() {
        // Where the forward switches to the logarithm route (a few ulps, see Conformal.log1p) or Math.atan
        // (within 1 ulp per its specification), both sides agree to a few ulps: no step in the results.
        double x = Math.nextDown(Conformal.SERIES_LIMIT);
        assertThat(Conformal.asinhSmall(x)).isCloseTo(Conformal.asinh(x), within(4 * Math.ulp(x)));
        assertThat(Conformal.atanSmall(x)).isCloseTo(Math.atan(x), within(2 * Math.ulp(x)));
    }
}
