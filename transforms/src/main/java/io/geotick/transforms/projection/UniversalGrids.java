package io.geotick.transforms.projection;

import io.geotick.geodesy.ellipsoid.Ellipsoid;
import io.geotick.geodesy.ellipsoid.Ellipsoids;

/**
 * The UTM/UPS system as a whole: the grid for a point is its UTM zone between 80°S and 84°N
 * ({@link Utm#forPosition}, with the Norway and Svalbard exceptions) and UPS North or South beyond
 * (NGA/DMA TM 8358.2; common practice).
 */
public final class UniversalGrids {
    private UniversalGrids() {
    }

    /** The UTM zone or UPS grid for a point on WGS 84. */
    public static MapProjection forPosition(double latitude, double longitude) {
        return forPosition(latitude, longitude, Ellipsoids.WGS84);
    }

    /** The UTM zone or UPS grid for a point on another ellipsoid. */
    public static MapProjection forPosition(double latitude, double longitude, Ellipsoid ellipsoid) {
        Checks.latitude(latitude);
        Checks.longitude(longitude);
        if (latitude > Utm.MAX_LATITUDE) {
            return Ups.of(Hemisphere.NORTH, ellipsoid);
        }
        if (latitude < Utm.MIN_LATITUDE) {
            return Ups.of(Hemisphere.SOUTH, ellipsoid);
        }
        return Utm.forPosition(latitude, longitude, ellipsoid);
    }
}
