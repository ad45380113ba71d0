package io.geotick.transforms.epsg;

import io.geotick.geodesy.ellipsoid.Ellipsoid;
import io.geotick.transforms.helmert.HelmertParameters;
import io.geotick.transforms.projection.MapProjection;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * A coordinate reference system known by its EPSG code, as read from Proj4J's bundled EPSG definitions
 * and mapped onto the project's types ({@link EpsgSystems#byCode}). Immutable and thread-safe.
 *
 * @param code the EPSG code
 * @param kind projected (easting, northing) or geographic (latitude, longitude)
 * @param ellipsoid the ellipsoid: the project's catalogued one when its axes match, else one built from
 *     Proj4J's axes
 * @param datumName the datum name in Proj4J's definition ("OSGB36", "WGS84", or "User-defined" when the
 *     definition gives only an ellipsoid and a shift)
 * @param toWgs84 the datum's shift to WGS 84 as Proj4J's definition gives it, as position-vector Helmert
 *     parameters (metres, arc-seconds, ppm; translations only for a 3-parameter shift); empty when the
 *     definition states none (for instance a grid-based datum)
 * @param projection the map projection of a projected system (empty for a geographic one)
 * @param method what the projection does (empty for a geographic system)
 * @param unit the system's native linear unit as Proj4J names it ("metres", "U.S. feet" …); the values
 *     here are always metres
 * @param cautions approximations of this mapping a user should know about, each with its size
 */
public record EpsgSystem(int code, Kind kind, Ellipsoid ellipsoid, String datumName,
        Optional<HelmertParameters> toWgs84, Optional<MapProjection> projection, Optional<ProjectionMethod> method,
        String unit, List<String> cautions) {

    /** Projected or geographic. */
    public enum Kind {
        /** Easting and northing on a map projection. */
        PROJECTED,
        /** Latitude and longitude on the datum's ellipsoid. */
        GEOGRAPHIC
    }

    public EpsgSystem {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(ellipsoid, "ellipsoid");
        Objects.requireNonNull(datumName, "datumName");
        Objects.requireNonNull(toWgs84, "toWgs84");
        Objects.requireNonNull(projection, "projection");
        Objects.requireNonNull(method, "method");
        Objects.requireNonNull(unit, "unit");
        cautions = List.copyOf(cautions);
        if ((kind == Kind.PROJECTED) != projection.isPresent() || projection.isPresent() != method.isPresent()) {
            throw new IllegalArgumentException("EPSG:" + code + ": a projection (with its method) is present exactly"
                + " for a projected system");
        }
    }

    /** "EPSG:27700". */
    public String name() {
        return "EPSG:" + code;
    }

    /** Whether the system is projected. */
    public boolean isProjected() {
        return kind == Kind.PROJECTED;
    }
}
