/** Angles: parsing and formatting degrees (decimal and DMS), and trigonometry of arguments in degrees. */
package io.geotick.geodesy.angle;
