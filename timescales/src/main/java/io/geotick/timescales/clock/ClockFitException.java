package io.geotick.timescales.clock;

/** The readings cannot support the requested clock model (too few pairs, all at one instant, singular). */
public class ClockFitException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    public ClockFitException(String message) {
        super(message);
    }

    public ClockFitException(String message, Throwable cause) {
        super(message, cause);
    }
}
