package io.geotick.geodesy.local;

/**
 * East, north, up components in metres in a local tangent frame.
 *
 * @param east metres towards local east
 * @param north metres towards local north
 * @param up metres along the ellipsoid normal, upwards
 */
public record Enu(double east, double north, double up) {
    public Enu {
        LocalChecks.finite("east", east);
        LocalChecks.finite("north", north);
        LocalChecks.finite("up", up);
    }

    public static Enu of(double east, double north, double up) {
        return new Enu(east, north, up);
    }

    /** The same vector as north-east-down. */
    public Ned toNed() {
        return new Ned(north, east, -up);
    }
}
