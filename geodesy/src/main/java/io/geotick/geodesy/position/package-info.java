/** Position value types: geodetic (latitude, longitude, ellipsoidal height) and Earth-centred Cartesian. */
package io.geotick.geodesy.position;
