package io.geotick.timescales.utc;

import io.geotick.timescales.Conversion;
import io.geotick.timescales.ScaleInstant;
import io.geotick.timescales.TimeInputException;
import io.geotick.timescales.TimeWarning;
import io.geotick.timescales.calendar.DateTimeLabel;
import java.math.BigInteger;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;

/**
 * The smeared-UTC clock: UTC outside the smear windows; inside a window of label length L around a step of
 * &delta; (a leap second: &plusmn;1 s), the clock runs at the constant rate L / (L + &delta;) so that it covers L of
 * labels while L + &delta; SI seconds pass, and never shows 23:59:60.
 *
 * <p>Formula: for TAI t in [W0, W1), label = S + (t &minus; W0) &times; L / (W1 &minus; W0), where S is the
 * window's first UTC label and W0, W1 = TAI of the UTC labels S and S + L (so W1 &minus; W0 = L + &delta; since
 * 1972). The rational result is rounded half-even to the nanosecond (&le; 0.5 ns; reported when inexact).
 * Every step of UTC is smeared the same way: the leap seconds, the 0.107758 s step into 1972 and the
 * fractional steps of 1961&ndash;1968, so a smeared clock never shows second 60. Immutable.
 */
public final class SmearedUtc {
    private static final long NANOS = 1_000_000_000L;

    private final UtcModel utc;
    private final SmearWindow window;
    private final long[] labelStart; // window start label, ns since 1970 label
    private final long[] labelEnd;
    private final long[] taiStart;   // TAI ns since 1970 TAI
    private final long[] taiEnd;

    /** The smeared clock over a UTC model, with the given window. */
    public static SmearedUtc of(UtcModel utc, SmearWindow window) {
        return new SmearedUtc(utc, window);
    }

    private SmearedUtc(UtcModel utc, SmearWindow window) {
        this.utc = utc;
        this.window = window;
        List<LocalDate> steps = utc.stepDates();
        int n = steps.size();
        labelStart = new long[n];
        labelEnd = new long[n];
        taiStart = new long[n];
        taiEnd = new long[n];
        for (int k = 0; k < n; k++) {
            long leapLabel = steps.get(k).toEpochDay() * DateTimeLabel.NANOS_PER_DAY;
            labelStart[k] = leapLabel + window.startNanos();
            labelEnd[k] = labelStart[k] + window.lengthNanos();
            if (k > 0 && labelStart[k] < labelEnd[k - 1]) {
                throw new TimeInputException("smear window " + window + " is too long: the windows of the steps on "
                    + steps.get(k - 1) + " and " + steps.get(k) + " overlap");
            }
            taiStart[k] = taiNanos(utc, labelStart[k]);
            taiEnd[k] = taiNanos(utc, labelEnd[k]);
        }
    }

    private static long taiNanos(UtcModel utc, long labelNanos) {
        DateTimeLabel l = DateTimeLabel.ofEpochDay(Math.floorDiv(labelNanos, DateTimeLabel.NANOS_PER_DAY),
            Math.floorMod(labelNanos, DateTimeLabel.NANOS_PER_DAY));
        ScaleInstant t = utc.toTai(l).value();
        return t.taiSeconds() * NANOS + t.nano();
    }

    /** The window used. */
    public SmearWindow window() {
        return window;
    }

    /** The TAI instant of a smeared-UTC label. */
    public Conversion<ScaleInstant> toTai(DateTimeLabel label) {
        if (label.isLeapSecondLabel()) {
            throw new TimeInputException("smeared-UTC label " + label + " does not exist: a smeared clock never "
                + "shows second 60");
        }
        long l = labelNanos(label);
        int k = find(labelStart, labelEnd, l);
        if (k < 0) {
            return utc.toTai(label);
        }
        long len = window.lengthNanos();
        BigInteger num = BigInteger.valueOf(l - labelStart[k]).multiply(BigInteger.valueOf(taiEnd[k] - taiStart[k]));
        return result(taiStart[k], num, len, "TAI of smeared-UTC label " + label).map(ns -> ScaleInstant.ofTai(
            Math.floorDiv(ns, NANOS), Math.floorMod(ns, NANOS))).withWarnings(expiry(
                Math.floorDiv(taiStart[k], NANOS)));
    }

    /** The smeared-UTC label of a TAI instant. */
    public Conversion<DateTimeLabel> toLabel(ScaleInstant tai) {
        long t = taiNanosOrClamp(tai);
        int k = find(taiStart, taiEnd, t);
        if (k < 0) {
            return utc.toLabel(tai);
        }
        BigInteger num = BigInteger.valueOf(t - taiStart[k]).multiply(BigInteger.valueOf(window.lengthNanos()));
        return result(labelStart[k], num, taiEnd[k] - taiStart[k], "smeared-UTC label of " + tai)
            .map(ns -> DateTimeLabel.ofEpochDay(Math.floorDiv(ns, DateTimeLabel.NANOS_PER_DAY),
                Math.floorMod(ns, DateTimeLabel.NANOS_PER_DAY)))
            .withWarnings(expiry(tai.taiSeconds()));
    }

    private List<TimeWarning> expiry(long taiSeconds) {
        return taiSeconds >= utc.expiryTaiSeconds() ? List.of(utc.expiredWarning()) : List.of();
    }

    private static Conversion<Long> result(long base, BigInteger num, long den, String what) {
        BigInteger[] qr = num.divideAndRemainder(BigInteger.valueOf(den));
        long v = base + UtcModel.divideHalfEven(num, BigInteger.valueOf(den));
        List<TimeWarning> w = new ArrayList<>(1);
        if (qr[1].signum() != 0) {
            w.add(TimeWarning.rounded(what));
        }
        return Conversion.of(v, w);
    }

    private static int find(long[] starts, long[] ends, long x) {
        for (int k = 0; k < starts.length; k++) {
            if (x < starts[k]) {
                return -1;
            }
            if (x < ends[k]) {
                return k;
            }
        }
        return -1;
    }

    private static long labelNanos(DateTimeLabel l) {
        if (Math.abs(l.epochDay()) > 100_000L) { // beyond 2243: no window there; avoid overflow
            return l.epochDay() > 0 ? Long.MAX_VALUE : Long.MIN_VALUE;
        }
        return l.epochDay() * DateTimeLabel.NANOS_PER_DAY + l.nanoOfDay();
    }

    private static long taiNanosOrClamp(ScaleInstant t) {
        if (t.taiSeconds() > Long.MAX_VALUE / NANOS - 1) {
            return Long.MAX_VALUE;
        }
        if (t.taiSeconds() < Long.MIN_VALUE / NANOS + 1) {
            return Long.MIN_VALUE;
        }
        return t.taiSeconds() * NANOS + t.nano();
    }
}
