package io.geotick.timescales.encoding;

import io.geotick.timescales.Conversion;
import io.geotick.timescales.ScaleInstant;
import io.geotick.timescales.TimeInputException;
import io.geotick.timescales.TimeScale;
import java.time.LocalDate;

/**
 * A GNSS week numbering: weeks of 604 800 seconds counted on a uniform scale from an epoch.
 *
 * <table>
 *   <caption>Week systems</caption>
 *   <tr><th>system</th><th>scale</th><th>week 0 starts</th><th>source</th></tr>
 *   <tr><td>GPS</td><td>GPS time</td><td>1980-01-06T00:00:00 GPS (= UTC)</td><td>IS-GPS-200, 3.3.4 and 20.3.3.3.1.1</td></tr>
 *   <tr><td>GALILEO</td><td>GST</td><td>1999-08-22T00:00:00 GST (= GPS week 1024; 13 s before midnight UTC)</td>
 *       <td>Galileo OS SIS ICD, 5.1.2</td></tr>
 *   <tr><td>BEIDOU</td><td>BDT</td><td>2006-01-01T00:00:00 BDT (= UTC)</td><td>BeiDou ICD (BDS-SIS-ICD), 4.2</td></tr>
 * </table>
 */
public enum WeekSystem {
    /** GPS week and time of week. */
    GPS(TimeScale.GPS, LocalDate.of(1980, 1, 6), "GPS"),
    /** Galileo week number and time of week (on GST). */
    GALILEO(TimeScale.GST, LocalDate.of(1999, 8, 22), "Galileo"),
    /** BeiDou week number and seconds of week (on BDT). */
    BEIDOU(TimeScale.BDT, LocalDate.of(2006, 1, 1), "BeiDou");

    /** Seconds in a week. */
    public static final long SECONDS_PER_WEEK = 604_800L;

    private final TimeScale scale;
    private final LocalDate epoch;
    private final String label;
    private final long epochScaleSeconds;

    WeekSystem(TimeScale scale, LocalDate epoch, String label) {
        this.scale = scale;
        this.epoch = epoch;
        this.label = label;
        this.epochScaleSeconds = epoch.toEpochDay() * 86_400L;
    }

    /** The scale the weeks are counted on. */
    public TimeScale scale() {
        return scale;
    }

    /** The date (on {@link #scale()}) at whose 00:00:00 week 0 starts. */
    public LocalDate epoch() {
        return epoch;
    }

    /** The system's name for messages, e.g. {@code "GPS"}. */
    public String label() {
        return label;
    }

    /** The week system counted on a scale (GPS, GST or BDT). */
    public static WeekSystem forScale(TimeScale s) {
        for (WeekSystem w : values()) {
            if (w.scale == s) {
                return w;
            }
        }
        throw new TimeInputException("time scale " + s.id() + " has no week numbering (use gps, gst or bdt)");
    }

    /** The epoch, read on {@link #scale()}. */
    public ScaleInstant epochInstant() {
        return ScaleInstant.ofScaleSeconds(scale, epochScaleSeconds, 0);
    }

    /**
     * Seconds elapsed since the epoch (negative before it). Exact.
     */
    public DecimalSeconds secondsSinceEpoch(ScaleInstant t) {
        ScaleInstant s = t.to(scale);
        return DecimalSeconds.of(s.scaleSeconds() - epochScaleSeconds, s.scaleNano());
    }

    /** The instant {@code seconds} after the epoch, read on {@link #scale()}. */
    public ScaleInstant fromSecondsSinceEpoch(DecimalSeconds seconds) {
        return ScaleInstant.ofScaleSeconds(scale, Math.addExact(epochScaleSeconds, seconds.seconds()), seconds.nano());
    }

    /** Reads decimal seconds since the epoch, e.g. {@code 1167264018}. */
    public Conversion<ScaleInstant> parseSecondsSinceEpoch(String text) {
        return DecimalSeconds.parse(text, "seconds since the " + label + " epoch").map(this::fromSecondsSinceEpoch);
    }

    /**
     * The full week number and time of week of an instant.
     *
     * @throws TimeInputException if the instant is before the system's epoch (week would be negative)
     */
    public WeekTime weekTime(ScaleInstant t) {
        DecimalSeconds s = secondsSinceEpoch(t);
        if (s.isNegative()) {
            throw new TimeInputException("no " + label + " week number: the instant is "
                + DecimalSeconds.ZERO.minus(s) + " s before the " + label + " epoch " + epoch + "T00:00:00 "
                + scale.id().toUpperCase(java.util.Locale.ROOT));
        }
        long week = s.seconds() / SECONDS_PER_WEEK;
        return new WeekTime(this, week, DecimalSeconds.of(s.seconds() % SECONDS_PER_WEEK, s.nano()));
    }

    /** Allocation-free: the full week of a count of seconds of {@link #scale()} since its 1970 label. */
    public long weekOfScaleSeconds(long scaleSeconds) {
        return Math.floorDiv(scaleSeconds - epochScaleSeconds, SECONDS_PER_WEEK);
    }

    /** Allocation-free: the whole seconds of week of a count of seconds of {@link #scale()} since its 1970 label. */
    public long secondOfWeekOfScaleSeconds(long scaleSeconds) {
        return Math.floorMod(scaleSeconds - epochScaleSeconds, SECONDS_PER_WEEK);
    }

    /** Allocation-free: the scale seconds since its 1970 label for a full week and whole second of week. */
    public long scaleSecondsOf(long week, long secondOfWeek) {
        return epochScaleSeconds + Math.multiplyExact(week, SECONDS_PER_WEEK) + secondOfWeek;
    }
}
