/**
 * Calendar labels: year-month-day hour:minute:second with nanoseconds, on any scale, including the leap
 * second 23:59:60; ISO 8601 text (calendar and ordinal dates) read and written.
 */
package io.geotick.timescales.calendar;
