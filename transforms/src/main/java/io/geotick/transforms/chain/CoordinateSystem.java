package io.geotick.transforms.chain;

import io.geotick.transforms.frames.Frame;
import io.geotick.transforms.frames.FrameRegistry;
import java.util.Locale;
import java.util.Objects;

/**
 * A coordinate system of a chain end: coordinate kind, frame and height kind. Immutable.
 *
 * @param kind ECEF or geodetic
 * @param frame the reference frame
 * @param height ellipsoidal or orthometric (orthometric only for geodetic coordinates)
 */
public record CoordinateSystem(CoordinateKind kind, Frame frame, HeightKind height) {

    public CoordinateSystem {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(frame, "frame");
        Objects.requireNonNull(height, "height");
        if (kind == CoordinateKind.ECEF && height == HeightKind.ORTHOMETRIC) {
            throw new IllegalArgumentException("ECEF coordinates have no orthometric height");
        }
    }

    /** ECEF coordinates in the frame. */
    public static CoordinateSystem ecef(Frame frame) {
        return new CoordinateSystem(CoordinateKind.ECEF, frame, HeightKind.ELLIPSOIDAL);
    }

    /** Geodetic coordinates with ellipsoidal heights on the frame's ellipsoid. */
    public static CoordinateSystem geodetic(Frame frame) {
        return new CoordinateSystem(CoordinateKind.GEODETIC, frame, HeightKind.ELLIPSOIDAL);
    }

    /** Geodetic coordinates with orthometric heights (the chain needs a geoid model). */
    public static CoordinateSystem geodeticOrthometric(Frame frame) {
        return new CoordinateSystem(CoordinateKind.GEODETIC, frame, HeightKind.ORTHOMETRIC);
    }

    /**
     * Parses {@code KIND@FRAME}: KIND is {@code ecef}, {@code geodetic} (ellipsoidal heights) or
     * {@code geodetic-orthometric}; FRAME is a registry name, e.g. {@code ecef@ITRF2020}.
     *
     * @throws IllegalArgumentException naming the text if the kind is unknown
     * @throws io.geotick.transforms.frames.UnknownFrameException if the frame is unknown
     */
    public static CoordinateSystem parse(String text, FrameRegistry registry) {
        Objects.requireNonNull(text, "text");
        int at = text.indexOf('@');
        if (at <= 0 || at == text.length() - 1) {
            throw new IllegalArgumentException("coordinate system '" + text
                + "' is not of the form KIND@FRAME, e.g. ecef@ITRF2020 or geodetic@ETRF2000");
        }
        String k = text.substring(0, at).strip().toLowerCase(Locale.ROOT);
        Frame f = registry.frame(text.substring(at + 1).strip());
        switch (k) {
            case "ecef":
                return ecef(f);
            case "geodetic":
                return geodetic(f);
            case "geodetic-orthometric":
                return geodeticOrthometric(f);
            default:
                throw new IllegalArgumentException("coordinate kind '" + k + "' in '" + text
                    + "' is not one of ecef, geodetic, geodetic-orthometric");
        }
    }

    @Override
    public String toString() {
        return (kind == CoordinateKind.ECEF ? "ecef" : height == HeightKind.ORTHOMETRIC ? "geodetic-orthometric"
            : "geodetic") + "@" + frame.name();
    }
}
