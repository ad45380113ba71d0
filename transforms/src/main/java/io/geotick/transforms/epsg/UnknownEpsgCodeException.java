package io.geotick.transforms.epsg;

/**
 * An EPSG code (or code text) that names no usable system: not in Proj4J's EPSG definitions, neither
 * projected nor geographic, unreadable by Proj4J (a compound system with a vertical unit), or defined in a
 * unit that cannot be resolved exactly. The message names the code and the reason.
 */
public class UnknownEpsgCodeException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    public UnknownEpsgCodeException(String message) {
        super(message);
    }
}
