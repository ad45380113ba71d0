package io.geotick.cli.coord;

import static io.geotick.cli.coord.CoordCommandTest.coord;
import static io.geotick.cli.coord.CoordCommandTest.fieldNames;
import static io.geotick.cli.coord.CoordCommandTest.json;
import static io.geotick.cli.coord.CoordCommandTest.textFields;
import static io.geotick.cli.coord.CoordGridsTest.proj4j;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import io.geotick.cli.CliRun;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * {@code geotick coord} with EPSG systems defined in feet: values printed and read in the system's unit,
 * labelled in text, {@code "unit"} in JSON, the unit in {@code --explain}. Checked against the IOGP worked
 * example in US survey feet and against Proj4J as a reference library (its results are in the system's unit).
 */
class CoordFeetTest {
    private static double number(String textValue) {
        return Double.parseDouble(textValue.split("\\s+")[0]);
    }

    @Test
    void textLabelsEastingAndNorthingInUsSurveyFeet() {
        CliRun r = coord("--from", "geodetic@NAD27", "--to", "EPSG:32040@NAD27", "28.5", "-96", "12.5");
        assertThat(r.exitCode()).isZero();
        assertThat(r.err()).isEmpty();
        Map<String, String> t = textFields(r.out());
        assertThat(t.get("easting")).endsWith(" ftUS");
        assertThat(t.get("northing")).endsWith(" ftUS");
        assertThat(t.get("height")).isEqualTo("12.500000 m");
        // Source: IOGP Guidance Note 7-2, Lambert Conic Conformal (2SP) worked example, NAD27 / Texas South
        // Central (from memory): 28°30'N 96°W → E 2 963 503.91 ftUS, N 254 759.80 ftUS.
        assertThat(number(t.get("easting"))).isCloseTo(2963503.91, within(0.005));
        assertThat(number(t.get("northing"))).isCloseTo(254759.80, within(0.005));
        // Six decimals of a foot (0.3 µm), as for metres.
        assertThat(t.get("easting")).matches("2963503\\.\\d{6} ftUS");
        assertThat(r.out()).doesNotContain("warning").doesNotContain("no unit conversion");
    }

    @Test
    void jsonCarriesTheUnitAndFullPrecisionFeet() throws Exception {
        JsonNode j = json(coord("--from", "geodetic@NAD27", "--to", "EPSG:32040@NAD27", "--json", "28.5", "-96", "0"));
        assertThat(fieldNames(j)).containsExactly("easting", "northing", "h", "scale", "convergence", "unit", "system",
            "ellipsoid", "from", "to", "epoch");
        assertThat(j.get("unit").asText()).isEqualTo("ftUS");
        // Source: Proj4J 1.4.1 EPSG:32040 as reference library, in US survey feet (measured 1.7e-8 ftUS apart).
        double[] ref = proj4j("EPSG:32040", 28.5, -96);
        assertThat(j.get("easting").asDouble()).isCloseTo(ref[0], within(3e-8));
        assertThat(j.get("northing").asDouble()).isCloseTo(ref[1], within(3e-8));
        assertThat(j.get("h").asDouble()).isZero();
        // Scale and convergence are unitless and degrees: the IOGP example's point, as for the metre grid.
        assertThat(j.get("scale").asDouble()).isCloseTo(0.99996856, within(1e-8));
        assertThat(j.has("warnings")).isFalse();
    }

    @Test
    void internationalFeetInJson() throws Exception {
        JsonNode j = json(coord("--from", "EPSG:4269", "--to", "EPSG:2222", "--json", "31", "-110.1666666666667", "0"));
        assertThat(j.get("unit").asText()).isEqualTo("ft");
        // Source: EPSG definition of NAD83 / Arizona East (ft): false easting 700 000 ft at the natural origin
        // 31°N 110°10'W (from memory); Proj4J 1.4.1 gives the same.
        assertThat(j.get("easting").asDouble()).isCloseTo(700000, within(1e-6));
        assertThat(j.get("northing").asDouble()).isCloseTo(0, within(1e-6));
        assertThat(j.get("easting").asDouble()).isCloseTo(proj4j("EPSG:2222", 31, -110.1666666666667)[0],
            within(1e-6));
        assertThat(j.get("warnings").toString()).doesNotContain("unit conversion").doesNotContain("metres");
    }

    @Test
    void feetAreReadAsInput() throws Exception {
        // Source: the same IOGP worked example, inverse (from memory): the published grid values in ftUS go back
        // to 28°30'N 96°W (0.005 ftUS of rounding is about 5e-8°).
        JsonNode g = json(coord("--from", "EPSG:32040@NAD27", "--to", "geodetic@NAD27", "--json", "2963503.91",
            "254759.80", "0"));
        assertThat(g.get("lat").asDouble()).isCloseTo(28.5, within(5e-8));
        assertThat(g.get("lon").asDouble()).isCloseTo(-96, within(5e-8));
        assertThat(g.has("unit")).isFalse();
        // International feet in, text out: Arizona East's false origin.
        CliRun r = coord("--from", "EPSG:2222", "--to", "EPSG:4269", "700000", "0");
        assertThat(r.exitCode()).isZero();
        Map<String, String> t = textFields(r.out());
        assertThat(number(t.get("latitude"))).isCloseTo(31, within(1e-10));
        assertThat(number(t.get("longitude"))).isCloseTo(-110.1666666666667, within(1e-10));
        // Feet to feet: the grid values come back in the unit they were given in.
        JsonNode same = json(coord("--from", "EPSG:2263", "--to", "EPSG:2263", "--json", "988212.237183",
            "211939.278568", "10"));
        assertThat(same.get("easting").asDouble()).isCloseTo(988212.237183, within(1e-7));
        assertThat(same.get("northing").asDouble()).isCloseTo(211939.278568, within(1e-7));
        assertThat(same.get("h").asDouble()).isCloseTo(10, within(1e-8));
    }

    @Test
    void explainShowsTheUnit() throws Exception {
        CliRun r = coord("--from", "geodetic@NAD27", "--to", "EPSG:32040@NAD27", "--explain", "28.5", "-96", "0");
        assertThat(r.exitCode()).isZero();
        assertThat(r.out()).contains("geodetic → EPSG:32040 grid (ftUS)")
            .contains("false easting in the grid unit = 2000000 ftUS")
            .contains("grid unit: 1 ftUS (US survey foot, 1200/3937 m exactly) = 0.304800609601 m")
            .contains("caution: eastings and northings are in the grid unit ftUS");
        JsonNode j = json(coord("--from", "geodetic@NAD27", "--to", "EPSG:32040@NAD27", "--json", "--explain", "28.5",
            "-96", "0"));
        assertThat(j.get("steps").toString()).contains("\"unit\":\"ftUS\"").contains("EPSG:32040 grid (ftUS)");
        // A metre system is unchanged: no unit parameters, unit "m".
        JsonNode bng = json(coord("--from", "geodetic@OSGB36", "--to", "EPSG:27700", "--json", "--explain", "52.1",
            "-1.4", "80"));
        assertThat(bng.get("unit").asText()).isEqualTo("m");
        assertThat(bng.get("steps").toString()).doesNotContain("grid unit");
    }

    @Test
    void aUnitThatCannotBeResolvedIsRefusedAndHelpNamesFeet() {
        CliRun r = coord("--from", "geodetic", "--to", "EPSG:3140", "-18", "178", "0");
        assertThat(r.exitCode()).isEqualTo(2);
        assertThat(r.err()).startsWith("geotick: ").contains("EPSG:3140").contains("'link'").doesNotContain("at io.");
        CliRun help = coord("--help");
        assertThat(help.out()).contains("northing in feet (ft or ftUS");
    }
}
