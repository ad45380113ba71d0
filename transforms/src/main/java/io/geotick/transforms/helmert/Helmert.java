package io.geotick.transforms.helmert;

import io.geotick.geodesy.position.EcefPosition;
import java.util.Objects;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.RealMatrix;

/**
 * The 7-parameter Helmert similarity transformation of Earth-centred coordinates,
 * X_T = M·R·X_S + T with M = 1 + ds·10⁻⁶, in a named rotation convention and rotation form.
 * Immutable and thread-safe.
 *
 * <h2>Formulas (IOGP Guidance Note 7-2, §4.3.3)</h2>
 * Position vector (EPSG 1033 / 9606), small-angle:
 * <pre>
 *   | X_T |       |  1   −rz   ry | | X_S |   | tx |
 *   | Y_T | = M · |  rz   1   −rx | | Y_S | + | ty |
 *   | Z_T |       | −ry   rx   1  | | Z_S |   | tz |
 * </pre>
 * Coordinate frame rotation (EPSG 1032 / 9607): the same with the signs of the rotations reversed.
 * Rotations are converted from arc-seconds to radians exactly (π/648000 in double-double).
 * The {@link RotationForm#RIGOROUS rigorous} form replaces the matrix by the orthogonal product
 * R₃(rz)R₂(ry)R₁(rx) (coordinate frame; position vector: the same with the rotations negated); it differs
 * from the small-angle form by about r²·R/2 (0.08 mm for 1″).
 *
 * <h2>Accuracy</h2>
 * The formula is evaluated as X + (D·X + T) with D = M·R − I, so rounding stays within about one ulp of
 * the coordinates (~1e-9 m at the Earth's surface). The transformation's real-world accuracy is that of
 * its parameters, which the frame registry states for each published set.
 *
 * <h2>Reverse</h2>
 * <ul>
 *   <li>{@link #inverse()}: the exact inverse X_S = (M R)⁻¹(X_T − T), round trips to ~1e-9 m.</li>
 *   <li>{@link #reversedBySignReversal()}: the same method with all seven parameters negated, as the EPSG
 *       dataset defines the reverse of 9606/9607. It is exact only to first order: it differs from the
 *       exact inverse by terms of order |D|²·R + |D|·|T| (e.g. 0.02 mm for the WGS 72 → WGS 84 set,
 *       about 1 cm for OSGB 1936 → WGS 84 with its −20 ppm scale and 540 m translations); {@link #signReversalDifference} computes
 *       the difference at a point.</li>
 * </ul>
 */
public final class Helmert implements GeocentricTransform {
    /** Radians per arc-second, π/648000, as a double-double. */
    static final double ARCSEC_HI = Math.PI / 648000;
    static final double ARCSEC_LO = (Math.fma(-ARCSEC_HI, 648000, Math.PI) + 1.2246467991473532e-16) / 648000;

    private final HelmertParameters parameters;
    private final RotationConvention convention;
    private final RotationForm form;
    private final AffineGeocentric kernel;

    private Helmert(HelmertParameters p, RotationConvention c, RotationForm f) {
        this.parameters = Objects.requireNonNull(p, "parameters");
        this.convention = Objects.requireNonNull(c, "convention");
        this.form = Objects.requireNonNull(f, "form");
        this.kernel = new AffineGeocentric(smallPart(p, c, f), new double[] {p.tx(), p.ty(), p.tz()},
            describe(p, c, f), null);
    }

    /** A Helmert transformation with the given parameters, convention and rotation form. */
    public static Helmert of(HelmertParameters parameters, RotationConvention convention, RotationForm form) {
        return new Helmert(parameters, convention, form);
    }

    /** Position vector convention (EPSG 1033 / 9606), small-angle matrix as EPSG defines it. */
    public static Helmert positionVector(HelmertParameters parameters) {
        return new Helmert(parameters, RotationConvention.POSITION_VECTOR, RotationForm.SMALL_ANGLE);
    }

    /** Coordinate frame convention (EPSG 1032 / 9607), small-angle matrix as EPSG defines it. */
    public static Helmert coordinateFrame(HelmertParameters parameters) {
        return new Helmert(parameters, RotationConvention.COORDINATE_FRAME, RotationForm.SMALL_ANGLE);
    }

    /** Arc-seconds to radians with the factor carried in two doubles. */
    static double arcsecToRad(double arcsec) {
        return arcsec * ARCSEC_HI + arcsec * ARCSEC_LO;
    }

    private static double[][] smallPart(HelmertParameters p, RotationConvention c, RotationForm f) {
        double sign = c == RotationConvention.COORDINATE_FRAME ? 1 : -1;
        // Coordinate-frame angles; the position-vector matrix is the coordinate-frame one with angles negated.
        double a = sign * arcsecToRad(p.rx());
        double b = sign * arcsecToRad(p.ry());
        double g = sign * arcsecToRad(p.rz());
        double s = p.ds() * 1e-6;
        double m = 1 + s;
        if (f == RotationForm.SMALL_ANGLE) {
            // M·(I + Ω) − I = s·I + M·Ω, with Ω the coordinate-frame skew matrix.
            return new double[][] {{s, m * g, -m * b}, {-m * g, s, m * a}, {m * b, -m * a, s}};
        }
        RealMatrix r = rot3(g).multiply(rot2(b)).multiply(rot1(a));
        // D = M·R − I = M·(R − I) + s·I. The product's entries carry an absolute rounding of ~1e-16,
        // i.e. below 1e-9 m once multiplied by an Earth-sized coordinate.
        double[][] d = r.subtract(MatrixUtils.createRealIdentityMatrix(3)).getData();
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                d[i][j] = d[i][j] * m + (i == j ? s : 0);
            }
        }
        return d;
    }

    private static RealMatrix rot1(double a) {
        double c = Math.cos(a);
        double s = Math.sin(a);
        return MatrixUtils.createRealMatrix(new double[][] {{1, 0, 0}, {0, c, s}, {0, -s, c}});
    }

    private static RealMatrix rot2(double b) {
        double c = Math.cos(b);
        double s = Math.sin(b);
        return MatrixUtils.createRealMatrix(new double[][] {{c, 0, -s}, {0, 1, 0}, {s, 0, c}});
    }

    private static RealMatrix rot3(double g) {
        double c = Math.cos(g);
        double s = Math.sin(g);
        return MatrixUtils.createRealMatrix(new double[][] {{c, s, 0}, {-s, c, 0}, {0, 0, 1}});
    }

    private static String describe(HelmertParameters p, RotationConvention c, RotationForm f) {
        return c.methodName() + " (EPSG method " + c.epsgGeocentricMethod() + " / " + c.epsgGeographicMethod()
            + "), " + (f == RotationForm.SMALL_ANGLE ? "small-angle" : "rigorous") + " rotation matrix";
    }

    /** The kernel that evaluates this transformation (for tests). */
    AffineGeocentric kernel() {
        return kernel;
    }

    /** The parameters, in the units and convention of this transformation. */
    public HelmertParameters parameters() {
        return parameters;
    }

    /** The rotation convention. */
    public RotationConvention convention() {
        return convention;
    }

    /** The rotation form. */
    public RotationForm form() {
        return form;
    }

    /** The same transformation written in the other convention (rotations negated); results are identical. */
    public Helmert inConvention(RotationConvention target) {
        return target == convention ? this : new Helmert(parameters.withRotationsNegated(), target, form);
    }

    /** The same parameters with another rotation form. */
    public Helmert withForm(RotationForm target) {
        return target == form ? this : new Helmert(parameters, convention, target);
    }

    /** The full matrix M·R, row-major, as a copy. */
    public double[][] matrix() {
        double[][] d = kernel.smallPart();
        for (int i = 0; i < 3; i++) {
            d[i][i] += 1;
        }
        return d;
    }

    @Override
    public EcefPosition apply(EcefPosition source) {
        return kernel.apply(source);
    }

    @Override
    public void apply(double[] in, int inOffset, double[] out, int outOffset, int count) {
        kernel.apply(in, inOffset, out, outOffset, count);
    }

    /** The exact inverse (see the class description); round trips within ~1e-9 m. */
    @Override
    public GeocentricTransform inverse() {
        return AffineGeocentric.inverseOf(kernel, "exact inverse of " + kernel.description(), this);
    }

    /** The usual reverse: the same method with every parameter negated (first-order exact only). */
    public Helmert reversedBySignReversal() {
        return new Helmert(parameters.negated(), convention, form);
    }

    /**
     * Distance in metres, at the target-frame position {@code target}, between the sign-reversed reverse
     * and the exact inverse: how much the usual approximation costs there.
     */
    public double signReversalDifference(EcefPosition target) {
        return reversedBySignReversal().apply(target).distanceTo(inverse().apply(target));
    }

    @Override
    public String description() {
        return kernel.description();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Helmert && ((Helmert) o).parameters.equals(parameters)
            && ((Helmert) o).convention == convention && ((Helmert) o).form == form;
    }

    @Override
    public int hashCode() {
        return Objects.hash(parameters, convention, form);
    }

    @Override
    public String toString() {
        return description() + " " + parameters;
    }
}
