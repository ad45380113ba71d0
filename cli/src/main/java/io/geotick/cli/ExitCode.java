package io.geotick.cli;

/**
 * The process exit codes of {@code geotick}, one per failure family, so a pipeline can tell them apart.
 */
public final class ExitCode {
    /** Success. */
    public static final int OK = 0;
    /** An unexpected internal failure: a bug in geotick. The message asks for a report. */
    public static final int INTERNAL = 1;
    /** Bad usage or bad input: an unknown option, a malformed or out-of-range value. */
    public static final int USAGE = 2;
    /** A file could not be read or written. */
    public static final int IO = 3;
    /** A data file (leap-second list, grid, model) was read but is invalid: bad hash, corrupt layout. */
    public static final int DATA = 4;
    /** A batch ran to the end but some rows were reported as error rows. */
    public static final int PARTIAL = 5;

    private ExitCode() {
    }
}
