package io.geotick.timescales;

/**
 * A time value that does not exist or cannot be read: a malformed text, a field out of range
 * (month 13, week &minus;1), a 23:59:60 label on a day without a leap second, a UTC date before 1961,
 * an unknown scale name. The message names the offending value.
 *
 * <p>This is the one exception family for bad time input; it extends {@link IllegalArgumentException}.
 */
public class TimeInputException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    public TimeInputException(String message) {
        super(message);
    }

    public TimeInputException(String message, Throwable cause) {
        super(message, cause);
    }
}
