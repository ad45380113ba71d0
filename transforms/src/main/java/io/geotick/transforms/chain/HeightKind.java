package io.geotick.transforms.chain;

/** The height of a geodetic position. */
public enum HeightKind {
    /** Height above the ellipsoid, h. */
    ELLIPSOIDAL,
    /** Height above the geoid, H = h − N, with N from a geoid model given to the chain. */
    ORTHOMETRIC
}
