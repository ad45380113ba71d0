package io.geotick.cli.coord;

import io.geotick.geodesy.position.GeodeticPosition;
import io.geotick.transforms.epsg.EpsgSystem;
import io.geotick.transforms.fit.SiteModel;
import io.geotick.transforms.frames.Frame;
import java.math.BigDecimal;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * A coordinate system as named on the command line ({@code --from}/{@code --to}): its kind, the kind's
 * parameters and, optionally, its reference frame ({@code SYS@FRAME}). Immutable. Made by
 * {@link #parse(String)} (which delegates to {@link SystemSpecParser}, the one place SYS text is read).
 *
 * <p>Without a frame the system is purely geometric, on the conversion's {@code --ellipsoid}. With a frame
 * the ellipsoid is the frame's own, and a conversion between two frames takes the frame path of the
 * registry (see {@link Conversion}).
 *
 * @param kind the kind of system
 * @param origin the geodetic origin of a local frame (present exactly when {@code kind.needsOrigin()});
 *     with a frame it is a position in that frame, on its ellipsoid
 * @param frame the reference frame, if one was named (or implied by an EPSG code)
 * @param grid the grid kind's parameter as written canonically: the UTM zone ("31N"), the UPS hemisphere
 *     ("N"), the EPSG code ("27700"); empty for {@code utm} with the zone from the point, and for non-grid kinds
 * @param epsg the EPSG system, present exactly for the EPSG kinds
 * @param frameImplied whether the frame was implied by the EPSG code rather than named with {@code @FRAME}
 *     (the canonical text then leaves it out)
 */
public record CoordinateSystemSpec(SystemKind kind, Optional<GeodeticPosition> origin, Optional<Frame> frame,
        Optional<String> grid, Optional<EpsgSystem> epsg, boolean frameImplied, Optional<Site> site) {

    /**
     * A fitted site grid: the model file as named, the model, and the system the model starts from (its
     * frame is the site system's).
     */
    public record Site(String file, SiteModel model, CoordinateSystemSpec source) {
        public Site {
            Objects.requireNonNull(file, "file");
            Objects.requireNonNull(model, "model");
            Objects.requireNonNull(source, "source");
        }
    }

    public CoordinateSystemSpec(SystemKind kind, Optional<GeodeticPosition> origin, Optional<Frame> frame,
            Optional<String> grid, Optional<EpsgSystem> epsg, boolean frameImplied) {
        this(kind, origin, frame, grid, epsg, frameImplied, Optional.empty());
    }

    /** A site grid: the frame is the model's source system's, implied. */
    public static CoordinateSystemSpec site(Site s) {
        return new CoordinateSystemSpec(s.model().kind().dimension() == 3 ? SystemKind.SITE_3D : SystemKind.SITE_2D,
            Optional.empty(), s.source().frame(), Optional.of(s.file()), Optional.empty(), true, Optional.of(s));
    }

    public CoordinateSystemSpec {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(origin, "origin");
        Objects.requireNonNull(frame, "frame");
        Objects.requireNonNull(grid, "grid");
        Objects.requireNonNull(epsg, "epsg");
        Objects.requireNonNull(site, "site");
        if (kind.needsOrigin() != origin.isPresent()) {
            throw new IllegalArgumentException(kind.word() + (kind.needsOrigin() ? " needs" : " takes no") + " origin");
        }
        boolean isEpsg = kind == SystemKind.EPSG_PROJECTED || kind == SystemKind.EPSG_GEOGRAPHIC;
        if (isEpsg != epsg.isPresent() || (grid.isPresent() && !kind.isGrid())) {
            throw new IllegalArgumentException(kind.word() + ": grid parameter or EPSG system does not fit the kind");
        }
    }

    /** A non-grid system. */
    public CoordinateSystemSpec(SystemKind kind, Optional<GeodeticPosition> origin, Optional<Frame> frame) {
        this(kind, origin, frame, Optional.empty(), Optional.empty(), false);
    }

    /** A grid system ({@code utm}, {@code utm:31N}, {@code ups:N}) without a frame. */
    public static CoordinateSystemSpec grid(SystemKind kind, Optional<String> parameter) {
        return new CoordinateSystemSpec(kind, Optional.empty(), Optional.empty(), parameter, Optional.empty(), false);
    }

    /** An EPSG system with the frame its datum implies. */
    public static CoordinateSystemSpec epsg(EpsgSystem s, Frame implied) {
        return new CoordinateSystemSpec(s.isProjected() ? SystemKind.EPSG_PROJECTED : SystemKind.EPSG_GEOGRAPHIC,
            Optional.empty(), Optional.of(implied), Optional.of(Integer.toString(s.code())), Optional.of(s), true);
    }

    /** A system without parameters (geodetic, ecef) and without a frame. */
    public static CoordinateSystemSpec of(SystemKind kind) {
        return new CoordinateSystemSpec(kind, Optional.empty(), Optional.empty());
    }

    /** A local frame (enu, ned, aer) about a geodetic origin, without a reference frame. */
    public static CoordinateSystemSpec local(SystemKind kind, GeodeticPosition origin) {
        return new CoordinateSystemSpec(kind, Optional.of(origin), Optional.empty());
    }

    /**
     * The three axes in order: the kind's, except that a projected EPSG system in another unit than the metre
     * has its easting and northing in that unit ("ftUS"); the height stays in metres.
     */
    public List<Axis> axes() {
        if (kind != SystemKind.EPSG_PROJECTED || epsg.orElseThrow().unit().isMetre()) {
            return kind.axes();
        }
        Unit u = Unit.of(epsg.get().unit());
        List<Axis> a = kind.axes();
        return List.of(new Axis(a.get(0).key(), a.get(0).label(), u), new Axis(a.get(1).key(), a.get(1).label(), u),
            a.get(2));
    }

    /** The same system in the given reference frame. */
    public CoordinateSystemSpec withFrame(Frame f) {
        return new CoordinateSystemSpec(kind, origin, Optional.of(f), grid, epsg, false, site);
    }

    /**
     * Parses SYS text such as {@code geodetic}, {@code enu:55,5,200} or {@code ecef@ITRF2020}.
     *
     * @throws io.geotick.cli.UserInputException naming the text and what is wrong with it
     */
    public static CoordinateSystemSpec parse(String text) {
        return SystemSpecParser.parse(text);
    }

    /**
     * The canonical SYS text: {@code geodetic}, {@code enu:55,5,200} (numbers without trailing zeros),
     * {@code geodetic@ETRF2000} (the frame's registry name).
     */
    public String text() {
        String base = origin.map(o -> kind.word() + ":" + plain(o.latitude()) + "," + plain(o.longitude()) + ","
            + plain(o.height())).orElse(kind.word() + grid.map(g -> ":" + g).orElse(""));
        return frame.filter(f -> !frameImplied).map(f -> base + "@" + f.name()).orElse(base);
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
