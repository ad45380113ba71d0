package io.geotick.transforms.chain;

/** How a position is written. */
public enum CoordinateKind {
    /** Earth-centred Cartesian (x, y, z), metres. */
    ECEF,
    /** Geodetic (latitude °, longitude °, height m) on the frame's ellipsoid. */
    GEODETIC
}
