package io.geotick.transforms.epsg;

import io.geotick.geodesy.ellipsoid.Ellipsoid;
import io.geotick.geodesy.position.GeodeticPosition;
import io.geotick.transforms.projection.GridPosition;
import io.geotick.transforms.projection.MapProjection;
import io.geotick.transforms.projection.ProjectionDomainException;
import org.locationtech.proj4j.ProjCoordinate;
import org.locationtech.proj4j.proj.Projection;

/**
 * A Proj4J projection object behind the {@link MapProjection} interface, for methods the project does not
 * implement itself. Grid values are in metres, like every projection of the project: Proj4J's own results
 * are in the system's unit (its projection multiplies by {@code getFromMetres()}, applied to the false
 * easting and northing too, which its definitions hold in metres), so they are divided by that factor
 * here and grid input is multiplied by it. That adds one rounding (about 1e-16 relative, 0.1 nm at
 * 1 000 km) to Proj4J's own accuracy. {@link EpsgSystem#projection()} then expresses the values in the
 * system's unit.
 *
 * <p>Some Proj4J projections keep scratch values in fields while they compute (its Cassini-Soldner does),
 * so every call into the Proj4J object is made while holding its lock: the wrapper is thread-safe, at the
 * cost of serialising the calls on one system.
 *
 * <p>Scale and convergence are not given by Proj4J; they are computed here by central differences of the
 * projection over ±1e-6 rad of latitude and longitude: along the parallel, k = |∂(E,N)/∂λ|/(ν cos φ) with
 * ν = a/√(1 − e² sin²φ) (the point scale of a conformal projection; for a non-conformal one it is the scale
 * along the parallel), and γ = atan2(−∂E/∂φ, ∂N/∂φ), the angle from true north to grid north. The
 * differencing error is O(δ²) ≈ 1e-12 relative, below the rounding of the coordinates.
 */
final class Proj4jProjection implements MapProjection {
    private static final double STEP_DEGREES = Math.toDegrees(1e-6);
    private final Projection projection;
    private final Ellipsoid ellipsoid;
    private final String name;
    /** Proj4J's factor from metres to the system's unit (1 for a metre system). */
    private final double fromMetres;

    /** The projection object must not be shared: the wrapper locks on it. */
    Proj4jProjection(Projection projection, Ellipsoid ellipsoid, String name) {
        this.projection = projection;
        this.ellipsoid = ellipsoid;
        this.name = name;
        this.fromMetres = projection.getFromMetres();
    }

    @Override
    public String name() {
        return name;
    }

    @Override
    public Ellipsoid ellipsoid() {
        return ellipsoid;
    }

    private double[] raw(double latitude, double longitude) {
        ProjCoordinate out = new ProjCoordinate();
        try {
            synchronized (projection) {
                projection.project(new ProjCoordinate(longitude, latitude), out);
            }
        } catch (RuntimeException e) {
            throw new ProjectionDomainException("latitude " + latitude + "°, longitude " + longitude
                + "° is outside the domain of " + name + " (" + e.getMessage() + ")");
        }
        if (!Double.isFinite(out.x) || !Double.isFinite(out.y)) {
            throw new ProjectionDomainException("latitude " + latitude + "°, longitude " + longitude
                + "° is outside the domain of " + name);
        }
        return fromMetres == 1 ? new double[] {out.x, out.y} : new double[] {out.x / fromMetres, out.y / fromMetres};
    }

    @Override
    public GridPosition project(double latitude, double longitude) {
        if (!(Math.abs(latitude) <= 90) || !(Math.abs(longitude) <= 360)) {
            throw new ProjectionDomainException("latitude " + latitude + "° / longitude " + longitude
                + "° out of range for " + name);
        }
        double[] p = raw(latitude, longitude);
        double d = STEP_DEGREES;
        double[] e1 = raw(latitude, longitude + d);
        double[] e0 = raw(latitude, longitude - d);
        // One-sided in latitude at the poles, where the meridian ends.
        double up = Math.min(latitude + d, 90);
        double down = Math.max(latitude - d, -90);
        double[] n1 = raw(up, longitude);
        double[] n0 = raw(down, longitude);
        double phi = Math.toRadians(latitude);
        double s = Math.sin(phi);
        double nu = ellipsoid.semiMajorAxis() / Math.sqrt(1 - ellipsoid.eccentricitySquared() * s * s);
        double dLam = Math.toRadians(2 * d);
        double k = Math.hypot(e1[0] - e0[0], e1[1] - e0[1]) / dLam / (nu * Math.cos(phi));
        double gamma = Math.toDegrees(Math.atan2(-(n1[0] - n0[0]), n1[1] - n0[1]));
        return new GridPosition(p[0], p[1], k, gamma);
    }

    @Override
    public GeodeticPosition unproject(double easting, double northing) {
        if (!Double.isFinite(easting) || !Double.isFinite(northing)) {
            throw new ProjectionDomainException("easting " + easting + " / northing " + northing
                + " is not a finite number");
        }
        ProjCoordinate out = new ProjCoordinate();
        try {
            synchronized (projection) {
                projection.inverseProject(new ProjCoordinate(easting * fromMetres, northing * fromMetres), out);
            }
        } catch (RuntimeException e) {
            throw new ProjectionDomainException("easting " + easting + " m, northing " + northing
                + " m maps to no point of " + name + " (" + e.getMessage() + ")");
        }
        if (!Double.isFinite(out.x) || !Double.isFinite(out.y) || Math.abs(out.y) > 90) {
            throw new ProjectionDomainException("easting " + easting + " m, northing " + northing
                + " m maps to no point of " + name);
        }
        double lon = out.x > 180 ? out.x - 360 : out.x <= -180 ? out.x + 360 : out.x;
        return GeodeticPosition.of(out.y, lon, 0);
    }

    @Override
    public void project(double[] src, int srcOff, double[] dst, int dstOff, int count) {
        for (int i = 0; i < count; i++) {
            double[] p;
            try {
                p = raw(src[srcOff + 2 * i], src[srcOff + 2 * i + 1]);
            } catch (ProjectionDomainException e) {
                throw new ProjectionDomainException("point " + i + ": " + e.getMessage());
            }
            dst[dstOff + 2 * i] = p[0];
            dst[dstOff + 2 * i + 1] = p[1];
        }
    }

    @Override
    public void unproject(double[] src, int srcOff, double[] dst, int dstOff, int count) {
        for (int i = 0; i < count; i++) {
            GeodeticPosition g;
            try {
                g = unproject(src[srcOff + 2 * i], src[srcOff + 2 * i + 1]);
            } catch (ProjectionDomainException e) {
                throw new ProjectionDomainException("point " + i + ": " + e.getMessage());
            }
            dst[dstOff + 2 * i] = g.latitude();
            dst[dstOff + 2 * i + 1] = g.longitude();
        }
    }

    @Override
    public String toString() {
        return name;
    }
}
