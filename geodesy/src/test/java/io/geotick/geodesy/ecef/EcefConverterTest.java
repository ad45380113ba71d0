package io.geotick.geodesy.ecef;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import io.geotick.geodesy.InvalidCoordinateException;
import io.geotick.geodesy.ellipsoid.Ellipsoids;
import io.geotick.geodesy.position.EcefPosition;
import io.geotick.geodesy.position.GeodeticPosition;
import io.geotick.geodesy.simd.Simd;
import java.util.Random;
import org.junit.jupiter.api.Test;

class EcefConverterTest {
    private static final EcefConverter C = EcefConverter.of(Ellipsoids.WGS84);

    @Test
    void arrayVariantsMatchTheSinglePointMethodsBitForBit() {
        Random rnd = new Random(31L);
        int n = 2000;
        double[] geo = new double[3 * n];
        for (int i = 0; i < n; i++) {
            geo[3 * i] = -90 + 180 * rnd.nextDouble();
            geo[3 * i + 1] = -180 + 360 * rnd.nextDouble();
            geo[3 * i + 2] = -5e6 + 5.5e7 * rnd.nextDouble();
        }
        geo[0] = 90;
        geo[3] = -90;
        geo[6] = 0;
        double[] ecef = new double[3 * n + 1];
        C.toEcef(geo, 0, ecef, 1, n);
        double[] back = ecef.clone();
        C.toGeodetic(back, 1, back, 1, n); // in place
        for (int i = 0; i < n; i++) {
            EcefPosition e = C.toEcef(GeodeticPosition.of(geo[3 * i], geo[3 * i + 1], geo[3 * i + 2]));
            assertThat(bits(ecef[1 + 3 * i])).isEqualTo(bits(e.x()));
            assertThat(bits(ecef[2 + 3 * i])).isEqualTo(bits(e.y()));
            assertThat(bits(ecef[3 + 3 * i])).isEqualTo(bits(e.z()));
            GeodeticPosition g = C.toGeodetic(e);
            if (Simd.enabled()) {
                // The SIMD kernel's lane arc tangent: equal or within an ulp plus the scalar one's 1.2e-16°
                // (EcefVectorKernelTest); heights bit for bit.
                assertThat(Math.abs(back[1 + 3 * i] - g.latitude()))
                    .isLessThanOrEqualTo(Math.ulp(g.latitude()) + 1.3e-16);
                assertThat(Math.abs(back[2 + 3 * i] - g.longitude()))
                    .isLessThanOrEqualTo(Math.ulp(g.longitude()) + 1.3e-16);
            } else {
                assertThat(bits(back[1 + 3 * i])).isEqualTo(bits(g.latitude()));
                assertThat(bits(back[2 + 3 * i])).isEqualTo(bits(g.longitude()));
            }
            assertThat(bits(back[3 + 3 * i])).isEqualTo(bits(g.height()));
        }
    }

    private static long bits(double d) {
        return Double.doubleToRawLongBits(d);
    }

    @Test
    void specialPointsFollowTheDocumentedConventions() {
        // Polar axis: longitude 0, latitude ±90, h = |z| − b.
        GeodeticPosition n = C.toGeodetic(EcefPosition.of(0, 0, 7e6));
        assertThat(n.latitude()).isEqualTo(90.0);
        assertThat(n.longitude()).isEqualTo(0.0);
        assertThat(n.height()).isCloseTo(7e6 - Ellipsoids.WGS84.semiMinorAxis(), within(1e-9));
        assertThat(C.toGeodetic(EcefPosition.of(0, 0, -7e6)).latitude()).isEqualTo(-90.0);
        // Equatorial plane: latitude exactly 0.
        GeodeticPosition e = C.toGeodetic(EcefPosition.of(-4e6, 5e6, 0));
        assertThat(e.latitude()).isEqualTo(0.0);
        assertThat(e.height()).isCloseTo(Math.hypot(4e6, 5e6) - 6378137, within(1e-9));
        // Near the centre, inside the evolute: a clear error, never NaN.
        for (double[] p : new double[][] {{0, 0, 0}, {1e3, 0, 1e3}, {2e4, -1e4, 5e3}, {0, 0, 3e4}}) {
            assertThatThrownBy(() -> C.toGeodetic(EcefPosition.of(p[0], p[1], p[2])))
                .isInstanceOf(InvalidCoordinateException.class).hasMessageContaining("evolute");
        }
    }

    @Test
    void nonFiniteAndAbsurdlyDistantPointsAreRejected() {
        // Beyond 1e15 m the inverse used to return NaN (squares overflow near 1e154 m); now it refuses.
        assertThatThrownBy(() -> C.toGeodetic(EcefPosition.of(1e200, 3e199, 7e199)))
            .isInstanceOf(InvalidCoordinateException.class).hasMessageContaining("1.0E200");
        double[] a = {6378137, 0, 0, 1e155, 0, 0};
        assertThatThrownBy(() -> C.toGeodetic(a, 0, new double[6], 0, 2)).isInstanceOf(InvalidCoordinateException.class)
            .hasMessageContaining("point 1");
        double[] b = {Double.NaN, 0, 0};
        assertThatThrownBy(() -> C.toGeodetic(b, 0, new double[3], 0, 1)).isInstanceOf(InvalidCoordinateException.class)
            .hasMessageContaining("NaN");
        // A far but legitimate point (1e12 m) still converts.
        GeodeticPosition far = C.toGeodetic(EcefPosition.of(1e12, 0, 1e12));
        assertThat(far.latitude()).isCloseTo(45.0, within(1e-3));
        double[] g = {45, 0, Double.NaN};
        assertThatThrownBy(() -> C.toEcef(g, 0, new double[3], 0, 1)).isInstanceOf(InvalidCoordinateException.class)
            .hasMessageContaining("point 0");
    }
}
