package io.geotick.timescales.clock;

import io.geotick.timescales.ScaleInstant;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.hipparchus.exception.MathIllegalArgumentException;
import org.hipparchus.exception.MathIllegalStateException;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.QRDecomposer;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.RealVector;
import org.hipparchus.optim.nonlinear.vector.leastsquares.GaussNewtonOptimizer;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresBuilder;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresOptimizer;
import org.hipparchus.optim.nonlinear.vector.leastsquares.LeastSquaresProblem;
import org.hipparchus.util.Pair;

/**
 * Estimates a {@link ClockModel} from paired readings by linear least squares (Hipparchus Gauss&ndash;Newton
 * with a QR decomposition; the problem is linear so one iteration is exact).
 *
 * <p>Observations: y = (reference &minus; device) &minus; c0 in seconds, c0 being the first pair's exact offset;
 * regressors 1, &Delta;, &frac12;&Delta;&sup2; with &Delta; = device &minus; origin (origin = earliest device reading),
 * scaled internally by the span for conditioning. Outliers: residuals beyond {@code threshold} &times; the
 * residual standard deviation; when {@code exclude} is set, the worst is removed and the fit repeated until
 * none remains (keeping at least p + 2 pairs). Common practice for clock-offset estimation (IEEE Std 1139 /
 * ITU-T G.810 define the quantities).
 */
public final class ClockFitter {
    private ClockFitter() {
    }

    /**
     * Fits a model.
     *
     * @param pairs     the readings, at least {@code terms.count()}
     * @param terms     which terms to estimate
     * @param threshold outlier threshold in residual standard deviations (e.g. 3)
     * @param exclude   whether to refit without the outliers
     * @throws ClockFitException when the readings cannot determine the model
     */
    public static ClockFit fit(List<ClockPair> pairs, ClockTerms terms, double threshold, boolean exclude) {
        int p = terms.count();
        if (pairs.size() < p) {
            throw new ClockFitException("a '" + terms.id() + "' model needs at least " + p + " pairs; got "
                + pairs.size());
        }
        if (!(threshold > 0)) {
            throw new ClockFitException("outlier threshold " + threshold + " must be positive");
        }
        ScaleInstant origin = pairs.stream().map(ClockPair::device).min(Comparator.naturalOrder()).orElseThrow();
        ScaleInstant last = pairs.stream().map(ClockPair::device).max(Comparator.naturalOrder()).orElseThrow();
        long base = pairs.get(0).offsetNanos();
        int n = pairs.size();
        double[] dt = new double[n];
        double[] y = new double[n];
        double span = 0;
        for (int i = 0; i < n; i++) {
            ClockPair c = pairs.get(i);
            dt[i] = origin.nanosUntil(c.device()) / 1e9;
            y[i] = Math.subtractExact(c.offsetNanos(), base) / 1e9;
            span = Math.max(span, Math.abs(dt[i]));
        }
        if (p > 1 && span == 0) {
            throw new ClockFitException("all device readings are at the same instant: drift cannot be estimated");
        }
        double scale = span == 0 ? 1 : span;
        boolean[] used = new boolean[n];
        java.util.Arrays.fill(used, true);
        Solution s = solve(dt, y, used, p, scale);
        List<Integer> flagged = flag(s, used, threshold);
        while (exclude && !flagged.isEmpty() && count(used) > p + 2) {
            int worst = flagged.stream().max(Comparator.comparingDouble(i -> Math.abs(s.residual(i)))).orElseThrow();
            used[worst] = false;
            s.replace(solve(dt, y, used, p, scale));
            flagged = flag(s, used, threshold);
        }
        List<ClockFit.Residual> residuals = new ArrayList<>(n);
        List<ClockFit.Residual> outliers = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            ClockFit.Residual r = new ClockFit.Residual(pairs.get(i).line(), pairs.get(i).device(), s.residual(i),
                !used[i]);
            residuals.add(r);
            if (!used[i] || flagged.contains(i)) {
                outliers.add(r);
            }
        }
        ClockPair firstPair = pairs.get(0);
        boolean known = Double.isFinite(s.sigma);
        ClockModel model = ClockModel.of(terms, firstPair.device().scale(), firstPair.reference().scale(), origin,
            base, s.coefficients, known ? Optional.of(s.covariance) : Optional.empty(), origin, last);
        return new ClockFit(model, n, count(used), s.rms, known ? OptionalDouble.of(s.sigma) : OptionalDouble.empty(),
            residuals, outliers);
    }

    private static int count(boolean[] used) {
        int c = 0;
        for (boolean b : used) {
            c += b ? 1 : 0;
        }
        return c;
    }

    private static List<Integer> flag(Solution s, boolean[] used, double threshold) {
        List<Integer> out = new ArrayList<>();
        if (!(s.sigma > 0)) {
            return out;
        }
        for (int i = 0; i < used.length; i++) {
            if (used[i] && Math.abs(s.residual(i)) > threshold * s.sigma) {
                out.add(i);
            }
        }
        return out;
    }

    /** Mutable holder so the refit loop can replace it (local to one fit call). */
    private static final class Solution {
        double[] coefficients;
        double[][] covariance;
        double rms;
        double sigma; // NaN (private) when there is no redundancy
        double[] residuals;

        double residual(int i) {
            return residuals[i];
        }

        void replace(Solution o) {
            coefficients = o.coefficients;
            covariance = o.covariance;
            rms = o.rms;
            sigma = o.sigma;
            residuals = o.residuals;
        }
    }

    private static Solution solve(double[] dt, double[] y, boolean[] used, int p, double scale) {
        int m = count(used);
        double[][] a = new double[m][p];
        double[] target = new double[m];
        int r = 0;
        for (int i = 0; i < dt.length; i++) {
            if (!used[i]) {
                continue;
            }
            double u = dt[i] / scale;
            double[] row = {1.0, u, 0.5 * u * u};
            System.arraycopy(row, 0, a[r], 0, p);
            target[r] = y[i];
            r++;
        }
        RealMatrix design = new Array2DRowRealMatrix(a, false);
        LeastSquaresProblem problem = new LeastSquaresBuilder()
            .model(point -> new Pair<RealVector, RealMatrix>(design.operate(point), design))
            .target(target)
            .start(new double[p])
            .maxEvaluations(10)
            .maxIterations(10)
            .checker((iteration, previous, current) -> iteration >= 1)
            .build();
        LeastSquaresOptimizer.Optimum opt;
        RealMatrix cov;
        try {
            opt = new GaussNewtonOptimizer(new QRDecomposer(1e-14), false).optimize(problem);
            cov = opt.getCovariances(1e-14);
        } catch (MathIllegalArgumentException | MathIllegalStateException e) {
            throw new ClockFitException("the readings cannot determine a '" + (p == 1 ? "offset" : p == 2 ? "drift"
                : "drift-rate") + "' model (" + e.getMessage() + "); use fewer terms or more varied readings", e);
        }
        RealVector x = opt.getPoint();
        Solution s = new Solution();
        s.coefficients = new double[p];
        s.covariance = new double[p][p];
        double[] unit = {1.0, 1.0 / scale, 1.0 / (scale * scale)};
        double rss = 0;
        s.residuals = new double[dt.length];
        for (int i = 0; i < dt.length; i++) {
            double u = dt[i] / scale;
            double[] row = {1.0, u, 0.5 * u * u};
            double model = 0;
            for (int j = 0; j < p; j++) {
                model += row[j] * x.getEntry(j);
            }
            s.residuals[i] = y[i] - model;
            if (used[i]) {
                rss += s.residuals[i] * s.residuals[i];
            }
        }
        s.rms = Math.sqrt(rss / m);
        s.sigma = m > p ? Math.sqrt(rss / (m - p)) : Double.NaN;
        double var = s.sigma * s.sigma;
        for (int i = 0; i < p; i++) {
            s.coefficients[i] = x.getEntry(i) * unit[i];
            for (int j = 0; j < p; j++) {
                s.covariance[i][j] = cov.getEntry(i, j) * var * unit[i] * unit[j];
            }
        }
        return s;
    }
}
