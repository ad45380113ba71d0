package io.geotick.timescales.encoding;

import io.geotick.timescales.Conversion;
import io.geotick.timescales.calendar.DateTimeLabel;

/**
 * Unix (POSIX) time: the UTC label counted as days since 1970-01-01 &times; 86 400 + seconds of the day
 * (IEEE Std 1003.1, "Seconds Since the Epoch").
 *
 * <p>At a leap second: POSIX time has no value for 23:59:60. geotick gives the leap second 23:59:60.x the
 * value of the following 00:00:00.x (the count repeats, as a POSIX clock that steps back does) and attaches a
 * {@link io.geotick.timescales.TimeWarning.Kind#LEAP_SECOND_REPEAT} warning. Reading a Unix value names the
 * non-leap second (00:00:00.x), with the same warning when the value could also be the leap second. Before
 * 1972 the count follows the UTC labels of the 1961&ndash;1971 table. Immutable.
 *
 * @param seconds whole seconds (floor)
 * @param nano    nanoseconds 0&ndash;999 999 999
 */
public record UnixTime(long seconds, int nano) implements Comparable<UnixTime> {
    public UnixTime {
        if (nano < 0 || nano > 999_999_999) {
            throw new IllegalArgumentException("nano " + nano + " out of range");
        }
    }

    /** {@code seconds} plus {@code nanoAdjustment} ns. */
    public static UnixTime of(long seconds, long nanoAdjustment) {
        DecimalSeconds d = DecimalSeconds.of(seconds, nanoAdjustment);
        return new UnixTime(d.seconds(), d.nano());
    }

    /** Reads decimal seconds, e.g. {@code 1483228800.5}; finer than 1 ns is rounded half-even and reported. */
    public static Conversion<UnixTime> parse(String text) {
        return DecimalSeconds.parse(text, "Unix seconds").map(d -> new UnixTime(d.seconds(), d.nano()));
    }

    /** The Unix value of a UTC label (23:59:60.x gives the value of the next day's 00:00:00.x). */
    public static UnixTime ofLabel(DateTimeLabel utc) {
        return of(Math.multiplyExact(utc.epochDay(), 86_400L), utc.nanoOfDay());
    }

    /** The UTC label this value names (never 23:59:60). */
    public DateTimeLabel toLabel() {
        return DateTimeLabel.ofEpochDay(Math.floorDiv(seconds, 86_400L),
            Math.floorMod(seconds, 86_400L) * 1_000_000_000L + nano);
    }

    /** As exact decimal seconds. */
    public DecimalSeconds toDecimalSeconds() {
        return DecimalSeconds.of(seconds, nano);
    }

    @Override
    public int compareTo(UnixTime o) {
        int c = Long.compare(seconds, o.seconds);
        return c != 0 ? c : Integer.compare(nano, o.nano);
    }

    /** Exact decimal text, e.g. {@code 1483228800.500}. */
    @Override
    public String toString() {
        return DecimalSeconds.format(seconds, nano);
    }
}
