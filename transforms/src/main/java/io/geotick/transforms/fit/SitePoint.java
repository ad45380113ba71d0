package io.geotick.transforms.fit;

/**
 * Three Cartesian coordinates in metres (x, y, z): a source or a site-grid position. For the 2D models
 * z is a height carried through unchanged.
 */
public record SitePoint(double x, double y, double z) {

    public SitePoint {
        check("x", x);
        check("y", y);
        check("z", z);
    }

    /** A point from its three coordinates. */
    public static SitePoint of(double x, double y, double z) {
        return new SitePoint(x, y, z);
    }

    /** A 2D point (z = 0). */
    public static SitePoint of(double x, double y) {
        return new SitePoint(x, y, 0);
    }

    static void check(String name, double v) {
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException("coordinate " + name + " = " + v + " is not a finite number");
        }
    }
}
