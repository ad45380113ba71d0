package io.geotick.transforms.fit;

import io.geotick.transforms.helmert.RotationConvention;
import java.util.List;
import org.hipparchus.analysis.differentiation.Gradient;
import org.hipparchus.analysis.differentiation.GradientField;
import org.hipparchus.linear.Array2DRowFieldMatrix;
import org.hipparchus.linear.FieldMatrix;

/**
 * The parametrisation of the three models, written once in Hipparchus {@link Gradient} arithmetic so
 * that the values, the Jacobian of the least-squares problem and the propagation of the covariance to
 * derived quantities all come from the same formulas (automatic differentiation, not hand-derived
 * partials).
 *
 * <p>Internal parameters (what the optimiser sees, chosen for conditioning):
 * <ul>
 *   <li>similarity-2d: (a, b, cx, cy), L = [[a, −b], [b, a]];</li>
 *   <li>affine-2d: (a1, a2, b1, b2, cx, cy), L = [[a1, a2], [b1, b2]];</li>
 *   <li>helmert-3d: (cx, cy, cz, α, β, γ, s) with coordinate-frame angles in radians and s = scale − 1,
 *       L = (1 + s)·R₃(γ)·R₂(β)·R₁(α), the rigorous matrix of
 *       {@link io.geotick.transforms.helmert.RotationForm#RIGOROUS} in the coordinate-frame convention.</li>
 * </ul>
 * (cx, cy[, cz]) is the translation of the centred form p' = t̄ + c + L·(p − s̄).
 * Reported parameters equal the internal ones except for the Helmert, reported in arc-seconds (sign of
 * the chosen convention: position vector negates the angles) and ppm.
 */
final class Models {
    /** Arc-seconds per radian. */
    static final double ARCSEC_PER_RAD = 648000 / Math.PI;

    private Models() {
    }

    static List<String> names(SiteModelKind kind) {
        switch (kind) {
            case SIMILARITY_2D: return List.of("a", "b", "cx", "cy");
            case AFFINE_2D: return List.of("a1", "a2", "b1", "b2", "cx", "cy");
            default: return List.of("cx", "cy", "cz", "rx", "ry", "rz", "ds");
        }
    }

    static List<String> units(SiteModelKind kind) {
        switch (kind) {
            case SIMILARITY_2D: return List.of("1", "1", "m", "m");
            case AFFINE_2D: return List.of("1", "1", "1", "1", "m", "m");
            default: return List.of("m", "m", "m", "arc-second", "arc-second", "arc-second", "ppm");
        }
    }

    /** Independent variables x₀ … x_{n−1} at the given values. */
    static Gradient[] variables(double[] values) {
        Gradient[] g = new Gradient[values.length];
        for (int i = 0; i < values.length; i++) {
            g[i] = Gradient.variable(values.length, i, values[i]);
        }
        return g;
    }

    /** Reported parameters from internal ones. */
    static Gradient[] toReported(SiteModelKind kind, Gradient[] x, RotationConvention c) {
        if (kind != SiteModelKind.HELMERT_3D) {
            return x.clone();
        }
        double sign = c == RotationConvention.COORDINATE_FRAME ? ARCSEC_PER_RAD : -ARCSEC_PER_RAD;
        return new Gradient[] {x[0], x[1], x[2], x[3].multiply(sign), x[4].multiply(sign), x[5].multiply(sign),
            x[6].multiply(1e6)};
    }

    /** Internal parameters from reported ones. */
    static Gradient[] toInternal(SiteModelKind kind, Gradient[] r, RotationConvention c) {
        if (kind != SiteModelKind.HELMERT_3D) {
            return r.clone();
        }
        double sign = c == RotationConvention.COORDINATE_FRAME ? 1 / ARCSEC_PER_RAD : -1 / ARCSEC_PER_RAD;
        return new Gradient[] {r[0], r[1], r[2], r[3].multiply(sign), r[4].multiply(sign), r[5].multiply(sign),
            r[6].multiply(1e-6)};
    }

    /** The translation c of the centred form. */
    static Gradient[] translation(SiteModelKind kind, Gradient[] x) {
        switch (kind) {
            case SIMILARITY_2D: return new Gradient[] {x[2], x[3]};
            case AFFINE_2D: return new Gradient[] {x[4], x[5]};
            default: return new Gradient[] {x[0], x[1], x[2]};
        }
    }

    /** The matrix L from internal parameters. */
    static Gradient[][] matrix(SiteModelKind kind, Gradient[] x) {
        switch (kind) {
            case SIMILARITY_2D:
                return new Gradient[][] {{x[0], x[1].negate()}, {x[1], x[0]}};
            case AFFINE_2D:
                return new Gradient[][] {{x[0], x[1]}, {x[2], x[3]}};
            default:
                FieldMatrix<Gradient> r = rot3(x[5]).multiply(rot2(x[4])).multiply(rot1(x[3]));
                return r.scalarMultiply(x[6].add(1)).getData();
        }
    }

    /** Prediction c + L·p for a centred point p (length d). */
    static Gradient[] predict(Gradient[][] l, Gradient[] c, double[] p) {
        int d = c.length;
        Gradient[] out = new Gradient[d];
        for (int i = 0; i < d; i++) {
            Gradient s = c[i];
            for (int j = 0; j < d; j++) {
                s = s.add(l[i][j].multiply(p[j]));
            }
            out[i] = s;
        }
        return out;
    }

    static double[][] values(Gradient[][] m) {
        double[][] v = new double[m.length][];
        for (int i = 0; i < m.length; i++) {
            v[i] = new double[m[i].length];
            for (int j = 0; j < m[i].length; j++) {
                v[i][j] = m[i][j].getValue();
            }
        }
        return v;
    }

    static double[] values(Gradient[] g) {
        double[] v = new double[g.length];
        for (int i = 0; i < g.length; i++) {
            v[i] = g[i].getValue();
        }
        return v;
    }

    // Coordinate-frame elementary rotations, as in io.geotick.transforms.helmert.Helmert (rigorous form).
    private static FieldMatrix<Gradient> rot1(Gradient a) {
        Gradient c = a.cos();
        Gradient s = a.sin();
        Gradient o = c.getField().getOne();
        Gradient z = c.getField().getZero();
        return matrix3(c, new Gradient[][] {{o, z, z}, {z, c, s}, {z, s.negate(), c}});
    }

    private static FieldMatrix<Gradient> rot2(Gradient b) {
        Gradient c = b.cos();
        Gradient s = b.sin();
        Gradient o = c.getField().getOne();
        Gradient z = c.getField().getZero();
        return matrix3(c, new Gradient[][] {{c, z, s.negate()}, {z, o, z}, {s, z, c}});
    }

    private static FieldMatrix<Gradient> rot3(Gradient g) {
        Gradient c = g.cos();
        Gradient s = g.sin();
        Gradient o = c.getField().getOne();
        Gradient z = c.getField().getZero();
        return matrix3(c, new Gradient[][] {{c, s, z}, {s.negate(), c, z}, {z, z, o}});
    }

    private static FieldMatrix<Gradient> matrix3(Gradient any, Gradient[][] d) {
        return new Array2DRowFieldMatrix<>(GradientField.getField(any.getFreeParameters()), d, false);
    }
}
