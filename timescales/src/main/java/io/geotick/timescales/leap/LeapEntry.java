package io.geotick.timescales.leap;

import java.time.LocalDate;
import java.util.Objects;

/**
 * One line of a leap-second table: from 00:00:00 UTC of {@code effective}, TAI &minus; UTC is
 * {@code taiMinusUtc} seconds. The leap second itself is 23:59:60 UTC of the day before (or, for a negative
 * step, 23:59:59 of that day is skipped).
 *
 * @param effective   the UTC date from whose start the offset holds
 * @param taiMinusUtc TAI &minus; UTC in whole seconds
 */
public record LeapEntry(LocalDate effective, int taiMinusUtc) {
    /** Seconds from the NTP prime epoch 1900-01-01 to 1970-01-01 (RFC 5905). */
    public static final long NTP_TO_UNIX_SECONDS = 2_208_988_800L;

    public LeapEntry {
        Objects.requireNonNull(effective, "effective");
    }

    /** The NTP second count (seconds since 1900-01-01T00:00:00, 86 400 per day) of the effective date. */
    public long ntpSeconds() {
        return effective.toEpochDay() * 86_400L + NTP_TO_UNIX_SECONDS;
    }

    /** The entry for an NTP second count as written in a leap-second list. */
    public static LeapEntry ofNtp(long ntpSeconds, int taiMinusUtc) {
        return new LeapEntry(LocalDate.ofEpochDay(Math.floorDiv(ntpSeconds - NTP_TO_UNIX_SECONDS, 86_400L)),
            taiMinusUtc);
    }
}
