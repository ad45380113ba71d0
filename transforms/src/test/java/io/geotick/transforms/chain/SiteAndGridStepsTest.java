package io.geotick.transforms.chain;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import io.geotick.geodesy.InvalidCoordinateException;
import io.geotick.geodesy.ecef.EcefConverter;
import io.geotick.geodesy.position.EcefPosition;
import io.geotick.geodesy.position.GeodeticPosition;
import io.geotick.transforms.StepDescription;
import io.geotick.transforms.fit.ControlPoint;
import io.geotick.transforms.fit.SiteFitter;
import io.geotick.transforms.fit.SiteModel;
import io.geotick.transforms.fit.SitePoint;
import io.geotick.transforms.frames.FrameRegistry;
import io.geotick.transforms.frames.StandardFrames;
import io.geotick.transforms.projection.GridPosition;
import io.geotick.transforms.projection.Hemisphere;
import io.geotick.transforms.projection.ProjectionDomainException;
import io.geotick.transforms.projection.TransverseMercator;
import io.geotick.transforms.projection.Utm;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;

/** Map grids and fitted site grids as chain steps. */
class SiteAndGridStepsTest {
    private static final Utm ZONE = Utm.zone(31, Hemisphere.NORTH, StandardFrames.ETRF2000.ellipsoid());
    private static final CoordinateSystem UTM = CoordinateSystem.projected(StandardFrames.ETRF2000, ZONE);
    private static final CoordinateSystem GEO = CoordinateSystem.geodetic(StandardFrames.ETRF2000);

    /** Invented marks: site = 0.9998·R(1.5°)·(utm − c) + (1000, 2000), plus millimetre noise. */
    private static SiteModel quay() {
        double[][] e = {{450000, 5700000}, {450600, 5700050}, {450550, 5700620}, {449980, 5700580},
            {450300, 5700300}};
        double[][] noise = {{0.002, -0.001}, {-0.001, 0.002}, {0.0, -0.002}, {0.001, 0.001}, {-0.002, 0.0}};
        List<ControlPoint> cps = new ArrayList<>();
        double c = Math.cos(Math.toRadians(1.5)) * 0.9998;
        double s = Math.sin(Math.toRadians(1.5)) * 0.9998;
        for (int i = 0; i < e.length; i++) {
            double dx = e[i][0] - 450000;
            double dy = e[i][1] - 5700000;
            cps.add(ControlPoint.of("Q" + i, e[i][0], e[i][1], 1000 + c * dx - s * dy + noise[i][0],
                2000 + s * dx + c * dy + noise[i][1]));
        }
        return SiteFitter.similarity(cps).model().withSystems("utm:31N@ETRF2000", "quay grid");
    }

    @Test
    void siteTargetIsTheProjectionThenTheModel() {
        SiteModel m = quay();
        ConversionChain c = ConversionChain.builder().from(GEO).to(CoordinateSystem.site(m)).build();
        assertThat(c.steps()).extracting(StepDescription::name).containsExactly(
            "geodetic → UTM zone 31N (GRS 1980)", "utm:31N@ETRF2000 → quay grid");
        double lat = 51.45;
        double lon = 2.3;
        GridPosition g = ZONE.project(lat, lon);
        SitePoint want = m.apply(g.easting(), g.northing(), 12.5);
        double[] got = c.convert(lat, lon, 12.5);
        // Bit for bit the projection and the model applied by hand.
        assertThat(got).containsExactly(want.x(), want.y(), 12.5);
        assertThat(c.toString()).contains("quay grid on utm:31N@ETRF2000");
    }

    @Test
    void siteStepListsParametersSourceAndAccuracy() {
        SiteModel m = quay();
        ConversionChain c = ConversionChain.builder().from(UTM).to(CoordinateSystem.site(m, UTM, "site grid (quay.json)"))
            .build();
        assertThat(c.steps()).hasSize(1);
        StepDescription d = c.steps().get(0);
        assertThat(d.name()).isEqualTo("utm:31N@ETRF2000 → site grid (quay.json)");
        assertThat(d.method()).isEqualTo("similarity-2d fitted by least squares to 5 control points");
        assertThat(d.parameters()).extracting(StepDescription.Parameter::name).contains("a", "b", "cx", "cy",
            "scale (derived)", "rotation (derived)");
        // The invented marks' 1.5° rotation, moved by their millimetre noise (measured 1.7e-5°).
        assertThat(d.parameter("rotation (derived)").orElseThrow().value()).isCloseTo(1.5, within(5e-5));
        assertThat(d.source()).contains("quay.json", "5 control points used of 5", "RMS residual", "utm:31N@ETRF2000");
        assertThat(d.accuracyMetres()).isEqualTo(m.statistics().rms()).isGreaterThan(0);
        assertThat(d.cautions()).anyMatch(s -> s.contains("control points' area"))
            .anyMatch(s -> s.contains("third value"));
        assertThat(c.accuracyMetres()).isEqualTo(m.statistics().rms());
        assertThat(c.inverse().steps().get(0).name()).isEqualTo("site grid (quay.json) → utm:31N@ETRF2000");
        assertThat(c.inverse().steps().get(0).method()).contains("inverse");
    }

    @Test
    void siteSourceThroughAnotherFrameRoundTrips() {
        SiteModel m = quay();
        ConversionChain c = ConversionChain.builder().from(CoordinateSystem.site(m))
            .to(CoordinateSystem.ecef(StandardFrames.ITRF2020)).epoch(io.geotick.transforms.Epoch.of(2024.5)).build();
        assertThat(c.steps().get(0).name()).isEqualTo("quay grid → utm:31N@ETRF2000");
        assertThat(c.steps().get(1).name()).isEqualTo("UTM zone 31N (GRS 1980) → geodetic");
        assertThat(c.steps().get(2).name()).startsWith("geodetic → ECEF");
        double[] p = {1260.25, 1950.75, 35.0, 1010.5, 2400.0, -3.0};
        double[] q = p.clone();
        c.convert(q, 0, q, 0, 2);
        c.inverse().convert(q, 0, q, 0, 2);
        for (int i = 0; i < p.length; i++) {
            // Rounding only: the round trip passes an ITRF → ETRF Helmert, ECEF and the Krüger series (nm).
            assertThat(q[i]).isCloseTo(p[i], within(1e-8));
        }
    }

    @Test
    void arraysMatchSinglePointsWithOffsetsAndThreads() {
        ConversionChain c = ConversionChain.builder().from(CoordinateSystem.ecef(StandardFrames.ETRF2000))
            .to(CoordinateSystem.site(quay())).build();
        int n = 200;
        double[] in = new double[3 * n + 2];
        for (int i = 0; i < n; i++) {
            in[2 + 3 * i] = 3_990_000 + i * 13.5;
            in[3 + 3 * i] = 160_000 - i * 7.25;
            in[4 + 3 * i] = 4_965_000 + i * 3.0;
        }
        double[] out = new double[3 * n + 1];
        c.convert(in, 2, out, 1, n);
        double[] inPlace = in.clone();
        c.convert(inPlace, 2, inPlace, 2, n);
        double[][] parallel = IntStream.range(0, n).parallel()
            .mapToObj(i -> c.convert(in[2 + 3 * i], in[3 + 3 * i], in[4 + 3 * i])).toArray(double[][]::new);
        for (int i = 0; i < n; i++) {
            double[] one = c.convert(in[2 + 3 * i], in[3 + 3 * i], in[4 + 3 * i]);
            // Metres: an ulp of a latitude or longitude (at most 2.8e-14°) plus 1.3e-16° is below 3.2e-9 m on
            // the ground, and the grid scale is near 1.
            ArrayAgreement.assertAgrees(Arrays.copyOfRange(out, 1 + 3 * i, 4 + 3 * i), one, 5e-9);
            ArrayAgreement.assertAgrees(Arrays.copyOfRange(inPlace, 2 + 3 * i, 5 + 3 * i), one, 5e-9);
            assertThat(parallel[i]).containsExactly(one);
        }
    }

    @Test
    void helmert3dSiteOnEcef() {
        // Invented marks: the site grid is ECEF translated by (−4 406 000, 376 000, −4 580 000) m, exact.
        double[][] p = {{4406214.692, -376365.730, 4580724.072}, {4406514.1, -376165.2, 4580424.9},
            {4405914.3, -376665.7, 4581024.0}, {4406314.0, -375965.0, 4580624.5}};
        List<ControlPoint> cps = new ArrayList<>();
        for (int i = 0; i < p.length; i++) {
            cps.add(ControlPoint.of("M" + i, p[i][0], p[i][1], p[i][2], p[i][0] - 4406000, p[i][1] + 376000,
                p[i][2] - 4580000));
        }
        SiteModel m = SiteFitter.helmert(cps).model().withSystems("ecef@WGS 84", "plant grid");
        ConversionChain c = ConversionChain.builder().from(CoordinateSystem.geodetic(StandardFrames.WGS84))
            .to(CoordinateSystem.site(m)).build();
        EcefPosition x = EcefConverter.of(StandardFrames.WGS84.ellipsoid()).toEcef(GeodeticPosition.of(46.2, -4.88,
            300));
        double[] r = c.convert(46.2, -4.88, 300);
        // Source: the hand-computed exact translation above (fit rounding, measured < 1e-8 m).
        assertThat(r[0]).isCloseTo(x.x() - 4406000, within(1e-7));
        assertThat(r[1]).isCloseTo(x.y() + 376000, within(1e-7));
        assertThat(r[2]).isCloseTo(x.z() - 4580000, within(1e-7));
        assertThat(c.steps()).extracting(StepDescription::name).containsExactly("geodetic → ECEF on WGS 84 (WGS 84)",
            "ecef@WGS 84 → plant grid");
        assertThat(c.steps().get(1).cautions()).noneMatch(s -> s.contains("third value"));
    }

    @Test
    void siteModelWithoutAUsableSourceSystemIsRefused() {
        SiteModel frameless = quay().withSystems("utm:31N", "quay grid");
        assertThatThrownBy(() -> CoordinateSystem.site(frameless)).isInstanceOf(IllegalArgumentException.class)
            .hasMessageContaining("'utm:31N'").hasMessageContaining("site(model, base)");
        assertThatThrownBy(() -> CoordinateSystem.site(quay().withSystems("", ""))).hasMessageContaining(
            "states no source system");
        // An explicit base works for it.
        assertThat(CoordinateSystem.site(frameless, UTM).frame()).isEqualTo(StandardFrames.ETRF2000);
        CoordinateSystem s = CoordinateSystem.site(quay());
        assertThatThrownBy(() -> CoordinateSystem.site(quay(), s)).hasMessageContaining("another site grid");
    }

    @Test
    void projectedSystemsParseAndConvertBetweenFrames() {
        FrameRegistry r = FrameRegistry.standard();
        assertThat(CoordinateSystem.parse("utm:31N@ETRF2000", r)).isEqualTo(UTM);
        assertThat(CoordinateSystem.parse("ups:S@WGS84", r).toString()).isEqualTo("ups:S@WGS 84");
        assertThat(CoordinateSystem.parse("EPSG:27700", r).frame()).isEqualTo(StandardFrames.OSGB36);
        assertThat(CoordinateSystem.parse("EPSG:27700", r).toString()).isEqualTo("EPSG:27700@OSGB 1936");
        assertThat(CoordinateSystem.parse("EPSG:4326", r)).isEqualTo(CoordinateSystem.geodetic(StandardFrames.WGS84));
        assertThatThrownBy(() -> CoordinateSystem.parse("utm:61N@ED50", r)).hasMessageContaining("utm:61N@ED50");
        assertThatThrownBy(() -> CoordinateSystem.parse("ups:X@ED50", r)).hasMessageContaining("'X'");
        assertThatThrownBy(() -> CoordinateSystem.parse("utm:31N", r)).hasMessageContaining("KIND@FRAME");
        assertThatThrownBy(() -> CoordinateSystem.parse("EPSG:27700@WGS84", r)).hasMessageContaining("Airy");
        assertThatThrownBy(() -> CoordinateSystem.projected(StandardFrames.ED50, ZONE)).hasMessageContaining(
            "International 1924");
        assertThatThrownBy(() -> CoordinateSystem.projected(StandardFrames.WGS84,
            TransverseMercator.of(StandardFrames.WGS84.ellipsoid(), 3, 1, 0, 0, 0))).hasMessageContaining("method");

        Utm ed = Utm.zone(31, Hemisphere.NORTH, StandardFrames.ED50.ellipsoid());
        ConversionChain c = ConversionChain.builder().from(CoordinateSystem.projected(StandardFrames.ED50, ed))
            .to(CoordinateSystem.projected(StandardFrames.WGS84, Utm.zone(31, Hemisphere.NORTH))).build();
        assertThat(c.steps()).extracting(StepDescription::name).containsExactly(
            "UTM zone 31N (International 1924) → geodetic", "geodetic → ECEF on International 1924 (ED50)", "ED50 → WGS 84",
            "ECEF → geodetic on WGS 84 (WGS 84)", "geodetic → UTM zone 31N (WGS 84)");
        assertThat(c.steps().get(0).epsgMethod()).hasValue(9807);
        double[] e = c.convert(450100, 5700200, 40);
        // ED50 → WGS 84 in the Netherlands moves points about 100 m (-87, -98, -121 m geocentric).
        assertThat(Math.hypot(e[0] - 450100, e[1] - 5700200)).isBetween(50.0, 250.0);
        double[] back = c.inverse().convert(e[0], e[1], e[2]);
        assertThat(back[0]).isCloseTo(450100, within(1e-8));
        assertThat(back[1]).isCloseTo(5700200, within(1e-8));
        assertThat(back[2]).isCloseTo(40, within(1e-8));
    }

    @Test
    void aSiteGridOntoItsOwnBaseIsOneStepAndIdentityIsEmpty() {
        CoordinateSystem s = CoordinateSystem.site(quay());
        assertThat(ConversionChain.builder().from(UTM).to(s).build().steps()).hasSize(1);
        assertThat(ConversionChain.builder().from(s).to(s).build().steps()).hasSize(2);
        assertThat(ConversionChain.builder().from(UTM).to(UTM).build().steps()).isEmpty();
    }

    @Test
    void badPointsAreNamedByIndex() {
        ConversionChain c = ConversionChain.builder().from(GEO).to(UTM).build();
        double[] b = {51, 2, 0, 86, 2, 0};
        assertThatThrownBy(() -> c.convert(b, 0, b, 0, 2)).isInstanceOf(ProjectionDomainException.class)
            .hasMessageStartingWith("point 1: ").hasMessageNotContaining("point 0");
        double[] h = {51, 2, Double.NaN};
        assertThatThrownBy(() -> c.convert(h, 0, h, 0, 1)).isInstanceOf(InvalidCoordinateException.class)
            .hasMessageContaining("point 0: height NaN");
        ConversionChain site = ConversionChain.builder().from(CoordinateSystem.site(quay())).to(GEO).build();
        double[] n = {1000, 2000, 0, Double.NaN, 2000, 0};
        assertThatThrownBy(() -> site.convert(n, 0, n, 0, 2)).isInstanceOf(IllegalArgumentException.class)
            .hasMessageContaining("point 1");
    }
}
