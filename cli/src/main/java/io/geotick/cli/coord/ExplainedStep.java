package io.geotick.cli.coord;

import io.geotick.transforms.StepDescription;
import java.util.Objects;
import java.util.OptionalDouble;

/**
 * One step of a conversion as {@code --explain} lists it: the library's description, and its accuracy,
 * which is empty when nobody stated one (a user's own {@code --helmert} parameters without
 * {@code --helmert-accuracy}). An empty accuracy is shown as "not stated", never as "exact".
 *
 * @param step what the step does (name, method with EPSG codes, parameters with units, source, cautions)
 * @param accuracyMetres the stated accuracy in metres (0 for exact conversions), or empty if not stated
 */
public record ExplainedStep(StepDescription step, OptionalDouble accuracyMetres) {
    public ExplainedStep {
        Objects.requireNonNull(step, "step");
        Objects.requireNonNull(accuracyMetres, "accuracyMetres");
    }

    /** A step with the accuracy its description states. */
    public static ExplainedStep of(StepDescription d) {
        return new ExplainedStep(d, OptionalDouble.of(d.accuracyMetres()));
    }

    /**
     * The root-sum-square of the steps' accuracies (as {@code ConversionChain.accuracyMetres} combines
     * them), or empty if any step's accuracy is not stated.
     */
    public static OptionalDouble total(Iterable<ExplainedStep> steps) {
        double s = 0;
        for (ExplainedStep e : steps) {
            if (e.accuracyMetres().isEmpty()) {
                return OptionalDouble.empty();
            }
            double a = e.accuracyMetres().getAsDouble();
            s += a * a;
        }
        return OptionalDouble.of(Math.sqrt(s));
    }
}
