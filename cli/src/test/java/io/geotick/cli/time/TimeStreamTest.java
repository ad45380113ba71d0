package io.geotick.cli.time;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectReader;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.dataformat.csv.CsvMapper;
import com.fasterxml.jackson.dataformat.csv.CsvParser;
import com.fasterxml.jackson.dataformat.csv.CsvSchema;
import io.geotick.cli.ExitCode;
import io.geotick.cli.Json;
import java.io.ByteArrayInputStream;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.api.parallel.ResourceLock;

/**
 * {@code geotick time --input}: every row's fields checked against the single-point {@code --json} for the
 * same value (same names, same digits) and, across the 2016-12-31 leap second, against the IERS leap-second
 * list. The ids and the 10,000-row file are invented.
 */
class TimeStreamTest {
    private static final CsvMapper CSV = new CsvMapper();

    /** The rows of a CSV text with a header, as maps (Jackson's CSV reader). */
    private static List<Map<String, String>> rows(String csv) throws Exception {
        return CSV.readerFor(Map.class).with(CsvSchema.emptySchema().withHeader())
            .<Map<String, String>>readValues(csv).readAll();
    }

    /** The header row of a CSV text (Jackson's CSV reader). */
    private static List<String> header(String csv) throws Exception {
        return List.of(CSV.readerFor(String[].class).with(CsvParser.Feature.WRAP_AS_ARRAY)
            .<String[]>readValues(csv).next());
    }

    private static Path write(Path dir, String name, String text) throws Exception {
        Path p = dir.resolve(name);
        Files.writeString(p, text, StandardCharsets.UTF_8);
        return p;
    }

    private static CliRun time(String... args) {
        List<String> all = new ArrayList<>(List.of("time"));
        all.addAll(List.of(args));
        return CliRun.of(all.toArray(String[]::new));
    }

    /** The single-point --json output for the same value, as printed. */
    private static String singleJson(List<String> options, String value) {
        List<String> args = new ArrayList<>(options);
        args.addAll(List.of("--json", "--", value));
        CliRun r = time(args.toArray(String[]::new));
        assertThat(r.code()).as(r.err()).isZero();
        return r.out().strip();
    }

    private static final ObjectReader EXACT = Json.MAPPER.copy()
        .setNodeFactory(JsonNodeFactory.withExactBigDecimals(true)).reader()
        .with(DeserializationFeature.USE_BIG_DECIMAL_FOR_FLOATS);

    /** Read with decimals kept as decimals, trailing zeros included, so that the digits survive. */
    private static JsonNode tree(String json) throws Exception {
        return EXACT.readTree(json);
    }

    /** What the CSV cell of a JSON field must be: the JSON text (exact decimals as printed), arrays joined. */
    private static String cell(JsonNode v) {
        if (v.isNull()) {
            return "";
        }
        if (v.isArray()) {
            List<String> parts = new ArrayList<>();
            v.forEach(e -> parts.add(e.asText()));
            return String.join("; ", parts);
        }
        return v.isBigDecimal() ? v.decimalValue().toPlainString() : v.asText();
    }

    /** The single-point mode's one-line message for the value, without the "geotick: " prefix. */
    private static String singleError(List<String> options, String value) {
        List<String> args = new ArrayList<>(options);
        args.addAll(List.of("--", value));
        CliRun r = time(args.toArray(String[]::new));
        assertThat(r.code()).isEqualTo(ExitCode.USAGE);
        return r.err().strip().substring("geotick: ".length());
    }

    private static final String[] LEAP = {"2016-12-31T23:59:59Z", "2016-12-31T23:59:60Z", "2017-01-01T00:00:00Z"};

    @Test
    void rowsAcrossTheLeapSecondFollowTheIersListAndEqualTheSinglePointJson(@TempDir Path dir) throws Exception {
        StringBuilder in = new StringBuilder("id,value\n");
        for (int i = 0; i < LEAP.length; i++) {
            in.append("t").append(i).append(',').append(LEAP[i]).append('\n');
        }
        Path file = write(dir, "leap.csv", in.toString());
        CliRun r = time("--input", file.toString());
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.err()).isEmpty();
        List<String> names = new ArrayList<>();
        tree(singleJson(List.of(), LEAP[0])).fieldNames().forEachRemaining(names::add);
        List<String> expectedHeader = new ArrayList<>(List.of("id"));
        expectedHeader.addAll(names);
        expectedHeader.add("error");
        assertThat(header(r.out())).containsExactlyElementsOf(expectedHeader);
        List<Map<String, String>> rows = rows(r.out());
        assertThat(rows).hasSize(LEAP.length);
        for (int i = 0; i < LEAP.length; i++) {
            Map<String, String> row = rows.get(i);
            assertThat(row.get("id")).isEqualTo("t" + i);
            assertThat(row.get("error")).isEmpty();
            JsonNode one = tree(singleJson(List.of(), LEAP[i]));
            for (Iterator<Map.Entry<String, JsonNode>> f = one.fields(); f.hasNext(); ) {
                Map.Entry<String, JsonNode> e = f.next();
                assertThat(row.get(e.getKey())).as("%s %s", LEAP[i], e.getKey()).isEqualTo(cell(e.getValue()));
            }
        }
        // Source: IERS Bulletin C 52 (and the IERS/IETF leap-second list, entry 3692217600 37): a positive leap
        // second at the end of 2016-12-31; TAI - UTC = 36 s before it, 37 s from 2017-01-01T00:00:00 UTC.
        assertThat(rows.get(0).get("tai_minus_utc")).isEqualTo("36");
        assertThat(rows.get(0).get("tai")).isEqualTo("2017-01-01T00:00:35");
        assertThat(rows.get(1).get("utc")).isEqualTo("2016-12-31T23:59:60Z");
        assertThat(rows.get(1).get("tai")).isEqualTo("2017-01-01T00:00:36");
        assertThat(rows.get(2).get("tai_minus_utc")).isEqualTo("37");
        assertThat(rows.get(2).get("tai")).isEqualTo("2017-01-01T00:00:37");
        // Source: POSIX time has no value of its own for 23:59:60: it repeats the next second's (common practice).
        assertThat(rows.get(1).get("unix")).isEqualTo(rows.get(2).get("unix")).isEqualTo("1483228800");
        assertThat(rows.get(1).get("warnings")).contains("Unix time has no value of its own").contains("; ");
        assertThat(rows.get(0).get("warnings")).doesNotContain("Unix");
    }

    @Test
    void ndjsonRowsAreTheSinglePointJsonLinesAndErrorRowsNameTheirLine(@TempDir Path dir) throws Exception {
        Path file = write(dir, "leap.csv", "value\n" + String.join("\n", LEAP) + "\njunk\n");
        CliRun r = time("--input", file.toString(), "--json");
        assertThat(r.code()).isEqualTo(ExitCode.PARTIAL);
        assertThat(r.err()).isEqualTo("geotick: 1 of 4 rows failed" + System.lineSeparator());
        String[] lines = r.out().split("\n");
        assertThat(lines).hasSize(4);
        for (int i = 0; i < LEAP.length; i++) {
            // Without pass-through columns an NDJSON line is the single-point --json text, byte for byte.
            assertThat(lines[i]).isEqualTo(singleJson(List.of(), LEAP[i]));
        }
        JsonNode bad = tree(lines[3]);
        assertThat(bad.fieldNames()).toIterable().containsExactly("line", "error");
        assertThat(bad.get("line").asInt()).isEqualTo(5);
        assertThat(bad.get("error").asText()).isEqualTo("line 5: " + singleError(List.of(), "junk"));
    }

    @Test
    void gpsWeekAndSecondsWithInGps(@TempDir Path dir) throws Exception {
        List<String> gps = List.of("--in", "gps");
        String[] values = {"1930:16", "1930:17.5", "1930:18"};
        Path file = write(dir, "weeks.csv", "value,rx\n" + values[0] + ",a\n" + values[1] + ",b\n" + values[2] + ",c\n");
        CliRun r = time("--in", "gps", "--input", file.toString());
        assertThat(r.code()).as(r.err()).isZero();
        List<Map<String, String>> rows = rows(r.out());
        assertThat(rows).extracting(m -> m.get("rx")).containsExactly("a", "b", "c");
        // Source: IS-GPS-200 (GPS time = TAI - 19 s) with IERS Bulletin C 52: GPS - UTC = 17 s before the
        // 2016-12-31 leap second and 18 s after; GPS week 1930 starts 2017-01-01T00:00:00 GPS (common practice).
        assertThat(rows).extracting(m -> m.get("utc"))
            .containsExactly("2016-12-31T23:59:59Z", "2016-12-31T23:59:60.500Z", "2017-01-01T00:00:00Z");
        assertThat(rows).extracting(m -> m.get("input_scale")).containsOnly("gps");
        for (int i = 0; i < values.length; i++) {
            JsonNode one = tree(singleJson(gps, values[i]));
            for (String k : List.of("utc", "tai", "gps_week", "gps_tow", "unix", "ptp", "mjd_tt", "warnings")) {
                assertThat(rows.get(i).get(k)).as("%s %s", values[i], k).isEqualTo(cell(one.get(k)));
            }
        }
    }

    @Test
    void errorRowsInterleavedWithGoodOnesKeepEveryRowAndExit5(@TempDir Path dir) throws Exception {
        String text = "id,value\n"
            + "g1,2016-12-31T23:59:60Z\n"   // line 2
            + "junk,not a time\n"           // line 3
            + "g2,unix:1483228800\n"        // line 4
            + "noleap,2017-06-30T23:59:60Z\n" // line 5: no leap second at the end of 2017-06-30
            + "\n"                          // line 6: empty, not a row
            + "g3,2031-01-01T00:00:00Z\n"   // line 7: past the table's expiry
            + "short\n"                     // line 8
            + "g4,ptp:1483228837\n";        // line 9
        Path file = write(dir, "mixed.csv", text);
        CliRun r = time("--to", "utc,unix", "--input", file.toString());
        assertThat(r.code()).isEqualTo(ExitCode.PARTIAL);
        assertThat(r.err()).isEqualTo("geotick: 3 of 7 rows failed" + System.lineSeparator());
        assertThat(header(r.out())).containsExactly("id", "input", "input_scale", "utc", "utc_doy", "unix",
            "tai_minus_utc", "leap_table_source", "leap_table_updated", "leap_table_expires", "leap_table_hash",
            "warnings", "error");
        List<Map<String, String>> rows = rows(r.out());
        assertThat(rows).extracting(m -> m.get("id"))
            .containsExactly("g1", "junk", "g2", "noleap", "g3", "short", "g4");
        assertThat(rows.get(1).get("error")).isEqualTo("line 3: " + singleError(List.of(), "not a time"))
            .contains("'not a time'");
        assertThat(rows.get(3).get("error")).isEqualTo("line 5: " + singleError(List.of(), "2017-06-30T23:59:60Z"))
            .contains("2017-06-30T23:59:60");
        assertThat(rows.get(5).get("error")).isEqualTo("line 8: 1 field where the header has 2");
        for (int i : new int[] {1, 3, 5}) {
            assertThat(rows.get(i).get("utc")).isEmpty();
            assertThat(rows.get(i).get("warnings")).isEmpty();
        }
        for (int i : new int[] {0, 2, 4, 6}) {
            assertThat(rows.get(i).get("error")).isEmpty();
        }
        assertThat(rows.get(4).get("warnings")).contains("expired on");
        // Source: IERS/IETF leap-second list: 2017-01-01T00:00:37 TAI is 2017-01-01T00:00:00 UTC (TAI - UTC = 37 s).
        assertThat(rows.get(6).get("utc")).isEqualTo("2017-01-01T00:00:00Z");
        assertThat(r.out() + r.err()).doesNotContain("Exception");
    }

    @Test
    void aMissingValueColumnIsAUsageErrorAndCreatesNoOutput(@TempDir Path dir) throws Exception {
        Path file = write(dir, "novalue.csv", "id,time\na,2017-01-01T00:00:00Z\n");
        Path out = dir.resolve("never.csv");
        CliRun r = time("--input", file.toString(), "--output", out.toString());
        assertThat(r.code()).isEqualTo(ExitCode.USAGE);
        assertThat(r.err()).contains("line 1").contains("no column 'value'").contains("id,time")
            .doesNotContain("Exception");
        assertThat(out).doesNotExist();
        Path clash = write(dir, "clash.csv", "value,utc\n2017-01-01T00:00:00Z,x\n");
        assertThat(time("--input", clash.toString()).err()).contains("'utc'").contains("rename it");
        // --to leaves 'tai' out of the output, so a 'tai' column may pass through.
        Path tai = write(dir, "tai.csv", "value,tai\n2017-01-01T00:00:00Z,x\n");
        CliRun kept = time("--to", "utc", "--input", tai.toString());
        assertThat(kept.code()).as(kept.err()).isZero();
        assertThat(header(kept.out())).startsWith("tai", "input", "input_scale", "utc");
    }

    @Test
    void optionMisuseIsAUsageError(@TempDir Path dir) throws Exception {
        Path ok = write(dir, "ok.csv", "value\n2017-01-01T00:00:00Z\n");
        CliRun both = time("--input", ok.toString(), "2017-01-01T00:00:00Z");
        assertThat(both.code()).isEqualTo(ExitCode.USAGE);
        assertThat(both.err()).contains("'2017-01-01T00:00:00Z'").contains("--input");
        CliRun output = time("--output", dir.resolve("o.csv").toString(), "2017-01-01T00:00:00Z");
        assertThat(output.code()).isEqualTo(ExitCode.USAGE);
        assertThat(output.err()).contains("--output applies to --input");
        CliRun same = time("--input", ok.toString(), "--output", ok.toString());
        assertThat(same.code()).isEqualTo(ExitCode.USAGE);
        assertThat(Files.readString(ok)).isEqualTo("value\n2017-01-01T00:00:00Z\n");
        CliRun none = time();
        assertThat(none.code()).isEqualTo(ExitCode.USAGE);
        assertThat(none.err()).contains("VALUE");
        CliRun missing = time("--input", dir.resolve("absent.csv").toString());
        assertThat(missing.code()).isEqualTo(ExitCode.IO);
        assertThat(missing.err()).contains("absent.csv").contains("no such file");
        Path badList = write(dir, "bad.list", "garbage\n");
        CliRun leap = time("--leap-file", badList.toString(), "--input", ok.toString());
        assertThat(leap.code()).isEqualTo(ExitCode.DATA);
        assertThat(leap.err()).contains("garbage");
    }

    @Test
    @ResourceLock("java.lang.System.in")
    void dashReadsStandardInput() throws Exception {
        InputStream saved = System.in;
        try {
            System.setIn(new ByteArrayInputStream("id,value\nq,unix:1483228800.5\n".getBytes(StandardCharsets.UTF_8)));
            CliRun r = time("--input", "-", "--to", "utc");
            assertThat(r.code()).as(r.err()).isZero();
            Map<String, String> row = rows(r.out()).get(0);
            assertThat(row.get("id")).isEqualTo("q");
            assertThat(row.get("utc")).isEqualTo(cell(tree(singleJson(List.of(), "unix:1483228800.5")).get("utc")))
                .isEqualTo("2017-01-01T00:00:00.500Z");
            assertThat(row.get("warnings")).contains("also names the leap second");
        } finally {
            System.setIn(saved);
        }
    }

    @Test
    void tenThousandRowsAllConvert(@TempDir Path dir) throws Exception {
        int n = 10_000;
        StringBuilder in = new StringBuilder("id,value\n");
        for (int i = 0; i < n; i++) {
            // Invented stamps: one every 997.5 s from 2016-10-01T00:00:00Z, across the 2016-12-31 leap second.
            long tenths = 14752800000L + 9975L * i;
            in.append(i).append(",unix:").append(tenths / 10).append('.').append(tenths % 10).append('\n');
        }
        Path file = write(dir, "big.csv", in.toString());
        Path out = dir.resolve("big-out.csv");
        CliRun r = time("--input", file.toString(), "--output", out.toString(), "--to", "gps");
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).isEmpty();
        List<Map<String, String>> rows = rows(Files.readString(out));
        assertThat(rows).hasSize(n);
        assertThat(rows.get(n - 1).get("id")).isEqualTo(Integer.toString(n - 1));
        assertThat(rows).allMatch(m -> m.get("error").isEmpty());
    }
}
