package io.geotick.transforms;

/**
 * A time-dependent step (a 14-parameter Helmert, a frame aligned by date, a velocity propagation) was
 * asked for without a coordinate epoch. geotick never assumes one: the message names the step.
 */
public class MissingEpochException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    public MissingEpochException(String message) {
        super(message);
    }
}
