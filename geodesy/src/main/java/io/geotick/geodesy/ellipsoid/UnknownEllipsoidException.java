package io.geotick.geodesy.ellipsoid;

/** No ellipsoid of the given name is in the catalogue. The message names the value and the known names. */
public final class UnknownEllipsoidException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    public UnknownEllipsoidException(String message) {
        super(message);
    }
}
