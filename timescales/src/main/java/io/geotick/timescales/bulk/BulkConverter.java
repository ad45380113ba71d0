package io.geotick.timescales.bulk;

import io.geotick.timescales.TimeScale;
import io.geotick.timescales.encoding.WeekSystem;
import io.geotick.timescales.utc.UtcModel;
import java.util.Objects;

/**
 * Array conversions between Unix time (UTC) and GPS week / time of week, exact and allocation-free.
 *
 * <p>Same rules as {@link io.geotick.timescales.TimeConverter}, restricted to what arrays of numbers can hold:
 * Unix input names the non-leap second (see {@link io.geotick.timescales.encoding.UnixTime}); GPS instants
 * inside a leap second give the repeated Unix value. Instead of warning objects, each method returns a bit set
 * of {@link #PAST_EXPIRY} and {@link #LEAP_SECOND_REPEAT}, telling whether any element of the range was past
 * the table's expiry or inside a leap second. Only 1972-01-01 onwards (integer leap seconds); earlier values
 * raise {@link io.geotick.timescales.TimeInputException}. Thread-safe (no state besides the immutable model).
 */
public final class BulkConverter {
    /** Flag: some element lay at or after the leap table's expiry (no further leap seconds assumed). */
    public static final int PAST_EXPIRY = 1;
    /** Flag: some element lay inside a leap second, so its Unix value repeats the following second's. */
    public static final int LEAP_SECOND_REPEAT = 2;

    private static final long NANOS = 1_000_000_000L;
    private static final long GPS_MINUS_TAI = -TimeScale.GPS.taiMinusScaleNanos() / NANOS; // -19
    private static final WeekSystem GPS = WeekSystem.GPS;

    private final UtcModel utc;
    private final long expiryTai;

    /** A bulk converter over a UTC model (e.g. {@code TimeConverter.utcModel()}). */
    public static BulkConverter of(UtcModel utc) {
        return new BulkConverter(utc);
    }

    private BulkConverter(UtcModel utc) {
        this.utc = Objects.requireNonNull(utc, "utc");
        this.expiryTai = utc.expiryTaiSeconds();
    }

    /**
     * Unix seconds and nanoseconds to GPS full week and time of week in nanoseconds, for indices
     * {@code [from, to)}.
     *
     * @return a bit set of {@link #PAST_EXPIRY}
     */
    public int unixToGpsWeek(long[] unixSeconds, int[] nanos, int from, int to, int[] weekOut, long[] towNanosOut) {
        int flags = 0;
        for (int i = from; i < to; i++) {
            long tai = utc.unixToTaiSeconds(unixSeconds[i]);
            if (tai >= expiryTai) {
                flags |= PAST_EXPIRY;
            }
            long gps = tai + GPS_MINUS_TAI;
            weekOut[i] = (int) GPS.weekOfScaleSeconds(gps);
            towNanosOut[i] = GPS.secondOfWeekOfScaleSeconds(gps) * NANOS + nanos[i];
        }
        return flags;
    }

    /**
     * GPS full week and time of week in nanoseconds to Unix seconds and nanoseconds, for indices
     * {@code [from, to)}.
     *
     * @return a bit set of {@link #PAST_EXPIRY} and {@link #LEAP_SECOND_REPEAT}
     */
    public int gpsWeekToUnix(int[] week, long[] towNanos, int from, int to, long[] unixSecondsOut, int[] nanosOut) {
        int flags = 0;
        for (int i = from; i < to; i++) {
            long tow = towNanos[i];
            long gps = GPS.scaleSecondsOf(week[i], tow / NANOS);
            long tai = gps - GPS_MINUS_TAI;
            if (tai >= expiryTai) {
                flags |= PAST_EXPIRY;
            }
            if (utc.isInsideLeapSecond(tai)) {
                flags |= LEAP_SECOND_REPEAT;
            }
            unixSecondsOut[i] = utc.taiSecondsToUnix(tai);
            nanosOut[i] = (int) (tow % NANOS);
        }
        return flags;
    }

    /** Single value: the GPS seconds since 1980-01-06T00:00:00 GPS of a Unix second. Allocation-free. */
    public long unixToGpsSecondsSinceEpoch(long unixSeconds) {
        return utc.unixToTaiSeconds(unixSeconds) + GPS_MINUS_TAI - GPS.scaleSecondsOf(0, 0);
    }
}
