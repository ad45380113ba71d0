package io.geotick.transforms.chain;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import io.geotick.geodesy.InvalidCoordinateException;
import io.geotick.geodesy.ecef.EcefConverter;
import io.geotick.geodesy.position.EcefPosition;
import io.geotick.geodesy.position.GeodeticPosition;
import io.geotick.transforms.Epoch;
import io.geotick.transforms.MissingEpochException;
import io.geotick.transforms.StepDescription;
import io.geotick.transforms.frames.FrameRegistry;
import io.geotick.transforms.frames.StandardFrames;
import io.geotick.transforms.height.GeoidGrid;
import io.geotick.transforms.height.Interpolation;
import io.geotick.transforms.helmert.Helmert;
import io.geotick.transforms.helmert.HelmertParameters;
import java.util.Arrays;
import java.util.Random;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;

class ConversionChainTest {
    private static final double[] STATION = {4027894.006, 307045.600, 4919474.910};

    private static ConversionChain itrfToEtrf() {
        return ConversionChain.builder().from(CoordinateSystem.ecef(StandardFrames.ITRF2020))
            .to(CoordinateSystem.geodetic(StandardFrames.ETRF2000)).epoch(Epoch.of(2024.5)).build();
    }

    @Test
    void listsItsStepsWithSourcesAndAccuracy() {
        ConversionChain c = itrfToEtrf();
        assertThat(c.steps()).extracting(StepDescription::name).containsExactly("ITRF2020 → ITRF2014",
            "ITRF2014 → ETRF2000", "ECEF → geodetic on GRS 1980 (ETRF2000)");
        assertThat(c.steps().get(1).source()).contains("EUREF");
        assertThat(c.steps().get(2).epsgMethod()).hasValue(9602);
        assertThat(c.accuracyMetres()).isCloseTo(Math.hypot(0.003, 0.01), within(1e-12));
        assertThat(c.explain()).contains("ecef@ITRF2020 → geodetic@ETRF2000 at epoch 2024.5")
            .contains("rz rate = ").contains("arc-second/yr");
    }

    @Test
    void roundTripsThroughTheInverseChain() {
        ConversionChain c = itrfToEtrf();
        double[] llh = c.convert(STATION[0], STATION[1], STATION[2]);
        assertThat(llh[0]).isBetween(50.0, 51.0);
        double[] back = c.inverse().convert(llh[0], llh[1], llh[2]);
        assertThat(EcefPosition.of(back[0], back[1], back[2]).distanceTo(
            EcefPosition.of(STATION[0], STATION[1], STATION[2]))).isLessThan(2e-9);
    }

    @Test
    void arraysMatchSinglePointsAndAreThreadSafe() {
        // 10,000 random geodetic points on ED50 → WGS 84 (geodetic) and back.
        ConversionChain c = ConversionChain.builder().from(CoordinateSystem.geodetic(StandardFrames.ED50))
            .to(CoordinateSystem.geodetic(StandardFrames.WGS84)).build();
        Random r = new Random(1);
        int n = 10_000;
        double[] in = new double[3 * n];
        for (int i = 0; i < n; i++) {
            in[3 * i] = -85 + 170 * r.nextDouble();
            in[3 * i + 1] = -180 + 360 * r.nextDouble();
            in[3 * i + 2] = -50 + 5000 * r.nextDouble();
        }
        double[] out = new double[3 * n];
        c.convert(in, 0, out, 0, n);
        double[] parallel = new double[3 * n];
        IntStream.range(0, n).parallel().forEach(i -> {
            double[] p = c.convert(in[3 * i], in[3 * i + 1], in[3 * i + 2]);
            System.arraycopy(p, 0, parallel, 3 * i, 3);
        });
        // Degrees: the arc tangents of the SIMD kernel and the scalar code agree within an ulp + 1.3e-16°.
        ArrayAgreement.assertAgrees(out, parallel, 1.3e-16);
        double[] back = out.clone();
        c.inverse().convert(back, 0, back, 0, n);
        EcefConverter ed = EcefConverter.of(StandardFrames.ED50.ellipsoid());
        double worst = 0;
        for (int i = 0; i < n; i++) {
            EcefPosition a = ed.toEcef(GeodeticPosition.of(in[3 * i], in[3 * i + 1], in[3 * i + 2]));
            EcefPosition b = ed.toEcef(GeodeticPosition.of(back[3 * i], back[3 * i + 1], back[3 * i + 2]));
            worst = Math.max(worst, a.distanceTo(b));
        }
        assertThat(worst).isLessThan(5e-9);
    }

    @Test
    void missingEpochFailsAtBuildTime() {
        assertThatThrownBy(() -> ConversionChain.builder().from(CoordinateSystem.ecef(StandardFrames.ITRF2020))
            .to(CoordinateSystem.geodetic(StandardFrames.ETRF2000)).build())
            .isInstanceOf(MissingEpochException.class).hasMessageContaining("needs the coordinate epoch");
    }

    @Test
    void sameFrameNeedsNoDatumStep() {
        ConversionChain c = ConversionChain.builder().from(CoordinateSystem.geodetic(StandardFrames.WGS84))
            .to(CoordinateSystem.ecef(StandardFrames.WGS84)).build();
        assertThat(c.steps()).hasSize(1);
        ConversionChain id = ConversionChain.builder().from(CoordinateSystem.geodetic(StandardFrames.WGS84))
            .to(CoordinateSystem.geodetic(StandardFrames.WGS84)).build();
        assertThat(id.steps()).isEmpty();
        assertThat(id.convert(1, 2, 3)).containsExactly(1, 2, 3);
        assertThatThrownBy(() -> id.convert(Double.NaN, 2, 3)).isInstanceOf(InvalidCoordinateException.class)
            .hasMessageContaining("NaN");
        assertThatThrownBy(() -> c.convert(91, 0, 0)).isInstanceOf(InvalidCoordinateException.class)
            .hasMessageContaining("91");
    }

    @Test
    void userHelmertReplacesTheRegistryPath() {
        Helmert h = Helmert.coordinateFrame(HelmertParameters.of(1, 2, 3, 0.1, 0.2, 0.3, 1.5));
        ConversionChain c = ConversionChain.builder().from(CoordinateSystem.ecef(StandardFrames.ED50))
            .to(CoordinateSystem.ecef(StandardFrames.WGS84)).helmert(h, "an invented authority", 0.5).build();
        assertThat(c.steps()).hasSize(1);
        StepDescription d = c.steps().get(0);
        assertThat(d.epsgMethod()).hasValue(1032);
        assertThat(d.parameter("rz").orElseThrow().unit()).isEqualTo("arc-second");
        assertThat(d.cautions().get(0)).contains("coordinate frame rotation convention");
        EcefPosition p = h.apply(EcefPosition.of(STATION[0], STATION[1], STATION[2]));
        assertThat(c.convert(STATION[0], STATION[1], STATION[2])).containsExactly(p.x(), p.y(), p.z());
    }

    @Test
    void orthometricHeightsNeedAGeoid() {
        assertThatThrownBy(() -> ConversionChain.builder()
            .from(CoordinateSystem.geodeticOrthometric(StandardFrames.WGS84))
            .to(CoordinateSystem.ecef(StandardFrames.WGS84)).build()).hasMessageContaining("geoid");
        GeoidGrid g = GeoidGrid.parse(String.join("\n", "begin_of_head ====", "model name : FLAT",
            "lat min : 40", "lat max : 41", "lon min : 0", "lon max : 1", "delta lat : 1", "delta lon : 1",
            "nrows : 2", "ncols : 2", "nodata : -9999", "ISG format : 2.0", "end_of_head ====",
            "47.0 48.0", "45.0 46.0"), "flat.isg");
        ConversionChain c = ConversionChain.builder()
            .from(CoordinateSystem.geodeticOrthometric(StandardFrames.WGS84))
            .to(CoordinateSystem.geodetic(StandardFrames.WGS84)).geoid(g, Interpolation.BILINEAR).build();
        // N at the cell centre is the mean of the four nodes, 46.5 m.
        assertThat(c.convert(40.5, 0.5, 100)[2]).isCloseTo(146.5, within(1e-12));
        assertThat(c.inverse().convert(40.5, 0.5, 146.5)[2]).isCloseTo(100, within(1e-12));
    }

    @Test
    void parsesKindAtFrame() {
        FrameRegistry r = FrameRegistry.standard();
        assertThat(CoordinateSystem.parse("ecef@ITRF2020", r)).isEqualTo(CoordinateSystem.ecef(StandardFrames.ITRF2020));
        assertThat(CoordinateSystem.parse("geodetic@etrf2000", r).toString()).isEqualTo("geodetic@ETRF2000");
        assertThatThrownBy(() -> CoordinateSystem.parse("utm@ED50", r)).hasMessageContaining("utm");
        assertThatThrownBy(() -> CoordinateSystem.parse("ecef", r)).hasMessageContaining("KIND@FRAME");
        assertThat(Arrays.asList(CoordinateKind.values())).containsExactly(CoordinateKind.ECEF, CoordinateKind.GEODETIC,
            CoordinateKind.PROJECTED, CoordinateKind.SITE);
    }
}
