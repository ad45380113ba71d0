package io.geotick.transforms.projection;

import io.geotick.geodesy.ellipsoid.Ellipsoid;
import io.geotick.geodesy.position.GeodeticPosition;

/**
 * A map projection on an ellipsoid: geodetic latitude/longitude (degrees) ↔ grid easting/northing.
 * Implementations are immutable and thread-safe.
 *
 * <p>Heights pass through unchanged: {@link #project(GeodeticPosition)} ignores h, and
 * {@link #unproject(double, double)} returns h = 0. Longitudes may be given in [−360°, 360°]; they are
 * reduced to within 180° of the central meridian, and unprojected longitudes come back in (−180°, 180°].
 *
 * <p>The array variants work on interleaved {@code double[]} pairs and allocate nothing per point; they
 * compute coordinates only (no scale or convergence) and may work in place ({@code src == dst},
 * same offset). A point outside the domain stops the call with a {@link ProjectionDomainException} naming
 * its index; earlier points are already written.
 */
public interface MapProjection {

    /** A short description, e.g. {@code "UTM zone 31N (WGS 84)"}. */
    String name();

    /** The ellipsoid the projection is defined on. */
    Ellipsoid ellipsoid();

    /**
     * Projects latitude φ and longitude λ (degrees) to the grid, with point scale and convergence.
     *
     * @throws ProjectionDomainException if the point is outside the projection's domain or not a number
     */
    GridPosition project(double latitude, double longitude);

    /** Projects a geodetic position (its height is not used). */
    default GridPosition project(GeodeticPosition position) {
        return project(position.latitude(), position.longitude());
    }

    /**
     * The geodetic position (h = 0) of a grid point.
     *
     * @throws ProjectionDomainException if the grid point maps to no point of the domain
     */
    GeodeticPosition unproject(double easting, double northing);

    /** The geodetic position (h = 0) of a grid point; its scale and convergence are not used. */
    default GeodeticPosition unproject(GridPosition position) {
        return unproject(position.easting(), position.northing());
    }

    /**
     * Projects {@code count} points: reads (latitude, longitude) pairs from {@code src} starting at
     * {@code srcOff} and writes (easting, northing) pairs to {@code dst} starting at {@code dstOff}.
     */
    void project(double[] src, int srcOff, double[] dst, int dstOff, int count);

    /**
     * Unprojects {@code count} points: reads (easting, northing) pairs from {@code src} and writes
     * (latitude, longitude) pairs to {@code dst}.
     */
    void unproject(double[] src, int srcOff, double[] dst, int dstOff, int count);
}
