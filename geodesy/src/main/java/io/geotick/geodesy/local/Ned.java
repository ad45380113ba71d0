package io.geotick.geodesy.local;

/**
 * North, east, down components in metres in a local tangent frame (the aviation and inertial convention).
 *
 * @param north metres towards local north
 * @param east metres towards local east
 * @param down metres along the ellipsoid normal, downwards
 */
public record Ned(double north, double east, double down) {
    public Ned {
        LocalChecks.finite("north", north);
        LocalChecks.finite("east", east);
        LocalChecks.finite("down", down);
    }

    public static Ned of(double north, double east, double down) {
        return new Ned(north, east, down);
    }

    /** The same vector as east-north-up. */
    public Enu toEnu() {
        return new Enu(east, north, -down);
    }
}
