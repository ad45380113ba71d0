package io.geotick.benchmarks.geodesy;

import io.geotick.geodesy.ecef.EcefConverter;
import io.geotick.geodesy.ellipsoid.Ellipsoids;
import java.util.Random;

/**
 * The input points shared by the geodesy benchmarks: {@link #COUNT} random positions on WGS 84 (latitude
 * uniform on the sphere, longitude uniform, height uniform in the chosen band), generated from a fixed seed
 * so that every run and both libraries see the same points. Invented data for measurement only.
 */
final class EcefPoints {
    /** Points per array operation; a power of two so that single-point benchmarks can cycle with a mask. */
    static final int COUNT = 1024;

    /** Geodetic input, interleaved (φ°, λ°, h m). */
    final double[] geodeticDegrees = new double[3 * COUNT];
    /** The same points as the reference library takes them, interleaved (λ rad, φ rad, h m). */
    final double[] geodeticRadiansLonLat = new double[3 * COUNT];
    /** The same points in ECEF, interleaved (x, y, z) m. */
    final double[] ecef = new double[3 * COUNT];

    /**
     * @param heights {@code surface}: −100 m to 10 km (survey, mapping and vehicle data);
     *     {@code orbit}: 200 km to 40,000 km (satellite positions)
     */
    EcefPoints(String heights) {
        double hmin;
        double hmax;
        switch (heights) {
            case "surface":
                hmin = -100;
                hmax = 10_000;
                break;
            case "orbit":
                hmin = 200e3;
                hmax = 40_000e3;
                break;
            default:
                throw new IllegalArgumentException("heights must be surface or orbit, not " + heights);
        }
        Random random = new Random(20240601L);
        for (int i = 0; i < COUNT; i++) {
            double lat = Math.toDegrees(Math.asin(2 * random.nextDouble() - 1));
            double lon = 360 * random.nextDouble() - 180;
            double h = hmin + (hmax - hmin) * random.nextDouble();
            geodeticDegrees[3 * i] = lat;
            geodeticDegrees[3 * i + 1] = lon;
            geodeticDegrees[3 * i + 2] = h;
            geodeticRadiansLonLat[3 * i] = Math.toRadians(lon);
            geodeticRadiansLonLat[3 * i + 1] = Math.toRadians(lat);
            geodeticRadiansLonLat[3 * i + 2] = h;
        }
        EcefConverter.of(Ellipsoids.WGS84).toEcef(geodeticDegrees, 0, ecef, 0, COUNT);
    }
}
