/**
 * Heights: geoid-undulation grids in the International Service for the Geoid's ISG text format (v2.0),
 * bilinear and bicubic interpolation, ellipsoidal ↔ orthometric heights (h = H + N). No geoid model is
 * shipped.
 */
package io.geotick.transforms.height;
