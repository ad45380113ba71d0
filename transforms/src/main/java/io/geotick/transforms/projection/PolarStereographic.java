package io.geotick.transforms.projection;

import io.geotick.geodesy.angle.DegreeTrig;
import io.geotick.geodesy.ellipsoid.Ellipsoid;
import java.util.Objects;

/**
 * Polar stereographic, variant A (EPSG method 9810): the ellipsoidal polar stereographic with the
 * latitude of origin at a pole and a scale factor k₀ there. Immutable and thread-safe.
 *
 * <p>Formulas (IOGP Guidance Note 7-2; Snyder 1987, §21): for the north pole,
 * t = tan(π/4 − φ/2)·((1 + e sin φ)/(1 − e sin φ))^{e/2}, ρ = 2ak₀t/√((1 + e)^{1+e}(1 − e)^{1−e}),
 * E = FE + ρ sin(λ − λ₀), N = FN − ρ cos(λ − λ₀); for the south pole φ → −φ in t and
 * N = FN + ρ cos(λ − λ₀). Here t is computed as tan(π/4 − χ/2) from the conformal latitude χ
 * (t = exp(−ψ), ψ the isometric latitude), in a form that neither cancels near the pole nor at the
 * equator. The inverse takes χ = π/2 − 2 atan t' and φ from χ by Newton's method on tan φ
 * (Karney 2011, eqs. 19–21) instead of the IOGP fixed-point iteration; same result, fewer steps.
 *
 * <p>Point scale k = ρ√(1 − e² sin²φ)/(a cos φ) (k₀ at the pole); convergence γ = λ − λ₀ for the north
 * pole and −(λ − λ₀) for the south (grid north is the direction of the projection's +N axis).
 * Accuracy: closed formulas, rounding only (below 1 nm). Domain: every latitude except the opposite
 * pole, which lies at infinity.
 */
public final class PolarStereographic extends KernelProjection {
    private final Ellipsoid ellipsoid;
    private final Hemisphere pole;
    private final double longitudeOfOrigin;
    private final double scale;
    private final double falseEasting;
    private final double falseNorthing;
    private final String name;
    private final Conformal conformal;
    /** 2ak₀/√((1 + e)^{1+e}(1 − e)^{1−e}): ρ = K·t. */
    private final double bigK;
    private final double a;
    private final double sign;

    private PolarStereographic(Ellipsoid ellipsoid, Hemisphere pole, double longitudeOfOrigin, double scale,
            double falseEasting, double falseNorthing, String name) {
        this.ellipsoid = ellipsoid;
        this.pole = pole;
        this.longitudeOfOrigin = longitudeOfOrigin;
        this.scale = scale;
        this.falseEasting = falseEasting;
        this.falseNorthing = falseNorthing;
        this.name = name;
        this.conformal = new Conformal(ellipsoid);
        this.a = ellipsoid.semiMajorAxis();
        double e = conformal.e;
        this.bigK = 2 * a * scale / Math.sqrt(Math.pow(1 + e, 1 + e) * Math.pow(1 - e, 1 - e));
        this.sign = pole == Hemisphere.NORTH ? 1 : -1;
    }

    /**
     * Polar stereographic variant A.
     *
     * @param ellipsoid the ellipsoid
     * @param pole the pole at the projection's centre (the latitude of origin ±90°)
     * @param longitudeOfOrigin λ₀, degrees: the meridian along the −N axis (north) or +N axis (south)
     * @param scale k₀ at the pole
     * @param falseEasting FE, metres
     * @param falseNorthing FN, metres
     */
    public static PolarStereographic variantA(Ellipsoid ellipsoid, Hemisphere pole, double longitudeOfOrigin,
            double scale, double falseEasting, double falseNorthing) {
        Objects.requireNonNull(ellipsoid, "ellipsoid");
        Objects.requireNonNull(pole, "pole");
        Checks.longitudeParameter("longitude of origin", longitudeOfOrigin);
        Checks.positiveParameter("scale factor", scale);
        Checks.finiteParameter("false easting", falseEasting);
        Checks.finiteParameter("false northing", falseNorthing);
        String name = "Polar stereographic (variant A) " + (pole == Hemisphere.NORTH ? "north" : "south")
            + " (" + ellipsoid.name() + ", λ0 " + longitudeOfOrigin + "°, k0 " + scale + ", FE " + falseEasting
            + " m, FN " + falseNorthing + " m)";
        return new PolarStereographic(ellipsoid, pole, longitudeOfOrigin, scale, falseEasting, falseNorthing,
            name);
    }

    static PolarStereographic named(Ellipsoid ellipsoid, Hemisphere pole, double scale, double falseEasting,
            double falseNorthing, String name) {
        return new PolarStereographic(ellipsoid, pole, 0.0, scale, falseEasting, falseNorthing, name);
    }

    @Override
    public String name() {
        return name;
    }

    @Override
    public Ellipsoid ellipsoid() {
        return ellipsoid;
    }

    /** The pole at the centre. */
    public Hemisphere pole() {
        return pole;
    }

    /** λ₀, degrees. */
    public double longitudeOfOrigin() {
        return longitudeOfOrigin;
    }

    /** k₀. */
    public double scaleFactor() {
        return scale;
    }

    @Override
    void forward(double latitude, double longitude, double[] out, int off, boolean full) {
        Checks.latitude(latitude);
        Checks.longitude(longitude);
        if (latitude == -90.0 * sign) {
            throw new ProjectionDomainException("latitude " + latitude + "° is the pole opposite the centre of "
                + name + ", at infinity");
        }
        double dlon = Checks.deltaLongitude(longitude, longitudeOfOrigin);
        DegreeTrig.sinCos(latitude, out, off);
        double s = sign * out[off];
        double c = out[off + 1];
        DegreeTrig.sinCos(dlon, out, off);
        double sl = out[off];
        double cl = out[off + 1];
        // t = tan(π/4 − χ/2) with tan χ = T/cos φ: t = c/(D + T) for T ≥ 0, (D − T)/c otherwise.
        double tc = conformal.taupCos(s);
        double d = Math.sqrt(tc * tc + c * c);
        double tOverC = tc >= 0 ? 1 / (d + tc) : (d - tc) / (c * c);
        double t = tc >= 0 ? c * tOverC : (d - tc) / c;
        double rho = bigK * t;
        out[off] = falseEasting + rho * sl;
        out[off + 1] = falseNorthing - sign * rho * cl;
        if (full) {
            out[off + 2] = bigK * tOverC * Math.sqrt(1 - conformal.e2 * s * s) / a;
            out[off + 3] = sign * dlon;
        }
    }

    @Override
    void inverse(double easting, double northing, double[] out, int off) {
        Checks.grid(easting, northing);
        double de = easting - falseEasting;
        double dn = northing - falseNorthing;
        double rho = Math.hypot(de, dn);
        double lat = sign * conformal.latitudeFromT(rho / bigK);
        double dlon = rho == 0 ? 0.0 : DegreeTrig.atan2(de, -sign * dn);
        out[off] = lat;
        out[off + 1] = Checks.normalizeLongitude(longitudeOfOrigin + dlon);
    }

    @Override
    public String toString() {
        return name;
    }
}
