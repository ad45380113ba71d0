package io.geotick.cli.demo;

import io.geotick.cli.Cautions;
import io.geotick.cli.ExitCode;
import java.io.PrintWriter;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/**
 * {@code geotick demo}: runs the built-in invented scenario and prints a short report, one section per
 * {@link DemoPart}, then the cautions.
 */
@Command(name = "demo", mixinStandardHelpOptions = true,
    description = "Run the built-in demo: an invented scenario that exercises each module and prints a short report.")
public final class DemoCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    /**
     * DEMO PARTS, in the order they run. Each module's part is added here (the time part joins on merge).
     */
    static List<DemoPart> parts() {
        return List.of(
            new GeodesyDemo());
    }

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        out.println("geotick demo");
        out.println("Invented scenario: a survey crew at Port Quillan, a fictional harbour, checks a new");
        out.println("rover receiver against the harbour's base station. Every name, position and number");
        out.println("below is made up for this demonstration.");
        List<DemoPart> parts = parts();
        for (int i = 0; i < parts.size(); i++) {
            out.println();
            String heading = "Part " + (i + 1) + ": " + parts.get(i).title();
            out.println(heading);
            out.println("-".repeat(heading.length()));
            parts.get(i).run(out);
        }
        out.println();
        out.printf(Cautions.TEXT);
        out.flush();
        return ExitCode.OK;
    }
}
