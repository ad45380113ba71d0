package io.geotick.reference.projection;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import io.geotick.transforms.projection.GridPosition;
import io.geotick.transforms.projection.Hemisphere;
import io.geotick.transforms.projection.ProjectionDomainException;
import io.geotick.transforms.projection.UniversalGrids;
import io.geotick.transforms.projection.Ups;
import io.geotick.transforms.projection.Utm;
import org.junit.jupiter.api.Test;

/**
 * The UTM/UPS grid rules. Source for every check: the UTM grid definition (NGA/DMA TM 8358.2, The
 * Universal Grids: UTM and UPS), common practice; rule values from memory.
 */
class UtmZoneRulesTest {

    @Test
    void zoneBoundariesEverySixDegreesFrom180West() {
        // Source: TM 8358.2 — zone 1 spans 180°W–174°W, numbered eastward; 180°E is 180°W (common practice).
        assertThat(Utm.zoneNumber(0, -180)).isEqualTo(1);
        assertThat(Utm.zoneNumber(0, -174.0000001)).isEqualTo(1);
        assertThat(Utm.zoneNumber(0, -174)).isEqualTo(2);
        assertThat(Utm.zoneNumber(0, -0.0000001)).isEqualTo(30);
        assertThat(Utm.zoneNumber(0, 0)).isEqualTo(31);
        assertThat(Utm.zoneNumber(0, 179.9999999)).isEqualTo(60);
        assertThat(Utm.zoneNumber(0, 180)).isEqualTo(1);
        assertThat(Utm.zoneNumber(0, 359)).isEqualTo(30);
        assertThat(Utm.zoneNumber(0, 181)).isEqualTo(1);
        assertThat(Utm.centralMeridianOf(1)).isEqualTo(-177);
        assertThat(Utm.centralMeridianOf(31)).isEqualTo(3);
        assertThat(Utm.centralMeridianOf(60)).isEqualTo(177);
    }

    @Test
    void norwayException() {
        // Source: TM 8358.2 — 32V is widened to 3°E–12°E between 56°N and 64°N; 31V covers 0°–3°E.
        assertThat(Utm.zoneNumber(56, 3)).isEqualTo(32);
        assertThat(Utm.zoneNumber(55.9999999, 3)).isEqualTo(31);
        assertThat(Utm.zoneNumber(63.9999999, 3)).isEqualTo(32);
        assertThat(Utm.zoneNumber(64, 3)).isEqualTo(31);
        assertThat(Utm.zoneNumber(60, 2.9999999)).isEqualTo(31);
        assertThat(Utm.zoneNumber(60, 11.9999999)).isEqualTo(32);
        assertThat(Utm.zoneNumber(60, 12)).isEqualTo(33);
        assertThat(Utm.forPosition(60, 5).zoneName()).isEqualTo("32N");
    }

    @Test
    void svalbardException() {
        // Source: TM 8358.2 — band X (72°N–84°N): 31X 0°–9°E, 33X 9°–21°E, 35X 21°–33°E, 37X 33°–42°E;
        // 32X, 34X and 36X are not used.
        assertThat(Utm.zoneNumber(72, 0)).isEqualTo(31);
        assertThat(Utm.zoneNumber(72, 8.9999999)).isEqualTo(31);
        assertThat(Utm.zoneNumber(72, 9)).isEqualTo(33);
        assertThat(Utm.zoneNumber(78, 20.9999999)).isEqualTo(33);
        assertThat(Utm.zoneNumber(78, 21)).isEqualTo(35);
        assertThat(Utm.zoneNumber(80, 32.9999999)).isEqualTo(35);
        assertThat(Utm.zoneNumber(80, 33)).isEqualTo(37);
        assertThat(Utm.zoneNumber(84, 41.9999999)).isEqualTo(37);
        assertThat(Utm.zoneNumber(84, 42)).isEqualTo(38);
        assertThat(Utm.zoneNumber(71.9999999, 9)).isEqualTo(32);
        assertThat(Utm.zoneNumber(75, -0.0000001)).isEqualTo(30);
        for (double lon = 0; lon < 42; lon += 0.25) {
            assertThat(Utm.zoneNumber(76, lon)).isNotIn(32, 34, 36);
        }
    }

    @Test
    void latitudeBands() {
        // Source: TM 8358.2 — 8° bands C…X from 80°S, I and O omitted, X extended to 84°N.
        assertThat(Utm.latitudeBand(-80)).isEqualTo('C');
        assertThat(Utm.latitudeBand(-72.0000001)).isEqualTo('C');
        assertThat(Utm.latitudeBand(-72)).isEqualTo('D');
        assertThat(Utm.latitudeBand(-0.0000001)).isEqualTo('M');
        assertThat(Utm.latitudeBand(0)).isEqualTo('N');
        assertThat(Utm.latitudeBand(56)).isEqualTo('V');
        assertThat(Utm.latitudeBand(64)).isEqualTo('W');
        assertThat(Utm.latitudeBand(72)).isEqualTo('X');
        assertThat(Utm.latitudeBand(84)).isEqualTo('X');
        StringBuilder all = new StringBuilder();
        for (int i = 0; i < 20; i++) {
            all.append(Utm.latitudeBand(-80 + 8 * i + 4));
        }
        assertThat(all.toString()).isEqualTo("CDEFGHJKLMNPQRSTUVWX");
        assertThatThrownBy(() -> Utm.latitudeBand(84.5)).isInstanceOf(ProjectionDomainException.class)
            .hasMessageContaining("84.5");
    }

    @Test
    void southernFalseNorthingAndSymmetry() {
        // Source: TM 8358.2 — k0 0.9996, FE 500000 m, FN 0 north and 10000000 m south; the TM is
        // symmetric about the equator (common practice).
        GridPosition north = Utm.zone(33, Hemisphere.NORTH).project(25, 16);
        GridPosition south = Utm.zone(33, Hemisphere.SOUTH).project(-25, 16);
        assertThat(south.easting()).isCloseTo(north.easting(), within(1e-9));
        assertThat(south.northing()).isCloseTo(10_000_000 - north.northing(), within(1e-8));
        assertThat(Utm.zone(33, Hemisphere.SOUTH).project(0, 15).northing()).isCloseTo(10_000_000, within(1e-9));
        assertThat(Utm.zone(33, Hemisphere.NORTH).project(0, 15).easting()).isCloseTo(500_000, within(1e-9));
        assertThat(Utm.zone(33, Hemisphere.NORTH).project(0, 15).scale()).isCloseTo(0.9996, within(1e-15));
        assertThat(Utm.forPosition(-0.0000001, 15).hemisphere()).isEqualTo(Hemisphere.SOUTH);
        assertThat(Utm.forPosition(0, 15).hemisphere()).isEqualTo(Hemisphere.NORTH);
    }

    @Test
    void epsgCodesAndParsing() {
        // Source: EPSG Geodetic Parameter Dataset — WGS 84 / UTM zone nN = 326nn, nS = 327nn; UPS 32661/32761.
        assertThat(Utm.parse("31N").epsgCode()).isEqualTo(32631);
        assertThat(Utm.parse("33s").epsgCode()).isEqualTo(32733);
        assertThat(Utm.parse(" 1 N ").zone()).isEqualTo(1);
        assertThat(Ups.of(Hemisphere.NORTH).epsgCode()).isEqualTo(32661);
        assertThat(Ups.of(Hemisphere.SOUTH).epsgCode()).isEqualTo(32761);
        assertThatThrownBy(() -> Utm.parse("61N")).isInstanceOf(ProjectionDomainException.class)
            .hasMessageContaining("61");
        assertThatThrownBy(() -> Utm.parse("0N")).hasMessageContaining("zone 0");
        assertThatThrownBy(() -> Utm.parse("33U")).hasMessageContaining("'U' is not N or S");
        assertThatThrownBy(() -> Utm.parse("thirty-one")).hasMessageContaining("thirty-one");
        assertThatThrownBy(() -> Utm.zone(61, Hemisphere.NORTH)).hasMessageContaining("zone 61");
    }

    @Test
    void utmLimitsAndUps() {
        // Source: TM 8358.2 — UTM from 80°S to 84°N; UPS beyond, overlapping by 30' (values from memory).
        assertThatThrownBy(() -> Utm.forPosition(84.0000001, 10)).isInstanceOf(ProjectionDomainException.class)
            .hasMessageContaining("84.0000001");
        assertThatThrownBy(() -> Utm.forPosition(-80.5, 10)).hasMessageContaining("-80.5");
        assertThatThrownBy(() -> Utm.zone(32, Hemisphere.NORTH).project(85, 9)).hasMessageContaining("85.0");
        assertThat(UniversalGrids.forPosition(84.0000001, 10)).isEqualTo(Ups.of(Hemisphere.NORTH));
        assertThat(UniversalGrids.forPosition(-80.0000001, 10)).isEqualTo(Ups.of(Hemisphere.SOUTH));
        assertThat(UniversalGrids.forPosition(84, 10)).isEqualTo(Utm.zone(33, Hemisphere.NORTH));
        assertThat(Ups.of(Hemisphere.NORTH).project(90, 0).easting()).isEqualTo(2_000_000);
        assertThat(Ups.of(Hemisphere.NORTH).project(90, 0).scale()).isCloseTo(0.994, within(1e-15));
        assertThat(Ups.of(Hemisphere.NORTH).project(83.5, 0).northing()).isLessThan(2_000_000);
        assertThatThrownBy(() -> Ups.of(Hemisphere.NORTH).project(83.4, 0)).hasMessageContaining("83.4");
        assertThatThrownBy(() -> Ups.of(Hemisphere.SOUTH).project(-79.4, 0)).hasMessageContaining("-79.4");
    }

    @Test
    void explicitZoneFarFromItsCentralMeridian() {
        // Source: common practice — a point may be projected into a neighbouring zone (overlap); here up
        // to 9° from the central meridian, farther is refused as a wrong zone.
        Utm z31 = Utm.zone(31, Hemisphere.NORTH);
        assertThat(z31.project(45, 12).easting()).isGreaterThan(1_000_000);
        assertThatThrownBy(() -> z31.project(45, 12.5)).isInstanceOf(ProjectionDomainException.class)
            .hasMessageContaining("12.5").hasMessageContaining("31N");
        assertThatThrownBy(() -> z31.unproject(1_500_000, 5_000_000)).isInstanceOf(ProjectionDomainException.class)
            .hasMessageContaining("1500000");
    }
}
