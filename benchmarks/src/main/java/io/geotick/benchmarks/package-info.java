/** JMH benchmarks of geotick, each beside a reference library in the same run. */
package io.geotick.benchmarks;
