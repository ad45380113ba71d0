package io.geotick.transforms.projection;

import io.geotick.geodesy.ellipsoid.Ellipsoid;
import io.geotick.geodesy.ellipsoid.Ellipsoids;
import java.util.Objects;

/**
 * Universal Polar Stereographic: {@link PolarStereographic} variant A (EPSG 9810) with k₀ = 0.994,
 * λ₀ = 0°, false easting and northing 2 000 000 m, centred on either pole. Immutable and thread-safe.
 *
 * <p>Domain (the UTM/UPS grid definition, NGA/DMA TM 8358.2; values from memory): UPS North from
 * 84°N and UPS South from 80°S, each with the standard 30′ overlap into the UTM area, so latitudes
 * φ ≥ {@value #NORTH_LIMIT}° and φ ≤ {@value #SOUTH_LIMIT}° are accepted; anything else is a
 * {@link ProjectionDomainException} naming the latitude.
 */
public final class Ups extends KernelProjection {
    /** k₀ of UPS. */
    public static final double SCALE_FACTOR = 0.994;
    /** False easting and northing, metres. */
    public static final double FALSE_ORIGIN = 2_000_000.0;
    /** Southernmost latitude of UPS North, degrees (84°N less the 30′ overlap). */
    public static final double NORTH_LIMIT = 83.5;
    /** Northernmost latitude of UPS South, degrees (80°S plus the 30′ overlap). */
    public static final double SOUTH_LIMIT = -79.5;

    private static final double INVERSE_SLACK = 1e-8;

    private final Hemisphere hemisphere;
    private final PolarStereographic ps;

    private Ups(Hemisphere hemisphere, Ellipsoid ellipsoid) {
        this.hemisphere = hemisphere;
        this.ps = PolarStereographic.named(ellipsoid, hemisphere, SCALE_FACTOR, FALSE_ORIGIN, FALSE_ORIGIN,
            "UPS " + (hemisphere == Hemisphere.NORTH ? "North" : "South") + " (" + ellipsoid.name() + ")");
    }

    /** UPS North or South on WGS 84. */
    public static Ups of(Hemisphere hemisphere) {
        return of(hemisphere, Ellipsoids.WGS84);
    }

    /** UPS North or South on another ellipsoid. */
    public static Ups of(Hemisphere hemisphere, Ellipsoid ellipsoid) {
        return new Ups(Objects.requireNonNull(hemisphere, "hemisphere"),
            Objects.requireNonNull(ellipsoid, "ellipsoid"));
    }

    /** The hemisphere (pole) of this grid. */
    public Hemisphere hemisphere() {
        return hemisphere;
    }

    /** {@code "N"} or {@code "S"}. */
    public String zoneName() {
        return String.valueOf(hemisphere.letter());
    }

    /** The EPSG code on WGS 84: 32661 (north) or 32761 (south). */
    public int epsgCode() {
        if (!ps.ellipsoid().equals(Ellipsoids.WGS84)) {
            throw new ProjectionDomainException("no EPSG code for UPS on " + ps.ellipsoid().name()
                + " without naming the datum");
        }
        return hemisphere == Hemisphere.NORTH ? 32661 : 32761;
    }

    /** The underlying polar stereographic projection. */
    public PolarStereographic polarStereographic() {
        return ps;
    }

    @Override
    public String name() {
        return ps.name();
    }

    @Override
    public Ellipsoid ellipsoid() {
        return ps.ellipsoid();
    }

    @Override
    void forward(double latitude, double longitude, double[] out, int off, boolean full) {
        checkLatitude(latitude);
        ps.forward(latitude, longitude, out, off, full);
    }

    @Override
    void inverse(double easting, double northing, double[] out, int off) {
        ps.inverse(easting, northing, out, off);
        double lat = out[off];
        boolean inside = hemisphere == Hemisphere.NORTH ? lat >= NORTH_LIMIT - INVERSE_SLACK
            : lat <= SOUTH_LIMIT + INVERSE_SLACK;
        if (!inside) {
            throw new ProjectionDomainException("grid point (E " + easting + ", N " + northing + ") maps to "
                + "latitude " + lat + "°, outside " + name() + " (" + limitText() + ")");
        }
    }

    private void checkLatitude(double latitude) {
        Checks.latitude(latitude);
        boolean inside = hemisphere == Hemisphere.NORTH ? latitude >= NORTH_LIMIT : latitude <= SOUTH_LIMIT;
        if (!inside) {
            throw new ProjectionDomainException("latitude " + latitude + "° is outside " + name() + " ("
                + limitText() + "; use UTM)");
        }
    }

    private String limitText() {
        return hemisphere == Hemisphere.NORTH ? "latitudes from 83.5°N, i.e. 84°N less the 30' overlap"
            : "latitudes from 79.5°S, i.e. 80°S plus the 30' overlap";
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Ups && ((Ups) o).hemisphere == hemisphere && ((Ups) o).ellipsoid().equals(ellipsoid());
    }

    @Override
    public int hashCode() {
        return Objects.hash(hemisphere, ellipsoid());
    }

    @Override
    public String toString() {
        return name();
    }
}
