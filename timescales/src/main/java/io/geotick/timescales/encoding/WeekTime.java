package io.geotick.timescales.encoding;

import io.geotick.timescales.Conversion;
import io.geotick.timescales.ScaleInstant;
import io.geotick.timescales.TimeInputException;
import java.util.Objects;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * A full week number and time of week in a {@link WeekSystem}. Exact; immutable.
 *
 * <p>Truncated week numbers, as broadcast (GPS legacy navigation message: 10 bits, rolling over every 1024
 * weeks, at 1999-08-22 and 2019-04-07; GPS CNAV and BeiDou: 13 bits; Galileo: 12 bits), are resolved with
 * {@link #resolve}: of the full weeks congruent to the truncated one, the one whose instant lies nearest a
 * reference instant. A reference within half a rollover period (about 9.8 years for 10 bits) gives the right
 * week; this is the rollover problem of older receivers, which use their firmware date as the reference.
 *
 * @param system       the week numbering
 * @param week         the full week number, 0 or more
 * @param timeOfWeek   seconds of the week, 0 &le; tow &lt; 604 800
 */
public record WeekTime(WeekSystem system, long week, DecimalSeconds timeOfWeek) {
    /** Largest full week accepted (beyond year 9999 of every week system). */
    public static final long MAX_WEEK = 999_999L;
    private static final Pattern WEEK_TOW = Pattern.compile("\\s*(-?\\d+)\\s*:\\s*([^:]+?)\\s*");

    public WeekTime {
        Objects.requireNonNull(system, "system");
        Objects.requireNonNull(timeOfWeek, "timeOfWeek");
        if (week < 0) {
            throw new TimeInputException(system.label() + " week " + week + " is negative");
        }
        if (week > MAX_WEEK) {
            throw new TimeInputException(system.label() + " week " + week + " is out of range 0-" + MAX_WEEK);
        }
        if (timeOfWeek.isNegative() || timeOfWeek.seconds() >= WeekSystem.SECONDS_PER_WEEK) {
            throw new TimeInputException(system.label() + " time of week " + timeOfWeek
                + " s is out of range 0 <= tow < 604800");
        }
    }

    /**
     * Reads {@code WEEK:SECONDS} (full week number), e.g. {@code 1930:17.5}.
     *
     * @throws TimeInputException naming the text when malformed or out of range
     */
    public static Conversion<WeekTime> parse(WeekSystem system, String text) {
        Matcher m = WEEK_TOW.matcher(text);
        if (!m.matches()) {
            throw new TimeInputException("'" + text + "' is not WEEK:SECONDS (e.g. 1930:17.5)");
        }
        long week;
        try {
            week = Long.parseLong(m.group(1));
        } catch (NumberFormatException e) {
            throw new TimeInputException(system.label() + " week '" + m.group(1) + "' is out of range", e);
        }
        return DecimalSeconds.parse(m.group(2), system.label() + " time of week")
            .map(tow -> new WeekTime(system, week, tow));
    }

    /**
     * The full week for a truncated week number: the candidate nearest {@code near}.
     *
     * @param truncatedWeek the broadcast week, 0 &le; w &lt; 2<sup>bits</sup>
     * @param bits          the width of the broadcast field (10, 12 or 13)
     * @param near          the reference instant (e.g. the receiver's idea of the date)
     */
    public static WeekTime resolve(WeekSystem system, long truncatedWeek, int bits, DecimalSeconds tow,
                                   ScaleInstant near) {
        if (bits != 10 && bits != 12 && bits != 13) {
            throw new TimeInputException("week-number width " + bits + " bits is not supported (10, 12 or 13)");
        }
        long mod = 1L << bits;
        if (truncatedWeek < 0 || truncatedWeek >= mod) {
            throw new TimeInputException(bits + "-bit " + system.label() + " week " + truncatedWeek
                + " is out of range 0-" + (mod - 1));
        }
        new WeekTime(system, truncatedWeek, tow); // validates the time of week
        DecimalSeconds ref = system.secondsSinceEpoch(near);
        long refWeek = Math.floorDiv(ref.seconds(), WeekSystem.SECONDS_PER_WEEK);
        long k0 = Math.floorDiv(refWeek - truncatedWeek, mod);
        WeekTime best = null;
        DecimalSeconds bestDist = null;
        for (long k = k0 - 1; k <= k0 + 2; k++) {
            long w = truncatedWeek + k * mod;
            if (w < 0) {
                continue;
            }
            DecimalSeconds at = DecimalSeconds.of(w * WeekSystem.SECONDS_PER_WEEK, 0).plus(tow);
            DecimalSeconds d = at.minus(ref);
            DecimalSeconds dist = d.isNegative() ? DecimalSeconds.ZERO.minus(d) : d;
            if (bestDist == null || dist.compareTo(bestDist) < 0) {
                bestDist = dist;
                best = new WeekTime(system, w, tow);
            }
        }
        return best;
    }

    /** The instant, read on the system's scale. */
    public ScaleInstant toInstant() {
        return system.fromSecondsSinceEpoch(DecimalSeconds.of(Math.multiplyExact(week, WeekSystem.SECONDS_PER_WEEK), 0)
            .plus(timeOfWeek));
    }

    /** The week number modulo 2<sup>bits</sup>, as broadcast in a field of that width. */
    public long truncatedWeek(int bits) {
        return week & ((1L << bits) - 1);
    }

    /** {@code WEEK:SECONDS}, e.g. {@code 1930:17.500}; {@link #parse} reads it back. */
    @Override
    public String toString() {
        return week + ":" + timeOfWeek;
    }
}
