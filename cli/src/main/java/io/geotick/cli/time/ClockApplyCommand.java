package io.geotick.cli.time;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.databind.util.RawValue;
import io.geotick.cli.ExitCode;
import io.geotick.cli.Json;
import io.geotick.cli.UserInputException;
import io.geotick.timescales.Conversion;
import io.geotick.timescales.ScaleInstant;
import io.geotick.timescales.TimeConverter;
import io.geotick.timescales.clock.ClockModel;
import io.geotick.timescales.encoding.DecimalSeconds;
import io.geotick.timescales.leap.LeapTables;
import io.geotick.transforms.FileFailure;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code geotick clock apply}: map device timestamps onto the reference scale with a fitted model. */
@Command(name = "apply", mixinStandardHelpOptions = true,
    description = {"Correct device timestamps with a fitted clock model.",
        "",
        "The model is a file written by 'geotick clock fit'. Values are read as",
        "in 'geotick time', on the model's device scale (a bare number is Unix",
        "seconds). With --input, one value per line (blank lines and # comments",
        "skipped); a line that cannot be read becomes an error row and the exit",
        "code is 5."})
public final class ClockApplyCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Option(names = {"-m", "--model"}, paramLabel = "FILE", required = true, description = "The model JSON file.")
    Path model;

    @Option(names = "--input", paramLabel = "FILE", description = "Read device timestamps from FILE.")
    Path input;

    @Option(names = "--json", description = "Print a JSON array, one object per value.")
    boolean json;

    @Mixin
    LeapOptions leap;

    @Parameters(paramLabel = "VALUE", arity = "0..*", description = "Device timestamps.")
    List<String> values = new ArrayList<>();

    @Override
    public Integer call() {
        ClockModel m = ClockModelFile.read(model);
        LeapTables.Selection sel = leap.selection();
        TimeConverter tc = leap.converter(sel.table());
        List<String[]> items = new ArrayList<>(); // {where, value}
        for (String v : values) {
            items.add(new String[] {"", v});
        }
        if (input != null) {
            try {
                List<String> lines = Files.readAllLines(input);
                for (int i = 0; i < lines.size(); i++) {
                    String s = lines.get(i).strip();
                    if (!s.isEmpty() && !s.startsWith("#")) {
                        items.add(new String[] {input + ":" + (i + 1), s});
                    }
                }
            } catch (IOException e) {
                throw new UncheckedIOException("cannot read " + input + ": " + FileFailure.reason(e), e);
            }
        }
        if (items.isEmpty()) {
            throw new UserInputException("no device timestamps: give VALUE arguments or --input FILE");
        }
        TimeValues.Context ctx = new TimeValues.Context(m.deviceScale(), false, 0, TimeCommand.now(tc), true);
        PrintWriter out = spec.commandLine().getOut();
        ArrayNode arr = Json.MAPPER.createArrayNode();
        int errors = 0;
        for (String[] item : items) {
            try {
                Conversion<ScaleInstant> d = TimeValues.parse(item[1], tc, ctx);
                ClockModel.ClockCorrection c = m.apply(d.value().to(m.deviceScale()));
                Conversion<String> refText = tc.formatIso(c.reference());
                List<String> warnings = new ArrayList<>();
                d.warnings().forEach(w -> warnings.add(w.message()));
                refText.warnings().forEach(w -> {
                    if (!warnings.contains(w.message())) {
                        warnings.add(w.message());
                    }
                });
                if (c.extrapolated()) {
                    warnings.add("outside the fitted span " + ClockModelFile.iso(tc, m.firstReading()) + " to "
                        + ClockModelFile.iso(tc, m.lastReading()) + ": extrapolating");
                }
                String corr = DecimalSeconds.ofNanos(c.correctionNanos()).toString();
                if (json) {
                    ObjectNode o = arr.addObject();
                    o.put("device", item[1]);
                    o.put("reference", refText.value());
                    o.putRawValue("correction_s", new RawValue(corr));
                    ClockModelFile.num(o, "sigma_s", c.sigmaSeconds());
                    o.put("extrapolated", c.extrapolated());
                    ArrayNode w = o.putArray("warnings");
                    warnings.forEach(w::add);
                } else {
                    out.printf("%s -> %s  (correction %s s, 1-sigma %s)%n", item[1], refText.value(), corr,
                        c.sigmaSeconds().isPresent() ? String.format(java.util.Locale.ROOT, "%.3e s",
                            c.sigmaSeconds().getAsDouble()) : "unknown");
                    warnings.forEach(w -> out.println("  warning: " + w));
                }
            } catch (IllegalArgumentException e) {
                if (input == null) {
                    throw e;
                }
                errors++;
                String where = item[0];
                if (json) {
                    ObjectNode o = arr.addObject();
                    o.put("device", item[1]);
                    o.put("error", where + ": " + e.getMessage());
                } else {
                    out.println("error: " + where + ": " + e.getMessage());
                }
            }
        }
        if (json) {
            out.println(Json.write(arr));
        }
        out.flush();
        if (errors > 0) {
            spec.commandLine().getErr().println("geotick: " + errors + " of " + items.size()
                + " values could not be corrected");
            spec.commandLine().getErr().flush();
            return ExitCode.PARTIAL;
        }
        return ExitCode.OK;
    }
}
