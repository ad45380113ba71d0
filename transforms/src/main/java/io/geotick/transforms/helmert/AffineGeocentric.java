package io.geotick.transforms.helmert;

import io.geotick.geodesy.InvalidCoordinateException;
import io.geotick.geodesy.position.EcefPosition;
import io.geotick.geodesy.simd.Simd;
import java.lang.invoke.MethodHandle;
import java.lang.invoke.MethodHandles;
import java.util.Objects;
import org.hipparchus.linear.LUDecomposition;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.RealMatrix;

/**
 * X' = X + (D·X + T): the common kernel of every Helmert-type transformation. D = M·R − I holds only the
 * small part of the matrix, so that the product never rounds a 6.4e6 m coordinate against a factor near 1:
 * the result is within about one ulp of the coordinates (≈ 1e-9 m) of the exact value of the formula.
 * The small part is evaluated as nested fused multiply-adds, fma(d₀, x, fma(d₁, y, fma(d₂, z, t))), which
 * rounds once per term instead of twice and is about 10 % faster in bulk than separate products and sums.
 */
final class AffineGeocentric implements GeocentricTransform {
    private final double d00, d01, d02, d10, d11, d12, d20, d21, d22;
    private final double t0, t1, t2;
    private final String description;
    private final GeocentricTransform inverseOf;
    /** The SIMD kernel's constructor when {@link Simd#enabled()}, null otherwise. */
    private static final MethodHandle VECTOR_KERNEL = Simd.kernelConstructor(MethodHandles.lookup(),
        "io.geotick.transforms.helmert.AffineVectorKernel", AffineGeocentric.class).orElse(null);
    /** The array kernel in vector lanes when {@link Simd#enabled()}; null otherwise. */
    private final AffineVectorKernel vectorKernel;

    AffineGeocentric(double[][] d, double[] t, String description, GeocentricTransform inverseOf) {
        d00 = d[0][0];
        d01 = d[0][1];
        d02 = d[0][2];
        d10 = d[1][0];
        d11 = d[1][1];
        d12 = d[1][2];
        d20 = d[2][0];
        d21 = d[2][1];
        d22 = d[2][2];
        t0 = t[0];
        t1 = t[1];
        t2 = t[2];
        this.description = description;
        this.inverseOf = inverseOf;
        // The cast only runs with the kernels on: the kernel's class needs the vector module.
        this.vectorKernel = VECTOR_KERNEL == null ? null
            : (AffineVectorKernel) Simd.newKernel(VECTOR_KERNEL, this);
    }

    double[][] smallPart() {
        return new double[][] {{d00, d01, d02}, {d10, d11, d12}, {d20, d21, d22}};
    }

    double[] translation() {
        return new double[] {t0, t1, t2};
    }

    /**
     * The exact inverse X = A⁻¹(X' − T) with A = I + D, written in the same form: D' = A⁻¹ − I = −D·A⁻¹
     * (formed as a product so that it keeps full relative precision) and T' = −A⁻¹·T. The 3×3 inverse is
     * taken with Hipparchus's LU decomposition.
     */
    static AffineGeocentric inverseOf(AffineGeocentric f, String description, GeocentricTransform original) {
        RealMatrix dm = MatrixUtils.createRealMatrix(f.smallPart());
        RealMatrix a = MatrixUtils.createRealIdentityMatrix(3).add(dm);
        RealMatrix ai = new LUDecomposition(a).getSolver().getInverse();
        RealMatrix di = dm.multiply(ai).scalarMultiply(-1);
        double[] ti = ai.operate(f.translation());
        for (int i = 0; i < 3; i++) {
            ti[i] = -ti[i];
        }
        return new AffineGeocentric(di.getData(), ti, description, original);
    }

    @Override
    public EcefPosition apply(EcefPosition s) {
        Objects.requireNonNull(s, "source");
        double x = s.x();
        double y = s.y();
        double z = s.z();
        return new EcefPosition(x + Math.fma(d00, x, Math.fma(d01, y, Math.fma(d02, z, t0))),
            y + Math.fma(d10, x, Math.fma(d11, y, Math.fma(d12, z, t1))),
            z + Math.fma(d20, x, Math.fma(d21, y, Math.fma(d22, z, t2))));
    }

    /**
     * {@inheritDoc} With the SIMD kernels on ({@link Simd}), blocks of points are transformed in vector lanes,
     * with the same results bit for bit.
     */
    @Override
    public void apply(double[] in, int inOffset, double[] out, int outOffset, int count) {
        Objects.checkFromIndexSize(inOffset, 3 * count, in.length);
        Objects.checkFromIndexSize(outOffset, 3 * count, out.length);
        if (vectorKernel != null) {
            vectorKernel.apply(in, inOffset, out, outOffset, count);
        } else {
            applyScalar(in, inOffset, out, outOffset, 0, count);
        }
    }

    /** The scalar array form for points {@code from} (inclusive) to {@code to} (exclusive). */
    void applyScalar(double[] in, int inOffset, double[] out, int outOffset, int from, int to) {
        for (int i = from; i < to; i++) {
            int k = inOffset + 3 * i;
            double x = in[k];
            double y = in[k + 1];
            double z = in[k + 2];
            // One branch for all three: v·0 is ±0 for finite v and NaN for NaN or ±∞.
            if (!Double.isFinite(x * 0 + y * 0 + z * 0)) {
                throw new InvalidCoordinateException("point " + i + ": (" + x + ", " + y + ", " + z
                    + ") m is not a finite ECEF position");
            }
            int o = outOffset + 3 * i;
            out[o] = x + Math.fma(d00, x, Math.fma(d01, y, Math.fma(d02, z, t0)));
            out[o + 1] = y + Math.fma(d10, x, Math.fma(d11, y, Math.fma(d12, z, t1)));
            out[o + 2] = z + Math.fma(d20, x, Math.fma(d21, y, Math.fma(d22, z, t2)));
        }
    }

    @Override
    public GeocentricTransform inverse() {
        return inverseOf != null ? inverseOf : inverseOf(this, "inverse of " + description, this);
    }

    @Override
    public String description() {
        return description;
    }

    @Override
    public String toString() {
        return description;
    }
}
