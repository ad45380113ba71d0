package io.geotick.reference.projection;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import io.geotick.geodesy.ellipsoid.Ellipsoids;
import io.geotick.geodesy.position.GeodeticPosition;
import io.geotick.transforms.projection.GridPosition;
import io.geotick.transforms.projection.Hemisphere;
import io.geotick.transforms.projection.LambertConformalConic;
import io.geotick.transforms.projection.PolarStereographic;
import io.geotick.transforms.projection.TransverseMercator;
import io.geotick.transforms.projection.WebMercator;
import org.junit.jupiter.api.Test;
import org.locationtech.proj4j.CRSFactory;
import org.locationtech.proj4j.ProjCoordinate;

/**
 * Published worked examples. The values were recalled rather than read from the documents while this
 * was written: each check says {@code from memory}. Where a recalled value disagrees beyond its
 * rounding, the inputs and conventions were re-checked and the disagreement is stated, not hidden by a
 * wider tolerance.
 */
class IogpWorkedExamplesTest {
    /** US survey foot, m (1200/3937; common practice for the NAD27 State Plane grids). */
    private static final double US_FOOT = 1200.0 / 3937.0;

    private static double dms(double d, double m, double s) {
        return Math.signum(d) * (Math.abs(d) + m / 60 + s / 3600);
    }

    private static final TransverseMercator BNG = TransverseMercator.of(Ellipsoids.AIRY_1830, -2, 0.9996012717,
        400000, -100000, 49);

    @Test
    void britishNationalGridOrdnanceSurveyExample() {
        // Source: Ordnance Survey, A Guide to Coordinate Systems in Great Britain, Annex C worked example
        // (OSGB 1936 / Airy 1830, φ0 49°N, λ0 2°W, k0 0.9996012717, FE 400000, FN −100000):
        // 52°39'27.2531"N 1°43'4.5177"E → E 651409.903 m, N 313177.270 m (values from memory).
        GridPosition g = BNG.project(dms(52, 39, 27.2531), dms(1, 43, 4.5177));
        assertThat(g.easting()).isCloseTo(651409.903, within(0.0005));
        assertThat(g.northing()).isCloseTo(313177.270, within(0.0005));
        GeodeticPosition back = BNG.unproject(651409.903, 313177.270);
        // Source: the same example's inverse, 0.0001" ≈ 3 mm.
        assertThat(back.latitude()).isCloseTo(dms(52, 39, 27.2531), within(1e-4 / 3600));
        assertThat(back.longitude()).isCloseTo(dms(1, 43, 4.5177), within(1e-4 / 3600));
    }

    @Test
    void britishNationalGridIogpExampleAsRecalled() {
        // Source: IOGP Guidance Note 7-2, Transverse Mercator worked example (OSGB 1936 / British
        // National Grid): 50°30'N 0°30'E → E 577274.99 m, N 69740.50 m (values from memory).
        // Disagreement stated: the projection gives E 577274.984, N 69740.492, i.e. 6 mm and 8 mm from the
        // recalled figures, beyond their 5 mm rounding. Inputs and conventions were re-checked: the same
        // grid reproduces the Ordnance Survey example above to 0.1 mm, Proj4J's EPSG:27700 agrees to 25 µm
        // (Proj4jProjectionComparisonTest), and the series matches the 40-digit exact mapping to nm. The
        // recalled last digits are therefore suspect; the check pins our value to the centimetre of the
        // recalled one and documents the gap, to be confirmed against the document itself.
        GridPosition g = BNG.project(50.5, 0.5);
        assertThat(g.easting()).isCloseTo(577274.99, within(0.01));
        assertThat(g.northing()).isCloseTo(69740.50, within(0.01));
        assertThat(g.easting()).isCloseTo(577274.984, within(0.0005));
        assertThat(g.northing()).isCloseTo(69740.492, within(0.0005));
    }

    @Test
    void lambertConicConformal2spTexasSouthCentral() {
        // Source: IOGP Guidance Note 7-2, Lambert Conic Conformal (2SP) worked example (NAD27 /
        // Texas South Central, Clarke 1866, φF 27°50'N, λF 99°W, φ1 28°23'N, φ2 30°17'N, EF 2000000 US ft,
        // NF 0): 28°30'N 96°W → E 2963503.91 US ft, N 254759.80 US ft (values from memory).
        LambertConformalConic tx = LambertConformalConic.twoStandardParallels(Ellipsoids.CLARKE_1866,
            dms(27, 50, 0), -99, dms(28, 23, 0), dms(30, 17, 0), 2000000 * US_FOOT, 0);
        GridPosition g = tx.project(28.5, -96);
        assertThat(g.easting() / US_FOOT).isCloseTo(2963503.91, within(0.005));
        assertThat(g.northing() / US_FOOT).isCloseTo(254759.80, within(0.005));
        GeodeticPosition back = tx.unproject(2963503.91 * US_FOOT, 254759.80 * US_FOOT);
        // Source: the same example's reverse case (0.005 ft ≈ 5e-8°).
        assertThat(back.latitude()).isCloseTo(28.5, within(5e-8));
        assertThat(back.longitude()).isCloseTo(-96, within(5e-8));
    }

    @Test
    void lambertConicConformal1spJamaica() {
        // Source: IOGP Guidance Note 7-2, Lambert Conic Conformal (1SP) worked example (JAD69 /
        // Jamaica National Grid, Clarke 1866, φ0 18°N, λ0 77°W, k0 1, FE 250000 m, FN 150000 m):
        // 17°55'55.80"N 76°56'37.26"W → E 255966.58 m, N 142493.51 m (values from memory).
        LambertConformalConic jm = LambertConformalConic.oneStandardParallel(Ellipsoids.CLARKE_1866, 18, -77, 1,
            250000, 150000);
        GridPosition g = jm.project(dms(17, 55, 55.80), dms(-76, 56, 37.26));
        assertThat(g.easting()).isCloseTo(255966.58, within(0.005));
        assertThat(g.northing()).isCloseTo(142493.51, within(0.005));
        GeodeticPosition back = jm.unproject(255966.58, 142493.51);
        assertThat(back.latitude()).isCloseTo(dms(17, 55, 55.80), within(5e-8));
        assertThat(back.longitude()).isCloseTo(dms(-76, 56, 37.26), within(5e-8));
    }

    @Test
    void polarStereographicVariantANorth() {
        // Source: IOGP Guidance Note 7-2, Polar Stereographic (variant A) worked example, WGS 84 / UPS North
        // (φ0 90°N, λ0 0°, k0 0.994, FE = FN = 2000000 m): 73°N 44°E → E 3320416.75 m, N 632668.43 m
        // (values from memory). An earlier reading of this example at 73°S gave the mirror-image northing;
        // the example is the north-pole one, where N = FN − ρ cos(λ − λ0).
        PolarStereographic ps = PolarStereographic.variantA(Ellipsoids.WGS84, Hemisphere.NORTH, 0, 0.994,
            2000000, 2000000);
        GridPosition g = ps.project(73, 44);
        assertThat(g.easting()).isCloseTo(3320416.75, within(0.005));
        assertThat(g.northing()).isCloseTo(632668.43, within(0.005));
        GeodeticPosition back = ps.unproject(3320416.75, 632668.43);
        assertThat(back.latitude()).isCloseTo(73, within(5e-8));
        assertThat(back.longitude()).isCloseTo(44, within(5e-8));
    }

    @Test
    void polarStereographicVariantASouthAgainstProj4j() {
        // Source: the south-pole mirror of the IOGP example (N = FN + ρ cos(λ − λ0), EPSG method 9810,
        // common practice), checked against Proj4J 1.4.1's EPSG:32761 (WGS 84 / UPS South) as a reference
        // library.
        PolarStereographic ps = PolarStereographic.variantA(Ellipsoids.WGS84, Hemisphere.SOUTH, 0, 0.994,
            2000000, 2000000);
        GridPosition g = ps.project(-73, 44);
        assertThat(g.easting()).isCloseTo(3320416.75, within(0.005));
        assertThat(g.northing()).isCloseTo(2000000 + (2000000 - 632668.43), within(0.005));
        ProjCoordinate theirs = new ProjCoordinate();
        new CRSFactory().createFromName("EPSG:32761").getProjection()
            .project(new ProjCoordinate(44, -73), theirs);
        assertThat(g.northing()).isCloseTo(theirs.y, within(1e-6));
        GeodeticPosition back = ps.unproject(g);
        assertThat(back.latitude()).isCloseTo(-73, within(1e-12));
        assertThat(back.longitude()).isCloseTo(44, within(1e-12));
    }

    @Test
    void pseudoMercator() {
        // Source: IOGP Guidance Note 7-2, Popular Visualisation Pseudo-Mercator worked example
        // (WGS 84 / Pseudo-Mercator, EPSG:3857): 24°22'54.433"N 100°20'00"W → E −11169055.58 m,
        // N 2800000.00 m (values from memory).
        GridPosition g = WebMercator.wgs84().project(dms(24, 22, 54.433), dms(-100, 20, 0));
        assertThat(g.easting()).isCloseTo(-11169055.58, within(0.005));
        assertThat(g.northing()).isCloseTo(2800000.00, within(0.005));
        GeodeticPosition back = WebMercator.wgs84().unproject(-11169055.58, 2800000.00);
        assertThat(back.latitude()).isCloseTo(dms(24, 22, 54.433), within(1e-3 / 3600));
        assertThat(back.longitude()).isCloseTo(-100 - 20.0 / 60, within(1e-7));
    }
}
