/** Geodetic ↔ Earth-centred Earth-fixed conversion (EPSG method 9602), single points and arrays. */
package io.geotick.geodesy.ecef;
