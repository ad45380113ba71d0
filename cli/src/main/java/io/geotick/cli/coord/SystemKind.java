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
 * order. New kinds (projected grids, for instance) are added here, in {@link SystemSpecParser} (their
 * parameter syntax) and in {@link SystemAdapter} (their conversion to and from ECEF).
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
        new Axis("az", "azimuth", DEGREE, true), new Axis("el", "elevation", DEGREE), new Axis("range", "range", METRE));

    private final String word;
    private final boolean needsOrigin;
    private final List<Axis> axes;

    SystemKind(String word, boolean needsOrigin, Axis... axes) {
        this.word = word;
        this.needsOrigin = needsOrigin;
        this.axes = List.of(axes);
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
        return needsOrigin ? word + ":LAT,LON,H" : word;
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
        if (texts.size() != axes.size()) {
            String got = texts.isEmpty() ? "none" : texts.size() + " (" + texts.stream().map(t -> "'" + t + "'")
                .collect(Collectors.joining(" ")) + ")";
            throw new UserInputException(word + " takes " + axes.size() + " values (" + axisLabels() + "), got "
                + got);
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
        return Stream.of(values()).filter(k -> k.word.equals(w)).findFirst();
    }

    /** All kinds' syntax, for the "known:" list of an error: "geodetic, ecef, enu:LAT,LON,H, …". */
    public static String knownSyntax() {
        return Stream.of(values()).map(SystemKind::syntax).collect(Collectors.joining(", "));
    }
}
