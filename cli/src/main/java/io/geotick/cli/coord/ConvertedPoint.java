package io.geotick.cli.coord;

import io.geotick.transforms.Epoch;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * The result of {@code geotick coord}: what both the text and the JSON writers render
 * ({@link TextOutput}, {@link JsonOutput}), so the two never disagree.
 *
 * @param source the source system
 * @param system the target system
 * @param ellipsoid the name of the ellipsoid of the target values (the target frame's, or {@code --ellipsoid})
 * @param epoch the coordinate epoch, if one was given
 * @param values the target values in axis order
 * @param steps every step of the conversion, in order (for {@code --explain})
 * @param accuracyMetres the combined accuracy of the steps (root-sum-square), empty if one is not stated
 * @param warnings cautions of the published parameter sets used (e.g. WGS 84 taken as an ITRF), each with
 *     its size; empty when there are none
 * @param zone the UTM zone ("31N") or UPS pole ("N") of a UTM/UPS target; empty otherwise
 */
public record ConvertedPoint(CoordinateSystemSpec source, CoordinateSystemSpec system, String ellipsoid,
        Optional<Epoch> epoch, List<OutputField> values, List<ExplainedStep> steps, OptionalDouble accuracyMetres,
        List<String> warnings, Optional<String> zone) {
    public ConvertedPoint {
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(system, "system");
        Objects.requireNonNull(ellipsoid, "ellipsoid");
        Objects.requireNonNull(epoch, "epoch");
        values = List.copyOf(values);
        steps = List.copyOf(steps);
        Objects.requireNonNull(accuracyMetres, "accuracyMetres");
        warnings = List.copyOf(warnings);
        Objects.requireNonNull(zone, "zone");
    }

    /** A point without a zone. */
    public ConvertedPoint(CoordinateSystemSpec source, CoordinateSystemSpec system, String ellipsoid,
            Optional<Epoch> epoch, List<OutputField> values, List<ExplainedStep> steps, OptionalDouble accuracyMetres,
            List<String> warnings) {
        this(source, system, ellipsoid, epoch, values, steps, accuracyMetres, warnings, Optional.empty());
    }

    /** A point of a purely geometric conversion (no epoch, no steps listed, no warnings); source = target. */
    public ConvertedPoint(CoordinateSystemSpec system, String ellipsoid, List<OutputField> values) {
        this(system, system, ellipsoid, Optional.empty(), values, List.of(), OptionalDouble.of(0), List.of());
    }
}
