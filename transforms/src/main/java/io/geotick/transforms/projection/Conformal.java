package io.geotick.transforms.projection;

import io.geotick.geodesy.angle.DegreeTrig;
import io.geotick.geodesy.ellipsoid.Ellipsoid;

/**
 * Conformal latitude χ of an ellipsoid, through τ = tan φ and τ' = tan χ (Karney 2011, J. Geodesy 85,
 * eqs. 7–9 and the Newton iteration of eqs. 19–21):
 * τ' = τ√(1 + σ²) − σ√(1 + τ²), σ = sinh(e·atanh(e·sin φ)).
 *
 * <p>Everything is written in terms of sin φ and cos φ rather than τ, so that the poles need no special
 * case: {@code T(s) = τ'·cos φ = s√(1 + σ²) − σ} (using sin²φ + cos²φ = 1; the rounding of that identity
 * costs below 1e-18 in τ'·cos φ). Package-private: shared by the conformal projections.
 */
final class Conformal {
    /** Newton tolerance on τ (Karney's √ε/10); quadratic convergence leaves an error near ε. */
    private static final double TOL = Math.sqrt(Math.ulp(1.0)) / 10;
    private static final int MAX_ITERATIONS = 8;

    final double e;
    final double e2;
    /** 1 − e². */
    final double e2m;
    /** exp(e·atanh(e)): the limit of τ/τ' at the poles. */
    final double expEAtanhE;

    Conformal(Ellipsoid ellipsoid) {
        this.e2 = ellipsoid.eccentricitySquared();
        this.e = Math.sqrt(e2);
        this.e2m = 1 - e2;
        this.expEAtanhE = Math.exp(eatanhe(1.0));
    }

    /** e·atanh(e·x) for |x| ≤ 1. For the Earth's e the odd series to x¹⁹ (first omitted term ≤ 1e-22). */
    double eatanhe(double x) {
        if (e < 0.2) {
            double u = e * x;
            double u2 = u * u;
            // atanh u = u(1 + u²/3 + u⁴/5 + …); (e·sin φ)² ≤ 0.0068, so u²⁰/21 < 1e-44 relative.
            // Estrin's scheme with constant coefficients (a division per term would dominate the cost,
            // and Horner's 9-deep chain the latency); every term beyond the first weighs below 0.003.
            double u4 = u2 * u2;
            double u8 = u4 * u4;
            double p01 = Math.fma(1.0 / 5, u2, 1.0 / 3);
            double p23 = Math.fma(1.0 / 9, u2, 1.0 / 7);
            double p45 = Math.fma(1.0 / 13, u2, 1.0 / 11);
            double p67 = Math.fma(1.0 / 17, u2, 1.0 / 15);
            double p = Math.fma(Math.fma(p67, u4, p45), u8, Math.fma(p23, u4, p01));
            p = Math.fma(1.0 / 19, u8 * u8, p);
            return e * u + e * u * (u2 * p);
        }
        double u = e * x;
        return e * 0.5 * log1p(2 * u / (1 - u));
    }

    /** σ = sinh(e·atanh(e·s)); for |argument| below 0.01 by its Taylor series to x⁹ (error ≤ 1e-24). */
    double sigma(double s) {
        double x = eatanhe(s);
        if (Math.abs(x) < 0.01) {
            // sinh x = x + x³/3! + x⁵/5! + x⁷/7! + x⁹/9!, constant reciprocals (no division).
            double x2 = x * x;
            return x + x * x2 * Math.fma(Math.fma(Math.fma(1.0 / 362880, x2, 1.0 / 5040), x2, 1.0 / 120), x2,
                1.0 / 6);
        }
        return Math.sinh(x);
    }

    /** T = τ'·cos φ for sin φ = s: the numerator of tan χ over the denominator cos φ. */
    double taupCos(double s) {
        double sig = sigma(s);
        return s * Math.sqrt(1 + sig * sig) - sig;
    }

    /** τ' from τ (Karney 2011, eq. 7). */
    double taup(double tau) {
        double tau1 = Math.sqrt(1 + tau * tau);
        double sig = sigma(tau / tau1);
        return tau * Math.sqrt(1 + sig * sig) - sig * tau1;
    }

    /**
     * τ from τ' by Newton's method (Karney 2011, eqs. 19–21), starting from τ'/(1 − e²) (or the polar
     * asymptote τ'·exp(e·atanh e) for |τ'| > 70); converges to full precision in at most 3 steps for
     * the Earth's ellipsoids.
     */
    double tau(double taup) {
        if (Double.isInfinite(taup)) {
            return taup;
        }
        double tau = Math.abs(taup) > 70 ? taup * expEAtanhE : taup / e2m;
        double stol = TOL * Math.max(1.0, Math.abs(taup));
        for (int i = 0; i < MAX_ITERATIONS; i++) {
            double taupa = taup(tau);
            double dtau = (taup - taupa) * (1 + e2m * tau * tau)
                / (e2m * Math.sqrt(1 + tau * tau) * Math.sqrt(1 + taupa * taupa));
            tau += dtau;
            if (!(Math.abs(dtau) >= stol)) {
                break;
            }
        }
        return tau;
    }

    /** Geodetic latitude in degrees from τ' = tan χ. */
    double latitudeFromTaup(double taup) {
        return DegreeTrig.atan2(tau(taup), 1.0);
    }

    /**
     * ln t, where t = tan(π/4 − χ/2) = exp(−ψ) (ψ the isometric latitude), the quantity of the IOGP
     * formulas for the stereographic and Lambert projections, for sin φ = s and cos φ = c; −∞ at the
     * north pole, +∞ at the south pole. Written so that neither hemisphere cancels.
     */
    double logT(double s, double c) {
        double t = taupCos(s);
        double d = Math.sqrt(t * t + c * c);
        return t >= 0 ? Math.log(c / (d + t)) : Math.log((d - t) / c);
    }

    /** Geodetic latitude (degrees) from t = tan(π/4 − χ/2) ≥ 0: τ' = tan χ = (1 − t²)/(2t). */
    double latitudeFromT(double t) {
        if (t == 0) {
            return 90.0;
        }
        if (Double.isInfinite(t)) {
            return -90.0;
        }
        return latitudeFromTaup((1 - t) * (1 + t) / (2 * t));
    }

    /** Arguments below this magnitude take {@link #asinhSmall} and {@link #atanSmall} (about 7.1°). */
    static final double SERIES_LIMIT = 0.125;

    // Taylor coefficients of asinh x = x + x·u·Σ aₙuⁿ (u = x²): (−1)ⁿ⁺¹(2n+1)!!/((2n+2)!!(2n+3)), exact
    // rationals rounded once to double (common practice; the series is in any table of integrals).
    private static final double ASH1 = -1.0 / 6;
    private static final double ASH2 = 3.0 / 40;
    private static final double ASH3 = -5.0 / 112;
    private static final double ASH4 = 35.0 / 1152;
    private static final double ASH5 = -63.0 / 2816;
    private static final double ASH6 = 231.0 / 13312;
    private static final double ASH7 = -143.0 / 10240;
    private static final double ASH8 = 6435.0 / 557056;
    private static final double ASH9 = -12155.0 / 1245184;
    private static final double ASH10 = 46189.0 / 5505024;

    /**
     * asinh x for |x| &lt; {@link #SERIES_LIMIT}: x + x³·P(x²), the Maclaurin series through x²¹ evaluated by
     * Estrin's scheme; the first omitted term is below 7.4e-3·x²³, i.e. below 1e-22 relative for |x| &lt; 0.125,
     * so the result is within about half an ulp (the one rounding of the final sum; the correction term
     * is at most 0.003 of x). Replaces the logarithm (the slowest step of the forward Transverse Mercator
     * near the central meridian).
     */
    static double asinhSmall(double x) {
        double u = x * x;
        double u2 = u * u;
        double u4 = u2 * u2;
        double p01 = Math.fma(ASH2, u, ASH1);
        double p23 = Math.fma(ASH4, u, ASH3);
        double p45 = Math.fma(ASH6, u, ASH5);
        double p67 = Math.fma(ASH8, u, ASH7);
        double p89 = Math.fma(ASH10, u, ASH9);
        double p03 = Math.fma(p23, u2, p01);
        double p47 = Math.fma(p67, u2, p45);
        double p = Math.fma(Math.fma(p89, u4, p47), u4, p03);
        return x + x * u * p;
    }

    /**
     * atan x for |x| &lt; {@link #SERIES_LIMIT}: x − x³/3 + x⁵/5 − … through x²³ by Estrin's scheme; the first
     * omitted term, x²⁵/25, is below 1e-24 relative for |x| &lt; 0.125 (common practice: the Gregory series),
     * so the result is within about half an ulp.
     */
    static double atanSmall(double x) {
        double u = x * x;
        double u2 = u * u;
        double u4 = u2 * u2;
        double p01 = Math.fma(1.0 / 5, u, -1.0 / 3);
        double p23 = Math.fma(1.0 / 9, u, -1.0 / 7);
        double p45 = Math.fma(1.0 / 13, u, -1.0 / 11);
        double p67 = Math.fma(1.0 / 17, u, -1.0 / 15);
        double p89 = Math.fma(1.0 / 21, u, -1.0 / 19);
        double p03 = Math.fma(p23, u2, p01);
        double p47 = Math.fma(p67, u2, p45);
        double p8 = Math.fma(-1.0 / 23, u2, p89);
        double p = Math.fma(Math.fma(p8, u4, p47), u4, p03);
        return x + x * u * p;
    }

    /** ln(1 + x) to a few ulps with the intrinsic logarithm (Kahan's trick). */
    static double log1p(double x) {
        double u = 1 + x;
        return u == 1 ? x : Math.log(u) * x / (u - 1);
    }

    /** asinh x to a few ulps, odd. */
    static double asinh(double x) {
        double y = Math.abs(x);
        double r = log1p(y + y * y / (1 + Math.sqrt(1 + y * y)));
        return x < 0 ? -r : r;
    }
}
