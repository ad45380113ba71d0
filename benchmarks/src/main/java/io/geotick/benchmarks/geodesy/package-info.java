/**
 * JMH benchmarks of the geodesy module's geodetic ↔ ECEF conversions beside Proj4J's geocentric
 * conversion, on the same points in the same run.
 */
package io.geotick.benchmarks.geodesy;
