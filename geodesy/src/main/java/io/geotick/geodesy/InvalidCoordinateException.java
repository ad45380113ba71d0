package io.geotick.geodesy;

/**
 * A coordinate value is outside its domain or does not parse: a latitude beyond ±90°, NaN, an infinity,
 * junk text, or a point where the requested conversion is undefined. The message names the value.
 */
public class InvalidCoordinateException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    public InvalidCoordinateException(String message) {
        super(message);
    }
}
