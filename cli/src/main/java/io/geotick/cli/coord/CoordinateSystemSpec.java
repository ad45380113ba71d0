package io.geotick.cli.coord;

import io.geotick.geodesy.position.GeodeticPosition;
import java.math.BigDecimal;
import java.util.Objects;
import java.util.Optional;

/**
 * A coordinate system as named on the command line ({@code --from}/{@code --to}): its kind and the
 * kind's parameters. Immutable. Made by {@link #parse(String)} (which delegates to
 * {@link SystemSpecParser}, the one place SYS text is read).
 *
 * <p>Room to grow: a reference frame ({@code SYS@FRAME}) becomes another component here, filled by the
 * parser; the ellipsoid stays a property of the conversion (it may then come from the frame).
 *
 * @param kind the kind of system
 * @param origin the geodetic origin of a local frame (present exactly when {@code kind.needsOrigin()})
 */
public record CoordinateSystemSpec(SystemKind kind, Optional<GeodeticPosition> origin) {
    public CoordinateSystemSpec {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(origin, "origin");
        if (kind.needsOrigin() != origin.isPresent()) {
            throw new IllegalArgumentException(kind.word() + (kind.needsOrigin() ? " needs" : " takes no") + " origin");
        }
    }

    /** A system without parameters (geodetic, ecef). */
    public static CoordinateSystemSpec of(SystemKind kind) {
        return new CoordinateSystemSpec(kind, Optional.empty());
    }

    /** A local frame (enu, ned, aer) about a geodetic origin. */
    public static CoordinateSystemSpec local(SystemKind kind, GeodeticPosition origin) {
        return new CoordinateSystemSpec(kind, Optional.of(origin));
    }

    /**
     * Parses SYS text such as {@code geodetic} or {@code enu:55,5,200}.
     *
     * @throws io.geotick.cli.UserInputException naming the text and what is wrong with it
     */
    public static CoordinateSystemSpec parse(String text) {
        return SystemSpecParser.parse(text);
    }

    /** The canonical SYS text: {@code geodetic}, {@code enu:55,5,200} (numbers as typed, without trailing zeros). */
    public String text() {
        return origin.map(o -> kind.word() + ":" + plain(o.latitude()) + "," + plain(o.longitude()) + ","
            + plain(o.height())).orElse(kind.word());
    }

    @Override
    public String toString() {
        return text();
    }

    /** The shortest decimal that reads back to the same double, without exponent or trailing zeros. */
    private static String plain(double v) {
        return new BigDecimal(Double.toString(v + 0.0)).stripTrailingZeros().toPlainString();
    }
}
