package io.geotick.timescales.calendar;

import io.geotick.timescales.TimeInputException;
import io.geotick.timescales.encoding.DecimalSeconds;
import java.time.DateTimeException;
import java.time.LocalDate;
import java.time.Month;
import java.util.Locale;
import java.util.Objects;

/**
 * A calendar label: proleptic Gregorian date, time of day and nanoseconds, with seconds 0&ndash;60.
 *
 * <p>The label does not say which scale it is on, nor whether a second of 60 exists on that scale at that
 * date; {@link io.geotick.timescales.TimeConverter} checks that (UTC has 23:59:60 only at the end of a day
 * on which a leap second was inserted; uniform scales never have it). Years 0000&ndash;9999. Immutable.
 */
public final class DateTimeLabel implements Comparable<DateTimeLabel> {
    /** Nanoseconds in an 86 400-second day. */
    public static final long NANOS_PER_DAY = 86_400_000_000_000L;
    private static final long NANOS = 1_000_000_000L;

    private final LocalDate date;
    private final int hour;
    private final int minute;
    private final int second;
    private final int nano;

    private DateTimeLabel(LocalDate date, int hour, int minute, int second, int nano) {
        this.date = date;
        this.hour = hour;
        this.minute = minute;
        this.second = second;
        this.nano = nano;
    }

    /**
     * A label from its fields; {@code second} may be 60 (a leap-second label).
     *
     * @throws TimeInputException naming the field and value when one is out of range
     */
    public static DateTimeLabel of(int year, int month, int day, int hour, int minute, int second, int nano) {
        return of(year, month, day, hour, minute, second, nano, null);
    }

    static DateTimeLabel of(int year, int month, int day, int hour, int minute, int second, int nano,
                            String text) {
        String in = text == null ? "" : " in '" + text + "'";
        check(year, 0, 9999, "year", in);
        check(month, 1, 12, "month", in);
        check(hour, 0, 23, "hour", in);
        check(minute, 0, 59, "minute", in);
        check(second, 0, 60, "second", in);
        check(nano, 0, 999_999_999, "nanosecond", in);
        LocalDate date;
        try {
            date = LocalDate.of(year, month, day);
        } catch (DateTimeException e) {
            String name = Month.of(month).name();
            String monthName = name.charAt(0) + name.substring(1).toLowerCase(Locale.ROOT);
            throw new TimeInputException("day " + day + " does not exist in " + monthName + " " + year + in, e);
        }
        return new DateTimeLabel(date, hour, minute, second, nano);
    }

    /** The label of day {@code dayOfYear} (1&ndash;366) of {@code year}. */
    public static DateTimeLabel ofYearDay(int year, int dayOfYear, int hour, int minute, int second, int nano) {
        return ofYearDay(year, dayOfYear, hour, minute, second, nano, null);
    }

    static DateTimeLabel ofYearDay(int year, int dayOfYear, int hour, int minute, int second, int nano,
                                   String text) {
        String in = text == null ? "" : " in '" + text + "'";
        check(year, 0, 9999, "year", in);
        int len = LocalDate.of(year, 1, 1).lengthOfYear();
        check(dayOfYear, 1, len, "day of year", in);
        LocalDate d = LocalDate.ofYearDay(year, dayOfYear);
        return of(year, d.getMonthValue(), d.getDayOfMonth(), hour, minute, second, nano, text);
    }

    private static void check(long v, long lo, long hi, String field, String in) {
        if (v < lo || v > hi) {
            throw new TimeInputException(field + " " + v + " is out of range " + lo + "-" + hi + in);
        }
    }

    /**
     * The label {@code nanoOfDay} nanoseconds into day {@code epochDay} (days since 1970-01-01). A nanosecond
     * of day from 86 400 s up to 86 401 s gives the leap-second label 23:59:60.
     */
    public static DateTimeLabel ofEpochDay(long epochDay, long nanoOfDay) {
        if (nanoOfDay < 0 || nanoOfDay >= NANOS_PER_DAY + NANOS) {
            throw new TimeInputException("nanosecond of day " + nanoOfDay + " is out of range");
        }
        LocalDate d;
        try {
            d = LocalDate.ofEpochDay(epochDay);
        } catch (DateTimeException e) {
            throw new TimeInputException("day " + epochDay + " since 1970-01-01 is out of range", e);
        }
        if (d.getYear() < 0 || d.getYear() > 9999) {
            throw new TimeInputException("year " + d.getYear() + " is out of range 0-9999");
        }
        if (nanoOfDay >= NANOS_PER_DAY) {
            return new DateTimeLabel(d, 23, 59, 60, (int) (nanoOfDay - NANOS_PER_DAY));
        }
        long sod = nanoOfDay / NANOS;
        return new DateTimeLabel(d, (int) (sod / 3600), (int) (sod / 60 % 60), (int) (sod % 60),
            (int) (nanoOfDay % NANOS));
    }

    /**
     * Reads ISO 8601 text without a zone (see {@link IsoText#parse} for the accepted forms).
     *
     * @throws TimeInputException naming the text when it is malformed, has a zone, or a field is out of range
     */
    public static DateTimeLabel parse(String text) {
        IsoText t = IsoText.parse(text).value();
        if (t.isZoned()) {
            throw new TimeInputException("'" + text + "' has a zone designator; a plain label was expected");
        }
        return t.label();
    }

    public int year() {
        return date.getYear();
    }

    public int month() {
        return date.getMonthValue();
    }

    public int day() {
        return date.getDayOfMonth();
    }

    public int dayOfYear() {
        return date.getDayOfYear();
    }

    public int hour() {
        return hour;
    }

    public int minute() {
        return minute;
    }

    /** Second of minute, 0&ndash;60. */
    public int second() {
        return second;
    }

    public int nano() {
        return nano;
    }

    /** The date part. */
    public LocalDate date() {
        return date;
    }

    /** Days since 1970-01-01 of the date. */
    public long epochDay() {
        return date.toEpochDay();
    }

    /** True for a second-60 label. */
    public boolean isLeapSecondLabel() {
        return second == 60;
    }

    /** Seconds since the start of the day by the label's fields: hh&times;3600 + mm&times;60 + ss (ss up to 60). */
    public int secondOfDay() {
        return hour * 3600 + minute * 60 + second;
    }

    /** Nanoseconds since the start of the day by the label's fields (23:59:60.5 gives 86 400.5 s). */
    public long nanoOfDay() {
        return secondOfDay() * NANOS + nano;
    }

    /**
     * This label moved by {@code seconds} of label time (86 400-second days), keeping a second of 60: the
     * label hh:mm:60 becomes the shifted hh:mm:59 with its second set back to 60. Used for GLONASS time
     * (UTC + 3 h, whose leap second is 02:59:60) and for ISO 8601 UTC offsets.
     */
    public DateTimeLabel shiftedKeepingLeapSecond(long seconds) {
        boolean leap = second == 60;
        long epochSecond = Math.addExact(Math.addExact(Math.multiplyExact(epochDay(), 86_400L),
            secondOfDay() - (leap ? 1 : 0)), seconds);
        DateTimeLabel l = ofEpochDay(Math.floorDiv(epochSecond, 86_400L),
            Math.floorMod(epochSecond, 86_400L) * NANOS + nano);
        return leap ? new DateTimeLabel(l.date, l.hour, l.minute, 60, l.nano) : l;
    }

    /** The same date and time with another nanosecond field. */
    public DateTimeLabel withNano(int newNano) {
        return of(year(), month(), day(), hour, minute, second, newNano);
    }

    /** ISO 8601 extended calendar text, e.g. {@code 2016-12-31T23:59:60.500}; fraction in groups of 3 digits. */
    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder(32);
        DecimalSeconds.pad(sb, year(), 4);
        sb.append('-');
        DecimalSeconds.pad(sb, month(), 2);
        sb.append('-');
        DecimalSeconds.pad(sb, day(), 2);
        sb.append('T');
        DecimalSeconds.pad(sb, hour, 2);
        sb.append(':');
        DecimalSeconds.pad(sb, minute, 2);
        sb.append(':');
        DecimalSeconds.pad(sb, second, 2);
        DecimalSeconds.appendFraction(sb, nano);
        return sb.toString();
    }

    /** ISO 8601 ordinal date, e.g. {@code 2016-366}. */
    public String toOrdinalDate() {
        return String.format("%04d-%03d", year(), dayOfYear());
    }

    /** ISO 8601 ordinal text with time, e.g. {@code 2016-366T23:59:60.500}. */
    public String toOrdinalString() {
        return toOrdinalDate() + toString().substring(10);
    }

    /** Orders by the fields (label order, which is time order on any one scale). */
    @Override
    public int compareTo(DateTimeLabel o) {
        int c = date.compareTo(o.date);
        if (c != 0) {
            return c;
        }
        c = Integer.compare(secondOfDay(), o.secondOfDay());
        return c != 0 ? c : Integer.compare(nano, o.nano);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof DateTimeLabel l && l.date.equals(date) && l.hour == hour && l.minute == minute
            && l.second == second && l.nano == nano;
    }

    @Override
    public int hashCode() {
        return Objects.hash(date, hour, minute, second, nano);
    }
}
