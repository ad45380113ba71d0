package io.geotick.transforms.helmert;

/**
 * The seven Helmert parameters in the units of the EPSG dataset and of published tables: translations in
 * metres, rotations in arc-seconds, scale difference in parts per million (the scale factor is
 * 1 + ds·10⁻⁶). The record carries no convention: the same numbers mean opposite rotations in the
 * position-vector and coordinate-frame conventions (see {@link RotationConvention}). Also used for the
 * rates of a time-dependent transformation (m/yr, ″/yr, ppm/yr).
 *
 * @param tx translation along X, metres
 * @param ty translation along Y, metres
 * @param tz translation along Z, metres
 * @param rx rotation about X, arc-seconds
 * @param ry rotation about Y, arc-seconds
 * @param rz rotation about Z, arc-seconds
 * @param ds scale difference, parts per million
 */
public record HelmertParameters(double tx, double ty, double tz, double rx, double ry, double rz, double ds) {

    /** All zero. */
    public static final HelmertParameters ZERO = new HelmertParameters(0, 0, 0, 0, 0, 0, 0);

    public HelmertParameters {
        String[] names = {"tx", "ty", "tz", "rx", "ry", "rz", "ds"};
        double[] v = {tx, ty, tz, rx, ry, rz, ds};
        for (int i = 0; i < v.length; i++) {
            if (!Double.isFinite(v[i])) {
                throw new IllegalArgumentException("Helmert parameter " + names[i] + " = " + v[i]
                    + " is not a finite number");
            }
        }
        if (!(Math.abs(ds) < 1e5)) {
            throw new IllegalArgumentException("Helmert scale difference ds = " + ds
                + " ppm is implausible (|ds| must be below 1e5 ppm)");
        }
    }

    /** Parameters in metres, arc-seconds and ppm. */
    public static HelmertParameters of(double tx, double ty, double tz, double rx, double ry, double rz,
            double ds) {
        return new HelmertParameters(tx, ty, tz, rx, ry, rz, ds);
    }

    /** Translations only (geocentric translations, EPSG 9603). */
    public static HelmertParameters ofTranslation(double tx, double ty, double tz) {
        return new HelmertParameters(tx, ty, tz, 0, 0, 0, 0);
    }

    /**
     * Parameters in the units of the IERS/EUREF tables: millimetres, milliarc-seconds and parts per
     * billion (the same factory serves their rates per year).
     */
    public static HelmertParameters ofMillimetres(double txMm, double tyMm, double tzMm, double rxMas,
            double ryMas, double rzMas, double dsPpb) {
        return new HelmertParameters(txMm / 1000, tyMm / 1000, tzMm / 1000, rxMas / 1000, ryMas / 1000,
            rzMas / 1000, dsPpb / 1000);
    }

    /** Every parameter negated: the usual approximate reverse (see {@link Helmert#reversedBySignReversal}). */
    public HelmertParameters negated() {
        return new HelmertParameters(-tx, -ty, -tz, -rx, -ry, -rz, -ds);
    }

    /** The same transformation in the other rotation convention: rotations negated, the rest unchanged. */
    public HelmertParameters withRotationsNegated() {
        return new HelmertParameters(tx, ty, tz, -rx, -ry, -rz, ds);
    }

    /** this + rates·years, parameter by parameter (the time-dependent Helmert, EPSG 1053/1056). */
    public HelmertParameters plus(HelmertParameters rates, double years) {
        return new HelmertParameters(Math.fma(rates.tx, years, tx), Math.fma(rates.ty, years, ty),
            Math.fma(rates.tz, years, tz), Math.fma(rates.rx, years, rx), Math.fma(rates.ry, years, ry),
            Math.fma(rates.rz, years, rz), Math.fma(rates.ds, years, ds));
    }

    /** True when only the translations are non-zero. */
    public boolean isTranslationOnly() {
        return rx == 0 && ry == 0 && rz == 0 && ds == 0;
    }

    /** The parameters as an ordered name → value map with units in the names, for listings. */
    public java.util.Map<String, Double> toMap() {
        java.util.Map<String, Double> m = new java.util.LinkedHashMap<>();
        m.put("tx (m)", tx);
        m.put("ty (m)", ty);
        m.put("tz (m)", tz);
        m.put("rx (arc-second)", rx);
        m.put("ry (arc-second)", ry);
        m.put("rz (arc-second)", rz);
        m.put("ds (ppm)", ds);
        return java.util.Collections.unmodifiableMap(m);
    }
}
