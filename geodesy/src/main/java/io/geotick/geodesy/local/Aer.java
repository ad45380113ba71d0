package io.geotick.geodesy.local;

import io.geotick.geodesy.InvalidCoordinateException;
import io.geotick.geodesy.angle.DegreeTrig;

/**
 * Azimuth, elevation and slant range of a target seen from a local frame's origin.
 *
 * <p>Azimuth is measured clockwise from local north in [0°, 360°); elevation is above the local
 * horizontal plane (the plane normal to the ellipsoid normal) in [−90°, 90°]; range is the straight-line
 * distance in metres, ≥ 0. For a target straight above or below the origin (or at it) the azimuth is 0 by
 * convention.
 *
 * @param azimuth degrees clockwise from north, [0, 360)
 * @param elevation degrees above the horizontal, [−90, 90]
 * @param range metres, ≥ 0
 */
public record Aer(double azimuth, double elevation, double range) {
    public Aer {
        String problem = problem(azimuth, elevation, range);
        if (problem != null) {
            throw new InvalidCoordinateException(problem);
        }
    }

    /** The reason (a, e, r) is not a valid AER, or null if it is. Allocates only when invalid. */
    static String problem(double azimuth, double elevation, double range) {
        if (!(azimuth >= 0 && azimuth < 360)) {
            return "azimuth " + azimuth + "° is outside [0°, 360°)";
        }
        if (!(elevation >= -90 && elevation <= 90)) {
            return "elevation " + elevation + "° is outside [-90°, 90°]";
        }
        if (!(range >= 0) || Double.isInfinite(range)) {
            return "range " + range + " m must be finite and not negative";
        }
        return null;
    }

    public static Aer of(double azimuth, double elevation, double range) {
        return new Aer(azimuth, elevation, range);
    }

    /**
     * The AER of an ENU vector: az = atan2(e, n) mod 360°, el = atan2(u, √(e² + n²)), range = |v|
     * (square roots by {@link Math#hypot}, so no intermediate overflow).
     */
    public static Aer fromEnu(Enu v) {
        double[] out = new double[3];
        enuToAer(v.east(), v.north(), v.up(), out, 0);
        return new Aer(out[0], out[1], out[2]);
    }

    /** The ENU vector: e = r cos el sin az, n = r cos el cos az, u = r sin el. */
    public Enu toEnu() {
        double[] out = new double[3];
        aerToEnu(azimuth, elevation, range, out, 0);
        return new Enu(out[0], out[1], out[2]);
    }

    /** ENU components → (az, el, range) into out[off..off+2]; shared by the single and array variants. */
    static void enuToAer(double e, double n, double u, double[] out, int off) {
        double horiz = Math.hypot(e, n);
        double az = horiz == 0 ? 0.0 : DegreeTrig.atan2(e, n);
        if (az < 0) {
            az += 360.0;
            if (az >= 360.0) { // −tiny + 360 rounds to 360
                az = 0.0;
            }
        }
        out[off] = az + 0.0; // + 0.0 turns a negative zero into 0
        out[off + 1] = DegreeTrig.atan2(u, horiz);
        out[off + 2] = Math.hypot(horiz, u);
    }

    /** (az, el, range) → ENU into out[off..off+2], using out as scratch (allocation-free). */
    static void aerToEnu(double azimuth, double elevation, double range, double[] out, int off) {
        DegreeTrig.sinCos(azimuth, out, off);
        double sa = out[off];
        double ca = out[off + 1];
        DegreeTrig.sinCos(elevation, out, off);
        double se = out[off];
        double horiz = range * out[off + 1];
        out[off] = horiz * sa;
        out[off + 1] = horiz * ca;
        out[off + 2] = range * se;
    }
}
