/** Benchmarks of datum shifts and conversion chains, each beside Proj4J's datum transformation. */
package io.geotick.benchmarks.transforms;
