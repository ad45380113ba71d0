package io.geotick.transforms.helmert;

import io.geotick.geodesy.position.EcefPosition;

/**
 * Geocentric translations (EPSG method 1031 in the geocentric domain, 9603 applied to geographic
 * coordinates through ECEF): X_T = X_S + T. Source: IOGP Guidance Note 7-2, §4.3.2. The reverse is the
 * negated translation, which is also the exact inverse. Rounding: one addition per axis (≤ 0.5 ulp,
 * ~5e-10 m). Immutable and thread-safe.
 */
public final class GeocentricTranslation implements GeocentricTransform {
    private final double tx;
    private final double ty;
    private final double tz;
    private final AffineGeocentric kernel;

    private GeocentricTranslation(double tx, double ty, double tz) {
        HelmertParameters.ofTranslation(tx, ty, tz); // validates: finite
        this.tx = tx;
        this.ty = ty;
        this.tz = tz;
        this.kernel = new AffineGeocentric(new double[3][3], new double[] {tx, ty, tz},
            "Geocentric translations (EPSG method 1031 / 9603)", null);
    }

    /** The translation (tx, ty, tz) in metres. */
    public static GeocentricTranslation of(double tx, double ty, double tz) {
        return new GeocentricTranslation(tx, ty, tz);
    }

    /** The parameters as a Helmert set with zero rotations and scale. */
    public HelmertParameters parameters() {
        return HelmertParameters.ofTranslation(tx, ty, tz);
    }

    @Override
    public EcefPosition apply(EcefPosition source) {
        return kernel.apply(source);
    }

    @Override
    public void apply(double[] in, int inOffset, double[] out, int outOffset, int count) {
        kernel.apply(in, inOffset, out, outOffset, count);
    }

    /** The negated translation: exact inverse (to one rounding per axis). */
    @Override
    public GeocentricTranslation inverse() {
        return new GeocentricTranslation(-tx, -ty, -tz);
    }

    @Override
    public String description() {
        return kernel.description();
    }

    @Override
    public String toString() {
        return description() + " (" + tx + ", " + ty + ", " + tz + ") m";
    }
}
