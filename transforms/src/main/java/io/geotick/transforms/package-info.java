/** geotick transforms. */
package io.geotick.transforms;
