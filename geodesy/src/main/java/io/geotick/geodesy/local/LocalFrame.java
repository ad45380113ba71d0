package io.geotick.geodesy.local;

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
        double dx = p.x() - originEcef.x();
        double dy = p.y() - originEcef.y();
        double dz = p.z() - originEcef.z();
        return new Enu(ex * dx + ey * dy, nx * dx + ny * dy + nz * dz, ux * dx + uy * dy + uz * dz);
    }

    /** ENU → ECEF. */
    public EcefPosition toEcef(Enu v) {
        double e = v.east();
        double n = v.north();
        double u = v.up();
        return new EcefPosition(originEcef.x() + (ex * e + nx * n + ux * u),
            originEcef.y() + (ey * e + ny * n + uy * u),
            originEcef.z() + (nz * n + uz * u));
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

    /** ECEF → azimuth, elevation, range. */
    public Aer toAer(EcefPosition p) {
        return Aer.fromEnu(toEnu(p));
    }

    /** Azimuth, elevation, range → ECEF. */
    public EcefPosition toEcef(Aer v) {
        return toEcef(v.toEnu());
    }

    /**
     * Rotates a vector (a velocity, a baseline) from ECEF axes to ENU axes; no translation.
     */
    public Vector3D rotateToEnu(Vector3D ecef) {
        double x = ecef.getX();
        double y = ecef.getY();
        double z = ecef.getZ();
        return new Vector3D(ex * x + ey * y, nx * x + ny * y + nz * z, ux * x + uy * y + uz * z);
    }

    /** Rotates a vector from ENU axes to ECEF axes; no translation. */
    public Vector3D rotateToEcef(Vector3D enu) {
        double e = enu.getX();
        double n = enu.getY();
        double u = enu.getZ();
        return new Vector3D(ex * e + nx * n + ux * u, ey * e + ny * n + uy * u, nz * n + uz * u);
    }

    /** The rotation matrix R (ECEF → ENU) as a new Hipparchus matrix; rows are east, north, up. */
    public RealMatrix rotationToEnu() {
        return MatrixUtils.createRealMatrix(new double[][] {{ex, ey, 0}, {nx, ny, nz}, {ux, uy, uz}});
    }

    /** Rotates a 3×3 ECEF covariance into ENU axes: C_enu = R C_ecef Rᵀ. */
    public RealMatrix covarianceToEnu(RealMatrix ecefCovariance) {
        checkCovariance(ecefCovariance);
        RealMatrix r = rotationToEnu();
        return r.multiply(ecefCovariance).multiplyTransposed(r);
    }

    /** Rotates a 3×3 ENU covariance into ECEF axes: C_ecef = Rᵀ C_enu R. */
    public RealMatrix covarianceToEcef(RealMatrix enuCovariance) {
        checkCovariance(enuCovariance);
        RealMatrix r = rotationToEnu();
        return r.transposeMultiply(enuCovariance).multiply(r);
    }

    private static void checkCovariance(RealMatrix m) {
        Objects.requireNonNull(m, "covariance");
        if (m.getRowDimension() != 3 || m.getColumnDimension() != 3) {
            throw new IllegalArgumentException("covariance must be 3×3, got " + m.getRowDimension() + "×"
                + m.getColumnDimension());
        }
    }

    @Override
    public String toString() {
        return "LocalFrame[origin " + originGeodetic + " on " + ellipsoid.name() + "]";
    }
}
