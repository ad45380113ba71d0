/**
 * geotick geodesy: ellipsoids, geodetic and Earth-centred Earth-fixed (ECEF) coordinates, local tangent
 * frames (ENU, NED, AER) and angles.
 *
 * <ul>
 *   <li>{@link io.geotick.geodesy.ellipsoid}: the {@code Ellipsoid} value type and the catalogue of named ones;</li>
 *   <li>{@link io.geotick.geodesy.position}: position value types (geodetic, ECEF);</li>
 *   <li>{@link io.geotick.geodesy.ecef}: geodetic ↔ ECEF conversion, single points and arrays;</li>
 *   <li>{@link io.geotick.geodesy.local}: local tangent frames about an origin, vectors and covariances;</li>
 *   <li>{@link io.geotick.geodesy.angle}: parsing, formatting and exact degree trigonometry.</li>
 * </ul>
 *
 * <p>All types are immutable and thread-safe. Angles in the API are degrees, lengths metres.
 */
package io.geotick.geodesy;
