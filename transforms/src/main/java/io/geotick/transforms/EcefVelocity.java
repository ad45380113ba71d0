package io.geotick.transforms;

import io.geotick.geodesy.InvalidCoordinateException;

/**
 * A station velocity in an Earth-centred frame, metres per year, as published with ITRF/ETRF station
 * coordinates. All three components must be finite.
 *
 * @param vx metres per year
 * @param vy metres per year
 * @param vz metres per year
 */
public record EcefVelocity(double vx, double vy, double vz) {

    public EcefVelocity {
        if (!Double.isFinite(vx) || !Double.isFinite(vy) || !Double.isFinite(vz)) {
            throw new InvalidCoordinateException("velocity (" + vx + ", " + vy + ", " + vz
                + ") m/yr is not finite");
        }
    }

    /** The velocity (vx, vy, vz) in m/yr. */
    public static EcefVelocity of(double vx, double vy, double vz) {
        return new EcefVelocity(vx, vy, vz);
    }

    /** The velocity from millimetres per year, the unit of station velocity tables. */
    public static EcefVelocity ofMillimetresPerYear(double vx, double vy, double vz) {
        return new EcefVelocity(vx / 1000, vy / 1000, vz / 1000);
    }
}
