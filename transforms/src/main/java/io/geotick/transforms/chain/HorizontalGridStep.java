package io.geotick.transforms.chain;

import io.geotick.transforms.StepDescription;
import io.geotick.transforms.grid.Ntv2Grid;
import java.util.List;
import java.util.Objects;
import java.util.OptionalInt;

/** An NTv2 grid shift on geodetic triples (heights unchanged). */
final class HorizontalGridStep implements Op {
    private final Ntv2Grid grid;
    private final boolean forward;
    private final StepDescription description;

    HorizontalGridStep(Ntv2Grid grid, boolean forward) {
        this.grid = Objects.requireNonNull(grid);
        this.forward = forward;
        this.description = new StepDescription(forward ? grid.systemFrom() + " → " + grid.systemTo()
            : grid.systemTo() + " → " + grid.systemFrom(),
            "NTv2 grid shift, bilinear" + (forward ? "" : ", reverse by iteration to < 1e-9°"),
            OptionalInt.of(9615), OptionalInt.empty(), List.of(), "NTv2 file " + grid.name() + " (SYSTEM_F "
                + grid.systemFrom() + ", SYSTEM_T " + grid.systemTo() + ", " + grid.subgridNames().size() + " subgrid"
                + (grid.subgridNames().size() == 1 ? "" : "s") + ")", 0,
            List.of("the accuracy is the grid's own: an NTv2 file states it per node (its accuracy columns), not as"
                + " one figure, so none is listed here; the shift is horizontal only: heights pass unchanged"));
    }

    @Override
    public void apply(double[] buf, int off, int count) {
        if (forward) {
            grid.forward(buf, off, buf, off, count);
        } else {
            grid.inverse(buf, off, buf, off, count);
        }
    }

    @Override
    public Op inverse() {
        return new HorizontalGridStep(grid, !forward);
    }

    @Override
    public StepDescription description() {
        return description;
    }
}
