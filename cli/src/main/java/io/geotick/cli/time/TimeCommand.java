package io.geotick.cli.time;

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
import java.util.Locale;
import java.util.Set;
import java.util.regex.Pattern;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code geotick time}: one timestamp on every scale and in every encoding. */
@Command(name = "time", mixinStandardHelpOptions = true,
    description = {"Convert one timestamp exactly to every time scale and encoding.",
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
        ""},
    footer = {"", "Examples:", "  geotick time 2016-12-31T23:59:60.5Z",
        "  geotick time --in gps 1930:17.5", "  geotick time --in gps --week-bits 10 --near 2017-01-01 906:17.5",
        "  geotick time --json unix:1483228800", "  geotick time --in tt mjd:57754.5 --to tai,utc"})
public final class TimeCommand implements Runnable {
    private static final Pattern TO_SPLIT = Pattern.compile("\\s*,\\s*");

    @Spec
    CommandSpec spec;

    @Option(names = "--in", paramLabel = "SCALE", description = "Scale of VALUE when it has no zone (default: utc).")
    String in;

    @Option(names = "--to", paramLabel = "SCALE[,SCALE...]",
        description = "Rows of the text output to show: scales, or unix, ntp, ptp, gpss, mjd, jd (default: all). "
            + "--json always carries every field.")
    String to;

    @Option(names = "--json", description = "Print one JSON object.")
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

    @Parameters(index = "0", paramLabel = "VALUE", description = "The timestamp to convert.")
    String value;

    @Override
    public void run() {
        TimeScale scale = in == null ? TimeScale.UTC : TimeScale.parse(in);
        Set<String> only = parseTo(to);
        LeapTables.Selection sel = leap.selection();
        TimeConverter tc = leap.converter(sel.table());
        boolean nearGiven = near != null;
        ScaleInstant ref = nearGiven ? tc.parseIso(near, TimeScale.UTC).value() : now(tc);
        if (weekBits != null && weekBits != 10 && weekBits != 12 && weekBits != 13) {
            throw new UserInputException("--week-bits " + weekBits + " is not supported (10, 12 or 13)");
        }
        boolean weekForm = value.trim().matches("-?\\d+\\s*:.*");
        if (weekBits != null && !weekForm) {
            throw new UserInputException("--week-bits applies to WEEK:SECONDS values, not '" + value + "'");
        }
        TimeValues.Context ctx = new TimeValues.Context(scale, in != null, weekBits == null ? 0 : weekBits, ref,
            false);
        Conversion<ScaleInstant> parsed = TimeValues.parse(value, tc, ctx);
        TimeReport report = new TimeReport(value, scale, parsed, tc);
        boolean usedNear = weekBits != null || value.trim().toLowerCase(Locale.ROOT).startsWith("ntp:0x");
        if (usedNear && !nearGiven) {
            report.addWarning("reference date assumed to be today (" + LocalDate.now(ZoneOffset.UTC)
                + "); give --near for old data");
        }
        PrintWriter out = spec.commandLine().getOut();
        if (json) {
            out.println(Json.write(report.toJson()));
        } else {
            report.printText(out, only);
        }
        out.flush();
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
