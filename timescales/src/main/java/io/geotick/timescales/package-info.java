/** geotick timescales. */
package io.geotick.timescales;
