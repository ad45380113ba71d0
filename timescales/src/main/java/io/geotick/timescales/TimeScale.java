package io.geotick.timescales;

import java.util.Arrays;
import java.util.Locale;
import java.util.stream.Collectors;

/**
 * The named time scales geotick converts between.
 *
 * <p>Uniform scales count SI seconds with a fixed offset from TAI; their calendar labels are the
 * proleptic Gregorian calendar with 86 400-second days. UTC, GLONASS time and smeared UTC follow the leap
 * seconds and need a leap table to be labelled (see {@link TimeConverter}).
 *
 * <table>
 *   <caption>Definitions</caption>
 *   <tr><th>scale</th><th>rule</th><th>source</th></tr>
 *   <tr><td>TAI</td><td>International Atomic Time, the reference of every other scale here</td><td>BIPM</td></tr>
 *   <tr><td>UTC</td><td>TAI &minus; (TAI &minus; UTC); integer leap seconds since 1972, the published offset
 *       formula 1961&ndash;1971; undefined before 1961</td><td>ITU-R TF.460-6, IERS Bulletin C</td></tr>
 *   <tr><td>GPS</td><td>TAI &minus; 19 s exactly (GPS time = UTC at 1980-01-06T00:00:00)</td><td>IS-GPS-200</td></tr>
 *   <tr><td>GST</td><td>Galileo system time, taken equal to GPS time. The broadcast GPS&ndash;Galileo time offset
 *       (GGTO, a few nanoseconds to tens of nanoseconds) is out of scope: it is a property of the two
 *       realisations, not of the scales' definitions</td><td>Galileo OS SIS ICD</td></tr>
 *   <tr><td>BDT</td><td>BeiDou time, TAI &minus; 33 s exactly (= GPS time &minus; 14 s; BDT = UTC at
 *       2006-01-01T00:00:00)</td><td>BeiDou ICD</td></tr>
 *   <tr><td>GLONASS</td><td>UTC + 3 h, with the leap seconds of UTC (its leap second is labelled 02:59:60)</td>
 *       <td>GLONASS ICD</td></tr>
 *   <tr><td>TT</td><td>Terrestrial Time, TAI + 32.184 s exactly</td><td>IERS Conventions 2010, ch. 10</td></tr>
 *   <tr><td>smeared UTC</td><td>UTC with each leap second spread linearly over a window (default: 24 h centred
 *       on the leap second); equal to UTC outside the windows</td><td>common practice</td></tr>
 * </table>
 */
public enum TimeScale {
    /** Coordinated Universal Time. */
    UTC("utc", false, 0L),
    /** International Atomic Time. */
    TAI("tai", true, 0L),
    /** GPS time: TAI &minus; 19 s. */
    GPS("gps", true, 19_000_000_000L),
    /** Galileo system time: equal to GPS time (GGTO out of scope). */
    GST("gst", true, 19_000_000_000L),
    /** BeiDou time: TAI &minus; 33 s. */
    BDT("bdt", true, 33_000_000_000L),
    /** GLONASS time: UTC + 3 h, following leap seconds. */
    GLONASS("glonass", false, 0L),
    /** Terrestrial Time: TAI + 32.184 s. */
    TT("tt", true, -32_184_000_000L),
    /** UTC with each leap second smeared linearly over a window. */
    SMEARED_UTC("smeared-utc", false, 0L);

    private final String id;
    private final boolean uniform;
    private final long taiMinusScaleNanos;

    TimeScale(String id, boolean uniform, long taiMinusScaleNanos) {
        this.id = id;
        this.uniform = uniform;
        this.taiMinusScaleNanos = taiMinusScaleNanos;
    }

    /** The lower-case name used on the command line and in JSON, e.g. {@code "smeared-utc"}. */
    public String id() {
        return id;
    }

    /** True for scales with a fixed offset from TAI (TAI, TT, GPS, GST, BDT). */
    public boolean isUniform() {
        return uniform;
    }

    /**
     * TAI minus this scale, in nanoseconds, for a uniform scale (exact).
     *
     * @throws UnsupportedOperationException for UTC, GLONASS and smeared UTC, whose offset varies
     */
    public long taiMinusScaleNanos() {
        if (!uniform) {
            throw new UnsupportedOperationException(id + " has no fixed offset from TAI");
        }
        return taiMinusScaleNanos;
    }

    /**
     * The scale with the given name ({@link #id()}, case-insensitive; {@code _} and {@code -} are the same).
     *
     * @throws TimeInputException naming the value and the known names when there is no such scale
     */
    public static TimeScale parse(String name) {
        String n = name.trim().toLowerCase(Locale.ROOT).replace('_', '-');
        for (TimeScale s : values()) {
            if (s.id.equals(n)) {
                return s;
            }
        }
        throw new TimeInputException("unknown time scale '" + name + "' (known: "
            + Arrays.stream(values()).map(TimeScale::id).collect(Collectors.joining(", ")) + ")");
    }

    @Override
    public String toString() {
        return id;
    }
}
