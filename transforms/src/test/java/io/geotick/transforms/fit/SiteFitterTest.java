package io.geotick.transforms.fit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import io.geotick.transforms.helmert.RotationConvention;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.Set;
import org.junit.jupiter.api.Test;

class SiteFitterTest {

    /** Invented site: source grid coordinates near (512000, 5430000) m, site grid near (1000, 2000). */
    static List<ControlPoint> similarityPoints(double a, double b, double tx, double ty, double noise, long seed) {
        Random r = new Random(seed);
        List<ControlPoint> pts = new ArrayList<>();
        double[][] s = {{512_010.0, 5_430_020.0}, {512_480.5, 5_430_110.2}, {512_300.3, 5_430_620.8},
            {511_790.1, 5_430_400.4}, {512_150.7, 5_429_810.9}, {512_620.0, 5_429_900.0}};
        for (int i = 0; i < s.length; i++) {
            double x = s[i][0];
            double y = s[i][1];
            pts.add(ControlPoint.of("P" + (i + 1), x, y, a * x - b * y + tx + noise * r.nextGaussian(),
                b * x + a * y + ty + noise * r.nextGaussian()));
        }
        return pts;
    }

    @Test
    void exactSimilarityIsRecovered() {
        double th = Math.toRadians(12.5);
        double sc = 1.000_123;
        double a = sc * Math.cos(th);
        double b = sc * Math.sin(th);
        SiteFit f = SiteFitter.similarity(similarityPoints(a, b, -1_500_000.0, 300_000.0, 0, 1));
        SiteModel m = f.model();
        // Source: points generated from known parameters (common practice)
        assertThat(m.parameter("a").value()).isCloseTo(a, within(1e-12));
        assertThat(m.parameter("b").value()).isCloseTo(b, within(1e-12));
        assertThat(m.parameter("scale").value()).isCloseTo(sc, within(1e-12));
        assertThat(m.parameter("rotation").value()).isCloseTo(12.5, within(1e-9));
        assertThat(m.parameter("tx").value()).isCloseTo(-1_500_000.0, within(1e-5));
        assertThat(m.parameter("ty").value()).isCloseTo(300_000.0, within(1e-5));
        assertThat(f.statistics().redundancy()).isEqualTo(12 - 4);
        assertThat(f.statistics().rms()).isLessThan(1e-8);
        assertThat(f.statistics().outliers()).isEmpty();
        SitePoint p = m.apply(512_200.0, 5_430_300.0);
        assertThat(p.x()).isCloseTo(a * 512_200.0 - b * 5_430_300.0 - 1_500_000.0, within(1e-8));
        assertThat(p.y()).isCloseTo(b * 512_200.0 + a * 5_430_300.0 + 300_000.0, within(1e-8));
    }

    @Test
    void twoPointSimilarityHasNoRedundancyAndNoUncertainties() {
        SiteFit f = SiteFitter.similarity(List.of(ControlPoint.of("A", 0, 0, 500, 300),
            ControlPoint.of("B", 3, 4, 497.2, 309.6)));
        FitStatistics s = f.statistics();
        assertThat(s.redundancy()).isZero();
        assertThat(s.sigma0()).isEmpty();
        assertThat(f.model().covariance()).isEmpty();
        assertThat(f.model().parameters()).allSatisfy(p -> assertThat(p.sigma()).isEmpty());
        assertThat(f.model().derivedParameters()).allSatisfy(p -> assertThat(p.sigma()).isEmpty());
        assertThat(s.residuals()).allSatisfy(r -> {
            assertThat(r.standardised()).isEmpty();
            assertThat(r.outlier()).isFalse();
        });
    }

    @Test
    void exactAffineAndHelmertAreRecovered() {
        List<ControlPoint> pts = new ArrayList<>();
        double[][] s = {{100, 200}, {400, 250}, {300, 700}, {50, 500}};
        for (int i = 0; i < s.length; i++) {
            double x = s[i][0];
            double y = s[i][1];
            pts.add(ControlPoint.of("Q" + i, x, y, 1.01 * x + 0.02 * y + 10, -0.03 * x + 0.99 * y - 20));
        }
        SiteModel m = SiteFitter.affine(pts).model();
        assertThat(m.parameter("a1").value()).isCloseTo(1.01, within(1e-13));
        assertThat(m.parameter("a2").value()).isCloseTo(0.02, within(1e-13));
        assertThat(m.parameter("b1").value()).isCloseTo(-0.03, within(1e-13));
        assertThat(m.parameter("b2").value()).isCloseTo(0.99, within(1e-13));
        assertThat(m.parameter("tx").value()).isCloseTo(10, within(1e-10));
        assertThat(m.parameter("ty").value()).isCloseTo(-20, within(1e-10));
    }

    @Test
    void helmertWithLargeRotationMatchesToHelmertAndInverts() {
        // A site frame rotated 30° about z, 2° about x, -1° about y, scaled by 25 ppm.
        List<ControlPoint> pts = helmertPoints(7200, 3600, -108000, 25, 0);
        SiteFit f = SiteFitter.helmert(pts);
        SiteModel m = f.model();
        assertThat(m.parameter("rx").value()).isCloseTo(7200, within(1e-7));
        assertThat(m.parameter("ry").value()).isCloseTo(3600, within(1e-7));
        assertThat(m.parameter("rz").value()).isCloseTo(-108000, within(1e-7));
        assertThat(m.parameter("ds").value()).isCloseTo(25, within(1e-6));
        assertThat(m.parameter("tx").value()).isCloseTo(-4_000_000.0, within(1e-5));
        double[] in = {4_027_894.0, 307_046.0, 4_919_474.0};
        SitePoint p = m.apply(in[0], in[1], in[2]);
        var q = m.toHelmert().apply(new io.geotick.geodesy.position.EcefPosition(in[0], in[1], in[2]));
        assertThat(p.x()).isCloseTo(q.x(), within(1e-6));
        assertThat(p.y()).isCloseTo(q.y(), within(1e-6));
        assertThat(p.z()).isCloseTo(q.z(), within(1e-6));
        SitePoint back = m.inverse().apply(p.x(), p.y(), p.z());
        assertThat(back.x()).isCloseTo(in[0], within(1e-8));
        assertThat(back.y()).isCloseTo(in[1], within(1e-8));
        assertThat(back.z()).isCloseTo(in[2], within(1e-8));
        assertThat(m.inverse().inverse()).isSameAs(m);
        // The same fit reported in the other convention: rotations negated, same transform.
        SiteModel cf = SiteFitter.fit(SiteModelKind.HELMERT_3D, pts,
            FitOptions.defaults().withConvention(RotationConvention.COORDINATE_FRAME)).model();
        assertThat(cf.parameter("rz").value()).isCloseTo(108000, within(1e-7));
        assertThat(cf.apply(in[0], in[1], in[2]).x()).isCloseTo(p.x(), within(1e-8));
    }

    /** Points around an invented station, transformed by the project's rigorous Helmert. */
    static List<ControlPoint> helmertPoints(double rx, double ry, double rz, double ds, double noise) {
        var h = io.geotick.transforms.helmert.Helmert.of(
            io.geotick.transforms.helmert.HelmertParameters.of(-4_000_000.0, 100.0, -5_000_000.0, rx, ry, rz, ds),
            RotationConvention.POSITION_VECTOR, io.geotick.transforms.helmert.RotationForm.RIGOROUS);
        Random r = new Random(7);
        List<ControlPoint> pts = new ArrayList<>();
        double[][] d = {{0, 0, 0}, {300, 20, -40}, {-150, 410, 90}, {220, -330, 150}, {-260, -120, -200},
            {50, 260, 310}, {-30, -400, 60}};
        for (int i = 0; i < d.length; i++) {
            double x = 4_027_894.0 + d[i][0];
            double y = 307_046.0 + d[i][1];
            double z = 4_919_474.0 + d[i][2];
            var t = h.apply(new io.geotick.geodesy.position.EcefPosition(x, y, z));
            pts.add(ControlPoint.of("H" + i, x, y, z, t.x() + noise * r.nextGaussian(),
                t.y() + noise * r.nextGaussian(), t.z() + noise * r.nextGaussian()));
        }
        return pts;
    }

    @Test
    void arrayVariantMatchesSinglePointsAndWorksInPlace() {
        SiteModel m = SiteFitter.similarity(similarityPoints(0.9, 0.1, 10, 20, 0.01, 3)).model();
        double[] buf = {512_000, 5_430_000, 12.5, 512_500, 5_430_500, -3};
        double[] out = new double[6];
        m.apply(buf, 0, out, 0, 2);
        m.apply(buf, 0, buf, 0, 2);
        assertThat(buf).containsExactly(out);
        SitePoint p = m.apply(512_500, 5_430_500, -3);
        assertThat(out[3]).isEqualTo(p.x());
        assertThat(out[4]).isEqualTo(p.y());
        assertThat(out[5]).isEqualTo(-3.0);
        double[] bad = {1, 2, 3, 4, Double.NaN, 6};
        assertThatThrownBy(() -> m.apply(bad, 0, new double[6], 0, 2))
            .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("point 1");
        SitePoint back = m.inverse().apply(p.x(), p.y());
        assertThat(back.x()).isCloseTo(512_500, within(1e-8));
        assertThat(back.y()).isCloseTo(5_430_500, within(1e-8));
    }

    @Test
    void helmertNeedsZ() {
        SiteModel m = SiteFitter.helmert(helmertPoints(1, 2, 3, 4, 0.001)).model();
        assertThatThrownBy(() -> m.apply(1.0, 2.0)).isInstanceOf(IllegalArgumentException.class)
            .hasMessageContaining("give z");
        assertThatThrownBy(() -> SiteFitter.affine(List.of()).model()).isInstanceOf(SiteFitException.class);
    }

    @Test
    void badInputIsNamed() {
        assertThatThrownBy(() -> SiteFitter.similarity(List.of(ControlPoint.of("A", 0, 0, 1, 1))))
            .isInstanceOf(SiteFitException.class).hasMessageContaining("at least 2").hasMessageContaining("1 given");
        assertThatThrownBy(() -> SiteFitter.affine(List.of(ControlPoint.of("A", 0, 0, 1, 1),
            ControlPoint.of("B", 1, 0, 2, 1)))).hasMessageContaining("at least 3").hasMessageContaining("2 given");
        assertThatThrownBy(() -> SiteFitter.helmert(List.of(ControlPoint.of("A", 0, 0, 0, 1, 1, 1),
            ControlPoint.of("B", 1, 0, 0, 2, 1, 1)))).hasMessageContaining("at least 3");
        assertThatThrownBy(() -> SiteFitter.similarity(List.of(ControlPoint.of("A", 0, 0, 1, 1),
            ControlPoint.of("A", 1, 0, 2, 1)))).hasMessageContaining("'A' is given twice");
        assertThatThrownBy(() -> ControlPoint.of("Z", Double.NaN, 0, 1, 1))
            .isInstanceOf(SiteFitException.class).hasMessageContaining("'Z'").hasMessageContaining("NaN");
        assertThatThrownBy(() -> ControlPoint.of(" ", 0, 0, 1, 1)).hasMessageContaining("blank");
        List<ControlPoint> pts = similarityPoints(1, 0, 0, 0, 0.01, 1);
        assertThatThrownBy(() -> SiteFitter.fit(SiteModelKind.SIMILARITY_2D, pts,
            FitOptions.defaults().excluding(Set.of("P9")))).hasMessageContaining("'P9'");
        assertThatThrownBy(() -> SiteFitter.fit(SiteModelKind.SIMILARITY_2D, pts,
            FitOptions.defaults().excluding(Set.of("P1", "P2", "P3", "P4", "P5"))))
            .hasMessageContaining("1 given (5 excluded)");
        assertThatThrownBy(() -> FitOptions.defaults().withOutlierThreshold(0)).hasMessageContaining("threshold");
        assertThatThrownBy(() -> SiteModelKind.parse("projective")).hasMessageContaining("'projective'");
    }

    @Test
    void degenerateGeometryIsRejected() {
        List<ControlPoint> collinear = List.of(ControlPoint.of("A", 0, 0, 10, 10), ControlPoint.of("B", 1, 1, 11, 11),
            ControlPoint.of("C", 2, 2, 12, 12), ControlPoint.of("D", 5, 5, 15, 15.1));
        assertThatThrownBy(() -> SiteFitter.affine(collinear)).isInstanceOf(SiteFitException.class)
            .hasMessageContaining("collinear");
        // The similarity is determined by collinear points.
        assertThat(SiteFitter.similarity(collinear).model().parameter("scale").value()).isCloseTo(1, within(0.02));
        List<ControlPoint> same = List.of(ControlPoint.of("A", 5, 5, 10, 10), ControlPoint.of("B", 5, 5, 11, 11));
        assertThatThrownBy(() -> SiteFitter.similarity(same)).isInstanceOf(SiteFitException.class)
            .hasMessageContaining("coincide");
        List<ControlPoint> line3 = List.of(ControlPoint.of("A", 1e6, 2e6, 3e6, 1, 2, 3),
            ControlPoint.of("B", 1e6 + 10, 2e6 + 20, 3e6 + 30, 11, 22, 33),
            ControlPoint.of("C", 1e6 + 30, 2e6 + 60, 3e6 + 90, 31, 62, 93),
            ControlPoint.of("D", 1e6 + 50, 2e6 + 100, 3e6 + 150, 51, 102, 153));
        assertThatThrownBy(() -> SiteFitter.helmert(line3)).isInstanceOf(SiteFitException.class)
            .hasMessageContaining("collinear");
        List<ControlPoint> flatTarget = List.of(ControlPoint.of("A", 0, 0, 1, 1), ControlPoint.of("B", 10, 0, 2, 2),
            ControlPoint.of("C", 0, 10, 3, 3), ControlPoint.of("D", 10, 10, 4, 4));
        assertThatThrownBy(() -> SiteFitter.affine(flatTarget)).isInstanceOf(SiteFitException.class)
            .hasMessageContaining("singular");
    }

    @Test
    void plantedBlunderIsFlaggedAndRefitRemovesIt() {
        // Twelve points (redundancy 20): the internally studentised residual cannot exceed √r, so a
        // threshold of 3 needs r > 9 to flag anything (Pope's τ bound; common practice).
        Random rnd = new Random(11);
        List<ControlPoint> pts = new ArrayList<>();
        for (int i = 0; i < 12; i++) {
            double x = 512_000 + 150.0 * (i % 4) + 10 * rnd.nextDouble();
            double y = 5_430_000 + 200.0 * (i / 4) + 10 * rnd.nextDouble();
            pts.add(ControlPoint.of("P" + (i + 1), x, y, 0.8 * x - 0.6 * y + 100 + 0.005 * rnd.nextGaussian(),
                0.6 * x + 0.8 * y + 200 + 0.005 * rnd.nextGaussian()));
        }
        ControlPoint p3 = pts.get(2);
        pts.set(2, new ControlPoint(p3.id(), p3.source(), SitePoint.of(p3.target().x() + 0.25, p3.target().y(), 0)));
        SiteFit f = SiteFitter.similarity(pts);
        assertThat(f.statistics().outliers()).extracting(PointResidual::id).containsExactly("P3");
        SiteFit g = f.refitWithoutOutliers();
        assertThat(g.options().excludedIds()).containsExactly("P3");
        assertThat(g.statistics().pointsUsed()).isEqualTo(11);
        assertThat(g.statistics().sigma0().getAsDouble()).isLessThan(0.02);
        PointResidual r3 = g.statistics().residuals().get(2);
        assertThat(r3.used()).isFalse();
        assertThat(r3.dx()).isCloseTo(0.25, within(0.03));
        assertThat(r3.outlier()).isTrue();
        assertThat(g.refitWithoutOutliers()).isSameAs(g);
    }
}
