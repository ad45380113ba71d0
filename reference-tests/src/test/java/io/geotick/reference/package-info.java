/** Checks of geotick against published sources and reference libraries. */
package io.geotick.reference;
