package io.geotick.transforms.fit;

/**
 * A site-model JSON file is not valid: not JSON, an unknown format or format version, a missing or
 * mistyped field, or values that do not make a usable transform. The message names the file (when read
 * from one) and the field. The CLI maps it to its data-file exit code.
 */
public class SiteModelFormatException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public SiteModelFormatException(String message) {
        super(message);
    }

    public SiteModelFormatException(String message, Throwable cause) {
        super(message, cause);
    }
}
