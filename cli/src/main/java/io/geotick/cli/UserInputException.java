package io.geotick.cli;

/**
 * Bad input detected by the command-line layer itself (a value that does not parse, a missing argument).
 * Mapped to {@link ExitCode#USAGE}; the message is shown to the user as it is, so it names the bad value.
 */
public final class UserInputException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    public UserInputException(String message) {
        super(message);
    }

    public UserInputException(String message, Throwable cause) {
        super(message, cause);
    }
}
