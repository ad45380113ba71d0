/**
 * Coordinate reference systems by EPSG code, read through Proj4J's bundled EPSG definitions and
 * mapped onto the project's own projections and frames ({@link io.geotick.transforms.epsg.EpsgSystems}).
 * Where an in-house projection implements the same method (Transverse Mercator, Lambert Conic Conformal
 * 1SP/2SP, polar stereographic variant A, Pseudo-Mercator) it is used; otherwise Proj4J's own projection
 * object is wrapped, with its lower, stated accuracy. A system defined in feet or another unit gives and
 * takes its eastings and northings in that unit ({@link io.geotick.transforms.epsg.LinearUnit}); the
 * projections compute in metres.
 */
package io.geotick.transforms.epsg;
