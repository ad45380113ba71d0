package io.geotick.timescales.leap;

/** How a leap table's integrity is known. */
public enum HashCheck {
    /** Read from a leap-second list whose {@code #h} SHA-1 hash was recomputed and matched. */
    VERIFIED,
    /** Compiled into geotick; checked by its tests against the published list, not at run time. */
    BUILT_IN
}
