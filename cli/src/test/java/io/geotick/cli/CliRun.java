package io.geotick.cli;

import java.io.PrintWriter;
import java.io.StringWriter;

/** Runs {@link Main#run} with string streams and keeps what it printed. */
public record CliRun(int exitCode, String out, String err) {
    public static CliRun of(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code;
        try (PrintWriter o = new PrintWriter(out); PrintWriter e = new PrintWriter(err)) {
            code = Main.run(args, o, e);
        }
        return new CliRun(code, out.toString(), err.toString());
    }
}
