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
 * @param projection the map projection of a projected system (empty for a geographic one), with eastings
 *     and northings <em>in the system's unit</em>: forward gives them in {@code unit}, inverse takes them in
 *     {@code unit}. Pass a projection that computes in metres (every projection of the projection package
 *     does); for a unit other than the metre the record keeps it wrapped so that its grid values are in
 *     {@code unit} ({@link #metricProjection()} is the one in metres). Point scale and convergence are
 *     unitless and degrees either way
 * @param method what the projection does (empty for a geographic system); its parameters are those of the
 *     computation in metres, plus the false easting and northing in the system's unit when that is not the
 *     metre
 * @param unit the unit of the eastings and northings ({@link LinearUnit#METRE} for a geographic system, whose
 *     heights are metres too). Heights are always metres: the definitions Proj4J reads carry no vertical
 *     unit (a definition with one is refused by its parser, so {@link EpsgSystems#byCode} reports it)
 * @param cautions approximations of this mapping a user should know about, each with its size
 */
public record EpsgSystem(int code, Kind kind, Ellipsoid ellipsoid, String datumName,
        Optional<HelmertParameters> toWgs84, Optional<MapProjection> projection, Optional<ProjectionMethod> method,
        LinearUnit unit, List<String> cautions) {

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
        projection = projection.map(p -> UnitProjection.inUnit(p, unit));
        cautions = List.copyOf(cautions);
        if ((kind == Kind.PROJECTED) != projection.isPresent() || projection.isPresent() != method.isPresent()) {
            throw new IllegalArgumentException("EPSG:" + code + ": a projection (with its method) is present exactly"
                + " for a projected system");
        }
        if (kind == Kind.GEOGRAPHIC && !unit.isMetre()) {
            throw new IllegalArgumentException("EPSG:" + code + ": a geographic system has no grid unit, got " + unit);
        }
    }

    /** "EPSG:27700". */
    public String name() {
        return "EPSG:" + code;
    }

    /**
     * The projection computing in metres behind {@link #projection()} (the same object for a metre system):
     * eastings and northings in metres whatever the system's unit.
     */
    public Optional<MapProjection> metricProjection() {
        return projection.map(UnitProjection::metric);
    }

    /** Whether the system is projected. */
    public boolean isProjected() {
        return kind == Kind.PROJECTED;
    }
}
