package io.geotick.transforms.epsg;

import io.geotick.geodesy.InvalidCoordinateException;
import io.geotick.geodesy.ellipsoid.Ellipsoid;
import io.geotick.geodesy.position.GeodeticPosition;
import io.geotick.transforms.projection.GridPosition;
import io.geotick.transforms.projection.MapProjection;
import io.geotick.transforms.projection.ProjectionDomainException;
import java.util.Objects;

/**
 * A projection computed in metres, with eastings and northings expressed in another unit (US survey feet,
 * international feet, links …): forward E_unit = E_m / (metres per unit), inverse E_m = E_unit × (metres per
 * unit), each correctly rounded from the unit's exact ratio ({@link LinearUnit}). Point scale and convergence
 * are unitless and degrees and pass through unchanged; so does the height. Immutable and thread-safe when
 * the wrapped projection is.
 *
 * <p>The array variants convert in the destination array and allocate nothing per point; in-place use
 * (same array, same offset) is allowed, as for every {@link MapProjection}.
 */
final class UnitProjection implements MapProjection {
    private final MapProjection metric;
    private final LinearUnit unit;
    private final String name;

    private UnitProjection(MapProjection metric, LinearUnit unit) {
        this.metric = metric;
        this.unit = unit;
        this.name = metric.name() + ", in " + unit.symbol();
    }

    /**
     * The projection with its grid values in the unit: the projection itself for the metre; an already
     * converted projection in the same unit is returned as it is.
     *
     * @throws IllegalArgumentException if it is already converted to another unit
     */
    static MapProjection inUnit(MapProjection p, LinearUnit unit) {
        Objects.requireNonNull(p, "projection");
        Objects.requireNonNull(unit, "unit");
        if (p instanceof UnitProjection) {
            UnitProjection u = (UnitProjection) p;
            if (!u.unit.equals(unit)) {
                throw new IllegalArgumentException(p.name() + " is in " + u.unit.symbol() + ", not " + unit.symbol());
            }
            return p;
        }
        return unit.isMetre() ? p : new UnitProjection(p, unit);
    }

    /** The projection in metres behind {@code p} ({@code p} itself if it computes in metres). */
    static MapProjection metric(MapProjection p) {
        return p instanceof UnitProjection ? ((UnitProjection) p).metric : p;
    }

    @Override
    public String name() {
        return name;
    }

    @Override
    public Ellipsoid ellipsoid() {
        return metric.ellipsoid();
    }

    @Override
    public GridPosition project(double latitude, double longitude) {
        GridPosition g = metric.project(latitude, longitude);
        return new GridPosition(unit.fromMetres(g.easting()), unit.fromMetres(g.northing()), g.scale(),
            g.convergence());
    }

    @Override
    public GeodeticPosition unproject(double easting, double northing) {
        return metric.unproject(toMetres("easting", easting), toMetres("northing", northing));
    }

    private double toMetres(String what, double v) {
        try {
            return unit.toMetres(v);
        } catch (InvalidCoordinateException e) {
            throw new ProjectionDomainException(what + " " + v + " " + unit.symbol() + " is not usable on " + name
                + ": " + e.getMessage());
        }
    }

    @Override
    public void project(double[] src, int srcOff, double[] dst, int dstOff, int count) {
        metric.project(src, srcOff, dst, dstOff, count);
        for (int i = 0; i < 2 * count; i++) {
            // Finite metres always convert (every unit here is longer than 1e-300 m and shorter than 1e300 m).
            dst[dstOff + i] = unit.fromMetres(dst[dstOff + i]);
        }
    }

    @Override
    public void unproject(double[] src, int srcOff, double[] dst, int dstOff, int count) {
        for (int i = 0; i < count; i++) {
            double e = src[srcOff + 2 * i];
            double n = src[srcOff + 2 * i + 1];
            try {
                dst[dstOff + 2 * i] = toMetres("easting", e);
                dst[dstOff + 2 * i + 1] = toMetres("northing", n);
                metric.unproject(dst, dstOff + 2 * i, dst, dstOff + 2 * i, 1);
            } catch (ProjectionDomainException ex) {
                // The one-point call numbers the point 0; say which point it was, with the single-point message.
                String why;
                try {
                    unproject(e, n);
                    why = ex.getMessage();
                } catch (ProjectionDomainException single) {
                    why = single.getMessage();
                }
                throw new ProjectionDomainException("point " + i + ": " + why);
            }
        }
    }

    @Override
    public String toString() {
        return name;
    }
}
