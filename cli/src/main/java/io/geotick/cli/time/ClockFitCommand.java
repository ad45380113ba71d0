package io.geotick.cli.time;

import com.fasterxml.jackson.databind.MappingIterator;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.dataformat.csv.CsvMapper;
import com.fasterxml.jackson.dataformat.csv.CsvSchema;
import io.geotick.cli.Json;
import io.geotick.cli.UserInputException;
import io.geotick.timescales.ScaleInstant;
import io.geotick.timescales.TimeConverter;
import io.geotick.timescales.TimeScale;
import io.geotick.timescales.clock.ClockFit;
import io.geotick.timescales.clock.ClockFitter;
import io.geotick.timescales.clock.ClockModel;
import io.geotick.timescales.clock.ClockPair;
import io.geotick.timescales.clock.ClockTerms;
import io.geotick.timescales.leap.LeapTables;
import io.geotick.transforms.FileFailure;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code geotick clock fit}: estimate a device-clock model from paired readings in a CSV file. */
@Command(name = "fit", mixinStandardHelpOptions = true,
    description = {"Fit a device-clock model to paired readings by least squares.",
        "",
        "PAIRS is a CSV file whose header names the columns 'device' (what the",
        "device clock showed) and 'reference' (the true time then); other",
        "columns are ignored and lines starting with # are comments. Cells take",
        "the values of 'geotick time' (ISO 8601, unix:, gpss:, ptp:, ...); a bare",
        "number is Unix seconds. The model is written as JSON (--output FILE, or",
        "standard output with --json) for 'geotick clock apply'."})
public final class ClockFitCommand implements Runnable {
    @Spec
    CommandSpec spec;

    @Option(names = "--terms", paramLabel = "TERMS", defaultValue = "drift",
        description = "offset, drift (offset + drift, default) or drift-rate (offset + drift + drift rate).")
    String terms;

    @Option(names = "--device-scale", paramLabel = "SCALE", defaultValue = "utc",
        description = "Scale the device clock claims to keep, for ISO text without a zone (default: utc).")
    String deviceScale;

    @Option(names = "--reference-scale", paramLabel = "SCALE", defaultValue = "utc",
        description = "Scale of the reference readings (default: utc).")
    String referenceScale;

    @Option(names = "--outlier-threshold", paramLabel = "K", defaultValue = "3",
        description = "Flag pairs whose residual exceeds K residual standard deviations (default: 3).")
    double threshold;

    @Option(names = "--exclude-outliers", description = "Refit without the flagged pairs, worst first.")
    boolean exclude;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE", description = "Write the model JSON to FILE.")
    Path output;

    @Option(names = "--json", description = "Print the model JSON instead of the text summary.")
    boolean json;

    @Mixin
    LeapOptions leap;

    @Parameters(index = "0", paramLabel = "PAIRS", description = "CSV file of paired readings.")
    Path pairsFile;

    @Override
    public void run() {
        ClockTerms t = ClockTerms.parse(terms);
        TimeScale dev = TimeScale.parse(deviceScale);
        TimeScale ref = TimeScale.parse(referenceScale);
        LeapTables.Selection sel = leap.selection();
        TimeConverter tc = leap.converter(sel.table());
        Set<String> warnings = new LinkedHashSet<>();
        List<ClockPair> pairs = readPairs(pairsFile, tc, dev, ref, warnings);
        ClockFit fit = ClockFitter.fit(pairs, t, threshold, exclude);
        ObjectNode model = ClockModelFile.toJson(fit, tc);
        var w = model.putArray("warnings");
        warnings.forEach(w::add);
        if (output != null) {
            try {
                Files.writeString(output, Json.MAPPER.writerWithDefaultPrettyPrinter().writeValueAsString(model)
                    + System.lineSeparator());
            } catch (IOException e) {
                throw new UncheckedIOException("cannot write clock model " + output + ": " + FileFailure.reason(e), e);
            }
        }
        PrintWriter out = spec.commandLine().getOut();
        if (json) {
            out.println(Json.write(model));
        } else {
            summary(out, fit, tc);
            warnings.forEach(x -> out.println("warning: " + x));
            if (output != null) {
                out.println("model written to " + output);
            }
        }
        out.flush();
    }

    private static void summary(PrintWriter out, ClockFit fit, TimeConverter tc) {
        ClockModel m = fit.model();
        out.printf("%-16s %s (%d of %d pairs used)%n", "model", m.terms().id(), fit.pairsUsed(), fit.pairsRead());
        out.printf("%-16s %s%n", "origin", ClockModelFile.iso(tc, m.origin()));
        double total = m.baseOffsetNanos() / 1e9 + m.offsetSeconds();
        out.printf("%-16s %.9f s +/- %s (reference - device at origin)%n", "offset", total, sigma(m.sigma(0), 1, "s"));
        if (m.terms().count() > 1) {
            double d = m.drift();
            out.printf("%-16s %.6e s/s +/- %s = %.3f ppm = %.6f s/day (device %s)%n", "drift", d,
                sigma(m.sigma(1), 1, "s/s"), d * 1e6, d * 86_400, d < 0 ? "gains" : "loses");
        }
        if (m.terms().count() > 2) {
            out.printf("%-16s %.6e s/s^2 +/- %s%n", "drift rate", m.driftRate(), sigma(m.sigma(2), 1, "s/s^2"));
        }
        out.printf("%-16s %.3e s (residual sigma %s)%n", "residual RMS", fit.residualRms(),
            sigma(fit.residualSigma(), 1, "s"));
        if (fit.outliers().isEmpty()) {
            out.printf("%-16s none%n", "outliers");
        }
        for (ClockFit.Residual r : fit.outliers()) {
            out.printf("%-16s line %d (%s): residual %.6f s%s%n", "outlier", r.line(),
                ClockModelFile.iso(tc, r.device()), r.seconds(), r.excluded() ? ", excluded" : "");
        }
    }

    private static String sigma(java.util.OptionalDouble v, double scale, String unit) {
        return v.isPresent() ? String.format(Locale.ROOT, "%.3e %s", v.getAsDouble() * scale, unit)
            : "unknown (no redundancy)";
    }

    static List<ClockPair> readPairs(Path file, TimeConverter tc, TimeScale dev, TimeScale ref, Set<String> warnings) {
        CsvMapper mapper = new CsvMapper();
        CsvSchema schema = CsvSchema.emptySchema().withHeader().withComments();
        List<ClockPair> pairs = new ArrayList<>();
        ScaleInstant near = TimeCommand.now(tc);
        TimeValues.Context dctx = new TimeValues.Context(dev, false, 0, near, true);
        TimeValues.Context rctx = new TimeValues.Context(ref, false, 0, near, true);
        try (Reader r = Files.newBufferedReader(file);
             MappingIterator<Map<String, String>> it = mapper.readerFor(Map.class).with(schema).readValues(r)) {
            String devCol = null;
            String refCol = null;
            while (it.hasNextValue()) {
                int line = it.getCurrentLocation().getLineNr();
                Map<String, String> row = it.nextValue();
                if (devCol == null) {
                    devCol = column(row, "device", file);
                    refCol = column(row, "reference", file);
                }
                String d = row.get(devCol);
                String v = row.get(refCol);
                if (d == null || v == null || d.isBlank() || v.isBlank()) {
                    throw new UserInputException(file + ": line " + line + ": missing device or reference value");
                }
                try {
                    var dc = TimeValues.parse(d, tc, dctx);
                    var rc = TimeValues.parse(v, tc, rctx);
                    dc.warnings().forEach(x -> warnings.add(x.message()));
                    rc.warnings().forEach(x -> warnings.add(x.message()));
                    pairs.add(new ClockPair(dc.value().to(dev), rc.value().to(ref), line));
                } catch (IllegalArgumentException e) {
                    throw new UserInputException(file + ": line " + line + ": " + e.getMessage(), e);
                }
            }
        } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
            throw new UserInputException(file + ": not a readable CSV file: " + e.getOriginalMessage(), e);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read " + file + ": " + FileFailure.reason(e), e);
        } catch (RuntimeException e) {
            if (e.getCause() instanceof com.fasterxml.jackson.core.JsonProcessingException j) {
                throw new UserInputException(file + ": not a readable CSV file: " + j.getOriginalMessage(), e);
            }
            throw e;
        }
        if (pairs.isEmpty()) {
            throw new UserInputException(file + ": no pairs (expected a header 'device,reference' and rows)");
        }
        return pairs;
    }

    private static String column(Map<String, String> row, String name, Path file) {
        for (String k : row.keySet()) {
            if (k.trim().equalsIgnoreCase(name)) {
                return k;
            }
        }
        throw new UserInputException(file + ": no '" + name + "' column in the header (found: "
            + String.join(", ", row.keySet()) + ")");
    }
}
