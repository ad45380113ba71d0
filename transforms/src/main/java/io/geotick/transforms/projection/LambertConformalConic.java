package io.geotick.transforms.projection;

import io.geotick.geodesy.angle.DegreeTrig;
import io.geotick.geodesy.ellipsoid.Ellipsoid;
import java.util.Objects;

/**
 * Lambert Conformal Conic on the ellipsoid, with one standard parallel (EPSG method 9801) or two
 * (EPSG method 9802). Immutable and thread-safe.
 *
 * <p>Formulas (IOGP Guidance Note 7-2; Snyder 1987, §15): m = cos φ/√(1 − e² sin²φ),
 * t = tan(π/4 − φ/2)/((1 − e sin φ)/(1 + e sin φ))^{e/2} (computed as exp(−ψ), ψ the isometric latitude,
 * through the conformal latitude, without cancellation in either hemisphere);
 * <ul>
 *   <li>1SP: n = sin φ₀, F = m₀/(n t₀ⁿ), r = a k₀ F tⁿ, r₀ = a k₀ F t₀ⁿ, E = FE + r sin θ,
 *       N = FN + r₀ − r cos θ;</li>
 *   <li>2SP: n = (ln m₁ − ln m₂)/(ln t₁ − ln t₂) (n = sin φ₁ when φ₁ = φ₂), F = m₁/(n t₁ⁿ), r = a F tⁿ,
 *       r_F = a F t_Fⁿ, E = E_F + r sin θ, N = N_F + r_F − r cos θ;</li>
 * </ul>
 * with θ = n(λ − λ₀). Inverse: r' = ±√((E − FE)² + (r₀ − (N − FN))²) with the sign of n,
 * t' = (r'/(a k₀ F))^{1/n}, θ' = atan2 of the same terms (signs turned for n &lt; 0), λ = θ'/n + λ₀,
 * and φ from t' through χ = π/2 − 2 atan t' by Newton's method on tan φ (Karney 2011, eqs. 19–21)
 * instead of the IOGP fixed-point iteration.
 *
 * <p>Point scale k = n·r/(a·m) (k₀ on the standard parallel of the 1SP form; 1 on both standard
 * parallels of the 2SP form); convergence γ = θ = n(λ − λ₀). Accuracy: closed formulas, rounding only
 * (below 1 nm for the distances of a national grid). Domain: latitudes strictly between the poles (the
 * apex pole has infinite scale, the other lies at infinity); longitudes within 180° of λ₀.
 */
public final class LambertConformalConic extends KernelProjection {
    private final Ellipsoid ellipsoid;
    private final double longitudeOfOrigin;
    private final double falseEasting;
    private final double falseNorthing;
    private final String name;
    private final Conformal conformal;
    private final double a;
    /** The cone constant n. */
    private final double n;
    /** a·k₀·F (a·F for the 2SP form). */
    private final double aF;
    /** r at the latitude of origin (1SP) or of the false origin (2SP). */
    private final double r0;

    private LambertConformalConic(Ellipsoid ellipsoid, double longitudeOfOrigin, double falseEasting,
            double falseNorthing, String name, double n, double scaledF, double originLatitude) {
        this.ellipsoid = ellipsoid;
        this.longitudeOfOrigin = longitudeOfOrigin;
        this.falseEasting = falseEasting;
        this.falseNorthing = falseNorthing;
        this.name = name;
        this.conformal = new Conformal(ellipsoid);
        this.a = ellipsoid.semiMajorAxis();
        this.n = n;
        this.aF = scaledF;
        this.r0 = aF * Math.exp(n * logT(conformal, originLatitude));
    }

    /**
     * Lambert Conic Conformal (1SP), EPSG 9801.
     *
     * @param latitudeOfOrigin φ₀, degrees, not 0 (that would be a Mercator) and strictly between the poles
     * @param longitudeOfOrigin λ₀, degrees
     * @param scale k₀ on the parallel φ₀
     */
    public static LambertConformalConic oneStandardParallel(Ellipsoid ellipsoid, double latitudeOfOrigin,
            double longitudeOfOrigin, double scale, double falseEasting, double falseNorthing) {
        Objects.requireNonNull(ellipsoid, "ellipsoid");
        checkParallel("latitude of origin", latitudeOfOrigin);
        Checks.longitudeParameter("longitude of origin", longitudeOfOrigin);
        Checks.positiveParameter("scale factor", scale);
        Checks.finiteParameter("false easting", falseEasting);
        Checks.finiteParameter("false northing", falseNorthing);
        Conformal conf = new Conformal(ellipsoid);
        double n = DegreeTrig.sin(latitudeOfOrigin);
        double f = m(conf, latitudeOfOrigin) / (n * Math.exp(n * logT(conf, latitudeOfOrigin)));
        String name = "Lambert Conic Conformal (1SP) (" + ellipsoid.name() + ", φ0 " + latitudeOfOrigin
            + "°, λ0 " + longitudeOfOrigin + "°, k0 " + scale + ", FE " + falseEasting + " m, FN "
            + falseNorthing + " m)";
        return new LambertConformalConic(ellipsoid, longitudeOfOrigin, falseEasting, falseNorthing, name, n,
            ellipsoid.semiMajorAxis() * scale * f, latitudeOfOrigin);
    }

    /**
     * Lambert Conic Conformal (2SP), EPSG 9802.
     *
     * @param latitudeOfFalseOrigin φ_F, degrees
     * @param longitudeOfFalseOrigin λ_F, degrees
     * @param firstParallel φ₁, degrees
     * @param secondParallel φ₂, degrees (φ₁ = −φ₂ would make a cylinder and is refused)
     * @param eastingAtFalseOrigin E_F, metres
     * @param northingAtFalseOrigin N_F, metres
     */
    public static LambertConformalConic twoStandardParallels(Ellipsoid ellipsoid, double latitudeOfFalseOrigin,
            double longitudeOfFalseOrigin, double firstParallel, double secondParallel,
            double eastingAtFalseOrigin, double northingAtFalseOrigin) {
        Objects.requireNonNull(ellipsoid, "ellipsoid");
        Checks.latitudeParameter("latitude of false origin", latitudeOfFalseOrigin);
        if (Math.abs(latitudeOfFalseOrigin) == 90.0) {
            throw new ProjectionDomainException("latitude of false origin " + latitudeOfFalseOrigin
                + "° is a pole");
        }
        Checks.longitudeParameter("longitude of false origin", longitudeOfFalseOrigin);
        checkParallel("first standard parallel", firstParallel);
        checkParallel("second standard parallel", secondParallel);
        Checks.finiteParameter("easting at false origin", eastingAtFalseOrigin);
        Checks.finiteParameter("northing at false origin", northingAtFalseOrigin);
        Conformal conf = new Conformal(ellipsoid);
        double m1 = m(conf, firstParallel);
        double m2 = m(conf, secondParallel);
        double lt1 = logT(conf, firstParallel);
        double lt2 = logT(conf, secondParallel);
        double n = firstParallel == secondParallel ? DegreeTrig.sin(firstParallel)
            : (Math.log(m1) - Math.log(m2)) / (lt1 - lt2);
        if (!(Math.abs(n) > 1e-9)) {
            throw new ProjectionDomainException("standard parallels " + firstParallel + "° and " + secondParallel
                + "° are symmetric about the equator: the cone degenerates to a cylinder (use Mercator)");
        }
        double f = m1 / (n * Math.exp(n * lt1));
        String name = "Lambert Conic Conformal (2SP) (" + ellipsoid.name() + ", φF " + latitudeOfFalseOrigin
            + "°, λF " + longitudeOfFalseOrigin + "°, φ1 " + firstParallel + "°, φ2 " + secondParallel + "°, EF "
            + eastingAtFalseOrigin + " m, NF " + northingAtFalseOrigin + " m)";
        return new LambertConformalConic(ellipsoid, longitudeOfFalseOrigin, eastingAtFalseOrigin,
            northingAtFalseOrigin, name, n, ellipsoid.semiMajorAxis() * f, latitudeOfFalseOrigin);
    }

    private static void checkParallel(String what, double latitude) {
        Checks.latitudeParameter(what, latitude);
        if (latitude == 0.0 || Math.abs(latitude) == 90.0) {
            throw new ProjectionDomainException(what + " " + latitude + "° must be strictly between the "
                + "equator and a pole");
        }
    }

    private static double m(Conformal conf, double latitude) {
        double s = DegreeTrig.sin(latitude);
        return DegreeTrig.cos(latitude) / Math.sqrt(1 - conf.e2 * s * s);
    }

    private static double logT(Conformal conf, double latitude) {
        return conf.logT(DegreeTrig.sin(latitude), DegreeTrig.cos(latitude));
    }

    @Override
    public String name() {
        return name;
    }

    @Override
    public Ellipsoid ellipsoid() {
        return ellipsoid;
    }

    /** The cone constant n (sin φ₀ for the 1SP form). */
    public double coneConstant() {
        return n;
    }

    /** λ₀ (or λ_F), degrees. */
    public double longitudeOfOrigin() {
        return longitudeOfOrigin;
    }

    @Override
    void forward(double latitude, double longitude, double[] out, int off, boolean full) {
        Checks.latitude(latitude);
        Checks.longitude(longitude);
        if (Math.abs(latitude) == 90.0) {
            throw new ProjectionDomainException("latitude " + latitude + "° is a pole, outside the domain of "
                + name + " (infinite scale at the apex, infinitely far at the other pole)");
        }
        double dlon = Checks.deltaLongitude(longitude, longitudeOfOrigin);
        DegreeTrig.sinCos(latitude, out, off);
        double s = out[off];
        double c = out[off + 1];
        double r = aF * Math.exp(n * conformal.logT(s, c));
        double theta = n * dlon;
        DegreeTrig.sinCos(theta, out, off);
        double st = out[off];
        double ct = out[off + 1];
        out[off] = falseEasting + r * st;
        out[off + 1] = falseNorthing + r0 - r * ct;
        if (full) {
            out[off + 2] = n * r * Math.sqrt(1 - conformal.e2 * s * s) / (a * c);
            out[off + 3] = theta;
        }
    }

    @Override
    void inverse(double easting, double northing, double[] out, int off) {
        Checks.grid(easting, northing);
        double dx = easting - falseEasting;
        double dy = r0 - (northing - falseNorthing);
        double sg = Math.signum(n);
        double r = sg * Math.hypot(dx, dy);
        double theta = DegreeTrig.atan2(sg * dx, sg * dy);
        double dlon = theta / n;
        if (!(Math.abs(dlon) <= 180.0)) {
            throw new ProjectionDomainException("grid point (E " + easting + ", N " + northing + ") lies outside "
                + "the cone's developed sector of " + name + " (λ − λ0 would be " + dlon + "°)");
        }
        double t = Math.exp(Math.log(r / aF) / n);
        out[off] = conformal.latitudeFromT(t);
        out[off + 1] = Checks.normalizeLongitude(longitudeOfOrigin + dlon);
    }

    @Override
    public String toString() {
        return name;
    }
}
