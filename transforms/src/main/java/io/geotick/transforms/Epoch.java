package io.geotick.transforms;

import java.time.LocalDate;
import java.util.Objects;

/**
 * A coordinate epoch (or reference epoch) as a decimal year, e.g. {@code 2024.5}. Immutable.
 *
 * <p>A {@code double} is ample for an epoch: near 2000 its resolution is about 2e-13 year (7 µs), while
 * plate motion of 10 cm/yr makes 1 nm of position in 1e-8 year (0.3 s). The decimal year of a date is
 * {@code year + (dayOfYear − 1)/daysInYear}, at 0 h of that day (common practice; the IERS tables use the
 * same convention within the rounding that matters here: one day is 0.3 mm at 10 cm/yr).
 *
 * @param decimalYear the epoch, finite, in [1800, 2200]
 */
public record Epoch(double decimalYear) implements Comparable<Epoch> {

    public Epoch {
        if (!(decimalYear >= 1800 && decimalYear <= 2200)) {
            throw new IllegalArgumentException("epoch " + decimalYear
                + " is not a decimal year in [1800, 2200]");
        }
    }

    /** The epoch of that decimal year. */
    public static Epoch of(double decimalYear) {
        return new Epoch(decimalYear);
    }

    /** The epoch at 0 h of that date: year + (dayOfYear − 1)/lengthOfYear. */
    public static Epoch from(LocalDate date) {
        Objects.requireNonNull(date, "date");
        return new Epoch(date.getYear() + (date.getDayOfYear() - 1) / (double) date.lengthOfYear());
    }

    /**
     * Parses a decimal year ({@code "2024.5"}) or an ISO 8601 date ({@code "2024-07-01"}).
     *
     * @throws IllegalArgumentException naming the text if it is neither
     */
    public static Epoch parse(String text) {
        Objects.requireNonNull(text, "text");
        String t = text.strip();
        try {
            if (t.length() == 10 && t.charAt(4) == '-') {
                return from(LocalDate.parse(t));
            }
            return of(Double.parseDouble(t));
        } catch (RuntimeException e) {
            throw new IllegalArgumentException("epoch '" + text
                + "' is neither a decimal year (e.g. 2024.5) nor a date (e.g. 2024-07-01)", e);
        }
    }

    /** This epoch minus the other, in years. */
    public double yearsSince(Epoch other) {
        return decimalYear - other.decimalYear;
    }

    @Override
    public int compareTo(Epoch o) {
        return Double.compare(decimalYear, o.decimalYear);
    }

    @Override
    public String toString() {
        return Double.toString(decimalYear);
    }
}
