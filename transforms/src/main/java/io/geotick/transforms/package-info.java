/**
 * geotick transforms: datum shifts and conversion chains.
 *
 * <ul>
 *   <li>{@code helmert}: geocentric translations, 7-parameter Helmert (both rotation conventions,
 *       rigorous and small-angle), 14-parameter time-dependent Helmert.</li>
 *   <li>{@code molodensky}: Molodensky and abridged Molodensky (EPSG 9604 / 9605).</li>
 *   <li>{@code frames}: the registry of named frames and their published parameter sets, path finding.</li>
 *   <li>{@code grid}: NTv2 horizontal grid shifts.</li>
 *   <li>{@code height}: geoid-undulation grids (ISG format), ellipsoidal ↔ orthometric heights.</li>
 *   <li>{@code chain}: conversion chains that list their steps.</li>
 * </ul>
 * Units throughout: metres, arc-seconds for rotations, parts per million for scale, decimal years for
 * epochs, degrees for latitude and longitude.
 */
package io.geotick.transforms;
