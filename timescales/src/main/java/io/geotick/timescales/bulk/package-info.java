/**
 * Allocation-free conversions over arrays, for high-rate logs: Unix &harr; GPS week and time of week, on
 * the leap-second era (1972-01-01 onwards). See {@link io.geotick.timescales.bulk.BulkConverter}.
 */
package io.geotick.timescales.bulk;
