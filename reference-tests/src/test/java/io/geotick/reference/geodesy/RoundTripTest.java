package io.geotick.reference.geodesy;

import static org.assertj.core.api.Assertions.assertThat;

import io.geotick.geodesy.ecef.EcefConverter;
import io.geotick.geodesy.ellipsoid.Ellipsoid;
import io.geotick.geodesy.ellipsoid.Ellipsoids;
import io.geotick.geodesy.local.LocalFrame;
import io.geotick.geodesy.position.EcefPosition;
import io.geotick.geodesy.position.GeodeticPosition;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Round trips on random points (fixed seed), all latitudes and longitudes, heights −5,000 km … +50,000 km
 * (half of them within −11 km … +100 km). A round trip compounds the forward's rounding (≤ 2.8 ulps,
 * {@link EcefHighPrecisionReferenceTest}) with the inverse's, so the bounds are stated in ulps of the
 * largest quantity involved; measured worst values are given beside each bound.
 */
class RoundTripTest {
    private static final Ellipsoid W = Ellipsoids.WGS84;
    private static final EcefConverter C = EcefConverter.of(W);
    private static final int N = 20_000;

    private static double height(Random rnd, int i) {
        return i % 2 == 0 ? -5e6 + 5.5e7 * rnd.nextDouble() : -1.1e4 + 1.11e5 * rnd.nextDouble();
    }

    private static double maxAbs(EcefPosition p) {
        return Math.max(Math.abs(p.x()), Math.max(Math.abs(p.y()), Math.abs(p.z())));
    }

    @Test
    void geodeticToEcefToGeodetic() {
        // Source: self-consistency of EPSG method 9602 (IOGP Guidance Note 7-2, §4.1.1): the reverse
        // undoes the forward. Bound: 4 ulps of max(|x|, |y|, |z|, a) in metres, horizontally and
        // vertically (measured 3.1 and 3.0 ulps; 4 ulps is 3.7 nm at the surface, 30 nm at 50,000 km).
        Random rnd = new Random(77L);
        for (int i = 0; i < N; i++) {
            double lat = -90 + 180 * rnd.nextDouble();
            double lon = -180 + 360 * rnd.nextDouble();
            double h = height(rnd, i);
            EcefPosition e = C.toEcef(GeodeticPosition.of(lat, lon, h));
            GeodeticPosition g = C.toGeodetic(e);
            double north = Math.abs(g.latitude() - lat) * Math.PI / 180 * (W.meridianRadius(lat) + h);
            double east = Math.abs(g.longitude() - lon) * Math.PI / 180 * (W.primeVerticalRadius(lat) + h)
                * Math.cos(Math.toRadians(lat));
            double bound = 4 * Math.ulp(Math.max(maxAbs(e), W.semiMajorAxis()));
            assertThat(Math.hypot(north, east)).as("(%s°, %s°, %s m)", lat, lon, h).isLessThanOrEqualTo(bound);
            assertThat(Math.abs(g.height() - h)).as("(%s°, %s°, %s m)", lat, lon, h).isLessThanOrEqualTo(bound);
        }
    }

    @Test
    void ecefToEnuToEcef() {
        // Source: EPSG method 9836 (IOGP Guidance Note 7-2, §4.1.2) is a rotation and a translation, which
        // the reverse undoes exactly. Bound: 5 ulps of the largest of the coordinates of point and origin
        // and their distance (measured 3.7 ulps).
        Random rnd = new Random(78L);
        for (int i = 0; i < N; i++) {
            EcefPosition e = C.toEcef(GeodeticPosition.of(-90 + 180 * rnd.nextDouble(), -180 + 360 * rnd.nextDouble(),
                height(rnd, i)));
            LocalFrame f = LocalFrame.at(GeodeticPosition.of(-90 + 180 * rnd.nextDouble(),
                -180 + 360 * rnd.nextDouble(), -100 + 9000 * rnd.nextDouble()), W);
            EcefPosition back = f.toEcef(f.toEnu(e));
            double m = Math.max(Math.max(maxAbs(e), maxAbs(f.originEcef())), e.distanceTo(f.originEcef()));
            assertThat(back.distanceTo(e)).as("%s about %s", e, f).isLessThanOrEqualTo(5 * Math.ulp(m));
        }
    }

    @Test
    void geodeticToEnuToGeodetic() {
        // Source: composition of EPSG 9602 and 9836 (IOGP Guidance Note 7-2, §4.1.1–4.1.2). Points within
        // 1,000 km of an origin near the surface; bound 8 ulps of the ECEF coordinates' scale (both round
        // trips above in sequence).
        Random rnd = new Random(79L);
        LocalFrame f = LocalFrame.at(GeodeticPosition.of(-12.3, 45.6, 120.0), W); // invented origin
        for (int i = 0; i < 5000; i++) {
            double lat = -12.3 + 16 * (rnd.nextDouble() - 0.5);
            double lon = 45.6 + 16 * (rnd.nextDouble() - 0.5);
            double h = -1e4 + 1e5 * rnd.nextDouble();
            GeodeticPosition g = f.toGeodetic(f.toEnu(GeodeticPosition.of(lat, lon, h)));
            double bound = 8 * Math.ulp(W.semiMajorAxis());
            assertThat(Math.abs(g.latitude() - lat) * Math.PI / 180 * W.meridianRadius(lat)).isLessThanOrEqualTo(bound);
            assertThat(Math.abs(g.longitude() - lon) * Math.PI / 180 * W.primeVerticalRadius(lat)).isLessThanOrEqualTo(bound);
            assertThat(Math.abs(g.height() - h)).isLessThanOrEqualTo(bound);
        }
    }
}
