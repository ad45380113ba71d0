package io.geotick.transforms.chain;

import io.geotick.geodesy.InvalidCoordinateException;
import io.geotick.transforms.StepDescription;
import io.geotick.transforms.epsg.ProjectionMethod;
import io.geotick.transforms.projection.MapProjection;
import io.geotick.transforms.projection.ProjectionDomainException;
import java.util.List;
import java.util.Objects;
import java.util.OptionalInt;

/**
 * A map projection on geodetic triples of its frame: (φ°, λ°, h) → (E, N, h) forward, the inverse back;
 * h passes through. Each point goes through the projection's allocation-free array method with a count
 * of one at its own offset, which reads and writes only the first two values of the triple.
 */
final class ProjectionStep implements Op {
    private static final String FIRST_POINT = "point 0: ";

    private final CoordinateSystem.Grid grid;
    private final boolean forward;
    private final StepDescription description;

    ProjectionStep(CoordinateSystem.Grid grid, boolean forward) {
        this.grid = Objects.requireNonNull(grid);
        this.forward = forward;
        ProjectionMethod m = grid.method();
        this.description = new StepDescription(forward ? "geodetic → " + grid.name() : grid.name() + " → geodetic",
            m.method() + (forward ? "" : ", inverse"), m.epsgMethod(), OptionalInt.empty(), m.parameters(),
            m.source(), m.accuracyMetres(), m.cautions());
    }

    @Override
    public void apply(double[] buf, int off, int count) {
        MapProjection p = grid.projection();
        for (int i = 0; i < count; i++) {
            int k = off + 3 * i;
            if (!Double.isFinite(buf[k + 2])) {
                throw new InvalidCoordinateException("point " + i + ": height " + buf[k + 2]
                    + " m is not a finite number");
            }
            try {
                if (forward) {
                    p.project(buf, k, buf, k, 1);
                } else {
                    p.unproject(buf, k, buf, k, 1);
                }
            } catch (ProjectionDomainException e) {
                String msg = e.getMessage() == null ? "" : e.getMessage();
                throw new ProjectionDomainException("point " + i + ": "
                    + (msg.startsWith(FIRST_POINT) ? msg.substring(FIRST_POINT.length()) : msg));
            }
        }
    }

    @Override
    public Op inverse() {
        return new ProjectionStep(grid, !forward);
    }

    @Override
    public StepDescription description() {
        return description;
    }
}
