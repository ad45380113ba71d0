package io.geotick.timescales;

import java.time.Duration;
import java.util.Objects;

/**
 * An instant read on a named {@link TimeScale}: an exact count of seconds and nanoseconds.
 *
 * <p>The physical instant is held as TAI seconds and nanoseconds since 1970-01-01T00:00:00 TAI (the PTP
 * epoch, IEEE 1588); the scale says how the instant is to be labelled. Changing the scale with
 * {@link #to(TimeScale)} is therefore exact and needs no table: only the labels of UTC, GLONASS time and
 * smeared UTC depend on the leap-second table, and those are produced by {@link TimeConverter}.
 *
 * <p>Arithmetic is in SI seconds and exact. Immutable and thread-safe. Ordering and {@link #isSameInstant}
 * compare the physical instant; {@link #equals} also compares the scale.
 */
public final class ScaleInstant implements Comparable<ScaleInstant> {
    private static final long NANOS_PER_SECOND = 1_000_000_000L;

    private final TimeScale scale;
    private final long taiSeconds;
    private final int nano;

    private ScaleInstant(TimeScale scale, long taiSeconds, int nano) {
        this.scale = scale;
        this.taiSeconds = taiSeconds;
        this.nano = nano;
    }

    /**
     * The instant {@code taiSeconds} + {@code nanoAdjustment} ns after 1970-01-01T00:00:00 TAI, read on TAI.
     * The nanosecond adjustment may be any value, positive or negative.
     */
    public static ScaleInstant ofTai(long taiSeconds, long nanoAdjustment) {
        return ofTai(TimeScale.TAI, taiSeconds, nanoAdjustment);
    }

    /** As {@link #ofTai(long, long)} but read on {@code scale}. */
    public static ScaleInstant ofTai(TimeScale scale, long taiSeconds, long nanoAdjustment) {
        Objects.requireNonNull(scale, "scale");
        long s = Math.addExact(taiSeconds, Math.floorDiv(nanoAdjustment, NANOS_PER_SECOND));
        int n = (int) Math.floorMod(nanoAdjustment, NANOS_PER_SECOND);
        return new ScaleInstant(scale, s, n);
    }

    /**
     * The instant whose count on the uniform {@code scale} is {@code scaleSeconds} + {@code nanoAdjustment} ns
     * since that scale's label 1970-01-01T00:00:00. For example GPS seconds since 1970-01-01T00:00:00 GPS.
     *
     * @throws TimeInputException if the scale is not uniform (UTC-like scales need {@link TimeConverter})
     */
    public static ScaleInstant ofScaleSeconds(TimeScale scale, long scaleSeconds, long nanoAdjustment) {
        requireUniform(scale);
        long off = scale.taiMinusScaleNanos();
        return ofTai(scale, scaleSeconds, 0L).plusNanos(nanoAdjustment).plusNanos(off);
    }

    private static void requireUniform(TimeScale scale) {
        if (!scale.isUniform()) {
            throw new TimeInputException(scale.id() + " is not a uniform scale; use TimeConverter for its labels");
        }
    }

    /** The scale this instant is read on. */
    public TimeScale scale() {
        return scale;
    }

    /** Whole TAI seconds since 1970-01-01T00:00:00 TAI (floor). */
    public long taiSeconds() {
        return taiSeconds;
    }

    /** Nanoseconds within the TAI second, 0 to 999 999 999. */
    public int nano() {
        return nano;
    }

    /** The same physical instant read on another scale (exact, no table needed). */
    public ScaleInstant to(TimeScale other) {
        return other == scale ? this : new ScaleInstant(Objects.requireNonNull(other, "scale"), taiSeconds, nano);
    }

    /**
     * Whole seconds of this instant on its uniform scale since the scale's 1970-01-01T00:00:00 label (floor).
     *
     * @throws TimeInputException if the scale is not uniform
     */
    public long scaleSeconds() {
        requireUniform(scale);
        return plusNanos(-scale.taiMinusScaleNanos()).taiSeconds;
    }

    /** Nanoseconds within the second of {@link #scaleSeconds()}. */
    public int scaleNano() {
        requireUniform(scale);
        return plusNanos(-scale.taiMinusScaleNanos()).nano;
    }

    /** This instant plus {@code nanos} SI nanoseconds (may be negative). */
    public ScaleInstant plusNanos(long nanos) {
        if (nanos == 0) {
            return this;
        }
        long s = Math.addExact(taiSeconds, Math.floorDiv(nanos, NANOS_PER_SECOND));
        long n = nano + Math.floorMod(nanos, NANOS_PER_SECOND);
        if (n >= NANOS_PER_SECOND) {
            s = Math.incrementExact(s);
            n -= NANOS_PER_SECOND;
        }
        return new ScaleInstant(scale, s, (int) n);
    }

    /** This instant plus {@code seconds} SI seconds. */
    public ScaleInstant plusSeconds(long seconds) {
        return seconds == 0 ? this : new ScaleInstant(scale, Math.addExact(taiSeconds, seconds), nano);
    }

    /** This instant plus an SI duration. */
    public ScaleInstant plus(Duration d) {
        return plusSeconds(d.getSeconds()).plusNanos(d.getNano());
    }

    /** The SI duration from this instant to {@code other} (negative if {@code other} is earlier). */
    public Duration until(ScaleInstant other) {
        return Duration.ofSeconds(Math.subtractExact(other.taiSeconds, taiSeconds), (long) other.nano - nano);
    }

    /** The signed SI interval to {@code other} in nanoseconds; overflows beyond about &plusmn;292 years. */
    public long nanosUntil(ScaleInstant other) {
        return Math.addExact(Math.multiplyExact(Math.subtractExact(other.taiSeconds, taiSeconds), NANOS_PER_SECOND),
            (long) other.nano - nano);
    }

    /** True if both denote the same physical instant, whatever their scales. */
    public boolean isSameInstant(ScaleInstant other) {
        return taiSeconds == other.taiSeconds && nano == other.nano;
    }

    /** True if this instant is physically before {@code other}. */
    public boolean isBefore(ScaleInstant other) {
        return compareTo(other) < 0;
    }

    /** True if this instant is physically after {@code other}. */
    public boolean isAfter(ScaleInstant other) {
        return compareTo(other) > 0;
    }

    /** Orders by physical instant (the scale is not considered). */
    @Override
    public int compareTo(ScaleInstant o) {
        int c = Long.compare(taiSeconds, o.taiSeconds);
        return c != 0 ? c : Integer.compare(nano, o.nano);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ScaleInstant other && other.scale == scale && other.taiSeconds == taiSeconds
            && other.nano == nano;
    }

    @Override
    public int hashCode() {
        return Long.hashCode(taiSeconds) * 31 + nano * 7 + scale.ordinal();
    }

    /** For example {@code gps@TAI+1483228836.500}: the scale and the exact TAI count since 1970 TAI. */
    @Override
    public String toString() {
        String v = io.geotick.timescales.encoding.DecimalSeconds.format(taiSeconds, nano);
        return scale.id() + "@TAI" + (v.startsWith("-") ? "" : "+") + v;
    }
}
