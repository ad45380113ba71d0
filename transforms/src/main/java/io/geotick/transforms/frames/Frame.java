package io.geotick.transforms.frames;

import io.geotick.geodesy.ellipsoid.Ellipsoid;
import java.util.List;
import java.util.Objects;
import java.util.OptionalInt;

/**
 * A named geodetic reference frame (datum) with its ellipsoid. Immutable. Frames are compared by name.
 *
 * @param name the registry name, e.g. {@code "ITRF2020"}
 * @param aliases other names accepted by lookup
 * @param kind how its coordinates behave in time
 * @param ellipsoid the ellipsoid its geodetic coordinates refer to
 * @param epsgCrs EPSG code of its geographic or geocentric CRS, if recorded
 * @param description one line for listings
 */
public record Frame(String name, List<String> aliases, FrameKind kind, Ellipsoid ellipsoid, OptionalInt epsgCrs,
        String description) {

    public Frame {
        Objects.requireNonNull(name, "name");
        if (name.isBlank()) {
            throw new IllegalArgumentException("frame name must not be blank");
        }
        aliases = List.copyOf(aliases);
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(ellipsoid, "ellipsoid");
        Objects.requireNonNull(epsgCrs, "epsgCrs");
        Objects.requireNonNull(description, "description");
    }

    /** A frame without aliases. */
    public static Frame of(String name, FrameKind kind, Ellipsoid ellipsoid, int epsgCrs, String description) {
        return new Frame(name, List.of(), kind, ellipsoid, epsgCrs > 0 ? OptionalInt.of(epsgCrs)
            : OptionalInt.empty(), description);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Frame && ((Frame) o).name.equals(name);
    }

    @Override
    public int hashCode() {
        return name.hashCode();
    }

    @Override
    public String toString() {
        return name;
    }
}
