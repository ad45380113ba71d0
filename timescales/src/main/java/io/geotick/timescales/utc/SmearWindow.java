package io.geotick.timescales.utc;

import io.geotick.timescales.TimeInputException;
import java.time.Duration;

/**
 * Where a smeared-UTC clock spreads each leap second: a window of UTC label time that starts {@code start}
 * before or after the leap (the 00:00:00 UTC that follows 23:59:60) and lasts {@code length}.
 *
 * <p>The default, {@link #CENTRED_24H}, is the common practice of a 24-hour window centred on the leap
 * second: from 12:00:00 UTC of the leap day to 12:00:00 UTC of the next day. The window must contain the
 * leap ({@code start < 0 < start + length}) and be at most 30 days long (leap seconds are months apart).
 *
 * @param start  signed offset of the window's start from the leap instant (usually negative)
 * @param length the window's length in UTC label time
 */
public record SmearWindow(Duration start, Duration length) {
    private static final Duration MAX = Duration.ofDays(30);

    /** 24 hours centred on the leap second (common practice). */
    public static final SmearWindow CENTRED_24H = new SmearWindow(Duration.ofHours(-12), Duration.ofHours(24));

    public SmearWindow {
        if (length.isNegative() || length.isZero() || length.compareTo(MAX) > 0) {
            throw new TimeInputException("smear window length " + length + " must be positive and at most 30 days");
        }
        Duration end = start.plus(length);
        if (!start.isNegative() || end.isNegative() || end.isZero()) {
            throw new TimeInputException("smear window starting " + start + " from the leap second and lasting "
                + length + " does not contain the leap second (need start < 0 < start + length)");
        }
    }

    /** A window of {@code length} centred on the leap second. */
    public static SmearWindow centred(Duration length) {
        return new SmearWindow(length.dividedBy(2).negated(), length);
    }

    /** The window's start in nanoseconds from the leap instant. */
    long startNanos() {
        return start.toNanos();
    }

    /** The window's length in nanoseconds. */
    long lengthNanos() {
        return length.toNanos();
    }
}
