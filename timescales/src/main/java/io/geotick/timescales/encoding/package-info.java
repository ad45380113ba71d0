/**
 * Encodings of instants: Unix/POSIX seconds ({@link io.geotick.timescales.encoding.UnixTime}), NTP
 * timestamps ({@link io.geotick.timescales.encoding.NtpTimestamp}), PTP timestamps
 * ({@link io.geotick.timescales.encoding.PtpTimestamp}), GNSS week and seconds of week
 * ({@link io.geotick.timescales.encoding.WeekSystem}, {@link io.geotick.timescales.encoding.WeekTime}),
 * Julian and Modified Julian Dates ({@link io.geotick.timescales.encoding.JulianDate}) and exact decimal
 * seconds ({@link io.geotick.timescales.encoding.DecimalSeconds}).
 *
 * <p>Encodings of UTC labels (Unix, NTP, Julian dates on UTC) are produced by
 * {@link io.geotick.timescales.TimeConverter}, which knows the leap table; encodings of uniform scales
 * (PTP, week/seconds of week, seconds since an epoch) need no table.
 */
package io.geotick.timescales.encoding;
