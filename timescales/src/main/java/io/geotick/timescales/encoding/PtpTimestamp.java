package io.geotick.timescales.encoding;

import io.geotick.timescales.Conversion;
import io.geotick.timescales.ScaleInstant;
import io.geotick.timescales.TimeInputException;

/**
 * A PTP timestamp (IEEE 1588-2019, 7.2): TAI seconds and nanoseconds since the PTP epoch
 * 1970-01-01T00:00:00 TAI, the seconds field being an unsigned 48-bit integer. The PTP timescale is TAI, so
 * no leap table is needed. Immutable.
 *
 * @param seconds     0 to 2<sup>48</sup> &minus; 1
 * @param nanoseconds 0 to 999 999 999
 */
public record PtpTimestamp(long seconds, int nanoseconds) {
    /** Largest seconds field (48 bits). */
    public static final long MAX_SECONDS = (1L << 48) - 1;

    public PtpTimestamp {
        if (seconds < 0 || seconds > MAX_SECONDS) {
            throw new TimeInputException("PTP seconds " + seconds + " out of range 0-" + MAX_SECONDS
                + " (the PTP epoch is 1970-01-01T00:00:00 TAI)");
        }
        if (nanoseconds < 0 || nanoseconds > 999_999_999) {
            throw new TimeInputException("PTP nanoseconds " + nanoseconds + " out of range 0-999999999");
        }
    }

    /** The PTP timestamp of an instant. */
    public static PtpTimestamp from(ScaleInstant t) {
        return new PtpTimestamp(t.taiSeconds(), t.nano());
    }

    /** Reads decimal TAI seconds since the PTP epoch, e.g. {@code 1483228837.5}. */
    public static Conversion<PtpTimestamp> parse(String text) {
        return DecimalSeconds.parse(text, "PTP seconds").map(d -> new PtpTimestamp(d.seconds(), d.nano()));
    }

    /** The instant, read on TAI. */
    public ScaleInstant toInstant() {
        return ScaleInstant.ofTai(seconds, nanoseconds);
    }

    /** Exact decimal text. */
    @Override
    public String toString() {
        return DecimalSeconds.format(seconds, nanoseconds);
    }
}
