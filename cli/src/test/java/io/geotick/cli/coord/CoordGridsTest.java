package io.geotick.cli.coord;

import static io.geotick.cli.coord.CoordCommandTest.coord;
import static io.geotick.cli.coord.CoordCommandTest.fieldNames;
import static io.geotick.cli.coord.CoordCommandTest.json;
import static io.geotick.cli.coord.CoordCommandTest.textFields;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import io.geotick.cli.CliRun;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.locationtech.proj4j.CRSFactory;
import org.locationtech.proj4j.ProjCoordinate;
import org.locationtech.proj4j.proj.Projection;

/**
 * {@code geotick coord} with map grids: {@code utm}, {@code utm:ZONE}, {@code ups:N|S} and {@code EPSG:n},
 * end to end through {@code Main.run}. Values are checked against published examples and against Proj4J as
 * a reference library (its projection objects used directly, not through geotick).
 */
class CoordGridsTest {
    private static final CRSFactory CRS = new CRSFactory();

    /** Proj4J's own projection of (lat, lon) in the system of that EPSG code: {E, N}. */
    static double[] proj4j(String code, double lat, double lon) {
        Projection p = CRS.createFromName(code).getProjection();
        ProjCoordinate out = p.project(new ProjCoordinate(lon, lat), new ProjCoordinate());
        return new double[] {out.x, out.y};
    }

    @Test
    void jsonFieldsOfAUtmTarget() throws Exception {
        JsonNode j = json(coord("--from", "geodetic", "--to", "utm:31N", "--json", "52.0", "3.5", "45"));
        assertThat(fieldNames(j)).containsExactly("easting", "northing", "h", "zone", "scale", "convergence", "unit",
            "system", "ellipsoid", "from", "to", "epoch");
        assertThat(j.get("unit").asText()).isEqualTo("m");
        assertThat(j.get("zone").asText()).isEqualTo("31N");
        assertThat(j.get("system").asText()).isEqualTo("utm:31N");
        // Source: Proj4J 1.4.1 EPSG:32631 as reference library (agreement to 1 mm within 3° of the CM).
        double[] ref = proj4j("EPSG:32631", 52.0, 3.5);
        assertThat(j.get("easting").asDouble()).isCloseTo(ref[0], within(0.001));
        assertThat(j.get("northing").asDouble()).isCloseTo(ref[1], within(0.001));
        assertThat(j.get("h").asDouble()).isCloseTo(45.0, within(1e-8));
        // Source: UTM definition, k0 = 0.9996 and γ ≈ Δλ·sin φ to first order (common practice).
        assertThat(j.get("scale").asDouble()).isCloseTo(0.9996144638, within(1e-9)).isGreaterThan(0.9996);
        assertThat(j.get("convergence").asDouble()).isCloseTo(0.5 * Math.sin(Math.toRadians(52)), within(0.001));
    }

    @Test
    void textIsLabelledWithUnits() {
        CliRun r = coord("--from", "geodetic", "--to", "utm", "52.0", "3.5", "45");
        assertThat(r.exitCode()).isZero();
        Map<String, String> t = textFields(r.out());
        assertThat(t.keySet()).containsExactly("system", "ellipsoid", "zone", "easting", "northing", "height", "scale",
            "convergence");
        assertThat(t.get("zone")).isEqualTo("31N");
        assertThat(t.get("easting")).endsWith(" m");
        assertThat(t.get("convergence")).endsWith(" deg");
        assertThat(t.get("scale")).matches("0\\.\\d{10}");
        assertThat(r.out()).contains("easting       534325.167455 m");
    }

    @ParameterizedTest(name = "{0}°, {1}° → zone {2}")
    @CsvSource({
        // Source: UTM grid rules as published for the UTM standard (common practice): regular 6° zones,
        // zone 32V widened to 3°E–12°E between 56°N and 64°N, Svalbard zones 31X/33X/35X/37X (72°N–84°N).
        "52.0, 3.5, 31N", "60.0, 4.0, 32N", "60.0, 2.5, 31N", "78.0, 8.0, 31N", "78.0, 10.0, 33N", "78.0, 22.0, 35N",
        "78.0, 35.0, 37N", "-33.9, 18.4, 34S", "0.0, -0.5, 30N", "-0.000001, 177.0, 60S"})
    void automaticZoneFollowsTheRules(double lat, double lon, String zone) throws Exception {
        JsonNode j = json(coord("--from", "geodetic", "--to", "utm", "--json", "--", Double.toString(lat),
            Double.toString(lon), "0"));
        assertThat(j.get("zone").asText()).isEqualTo(zone);
        assertThat(j.get("system").asText()).isEqualTo("utm");
    }

    @Test
    void explicitZonesRoundTrip() throws Exception {
        JsonNode g = json(coord("--from", "geodetic", "--to", "utm:33S", "--json", "--", "-33.9", "13.6", "12.5"));
        // Source: UTM definition, false northing 10 000 000 m in the south (common practice); Proj4J EPSG:32733.
        double[] ref = proj4j("EPSG:32733", -33.9, 13.6);
        assertThat(g.get("easting").asDouble()).isCloseTo(ref[0], within(0.001));
        assertThat(g.get("northing").asDouble()).isCloseTo(ref[1], within(0.001));
        JsonNode back = json(coord("--from", "utm:33S", "--to", "geodetic", "--json", g.get("easting").asText(),
            g.get("northing").asText(), g.get("h").asText()));
        // Round trip: within 1 nm of position (1e-14° ≈ 1 nm).
        assertThat(back.get("lat").asDouble()).isCloseTo(-33.9, within(1e-13));
        assertThat(back.get("lon").asDouble()).isCloseTo(13.6, within(1e-13));
        assertThat(back.get("h").asDouble()).isCloseTo(12.5, within(1e-8));
    }

    @Test
    void heightMayBeLeftOut() throws Exception {
        JsonNode j = json(coord("--from", "utm:31N", "--to", "geodetic", "--json", "534325.167455", "5761156.235699"));
        assertThat(fieldNames(j)).contains("lat", "lon").doesNotContain("h");
        assertThat(j.has("warnings")).isFalse(); // no datum change: the height does not matter
        CliRun r = coord("--from", "utm:31N", "--to", "ecef", "534325.167455", "5761156.235699");
        assertThat(r.exitCode()).isEqualTo(2);
        assertThat(r.err()).contains("'ecef' needs the height");
    }

    @Test
    void upsBeyondTheUtmLimits() throws Exception {
        JsonNode j = json(coord("--from", "geodetic", "--to", "ups:N", "--json", "87", "30", "0"));
        assertThat(j.get("zone").asText()).isEqualTo("N");
        // Source: Proj4J 1.4.1 EPSG:32661 (UPS North) as reference library; UPS k0 = 0.994, FE = FN = 2 000 000 m
        // (common practice); convergence of a north polar grid = λ − λ0 (IOGP Guidance Note 7-2, from memory).
        double[] ref = proj4j("EPSG:32661", 87, 30);
        assertThat(j.get("easting").asDouble()).isCloseTo(ref[0], within(0.001));
        assertThat(j.get("northing").asDouble()).isCloseTo(ref[1], within(0.001));
        assertThat(j.get("convergence").asDouble()).isCloseTo(30.0, within(1e-12));
        JsonNode s = json(coord("--from", "geodetic", "--to", "ups:S", "--json", "--", "-85", "-60", "0"));
        double[] refS = proj4j("EPSG:32761", -85, -60);
        assertThat(s.get("easting").asDouble()).isCloseTo(refS[0], within(0.001));
        assertThat(s.get("northing").asDouble()).isCloseTo(refS[1], within(0.001));

        CliRun utm = coord("--from", "geodetic", "--to", "utm", "86", "20", "0");
        assertThat(utm.exitCode()).isEqualTo(2);
        assertThat(utm.err()).contains("latitude 86.0").contains("outside the UTM limits").contains("--to ups:N");
        // Not a latitude at all: the plain range error, with no UPS hint.
        CliRun notLat = coord("--from", "geodetic", "--to", "utm", "91", "20", "0");
        assertThat(notLat.exitCode()).isEqualTo(2);
        assertThat(notLat.err()).contains("latitude 91.0° is outside [-90°, 90°]").doesNotContain("ups");
        CliRun ups = coord("--from", "geodetic", "--to", "ups:N", "80", "3", "0");
        assertThat(ups.exitCode()).isEqualTo(2);
        assertThat(ups.err()).contains("latitude 80.0").contains("83.5");
    }

    @Test
    void badGridInputNamesTheValue() {
        CliRun zone61 = coord("--from", "geodetic", "--to", "utm:61N", "1", "2", "3");
        assertThat(zone61.exitCode()).isEqualTo(2);
        assertThat(zone61.err()).contains("'utm:61N'").contains("zone 61").doesNotContain("Exception");
        CliRun band = coord("--from", "geodetic", "--to", "utm:31U", "1", "2", "3");
        assertThat(band.exitCode()).isEqualTo(2);
        assertThat(band.err()).contains("'utm:31U'");
        CliRun source = coord("--from", "utm", "--to", "geodetic", "500000", "5500000", "0");
        assertThat(source.exitCode()).isEqualTo(2);
        assertThat(source.err()).contains("'utm' as a source needs its zone").contains("utm:31N");
        CliRun beyond = coord("--from", "geodetic", "--to", "utm:31N", "85", "3", "0");
        assertThat(beyond.exitCode()).isEqualTo(2);
        assertThat(beyond.err()).contains("latitude 85.0");
        CliRun far = coord("--from", "geodetic", "--to", "utm:31N", "50", "20", "0");
        assertThat(far.exitCode()).isEqualTo(2);
        assertThat(far.err()).contains("longitude 20.0").contains("zone 31N");
        CliRun pole = coord("--from", "geodetic", "--to", "ups", "88", "3", "0");
        assertThat(pole.exitCode()).isEqualTo(2);
        assertThat(pole.err()).contains("ups:N or ups:S");
        CliRun unknown = coord("--from", "geodetic", "--to", "EPSG:999999", "1", "2", "3");
        assertThat(unknown.exitCode()).isEqualTo(2);
        assertThat(unknown.err()).contains("unknown EPSG code 999999").doesNotContain("Exception");
        CliRun lcc = coord("--from", "geodetic@WGS84", "--to", "EPSG:2154@WGS84", "90", "3", "0");
        assertThat(lcc.err()).contains("EPSG:2154@WGS84").contains("GRS 1980");
        assertThat(lcc.exitCode()).isEqualTo(2);
        CliRun lccPole = coord("--from", "geodetic@ETRF2000", "--to", "EPSG:2154@ETRF2000", "90", "3", "0");
        assertThat(lccPole.exitCode()).isEqualTo(2);
        assertThat(lccPole.err()).contains("90");
    }

    @Test
    void nationalGridThroughItsEpsgCode() throws Exception {
        // Source: Ordnance Survey, A Guide to Coordinate Systems in Great Britain, worked example (values from
        // memory): OSGB36 52°39'27.2531"N 1°43'4.5177"E → E 651409.903 m, N 313177.270 m.
        double lat = 52 + 39 / 60.0 + 27.2531 / 3600;
        double lon = 1 + 43 / 60.0 + 4.5177 / 3600;
        JsonNode j = json(coord("--from", "geodetic@OSGB36", "--to", "EPSG:27700", "--json", Double.toString(lat),
            Double.toString(lon), "0"));
        assertThat(j.get("easting").asDouble()).isCloseTo(651409.903, within(0.001));
        assertThat(j.get("northing").asDouble()).isCloseTo(313177.270, within(0.001));
        assertThat(j.has("zone")).isFalse();
        // The datum (Proj4J: Airy 1830 with the OSGB36 shift) is the registry's OSGB 1936: no datum warning.
        assertThat(j.has("warnings")).isFalse();
        assertThat(j.get("ellipsoid").asText()).isEqualTo("Airy 1830");
        // Source: IOGP Guidance Note 7-2, Transverse Mercator worked example on the British National Grid:
        // 50°30'N 0°30'E → E 577274.99, N 69740.50 (values from memory; the in-house projection gives 577274.984,
        // 69740.492, as the projection reference tests record).
        JsonNode i = json(coord("--from", "geodetic@OSGB36", "--to", "EPSG:27700", "--json", "50.5", "0.5", "0"));
        assertThat(i.get("easting").asDouble()).isCloseTo(577274.99, within(0.01));
        assertThat(i.get("northing").asDouble()).isCloseTo(69740.50, within(0.01));
    }

    @Test
    void explainListsTheProjectionStep() {
        CliRun r = coord("--from", "geodetic", "--to", "utm:31N", "--explain", "52.0", "3.5", "45");
        assertThat(r.exitCode()).isZero();
        assertThat(r.out()).contains("geodetic → UTM zone 31N (WGS 84)")
            .contains("Transverse Mercator, Krüger series to 6th order").contains("(EPSG method 9807)")
            .contains("longitude of natural origin = 3 degree").contains("scale factor at natural origin = 0.9996")
            .contains("~5 nm within 3,900 km").contains("accuracy: 0.000000005 m");
        CliRun ups = coord("--from", "ups:S", "--to", "geodetic", "--explain", "2000000", "2500000", "0");
        assertThat(ups.out()).contains("(EPSG method 9810)").contains("scale factor at natural origin = 0.994");
        // A method without an in-house implementation says so, with Proj4J's lower accuracy.
        CliRun rd = coord("--from", "geodetic@WGS84", "--to", "EPSG:28992", "--explain", "52.1", "5.2", "0");
        assertThat(rd.exitCode()).isZero();
        assertThat(rd.out()).contains("Proj4J projection").contains("not implemented in-house")
            .contains("accuracy: 0.001 m").contains("warning      EPSG:28992: computed by Proj4J");
    }

    @Test
    void epsgDatumsMapToRegistryFramesOrSaySo() throws Exception {
        // ED50 / UTM 31N: Proj4J's ED50 shift (-87, -98, -121) is the registry's ED50 → WGS 84 set.
        CliRun ed = coord("--from", "geodetic@ED50", "--to", "EPSG:23031", "--explain", "52", "3.5", "0");
        // Same frame at both ends: the point goes straight onto the grid (one step, no Proj4J datum).
        assertThat(ed.out()).contains("International 1924").contains("steps: 1").doesNotContain("datum of EPSG")
            .doesNotContain("warning");
        // Proj4J's ETRS89 is GRS 1980 with a zero shift: no registry frame; the warning names the source.
        JsonNode w = json(coord("--from", "geodetic@WGS84", "--to", "EPSG:25831", "--json", "--epoch", "2026.5", "52",
            "3.5", "0"));
        assertThat(w.get("warnings").toString()).contains("taken from the EPSG definitions bundled with Proj4J")
            .contains("EPSG:25831@ETRF2000").doesNotContain("+proj").doesNotContain("towgs84");
        assertThat(w.get("ellipsoid").asText()).isEqualTo("GRS 1980");
        // Naming the realisation: the registry path ITRF/ETRF2000 is used, no Proj4J datum.
        JsonNode e = json(coord("--from", "geodetic@ETRF2000", "--to", "EPSG:25831@ETRF2000", "--json", "52", "3.5",
            "0"));
        assertThat(e.has("warnings")).isFalse();
        assertThat(e.get("system").asText()).isEqualTo("EPSG:25831@ETRF2000");
        // Frames combine with explicit zones the same way.
        JsonNode u = json(coord("--from", "geodetic@ETRF2000", "--to", "utm:31N@ETRF2000", "--json", "52", "3.5",
            "0"));
        assertThat(u.get("easting").asDouble()).isCloseTo(e.get("easting").asDouble(), within(1e-9));
        // An EPSG end needs a frame at the other end too.
        CliRun bare = coord("--from", "geodetic", "--to", "EPSG:32631", "52", "3.5", "0");
        assertThat(bare.exitCode()).isEqualTo(2);
        assertThat(bare.err()).contains("implies frame WGS 84");
        // The hint is typeable in a shell: the frame's alias without spaces.
        assertThat(bare.err()).contains("geodetic@WGS84 for the same frame");
        CliRun bng = coord("--from", "geodetic", "--to", "EPSG:27700", "52", "-1.5", "0");
        assertThat(bng.err()).contains("implies frame OSGB 1936").contains("geodetic@OSGB36 for the same frame");
    }

    @Test
    void geographicAndOtherEpsgSystems() throws Exception {
        JsonNode g = json(coord("--from", "EPSG:27700", "--to", "EPSG:4277", "--json", "651409.903", "313177.270",
            "0"));
        // Source: Ordnance Survey worked example, inverse direction (values from memory).
        assertThat(g.get("lat").asDouble()).isCloseTo(52 + 39 / 60.0 + 27.2531 / 3600, within(1e-8));
        assertThat(g.get("lon").asDouble()).isCloseTo(1 + 43 / 60.0 + 4.5177 / 3600, within(1e-8));
        // Lambert 93 (LCC 2SP) and Web Mercator against Proj4J as reference library.
        for (String[] c : List.of(new String[] {"EPSG:2154", "geodetic@ETRF2000", "EPSG:2154@ETRF2000"},
                new String[] {"EPSG:3857", "geodetic@WGS84", "EPSG:3857"})) {
            JsonNode j = json(coord("--from", c[1], "--to", c[2], "--json", "46.8", "2.3", "0"));
            double[] ref = proj4j(c[0], 46.8, 2.3);
            assertThat(j.get("easting").asDouble()).as(c[0]).isCloseTo(ref[0], within(0.001));
            assertThat(j.get("northing").asDouble()).as(c[0]).isCloseTo(ref[1], within(0.001));
        }
    }
}
