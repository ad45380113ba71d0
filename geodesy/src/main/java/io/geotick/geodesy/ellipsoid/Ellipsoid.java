package io.geotick.geodesy.ellipsoid;

import io.geotick.geodesy.InvalidCoordinateException;
import io.geotick.geodesy.angle.DegreeTrig;
import java.util.Objects;

/**
 * An oblate ellipsoid of revolution, defined by its semi-major axis a and either its inverse flattening
 * 1/f or its semi-minor axis b. Immutable and thread-safe.
 *
 * <p>Derived quantities (formulas common to every geodesy text, e.g. IOGP Guidance Note 7-2, §1.2):
 * <ul>
 *   <li>flattening f = (a − b)/a, semi-minor axis b = a(1 − f);</li>
 *   <li>first eccentricity squared e² = f(2 − f) = (a² − b²)/a²;</li>
 *   <li>second eccentricity squared e'² = e²/(1 − e²) = (a² − b²)/b²;</li>
 *   <li>third flattening n = (a − b)/(a + b) = f/(2 − f);</li>
 *   <li>mean radius R₁ = (2a + b)/3 (the IUGG arithmetic mean radius, Moritz 1980).</li>
 * </ul>
 * Derived values are computed once, in double precision, from the defining constants in the formula
 * that loses least: e² as f(2 − f) rather than a difference of squares.
 */
public final class Ellipsoid {
    private final String name;
    private final double a;
    private final double b;
    private final double f;
    private final double inverseFlattening;
    private final boolean definedByInverseFlattening;
    private final String source;
    private final double e2;
    private final double ep2;
    private final double n;
    // Meridian arc series (Helmert), coefficients of sin 2kφ to n⁶, and the rectifying radius A.
    private final double rectifyingRadius;
    private final double[] arcCoefficients;

    private Ellipsoid(String name, double a, double b, double f, double inverseFlattening,
            boolean byInverseFlattening, String source) {
        this.name = name;
        this.a = a;
        this.b = b;
        this.f = f;
        this.inverseFlattening = inverseFlattening;
        this.definedByInverseFlattening = byInverseFlattening;
        this.source = source;
        this.e2 = f * (2 - f);
        this.ep2 = e2 / (1 - e2);
        this.n = f / (2 - f);
        double n2 = n * n;
        double n3 = n2 * n;
        double n4 = n3 * n;
        double n5 = n4 * n;
        double n6 = n5 * n;
        this.rectifyingRadius = a / (1 + n) * (1 + n2 / 4 + n4 / 64 + n6 / 256);
        this.arcCoefficients = new double[] {
            -1.5 * n + 9.0 / 16 * n3 - 3.0 / 32 * n5,
            15.0 / 16 * n2 - 15.0 / 32 * n4 + 135.0 / 2048 * n6,
            -35.0 / 48 * n3 + 105.0 / 256 * n5,
            315.0 / 512 * n4 - 189.0 / 512 * n6,
            -693.0 / 1280 * n5,
            1001.0 / 2048 * n6,
        };
    }

    /**
     * An ellipsoid from its semi-major axis and inverse flattening.
     *
     * @param name a short name, e.g. {@code "WGS 84"}
     * @param semiMajorAxis a in metres, finite and positive
     * @param inverseFlattening 1/f, finite and greater than 1 (use {@link #sphere} for a sphere)
     * @param source where the defining constants come from
     */
    public static Ellipsoid ofInverseFlattening(String name, double semiMajorAxis, double inverseFlattening,
            String source) {
        checkAxis("semi-major axis", semiMajorAxis);
        if (!(inverseFlattening > 1) || Double.isInfinite(inverseFlattening)) {
            throw new InvalidCoordinateException("inverse flattening must be finite and > 1, got "
                + inverseFlattening);
        }
        double f = 1 / inverseFlattening;
        return new Ellipsoid(requireText(name, "name"), semiMajorAxis, semiMajorAxis * (1 - f), f,
            inverseFlattening, true, requireText(source, "source"));
    }

    /**
     * An ellipsoid from its semi-axes a ≥ b.
     *
     * @param semiMajorAxis a in metres
     * @param semiMinorAxis b in metres, 0 &lt; b ≤ a
     */
    public static Ellipsoid ofSemiAxes(String name, double semiMajorAxis, double semiMinorAxis, String source) {
        checkAxis("semi-major axis", semiMajorAxis);
        checkAxis("semi-minor axis", semiMinorAxis);
        if (semiMinorAxis > semiMajorAxis) {
            throw new InvalidCoordinateException("semi-minor axis " + semiMinorAxis
                + " m exceeds the semi-major axis " + semiMajorAxis + " m");
        }
        double f = (semiMajorAxis - semiMinorAxis) / semiMajorAxis;
        if (!(f < 1)) { // b below ~1e-16 a: 1 − e² would round to 0 and the radii to infinity
            throw new InvalidCoordinateException("semi-minor axis " + semiMinorAxis
                + " m is too small relative to the semi-major axis " + semiMajorAxis + " m");
        }
        return new Ellipsoid(requireText(name, "name"), semiMajorAxis, semiMinorAxis, f,
            f == 0 ? Double.POSITIVE_INFINITY : 1 / f, false, requireText(source, "source"));
    }

    /** A sphere of the given radius (f = 0, 1/f reported as positive infinity). */
    public static Ellipsoid sphere(String name, double radius, String source) {
        return ofSemiAxes(name, radius, radius, source);
    }

    private static void checkAxis(String what, double v) {
        if (!(v > 0) || Double.isInfinite(v)) {
            throw new InvalidCoordinateException(what + " must be finite and positive, got " + v);
        }
    }

    private static String requireText(String s, String what) {
        Objects.requireNonNull(s, what);
        if (s.isBlank()) {
            throw new IllegalArgumentException(what + " must not be blank");
        }
        return s;
    }

    /** The name, e.g. {@code "WGS 84"}. */
    public String name() {
        return name;
    }

    /** Where the defining constants come from. */
    public String source() {
        return source;
    }

    /** Whether the defining constants are a and 1/f (true) or a and b (false). */
    public boolean isDefinedByInverseFlattening() {
        return definedByInverseFlattening;
    }

    /** Semi-major axis a, metres. */
    public double semiMajorAxis() {
        return a;
    }

    /** Semi-minor axis b, metres (derived as a(1 − f) when defined by 1/f). */
    public double semiMinorAxis() {
        return b;
    }

    /** Flattening f. */
    public double flattening() {
        return f;
    }

    /** Inverse flattening 1/f; positive infinity for a sphere. */
    public double inverseFlattening() {
        return inverseFlattening;
    }

    /** First eccentricity squared e² = f(2 − f). */
    public double eccentricitySquared() {
        return e2;
    }

    /** Second eccentricity squared e'² = e²/(1 − e²). */
    public double secondEccentricitySquared() {
        return ep2;
    }

    /** Third flattening n = f/(2 − f). */
    public double thirdFlattening() {
        return n;
    }

    /** Mean radius R₁ = (2a + b)/3, metres (IUGG; Moritz, Geodetic Reference System 1980). */
    public double meanRadius() {
        return (2 * a + b) / 3;
    }

    /**
     * Rectifying radius A = a/(1 + n)·(1 + n²/4 + n⁴/64 + n⁶/256): the meridian quadrant is A·π/2.
     * Truncation error below 1e-12 m for the Earth's ellipsoids (terms in n⁸ ≈ 6e-23).
     */
    public double rectifyingRadius() {
        return rectifyingRadius;
    }

    /**
     * Radius of curvature in the meridian, M = a(1 − e²)/(1 − e² sin²φ)^{3/2}, metres.
     *
     * @param latitude geodetic latitude φ in degrees, in [−90, 90]
     */
    public double meridianRadius(double latitude) {
        double s = DegreeTrig.sin(checkLatitude(latitude));
        double w2 = 1 - e2 * s * s;
        return a * (1 - e2) / (w2 * Math.sqrt(w2));
    }

    /**
     * Radius of curvature in the prime vertical, N = a/√(1 − e² sin²φ), metres.
     *
     * @param latitude geodetic latitude φ in degrees, in [−90, 90]
     */
    public double primeVerticalRadius(double latitude) {
        double s = DegreeTrig.sin(checkLatitude(latitude));
        return a / Math.sqrt(1 - e2 * s * s);
    }

    /**
     * Meridian arc length from the equator to geodetic latitude φ, metres (negative south of the equator).
     *
     * <p>Helmert's series in the third flattening, m = A(φ + Σ_{k=1..6} b_k sin 2kφ), with the b_k taken
     * to n⁶ (e.g. b₁ = −3n/2 + 9n³/16 − 3n⁵/32). Source: Helmert (1880); the same expansion underlies the
     * Krüger series (Karney 2011, J. Geodesy 85, eq. 14). Truncation error for the Earth's ellipsoids:
     * below 1e-9 m at every latitude (checked against numerical quadrature in the tests).
     */
    public double meridianArc(double latitude) {
        double phi = DegreeTrig.toRadians(checkLatitude(latitude));
        double[] c = arcCoefficients;
        // Clenshaw summation of Σ c_k sin 2kφ.
        double s2 = Math.sin(2 * phi);
        double c2 = Math.cos(2 * phi);
        double x = 2 * c2;
        double u0 = 0;
        double u1 = 0;
        for (int k = c.length - 1; k >= 0; k--) {
            double t = x * u0 - u1 + c[k];
            u1 = u0;
            u0 = t;
        }
        return rectifyingRadius * (phi + u0 * s2);
    }

    /**
     * Geocentric latitude ψ for geodetic latitude φ on the ellipsoid surface: tan ψ = (1 − e²) tan φ.
     * Exact formula; the result is within a few ulps.
     */
    public double geocentricLatitude(double geodeticLatitude) {
        double[] sc = sinCos(checkLatitude(geodeticLatitude));
        return DegreeTrig.atan2((1 - e2) * sc[0], sc[1]);
    }

    /** Geodetic latitude φ from geocentric latitude ψ (surface points): tan φ = tan ψ/(1 − e²). */
    public double geodeticLatitudeFromGeocentric(double geocentricLatitude) {
        double[] sc = sinCos(checkLatitude(geocentricLatitude));
        return DegreeTrig.atan2(sc[0], (1 - e2) * sc[1]);
    }

    /** Parametric (reduced) latitude β for geodetic latitude φ: tan β = (b/a) tan φ = (1 − f) tan φ. */
    public double parametricLatitude(double geodeticLatitude) {
        double[] sc = sinCos(checkLatitude(geodeticLatitude));
        return DegreeTrig.atan2((1 - f) * sc[0], sc[1]);
    }

    /** Geodetic latitude φ from parametric latitude β: tan φ = tan β/(1 − f). */
    public double geodeticLatitudeFromParametric(double parametricLatitude) {
        double[] sc = sinCos(checkLatitude(parametricLatitude));
        return DegreeTrig.atan2(sc[0], (1 - f) * sc[1]);
    }

    private static double[] sinCos(double degrees) {
        double[] sc = new double[2];
        DegreeTrig.sinCos(degrees, sc, 0);
        return sc;
    }

    private static double checkLatitude(double latitude) {
        if (!(latitude >= -90 && latitude <= 90)) {
            throw new InvalidCoordinateException("latitude " + latitude + "° is outside [-90°, 90°]");
        }
        return latitude;
    }

    /** Equal when the name and the defining constants are equal. */
    @Override
    public boolean equals(Object o) {
        if (this == o) {
            return true;
        }
        if (!(o instanceof Ellipsoid)) {
            return false;
        }
        Ellipsoid e = (Ellipsoid) o;
        return name.equals(e.name) && Double.compare(a, e.a) == 0 && Double.compare(b, e.b) == 0
            && Double.compare(inverseFlattening, e.inverseFlattening) == 0;
    }

    @Override
    public int hashCode() {
        return Objects.hash(name, a, b, inverseFlattening);
    }

    @Override
    public String toString() {
        return definedByInverseFlattening
            ? name + " (a = " + a + " m, 1/f = " + inverseFlattening + ")"
            : name + " (a = " + a + " m, b = " + b + " m)";
    }
}
