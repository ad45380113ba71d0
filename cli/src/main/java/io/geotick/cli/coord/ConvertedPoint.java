package io.geotick.cli.coord;

import java.util.List;
import java.util.Objects;

/**
 * The result of {@code geotick coord}: what both the text and the JSON writers render
 * ({@link TextOutput}, {@link JsonOutput}), so the two never disagree.
 *
 * <p>Room to grow: the steps of the conversion (for {@code --explain}) and their accuracies join here.
 *
 * @param system the target system
 * @param ellipsoid the name of the ellipsoid the conversion used
 * @param values the target values in axis order
 */
public record ConvertedPoint(CoordinateSystemSpec system, String ellipsoid, List<OutputField> values) {
    public ConvertedPoint {
        Objects.requireNonNull(system, "system");
        Objects.requireNonNull(ellipsoid, "ellipsoid");
        values = List.copyOf(values);
    }
}
