package io.geotick.reference.fit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import io.geotick.transforms.fit.ControlPoint;
import io.geotick.transforms.fit.FitStatistics;
import io.geotick.transforms.fit.PointResidual;
import io.geotick.transforms.fit.SiteFit;
import io.geotick.transforms.fit.SiteFitException;
import io.geotick.transforms.fit.SiteFitter;
import io.geotick.transforms.fit.SiteModel;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.hipparchus.linear.CholeskyDecomposition;
import org.hipparchus.linear.LUDecomposition;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.RealVector;
import org.junit.jupiter.api.Test;

/**
 * Control-point fits checked against hand computations, textbook formulas and Hipparchus solving the
 * normal equations NΔ = Aᵀℓ directly (the reference; the library itself uses QR and never forms N).
 * All coordinates are an invented scenario.
 */
class SiteFitReferenceTest {

    @Test
    void twoPointSimilaritySolvedByHand() {
        // Source: hand computation (common practice: two points fix a similarity exactly).
        // A (0, 0) → (500, 300), B (3, 4) → (497.2, 309.6). With complex numbers, a + ib = ΔT/ΔS
        // = (−2.8 + 9.6i)/(3 + 4i) = (−2.8 + 9.6i)(3 − 4i)/25 = (30 + 40i)/25 = 1.2 + 1.6i,
        // so scale = √(1.2² + 1.6²) = 2, rotation = atan2(1.6, 1.2) = 53.130102354156°,
        // tx = 500 − (1.2·0 − 1.6·0) = 500, ty = 300 − (1.6·0 + 1.2·0) = 300.
        SiteFit f = SiteFitter.similarity(List.of(ControlPoint.of("A", 0, 0, 500, 300),
            ControlPoint.of("B", 3, 4, 497.2, 309.6)));
        SiteModel m = f.model();
        assertThat(m.parameter("a").value()).isCloseTo(1.2, within(1e-13)); // Source: hand computation above
        assertThat(m.parameter("b").value()).isCloseTo(1.6, within(1e-13)); // Source: hand computation above
        assertThat(m.parameter("scale").value()).isCloseTo(2.0, within(1e-13)); // Source: hand computation above
        assertThat(m.parameter("rotation").value())
            .isCloseTo(Math.toDegrees(Math.atan2(1.6, 1.2)), within(1e-11)); // Source: hand computation above
        assertThat(m.parameter("tx").value()).isCloseTo(500, within(1e-11)); // Source: hand computation above
        assertThat(m.parameter("ty").value()).isCloseTo(300, within(1e-11)); // Source: hand computation above
        // Source: redundancy r = 2n − u = 4 − 4 = 0 (Ghilani & Wolf, Adjustment Computations; from memory)
        assertThat(f.statistics().redundancy()).isZero();
        assertThat(f.statistics().sigma0()).isEmpty();
        assertThat(m.parameter("a").sigma()).isEmpty();
        // A third point computed by hand with the same parameters: C (10, 0) → (512, 316).
        assertThat(m.apply(10, 0).x()).isCloseTo(512, within(1e-11)); // Source: hand computation
        assertThat(m.apply(10, 0).y()).isCloseTo(316, within(1e-11)); // Source: hand computation
    }

    @Test
    void threePointAffineSolvedByHand() {
        // Source: hand computation. With the unit triangle (0,0), (1,0), (0,1) the affine parameters are
        // read off directly: T(0,0) = (tx, ty) = (10, 20); T(1,0) − T(0,0) = (a1, b1) = (2, 1);
        // T(0,1) − T(0,0) = (a2, b2) = (−0.5, 3).
        SiteModel m = SiteFitter.affine(List.of(ControlPoint.of("O", 0, 0, 10, 20),
            ControlPoint.of("X", 1, 0, 12, 21), ControlPoint.of("Y", 0, 1, 9.5, 23))).model();
        assertThat(m.parameter("a1").value()).isCloseTo(2, within(1e-14)); // Source: hand computation above
        assertThat(m.parameter("b1").value()).isCloseTo(1, within(1e-14)); // Source: hand computation above
        assertThat(m.parameter("a2").value()).isCloseTo(-0.5, within(1e-14)); // Source: hand computation above
        assertThat(m.parameter("b2").value()).isCloseTo(3, within(1e-14)); // Source: hand computation above
        assertThat(m.parameter("tx").value()).isCloseTo(10, within(1e-13)); // Source: hand computation above
        assertThat(m.parameter("ty").value()).isCloseTo(20, within(1e-13)); // Source: hand computation above
        assertThat(m.statistics().redundancy()).isZero(); // Source: r = 2·3 − 6 = 0 (common practice)
    }

    /** Invented control points: a site grid near (20 000, 30 000) m, 12 points over about 600 m. */
    private static List<ControlPoint> noisyPairs(boolean affine, double blunder) {
        Random r = new Random(2026);
        List<ControlPoint> pts = new ArrayList<>();
        for (int i = 0; i < 12; i++) {
            double x = 20_000 + 200.0 * (i % 4) + 30 * r.nextDouble();
            double y = 30_000 + 250.0 * (i / 4) + 30 * r.nextDouble();
            double tx = affine ? 1.0004 * x + 0.0021 * y - 1234.5 : 0.99991 * x - 0.01745 * y + 812.25;
            double ty = affine ? -0.0030 * x + 0.9987 * y + 555.0 : 0.01745 * x + 0.99991 * y - 977.75;
            pts.add(ControlPoint.of("C" + (i + 1), x, y, tx + 0.004 * r.nextGaussian() + (i == 6 ? blunder : 0),
                ty + 0.004 * r.nextGaussian()));
        }
        return pts;
    }

    /** Design matrix of the textbook (uncentred) form, rows x then y of each point. */
    private static RealMatrix design(List<ControlPoint> pts, boolean affine) {
        int u = affine ? 6 : 4;
        RealMatrix a = MatrixUtils.createRealMatrix(2 * pts.size(), u);
        for (int i = 0; i < pts.size(); i++) {
            double x = pts.get(i).source().x();
            double y = pts.get(i).source().y();
            if (affine) { // (a1, a2, b1, b2, tx, ty)
                a.setRow(2 * i, new double[] {x, y, 0, 0, 1, 0});
                a.setRow(2 * i + 1, new double[] {0, 0, x, y, 0, 1});
            } else { // (a, b, tx, ty)
                a.setRow(2 * i, new double[] {x, -y, 1, 0});
                a.setRow(2 * i + 1, new double[] {y, x, 0, 1});
            }
        }
        return a;
    }

    private static RealVector observations(List<ControlPoint> pts) {
        RealVector l = MatrixUtils.createRealVector(2 * pts.size());
        for (int i = 0; i < pts.size(); i++) {
            l.setEntry(2 * i, pts.get(i).target().x());
            l.setEntry(2 * i + 1, pts.get(i).target().y());
        }
        return l;
    }

    @Test
    void noisySimilarityMatchesNormalEquations() {
        List<ControlPoint> pts = noisyPairs(false, 0);
        SiteModel m = SiteFitter.similarity(pts).model();
        // Source: Hipparchus (reference library) solving the normal equations AᵀA·x = Aᵀℓ by Cholesky, with
        // σ₀² = vᵀv/(n − u) and Σ = σ₀²(AᵀA)⁻¹ (Ghilani & Wolf, Adjustment Computations; from memory).
        RealMatrix a = design(pts, false);
        RealVector l = observations(pts);
        RealMatrix n = a.transposeMultiply(a);
        CholeskyDecomposition ch = new CholeskyDecomposition(n, 1e-14, 1e-14);
        RealVector x = ch.getSolver().solve(a.transpose().operate(l));
        RealVector v = l.subtract(a.operate(x));
        double s02 = v.dotProduct(v) / (2 * pts.size() - 4);
        RealMatrix cov = ch.getSolver().getInverse().scalarMultiply(s02);
        String[] names = {"a", "b", "tx", "ty"};
        double[] tol = {1e-11, 1e-11, 1e-6, 1e-6};
        for (int i = 0; i < 4; i++) {
            // Source: Hipparchus normal-equation solution (reference library)
            assertThat(m.parameter(names[i]).value()).as(names[i]).isCloseTo(x.getEntry(i), within(tol[i]));
            // Source: σ = √(σ₀²·N⁻¹ᵢᵢ) from Hipparchus's Cholesky inverse (reference library)
            assertThat(m.parameter(names[i]).sigma().getAsDouble()).as("sigma " + names[i])
                .isCloseTo(Math.sqrt(cov.getEntry(i, i)), within(1e-6 * Math.sqrt(cov.getEntry(i, i))));
        }
        // Source: σ₀ = √(vᵀv/r) with r = 2n − 4 (Ghilani & Wolf; from memory)
        assertThat(m.statistics().sigma0().getAsDouble()).isCloseTo(Math.sqrt(s02), within(1e-9));
        assertThat(m.statistics().redundancy()).isEqualTo(20);
        for (int i = 0; i < pts.size(); i++) {
            PointResidual r = m.statistics().residuals().get(i);
            assertThat(r.dx()).isCloseTo(v.getEntry(2 * i), within(1e-7)); // Source: v = ℓ − A·x (reference)
            assertThat(r.dy()).isCloseTo(v.getEntry(2 * i + 1), within(1e-7)); // Source: same
        }
    }

    @Test
    void noisyAffineMatchesNormalEquations() {
        List<ControlPoint> pts = noisyPairs(true, 0);
        SiteModel m = SiteFitter.affine(pts).model();
        // Source: Hipparchus (reference library) LU solution of the normal equations and σ₀²(AᵀA)⁻¹.
        RealMatrix a = design(pts, true);
        RealVector l = observations(pts);
        LUDecomposition lu = new LUDecomposition(a.transposeMultiply(a));
        RealVector x = lu.getSolver().solve(a.transpose().operate(l));
        RealVector v = l.subtract(a.operate(x));
        double s02 = v.dotProduct(v) / (2 * pts.size() - 6);
        RealMatrix cov = lu.getSolver().getInverse().scalarMultiply(s02);
        String[] names = {"a1", "a2", "b1", "b2", "tx", "ty"};
        double[] tol = {1e-11, 1e-11, 1e-11, 1e-11, 1e-6, 1e-6};
        for (int i = 0; i < 6; i++) {
            // Source: Hipparchus normal-equation solution (reference library)
            assertThat(m.parameter(names[i]).value()).as(names[i]).isCloseTo(x.getEntry(i), within(tol[i]));
            // Source: σ = √(σ₀²·N⁻¹ᵢᵢ) (reference library)
            assertThat(m.parameter(names[i]).sigma().getAsDouble()).as("sigma " + names[i])
                .isCloseTo(Math.sqrt(cov.getEntry(i, i)), within(1e-6 * Math.sqrt(cov.getEntry(i, i))));
        }
        assertThat(m.statistics().sigma0().getAsDouble()).isCloseTo(Math.sqrt(s02), within(1e-9)); // Source: same
    }

    @Test
    void similarityUncertaintiesFollowTheTextbookFormula() {
        // Source: for centred coordinates the similarity's normal matrix is diagonal,
        // N = diag(Σ(x̃² + ỹ²), Σ(x̃² + ỹ²), n, n), so σ_a = σ_b = σ₀/√Σ(x̃² + ỹ²) and σ_c = σ₀/√n
        // (Ghilani & Wolf, Adjustment Computations, 2D conformal transformation; from memory).
        List<ControlPoint> pts = noisyPairs(false, 0);
        SiteModel m = SiteFitter.similarity(pts).model();
        double sx = m.sourceCentroid().x();
        double sy = m.sourceCentroid().y();
        double sum = 0;
        for (ControlPoint p : pts) {
            double dx = p.source().x() - sx;
            double dy = p.source().y() - sy;
            sum += dx * dx + dy * dy;
        }
        double s0 = m.statistics().sigma0().getAsDouble();
        assertThat(m.parameter("a").sigma().getAsDouble())
            .isCloseTo(s0 / Math.sqrt(sum), within(1e-9 * s0 / Math.sqrt(sum))); // Source: formula above
        assertThat(m.parameter("b").sigma().getAsDouble())
            .isCloseTo(s0 / Math.sqrt(sum), within(1e-9 * s0 / Math.sqrt(sum))); // Source: formula above
        assertThat(m.parameter("cx").sigma().getAsDouble())
            .isCloseTo(s0 / Math.sqrt(pts.size()), within(1e-9 * s0)); // Source: formula above
        assertThat(m.parameter("cy").sigma().getAsDouble())
            .isCloseTo(s0 / Math.sqrt(pts.size()), within(1e-9 * s0)); // Source: formula above
        // Source: σ_scale = σ_a for a scale near 1 and σ_θ = σ_a/scale in radians (first-order propagation
        // of scale = √(a² + b²), θ = atan2(b, a); common practice)
        double sc = m.parameter("scale").value();
        assertThat(m.parameter("scale").sigma().getAsDouble()).isCloseTo(s0 / Math.sqrt(sum), within(1e-6 * s0));
        assertThat(Math.toRadians(m.parameter("rotation").sigma().getAsDouble()))
            .isCloseTo(s0 / Math.sqrt(sum) / sc, within(1e-9 * s0 / Math.sqrt(sum)));
    }

    @Test
    void plantedBlunderIsFlaggedWithTheStandardisedResidual() {
        List<ControlPoint> pts = noisyPairs(false, 0.12); // 12 cm blunder in x of C7, noise 4 mm
        SiteFit f = SiteFitter.similarity(pts);
        FitStatistics s = f.statistics();
        // Source: standardised residual wᵢ = vᵢ/(σ₀√(1 − hᵢᵢ)), hᵢᵢ = aᵢ(AᵀA)⁻¹aᵢᵀ, flagged beyond 3
        // (Pope's τ test with a fixed threshold; Ghilani & Wolf, Adjustment Computations; from memory),
        // recomputed here from Hipparchus's normal-equation inverse (reference library).
        RealMatrix a = design(pts, false);
        RealVector l = observations(pts);
        LUDecomposition lu = new LUDecomposition(a.transposeMultiply(a));
        RealMatrix q = lu.getSolver().getInverse();
        RealVector v = l.subtract(a.operate(lu.getSolver().solve(a.transpose().operate(l))));
        double s0 = Math.sqrt(v.dotProduct(v) / (2 * pts.size() - 4));
        for (int i = 0; i < pts.size(); i++) {
            double w = 0;
            for (int k = 0; k < 2; k++) {
                RealVector row = a.getRowVector(2 * i + k);
                double h = row.dotProduct(q.operate(row));
                w = Math.max(w, Math.abs(v.getEntry(2 * i + k)) / (s0 * Math.sqrt(1 - h)));
            }
            // Source: the formula above (reference computation)
            assertThat(s.residuals().get(i).standardised().getAsDouble()).isCloseTo(w, within(1e-6));
            assertThat(s.residuals().get(i).outlier()).isEqualTo(w > 3);
        }
        assertThat(s.outliers()).extracting(PointResidual::id).containsExactly("C7");
        SiteFit g = f.refitWithoutOutliers();
        assertThat(g.statistics().outliers()).extracting(PointResidual::id).containsExactly("C7");
        assertThat(g.statistics().residuals().get(6).used()).isFalse();
        // Source: the blunder reappears whole in the prediction residual once the point is left out
        // (common practice); noise 4 mm.
        assertThat(g.statistics().residuals().get(6).dx()).isCloseTo(0.12, within(0.02));
        assertThat(g.statistics().sigma0().getAsDouble()).isLessThan(0.008);
    }

    @Test
    void degenerateGeometryGivesClearErrors() {
        // Source: an affine needs three non-collinear points and a Helmert non-collinear points, else the
        // normal matrix is singular (common practice).
        assertThatThrownBy(() -> SiteFitter.affine(List.of(ControlPoint.of("A", 0, 0, 0, 0),
            ControlPoint.of("B", 10, 10, 10, 10), ControlPoint.of("C", 20, 20, 20, 20.01))))
            .isInstanceOf(SiteFitException.class).hasMessageContaining("collinear");
        assertThatThrownBy(() -> SiteFitter.helmert(List.of(ControlPoint.of("A", 0, 0, 0, 0, 0, 0),
            ControlPoint.of("B", 1, 1, 1, 1, 1, 1), ControlPoint.of("C", 5, 5, 5, 5, 5, 5.01))))
            .isInstanceOf(SiteFitException.class).hasMessageContaining("collinear");
        // Source: minimum point counts 2 / 3 / 3 (common practice)
        assertThatThrownBy(() -> SiteFitter.helmert(List.of(ControlPoint.of("A", 0, 0, 0, 0, 0, 0),
            ControlPoint.of("B", 1, 0, 0, 1, 0, 0)))).isInstanceOf(SiteFitException.class)
            .hasMessageContaining("at least 3 control points; 2 given");
    }

    // ---- 3D Helmert against an independent Gauss–Newton on the normal equations ----

    /** Independent rigorous model: t̃ = c + (1 + s)·R₃(γ)R₂(β)R₁(α)·p̃ (coordinate-frame angles). */
    private static double[] helmert(double[] x, double[] p) {
        RealMatrix r1 = MatrixUtils.createRealMatrix(new double[][] {{1, 0, 0}, {0, Math.cos(x[3]), Math.sin(x[3])},
            {0, -Math.sin(x[3]), Math.cos(x[3])}});
        RealMatrix r2 = MatrixUtils.createRealMatrix(new double[][] {{Math.cos(x[4]), 0, -Math.sin(x[4])},
            {0, 1, 0}, {Math.sin(x[4]), 0, Math.cos(x[4])}});
        RealMatrix r3 = MatrixUtils.createRealMatrix(new double[][] {{Math.cos(x[5]), Math.sin(x[5]), 0},
            {-Math.sin(x[5]), Math.cos(x[5]), 0}, {0, 0, 1}});
        double[] q = r3.multiply(r2).multiply(r1).scalarMultiply(1 + x[6]).operate(p);
        return new double[] {q[0] + x[0], q[1] + x[1], q[2] + x[2]};
    }

    @Test
    void noisyHelmertMatchesGaussNewtonOnTheNormalEquations() {
        // Invented: a local 3D site frame rotated 40° about z, with 2 mm noise, 8 points.
        Random rnd = new Random(99);
        double[] truth = {0, 0, 0, Math.toRadians(0.5), Math.toRadians(-0.3), Math.toRadians(40), 35e-6};
        double[][] src = new double[8][];
        List<ControlPoint> pts = new ArrayList<>();
        for (int i = 0; i < 8; i++) {
            src[i] = new double[] {4_100_000 + 400 * rnd.nextDouble(), 500_000 + 400 * rnd.nextDouble(),
                4_850_000 + 400 * rnd.nextDouble()};
            double[] t = helmert(truth, new double[] {src[i][0] - 4_100_000, src[i][1] - 500_000,
                src[i][2] - 4_850_000});
            pts.add(ControlPoint.of("G" + i, src[i][0], src[i][1], src[i][2], 1000 + t[0] + 0.002 * rnd.nextGaussian(),
                2000 + t[1] + 0.002 * rnd.nextGaussian(), 100 + t[2] + 0.002 * rnd.nextGaussian()));
        }
        SiteModel m = SiteFitter.helmert(pts).model();

        // Reference: centre both sides, then Gauss–Newton, each step solving the normal equations
        // (AᵀA)Δ = Aᵀv with Hipparchus's LU; A by central differences of the model above.
        // Source: Ghilani & Wolf, Adjustment Computations, nonlinear 3D conformal transformation
        // (from memory); Hipparchus as reference library.
        double[] sc = new double[3];
        double[] tc = new double[3];
        for (ControlPoint p : pts) {
            sc[0] += p.source().x() / 8;
            sc[1] += p.source().y() / 8;
            sc[2] += p.source().z() / 8;
            tc[0] += p.target().x() / 8;
            tc[1] += p.target().y() / 8;
            tc[2] += p.target().z() / 8;
        }
        double[][] pc = new double[8][3];
        double[] l = new double[24];
        for (int i = 0; i < 8; i++) {
            ControlPoint p = pts.get(i);
            pc[i] = new double[] {p.source().x() - sc[0], p.source().y() - sc[1], p.source().z() - sc[2]};
            l[3 * i] = p.target().x() - tc[0];
            l[3 * i + 1] = p.target().y() - tc[1];
            l[3 * i + 2] = p.target().z() - tc[2];
        }
        double[] x = {0, 0, 0, 0, 0, Math.toRadians(39), 0}; // rough start
        RealMatrix a = null;
        RealVector v = null;
        for (int it = 0; it < 20; it++) {
            a = MatrixUtils.createRealMatrix(24, 7);
            v = MatrixUtils.createRealVector(24);
            for (int i = 0; i < 8; i++) {
                double[] f = helmert(x, pc[i]);
                for (int k = 0; k < 3; k++) {
                    v.setEntry(3 * i + k, l[3 * i + k] - f[k]);
                }
                for (int j = 0; j < 7; j++) {
                    double h = j < 3 ? 1e-3 : 1e-7;
                    double[] xp = x.clone();
                    double[] xm = x.clone();
                    xp[j] += h;
                    xm[j] -= h;
                    double[] fp = helmert(xp, pc[i]);
                    double[] fm = helmert(xm, pc[i]);
                    for (int k = 0; k < 3; k++) {
                        a.setEntry(3 * i + k, j, (fp[k] - fm[k]) / (2 * h));
                    }
                }
            }
            RealVector dx = new LUDecomposition(a.transposeMultiply(a)).getSolver().solve(a.transpose().operate(v));
            for (int j = 0; j < 7; j++) {
                x[j] += dx.getEntry(j);
            }
        }
        double s02 = v.dotProduct(v) / (24 - 7);
        RealMatrix cov = new LUDecomposition(a.transposeMultiply(a)).getSolver().getInverse().scalarMultiply(s02);
        double arcsec = 648000 / Math.PI;
        // Position-vector convention reports the coordinate-frame angles negated (IOGP GN 7-2 §4.3.3).
        String[] names = {"cx", "cy", "cz", "rx", "ry", "rz", "ds"};
        double[] scale = {1, 1, 1, -arcsec, -arcsec, -arcsec, 1e6};
        double[] tol = {1e-7, 1e-7, 1e-7, 1e-6, 1e-6, 1e-6, 1e-5};
        for (int j = 0; j < 7; j++) {
            // Source: Gauss–Newton on the normal equations with Hipparchus LU (reference computation above)
            assertThat(m.parameter(names[j]).value()).as(names[j]).isCloseTo(scale[j] * x[j], within(tol[j]));
            double ref = Math.abs(scale[j]) * Math.sqrt(cov.getEntry(j, j));
            // Source: σ = √(σ₀²(AᵀA)⁻¹ⱼⱼ) (Ghilani & Wolf; from memory)
            assertThat(m.parameter(names[j]).sigma().getAsDouble()).as("sigma " + names[j])
                .isCloseTo(ref, within(1e-4 * ref));
        }
        // Source: σ₀² = vᵀv/(3n − 7) (Ghilani & Wolf; from memory)
        assertThat(m.statistics().sigma0().getAsDouble()).isCloseTo(Math.sqrt(s02), within(1e-9));
        assertThat(m.statistics().redundancy()).isEqualTo(17);
    }

    @Test
    void jsonFileHasTheDocumentedLayoutAndRoundTrips() throws Exception {
        SiteModel m = SiteFitter.similarity(noisyPairs(false, 0)).model()
            .withSystems("EPSG:32631", "Invented site grid");
        // Source: plain Jackson (reference library) reading the file as a tree.
        JsonNode n = new ObjectMapper().readTree(m.toJson());
        assertThat(n.get("format").asText()).isEqualTo("geotick-site-model");
        assertThat(n.get("format_version").asInt()).isEqualTo(1);
        assertThat(n.get("kind").asText()).isEqualTo("similarity-2d");
        assertThat(n.get("source_system").asText()).isEqualTo("EPSG:32631");
        assertThat(n.get("parameters").get(0).get("value").doubleValue()).isEqualTo(m.parameter("a").value());
        assertThat(n.get("parameters").get(0).get("sigma").doubleValue())
            .isEqualTo(m.parameter("a").sigma().getAsDouble());
        assertThat(n.get("centroid").get("source").get(0).doubleValue()).isEqualTo(m.sourceCentroid().x());
        assertThat(n.get("statistics").get("redundancy").asInt()).isEqualTo(20);
        assertThat(n.get("residuals")).hasSize(12);
        // Source: round trip (common practice)
        SiteModel back = SiteModel.fromJson(m.toJson());
        assertThat(back).isEqualTo(m);
        assertThat(back.apply(20_300, 30_400).x()).isEqualTo(m.apply(20_300, 30_400).x());
    }
}
