package io.geotick.reference.projection;

import static org.assertj.core.api.Assertions.assertThat;

import io.geotick.geodesy.ellipsoid.Ellipsoids;
import io.geotick.geodesy.position.GeodeticPosition;
import io.geotick.transforms.projection.GridPosition;
import io.geotick.transforms.projection.Hemisphere;
import io.geotick.transforms.projection.LambertConformalConic;
import io.geotick.transforms.projection.MapProjection;
import io.geotick.transforms.projection.TransverseMercator;
import io.geotick.transforms.projection.Ups;
import io.geotick.transforms.projection.Utm;
import io.geotick.transforms.projection.WebMercator;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.locationtech.proj4j.CRSFactory;
import org.locationtech.proj4j.ProjCoordinate;
import org.locationtech.proj4j.proj.Projection;

/**
 * Each projection against Proj4J 1.4.1 as a reference library, on random points (fixed seeds). Proj4J
 * CRSs are created from EPSG codes only, and only their projection step is used
 * ({@code Projection.project}/{@code inverseProject}, degrees in), so no datum shift enters.
 *
 * <p>Differences found (measured when written, recorded beside each check):
 * <ul>
 *   <li>UTM (EPSG:326xx/327xx): Proj4J uses its extended Transverse Mercator, also a 6th-order Krüger
 *       series, so the two agree to the nanometre level even 9° from the central meridian;</li>
 *   <li>British National Grid (EPSG:27700): Proj4J's plain Transverse Mercator is the classical
 *       series in powers of the longitude difference (Snyder 1987, eqs. 8-9 ff.), truncated at the
 *       6th/8th power; it agrees to well under 1 mm within 3° of the central meridian and drifts off
 *       farther out (recorded below);</li>
 *   <li>Lambert 1SP/2SP, polar stereographic and Pseudo-Mercator are closed formulas in both: agreement
 *       at the rounding level.</li>
 * </ul>
 */
class Proj4jProjectionComparisonTest {
    private static final CRSFactory FACTORY = new CRSFactory();

    private static Projection proj4j(String epsg) {
        return FACTORY.createFromName(epsg).getProjection();
    }

    /** Largest horizontal difference (m) between ours and Proj4J's forward over the points. */
    private static double forwardDifference(MapProjection ours, Projection theirs, double[][] points) {
        double worst = 0;
        ProjCoordinate out = new ProjCoordinate();
        for (double[] p : points) {
            GridPosition g = ours.project(p[0], p[1]);
            theirs.project(new ProjCoordinate(p[1], p[0]), out);
            worst = Math.max(worst, Math.hypot(g.easting() - out.x, g.northing() - out.y));
        }
        return worst;
    }

    /** Largest difference (m, on the ellipsoid) between ours and Proj4J's inverse of our forward. */
    private static double inverseDifference(MapProjection ours, Projection theirs, double[][] points) {
        double worst = 0;
        ProjCoordinate out = new ProjCoordinate();
        for (double[] p : points) {
            GridPosition g = ours.project(p[0], p[1]);
            GeodeticPosition back = ours.unproject(g);
            theirs.inverseProject(new ProjCoordinate(g.easting(), g.northing()), out);
            double dLat = Math.toRadians(back.latitude() - out.y) * 6.4e6;
            double dLon = Math.toRadians(Math.IEEEremainder(back.longitude() - out.x, 360))
                * 6.4e6 * Math.cos(Math.toRadians(p[0]));
            worst = Math.max(worst, Math.hypot(dLat, dLon));
        }
        return worst;
    }

    private static double[][] points(long seed, int count, double latMin, double latMax, double lonMin,
            double lonMax) {
        SplittableRandom r = new SplittableRandom(seed);
        double[][] p = new double[count][];
        for (int i = 0; i < count; i++) {
            p[i] = new double[] {r.nextDouble(latMin, latMax), r.nextDouble(lonMin, lonMax)};
        }
        return p;
    }

    @Test
    void utmZone31NorthWithin3DegreesOfTheCentralMeridian() {
        // Source: Proj4J 1.4.1, EPSG:32631 (WGS 84 / UTM zone 31N) as a reference library.
        double[][] pts = points(31, 2000, 0, 84, 0, 6);
        assertThat(forwardDifference(Utm.zone(31, Hemisphere.NORTH), proj4j("EPSG:32631"), pts))
            .isLessThan(1e-3);
        assertThat(inverseDifference(Utm.zone(31, Hemisphere.NORTH), proj4j("EPSG:32631"), pts))
            .isLessThan(1e-3);
    }

    @Test
    void utmZone33SouthOutTo9DegreesFromTheCentralMeridian() {
        // Source: Proj4J 1.4.1, EPSG:32733 (WGS 84 / UTM zone 33S). Both are 6th-order Krüger series;
        // measured when written: 4.8 nm at up to 9° from the central meridian.
        double[][] pts = points(33, 2000, -80, 0, 6, 24);
        double d = forwardDifference(Utm.zone(33, Hemisphere.SOUTH), proj4j("EPSG:32733"), pts);
        assertThat(d).isLessThan(1e-6);
    }

    @Test
    void britishNationalGridTransverseMercator() {
        // Source: Proj4J 1.4.1, EPSG:27700 (OSGB 1936 / British National Grid; Airy 1830).
        TransverseMercator bng = TransverseMercator.of(Ellipsoids.AIRY_1830, -2, 0.9996012717, 400000, -100000,
            49);
        Projection theirs = proj4j("EPSG:27700");
        double near = forwardDifference(bng, theirs, points(27700, 2000, 49, 61, -5, 1));
        double far = forwardDifference(bng, theirs, points(27701, 2000, 0, 70, -2 + 3, -2 + 9));
        double veryFar = forwardDifference(bng, theirs, points(27702, 500, 0, 60, -2 + 15, -2 + 20));
        // Measured when written: 25 µm within 3° of the central meridian; 1.1 cm at 3°–9°; 3.4 m at
        // 15°–20°. The growth is Proj4J's truncated power series in Δλ (its error grows like Δλ⁸); ours
        // stays within 5 nm of the 40-digit exact mapping there (KrugerExactReferenceTest).
        assertThat(near).isLessThan(1e-3);
        assertThat(far).isBetween(1e-3, 0.05);
        assertThat(veryFar).isBetween(0.5, 10.0);
        assertThat(inverseDifference(bng, theirs, points(27703, 2000, 49, 61, -5, 1))).isLessThan(1e-3);
    }

    @Test
    void lambert93TwoStandardParallels() {
        // Source: Proj4J 1.4.1, EPSG:2154 (RGF93 / Lambert-93: GRS 80, φ1 49°N, φ2 44°N, φF 46°30'N,
        // λF 3°E, EF 700 000 m, NF 6 600 000 m — parameters common practice).
        LambertConformalConic l93 = LambertConformalConic.twoStandardParallels(Ellipsoids.GRS80, 46.5, 3, 49, 44,
            700000, 6600000);
        double[][] pts = points(2154, 2000, 41, 52, -5, 10);
        double d = forwardDifference(l93, proj4j("EPSG:2154"), pts);
        // Measured when written: 4.7 nm forward; 2 µm inverse (Proj4J's latitude iteration tolerance).
        assertThat(d).isLessThan(1e-3);
        assertThat(inverseDifference(l93, proj4j("EPSG:2154"), pts)).isLessThan(1e-3);
    }

    @Test
    void jamaicaNationalGridOneStandardParallel() {
        // Source: Proj4J 1.4.1, EPSG:24200 (JAD69 / Jamaica National Grid: Clarke 1866, φ0 18°N, λ0 77°W,
        // k0 1, FE 250 000 m, FN 150 000 m).
        LambertConformalConic jm = LambertConformalConic.oneStandardParallel(Ellipsoids.CLARKE_1866, 18, -77, 1,
            250000, 150000);
        double[][] pts = points(24200, 2000, 15, 21, -80, -74);
        double d = forwardDifference(jm, proj4j("EPSG:24200"), pts);
        // Measured when written: 8.9 nm.
        assertThat(d).isLessThan(1e-3);
        assertThat(inverseDifference(jm, proj4j("EPSG:24200"), pts)).isLessThan(1e-3);
    }

    @Test
    void upsNorthAndSouth() {
        // Source: Proj4J 1.4.1, EPSG:32661 (WGS 84 / UPS North) and EPSG:32761 (UPS South).
        double[][] north = points(32661, 2000, 83.5, 90, -180, 180);
        double[][] south = points(32761, 2000, -90, -79.5, -180, 180);
        double dn = forwardDifference(Ups.of(Hemisphere.NORTH), proj4j("EPSG:32661"), north);
        double ds = forwardDifference(Ups.of(Hemisphere.SOUTH), proj4j("EPSG:32761"), south);
        // Measured when written: 1.4 nm and 1.5 nm.
        assertThat(dn).isLessThan(1e-3);
        assertThat(ds).isLessThan(1e-3);
        assertThat(inverseDifference(Ups.of(Hemisphere.NORTH), proj4j("EPSG:32661"), north)).isLessThan(1e-3);
        assertThat(inverseDifference(Ups.of(Hemisphere.SOUTH), proj4j("EPSG:32761"), south)).isLessThan(1e-3);
    }

    @Test
    void pseudoMercator() {
        // Source: Proj4J 1.4.1, EPSG:3857 (WGS 84 / Pseudo-Mercator; spherical formulas on a = 6 378 137 m).
        double[][] pts = points(3857, 2000, -85, 85, -180, 180);
        double d = forwardDifference(WebMercator.wgs84(), proj4j("EPSG:3857"), pts);
        // Measured when written: 30 nm (rounding at northings up to 2e7 m).
        assertThat(d).isLessThan(1e-3);
        assertThat(inverseDifference(WebMercator.wgs84(), proj4j("EPSG:3857"), pts)).isLessThan(1e-3);
    }
}
