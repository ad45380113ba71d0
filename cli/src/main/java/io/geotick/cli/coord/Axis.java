package io.geotick.cli.coord;

/**
 * One value of a coordinate system: its JSON key, its text label and its unit.
 *
 * @param key the JSON field name ("lat", "x", "az" …)
 * @param label the word used in text output and in error messages ("latitude", "x", "azimuth" …)
 * @param unit the unit of the value
 * @param fullCircle whether the axis is an angle in [0°, 360°) (azimuth), where text rounding up to
 *     360 must wrap to 0
 */
public record Axis(String key, String label, Unit unit, boolean fullCircle) {
    /** An axis that is not a full-circle angle. */
    public Axis(String key, String label, Unit unit) {
        this(key, label, unit, false);
    }

    /** The value as text output shows it (see {@link Unit#formatText}). */
    public String formatText(double value) {
        String s = unit.formatText(value);
        if (fullCircle && s.startsWith("360.")) {
            // 359.999999999996° rounds to "360.00000000000"; the same direction reads 0 in [0°, 360°).
            s = "0" + s.substring(3);
        }
        return s;
    }

    /** Parses the text typed for this axis, naming the axis (with the given prefix) in any error. */
    double parse(String prefix, String text) {
        String name = prefix.isEmpty() ? label : prefix + label;
        return unit == Unit.DEGREE ? NumberArgs.angle(name, text) : NumberArgs.length(name, text);
    }
}
