package io.geotick.timescales.utc;

import java.time.LocalDate;
import java.util.List;

/**
 * TAI &minus; UTC from 1961-01-01 to 1971-12-31, when UTC ran at an offset rate and stepped by fractions of a
 * second: TAI &minus; UTC = A + (MJD &minus; B) &times; C seconds, MJD being the UTC Modified Julian Date with
 * its fraction of day.
 *
 * <p>Source: the USNO/BIH table of TAI &minus; UTC (values from memory of the published table, checked by
 * the continuity of the offsets at each rate change; see the reference tests). The rates C are exactly
 * 15, 13 and 30 ns per second, the offsets A are given to 0.1 &micro;s, so each offset is exact at 00:00 UTC
 * and the instants between are rounded half-even to the nanosecond (at most 0.5 ns, reported).
 *
 * @param start   first UTC day of the row
 * @param aNanos  A in nanoseconds
 * @param bMjd    B, an MJD
 * @param cNanosPerDay C in nanoseconds per day
 */
public record EarlyUtcTable(LocalDate start, long aNanos, long bMjd, long cNanosPerDay) {
    /** The rows, oldest first. The table ends where the leap-second table begins, 1972-01-01 (10 s). */
    public static final List<EarlyUtcTable> ROWS = List.of(
        row(1961, 1, 1, 1_422_818_000L, 37300, 1_296_000L),
        row(1961, 8, 1, 1_372_818_000L, 37300, 1_296_000L),
        row(1962, 1, 1, 1_845_858_000L, 37665, 1_123_200L),
        row(1963, 11, 1, 1_945_858_000L, 37665, 1_123_200L),
        row(1964, 1, 1, 3_240_130_000L, 38761, 1_296_000L),
        row(1964, 4, 1, 3_340_130_000L, 38761, 1_296_000L),
        row(1964, 9, 1, 3_440_130_000L, 38761, 1_296_000L),
        row(1965, 1, 1, 3_540_130_000L, 38761, 1_296_000L),
        row(1965, 3, 1, 3_640_130_000L, 38761, 1_296_000L),
        row(1965, 7, 1, 3_740_130_000L, 38761, 1_296_000L),
        row(1965, 9, 1, 3_840_130_000L, 38761, 1_296_000L),
        row(1966, 1, 1, 4_313_170_000L, 39126, 2_592_000L),
        row(1968, 2, 1, 4_213_170_000L, 39126, 2_592_000L));

    /** First UTC date geotick can label: 1961-01-01. */
    public static final LocalDate UTC_START = LocalDate.of(1961, 1, 1);

    private static EarlyUtcTable row(int y, int m, int d, long a, long b, long c) {
        return new EarlyUtcTable(LocalDate.of(y, m, d), a, b, c);
    }
}
