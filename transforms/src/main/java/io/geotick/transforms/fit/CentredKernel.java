package io.geotick.transforms.fit;

import java.util.Objects;
import org.hipparchus.linear.LUDecomposition;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.RealMatrix;

/** p' = oc + L·(p − ic), the arithmetic shared by every site transform. Immutable. */
final class CentredKernel implements SiteTransform {
    private final SiteModelKind kind;
    private final boolean threeD;
    private final double ic0, ic1, ic2, oc0, oc1, oc2;
    private final double l00, l01, l02, l10, l11, l12, l20, l21, l22;
    private final String description;
    /** The transform this one is the inverse of, or null for a forward kernel. */
    private final SiteTransform inverseOf;

    CentredKernel(SiteModelKind kind, double[] ic, double[] oc, double[][] l, String description,
            SiteTransform inverseOf) {
        this.kind = kind;
        this.threeD = kind.dimension() == 3;
        ic0 = ic[0];
        ic1 = ic[1];
        ic2 = threeD ? ic[2] : 0;
        oc0 = oc[0];
        oc1 = oc[1];
        oc2 = threeD ? oc[2] : 0;
        l00 = l[0][0];
        l01 = l[0][1];
        l10 = l[1][0];
        l11 = l[1][1];
        l02 = threeD ? l[0][2] : 0;
        l12 = threeD ? l[1][2] : 0;
        l20 = threeD ? l[2][0] : 0;
        l21 = threeD ? l[2][1] : 0;
        l22 = threeD ? l[2][2] : 1;
        this.description = description;
        this.inverseOf = inverseOf;
    }

    /** The matrix L (2×2 or 3×3), a copy. */
    double[][] matrix() {
        return threeD ? new double[][] {{l00, l01, l02}, {l10, l11, l12}, {l20, l21, l22}}
            : new double[][] {{l00, l01}, {l10, l11}};
    }

    /**
     * The inverse p = ic + L⁻¹·(p' − oc); L⁻¹ by Hipparchus's LU decomposition.
     */
    CentredKernel inverted(SiteTransform original) {
        RealMatrix li = new LUDecomposition(MatrixUtils.createRealMatrix(matrix())).getSolver().getInverse();
        double[] ic = threeD ? new double[] {ic0, ic1, ic2} : new double[] {ic0, ic1};
        double[] oc = threeD ? new double[] {oc0, oc1, oc2} : new double[] {oc0, oc1};
        return new CentredKernel(kind, oc, ic, li.getData(), "inverse of " + original.description(), original);
    }

    @Override
    public SiteModelKind kind() {
        return kind;
    }

    @Override
    public SitePoint apply(double x, double y) {
        if (threeD) {
            throw new IllegalArgumentException("the " + kind.id() + " model transforms 3D points: give z");
        }
        check(x, y, 0, -1);
        double dx = x - ic0;
        double dy = y - ic1;
        return new SitePoint(oc0 + (l00 * dx + l01 * dy), oc1 + (l10 * dx + l11 * dy), 0);
    }

    @Override
    public SitePoint apply(double x, double y, double z) {
        check(x, y, z, -1);
        double dx = x - ic0;
        double dy = y - ic1;
        if (!threeD) {
            return new SitePoint(oc0 + (l00 * dx + l01 * dy), oc1 + (l10 * dx + l11 * dy), z);
        }
        double dz = z - ic2;
        return new SitePoint(oc0 + (l00 * dx + l01 * dy + l02 * dz), oc1 + (l10 * dx + l11 * dy + l12 * dz),
            oc2 + (l20 * dx + l21 * dy + l22 * dz));
    }

    @Override
    public void apply(double[] in, int inOffset, double[] out, int outOffset, int count) {
        Objects.checkFromIndexSize(inOffset, 3 * count, in.length);
        Objects.checkFromIndexSize(outOffset, 3 * count, out.length);
        for (int i = 0; i < count; i++) {
            int k = inOffset + 3 * i;
            double x = in[k];
            double y = in[k + 1];
            double z = in[k + 2];
            check(x, y, z, i);
            double dx = x - ic0;
            double dy = y - ic1;
            int o = outOffset + 3 * i;
            if (threeD) {
                double dz = z - ic2;
                out[o] = oc0 + (l00 * dx + l01 * dy + l02 * dz);
                out[o + 1] = oc1 + (l10 * dx + l11 * dy + l12 * dz);
                out[o + 2] = oc2 + (l20 * dx + l21 * dy + l22 * dz);
            } else {
                out[o] = oc0 + (l00 * dx + l01 * dy);
                out[o + 1] = oc1 + (l10 * dx + l11 * dy);
                out[o + 2] = z;
            }
        }
    }

    private static void check(double x, double y, double z, int index) {
        if (!Double.isFinite(x) || !Double.isFinite(y) || !Double.isFinite(z)) {
            throw new IllegalArgumentException((index >= 0 ? "point " + index + ": " : "") + "coordinates ("
                + x + ", " + y + ", " + z + ") are not all finite numbers");
        }
    }

    @Override
    public SiteTransform inverse() {
        return inverseOf != null ? inverseOf : inverted(this);
    }

    @Override
    public String description() {
        return description;
    }
}
