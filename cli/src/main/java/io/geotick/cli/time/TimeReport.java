package io.geotick.cli.time;

import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.databind.util.RawValue;
import io.geotick.cli.Json;
import io.geotick.timescales.Conversion;
import io.geotick.timescales.ScaleInstant;
import io.geotick.timescales.TimeConverter;
import io.geotick.timescales.TimeScale;
import io.geotick.timescales.TimeWarning;
import io.geotick.timescales.calendar.DateTimeLabel;
import io.geotick.timescales.encoding.DecimalSeconds;
import io.geotick.timescales.encoding.JulianDate;
import io.geotick.timescales.encoding.NtpTimestamp;
import io.geotick.timescales.encoding.PtpTimestamp;
import io.geotick.timescales.encoding.UnixTime;
import io.geotick.timescales.encoding.WeekSystem;
import io.geotick.timescales.encoding.WeekTime;
import io.geotick.timescales.leap.HashCheck;
import io.geotick.timescales.leap.LeapTable;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Supplier;

/**
 * Every representation of one instant, computed once and written as JSON or as labelled text. A
 * representation that does not exist for the instant (UTC before 1961, a GPS week before 1980, PTP before
 * 1970 TAI) is JSON {@code null} and a note in the warnings; it never stops the others.
 */
final class TimeReport {
    /** Keys accepted by {@code --to}, in output order. */
    static final List<String> ROW_KEYS = List.of("utc", "tai", "tt", "gps", "gst", "bdt", "glonass", "smeared-utc",
        "unix", "ntp", "ptp", "gpss", "mjd", "jd");

    /**
     * The JSON fields in output order, each with the {@code --to} key whose text row shows it; "" for the fields
     * kept whatever {@code --to} selects (the input, TAI - UTC, the leap table and the warnings: the lines the
     * text output always prints). Used by the batch mode to choose its columns.
     */
    private static final String[][] FIELD_ROWS = {
        {"input", ""}, {"input_scale", ""}, {"utc", "utc"}, {"tai", "tai"}, {"tt", "tt"}, {"gps", "gps"},
        {"gst", "gst"}, {"bdt", "bdt"}, {"glonass", "glonass"}, {"smeared_utc", "smeared-utc"}, {"utc_doy", "utc"},
        {"gps_week", "gps"}, {"gps_tow", "gps"}, {"gst_week", "gst"}, {"gst_tow", "gst"}, {"bdt_week", "bdt"},
        {"bdt_tow", "bdt"}, {"gps_seconds", "gpss"}, {"unix", "unix"}, {"ntp", "ntp"}, {"ntp_era", "ntp"},
        {"ntp_hex", "ntp"}, {"ptp", "ptp"}, {"mjd_utc", "mjd"}, {"jd_utc", "jd"}, {"mjd_tt", "mjd"},
        {"jd_tt", "jd"}, {"tai_minus_utc", ""}, {"leap_table_source", ""}, {"leap_table_updated", ""},
        {"leap_table_expires", ""}, {"leap_table_hash", ""}, {"smear_start", "smeared-utc"},
        {"smear_length", "smeared-utc"}, {"warnings", ""},
    };

    /**
     * The names of the JSON fields, in the order of {@link #toJson()}, for the {@code --to} selection
     * {@code only} (empty: all).
     */
    static List<String> fields(Set<String> only) {
        List<String> out = new ArrayList<>();
        for (String[] f : FIELD_ROWS) {
            if (only.isEmpty() || f[1].isEmpty() || only.contains(f[1])) {
                out.add(f[0]);
            }
        }
        return out;
    }

    private final Map<String, Object> fields = new LinkedHashMap<>();
    private final List<String> warnings = new ArrayList<>();
    private final List<String[]> rows = new ArrayList<>();

    /** A raw JSON number: exact decimal text. */
    private record Num(String text) {
        @Override
        public String toString() {
            return text;
        }
    }

    TimeReport(String input, TimeScale inScale, Conversion<ScaleInstant> parsed, TimeConverter tc) {
        ScaleInstant t = parsed.value();
        note(parsed.warnings());
        fields.put("input", input);
        fields.put("input_scale", inScale.id());
        String utc = put("utc", () -> tc.formatIso(t, TimeScale.UTC));
        DateTimeLabel utcLabel = utc == null ? null : tc.toLabel(t, TimeScale.UTC).value();
        String doy = utcLabel == null ? null : utcLabel.toOrdinalDate();
        String[] iso = new String[TimeScale.values().length];
        for (TimeScale s : new TimeScale[] {TimeScale.TAI, TimeScale.TT, TimeScale.GPS, TimeScale.GST, TimeScale.BDT,
            TimeScale.GLONASS, TimeScale.SMEARED_UTC}) {
            iso[s.ordinal()] = put(s.id().replace('-', '_'), () -> tc.formatIso(t, s));
        }
        fields.put("utc_doy", doy);
        WeekTime[] weeks = new WeekTime[3];
        String[] wk = {"gps", "gst", "bdt"};
        for (int i = 0; i < 3; i++) {
            WeekSystem ws = WeekSystem.values()[i];
            weeks[i] = attempt(() -> Conversion.exact(ws.weekTime(t)));
            fields.put(wk[i] + "_week", weeks[i] == null ? null : weeks[i].week());
            fields.put(wk[i] + "_tow", weeks[i] == null ? null : new Num(weeks[i].timeOfWeek().toString()));
        }
        DecimalSeconds gpss = attempt(() -> Conversion.exact(WeekSystem.GPS.secondsSinceEpoch(t)));
        fields.put("gps_seconds", gpss == null ? null : new Num(gpss.toString()));
        UnixTime unix = attempt(() -> tc.toUnix(t));
        fields.put("unix", unix == null ? null : new Num(unix.toString()));
        NtpTimestamp ntp = unix == null ? null : NtpTimestamp.ofUnix(unix);
        DecimalSeconds ntpSec = unix == null ? null
            : unix.toDecimalSeconds().plus(DecimalSeconds.of(NtpTimestamp.UNIX_OFFSET, 0));
        fields.put("ntp", ntpSec == null ? null : new Num(ntpSec.toString()));
        fields.put("ntp_era", ntp == null ? null : ntp.era());
        fields.put("ntp_hex", ntp == null ? null : ntp.toHex());
        PtpTimestamp ptp = attempt(() -> Conversion.exact(PtpTimestamp.from(t)));
        fields.put("ptp", ptp == null ? null : new Num(ptp.toString()));
        JulianDate jdUtc = attempt(() -> tc.toJulianDate(t, TimeScale.UTC));
        JulianDate jdTt = attempt(() -> tc.toJulianDate(t, TimeScale.TT));
        fields.put("mjd_utc", jdUtc == null ? null : new Num(jdUtc.mjdDecimal().toPlainString()));
        fields.put("jd_utc", jdUtc == null ? null : new Num(jdUtc.jdDecimal().toPlainString()));
        fields.put("mjd_tt", jdTt == null ? null : new Num(jdTt.mjdDecimal().toPlainString()));
        fields.put("jd_tt", jdTt == null ? null : new Num(jdTt.jdDecimal().toPlainString()));
        DecimalSeconds dtai = utcLabel == null ? null : attempt(() -> tc.taiMinusUtc(t));
        fields.put("tai_minus_utc", dtai == null ? null : new Num(dtai.toString()));
        LeapTable table = tc.leapTable();
        fields.put("leap_table_source", table.source());
        fields.put("leap_table_updated", table.updated().toString());
        fields.put("leap_table_expires", table.expires().toString());
        fields.put("leap_table_hash", table.hashCheck() == HashCheck.VERIFIED ? "verified" : "built-in");
        fields.put("smear_start", tc.smearWindow().start().toString());
        fields.put("smear_length", tc.smearWindow().length().toString());

        row("utc", "UTC", utc == null ? "-" : utc + (doy == null ? "" : "   (day " + doy + ")"));
        row("tai", "TAI", iso[TimeScale.TAI.ordinal()]);
        row("tt", "TT", iso[TimeScale.TT.ordinal()]);
        String[] names = {"GPS", "GST", "BDT"};
        TimeScale[] ws = {TimeScale.GPS, TimeScale.GST, TimeScale.BDT};
        for (int i = 0; i < 3; i++) {
            String w = weeks[i] == null ? "" : "   week " + weeks[i].week() + (i == 2 ? "  sow " : "  tow ")
                + weeks[i].timeOfWeek();
            String label = iso[ws[i].ordinal()];
            row(wk[i], names[i], (label == null ? "-" : label) + w);
        }
        row("glonass", "GLONASS", iso[TimeScale.GLONASS.ordinal()]);
        row("smeared-utc", "smeared UTC", iso[TimeScale.SMEARED_UTC.ordinal()]);
        row("unix", "Unix", unix == null ? null : unix.toString());
        row("ntp", "NTP", ntp == null ? null : ntpSec + "   (era " + ntp.era() + ", 64-bit " + ntp.toHex() + ")");
        row("ptp", "PTP", ptp == null ? null : ptp.toString());
        row("gpss", "GPS seconds", gpss == null ? null : gpss.toString());
        row("mjd", "MJD (UTC)", jdUtc == null ? null : jdUtc.mjdDecimal().toPlainString());
        row("jd", "JD (UTC)", jdUtc == null ? null : jdUtc.jdDecimal().toPlainString());
        row("mjd", "MJD (TT)", jdTt == null ? null : jdTt.mjdDecimal().toPlainString());
        row("jd", "JD (TT)", jdTt == null ? null : jdTt.jdDecimal().toPlainString());
    }

    private String put(String key, Supplier<Conversion<String>> f) {
        String v = attempt(f);
        fields.put(key, v);
        return v;
    }

    private <T> T attempt(Supplier<Conversion<T>> f) {
        try {
            Conversion<T> c = f.get();
            note(c.warnings());
            return c.value();
        } catch (IllegalArgumentException e) {
            addWarning(e.getMessage());
            return null;
        } catch (ArithmeticException e) {
            addWarning("a representation is out of range for this instant");
            return null;
        }
    }

    private void note(List<TimeWarning> ws) {
        for (TimeWarning w : ws) {
            if (!warnings.contains(w.message())) {
                warnings.add(w.message());
            }
        }
    }

    /** Adds a note of the command's own (e.g. an assumed reference date). */
    void addWarning(String message) {
        if (!warnings.contains(message)) {
            warnings.add(message);
        }
    }

    private void row(String key, String label, String value) {
        rows.add(new String[] {key, label, value == null ? "-" : value});
    }

    List<String> warnings() {
        return warnings;
    }

    /** The JSON object, field names as documented. */
    ObjectNode toJson() {
        ObjectNode o = Json.object();
        fields.forEach((k, v) -> {
            if (v == null) {
                o.putNull(k);
            } else if (v instanceof Num n) {
                o.putRawValue(k, new RawValue(n.text()));
            } else if (v instanceof Long l) {
                o.put(k, l);
            } else if (v instanceof Integer i) {
                o.put(k, i);
            } else {
                o.put(k, v.toString());
            }
        });
        var arr = o.putArray("warnings");
        warnings.forEach(arr::add);
        return o;
    }

    /** Labelled text; {@code only} selects rows by key (empty: all). */
    void printText(PrintWriter out, Set<String> only) {
        for (String[] r : rows) {
            if (only.isEmpty() || only.contains(r[0])) {
                out.printf("%-13s %s%n", r[1], r[2]);
            }
        }
        Object d = fields.get("tai_minus_utc");
        out.printf("%-13s %s%n", "TAI - UTC", d == null ? "-" : d + " s");
        out.printf("%-13s %s (updated %s, expires %s, hash %s)%n", "leap table", fields.get("leap_table_source"),
            fields.get("leap_table_updated"), fields.get("leap_table_expires"), fields.get("leap_table_hash"));
        for (String w : warnings) {
            out.println("warning: " + w);
        }
    }
}
