package io.geotick.cli.coord;

/**
 * One value of a converted point, with its axis (key, label, unit).
 *
 * @param axis the axis the value belongs to
 * @param value the value, full double precision; never NaN or infinite
 */
public record OutputField(Axis axis, double value) {
    public OutputField {
        if (!Double.isFinite(value)) {
            // The geodesy module never returns non-finite values; reaching here is a bug, not bad input.
            throw new IllegalStateException(axis.label() + " came out as " + value);
        }
        value = value + 0.0; // -0.0 becomes 0.0, so neither writer prints a negative zero
    }
}
