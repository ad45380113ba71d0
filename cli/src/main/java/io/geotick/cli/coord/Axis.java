package io.geotick.cli.coord;

/**
 * One value of a coordinate system: its JSON key, its text label and its unit.
 *
 * @param key the JSON field name ("lat", "x", "az" …)
 * @param label the word used in text output and in error messages ("latitude", "x", "azimuth" …)
 * @param unit the unit of the value
 */
public record Axis(String key, String label, Unit unit) {
    /** Parses the text typed for this axis, naming the axis (with the given prefix) in any error. */
    double parse(String prefix, String text) {
        String name = prefix.isEmpty() ? label : prefix + label;
        return unit == Unit.DEGREE ? NumberArgs.angle(name, text) : NumberArgs.length(name, text);
    }
}
