/**
 * Molodensky and abridged Molodensky transformations (EPSG methods 9604 / 9605): shifts of geodetic
 * coordinates between two ellipsoids from three geocentric translations, without passing through ECEF.
 */
package io.geotick.transforms.molodensky;
