/**
 * Leap-second bookkeeping: the table of TAI &minus; UTC steps since 1972 ({@link io.geotick.timescales.leap.LeapTable}),
 * the IERS/IETF {@code leap-seconds.list} format with its SHA-1 check
 * ({@link io.geotick.timescales.leap.LeapListParser}), and the choice of the newest verified table
 * among the built-in one and the system's tzdata copy ({@link io.geotick.timescales.leap.LeapTables}).
 */
package io.geotick.timescales.leap;
