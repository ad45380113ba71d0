/**
 * Conversion chains: from a source coordinate system (coordinate kind, frame, height kind) to a target,
 * at a coordinate epoch, composed from the geodesy conversions, the frame registry's datum shifts, grid
 * shifts and geoid models. A chain is immutable, converts single points and arrays, and lists its steps.
 */
package io.geotick.transforms.chain;
