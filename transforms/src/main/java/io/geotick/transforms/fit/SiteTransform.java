package io.geotick.transforms.fit;

/**
 * A transform between a source system and a site grid, fitted to control points (or the inverse of
 * one). Immutable and thread-safe: one instance may be shared by any number of threads.
 *
 * <p>Every transform here has the centred form p' = c' + L·(p − c): c the centroid of the input
 * control points, c' the fitted position of that centroid in the output, L a 2×2 (2D models; z passes
 * through unchanged) or 3×3 matrix. Differences from the centroid are small numbers, so the products
 * round at the level of one ulp of the coordinates.
 */
public interface SiteTransform {

    /** The model kind. */
    SiteModelKind kind();

    /**
     * Transforms a 2D point; the result has z = 0.
     *
     * @throws IllegalArgumentException for a non-finite coordinate, or for a 3D Helmert (it needs z)
     */
    SitePoint apply(double x, double y);

    /**
     * Transforms a point; the 2D models carry z through unchanged.
     *
     * @throws IllegalArgumentException for a non-finite coordinate
     */
    SitePoint apply(double x, double y, double z);

    /**
     * Transforms {@code count} interleaved (x, y, z) triples from {@code in} (from {@code inOffset}) into
     * {@code out} (from {@code outOffset}); the same array and offset may be given for in-place use. The
     * 2D models carry z through. Allocates nothing.
     *
     * @throws IllegalArgumentException on the first non-finite coordinate, naming its point index; earlier
     *     points are written, later ones untouched
     */
    void apply(double[] in, int inOffset, double[] out, int outOffset, int count);

    /** The inverse transform, exact to rounding (the fitted matrix is checked to be invertible). */
    SiteTransform inverse();

    /** A one-line description. */
    String description();
}
