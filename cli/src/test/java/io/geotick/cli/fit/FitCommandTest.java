package io.geotick.cli.fit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import io.geotick.cli.CliRun;
import io.geotick.cli.Json;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code geotick fit} and fitted site grids in {@code geotick coord}, end to end. The control points are
 * invented; the exact case is computed by hand from the model's formula.
 */
class FitCommandTest {
    // Hand-computed exact case: a 2D similarity x' = a·x − b·y + tx, y' = b·x + a·y + ty with scale
    // s = 1.0001 and rotation θ = 30°, so a = s·cos θ, b = s·sin θ (the model's definition, common practice),
    // applied to UTM 31N eastings/northings reduced by (450 000, 5 700 000) m, translation (1 000, 2 000) m.
    static final double S = 1.0001;
    static final double THETA = Math.toRadians(30);
    static final double[][] SOURCE = {{450120.0, 5700080.0}, {450480.0, 5700030.0}, {450390.0, 5699790.0},
        {450050.0, 5699820.0}, {450260.0, 5699950.0}, {450310.0, 5700110.0}, {450170.0, 5699700.0},
        {450420.0, 5699880.0}};

    static double[] site(double e, double n) {
        double x = e - 450000;
        double y = n - 5700000;
        double a = S * Math.cos(THETA);
        double b = S * Math.sin(THETA);
        return new double[] {a * x - b * y + 1000, b * x + a * y + 2000};
    }

    /** The pairs file; {@code noise} adds invented millimetre errors, {@code blunder} 0.5 m to point 5's x. */
    static Path pairs(Path dir, boolean noise, boolean blunder) throws IOException {
        StringBuilder s = new StringBuilder("id,easting,northing,site_x,site_y\n");
        double[] mm = {0.002, -0.001, 0.0015, -0.002, 0.001, -0.0005, 0.0012, -0.0018};
        for (int i = 0; i < SOURCE.length; i++) {
            double[] t = site(SOURCE[i][0], SOURCE[i][1]);
            double dx = (noise ? mm[i] : 0) + (blunder && i == 4 ? 0.5 : 0);
            double dy = noise ? -mm[(i + 3) % mm.length] : 0;
            s.append(String.format(Locale.ROOT, "Q%d,%.3f,%.3f,%.6f,%.6f%n", i + 1, SOURCE[i][0], SOURCE[i][1],
                t[0] + dx, t[1] + dy));
        }
        Path p = dir.resolve(noise ? "noisy.csv" : "exact.csv");
        Files.writeString(p, s.toString());
        return p;
    }

    static JsonNode parameter(JsonNode model, String group, String name) {
        for (JsonNode p : model.get(group)) {
            if (p.get("name").asText().equals(name)) {
                return p;
            }
        }
        throw new AssertionError("no parameter " + name);
    }

    @Test
    void exactCaseRecoversTheHandComputedParameters(@TempDir Path dir) throws Exception {
        CliRun r = CliRun.of("fit", "--model", "similarity", "--from", "utm:31N", "--json",
            pairs(dir, false, false).toString());
        assertThat(r.err()).isEmpty();
        assertThat(r.exitCode()).isZero();
        JsonNode m = Json.MAPPER.readTree(r.out());
        assertThat(m.get("kind").asText()).isEqualTo("similarity-2d");
        assertThat(m.get("source_system").asText()).isEqualTo("utm:31N");
        // Source: hand-computed exact case above (a = s·cos θ, b = s·sin θ).
        assertThat(parameter(m, "parameters", "a").get("value").asDouble()).isCloseTo(S * Math.cos(THETA), within(1e-9));
        assertThat(parameter(m, "parameters", "b").get("value").asDouble()).isCloseTo(S * Math.sin(THETA), within(1e-9));
        assertThat(m.get("statistics").get("rms_m").asDouble()).isLessThan(1e-6); // inputs rounded to 1 µm
        assertThat(m.get("residuals")).hasSize(SOURCE.length);
        CliRun text = CliRun.of("fit", "--model", "similarity", pairs(dir, false, false).toString());
        assertThat(text.out()).contains("model        similarity-2d").contains("points       8 used of 8")
            .contains("redundancy   12").contains("residuals").contains("Q8").contains("from         (not stated)");
    }

    @Test
    void sourceInFeetIsNotedInTheReport(@TempDir Path dir) throws Exception {
        // EPSG:2263 is in US survey feet (its definition, as Proj4J's bundled EPSG file carries it); the pairs
        // are the invented exact case, read as feet. The fit maps the values as typed, so the report says
        // which unit the --from values are in and that its m labels are the site grid's own unit.
        Path csv = pairs(dir, false, false);
        CliRun feet = CliRun.of("fit", "--model", "similarity", "--from", "EPSG:2263", csv.toString());
        assertThat(feet.exitCode()).as(feet.err()).isZero();
        assertThat(feet.out()).startsWith("note         the --from values are in ftUS (the unit of EPSG:2263)");
        CliRun metres = CliRun.of("fit", "--model", "similarity", "--from", "utm:31N", csv.toString());
        assertThat(metres.out()).doesNotContain("note ");
    }

    @Test
    void badRowsAreNamedByLineAndField(@TempDir Path dir) throws Exception {
        Path p = dir.resolve("bad.csv");
        Files.writeString(p, "id,easting,northing,site_x,site_y\nQ1,450120,5700080,1,2\nQ2,abc,5700030,3,4\n\n"
            + "Q3,1,2,3\nQ1,1,2,3,4\nQ5,1,2,,4\n");
        CliRun r = CliRun.of("fit", "--model", "similarity", p.toString());
        assertThat(r.exitCode()).isEqualTo(2);
        assertThat(r.err()).contains("4 bad rows, nothing fitted")
            .contains("line 3: field 'easting': 'abc' is not a number")
            .contains("line 5: 4 fields, expected 5").contains("line 6: id 'Q1' appears twice")
            .contains("line 7: field 'site_x' is empty").doesNotContain("Exception");
        Path header = dir.resolve("header.csv");
        Files.writeString(header, "id,e,n,x\nQ1,1,2,3\n");
        CliRun h = CliRun.of("fit", "--model", "similarity", header.toString());
        assertThat(h.exitCode()).isEqualTo(2);
        assertThat(h.err()).contains("line 1").contains("header must have 5 columns");
        CliRun model = CliRun.of("fit", "--model", "projective", header.toString());
        assertThat(model.exitCode()).isEqualTo(2);
        assertThat(model.err()).contains("--model 'projective'");
        CliRun auto = CliRun.of("fit", "--model", "similarity", "--from", "utm", header.toString());
        assertThat(auto.err()).contains("--from 'utm'");
        assertThat(CliRun.of("fit", "--model", "similarity", dir.resolve("none.csv").toString()).exitCode())
            .isEqualTo(3);
    }

    @Test
    void outlierIsFlaggedAndCanBeExcluded(@TempDir Path dir) throws Exception {
        Path p = pairs(dir, true, true);
        CliRun r = CliRun.of("fit", "--model", "similarity", p.toString());
        assertThat(r.exitCode()).isZero();
        assertThat(r.out()).containsPattern("Q5 .*OUTLIER").contains("warning      outliers flagged");
        CliRun x = CliRun.of("fit", "--model", "similarity", "--exclude-outliers", "--json", p.toString());
        JsonNode m = Json.MAPPER.readTree(x.out());
        assertThat(m.get("statistics").get("points_used").asInt()).isEqualTo(7);
        JsonNode q5 = m.get("residuals").get(4);
        assertThat(q5.get("id").asText()).isEqualTo("Q5");
        assertThat(q5.get("used").asBoolean()).isFalse();
        // The excluded point's prediction residual shows the planted 0.5 m blunder (invented data).
        assertThat(q5.get("dx").asDouble()).isCloseTo(0.5, within(0.01));
        assertThat(m.get("statistics").get("rms_m").asDouble()).isLessThan(0.005);
    }

    @Test
    void modelFileRoundTripIntoCoord(@TempDir Path dir) throws Exception {
        Path model = dir.resolve("site.json");
        CliRun f = CliRun.of("fit", "--model", "similarity", "--from", "utm:31N", "-o", model.toString(),
            pairs(dir, false, false).toString());
        assertThat(f.exitCode()).isZero();
        assertThat(f.out()).contains("model written to");
        String sys = "site:" + model;
        CliRun c = CliRun.of("coord", "--from", "utm:31N", "--to", sys, "--json", "450260", "5699950", "12.5");
        assertThat(c.err()).isEmpty();
        JsonNode j = Json.MAPPER.readTree(c.out());
        double[] want = site(450260, 5699950);
        // Source: hand-computed exact case above.
        assertThat(j.get("x").asDouble()).isCloseTo(want[0], within(1e-6));
        assertThat(j.get("y").asDouble()).isCloseTo(want[1], within(1e-6));
        assertThat(j.get("h").asDouble()).isCloseTo(12.5, within(1e-8));
        // Through the chain from geodetic, and back through the model's inverse.
        CliRun g = CliRun.of("coord", "--from", sys, "--to", "geodetic", "--json", j.get("x").asText(),
            j.get("y").asText(), "12.5");
        JsonNode back = Json.MAPPER.readTree(g.out());
        CliRun u = CliRun.of("coord", "--from", "geodetic", "--to", "utm:31N", "--json", back.get("lat").asText(),
            back.get("lon").asText(), "12.5");
        JsonNode e = Json.MAPPER.readTree(u.out());
        assertThat(e.get("easting").asDouble()).isCloseTo(450260, within(1e-6));
        assertThat(e.get("northing").asDouble()).isCloseTo(5699950, within(1e-6));
        CliRun explain = CliRun.of("coord", "--from", "utm:31N", "--to", sys, "--explain", "450260", "5699950", "0");
        assertThat(explain.out()).contains("utm:31N → site grid").contains("similarity-2d fitted by least squares to 8")
            .contains("control points' area");
    }

    @Test
    void corruptOrUnusableModelFiles(@TempDir Path dir) throws Exception {
        Path bad = dir.resolve("bad.json");
        Files.writeString(bad, "{\"format\": \"something else\"}");
        CliRun r = CliRun.of("coord", "--from", "utm:31N", "--to", "site:" + bad, "450260", "5699950", "0");
        assertThat(r.exitCode()).isEqualTo(4);
        assertThat(r.err()).contains(bad.toString()).doesNotContain("Exception");
        Path notJson = dir.resolve("notjson.json");
        Files.writeString(notJson, "{ \"kind\": ");
        assertThat(CliRun.of("coord", "--from", "utm:31N", "--to", "site:" + notJson, "1", "2", "3").exitCode())
            .isEqualTo(4);
        assertThat(CliRun.of("coord", "--from", "utm:31N", "--to", "site:" + dir.resolve("missing.json"), "1", "2",
            "3").exitCode()).isEqualTo(3);
        Path unnamed = dir.resolve("unnamed.json");
        CliRun f = CliRun.of("fit", "--model", "similarity", "-o", unnamed.toString(),
            pairs(dir, false, false).toString());
        assertThat(f.exitCode()).isZero();
        CliRun u = CliRun.of("coord", "--from", "utm:31N", "--to", "site:" + unnamed, "450260", "5699950", "0");
        assertThat(u.exitCode()).isEqualTo(2);
        assertThat(u.err()).contains("states no source system");
    }

    @Test
    void helmert3dExactTranslationIntoCoord(@TempDir Path dir) throws Exception {
        // Hand-computed exact case: the site grid is ECEF shifted by (-4 406 000 + 1.5, 376 000 - 0.7,
        // -4 580 000 + 2.1) m with no rotation and no scale (invented marks).
        double[][] p = {{4406214.692, -376365.730, 4580724.072}, {4406514.1, -376165.2, 4580424.9},
            {4405914.3, -376665.7, 4581024.0}, {4406314.0, -375965.0, 4580624.5}, {4406000.0, -376500.0, 4580900.0}};
        StringBuilder s = new StringBuilder("id,x,y,z,site_x,site_y,site_z\n");
        for (int i = 0; i < p.length; i++) {
            s.append(String.format(Locale.ROOT, "M%d,%.3f,%.3f,%.3f,%.3f,%.3f,%.3f%n", i, p[i][0], p[i][1], p[i][2],
                p[i][0] - 4406000 + 1.5, p[i][1] + 376000 - 0.7, p[i][2] - 4580000 + 2.1));
        }
        Path csv = dir.resolve("h3.csv");
        Files.writeString(csv, s.toString());
        Path model = dir.resolve("h3.json");
        CliRun f = CliRun.of("fit", "--model", "helmert3d", "--from", "ecef", "-o", model.toString(), csv.toString());
        assertThat(f.exitCode()).isZero();
        assertThat(f.out()).contains("helmert-3d").contains("redundancy   8");
        JsonNode m = Json.MAPPER.readTree(Files.readString(model));
        // Source: hand-computed exact case above: scale difference and rotations zero (to 1e-6 arc-second or
        // ppm: over the marks' ~500 m spread that is below 3 nm, the rounding of the fit).
        for (JsonNode q : m.get("parameters")) {
            String n = q.get("name").asText();
            if (n.startsWith("r") || n.equals("ds")) {
                assertThat(q.get("value").asDouble()).as(n).isCloseTo(0, within(1e-6));
            }
        }
        CliRun c = CliRun.of("coord", "--from", "ecef", "--to", "site:" + model, "--json", "4406100", "-376200",
            "4580800");
        JsonNode j = Json.MAPPER.readTree(c.out());
        assertThat(j.get("x").asDouble()).isCloseTo(101.5, within(1e-6));
        assertThat(j.get("y").asDouble()).isCloseTo(-200.7, within(1e-6));
        assertThat(j.get("z").asDouble()).isCloseTo(802.1, within(1e-6));
        CliRun k = CliRun.of("fit", "--model", "helmert3d", "--outlier-threshold", "-1", csv.toString());
        assertThat(k.exitCode()).isEqualTo(2);
        assertThat(k.err()).contains("--outlier-threshold -1");
    }
}
