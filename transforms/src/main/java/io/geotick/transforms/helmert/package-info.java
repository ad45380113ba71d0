/**
 * Similarity transformations between Earth-centred Cartesian frames: geocentric translations (EPSG
 * method 1031 / 9603), the 7-parameter Helmert in the position-vector (1033 / 9606) and coordinate-frame
 * (1032 / 9607) conventions, and the 14-parameter time-dependent Helmert (1053 / 1056).
 * Parameter units: metres, arc-seconds, parts per million (rates: the same per year).
 */
package io.geotick.transforms.helmert;
