package io.geotick.cli.time;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import io.geotick.cli.Json;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ClockCommandTest {
    /** Invented readings: device 2.5 s behind... gaining 0.5 s a day, alternating 1 ms jitter, one outlier. */
    private static Path pairs(Path dir, int outlierRow) throws IOException {
        StringBuilder sb = new StringBuilder("# invented readings\nsite,device,reference\n");
        long t0 = 1_700_000_000L;
        for (int i = 0; i < 24; i++) {
            double corr = 2.5 - 0.5 / 86_400 * (i * 3600.0) + (i % 2 == 0 ? 1e-3 : -1e-3) + (i == outlierRow ? 0.7 : 0);
            sb.append(String.format(Locale.ROOT, "a,%d,unix:%.6f%n", t0 + i * 3600L, t0 + i * 3600L + corr));
        }
        Path f = dir.resolve("pairs.csv");
        Files.writeString(f, sb.toString());
        return f;
    }

    @Test
    void fitWritesAModelThatApplyUses(@TempDir Path dir) throws IOException {
        Path csv = pairs(dir, 7);
        Path model = dir.resolve("m.json");
        CliRun fit = CliRun.of("clock", "fit", "--exclude-outliers", "-o", model.toString(), csv.toString());
        assertThat(fit.code()).as(fit.err()).isZero();
        assertThat(fit.out()).contains("drift").contains("s/day").contains("outlier").contains("line 10")
            .contains("excluded").contains("model written to");
        JsonNode m = Json.MAPPER.readTree(Files.readString(model));
        assertThat(m.get("format").asText()).isEqualTo("geotick-clock-model/1");
        assertThat(m.get("drift_s_per_day").asDouble()).isCloseTo(-0.5, within(1e-3));
        assertThat(m.get("pairs_used").asInt()).isEqualTo(23);
        assertThat(m.get("sigma").get("drift").asDouble()).isPositive();
        assertThat(m.get("outliers").get(0).get("line").asInt()).isEqualTo(10);

        CliRun apply = CliRun.of("clock", "apply", "--json", "-m", model.toString(), "1700036000");
        assertThat(apply.code()).as(apply.err()).isZero();
        JsonNode a = apply.json().get(0);
        assertThat(a.get("correction_s").asDouble()).isCloseTo(2.5 - 0.5 / 86_400 * 36_000, within(2e-3));
        assertThat(a.get("extrapolated").asBoolean()).isFalse();
        CliRun far = CliRun.of("clock", "apply", "-m", model.toString(), "unix:1710000000");
        assertThat(far.out()).contains("extrapolating");
    }

    @Test
    void fitJsonAndTerms(@TempDir Path dir) throws IOException {
        CliRun r = CliRun.of("clock", "fit", "--json", "--terms", "offset", pairs(dir, -1).toString());
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.json().get("terms").asText()).isEqualTo("offset");
        CliRun bad = CliRun.of("clock", "fit", "--terms", "cubic", pairs(dir, -1).toString());
        assertThat(bad.code()).isEqualTo(2);
        assertThat(bad.err()).contains("cubic");
    }

    @Test
    void aSinglePairGivesAnOffsetWithUnknownUncertainty(@TempDir Path dir) throws IOException {
        Path csv = dir.resolve("one.csv");
        Files.writeString(csv, "device,reference\n2024-01-01T00:00:00Z,2024-01-01T00:00:01.5Z\n");
        Path model = dir.resolve("one.json");
        CliRun fit = CliRun.of("clock", "fit", "--terms", "offset", "-o", model.toString(), csv.toString());
        assertThat(fit.code()).as(fit.err()).isZero();
        assertThat(fit.out()).contains("unknown (no redundancy)");
        JsonNode m = Json.MAPPER.readTree(Files.readString(model));
        assertThat(m.get("covariance").isNull()).isTrue();
        assertThat(m.get("sigma").get("offset_s").isNull()).isTrue();
        CliRun apply = CliRun.of("clock", "apply", "--json", "-m", model.toString(), "2024-01-01T00:00:00Z");
        assertThat(apply.code()).as(apply.err()).isZero();
        assertThat(apply.json().get(0).get("reference").asText()).isEqualTo("2024-01-01T00:00:01.500Z");
        assertThat(apply.json().get(0).get("sigma_s").isNull()).isTrue();
    }

    @Test
    void badCsvNamesTheLineOrColumn(@TempDir Path dir) throws IOException {
        Path noCol = dir.resolve("nocol.csv");
        Files.writeString(noCol, "when,truth\n1,2\n");
        CliRun r = CliRun.of("clock", "fit", noCol.toString());
        assertThat(r.code()).isEqualTo(2);
        assertThat(r.err()).contains("'device'").contains("nocol.csv");
        Path badCell = dir.resolve("cell.csv");
        Files.writeString(badCell, "device,reference\n1700000000,1700000002\n1700003600,tomorrow\n");
        CliRun c = CliRun.of("clock", "fit", badCell.toString());
        assertThat(c.code()).isEqualTo(2);
        assertThat(c.err()).contains("line 3").contains("tomorrow");
        CliRun missing = CliRun.of("clock", "fit", dir.resolve("none.csv").toString());
        assertThat(missing.code()).isEqualTo(3);
    }

    @Test
    void badModelFilesExitFourAndBadBatchRowsExitFive(@TempDir Path dir) throws IOException {
        Path m = dir.resolve("bad.json");
        Files.writeString(m, "{\"format\":\"geotick-clock-model/1\",\"terms\":\"drift\"}");
        CliRun r = CliRun.of("clock", "apply", "-m", m.toString(), "1700000000");
        assertThat(r.code()).isEqualTo(4);
        assertThat(r.err()).contains("bad.json");
        Path model = dir.resolve("m.json");
        assertThat(CliRun.of("clock", "fit", "-o", model.toString(), pairs(dir, -1).toString()).code()).isZero();
        Path in = dir.resolve("in.txt");
        Files.writeString(in, "# device stamps\n1700000000\nnot-a-time\n2023-11-15T00:00:00Z\n");
        CliRun b = CliRun.of("clock", "apply", "-m", model.toString(), "--input", in.toString());
        assertThat(b.code()).isEqualTo(5);
        assertThat(b.out()).contains("in.txt:3").contains("not-a-time").contains("2023-11-15T00:00:00Z ->");
        CliRun none = CliRun.of("clock", "apply", "-m", model.toString());
        assertThat(none.code()).isEqualTo(2);
    }
}
