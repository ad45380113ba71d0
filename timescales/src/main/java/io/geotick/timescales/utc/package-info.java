/**
 * UTC labels and TAI: the 1961&ndash;1971 offset formula ({@link io.geotick.timescales.utc.EarlyUtcTable}),
 * the leap seconds since 1972 ({@link io.geotick.timescales.utc.UtcModel}), and the smeared-UTC clock
 * ({@link io.geotick.timescales.utc.SmearWindow}, {@link io.geotick.timescales.utc.SmearedUtc}).
 */
package io.geotick.timescales.utc;
