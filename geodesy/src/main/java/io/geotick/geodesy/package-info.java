/** geotick geodesy. */
package io.geotick.geodesy;
