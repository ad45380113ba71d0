package io.geotick.transforms.projection;

import io.geotick.geodesy.angle.DegreeTrig;
import io.geotick.geodesy.ellipsoid.Ellipsoid;
import io.geotick.geodesy.ellipsoid.Ellipsoids;
import java.util.Objects;

/**
 * Popular Visualisation Pseudo-Mercator (EPSG method 1024), the "Web Mercator" of EPSG:3857: the
 * spherical Mercator formulas applied to geodetic latitude and longitude with the ellipsoid's semi-major
 * axis a as the sphere's radius. Immutable and thread-safe.
 *
 * <p>Formulas (IOGP Guidance Note 7-2): E = FE + a(λ − λ₀), N = FN + a·ln tan(π/4 + φ/2)
 * (= a·atanh(sin φ), computed as ln((1 + |sin φ|)/cos φ) with the sign of φ); inverse
 * φ = atan(sinh((N − FN)/a)), λ = λ₀ + (E − FE)/a.
 *
 * <p><b>Not conformal.</b> Because a spherical formula is fed ellipsoidal latitudes, the scale along a
 * meridian h = a/(M cos φ) differs from the scale along a parallel k = a/(ν cos φ) (M, ν the ellipsoid's
 * radii of curvature): h/k = ν/M = (1 − e² sin²φ)/(1 − e²), i.e. 1 + e'² cos²φ. On WGS 84 the two differ
 * by 0.674 % at the equator (e'² = 0.006 739 5), falling to 0 at the poles, and a direction is turned by
 * up to about 0.19° (at 45° to the meridian, on the equator); the tests check both figures.
 * {@link GridPosition#scale()} reports the parallel scale k; {@link #meridianScale} and {@link #parallelScale} give both. The meridians are grid
 * lines, so the convergence is exactly 0.
 *
 * <p>Domain: latitudes strictly between the poles (they lie at infinity; the EPSG:3857 area of use stops
 * at about 85.06°, where the map is square, but the formulas hold beyond); longitudes within 180° of λ₀.
 * Accuracy: closed formulas, rounding only.
 */
public final class WebMercator extends KernelProjection {
    private static final WebMercator WGS84 = new WebMercator(Ellipsoids.WGS84, 0, 0, 0,
        "Popular Visualisation Pseudo-Mercator (WGS 84, as EPSG:3857)");

    private final Ellipsoid ellipsoid;
    private final double longitudeOfOrigin;
    private final double falseEasting;
    private final double falseNorthing;
    private final String name;
    private final double a;
    private final double e2;

    private WebMercator(Ellipsoid ellipsoid, double longitudeOfOrigin, double falseEasting, double falseNorthing,
            String name) {
        this.ellipsoid = ellipsoid;
        this.longitudeOfOrigin = longitudeOfOrigin;
        this.falseEasting = falseEasting;
        this.falseNorthing = falseNorthing;
        this.name = name;
        this.a = ellipsoid.semiMajorAxis();
        this.e2 = ellipsoid.eccentricitySquared();
    }

    /** The WGS 84 form used by EPSG:3857 (λ₀ = 0, no false origin). */
    public static WebMercator wgs84() {
        return WGS84;
    }

    /** Pseudo-Mercator on another ellipsoid or with another origin. */
    public static WebMercator of(Ellipsoid ellipsoid, double longitudeOfOrigin, double falseEasting,
            double falseNorthing) {
        Objects.requireNonNull(ellipsoid, "ellipsoid");
        Checks.longitudeParameter("longitude of origin", longitudeOfOrigin);
        Checks.finiteParameter("false easting", falseEasting);
        Checks.finiteParameter("false northing", falseNorthing);
        return new WebMercator(ellipsoid, longitudeOfOrigin, falseEasting, falseNorthing,
            "Popular Visualisation Pseudo-Mercator (" + ellipsoid.name() + ", λ0 " + longitudeOfOrigin + "°, FE "
                + falseEasting + " m, FN " + falseNorthing + " m)");
    }

    @Override
    public String name() {
        return name;
    }

    @Override
    public Ellipsoid ellipsoid() {
        return ellipsoid;
    }

    /** Scale along the meridian h = a/(M cos φ) = (1 − e² sin²φ)^{3/2}/((1 − e²) cos φ). */
    public double meridianScale(double latitude) {
        checkLatitude(latitude);
        double s = DegreeTrig.sin(latitude);
        double w2 = 1 - e2 * s * s;
        return w2 * Math.sqrt(w2) / ((1 - e2) * DegreeTrig.cos(latitude));
    }

    /** Scale along the parallel k = a/(ν cos φ) = √(1 − e² sin²φ)/cos φ. */
    public double parallelScale(double latitude) {
        checkLatitude(latitude);
        double s = DegreeTrig.sin(latitude);
        return Math.sqrt(1 - e2 * s * s) / DegreeTrig.cos(latitude);
    }

    private static void checkLatitude(double latitude) {
        Checks.latitude(latitude);
        if (Math.abs(latitude) == 90.0) {
            throw new ProjectionDomainException("latitude " + latitude + "° is a pole, infinitely far on a "
                + "Mercator grid");
        }
    }

    @Override
    void forward(double latitude, double longitude, double[] out, int off, boolean full) {
        checkLatitude(latitude);
        Checks.longitude(longitude);
        double dlon = Checks.deltaLongitude(longitude, longitudeOfOrigin);
        DegreeTrig.sinCos(latitude, out, off);
        double s = out[off];
        double c = out[off + 1];
        double psi = Math.log((1 + Math.abs(s)) / c);
        out[off] = falseEasting + a * DegreeTrig.toRadians(dlon);
        out[off + 1] = falseNorthing + (s < 0 ? -a * psi : a * psi);
        if (full) {
            out[off + 2] = Math.sqrt(1 - e2 * s * s) / c;
            out[off + 3] = 0.0;
        }
    }

    @Override
    void inverse(double easting, double northing, double[] out, int off) {
        Checks.grid(easting, northing);
        double x = (easting - falseEasting) / a;
        if (!(Math.abs(x) <= Math.PI)) {
            throw new ProjectionDomainException("easting " + easting + " is more than half the world ("
                + Math.PI * a + " m) from the false easting " + falseEasting + " of " + name);
        }
        double y = (northing - falseNorthing) / a;
        double lat = DegreeTrig.atan2(Math.sinh(y), 1.0);
        if (Math.abs(lat) == 90.0) {
            throw new ProjectionDomainException("northing " + northing + " is so far from the false northing that "
                + "it rounds to a pole on " + name);
        }
        out[off] = lat;
        out[off + 1] = Checks.normalizeLongitude(longitudeOfOrigin + DegreeTrig.toDegrees(x));
    }

    @Override
    public String toString() {
        return name;
    }
}
