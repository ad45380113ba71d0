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
            // Unrolled Horner with constant coefficients (a division per term would dominate the cost).
            double p = ((((((((1.0 / 19 * u2 + 1.0 / 17) * u2 + 1.0 / 15) * u2 + 1.0 / 13) * u2 + 1.0 / 11)
                * u2 + 1.0 / 9) * u2 + 1.0 / 7) * u2 + 1.0 / 5) * u2 + 1.0 / 3) * u2 + 1.0;
            return e * u * p;
        }
        double u = e * x;
        return e * 0.5 * log1p(2 * u / (1 - u));
    }

    /** σ = sinh(e·atanh(e·s)); for |argument| below 0.01 by its Taylor series to x⁹ (error ≤ 1e-24). */
    double sigma(double s) {
        double x = eatanhe(s);
        if (Math.abs(x) < 0.01) {
            double x2 = x * x;
            return x * (1 + x2 / 6 * (1 + x2 / 20 * (1 + x2 / 42 * (1 + x2 / 72))));
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
