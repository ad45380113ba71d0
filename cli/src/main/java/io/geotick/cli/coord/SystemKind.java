package io.geotick.cli.coord;

import static io.geotick.cli.coord.Unit.DEGREE;
import static io.geotick.cli.coord.Unit.METRE;

import io.geotick.cli.UserInputException;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Collectors;
import java.util.stream.Stream;

/**
 * The kinds of coordinate system {@code geotick coord} knows, each with its three axes in input and output
 * order. New kinds are added here, in {@link SystemSpecParser} (their parameter syntax) and in
 * {@link SystemAdapter} (their conversion to and from ECEF). Grid kinds ({@link #isGrid()}) carry their
 * parameter (zone, hemisphere, EPSG code) in the {@link CoordinateSystemSpec}; as targets they add the
 * point scale and the meridian convergence to the three values.
 */
public enum SystemKind {
    /** Latitude, longitude (degrees), ellipsoidal height (metres). */
    GEODETIC("geodetic", false,
        new Axis("lat", "latitude", DEGREE), new Axis("lon", "longitude", DEGREE), new Axis("h", "height", METRE)),
    /** Earth-centred, Earth-fixed Cartesian x, y, z (metres). */
    ECEF("ecef", false, new Axis("x", "x", METRE), new Axis("y", "y", METRE), new Axis("z", "z", METRE)),
    /** East, north, up (metres) in the local tangent frame about a geodetic origin. */
    ENU("enu", true, new Axis("e", "east", METRE), new Axis("n", "north", METRE), new Axis("u", "up", METRE)),
    /** North, east, down (metres) in the local tangent frame about a geodetic origin. */
    NED("ned", true, new Axis("n", "north", METRE), new Axis("e", "east", METRE), new Axis("d", "down", METRE)),
    /** Azimuth (degrees clockwise from north), elevation (degrees), slant range (metres) from an origin. */
    AER("aer", true,
        new Axis("az", "azimuth", DEGREE, true), new Axis("el", "elevation", DEGREE), new Axis("range", "range", METRE)),
    /**
     * Latitude, longitude (degrees) and orthometric height H = h − N (metres, above the geoid), with the
     * undulation N from the geoid grid given by {@code --geoid}. JSON key {@code H}, text label
     * {@code orthometric-height}, so it can never be mistaken for the ellipsoidal {@code h}.
     */
    GEODETIC_ORTHOMETRIC("geodetic-orthometric", false, new Axis("lat", "latitude", DEGREE),
        new Axis("lon", "longitude", DEGREE), new Axis("H", "orthometric-height", METRE)),
    /**
     * UTM easting, northing (metres) and ellipsoidal height h (metres, passed through): {@code utm} (zone
     * from the point, as a target only) or {@code utm:ZONE} ({@code utm:31N}).
     */
    UTM("utm", "utm[:ZONE]", GridAxes.E, GridAxes.N, GridAxes.H),
    /** UPS easting, northing (metres) and h: {@code ups:N} or {@code ups:S}. */
    UPS("ups", "ups:N|S", GridAxes.E, GridAxes.N, GridAxes.H),
    /** A projected EPSG system: easting, northing (metres) and h. */
    EPSG_PROJECTED("EPSG", "EPSG:n", GridAxes.E, GridAxes.N, GridAxes.H),
    /** A geographic EPSG system: latitude, longitude (degrees) and ellipsoidal height (metres). */
    EPSG_GEOGRAPHIC("EPSG", "EPSG:n", new Axis("lat", "latitude", DEGREE), new Axis("lon", "longitude", DEGREE),
        new Axis("h", "height", METRE)),
    /**
     * A site grid fitted by {@code geotick fit} (2D models): site x, y (metres) and the source system's third
     * value passed through (its height).
     */
    SITE_2D("site", "site:FILE.json", new Axis("x", "site-x", METRE), new Axis("y", "site-y", METRE),
        new Axis("h", "height", METRE)),
    /** A site grid fitted as a 3D Helmert: site x, y, z (metres). */
    SITE_3D("site", "site:FILE.json", new Axis("x", "site-x", METRE), new Axis("y", "site-y", METRE),
        new Axis("z", "site-z", METRE));

    /** The axes of the grid kinds and the two values every grid target adds. */
    static final class GridAxes {
        static final Axis E = new Axis("easting", "easting", METRE);
        static final Axis N = new Axis("northing", "northing", METRE);
        static final Axis H = new Axis("h", "height", METRE);
        /** Point scale factor k (unitless). */
        static final Axis SCALE = new Axis("scale", "scale", Unit.FACTOR);
        /** Meridian convergence γ, true north to grid north, clockwise (degrees). */
        static final Axis CONVERGENCE = new Axis("convergence", "convergence", DEGREE);

        private GridAxes() {
        }
    }

    private final String word;
    private final boolean needsOrigin;
    private final String gridSyntax;
    private final List<Axis> axes;

    SystemKind(String word, boolean needsOrigin, Axis... axes) {
        this.word = word;
        this.needsOrigin = needsOrigin;
        this.gridSyntax = null;
        this.axes = List.of(axes);
    }

    SystemKind(String word, String gridSyntax, Axis... axes) {
        this.word = word;
        this.needsOrigin = false;
        this.gridSyntax = gridSyntax;
        this.axes = List.of(axes);
    }

    /** Whether this is a map-grid or EPSG kind, whose parameters follow a colon ({@code utm:31N}, {@code EPSG:n}). */
    public boolean isGrid() {
        return gridSyntax != null;
    }

    /** Whether the values are easting, northing, h on a map projection. */
    public boolean isProjected() {
        return this == UTM || this == UPS || this == EPSG_PROJECTED;
    }

    /** The word that names the kind in a SYS text ("geodetic", "enu" …). */
    public String word() {
        return word;
    }

    /** Whether the SYS text must carry an origin ({@code enu:LAT,LON,H}). */
    public boolean needsOrigin() {
        return needsOrigin;
    }

    /** The three axes, in the order values are typed and printed. */
    public List<Axis> axes() {
        return axes;
    }

    /** How the kind is written, for help and error messages: "geodetic", "enu:LAT,LON,H". */
    public String syntax() {
        return gridSyntax != null ? gridSyntax : needsOrigin ? word + ":LAT,LON,H" : word;
    }

    /** The axis labels joined for messages: "latitude, longitude, height". */
    public String axisLabels() {
        return axes.stream().map(Axis::label).collect(Collectors.joining(", "));
    }

    /**
     * Reads the three values typed for a point in this kind of system, in axis order.
     *
     * @throws UserInputException if there are not exactly three, or one is not a number (naming it)
     */
    public double[] parseValues(List<String> texts) {
        if (isProjected() && texts.size() == 2) {
            // Easting and northing without a height: h is unknown (NaN here, never printed; see Conversion).
            return new double[] {axes.get(0).parse("", texts.get(0)), axes.get(1).parse("", texts.get(1)), Double.NaN};
        }
        if (texts.size() != axes.size()) {
            String got = texts.isEmpty() ? "none" : texts.size() + " (" + texts.stream().map(t -> "'" + t + "'")
                .collect(Collectors.joining(" ")) + ")";
            throw new UserInputException(word + " takes " + axes.size() + " values (" + axisLabels() + ")"
                + (isProjected() ? " or 2 (easting, northing; height unknown)" : "") + ", got " + got);
        }
        double[] v = new double[axes.size()];
        for (int i = 0; i < v.length; i++) {
            v[i] = axes.get(i).parse("", texts.get(i));
        }
        return v;
    }

    /** The kind named by a word, ignoring case. */
    public static Optional<SystemKind> byWord(String word) {
        String w = word.toLowerCase(Locale.ROOT);
        return Stream.of(values()).filter(k -> k.word.toLowerCase(Locale.ROOT).equals(w)).findFirst();
    }

    /** All kinds' syntax, for the "known:" list of an error: "geodetic, ecef, enu:LAT,LON,H, …". */
    public static String knownSyntax() {
        return Stream.of(values()).map(SystemKind::syntax).distinct().collect(Collectors.joining(", "));
    }
}
