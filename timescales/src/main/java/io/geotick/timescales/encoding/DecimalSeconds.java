package io.geotick.timescales.encoding;

import io.geotick.timescales.Conversion;
import io.geotick.timescales.TimeInputException;
import io.geotick.timescales.TimeWarning;
import java.math.BigDecimal;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * An exact signed count of seconds with nanosecond resolution, read from and written as decimal text.
 *
 * <p>Held as whole seconds (floor) plus nanoseconds 0&ndash;999 999 999. Text with more than nine fraction
 * digits is rounded half-even to the nanosecond and the rounding is reported. Immutable.
 */
public final class DecimalSeconds implements Comparable<DecimalSeconds> {
    private static final long NANOS = 1_000_000_000L;
    private static final Pattern NUMBER = Pattern.compile("([+-]?)(\\d*)(?:\\.(\\d*))?");

    /** Zero seconds. */
    public static final DecimalSeconds ZERO = new DecimalSeconds(0, 0);

    private final long seconds;
    private final int nano;

    private DecimalSeconds(long seconds, int nano) {
        this.seconds = seconds;
        this.nano = nano;
    }

    /** {@code seconds} plus {@code nanoAdjustment} nanoseconds (any sign). */
    public static DecimalSeconds of(long seconds, long nanoAdjustment) {
        long s = Math.addExact(seconds, Math.floorDiv(nanoAdjustment, NANOS));
        return new DecimalSeconds(s, (int) Math.floorMod(nanoAdjustment, NANOS));
    }

    /** A count of nanoseconds. */
    public static DecimalSeconds ofNanos(long nanos) {
        return of(0, nanos);
    }

    /**
     * Reads decimal text such as {@code 1483228800}, {@code -12.5} or {@code 604799.999999999}. More than nine
     * fraction digits are rounded half-even to the nanosecond; the result then carries a
     * {@link TimeWarning.Kind#ROUNDED} warning.
     *
     * @param text the number
     * @param what how to name the value in messages, e.g. {@code "Unix seconds"}
     * @throws TimeInputException naming the text if it is not a plain decimal number or is out of range
     */
    public static Conversion<DecimalSeconds> parse(String text, String what) {
        String t = text.trim();
        Matcher m = NUMBER.matcher(t);
        String intPart = m.matches() ? m.group(2) : "";
        String frac = m.matches() && m.group(3) != null ? m.group(3) : "";
        if (!m.matches() || (intPart.isEmpty() && frac.isEmpty())) {
            throw new TimeInputException(what + " '" + text + "' is not a decimal number");
        }
        boolean negative = "-".equals(m.group(1));
        long whole;
        try {
            whole = intPart.isEmpty() ? 0 : Long.parseLong(intPart);
        } catch (NumberFormatException e) {
            throw new TimeInputException(what + " '" + text + "' is out of range", e);
        }
        long n = 0;
        for (int i = 0; i < 9; i++) {
            n = n * 10 + (i < frac.length() ? frac.charAt(i) - '0' : 0);
        }
        boolean rounded = false;
        if (frac.length() > 9) {
            String rest = frac.substring(9);
            if (!rest.chars().allMatch(c -> c == '0')) {
                rounded = true;
                int first = rest.charAt(0) - '0';
                boolean restAfterFirstZero = rest.substring(1).chars().allMatch(c -> c == '0');
                boolean up = first > 5 || (first == 5 && (!restAfterFirstZero || (n % 2 == 1)));
                if (up) {
                    n++;
                }
            }
        }
        long totalSec = whole + n / NANOS;
        n %= NANOS;
        DecimalSeconds v = negative ? of(-totalSec, -n) : of(totalSec, n);
        return Conversion.of(v, rounded ? List.of(TimeWarning.rounded(what + " '" + text + "'")) : List.of());
    }

    /** Whole seconds (floor: &minus;0.5 s has {@code seconds() == -1} and {@code nano() == 500000000}). */
    public long seconds() {
        return seconds;
    }

    /** Nanoseconds 0&ndash;999 999 999 added to {@link #seconds()}. */
    public int nano() {
        return nano;
    }

    /** The value in nanoseconds; throws {@link ArithmeticException} beyond about &plusmn;292 years. */
    public long toNanos() {
        return Math.addExact(Math.multiplyExact(seconds, NANOS), nano);
    }

    /** The exact value as a {@link BigDecimal} with scale 9. */
    public BigDecimal toBigDecimal() {
        return BigDecimal.valueOf(seconds).add(BigDecimal.valueOf(nano, 9));
    }

    /** This plus another count. */
    public DecimalSeconds plus(DecimalSeconds o) {
        return of(Math.addExact(seconds, o.seconds), (long) nano + o.nano);
    }

    /** This minus another count. */
    public DecimalSeconds minus(DecimalSeconds o) {
        return of(Math.subtractExact(seconds, o.seconds), (long) nano - o.nano);
    }

    /** True if negative. */
    public boolean isNegative() {
        return seconds < 0;
    }

    @Override
    public int compareTo(DecimalSeconds o) {
        int c = Long.compare(seconds, o.seconds);
        return c != 0 ? c : Integer.compare(nano, o.nano);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof DecimalSeconds d && d.seconds == seconds && d.nano == nano;
    }

    @Override
    public int hashCode() {
        return Long.hashCode(seconds) * 31 + nano;
    }

    /**
     * Exact decimal text with the fraction in groups of three digits, trailing zero groups dropped:
     * {@code 17}, {@code 17.500}, {@code -0.000000001}.
     */
    @Override
    public String toString() {
        return format(seconds, nano);
    }

    /** Formats {@code seconds} (floor) + {@code nano} as exact decimal text, as {@link #toString()}. */
    public static String format(long seconds, int nano) {
        StringBuilder sb = new StringBuilder(24);
        long whole = seconds;
        long frac = nano;
        if (seconds < 0 && nano > 0) {
            whole = seconds + 1;
            frac = NANOS - nano;
        }
        if (seconds < 0) {
            sb.append('-');
            sb.append(whole == 0 ? "0" : Long.toString(whole).substring(1));
        } else {
            sb.append(whole);
        }
        appendFraction(sb, frac);
        return sb.toString();
    }

    /** Appends {@code .ddd[ddd[ddd]]} for a non-zero nanosecond count, nothing for zero. */
    public static void appendFraction(StringBuilder sb, long nanos) {
        if (nanos == 0) {
            return;
        }
        int len = nanos % 1_000_000 == 0 ? 3 : nanos % 1_000 == 0 ? 6 : 9;
        long v = len == 3 ? nanos / 1_000_000 : len == 6 ? nanos / 1_000 : nanos;
        sb.append('.');
        pad(sb, v, len);
    }

    /** Appends {@code v} (non-negative) zero-padded to {@code width} digits. */
    public static void pad(StringBuilder sb, long v, int width) {
        String d = Long.toString(v);
        for (int i = d.length(); i < width; i++) {
            sb.append('0');
        }
        sb.append(d);
    }
}
