package io.geotick.transforms.epsg;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import io.geotick.geodesy.InvalidCoordinateException;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

class LinearUnitTest {
    /** x·num/den to 60 digits, rounded once to the nearest double: the correctly rounded conversion. */
    private static double exact(double x, BigInteger num, BigInteger den) {
        return new BigDecimal(x).multiply(new BigDecimal(num)).divide(new BigDecimal(den), new MathContext(60))
            .doubleValue();
    }

    @Test
    void exactFactorsOfTheFeet() {
        // Source: international foot = 0.3048 m exactly (NIST Handbook 44, Appendix C; US Federal Register
        // 1959), from memory: 381/1250 in lowest terms.
        assertThat(LinearUnit.INTERNATIONAL_FOOT.numerator()).isEqualTo(BigInteger.valueOf(381));
        assertThat(LinearUnit.INTERNATIONAL_FOOT.denominator()).isEqualTo(BigInteger.valueOf(1250));
        assertThat(LinearUnit.INTERNATIONAL_FOOT.definition()).isEqualTo("0.3048");
        assertThat(LinearUnit.INTERNATIONAL_FOOT.symbol()).isEqualTo("ft");
        assertThat(LinearUnit.INTERNATIONAL_FOOT.metresPerUnit()).isEqualTo(0.3048);
        // Source: US survey foot = 1200/3937 m exactly (NGS; US Federal Register 1959), from memory.
        assertThat(LinearUnit.US_SURVEY_FOOT.numerator()).isEqualTo(BigInteger.valueOf(1200));
        assertThat(LinearUnit.US_SURVEY_FOOT.denominator()).isEqualTo(BigInteger.valueOf(3937));
        assertThat(LinearUnit.US_SURVEY_FOOT.definition()).isEqualTo("1200/3937");
        assertThat(LinearUnit.US_SURVEY_FOOT.symbol()).isEqualTo("ftUS");
        // 0.3048006096012192024384… m; the nearest double.
        assertThat(LinearUnit.US_SURVEY_FOOT.metresPerUnit()).isEqualTo(0.3048006096012192)
            .isEqualTo(new BigDecimal("0.30480060960121920243840487680975").doubleValue());
        assertThat(LinearUnit.METRE.isMetre()).isTrue();
        assertThat(LinearUnit.US_SURVEY_FOOT.isMetre()).isFalse();
        assertThat(LinearUnit.METRE.toMetres(123.456)).isEqualTo(123.456);
    }

    @Test
    void definingIdentitiesHoldExactly() {
        // Source: the definitions above (common practice): 1 200 m = 3 937 ftUS; 381 m = 1 250 ft; the US survey
        // foot is 2 ppm longer than the international foot (1 ftUS = 1.000002000004… ft).
        assertThat(LinearUnit.US_SURVEY_FOOT.fromMetres(1200)).isEqualTo(3937.0);
        assertThat(LinearUnit.US_SURVEY_FOOT.toMetres(3937)).isEqualTo(1200.0);
        assertThat(LinearUnit.US_SURVEY_FOOT.fromMetres(300000)).isEqualTo(984250.0);
        assertThat(LinearUnit.US_SURVEY_FOOT.toMetres(2000000)).isEqualTo(exact(2000000, BigInteger.valueOf(1200),
            BigInteger.valueOf(3937)));
        assertThat(LinearUnit.INTERNATIONAL_FOOT.fromMetres(381)).isEqualTo(1250.0);
        assertThat(LinearUnit.INTERNATIONAL_FOOT.fromMetres(213360)).isEqualTo(700000.0);
        assertThat(LinearUnit.INTERNATIONAL_FOOT.toMetres(1)).isEqualTo(0.3048);
        double ratio = LinearUnit.INTERNATIONAL_FOOT.fromMetres(LinearUnit.US_SURVEY_FOOT.toMetres(1_000_000));
        // Two conversions, each correctly rounded: within 2 ulps of the exact product.
        assertThat(ratio).isCloseTo(exact(1_000_000, BigInteger.valueOf(1500000), BigInteger.valueOf(1499997)),
            org.assertj.core.api.Assertions.within(2 * Math.ulp(1e6)));
        assertThat(ratio - 1_000_000).isBetween(2.0, 2.0001);
    }

    @Test
    void conversionsAreCorrectlyRounded() {
        LinearUnit link = LinearUnit.ofDecimal("Clarke's link", "lkCla", "0.201166195164", "test");
        // A factor with more than 53 bits in lowest terms goes through decimal arithmetic.
        LinearUnit wide = LinearUnit.ofDecimal("long decimal", "uLong", "0.30480060960121920243840487680975", "test");
        assertThat(wide.numerator().bitLength()).isGreaterThan(53);
        Random r = new Random(42);
        for (LinearUnit u : List.of(LinearUnit.US_SURVEY_FOOT, LinearUnit.INTERNATIONAL_FOOT, link, wide)) {
            for (int i = 0; i < 20_000; i++) {
                // Grid magnitudes from a millimetre to 10⁸ units, both signs.
                double x = Math.copySign(Math.pow(10, -3 + 11 * r.nextDouble()), r.nextDouble() - 0.5);
                assertThat(u.toMetres(x)).as("%s toMetres(%s)", u.symbol(), x)
                    .isEqualTo(exact(x, u.numerator(), u.denominator()));
                assertThat(u.fromMetres(x)).as("%s fromMetres(%s)", u.symbol(), x)
                    .isEqualTo(exact(x, u.denominator(), u.numerator()));
            }
        }
    }

    @Test
    void decimalsAreKeptExactlyAsGiven() {
        LinearUnit link = LinearUnit.ofDecimal("Clarke's link", "lkCla", "0.2011661951640", "test");
        assertThat(link.definition()).isEqualTo("0.201166195164");
        assertThat(link.numerator()).isEqualTo(BigInteger.valueOf(50291548791L));
        assertThat(link.denominator()).isEqualTo(BigInteger.valueOf(250000000000L));
        assertThat(LinearUnit.ofRatio("kilometre", "km", 1000, 1, "SI").definition()).isEqualTo("1000");
        assertThat(LinearUnit.ofRatio("x", "x", 2400, 7874, "test").numerator()).isEqualTo(BigInteger.valueOf(1200));
        assertThat(LinearUnit.ofDecimal("international foot", "ft", "0.30480", "x").numerator())
            .isEqualTo(BigInteger.valueOf(381));
        assertThat(LinearUnit.US_SURVEY_FOOT).hasToString("US survey foot (ftUS, 1200/3937 m)");
        assertThat(LinearUnit.ofRatio("US survey foot", "ftUS", 1200, 3937, "elsewhere"))
            .isEqualTo(LinearUnit.US_SURVEY_FOOT).hasSameHashCodeAs(LinearUnit.US_SURVEY_FOOT);
    }

    @Test
    void badDefinitionsAndValuesAreNamed() {
        assertThatThrownBy(() -> LinearUnit.ofDecimal("foot", "ft", "-0.3", "x"))
            .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("-0.3");
        assertThatThrownBy(() -> LinearUnit.ofDecimal("foot", "ft", "0,3048", "x"))
            .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("'0,3048'");
        assertThatThrownBy(() -> LinearUnit.ofRatio("foot", "ft", 0, 3, "x"))
            .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("0/3");
        assertThatThrownBy(() -> LinearUnit.ofRatio("foot", "f t", 1, 3, "x"))
            .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("'f t'");
        assertThatThrownBy(() -> LinearUnit.ofRatio(" ", "ft", 1, 3, "x"))
            .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("name");
        assertThatThrownBy(() -> LinearUnit.US_SURVEY_FOOT.toMetres(Double.NaN))
            .isInstanceOf(InvalidCoordinateException.class).hasMessageContaining("NaN ftUS");
        assertThatThrownBy(() -> LinearUnit.US_SURVEY_FOOT.fromMetres(Double.POSITIVE_INFINITY))
            .isInstanceOf(InvalidCoordinateException.class).hasMessageContaining("Infinity m");
        assertThatThrownBy(() -> LinearUnit.US_SURVEY_FOOT.fromMetres(Double.MAX_VALUE))
            .isInstanceOf(InvalidCoordinateException.class).hasMessageContaining("too large");
    }
}
