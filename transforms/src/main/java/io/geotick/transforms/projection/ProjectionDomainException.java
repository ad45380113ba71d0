package io.geotick.transforms.projection;

import io.geotick.geodesy.InvalidCoordinateException;

/**
 * A map-projection input or parameter is outside the domain where the projection is defined or where its
 * stated accuracy holds: a latitude beyond a grid's limits (UTM beyond 80°S/84°N, the opposite pole of
 * a conic), a longitude too far from a central meridian, a UTM zone outside 1–60, a grid coordinate
 * that maps to no point, NaN or an infinity. The message names the value and the limit.
 *
 * <p>It is an {@link InvalidCoordinateException} (and so an {@link IllegalArgumentException}), the
 * geodesy module's family for bad coordinates, so one catch covers both.
 */
public class ProjectionDomainException extends InvalidCoordinateException {
    private static final long serialVersionUID = 1L;

    public ProjectionDomainException(String message) {
        super(message);
    }
}
