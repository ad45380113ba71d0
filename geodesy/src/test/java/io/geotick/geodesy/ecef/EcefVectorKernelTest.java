package io.geotick.geodesy.ecef;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import io.geotick.geodesy.InvalidCoordinateException;
import io.geotick.geodesy.ellipsoid.Ellipsoids;
import io.geotick.geodesy.simd.Simd;
import java.util.Arrays;
import java.util.Random;
import org.hipparchus.dfp.Dfp;
import org.hipparchus.dfp.DfpField;
import org.hipparchus.dfp.DfpMath;
import org.junit.jupiter.api.Test;

/**
 * The SIMD kernel of the array inverse against the scalar code and a 30-digit arc tangent. These tests run in
 * the build's second test pass, with {@code --add-modules jdk.incubator.vector}; in the first pass (no
 * vector module) they are skipped. The position bound against a 40-digit reference is asserted for both
 * paths in reference-tests ({@code EcefHighPrecisionReferenceTest}).
 */
class EcefVectorKernelTest {
    private static final EcefConverter C = EcefConverter.of(Ellipsoids.WGS84);

    /** Random ECEF points: all latitudes and longitudes, heights −5,000 km … 50,000 km and near the surface. */
    private static double[] randomEcef(int n, long seed) {
        Random r = new Random(seed);
        double[] g = new double[3 * n];
        for (int i = 0; i < n; i++) {
            g[3 * i] = Math.toDegrees(Math.asin(2 * r.nextDouble() - 1));
            g[3 * i + 1] = 360 * r.nextDouble() - 180;
            g[3 * i + 2] = i % 2 == 0 ? -5e6 + 5.5e7 * r.nextDouble() : -1e4 + 1e5 * r.nextDouble();
        }
        double[] e = new double[3 * n];
        C.toEcef(g, 0, e, 0, n);
        return e;
    }

    private static double[] scalar(double[] ecef, int n) {
        double[] out = new double[3 * n];
        C.toGeodeticScalar(ecef, 0, out, 0, 0, n);
        return out;
    }

    /**
     * Heights bit for bit; latitudes and longitudes equal, or apart by at most an ulp plus the scalar table
     * arc tangent's 1.2e-16° (the lane arc tangent is within 5e-18° of half an ulp).
     */
    private static void assertMatchesScalar(double[] got, double[] scalar, int n) {
        for (int i = 0; i < n; i++) {
            for (int k = 0; k < 2; k++) {
                double a = got[3 * i + k];
                double b = scalar[3 * i + k];
                assertThat(Math.abs(a - b)).as("point %s, coordinate %s: %s vs scalar %s", i, k, a, b)
                    .isLessThanOrEqualTo(Math.ulp(b) + 1.3e-16);
            }
            assertThat(got[3 * i + 2]).as("height of point %s", i).isEqualTo(scalar[3 * i + 2]);
        }
    }

    @Test
    void theKernelIsUsedWhenSimdIsOn() {
        assumeTrue(Simd.enabled(), Simd.status());
        assertThat(C.vectorised()).isTrue();
        assertThat(Simd.status()).startsWith("SIMD kernels on");
    }

    @Test
    void arrayResultsMatchTheScalarCode() {
        assumeTrue(Simd.enabled(), Simd.status());
        int n = 100_003; // several chunks and a tail short of a block
        double[] ecef = randomEcef(n, 71);
        double[] expected = scalar(ecef, n);
        double[] got = new double[3 * n];
        C.toGeodetic(ecef, 0, got, 0, n);
        assertMatchesScalar(got, expected, n);
        int differing = 0;
        for (int i = 0; i < 3 * n; i++) {
            differing += got[i] == expected[i] ? 0 : 1;
        }
        // Measured when written: 0.6 % of the latitudes and longitudes.
        assertThat(differing).isLessThan(3 * n / 50);
    }

    @Test
    void inPlaceAndWithOffsetsGiveTheSameResults() {
        assumeTrue(Simd.enabled(), Simd.status());
        int n = 1_000;
        double[] ecef = randomEcef(n, 72);
        double[] expected = new double[3 * n];
        C.toGeodetic(ecef, 0, expected, 0, n);
        double[] inPlace = Arrays.copyOf(ecef, 3 * n);
        C.toGeodetic(inPlace, 0, inPlace, 0, n);
        assertThat(inPlace).isEqualTo(expected);
        double[] shifted = new double[3 * n + 7];
        System.arraycopy(ecef, 0, shifted, 5, 3 * n);
        double[] out = new double[3 * n + 2];
        C.toGeodetic(shifted, 5, out, 2, n);
        assertThat(Arrays.copyOfRange(out, 2, 3 * n + 2)).isEqualTo(expected);
    }

    @Test
    void blocksWithSpecialPointsGiveTheScalarResults() {
        assumeTrue(Simd.enabled(), Simd.status());
        int n = 64;
        double[] ecef = randomEcef(n, 73);
        // The polar axis, the equatorial plane, inside the evolute's box (but outside the evolute), and far
        // out, each in a different block.
        double[][] special = {{0, 0, 6.4e6}, {6.4e6, -1e5, 0}, {3.0e4, 1.0e4, 3.5e4}, {4e7, 3e7, 1e3},
            {1e-310, 0, -6.4e6}};
        for (int j = 0; j < special.length; j++) {
            System.arraycopy(special[j], 0, ecef, 3 * (3 + 11 * j), 3);
        }
        double[] expected = scalar(ecef, n);
        double[] got = new double[3 * n];
        C.toGeodetic(ecef, 0, got, 0, n);
        assertMatchesScalar(got, expected, n);
        for (int j = 0; j < special.length; j++) {
            int i = 3 + 11 * j;
            assertThat(Arrays.copyOfRange(got, 3 * i, 3 * i + 3)).as("special point %s", j)
                .isEqualTo(Arrays.copyOfRange(expected, 3 * i, 3 * i + 3));
        }
    }

    @Test
    void aBadPointIsReportedByIndexAndThePointsBeforeItAreConverted() {
        assumeTrue(Simd.enabled(), Simd.status());
        int n = 1_000;
        for (double[] bad : new double[][] {{Double.NaN, 1, 1}, {1e4, 1e4, -1e4}, {2e15, 0, 0}}) {
            double[] ecef = randomEcef(n, 74);
            System.arraycopy(bad, 0, ecef, 3 * 517, 3);
            double[] expected = scalar(Arrays.copyOf(ecef, 3 * 517), 517);
            double[] out = new double[3 * n];
            Arrays.fill(out, -1);
            assertThatThrownBy(() -> C.toGeodetic(ecef, 0, out, 0, n))
                .isInstanceOf(InvalidCoordinateException.class).hasMessageStartingWith("point 517: ");
            double[] before = Arrays.copyOf(out, 3 * 517);
            assertMatchesScalar(before, expected, 517);
            for (int i = 3 * 517; i < 3 * n; i++) {
                assertThat(out[i]).isEqualTo(-1.0);
            }
        }
    }

    /** Random geodetic points, with the exact quadrant boundaries and signed zeros mixed in. */
    private static double[] randomGeodetic(int n, long seed) {
        Random r = new Random(seed);
        double[] edgeLat = {90, -90, 0.0, -0.0, 45, -45, 89.99999999, Math.nextDown(90.0), 1e-300};
        double[] edgeLon = {180, -180, 360, -360, 0.0, -0.0, 90, -90, 270, -270, 135, 315, -225, Math.nextUp(-360.0)};
        double[] g = new double[3 * n];
        for (int i = 0; i < n; i++) {
            g[3 * i] = i % 5 == 0 ? edgeLat[r.nextInt(edgeLat.length)]
                : Math.toDegrees(Math.asin(2 * r.nextDouble() - 1));
            g[3 * i + 1] = i % 3 == 0 ? edgeLon[r.nextInt(edgeLon.length)] : 720 * r.nextDouble() - 360;
            g[3 * i + 2] = i % 2 == 0 ? -5e6 + 5.5e7 * r.nextDouble() : -1e4 + 1e5 * r.nextDouble();
        }
        return g;
    }

    private static long[] bits(double[] a) {
        return Arrays.stream(a).mapToLong(Double::doubleToRawLongBits).toArray();
    }

    @Test
    void theForwardArraysMatchTheScalarCodeBitForBit() {
        assumeTrue(Simd.enabled(), Simd.status());
        for (int n : new int[] {1, 7, 8, 9, 300, 10_001}) {
            double[] g = randomGeodetic(n, n);
            double[] expected = new double[3 * n];
            C.toEcefScalar(g, 0, expected, 0, 0, n);
            double[] got = new double[3 * n + 3];
            C.toEcef(g, 0, got, 3, n);
            assertThat(bits(Arrays.copyOfRange(got, 3, 3 * n + 3))).as("n %s", n).isEqualTo(bits(expected));
            double[] inPlace = g.clone();
            C.toEcef(inPlace, 0, inPlace, 0, n);
            assertThat(bits(inPlace)).as("in place, n %s", n).isEqualTo(bits(expected));
        }
    }

    @Test
    void anInvalidForwardPointIsReportedByIndexAndThePointsBeforeItAreConverted() {
        assumeTrue(Simd.enabled(), Simd.status());
        int n = 1_000;
        for (double[] bad : new double[][] {{91, 0, 0}, {10, 400, 0}, {10, 20, Double.NaN}, {Double.NaN, 0, 0}}) {
            double[] g = randomGeodetic(n, 76);
            System.arraycopy(bad, 0, g, 3 * 611, 3);
            double[] expected = new double[3 * 611];
            C.toEcefScalar(g, 0, expected, 0, 0, 611);
            double[] out = new double[3 * n];
            Arrays.fill(out, -1);
            assertThatThrownBy(() -> C.toEcef(g, 0, out, 0, n)).isInstanceOf(InvalidCoordinateException.class)
                .hasMessageStartingWith("point 611: ");
            assertThat(bits(Arrays.copyOf(out, 3 * 611))).isEqualTo(bits(expected));
            assertThat(Arrays.copyOfRange(out, 3 * 611, 3 * n)).containsOnly(-1.0);
        }
    }

    private static final DfpField F = new DfpField(30);
    private static final Dfp PER_RAD = F.newDfp(180).divide(F.getPi());

    /** 30-digit atan2 in degrees from Dfp's arc tangent, plus the correction in radians. */
    private static Dfp atan2Degrees(double y, double x, double correction) {
        Dfp t;
        if (x == 0) {
            t = y == 0 ? F.getZero() : F.getPi().divide(y < 0 ? -2 : 2);
        } else {
            t = DfpMath.atan(F.newDfp(y).divide(F.newDfp(x)));
            if (x < 0) {
                t = y < 0 ? t.subtract(F.getPi()) : t.add(F.getPi());
            }
        }
        return t.add(F.newDfp(correction)).multiply(PER_RAD);
    }

    @Test
    void theLaneArcTangentIsWithinHalfAnUlpPlus5e18Degrees() {
        assumeTrue(Simd.enabled(), Simd.status());
        int n = 20_000;
        Random r = new Random(75);
        double[] y = new double[n];
        double[] x = new double[n];
        double[] c = new double[n];
        for (int i = 0; i < n; i++) {
            y[i] = (r.nextDouble() - 0.5) * Math.pow(10, 6 * r.nextDouble() - 3);
            x[i] = (r.nextDouble() - 0.5) * Math.pow(10, 6 * r.nextDouble() - 3);
            if (i % 5 == 0) {
                x[i] = Math.copySign(y[i] * (1 + 1e-9 * (r.nextDouble() - 0.5)), x[i]); // octant borders
            }
            if (i % 7 == 0) {
                y[i] = x[i] * (Math.rint(8 * r.nextDouble()) / 8 + 1e-3 * (r.nextDouble() - 0.5)); // near rows
            }
            if (i % 11 == 0) {
                y[i] = x[i] * (0.0626 + 1e-6 * (r.nextDouble() - 0.5)); // where row 0 hands over to row 1
            }
            c[i] = i % 3 == 0 ? 0 : (r.nextDouble() - 0.5) * 1e-9;
        }
        double[] out = new double[n];
        EcefVectorKernel.atanStage(y, 0, x, 0, c, 0, out, 0, n);
        double worstExcess = 0;
        for (int i = 0; i < n; i++) {
            // Source: 30-digit Hipparchus Dfp arc tangent of y/x, unfolded to the quadrant.
            Dfp exact = atan2Degrees(y[i], x[i], c[i]);
            double excess = Math.abs(F.newDfp(out[i]).subtract(exact).toDouble())
                - 0.5 * Math.ulp(exact.toDouble());
            worstExcess = Math.max(worstExcess, excess);
        }
        // Measured when written: 2.6e-18° beyond half an ulp.
        assertThat(worstExcess).isLessThanOrEqualTo(5e-18);
    }

    @Test
    void theLaneArcTangentIsExactOnTheAxesAndDiagonals() {
        assumeTrue(Simd.enabled(), Simd.status());
        // Source: the angles of the axes and diagonals (exact): 0°, 90°, 180°, −90°, 45°, −135°.
        double[] y = {0, 1, 0, -1, -0.0, 1, 3, -2};
        double[] x = {1, 0, -1, 0, -1, -0.0, 3, -2};
        double[] expected = {0, 90, 180, -90, 180, 90, 45, -135};
        int n = 8 * ((y.length + 7) / 8) * 8; // whole blocks for any lane count up to 64
        double[] yy = new double[n];
        double[] xx = new double[n];
        Arrays.fill(xx, 1);
        System.arraycopy(y, 0, yy, 0, y.length);
        System.arraycopy(x, 0, xx, 0, x.length);
        double[] out = new double[n];
        EcefVectorKernel.atanStage(yy, 0, xx, 0, new double[n], 0, out, 0, n);
        for (int i = 0; i < y.length; i++) {
            assertThat(out[i]).as("atan2(%s, %s)", y[i], x[i]).isEqualTo(expected[i]);
        }
        assertThat(Double.doubleToRawLongBits(out[0])).isEqualTo(0L);
    }
}
