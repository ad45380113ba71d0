package io.geotick.geodesy.angle;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Random;
import org.hipparchus.dfp.Dfp;
import org.hipparchus.dfp.DfpField;
import org.hipparchus.dfp.DfpMath;
import org.junit.jupiter.api.Test;

/**
 * DegreeTrig against a 30-digit reference computed in the test with Hipparchus {@link Dfp}, on 10,000
 * random arguments each (fixed seed) plus the edges, with the bounds its Javadoc states.
 */
class DegreeTrigTest {
    private static final DfpField F = new DfpField(30);
    private static final Dfp DEG = F.getPi().divide(180);
    private static final Dfp PER_RAD = F.newDfp(180).divide(F.getPi());

    /** |value − exact| in ulps of the exact value (the ulp of the double nearest it). */
    private static double ulps(double value, Dfp exact) {
        double e = exact.toDouble();
        double ulp = e == 0 ? Double.MIN_VALUE : Math.ulp(e);
        return Math.abs(F.newDfp(value).subtract(exact).toDouble()) / ulp;
    }

    /** 30-digit atan2 in degrees from Dfp's arc tangent. */
    private static Dfp atan2Degrees(double y, double x) {
        Dfp dy = F.newDfp(y);
        Dfp dx = F.newDfp(x);
        Dfp t;
        if (x == 0) {
            t = y == 0 ? F.getZero() : F.getPi().divide(y < 0 ? -2 : 2);
        } else {
            t = DfpMath.atan(dy.divide(dx));
            if (x < 0) {
                t = y < 0 ? t.subtract(F.getPi()) : t.add(F.getPi());
            }
        }
        return t.multiply(PER_RAD);
    }

    @Test
    void sinCosIsWithinPointEightUlpOfTheReferenceValue() {
        Random r = new Random(7);
        double[] sc = new double[2];
        double worst = 0;
        for (int i = 0; i < 10_000; i++) {
            // A third anywhere in [−360°, 360°], a third near odd multiples of 45° (where the reduced
            // argument is largest and the kernels' rounding is worst), a third small angles.
            double d = switch (i % 3) {
                case 0 -> 720 * r.nextDouble() - 360;
                case 1 -> 45 * (2 * r.nextInt(16) - 15) + (r.nextDouble() - 0.5);
                default -> (r.nextDouble() - 0.5) * Math.pow(10, -6 + 6 * r.nextDouble());
            };
            DegreeTrig.sinCos(d, sc, 0);
            Dfp x = F.newDfp(d).multiply(DEG);
            // Source: 30-digit Hipparchus Dfp sin/cos of the same double argument, in radians exactly.
            worst = Math.max(worst, Math.max(ulps(sc[0], DfpMath.sin(x)), ulps(sc[1], DfpMath.cos(x))));
        }
        assertThat(worst).isLessThanOrEqualTo(0.8);
    }

    @Test
    void sinCosIsExactAtMultiplesOfNinetyDegrees() {
        double[] sc = new double[2];
        // Source: sin and cos of k·90° are 0 and ±1 (exact identities); cosines come out as +0.
        double[][] expected = {
            {-360, 0, 1}, {-270, 1, 0}, {-180, -0.0, -1}, {-90, -1, 0}, {0, 0, 1}, {90, 1, 0},
            {180, -0.0, -1}, {270, -1, 0}, {360, 0, 1}, {720, 0, 1}, {-450, -1, 0},
        };
        for (double[] e : expected) {
            DegreeTrig.sinCos(e[0], sc, 0);
            assertThat(Math.abs(sc[0])).as("|sin %s°|", e[0]).isEqualTo(Math.abs(e[1]));
            assertThat(sc[0] == e[1]).as("sin %s°", e[0]).isTrue();
            assertThat(Double.doubleToRawLongBits(sc[1])).as("cos %s°", e[0])
                .isEqualTo(Double.doubleToRawLongBits(e[2]));
        }
        // Source: sin 30° = 1/2 exactly; the others are the doubles nearest √2/2 and √3/2.
        DegreeTrig.sinCos(30, sc, 0);
        assertThat(sc[0]).isEqualTo(0.5);
        assertThat(sc[1]).isEqualTo(0.8660254037844386);
        DegreeTrig.sinCos(45, sc, 0);
        assertThat(sc[0]).isEqualTo(0.7071067811865476);
        assertThat(sc[1]).isEqualTo(0.7071067811865476);
    }

    @Test
    void atan2IsWithinHalfAnUlpPlus1Point2e16Degrees() {
        Random r = new Random(11);
        double worstExcess = 0;
        for (int i = 0; i < 10_000; i++) {
            double y = (r.nextDouble() - 0.5) * Math.pow(10, 6 * r.nextDouble() - 3);
            double x = (r.nextDouble() - 0.5) * Math.pow(10, 6 * r.nextDouble() - 3);
            if (i % 5 == 0) {
                x = Math.copySign(y * (1 + 1e-9 * (r.nextDouble() - 0.5)), x); // near the octant borders
            }
            double a = DegreeTrig.atan2(y, x);
            // Source: 30-digit Hipparchus Dfp arc tangent of y/x, unfolded to the quadrant.
            Dfp exact = atan2Degrees(y, x);
            double excess = Math.abs(F.newDfp(a).subtract(exact).toDouble()) - 0.5 * Math.ulp(exact.toDouble());
            worstExcess = Math.max(worstExcess, excess);
        }
        assertThat(worstExcess).isLessThanOrEqualTo(1.2e-16);
    }

    @Test
    void atan2IsExactOnTheAxesAndTreatsSignedZerosAsZero() {
        // Source: the angles of the axes, 0°, 90°, 180°, −90° (exact); 45° on the diagonal.
        assertThat(DegreeTrig.atan2(0, 1)).isEqualTo(0.0);
        assertThat(DegreeTrig.atan2(1, 0)).isEqualTo(90.0);
        assertThat(DegreeTrig.atan2(0, -1)).isEqualTo(180.0);
        assertThat(DegreeTrig.atan2(-1, 0)).isEqualTo(-90.0);
        assertThat(DegreeTrig.atan2(-0.0, -1)).isEqualTo(180.0);
        assertThat(DegreeTrig.atan2(1, -0.0)).isEqualTo(90.0);
        assertThat(DegreeTrig.atan2(3, 3)).isEqualTo(45.0);
        assertThat(DegreeTrig.atan2(-2, -2)).isEqualTo(-135.0);
        assertThat(Double.doubleToRawLongBits(DegreeTrig.atan2(0, 0))).isEqualTo(0L);
        assertThat(Double.doubleToRawLongBits(DegreeTrig.atan2(-0.0, -0.0))).isEqualTo(0L);
        assertThat(DegreeTrig.atan2(Double.NaN, 1)).isNaN();
    }

    @Test
    void atan2OfTinyAndHugeArgumentsKeepsItsAccuracy() {
        // Source: 30-digit Hipparchus Dfp reference, as above; the ratio is what matters, not the scale.
        double[][] points = {{1e-310, 2e-310}, {-3e-305, 1e-300}, {1e305, -2e305}, {-1e300, -1e-300},
            {Double.MIN_VALUE, Double.MIN_VALUE}, {Double.MAX_VALUE, 1}};
        for (double[] p : points) {
            Dfp exact = atan2Degrees(p[0], p[1]);
            double a = DegreeTrig.atan2(p[0], p[1]);
            double excess = Math.abs(F.newDfp(a).subtract(exact).toDouble()) - 0.5 * Math.ulp(exact.toDouble());
            assertThat(excess).as("atan2(%s, %s) = %s", p[0], p[1], a).isLessThanOrEqualTo(1.2e-16);
        }
    }

    @Test
    void atan2SplitPlusTheCorrectionIsExactlyAtan2WithTheCorrection() {
        Random r = new Random(13);
        double[] hl = new double[2];
        for (int i = 0; i < 10_000; i++) {
            double y = (r.nextDouble() - 0.5) * Math.pow(10, 8 * r.nextDouble() - 4);
            double x = (r.nextDouble() - 0.5) * Math.pow(10, 8 * r.nextDouble() - 4);
            double c = (r.nextDouble() - 0.5) * 1e-9;
            DegreeTrig.atan2Split(y, x, hl, 0);
            // Source: the documented identity hi + (lo + toDegrees(c)) = atan2(y, x, c), bit for bit.
            assertThat(hl[0] + (hl[1] + Math.toDegrees(c))).isEqualTo(DegreeTrig.atan2(y, x, c));
        }
    }
}
