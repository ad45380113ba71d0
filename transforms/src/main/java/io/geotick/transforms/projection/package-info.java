/**
 * Map projections with nanometre-class accuracy: Transverse Mercator by the 6th-order Krüger series
 * (Karney 2011), UTM and UPS, Lambert Conformal Conic (1SP and 2SP), polar stereographic variant A,
 * Popular Visualisation Pseudo-Mercator, and grid ↔ ground scale factors.
 *
 * <p>Every projection implements {@link io.geotick.transforms.projection.MapProjection}, is immutable
 * and thread-safe, and reports bad input with a
 * {@link io.geotick.transforms.projection.ProjectionDomainException} naming the value. Angles are in
 * degrees, lengths in metres; convergence is the angle from true north to grid north, clockwise.
 */
package io.geotick.transforms.projection;
