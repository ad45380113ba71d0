package io.geotick.transforms.fit;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import org.hipparchus.analysis.differentiation.Gradient;
import org.hipparchus.exception.MathIllegalArgumentException;
import org.hipparchus.exception.MathIllegalStateException;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.DecompositionSolver;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.QRDecomposition;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.RealVector;
import org.hipparchus.linear.SingularValueDecomposition;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresBuilder;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresOptimizer;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresProblem;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LevenbergMarquardtOptimizer;
import org.hipparchus.util.Pair;

/**
 * Least-squares fit of a {@link SiteModel} to control points. Stateless; all methods are thread-safe.
 *
 * <h2>Method</h2>
 * Unit-weight least squares on the site-grid coordinates (observations), with the source coordinates
 * taken as error-free (Ghilani &amp; Wolf, Adjustment Computations, the usual treatment of coordinate
 * transformations):
 * <ol>
 *   <li>Both sides are centred on the centroids s̄, t̄ of the points used, for numerical conditioning
 *       (common practice): the products then act on differences of a few hundred metres instead of
 *       Earth-sized coordinates, and the translation decouples from the rest.</li>
 *   <li>Geometry is checked first: the centred source points must not coincide (all models), and for
 *       the affine and the Helmert must not be collinear: the ratio of the second to the first singular
 *       value of the centred coordinates (Hipparchus SVD) must exceed 1e-9.</li>
 *   <li>The 2D models are linear: x̂ from Hipparchus's QR decomposition of the design matrix A (no normal
 *       equations are formed). The Helmert is nonlinear in its rotations: starting values from the closed
 *       form of the best rotation and scale (SVD of the cross-covariance of the centred points, with the
 *       reflection excluded; Umeyama 1991, from memory), refined by Hipparchus's Levenberg–Marquardt
 *       optimiser on the rigorous model, with the Jacobian from automatic differentiation.</li>
 *   <li>Cofactors Q = (AᵀA)⁻¹ = A⁺A⁺ᵀ (A⁺ the QR pseudo-inverse, A the Jacobian at the solution);
 *       σ₀² = vᵀv/(n − u) with n observations and u parameters; covariance σ₀²Q. With no redundancy the
 *       uncertainties are empty.</li>
 *   <li>Outliers: each residual is standardised, wᵢ = vᵢ/(σ₀√qᵥᵥ) with qᵥᵥ = 1 − aᵢQaᵢᵀ (for a point left
 *       out, the prediction cofactor 1 + aᵢQaᵢᵀ), and a point is flagged when its largest |wᵢ| exceeds the
 *       threshold (default 3). This is the internally studentised residual test with a fixed critical
 *       value (Pope's τ test in its simple form; common practice). A single blunder spreads into the other
 *       residuals, so refit without the flagged points ({@link SiteFit#refitWithoutOutliers()}) and look
 *       again. Because σ₀ comes from the same residuals, a used point's |wᵢ| can never exceed √r: with a
 *       redundancy of 9 or less a threshold of 3 flags nothing, and only a left-out point's prediction
 *       residual can show a blunder. σ₀ below the rounding level 1e-14·max|coordinate| is raised to it for the test, so exact data
 *       flag nothing.</li>
 * </ol>
 * Redundancy r = d·n − u: 2n − 4, 2n − 6, 3n − 7. Minimum points: 2, 3, 3.
 */
public final class SiteFitter {
    private static final double COLLINEAR_RATIO = 1e-9;

    private SiteFitter() {
    }

    /** A 2D similarity fit with default options. */
    public static SiteFit similarity(List<ControlPoint> points) {
        return fit(SiteModelKind.SIMILARITY_2D, points, FitOptions.defaults());
    }

    /** A 2D affine fit with default options. */
    public static SiteFit affine(List<ControlPoint> points) {
        return fit(SiteModelKind.AFFINE_2D, points, FitOptions.defaults());
    }

    /** A 3D Helmert fit with default options (rotations reported in the position-vector convention). */
    public static SiteFit helmert(List<ControlPoint> points) {
        return fit(SiteModelKind.HELMERT_3D, points, FitOptions.defaults());
    }

    /** A fit with default options. */
    public static SiteFit fit(SiteModelKind kind, List<ControlPoint> points) {
        return fit(kind, points, FitOptions.defaults());
    }

    /**
     * Fits a model of the given kind.
     *
     * @throws SiteFitException for too few points (naming the count needed and given), duplicate ids, an
     *     excluded id that is not among the points, degenerate geometry, or no convergence
     */
    public static SiteFit fit(SiteModelKind kind, List<ControlPoint> points, FitOptions options) {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(options, "options");
        List<ControlPoint> all = List.copyOf(points);
        Set<String> ids = new HashSet<>();
        for (ControlPoint p : all) {
            if (!ids.add(p.id())) {
                throw new SiteFitException("control point id '" + p.id() + "' is given twice");
            }
        }
        for (String x : options.excludedIds()) {
            if (!ids.contains(x)) {
                throw new SiteFitException("excluded control point '" + x + "' is not among the points");
            }
        }
        int d = kind.dimension();
        int u = kind.parameterCount();
        int nAll = all.size();
        boolean[] used = new boolean[nAll];
        int n = 0;
        for (int i = 0; i < nAll; i++) {
            used[i] = !options.excludedIds().contains(all.get(i).id());
            n += used[i] ? 1 : 0;
        }
        if (n < kind.minimumPoints()) {
            throw new SiteFitException("a " + kind.id() + " fit needs at least " + kind.minimumPoints()
                + " control points; " + n + " given" + (n < nAll ? " (" + (nAll - n) + " excluded)" : ""));
        }

        // Centroids of the points used, and centred coordinates of every point.
        double[] sc = new double[d];
        double[] tc = new double[d];
        double maxAbs = 0;
        for (int i = 0; i < nAll; i++) {
            if (used[i]) {
                double[] s = coords(all.get(i).source(), d);
                double[] t = coords(all.get(i).target(), d);
                for (int k = 0; k < d; k++) {
                    sc[k] += s[k] / n;
                    tc[k] += t[k] / n;
                    maxAbs = Math.max(maxAbs, Math.max(Math.abs(s[k]), Math.abs(t[k])));
                }
            }
        }
        double[][] p = new double[nAll][d];
        double[][] q = new double[nAll][d];
        for (int i = 0; i < nAll; i++) {
            double[] s = coords(all.get(i).source(), d);
            double[] t = coords(all.get(i).target(), d);
            for (int k = 0; k < d; k++) {
                p[i][k] = s[k] - sc[k];
                q[i][k] = t[k] - tc[k];
            }
        }
        checkGeometry(kind, p, used, n, maxAbs);

        double[] x = kind == SiteModelKind.HELMERT_3D ? solveHelmert(p, q, used, n) : solveLinear(kind, p, q, used, n);

        // Jacobian at the solution, residuals, cofactors.
        Gradient[] xv = Models.variables(x);
        Gradient[][] l = Models.matrix(kind, xv);
        Gradient[] c = Models.translation(kind, xv);
        double[][] rows = new double[nAll * d][];
        double[] v = new double[nAll * d];
        for (int i = 0; i < nAll; i++) {
            Gradient[] f = Models.predict(l, c, p[i]);
            for (int k = 0; k < d; k++) {
                rows[i * d + k] = f[k].getGradient();
                v[i * d + k] = q[i][k] - f[k].getValue();
            }
        }
        RealMatrix a = new Array2DRowRealMatrix(n * d, u);
        double vtv = 0;
        double sumSq = 0;
        int r0 = 0;
        for (int i = 0; i < nAll; i++) {
            if (used[i]) {
                double len2 = 0;
                for (int k = 0; k < d; k++) {
                    a.setRow(r0++, rows[i * d + k]);
                    vtv += v[i * d + k] * v[i * d + k];
                    len2 += v[i * d + k] * v[i * d + k];
                }
                sumSq += len2;
            }
        }
        RealMatrix qxx;
        try {
            DecompositionSolver solver = new QRDecomposition(a, 1e-300).getSolver();
            if (!solver.isNonSingular()) {
                throw degenerate(kind, "the normal equations are singular");
            }
            RealMatrix pinv = solver.getInverse();
            qxx = pinv.multiplyTransposed(pinv);
        } catch (MathIllegalArgumentException e) {
            throw degenerate(kind, "the normal equations are singular");
        }
        int redundancy = n * d - u;
        OptionalDouble sigma0 = redundancy > 0 ? OptionalDouble.of(Math.sqrt(vtv / redundancy))
            : OptionalDouble.empty();
        double floor = 1e-14 * Math.max(maxAbs, 1);

        List<PointResidual> res = new ArrayList<>();
        for (int i = 0; i < nAll; i++) {
            OptionalDouble w = OptionalDouble.empty();
            if (sigma0.isPresent()) {
                double s0 = Math.max(sigma0.getAsDouble(), floor);
                double worst = -1;
                boolean known = true;
                for (int k = 0; k < d; k++) {
                    RealVector row = new ArrayRealVector(rows[i * d + k], false);
                    double h = row.dotProduct(qxx.operate(row));
                    double qvv = used[i] ? 1 - h : 1 + h;
                    if (!(qvv > 1e-10)) {
                        known = false; // the fit reproduces this coordinate whatever it is
                        break;
                    }
                    worst = Math.max(worst, Math.abs(v[i * d + k]) / (s0 * Math.sqrt(qvv)));
                }
                if (known) {
                    w = OptionalDouble.of(worst);
                }
            }
            boolean flag = w.isPresent() && w.getAsDouble() > options.outlierThreshold();
            res.add(new PointResidual(all.get(i).id(), used[i], v[i * d], v[i * d + 1], d == 3 ? v[i * d + 2] : 0,
                w, flag));
        }
        FitStatistics stats = new FitStatistics(nAll, n, redundancy, sigma0, Math.sqrt(sumSq / n),
            options.outlierThreshold(), res);

        // Reported parameters and their covariance J·σ₀²Q·Jᵀ.
        Gradient[] rep = Models.toReported(kind, xv, options.convention());
        double[] values = Models.values(rep);
        Optional<double[][]> cov = Optional.empty();
        if (sigma0.isPresent()) {
            RealMatrix j = new Array2DRowRealMatrix(u, u);
            for (int i = 0; i < u; i++) {
                j.setRow(i, rep[i].getGradient());
            }
            double s2 = sigma0.getAsDouble() * sigma0.getAsDouble();
            cov = Optional.of(j.multiply(qxx).multiplyTransposed(j).scalarMultiply(s2).getData());
        }
        try {
            SiteModel model = SiteModel.of(kind, options.convention(), values, cov, sc, tc, stats, "", "");
            return new SiteFit(model, all, options);
        } catch (IllegalArgumentException e) {
            throw new SiteFitException(e.getMessage(), e);
        }
    }

    private static double[] coords(SitePoint s, int d) {
        return d == 3 ? new double[] {s.x(), s.y(), s.z()} : new double[] {s.x(), s.y()};
    }

    private static SiteFitException degenerate(SiteModelKind kind, String why) {
        return new SiteFitException("the control points do not determine a " + kind.id() + ": " + why);
    }

    private static void checkGeometry(SiteModelKind kind, double[][] p, boolean[] used, int n, double maxAbs) {
        int d = kind.dimension();
        RealMatrix m = new Array2DRowRealMatrix(n, d);
        int r = 0;
        for (int i = 0; i < p.length; i++) {
            if (used[i]) {
                m.setRow(r++, p[i]);
            }
        }
        double[] sv = new SingularValueDecomposition(m).getSingularValues();
        // Spread below the rounding of the coordinates themselves means the points coincide.
        if (!(sv[0] > 1e-13 * Math.max(maxAbs, 1e-300))) {
            throw degenerate(kind, "the source coordinates of the " + n + " points coincide");
        }
        if (kind != SiteModelKind.SIMILARITY_2D && !(sv[1] > COLLINEAR_RATIO * sv[0])) {
            throw degenerate(kind, "the source coordinates of the " + n + " points are collinear (singular value "
                + "ratio " + sv[1] / sv[0] + ")");
        }
    }

    /** Linear models: x̂ = A⁺·q by Hipparchus QR. */
    private static double[] solveLinear(SiteModelKind kind, double[][] p, double[][] q, boolean[] used, int n) {
        int d = kind.dimension();
        int u = kind.parameterCount();
        Gradient[] xv = Models.variables(new double[u]);
        Gradient[][] l = Models.matrix(kind, xv);
        Gradient[] c = Models.translation(kind, xv);
        RealMatrix a = new Array2DRowRealMatrix(n * d, u);
        RealVector b = new ArrayRealVector(n * d);
        int r = 0;
        for (int i = 0; i < p.length; i++) {
            if (used[i]) {
                Gradient[] f = Models.predict(l, c, p[i]);
                for (int k = 0; k < d; k++) {
                    a.setRow(r, f[k].getGradient());
                    b.setEntry(r++, q[i][k]);
                }
            }
        }
        try {
            DecompositionSolver s = new QRDecomposition(a, 1e-300).getSolver();
            if (!s.isNonSingular()) {
                throw degenerate(kind, "the design matrix is rank deficient");
            }
            return s.solve(b).toArray();
        } catch (MathIllegalArgumentException e) {
            throw degenerate(kind, "the design matrix is rank deficient");
        }
    }

    /** Helmert: closed-form start (SVD), then Levenberg–Marquardt on the rigorous model. */
    private static double[] solveHelmert(double[][] p, double[][] q, boolean[] used, int n) {
        List<double[]> ps = new ArrayList<>();
        List<double[]> qs = new ArrayList<>();
        for (int i = 0; i < p.length; i++) {
            if (used[i]) {
                ps.add(p[i]);
                qs.add(q[i]);
            }
        }
        RealMatrix pm = MatrixUtils.createRealMatrix(ps.toArray(new double[0][]));
        RealMatrix qm = MatrixUtils.createRealMatrix(qs.toArray(new double[0][]));
        // H = Σ pᵢqᵢᵀ = U Σ Vᵀ; the rotation maximising Σ qᵢᵀRpᵢ is R = V·D·Uᵀ, D = diag(1, 1, ±1).
        SingularValueDecomposition svd = new SingularValueDecomposition(pm.transposeMultiply(qm));
        RealMatrix vu = svd.getV().multiplyTransposed(svd.getU());
        double det = new org.hipparchus.linear.LUDecomposition(vu).getDeterminant();
        RealMatrix dm = MatrixUtils.createRealDiagonalMatrix(new double[] {1, 1, det < 0 ? -1 : 1});
        RealMatrix rot = svd.getV().multiply(dm).multiplyTransposed(svd.getU());
        double[] sv = svd.getSingularValues();
        double trace = sv[0] + sv[1] + (det < 0 ? -sv[2] : sv[2]);
        double pp = pm.getFrobeniusNorm() * pm.getFrobeniusNorm();
        double scale = trace / pp;
        if (!(scale > 0)) {
            throw degenerate(SiteModelKind.HELMERT_3D, "the fitted scale " + scale + " is not positive");
        }
        // Angles of R = R3(γ)R2(β)R1(α): R[2][0] = sin β, R[2][1] = −cos β sin α, R[1][0] = −sin γ cos β.
        double[][] r = rot.getData();
        double beta = Math.asin(Math.max(-1, Math.min(1, r[2][0])));
        double alpha = Math.atan2(-r[2][1], r[2][2]);
        double gamma = Math.atan2(-r[1][0], r[0][0]);
        double[] start = {0, 0, 0, alpha, beta, gamma, scale - 1};

        double[] target = new double[3 * n];
        for (int i = 0; i < n; i++) {
            System.arraycopy(qs.get(i), 0, target, 3 * i, 3);
        }
        LeastSquaresProblem problem = new LeastSquaresBuilder()
            .start(start)
            .target(target)
            .model(point -> {
                Gradient[] xv = Models.variables(point.toArray());
                Gradient[][] l = Models.matrix(SiteModelKind.HELMERT_3D, xv);
                Gradient[] c = Models.translation(SiteModelKind.HELMERT_3D, xv);
                RealVector value = new ArrayRealVector(3 * n);
                RealMatrix jac = new Array2DRowRealMatrix(3 * n, 7);
                for (int i = 0; i < n; i++) {
                    Gradient[] f = Models.predict(l, c, ps.get(i));
                    for (int k = 0; k < 3; k++) {
                        value.setEntry(3 * i + k, f[k].getValue());
                        jac.setRow(3 * i + k, f[k].getGradient());
                    }
                }
                return new Pair<>(value, jac);
            })
            .maxEvaluations(1000)
            .maxIterations(200)
            .build();
        try {
            LeastSquaresOptimizer.Optimum opt = new LevenbergMarquardtOptimizer().optimize(problem);
            return opt.getPoint().toArray();
        } catch (MathIllegalStateException e) {
            throw new SiteFitException("the " + SiteModelKind.HELMERT_3D.id() + " fit did not converge: "
                + e.getMessage(), e);
        }
    }
}
