package io.geotick.geodesy;

/**
 * A matrix given as a covariance is not one: not 3×3, not finite, not symmetric, or not positive
 * semi-definite. The message names the offending entry or eigenvalue.
 */
public class InvalidCovarianceException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    public InvalidCovarianceException(String message) {
        super(message);
    }
}
