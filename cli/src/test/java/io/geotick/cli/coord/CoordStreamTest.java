package io.geotick.cli.coord;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.MappingIterator;
import com.fasterxml.jackson.dataformat.csv.CsvMapper;
import com.fasterxml.jackson.dataformat.csv.CsvSchema;
import io.geotick.cli.CliRun;
import io.geotick.cli.ExitCode;
import io.geotick.cli.Json;
import java.io.ByteArrayInputStream;
import java.io.InputStream;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.api.parallel.ResourceLock;

/**
 * {@code geotick coord --input}: rows streamed through one conversion, checked row by row against the
 * single-point mode (bit-identical values, identical messages) and against a published worked example.
 * The other points are invented.
 */
class CoordStreamTest {
    // Source: IOGP Guidance Note 7-2, §4.1.1, EPSG method 9602 worked example on WGS 84 (values from memory):
    // φ = 53°48'33.820"N, λ = 2°07'46.380"E, h = 73.0 m → X = 3771793.968, Y = 140253.342, Z = 5124304.349 m.
    private static final String IOGP_LAT = "53°48'33.820\"N";
    private static final String IOGP_LON = "2°07'46.380\"E";
    private static final double HALF_MM = 0.0005;

    private static final CsvMapper CSV = new CsvMapper();

    /** The rows of a CSV text with a header, as maps in column order. */
    static List<Map<String, String>> rows(String csv) throws Exception {
        List<Map<String, String>> rows = new ArrayList<>();
        try (MappingIterator<Map<String, String>> it = CSV.readerFor(Map.class)
                .with(CsvSchema.emptySchema().withHeader()).readValues(csv)) {
            while (it.hasNextValue()) {
                rows.add(it.nextValue());
            }
        }
        return rows;
    }

    /** The header of a CSV text, as Jackson reads it. */
    static List<String> header(String csv) throws Exception {
        try (MappingIterator<String[]> it = CSV.readerFor(String[].class)
                .with(CsvSchema.emptySchema()).with(com.fasterxml.jackson.dataformat.csv.CsvParser.Feature.WRAP_AS_ARRAY)
                .readValues(csv)) {
            return List.of(it.nextValue());
        }
    }

    static Path write(Path dir, String name, String text) throws Exception {
        Path p = dir.resolve(name);
        Files.writeString(p, text, StandardCharsets.UTF_8);
        return p;
    }

    /** The single-point mode's --json object for the same values. */
    static JsonNode single(List<String> options, String... values) throws Exception {
        List<String> args = new ArrayList<>(List.of("coord"));
        args.addAll(options);
        args.add("--json");
        args.add("--");
        args.addAll(List.of(values));
        CliRun r = CliRun.of(args.toArray(String[]::new));
        assertThat(r.exitCode()).as(r.err()).isZero();
        return Json.MAPPER.readTree(r.out());
    }

    /** The single-point mode's one-line message for the same values, without the "geotick: " prefix. */
    static String singleError(List<String> options, String... values) {
        List<String> args = new ArrayList<>(List.of("coord"));
        args.addAll(options);
        args.add("--");
        args.addAll(List.of(values));
        CliRun r = CliRun.of(args.toArray(String[]::new));
        assertThat(r.exitCode()).isEqualTo(ExitCode.USAGE);
        assertThat(r.err()).startsWith("geotick: ");
        return r.err().strip().substring("geotick: ".length());
    }

    static CliRun stream(List<String> options, String... more) {
        List<String> args = new ArrayList<>(List.of("coord"));
        args.addAll(options);
        args.addAll(List.of(more));
        return CliRun.of(args.toArray(String[]::new));
    }

    private static final List<String> GEODETIC_TO_ECEF = List.of("--from", "geodetic", "--to", "ecef");

    // Invented points (with the IOGP one first), as typed in the CSV and on the command line.
    private static final String[][] POINTS = {
        {"iogp", IOGP_LAT, IOGP_LON, "73.0"},
        {"p2", "-33.8688", "151.2093", "58"},
        {"p3", "0", "-180", "-5000"},
        {"p4", "89.99999", "45.5", "1e4"},
        {"p5", "-12.3456", "130.9876", "25"},
    };

    /** A CSV field: quoted, with doubled quotes, when it holds a quote or a comma (RFC 4180). */
    private static String field(String s) {
        return s.contains("\"") || s.contains(",") ? "\"" + s.replace("\"", "\"\"") + "\"" : s;
    }

    @Test
    void geodeticToEcefPassesTheIdThroughAndMatchesTheSinglePointModeBitForBit(@TempDir Path dir) throws Exception {
        StringBuilder in = new StringBuilder("id,lat,lon,h\n");
        for (String[] p : POINTS) {
            in.append(field(p[0])).append(',').append(field(p[1])).append(',').append(field(p[2])).append(',')
                .append(p[3]).append('\n');
        }
        Path file = write(dir, "points.csv", in.toString());
        CliRun r = stream(GEODETIC_TO_ECEF, "--input", file.toString());
        assertThat(r.exitCode()).as(r.err()).isZero();
        assertThat(r.err()).isEmpty();
        assertThat(header(r.out())).containsExactly("id", "x", "y", "z", "error");
        List<Map<String, String>> rows = rows(r.out());
        assertThat(rows).hasSize(POINTS.length);
        for (int i = 0; i < POINTS.length; i++) {
            Map<String, String> row = rows.get(i);
            assertThat(row.get("id")).isEqualTo(POINTS[i][0]);
            assertThat(row.get("error")).isEmpty();
            JsonNode one = single(GEODETIC_TO_ECEF, POINTS[i][1], POINTS[i][2], POINTS[i][3]);
            for (String k : List.of("x", "y", "z")) {
                // Bit-identical: the same double, not merely close.
                assertThat(Double.doubleToRawLongBits(Double.parseDouble(row.get(k))))
                    .as("%s %s", POINTS[i][0], k).isEqualTo(Double.doubleToRawLongBits(one.get(k).doubleValue()));
                assertThat(row.get(k)).isEqualTo(one.get(k).asText());
            }
        }
        // Source: IOGP Guidance Note 7-2, §4.1.1, EPSG method 9602 worked example on WGS 84 (values from memory).
        Map<String, String> iogp = rows.get(0);
        assertThat(Double.parseDouble(iogp.get("x"))).isCloseTo(3771793.968, within(HALF_MM));
        assertThat(Double.parseDouble(iogp.get("y"))).isCloseTo(140253.342, within(HALF_MM));
        assertThat(Double.parseDouble(iogp.get("z"))).isCloseTo(5124304.349, within(HALF_MM));
    }

    @Test
    void passThroughColumnsKeepTheirOrderAndTextAndValueColumnsMayComeInAnyOrder(@TempDir Path dir) throws Exception {
        Path file = write(dir, "mixed.csv", "\uFEFFh,time,lon,id,lat\n25,2026-03-01T10:00:00Z,130.9876,\"a, b\",-12.3456\n");
        CliRun r = stream(GEODETIC_TO_ECEF, "--input", file.toString());
        assertThat(r.exitCode()).as(r.err()).isZero();
        assertThat(header(r.out())).containsExactly("time", "id", "x", "y", "z", "error");
        Map<String, String> row = rows(r.out()).get(0);
        assertThat(row.get("time")).isEqualTo("2026-03-01T10:00:00Z");
        assertThat(row.get("id")).isEqualTo("a, b");
        assertThat(row.get("x")).isEqualTo(single(GEODETIC_TO_ECEF, "-12.3456", "130.9876", "25").get("x").asText());
    }

    @Test
    void errorRowsAreKeptInPlaceNameTheirLineAndGiveExit5(@TempDir Path dir) throws Exception {
        String text = "id,lat,lon,h\n"
            + "g1,10,20,30\n"      // line 2
            + "bad-lat,91,20,30\n" // line 3
            + "g2,11,21,31\n"      // line 4
            + "nan,abc,20,30\n"    // line 5
            + "\n"                 // line 6: empty, not a row
            + "g3,12,22,32\n"      // line 7
            + "empty,13,,33\n"     // line 8
            + "short,13,23\n"      // line 9
            + "g4,14,24,34\n";     // line 10
        Path file = write(dir, "mixed.csv", text);
        CliRun r = stream(GEODETIC_TO_ECEF, "--input", file.toString());
        assertThat(r.exitCode()).isEqualTo(ExitCode.PARTIAL);
        assertThat(r.err()).isEqualTo("geotick: 4 of 8 rows failed" + System.lineSeparator());
        List<Map<String, String>> rows = rows(r.out());
        assertThat(rows).extracting(m -> m.get("id"))
            .containsExactly("g1", "bad-lat", "g2", "nan", "g3", "empty", "short", "g4");
        // Each error is the single-point mode's message for the same values, after the line number.
        assertThat(rows.get(1).get("error")).isEqualTo("line 3: " + singleError(GEODETIC_TO_ECEF, "91", "20", "30"))
            .contains("91");
        assertThat(rows.get(3).get("error")).isEqualTo("line 5: " + singleError(GEODETIC_TO_ECEF, "abc", "20", "30"))
            .contains("'abc' is not a number");
        assertThat(rows.get(5).get("error")).isEqualTo("line 8: " + singleError(GEODETIC_TO_ECEF, "13", "", "33"))
            .contains("longitude is empty");
        assertThat(rows.get(6).get("error")).isEqualTo("line 9: 3 fields where the header has 4");
        for (int i : new int[] {1, 3, 5, 6}) {
            assertThat(rows.get(i).get("x")).isEmpty();
            assertThat(rows.get(i).get("z")).isEmpty();
        }
        String[][] good = {{"10", "20", "30"}, {"11", "21", "31"}, {"12", "22", "32"}, {"14", "24", "34"}};
        int[] at = {0, 2, 4, 7};
        for (int j = 0; j < at.length; j++) {
            Map<String, String> row = rows.get(at[j]);
            assertThat(row.get("error")).isEmpty();
            assertThat(row.get("y")).isEqualTo(single(GEODETIC_TO_ECEF, good[j]).get("y").asText());
        }
        assertThat(r.out() + r.err()).doesNotContain("Exception");
    }

    @Test
    void ndjsonHasTheSinglePointFieldNamesAndLineNumberedErrorObjects(@TempDir Path dir) throws Exception {
        Path file = write(dir, "p.csv", "id,lat,lon,h\ng1,10,20,30\nbad,91,20,30\n");
        CliRun r = stream(GEODETIC_TO_ECEF, "--input", file.toString(), "--json");
        assertThat(r.exitCode()).isEqualTo(ExitCode.PARTIAL);
        String[] lines = r.out().split("\n");
        assertThat(lines).hasSize(2);
        JsonNode ok = Json.MAPPER.readTree(lines[0]);
        JsonNode one = single(GEODETIC_TO_ECEF, "10", "20", "30");
        assertThat(ok.fieldNames()).toIterable().containsExactly("id", "x", "y", "z");
        assertThat(ok.get("id").asText()).isEqualTo("g1");
        for (String k : List.of("x", "y", "z")) {
            assertThat(ok.get(k).isNumber()).isTrue();
            assertThat(ok.get(k).doubleValue()).isEqualTo(one.get(k).doubleValue());
        }
        JsonNode bad = Json.MAPPER.readTree(lines[1]);
        assertThat(bad.fieldNames()).toIterable().containsExactly("line", "error", "id");
        assertThat(bad.get("line").asInt()).isEqualTo(3);
        assertThat(bad.get("error").asText()).isEqualTo("line 3: " + singleError(GEODETIC_TO_ECEF, "91", "20", "30"));
        assertThat(bad.get("id").asText()).isEqualTo("bad");
    }

    @Test
    void gridTargetHasZoneScaleConvergenceAndUnitColumns(@TempDir Path dir) throws Exception {
        List<String> toUtm = List.of("--from", "geodetic", "--to", "utm:31N");
        Path file = write(dir, "g.csv", "id,lat,lon,h\nm1,52.1,3.4,45\nm2,48.85,2.35,35\n");
        Path out = dir.resolve("out.csv");
        CliRun r = stream(toUtm, "--input", file.toString(), "--output", out.toString());
        assertThat(r.exitCode()).as(r.err()).isZero();
        assertThat(r.out()).isEmpty();
        String csv = Files.readString(out);
        assertThat(header(csv)).containsExactly("id", "easting", "northing", "h", "zone", "scale", "convergence", "unit",
            "error");
        List<Map<String, String>> rows = rows(csv);
        String[][] in = {{"52.1", "3.4", "45"}, {"48.85", "2.35", "35"}};
        for (int i = 0; i < 2; i++) {
            JsonNode one = single(toUtm, in[i]);
            for (String k : List.of("easting", "northing", "h", "zone", "scale", "convergence", "unit")) {
                assertThat(rows.get(i).get(k)).as(k).isEqualTo(one.get(k).asText());
            }
            assertThat(rows.get(i).get("zone")).isEqualTo("31N");
            assertThat(rows.get(i).get("unit")).isEqualTo("m");
        }
    }

    @Test
    void gridSourceWithoutHeightColumnLeavesTheHeightOut(@TempDir Path dir) throws Exception {
        List<String> fromUtm = List.of("--from", "utm:31N", "--to", "geodetic");
        Path file = write(dir, "en.csv", "easting,northing,name\n534325.17,5761156.24,quay\n");
        CliRun r = stream(fromUtm, "--input", file.toString());
        assertThat(r.exitCode()).as(r.err()).isZero();
        assertThat(header(r.out())).containsExactly("name", "lat", "lon", "error");
        JsonNode one = single(fromUtm, "534325.17", "5761156.24");
        assertThat(rows(r.out()).get(0).get("lat")).isEqualTo(one.get("lat").asText());
        // A target whose third value is not a height needs the h column: refused up front.
        CliRun ecef = stream(List.of("--from", "utm:31N", "--to", "ecef"), "--input", file.toString());
        assertThat(ecef.exitCode()).isEqualTo(ExitCode.USAGE);
        assertThat(ecef.err()).contains("'h'").contains("needs the height");
    }

    @Test
    void ntv2PointOutsideTheGridIsAnErrorRowWithTheSinglePointMessage(@TempDir Path dir) throws Exception {
        Path grid = CoordShiftOptionsTest.grid(dir, ByteOrder.BIG_ENDIAN);
        List<String> opts = List.of("--from", "geodetic@ED50", "--to", "geodetic@ETRF2000", "--ntv2", grid.toString());
        Path file = write(dir, "n.csv", "id,lat,lon,h\nin,40.42,-3.70,650\nout,39.5,-3.5,650\n");
        CliRun r = stream(opts, "--input", file.toString());
        assertThat(r.exitCode()).isEqualTo(ExitCode.PARTIAL);
        List<Map<String, String>> rows = rows(r.out());
        JsonNode one = single(opts, "40.42", "-3.70", "650");
        assertThat(rows.get(0).get("lat")).isEqualTo(one.get("lat").asText());
        assertThat(rows.get(0).get("lon")).isEqualTo(one.get("lon").asText());
        assertThat(rows.get(1).get("error")).isEqualTo("line 3: " + singleError(opts, "39.5", "-3.5", "650"))
            .contains("outside");
    }

    @Test
    @ResourceLock("java.lang.System.in")
    void dashReadsStandardInput() throws Exception {
        InputStream saved = System.in;
        try {
            System.setIn(new ByteArrayInputStream("id,x,y,z\nq,3771793.968,140253.342,5124304.349\n"
                .getBytes(StandardCharsets.UTF_8)));
            CliRun r = stream(List.of("--from", "ecef", "--to", "geodetic"), "--input", "-");
            assertThat(r.exitCode()).as(r.err()).isZero();
            assertThat(header(r.out())).containsExactly("id", "lat", "lon", "h", "error");
            Map<String, String> row = rows(r.out()).get(0);
            JsonNode one = single(List.of("--from", "ecef", "--to", "geodetic"), "3771793.968", "140253.342",
                "5124304.349");
            assertThat(row.get("lat")).isEqualTo(one.get("lat").asText());
            assertThat(row.get("h")).isEqualTo(one.get("h").asText());
        } finally {
            System.setIn(saved);
        }
    }

    @Test
    void aHeaderOnlyInputGivesAHeaderOnlyOutput(@TempDir Path dir) throws Exception {
        Path file = write(dir, "empty.csv", "id,lat,lon,h\n");
        CliRun r = stream(GEODETIC_TO_ECEF, "--input", file.toString());
        assertThat(r.exitCode()).as(r.err()).isZero();
        assertThat(r.out()).isEqualTo("id,x,y,z,error\n");
        CliRun j = stream(GEODETIC_TO_ECEF, "--input", file.toString(), "--json");
        assertThat(j.exitCode()).isZero();
        assertThat(j.out()).isEmpty();
    }

    @Test
    void aMissingColumnIsAUsageErrorNamingItAndTheExpectedNames(@TempDir Path dir) throws Exception {
        Path file = write(dir, "noh.csv", "id,lat,lon\na,1,2\n");
        Path out = dir.resolve("never.csv");
        CliRun r = stream(GEODETIC_TO_ECEF, "--input", file.toString(), "--output", out.toString());
        assertThat(r.exitCode()).isEqualTo(ExitCode.USAGE);
        assertThat(r.err()).contains("line 1").contains("no column 'h'").contains("lat,lon,h")
            .doesNotContain("Exception");
        assertThat(out).doesNotExist();
    }

    @Test
    void headerProblemsAndOptionMisuseAreUsageErrors(@TempDir Path dir) throws Exception {
        Path twice = write(dir, "twice.csv", "id,lat,lon,h,id\n");
        assertThat(stream(GEODETIC_TO_ECEF, "--input", twice.toString()).err()).contains("'id' appears twice");
        Path clash = write(dir, "clash.csv", "lat,lon,h,x\n");
        CliRun c = stream(GEODETIC_TO_ECEF, "--input", clash.toString());
        assertThat(c.exitCode()).isEqualTo(ExitCode.USAGE);
        assertThat(c.err()).contains("'x'").contains("rename it");
        Path empty = write(dir, "nothing.csv", "");
        assertThat(stream(GEODETIC_TO_ECEF, "--input", empty.toString()).err()).contains("is empty");
        Path ok = write(dir, "ok.csv", "lat,lon,h\n1,2,3\n");
        CliRun values = stream(GEODETIC_TO_ECEF, "--input", ok.toString(), "1", "2", "3");
        assertThat(values.exitCode()).isEqualTo(ExitCode.USAGE);
        assertThat(values.err()).contains("'1' '2' '3'");
        CliRun explain = stream(GEODETIC_TO_ECEF, "--input", ok.toString(), "--explain");
        assertThat(explain.exitCode()).isEqualTo(ExitCode.USAGE);
        assertThat(explain.err()).contains("--explain");
        CliRun same = stream(GEODETIC_TO_ECEF, "--input", ok.toString(), "--output", ok.toString());
        assertThat(same.exitCode()).isEqualTo(ExitCode.USAGE);
        assertThat(same.err()).contains("is the --input file");
        assertThat(Files.readString(ok)).isEqualTo("lat,lon,h\n1,2,3\n");
        CliRun output = stream(GEODETIC_TO_ECEF, "--output", dir.resolve("o.csv").toString(), "1", "2", "3");
        assertThat(output.exitCode()).isEqualTo(ExitCode.USAGE);
        assertThat(output.err()).contains("--output applies to --input");
    }

    @Test
    void unreadableInputAndUnwritableOutputExit3(@TempDir Path dir) throws Exception {
        CliRun missing = stream(GEODETIC_TO_ECEF, "--input", dir.resolve("absent.csv").toString());
        assertThat(missing.exitCode()).isEqualTo(ExitCode.IO);
        assertThat(missing.err()).contains("absent.csv").contains("no such file");
        Path ok = write(dir, "ok.csv", "lat,lon,h\n1,2,3\n");
        CliRun out = stream(GEODETIC_TO_ECEF, "--input", ok.toString(), "--output",
            dir.resolve("no-dir").resolve("o.csv").toString());
        assertThat(out.exitCode()).isEqualTo(ExitCode.IO);
        assertThat(out.err()).contains("cannot write").contains("o.csv");
        Path unclosed = write(dir, "unclosed.csv", "id,lat,lon,h\na,1,2,3\n\"b,1,2,3\n");
        CliRun broken = stream(GEODETIC_TO_ECEF, "--input", unclosed.toString());
        assertThat(broken.exitCode()).isEqualTo(ExitCode.IO);
        assertThat(broken.err()).contains("not readable as CSV").doesNotContain("Exception");
        assertThat(rows(broken.out())).hasSize(1);
    }

    @Test
    void tenThousandRowsAllConvert(@TempDir Path dir) throws Exception {
        int n = 10_000;
        StringBuilder in = new StringBuilder("id,lat,lon,h\n");
        for (int i = 0; i < n; i++) {
            // Invented points on a spiral over the globe.
            in.append(i).append(',').append(String.format(Locale.ROOT, "%.6f", -89.9 + 179.8 * i / n)).append(',')
                .append(String.format(Locale.ROOT, "%.6f", -180 + (i * 7.3) % 360)).append(',').append(i % 900)
                .append('\n');
        }
        Path file = write(dir, "big.csv", in.toString());
        Path out = dir.resolve("big-out.csv");
        CliRun r = stream(GEODETIC_TO_ECEF, "--input", file.toString(), "--output", out.toString());
        assertThat(r.exitCode()).as(r.err()).isZero();
        List<Map<String, String>> rows = rows(Files.readString(out));
        assertThat(rows).hasSize(n);
        assertThat(rows.get(n - 1).get("id")).isEqualTo(Integer.toString(n - 1));
        assertThat(rows).allMatch(m -> m.get("error").isEmpty());
    }
}
