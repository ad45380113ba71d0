package io.geotick.transforms;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * What one step of a conversion does, for listings ({@code --explain}) and audits: its name, method with
 * EPSG codes, parameters with units, source, expected accuracy and cautions. Immutable.
 *
 * @param name short title, e.g. "ITRF2020 → ITRF2014"
 * @param method method name, e.g. "Time-dependent Position Vector transformation"
 * @param epsgMethod EPSG method code, if the method has one
 * @param epsgTransformation EPSG transformation code of the parameter set, if it has one
 * @param parameters the parameters as evaluated for this conversion (e.g. at the coordinate epoch)
 * @param source where the method and parameters come from
 * @param accuracyMetres the published or stated accuracy of the step in metres (0 for exact conversions,
 *     whose error is rounding only)
 * @param cautions approximations a user should know about, each with its size
 */
public record StepDescription(String name, String method, OptionalInt epsgMethod, OptionalInt epsgTransformation,
        List<Parameter> parameters, String source, double accuracyMetres, List<String> cautions) {

    public StepDescription {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(method, "method");
        Objects.requireNonNull(epsgMethod, "epsgMethod");
        Objects.requireNonNull(epsgTransformation, "epsgTransformation");
        parameters = List.copyOf(parameters);
        Objects.requireNonNull(source, "source");
        if (!(accuracyMetres >= 0) || Double.isInfinite(accuracyMetres)) {
            throw new IllegalArgumentException("accuracy must be finite and >= 0, got " + accuracyMetres);
        }
        cautions = List.copyOf(cautions);
    }

    /** One named parameter value with its unit, e.g. ("rz", 0.554, "arc-second"). */
    public record Parameter(String name, double value, String unit) {
        public Parameter {
            Objects.requireNonNull(name, "name");
            Objects.requireNonNull(unit, "unit");
        }

        @Override
        public String toString() {
            return name + " = " + value + (unit.isEmpty() ? "" : " " + unit);
        }
    }

    /** The parameter of that name, if present. */
    public Optional<Parameter> parameter(String parameterName) {
        return parameters.stream().filter(p -> p.name().equals(parameterName)).findFirst();
    }

    /** A multi-line human-readable listing. */
    public String toText() {
        StringBuilder s = new StringBuilder(name).append(": ").append(method);
        epsgMethod.ifPresent(c -> s.append(" (EPSG method ").append(c).append(')'));
        s.append('\n');
        epsgTransformation.ifPresent(c -> s.append("  EPSG transformation ").append(c).append('\n'));
        for (Parameter p : parameters) {
            s.append("  ").append(p).append('\n');
        }
        s.append("  source: ").append(source).append('\n');
        s.append("  accuracy: ").append(accuracyMetres == 0 ? "exact (rounding only)" : accuracyMetres + " m")
            .append('\n');
        for (String c : cautions) {
            s.append("  caution: ").append(c).append('\n');
        }
        return s.toString();
    }
}
