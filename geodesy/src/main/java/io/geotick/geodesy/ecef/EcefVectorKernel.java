package io.geotick.geodesy.ecef;

import jdk.incubator.vector.DoubleVector;
import jdk.incubator.vector.VectorMask;
import jdk.incubator.vector.VectorOperators;
import jdk.incubator.vector.VectorSpecies;

/**
 * The array conversions of {@link EcefConverter} on blocks of {@link #LANES} points at once, one point per
 * vector lane (the JDK's incubating vector API; loaded only when {@link io.geotick.geodesy.simd.Simd} says
 * so). Immutable and thread-safe; the scratch columns are per thread.
 *
 * <p><b>Forward</b> (geodetic → ECEF): {@code DegreeTrig.sinCos} and the closed form, operation for
 * operation, so the results are the scalar ones bit for bit.
 *
 * <p><b>Inverse</b> (ECEF → geodetic): per lane, the scalar method's common path, operation for operation:
 * the double-double p = √(x² + y²), Bowring's start, one Newton step on the normal condition (refined to
 * Halley's order when the step lies between 1e-9 and 1e-6 rad) and the compensated height, so the height is
 * bit for bit the scalar one. The two arc tangents use a table-free reduction suited to lanes (see
 * {@link #atanStage}), within half an ulp plus 5e-18° (the scalar table method: half an ulp plus 1.2e-16°),
 * so latitude and longitude agree with the scalar results or, for 0.6 % of them, differ by about an ulp
 * (asserted in the tests, with the position bound of the reference tests).
 *
 * <p>A block with any point off the common path (invalid input; for the inverse also a point on the polar
 * axis or in the equatorial plane, within the evolute's bounding box, or needing a second Newton step) is
 * refused before anything of it is written, and the caller converts it with the scalar code, which also
 * raises the errors.
 */
final class EcefVectorKernel {
    static final VectorSpecies<Double> S = DoubleVector.SPECIES_PREFERRED;
    /** Points per block. */
    static final int LANES = S.length();

    /** Points per chunk: the scratch columns hold one chunk (a multiple of any lane count up to 64). */
    static final int CHUNK = 256;
    // Scratch columns, each CHUNK doubles. In: the chunk's three coordinates (x, y, z or φ, λ, h). Out: the
    // three results (φ, λ, h or x, y, z). Between: the inverse's Newton results, the forward's sines and
    // cosines. (This order measured a fifth faster for the inverse than putting the outputs first.)
    private static final int IN_0 = 0;
    private static final int IN_1 = 1;
    private static final int IN_2 = 2;
    private static final int S_ = 3;
    private static final int C_ = 4;
    private static final int DELTA = 5;
    private static final int OUT_2 = 6;
    private static final int OUT_0 = 7;
    private static final int OUT_1 = 8;
    private static final int ZERO = 9;
    private static final int SIN_LON = 3;
    private static final int COS_LON = 4;
    private static final int SIN_LAT = 5;
    private static final int COS_LAT = 10;
    private static final int COLUMNS = 11;
    /** Per thread: the columns, and per block whether the lanes took the common path. */
    private static final ThreadLocal<Scratch> SCRATCH = ThreadLocal.withInitial(Scratch::new);

    private static final class Scratch {
        final double[] columns = new double[COLUMNS * CHUNK];
        final boolean[] blockDone = new boolean[CHUNK / LANES];
    }

    /** 1.5·2⁵²: x + ROUNDER − ROUNDER is x rounded to an integer, half to even, for |x| < 2⁵¹. */
    private static final double ROUNDER = 0x1.8p52;
    /**
     * π/180 as a double-double, and the Taylor coefficients of sin and cos: the values of {@code DegreeTrig},
     * repeated here because the lanes must reproduce its results bit for bit (asserted in
     * EcefVectorKernelTest).
     */
    private static final double DEG_HI = Math.PI / 180.0;
    private static final double DEG_LO = 2.9486522708701687e-19;
    private static final double S3 = -1.0 / 6;
    private static final double S5 = 1.0 / 120;
    private static final double S7 = -1.0 / 5040;
    private static final double S9 = 1.0 / 362880;
    private static final double S11 = -1.0 / 39916800;
    private static final double S13 = 1.0 / 6227020800.0;
    private static final double S15 = -1.0 / 1307674368000.0;
    private static final double S17 = 1.0 / 355687428096000.0;
    private static final double C4 = 1.0 / 24;
    private static final double C6 = -1.0 / 720;
    private static final double C8 = 1.0 / 40320;
    private static final double C10 = -1.0 / 3628800;
    private static final double C12 = 1.0 / 479001600;
    private static final double C14 = -1.0 / 87178291200.0;
    private static final double C16 = 1.0 / 20922789888000.0;

    /** 180/π rounded to double, and its low part. */
    private static final double RAD_HI = 180.0 / Math.PI;
    private static final double RAD_LO = -1.9878495670576283e-15;
    /**
     * atan(k/8) in degrees for k = 1..8 as a double-double: 60-digit values rounded to double (mpmath); the
     * same values as the rows k/8 of the scalar table in {@code DegreeTrig}.
     */
    private static final double ATAN1_HI = 7.125016348901798;
    private static final double ATAN1_LO = -1.2948639595014213e-16;
    private static final double ATAN2_HI = 14.036243467926479;
    private static final double ATAN2_LO = -1.178545638282857e-16;
    private static final double ATAN3_HI = 20.556045219583464;
    private static final double ATAN3_LO = 7.735753643362621e-16;
    private static final double ATAN4_HI = 26.56505117707799;
    private static final double ATAN4_LO = -6.673432494950659e-16;
    private static final double ATAN5_HI = 32.005383208083494;
    private static final double ATAN5_LO = 1.8761647814886433e-15;
    private static final double ATAN6_HI = 36.86989764584402;
    private static final double ATAN6_LO = 1.3346864989901319e-15;
    private static final double ATAN7_HI = 41.18592516570965;
    private static final double ATAN7_LO = -2.0942594695766676e-15;
    private static final double ATAN8_HI = 45.0;
    private static final double ATAN8_LO = 0.0;
    /**
     * Row thresholds: row k serves num/den in (T_k, T_{k+1}], T_j = (2j − 1)/16, except T_1, a little above
     * 1/16, so that num ≥ (k/8)·den/2 in every row k ≥ 1 (keeping num − fl((k/8)·den) exact by Sterbenz's
     * lemma) while the reduced argument stays within |t| ≤ 0.0626.
     */
    private static final double T1 = 0.0626;
    private static final double T2 = 3.0 / 16;
    private static final double T3 = 5.0 / 16;
    private static final double T4 = 7.0 / 16;
    private static final double T5 = 9.0 / 16;
    private static final double T6 = 11.0 / 16;
    private static final double T7 = 13.0 / 16;
    private static final double T8 = 15.0 / 16;
    /** (atan t − t)/t³ = Σ A_j t^{2j}, A_j = (−1)^{j+1}/(2j + 3), j = 0..6; first omitted term below 4e-21·t. */
    private static final double A0 = -1.0 / 3;
    private static final double A1 = 1.0 / 5;
    private static final double A2 = -1.0 / 7;
    private static final double A3 = 1.0 / 9;
    private static final double A4 = -1.0 / 11;
    private static final double A5 = 1.0 / 13;
    private static final double A6 = -1.0 / 15;

    private final double a;
    private final double e2;
    private final double evoluteP;
    private final double evoluteZ;
    private final double e2a;
    private final double ep2b;
    private final double bOverA2;
    private final double e2aBOverA3;
    private final double threeE2a;
    private final double oneMinusE2;
    private final EcefConverter scalar;

    /** The kernel for {@code converter}'s ellipsoid, with the converter's own constants. */
    EcefVectorKernel(EcefConverter converter) {
        this.a = converter.a;
        this.e2 = converter.e2;
        this.evoluteP = converter.evoluteP;
        this.evoluteZ = converter.evoluteZ;
        this.e2a = converter.e2a;
        this.ep2b = converter.ep2b;
        this.bOverA2 = converter.bOverA2;
        this.e2aBOverA3 = converter.e2aBOverA3;
        this.threeE2a = 3 * converter.e2a;
        this.oneMinusE2 = converter.oneMinusE2;
        this.scalar = converter;
    }

    /**
     * The array inverse of {@link EcefConverter#toGeodetic(double[], int, double[], int, int)}, same contract:
     * chunk by chunk, the coordinates are copied into columns, converted block by block in lanes (stages
     * {@link #newtonStage}, then {@link #atanStage} for latitude and longitude, each a loop small enough for
     * the JIT to compile with every vector in registers), and written back interleaved; a block refused by
     * the common path, and the last points short of a block, go through the converter's scalar code.
     */
    void toGeodetic(double[] in, int inOffset, double[] out, int outOffset, int count) {
        run(in, inOffset, out, outOffset, count, true);
    }

    /**
     * The array forward of {@link EcefConverter#toEcef(double[], int, double[], int, int)}, same contract and
     * bit for bit the same results: as {@link #toGeodetic}, with the stages {@link #sinCosStage} (longitude,
     * then latitude) and {@link #forwardStage}.
     */
    void toEcef(double[] in, int inOffset, double[] out, int outOffset, int count) {
        run(in, inOffset, out, outOffset, count, false);
    }

    private void run(double[] in, int inOffset, double[] out, int outOffset, int count, boolean inverse) {
        Scratch scratch = SCRATCH.get();
        double[] col = scratch.columns;
        int done = 0;
        while (count - done >= LANES) {
            int m = Math.min(CHUNK, (count - done) / LANES * LANES);
            int base = inOffset + 3 * done;
            for (int i = 0; i < m; i++) {
                col[IN_0 * CHUNK + i] = in[base + 3 * i];
                col[IN_1 * CHUNK + i] = in[base + 3 * i + 1];
                col[IN_2 * CHUNK + i] = in[base + 3 * i + 2];
            }
            if (inverse) {
                newtonStage(col, scratch.blockDone, m);
                atanStage(col, S_ * CHUNK, col, C_ * CHUNK, col, DELTA * CHUNK, col, OUT_0 * CHUNK, m);
                atanStage(col, IN_1 * CHUNK, col, IN_0 * CHUNK, col, ZERO * CHUNK, col, OUT_1 * CHUNK, m);
                // The latitude takes the sign of z, as Math.copySign does in the scalar code.
                for (int i = 0; i < m; i++) {
                    col[OUT_0 * CHUNK + i] = Math.copySign(col[OUT_0 * CHUNK + i], col[IN_2 * CHUNK + i]);
                }
            } else {
                sinCosStage(col, IN_1 * CHUNK, SIN_LON * CHUNK, COS_LON * CHUNK, m);
                sinCosStage(col, IN_0 * CHUNK, SIN_LAT * CHUNK, COS_LAT * CHUNK, m);
                forwardStage(col, scratch.blockDone, m);
            }
            for (int b = 0; b < m; b += LANES) {
                int first = done + b;
                if (scratch.blockDone[b / LANES]) {
                    for (int i = b; i < b + LANES; i++) {
                        int k = outOffset + 3 * (done + i);
                        out[k] = col[OUT_0 * CHUNK + i];
                        out[k + 1] = col[OUT_1 * CHUNK + i];
                        out[k + 2] = col[OUT_2 * CHUNK + i];
                    }
                } else if (inverse) {
                    scalar.toGeodeticScalar(in, inOffset, out, outOffset, first, first + LANES);
                } else {
                    scalar.toEcefScalar(in, inOffset, out, outOffset, first, first + LANES);
                }
            }
            done += m;
        }
        if (inverse) {
            scalar.toGeodeticScalar(in, inOffset, out, outOffset, done, count);
        } else {
            scalar.toEcefScalar(in, inOffset, out, outOffset, done, count);
        }
    }

    /**
     * For the first {@code m} points of the columns: p, Bowring's start, one Newton step (or Halley's) and the
     * height, as in the scalar code; writes (s, c), δ and h to their columns and, per block, whether every
     * lane took the common path.
     */
    private void newtonStage(double[] col, boolean[] blockDone, int m) {
        // One loop with the whole block inline: a vector passed to a method the JIT does not inline would
        // be boxed, which costs more than the SIMD gains.
        for (int i = 0; i < m; i += LANES) {
            DoubleVector x = DoubleVector.fromArray(S, col, IN_0 * CHUNK + i);
            DoubleVector y = DoubleVector.fromArray(S, col, IN_1 * CHUNK + i);
            DoubleVector z = DoubleVector.fromArray(S, col, IN_2 * CHUNK + i);
            DoubleVector ax = x.abs();
            DoubleVector ay = y.abs();
            DoubleVector az = z.abs();
            // The common path: finite and within reach, off the polar axis (max(|x|, |y|) is also in the arc
            // tangent's direct range) and the equatorial plane, outside the evolute's bounding box.
            VectorMask<Double> common = ax.compare(VectorOperators.LE, EcefConverter.MAX_COORDINATE)
                .and(ay.compare(VectorOperators.LE, EcefConverter.MAX_COORDINATE))
                .and(az.compare(VectorOperators.LE, EcefConverter.MAX_COORDINATE))
                .and(ax.max(ay).compare(VectorOperators.GT, 0x1p-1000))
                .and(az.compare(VectorOperators.GT, 0.0));

            // p = √(x² + y²) as a double-double (ph + pl), as in the scalar code.
            DoubleVector xx = x.mul(x);
            DoubleVector yy = y.mul(y);
            DoubleVector s2 = xx.add(yy);
            DoubleVector bv = s2.sub(xx);
            DoubleVector s2l = xx.sub(s2.sub(bv)).add(yy.sub(bv)).add(x.fma(x, xx.neg())).add(y.fma(y, yy.neg()));
            DoubleVector ph = s2.sqrt();
            common = common.and(ph.compare(VectorOperators.GE, evoluteP).or(az.compare(VectorOperators.GE, evoluteZ)));
            DoubleVector pl = ph.neg().fma(ph, s2).add(s2l).div(ph.mul(2.0));

            // Bowring's start as an unnormalised (c, s).
            DoubleVector zz = az.mul(az);
            DoubleVector ru2 = s2.fma(DoubleVector.broadcast(S, bOverA2), zz);
            DoubleVector ru3 = ru2.mul(ru2.sqrt());
            DoubleVector s = az.mul(zz.fma(DoubleVector.broadcast(S, ep2b), ru3));
            DoubleVector c = ph.mul(s2.fma(DoubleVector.broadcast(S, -e2aBOverA3), ru3));

            // One Newton step δ = −GQ/G'Q.
            DoubleVector cc = c.mul(c);
            DoubleVector ss = s.mul(s);
            DoubleVector n2 = cc.add(ss);
            DoubleVector q2 = n2.sub(ss.mul(e2));
            DoubleVector qh = q2.sqrt();
            DoubleVector iq2 = DoubleVector.broadcast(S, 1.0).div(q2);
            DoubleVector sc = s.mul(c);
            DoubleVector d = cc.sub(ss);
            DoubleVector zc = az.mul(c);
            DoubleVector zcl = az.fma(c, zc.neg());
            DoubleVector psMinusZc = ph.fma(s, zc.neg()).sub(zcl).add(pl.mul(s));
            DoubleVector gq = qh.mul(psMinusZc).sub(sc.mul(e2a));
            DoubleVector gpq = qh.mul(ph.mul(c).add(az.mul(s))).sub(d.add(sc.mul(e2).mul(sc).mul(iq2)).mul(e2a));
            DoubleVector delta = gq.neg().div(gpq);
            DoubleVector ad = delta.abs();
            common = common.and(gpq.compare(VectorOperators.GT, 0.0)).and(c.compare(VectorOperators.GT, 0.0))
                .and(s.compare(VectorOperators.GT, 0.0)).and(ad.compare(VectorOperators.LT, 1e-6));
            if (!common.allTrue()) {
                blockDone[i / LANES] = false;
                continue;
            }
            // Steps between 1e-9 and 1e-6 rad: Halley's refinement and the height term of the unapplied step.
            DoubleVector eu = sc.mul(e2).mul(iq2);
            DoubleVector gppq = sc.mul(threeE2a)
                .mul(DoubleVector.broadcast(S, 1.0).sub(d.mul(e2).mul(iq2)).sub(eu.mul(eu))).sub(gq);
            DoubleVector deltaH = delta.sub(delta.mul(0.5).mul(delta).mul(gppq).div(gpq));
            DoubleVector hStepH = deltaH.mul(0.5).mul(deltaH).mul(gpq).mul(qh).mul(iq2);
            VectorMask<Double> small = ad.compare(VectorOperators.LT, 1e-9);
            delta = deltaH.blend(delta, small);
            DoubleVector hStep = hStepH.blend(0.0, small);

            // Height h = (p c + z s − a Q)/|(c, s)| in double-double, as in the scalar code.
            DoubleVector ccl = c.fma(c, cc.neg());
            DoubleVector ssl = s.fma(s, ss.neg());
            DoubleVector nv = n2.sub(cc);
            DoubleVector n2l = cc.sub(n2.sub(nv)).add(ss.sub(nv)).add(ccl).add(ssl);
            DoubleVector q = ss.mul(e2);
            DoubleVector q2l = n2.sub(q2).sub(q).add(n2l).sub(ssl.mul(e2));
            DoubleVector ql = qh.neg().fma(qh, q2).add(q2l).mul(qh.mul(0.5).mul(iq2));
            DoubleVector pc = ph.mul(c);
            DoubleVector pcl = ph.fma(c, pc.neg()).add(pl.mul(c));
            DoubleVector zs = az.mul(s);
            DoubleVector zsl = az.fma(s, zs.neg());
            DoubleVector t = pc.add(zs);
            DoubleVector tv = t.sub(pc);
            DoubleVector tl = pc.sub(t.sub(tv)).add(zs.sub(tv)).add(pcl).add(zsl);
            DoubleVector aq = qh.mul(a);
            DoubleVector aql = qh.fma(DoubleVector.broadcast(S, a), aq.neg()).add(ql.mul(a));
            DoubleVector hd = t.sub(aq);
            DoubleVector hv = hd.sub(t);
            DoubleVector hdl = t.sub(hd.sub(hv)).add(aq.neg().sub(hv)).add(tl.sub(aql));
            DoubleVector rh = n2.sqrt();
            DoubleVector ir = DoubleVector.broadcast(S, 1.0).div(rh);
            DoubleVector rl = rh.neg().fma(rh, n2).add(n2l).mul(ir.mul(0.5));
            DoubleVector h0 = hd.mul(ir);
            DoubleVector h = h0.add(h0.neg().fma(rh, hd).add(hdl).sub(h0.mul(rl)).add(hStep).mul(ir));

            s.intoArray(col, S_ * CHUNK + i);
            c.intoArray(col, C_ * CHUNK + i);
            delta.intoArray(col, DELTA * CHUNK + i);
            h.intoArray(col, OUT_2 * CHUNK + i);
            blockDone[i / LANES] = true;
        }
    }

    /**
     * sin and cos of the degree arguments in column {@code inAt}, per lane, into {@code sinAt} and {@code cosAt}:
     * {@code DegreeTrig.sinCos}'s method operation for operation (exact reduction to [−45°, 45°], the
     * double-double radian argument, Estrin's polynomials, the branch-free quadrant), so bit for bit its
     * results. For |d| ≤ 360°, which {@link #forwardStage} checks before it uses them.
     */
    static void sinCosStage(double[] col, int inAt, int sinAt, int cosAt, int m) {
        // One loop with the whole block inline (see newtonStage).
        for (int i = 0; i < m; i += LANES) {
            DoubleVector d = DoubleVector.fromArray(S, col, inAt + i);
            // qd = rint(d/90): adding and subtracting 1.5·2⁵² rounds half to even, as Math.rint does.
            DoubleVector qd = d.mul(1.0 / 90.0).add(ROUNDER).sub(ROUNDER);
            DoubleVector r = d.sub(qd.mul(90.0));
            DoubleVector hi = r.mul(DEG_HI);
            DoubleVector lo = r.fma(DoubleVector.broadcast(S, DEG_HI), hi.neg()).add(r.mul(DEG_LO));
            DoubleVector z = hi.mul(hi);
            DoubleVector zl = hi.fma(hi, z.neg());
            DoubleVector z2 = z.mul(z);
            DoubleVector z4 = z2.mul(z2);
            DoubleVector one = DoubleVector.broadcast(S, 1.0);
            DoubleVector ps = z.fma(S17, S15).fma(z2, z.fma(S13, S11)).fma(z4, z.fma(S9, S7).fma(z2, z.fma(S5, S3)));
            DoubleVector sin = hi.add(hi.mul(z.mul(ps).add(zl.mul(S3))).add(lo.mul(one.sub(z.mul(0.5)))));
            DoubleVector pc = z2.fma(DoubleVector.broadcast(S, C16), z.fma(C14, C12))
                .fma(z4, z.fma(C10, C8).fma(z2, z.fma(C6, C4)));
            DoubleVector hz = z.mul(0.5);
            DoubleVector w = one.sub(hz);
            DoubleVector cos = w.add(one.sub(w).sub(hz).sub(zl.mul(0.5)).add(z2.mul(pc).sub(lo.mul(hi))));
            // The quadrant m = qd mod 4 (qd in −4..4): m odd swaps sine and cosine; the sine is negative for
            // m in {2, 3}, the cosine for m in {1, 2}. Products with 0 and ±1 as in the scalar code.
            VectorMask<Double> q1 = qd.compare(VectorOperators.EQ, 1.0);
            VectorMask<Double> q2 = qd.compare(VectorOperators.EQ, 2.0);
            VectorMask<Double> q3 = qd.compare(VectorOperators.EQ, 3.0);
            VectorMask<Double> qm1 = qd.compare(VectorOperators.EQ, -1.0);
            VectorMask<Double> qm2 = qd.compare(VectorOperators.EQ, -2.0);
            VectorMask<Double> qm3 = qd.compare(VectorOperators.EQ, -3.0);
            DoubleVector swap = DoubleVector.zero(S).blend(1.0, q1.or(q3).or(qm1).or(qm3));
            DoubleVector keep = one.sub(swap);
            DoubleVector sinSign = one.blend(-1.0, q2.or(q3).or(qm1).or(qm2));
            DoubleVector cosSign = one.blend(-1.0, q1.or(q2).or(qm2).or(qm3));
            sinSign.mul(sin.mul(keep).add(cos.mul(swap))).intoArray(col, sinAt + i);
            cosSign.mul(cos.mul(keep).add(sin.mul(swap))).add(0.0).intoArray(col, cosAt + i);
        }
    }

    /**
     * Geodetic → ECEF for the first {@code m} points of the columns, from the sines and cosines:
     * ν = a/√(1 − e² sin²φ), x = (ν + h) cos φ cos λ, y = (ν + h) cos φ sin λ, z = ((1 − e²)ν + h) sin φ, as
     * the scalar code evaluates them; per block, whether every lane holds a valid position
     * (φ in [−90°, 90°], λ in [−360°, 360°], h finite).
     */
    private void forwardStage(double[] col, boolean[] blockDone, int m) {
        for (int i = 0; i < m; i += LANES) {
            DoubleVector lat = DoubleVector.fromArray(S, col, IN_0 * CHUNK + i);
            DoubleVector lon = DoubleVector.fromArray(S, col, IN_1 * CHUNK + i);
            DoubleVector h = DoubleVector.fromArray(S, col, IN_2 * CHUNK + i);
            VectorMask<Double> valid = lat.compare(VectorOperators.GE, -90.0).and(lat.compare(VectorOperators.LE, 90.0))
                .and(lon.compare(VectorOperators.GE, -360.0)).and(lon.compare(VectorOperators.LE, 360.0))
                .and(h.abs().compare(VectorOperators.LE, Double.MAX_VALUE));
            if (!valid.allTrue()) {
                blockDone[i / LANES] = false;
                continue;
            }
            DoubleVector sp = DoubleVector.fromArray(S, col, SIN_LAT * CHUNK + i);
            DoubleVector cp = DoubleVector.fromArray(S, col, COS_LAT * CHUNK + i);
            DoubleVector sl = DoubleVector.fromArray(S, col, SIN_LON * CHUNK + i);
            DoubleVector cl = DoubleVector.fromArray(S, col, COS_LON * CHUNK + i);
            DoubleVector nu = DoubleVector.broadcast(S, a)
                .div(DoubleVector.broadcast(S, 1.0).sub(sp.mul(e2).mul(sp)).sqrt());
            DoubleVector r = nu.add(h).mul(cp);
            r.mul(cl).intoArray(col, OUT_0 * CHUNK + i);
            r.mul(sl).intoArray(col, OUT_1 * CHUNK + i);
            nu.mul(oneMinusE2).add(h).mul(sp).intoArray(col, OUT_2 * CHUNK + i);
            blockDone[i / LANES] = true;
        }
    }

    /**
     * atan2(y, x) + c in degrees per lane for the first {@code m} entries of the given columns, c a small
     * correction in radians; for max(|x|, |y|) in (2^-1000, 2^1000).
     *
     * <p>Method (table-free, so no gathers): fold to the first octant, num = min(|x|, |y|),
     * den = max(|x|, |y|); with r0 = k/8 an eighth within 1/16 of num/den (k counts the thresholds below
     * num/den, by comparisons), atan(num/den) = atan r0 + atan t, t = (num − r0·den)/(den + r0·num),
     * |t| ≤ 0.0626. Numerator and denominator are exact double-doubles (error-free {@code fma} products;
     * num − fl(r0·den) is exact by Sterbenz's lemma), t = th + tl with one division and an fma residual,
     * atan t = t + t³·Σⱼ₌₀..₆ (−1)ʲ⁺¹t²ʲ/(2j + 3). atan r0 in degrees comes from a nine-entry
     * double-double table selected by blends, 180/π is carried in two doubles, and the octant offset is added with
     * error-free sums, so that the only sizeable rounding is the last: within half an ulp plus 5e-18°
     * (asserted against a 30-digit reference in the tests).
     */
    static void atanStage(double[] yArray, int yOffset, double[] xArray, int xOffset, double[] correctionArray,
            int correctionOffset, double[] out, int outOffset, int m) {
        // One loop with the arc tangent inline (see newtonStage).
        for (int i = 0; i < m; i += LANES) {
            DoubleVector y = DoubleVector.fromArray(S, yArray, yOffset + i);
            DoubleVector x = DoubleVector.fromArray(S, xArray, xOffset + i);
            DoubleVector correctionRadians = DoubleVector.fromArray(S, correctionArray, correctionOffset + i);
            DoubleVector ax = x.abs();
            DoubleVector ay = y.abs();
            VectorMask<Double> swap = ay.compare(VectorOperators.GT, ax);
            DoubleVector num = ay.blend(ax, swap);
            DoubleVector den = ax.blend(ay, swap);
            VectorMask<Double> xNeg = x.compare(VectorOperators.LT, 0.0);
            VectorMask<Double> yNeg = y.compare(VectorOperators.LT, 0.0);
            // The angle is offset + sign·atan(num/den): sign (−1)^(swap + [x < 0] + [y < 0]); offset 90° if
            // swapped, else 180° if x < 0, else 0, negative when y < 0.
            DoubleVector sign = DoubleVector.broadcast(S, 1.0).blend(-1.0, swap);
            sign = sign.blend(sign.neg(), xNeg);
            sign = sign.blend(sign.neg(), yNeg);
            DoubleVector offsetUp = DoubleVector.zero(S).blend(180.0, xNeg).blend(90.0, swap);
            DoubleVector offsetDown = DoubleVector.zero(S).blend(-180.0, xNeg).blend(-90.0, swap);
            DoubleVector offset = offsetUp.blend(offsetDown, yNeg);

            // Row k by thresholds; the rows are nested, so a chain of blends picks the last row passed. Written
            // out (no loop, constants inline) so that the JIT keeps every vector and mask in registers.
            VectorMask<Double> row1 = num.compare(VectorOperators.GT, den.mul(T1));
            VectorMask<Double> row2 = num.compare(VectorOperators.GT, den.mul(T2));
            VectorMask<Double> row3 = num.compare(VectorOperators.GT, den.mul(T3));
            VectorMask<Double> row4 = num.compare(VectorOperators.GT, den.mul(T4));
            VectorMask<Double> row5 = num.compare(VectorOperators.GT, den.mul(T5));
            VectorMask<Double> row6 = num.compare(VectorOperators.GT, den.mul(T6));
            VectorMask<Double> row7 = num.compare(VectorOperators.GT, den.mul(T7));
            VectorMask<Double> row8 = num.compare(VectorOperators.GT, den.mul(T8));
            DoubleVector r0 = DoubleVector.zero(S).blend(0.125, row1).blend(0.25, row2).blend(0.375, row3)
                .blend(0.5, row4).blend(0.625, row5).blend(0.75, row6).blend(0.875, row7).blend(1.0, row8);
            DoubleVector ah = DoubleVector.zero(S)
                .blend(ATAN1_HI, row1).blend(ATAN2_HI, row2)
                .blend(ATAN3_HI, row3).blend(ATAN4_HI, row4)
                .blend(ATAN5_HI, row5).blend(ATAN6_HI, row6)
                .blend(ATAN7_HI, row7).blend(ATAN8_HI, row8);
            DoubleVector al = DoubleVector.zero(S)
                .blend(ATAN1_LO, row1).blend(ATAN2_LO, row2)
                .blend(ATAN3_LO, row3).blend(ATAN4_LO, row4)
                .blend(ATAN5_LO, row5).blend(ATAN6_LO, row6)
                .blend(ATAN7_LO, row7).blend(ATAN8_LO, row8);
            // N = num − r0·den exactly as n1 + n1l; D = den + r0·num as dh + dl; t = N/D = th + tl.
            DoubleVector ph = r0.mul(den);
            DoubleVector pl = r0.fma(den, ph.neg());
            DoubleVector nh = num.sub(ph);
            DoubleVector n1 = nh.sub(pl);
            DoubleVector n1l = nh.sub(n1).sub(pl);
            DoubleVector qh = r0.mul(num);
            DoubleVector ql = r0.fma(num, qh.neg());
            DoubleVector dh = den.add(qh);
            DoubleVector dl = den.sub(dh).add(qh).add(ql);
            DoubleVector id = DoubleVector.broadcast(S, 1.0).div(dh);
            DoubleVector th = n1.mul(id);
            DoubleVector tl = th.neg().fma(dh, n1).add(n1l).sub(th.mul(dl)).mul(id);
            // atan t − t = t³·P(t²), Estrin's scheme.
            DoubleVector u = th.mul(th);
            DoubleVector u2 = u.mul(u);
            DoubleVector p03 = u.fma(A3, A2).fma(u2, u.fma(A1, A0));
            DoubleVector p46 = u2.fma(DoubleVector.broadcast(S, A6), u.fma(A5, A4));
            DoubleVector poly = p46.fma(u2.mul(u2), p03);
            // (th + tl + th³P)·180/π = mh + ml.
            DoubleVector mh = th.mul(RAD_HI);
            DoubleVector ml = th.fma(DoubleVector.broadcast(S, RAD_HI), mh.neg())
                .add(th.mul(RAD_LO).add(th.mul(u).fma(poly, tl).mul(RAD_HI)));
            // offset + sign·(ah + mh) with exact error terms (|offset| ≥ |ah| or offset = 0; |offset + sign·ah|
            // ≥ |mh| or both are 0).
            DoubleVector sah = sign.mul(ah);
            DoubleVector smh = sign.mul(mh);
            DoubleVector s1 = offset.add(sah);
            DoubleVector s1l = offset.sub(s1).add(sah);
            DoubleVector s2 = s1.add(smh);
            DoubleVector s2l = s1.sub(s2).add(smh);
            DoubleVector lo = s1l.add(s2l).add(sign.mul(al.add(ml)));
            s2.add(lo.add(correctionRadians.mul(RAD_HI))).intoArray(out, outOffset + i);
        }
    }
}
