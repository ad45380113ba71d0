package io.geotick.cli.coord;

import io.geotick.geodesy.ecef.EcefConverter;
import io.geotick.geodesy.ellipsoid.Ellipsoid;
import io.geotick.geodesy.local.Aer;
import io.geotick.geodesy.local.Enu;
import io.geotick.geodesy.local.LocalFrame;
import io.geotick.geodesy.local.Ned;
import io.geotick.geodesy.position.EcefPosition;
import io.geotick.geodesy.position.GeodeticPosition;
import io.geotick.transforms.StepDescription;
import io.geotick.transforms.StepDescription.Parameter;
import io.geotick.transforms.epsg.EpsgSystem;
import io.geotick.transforms.epsg.ProjectionMethod;
import io.geotick.transforms.fit.FitParameter;
import io.geotick.transforms.fit.FitStatistics;
import io.geotick.transforms.fit.SiteModel;
import io.geotick.transforms.fit.SitePoint;
import io.geotick.transforms.fit.SiteTransform;
import io.geotick.transforms.projection.GridPosition;
import io.geotick.transforms.projection.Hemisphere;
import io.geotick.transforms.projection.MapProjection;
import io.geotick.transforms.projection.Ups;
import io.geotick.transforms.projection.Utm;
import io.geotick.transforms.height.GeoidGrid;
import io.geotick.transforms.height.Interpolation;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * Takes a point of one coordinate system to ECEF and back, on one ellipsoid: the two ends of a
 * {@link Conversion}. Values are in the axis order of the system's {@link SystemKind}. Implementations
 * build the geodesy module's validating value types, so an out-of-range value (latitude 91°, azimuth
 * 360°) fails there with an {@link io.geotick.geodesy.InvalidCoordinateException} naming it.
 *
 * <p>Each adapter also says what it does as {@link StepDescription}s (for {@code --explain}); those are
 * exact conversions (accuracy 0: rounding only) except where a model enters (the geoid).
 *
 * <p>A projected grid system ({@link Grid}) is one more adapter: grid → geodetic → ECEF and back, with
 * its projection step described the same way (method, EPSG method code, parameters, accuracy).
 */
interface SystemAdapter {
    /** The point's ECEF position. */
    EcefPosition toEcef(double[] values);

    /** The ECEF position expressed in this system, in axis order. */
    double[] fromEcef(EcefPosition p);

    /** The steps of {@link #toEcef}, in order (empty for ECEF itself). */
    List<StepDescription> toEcefSteps();

    /** The steps of {@link #fromEcef}, in order (empty for ECEF itself). */
    List<StepDescription> fromEcefSteps();

    /**
     * The adapter for a system on an ellipsoid.
     *
     * @param where how the listing names the ellipsoid's owner, e.g. "ETRF2000" or "--ellipsoid"
     * @param geoid the geoid grid, required for {@link SystemKind#GEODETIC_ORTHOMETRIC}
     */
    static SystemAdapter of(CoordinateSystemSpec spec, Ellipsoid ellipsoid, String where, Optional<GeoidGrid> geoid) {
        switch (spec.kind()) {
            case GEODETIC:
                return new Geodetic(ellipsoid, where);
            case GEODETIC_ORTHOMETRIC:
                return new Orthometric(new Geodetic(ellipsoid, where), geoid.orElseThrow(() ->
                    new io.geotick.cli.UserInputException("coordinate system '" + spec.text() + "' needs a geoid "
                        + "model: give --geoid FILE.isg")));
            case ECEF:
                return new Ecef();
            case ENU:
            case NED:
            case AER:
                return new Local(spec.kind(), spec.origin().orElseThrow(), ellipsoid, where);
            case EPSG_GEOGRAPHIC:
                return new Geodetic(ellipsoid, where);
            case UTM:
            case UPS:
            case EPSG_PROJECTED:
                return new Grid(spec, ellipsoid, where);
            case SITE_2D:
            case SITE_3D: {
                CoordinateSystemSpec.Site s = spec.site().orElseThrow();
                return new SiteGrid(s, of(s.source(), ellipsoid, where, geoid));
            }
            default:
                throw new IllegalStateException("no adapter for " + spec.kind());
        }
    }

    /** The EPSG 9602 conversion step on an ellipsoid (as the transforms chain lists it). */
    static StepDescription geographicGeocentric(boolean toEcef, Ellipsoid e, String where) {
        return new StepDescription((toEcef ? "geodetic → ECEF" : "ECEF → geodetic") + " on " + e.name() + " ("
            + where + ")", "Geographic/geocentric conversion", OptionalInt.of(9602), OptionalInt.empty(),
            List.of(new Parameter("a", e.semiMajorAxis(), "m"), new Parameter("1/f", e.inverseFlattening(), "")),
            "IOGP Guidance Note 7-2, §4.1.1; ellipsoid " + e.name() + " (" + e.source() + ")", 0, List.of());
    }

    /**
     * A map grid: easting, northing and h ↔ geodetic on the ellipsoid ↔ ECEF. As a target it also gives the
     * point scale and the meridian convergence ({@link #gridFromEcef}), and for UTM/UPS the zone. For
     * {@code utm} without a zone the zone is chosen from each point (Norway and Svalbard rules included);
     * such a system can only be a target. An EPSG system defined in feet (or another unit) gives and takes
     * easting and northing in that unit, through {@link EpsgSystem#projection()}; h stays in metres.
     */
    final class Grid implements SystemAdapter {
        private final CoordinateSystemSpec spec;
        private final Ellipsoid ellipsoid;
        private final Geodetic geodetic;
        private final Optional<MapProjection> fixed;
        private final Optional<ProjectionMethod> fixedMethod;

        /** A grid point: E, N, h (NaN when unknown), k, γ; the zone name for UTM/UPS; the projection used. */
        record Result(double[] values, Optional<String> zone, String projectionName, ProjectionMethod method) {
        }

        Grid(CoordinateSystemSpec spec, Ellipsoid ellipsoid, String where) {
            this.spec = spec;
            this.ellipsoid = ellipsoid;
            this.geodetic = new Geodetic(ellipsoid, where);
            switch (spec.kind()) {
                case UTM:
                    if (spec.grid().isPresent()) {
                        Utm u = Utm.parse(spec.grid().get(), ellipsoid);
                        fixed = Optional.of(u);
                        fixedMethod = Optional.of(ProjectionMethod.utm(u));
                    } else {
                        fixed = Optional.empty();
                        fixedMethod = Optional.empty();
                    }
                    break;
                case UPS: {
                    Ups u = Ups.of(Hemisphere.parse(spec.grid().orElseThrow()), ellipsoid);
                    fixed = Optional.of(u);
                    fixedMethod = Optional.of(ProjectionMethod.ups(u));
                    break;
                }
                default: {
                    EpsgSystem s = spec.epsg().orElseThrow();
                    fixed = s.projection();
                    fixedMethod = s.method();
                }
            }
        }

        /** Whether the zone comes from each point ({@code utm} without a zone). */
        boolean automaticZone() {
            return fixed.isEmpty();
        }

        private String gridName(MapProjection p) {
            return spec.epsg().map(s -> s.name() + " grid" + (s.unit().isMetre() ? "" : " (" + s.unit().symbol()
                + ")")).orElse(p.name());
        }

        @Override
        public EcefPosition toEcef(double[] v) {
            MapProjection p = fixed.orElseThrow(() -> new io.geotick.cli.UserInputException("'utm' as a source "
                + "needs its zone: write utm:ZONE, e.g. utm:31N"));
            GeodeticPosition g = p.unproject(v[0], v[1]);
            return geodetic.toEcef(new double[] {g.latitude(), g.longitude(), v[2]});
        }

        @Override
        public double[] fromEcef(EcefPosition p) {
            return gridFromEcef(p).values();
        }

        /** The grid values E, N, h, k, γ of a position, with the zone for UTM/UPS. */
        Result gridFromEcef(EcefPosition p) {
            return gridFromGeodetic(geodetic.fromEcef(p));
        }

        /** The grid values of a geodetic position (φ°, λ°, h) on this grid's ellipsoid. */
        Result gridFromGeodetic(double[] g) {
            MapProjection proj;
            ProjectionMethod method;
            if (fixed.isPresent()) {
                proj = fixed.get();
                method = fixedMethod.orElseThrow();
            } else {
                Utm u;
                try {
                    u = Utm.forPosition(g[0], g[1], ellipsoid);
                } catch (io.geotick.transforms.projection.ProjectionDomainException e) {
                    throw new io.geotick.transforms.projection.ProjectionDomainException(e.getMessage()
                        + (Math.abs(g[0]) > 80 && Math.abs(g[0]) <= 90 ? "; --to " + (g[0] > 0 ? "ups:N" : "ups:S")
                        + " covers the point" : ""));
                }
                proj = u;
                method = ProjectionMethod.utm(u);
            }
            GridPosition gp = proj.project(g[0], g[1]);
            Optional<String> zone = proj instanceof Utm ? Optional.of(((Utm) proj).zoneName())
                : proj instanceof Ups ? Optional.of(String.valueOf(((Ups) proj).hemisphere().letter()))
                : Optional.empty();
            return new Result(new double[] {gp.easting(), gp.northing(), g[2], gp.scale(), gp.convergence()}, zone,
                gridName(proj), method);
        }

        private static StepDescription step(boolean forward, String gridName, ProjectionMethod m) {
            return new StepDescription(forward ? "geodetic → " + gridName : gridName + " → geodetic",
                m.method() + (forward ? "" : ", inverse"), m.epsgMethod(), OptionalInt.empty(), m.parameters(),
                m.source(), m.accuracyMetres(), m.cautions());
        }

        @Override
        public List<StepDescription> toEcefSteps() {
            MapProjection p = fixed.orElseThrow();
            List<StepDescription> s = new ArrayList<>();
            s.add(step(false, gridName(p), fixedMethod.orElseThrow()));
            s.addAll(geodetic.toEcefSteps());
            return s;
        }

        @Override
        public List<StepDescription> fromEcefSteps() {
            List<StepDescription> s = new ArrayList<>(geodetic.fromEcefSteps());
            if (fixed.isPresent()) {
                s.add(step(true, gridName(fixed.get()), fixedMethod.orElseThrow()));
            } else {
                s.add(new StepDescription("geodetic → UTM, zone from the point", ProjectionMethod.utm(Utm.zone(31,
                    Hemisphere.NORTH)).method().replace(" (UTM zone 31N)", ""), OptionalInt.of(9807),
                    OptionalInt.empty(), List.of(), "UTM zone rules incl. the Norway and Svalbard exceptions (common"
                    + " practice)", 5e-9, List.of(ProjectionMethod.TM_ACCURACY)));
            }
            return s;
        }

        /** The step of {@link #gridFromGeodetic} for one point (the zone it fell in). */
        List<StepDescription> fromGeodeticSteps(Result r) {
            return List.of(step(true, r.projectionName(), r.method()));
        }

        /** The steps of {@link #gridFromEcef} for one point (the zone it fell in). */
        List<StepDescription> fromEcefSteps(Result r) {
            List<StepDescription> s = new ArrayList<>(geodetic.fromEcefSteps());
            s.add(step(true, r.projectionName(), r.method()));
            return s;
        }
    }

    /**
     * A site grid fitted by {@code geotick fit}: the model's source system (its own adapter), then the
     * fitted model on its first two values (2D, the third passed through) or all three (Helmert); as a
     * source, the model's inverse (exact to rounding) and then the source system.
     */
    final class SiteGrid implements SystemAdapter {
        private final CoordinateSystemSpec.Site site;
        private final SystemAdapter inner;
        private final SiteTransform inverse;

        SiteGrid(CoordinateSystemSpec.Site site, SystemAdapter inner) {
            this.site = site;
            this.inner = inner;
            this.inverse = site.model().inverse();
        }

        @Override
        public EcefPosition toEcef(double[] v) {
            SitePoint s = inverse.apply(v[0], v[1], v[2]);
            return inner.toEcef(new double[] {s.x(), s.y(), s.z()});
        }

        @Override
        public double[] fromEcef(EcefPosition p) {
            double[] v = inner instanceof Grid ? ((Grid) inner).gridFromEcef(p).values() : inner.fromEcef(p);
            SitePoint s = site.model().apply(v[0], v[1], v[2]);
            return new double[] {s.x(), s.y(), s.z()};
        }

        private StepDescription step(boolean forward) {
            SiteModel m = site.model();
            List<Parameter> ps = new ArrayList<>();
            for (FitParameter p : m.parameters()) {
                ps.add(new Parameter(p.name(), p.value(), "1".equals(p.unit()) ? "" : p.unit()));
            }
            FitStatistics st = m.statistics();
            String src = site.source().text();
            return new StepDescription(forward ? src + " → site grid (" + site.file() + ")"
                : "site grid (" + site.file() + ") → " + src, m.kind().id() + " fitted by least squares to "
                + st.pointsUsed() + " control points" + (forward ? "" : ", inverse"), OptionalInt.empty(),
                OptionalInt.empty(), ps, "site model " + site.file() + " (geotick fit)", st.rms(), List.of(
                    "accuracy shown is the fit's RMS residual (" + String.format(Locale.ROOT, "%.4f", st.rms()) + " m"
                        + ", redundancy " + st.redundancy() + "); valid only inside the control points' area, errors"
                        + " grow outside it"));
        }

        @Override
        public List<StepDescription> toEcefSteps() {
            List<StepDescription> s = new ArrayList<>();
            s.add(step(false));
            s.addAll(inner.toEcefSteps());
            return s;
        }

        @Override
        public List<StepDescription> fromEcefSteps() {
            List<StepDescription> s = new ArrayList<>(inner.fromEcefSteps());
            s.add(step(true));
            return s;
        }
    }

    /** Geodetic latitude, longitude, ellipsoidal height. */
    final class Geodetic implements SystemAdapter {
        private final EcefConverter converter;
        private final Ellipsoid ellipsoid;
        private final String where;

        Geodetic(Ellipsoid ellipsoid, String where) {
            this.converter = EcefConverter.of(ellipsoid);
            this.ellipsoid = ellipsoid;
            this.where = where;
        }

        @Override
        public EcefPosition toEcef(double[] v) {
            return converter.toEcef(GeodeticPosition.of(v[0], v[1], v[2]));
        }

        @Override
        public double[] fromEcef(EcefPosition p) {
            GeodeticPosition g = converter.toGeodetic(p);
            return new double[] {g.latitude(), g.longitude(), g.height()};
        }

        @Override
        public List<StepDescription> toEcefSteps() {
            return List.of(geographicGeocentric(true, ellipsoid, where));
        }

        @Override
        public List<StepDescription> fromEcefSteps() {
            return List.of(geographicGeocentric(false, ellipsoid, where));
        }
    }

    /**
     * Geodetic with orthometric heights: h = H + N on the way in, H = h − N on the way out, N bilinear
     * from the ISG grid (the geoid grid's stated approximation: deflection of the vertical neglected, below
     * 1 mm in practice).
     */
    final class Orthometric implements SystemAdapter {
        private final Geodetic geodetic;
        private final GeoidGrid grid;

        Orthometric(Geodetic geodetic, GeoidGrid grid) {
            this.geodetic = geodetic;
            this.grid = grid;
        }

        @Override
        public EcefPosition toEcef(double[] v) {
            // Range checks of latitude and longitude come first, from the geodetic position type.
            GeodeticPosition.of(v[0], v[1], 0);
            double h = grid.ellipsoidalHeight(v[0], v[1], v[2], Interpolation.BILINEAR);
            return geodetic.toEcef(new double[] {v[0], v[1], h});
        }

        @Override
        public double[] fromEcef(EcefPosition p) {
            double[] g = geodetic.fromEcef(p);
            g[2] = grid.orthometricHeight(g[0], g[1], g[2], Interpolation.BILINEAR);
            return g;
        }

        private StepDescription height(boolean toEllipsoidal) {
            String ref = grid.header().getOrDefault("ref frame", "not stated") + ", ellipsoid "
                + grid.header().getOrDefault("ref ellipsoid", "not stated");
            return new StepDescription(toEllipsoidal ? "orthometric → ellipsoidal height (h = H + N)"
                : "ellipsoidal → orthometric height (H = h − N)", "Geoid undulation from " + grid.modelName()
                + ", " + Interpolation.BILINEAR.name().toLowerCase(Locale.ROOT) + " interpolation",
                OptionalInt.empty(), OptionalInt.empty(), List.of(
                    new Parameter("latitude spacing", grid.latitudeSpacing(), "degree"),
                    new Parameter("longitude spacing", grid.longitudeSpacing(), "degree")),
                "ISG grid " + grid.name() + " (model frame: " + ref + ")", 0,
                List.of("the accuracy is that of the geoid model, which ISG files do not state; the model's frame"
                    + " and ellipsoid should match this system's, or N is off by up to the datum difference in"
                    + " height"));
        }

        @Override
        public List<StepDescription> toEcefSteps() {
            List<StepDescription> s = new ArrayList<>();
            s.add(height(true));
            s.addAll(geodetic.toEcefSteps());
            return s;
        }

        @Override
        public List<StepDescription> fromEcefSteps() {
            List<StepDescription> s = new ArrayList<>(geodetic.fromEcefSteps());
            s.add(height(false));
            return s;
        }
    }

    /** ECEF itself. */
    final class Ecef implements SystemAdapter {
        @Override
        public EcefPosition toEcef(double[] v) {
            return EcefPosition.of(v[0], v[1], v[2]);
        }

        @Override
        public double[] fromEcef(EcefPosition p) {
            return new double[] {p.x(), p.y(), p.z()};
        }

        @Override
        public List<StepDescription> toEcefSteps() {
            return List.of();
        }

        @Override
        public List<StepDescription> fromEcefSteps() {
            return List.of();
        }
    }

    /** ENU, NED or AER in a local tangent frame. */
    final class Local implements SystemAdapter {
        private final SystemKind kind;
        private final LocalFrame frame;
        private final GeodeticPosition origin;
        private final Ellipsoid ellipsoid;
        private final String where;

        Local(SystemKind kind, GeodeticPosition origin, Ellipsoid ellipsoid, String where) {
            this.kind = kind;
            this.frame = LocalFrame.at(origin, ellipsoid);
            this.origin = origin;
            this.ellipsoid = ellipsoid;
            this.where = where;
        }

        @Override
        public EcefPosition toEcef(double[] v) {
            switch (kind) {
                case ENU:
                    return frame.toEcef(Enu.of(v[0], v[1], v[2]));
                case NED:
                    return frame.toEcef(Ned.of(v[0], v[1], v[2]));
                default:
                    return frame.toEcef(Aer.of(v[0], v[1], v[2]));
            }
        }

        @Override
        public double[] fromEcef(EcefPosition p) {
            switch (kind) {
                case ENU: {
                    Enu e = frame.toEnu(p);
                    return new double[] {e.east(), e.north(), e.up()};
                }
                case NED: {
                    Ned n = frame.toNed(p);
                    return new double[] {n.north(), n.east(), n.down()};
                }
                default: {
                    Aer a = frame.toAer(p);
                    return new double[] {a.azimuth(), a.elevation(), a.range()};
                }
            }
        }

        private StepDescription step(boolean toEcef) {
            String local = kind.word().toUpperCase(Locale.ROOT);
            String extra = kind == SystemKind.ENU ? ""
                : kind == SystemKind.NED ? "; north, east, down = the ENU axes reordered, up negated (common practice)"
                : "; azimuth = atan2(E, N), elevation = atan2(U, √(E² + N²)), range = |ENU| (common practice)";
            return new StepDescription((toEcef ? local + " → ECEF" : "ECEF → " + local) + " about the origin on "
                + ellipsoid.name() + " (" + where + ")", "Geocentric/topocentric conversion" + extra,
                OptionalInt.of(9836), OptionalInt.empty(), List.of(
                    new Parameter("origin latitude", origin.latitude(), "degree"),
                    new Parameter("origin longitude", origin.longitude(), "degree"),
                    new Parameter("origin height", origin.height(), "m"),
                    new Parameter("a", ellipsoid.semiMajorAxis(), "m"),
                    new Parameter("1/f", ellipsoid.inverseFlattening(), "")),
                "IOGP Guidance Note 7-2, §4.1.2; ellipsoid " + ellipsoid.name() + " (" + ellipsoid.source() + ")", 0,
                List.of());
        }

        @Override
        public List<StepDescription> toEcefSteps() {
            return List.of(step(true));
        }

        @Override
        public List<StepDescription> fromEcefSteps() {
            return List.of(step(false));
        }
    }
}
