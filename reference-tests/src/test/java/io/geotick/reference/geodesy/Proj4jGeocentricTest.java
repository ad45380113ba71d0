package io.geotick.reference.geodesy;

import static org.assertj.core.api.Assertions.assertThat;

import io.geotick.geodesy.ecef.EcefConverter;
import io.geotick.geodesy.ellipsoid.Ellipsoids;
import io.geotick.geodesy.position.EcefPosition;
import io.geotick.geodesy.position.GeodeticPosition;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.locationtech.proj4j.ProjCoordinate;
import org.locationtech.proj4j.datum.GeocentricConverter;

/**
 * Geodetic ↔ ECEF against Proj4J's {@link GeocentricConverter} on WGS 84, a reference library, on random
 * points (fixed seed). Proj4J takes radians in (longitude, latitude, height) order in a ProjCoordinate's
 * (x, y, z). Its inverse iterates until its own tolerance (1e-12, relative) is met and its forward goes
 * through radian arguments rounded once, so differences at this level are Proj4J's error: ours is within
 * 0.7 ulp-equivalents of a 40-digit reference ({@link EcefHighPrecisionReferenceTest}).
 *
 * <p>The bounds are relative to r = max(geocentric distance, a), a little above the agreement measured
 * when this test was written on 20,000 points in each height band: forward 4.7e-16·r (3.0 nm at the
 * surface, 21 nm at 50,000 km, 2.6 nm deep below), inverse 7.5e-16·r (4.8 nm at the surface, 39 nm at
 * 50,000 km, 4.0 nm deep below); height alone within 3.9 nm at the surface and 30 nm at 50,000 km.
 */
class Proj4jGeocentricTest {
    private static final EcefConverter OURS = EcefConverter.of(Ellipsoids.WGS84);
    private static final GeocentricConverter PROJ4J =
        new GeocentricConverter(org.locationtech.proj4j.datum.Ellipsoid.WGS84);
    private static final double FORWARD_RELATIVE = 6e-16;
    private static final double INVERSE_RELATIVE = 1e-15;

    private static void compare(double hMin, double hMax, long seed) {
        Random rnd = new Random(seed);
        for (int i = 0; i < 20_000; i++) {
            double lat = -90 + 180 * rnd.nextDouble();
            double lon = -180 + 360 * rnd.nextDouble();
            double h = hMin + (hMax - hMin) * rnd.nextDouble();
            EcefPosition ours = OURS.toEcef(GeodeticPosition.of(lat, lon, h));
            // Scale: the geocentric distance, or a where that is larger (ν ≈ a enters every point).
            double r = Math.max(ours.norm(), Ellipsoids.WGS84.semiMajorAxis());

            // Source: Proj4J 1.4.1 GeocentricConverter.convertGeodeticToGeocentric (reference library).
            ProjCoordinate q = new ProjCoordinate(Math.toRadians(lon), Math.toRadians(lat), h);
            PROJ4J.convertGeodeticToGeocentric(q);
            double forwardDiff = ours.distanceTo(EcefPosition.of(q.x, q.y, q.z));
            assertThat(forwardDiff).as("forward (%s°, %s°, %s m)", lat, lon, h)
                .isLessThanOrEqualTo(FORWARD_RELATIVE * r);

            // Source: Proj4J 1.4.1 GeocentricConverter.convertGeocentricToGeodetic (iterative; reference library).
            ProjCoordinate p = new ProjCoordinate(ours.x(), ours.y(), ours.z());
            PROJ4J.convertGeocentricToGeodetic(p);
            GeodeticPosition theirs = GeodeticPosition.of(Math.toDegrees(p.y), Math.toDegrees(p.x), p.z);
            GeodeticPosition mine = OURS.toGeodetic(ours);
            // Compared as positions: both results taken forward (ours) and measured against each other.
            double inverseDiff = OURS.toEcef(theirs).distanceTo(OURS.toEcef(mine));
            assertThat(inverseDiff).as("inverse %s", ours).isLessThanOrEqualTo(INVERSE_RELATIVE * r);
            assertThat(Math.abs(theirs.height() - mine.height())).as("height %s", ours)
                .isLessThanOrEqualTo(INVERSE_RELATIVE * r);
        }
    }

    @Test
    void agreesNearTheSurface() {
        compare(-1.1e4, 1e5, 42L);
    }

    @Test
    void agreesAtSatelliteHeights() {
        compare(1e5, 5e7, 43L);
    }

    @Test
    void agreesDeepBelowTheSurface() {
        compare(-5e6, -1.1e4, 44L);
    }
}
