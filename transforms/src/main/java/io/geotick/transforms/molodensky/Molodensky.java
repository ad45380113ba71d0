package io.geotick.transforms.molodensky;

import io.geotick.geodesy.InvalidCoordinateException;
import io.geotick.geodesy.angle.DegreeTrig;
import io.geotick.geodesy.ellipsoid.Ellipsoid;
import io.geotick.geodesy.position.GeodeticPosition;
import java.util.Objects;

/**
 * Molodensky (EPSG 9604) and abridged Molodensky (EPSG 9605) transformations of geodetic coordinates.
 * Immutable and thread-safe.
 *
 * <h2>Formulas (IOGP Guidance Note 7-2, §4.4.1 and §4.4.2)</h2>
 * With ρ = a(1 − e²)/(1 − e² sin²φ)^{3/2}, ν = a/(1 − e² sin²φ)^{1/2} on the source ellipsoid,
 * Δa = a_T − a_S, Δf = f_T − f_S, and the geocentric translations ΔX, ΔY, ΔZ (source → target):
 * <pre>
 * Molodensky:
 *   Δφ = [−ΔX sinφ cosλ − ΔY sinφ sinλ + ΔZ cosφ + Δa (ν e² sinφ cosφ)/a
 *         + Δf (ρ a/b + ν b/a) sinφ cosφ] / (ρ + h)
 *   Δλ = (−ΔX sinλ + ΔY cosλ) / ((ν + h) cosφ)
 *   Δh = ΔX cosφ cosλ + ΔY cosφ sinλ + ΔZ sinφ − Δa a/ν + Δf (b/a) ν sin²φ
 * Abridged:
 *   Δφ = (−ΔX sinφ cosλ − ΔY sinφ sinλ + ΔZ cosφ + (a Δf + f Δa) sin 2φ) / ρ
 *   Δλ = (−ΔX sinλ + ΔY cosλ) / (ν cosφ)
 *   Δh = ΔX cosφ cosλ + ΔY cosφ sinλ + ΔZ sinφ + (a Δf + f Δa) sin²φ − Δa
 * </pre>
 * (Δφ, Δλ in radians here; the Guidance Note divides by sin 1″ to get arc-seconds.)
 *
 * <h2>Accuracy</h2>
 * These are first-order expansions of the geocentric-translation route (EPSG 9603). For translations of
 * ~100 m and ellipsoid differences like WGS 84/International 1924 the full Molodensky stays within a few
 * centimetres of it, the abridged form within about a metre in height and a few decimetres horizontally
 * (the size of the omitted terms, of order Δ²/R and Δ·h/R); the reference tests measure it. The reverse
 * ({@link #reversed()}) swaps the ellipsoids and negates the translations, as EPSG defines it; a round trip
 * then closes to a small multiple of Δ²/R (1–2 cm for the ~150 m shifts of ED50, measured by the tests),
 * not to rounding.
 */
public final class Molodensky {
    private final Ellipsoid source;
    private final Ellipsoid target;
    private final double dx;
    private final double dy;
    private final double dz;
    private final boolean abridged;
    private final double a;
    private final double b;
    private final double f;
    private final double e2;
    private final double da;
    private final double df;

    private Molodensky(Ellipsoid source, Ellipsoid target, double dx, double dy, double dz, boolean abridged) {
        this.source = Objects.requireNonNull(source, "source ellipsoid");
        this.target = Objects.requireNonNull(target, "target ellipsoid");
        if (!Double.isFinite(dx) || !Double.isFinite(dy) || !Double.isFinite(dz)) {
            throw new IllegalArgumentException("Molodensky translations (" + dx + ", " + dy + ", " + dz
                + ") m must be finite");
        }
        this.dx = dx;
        this.dy = dy;
        this.dz = dz;
        this.abridged = abridged;
        this.a = source.semiMajorAxis();
        this.b = source.semiMinorAxis();
        this.f = source.flattening();
        this.e2 = source.eccentricitySquared();
        this.da = target.semiMajorAxis() - source.semiMajorAxis();
        this.df = target.flattening() - source.flattening();
    }

    /** Molodensky (EPSG 9604) from {@code source} to {@code target} with translations in metres. */
    public static Molodensky of(Ellipsoid source, Ellipsoid target, double dx, double dy, double dz) {
        return new Molodensky(source, target, dx, dy, dz, false);
    }

    /** Abridged Molodensky (EPSG 9605). */
    public static Molodensky abridged(Ellipsoid source, Ellipsoid target, double dx, double dy, double dz) {
        return new Molodensky(source, target, dx, dy, dz, true);
    }

    /** True for the abridged form. */
    public boolean isAbridged() {
        return abridged;
    }

    /** EPSG method code: 9604 or 9605. */
    public int epsgMethod() {
        return abridged ? 9605 : 9604;
    }

    /** Source ellipsoid. */
    public Ellipsoid sourceEllipsoid() {
        return source;
    }

    /** Target ellipsoid. */
    public Ellipsoid targetEllipsoid() {
        return target;
    }

    /** The translations (ΔX, ΔY, ΔZ) in metres. */
    public double[] translations() {
        return new double[] {dx, dy, dz};
    }

    /** Δa = a_T − a_S, metres. */
    public double deltaA() {
        return da;
    }

    /** Δf = f_T − f_S. */
    public double deltaF() {
        return df;
    }

    /** The EPSG reverse: ellipsoids swapped, translations negated (see the class accuracy note). */
    public Molodensky reversed() {
        return new Molodensky(target, source, -dx, -dy, -dz, abridged);
    }

    /** The method description, e.g. "Molodensky (EPSG method 9604)". */
    public String description() {
        return (abridged ? "Abridged Molodensky" : "Molodensky") + " (EPSG method " + epsgMethod() + ")";
    }

    /** Transforms one position. */
    public GeodeticPosition apply(GeodeticPosition p) {
        Objects.requireNonNull(p, "position");
        double[] buf = {p.latitude(), p.longitude(), p.height()};
        apply(buf, 0, buf, 0, 1);
        return new GeodeticPosition(buf[0], buf[1], buf[2]);
    }

    /**
     * Transforms {@code count} interleaved (φ°, λ°, h) triples; in-place allowed; allocates nothing.
     *
     * @throws InvalidCoordinateException for an invalid position or a pole (where Δλ is undefined),
     *     naming its index
     */
    public void apply(double[] in, int inOffset, double[] out, int outOffset, int count) {
        Objects.checkFromIndexSize(inOffset, 3 * count, in.length);
        Objects.checkFromIndexSize(outOffset, 3 * count, out.length);
        for (int i = 0; i < count; i++) {
            int k = inOffset + 3 * i;
            double lat = in[k];
            double lon = in[k + 1];
            double h = in[k + 2];
            if (!(lat > -90 && lat < 90) || !(lon >= -360 && lon <= 360) || !Double.isFinite(h)) {
                throw new InvalidCoordinateException("point " + i + ": (" + lat + "°, " + lon + "°, " + h
                    + " m) is not a valid position for " + description()
                    + " (latitude must be inside (-90°, 90°): the longitude shift is undefined at a pole)");
            }
            double sp = DegreeTrig.sin(lat);
            double cp = DegreeTrig.cos(lat);
            double sl = DegreeTrig.sin(lon);
            double cl = DegreeTrig.cos(lon);
            double w2 = 1 - e2 * sp * sp;
            double nu = a / Math.sqrt(w2);
            double rho = a * (1 - e2) / (w2 * Math.sqrt(w2));
            double common = -dx * sp * cl - dy * sp * sl + dz * cp;
            double dlon = (-dx * sl + dy * cl);
            double up = dx * cp * cl + dy * cp * sl + dz * sp;
            double dphi;
            double dh;
            if (abridged) {
                double k2 = a * df + f * da;
                dphi = (common + k2 * 2 * sp * cp) / rho;
                dlon = dlon / (nu * cp);
                dh = up + k2 * sp * sp - da;
            } else {
                dphi = (common + da * (nu * e2 * sp * cp) / a + df * (rho * a / b + nu * b / a) * sp * cp)
                    / (rho + h);
                dlon = dlon / ((nu + h) * cp);
                dh = up - da * a / nu + df * (b / a) * nu * sp * sp;
            }
            int o = outOffset + 3 * i;
            out[o] = lat + DegreeTrig.toDegrees(dphi);
            out[o + 1] = lon + DegreeTrig.toDegrees(dlon);
            out[o + 2] = h + dh;
        }
    }

    @Override
    public String toString() {
        return description() + " " + source.name() + " → " + target.name() + " (" + dx + ", " + dy + ", "
            + dz + ") m";
    }
}
