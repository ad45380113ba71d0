/**
 * The geodesy module against outside sources: IOGP Guidance Note 7-2 worked examples (EPSG 9602, 9836),
 * NGA.STND.0036 and Moritz (GRS 80) constants, Proj4J as a reference library, and a 40-digit Hipparchus
 * {@code Dfp} evaluation of the geodetic → ECEF formula.
 */
package io.geotick.reference.geodesy;
