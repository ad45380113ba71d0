package io.geotick.transforms.grid;

/**
 * A grid file (NTv2, ISG) is corrupt, truncated or of an unsupported variant. The message names the
 * file, the record or line, and what is wrong with it.
 */
public class GridFormatException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public GridFormatException(String message) {
        super(message);
    }

    public GridFormatException(String message, Throwable cause) {
        super(message, cause);
    }
}
