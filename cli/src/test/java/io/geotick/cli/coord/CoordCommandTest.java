package io.geotick.cli.coord;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import io.geotick.cli.CliRun;
import io.geotick.cli.Json;
import io.geotick.geodesy.ecef.EcefConverter;
import io.geotick.geodesy.ellipsoid.Ellipsoids;
import io.geotick.geodesy.position.EcefPosition;
import io.geotick.geodesy.position.GeodeticPosition;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * {@code geotick coord} end to end through {@code Main.run}: every pair of systems against published
 * values, the exact JSON field names, the text labels and units, negative values, and bad input.
 */
class CoordCommandTest {
    // Source: IOGP Guidance Note 7-2, §4.1.1, EPSG method 9602 worked example, WGS 84 (values from memory):
    // φ = 53°48'33.820"N, λ = 2°07'46.380"E, h = 73.0 m  <->  X = 3771793.968, Y = 140253.342, Z = 5124304.349 m.
    static final double LAT = 53 + 48 / 60.0 + 33.820 / 3600;
    static final double LON = 2 + 7 / 60.0 + 46.380 / 3600;
    static final double H = 73.0;
    static final double X = 3771793.968;
    static final double Y = 140253.342;
    static final double Z = 5124304.349;
    // Source: IOGP Guidance Note 7-2, §4.1.2, EPSG method 9836 worked example, WGS 84 (values from memory):
    // topocentric origin φ0 = 55°N, λ0 = 5°E, h0 = 200 m; the point above has U (east) = -189013.869,
    // V (north) = -128642.040, W (up) = -4220.171 m.
    static final String ORIGIN = "55,5,200";
    static final double EAST = -189013.869;
    static final double NORTH = -128642.040;
    static final double UP = -4220.171;
    // Azimuth, elevation, range derived from the IOGP ENU values above by the definitions
    // az = atan2(E, N) clockwise from north, el = atan2(U, √(E² + N²)), range = |(E, N, U)| (common practice).
    static final double AZ = Math.toDegrees(Math.atan2(EAST, NORTH)) + 360;
    static final double EL = Math.toDegrees(Math.atan2(UP, Math.hypot(EAST, NORTH)));
    static final double RANGE = Math.sqrt(EAST * EAST + NORTH * NORTH + UP * UP);

    // The published values are rounded to 1 mm (and 0.001"), so a conversion of one into another agrees to
    // about 1 mm per coordinate; 2 mm, and its angular equivalent, is the allowance.
    static final double TOL_M = 0.002;
    static final double TOL_LATLON_DEG = 2.0e-8; // 2.2 mm on the ground
    static final double TOL_AER_DEG = 6.0e-7; // 2.4 mm at the 228 km range of the example

    /** The IOGP point in each system: SYS text, JSON keys, values, tolerances. */
    record Ref(String sys, List<String> keys, double[] values, double[] tolerances) {
        String[] valueArgs() {
            return Stream.of(0, 1, 2).map(i -> Double.toString(values[i])).toArray(String[]::new);
        }

        @Override
        public String toString() {
            return sys;
        }
    }

    static final List<Ref> REFS = List.of(
        new Ref("geodetic", List.of("lat", "lon", "h"), new double[] {LAT, LON, H},
            new double[] {TOL_LATLON_DEG, TOL_LATLON_DEG, TOL_M}),
        new Ref("ecef", List.of("x", "y", "z"), new double[] {X, Y, Z}, new double[] {TOL_M, TOL_M, TOL_M}),
        new Ref("enu:" + ORIGIN, List.of("e", "n", "u"), new double[] {EAST, NORTH, UP},
            new double[] {TOL_M, TOL_M, TOL_M}),
        new Ref("ned:" + ORIGIN, List.of("n", "e", "d"), new double[] {NORTH, EAST, -UP},
            new double[] {TOL_M, TOL_M, TOL_M}),
        new Ref("aer:" + ORIGIN, List.of("az", "el", "range"), new double[] {AZ, EL, RANGE},
            new double[] {TOL_AER_DEG, TOL_AER_DEG, TOL_M}));

    static Stream<Arguments> everyPair() {
        List<Arguments> pairs = new ArrayList<>();
        for (Ref from : REFS) {
            for (Ref to : REFS) {
                pairs.add(Arguments.of(from, to));
            }
        }
        return pairs.stream();
    }

    static JsonNode json(CliRun r) throws Exception {
        assertThat(r.err()).isEmpty();
        assertThat(r.exitCode()).isZero();
        assertThat(r.out().strip()).doesNotContain("\n"); // one JSON object on one line
        return Json.MAPPER.readTree(r.out());
    }

    static List<String> fieldNames(JsonNode n) {
        List<String> names = new ArrayList<>();
        for (Iterator<String> it = n.fieldNames(); it.hasNext(); ) {
            names.add(it.next());
        }
        return names;
    }

    static CliRun coord(String... args) {
        String[] all = new String[args.length + 1];
        all[0] = "coord";
        System.arraycopy(args, 0, all, 1, args.length);
        return CliRun.of(all);
    }

    /** Parses text output into label → value (numbers) or label → text (system, ellipsoid). */
    static Map<String, String> textFields(String out) {
        Map<String, String> m = new LinkedHashMap<>();
        for (String line : out.split("\\R")) {
            String[] parts = line.strip().split("\\s+", 2);
            m.put(parts[0], parts.length > 1 ? parts[1] : "");
        }
        return m;
    }

    // ---- every system pair, against the published values ----

    @ParameterizedTest(name = "{0} -> {1}")
    @MethodSource("everyPair")
    void everyPairOfSystemsAgreesWithIogp(Ref from, Ref to) throws Exception {
        // Source: IOGP Guidance Note 7-2 §4.1.1 and §4.1.2 worked examples (values from memory), see REFS.
        List<String> args = new ArrayList<>(List.of("--from", from.sys(), "--to", to.sys(), "--json", "--"));
        args.addAll(List.of(from.valueArgs()));
        JsonNode n = json(coord(args.toArray(String[]::new)));
        List<String> expectedFields = new ArrayList<>(to.keys());
        expectedFields.addAll(List.of("system", "ellipsoid"));
        assertThat(fieldNames(n)).containsExactlyElementsOf(expectedFields);
        for (int i = 0; i < 3; i++) {
            JsonNode v = n.get(to.keys().get(i));
            assertThat(v.isNumber()).as(to.keys().get(i)).isTrue();
            assertThat(v.doubleValue()).as(to.keys().get(i)).isCloseTo(to.values()[i], within(to.tolerances()[i]));
        }
        assertThat(n.get("system").asText()).isEqualTo(to.sys());
        assertThat(n.get("ellipsoid").asText()).isEqualTo("WGS 84");
    }

    @Test
    void geodeticToEcefTextIsLabelledWithUnits() {
        // Source: IOGP Guidance Note 7-2 §4.1.1, EPSG 9602 worked example (values from memory).
        CliRun r = coord("--from", "geodetic", "--to", "ecef", Double.toString(LAT), Double.toString(LON), "73");
        assertThat(r.exitCode()).isZero();
        assertThat(r.err()).isEmpty();
        Map<String, String> f = textFields(r.out());
        assertThat(f.keySet()).containsExactly("system", "ellipsoid", "x", "y", "z");
        assertThat(f.get("system")).isEqualTo("ecef");
        assertThat(f.get("ellipsoid")).isEqualTo("WGS 84");
        assertThat(f.get("x")).endsWith(" m");
        assertThat(Double.parseDouble(f.get("x").replace(" m", ""))).isCloseTo(X, within(0.0006));
        assertThat(Double.parseDouble(f.get("y").replace(" m", ""))).isCloseTo(Y, within(0.0006));
        assertThat(Double.parseDouble(f.get("z").replace(" m", ""))).isCloseTo(Z, within(0.0006));
        // Lengths are shown to the micrometre.
        assertThat(f.get("x")).matches("-?\\d+\\.\\d{6} m");
    }

    @Test
    void ecefToGeodeticTextShowsDegreesAndMetres() {
        // Source: IOGP Guidance Note 7-2 §4.1.1, EPSG 9602 worked example (values from memory).
        CliRun r = coord("--from", "ecef", "--to", "geodetic", "3771793.968", "140253.342", "5124304.349");
        assertThat(r.exitCode()).isZero();
        Map<String, String> f = textFields(r.out());
        assertThat(f.keySet()).containsExactly("system", "ellipsoid", "latitude", "longitude", "height");
        assertThat(f.get("latitude")).matches("\\d+\\.\\d{11} deg");
        assertThat(f.get("longitude")).matches("\\d+\\.\\d{11} deg");
        assertThat(f.get("height")).matches("\\d+\\.\\d{6} m");
        assertThat(Double.parseDouble(f.get("latitude").replace(" deg", ""))).isCloseTo(LAT, within(TOL_LATLON_DEG));
        assertThat(Double.parseDouble(f.get("longitude").replace(" deg", ""))).isCloseTo(LON, within(TOL_LATLON_DEG));
        assertThat(Double.parseDouble(f.get("height").replace(" m", ""))).isCloseTo(H, within(TOL_M));
    }

    @Test
    void localSystemsTextLabels() {
        // Labels and units only; the numbers are checked by everyPairOfSystemsAgreesWithIogp.
        String[] point = {"--", "3771793.968", "140253.342", "5124304.349"};
        assertThat(textFields(coord(concat(new String[] {"--from", "ecef", "--to", "enu:" + ORIGIN}, point)).out()))
            .containsKeys("east", "north", "up").containsEntry("system", "enu:55,5,200");
        assertThat(textFields(coord(concat(new String[] {"--from", "ecef", "--to", "ned:" + ORIGIN}, point)).out())
            .keySet()).containsExactly("system", "ellipsoid", "north", "east", "down");
        Map<String, String> aer = textFields(coord(concat(new String[] {"--from", "ecef", "--to", "aer:" + ORIGIN},
            point)).out());
        assertThat(aer.keySet()).containsExactly("system", "ellipsoid", "azimuth", "elevation", "range");
        assertThat(aer.get("azimuth")).endsWith(" deg");
        assertThat(aer.get("elevation")).endsWith(" deg");
        assertThat(aer.get("range")).endsWith(" m");
    }

    @Test
    void textLinesUpTheDecimalPoints() {
        CliRun r = coord("--from", "ecef", "--to", "enu:" + ORIGIN, "--", "3771793.968", "140253.342", "5124304.349");
        List<String> valueLines = r.out().lines().skip(2).toList();
        assertThat(valueLines).hasSize(3);
        assertThat(valueLines.stream().map(l -> l.indexOf('.')).distinct()).hasSize(1);
    }

    @Test
    void jsonCarriesFullPrecision() throws Exception {
        // Checks that the writer loses no digits: the JSON number reads back to the very double the geodesy
        // module computes (the module's accuracy itself is checked against IOGP above).
        JsonNode n = json(coord("--from", "geodetic", "--to", "ecef", "--json", Double.toString(LAT),
            Double.toString(LON), "73"));
        EcefPosition p = EcefConverter.of(Ellipsoids.WGS84).toEcef(GeodeticPosition.of(LAT, LON, H));
        assertThat(n.get("x").doubleValue()).isEqualTo(p.x());
        assertThat(n.get("y").doubleValue()).isEqualTo(p.y());
        assertThat(n.get("z").doubleValue()).isEqualTo(p.z());
    }

    @Test
    void jsonFieldNamesForEachTarget() throws Exception {
        String[] point = {"--", "3771793.968", "140253.342", "5124304.349"};
        assertThat(fieldNames(json(coord(concat(new String[] {"--from", "ecef", "--to", "geodetic", "--json"}, point)))))
            .containsExactly("lat", "lon", "h", "system", "ellipsoid");
        assertThat(fieldNames(json(coord(concat(new String[] {"--from", "ecef", "--to", "ecef", "--json"}, point)))))
            .containsExactly("x", "y", "z", "system", "ellipsoid");
        assertThat(fieldNames(json(coord(concat(new String[] {"--from", "ecef", "--to", "enu:1,2,3", "--json"},
            point))))).containsExactly("e", "n", "u", "system", "ellipsoid");
        assertThat(fieldNames(json(coord(concat(new String[] {"--from", "ecef", "--to", "ned:1,2,3", "--json"},
            point))))).containsExactly("n", "e", "d", "system", "ellipsoid");
        assertThat(fieldNames(json(coord(concat(new String[] {"--from", "ecef", "--to", "aer:1,2,3", "--json"},
            point))))).containsExactly("az", "el", "range", "system", "ellipsoid");
    }

    // ---- negative values, with and without "--" ----

    @Test
    void negativeValuesWorkWithoutDoubleDash() throws Exception {
        // Source: IOGP Guidance Note 7-2 §4.1.1 example (values from memory), mirrored through the equator and
        // the Greenwich meridian: the ellipsoid is symmetric, so (-φ, -λ, h) <-> (X, -Y, -Z) (geometry).
        JsonNode n = json(coord("--from", "geodetic", "--to", "ecef", "--json",
            Double.toString(-LAT), Double.toString(-LON), "73"));
        assertThat(n.get("x").doubleValue()).isCloseTo(X, within(TOL_M));
        assertThat(n.get("y").doubleValue()).isCloseTo(-Y, within(TOL_M));
        assertThat(n.get("z").doubleValue()).isCloseTo(-Z, within(TOL_M));
    }

    @Test
    void negativeValuesWorkAfterDoubleDash() throws Exception {
        // Source: IOGP Guidance Note 7-2 §4.1.2, EPSG 9836 worked example, reversed (values from memory).
        JsonNode n = json(coord("--from", "enu:" + ORIGIN, "--to", "ecef", "--json", "--",
            "-189013.869", "-128642.040", "-4220.171"));
        assertThat(n.get("x").doubleValue()).isCloseTo(X, within(TOL_M));
        assertThat(n.get("y").doubleValue()).isCloseTo(Y, within(TOL_M));
        assertThat(n.get("z").doubleValue()).isCloseTo(Z, within(TOL_M));
        // The same without "--", options after the values.
        JsonNode m = json(coord("--from", "enu:" + ORIGIN, "--to", "ecef", "-189013.869", "-128642.040",
            "-4220.171", "--json"));
        assertThat(m).isEqualTo(n);
    }

    @Test
    void negativeOriginAndExponentNotation() throws Exception {
        // Source: NGA.STND.0036 WGS 84 (b = 6356752.3142 m, derived from a and 1/f; from memory): the south
        // pole is at z = -b, and a point straight below the origin at the pole has up = -(distance).
        JsonNode n = json(coord("--from", "geodetic", "--to", "ecef", "--json", "-90", "-1.5e2", "-0"));
        assertThat(n.get("z").doubleValue()).isCloseTo(-6356752.3142, within(0.00005));
        assertThat(n.get("x").doubleValue()).isCloseTo(0.0, within(1e-9));
        JsonNode u = json(coord("--from", "ecef", "--to", "enu:-90,0,0", "--json", "0", "0", "-6356000"));
        assertThat(u.get("u").doubleValue()).isCloseTo(-752.3142, within(0.00005));
    }

    // ---- ellipsoid option ----

    @Test
    void ellipsoidOptionIsUsedAndReported() throws Exception {
        // Source: Moritz, Geodetic Reference System 1980: semi-minor axis b = 6356752.3141 m (from memory).
        JsonNode n = json(coord("--from", "geodetic", "--to", "ecef", "--ellipsoid", "GRS 1980", "--json", "90", "0",
            "0"));
        assertThat(n.get("z").doubleValue()).isCloseTo(6356752.3141, within(0.00005));
        assertThat(n.get("ellipsoid").asText()).isEqualTo("GRS 1980");
        // Source: on a sphere of radius a = 6378137 m (EPSG 7059), the point (0°, -90°, 0) is at y = -a (geometry).
        JsonNode s = json(coord("--from", "geodetic", "--to", "ecef", "--ellipsoid", "WGS 84 sphere", "--json",
            "0", "-90", "0"));
        assertThat(s.get("y").doubleValue()).isEqualTo(-6378137.0);
        assertThat(s.get("x").doubleValue()).isCloseTo(0.0, within(1e-9));
    }

    // ---- bad input: exit 2, one line naming the value, no stack trace ----

    static Stream<Arguments> badInputs() {
        return Stream.of(
            Arguments.of(new String[] {"--from", "geodetic", "--to", "ecef", "91", "0", "0"}, "latitude 91"),
            Arguments.of(new String[] {"--from", "geodetic", "--to", "ecef", "NaN", "0", "0"}, "latitude 'NaN'"),
            Arguments.of(new String[] {"--from", "geodetic", "--to", "ecef", "--", "-NaN", "0", "0"}, "'-NaN'"),
            Arguments.of(new String[] {"--from", "geodetic", "--to", "ecef", "1", "Infinity", "0"},
                "longitude 'Infinity'"),
            Arguments.of(new String[] {"--from", "geodetic", "--to", "ecef", "1", "2"}, "got 2"),
            Arguments.of(new String[] {"--from", "geodetic", "--to", "ecef"}, "got none"),
            Arguments.of(new String[] {"--from", "geodetic", "--to", "ecef", "1", "2", "3", "4"}, "got 4"),
            Arguments.of(new String[] {"--from", "geodetic", "--to", "ecef", "1", "2", "12,5"}, "height '12,5'"),
            Arguments.of(new String[] {"--from", "geodetic", "--to", "ecef", "1", "2", "abc"}, "height 'abc'"),
            Arguments.of(new String[] {"--from", "geodetic", "--to", "ecef", "0x1p3", "2", "3"}, "latitude '0x1p3'"),
            Arguments.of(new String[] {"--from", "geodetic", "--to", "ecef", "1", "2", "1e999"}, "height '1e999'"),
            Arguments.of(new String[] {"--from", "geodetic", "--to", "ecef", "1", "2", ""}, "height is empty"),
            Arguments.of(new String[] {"--from", "foo", "--to", "ecef", "1", "2", "3"},
                "unknown coordinate system 'foo'; known: geodetic, ecef, enu:LAT,LON,H, ned:LAT,LON,H, aer:LAT,LON,H"),
            Arguments.of(new String[] {"--from", "ecef", "--to", "utm", "1", "2", "3"}, "unknown coordinate system 'utm'"),
            Arguments.of(new String[] {"--from", "geodetic", "--to", "ecef", "--ellipsoid", "Mars", "1", "2", "3"},
                "unknown ellipsoid 'Mars'"),
            Arguments.of(new String[] {"--from", "enu", "--to", "ecef", "1", "2", "3"}, "'enu' needs its origin"),
            Arguments.of(new String[] {"--from", "enu:1,2", "--to", "ecef", "1", "2", "3"}, "'enu:1,2'"),
            Arguments.of(new String[] {"--from", "ecef", "--to", "aer:1,x,3", "1", "2", "3"}, "origin longitude 'x'"),
            Arguments.of(new String[] {"--from", "ecef", "--to", "ned:91,0,0", "1", "2", "3"}, "origin latitude 91"),
            Arguments.of(new String[] {"--from", "aer:0,0,0", "--to", "ecef", "360", "0", "5"}, "azimuth 360"),
            Arguments.of(new String[] {"--from", "aer:0,0,0", "--to", "ecef", "10", "0", "-5"}, "range -5"),
            Arguments.of(new String[] {"--from", "ecef", "--to", "geodetic", "0", "0", "0"}, "Earth's centre"),
            Arguments.of(new String[] {"--to", "ecef", "1", "2", "3"}, "--from"),
            Arguments.of(new String[] {"--from", "geodetic", "--to", "ecef", "-abc", "2", "3"}, "-abc"));
    }

    @ParameterizedTest(name = "{1}")
    @MethodSource("badInputs")
    void badInputGivesExitTwoAndNamesTheValue(String[] args, String expected) {
        CliRun r = coord(args);
        assertThat(r.exitCode()).isEqualTo(2);
        assertThat(r.out()).isEmpty();
        String first = r.err().lines().findFirst().orElseThrow();
        assertThat(first).startsWith("geotick: ").contains(expected);
        assertThat(r.err()).doesNotContain("Exception").doesNotContain("\tat ");
    }

    @Test
    void inputErrorsAreOneLine() {
        // Errors found by geotick itself (not by the option parser, which adds a hint line) are exactly one line.
        for (String[] args : new String[][] {
            {"--from", "geodetic", "--to", "ecef", "91", "0", "0"},
            {"--from", "foo", "--to", "ecef", "1", "2", "3"},
            {"--from", "geodetic", "--to", "ecef", "1", "2", "3", "4"},
        }) {
            assertThat(coord(args).err().lines()).hasSize(1);
        }
    }

    // ---- help ----

    @Test
    void helpShowsSystemsUnitsExampleAndCautions() {
        CliRun r = coord("--help");
        assertThat(r.exitCode()).isZero();
        assertThat(r.out())
            .contains("--from", "--to", "--ellipsoid", "--json")
            .contains("geodetic", "ecef", "enu:LAT,LON,H", "ned:LAT,LON,H", "aer:LAT,LON,H")
            .contains("(deg", "(m)")
            .contains("Examples (invented points)")
            .contains("geotick coord --from geodetic --to ecef")
            .contains("Cautions:", "safety-of-life");
    }

    static String[] concat(String[] a, String[] b) {
        String[] all = new String[a.length + b.length];
        System.arraycopy(a, 0, all, 0, a.length);
        System.arraycopy(b, 0, all, a.length, b.length);
        return all;
    }
}
