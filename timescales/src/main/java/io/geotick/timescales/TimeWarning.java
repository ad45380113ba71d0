package io.geotick.timescales;

import java.util.Objects;

/**
 * A note attached to a conversion result: the answer is right under a stated assumption, or was rounded.
 *
 * @param kind    what family of caveat this is
 * @param message a sentence for the user, naming the value or date concerned
 */
public record TimeWarning(Kind kind, String message) {
    /** The families of caveat. */
    public enum Kind {
        /** The instant lies at or after the leap table's expiry: no further leap seconds were assumed. */
        TABLE_EXPIRED,
        /** An input or an output had to be rounded to the nanosecond (half-even). */
        ROUNDED,
        /**
         * The instant lies inside a leap second and the encoding (Unix, NTP, Julian date on UTC) has no label
         * for it, so its value repeats the value of the following second; or a value of such an encoding was
         * read that could mean either of the two seconds.
         */
        LEAP_SECOND_REPEAT
    }

    public TimeWarning {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(message, "message");
    }

    /** Warning that the instant is past the expiry of the leap table. */
    public static TimeWarning expired(java.time.LocalDate expiry) {
        return new TimeWarning(Kind.TABLE_EXPIRED,
            "leap-second table expired on " + expiry + ", assuming no further leap seconds");
    }

    /** Warning that {@code what} was rounded half-even to the nanosecond. */
    public static TimeWarning rounded(String what) {
        return new TimeWarning(Kind.ROUNDED, what + " rounded half-even to the nanosecond");
    }

    @Override
    public String toString() {
        return message;
    }
}
