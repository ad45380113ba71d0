package io.geotick.geodesy.local;

import io.geotick.geodesy.InvalidCovarianceException;
import java.util.Objects;
import org.hipparchus.linear.EigenDecompositionSymmetric;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.RealMatrix;

/** Validation of 3×3 covariance matrices, shared by the frame rotations and the accuracy figures. */
final class Covariances {
    /**
     * Largest accepted asymmetry |c_ij − c_ji|, relative to the largest variance: well above the rounding
     * of a rotation R C Rᵀ (~1e-16) and below any asymmetry that would mean a wrong matrix.
     */
    static final double SYMMETRY_TOLERANCE = 1e-9;
    /**
     * Most negative accepted eigenvalue, relative to the largest: rounding can leave a singular
     * covariance (e.g. a fixed height) with an eigenvalue of −1e-16·λmax; anything more negative is
     * not a covariance.
     */
    static final double DEFINITENESS_TOLERANCE = 1e-12;

    private Covariances() {
    }

    /**
     * Checks that {@code m} is a finite, symmetric (within tolerance), positive semi-definite 3×3
     * matrix and returns its symmetrised copy (c_ij + c_ji)/2.
     *
     * @param axes the axis names for messages, e.g. {"east", "north", "up"}
     */
    static RealMatrix checked(RealMatrix m, String[] axes) {
        Objects.requireNonNull(m, "covariance");
        if (m.getRowDimension() != 3 || m.getColumnDimension() != 3) {
            throw new InvalidCovarianceException("a covariance must be 3×3, got " + m.getRowDimension() + "×"
                + m.getColumnDimension());
        }
        double scale = 0;
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                double v = m.getEntry(i, j);
                if (!Double.isFinite(v)) {
                    throw new InvalidCovarianceException("covariance entry (" + axes[i] + ", " + axes[j] + ") = "
                        + v + " is not a finite number");
                }
            }
            double var = m.getEntry(i, i);
            if (var < 0) {
                throw new InvalidCovarianceException("variance of " + axes[i] + " = " + var
                    + " m² is negative");
            }
            scale = Math.max(scale, var);
        }
        double[][] s = new double[3][3];
        for (int i = 0; i < 3; i++) {
            s[i][i] = m.getEntry(i, i);
            for (int j = i + 1; j < 3; j++) {
                double a = m.getEntry(i, j);
                double b = m.getEntry(j, i);
                if (Math.abs(a - b) > SYMMETRY_TOLERANCE * scale) {
                    throw new InvalidCovarianceException("covariance is not symmetric: entry (" + axes[i] + ", "
                        + axes[j] + ") = " + a + " but (" + axes[j] + ", " + axes[i] + ") = " + b);
                }
                s[i][j] = 0.5 * (a + b);
                s[j][i] = s[i][j];
            }
        }
        RealMatrix sym = MatrixUtils.createRealMatrix(s);
        if (scale > 0) {
            double[] ev = new EigenDecompositionSymmetric(sym).getEigenvalues();
            double max = Math.max(ev[0], Math.max(ev[1], ev[2]));
            double min = Math.min(ev[0], Math.min(ev[1], ev[2]));
            if (min < -DEFINITENESS_TOLERANCE * max) {
                throw new InvalidCovarianceException("covariance is not positive semi-definite: it has the"
                    + " eigenvalue " + min + " m² (largest " + max + " m²)");
            }
        } else if (scale == 0 && (s[0][1] != 0 || s[0][2] != 0 || s[1][2] != 0)) {
            throw new InvalidCovarianceException("covariance has zero variances but non-zero covariances");
        }
        return sym;
    }

    /** (M + Mᵀ)/2: removes the rounding asymmetry a product R C Rᵀ leaves. */
    static RealMatrix symmetrised(RealMatrix m) {
        double[][] s = new double[3][3];
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                s[i][j] = i == j ? m.getEntry(i, i) : 0.5 * (m.getEntry(i, j) + m.getEntry(j, i));
            }
        }
        return MatrixUtils.createRealMatrix(s);
    }
}
