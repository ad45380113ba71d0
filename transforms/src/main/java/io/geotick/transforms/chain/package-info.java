/**
 * Conversion chains: from a source coordinate system (coordinate kind, frame, height kind; a map grid or a
 * fitted site grid on top) to a target, at a coordinate epoch, composed from the geodesy conversions, map
 * projections, the frame registry's datum shifts (or the user's Helmert, NTv2 or Molodensky shift), geoid
 * models and site models. A chain is immutable, converts single points and arrays, and lists its steps.
 */
package io.geotick.transforms.chain;
