package io.geotick.transforms.chain;

import io.geotick.transforms.epsg.EpsgSystem;
import io.geotick.transforms.epsg.EpsgSystems;
import io.geotick.transforms.epsg.ProjectionMethod;
import io.geotick.transforms.epsg.UnknownEpsgCodeException;
import io.geotick.transforms.fit.SiteModel;
import io.geotick.transforms.frames.Frame;
import io.geotick.transforms.frames.FrameRegistry;
import io.geotick.transforms.projection.Hemisphere;
import io.geotick.transforms.projection.MapProjection;
import io.geotick.transforms.projection.ProjectionDomainException;
import io.geotick.transforms.projection.Ups;
import io.geotick.transforms.projection.Utm;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;

/**
 * A coordinate system of a chain end: coordinate kind, frame, height kind and, for the layered kinds, the
 * map grid or the fitted site grid. Immutable and thread-safe.
 *
 * <ul>
 *   <li>{@link #ecef}, {@link #geodetic}, {@link #geodeticOrthometric}: the core kinds;</li>
 *   <li>{@link #projected}: easting, northing, h on a map projection of the frame's ellipsoid (one step:
 *       the projection, or its inverse, on geodetic coordinates of the frame);</li>
 *   <li>{@link #site}: a site grid fitted to control points ({@link SiteModel}) on top of its <em>base</em>
 *       system, the system the control points' source coordinates were in (one step: the fitted model, or
 *       its inverse, on the base's values); its frame and height kind are the base's.</li>
 * </ul>
 *
 * @param kind how the values are written
 * @param frame the reference frame (of the base, for a site grid)
 * @param height ellipsoidal or orthometric (orthometric only for geodetic coordinates, or a site grid on them)
 * @param grid the map grid, present exactly for {@link CoordinateKind#PROJECTED}
 * @param site the site grid, present exactly for {@link CoordinateKind#SITE}
 */
public record CoordinateSystem(CoordinateKind kind, Frame frame, HeightKind height, Optional<Grid> grid,
        Optional<Site> site) {

    /**
     * A map grid of a projected system.
     *
     * @param id the grid as {@link #parse} reads it: {@code utm:31N}, {@code ups:N}, {@code EPSG:27700}, or the
     *     projection's name for another projection
     * @param name how step listings name the grid, e.g. "UTM zone 31N (WGS 84)"
     * @param projection the projection, on the frame's ellipsoid
     * @param method what the projection step lists: method, EPSG code, parameters, source, accuracy, cautions
     */
    public record Grid(String id, String name, MapProjection projection, ProjectionMethod method) {
        public Grid {
            Objects.requireNonNull(id, "id");
            Objects.requireNonNull(name, "name");
            Objects.requireNonNull(projection, "projection");
            Objects.requireNonNull(method, "method");
        }
    }

    /**
     * A fitted site grid on its base system.
     *
     * @param model the fitted model, applied to the base's values (2D models to the first two, the third
     *     passing through; the 3D Helmert to all three)
     * @param base the system of the control points' source coordinates (not itself a site grid)
     * @param name how listings name the site grid, e.g. the model file
     */
    public record Site(SiteModel model, CoordinateSystem base, String name) {
        public Site {
            Objects.requireNonNull(model, "model");
            Objects.requireNonNull(base, "base");
            Objects.requireNonNull(name, "name");
            if (base.kind() == CoordinateKind.SITE) {
                throw new IllegalArgumentException("a site grid cannot be based on another site grid (" + base + ")");
            }
            if (name.isBlank()) {
                throw new IllegalArgumentException("a site grid needs a name for listings (got a blank one)");
            }
        }
    }

    public CoordinateSystem {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(frame, "frame");
        Objects.requireNonNull(height, "height");
        Objects.requireNonNull(grid, "grid");
        Objects.requireNonNull(site, "site");
        if ((kind == CoordinateKind.PROJECTED) != grid.isPresent() || (kind == CoordinateKind.SITE) != site.isPresent()) {
            throw new IllegalArgumentException("a " + kind.name().toLowerCase(Locale.ROOT) + " system has "
                + (kind == CoordinateKind.PROJECTED ? "a map grid and no site grid" : kind == CoordinateKind.SITE
                ? "a site grid and no map grid" : "neither a map grid nor a site grid"));
        }
        if ((kind == CoordinateKind.ECEF || kind == CoordinateKind.PROJECTED) && height == HeightKind.ORTHOMETRIC) {
            throw new IllegalArgumentException((kind == CoordinateKind.ECEF ? "ECEF coordinates" : "projected systems")
                + " have no orthometric height here");
        }
        if (grid.isPresent() && !grid.get().projection().ellipsoid().equals(frame.ellipsoid())) {
            throw new IllegalArgumentException("projection " + grid.get().name() + " is on "
                + grid.get().projection().ellipsoid().name() + " but frame " + frame.name() + " is on "
                + frame.ellipsoid().name());
        }
        if (site.isPresent() && (!site.get().base().frame().equals(frame) || site.get().base().height() != height)) {
            throw new IllegalArgumentException("a site grid has the frame and height kind of its base "
                + site.get().base());
        }
    }

    /** A core system (ECEF or geodetic) without grids. */
    public CoordinateSystem(CoordinateKind kind, Frame frame, HeightKind height) {
        this(kind, frame, height, Optional.empty(), Optional.empty());
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
     * Easting, northing and ellipsoidal height on a UTM zone or a UPS grid of the frame (the listing's method,
     * parameters and accuracy are {@link ProjectionMethod#utm} / {@link ProjectionMethod#ups}). For another
     * projection use {@link #projected(Frame, MapProjection, ProjectionMethod)}, which says what it does.
     *
     * @throws IllegalArgumentException if the projection is neither, or is on another ellipsoid than the frame
     */
    public static CoordinateSystem projected(Frame frame, MapProjection projection) {
        Objects.requireNonNull(projection, "projection");
        if (projection instanceof Utm) {
            Utm u = (Utm) projection;
            return projected(frame, new Grid("utm:" + u.zoneName(), u.name(), u, ProjectionMethod.utm(u)));
        }
        if (projection instanceof Ups) {
            Ups u = (Ups) projection;
            return projected(frame, new Grid("ups:" + u.hemisphere().letter(), u.name(), u, ProjectionMethod.ups(u)));
        }
        throw new IllegalArgumentException("projection " + projection.name() + " is not a UTM zone or a UPS grid: "
            + "give what it does with projected(frame, projection, method)");
    }

    /** Easting, northing and ellipsoidal height on any map projection, with what its step lists. */
    public static CoordinateSystem projected(Frame frame, MapProjection projection, ProjectionMethod method) {
        return projected(frame, new Grid(projection.name(), projection.name(), projection, method));
    }

    private static CoordinateSystem projected(Frame frame, Grid g) {
        return new CoordinateSystem(CoordinateKind.PROJECTED, frame, HeightKind.ELLIPSOIDAL, Optional.of(g),
            Optional.empty());
    }

    /**
     * An EPSG system (through the public API of {@link EpsgSystems}) in a frame on its ellipsoid: projected
     * systems are {@link CoordinateKind#PROJECTED} with the system's projection and method, geographic ones
     * {@link #geodetic}.
     *
     * @throws IllegalArgumentException if the frame is on another ellipsoid
     */
    public static CoordinateSystem epsg(EpsgSystem system, Frame frame) {
        if (!system.ellipsoid().equals(frame.ellipsoid())) {
            throw new IllegalArgumentException(system.name() + " is on " + system.ellipsoid().name() + " but frame "
                + frame.name() + " is on " + frame.ellipsoid().name());
        }
        if (!system.isProjected()) {
            return geodetic(frame);
        }
        return projected(frame, new Grid(system.name(), system.name() + " grid", system.projection().orElseThrow(),
            system.method().orElseThrow()));
    }

    /**
     * The site grid of a fitted model on the base system the model records ({@link SiteModel#sourceSystem()},
     * read with {@link #parse} and the standard registry), named by the model's target system (or "site grid").
     *
     * @throws IllegalArgumentException if the model states no source system, or one {@link #parse} cannot read
     *     (for instance one without a frame: then give the base with {@link #site(SiteModel, CoordinateSystem)})
     */
    public static CoordinateSystem site(SiteModel model) {
        Objects.requireNonNull(model, "model");
        if (model.sourceSystem().isBlank()) {
            throw new IllegalArgumentException("the site model states no source system; give its base system with"
                + " CoordinateSystem.site(model, base)");
        }
        CoordinateSystem base;
        try {
            base = parse(model.sourceSystem(), FrameRegistry.standard());
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("the site model's source system '" + model.sourceSystem()
                + "' is not a chain system (" + e.getMessage() + "); give its base system with"
                + " CoordinateSystem.site(model, base)", e);
        }
        return site(model, base);
    }

    /** The site grid of a fitted model on the given base system, named by the model's target system. */
    public static CoordinateSystem site(SiteModel model, CoordinateSystem base) {
        return site(model, base, model.targetSystem().isBlank() ? "site grid" : model.targetSystem());
    }

    /**
     * The site grid of a fitted model on the given base system.
     *
     * @param name how listings name the grid, e.g. "site grid (quay.json)"
     */
    public static CoordinateSystem site(SiteModel model, CoordinateSystem base, String name) {
        Site s = new Site(model, base, name);
        return new CoordinateSystem(CoordinateKind.SITE, base.frame(), base.height(), Optional.empty(), Optional.of(s));
    }

    /**
     * The core system (ECEF or geodetic) under the layers: for a projected system geodetic coordinates of its
     * frame, for a site grid its base's core; a core system itself.
     */
    public CoordinateSystem core() {
        switch (kind) {
            case PROJECTED:
                return geodetic(frame);
            case SITE:
                return site.orElseThrow().base().core();
            default:
                return this;
        }
    }

    /**
     * Parses {@code SYS@FRAME}: SYS is {@code ecef}, {@code geodetic} (ellipsoidal heights),
     * {@code geodetic-orthometric}, {@code utm:ZONE} ({@code utm:31N}), {@code ups:N} or {@code ups:S}; FRAME a
     * registry name, e.g. {@code ecef@ITRF2020}, {@code utm:31N@ETRF2000}. {@code EPSG:n} may leave the frame
     * out: it is then the registry frame the system's datum matches, else a frame for the datum as Proj4J
     * defines it ({@link EpsgSystems#registryFrame}, {@link EpsgSystems#datumFrame}; join that one to the
     * registry with {@link EpsgSystems#datumLink} before a chain to another frame).
     *
     * @throws IllegalArgumentException naming the text if the kind, zone or code is unknown or the frame missing
     * @throws io.geotick.transforms.frames.UnknownFrameException if the frame is unknown
     */
    public static CoordinateSystem parse(String text, FrameRegistry registry) {
        Objects.requireNonNull(text, "text");
        int at = text.indexOf('@');
        String base = (at < 0 ? text : text.substring(0, at)).strip();
        String k = base.toLowerCase(Locale.ROOT);
        if (k.startsWith("epsg")) {
            EpsgSystem s;
            try {
                s = EpsgSystems.parse(base);
            } catch (UnknownEpsgCodeException e) {
                throw new IllegalArgumentException("coordinate system '" + text + "': " + e.getMessage(), e);
            }
            Frame f = at < 0 ? EpsgSystems.registryFrame(s, registry).orElseGet(() -> EpsgSystems.datumFrame(s))
                : registry.frame(text.substring(at + 1).strip());
            return epsg(s, f);
        }
        if (at <= 0 || at == text.length() - 1) {
            throw new IllegalArgumentException("coordinate system '" + text
                + "' is not of the form KIND@FRAME, e.g. ecef@ITRF2020, geodetic@ETRF2000 or utm:31N@ETRF2000");
        }
        Frame f = registry.frame(text.substring(at + 1).strip());
        int colon = k.indexOf(':');
        String word = colon < 0 ? k : k.substring(0, colon).strip();
        String param = colon < 0 ? "" : base.substring(colon + 1).strip();
        try {
            switch (word) {
                case "ecef":
                    return colon < 0 ? ecef(f) : noParameters(text, word);
                case "geodetic":
                    return colon < 0 ? geodetic(f) : noParameters(text, word);
                case "geodetic-orthometric":
                    return colon < 0 ? geodeticOrthometric(f) : noParameters(text, word);
                case "utm":
                    if (param.isEmpty()) {
                        throw new IllegalArgumentException("coordinate system '" + text + "': utm needs its zone, "
                            + "e.g. utm:31N@" + f.name());
                    }
                    return projected(f, Utm.parse(param, f.ellipsoid()));
                case "ups":
                    return projected(f, Ups.of(Hemisphere.parse(param), f.ellipsoid()));
                default:
                    throw new IllegalArgumentException("coordinate kind '" + word + "' in '" + text
                        + "' is not one of ecef, geodetic, geodetic-orthometric, utm:ZONE, ups:N|S, EPSG:n");
            }
        } catch (ProjectionDomainException e) {
            throw new IllegalArgumentException("coordinate system '" + text + "': " + e.getMessage(), e);
        }
    }

    private static CoordinateSystem noParameters(String text, String word) {
        throw new IllegalArgumentException("coordinate system '" + text + "': " + word + " takes no parameters");
    }

    /**
     * The text {@link #parse} reads ({@code ecef@ITRF2020}, {@code utm:31N@ETRF2000}); a site grid by its name
     * and base ({@code site grid (quay.json) on utm:31N@ETRF2000}).
     */
    @Override
    public String toString() {
        switch (kind) {
            case ECEF:
                return "ecef@" + frame.name();
            case PROJECTED:
                return grid.orElseThrow().id() + "@" + frame.name();
            case SITE:
                return site.orElseThrow().name() + " on " + site.orElseThrow().base();
            default:
                return (height == HeightKind.ORTHOMETRIC ? "geodetic-orthometric" : "geodetic") + "@" + frame.name();
        }
    }
}
