/** Reference ellipsoids: the {@link io.geotick.geodesy.ellipsoid.Ellipsoid} value type and a catalogue. */
package io.geotick.geodesy.ellipsoid;
