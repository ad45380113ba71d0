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
        if (!(azimuth >= 0 && azimuth < 360)) {
            throw new InvalidCoordinateException("azimuth " + azimuth + "° is outside [0°, 360°)");
        }
        if (!(elevation >= -90 && elevation <= 90)) {
            throw new InvalidCoordinateException("elevation " + elevation + "° is outside [-90°, 90°]");
        }
        if (!(range >= 0) || Double.isInfinite(range)) {
            throw new InvalidCoordinateException("range " + range + " m must be finite and not negative");
        }
    }

    public static Aer of(double azimuth, double elevation, double range) {
        return new Aer(azimuth, elevation, range);
    }

    /**
     * The AER of an ENU vector: az = atan2(e, n) mod 360°, el = atan2(u, √(e² + n²)), range = |v|.
     */
    public static Aer fromEnu(Enu v) {
        double horiz = Math.hypot(v.east(), v.north());
        double az = horiz == 0 ? 0.0 : DegreeTrig.atan2(v.east(), v.north());
        if (az < 0) {
            az += 360.0;
            if (az >= 360.0) { // −tiny + 360 rounds to 360
                az = 0.0;
            }
        }
        double el = DegreeTrig.atan2(v.up(), horiz);
        return new Aer(az, el, Math.sqrt(horiz * horiz + v.up() * v.up()));
    }

    /** The ENU vector: e = r cos el sin az, n = r cos el cos az, u = r sin el. */
    public Enu toEnu() {
        double[] sc = new double[4];
        DegreeTrig.sinCos(azimuth, sc, 0);
        DegreeTrig.sinCos(elevation, sc, 2);
        double horiz = range * sc[3];
        return new Enu(horiz * sc[0], horiz * sc[1], range * sc[2]);
    }
}
