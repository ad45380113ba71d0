/**
 * Device clocks: estimate offset, drift and optionally drift rate from paired readings (device clock,
 * reference time) by least squares ({@link io.geotick.timescales.clock.ClockFitter}), and map device
 * timestamps onto the reference scale with the fitted {@link io.geotick.timescales.clock.ClockModel}.
 */
package io.geotick.timescales.clock;
