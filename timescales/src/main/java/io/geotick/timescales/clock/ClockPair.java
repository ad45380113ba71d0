package io.geotick.timescales.clock;

import io.geotick.timescales.ScaleInstant;
import java.util.Objects;

/**
 * One paired reading: what the device clock showed, and the reference time at that moment.
 *
 * @param device    the device clock reading (its scale is what the device claims to keep)
 * @param reference the reference time of the same moment
 * @param line      where the pair came from (e.g. CSV line number), 0 if not from a file
 */
public record ClockPair(ScaleInstant device, ScaleInstant reference, int line) {
    public ClockPair {
        Objects.requireNonNull(device, "device");
        Objects.requireNonNull(reference, "reference");
    }

    /** reference &minus; device in nanoseconds (exact). */
    public long offsetNanos() {
        return device.nanosUntil(reference);
    }
}
