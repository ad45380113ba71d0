/**
 * Exact instants on named time scales (UTC, TAI, TT, GPS, Galileo, BeiDou, GLONASS and smeared UTC).
 *
 * <p>Where to look:
 * <ul>
 *   <li>this package: {@link io.geotick.timescales.TimeScale}, the instant type
 *       {@link io.geotick.timescales.ScaleInstant}, the façade {@link io.geotick.timescales.TimeConverter}
 *       and its result type {@link io.geotick.timescales.Conversion} with {@link io.geotick.timescales.TimeWarning}s;</li>
 *   <li>{@code calendar}: calendar labels (ISO 8601 text, including 23:59:60 and ordinal dates);</li>
 *   <li>{@code leap}: leap-second tables, the IERS/IETF list format and the choice of table;</li>
 *   <li>{@code utc}: UTC labels &harr; TAI (1961&ndash;1971 offsets, leap seconds) and the smeared-UTC clock;</li>
 *   <li>{@code encoding}: Unix, NTP, PTP, GNSS week/seconds-of-week, Julian dates, decimal seconds;</li>
 *   <li>{@code bulk}: allocation-free array conversions for high-rate data;</li>
 *   <li>{@code clock}: device-clock offset/drift estimation and application.</li>
 * </ul>
 *
 * <p>Every instant is an integer count of seconds plus nanoseconds; no floating-point value is carried
 * across epochs. The only approximations are named where they occur (rounding to the nanosecond,
 * decimal printing of Julian dates, the clock-model evaluation).
 */
package io.geotick.timescales;
