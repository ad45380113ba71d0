package io.geotick.timescales.encoding;

import io.geotick.timescales.Conversion;
import io.geotick.timescales.TimeInputException;
import io.geotick.timescales.TimeWarning;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * An NTP timestamp (RFC 5905, 6): era, 32-bit seconds of the era and 32-bit fraction of a second.
 *
 * <p>The NTP count is the UTC label counted from the prime epoch 1900-01-01T00:00:00 UTC at 86 400 seconds
 * a day, like Unix time (NTP = Unix + 2 208 988 800 s), with the same leap-second convention (see
 * {@link UnixTime}). Era 0 started at the prime epoch; era 1 starts 2036-02-07T06:28:16 UTC. A 64-bit
 * timestamp on the wire has no era: {@link #resolveEra} chooses the era nearest a reference time.
 *
 * <p>Resolution: the fraction is 2<sup>&minus;32</sup> s (about 233 ps). Converting a fraction to nanoseconds
 * rounds half-even (&le; 0.5 ns, reported); converting nanoseconds to a fraction rounds half-even (&le;
 * 2<sup>&minus;33</sup> s, about 0.12 ns). The decimal text form keeps nanoseconds exactly. Immutable.
 *
 * @param era      the era number (may be negative before 1900)
 * @param seconds  seconds of the era, 0 to 2<sup>32</sup> &minus; 1
 * @param fraction fraction of a second in units of 2<sup>&minus;32</sup> s, 0 to 2<sup>32</sup> &minus; 1
 */
public record NtpTimestamp(int era, long seconds, long fraction) {
    /** Seconds from 1900-01-01 to 1970-01-01 (70 years with 17 leap days). */
    public static final long UNIX_OFFSET = 2_208_988_800L;
    private static final long ERA = 1L << 32;
    private static final Pattern HEX = Pattern.compile("(?:0[xX])?([0-9a-fA-F]{8})\\.?([0-9a-fA-F]{8})");

    public NtpTimestamp {
        if (seconds < 0 || seconds >= ERA) {
            throw new TimeInputException("NTP era seconds " + seconds + " out of range 0-4294967295");
        }
        if (fraction < 0 || fraction >= ERA) {
            throw new TimeInputException("NTP fraction " + fraction + " out of range 0-4294967295");
        }
    }

    /** The timestamp for a count of seconds since the prime epoch (any era) and a 32-bit fraction. */
    public static NtpTimestamp ofPrimeEpochSeconds(long secondsSince1900, long fraction) {
        return new NtpTimestamp(Math.toIntExact(Math.floorDiv(secondsSince1900, ERA)),
            Math.floorMod(secondsSince1900, ERA), fraction);
    }

    /**
     * The timestamp of a Unix time; the nanoseconds are rounded half-even to the 2<sup>&minus;32</sup> s fraction.
     */
    public static NtpTimestamp ofUnix(UnixTime u) {
        long frac = divHalfEven(BigInteger.valueOf(u.nano()).shiftLeft(32), BigInteger.valueOf(1_000_000_000L));
        long s = Math.addExact(u.seconds(), UNIX_OFFSET);
        if (frac == ERA) {
            frac = 0;
            s++;
        }
        return ofPrimeEpochSeconds(s, frac);
    }

    /**
     * Reads decimal seconds since the prime epoch (era-resolved: values from 2<sup>32</sup> on are in era 1),
     * e.g. {@code 3692217600.5}. The decimal is kept to the nanosecond (finer digits are rounded half-even and
     * reported); see {@link #parseToUnix}.
     */
    public static Conversion<UnixTime> parseToUnix(String text) {
        return DecimalSeconds.parse(text, "NTP seconds").map(d -> UnixTime.of(
            Math.subtractExact(d.seconds(), UNIX_OFFSET), d.nano()));
    }

    /**
     * Reads a 64-bit timestamp written in hexadecimal, {@code SSSSSSSS.FFFFFFFF} (the point and a {@code 0x}
     * prefix are optional), choosing its era with {@link #resolveEra}.
     *
     * @param nearPrimeEpochSeconds a reference time, seconds since the prime epoch, within 68 years of the value
     */
    public static NtpTimestamp parseHex(String text, long nearPrimeEpochSeconds) {
        Matcher m = HEX.matcher(text.trim());
        if (!m.matches()) {
            throw new TimeInputException("NTP timestamp '" + text + "' is not 16 hexadecimal digits "
                + "(SSSSSSSS.FFFFFFFF)");
        }
        return resolveEra(Long.parseLong(m.group(1), 16), Long.parseLong(m.group(2), 16), nearPrimeEpochSeconds);
    }

    /**
     * The era-resolved timestamp for era-less {@code seconds} and {@code fraction}: the era that puts it
     * nearest to {@code nearPrimeEpochSeconds} (RFC 5905, 6: eras are resolved from other knowledge of the
     * date; a reference within 68 years is unambiguous).
     */
    public static NtpTimestamp resolveEra(long seconds, long fraction, long nearPrimeEpochSeconds) {
        long base = Math.floorDiv(nearPrimeEpochSeconds, ERA);
        NtpTimestamp best = null;
        long bestDist = Long.MAX_VALUE;
        for (long e = base - 1; e <= base + 1; e++) {
            long full = e * ERA + seconds;
            long dist = Math.abs(full - nearPrimeEpochSeconds);
            if (dist < bestDist) {
                bestDist = dist;
                best = new NtpTimestamp(Math.toIntExact(e), seconds, fraction);
            }
        }
        return best;
    }

    /** Seconds since the prime epoch, era included. */
    public long primeEpochSeconds() {
        return era * ERA + seconds;
    }

    /**
     * The Unix time: the fraction rounded half-even to the nanosecond (a {@code ROUNDED} warning when inexact).
     */
    public Conversion<UnixTime> toUnix() {
        BigInteger num = BigInteger.valueOf(fraction).multiply(BigInteger.valueOf(1_000_000_000L));
        long ns = divHalfEven(num, BigInteger.valueOf(ERA));
        List<TimeWarning> w = new ArrayList<>(1);
        if (num.mod(BigInteger.valueOf(ERA)).signum() != 0) {
            w.add(TimeWarning.rounded("NTP fraction 0x" + String.format("%08x", fraction)));
        }
        return Conversion.of(UnixTime.of(primeEpochSeconds() - UNIX_OFFSET, ns), w);
    }

    /** The 64-bit wire form in hexadecimal, {@code SSSSSSSS.FFFFFFFF} (era not shown). */
    public String toHex() {
        return String.format(Locale.ROOT, "%08X.%08X", seconds, fraction);
    }

    private static long divHalfEven(BigInteger num, BigInteger den) {
        return new BigDecimal(num).divide(new BigDecimal(den), 0, RoundingMode.HALF_EVEN).longValueExact();
    }

    @Override
    public String toString() {
        return "era " + era + " " + toHex();
    }
}
