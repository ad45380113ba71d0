package io.geotick.cli.coord;

import io.geotick.geodesy.position.EcefPosition;

/**
 * One step of a {@link Conversion} between the source's and the target's ECEF positions.
 *
 * <p>FRAME PLUG-IN POINT: today a conversion has no steps (source and target share one ellipsoid and
 * one frame). A datum frame change ({@code SYS@FRAME} to {@code SYS@OTHER} at {@code --epoch}) becomes a
 * Helmert step here, and a grid shift a step that goes through geodetic coordinates internally;
 * {@code --explain} will print each step's {@link #description()} with its stated accuracy.
 */
interface EcefStep {
    /** The position after this step. */
    EcefPosition apply(EcefPosition p);

    /** One line saying what the step does, its source and its accuracy. */
    String description();
}
