package io.geotick.cli.coord;

import io.geotick.cli.UserInputException;
import java.util.regex.Pattern;

/**
 * Strict parsing of the numbers a user types on the command line. Every failure is a
 * {@link UserInputException} whose message names the argument and quotes the text, e.g.
 * {@code latitude 'abc' is not a number}.
 *
 * <p>Only plain decimal numbers are accepted: an optional sign, digits with an optional decimal point,
 * and an optional exponent ({@code -33.9}, {@code 6.4e6}). {@link Double#parseDouble} alone would also
 * take {@code NaN}, {@code Infinity}, hexadecimal floats ({@code 0x1p3}), the type suffixes {@code d}/{@code f}
 * and surrounding blanks; each of those is a typing mistake here, not a coordinate, so they are refused
 * before it is called. A number too large for a double (e.g. {@code 1e400}) is refused instead of
 * becoming an infinity.
 */
public final class NumberArgs {
    private static final Pattern DECIMAL = Pattern.compile("[+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d+)?");

    private NumberArgs() {
    }

    /**
     * A decimal number.
     *
     * @param name what the value is, for the message ("latitude", "origin height")
     * @param text the text as typed
     * @throws UserInputException if the text is not a plain, finite decimal number
     */
    public static double decimal(String name, String text) {
        if (text == null || text.isEmpty()) {
            throw new UserInputException(name + " is empty; a number is needed");
        }
        if (!DECIMAL.matcher(text).matches()) {
            throw new UserInputException(name + " '" + text + "' is not a number");
        }
        double v = Double.parseDouble(text);
        if (Double.isInfinite(v)) {
            throw new UserInputException(name + " '" + text + "' is too large");
        }
        return v;
    }

    /**
     * An angle in degrees.
     *
     * <p>DMS PLUG-IN POINT: this is the one place where angle text is read. Today it takes decimal
     * degrees only; when the geodesy module's angle parser (degrees-minutes-seconds with hemisphere
     * letters) lands, call it here and keep the {@link UserInputException} wrapping so the message still
     * names the argument. Range checks (latitude within ±90°) stay with the position types.
     *
     * @param name what the value is, for the message
     * @param text the text as typed
     * @throws UserInputException if the text is not an angle
     */
    public static double angle(String name, String text) {
        return decimal(name, text);
    }

    /**
     * A length in metres (a height, a Cartesian coordinate, a range).
     *
     * @param name what the value is, for the message
     * @param text the text as typed
     * @throws UserInputException if the text is not a plain, finite decimal number
     */
    public static double length(String name, String text) {
        return decimal(name, text);
    }
}
