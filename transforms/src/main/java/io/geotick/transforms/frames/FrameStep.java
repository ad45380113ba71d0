package io.geotick.transforms.frames;

import io.geotick.transforms.StepDescription;
import io.geotick.transforms.helmert.GeocentricTransform;
import java.util.Objects;

/**
 * One link of a frame path, evaluated in one direction at one coordinate epoch: an ECEF → ECEF
 * transformation with its description. Immutable.
 *
 * @param from source frame
 * @param to target frame
 * @param transform the evaluated transformation
 * @param description method, parameters as evaluated, source, accuracy, cautions
 */
public record FrameStep(Frame from, Frame to, GeocentricTransform transform, StepDescription description) {
    public FrameStep {
        Objects.requireNonNull(from, "from");
        Objects.requireNonNull(to, "to");
        Objects.requireNonNull(transform, "transform");
        Objects.requireNonNull(description, "description");
    }
}
