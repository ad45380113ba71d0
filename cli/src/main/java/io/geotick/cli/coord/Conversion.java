package io.geotick.cli.coord;

import io.geotick.cli.UserInputException;
import io.geotick.geodesy.ellipsoid.Ellipsoid;
import io.geotick.geodesy.ellipsoid.Ellipsoids;
import io.geotick.geodesy.position.EcefPosition;
import io.geotick.transforms.Epoch;
import io.geotick.transforms.MissingEpochException;
import io.geotick.transforms.StepDescription;
import io.geotick.transforms.chain.ConversionChain;
import io.geotick.transforms.chain.CoordinateSystem;
import io.geotick.transforms.epsg.EpsgSystem;
import io.geotick.transforms.epsg.EpsgSystems;
import io.geotick.transforms.helmert.HelmertParameters;
import io.geotick.transforms.frames.Frame;
import io.geotick.transforms.frames.FrameKind;
import io.geotick.transforms.frames.FrameLink;
import io.geotick.transforms.frames.FrameRegistry;
import io.geotick.transforms.grid.Ntv2Grid;
import io.geotick.transforms.height.GeoidGrid;
import io.geotick.transforms.molodensky.Molodensky;
import io.geotick.transforms.helmert.Helmert;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;

/**
 * Converts points from one coordinate system to another through ECEF:
 * source values → ECEF → (steps) → ECEF → target values. Immutable and thread-safe.
 *
 * <p>Every path goes through ECEF so that each system needs only its own {@link SystemAdapter}; the
 * ECEF round trip adds at most a few nanometres (the geodesy module's stated bounds: the forward
 * conversions are exact to a few ulps, the ECEF → geodetic inverse is within 1 nm).
 *
 * <h2>Frames</h2>
 * <ul>
 *   <li>Neither system names a frame: a purely geometric conversion, both ends on {@code --ellipsoid}
 *       (default WGS 84); no step between the ECEF positions.</li>
 *   <li>Both name a frame ({@code SYS@FRAME}): each end uses its frame's ellipsoid (an explicit
 *       {@code --ellipsoid} must be that ellipsoid), and the step between the ECEF positions is the
 *       transforms library's {@link ConversionChain} from {@code ecef@SOURCE} to {@code ecef@TARGET} at the
 *       coordinate epoch: the registry's path, whose time-dependent steps need {@code --epoch}.</li>
 *   <li>Only one names a frame: refused, since "the same frame" and "WGS 84" would both be plausible
 *       readings of the bare end.</li>
 *   <li>User Helmert parameters ({@code --helmert}), an NTv2 grid ({@code --ntv2}) or Molodensky translations
 *       ({@code --molodensky}) replace the registry path between two named frames; without frames they apply
 *       between the two ends on the bare {@code --ellipsoid}. The last two work on geodetic coordinates: a
 *       geodetic source onto a geodetic or grid target skips the ECEF detour.</li>
 * </ul>
 */
public final class Conversion {
    private final CoordinateSystemSpec source;
    private final CoordinateSystemSpec target;
    private final Ellipsoid targetEllipsoid;
    private final Ellipsoid sourceEllipsoid;
    private final SystemAdapter from;
    private final SystemAdapter to;
    private final List<EcefStep> steps;
    private final Optional<Epoch> epoch;
    private final List<String> warnings;
    private final Optional<ChainStep> geodeticShift;

    private Conversion(CoordinateSystemSpec source, CoordinateSystemSpec target, SystemAdapter from,
            SystemAdapter to, Ellipsoid sourceEllipsoid, Ellipsoid targetEllipsoid, List<EcefStep> steps,
            Optional<Epoch> epoch, List<String> warnings, Optional<ChainStep> geodeticShift) {
        this.source = source;
        this.sourceEllipsoid = sourceEllipsoid;
        this.target = target;
        this.from = from;
        this.to = to;
        this.targetEllipsoid = targetEllipsoid;
        this.steps = List.copyOf(steps);
        this.epoch = epoch;
        this.warnings = List.copyOf(warnings);
        this.geodeticShift = geodeticShift;
    }

    /**
     * The geometric conversion between two systems without frames on one ellipsoid (local-frame origins are
     * on it too).
     *
     * @throws io.geotick.geodesy.InvalidCoordinateException if a local origin is unusable
     */
    public static Conversion of(CoordinateSystemSpec source, CoordinateSystemSpec target, Ellipsoid ellipsoid) {
        return builder(source, target).ellipsoid(ellipsoid).build();
    }

    /** A builder for the conversion from {@code source} to {@code target}. */
    public static Builder builder(CoordinateSystemSpec source, CoordinateSystemSpec target) {
        return new Builder(Objects.requireNonNull(source, "source"), Objects.requireNonNull(target, "target"));
    }

    public CoordinateSystemSpec source() {
        return source;
    }

    public CoordinateSystemSpec target() {
        return target;
    }

    /** The ellipsoid of the target values. */
    public Ellipsoid ellipsoid() {
        return targetEllipsoid;
    }

    /** Every step, in order: source → ECEF, the frame steps, ECEF → target. */
    public List<ExplainedStep> steps() {
        List<ExplainedStep> all = new ArrayList<>();
        from.toEcefSteps().forEach(d -> all.add(ExplainedStep.of(d)));
        steps.forEach(s -> all.addAll(s.steps()));
        to.fromEcefSteps().forEach(d -> all.add(ExplainedStep.of(d)));
        return all;
    }

    /** The cautions of the published parameter sets used, each with its size. */
    public List<String> warnings() {
        return warnings;
    }

    /**
     * Converts one point given as typed: exactly three values in the source's axis order.
     *
     * @throws UserInputException if the count is wrong or a value is not a number
     * @throws io.geotick.geodesy.InvalidCoordinateException if a value is out of range, or the point has
     *     no value in the target (inside the Earth's evolute, for geodetic)
     */
    public ConvertedPoint convert(List<String> texts) {
        return convert(source.kind().parseValues(texts));
    }

    /**
     * Converts one point given in the source's axis order. A grid source may leave the height unknown
     * (NaN): it is then taken as 0 m for the computation and left out of the result, which needs a target
     * whose third value is a height.
     */
    public ConvertedPoint convert(double[] values) {
        boolean heightKnown = !Double.isNaN(values[2]);
        List<String> w = new ArrayList<>(warnings);
        if (!heightKnown) {
            if (!target.kind().axes().get(2).label().endsWith("height")) {
                throw new UserInputException("'" + target + "' needs the height: give easting, northing and h (m)");
            }
            values = new double[] {values[0], values[1], 0};
            if (!steps.isEmpty() || !sourceEllipsoid.equals(targetEllipsoid)) {
                w.add("height not given: taken as 0 m and not printed; across a datum change each 100 m of"
                    + " height error shifts the result horizontally by up to ~1 cm (the two ellipsoids' normals"
                    + " differ by about the datum shift divided by the Earth's radius)");
            }
        }
        double[] out;
        List<ExplainedStep> all = new ArrayList<>();
        Optional<String> zone = Optional.empty();
        if (geodeticShift.isPresent() && from instanceof SystemAdapter.Geodetic
                && (to instanceof SystemAdapter.Geodetic || to instanceof SystemAdapter.Grid)) {
            // A shift of the geodetic domain (NTv2, Molodensky) between geodetic values: applied to them
            // directly, so the heights pass through exactly and no ECEF round trip adds its rounding.
            ChainStep c = geodeticShift.get();
            double[] g = c.chain.convert(values[0], values[1], values[2]);
            all.addAll(c.steps());
            if (to instanceof SystemAdapter.Grid) {
                SystemAdapter.Grid grid = (SystemAdapter.Grid) to;
                SystemAdapter.Grid.Result r = grid.gridFromGeodetic(g);
                out = r.values();
                zone = r.zone();
                grid.fromGeodeticSteps(r).forEach(d -> all.add(ExplainedStep.of(d)));
            } else {
                out = g;
            }
        } else if (steps.isEmpty() && sourceEllipsoid.equals(targetEllipsoid) && from instanceof SystemAdapter.Geodetic
                && to instanceof SystemAdapter.Grid) {
            // Geodetic straight onto a grid on the same ellipsoid: no detour through ECEF, whose round trip
            // would add rounding (an ulp or so) to the latitude and longitude the user typed.
            SystemAdapter.Grid g = (SystemAdapter.Grid) to;
            SystemAdapter.Grid.Result r = g.gridFromGeodetic(values);
            out = r.values();
            zone = r.zone();
            g.fromGeodeticSteps(r).forEach(d -> all.add(ExplainedStep.of(d)));
        } else {
            EcefPosition p = from.toEcef(values);
            for (EcefStep s : steps) {
                p = s.apply(p);
            }
            from.toEcefSteps().forEach(d -> all.add(ExplainedStep.of(d)));
            steps.forEach(s -> all.addAll(s.steps()));
            if (to instanceof SystemAdapter.Grid) {
                SystemAdapter.Grid g = (SystemAdapter.Grid) to;
                SystemAdapter.Grid.Result r = g.gridFromEcef(p);
                out = r.values();
                zone = r.zone();
                g.fromEcefSteps(r).forEach(d -> all.add(ExplainedStep.of(d)));
            } else {
                out = to.fromEcef(p);
                to.fromEcefSteps().forEach(d -> all.add(ExplainedStep.of(d)));
            }
        }
        List<Axis> axes = new ArrayList<>(target.axes());
        if (target.kind().isProjected()) {
            axes.add(SystemKind.GridAxes.SCALE);
            axes.add(SystemKind.GridAxes.CONVERGENCE);
        }
        List<OutputField> fields = new ArrayList<>(axes.size());
        for (int i = 0; i < axes.size(); i++) {
            if (i == 2 && !heightKnown) {
                continue;
            }
            fields.add(new OutputField(axes.get(i), out[i]));
        }
        return new ConvertedPoint(source, target, targetEllipsoid.name(), epoch, fields, all,
            ExplainedStep.total(all), w, zone);
    }

    /**
     * Refuses a geoid grid when neither system has orthometric heights (so the file need not be read).
     *
     * @throws UserInputException naming both systems
     */
    public static void checkGeoidUse(CoordinateSystemSpec source, CoordinateSystemSpec target) {
        if (source.kind() != SystemKind.GEODETIC_ORTHOMETRIC && target.kind() != SystemKind.GEODETIC_ORTHOMETRIC) {
            throw new UserInputException("--geoid is used only with a geodetic-orthometric system, and neither '"
                + source + "' nor '" + target + "' is one");
        }
    }

    /** The user's own Helmert transformation and its stated accuracy (empty if not stated). */
    public record UserHelmert(Helmert helmert, OptionalDouble accuracyMetres) {
        public UserHelmert {
            Objects.requireNonNull(helmert, "helmert");
            Objects.requireNonNull(accuracyMetres, "accuracyMetres");
        }
    }

    /**
     * The user's own Molodensky translations (metres, source → target), the form, and their stated accuracy
     * (empty if not stated). The ellipsoids are those of the two ends.
     */
    public record UserMolodensky(double dx, double dy, double dz, boolean abridged, OptionalDouble accuracyMetres) {
        public UserMolodensky {
            Objects.requireNonNull(accuracyMetres, "accuracyMetres");
        }

        Molodensky between(Ellipsoid source, Ellipsoid target) {
            return abridged ? Molodensky.abridged(source, target, dx, dy, dz) : Molodensky.of(source, target, dx, dy, dz);
        }
    }

    /** Collects the options of a conversion; {@link #build()} checks that they fit together. */
    public static final class Builder {
        private final CoordinateSystemSpec source;
        private final CoordinateSystemSpec target;
        private FrameRegistry registry = FrameRegistry.standard();
        private Optional<Ellipsoid> ellipsoid = Optional.empty();
        private Optional<Epoch> epoch = Optional.empty();
        private Optional<UserHelmert> helmert = Optional.empty();
        private Optional<GeoidGrid> geoid = Optional.empty();
        private Optional<Ntv2Grid> ntv2 = Optional.empty();
        private boolean ntv2Reverse;
        private Optional<UserMolodensky> molodensky = Optional.empty();
        private final List<String> extraWarnings = new ArrayList<>();

        private Builder(CoordinateSystemSpec source, CoordinateSystemSpec target) {
            this.source = source;
            this.target = target;
        }

        /** The registry whose paths join the frames (default: the standard one). */
        public Builder registry(FrameRegistry r) {
            this.registry = Objects.requireNonNull(r, "registry");
            return this;
        }

        /** The ellipsoid asked for with {@code --ellipsoid}. */
        public Builder ellipsoid(Ellipsoid e) {
            this.ellipsoid = Optional.of(e);
            return this;
        }

        /** The coordinate epoch ({@code --epoch}). */
        public Builder epoch(Epoch e) {
            this.epoch = Optional.of(e);
            return this;
        }

        /** The user's own Helmert parameters ({@code --helmert}, {@code --convention}). */
        public Builder helmert(UserHelmert h) {
            this.helmert = Optional.of(h);
            return this;
        }

        /** An NTv2 grid shift from the source frame to the target frame ({@code --ntv2}). */
        public Builder ntv2(Ntv2Grid g) {
            this.ntv2 = Optional.of(g);
            return this;
        }

        /** The NTv2 grid applied against its direction, SYSTEM_T to SYSTEM_F ({@code --ntv2-reverse}). */
        public Builder ntv2Reverse(boolean reverse) {
            this.ntv2Reverse = reverse;
            return this;
        }

        /** The user's own Molodensky translations ({@code --molodensky}, {@code --abridged}). */
        public Builder molodensky(UserMolodensky m) {
            this.molodensky = Optional.of(m);
            return this;
        }

        /** The geoid grid for orthometric heights ({@code --geoid}). */
        public Builder geoid(GeoidGrid g) {
            this.geoid = Optional.of(g);
            return this;
        }

        /**
         * The conversion.
         *
         * @throws UserInputException for options that do not fit together, naming them, and for a
         *     time-dependent step without an epoch (the library's message, naming the step)
         * @throws io.geotick.transforms.frames.NoFramePathException if no path joins the frames at the epoch
         */
        public Conversion build() {
            if (geoid.isPresent()) {
                checkGeoidUse(source, target);
            }
            int shifts = (helmert.isPresent() ? 1 : 0) + (ntv2.isPresent() ? 1 : 0) + (molodensky.isPresent() ? 1 : 0);
            if (shifts > 1) {
                throw new UserInputException("--helmert, --ntv2 and --molodensky are each a datum shift; give one of"
                    + " them, not " + shifts);
            }
            if (source.kind() == SystemKind.UTM && source.grid().isEmpty()) {
                throw new UserInputException("'utm' as a source needs its zone (an easting and northing do not tell"
                    + " it): write utm:ZONE, e.g. utm:31N or utm:33S");
            }
            boolean sf = source.frame().isPresent();
            boolean tf = target.frame().isPresent();
            if (sf != tf) {
                CoordinateSystemSpec with = sf ? source : target;
                CoordinateSystemSpec without = sf ? target : source;
                throw new UserInputException("'" + with + "' " + (with.frameImplied() ? "implies frame "
                    + with.frame().orElseThrow().name() : "names a frame") + " but '" + without + "' does not; give a"
                    + " frame at both ends (e.g. " + without + "@" + typeable(with.frame().orElseThrow())
                    + " for the same frame) or at neither");
            }
            for (CoordinateSystemSpec end : List.of(source, target)) {
                CoordinateSystemSpec e = end.site().map(CoordinateSystemSpec.Site::source).orElse(end);
                e.epsg().ifPresent(s -> joinEpsgDatum(e, s));
            }
            return sf ? betweenFrames(source.frame().orElseThrow(), target.frame().orElseThrow()) : geometric();
        }

        private Conversion geometric() {
            Ellipsoid e = ellipsoid.orElse(Ellipsoids.WGS84);
            List<EcefStep> steps = new ArrayList<>();
            Optional<ChainStep> geodeticShift = Optional.empty();
            if (userShift()) {
                // The chain needs frames: two unnamed ones on the one ellipsoid, joined only by the user's shift.
                Frame s = Frame.of("source frame", FrameKind.STATIC, e, 0, "the source system, no frame named");
                Frame t = Frame.of("target frame", FrameKind.STATIC, e, 0, "the target system, no frame named");
                steps.add(chainStep(s, t, false));
                geodeticShift = geodeticShift(s, t);
            }
            return new Conversion(source, target, SystemAdapter.of(source, e, "--ellipsoid", geoid),
                SystemAdapter.of(target, e, "--ellipsoid", geoid), e, e, steps, epoch, List.of(), geodeticShift);
        }

        private Conversion betweenFrames(Frame s, Frame t) {
            for (Frame f : List.of(s, t)) {
                if (ellipsoid.isPresent() && !ellipsoid.get().equals(f.ellipsoid())) {
                    throw new UserInputException("--ellipsoid '" + ellipsoid.get().name() + "' is not the ellipsoid"
                        + " of frame " + f.name() + " (" + f.ellipsoid().name() + "); a frame implies its ellipsoid:"
                        + " leave --ellipsoid out");
                }
            }
            if (userShift() && s.equals(t)) {
                throw new UserInputException(shiftOption() + " between " + s.name() + " and itself: name the frame"
                    + " your " + (ntv2.isPresent() ? "grid" : "parameters") + " start from in --from and the one they"
                    + " lead to in --to");
            }
            List<EcefStep> steps = new ArrayList<>();
            ChainStep c = chainStep(s, t, false);
            if (!c.steps().isEmpty()) {
                steps.add(c);
            }
            List<String> w = new ArrayList<>(extraWarnings);
            if (!userShift()) {
                // The registry's cautions belong to its own sets; a user's shift between the same frames has none.
                w.addAll(warnings(c.chain));
            }
            return new Conversion(source, target, SystemAdapter.of(source, s.ellipsoid(), s.name(), geoid),
                SystemAdapter.of(target, t.ellipsoid(), t.name(), geoid), s.ellipsoid(), t.ellipsoid(), steps, epoch,
                w, geodeticShift(s, t));
        }

        private boolean userShift() {
            return helmert.isPresent() || ntv2.isPresent() || molodensky.isPresent();
        }

        private String shiftOption() {
            return helmert.isPresent() ? "--helmert" : ntv2.isPresent() ? "--ntv2" : "--molodensky";
        }

        /** For a shift of the geodetic domain (NTv2, Molodensky), the same chain between geodetic values. */
        private Optional<ChainStep> geodeticShift(Frame s, Frame t) {
            return ntv2.isPresent() || molodensky.isPresent() ? Optional.of(chainStep(s, t, true)) : Optional.empty();
        }

        /**
         * An EPSG end: its own cautions become warnings; a datum that matches no registry frame joins the
         * registry through Proj4J's shift to WGS 84, with a warning saying so.
         */
        private void joinEpsgDatum(CoordinateSystemSpec end, EpsgSystem s) {
            s.cautions().forEach(c -> addWarning(s.name() + ": " + c));
            Frame implied = EpsgSystems.datumFrame(s);
            if (!end.frame().orElseThrow().equals(implied) || registry.contains(implied.name())) {
                return;
            }
            Optional<FrameLink> link = EpsgSystems.datumLink(s, registry);
            if (link.isEmpty()) {
                if (!source.frame().equals(target.frame())) {
                    throw new UserInputException(s.name() + ": the EPSG definitions bundled with Proj4J give its datum ("
                        + s.datumName() + ") no shift to WGS 84, and no registry frame matches it; name its frame as "
                        + s.name() + "@FRAME (geotick frames lists them)");
                }
                registry = registry.toBuilder().add(implied).build();
                return;
            }
            registry = registry.toBuilder().add(implied).add(link.get()).build();
            HelmertParameters h = s.toWgs84().orElseThrow();
            boolean zero = h.equals(HelmertParameters.ZERO) || h.equals(HelmertParameters.ofTranslation(0, 0, 0));
            addWarning("the datum of " + s.name() + " is taken from the EPSG definitions bundled with Proj4J ("
                + s.ellipsoid().name() + ", shift to WGS 84: " + EpsgSystems.shiftText(h) + ", accuracy not stated); no"
                + " frame of the registry matches it" + (zero ? ". A zero shift treats the datum as WGS 84: for a"
                + " plate-fixed datum such as ETRS89 that neglects its drift from WGS 84 (about 2.5 cm/yr since 1989)"
                + "; name the realisation, e.g. " + s.name() + "@ETRF2000" : ""));
        }

        private void addWarning(String w) {
            if (!extraWarnings.contains(w)) {
                extraWarnings.add(w);
            }
        }

        private ChainStep chainStep(Frame s, Frame t, boolean geodetic) {
            ConversionChain.Builder b = ConversionChain.builder().registry(registry)
                .from(geodetic ? CoordinateSystem.geodetic(s) : CoordinateSystem.ecef(s))
                .to(geodetic ? CoordinateSystem.geodetic(t) : CoordinateSystem.ecef(t));
            epoch.ifPresent(b::epoch);
            helmert.ifPresent(h -> b.helmert(h.helmert(), "your own parameters (--helmert"
                + (h.accuracyMetres().isPresent() ? ", accuracy from --helmert-accuracy)"
                : "); accuracy not stated (give --helmert-accuracy)"), h.accuracyMetres().orElse(0)));
            ntv2.ifPresent(g -> {
                if (ntv2Reverse) {
                    b.horizontalGridReverse(g);
                } else {
                    b.horizontalGrid(g);
                }
            });
            molodensky.ifPresent(m -> b.molodensky(m.between(s.ellipsoid(), t.ellipsoid()), "your own translations"
                + " (--molodensky" + (m.accuracyMetres().isPresent() ? ", accuracy from --molodensky-accuracy)"
                : "); accuracy not stated (give --molodensky-accuracy)"), m.accuracyMetres().orElse(0)));
            // The stated accuracy of the user's step: what they gave, if anything; an NTv2 file states its
            // accuracy per node, not as one figure, so the listing says "not stated" and the caution explains.
            OptionalDouble stated = helmert.isPresent() ? helmert.get().accuracyMetres()
                : molodensky.isPresent() ? molodensky.get().accuracyMetres() : OptionalDouble.empty();
            try {
                return new ChainStep(b.build(), stated, userShift());
            } catch (MissingEpochException e) {
                throw new UserInputException(e.getMessage() + " (give --epoch DECIMAL_YEAR or --epoch YYYY-MM-DD)", e);
            }
        }

        /** The cautions of the registry's published sets along the path (WGS 84 ≈ ITRF, regional means …). */
        private List<String> warnings(ConversionChain chain) {
            Set<String> w = new LinkedHashSet<>();
            for (StepDescription d : chain.steps()) {
                for (FrameLink l : registry.links()) {
                    if (d.name().equals(l.from() + " → " + l.to()) || d.name().equals(l.to() + " → " + l.from())) {
                        w.addAll(l.cautions());
                    }
                }
            }
            return new ArrayList<>(w);
        }
    }

    /** The frame change as a transforms-library chain between two ECEF systems. */
    private static final class ChainStep implements EcefStep {
        private final ConversionChain chain;
        private final List<ExplainedStep> listed;

        ChainStep(ConversionChain chain, OptionalDouble userAccuracy, boolean user) {
            this.chain = chain;
            List<ExplainedStep> l = new ArrayList<>();
            for (StepDescription d : chain.steps()) {
                // The user's shift is the chain's only step besides ECEF ↔ geodetic conversions (EPSG 9602, exact);
                // its accuracy is what they stated, if anything. A datum shift read from Proj4J's EPSG definitions
                // states none either.
                boolean conversion = d.epsgMethod().equals(java.util.OptionalInt.of(9602));
                l.add(user && !conversion ? new ExplainedStep(d, userAccuracy) : d.name().contains("datum of EPSG:")
                    ? new ExplainedStep(d, OptionalDouble.empty()) : ExplainedStep.of(d));
            }
            this.listed = List.copyOf(l);
        }

        @Override
        public EcefPosition apply(EcefPosition p) {
            double[] r = chain.convert(p.x(), p.y(), p.z());
            return EcefPosition.of(r[0], r[1], r[2]);
        }

        @Override
        public List<ExplainedStep> steps() {
            return listed;
        }
    }

    /** A frame's name as it can be typed in a shell: the first alias without spaces if the name has one. */
    static String typeable(io.geotick.transforms.frames.Frame f) {
        if (!f.name().contains(" ")) {
            return f.name();
        }
        return f.aliases().stream().filter(a -> !a.contains(" ") && !a.contains(":")).findFirst().orElse("'" + f.name() + "'");
    }
}
