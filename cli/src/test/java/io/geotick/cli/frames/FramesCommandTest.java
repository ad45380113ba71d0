package io.geotick.cli.frames;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import io.geotick.cli.CliRun;
import io.geotick.cli.Json;
import io.geotick.transforms.frames.Frame;
import io.geotick.transforms.frames.FrameLink;
import io.geotick.transforms.frames.FrameRegistry;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** {@code geotick frames} lists every frame and every parameter set of the registry. */
class FramesCommandTest {
    @Test
    void textListsEveryFrameWithItsEllipsoidAndKind() {
        CliRun r = CliRun.of("frames");
        assertThat(r.exitCode()).isZero();
        assertThat(r.err()).isEmpty();
        FrameRegistry reg = FrameRegistry.standard();
        List<String> frameLines = r.out().lines().filter(l -> l.startsWith("frame ")).toList();
        assertThat(frameLines).hasSize(reg.frames().size());
        for (int i = 0; i < reg.frames().size(); i++) {
            Frame f = reg.frames().get(i);
            assertThat(frameLines.get(i)).contains(f.name(), f.ellipsoid().name(),
                FramesCommand.kindWord(f.kind()));
        }
        assertThat(r.out()).contains("frames: " + reg.frames().size(), "links: " + reg.links().size());
        assertThat(r.out().lines().filter(l -> l.startsWith("link "))).hasSize(reg.links().size());
    }

    @Test
    void textShowsLinkMethodsCodesSourcesAndAccuracy() {
        String out = CliRun.of("frames").out();
        // Source: EPSG transformation 1237, WGS 72 to WGS 84 (1), and 1314, OSGB36 to WGS 84 (6) (codes from memory;
        // the registry's own values are checked in the reference tests).
        assertThat(out).contains("link   WGS 72 → WGS 84", "EPSG transformation: 1237", "EPSG transformation: 1314");
        assertThat(out).contains("method: Time-dependent Position Vector transformation (EPSG method 1053)");
        assertThat(out).contains("method: Geocentric translations (EPSG method 9603)");
        assertThat(out).contains("source: EUREF Technical Note 1", "accuracy: 10.0 m", "needs epoch: yes",
            "needs epoch: no", "caution: WGS 84 is treated as identical");
    }

    @Test
    void jsonListsTheRegistry() throws Exception {
        CliRun r = CliRun.of("frames", "--json");
        assertThat(r.exitCode()).isZero();
        assertThat(r.out().strip()).doesNotContain("\n");
        JsonNode n = Json.MAPPER.readTree(r.out());
        FrameRegistry reg = FrameRegistry.standard();
        List<String> names = new ArrayList<>();
        n.get("frames").forEach(f -> names.add(f.get("name").asText()));
        assertThat(names).containsExactlyElementsOf(reg.frames().stream().map(Frame::name).toList());
        JsonNode itrf = n.get("frames").get(0);
        assertThat(itrf.get("ellipsoid").asText()).isEqualTo("GRS 1980");
        assertThat(itrf.get("kind").asText()).isEqualTo("global");
        assertThat(itrf.get("epsg_crs").isInt()).isTrue();
        assertThat(n.get("links")).hasSize(reg.links().size());
        for (int i = 0; i < reg.links().size(); i++) {
            FrameLink l = reg.links().get(i);
            JsonNode j = n.get("links").get(i);
            assertThat(j.get("from").asText()).isEqualTo(l.from().name());
            assertThat(j.get("to").asText()).isEqualTo(l.to().name());
            assertThat(j.get("accuracy_m").doubleValue()).isEqualTo(l.accuracyMetres());
            assertThat(j.get("source").asText()).isEqualTo(l.source());
            assertThat(j.get("needs_epoch").booleanValue()).isEqualTo(l.requiresEpoch());
            assertThat(j.has("method")).isTrue();
            assertThat(j.has("parameters")).isTrue();
        }
    }

    @Test
    void helpSaysWhereTheValuesComeFrom() {
        CliRun r = CliRun.of("frames", "--help");
        assertThat(r.exitCode()).isZero();
        assertThat(r.out()).contains("SYS@FRAME", "from memory", "geodetic authority", "licensed surveyors");
    }
}
