package io.geotick.timescales.encoding;

import io.geotick.timescales.Conversion;
import io.geotick.timescales.TimeInputException;
import io.geotick.timescales.TimeScale;
import io.geotick.timescales.TimeWarning;
import io.geotick.timescales.calendar.DateTimeLabel;
import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.List;
import java.util.Objects;

/**
 * A Modified Julian Date (and its Julian Date) on a named scale: whole MJD day plus nanoseconds of an
 * 86 400-second day. MJD = JD &minus; 2 400 000.5; MJD 0 is 1858-11-17T00:00:00 on the scale.
 *
 * <p>Exactness: held exactly. Decimal day text is rounded half-even to {@link #DECIMALS} = 14 decimals of a
 * day (0.864 ns; error &le; 0.432 ns), so reading the printed value back gives the same nanosecond. Reading
 * decimal text rounds the day fraction to the nanosecond (half-even) and reports it when inexact.
 * On UTC (and GLONASS), the leap second 23:59:60.x has no value of its own: it is given the value of the next
 * day's 00:00:00.x (as with Unix time; see {@link UnixTime}). Immutable.
 *
 * @param scale     the scale whose label the date counts
 * @param mjd       whole MJD day
 * @param nanoOfDay nanoseconds into the day, 0 &le; n &lt; 86 400 &times; 10<sup>9</sup>
 */
public record JulianDate(TimeScale scale, long mjd, long nanoOfDay) {
    /** Decimals of a day printed: 14 (resolution 0.864 ns). */
    public static final int DECIMALS = 14;
    /** MJD of 1970-01-01. */
    public static final long MJD_OF_UNIX_EPOCH = 40_587L;
    private static final BigDecimal NPD = BigDecimal.valueOf(DateTimeLabel.NANOS_PER_DAY);
    private static final BigDecimal JD_MINUS_MJD = new BigDecimal("2400000.5");

    public JulianDate {
        Objects.requireNonNull(scale, "scale");
        if (nanoOfDay < 0 || nanoOfDay >= DateTimeLabel.NANOS_PER_DAY) {
            throw new TimeInputException("nanosecond of day " + nanoOfDay + " out of range");
        }
    }

    /** The date of a label on {@code scale} (23:59:60.x counts as the next day's 00:00:00.x). */
    public static JulianDate ofLabel(TimeScale scale, DateTimeLabel label) {
        long n = label.nanoOfDay();
        long day = label.epochDay() + MJD_OF_UNIX_EPOCH;
        if (n >= DateTimeLabel.NANOS_PER_DAY) {
            n -= DateTimeLabel.NANOS_PER_DAY;
            day++;
        }
        return new JulianDate(scale, day, n);
    }

    /** Reads a decimal MJD, e.g. {@code 57754.5}. */
    public static Conversion<JulianDate> parseMjd(TimeScale scale, String text) {
        return parse(scale, text, BigDecimal.ZERO, "MJD");
    }

    /** Reads a decimal JD, e.g. {@code 2457755.0}. */
    public static Conversion<JulianDate> parseJd(TimeScale scale, String text) {
        return parse(scale, text, JD_MINUS_MJD, "JD");
    }

    private static Conversion<JulianDate> parse(TimeScale scale, String text, BigDecimal minus, String what) {
        BigDecimal v;
        try {
            v = new BigDecimal(text.trim());
        } catch (NumberFormatException e) {
            throw new TimeInputException(what + " '" + text + "' is not a decimal number", e);
        }
        BigDecimal mjd = v.subtract(minus);
        BigDecimal day = mjd.setScale(0, RoundingMode.FLOOR);
        BigDecimal nanos = mjd.subtract(day).multiply(NPD);
        BigDecimal rounded = nanos.setScale(0, RoundingMode.HALF_EVEN);
        long d;
        long n;
        try {
            d = day.longValueExact();
            n = rounded.longValueExact();
        } catch (ArithmeticException e) {
            throw new TimeInputException(what + " '" + text + "' is out of range", e);
        }
        if (n == DateTimeLabel.NANOS_PER_DAY) {
            d++;
            n = 0;
        }
        List<TimeWarning> w = nanos.compareTo(rounded) == 0 ? List.of()
            : List.of(TimeWarning.rounded(what + " '" + text + "'"));
        return Conversion.of(new JulianDate(scale, d, n), w);
    }

    /** The label on {@link #scale()} (never 23:59:60). */
    public DateTimeLabel toLabel() {
        return DateTimeLabel.ofEpochDay(mjd - MJD_OF_UNIX_EPOCH, nanoOfDay);
    }

    /** The MJD as a decimal rounded half-even to {@link #DECIMALS} decimals, trailing zeros dropped. */
    public BigDecimal mjdDecimal() {
        BigDecimal v = BigDecimal.valueOf(mjd).add(BigDecimal.valueOf(nanoOfDay).divide(NPD, DECIMALS,
            RoundingMode.HALF_EVEN));
        return strip(v);
    }

    /** The JD as a decimal rounded half-even to {@link #DECIMALS} decimals, trailing zeros dropped. */
    public BigDecimal jdDecimal() {
        BigDecimal v = BigDecimal.valueOf(mjd).add(JD_MINUS_MJD).add(BigDecimal.valueOf(nanoOfDay).divide(NPD,
            DECIMALS, RoundingMode.HALF_EVEN));
        return strip(v);
    }

    private static BigDecimal strip(BigDecimal v) {
        BigDecimal s = v.stripTrailingZeros();
        return s.scale() < 1 ? s.setScale(1) : s;
    }

    /** For example {@code MJD 57754.5 (tt)}. */
    @Override
    public String toString() {
        return "MJD " + mjdDecimal().toPlainString() + " (" + scale.id() + ")";
    }
}
