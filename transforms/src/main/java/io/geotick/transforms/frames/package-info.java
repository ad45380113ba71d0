/**
 * The registry of named reference frames (ITRF realisations, WGS 84, ETRF2000, classic datums), their
 * published parameter sets with sources, EPSG codes and accuracies, and path finding between frames
 * evaluated at a coordinate epoch.
 */
package io.geotick.transforms.frames;
