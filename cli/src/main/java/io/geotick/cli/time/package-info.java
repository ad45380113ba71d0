/**
 * The time commands: {@code geotick time} (convert one timestamp, or with {@code --input} every {@code value} of
 * a CSV file, to every scale and encoding), {@code geotick leap} (the leap-second table in force) and
 * {@code geotick clock fit|apply} (device-clock models). Shared pieces: {@link io.geotick.cli.time.LeapOptions}
 * (leap table and smear window options) and {@link io.geotick.cli.time.TimeValues} (the VALUE grammar).
 */
package io.geotick.cli.time;
