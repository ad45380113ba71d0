package io.geotick.cli.coord;

import io.geotick.geodesy.position.EcefPosition;
import java.util.List;

/**
 * One step of a {@link Conversion} between the source's and the target's ECEF positions: a change of
 * reference frame (the registry's path at the coordinate epoch, or the user's own Helmert parameters),
 * later perhaps a grid shift that goes through geodetic coordinates internally. {@code --explain} lists
 * its {@link #steps()}.
 */
interface EcefStep {
    /** The position after this step. */
    EcefPosition apply(EcefPosition p);

    /** What the step does, as one or more listed steps with their sources and accuracies. */
    List<ExplainedStep> steps();
}
