package io.geotick.geodesy.local;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import io.geotick.geodesy.InvalidCoordinateException;
import io.geotick.geodesy.ellipsoid.Ellipsoids;
import io.geotick.geodesy.position.EcefPosition;
import io.geotick.geodesy.position.GeodeticPosition;
import io.geotick.geodesy.simd.Simd;
import java.util.Random;
import java.util.function.Function;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.junit.jupiter.api.Test;

/**
 * The array variants of {@link LocalFrame} give bit-for-bit the single-point results, in place or not (with the
 * SIMD kernels on: see {@link #assertSame}).
 */
class LocalFrameArrayTest {
    private static final int N = 500;
    // Invented origin for the tests.
    private static final LocalFrame F = LocalFrame.at(GeodeticPosition.of(-33.9, 151.2, 40.0), Ellipsoids.WGS84);

    @FunctionalInterface
    interface ArrayOp {
        void apply(double[] in, int inOffset, double[] out, int outOffset, int count);
    }

    private static double[] ecefPoints(Random rnd) {
        double[] a = new double[3 * N];
        for (int i = 0; i < N; i++) {
            GeodeticPosition g = GeodeticPosition.of(-90 + 180 * rnd.nextDouble(), -180 + 360 * rnd.nextDouble(),
                -1e4 + 4e7 * rnd.nextDouble());
            EcefPosition e = io.geotick.geodesy.ecef.EcefConverter.of(Ellipsoids.WGS84).toEcef(g);
            a[3 * i] = e.x();
            a[3 * i + 1] = e.y();
            a[3 * i + 2] = e.z();
        }
        return a;
    }

    private static double[] geodeticPoints(Random rnd) {
        double[] a = new double[3 * N];
        for (int i = 0; i < N; i++) {
            a[3 * i] = -90 + 180 * rnd.nextDouble();
            a[3 * i + 1] = -180 + 360 * rnd.nextDouble();
            a[3 * i + 2] = -1e4 + 4e7 * rnd.nextDouble();
        }
        return a;
    }

    private static double[] toArray(double[] in, Function<double[], double[]> single) {
        double[] out = new double[in.length];
        for (int i = 0; i < in.length / 3; i++) {
            double[] r = single.apply(new double[] {in[3 * i], in[3 * i + 1], in[3 * i + 2]});
            System.arraycopy(r, 0, out, 3 * i, 3);
        }
        return out;
    }

    /** Runs the op out of place with offsets and in place, and compares bits with the expected values. */
    private static void assertSameBits(double[] in, double[] expected, ArrayOp op) {
        double[] padded = new double[in.length + 5];
        System.arraycopy(in, 0, padded, 2, in.length);
        double[] out = new double[in.length + 7];
        op.apply(padded, 2, out, 4, in.length / 3);
        double[] inPlace = in.clone();
        op.apply(inPlace, 0, inPlace, 0, in.length / 3);
        for (int k = 0; k < in.length; k++) {
            assertSame(out[4 + k], expected[k], "index " + k);
            assertSame(inPlace[k], expected[k], "in place, index " + k);
        }
        assertThat(out[0]).isZero(); // nothing written outside the range
        assertThat(out[out.length - 1]).isZero();
    }

    /**
     * Bit for bit; with the SIMD kernels on (the build's second test pass), geodetic results of the batch
     * ECEF → geodetic inverse may differ by an ulp plus 1.3e-16° (see EcefVectorKernelTest).
     */
    private static void assertSame(double got, double expected, String what) {
        if (Simd.enabled()) {
            assertThat(Math.abs(got - expected)).as(what).isLessThanOrEqualTo(Math.ulp(expected) + 1.3e-16);
        } else {
            assertThat(Double.doubleToRawLongBits(got)).as(what).isEqualTo(Double.doubleToRawLongBits(expected));
        }
    }

    private static double[] v(Enu e) {
        return new double[] {e.east(), e.north(), e.up()};
    }

    private static double[] v(Ned e) {
        return new double[] {e.north(), e.east(), e.down()};
    }

    private static double[] v(Aer e) {
        return new double[] {e.azimuth(), e.elevation(), e.range()};
    }

    private static double[] v(EcefPosition e) {
        return new double[] {e.x(), e.y(), e.z()};
    }

    private static double[] v(GeodeticPosition e) {
        return new double[] {e.latitude(), e.longitude(), e.height()};
    }

    private static double[] v(Vector3D e) {
        return new double[] {e.getX(), e.getY(), e.getZ()};
    }

    @Test
    void ecefAndLocalArraysMatchTheSinglePointMethods() {
        Random rnd = new Random(21L);
        double[] ecef = ecefPoints(rnd);
        double[] enu = toArray(ecef, p -> v(F.toEnu(EcefPosition.of(p[0], p[1], p[2]))));
        double[] ned = toArray(ecef, p -> v(F.toNed(EcefPosition.of(p[0], p[1], p[2]))));
        double[] aer = toArray(ecef, p -> v(F.toAer(EcefPosition.of(p[0], p[1], p[2]))));
        assertSameBits(ecef, enu, F::ecefToEnu);
        assertSameBits(ecef, ned, F::ecefToNed);
        assertSameBits(ecef, aer, F::ecefToAer);
        assertSameBits(enu, toArray(enu, p -> v(F.toEcef(Enu.of(p[0], p[1], p[2])))), F::enuToEcef);
        assertSameBits(ned, toArray(ned, p -> v(F.toEcef(Ned.of(p[0], p[1], p[2])))), F::nedToEcef);
        assertSameBits(aer, toArray(aer, p -> v(F.toEcef(Aer.of(p[0], p[1], p[2])))), F::aerToEcef);
    }

    @Test
    void geodeticAndLocalArraysMatchTheSinglePointMethods() {
        Random rnd = new Random(22L);
        double[] geo = geodeticPoints(rnd);
        double[] enu = toArray(geo, p -> v(F.toEnu(GeodeticPosition.of(p[0], p[1], p[2]))));
        double[] ned = toArray(geo, p -> v(F.toNed(GeodeticPosition.of(p[0], p[1], p[2]))));
        double[] aer = toArray(geo, p -> v(F.toAer(GeodeticPosition.of(p[0], p[1], p[2]))));
        assertSameBits(geo, enu, F::geodeticToEnu);
        assertSameBits(geo, ned, F::geodeticToNed);
        assertSameBits(geo, aer, F::geodeticToAer);
        assertSameBits(enu, toArray(enu, p -> v(F.toGeodetic(Enu.of(p[0], p[1], p[2])))), F::enuToGeodetic);
        assertSameBits(ned, toArray(ned, p -> v(F.toGeodetic(Ned.of(p[0], p[1], p[2])))), F::nedToGeodetic);
        assertSameBits(aer, toArray(aer, p -> v(F.toGeodetic(Aer.of(p[0], p[1], p[2])))), F::aerToGeodetic);
    }

    @Test
    void vectorRotationArraysMatchTheSinglePointMethods() {
        Random rnd = new Random(23L);
        double[] vel = new double[3 * N];
        for (int k = 0; k < vel.length; k++) {
            vel[k] = 8000 * (2 * rnd.nextDouble() - 1);
        }
        assertSameBits(vel, toArray(vel, p -> v(F.rotateToEnu(new Vector3D(p[0], p[1], p[2])))), F::rotateToEnu);
        assertSameBits(vel, toArray(vel, p -> v(F.rotateToEcef(new Vector3D(p[0], p[1], p[2])))), F::rotateToEcef);
    }

    @Test
    void invalidPointsAreReportedByIndex() {
        double[] ecef = {6378137, 0, 0, Double.NaN, 0, 0};
        assertThatThrownBy(() -> F.ecefToEnu(ecef, 0, new double[6], 0, 2)).isInstanceOf(InvalidCoordinateException.class)
            .hasMessageContaining("point 1").hasMessageContaining("NaN");
        double[] geo = {10, 20, 30, 91, 0, 0};
        assertThatThrownBy(() -> F.geodeticToEnu(geo, 0, new double[6], 0, 2)).isInstanceOf(InvalidCoordinateException.class)
            .hasMessageContaining("point 1").hasMessageContaining("91.0");
        double[] aer = {10, 20, 30, 360, 0, 5};
        assertThatThrownBy(() -> F.aerToEcef(aer, 0, new double[6], 0, 2)).isInstanceOf(InvalidCoordinateException.class)
            .hasMessageContaining("point 1").hasMessageContaining("azimuth 360.0");
        double[] enu = {0, 0, 0, 0, Double.POSITIVE_INFINITY, 0};
        assertThatThrownBy(() -> F.enuToGeodetic(enu, 0, new double[6], 0, 2)).isInstanceOf(InvalidCoordinateException.class)
            .hasMessageContaining("point 1");
        // The point at the Earth's centre, in local coordinates, has no geodetic coordinates.
        double[] centre = v(F.toEnu(EcefPosition.of(0, 0, 0)));
        assertThatThrownBy(() -> F.enuToGeodetic(centre, 0, new double[3], 0, 1))
            .isInstanceOf(InvalidCoordinateException.class).hasMessageContaining("evolute");
        double[] vel = {1, 2, Double.NaN};
        assertThatThrownBy(() -> F.rotateToEnu(vel, 0, new double[3], 0, 1)).isInstanceOf(InvalidCoordinateException.class)
            .hasMessageContaining("point 0");
        double[] huge = {Double.MAX_VALUE, Double.MAX_VALUE, 0};
        assertThatThrownBy(() -> F.rotateToEnu(huge, 0, new double[3], 0, 1)).isInstanceOf(InvalidCoordinateException.class)
            .hasMessageContaining("overflows");
    }

    @Test
    void rangesAreCheckedAndZeroCountIsANoOp() {
        double[] a = new double[6];
        assertThatThrownBy(() -> F.ecefToEnu(a, 1, a, 0, 2)).isInstanceOf(IndexOutOfBoundsException.class);
        assertThatThrownBy(() -> F.enuToEcef(a, 0, new double[5], 0, 2)).isInstanceOf(IndexOutOfBoundsException.class);
        assertThatThrownBy(() -> F.ecefToEnu(a, 0, a, 0, -1)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> F.ecefToEnu(null, 0, a, 0, 1)).isInstanceOf(NullPointerException.class);
        double[] untouched = {1, 2, 3};
        F.geodeticToAer(untouched, 0, untouched, 0, 0);
        assertThat(untouched).containsExactly(1, 2, 3);
    }
}
