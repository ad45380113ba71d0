package io.geotick.geodesy.position;

import io.geotick.geodesy.InvalidCoordinateException;

/**
 * Earth-centred, Earth-fixed Cartesian coordinates in metres: origin at the centre of mass, z towards
 * the conventional pole, x towards the reference meridian in the equatorial plane, y completing a
 * right-handed frame. All three must be finite.
 *
 * @param x metres
 * @param y metres
 * @param z metres
 */
public record EcefPosition(double x, double y, double z) {

    public EcefPosition {
        check("x", x);
        check("y", y);
        check("z", z);
    }

    /** The position (x, y, z), metres. */
    public static EcefPosition of(double x, double y, double z) {
        return new EcefPosition(x, y, z);
    }

    /** Distance from the origin, metres. */
    public double norm() {
        return Math.sqrt(x * x + y * y + z * z);
    }

    /** Straight-line distance to another position, metres. */
    public double distanceTo(EcefPosition o) {
        double dx = x - o.x;
        double dy = y - o.y;
        double dz = z - o.z;
        return Math.sqrt(dx * dx + dy * dy + dz * dz);
    }

    private static void check(String axis, double v) {
        if (!Double.isFinite(v)) {
            throw new InvalidCoordinateException("ECEF " + axis + " = " + v + " m is not a finite number");
        }
    }
}
