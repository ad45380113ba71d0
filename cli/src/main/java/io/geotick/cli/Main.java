package io.geotick.cli;

import java.io.IOException;
import java.io.OutputStreamWriter;
import java.nio.charset.StandardCharsets;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.util.List;
import picocli.CommandLine;
import picocli.CommandLine.ParameterException;

/**
 * Entry point of the geotick command-line tool.
 *
 * <p>Every failure becomes one line on standard error and a distinct {@link ExitCode}; a stack trace is
 * printed only when the environment variable {@code GEOTICK_DEBUG} is set.
 */
public final class Main {
    private Main() {
    }

    public static void main(String[] args) {
        // UTF-8 whatever the platform default, so degree signs and arrows in messages survive.
        PrintWriter out = new PrintWriter(new OutputStreamWriter(System.out, StandardCharsets.UTF_8), true);
        PrintWriter err = new PrintWriter(new OutputStreamWriter(System.err, StandardCharsets.UTF_8), true);
        int code = run(args, out, err);
        out.flush();
        err.flush();
        System.exit(code);
    }

    /** Runs geotick with the given arguments and streams; returns the exit code. Used by the tests. */
    public static int run(String[] args, PrintWriter out, PrintWriter err) {
        CommandLine cl = commandLine();
        cl.setOut(out);
        cl.setErr(err);
        return cl.execute(args);
    }

    /** The configured picocli command line with geotick's error handling. */
    public static CommandLine commandLine() {
        CommandLine cl = new CommandLine(new GeotickCommand());
        // Negative numbers such as -33.9 are values, not options.
        cl.setUnmatchedOptionsAllowedAsOptionParameters(false);
        cl.setParameterExceptionHandler((ex, args) -> {
            PrintWriter err = ex.getCommandLine().getErr();
            err.println("geotick: " + ex.getMessage());
            if (!(ex instanceof CommandLine.UnmatchedArgumentException)
                || !CommandLine.UnmatchedArgumentException.printSuggestions(ex, err)) {
                err.println("Try '" + ex.getCommandLine().getCommandSpec().qualifiedName() + " --help'.");
            }
            return ExitCode.USAGE;
        });
        cl.setExecutionExceptionHandler((ex, commandLine, parseResult) -> {
            PrintWriter err = commandLine.getErr();
            int code = exitCodeFor(ex);
            String msg = ex.getMessage() == null ? ex.getClass().getSimpleName() : ex.getMessage();
            if (code == ExitCode.INTERNAL) {
                err.println("geotick: internal error (please report): " + ex);
            } else {
                err.println("geotick: " + msg);
            }
            if (System.getenv("GEOTICK_DEBUG") != null) {
                ex.printStackTrace(err);
            }
            err.flush();
            return code;
        });
        return cl;
    }

    /**
     * Maps a failure to its exit code. Library exceptions for bad input extend
     * {@link IllegalArgumentException}; each module's exception for an invalid data file is listed in
     * {@link #DATA_FILE_FAILURES} (checked first, since some of them are also argument failures).
     */
    static int exitCodeFor(Throwable ex) {
        if (ex instanceof ParameterException) {
            return ExitCode.USAGE;
        }
        for (Class<? extends Throwable> c : DATA_FILE_FAILURES) {
            if (c.isInstance(ex)) {
                return ExitCode.DATA;
            }
        }
        if (ex instanceof IllegalArgumentException) {
            return ExitCode.USAGE;
        }
        if (ex instanceof IOException || ex instanceof UncheckedIOException) {
            return ExitCode.IO;
        }
        return ExitCode.INTERNAL;
    }

    /** Exception types meaning "a data file was read but is invalid"; modules add theirs here. */
    private static final List<Class<? extends Throwable>> DATA_FILE_FAILURES = List.of(
        DataFileException.class,
        io.geotick.timescales.leap.LeapListException.class,
        io.geotick.transforms.grid.GridFormatException.class,
        io.geotick.transforms.fit.SiteModelFormatException.class);
}
