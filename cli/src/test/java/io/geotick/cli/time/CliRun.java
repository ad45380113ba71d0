package io.geotick.cli.time;

import com.fasterxml.jackson.databind.JsonNode;
import io.geotick.cli.Json;
import io.geotick.cli.Main;
import java.io.PrintWriter;
import java.io.StringWriter;

/** Runs geotick in-process and captures its output. */
record CliRun(int code, String out, String err) {
    static CliRun of(String... args) {
        StringWriter o = new StringWriter();
        StringWriter e = new StringWriter();
        int code = Main.run(args, new PrintWriter(o, true), new PrintWriter(e, true));
        return new CliRun(code, o.toString(), e.toString());
    }

    JsonNode json() {
        try {
            return Json.MAPPER.readTree(out);
        } catch (Exception ex) {
            throw new AssertionError("not JSON: " + out + err, ex);
        }
    }
}
