package io.geotick.geodesy.ecef;

import io.geotick.geodesy.InvalidCoordinateException;
import io.geotick.geodesy.angle.DegreeTrig;
import io.geotick.geodesy.ellipsoid.Ellipsoid;
import io.geotick.geodesy.position.EcefPosition;
import io.geotick.geodesy.position.GeodeticPosition;
import io.geotick.geodesy.simd.Simd;
import java.lang.invoke.MethodHandle;
import java.lang.invoke.MethodHandles;
import java.util.Objects;

/**
 * Converts between geodetic coordinates (φ, λ, h) on an ellipsoid and Earth-centred Earth-fixed Cartesian
 * coordinates (x, y, z): EPSG method 9602 (IOGP Guidance Note 7-2, §4.1.1). Immutable and thread-safe.
 *
 * <h2>Forward (geodetic → ECEF)</h2>
 * Exact closed form: ν = a/√(1 − e² sin²φ), x = (ν + h) cos φ cos λ, y = (ν + h) cos φ sin λ,
 * z = ((1 − e²)ν + h) sin φ. Sines and cosines of the degree arguments are taken with exact argument
 * reduction ({@link DegreeTrig}); the result is within a few ulps of the exact value of the formula.
 *
 * <h2>Inverse (ECEF → geodetic)</h2>
 * The foot point on the meridian ellipse is found by Newton's method on the normal condition
 * g(φ) = p sin φ − z cos φ − e² ν sin φ cos φ = 0 (p = √(x² + y²)), with (cos φ, sin φ) carried as an
 * unnormalised vector (c, s) and g, g′ written homogeneously in it, so that neither the start nor the
 * iteration needs a trigonometric call or a normalisation. The start is Bowring's (1976) formula, within
 * about 1e-12 rad of the latitude for heights up to 10 km and within 1e-6 rad for nearly all points at
 * orbit heights. A Newton step below 1e-9 rad (remaining error below 3e-20 rad), or one below 1e-6 rad
 * refined to Halley's third order (remaining error below 4e-20 rad), is the last: it is added to the arc
 * tangent of (c, s) rather than applied to the vector, so one evaluation of g usually suffices, and the
 * arc tangent is taken while g is evaluated. The residual g and the height
 * h = p cos φ + z sin φ − a√(1 − e² sin² φ) are evaluated with error-free products ({@link Math#fma}) and
 * sums so that no cancellation of Earth-radius-sized terms reaches the result; the height is corrected for
 * the unapplied step (½ g′ δ², dh/dφ being −g) where that exceeds 3e-12 m. Latitude and longitude come
 * from {@link DegreeTrig#atan2(double, double, double)}.
 * Convergence is guaranteed: outside the evolute g has exactly one zero in the quadrant of the point and
 * changes sign across it, and an iterate that would leave the quadrant, a slope of the wrong sign or an
 * overlong step hands over to bisection, from whose result Newton resumes.
 *
 * <p>Accuracy (asserted by the reference tests against a 40-digit computation on random and edge-case
 * points, heights −5,000 km to +50,000 km): the recovered (φ, λ, h), taken forward again exactly, lies
 * within 1 nm of the input, or within a few units in the last place of the coordinates where those are
 * coarser than 1 nm.
 *
 * <h2>Special points</h2>
 * <ul>
 *   <li>On the polar axis (x = y = 0) the longitude is 0 by convention, latitude ±90°.</li>
 *   <li>In the equatorial plane (z = 0) the latitude is exactly 0.</li>
 *   <li>Inside the evolute of the meridian ellipse, a region within about 43 km of the centre
 *       ((p/ae²)^{2/3} + (z/(a e²/√(1−e²)))^{2/3} &lt; 1), the nearest surface point may not be unique
 *       and the conversion throws {@link InvalidCoordinateException} naming the point; it never returns
 *       NaN.</li>
 *   <li>A non-finite coordinate, or one beyond {@link #MAX_COORDINATE} (10¹⁵ m), is an
 *       {@link InvalidCoordinateException} naming the point.</li>
 * </ul>
 */
public final class EcefConverter {
    /**
     * Largest ECEF coordinate magnitude accepted by the inverse, metres (about 6,700 astronomical units):
     * far beyond any use, and far below the ~1e154 m where squares overflow and the inverse would
     * otherwise return NaN.
     */
    public static final double MAX_COORDINATE = 1e15;
    private final Ellipsoid ellipsoid;
    final double a;
    final double e2;
    final double oneMinusE2;
    // Evolute semi-axes (astroid): a e² along the equator, a e²/√(1−e²) along the axis.
    final double evoluteP;
    final double evoluteZ;
    private final double b;
    private final double bOverA;
    final double e2a;
    final double ep2b;
    final double bOverA2;
    final double e2aBOverA3;
    private static final double DEGREES_PER_RADIAN = 180.0 / Math.PI;
    /** The SIMD kernel's constructor when {@link Simd#enabled()}, null otherwise. */
    private static final MethodHandle VECTOR_KERNEL = Simd.kernelConstructor(MethodHandles.lookup(),
        "io.geotick.geodesy.ecef.EcefVectorKernel", EcefConverter.class).orElse(null);
    /** The SIMD kernel of the array conversions, when {@link Simd#enabled()}; null otherwise. */
    private final EcefVectorKernel vectorKernel;

    private EcefConverter(Ellipsoid ellipsoid) {
        this.ellipsoid = ellipsoid;
        this.a = ellipsoid.semiMajorAxis();
        this.e2 = ellipsoid.eccentricitySquared();
        this.oneMinusE2 = 1 - e2;
        this.evoluteP = a * e2;
        this.evoluteZ = a * e2 / Math.sqrt(oneMinusE2);
        this.b = ellipsoid.semiMinorAxis();
        this.bOverA = b / a;
        this.e2a = e2 * a;
        this.ep2b = e2 / oneMinusE2 * b;
        this.bOverA2 = bOverA * bOverA;
        this.e2aBOverA3 = e2a * bOverA * bOverA * bOverA;
        // The cast only runs with the kernels on: the kernel's class needs the vector module.
        this.vectorKernel = VECTOR_KERNEL == null ? null : (EcefVectorKernel) Simd.newKernel(VECTOR_KERNEL, this);
    }

    /** A converter on the given ellipsoid. */
    public static EcefConverter of(Ellipsoid ellipsoid) {
        return new EcefConverter(Objects.requireNonNull(ellipsoid, "ellipsoid"));
    }

    /** Whether the array conversions use the SIMD kernel (for tests). */
    boolean vectorised() {
        return vectorKernel != null;
    }

    /** The ellipsoid this converter works on. */
    public Ellipsoid ellipsoid() {
        return ellipsoid;
    }

    /** Geodetic → ECEF. */
    public EcefPosition toEcef(GeodeticPosition g) {
        double[] out = new double[3];
        forward(g.latitude(), g.longitude(), g.height(), out, 0);
        return new EcefPosition(out[0], out[1], out[2]);
    }

    /**
     * ECEF → geodetic.
     *
     * @throws InvalidCoordinateException if the point lies inside the evolute (within ~43 km of the centre)
     */
    public GeodeticPosition toGeodetic(EcefPosition e) {
        if (!withinReach(e.x(), e.y(), e.z())) {
            throw beyondReach(e.x(), e.y(), e.z());
        }
        double[] out = new double[3];
        if (!inverse(e.x(), e.y(), e.z(), out, 0)) {
            throw insideEvolute(e.x(), e.y(), e.z());
        }
        return new GeodeticPosition(out[0], out[1], out[2]);
    }

    /**
     * Array forward conversion over interleaved triples: reads {@code count} points (φ°, λ°, h) from
     * {@code in} starting at {@code inOffset} and writes (x, y, z) to {@code out} from {@code outOffset}.
     * {@code in} and {@code out} may be the same array with the same offset (in-place). Allocates nothing.
     * When the SIMD kernels are on ({@link Simd}), blocks of points are converted in vector lanes, with the
     * same results bit for bit.
     *
     * @throws InvalidCoordinateException on the first invalid input, naming its index; points before it are
     *     converted, the rest are untouched
     */
    public void toEcef(double[] in, int inOffset, double[] out, int outOffset, int count) {
        checkRange(in, inOffset, out, outOffset, count);
        if (vectorKernel != null) {
            vectorKernel.toEcef(in, inOffset, out, outOffset, count);
        } else {
            toEcefScalar(in, inOffset, out, outOffset, 0, count);
        }
    }

    /** The scalar array forward of points {@code from} (inclusive) to {@code to} (exclusive). */
    void toEcefScalar(double[] in, int inOffset, double[] out, int outOffset, int from, int to) {
        for (int i = from; i < to; i++) {
            int k = inOffset + 3 * i;
            double lat = in[k];
            double lon = in[k + 1];
            double h = in[k + 2];
            if (!(lat >= -90 && lat <= 90) || !(lon >= -360 && lon <= 360) || !Double.isFinite(h)) {
                throw new InvalidCoordinateException("point " + i + ": (" + lat + "°, " + lon + "°, " + h
                    + " m) is not a valid geodetic position");
            }
            forward(lat, lon, h, out, outOffset + 3 * i);
        }
    }

    /**
     * Array inverse conversion over interleaved triples (x, y, z) → (φ°, λ°, h); same layout and in-place
     * rule as {@link #toEcef(double[], int, double[], int, int)}. Allocates nothing. When the SIMD kernels
     * are on ({@link Simd}), blocks of points are converted in vector lanes: heights are bit for bit those
     * of the scalar code, latitudes and longitudes equal them or, for 0.6 % of them, differ by about an ulp
     * (the lane arc tangent is within half an ulp plus 5e-18°, the scalar one within half an ulp plus
     * 1.2e-16°); the accuracy bound above holds for both.
     *
     * @throws InvalidCoordinateException on the first non-finite point or point inside the evolute,
     *     naming its index
     */
    public void toGeodetic(double[] in, int inOffset, double[] out, int outOffset, int count) {
        checkRange(in, inOffset, out, outOffset, count);
        if (vectorKernel != null) {
            vectorKernel.toGeodetic(in, inOffset, out, outOffset, count);
        } else {
            toGeodeticScalar(in, inOffset, out, outOffset, 0, count);
        }
    }

    /** The scalar array inverse of points {@code from} (inclusive) to {@code to} (exclusive). */
    void toGeodeticScalar(double[] in, int inOffset, double[] out, int outOffset, int from, int to) {
        for (int i = from; i < to; i++) {
            int k = inOffset + 3 * i;
            double x = in[k];
            double y = in[k + 1];
            double z = in[k + 2];
            if (!withinReach(x, y, z)) {
                throw new InvalidCoordinateException("point " + i + ": " + beyondReach(x, y, z).getMessage());
            }
            if (!inverse(x, y, z, out, outOffset + 3 * i)) {
                throw new InvalidCoordinateException("point " + i + ": " + insideEvolute(x, y, z).getMessage());
            }
        }
    }

    /** Finite and at most {@link #MAX_COORDINATE} in magnitude (NaN fails every comparison). */
    private static boolean withinReach(double x, double y, double z) {
        return Math.abs(x) <= MAX_COORDINATE && Math.abs(y) <= MAX_COORDINATE && Math.abs(z) <= MAX_COORDINATE;
    }

    private static InvalidCoordinateException beyondReach(double x, double y, double z) {
        return new InvalidCoordinateException("ECEF point (" + x + ", " + y + ", " + z + ") m is not finite or"
            + " has a coordinate beyond " + MAX_COORDINATE + " m");
    }

    private static void checkRange(double[] in, int inOffset, double[] out, int outOffset, int count) {
        Objects.checkFromIndexSize(inOffset, 3 * count, in.length);
        Objects.checkFromIndexSize(outOffset, 3 * count, out.length);
    }

    private InvalidCoordinateException insideEvolute(double x, double y, double z) {
        return new InvalidCoordinateException("ECEF point (" + x + ", " + y + ", " + z + ") m lies within "
            + Math.round(Math.max(evoluteP, evoluteZ) / 1000) + " km of the Earth's centre, inside the evolute"
            + " of the " + ellipsoid.name() + " meridian ellipse, where geodetic coordinates are not unique");
    }

    /** Forward formula into out[off..off+2]. Inputs already validated. */
    private void forward(double lat, double lon, double h, double[] out, int off) {
        // sinCos writes (sin, cos) pairs; use out as scratch to stay allocation-free.
        DegreeTrig.sinCos(lon, out, off);
        double sl = out[off];
        double cl = out[off + 1];
        DegreeTrig.sinCos(lat, out, off);
        double sp = out[off];
        double cp = out[off + 1];
        double nu = a / Math.sqrt(1 - e2 * sp * sp);
        double r = (nu + h) * cp;
        out[off] = r * cl;
        out[off + 1] = r * sl;
        out[off + 2] = (oneMinusE2 * nu + h) * sp;
    }

    /**
     * Inverse into out[off..off+2] as (φ°, λ°, h). Returns false (writing nothing) inside the evolute.
     */
    private boolean inverse(double x, double y, double z, double[] out, int off) {
        // p = √(x² + y²) as a double-double (ph + pl): exact squares, an error-free sum, a corrected root.
        double xx = x * x;
        double yy = y * y;
        double s2 = xx + yy;
        double bv = s2 - xx;
        double s2l = ((xx - (s2 - bv)) + (yy - bv)) + Math.fma(x, x, -xx) + Math.fma(y, y, -yy);
        double ph = Math.sqrt(s2);
        double az = Math.abs(z);
        // atan2(±0, ±0) = 0: on the polar axis this is the convention λ = 0.
        double lon = DegreeTrig.atan2(y, x);
        if (ph < evoluteP && az < evoluteZ && insideEvolute(ph, az)) {
            return false;
        }
        if (ph == 0 || az == 0) {
            onAxisOrEquator(z, ph, pl(ph, s2, s2l), lon, out, off);
            return true;
        }
        double pl = pl(ph, s2, s2l);

        // Start: Bowring's formula, tan φ = (z + e'² b sin³u)/(p − e² a cos³u) with u the parametric
        // latitude of the surface point under (p, z), (cos u, sin u) ∝ ((b/a) p, z). The direction is kept
        // as an unnormalised vector (c, s) ∝ (cos φ, sin φ), here scaled by |((b/a) p, z)|³ so that no
        // division is needed; nothing below depends on its length. Written so that p itself enters only
        // at the last product (its square root runs meanwhile).
        double zz = az * az;
        double ru2 = Math.fma(bOverA2, s2, zz);
        double ru3 = ru2 * Math.sqrt(ru2);
        double s = az * Math.fma(ep2b, zz, ru3);
        double c = ph * Math.fma(-e2aBOverA3, s2, ru3);
        // The latitude's arc tangent of this start is taken at once, alongside the Newton evaluation
        // below, which nearly always ends without moving (c, s); the step is added at the end.
        DegreeTrig.atan2Split(s, c, out, off);
        boolean rotated = false;
        boolean bisected = false;

        // Newton's method on g(φ) = p sin φ − z cos φ − e² ν sin φ cos φ, written for the unnormalised
        // (c, s) with Q = √(c² + (1 − e²) s²) = |(c, s)|·√(1 − e² sin²φ). Scaled by |(c, s)| Q:
        //   GQ   = Q (p s − z c) − e² a s c,
        //   G'Q  = Q (p c + z s) − e² a (c² − s² + e² s²c²/Q²),
        // so the step δ = −g/g' = −GQ/G'Q needs one square root and two divisions, neither 1/Q on the
        // way to δ (1/Q² only weighs 1e-5 of G'Q). The Newton error after a step δ is below 0.03 δ² (for
        // heights above −5,000 km), so a step below 1e-9 rad leaves an error below 3e-20 rad: that step
        // is the last, and it is not applied to (c, s) but added to the latitude, where it is not lost to
        // rounding. Bowring's start is within 1e-12 rad for heights up to 10 km, so there the first step is
        // the last. Steps between 1e-9 and 1e-6 rad (orbit heights) are refined to Halley's third order
        // instead, δ ← δ − δ² G''/(2G') with
        //   G''Q = −GQ + 3 e² a s c (1 − e² (c² − s²)/Q² − e⁴ s²c²/Q⁴),
        // whose error is below 0.04 δ³ < 4e-20 rad, and are the last too.
        double delta;
        double hStep = 0;
        double cc;
        double ss;
        double n2;
        double q2;
        double qh;
        double iq2;
        for (int iter = 0; ; iter++) {
            cc = c * c;
            ss = s * s;
            n2 = cc + ss;
            q2 = n2 - e2 * ss;
            qh = Math.sqrt(q2);
            iq2 = 1 / q2;
            double sc = s * c;
            double d = cc - ss;
            // p s − z c with the products of Earth-radius size split exactly (fma), so no cancellation
            // is lost.
            double zc = az * c;
            double zcl = Math.fma(az, c, -zc);
            double psMinusZc = Math.fma(ph, s, -zc) - zcl + pl * s;
            double gq = qh * psMinusZc - e2a * sc;
            double gpq = qh * (ph * c + az * s) - e2a * (d + e2 * sc * sc * iq2);
            delta = -gq / gpq;
            double ad = Math.abs(delta);
            // Outside the evolute g has one zero in the quadrant, where g' = (M + h)|(c, s)| > 0. A start
            // or step that leaves the quadrant, a slope of the wrong sign or a long step (only ever seen
            // just outside the evolute) hands over to bisection, which cannot fail, and Newton resumes
            // from its result.
            if (!(gpq > 0 && c > 0 && s > 0 && ad < 0.5) || iter > 20) {
                if (bisected) {
                    delta = 0;
                    break;
                }
                double m = bisect(ph, az);
                s = Math.sin(m);
                c = Math.cos(m);
                bisected = true;
                rotated = true;
                iter = 0;
                continue;
            }
            if (ad < 1e-9) {
                break;
            }
            if (ad < 1e-6) {
                double eu = e2 * sc * iq2;
                double gppq = 3 * e2a * sc * (1 - e2 * d * iq2 - eu * eu) - gq;
                delta -= 0.5 * delta * delta * gppq / gpq;
                // The height is taken at (c, s), δ short of the foot point: h(φ + δ) = h(φ) + ½ g'(φ) δ²
                // + O(e² a δ³), since dh/dφ = −g and d²h/dφ² = −g' exactly, and g' = G'Q/(Q|(c, s)|). (For
                // steps below 1e-9 the term is below 3e-12 m and left out.)
                hStep = 0.5 * delta * delta * gpq * qh * iq2;
                break;
            }
            // Rotate (c, s) by atan δ: the first-order rotation, whose length change does not matter and
            // whose angle error δ³/3 the next step removes with the rest.
            double cn = c - s * delta;
            s = s + c * delta;
            c = cn;
            rotated = true;
        }

        // Latitude: direction of (c, s) plus the last, not yet applied, correction.
        double lat = rotated ? DegreeTrig.atan2(s, c, delta)
            : out[off] + (out[off + 1] + delta * DEGREES_PER_RADIAN);

        // Height h = (p c + z s − a Q)/|(c, s)|, each term carried as a double-double so that the
        // cancellation of the three Earth-radius-sized terms loses nothing, then divided with a correction.
        double ccl = Math.fma(c, c, -cc);
        double ssl = Math.fma(s, s, -ss);
        double nv = n2 - cc;
        double n2l = ((cc - (n2 - nv)) + (ss - nv)) + ccl + ssl; // n2 + n2l = c² + s²
        double q = e2 * ss;
        double q2l = ((n2 - q2) - q) + n2l - e2 * ssl; // q2 + q2l = c² + (1 − e²) s², to ~1e-19 relative
        double ql = (Math.fma(-qh, qh, q2) + q2l) * (0.5 * qh * iq2); // qh + ql = Q
        double pc = ph * c;
        double pcl = Math.fma(ph, c, -pc) + pl * c;
        double zs = az * s;
        double zsl = Math.fma(az, s, -zs);
        double t = pc + zs;
        double tv = t - pc;
        double tl = ((pc - (t - tv)) + (zs - tv)) + pcl + zsl;
        double aq = a * qh;
        double aql = Math.fma(a, qh, -aq) + a * ql;
        double hd = t - aq;
        double hv = hd - t;
        double hdl = ((t - (hd - hv)) + (-aq - hv)) + (tl - aql); // hd + hdl = p c + z s − a Q
        double rh = Math.sqrt(n2);
        double ir = 1 / rh;
        double rl = (Math.fma(-rh, rh, n2) + n2l) * (0.5 * ir); // rh + rl = |(c, s)|
        double h0 = hd * ir;
        double h = h0 + ((Math.fma(-h0, rh, hd) + hdl - h0 * rl) + hStep) * ir;

        out[off] = Math.copySign(lat, z);
        out[off + 1] = lon;
        out[off + 2] = h;
        return true;
    }

    /** The low part of p = √(s2 + s2l) given its rounded root ph. */
    private static double pl(double ph, double s2, double s2l) {
        return ph == 0 ? 0 : (Math.fma(-ph, ph, s2) + s2l) / (2 * ph);
    }

    /** Whether (p, z), z ≥ 0, lies inside the evolute (astroid) of the meridian ellipse. */
    private boolean insideEvolute(double p, double z) {
        double rp = p / evoluteP;
        double rz = z / evoluteZ;
        return Math.cbrt(rp * rp) + Math.cbrt(rz * rz) < 1;
    }

    /** The polar axis (p = 0) and the equatorial plane (z = 0), exactly. */
    private void onAxisOrEquator(double z, double ph, double pl, double lon, double[] out, int off) {
        if (ph == 0) {
            // On the polar axis: latitude ±90°, longitude 0 by convention, h = |z| − b.
            out[off] = z >= 0 ? 90.0 : -90.0;
            out[off + 1] = 0.0;
            out[off + 2] = Math.abs(z) - b;
        } else {
            // In the equatorial plane: latitude 0, h = p − a.
            out[off] = 0.0;
            out[off + 1] = lon;
            out[off + 2] = (ph - a) + pl;
        }
    }

    /** Robust fallback, never taken in the tests' sweeps: bisection for g(φ) = 0 on [0, π/2], radians. */
    private double bisect(double p, double z) {
        double lo = 0;
        double hi = Math.PI / 2;
        for (int i = 0; i < 200 && hi - lo > 1e-17; i++) {
            double mid = 0.5 * (lo + hi);
            double s = Math.sin(mid);
            double c = Math.cos(mid);
            double nu = a / Math.sqrt(1 - e2 * s * s);
            double g = p * s - z * c - e2 * nu * s * c;
            if (g > 0) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        return 0.5 * (lo + hi);
    }
}
