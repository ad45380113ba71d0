package io.geotick.transforms.projection;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import io.geotick.geodesy.InvalidCoordinateException;
import io.geotick.geodesy.ellipsoid.Ellipsoids;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Bad input gets a {@link ProjectionDomainException} naming the value; never NaN out. */
class BadInputTest {
    private static final List<MapProjection> ALL = List.of(
        Utm.zone(31, Hemisphere.NORTH),
        TransverseMercator.of(Ellipsoids.WGS84, 0, 1, 0, 0, 0),
        Ups.of(Hemisphere.SOUTH),
        PolarStereographic.variantA(Ellipsoids.WGS84, Hemisphere.NORTH, 0, 1, 0, 0),
        LambertConformalConic.oneStandardParallel(Ellipsoids.GRS80, 45, 0, 1, 0, 0),
        WebMercator.wgs84());

    @Test
    void notANumberIsRefusedEverywhere() {
        for (MapProjection p : ALL) {
            assertThatThrownBy(() -> p.project(Double.NaN, 3)).as(p.name())
                .isInstanceOf(ProjectionDomainException.class).hasMessageContaining("latitude NaN");
            double lat = p instanceof Ups ? -85 : 45;
            assertThatThrownBy(() -> p.project(lat, Double.NaN)).as(p.name())
                .isInstanceOf(ProjectionDomainException.class).hasMessageContaining("NaN");
            assertThatThrownBy(() -> p.unproject(Double.NaN, 0)).as(p.name())
                .isInstanceOf(ProjectionDomainException.class).hasMessageContaining("easting NaN");
            assertThatThrownBy(() -> p.unproject(0, Double.POSITIVE_INFINITY)).as(p.name())
                .hasMessageContaining("northing Infinity");
            assertThatThrownBy(() -> p.project(91, 0)).as(p.name()).hasMessageContaining("91.0° is outside [-90°, 90°]");
            // One family: also an InvalidCoordinateException and an IllegalArgumentException.
            assertThatThrownBy(() -> p.project(Double.NaN, 0)).isInstanceOf(InvalidCoordinateException.class)
                .isInstanceOf(IllegalArgumentException.class);
        }
    }

    @Test
    void arrayVariantNamesThePointIndex() {
        double[] src = {45, 3, Double.NaN, 3, 46, 3};
        double[] dst = new double[6];
        assertThatThrownBy(() -> Utm.zone(31, Hemisphere.NORTH).project(src, 0, dst, 0, 3))
            .isInstanceOf(ProjectionDomainException.class).hasMessageStartingWith("point 1: latitude NaN");
        assertThat(dst[0]).isGreaterThan(0);
        assertThatThrownBy(() -> Utm.zone(31, Hemisphere.NORTH).project(src, 2, dst, 0, 3))
            .isInstanceOf(IndexOutOfBoundsException.class).hasMessageContaining("offset 2");
    }

    @Test
    void transverseMercatorDomain() {
        TransverseMercator tm = TransverseMercator.of(Ellipsoids.WGS84, 0, 1, 0, 0, 0);
        assertThatThrownBy(() -> tm.project(10, 90)).hasMessageContaining("90.0° from the central meridian");
        assertThatThrownBy(() -> tm.project(0, 55)).hasMessageContaining("too far from the central meridian")
            .hasMessageContaining("(0.0°, 55.0°)");
        assertThat(tm.project(80, 89).scale()).isGreaterThan(1);
        assertThatThrownBy(() -> tm.unproject(9e6, 0)).hasMessageContaining("E 9000000.0");
        assertThatThrownBy(() -> tm.unproject(0, 2.1e7)).hasMessageContaining("N 2.1E7");
        assertThatThrownBy(() -> TransverseMercator.of(Ellipsoids.WGS84, 200, 1, 0, 0, 0))
            .hasMessageContaining("central meridian 200.0");
        assertThatThrownBy(() -> TransverseMercator.of(Ellipsoids.WGS84, 0, 0, 0, 0, 0))
            .hasMessageContaining("scale factor 0.0");
        assertThatThrownBy(() -> TransverseMercator.of(Ellipsoids.WGS84, 0, 1, Double.NaN, 0, 0))
            .hasMessageContaining("false easting NaN");
    }

    @Test
    void poles() {
        // Lambert: the apex pole has infinite scale, the other is at infinity.
        LambertConformalConic lcc = LambertConformalConic.oneStandardParallel(Ellipsoids.GRS80, 45, 0, 1, 0, 0);
        assertThatThrownBy(() -> lcc.project(90, 0)).hasMessageContaining("latitude 90.0° is a pole");
        assertThatThrownBy(() -> lcc.project(-90, 0)).hasMessageContaining("-90.0");
        assertThatThrownBy(() -> WebMercator.wgs84().project(-90, 0)).hasMessageContaining("-90.0° is a pole");
        assertThatThrownBy(() -> WebMercator.wgs84().unproject(0, 1e9)).hasMessageContaining("northing 1.0E9");
        assertThatThrownBy(() -> WebMercator.wgs84().unproject(3e7, 0)).hasMessageContaining("easting 3.0E7");
        PolarStereographic ps = PolarStereographic.variantA(Ellipsoids.WGS84, Hemisphere.NORTH, 0, 1, 0, 0);
        assertThatThrownBy(() -> ps.project(-90, 0)).hasMessageContaining("opposite");
        assertThat(ps.project(90, 0).scale()).isEqualTo(1.0, org.assertj.core.api.Assertions.within(1e-15));
        assertThat(TransverseMercator.of(Ellipsoids.WGS84, 0, 1, 0, 0, 0).project(90, 45).easting())
            .isEqualTo(0.0);
        assertThatThrownBy(() -> LambertConformalConic.twoStandardParallels(Ellipsoids.GRS80, 0, 0, 30, -30, 0, 0))
            .hasMessageContaining("cylinder");
        assertThatThrownBy(() -> LambertConformalConic.oneStandardParallel(Ellipsoids.GRS80, 0, 0, 1, 0, 0))
            .hasMessageContaining("latitude of origin 0.0");
    }

    @Test
    void lambertGridPointOutsideTheDevelopedCone() {
        // n = sin 30° = 0.5: the cone develops into a half disc; a point "behind" the apex maps to no λ.
        LambertConformalConic lcc = LambertConformalConic.oneStandardParallel(Ellipsoids.GRS80, 30, 0, 1, 0, 0);
        double r0 = 0 - lcc.project(30, 0).northing();
        assertThat(r0).isEqualTo(0.0);
        assertThatThrownBy(() -> lcc.unproject(0, 3e7)).hasMessageContaining("outside the cone's developed sector");
    }

    @Test
    void hemisphereText() {
        assertThat(Hemisphere.parse("south")).isEqualTo(Hemisphere.SOUTH);
        assertThatThrownBy(() -> Hemisphere.parse("X")).hasMessageContaining("'X'");
    }
}
