package io.geotick.geodesy.ellipsoid;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class EllipsoidsTest {

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "WGS 84 | WGS 84", "wgs84 | WGS 84", "WGS-84 | WGS 84", "wgs_84 | WGS 84", "EPSG:7030 | WGS 84",
        "epsg:7030 | WGS 84", "GRS 1980 | GRS 1980", "GRS80 | GRS 1980", "EPSG:7019 | GRS 1980",
        "International 1924 | International 1924", "Hayford | International 1924", "intl | International 1924",
        "Clarke 1866 | Clarke 1866", "Bessel 1841 | Bessel 1841", "bessel | Bessel 1841",
        "Airy 1830 | Airy 1830", "airy | Airy 1830", "Krassovsky 1940 | Krassovsky 1940",
        "Krasovsky 1940 | Krassovsky 1940", "EPSG:7024 | Krassovsky 1940"})
    void looksUpByNameAliasAndEpsgCode(String query, String expected) {
        assertThat(Ellipsoids.byName(query).name()).isEqualTo(expected);
    }

    @Test
    void theCatalogueHoldsTheEllipsoidsIssueTwoAsksFor() {
        assertThat(Ellipsoids.all()).extracting(Ellipsoid::name).contains("WGS 84", "GRS 1980",
            "International 1924", "Clarke 1866", "Bessel 1841", "Airy 1830", "Krassovsky 1940");
        assertThat(Ellipsoids.all()).allSatisfy(e -> assertThat(e.source()).isNotBlank());
        assertThat(Ellipsoids.all()).extracting(Ellipsoid::name).doesNotHaveDuplicates();
        // Every entry can be found again by its own name.
        assertThat(Ellipsoids.all()).allSatisfy(e -> assertThat(Ellipsoids.byName(e.name())).isSameAs(e));
    }

    @Test
    void definingConstantsAreKeptAsPublished() {
        // Axes-defined ellipsoids keep b exactly; 1/f-defined ones keep 1/f exactly.
        assertThat(Ellipsoids.CLARKE_1866.isDefinedByInverseFlattening()).isFalse();
        assertThat(Ellipsoids.CLARKE_1866.semiMinorAxis()).isEqualTo(6356583.8);
        assertThat(Ellipsoids.AIRY_1830.semiMinorAxis()).isEqualTo(6356256.909);
        assertThat(Ellipsoids.BESSEL_1841.inverseFlattening()).isEqualTo(299.1528128);
    }

    @Test
    void unknownNamesAreRejectedNamingTheValueAndTheKnownOnes() {
        assertThatThrownBy(() -> Ellipsoids.byName("Everest 1830")).isInstanceOf(UnknownEllipsoidException.class)
            .hasMessageContaining("'Everest 1830'").hasMessageContaining("WGS 84").hasMessageContaining("Airy 1830");
        assertThatThrownBy(() -> Ellipsoids.byName("")).isInstanceOf(UnknownEllipsoidException.class);
        assertThatThrownBy(() -> Ellipsoids.byName(null)).isInstanceOf(UnknownEllipsoidException.class)
            .hasMessageContaining("null");
    }
}
