package io.geotick.cli.coord;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import io.geotick.cli.Json;
import io.geotick.cli.Main;
import java.io.PrintWriter;
import java.io.StringWriter;
import org.junit.jupiter.api.Test;

/** Latitudes and longitudes typed as degrees-minutes-seconds with hemisphere letters. */
class CoordDmsInputTest {

    private static String[] run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
        return new String[] {Integer.toString(code), out.toString(), err.toString()};
    }

    @Test
    void dmsPointGivesTheIogpGeocentricExample() throws Exception {
        // Source: IOGP Guidance Note 7-2, EPSG method 9602 worked example (WGS 84: 53°48'33.820"N,
        // 2°07'46.380"E, 73.0 m ↔ X 3771793.968, Y 140253.342, Z 5124304.349 m; values from memory).
        String[] r = run("coord", "--from", "geodetic", "--to", "ecef", "--json",
            "53°48'33.820\"N", "2°07'46.380\"E", "73.0");
        assertThat(r[0]).isEqualTo("0");
        JsonNode j = Json.MAPPER.readTree(r[1]);
        assertThat(j.get("x").asDouble()).isCloseTo(3771793.968, within(0.0005));
        assertThat(j.get("y").asDouble()).isCloseTo(140253.342, within(0.0005));
        assertThat(j.get("z").asDouble()).isCloseTo(5124304.349, within(0.0005));
    }

    @Test
    void westernLongitudeWithSpacesIsNegative() throws Exception {
        // Source: common practice (W longitudes are negative); the value itself is invented.
        String[] r = run("coord", "--from", "geodetic", "--to", "geodetic", "--json",
            "10 30 00 S", "0 00 05.3 W", "5");
        assertThat(r[0]).isEqualTo("0");
        JsonNode j = Json.MAPPER.readTree(r[1]);
        assertThat(j.get("lat").asDouble()).isCloseTo(-10.5, within(1e-12));
        assertThat(j.get("lon").asDouble()).isCloseTo(-5.3 / 3600, within(1e-12));
    }

    @Test
    void badDmsNamesTheArgumentAndExitsTwo() {
        String[] r = run("coord", "--from", "geodetic", "--to", "ecef", "91°00'00\"N", "0", "0");
        assertThat(r[0]).isEqualTo("2");
        assertThat(r[2]).contains("latitude").contains("91").doesNotContain("Exception");
        String[] r2 = run("coord", "--from", "geodetic", "--to", "ecef", "10°61'00\"N", "0", "0");
        assertThat(r2[0]).isEqualTo("2");
        assertThat(r2[2]).contains("10°61'00\"N");
    }
}
