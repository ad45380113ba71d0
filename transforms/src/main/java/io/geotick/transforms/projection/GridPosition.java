package io.geotick.transforms.projection;

/**
 * A point on a map grid with the projection's local properties there.
 *
 * <p>Convergence γ follows the common convention (e.g. IOGP Guidance Note 7-2, Snyder 1987): the angle
 * from true north to grid north, clockwise positive; so on a Transverse Mercator grid γ ≈ Δλ·sin φ is
 * positive east of the central meridian in the northern hemisphere. A grid bearing is the true bearing
 * (azimuth) minus γ.
 *
 * @param easting E, in the grid's unit (metres for every projection here)
 * @param northing N, same unit
 * @param scale point scale factor k (grid distance / ellipsoid distance for an infinitesimal line);
 *     for a non-conformal projection the projection's Javadoc says which direction it refers to
 * @param convergence meridian convergence γ, degrees
 */
public record GridPosition(double easting, double northing, double scale, double convergence) {

    public GridPosition {
        check("easting", easting);
        check("northing", northing);
        check("scale", scale);
        check("convergence", convergence);
    }

    private static void check(String what, double v) {
        if (!Double.isFinite(v)) {
            throw new ProjectionDomainException(what + " " + v + " is not a finite number");
        }
    }
}
