package io.geotick.geodesy.local;

import io.geotick.geodesy.InvalidCoordinateException;
import io.geotick.geodesy.InvalidCovarianceException;
import io.geotick.geodesy.angle.DegreeTrig;
import io.geotick.geodesy.ecef.EcefConverter;
import io.geotick.geodesy.ellipsoid.Ellipsoid;
import io.geotick.geodesy.position.EcefPosition;
import io.geotick.geodesy.position.GeodeticPosition;
import java.util.Objects;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.RealMatrix;

/**
 * A local tangent frame (east, north, up) about an origin on an ellipsoid: EPSG method 9836,
 * geocentric/topocentric conversion (IOGP Guidance Note 7-2, §4.1.2). Immutable and thread-safe.
 *
 * <p>With the origin at geodetic (φ₀, λ₀) and ECEF position (X₀, Y₀, Z₀), a point's ENU components are
 * R·(X − X₀, Y − Y₀, Z − Z₀) with the rotation
 * <pre>
 *   R = | −sin λ₀          cos λ₀          0      |
 *       | −sin φ₀ cos λ₀   −sin φ₀ sin λ₀  cos φ₀ |
 *       |  cos φ₀ cos λ₀    cos φ₀ sin λ₀  sin φ₀ |
 * </pre>
 * and the inverse uses the transpose. The conversion is exact (a rotation and a translation); the
 * result is within a few ulps of the coordinates involved. NED and AER are re-expressions of ENU
 * ({@link Enu#toNed()}, {@link Aer#fromEnu(Enu)}).
 *
 * <p>Every conversion exists between ECEF or geodetic coordinates (on this frame's ellipsoid) and each of
 * ENU, NED and AER, for single points and as allocation-free array variants over interleaved triples
 * ({@code ecefToEnu}, {@code geodeticToAer}, …) whose results are bit-for-bit the single-point ones (with
 * the optional SIMD kernels on, geodetic results of the batch inverse may differ by about an ulp: see
 * {@link io.geotick.geodesy.ecef.EcefConverter#toGeodetic(double[], int, double[], int, int)}).
 * Vectors (velocities, baselines) rotate without translation, and 3×3 covariances rotate as R C Rᵀ;
 * {@link #accuracyOf} derives the accuracy figures of an ECEF covariance in this frame. Invalid input
 * (non-finite values, results that overflow, points with no geodetic coordinates) is an
 * {@link InvalidCoordinateException} or {@link InvalidCovarianceException} naming the value.
 */
public final class LocalFrame {
    private final Ellipsoid ellipsoid;
    private final EcefConverter converter;
    private final GeodeticPosition originGeodetic;
    private final EcefPosition originEcef;
    // Rows of R: east, north, up unit vectors in ECEF.
    private final double ex;
    private final double ey;
    private final double nx;
    private final double ny;
    private final double nz;
    private final double ux;
    private final double uy;
    private final double uz;
    private static final String[] ECEF_AXES = {"x", "y", "z"};
    private static final String[] ENU_AXES = {"east", "north", "up"};

    private LocalFrame(Ellipsoid ellipsoid, GeodeticPosition g, EcefPosition e) {
        this.ellipsoid = ellipsoid;
        this.converter = EcefConverter.of(ellipsoid);
        this.originGeodetic = g;
        this.originEcef = e;
        double[] sc = new double[4];
        DegreeTrig.sinCos(g.latitude(), sc, 0);
        DegreeTrig.sinCos(g.longitude(), sc, 2);
        double sp = sc[0];
        double cp = sc[1];
        double sl = sc[2];
        double cl = sc[3];
        ex = -sl;
        ey = cl;
        nx = -sp * cl;
        ny = -sp * sl;
        nz = cp;
        ux = cp * cl;
        uy = cp * sl;
        uz = sp;
    }

    /** The frame about a geodetic origin on the given ellipsoid. */
    public static LocalFrame at(GeodeticPosition origin, Ellipsoid ellipsoid) {
        Objects.requireNonNull(origin, "origin");
        EcefConverter c = EcefConverter.of(Objects.requireNonNull(ellipsoid, "ellipsoid"));
        return new LocalFrame(ellipsoid, origin, c.toEcef(origin));
    }

    /** The frame about an ECEF origin; its orientation follows the origin's geodetic latitude and longitude. */
    public static LocalFrame at(EcefPosition origin, Ellipsoid ellipsoid) {
        Objects.requireNonNull(origin, "origin");
        EcefConverter c = EcefConverter.of(Objects.requireNonNull(ellipsoid, "ellipsoid"));
        return new LocalFrame(ellipsoid, c.toGeodetic(origin), origin);
    }

    public Ellipsoid ellipsoid() {
        return ellipsoid;
    }

    public GeodeticPosition originGeodetic() {
        return originGeodetic;
    }

    public EcefPosition originEcef() {
        return originEcef;
    }

    /** ECEF → ENU. */
    public Enu toEnu(EcefPosition p) {
        double[] out = new double[3];
        ecefToEnu(p.x(), p.y(), p.z(), out, 0);
        return new Enu(out[0], out[1], out[2]);
    }

    /** ENU → ECEF. */
    public EcefPosition toEcef(Enu v) {
        double[] out = new double[3];
        enuToEcef(v.east(), v.north(), v.up(), out, 0);
        return new EcefPosition(out[0], out[1], out[2]);
    }

    /** Geodetic (on this frame's ellipsoid) → ENU. */
    public Enu toEnu(GeodeticPosition p) {
        return toEnu(converter.toEcef(p));
    }

    /** ENU → geodetic (on this frame's ellipsoid). */
    public GeodeticPosition toGeodetic(Enu v) {
        return converter.toGeodetic(toEcef(v));
    }

    /** ECEF → NED. */
    public Ned toNed(EcefPosition p) {
        return toEnu(p).toNed();
    }

    /** NED → ECEF. */
    public EcefPosition toEcef(Ned v) {
        return toEcef(v.toEnu());
    }

    /** Geodetic (on this frame's ellipsoid) → NED. */
    public Ned toNed(GeodeticPosition p) {
        return toEnu(p).toNed();
    }

    /** NED → geodetic (on this frame's ellipsoid). */
    public GeodeticPosition toGeodetic(Ned v) {
        return toGeodetic(v.toEnu());
    }

    /** ECEF → azimuth, elevation, range. */
    public Aer toAer(EcefPosition p) {
        return Aer.fromEnu(toEnu(p));
    }

    /** Azimuth, elevation, range → ECEF. */
    public EcefPosition toEcef(Aer v) {
        return toEcef(v.toEnu());
    }

    /** Geodetic (on this frame's ellipsoid) → azimuth, elevation, range. */
    public Aer toAer(GeodeticPosition p) {
        return Aer.fromEnu(toEnu(p));
    }

    /** Azimuth, elevation, range → geodetic (on this frame's ellipsoid). */
    public GeodeticPosition toGeodetic(Aer v) {
        return toGeodetic(v.toEnu());
    }

    /**
     * Rotates a vector (a velocity, a baseline) from ECEF axes to ENU axes; no translation. The norm is
     * preserved to rounding.
     *
     * @throws InvalidCoordinateException if a component is not finite
     */
    public Vector3D rotateToEnu(Vector3D ecef) {
        double[] out = new double[3];
        rotateToEnu(ecef.getX(), ecef.getY(), ecef.getZ(), out, 0);
        checkFinite(out, ecef);
        return new Vector3D(out[0], out[1], out[2]);
    }

    /**
     * Rotates a vector from ENU axes to ECEF axes; no translation.
     *
     * @throws InvalidCoordinateException if a component is not finite
     */
    public Vector3D rotateToEcef(Vector3D enu) {
        double[] out = new double[3];
        rotateToEcef(enu.getX(), enu.getY(), enu.getZ(), out, 0);
        checkFinite(out, enu);
        return new Vector3D(out[0], out[1], out[2]);
    }

    /** The rotation matrix R (ECEF → ENU) as a new Hipparchus matrix; rows are east, north, up. */
    public RealMatrix rotationToEnu() {
        return MatrixUtils.createRealMatrix(new double[][] {{ex, ey, 0}, {nx, ny, nz}, {ux, uy, uz}});
    }

    /**
     * Rotates a 3×3 ECEF covariance (m²) into ENU axes: C_enu = R C_ecef Rᵀ (exact similarity transform;
     * the result is symmetrised, (M + Mᵀ)/2, to remove the rounding asymmetry of the product).
     *
     * @throws InvalidCovarianceException unless the matrix is 3×3, finite, symmetric (to 1e-9 of its
     *     largest variance) and positive semi-definite
     */
    public RealMatrix covarianceToEnu(RealMatrix ecefCovariance) {
        RealMatrix c = Covariances.checked(ecefCovariance, ECEF_AXES);
        RealMatrix r = rotationToEnu();
        return Covariances.symmetrised(r.multiply(c).multiplyTransposed(r));
    }

    /**
     * Rotates a 3×3 ENU covariance (m²) into ECEF axes: C_ecef = Rᵀ C_enu R, symmetrised.
     *
     * @throws InvalidCovarianceException as {@link #covarianceToEnu}
     */
    public RealMatrix covarianceToEcef(RealMatrix enuCovariance) {
        RealMatrix c = Covariances.checked(enuCovariance, ENU_AXES);
        RealMatrix r = rotationToEnu();
        return Covariances.symmetrised(r.transposeMultiply(c).multiply(r));
    }

    /**
     * The accuracy figures (σE, σN, σU, DRMS, CEP50, error ellipse, …) of a position whose ECEF
     * covariance (m²) is given, in this frame's east-north-up axes: {@code
     * AccuracyFigures.fromEnuCovariance(covarianceToEnu(ecefCovariance))}.
     *
     * @throws InvalidCovarianceException as {@link #covarianceToEnu}
     */
    public AccuracyFigures accuracyOf(RealMatrix ecefCovariance) {
        return AccuracyFigures.fromEnuCovariance(covarianceToEnu(ecefCovariance));
    }

    // ---------------------------------------------------------------------------------------------
    // Array (batch) variants. Every one reads count interleaved triples from in[inOffset..] and writes
    // count triples to out[outOffset..]; in and out may be the same array at the same offset (in place).
    // Nothing is allocated per point, and each result is bit-for-bit the single-point method's (but see the
    // class description for the optional SIMD kernels). An
    // invalid point throws InvalidCoordinateException naming its index; out is then unspecified.
    // ---------------------------------------------------------------------------------------------

    /** ECEF (x, y, z) → ENU (e, n, u), arrays; as {@link #toEnu(EcefPosition)}. */
    public void ecefToEnu(double[] in, int inOffset, double[] out, int outOffset, int count) {
        checkRange(in, inOffset, out, outOffset, count);
        for (int i = 0; i < count; i++) {
            int k = inOffset + 3 * i;
            int o = outOffset + 3 * i;
            double x = in[k];
            double y = in[k + 1];
            double z = in[k + 2];
            checkFiniteEcef(x, y, z, i);
            ecefToEnu(x, y, z, out, o);
            checkFinite(out, o, "ENU", i);
        }
    }

    /** ENU (e, n, u) → ECEF (x, y, z), arrays; as {@link #toEcef(Enu)}. */
    public void enuToEcef(double[] in, int inOffset, double[] out, int outOffset, int count) {
        checkRange(in, inOffset, out, outOffset, count);
        for (int i = 0; i < count; i++) {
            int k = inOffset + 3 * i;
            int o = outOffset + 3 * i;
            double e = in[k];
            double n = in[k + 1];
            double u = in[k + 2];
            checkFiniteLocal(e, n, u, "ENU", i);
            enuToEcef(e, n, u, out, o);
            checkFinite(out, o, "ECEF", i);
        }
    }

    /** ECEF (x, y, z) → NED (n, e, d), arrays; as {@link #toNed(EcefPosition)}. */
    public void ecefToNed(double[] in, int inOffset, double[] out, int outOffset, int count) {
        ecefToEnu(in, inOffset, out, outOffset, count);
        enuNedSwap(out, outOffset, count);
    }

    /** NED (n, e, d) → ECEF (x, y, z), arrays; as {@link #toEcef(Ned)}. */
    public void nedToEcef(double[] in, int inOffset, double[] out, int outOffset, int count) {
        checkRange(in, inOffset, out, outOffset, count);
        for (int i = 0; i < count; i++) {
            int k = inOffset + 3 * i;
            int o = outOffset + 3 * i;
            double n = in[k];
            double e = in[k + 1];
            double d = in[k + 2];
            checkFiniteLocal(n, e, d, "NED", i);
            enuToEcef(e, n, -d, out, o);
            checkFinite(out, o, "ECEF", i);
        }
    }

    /** ECEF (x, y, z) → (azimuth°, elevation°, range m), arrays; as {@link #toAer(EcefPosition)}. */
    public void ecefToAer(double[] in, int inOffset, double[] out, int outOffset, int count) {
        ecefToEnu(in, inOffset, out, outOffset, count);
        enuToAerInPlace(out, outOffset, count);
    }

    /** (azimuth°, elevation°, range m) → ECEF (x, y, z), arrays; as {@link #toEcef(Aer)}. */
    public void aerToEcef(double[] in, int inOffset, double[] out, int outOffset, int count) {
        checkRange(in, inOffset, out, outOffset, count);
        for (int i = 0; i < count; i++) {
            int k = inOffset + 3 * i;
            int o = outOffset + 3 * i;
            double az = in[k];
            double el = in[k + 1];
            double r = in[k + 2];
            String problem = Aer.problem(az, el, r);
            if (problem != null) {
                throw new InvalidCoordinateException("point " + i + ": " + problem);
            }
            Aer.aerToEnu(az, el, r, out, o);
            enuToEcef(out[o], out[o + 1], out[o + 2], out, o);
            checkFinite(out, o, "ECEF", i);
        }
    }

    /** Geodetic (φ°, λ°, h) → ENU (e, n, u), arrays; as {@link #toEnu(GeodeticPosition)}. */
    public void geodeticToEnu(double[] in, int inOffset, double[] out, int outOffset, int count) {
        checkRange(in, inOffset, out, outOffset, count);
        converter.toEcef(in, inOffset, out, outOffset, count);
        ecefToEnu(out, outOffset, out, outOffset, count);
    }

    /** ENU (e, n, u) → geodetic (φ°, λ°, h), arrays; as {@link #toGeodetic(Enu)}. */
    public void enuToGeodetic(double[] in, int inOffset, double[] out, int outOffset, int count) {
        enuToEcef(in, inOffset, out, outOffset, count);
        converter.toGeodetic(out, outOffset, out, outOffset, count);
    }

    /** Geodetic (φ°, λ°, h) → NED (n, e, d), arrays; as {@link #toNed(GeodeticPosition)}. */
    public void geodeticToNed(double[] in, int inOffset, double[] out, int outOffset, int count) {
        geodeticToEnu(in, inOffset, out, outOffset, count);
        enuNedSwap(out, outOffset, count);
    }

    /** NED (n, e, d) → geodetic (φ°, λ°, h), arrays; as {@link #toGeodetic(Ned)}. */
    public void nedToGeodetic(double[] in, int inOffset, double[] out, int outOffset, int count) {
        nedToEcef(in, inOffset, out, outOffset, count);
        converter.toGeodetic(out, outOffset, out, outOffset, count);
    }

    /** Geodetic (φ°, λ°, h) → (azimuth°, elevation°, range m), arrays; as {@link #toAer(GeodeticPosition)}. */
    public void geodeticToAer(double[] in, int inOffset, double[] out, int outOffset, int count) {
        geodeticToEnu(in, inOffset, out, outOffset, count);
        enuToAerInPlace(out, outOffset, count);
    }

    /** (azimuth°, elevation°, range m) → geodetic (φ°, λ°, h), arrays; as {@link #toGeodetic(Aer)}. */
    public void aerToGeodetic(double[] in, int inOffset, double[] out, int outOffset, int count) {
        aerToEcef(in, inOffset, out, outOffset, count);
        converter.toGeodetic(out, outOffset, out, outOffset, count);
    }

    /** Rotates vectors from ECEF axes to ENU axes, arrays; as {@link #rotateToEnu(Vector3D)}. */
    public void rotateToEnu(double[] in, int inOffset, double[] out, int outOffset, int count) {
        checkRange(in, inOffset, out, outOffset, count);
        for (int i = 0; i < count; i++) {
            int k = inOffset + 3 * i;
            int o = outOffset + 3 * i;
            rotateToEnu(in[k], in[k + 1], in[k + 2], out, o);
            checkFinite(out, o, "rotated vector", i);
        }
    }

    /** Rotates vectors from ENU axes to ECEF axes, arrays; as {@link #rotateToEcef(Vector3D)}. */
    public void rotateToEcef(double[] in, int inOffset, double[] out, int outOffset, int count) {
        checkRange(in, inOffset, out, outOffset, count);
        for (int i = 0; i < count; i++) {
            int k = inOffset + 3 * i;
            int o = outOffset + 3 * i;
            rotateToEcef(in[k], in[k + 1], in[k + 2], out, o);
            checkFinite(out, o, "rotated vector", i);
        }
    }

    // --- the arithmetic, shared by the single-point and array variants ---

    private void ecefToEnu(double x, double y, double z, double[] out, int o) {
        double dx = x - originEcef.x();
        double dy = y - originEcef.y();
        double dz = z - originEcef.z();
        rotateToEnu(dx, dy, dz, out, o);
    }

    private void enuToEcef(double e, double n, double u, double[] out, int o) {
        rotateToEcef(e, n, u, out, o);
        out[o] += originEcef.x();
        out[o + 1] += originEcef.y();
        out[o + 2] += originEcef.z();
    }

    private void rotateToEnu(double x, double y, double z, double[] out, int o) {
        out[o] = ex * x + ey * y;
        out[o + 1] = nx * x + ny * y + nz * z;
        out[o + 2] = ux * x + uy * y + uz * z;
    }

    private void rotateToEcef(double e, double n, double u, double[] out, int o) {
        out[o] = ex * e + nx * n + ux * u;
        out[o + 1] = ey * e + ny * n + uy * u;
        out[o + 2] = nz * n + uz * u;
    }

    private static void enuNedSwap(double[] a, int off, int count) {
        for (int i = 0; i < count; i++) {
            int o = off + 3 * i;
            double e = a[o];
            a[o] = a[o + 1];
            a[o + 1] = e;
            a[o + 2] = -a[o + 2];
        }
    }

    private static void enuToAerInPlace(double[] a, int off, int count) {
        for (int i = 0; i < count; i++) {
            int o = off + 3 * i;
            Aer.enuToAer(a[o], a[o + 1], a[o + 2], a, o);
            if (Double.isInfinite(a[o + 2])) {
                throw new InvalidCoordinateException("point " + i + ": the range overflows");
            }
        }
    }

    private static void checkRange(double[] in, int inOffset, double[] out, int outOffset, int count) {
        Objects.requireNonNull(in, "in");
        Objects.requireNonNull(out, "out");
        if (count < 0) {
            throw new IllegalArgumentException("count must not be negative, got " + count);
        }
        Objects.checkFromIndexSize(inOffset, 3 * count, in.length);
        Objects.checkFromIndexSize(outOffset, 3 * count, out.length);
    }

    private static void checkFiniteEcef(double x, double y, double z, int i) {
        if (!(Double.isFinite(x) && Double.isFinite(y) && Double.isFinite(z))) {
            throw new InvalidCoordinateException("point " + i + ": ECEF (" + x + ", " + y + ", " + z
                + ") m is not finite");
        }
    }

    private static void checkFiniteLocal(double a, double b, double c, String frame, int i) {
        if (!(Double.isFinite(a) && Double.isFinite(b) && Double.isFinite(c))) {
            throw new InvalidCoordinateException("point " + i + ": " + frame + " (" + a + ", " + b + ", " + c
                + ") m is not finite");
        }
    }

    private static void checkFinite(double[] out, int o, String what, int i) {
        if (!(Double.isFinite(out[o]) && Double.isFinite(out[o + 1]) && Double.isFinite(out[o + 2]))) {
            throw new InvalidCoordinateException("point " + i + ": the " + what + " result overflows");
        }
    }

    private static void checkFinite(double[] out, Vector3D v) {
        if (!(Double.isFinite(out[0]) && Double.isFinite(out[1]) && Double.isFinite(out[2]))) {
            throw new InvalidCoordinateException("vector " + v + " is not finite (or its rotation overflows)");
        }
    }

    @Override
    public String toString() {
        return "LocalFrame[origin " + originGeodetic + " on " + ellipsoid.name() + "]";
    }
}
