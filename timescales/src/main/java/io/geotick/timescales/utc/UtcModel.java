package io.geotick.timescales.utc;

import io.geotick.timescales.Conversion;
import io.geotick.timescales.ScaleInstant;
import io.geotick.timescales.TimeInputException;
import io.geotick.timescales.TimeWarning;
import io.geotick.timescales.calendar.DateTimeLabel;
import io.geotick.timescales.encoding.DecimalSeconds;
import io.geotick.timescales.leap.LeapEntry;
import io.geotick.timescales.leap.LeapTable;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.RoundingMode;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;

/**
 * UTC labels &harr; TAI, from the 1961&ndash;1971 table ({@link EarlyUtcTable}) followed by a
 * {@link LeapTable}. Immutable and thread-safe.
 *
 * <p>Model: UTC is a sequence of segments, each starting at 00:00 UTC of a day, within which
 * TAI = label + A + (MJD &minus; B) &times; C (C = 0 since 1972). Where TAI &minus; UTC increases by &delta; at the
 * start of a day, the previous day gains the labels 23:59:60.000&hellip; up to (not including) 23:59:60 + &delta;
 * (ITU-R TF.460-6: a positive leap second is 23:59:60; before 1972 the fractional steps are labelled the same
 * way). Where it decreases, the last &delta; seconds of labels of the previous day do not exist.
 *
 * <p>Exactness: since 1972 every conversion is exact. From 1961 to 1971 the offset is a linear function of
 * the label, evaluated exactly and rounded half-even to the nanosecond (&le; 0.5 ns, reported as a
 * {@link TimeWarning.Kind#ROUNDED} warning when inexact). Before 1961-01-01 UTC is not defined here and every
 * conversion fails with a {@link TimeInputException}.
 *
 * <p>Conversions of instants at or after the table's expiry carry a {@link TimeWarning.Kind#TABLE_EXPIRED}
 * warning; the last offset is then assumed to hold.
 */
public final class UtcModel {
    private static final long NANOS = 1_000_000_000L;
    private static final long NPD = DateTimeLabel.NANOS_PER_DAY;
    private static final long MJD_OF_EPOCH_DAY_0 = 40_587L;

    private final LeapTable table;
    private final int count;
    private final long[] startDay;
    private final long[] aNanos;
    private final long[] bDay;
    private final long[] cNanosPerDay;
    private final long[] stepNanos;
    private final long[] startTaiNanos; // TAI ns since 1970 TAI of each segment's 00:00 label (1961..2262)
    private final int firstLeap;         // index of the 1972-01-01 segment

    // Hot path (since 1972), indexed from firstLeap: label (Unix) seconds, TAI seconds, offsets.
    private final long[] leapStartUnix;
    private final long[] leapStartTai;
    private final long[] leapOffset;
    private final long expiryTaiSeconds;
    private final TimeWarning expiredWarning;
    // Day-indexed lookup tables for the leap era: entry d is the leap index in force at the start of
    // Unix day (resp. TAI day) firstTableDay + d; days after the table use the last index.
    private final long firstTableDay;
    private final short[] indexByUnixDay;
    private final short[] indexByTaiDay;

    private UtcModel(LeapTable table) {
        this.table = table;
        List<EarlyUtcTable> early = EarlyUtcTable.ROWS;
        List<LeapEntry> leaps = table.entries();
        count = early.size() + leaps.size();
        startDay = new long[count];
        aNanos = new long[count];
        bDay = new long[count];
        cNanosPerDay = new long[count];
        for (int i = 0; i < early.size(); i++) {
            EarlyUtcTable r = early.get(i);
            startDay[i] = r.start().toEpochDay();
            aNanos[i] = r.aNanos();
            bDay[i] = r.bMjd() - MJD_OF_EPOCH_DAY_0;
            cNanosPerDay[i] = r.cNanosPerDay();
        }
        firstLeap = early.size();
        for (int k = 0; k < leaps.size(); k++) {
            startDay[firstLeap + k] = leaps.get(k).effective().toEpochDay();
            aNanos[firstLeap + k] = leaps.get(k).taiMinusUtc() * NANOS;
        }
        stepNanos = new long[count];
        startTaiNanos = new long[count];
        for (int i = 0; i < count; i++) {
            long off = offsetAtDayStart(i, startDay[i]);
            startTaiNanos[i] = Math.addExact(Math.multiplyExact(startDay[i], NPD), off);
            stepNanos[i] = i == 0 ? 0 : off - offsetAtDayStart(i - 1, startDay[i]);
        }
        int n = leaps.size();
        leapStartUnix = new long[n];
        leapStartTai = new long[n];
        leapOffset = new long[n];
        for (int k = 0; k < n; k++) {
            leapStartUnix[k] = startDay[firstLeap + k] * 86_400L;
            leapOffset[k] = leaps.get(k).taiMinusUtc();
            leapStartTai[k] = leapStartUnix[k] + leapOffset[k];
        }
        expiryTaiSeconds = table.expires().toEpochDay() * 86_400L + leapOffset[n - 1];
        expiredWarning = TimeWarning.expired(table.expires());
        if (n > Short.MAX_VALUE) {
            throw new IllegalArgumentException("too many leap-table entries: " + n);
        }
        firstTableDay = startDay[firstLeap];
        int days = (int) (startDay[count - 1] - firstTableDay + 2);
        indexByUnixDay = new short[days];
        indexByTaiDay = new short[days];
        for (int d = 0; d < days; d++) {
            long unixDayStart = (firstTableDay + d) * 86_400L;
            indexByUnixDay[d] = (short) searchUnix(unixDayStart);
            indexByTaiDay[d] = (short) Math.max(0, searchTai(unixDayStart));
        }
    }

    /** The model for a leap table (preceded by the built-in 1961&ndash;1971 table). */
    public static UtcModel of(LeapTable table) {
        return new UtcModel(table);
    }

    /** The leap table used from 1972. */
    public LeapTable leapTable() {
        return table;
    }

    private long offsetAtDayStart(int i, long day) {
        return aNanos[i] + (day - bDay[i]) * cNanosPerDay[i];
    }

    /** Index of the segment holding UTC day {@code epochDay}, or -1 before 1961. */
    private int segmentOfDay(long epochDay) {
        if (epochDay >= firstTableDay) {
            long d = epochDay - firstTableDay;
            return firstLeap + (d < indexByUnixDay.length ? indexByUnixDay[(int) d] : leapStartUnix.length - 1);
        }
        int lo = 0;
        int hi = count - 1;
        if (epochDay >= startDay[hi]) {
            return hi;
        }
        if (epochDay < startDay[0]) {
            return -1;
        }
        while (lo < hi) {
            int mid = (lo + hi + 1) >>> 1;
            if (startDay[mid] <= epochDay) {
                lo = mid;
            } else {
                hi = mid - 1;
            }
        }
        return lo;
    }

    /**
     * The TAI instant of a UTC label.
     *
     * @throws TimeInputException if the label does not exist: before 1961-01-01, 23:59:60 on a day without a
     *                            positive leap second (or beyond the fractional step before 1972), a second of
     *                            60 other than at 23:59, or a label removed by a negative step
     */
    public Conversion<ScaleInstant> toTai(DateTimeLabel label) {
        if (label.second() == 60 && (label.hour() != 23 || label.minute() != 59)) {
            throw new TimeInputException("UTC label " + label + " does not exist: a leap second is labelled "
                + "23:59:60 (ITU-R TF.460-6)");
        }
        long d = label.epochDay();
        int i = segmentOfDay(d);
        if (i < 0) {
            throw beforeUtc(label.toString());
        }
        long nod = label.nanoOfDay();
        List<TimeWarning> warnings = new ArrayList<>(1);
        ScaleInstant t;
        if (nod >= NPD) {
            int j = i + 1;
            if (j >= count || startDay[j] != d + 1 || stepNanos[j] <= 0) {
                throw noLeapSecond(label, d);
            }
            long x = nod - NPD;
            if (x >= stepNanos[j]) {
                throw new TimeInputException("UTC label " + label + " does not exist: the step at the end of "
                    + label.date() + " was only " + DecimalSeconds.ofNanos(stepNanos[j]) + " s");
            }
            t = taiOfNanos(startTaiNanos[j] - stepNanos[j] + x);
        } else if (i >= firstLeap) {
            long sec = d * 86_400L + nod / NANOS + aNanos[i] / NANOS;
            t = ScaleInstant.ofTai(sec, nod % NANOS);
        } else {
            BigInteger rate = BigInteger.valueOf(nod).multiply(BigInteger.valueOf(cNanosPerDay[i]));
            BigInteger[] qr = rate.divideAndRemainder(BigInteger.valueOf(NPD));
            long frac = divideHalfEven(rate, BigInteger.valueOf(NPD));
            if (qr[1].signum() != 0) {
                warnings.add(TimeWarning.rounded("TAI - UTC of " + label + " (1961-1971 rate)"));
            }
            long taiNs = d * NPD + nod + offsetAtDayStart(i, d) + frac;
            t = taiOfNanos(taiNs);
        }
        int j = i + 1;
        if (j < count && stepNanos[j] < 0 && nod < NPD && compareToNanos(t, startTaiNanos[j]) >= 0) {
            throw new TimeInputException("UTC label " + label + " does not exist: it was skipped by the "
                + DecimalSeconds.ofNanos(stepNanos[j]) + " s step at the end of " + label.date());
        }
        if (t.taiSeconds() >= expiryTaiSeconds) {
            warnings.add(expiredWarning);
        }
        return Conversion.of(t, warnings);
    }

    /**
     * The UTC label of a TAI instant (23:59:60.x inside a leap second).
     *
     * @throws TimeInputException if the instant is before 1961-01-01T00:00:00 UTC
     */
    public Conversion<DateTimeLabel> toLabel(ScaleInstant tai) {
        long s = tai.taiSeconds();
        int nano = tai.nano();
        List<TimeWarning> warnings = new ArrayList<>(1);
        if (s >= expiryTaiSeconds) {
            warnings.add(expiredWarning);
        }
        int k = segmentOfTai(s, nano);
        if (k < 0) {
            throw beforeUtc("TAI " + DecimalSeconds.format(s, nano) + " s since 1970");
        }
        int j = k + 1;
        if (j < count && stepNanos[j] > 0 && compareToNanos(tai, startTaiNanos[j] - stepNanos[j]) >= 0) {
            long x = nanosSince(tai, startTaiNanos[j] - stepNanos[j]);
            return Conversion.of(DateTimeLabel.ofEpochDay(startDay[j] - 1, NPD + x), warnings);
        }
        if (k >= firstLeap) {
            long label = s - aNanos[k] / NANOS;
            return Conversion.of(DateTimeLabel.ofEpochDay(Math.floorDiv(label, 86_400L),
                Math.floorMod(label, 86_400L) * NANOS + nano), warnings);
        }
        // 1961-1971: t = L (1 + C/NPD) + A - B C  =>  L = (t - A + B C) NPD / (NPD + C)
        BigInteger t = BigInteger.valueOf(s).multiply(BigInteger.valueOf(NANOS)).add(BigInteger.valueOf(nano));
        BigInteger num = t.subtract(BigInteger.valueOf(aNanos[k]))
            .add(BigInteger.valueOf(bDay[k]).multiply(BigInteger.valueOf(cNanosPerDay[k])))
            .multiply(BigInteger.valueOf(NPD));
        BigInteger den = BigInteger.valueOf(NPD + cNanosPerDay[k]);
        BigInteger[] qr = num.divideAndRemainder(den);
        if (qr[1].signum() != 0) {
            warnings.add(TimeWarning.rounded("UTC label of TAI " + DecimalSeconds.format(s, nano)
                + " s (1961-1971 rate)"));
        }
        long label = divideHalfEven(num, den);
        return Conversion.of(DateTimeLabel.ofEpochDay(Math.floorDiv(label, NPD), Math.floorMod(label, NPD)),
            warnings);
    }

    /**
     * TAI &minus; UTC at an instant: the TAI label minus the UTC label, with 23:59:60.x counted as 86 400 + x
     * seconds of its day (so inside a leap second the offset before the step is given). Exact since 1972,
     * rounded to the nanosecond 1961&ndash;1971.
     */
    public Conversion<DecimalSeconds> taiMinusUtc(ScaleInstant tai) {
        return toLabel(tai).map(l -> {
            DecimalSeconds utc = DecimalSeconds.of(l.epochDay() * 86_400L, l.nanoOfDay());
            return DecimalSeconds.of(tai.taiSeconds(), tai.nano()).minus(utc);
        });
    }

    /**
     * The UTC dates at whose start TAI &minus; UTC steps (up or down), oldest first: the fractional steps of
     * 1961&ndash;1971, the 0.107758 s step into 1972-01-01 and every leap second since.
     */
    public List<LocalDate> stepDates() {
        List<LocalDate> out = new ArrayList<>();
        for (int i = 1; i < count; i++) {
            if (stepNanos[i] != 0) {
                out.add(LocalDate.ofEpochDay(startDay[i]));
            }
        }
        return List.copyOf(out);
    }

    /** True if a TAI instant is at or after the table's expiry. */
    public boolean isPastExpiry(ScaleInstant tai) {
        return tai.taiSeconds() >= expiryTaiSeconds;
    }

    /** The warning given for instants past the expiry. */
    public TimeWarning expiredWarning() {
        return expiredWarning;
    }

    /** TAI seconds (since 1970 TAI) of 00:00:00 UTC on the expiry date. */
    public long expiryTaiSeconds() {
        return expiryTaiSeconds;
    }

    /**
     * For a UTC label in the first moments of a day that follows a positive step, the day whose extra labels
     * 23:59:60.x have the same Unix-like value (days &times; 86 400 + seconds of day) as this label; empty otherwise.
     * Used to flag Unix, NTP and Julian-date values that could name either instant.
     */
    public java.util.Optional<LocalDate> stepJustBefore(DateTimeLabel utcLabel) {
        if (utcLabel.isLeapSecondLabel()) {
            return java.util.Optional.empty();
        }
        long d = utcLabel.epochDay();
        int i = segmentOfDay(d);
        if (i >= 1 && startDay[i] == d && stepNanos[i] > 0 && utcLabel.nanoOfDay() < stepNanos[i]) {
            return java.util.Optional.of(LocalDate.ofEpochDay(d - 1));
        }
        return java.util.Optional.empty();
    }

    // ---- allocation-free primitives for the leap-second era (1972-01-01 onwards) ----

    private int leapIndexOfUnix(long unixSeconds) {
        long d = Math.floorDiv(unixSeconds, 86_400L) - firstTableDay;
        if (d < 0) {
            return -1;
        }
        return d < indexByUnixDay.length ? indexByUnixDay[(int) d] : leapStartUnix.length - 1;
    }

    private int leapIndexOfTai(long taiSeconds) {
        long d = Math.floorDiv(taiSeconds, 86_400L) - firstTableDay;
        if (d < 0) {
            return taiSeconds < leapStartTai[0] ? -1 : 0;
        }
        if (d >= indexByTaiDay.length) {
            return leapStartTai.length - 1;
        }
        int k = indexByTaiDay[(int) d];
        // at most one step inside a TAI day (it starts a few tens of seconds after the TAI midnight)
        return k + 1 < leapStartTai.length && taiSeconds >= leapStartTai[k + 1] ? k + 1 : k;
    }

    private int searchUnix(long unixSeconds) {
        int hi = leapStartUnix.length - 1;
        if (unixSeconds >= leapStartUnix[hi]) {
            return hi;
        }
        if (unixSeconds < leapStartUnix[0]) {
            return -1;
        }
        int lo = 0;
        while (lo < hi) {
            int mid = (lo + hi + 1) >>> 1;
            if (leapStartUnix[mid] <= unixSeconds) {
                lo = mid;
            } else {
                hi = mid - 1;
            }
        }
        return lo;
    }

    private int searchTai(long taiSeconds) {
        int hi = leapStartTai.length - 1;
        if (taiSeconds >= leapStartTai[hi]) {
            return hi;
        }
        if (taiSeconds < leapStartTai[0]) {
            return -1;
        }
        int lo = 0;
        while (lo < hi) {
            int mid = (lo + hi + 1) >>> 1;
            if (leapStartTai[mid] <= taiSeconds) {
                lo = mid;
            } else {
                hi = mid - 1;
            }
        }
        return lo;
    }

    /**
     * TAI &minus; UTC in whole seconds for a Unix (POSIX) second count, 1972-01-01 or later. Allocation-free.
     * A Unix value names the non-leap second (see {@link io.geotick.timescales.encoding.UnixTime}).
     *
     * @throws TimeInputException before 1972-01-01
     */
    public long taiMinusUtcAtUnix(long unixSeconds) {
        int k = leapIndexOfUnix(unixSeconds);
        if (k < 0) {
            throw new TimeInputException("Unix second " + unixSeconds
                + " is before 1972-01-01; use the label API for 1961-1971");
        }
        return leapOffset[k];
    }

    /** TAI seconds (since 1970 TAI) of a Unix second count, 1972-01-01 or later. Allocation-free. */
    public long unixToTaiSeconds(long unixSeconds) {
        return unixSeconds + taiMinusUtcAtUnix(unixSeconds);
    }

    /**
     * The Unix second count of a TAI second (1972-01-01 or later). Inside a positive leap second the value of
     * the following second is returned (Unix time repeats); see {@link #isInsideLeapSecond(long)}.
     * Allocation-free.
     */
    public long taiSecondsToUnix(long taiSeconds) {
        int k = leapIndexOfTai(taiSeconds);
        if (k < 0) {
            throw new TimeInputException("TAI second " + taiSeconds + " is before 1972-01-01 UTC");
        }
        return taiSeconds - leapOffset[k];
    }

    /** True if the TAI second (since 1970 TAI) is a positive leap second (UTC 23:59:60). Allocation-free. */
    public boolean isInsideLeapSecond(long taiSeconds) {
        int k = leapIndexOfTai(taiSeconds);
        int j = k + 1;
        return k >= 0 && j < leapStartTai.length && leapOffset[j] > leapOffset[k]
            && taiSeconds >= leapStartTai[j] - 1;
    }

    // ---- helpers ----

    private int segmentOfTai(long s, int nano) {
        if (s >= leapStartTai[0]) {
            return firstLeap + leapIndexOfTai(s);
        }
        if (s < Long.MIN_VALUE / NANOS + 1) {
            return -1;
        }
        long ns = s * NANOS + nano;
        int lo = 0;
        int hi = count - 1;
        if (ns >= startTaiNanos[hi]) {
            return hi;
        }
        if (ns < startTaiNanos[0]) {
            return -1;
        }
        while (lo < hi) {
            int mid = (lo + hi + 1) >>> 1;
            if (startTaiNanos[mid] <= ns) {
                lo = mid;
            } else {
                hi = mid - 1;
            }
        }
        return lo;
    }

    private static int compareToNanos(ScaleInstant t, long nanos) {
        int c = Long.compare(t.taiSeconds(), Math.floorDiv(nanos, NANOS));
        return c != 0 ? c : Integer.compare(t.nano(), (int) Math.floorMod(nanos, NANOS));
    }

    private static long nanosSince(ScaleInstant t, long nanos) {
        return (t.taiSeconds() - Math.floorDiv(nanos, NANOS)) * NANOS + t.nano() - Math.floorMod(nanos, NANOS);
    }

    private static ScaleInstant taiOfNanos(long ns) {
        return ScaleInstant.ofTai(Math.floorDiv(ns, NANOS), Math.floorMod(ns, NANOS));
    }

    /** {@code num / den} rounded half-even to an integer. */
    static long divideHalfEven(BigInteger num, BigInteger den) {
        return new BigDecimal(num).divide(new BigDecimal(den), 0, RoundingMode.HALF_EVEN).longValueExact();
    }

    private TimeInputException noLeapSecond(DateTimeLabel label, long day) {
        String extra = table.isExpiredOn(LocalDate.ofEpochDay(day)) ? " (the leap table expired on "
            + table.expires() + "; a leap second announced since is not known to it)" : "";
        return new TimeInputException("UTC label " + label + " does not exist: there was no leap second at the "
            + "end of " + label.date() + extra);
    }

    private static TimeInputException beforeUtc(String what) {
        return new TimeInputException(what + " is before 1961-01-01 UTC: TAI - UTC is not defined before the "
            + "1961 offset table");
    }
}
