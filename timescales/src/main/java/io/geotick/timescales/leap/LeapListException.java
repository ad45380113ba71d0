package io.geotick.timescales.leap;

/**
 * A leap-second list was read but is invalid: a malformed line, a bad or missing SHA-1 hash, a missing
 * expiry, entries out of order. The message names the line (number and text) where one is concerned.
 */
public class LeapListException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    private final int line;

    public LeapListException(String message, int line) {
        super(message);
        this.line = line;
    }

    /** The 1-based line number concerned, or 0 when the failure concerns the whole file. */
    public int line() {
        return line;
    }
}
