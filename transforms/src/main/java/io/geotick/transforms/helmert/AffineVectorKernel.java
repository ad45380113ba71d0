package io.geotick.transforms.helmert;

import jdk.incubator.vector.DoubleVector;
import jdk.incubator.vector.VectorMask;
import jdk.incubator.vector.VectorOperators;
import jdk.incubator.vector.VectorSpecies;

/**
 * The array form of {@link AffineGeocentric}, X' = X + (D·X + T), on blocks of {@link #LANES} points in vector
 * lanes (the JDK's incubating vector API; loaded only when {@link io.geotick.geodesy.simd.Simd} says so).
 * Immutable and thread-safe.
 *
 * <p>Why it needs no shuffles: in the interleaved array (x₀ y₀ z₀ x₁ …) coordinate r of a point sits at
 * element i with r = i mod 3, and its point's x, y, z at i − r, i − r + 1, i − r + 2. So element i of the
 * result is in[i] + Σₛ C_s(i)·in[i + s] + T(i) over the shifts s = −2..2, with C_s(i) = D[r][r + s] where
 * that is a matrix entry and 0 elsewhere: five plain vector loads at shifted offsets, and coefficient
 * vectors whose pattern repeats every three vectors. The sum is nested as the scalar code nests it
 * (the z term innermost, then y, then x; the zero terms add exact zeros), so the results are the scalar
 * ones bit for bit (up to the sign of an exactly zero coordinate).
 *
 * <p>A block whose results are not all finite (a non-finite or huge input point, or one next to the block),
 * and the first and last blocks of an array when the shifted loads would reach past its ends, are left to
 * the scalar code, which also raises the errors.
 */
final class AffineVectorKernel {
    static final VectorSpecies<Double> S = DoubleVector.SPECIES_PREFERRED;
    /** Points per block: three vectors of coordinates. */
    static final int LANES = S.length();

    /**
     * Per output vector v = 0..2 of a block: the coefficient vectors C₋₂ … C₂ and the translation vector, each
     * LANES doubles, in that order.
     */
    private final double[] coefficients = new double[3 * 6 * LANES];
    private final AffineGeocentric scalar;

    /** The kernel for {@code f}'s matrix and translation. */
    AffineVectorKernel(AffineGeocentric f) {
        this.scalar = f;
        double[][] d = f.smallPart();
        double[] t = f.translation();
        for (int v = 0; v < 3; v++) {
            for (int lane = 0; lane < LANES; lane++) {
                int r = (v * LANES + lane) % 3;
                for (int s = -2; s <= 2; s++) {
                    int c = r + s;
                    coefficients[(v * 6 + s + 2) * LANES + lane] = c >= 0 && c <= 2 ? d[r][c] : 0.0;
                }
                coefficients[(v * 6 + 5) * LANES + lane] = t[r];
            }
        }
    }

    private DoubleVector coefficient(int v, int k) {
        return DoubleVector.fromArray(S, coefficients, (v * 6 + k) * LANES);
    }

    /** Same contract as {@link AffineGeocentric#apply(double[], int, double[], int, int)}. */
    void apply(double[] in, int inOffset, double[] out, int outOffset, int count) {
        // The coefficients as loop-invariant vectors; the block is written out in full (no inner loop or
        // helper taking vectors), so that the JIT keeps everything in registers.
        DoubleVector a0m2 = coefficient(0, 0);
        DoubleVector a0m1 = coefficient(0, 1);
        DoubleVector a0c0 = coefficient(0, 2);
        DoubleVector a0p1 = coefficient(0, 3);
        DoubleVector a0p2 = coefficient(0, 4);
        DoubleVector a0t = coefficient(0, 5);
        DoubleVector a1m2 = coefficient(1, 0);
        DoubleVector a1m1 = coefficient(1, 1);
        DoubleVector a1c0 = coefficient(1, 2);
        DoubleVector a1p1 = coefficient(1, 3);
        DoubleVector a1p2 = coefficient(1, 4);
        DoubleVector a1t = coefficient(1, 5);
        DoubleVector a2m2 = coefficient(2, 0);
        DoubleVector a2m1 = coefficient(2, 1);
        DoubleVector a2c0 = coefficient(2, 2);
        DoubleVector a2p1 = coefficient(2, 3);
        DoubleVector a2p2 = coefficient(2, 4);
        DoubleVector a2t = coefficient(2, 5);
        int i = 0;
        for (; i + LANES <= count; i += LANES) {
            int e = inOffset + 3 * i;
            if (e < 2 || e + 3 * LANES + 2 > in.length) {
                scalar.applyScalar(in, inOffset, out, outOffset, i, i + LANES);
                continue;
            }
            // Vector v covers elements e + v·LANES …; inner to outer: shifts +2, +1, 0, −1, −2, then + X.
            DoubleVector x0 = DoubleVector.fromArray(S, in, e);
            DoubleVector r0 = x0.add(DoubleVector.fromArray(S, in, e - 2).fma(a0m2,
                DoubleVector.fromArray(S, in, e - 1).fma(a0m1, x0.fma(a0c0,
                    DoubleVector.fromArray(S, in, e + 1).fma(a0p1,
                        DoubleVector.fromArray(S, in, e + 2).fma(a0p2, a0t))))));
            int e1 = e + LANES;
            DoubleVector x1 = DoubleVector.fromArray(S, in, e1);
            DoubleVector r1 = x1.add(DoubleVector.fromArray(S, in, e1 - 2).fma(a1m2,
                DoubleVector.fromArray(S, in, e1 - 1).fma(a1m1, x1.fma(a1c0,
                    DoubleVector.fromArray(S, in, e1 + 1).fma(a1p1,
                        DoubleVector.fromArray(S, in, e1 + 2).fma(a1p2, a1t))))));
            int e2 = e + 2 * LANES;
            DoubleVector x2 = DoubleVector.fromArray(S, in, e2);
            DoubleVector r2 = x2.add(DoubleVector.fromArray(S, in, e2 - 2).fma(a2m2,
                DoubleVector.fromArray(S, in, e2 - 1).fma(a2m1, x2.fma(a2c0,
                    DoubleVector.fromArray(S, in, e2 + 1).fma(a2p1,
                        DoubleVector.fromArray(S, in, e2 + 2).fma(a2p2, a2t))))));
            // Finite results only, else the scalar code takes the block: a NaN or infinity in any lane makes
            // the sum non-finite (so does an overflow of the sum of finite values, which only sends a block of
            // huge coordinates to the scalar code for nothing), and NaN fails the comparison.
            VectorMask<Double> finite = r0.add(r1).add(r2).abs().compare(VectorOperators.LE, Double.MAX_VALUE);
            if (!finite.allTrue()) {
                scalar.applyScalar(in, inOffset, out, outOffset, i, i + LANES);
                continue;
            }
            int o = outOffset + 3 * i;
            r0.intoArray(out, o);
            r1.intoArray(out, o + LANES);
            r2.intoArray(out, o + 2 * LANES);
        }
        scalar.applyScalar(in, inOffset, out, outOffset, i, count);
    }
}
