package io.geotick.cli;

/**
 * A data file was read but its content is invalid. Mapped to {@link ExitCode#DATA}.
 * Library exceptions of the same family are mapped by {@link Main#exitCodeFor(Throwable)}.
 */
public final class DataFileException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public DataFileException(String message, Throwable cause) {
        super(message, cause);
    }
}
