package io.geotick.transforms.helmert;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import io.geotick.geodesy.InvalidCoordinateException;
import io.geotick.geodesy.simd.Simd;
import java.util.Arrays;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The SIMD kernel of the Helmert arrays against the scalar code, bit for bit. These tests run in the
 * build's second test pass, with {@code --add-modules jdk.incubator.vector}; without the module they are
 * skipped. The formulas themselves are checked against IOGP worked examples in reference-tests.
 */
class AffineVectorKernelTest {
    // Source: EPSG transformation 1314 (OSGB 1936 → WGS 84, position vector), values from memory; any
    // parameter set serves here, since the kernel is compared with the scalar code.
    private static final Helmert OSGB = Helmert.positionVector(
        HelmertParameters.of(446.448, -125.157, 542.06, 0.15, 0.247, 0.842, -20.489));
    private static final Helmert RIGOROUS = Helmert.of(HelmertParameters.of(-0.5, 1.2, 3.3, 12.5, -8.1, 30.2, 4.5),
        RotationConvention.COORDINATE_FRAME, RotationForm.RIGOROUS);

    private static double[] randomEcef(int n, long seed) {
        Random r = new Random(seed);
        double[] e = new double[3 * n];
        for (int i = 0; i < 3 * n; i++) {
            e[i] = (r.nextDouble() - 0.5) * 1.4e7 * (i % 7 == 0 ? 5 : 1);
        }
        return e;
    }

    private static double[] scalar(Helmert h, double[] in, int inOffset, int n) {
        double[] out = new double[3 * n];
        h.kernel().applyScalar(in, inOffset, out, 0, 0, n);
        return out;
    }

    private static long[] bits(double[] a) {
        return Arrays.stream(a).mapToLong(Double::doubleToRawLongBits).toArray();
    }

    @Test
    void theArraysMatchTheScalarCodeBitForBit() {
        assumeTrue(Simd.enabled(), Simd.status());
        for (Helmert h : new Helmert[] {OSGB, RIGOROUS, OSGB.reversedBySignReversal()}) {
            for (int n : new int[] {1, 7, 8, 9, 64, 1000, 1001}) {
                for (int offset : new int[] {0, 1, 2, 5}) {
                    double[] in = new double[3 * n + offset + 1];
                    System.arraycopy(randomEcef(n, n + offset), 0, in, offset, 3 * n);
                    double[] out = new double[3 * n];
                    h.apply(in, offset, out, 0, n);
                    assertThat(bits(out)).as("n %s, offset %s", n, offset).isEqualTo(bits(scalar(h, in, offset, n)));
                }
            }
        }
    }

    @Test
    void inPlaceGivesTheSameResults() {
        assumeTrue(Simd.enabled(), Simd.status());
        int n = 1000;
        double[] in = randomEcef(n, 5);
        double[] expected = scalar(OSGB, in, 0, n);
        OSGB.apply(in, 0, in, 0, n);
        assertThat(bits(in)).isEqualTo(bits(expected));
    }

    @Test
    void aNonFinitePointIsReportedByIndexAndThePointsBeforeItAreTransformed() {
        assumeTrue(Simd.enabled(), Simd.status());
        int n = 1000;
        for (double bad : new double[] {Double.NaN, Double.POSITIVE_INFINITY}) {
            double[] in = randomEcef(n, 6);
            in[3 * 433 + 1] = bad;
            double[] expected = scalar(OSGB, Arrays.copyOf(in, 3 * 433), 0, 433);
            double[] out = new double[3 * n];
            Arrays.fill(out, -1);
            assertThatThrownBy(() -> OSGB.apply(in, 0, out, 0, n)).isInstanceOf(InvalidCoordinateException.class)
                .hasMessageStartingWith("point 433: ");
            assertThat(bits(Arrays.copyOf(out, 3 * 433))).isEqualTo(bits(expected));
            assertThat(Arrays.copyOfRange(out, 3 * 433, 3 * n)).containsOnly(-1.0);
        }
    }

    @Test
    void hugeButFiniteCoordinatesGiveTheScalarResults() {
        assumeTrue(Simd.enabled(), Simd.status());
        int n = 64;
        double[] in = randomEcef(n, 8);
        in[3 * 20] = 1e308; // overflows to infinity in the scalar code too, without an error
        double[] out = new double[3 * n];
        OSGB.apply(in, 0, out, 0, n);
        assertThat(bits(out)).isEqualTo(bits(scalar(OSGB, in, 0, n)));
    }
}
