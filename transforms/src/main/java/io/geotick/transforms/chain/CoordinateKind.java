package io.geotick.transforms.chain;

/** How a position is written. */
public enum CoordinateKind {
    /** Earth-centred Cartesian (x, y, z), metres. */
    ECEF,
    /** Geodetic (latitude °, longitude °, height m) on the frame's ellipsoid. */
    GEODETIC,
    /**
     * A map grid: easting, northing (m) of a map projection on the frame's ellipsoid, and the ellipsoidal
     * height (m), passed through ({@link CoordinateSystem#projected}).
     */
    PROJECTED,
    /**
     * A site grid fitted to control points: the fitted model applied to the values of its base system
     * ({@link CoordinateSystem#site}); site x, y and the base's third value (2D models) or site x, y, z
     * (3D Helmert), metres.
     */
    SITE
}
