package io.geotick.transforms.helmert;

import io.geotick.geodesy.position.EcefPosition;

/**
 * A transformation of Earth-centred Cartesian coordinates (metres) from one frame to another.
 * Implementations are immutable and thread-safe.
 */
public interface GeocentricTransform {

    /** Transforms one position. */
    EcefPosition apply(EcefPosition source);

    /**
     * Transforms {@code count} interleaved (x, y, z) triples from {@code in} (starting at {@code inOffset})
     * into {@code out} (from {@code outOffset}). In-place use (same array and offset) is allowed.
     * Allocates nothing.
     *
     * @throws io.geotick.geodesy.InvalidCoordinateException on the first non-finite coordinate, naming its
     *     point index; earlier points are written, later ones untouched
     */
    void apply(double[] in, int inOffset, double[] out, int outOffset, int count);

    /** The exact inverse transformation (to rounding). */
    GeocentricTransform inverse();

    /** A one-line description: method, EPSG method code, rotation form. */
    String description();
}
