package io.geotick.transforms.projection;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import io.geotick.geodesy.ellipsoid.Ellipsoid;
import io.geotick.geodesy.ellipsoid.Ellipsoids;
import io.geotick.geodesy.position.GeodeticPosition;
import java.util.List;
import java.util.SplittableRandom;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Properties every projection must have: forward then inverse returns the point, the array variants
 * agree with the single-point ones (also in place), and the reported scale and convergence agree with
 * numerical differentiation of the forward mapping (central differences).
 *
 * <p>Source of the scale/convergence definitions: IOGP Guidance Note 7-2 and Snyder (1987) §4
 * (common practice): k = |d(E, N)|/ds along a meridian (M dφ) or a parallel (ν cos φ dλ); γ is the
 * angle from true north to grid north, clockwise, so the meridian's grid direction is rotated by −γ.
 */
class ProjectionPropertiesTest {

    /** A projection with a sampling box inside its domain. */
    record Case(String label, MapProjection projection, double latMin, double latMax, double lonMin,
            double lonMax, boolean conformal, double roundTripMetres) {
        @Override
        public String toString() {
            return label;
        }
    }

    /**
     * Round-trip tolerances: 1e-9 m where the grid coordinates stay below about 4e6 m; where they reach
     * 1e7–2e7 m (false northings, far cone apexes) the spacing of doubles there is itself 1.9e-9–3.7e-9 m,
     * so a few such units are allowed (stated per case).
     */
    static Stream<Case> cases() {
        return Stream.of(
            // The TM round trip carries the two series' truncations (≈ nm, Karney 2011 §4).
            new Case("UTM 31N", Utm.zone(31, Hemisphere.NORTH), 0, 84, -6, 12, true, 5e-9),
            new Case("UTM 33S", Utm.zone(33, Hemisphere.SOUTH), -80, 0, 6, 24, true, 5e-9),
            new Case("TM wide", TransverseMercator.of(Ellipsoids.GRS80, 10, 1, 0, 0, 30), -89.9, 89.9, -20, 40,
                true, 5e-9),
            new Case("TM BNG", TransverseMercator.of(Ellipsoids.AIRY_1830, -2, 0.9996012717, 400000, -100000, 49),
                49, 61, -8, 2, true, 5e-9),
            new Case("UPS N", Ups.of(Hemisphere.NORTH), 83.5, 89.999, -180, 180, true, 1e-9),
            new Case("UPS S", Ups.of(Hemisphere.SOUTH), -89.999, -79.5, -180, 180, true, 1e-9),
            new Case("PS A north", PolarStereographic.variantA(Ellipsoids.INTERNATIONAL_1924, Hemisphere.NORTH,
                -45, 0.97, 100, -200), 10, 89.999, -180, 180, true, 5e-9), // ρ up to 1.1e7 m
            new Case("LCC 2SP", LambertConformalConic.twoStandardParallels(Ellipsoids.GRS80, 46.5, 3, 49, 44,
                700000, 6600000), 30, 70, -30, 40, true, 1e-8), // N up to 9e6 m, r up to 1e7 m
            new Case("LCC 2SP south", LambertConformalConic.twoStandardParallels(Ellipsoids.GRS80, -32, 135, -28,
                -36, 1000000, 2000000), -50, -10, 100, 170, true, 1e-8), // r up to 1.2e7 m
            new Case("LCC 1SP", LambertConformalConic.oneStandardParallel(Ellipsoids.CLARKE_1866, 18, -77, 1,
                250000, 150000), 0, 40, -100, -50, true, 1e-8), // r up to 2.2e7 m
            new Case("Lambert-93 extent", LambertConformalConic.twoStandardParallels(Ellipsoids.GRS80, 46.5, 3, 49,
                44, 700000, 6600000), 41, 52, -5, 10, true, 5e-9), // r ≈ 6e6 m through exp/log: ~2 nm each way
            new Case("Web Mercator", WebMercator.wgs84(), -85, 85, -180, 180, false, 1e-8)); // |E|, |N| to 2e7 m
    }

    private static double[][] sample(Case c, long seed, int n) {
        SplittableRandom r = new SplittableRandom(seed);
        double[][] p = new double[n][];
        for (int i = 0; i < n; i++) {
            p[i] = new double[] {r.nextDouble(c.latMin, c.latMax), r.nextDouble(c.lonMin, c.lonMax)};
        }
        return p;
    }

    /** Distance on the ellipsoid (m) between two nearby positions. */
    private static double distance(Ellipsoid el, double lat1, double lon1, double lat2, double lon2) {
        double m = el.meridianRadius(lat1);
        double nu = el.primeVerticalRadius(lat1);
        double dN = Math.toRadians(lat2 - lat1) * m;
        double dE = Math.toRadians(Math.IEEEremainder(lon2 - lon1, 360)) * nu * Math.cos(Math.toRadians(lat1));
        return Math.hypot(dN, dE);
    }

    @ParameterizedTest
    @MethodSource("cases")
    void forwardThenInverseReturnsThePoint(Case c) {
        // Source: the definition of an inverse (the round trip is exact up to rounding and, for TM, the
        // truncation of the α and β series).
        double worst = 0;
        double worstGrid = 0;
        for (double[] p : sample(c, 1, 2000)) {
            GridPosition g = c.projection.project(p[0], p[1]);
            GeodeticPosition back = c.projection.unproject(g);
            worst = Math.max(worst, distance(c.projection.ellipsoid(), p[0], p[1], back.latitude(),
                back.longitude()));
            GridPosition again = c.projection.project(back);
            worstGrid = Math.max(worstGrid, Math.hypot(again.easting() - g.easting(),
                again.northing() - g.northing()));
        }
        assertThat(worst).as(c.label + " geodetic round trip, m").isLessThanOrEqualTo(c.roundTripMetres);
        assertThat(worstGrid).as(c.label + " grid round trip, m").isLessThanOrEqualTo(c.roundTripMetres);
    }

    @ParameterizedTest
    @MethodSource("cases")
    void arrayVariantsMatchSinglePointsAndWorkInPlace(Case c) {
        double[][] pts = sample(c, 2, 200);
        double[] src = new double[2 + 2 * pts.length];
        for (int i = 0; i < pts.length; i++) {
            src[2 + 2 * i] = pts[i][0];
            src[3 + 2 * i] = pts[i][1];
        }
        double[] dst = new double[2 * pts.length];
        c.projection.project(src, 2, dst, 0, pts.length);
        double[] inPlace = src.clone();
        c.projection.project(inPlace, 2, inPlace, 2, pts.length);
        double[] back = new double[2 * pts.length];
        c.projection.unproject(dst, 0, back, 0, pts.length);
        for (int i = 0; i < pts.length; i++) {
            GridPosition g = c.projection.project(pts[i][0], pts[i][1]);
            assertThat(dst[2 * i]).isEqualTo(g.easting());
            assertThat(dst[2 * i + 1]).isEqualTo(g.northing());
            assertThat(inPlace[2 + 2 * i]).isEqualTo(g.easting());
            assertThat(inPlace[3 + 2 * i]).isEqualTo(g.northing());
            GeodeticPosition p = c.projection.unproject(g);
            assertThat(back[2 * i]).isEqualTo(p.latitude());
            assertThat(back[2 * i + 1]).isEqualTo(p.longitude());
        }
    }

    @ParameterizedTest
    @MethodSource("cases")
    void scaleAndConvergenceMatchNumericalDerivatives(Case c) {
        // Source: IOGP Guidance Note 7-2 / Snyder (1987) §4 definitions of point scale and convergence;
        // central differences with a step of 1e-4° (truncation ~1e-12 relative, rounding ~1e-10).
        Ellipsoid el = c.projection.ellipsoid();
        double h = 1e-4;
        double hr = Math.toRadians(h);
        for (double[] p : sample(c, 3, 300)) {
            double lat = Math.max(c.latMin + h, Math.min(c.latMax - h, p[0]));
            double lon = p[1];
            if (Math.abs(lat) > 89.99) {
                continue;
            }
            GridPosition g = c.projection.project(lat, lon);
            GridPosition n1 = c.projection.project(lat + h, lon);
            GridPosition s1 = c.projection.project(lat - h, lon);
            // The longitude step grows toward the poles so that the east-west displacement stays ~10 m, but
            // at most 1e-3° (a larger step's chord-for-arc error, h²/6, would exceed 5e-11).
            double hl = Math.min(h / Math.cos(Math.toRadians(lat)), 1e-3);
            double hlr = Math.toRadians(hl);
            GridPosition e1 = c.projection.project(lat, lon + hl);
            GridPosition w1 = c.projection.project(lat, lon - hl);
            double dEdPhi = (n1.easting() - s1.easting()) / (2 * hr);
            double dNdPhi = (n1.northing() - s1.northing()) / (2 * hr);
            double dEdLam = (e1.easting() - w1.easting()) / (2 * hlr);
            double dNdLam = (e1.northing() - w1.northing()) / (2 * hlr);
            double meridianScale = Math.hypot(dEdPhi, dNdPhi) / el.meridianRadius(lat);
            double parallelScale = Math.hypot(dEdLam, dNdLam)
                / (el.primeVerticalRadius(lat) * Math.cos(Math.toRadians(lat)));
            double gamma = Math.toDegrees(Math.atan2(-dEdPhi, dNdPhi));
            String where = c.label + " at (" + lat + ", " + lon + ")";
            assertThat(g.convergence()).as(where + " convergence").isCloseTo(gamma, within(1e-7));
            if (c.conformal) {
                assertThat(g.scale()).as(where + " scale").isCloseTo(meridianScale, within(2e-9 * g.scale()));
                // Conformality: the same scale east-west, where the parallel is not a tiny circle.
                if (Math.abs(lat) <= 89) {
                    assertThat(parallelScale).as(where + " conformality").isCloseTo(meridianScale,
                        within(2e-9 * g.scale()));
                }
            } else {
                assertThat(g.scale()).as(where + " scale").isCloseTo(parallelScale, within(2e-9 * g.scale()));
                WebMercator w = (WebMercator) c.projection;
                assertThat(w.meridianScale(lat)).as(where).isCloseTo(meridianScale, within(2e-9 * meridianScale));
                assertThat(w.parallelScale(lat)).as(where).isCloseTo(parallelScale, within(2e-9 * parallelScale));
            }
        }
    }

    @ParameterizedTest
    @MethodSource("cases")
    void heightIsNotUsedAndComesBackZero(Case c) {
        double[] p = sample(c, 4, 1)[0];
        GridPosition a = c.projection.project(GeodeticPosition.of(p[0], p[1], 1234.5));
        GridPosition b = c.projection.project(p[0], p[1]);
        assertThat(a).isEqualTo(b);
        assertThat(c.projection.unproject(a).height()).isZero();
        assertThat(c.projection.name()).isNotBlank();
    }

    static List<Case> list() {
        return cases().toList();
    }
}
