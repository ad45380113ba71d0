package io.geotick.transforms.fit;

import io.geotick.transforms.FileFailure;
import io.geotick.transforms.helmert.Helmert;
import io.geotick.transforms.helmert.HelmertParameters;
import io.geotick.transforms.helmert.RotationConvention;
import io.geotick.transforms.helmert.RotationForm;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;
import org.hipparchus.analysis.differentiation.Gradient;
import org.hipparchus.linear.LUDecomposition;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.RealMatrix;

/**
 * A site-grid model fitted to control points: the transform from the source system to the site grid,
 * with its parameters, their uncertainties and the statistics of the fit. Immutable and thread-safe.
 * Made by {@link SiteFitter}; saved and loaded with {@link #toJson()} / {@link #fromJson(String)}.
 *
 * <h2>Formulas</h2>
 * The model is held and applied in centred form p' = t̄ + c + L·(p − s̄), with s̄ and t̄ the centroids of
 * the source and site-grid coordinates of the control points used (Ghilani &amp; Wolf, Adjustment
 * Computations, chapters on 2D conformal, affine and 3D conformal transformations; centring for
 * conditioning is common practice):
 * <ul>
 *   <li>{@code similarity-2d}: L = [[a, −b], [b, a]]; scale = √(a² + b²), rotation θ = atan2(b, a)
 *       (counter-clockwise from the source x axis to the site x axis, degrees);</li>
 *   <li>{@code affine-2d}: L = [[a1, a2], [b1, b2]];</li>
 *   <li>{@code helmert-3d}: L = (1 + ds·10⁻⁶)·R with R the rigorous (orthogonal) rotation R₃R₂R₁ of
 *       {@link RotationForm#RIGOROUS}, angles rx, ry, rz in arc-seconds in the {@link #convention()} of the
 *       model (position vector by default, IOGP Guidance Note 7-2 §4.3.3; coordinate frame has the signs
 *       reversed).</li>
 * </ul>
 * The 2D models carry z through unchanged. The uncentred translation T = t̄ + c − L·s̄ (parameters tx, ty[,
 * tz] among the {@link #derivedParameters() derived ones}) is the conventional form; its uncertainty is
 * much larger than that of c when the control points lie far from the origin, which is why the centred
 * form is what is estimated and applied.
 *
 * <h2>Accuracy</h2>
 * Application rounds at about one ulp of the coordinates (the products act on differences from the
 * centroid). The model's real accuracy is what the fit statistics say: σ₀ and the parameter
 * uncertainties, valid inside the area the control points cover.
 */
public final class SiteModel implements SiteTransform {
    private final SiteModelKind kind;
    private final RotationConvention convention;
    private final double[] values;
    private final double[][] covariance;
    private final double[] sourceCentroid;
    private final double[] targetCentroid;
    private final FitStatistics statistics;
    private final String sourceSystem;
    private final String targetSystem;
    private final List<FitParameter> parameters;
    private final List<FitParameter> derived;
    private final CentredKernel kernel;

    private SiteModel(SiteModelKind kind, RotationConvention convention, double[] values, double[][] covariance,
            double[] sourceCentroid, double[] targetCentroid, FitStatistics statistics, String sourceSystem,
            String targetSystem) {
        this.kind = Objects.requireNonNull(kind, "kind");
        this.convention = Objects.requireNonNull(convention, "convention");
        this.statistics = Objects.requireNonNull(statistics, "statistics");
        this.sourceSystem = Objects.requireNonNull(sourceSystem, "sourceSystem");
        this.targetSystem = Objects.requireNonNull(targetSystem, "targetSystem");
        int u = kind.parameterCount();
        int d = kind.dimension();
        require(values.length == u, "a " + kind.id() + " model has " + u + " parameters, not " + values.length);
        require(sourceCentroid.length == d && targetCentroid.length == d,
            "a " + kind.id() + " model has " + d + "-coordinate centroids");
        this.values = values.clone();
        this.sourceCentroid = sourceCentroid.clone();
        this.targetCentroid = targetCentroid.clone();
        for (int i = 0; i < d; i++) {
            require(Double.isFinite(sourceCentroid[i]) && Double.isFinite(targetCentroid[i]),
                "centroid coordinates must be finite numbers");
        }
        List<String> names = Models.names(kind);
        List<String> units = Models.units(kind);
        for (int i = 0; i < u; i++) {
            require(Double.isFinite(values[i]), "parameter " + names.get(i) + " = " + values[i]
                + " is not a finite number");
        }
        if (covariance != null) {
            require(covariance.length == u, "the covariance must be " + u + "×" + u);
            this.covariance = new double[u][];
            for (int i = 0; i < u; i++) {
                require(covariance[i].length == u, "the covariance must be " + u + "×" + u);
                for (int j = 0; j < u; j++) {
                    require(Double.isFinite(covariance[i][j]), "covariance entry [" + i + "][" + j
                        + "] is not a finite number");
                }
                require(covariance[i][i] >= 0, "covariance diagonal entry [" + i + "][" + i + "] is negative");
                this.covariance[i] = covariance[i].clone();
            }
        } else {
            this.covariance = null;
        }

        Gradient[] reported = Models.variables(this.values);
        Gradient[] x = Models.toInternal(kind, reported, convention);
        Gradient[][] l = Models.matrix(kind, x);
        Gradient[] c = Models.translation(kind, x);
        double[][] lv = Models.values(l);
        checkInvertible(lv);
        double[] oc = new double[d];
        for (int i = 0; i < d; i++) {
            oc[i] = targetCentroid[i] + c[i].getValue();
        }
        this.kernel = new CentredKernel(kind, this.sourceCentroid, oc, lv, describe(), null);

        List<FitParameter> ps = new ArrayList<>();
        for (int i = 0; i < u; i++) {
            ps.add(new FitParameter(names.get(i), units.get(i), this.values[i], sigma(reported[i])));
        }
        this.parameters = List.copyOf(ps);

        // Derived: T = t̄ + c − L·s̄, and for the similarity its scale and rotation.
        List<FitParameter> ds = new ArrayList<>();
        double[] minusS = new double[d];
        for (int i = 0; i < d; i++) {
            minusS[i] = -sourceCentroid[i];
        }
        Gradient[] t = Models.predict(l, c, minusS);
        String[] tn = {"tx", "ty", "tz"};
        for (int i = 0; i < d; i++) {
            ds.add(new FitParameter(tn[i], "m", t[i].add(targetCentroid[i]).getValue(), sigma(t[i])));
        }
        if (kind == SiteModelKind.SIMILARITY_2D) {
            Gradient scale = reported[0].multiply(reported[0]).add(reported[1].multiply(reported[1])).sqrt();
            Gradient rot = reported[1].atan2(reported[0]).multiply(180 / Math.PI);
            ds.add(new FitParameter("scale", "1", scale.getValue(), sigma(scale)));
            ds.add(new FitParameter("rotation", "degree", rot.getValue(), sigma(rot)));
        }
        this.derived = List.copyOf(ds);
    }

    /**
     * A model from its reported parameters (the form {@link #parameters()} lists and the file stores).
     *
     * @param kind the model kind
     * @param convention how Helmert rotations are signed (ignored by the 2D models)
     * @param values the parameter values in the order of {@link #parameters()}
     * @param covariance their covariance matrix, empty when unknown (no redundancy)
     * @param sourceCentroid s̄ (2 or 3 coordinates)
     * @param targetCentroid t̄ (2 or 3 coordinates)
     * @param statistics the fit statistics
     * @param sourceSystem free text naming the source system ("" when not given)
     * @param targetSystem free text naming the site grid ("" when not given)
     * @throws IllegalArgumentException naming the inconsistent value, or when L is not invertible
     */
    public static SiteModel of(SiteModelKind kind, RotationConvention convention, double[] values,
            Optional<double[][]> covariance, double[] sourceCentroid, double[] targetCentroid,
            FitStatistics statistics, String sourceSystem, String targetSystem) {
        return new SiteModel(kind, convention, values, covariance.orElse(null), sourceCentroid, targetCentroid,
            statistics, sourceSystem, targetSystem);
    }

    private static void require(boolean ok, String message) {
        if (!ok) {
            throw new IllegalArgumentException(message);
        }
    }

    /** Rejects a singular or nearly singular L (relative determinant below 1e-12): it has no inverse. */
    private void checkInvertible(double[][] lv) {
        RealMatrix m = MatrixUtils.createRealMatrix(lv);
        double norm = m.getFrobeniusNorm();
        double det = new LUDecomposition(m).getDeterminant();
        if (!(norm > 0) || !(Math.abs(det) > 1e-12 * Math.pow(norm, lv.length))) {
            throw new IllegalArgumentException("the fitted " + kind.id() + " matrix is singular (determinant "
                + det + "): the site-grid points are coincident or collinear");
        }
    }

    private OptionalDouble sigma(Gradient g) {
        if (covariance == null) {
            return OptionalDouble.empty();
        }
        double[] grad = g.getGradient();
        double var = MatrixUtils.createRealVector(grad)
            .dotProduct(MatrixUtils.createRealMatrix(covariance).operate(MatrixUtils.createRealVector(grad)));
        return OptionalDouble.of(Math.sqrt(Math.max(var, 0)));
    }

    private String describe() {
        String what;
        switch (kind) {
            case SIMILARITY_2D: what = "2D similarity (4 parameters)"; break;
            case AFFINE_2D: what = "2D affine (6 parameters)"; break;
            default: what = "3D Helmert (7 parameters, rigorous rotation, " + convention.methodName() + " signs)";
        }
        return what + " fitted to " + statistics.pointsUsed() + " control points"
            + (sourceSystem.isEmpty() ? "" : ", from " + sourceSystem)
            + (targetSystem.isEmpty() ? "" : " to " + targetSystem);
    }

    /** The model kind. */
    @Override
    public SiteModelKind kind() {
        return kind;
    }

    /** The sign convention of the Helmert rotations (meaningless for the 2D models, which keep the default). */
    public RotationConvention convention() {
        return convention;
    }

    /**
     * The estimated parameters with standard uncertainties, in estimation order: similarity a, b, cx, cy;
     * affine a1, a2, b1, b2, cx, cy; Helmert cx, cy, cz (m), rx, ry, rz (arc-seconds), ds (ppm). (cx, cy[,
     * cz]) is the translation of the centred form, near zero by construction.
     */
    public List<FitParameter> parameters() {
        return parameters;
    }

    /**
     * Quantities computed from the parameters, uncertainties propagated with the full covariance:
     * tx, ty[, tz] (the uncentred translation T = t̄ + c − L·s̄) for every kind, and for the similarity
     * scale and rotation (degrees).
     */
    public List<FitParameter> derivedParameters() {
        return derived;
    }

    /**
     * A parameter or derived quantity by name.
     *
     * @throws IllegalArgumentException naming the unknown name
     */
    public FitParameter parameter(String name) {
        for (FitParameter p : parameters) {
            if (p.name().equals(name)) {
                return p;
            }
        }
        for (FitParameter p : derived) {
            if (p.name().equals(name)) {
                return p;
            }
        }
        throw new IllegalArgumentException("a " + kind.id() + " model has no parameter '" + name + "'");
    }

    /** The covariance of {@link #parameters()} (σ₀²·Q), a copy; empty when the fit has no redundancy. */
    public Optional<double[][]> covariance() {
        if (covariance == null) {
            return Optional.empty();
        }
        double[][] c = new double[covariance.length][];
        for (int i = 0; i < c.length; i++) {
            c[i] = covariance[i].clone();
        }
        return Optional.of(c);
    }

    /** The centroid s̄ of the source coordinates of the control points used (z = 0 for 2D). */
    public SitePoint sourceCentroid() {
        return new SitePoint(sourceCentroid[0], sourceCentroid[1], kind.dimension() == 3 ? sourceCentroid[2] : 0);
    }

    /** The centroid t̄ of the site-grid coordinates of the control points used (z = 0 for 2D). */
    public SitePoint targetCentroid() {
        return new SitePoint(targetCentroid[0], targetCentroid[1], kind.dimension() == 3 ? targetCentroid[2] : 0);
    }

    /** The matrix L of the centred form (2×2 or 3×3), a copy. */
    public double[][] matrix() {
        return kernel.matrix();
    }

    /** The statistics of the fit. */
    public FitStatistics statistics() {
        return statistics;
    }

    /** Free text naming the source system ("" when not given). */
    public String sourceSystem() {
        return sourceSystem;
    }

    /** Free text naming the site grid ("" when not given). */
    public String targetSystem() {
        return targetSystem;
    }

    /** This model with the two system names set (free text, e.g. {@code EPSG:32631} and a site-grid name). */
    public SiteModel withSystems(String source, String target) {
        return new SiteModel(kind, convention, values, covariance, sourceCentroid, targetCentroid, statistics,
            Objects.requireNonNull(source, "source"), Objects.requireNonNull(target, "target"));
    }

    /**
     * The Helmert as a chainable geocentric transformation in the uncentred form X' = T + (1 + ds·10⁻⁶)·R·X
     * (same convention, rigorous form). Equal to this model to rounding of T (about 1e-9 m for
     * Earth-centred coordinates).
     *
     * @throws IllegalStateException for the 2D models
     */
    public Helmert toHelmert() {
        if (kind != SiteModelKind.HELMERT_3D) {
            throw new IllegalStateException("a " + kind.id() + " model is not a Helmert transformation");
        }
        return Helmert.of(HelmertParameters.of(derived.get(0).value(), derived.get(1).value(),
            derived.get(2).value(), values[3], values[4], values[5], values[6]), convention, RotationForm.RIGOROUS);
    }

    @Override
    public SitePoint apply(double x, double y) {
        return kernel.apply(x, y);
    }

    @Override
    public SitePoint apply(double x, double y, double z) {
        return kernel.apply(x, y, z);
    }

    @Override
    public void apply(double[] in, int inOffset, double[] out, int outOffset, int count) {
        kernel.apply(in, inOffset, out, outOffset, count);
    }

    /** The inverse (site grid → source); its inverse is this model. */
    @Override
    public SiteTransform inverse() {
        return kernel.inverted(this);
    }

    @Override
    public String description() {
        return kernel.description();
    }

    /** The model as JSON text (layout in {@link SiteModelJson}). */
    public String toJson() {
        return SiteModelJson.write(this);
    }

    /** Writes {@link #toJson()} to a file (UTF-8). */
    public void write(Path file) {
        try {
            Files.writeString(file, toJson());
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write site model " + file + ": " + FileFailure.reason(e), e);
        }
    }

    /**
     * Reads a model from JSON text.
     *
     * @throws SiteModelFormatException naming the problem when the text is not a valid site model
     */
    public static SiteModel fromJson(String json) {
        return SiteModelJson.read(json, "site model");
    }

    /**
     * Reads a model from a file.
     *
     * @throws SiteModelFormatException naming the file and the problem when it is not a valid site model
     * @throws UncheckedIOException when the file cannot be read
     */
    public static SiteModel read(Path file) {
        String text;
        try {
            text = Files.readString(file);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read site model " + file + ": " + FileFailure.reason(e), e);
        }
        return SiteModelJson.read(text, "site model " + file);
    }

    double[] values() {
        return values.clone();
    }

    double[] sourceCentroidArray() {
        return sourceCentroid.clone();
    }

    double[] targetCentroidArray() {
        return targetCentroid.clone();
    }

    @Override
    public boolean equals(Object o) {
        if (!(o instanceof SiteModel)) {
            return false;
        }
        SiteModel m = (SiteModel) o;
        return kind == m.kind && convention == m.convention && Arrays.equals(values, m.values)
            && Arrays.deepEquals(covariance, m.covariance) && Arrays.equals(sourceCentroid, m.sourceCentroid)
            && Arrays.equals(targetCentroid, m.targetCentroid) && statistics.equals(m.statistics)
            && sourceSystem.equals(m.sourceSystem) && targetSystem.equals(m.targetSystem);
    }

    @Override
    public int hashCode() {
        return Objects.hash(kind, convention, Arrays.hashCode(values), Arrays.hashCode(sourceCentroid),
            Arrays.hashCode(targetCentroid), statistics, sourceSystem, targetSystem);
    }

    @Override
    public String toString() {
        return description();
    }
}
