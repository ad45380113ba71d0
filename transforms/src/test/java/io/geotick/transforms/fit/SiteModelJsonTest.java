package io.geotick.transforms.fit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SiteModelJsonTest {

    @Test
    void roundTripsExactly(@TempDir Path dir) throws Exception {
        for (SiteModel m : new SiteModel[] {
            SiteFitter.similarity(SiteFitterTest.similarityPoints(0.9, 0.1, 10, 20, 0.01, 5)).model(),
            SiteFitter.affine(SiteFitterTest.similarityPoints(0.9, 0.1, 10, 20, 0.01, 6)).model(),
            SiteFitter.helmert(SiteFitterTest.helmertPoints(1, 2, 3, 4, 0.002)).model()}) {
            SiteModel named = m.withSystems("EPSG:32631", "Invented site grid");
            Path file = dir.resolve(m.kind().id() + ".json");
            named.write(file);
            SiteModel back = SiteModel.read(file);
            assertThat(back).isEqualTo(named);
            assertThat(back.parameters()).isEqualTo(named.parameters());
            assertThat(back.derivedParameters()).isEqualTo(named.derivedParameters());
            assertThat(back.sourceSystem()).isEqualTo("EPSG:32631");
            assertThat(back.apply(512_000, 5_430_000, 1).x()).isEqualTo(named.apply(512_000, 5_430_000, 1).x());
        }
        SiteModel exact = SiteFitter.similarity(java.util.List.of(ControlPoint.of("A", 0, 0, 500, 300),
            ControlPoint.of("B", 3, 4, 497.2, 309.6))).model();
        String json = exact.toJson();
        assertThat(json).contains("\"covariance\" : null").contains("\"sigma0_m\" : null");
        assertThat(SiteModel.fromJson(json)).isEqualTo(exact);
    }

    @Test
    void invalidFilesNameTheProblem(@TempDir Path dir) throws Exception {
        String good = SiteFitter.similarity(SiteFitterTest.similarityPoints(0.9, 0.1, 10, 20, 0.01, 5)).model()
            .toJson();
        assertThatThrownBy(() -> SiteModel.fromJson("{not json"))
            .isInstanceOf(SiteModelFormatException.class).hasMessageContaining("not valid JSON");
        assertThatThrownBy(() -> SiteModel.fromJson("[1, 2]")).isInstanceOf(SiteModelFormatException.class)
            .hasMessageContaining("not a JSON object");
        assertThatThrownBy(() -> SiteModel.fromJson(good.replace("geotick-site-model", "other")))
            .isInstanceOf(SiteModelFormatException.class).hasMessageContaining("'format'");
        assertThatThrownBy(() -> SiteModel.fromJson(good.replace("\"format_version\" : 1", "\"format_version\" : 9")))
            .isInstanceOf(SiteModelFormatException.class).hasMessageContaining("'format_version' is 9");
        assertThatThrownBy(() -> SiteModel.fromJson(good.replace("similarity-2d", "conic")))
            .isInstanceOf(SiteModelFormatException.class).hasMessageContaining("'kind'");
        assertThatThrownBy(() -> SiteModel.fromJson(good.replace("\"name\" : \"b\"", "\"name\" : \"q\"")))
            .isInstanceOf(SiteModelFormatException.class).hasMessageContaining("'parameters[1].name'");
        assertThatThrownBy(() -> SiteModel.fromJson(good.replace("\"rms_m\"", "\"rms\"")))
            .isInstanceOf(SiteModelFormatException.class).hasMessageContaining("'statistics.rms_m'");
        assertThatThrownBy(() -> SiteModel.fromJson(good.replace("\"source\" : [", "\"source\" : [1, ")))
            .isInstanceOf(SiteModelFormatException.class).hasMessageContaining("'centroid.source'");
        assertThatThrownBy(() -> SiteModel.fromJson(good.replace("\"redundancy\" : 8", "\"redundancy\" : 7")))
            .isInstanceOf(SiteModelFormatException.class).hasMessageContaining("'statistics.redundancy' is 7");
        assertThatThrownBy(() -> SiteModel.fromJson(good.replaceFirst("\"covariance\" : \\[", "\"covariance\" : [[1], ")))
            .isInstanceOf(SiteModelFormatException.class).hasMessageContaining("'covariance'");
        Path f = dir.resolve("broken.json");
        Files.writeString(f, good.replace("\"id\" : \"P2\"", "\"id\" : 2"));
        assertThatThrownBy(() -> SiteModel.read(f)).isInstanceOf(SiteModelFormatException.class)
            .hasMessageContaining(f.toString()).hasMessageContaining("'id'");
        assertThatThrownBy(() -> SiteModel.read(dir.resolve("missing.json")))
            .isInstanceOf(java.io.UncheckedIOException.class).hasMessageContaining("missing.json");
    }
}
