package io.geotick.timescales.clock;

import io.geotick.timescales.TimeInputException;
import java.util.Locale;

/** Which terms a clock model estimates. */
public enum ClockTerms {
    /** A constant offset. */
    OFFSET("offset", 1),
    /** Offset and drift (a linear frequency error). */
    DRIFT("drift", 2),
    /** Offset, drift and drift rate (a linearly changing frequency, e.g. quartz ageing or warming). */
    DRIFT_RATE("drift-rate", 3);

    private final String id;
    private final int count;

    ClockTerms(String id, int count) {
        this.id = id;
        this.count = count;
    }

    /** Name on the command line and in model files. */
    public String id() {
        return id;
    }

    /** Number of parameters. */
    public int count() {
        return count;
    }

    /** The terms with the given name. */
    public static ClockTerms parse(String s) {
        for (ClockTerms t : values()) {
            if (t.id.equals(s.trim().toLowerCase(Locale.ROOT))) {
                return t;
            }
        }
        throw new TimeInputException("unknown clock model terms '" + s + "' (known: offset, drift, drift-rate)");
    }
}
