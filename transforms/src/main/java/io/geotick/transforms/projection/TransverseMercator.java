package io.geotick.transforms.projection;

import io.geotick.geodesy.angle.DegreeTrig;
import io.geotick.geodesy.ellipsoid.Ellipsoid;
import java.util.Objects;

/**
 * Transverse Mercator (Gauss–Krüger; EPSG method 9807) by the Krüger series to 6th order in the third
 * flattening n, forward and inverse, with point scale factor and meridian convergence. Immutable and
 * thread-safe.
 *
 * <p>Method (Karney, C. F. F. (2011), Transverse Mercator with an accuracy of a few nanometers,
 * J. Geodesy 85:475–485; after Krüger 1912):
 * <ol>
 *   <li>conformal latitude χ through τ' = tan χ = τ√(1 + σ²) − σ√(1 + τ²), τ = tan φ,
 *       σ = sinh(e·atanh(e sin φ)) (eqs. 7–9);</li>
 *   <li>Gauss–Schreiber (spherical TM) coordinates ξ' = atan2(τ', cos λ),
 *       η' = asinh(sin λ / √(τ'² + cos² λ)) (eq. 10);</li>
 *   <li>ζ = ξ + iη = ζ' + Σ_{j=1..6} α_j sin 2jζ' (eq. 11), summed by Clenshaw's method in complex
 *       arithmetic, with α_j of eq. 35 to n⁶;</li>
 *   <li>x = k₀Aη, y = k₀Aξ with the rectifying radius A = a/(1 + n)·(1 + n²/4 + n⁴/64 + n⁶/256)
 *       (eq. 14);</li>
 *   <li>convergence γ = γ' + γ'' and scale k = k₀(A/a)·k'·k'': γ' = atan(τ' tan λ/√(1 + τ'²)),
 *       k' = √(1 − e² sin²φ)·√(1 + τ²)/√(τ'² + cos²λ) (eqs. 12–13) for the spherical step, and γ'', k''
 *       the argument and modulus of dζ/dζ' = 1 + Σ 2jα_j cos 2jζ' (eqs. 15–16, the series'
 *       derivative), with the sign turned for the ξ + iη orientation.</li>
 * </ol>
 * The inverse runs the β series ζ' = ζ − Σ β_j sin 2jζ (eq. 36), then τ' = sin ξ'/√(sinh²η' + cos²ξ'),
 * λ = atan2(sinh η', cos ξ') and τ from τ' by Newton's method (eqs. 19–21).
 *
 * <p>Accuracy: the 6th-order series is accurate to about 5 nm within 3 900 km of the central meridian
 * (Karney 2011, §4; checked in the reference tests against an independent 40-digit evaluation of the
 * exact mapping); rounding in double precision adds about 1 nm. Domain: longitudes within 90° of the
 * central meridian whose spherical easting satisfies |η'| ≤ {@value #MAX_ETA_PRIME}
 * (about 6 400 km of the central meridian on the equator; farther from the pole the limit is reached
 * at smaller Δλ); at that limit the series error is about 0.1 µm (measured against the 40-digit
 * reference), and it grows quickly beyond, so farther points get a {@link ProjectionDomainException}.
 *
 * <p>The degree ↔ radian steps use {@link DegreeTrig} (exact degree reduction).
 */
public final class TransverseMercator extends KernelProjection {
    /** The largest |η'| accepted: the series' error stays below 0.2 µm up to here. */
    public static final double MAX_ETA_PRIME = 1.0;

    private static final int ORDER = 6;

    private final Ellipsoid ellipsoid;
    private final double centralMeridian;
    private final double scale;
    private final double falseEasting;
    private final double falseNorthing;
    private final double latitudeOfOrigin;
    private final String name;

    private final Conformal conformal;
    /** α_j, β_j at indices 1..6. */
    private final double[] alp = new double[ORDER + 1];
    private final double[] bet = new double[ORDER + 1];
    /** k₀·A. */
    private final double kA;
    /** A/a. */
    private final double b1;
    /** k₀A·ξ at the latitude of origin on the central meridian (the meridian distance there). */
    private final double y0;

    private TransverseMercator(Ellipsoid ellipsoid, double centralMeridian, double scale, double falseEasting,
            double falseNorthing, double latitudeOfOrigin, String name) {
        this.ellipsoid = ellipsoid;
        this.centralMeridian = centralMeridian;
        this.scale = scale;
        this.falseEasting = falseEasting;
        this.falseNorthing = falseNorthing;
        this.latitudeOfOrigin = latitudeOfOrigin;
        this.name = name;
        this.conformal = new Conformal(ellipsoid);
        double n = ellipsoid.thirdFlattening();
        double n2 = n * n;
        double n3 = n2 * n;
        double n4 = n3 * n;
        double n5 = n4 * n;
        double n6 = n5 * n;
        // Karney (2011), eq. 35.
        alp[1] = n / 2 - 2.0 / 3 * n2 + 5.0 / 16 * n3 + 41.0 / 180 * n4 - 127.0 / 288 * n5
            + 7891.0 / 37800 * n6;
        alp[2] = 13.0 / 48 * n2 - 3.0 / 5 * n3 + 557.0 / 1440 * n4 + 281.0 / 630 * n5
            - 1983433.0 / 1935360 * n6;
        alp[3] = 61.0 / 240 * n3 - 103.0 / 140 * n4 + 15061.0 / 26880 * n5 + 167603.0 / 181440 * n6;
        alp[4] = 49561.0 / 161280 * n4 - 179.0 / 168 * n5 + 6601661.0 / 7257600 * n6;
        alp[5] = 34729.0 / 80640 * n5 - 3418889.0 / 1995840 * n6;
        alp[6] = 212378941.0 / 319334400 * n6;
        // Karney (2011), eq. 36.
        bet[1] = n / 2 - 2.0 / 3 * n2 + 37.0 / 96 * n3 - 1.0 / 360 * n4 - 81.0 / 512 * n5
            + 96199.0 / 604800 * n6;
        bet[2] = 1.0 / 48 * n2 + 1.0 / 15 * n3 - 437.0 / 1440 * n4 + 46.0 / 105 * n5
            - 1118711.0 / 3870720 * n6;
        bet[3] = 17.0 / 480 * n3 - 37.0 / 840 * n4 - 209.0 / 4480 * n5 + 5569.0 / 90720 * n6;
        bet[4] = 4397.0 / 161280 * n4 - 11.0 / 504 * n5 - 830251.0 / 7257600 * n6;
        bet[5] = 4583.0 / 161280 * n5 - 108847.0 / 3991680 * n6;
        bet[6] = 20648693.0 / 638668800 * n6;
        double a = ellipsoid.semiMajorAxis();
        double bigA = ellipsoid.rectifyingRadius();
        this.b1 = bigA / a;
        this.kA = scale * bigA;
        double[] buf = new double[4];
        forwardRaw(latitudeOfOrigin, 0.0, buf, 0, false);
        this.y0 = buf[1];
    }

    /**
     * A Transverse Mercator projection.
     *
     * @param ellipsoid the ellipsoid
     * @param centralMeridian λ₀, degrees in [−180, 180]
     * @param scale k₀ on the central meridian, positive
     * @param falseEasting FE, metres
     * @param falseNorthing FN, metres
     * @param latitudeOfOrigin φ₀, degrees: the northing is FN there on the central meridian
     * @throws ProjectionDomainException naming any parameter out of range
     */
    public static TransverseMercator of(Ellipsoid ellipsoid, double centralMeridian, double scale,
            double falseEasting, double falseNorthing, double latitudeOfOrigin) {
        Objects.requireNonNull(ellipsoid, "ellipsoid");
        Checks.longitudeParameter("central meridian", centralMeridian);
        Checks.positiveParameter("scale factor", scale);
        Checks.finiteParameter("false easting", falseEasting);
        Checks.finiteParameter("false northing", falseNorthing);
        Checks.latitudeParameter("latitude of origin", latitudeOfOrigin);
        String name = "Transverse Mercator (" + ellipsoid.name() + ", λ0 " + centralMeridian + "°, φ0 "
            + latitudeOfOrigin + "°, k0 " + scale + ", FE " + falseEasting + " m, FN " + falseNorthing + " m)";
        return new TransverseMercator(ellipsoid, centralMeridian, scale, falseEasting, falseNorthing,
            latitudeOfOrigin, name);
    }

    /** Package-private: a TM with a given display name (UTM). */
    static TransverseMercator named(Ellipsoid ellipsoid, double centralMeridian, double scale,
            double falseEasting, double falseNorthing, String name) {
        return new TransverseMercator(ellipsoid, centralMeridian, scale, falseEasting, falseNorthing, 0.0,
            name);
    }

    @Override
    public String name() {
        return name;
    }

    @Override
    public Ellipsoid ellipsoid() {
        return ellipsoid;
    }

    /** λ₀, degrees. */
    public double centralMeridian() {
        return centralMeridian;
    }

    /** k₀. */
    public double scaleFactor() {
        return scale;
    }

    /** FE, metres. */
    public double falseEasting() {
        return falseEasting;
    }

    /** FN, metres. */
    public double falseNorthing() {
        return falseNorthing;
    }

    /** φ₀, degrees. */
    public double latitudeOfOrigin() {
        return latitudeOfOrigin;
    }

    /**
     * Forward into out[off] = E, out[off+1] = N and, when {@code full}, out[off+2] = k, out[off+3] = γ
     * (degrees). out[off], out[off+1] serve as scratch first. Package-private for UTM.
     */
    @Override
    void forward(double latitude, double longitude, double[] out, int off, boolean full) {
        Checks.latitude(latitude);
        Checks.longitude(longitude);
        forwardRaw(latitude, Checks.deltaLongitude(longitude, centralMeridian), out, off, full);
        out[off] += falseEasting;
        out[off + 1] += falseNorthing - y0;
    }

    /** x = k₀Aη, y = k₀Aξ (no false origin) for Δλ in [−180, 180]. */
    private void forwardRaw(double latitude, double dlon, double[] out, int off, boolean full) {
        if (!(Math.abs(dlon) < 90.0)) {
            throw new ProjectionDomainException("longitude is " + dlon + "° from the central meridian "
                + centralMeridian + "°; Transverse Mercator needs less than 90°");
        }
        DegreeTrig.sinCos(latitude, out, off);
        double s = out[off];
        double c = out[off + 1];
        DegreeTrig.sinCos(dlon, out, off);
        double sl = out[off];
        double cl = out[off + 1];
        // T = τ'·cos φ; ξ' = atan2(τ', cos λ), sinh η' = sin λ/√(τ'² + cos²λ), all multiplied through by cos φ.
        double t = conformal.taupCos(s);
        double ccl = c * cl;
        double d2 = t * t + ccl * ccl;
        double d = Math.sqrt(d2);
        // cos φ·cos λ ≥ 0 here (|Δλ| < 90°), so atan of the ratio replaces the slower atan2; at the
        // poles (cos φ = 0) ξ' = ±π/2 exactly.
        double xip = ccl > 0 ? Math.atan(t / ccl) : Math.copySign(Math.PI / 2, t);
        double shp = c * sl / d;
        double chp2 = 1 + shp * shp;
        double chp = Math.sqrt(chp2);
        // η' = asinh(sinh η'): by its series near the central meridian (UTM zones: |sinh η'| < 0.07),
        // else log1p(|x| + x²/(1 + cosh η')) with the sign restored.
        double ashp = Math.abs(shp);
        double etap = ashp < Conformal.SERIES_LIMIT ? Conformal.asinhSmall(shp)
            : Math.copySign(Conformal.log1p(ashp + ashp * ashp / (1 + chp)), shp);
        double etapAbs = Math.abs(etap);
        if (!(etapAbs <= MAX_ETA_PRIME)) {
            throw new ProjectionDomainException("point (" + latitude + "°, " + (centralMeridian + dlon)
                + "°) is too far from the central meridian " + centralMeridian + "° for the 6th-order "
                + "Krüger series: |η'| = " + etapAbs + " exceeds " + MAX_ETA_PRIME);
        }
        // cos 2ξ', sin 2ξ', cosh 2η', sinh 2η' from the half-angle quantities (no further transcendental).
        double invD2 = 1 / d2;
        double c2 = (ccl * ccl - t * t) * invD2;
        double s2 = 2 * t * ccl * invD2;
        double ch2 = chp2 + shp * shp;
        double sh2 = 2 * shp * chp;
        // Clenshaw, complex: ar + i·ai = 2 cos 2ζ'.
        double ar = 2 * c2 * ch2;
        double ai = -2 * s2 * sh2;
        double y0r = 0;
        double y0i = 0;
        double y1r = 0;
        double y1i = 0;
        double z0r = 0;
        double z0i = 0;
        double z1r = 0;
        double z1i = 0;
        for (int j = ORDER; j >= 1; j--) {
            double yr = ar * y0r - ai * y0i - y1r + alp[j];
            double yi = ar * y0i + ai * y0r - y1i;
            y1r = y0r;
            y1i = y0i;
            y0r = yr;
            y0i = yi;
            if (full) {
                double zr = ar * z0r - ai * z0i - z1r + 2 * j * alp[j];
                double zi = ar * z0i + ai * z0r - z1i;
                z1r = z0r;
                z1i = z0i;
                z0r = zr;
                z0i = zi;
            }
        }
        // ζ = ζ' + sin 2ζ' · y₁, sin 2ζ' = sin 2ξ' cosh 2η' + i cos 2ξ' sinh 2η'.
        double sr = s2 * ch2;
        double si = c2 * sh2;
        double xi = xip + (sr * y0r - si * y0i);
        double eta = etap + (sr * y0i + si * y0r);
        out[off] = kA * eta;
        out[off + 1] = kA * xi;
        if (full) {
            // dζ/dζ' = 1 − z₂ + cos 2ζ'·z₁.
            double hr = ar / 2;
            double hi = ai / 2;
            double dr = 1 - z1r + (hr * z0r - hi * z0i);
            double di = -z1i + (hr * z0i + hi * z0r);
            // γ = γ' − arg(dζ/dζ') = arg((Q + iP)·conj(dζ/dζ')) with tan γ' = P/Q, Q = cos λ·√(cos²φ + T²) > 0;
            // the real part of that product is positive in practice (Re dζ/dζ' ≈ 1, |γ| < 90°), where
            // the argument is a plain arc tangent (cheaper than atan2).
            double bigP = t * sl;
            double bigQ = cl * Math.sqrt(c * c + t * t);
            double re = bigQ * dr + bigP * di;
            double im = bigP * dr - bigQ * di;
            double w = im / re;
            double gamma = re > 0 ? (Math.abs(w) < Conformal.SERIES_LIMIT ? Conformal.atanSmall(w) : Math.atan(w))
                : Math.atan2(im, re);
            // k = k₀(A/a)·√(1 − e² sin²φ)/D·|dζ/dζ'|, one square root.
            out[off + 2] = scale * b1 * Math.sqrt((1 - conformal.e2 * s * s) * (dr * dr + di * di)) / d;
            out[off + 3] = DegreeTrig.toDegrees(gamma);
        }
    }

    /** Inverse into out[off] = φ, out[off+1] = λ (degrees). Package-private for UTM. */
    @Override
    void inverse(double easting, double northing, double[] out, int off) {
        Checks.grid(easting, northing);
        double xi = (northing - falseNorthing + y0) / kA;
        double eta = (easting - falseEasting) / kA;
        if (!(Math.abs(eta) <= 1.2 * MAX_ETA_PRIME && Math.abs(xi) <= 2.0)) {
            throw outsideGrid(easting, northing);
        }
        double c2 = Math.cos(2 * xi);
        double s2 = Math.sin(2 * xi);
        double ex = Math.exp(2 * eta);
        double ch2 = (ex + 1 / ex) / 2;
        double sh2 = (ex - 1 / ex) / 2;
        double ar = 2 * c2 * ch2;
        double ai = -2 * s2 * sh2;
        double y0r = 0;
        double y0i = 0;
        double y1r = 0;
        double y1i = 0;
        for (int j = ORDER; j >= 1; j--) {
            double yr = ar * y0r - ai * y0i - y1r - bet[j];
            double yi = ar * y0i + ai * y0r - y1i;
            y1r = y0r;
            y1i = y0i;
            y0r = yr;
            y0i = yi;
        }
        double sr = s2 * ch2;
        double si = c2 * sh2;
        double xip = xi + (sr * y0r - si * y0i);
        double etap = eta + (sr * y0i + si * y0r);
        if (!(Math.abs(etap) <= MAX_ETA_PRIME * (1 + 1e-12))) {
            throw outsideGrid(easting, northing);
        }
        double sh = Math.sinh(etap);
        double cx = Math.cos(xip);
        if (cx < 0) {
            // Beyond the pole: |λ − λ₀| would exceed 90°. Allow rounding at the pole itself.
            if (cx > -1e-15) {
                cx = 0;
            } else {
                throw outsideGrid(easting, northing);
            }
        }
        double r = Math.hypot(sh, cx);
        double lat;
        double dlon;
        if (r == 0) {
            lat = xip > 0 ? 90.0 : -90.0;
            dlon = 0;
        } else {
            dlon = DegreeTrig.atan2(sh, cx);
            lat = conformal.latitudeFromTaup(Math.sin(xip) / r);
        }
        out[off] = lat;
        out[off + 1] = Checks.normalizeLongitude(centralMeridian + dlon);
    }

    private ProjectionDomainException outsideGrid(double easting, double northing) {
        return new ProjectionDomainException("grid point (E " + easting + ", N " + northing + ") is outside "
            + "the domain of " + name + ": more than |η'| = " + MAX_ETA_PRIME
            + " from the central meridian or beyond the pole");
    }

    @Override
    public String toString() {
        return name;
    }
}
