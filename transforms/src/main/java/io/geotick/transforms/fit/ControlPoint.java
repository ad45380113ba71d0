package io.geotick.transforms.fit;

import java.util.Objects;

/**
 * One control point: its id and its coordinates in the source system and in the site grid (target).
 * For the 2D models only x and y are used.
 *
 * @param id a non-blank identifier, unique within a fit (it names the point in residuals and errors)
 * @param source coordinates in the source system, metres
 * @param target coordinates in the site grid, metres
 */
public record ControlPoint(String id, SitePoint source, SitePoint target) {

    public ControlPoint {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(target, "target");
        if (id.isBlank()) {
            throw new SiteFitException("control point id is blank");
        }
    }

    /** A 2D pair: source (sx, sy) ↔ site grid (tx, ty). */
    public static ControlPoint of(String id, double sx, double sy, double tx, double ty) {
        return new ControlPoint(id, point(id, "source", sx, sy, 0), point(id, "target", tx, ty, 0));
    }

    /** A 3D pair: source (sx, sy, sz) ↔ site grid (tx, ty, tz). */
    public static ControlPoint of(String id, double sx, double sy, double sz, double tx, double ty, double tz) {
        return new ControlPoint(id, point(id, "source", sx, sy, sz), point(id, "target", tx, ty, tz));
    }

    private static SitePoint point(String id, String side, double x, double y, double z) {
        try {
            return SitePoint.of(x, y, z);
        } catch (IllegalArgumentException e) {
            throw new SiteFitException("control point '" + id + "': " + side + " " + e.getMessage(), e);
        }
    }
}
