package io.geotick.cli.coord;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import io.geotick.cli.CliRun;
import io.geotick.cli.Json;
import io.geotick.transforms.grid.Ntv2Writer;
import java.nio.ByteOrder;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code geotick coord --ntv2} and {@code --molodensky}. */
class CoordShiftOptionsTest {
    private static final String LAT = "40.42";
    private static final String LON = "-3.70";
    // Source: hand-computed bilinear interpolation (NTv2 Developer's Guide rule, the grid below) at
    // (40.42°N, 3.70°W): column x = (3.70 − 3.0)/0.5 = 1.4, row y = (40.42 − 40.0)/0.5 = 0.84, so i = 1,
    // fx = 0.4, j = 0, fy = 0.84 (nodes of rows 0 and 1, columns 1 and 2). Latitude: bottom
    // −3.125 + 0.125·0.4 = −3.075, top −2.75 + 0.25·0.4 = −2.65, shift −3.075 + 0.425·0.84 = −2.718″.
    // Longitude (positive west): bottom 4.75 + 0.25·0.4 = 4.85, top 4.5 + 0.5·0.4 = 4.7, shift
    // 4.85 − 0.15·0.84 = 4.724″ west.
    private static final double WANT_LAT = 40.42 - 2.718 / 3600;
    private static final double WANT_LON = -3.70 - 4.724 / 3600;

    /**
     * A 3 × 3 node grid, 40°..41°N, 3°..4°W, 0.5° spacing, ED50 → ETRF2000 (invented shifts, dyadic so that
     * the file's floats hold them exactly). Rows south to north, columns east to west, values in
     * arc-seconds (latitude north, longitude west).
     */
    static Path grid(Path dir, ByteOrder order) throws Exception {
        float[][] lat = {{-3.25f, -3.125f, -3.0f}, {-3.0f, -2.75f, -2.5f}, {-2.5f, -2.25f, -1.75f}};
        float[][] lonW = {{4.5f, 4.75f, 5.0f}, {4.25f, 4.5f, 5.0f}, {4.0f, 4.5f, 5.5f}};
        float[][][] nodes = new float[3][3][];
        for (int r = 0; r < 3; r++) {
            for (int c = 0; c < 3; c++) {
                nodes[r][c] = new float[] {lat[r][c], lonW[r][c], 0.05f, 0.05f};
            }
        }
        byte[] b = Ntv2Writer.write(order, "ED50", "ETRF2000", List.of(
            new Ntv2Writer.Sub("MADRID", "NONE", 144000, 147600, 10800, 14400, 1800, 1800, nodes)));
        Path p = dir.resolve("madrid-" + order + ".gsb");
        Files.write(p, b);
        return p;
    }

    @Test
    void ntv2ReverseUndoesTheForwardShift(@TempDir Path dir) throws Exception {
        Path g = grid(dir, ByteOrder.BIG_ENDIAN);
        // The reverse of the hand-computed forward point (see WANT_LAT/WANT_LON) lands back on the input: the
        // reverse is the forward inverted by iteration to < 1e-9° (NTv2 Developer's Guide: the grid is one-way).
        CliRun r = CliRun.of("coord", "--from", "geodetic@ETRF2000", "--to", "geodetic@ED50", "--ntv2", g.toString(),
            "--ntv2-reverse", "--json", "--explain", Double.toString(WANT_LAT), Double.toString(WANT_LON), "650");
        assertThat(r.err()).isEmpty();
        assertThat(r.exitCode()).isZero();
        JsonNode j = Json.MAPPER.readTree(r.out());
        assertThat(j.get("lat").asDouble()).isCloseTo(40.42, within(1e-9));
        assertThat(j.get("lon").asDouble()).isCloseTo(-3.70, within(1e-9));
        assertThat(j.get("h").asDouble()).isEqualTo(650.0);
        assertThat(j.get("steps").get(0).get("name").asText()).isEqualTo("ETRF2000 → ED50");
        CliRun alone = CliRun.of("coord", "--from", "geodetic@ETRF2000", "--to", "geodetic@ED50", "--ntv2-reverse",
            LAT, LON, "650");
        assertThat(alone.exitCode()).isEqualTo(2);
        assertThat(alone.err()).contains("--ntv2-reverse needs --ntv2");
    }

    @Test
    void ntv2ShiftMatchesHandComputedBilinear(@TempDir Path dir) throws Exception {
        for (ByteOrder order : List.of(ByteOrder.BIG_ENDIAN, ByteOrder.LITTLE_ENDIAN)) {
            Path g = grid(dir, order);
            CliRun r = CliRun.of("coord", "--from", "geodetic@ED50", "--to", "geodetic@ETRF2000", "--ntv2", g.toString(),
                "--json", LAT, LON, "650");
            assertThat(r.err()).isEmpty();
            assertThat(r.exitCode()).isZero();
            JsonNode j = Json.MAPPER.readTree(r.out());
            assertThat(j.get("lat").asDouble()).isCloseTo(WANT_LAT, within(1e-12)); // Source: hand bilinear above
            assertThat(j.get("lon").asDouble()).isCloseTo(WANT_LON, within(1e-12)); // Source: hand bilinear above
            // Heights pass through unchanged: NTv2 shifts are horizontal (NTv2 Developer's Guide).
            assertThat(j.get("h").asDouble()).isEqualTo(650.0);
            assertThat(j.get("ellipsoid").asText()).isEqualTo("GRS 1980");
        }
        Path g = grid(dir, ByteOrder.BIG_ENDIAN);
        CliRun text = CliRun.of("coord", "--from", "geodetic@ED50", "--to", "geodetic@ETRF2000", "--ntv2", g.toString(),
            "--explain", LAT, LON, "650");
        assertThat(text.exitCode()).isZero();
        assertThat(text.out()).contains("latitude", String.format(java.util.Locale.ROOT, "%.11f", WANT_LAT))
            .containsPattern("height +650.000000 m").contains("ED50 → ETRF2000").contains("NTv2 grid shift")
            .contains("EPSG method 9615").contains("accuracy: not stated").contains("steps: 1,");
        CliRun json = CliRun.of("coord", "--from", "geodetic@ED50", "--to", "geodetic@ETRF2000", "--ntv2", g.toString(),
            "--json", "--explain", LAT, LON, "650");
        JsonNode steps = Json.MAPPER.readTree(json.out()).get("steps");
        assertThat(steps).hasSize(1);
        assertThat(steps.get(0).get("epsg_method").asInt()).isEqualTo(9615);
        assertThat(steps.get(0).get("accuracy_m").isNull()).isTrue();
    }

    @Test
    void ntv2FromEcefAndOntoAGrid(@TempDir Path dir) throws Exception {
        Path g = grid(dir, ByteOrder.BIG_ENDIAN);
        CliRun geo = CliRun.of("coord", "--from", "geodetic@ED50", "--to", "ecef@ED50", "--json", LAT, LON, "650");
        JsonNode x = Json.MAPPER.readTree(geo.out());
        CliRun r = CliRun.of("coord", "--from", "ecef@ED50", "--to", "geodetic@ETRF2000", "--ntv2", g.toString(),
            "--json", "--explain", x.get("x").asText(), x.get("y").asText(), x.get("z").asText());
        JsonNode j = Json.MAPPER.readTree(r.out());
        // Source: hand bilinear above; the ECEF round trip adds rounding only (below 1e-9 m, i.e. 1e-14°).
        assertThat(j.get("lat").asDouble()).isCloseTo(WANT_LAT, within(1e-11));
        assertThat(j.get("lon").asDouble()).isCloseTo(WANT_LON, within(1e-11));
        assertThat(j.get("h").asDouble()).isCloseTo(650, within(1e-8));
        CliRun u = CliRun.of("coord", "--from", "geodetic@ED50", "--to", "utm:30N@ETRF2000", "--ntv2", g.toString(),
            "--json", LAT, LON, "650");
        CliRun direct = CliRun.of("coord", "--from", "geodetic@ETRF2000", "--to", "utm:30N@ETRF2000", "--json",
            Double.toString(WANT_LAT), Double.toString(WANT_LON), "650");
        JsonNode a = Json.MAPPER.readTree(u.out());
        JsonNode b = Json.MAPPER.readTree(direct.out());
        assertThat(a.get("easting").asDouble()).isCloseTo(b.get("easting").asDouble(), within(1e-6));
        assertThat(a.get("northing").asDouble()).isCloseTo(b.get("northing").asDouble(), within(1e-6));
        assertThat(a.get("zone").asText()).isEqualTo("30N");
    }

    @Test
    void ntv2BadInputs(@TempDir Path dir) throws Exception {
        Path g = grid(dir, ByteOrder.BIG_ENDIAN);
        CliRun out = CliRun.of("coord", "--from", "geodetic@ED50", "--to", "geodetic@ETRF2000", "--ntv2", g.toString(),
            "39.5", LON, "0");
        assertThat(out.exitCode()).isEqualTo(2);
        assertThat(out.err()).contains("39.5").contains("outside").contains(g.toString()).doesNotContain("Exception")
            .doesNotContain("\tat ");
        CliRun missing = CliRun.of("coord", "--from", "geodetic@ED50", "--to", "geodetic@ETRF2000", "--ntv2",
            dir.resolve("none.gsb").toString(), LAT, LON, "0");
        assertThat(missing.exitCode()).isEqualTo(3);
        assertThat(missing.err()).contains("none.gsb");
        byte[] whole = Files.readAllBytes(g);
        Path truncated = dir.resolve("truncated.gsb");
        Files.write(truncated, Arrays.copyOf(whole, whole.length - 40));
        CliRun t = CliRun.of("coord", "--from", "geodetic@ED50", "--to", "geodetic@ETRF2000", "--ntv2",
            truncated.toString(), LAT, LON, "0");
        assertThat(t.exitCode()).isEqualTo(4);
        assertThat(t.err()).contains("truncated.gsb").doesNotContain("Exception");
        Path junk = dir.resolve("junk.gsb");
        Files.write(junk, new byte[300]);
        assertThat(CliRun.of("coord", "--from", "geodetic@ED50", "--to", "geodetic@ETRF2000", "--ntv2", junk.toString(),
            LAT, LON, "0").exitCode()).isEqualTo(4);
        CliRun both = CliRun.of("coord", "--from", "geodetic@ED50", "--to", "geodetic@ETRF2000", "--ntv2", g.toString(),
            "--helmert", "1,2,3,0,0,0,0", "--convention", "position-vector", LAT, LON, "0");
        assertThat(both.exitCode()).isEqualTo(2);
        assertThat(both.err()).contains("--ntv2").contains("--helmert").contains("give one");
        CliRun same = CliRun.of("coord", "--from", "geodetic@ED50", "--to", "geodetic@ED50", "--ntv2", g.toString(),
            LAT, LON, "0");
        assertThat(same.exitCode()).isEqualTo(2);
        assertThat(same.err()).contains("--ntv2 between ED50 and itself");
    }

    @Test
    void molodenskyAgainstTheGuidanceNoteExamples() throws Exception {
        // Source: IOGP Guidance Note 7-2, §4.4.1 and §4.4.2 worked examples (EPSG methods 9604 and 9605), WGS 84 →
        // ED50, ΔX, ΔY, ΔZ = 84.87, 96.49, 116.95 m at 53°48'33.82"N, 2°07'46.38"E, h = 73.0 m → 53°48'36.565"N,
        // 2°07'51.477"E, h = 28.02 m (standard) and 53°48'36.563"N, 2°07'51.477"E, h = 28.09 m (abridged)
        // (values from memory, as in reference-tests' HelmertReferenceTest).
        String lat = Double.toString(53 + 48 / 60.0 + 33.82 / 3600);
        String lon = Double.toString(2 + 7 / 60.0 + 46.38 / 3600);
        double[][] want = {{53 + 48 / 60.0 + 36.565 / 3600, 2 + 7 / 60.0 + 51.477 / 3600, 28.02},
            {53 + 48 / 60.0 + 36.563 / 3600, 2 + 7 / 60.0 + 51.477 / 3600, 28.09}};
        for (int k = 0; k < 2; k++) {
            List<String> args = new java.util.ArrayList<>(List.of("coord", "--from", "geodetic@WGS84", "--to",
                "geodetic@ED50", "--molodensky", "84.87,96.49,116.95", "--molodensky-accuracy", "5", "--json",
                "--explain"));
            if (k == 1) {
                args.add("--abridged");
            }
            args.addAll(List.of(lat, lon, "73"));
            CliRun r = CliRun.of(args.toArray(String[]::new));
            assertThat(r.err()).isEmpty();
            JsonNode j = Json.MAPPER.readTree(r.out());
            assertThat(j.get("lat").asDouble()).isCloseTo(want[k][0], within(0.0005 / 3600));
            assertThat(j.get("lon").asDouble()).isCloseTo(want[k][1], within(0.0005 / 3600));
            assertThat(j.get("h").asDouble()).isCloseTo(want[k][2], within(0.005));
            JsonNode steps = j.get("steps");
            assertThat(steps).hasSize(1);
            assertThat(steps.get(0).get("epsg_method").asInt()).isEqualTo(k == 0 ? 9604 : 9605);
            assertThat(steps.get(0).get("name").asText()).isEqualTo("WGS 84 → ED50");
            assertThat(steps.get(0).get("accuracy_m").asDouble()).isEqualTo(5.0);
            assertThat(steps.get(0).get("cautions").get(0).asText()).contains("first-order", "metre");
            assertThat(steps.get(0).get("parameters").get(3).get("value").asDouble()).isEqualTo(251.0);
        }
        CliRun text = CliRun.of("coord", "--from", "ecef@WGS84", "--to", "geodetic@ED50", "--molodensky",
            "84.87,96.49,116.95", "--explain", "3790000", "140000", "5120000");
        assertThat(text.exitCode()).isZero();
        assertThat(text.out()).contains("method: Molodensky (EPSG method 9604)").contains("dX = 84.87 m")
            .contains("accuracy: not stated").contains("expected accuracy not stated");
    }

    @Test
    void molodenskyBadInputs() {
        CliRun two = CliRun.of("coord", "--from", "geodetic@WGS84", "--to", "geodetic@ED50", "--molodensky", "1,2",
            "50", "2", "0");
        assertThat(two.exitCode()).isEqualTo(2);
        assertThat(two.err()).contains("--molodensky '1,2' has 2 values");
        CliRun nan = CliRun.of("coord", "--from", "geodetic@WGS84", "--to", "geodetic@ED50", "--molodensky",
            "1,x,3", "50", "2", "0");
        assertThat(nan.exitCode()).isEqualTo(2);
        assertThat(nan.err()).contains("DY").contains("'x'");
        CliRun alone = CliRun.of("coord", "--from", "geodetic@WGS84", "--to", "geodetic@ED50", "--abridged", "50",
            "2", "0");
        assertThat(alone.exitCode()).isEqualTo(2);
        assertThat(alone.err()).contains("--abridged applies to --molodensky");
        CliRun both = CliRun.of("coord", "--from", "geodetic@WGS84", "--to", "geodetic@ED50", "--molodensky", "1,2,3",
            "--helmert", "1,2,3,0,0,0,0", "--convention", "position-vector", "50", "2", "0");
        assertThat(both.exitCode()).isEqualTo(2);
        assertThat(both.err()).contains("--molodensky and --helmert");
        CliRun pole = CliRun.of("coord", "--from", "geodetic@WGS84", "--to", "geodetic@ED50", "--molodensky", "1,2,3",
            "90", "0", "0");
        assertThat(pole.exitCode()).isEqualTo(2);
        assertThat(pole.err()).contains("pole").doesNotContain("Exception");
    }
}
