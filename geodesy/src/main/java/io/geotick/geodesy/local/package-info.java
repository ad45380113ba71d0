/**
 * Local tangent frames about an origin: east-north-up (ENU), north-east-down (NED) and
 * azimuth-elevation-range (AER); rotation of vectors and covariance matrices between ECEF and ENU; the
 * horizontal and vertical accuracy figures of a covariance ({@link io.geotick.geodesy.local.AccuracyFigures}).
 */
package io.geotick.geodesy.local;
