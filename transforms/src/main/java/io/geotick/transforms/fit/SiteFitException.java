package io.geotick.transforms.fit;

/**
 * A control-point fit cannot be made: too few points (the message names the count needed and given),
 * duplicate or blank point ids, non-finite coordinates, degenerate geometry (coincident or collinear
 * control points, singular fitted matrix), or an iteration that does not converge.
 */
public class SiteFitException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    public SiteFitException(String message) {
        super(message);
    }

    public SiteFitException(String message, Throwable cause) {
        super(message, cause);
    }
}
