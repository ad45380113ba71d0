package io.geotick.cli.time;

import com.fasterxml.jackson.databind.node.ObjectNode;
import io.geotick.cli.CsvBatch;
import io.geotick.cli.ExitCode;
import io.geotick.cli.Json;
import io.geotick.cli.UserInputException;
import io.geotick.timescales.Conversion;
import io.geotick.timescales.ScaleInstant;
import io.geotick.timescales.TimeConverter;
import io.geotick.timescales.TimeScale;
import io.geotick.timescales.encoding.UnixTime;
import io.geotick.timescales.leap.LeapTables;
import java.io.PrintWriter;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.concurrent.Callable;
import java.util.regex.Pattern;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code geotick time}: one timestamp on every scale and in every encoding, or with {@code --input} every
 * {@code value} of a CSV file ({@link CsvBatch}), each row's fields those of the single-point {@code --json}.
 * The leap table, the converter and the reference date are built once for the whole batch.
 */
@Command(name = "time", mixinStandardHelpOptions = true,
    customSynopsis = {"geotick time [--in SCALE] [--to SCALE[,SCALE...]] [--json]",
        "      [--week-bits BITS] [--near DATE] [--leap-file PATH]",
        "      [--smear-start DURATION] [--smear-length DURATION] [--] VALUE",
        "       geotick time [same options] --input FILE|- [--output FILE]"},
    description = {"Convert one timestamp exactly to every time scale and encoding, or every value of a CSV "
            + "file (--input).",
        "",
        "VALUE is one of:",
        "  ISO 8601 text: Z or an offset means UTC, otherwise a label on --in;",
        "  WEEK:SECONDS with --in gps, gst or bdt;",
        "  unix:N   Unix seconds (UTC);",
        "  ntp:N    NTP seconds since 1900 (UTC), or ntp:0x + 16 hex digits",
        "           (64-bit form, era chosen nearest --near);",
        "  ptp:N    PTP seconds (TAI since 1970-01-01T00:00:00 TAI);",
        "  gpss:N   seconds since the GPS epoch 1980-01-06;",
        "  mjd:N, jd:N   Modified Julian Date, Julian Date on --in.",
        "Scales: utc, tai, gps, gst, bdt, glonass, tt, smeared-utc.",
        "Unix, NTP and Julian dates on UTC have no value of their own for a",
        "leap second (23:59:60): they repeat the following second's value and",
        "say so in the warnings.",
        "",
        "Streams (--input FILE, '-' for standard input): a CSV file with a header",
        "row and a 'value' column holding one VALUE a row, in the syntax above; the",
        "other options apply to every row, and the leap table is read once. Rows are",
        "read and written one at a time. Other columns (id, station ...) are passed",
        "through unchanged, in their order, before the results. Output (--output",
        "FILE, default standard output): CSV with the pass-through columns, the",
        "--json fields with the same names and digits (seconds as exact decimals),",
        "then 'error'; 'warnings' holds a row's warnings joined by '; ' (a repeated",
        "leap second, a date past the leap table's expiry ...). --to keeps the",
        "fields of its rows (and always input, input_scale, tai_minus_utc, the",
        "leap_table_* fields and warnings). With --json, one JSON object per line",
        "(NDJSON; warnings an array). Every row gives one output row: a row that",
        "cannot be read gets an error naming its line and the problem (the message",
        "the single value would give), and the batch goes on. Empty lines are not",
        "rows.",
        ""},
    footer = {"", "Examples:", "  geotick time 2016-12-31T23:59:60.5Z",
        "  geotick time --in gps 1930:17.5", "  geotick time --in gps --week-bits 10 --near 2017-01-01 906:17.5",
        "  geotick time --json unix:1483228800", "  geotick time --in tt mjd:57754.5 --to tai,utc",
        "  geotick time --to utc,gps --input stamps.csv --output out.csv",
        "    with stamps.csv (invented):  id,value",
        "                                 s1,2016-12-31T23:59:60.5Z",
        "    gives out.csv the columns    id,input,input_scale,utc,gps,utc_doy,",
        "                                 gps_week,gps_tow,tai_minus_utc,",
        "                                 leap_table_source,leap_table_updated,",
        "                                 leap_table_expires,leap_table_hash,",
        "                                 warnings,error",
        "    and s1's row has utc 2016-12-31T23:59:60.500Z, gps_week 1930,",
        "    gps_tow 17.500, tai_minus_utc 36 (warnings: the leap second repeats in",
        "    Unix time and the Julian date); each output record is on one line.",
        "",
        "Exit codes: 0 ok; 2 bad usage or a bad VALUE (the message names it), with",
        "  --input a bad header (no 'value' column, a name twice) or an --output",
        "  that is the input file; 3 file not readable (--input, --leap-file, or CSV",
        "  that cannot be parsed on) or not writable (--output); 4 invalid leap-second",
        "  list (--leap-file); 5 --input finished with error rows ('geotick: N of M",
        "  rows failed' on standard error)."})
public final class TimeCommand implements Callable<Integer> {
    private static final Pattern TO_SPLIT = Pattern.compile("\\s*,\\s*");
    /** The column of the values in {@code --input}. */
    static final String VALUE_COLUMN = "value";

    @Spec
    CommandSpec spec;

    @Option(names = "--in", paramLabel = "SCALE", description = "Scale of VALUE when it has no zone (default: utc).")
    String in;

    @Option(names = "--to", paramLabel = "SCALE[,SCALE...]",
        description = "Rows of the text output to show: scales, or unix, ntp, ptp, gpss, mjd, jd (default: all). "
            + "--json always carries every field; with --input, the columns of those rows.")
    String to;

    @Option(names = "--json", description = "Print one JSON object (with --input: one object per row, NDJSON).")
    boolean json;

    @Option(names = "--week-bits", paramLabel = "BITS",
        description = "WEEK is truncated to BITS bits (10: legacy GPS, 12: Galileo, 13: GPS CNAV/BeiDou); the full "
            + "week is the one nearest --near.")
    Integer weekBits;

    @Option(names = "--near", paramLabel = "DATE",
        description = "Reference date (ISO 8601, UTC) for truncated weeks and NTP eras (default: today).")
    String near;

    @Mixin
    LeapOptions leap;

    @Option(names = "--input", paramLabel = "FILE",
        description = "Convert the 'value' column of every row of a CSV file with a header row ('-': standard "
            + "input) instead of one VALUE; other columns passed through. Output: CSV (or NDJSON with --json).")
    String input;

    @Option(names = "--output", paramLabel = "FILE",
        description = "With --input: write the rows to FILE instead of standard output ('-': standard output).")
    String output;

    @Parameters(index = "0", arity = "0..1", paramLabel = "VALUE", description = "The timestamp to convert.")
    String value;

    @Override
    public Integer call() {
        TimeScale scale = in == null ? TimeScale.UTC : TimeScale.parse(in);
        Set<String> only = parseTo(to);
        LeapTables.Selection sel = leap.selection();
        TimeConverter tc = leap.converter(sel.table());
        boolean nearGiven = near != null;
        ScaleInstant ref = nearGiven ? tc.parseIso(near, TimeScale.UTC).value() : now(tc);
        if (weekBits != null && weekBits != 10 && weekBits != 12 && weekBits != 13) {
            throw new UserInputException("--week-bits " + weekBits + " is not supported (10, 12 or 13)");
        }
        TimeValues.Context ctx = new TimeValues.Context(scale, in != null, weekBits == null ? 0 : weekBits, ref,
            false);
        CsvBatch.checkUse(input, output, value == null ? List.of() : List.of(value), "a single value");
        PrintWriter out = spec.commandLine().getOut();
        if (input != null) {
            return stream(only, tc, ctx, nearGiven, out);
        }
        if (value == null) {
            throw new UserInputException("missing VALUE: give one timestamp, or --input FILE with a 'value' column");
        }
        TimeReport report = report(value, tc, ctx, nearGiven);
        if (json) {
            out.println(Json.write(report.toJson()));
        } else {
            report.printText(out, only);
        }
        out.flush();
        return ExitCode.OK;
    }

    /** Every representation of one VALUE, with the command's own notes; the same for a point and a row. */
    private TimeReport report(String text, TimeConverter tc, TimeValues.Context ctx, boolean nearGiven) {
        boolean weekForm = text.trim().matches("-?\\d+\\s*:.*");
        if (weekBits != null && !weekForm) {
            throw new UserInputException("--week-bits applies to WEEK:SECONDS values, not '" + text + "'");
        }
        Conversion<ScaleInstant> parsed = TimeValues.parse(text, tc, ctx);
        TimeReport report = new TimeReport(text, ctx.scale(), parsed, tc);
        boolean usedNear = weekBits != null || text.trim().toLowerCase(Locale.ROOT).startsWith("ntp:0x");
        if (usedNear && !nearGiven) {
            report.addWarning("reference date assumed to be today (" + LocalDate.now(ZoneOffset.UTC)
                + "); give --near for old data");
        }
        return report;
    }

    /**
     * The batch mode: the {@code value} of every row through the one converter; the columns are the
     * {@code --json} fields of {@code only}'s rows ({@link TimeReport#fields}).
     */
    private int stream(Set<String> only, TimeConverter tc, TimeValues.Context ctx, boolean nearGiven,
            PrintWriter out) {
        List<String> keys = TimeReport.fields(only);
        CsvBatch.Planner planner = header -> {
            int at = header.indexOf(VALUE_COLUMN);
            if (at < 0) {
                throw header.problem("no column '" + VALUE_COLUMN + "'; 'geotick time --input' needs a '"
                    + VALUE_COLUMN + "' column holding one VALUE a row (got " + String.join(",", header.names())
                    + ")");
            }
            return new CsvBatch.Plan() {
                @Override
                public List<String> valueColumns() {
                    return List.of(VALUE_COLUMN);
                }

                @Override
                public List<String> outputKeys() {
                    return keys;
                }

                @Override
                public ObjectNode convert(String[] cells) {
                    return report(cells[at].strip(), tc, ctx, nearGiven).toJson();
                }
            };
        };
        return CsvBatch.execute(input, output, json, out, spec.commandLine().getErr(), VALUE_COLUMN, planner);
    }

    static ScaleInstant now(TimeConverter tc) {
        Instant n = Instant.now();
        return tc.fromUnix(UnixTime.of(n.getEpochSecond(), n.getNano())).value();
    }

    private static Set<String> parseTo(String to) {
        Set<String> out = new LinkedHashSet<>();
        if (to == null) {
            return out;
        }
        for (String k : TO_SPLIT.split(to.trim())) {
            String key = k.toLowerCase(Locale.ROOT).replace('_', '-');
            if (!TimeReport.ROW_KEYS.contains(key)) {
                throw new UserInputException("--to: unknown scale or encoding '" + k + "' (known: "
                    + String.join(", ", TimeReport.ROW_KEYS) + ")");
            }
            out.add(key);
        }
        return out;
    }
}
