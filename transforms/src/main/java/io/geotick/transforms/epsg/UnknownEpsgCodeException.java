package io.geotick.transforms.epsg;

/** An EPSG code (or code text) that names no system Proj4J's EPSG definitions know. */
public class UnknownEpsgCodeException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    public UnknownEpsgCodeException(String message) {
        super(message);
    }
}
