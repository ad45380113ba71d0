package io.geotick.transforms.projection;

import java.util.Locale;

/** The northern or southern hemisphere of a UTM zone or a UPS grid. */
public enum Hemisphere {
    /** North: UTM false northing 0 m; UPS centred on the north pole. */
    NORTH('N'),
    /** South: UTM false northing 10 000 000 m; UPS centred on the south pole. */
    SOUTH('S');

    private final char letter;

    Hemisphere(char letter) {
        this.letter = letter;
    }

    /** {@code 'N'} or {@code 'S'}. */
    public char letter() {
        return letter;
    }

    /** The hemisphere a latitude lies in; the equator counts as north (common practice for UTM). */
    public static Hemisphere ofLatitude(double latitude) {
        return latitude >= 0 ? NORTH : SOUTH;
    }

    /**
     * {@code "N"}/{@code "S"} (also {@code "north"}/{@code "south"}), ignoring case.
     *
     * @throws ProjectionDomainException naming the text otherwise
     */
    public static Hemisphere parse(String text) {
        String t = text == null ? "" : text.trim().toUpperCase(Locale.ROOT);
        switch (t) {
            case "N":
            case "NORTH":
                return NORTH;
            case "S":
            case "SOUTH":
                return SOUTH;
            default:
                throw new ProjectionDomainException("hemisphere '" + text + "' is not N or S");
        }
    }
}
