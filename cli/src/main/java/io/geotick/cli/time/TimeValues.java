package io.geotick.cli.time;

import io.geotick.cli.UserInputException;
import io.geotick.timescales.Conversion;
import io.geotick.timescales.ScaleInstant;
import io.geotick.timescales.TimeConverter;
import io.geotick.timescales.TimeScale;
import io.geotick.timescales.encoding.JulianDate;
import io.geotick.timescales.encoding.NtpTimestamp;
import io.geotick.timescales.encoding.PtpTimestamp;
import io.geotick.timescales.encoding.UnixTime;
import io.geotick.timescales.encoding.WeekSystem;
import io.geotick.timescales.encoding.WeekTime;
import java.util.Locale;
import java.util.regex.Pattern;

/**
 * The VALUE grammar of the time commands.
 *
 * <ul>
 *   <li>ISO 8601 text: with {@code Z} or an offset it is UTC, otherwise a label on the input scale;</li>
 *   <li>{@code WEEK:SECONDS} on gps, gst or bdt (full week, or truncated with a week width and a reference);</li>
 *   <li>{@code unix:N} (UTC), {@code ntp:N} (UTC; decimal seconds since 1900, or {@code ntp:0x} and 16
 *       hexadecimal digits resolved to the era nearest the reference), {@code ptp:N} (TAI since 1970 TAI),
 *       {@code gpss:N} (seconds since the GPS epoch), {@code mjd:N} and {@code jd:N} (on the input scale).</li>
 * </ul>
 */
public final class TimeValues {
    private static final Pattern WEEK_FORM = Pattern.compile("-?\\d+\\s*:\\s*[-+]?[\\d.]+");
    private static final Pattern PREFIX = Pattern.compile("(?i)(unix|ntp|ptp|mjd|jd|gpss):(.*)");
    private static final String EXPECTED = "expected ISO 8601 text (2017-01-01T00:00:00Z), WEEK:SECONDS with --in "
        + "gps|gst|bdt, or one of unix:, ntp:, ptp:, mjd:, jd:, gpss: followed by a number";

    private TimeValues() {
    }

    /**
     * How to read a value.
     *
     * @param scale         the input scale
     * @param scaleExplicit whether the user named the scale (then prefixes that fix their own scale conflict)
     * @param weekBits      width of a truncated week number, 0 for full weeks
     * @param near          reference instant for truncated weeks and NTP eras
     * @param bareNumbersAsUnix whether a bare decimal number is Unix seconds (CSV cells)
     */
    public record Context(TimeScale scale, boolean scaleExplicit, int weekBits, ScaleInstant near,
                          boolean bareNumbersAsUnix) {
    }

    /** Reads one value; a failure message always names the value. */
    public static Conversion<ScaleInstant> parse(String raw, TimeConverter tc, Context ctx) {
        try {
            return parseValue(raw, tc, ctx);
        } catch (ArithmeticException e) {
            throw new UserInputException("'" + raw.trim() + "' is out of range", e);
        } catch (IllegalArgumentException e) {
            if (e.getMessage() != null && e.getMessage().contains(raw.trim())) {
                throw e;
            }
            throw new UserInputException("'" + raw.trim() + "': " + e.getMessage(), e);
        }
    }

    private static Conversion<ScaleInstant> parseValue(String raw, TimeConverter tc, Context ctx) {
        String v = raw.trim();
        if (v.isEmpty()) {
            throw new UserInputException("empty time value; " + EXPECTED);
        }
        var m = PREFIX.matcher(v);
        if (m.matches()) {
            String kind = m.group(1).toLowerCase(Locale.ROOT);
            String num = m.group(2).trim();
            switch (kind) {
                case "unix":
                    requireScale(ctx, TimeScale.UTC, raw, "Unix time counts UTC");
                    return UnixTime.parse(num).then(tc::fromUnix);
                case "ntp":
                    requireScale(ctx, TimeScale.UTC, raw, "NTP time counts UTC");
                    if (num.startsWith("0x") || num.startsWith("0X")) {
                        long nearNtp = tc.toUnix(ctx.near()).value().seconds() + NtpTimestamp.UNIX_OFFSET;
                        return tc.fromNtp(NtpTimestamp.parseHex(num, nearNtp));
                    }
                    return NtpTimestamp.parseToUnix(num).then(tc::fromUnix);
                case "ptp":
                    requireScale(ctx, TimeScale.TAI, raw, "PTP time counts TAI");
                    return PtpTimestamp.parse(num).map(PtpTimestamp::toInstant);
                case "gpss":
                    requireScale(ctx, TimeScale.GPS, raw, "gpss: counts GPS time");
                    return WeekSystem.GPS.parseSecondsSinceEpoch(num);
                case "mjd":
                    return JulianDate.parseMjd(ctx.scale(), num).then(tc::fromJulianDate);
                default:
                    return JulianDate.parseJd(ctx.scale(), num).then(tc::fromJulianDate);
            }
        }
        if (WEEK_FORM.matcher(v).matches()) {
            WeekSystem ws;
            try {
                ws = WeekSystem.forScale(ctx.scale());
            } catch (IllegalArgumentException e) {
                throw new UserInputException("'" + raw + "' looks like WEEK:SECONDS, which needs --in gps, gst or "
                    + "bdt (input scale is " + ctx.scale().id() + ")");
            }
            Conversion<WeekTime> full = WeekTime.parse(ws, v);
            if (ctx.weekBits() == 0) {
                return full.map(WeekTime::toInstant);
            }
            WeekTime w = full.value();
            return Conversion.of(WeekTime.resolve(ws, w.week(), ctx.weekBits(), w.timeOfWeek(), ctx.near())
                .toInstant(), full.warnings());
        }
        if (ctx.bareNumbersAsUnix() && v.matches("[-+]?\\d*\\.?\\d+")) {
            requireScale(ctx, TimeScale.UTC, raw, "bare numbers are read as Unix seconds (UTC)");
            return UnixTime.parse(v).then(tc::fromUnix);
        }
        if (!Character.isDigit(v.charAt(0)) || v.length() < 4 || !v.matches("\\d{4}-.*")) {
            throw new UserInputException("cannot read '" + raw + "' as a time value; " + EXPECTED);
        }
        return tc.parseIso(v, ctx.scale());
    }

    private static void requireScale(Context ctx, TimeScale s, String raw, String why) {
        if (ctx.scaleExplicit() && ctx.scale() != s) {
            throw new UserInputException("'" + raw + "' conflicts with --in " + ctx.scale().id() + ": " + why
                + "; drop --in or use --in " + s.id());
        }
    }
}
