package io.geotick.transforms.chain;

import io.geotick.geodesy.InvalidCoordinateException;
import io.geotick.geodesy.ellipsoid.Ellipsoid;
import io.geotick.transforms.Epoch;
import io.geotick.transforms.StepDescription;
import io.geotick.transforms.StepDescription.Parameter;
import io.geotick.transforms.frames.FrameRegistry;
import io.geotick.transforms.frames.FrameStep;
import io.geotick.transforms.frames.FrameTransformation;
import io.geotick.transforms.helmert.GeocentricTransform;
import io.geotick.transforms.helmert.Helmert;
import io.geotick.transforms.molodensky.Molodensky;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * A conversion from a source coordinate system to a target one at a coordinate epoch, as an ordered list
 * of steps. Immutable and thread-safe: build once, use from many threads.
 *
 * <p>The steps, in order: a site grid's inverse model (if the source is a {@link CoordinateKind#SITE site
 * grid}) and a map grid's inverse projection (if the source, or the site grid's base, is
 * {@link CoordinateKind#PROJECTED projected}); orthometric → ellipsoidal height (if the source heights are
 * orthometric); geodetic → ECEF on the source ellipsoid; the frame path from the registry (or the user's own
 * Helmert parameters, or an NTv2 grid shift or a Molodensky shift in the geodetic domain); ECEF → geodetic on
 * the target ellipsoid; ellipsoidal → orthometric height; the target's projection and site model. Conversions
 * that would cancel (same frame, same kind; a site grid onto its own base) are left out. The coordinates keep
 * their epoch: the chain changes frames, not time.
 *
 * <p>Coordinates are triples: ECEF (x, y, z) in metres, geodetic (latitude °, longitude °, height m),
 * projected (easting m, northing m, ellipsoidal height m), site grid (site x, y m and the base's third value,
 * or site x, y, z m for a 3D Helmert). Expected accuracy ({@link #accuracyMetres()}): root-sum-square of the
 * steps' stated accuracies (a site grid states its fit's RMS residual).
 *
 * <pre>{@code
 * ConversionChain c = ConversionChain.builder()
 *     .from(CoordinateSystem.ecef(StandardFrames.ITRF2020))
 *     .to(CoordinateSystem.geodetic(StandardFrames.ETRF2000))
 *     .epoch(Epoch.of(2024.5))
 *     .build();
 * double[] llh = c.convert(4027894.006, 307045.600, 4919474.910);
 * c.steps().forEach(s -> System.out.print(s.toText()));
 * }</pre>
 */
public final class ConversionChain {
    private final CoordinateSystem source;
    private final CoordinateSystem target;
    private final Optional<Epoch> epoch;
    private final List<Op> ops;

    private ConversionChain(CoordinateSystem source, CoordinateSystem target, Optional<Epoch> epoch, List<Op> ops) {
        this.source = source;
        this.target = target;
        this.epoch = epoch;
        this.ops = List.copyOf(ops);
    }

    /** A new builder using the standard frame registry. */
    public static Builder builder() {
        return new Builder();
    }

    public CoordinateSystem source() {
        return source;
    }

    public CoordinateSystem target() {
        return target;
    }

    /** The coordinate epoch the chain was built for, if one was given. */
    public Optional<Epoch> epoch() {
        return epoch;
    }

    /** The steps in order, each with method, parameters, source, accuracy and cautions. */
    public List<StepDescription> steps() {
        List<StepDescription> d = new ArrayList<>();
        for (Op o : ops) {
            d.add(o.description());
        }
        return Collections.unmodifiableList(d);
    }

    /** Root-sum-square of the steps' accuracies, metres. */
    public double accuracyMetres() {
        double s = 0;
        for (Op o : ops) {
            double a = o.description().accuracyMetres();
            s += a * a;
        }
        return Math.sqrt(s);
    }

    /** A listing of every step, for {@code --explain}. */
    public String explain() {
        StringBuilder s = new StringBuilder(source + " → " + target
            + epoch.map(e -> " at epoch " + e).orElse("") + ", expected accuracy "
            + (ops.isEmpty() ? "exact" : accuracyMetres() + " m") + "\n");
        int i = 1;
        for (Op o : ops) {
            s.append(i++).append(". ").append(o.description().toText());
        }
        return s.toString();
    }

    /**
     * Converts one point.
     *
     * @return a new array with the converted triple
     * @throws InvalidCoordinateException for NaN, infinities or out-of-range values, naming them
     */
    public double[] convert(double first, double second, double third) {
        double[] b = {first, second, third};
        convert(b, 0, b, 0, 1);
        return b;
    }

    /**
     * Converts {@code count} interleaved triples from {@code in} into {@code out}; in-place use is allowed.
     * Allocates nothing per point; the NTv2 steps and the reverse Molodensky step allocate one small scratch
     * array per call.
     *
     * @throws InvalidCoordinateException on the first invalid point, naming its index
     */
    public void convert(double[] in, int inOffset, double[] out, int outOffset, int count) {
        Objects.checkFromIndexSize(inOffset, 3 * count, in.length);
        Objects.checkFromIndexSize(outOffset, 3 * count, out.length);
        if (in != out || inOffset != outOffset) {
            System.arraycopy(in, inOffset, out, outOffset, 3 * count);
        }
        if (ops.isEmpty()) {
            for (int i = 0; i < 3 * count; i++) {
                if (!Double.isFinite(out[outOffset + i])) {
                    throw new InvalidCoordinateException("point " + i / 3 + ": coordinate " + out[outOffset + i]
                        + " is not a finite number");
                }
            }
            return;
        }
        for (Op o : ops) {
            o.apply(out, outOffset, count);
        }
    }

    /** The reverse chain: target → source, each step reversed. */
    public ConversionChain inverse() {
        List<Op> rev = new ArrayList<>();
        for (int i = ops.size() - 1; i >= 0; i--) {
            rev.add(ops.get(i).inverse());
        }
        return new ConversionChain(target, source, epoch, rev);
    }

    @Override
    public String toString() {
        return source + " → " + target + epoch.map(e -> " at epoch " + e).orElse("") + " (" + ops.size()
            + " steps)";
    }

    /** Builds a chain; {@link #build()} resolves the frame path and fails fast on what is missing. */
    public static final class Builder {
        private FrameRegistry registry = FrameRegistry.standard();
        private CoordinateSystem source;
        private CoordinateSystem target;
        private Epoch epoch;
        private Helmert userHelmert;
        private String userSource;
        private double userAccuracy;
        private GeoidStep geoid;
        private HorizontalGridStep grid;
        private Molodensky molodensky;
        private String molodenskySource;
        private double molodenskyAccuracy;

        private Builder() {
        }

        /** The registry to find frame paths in (default: {@link FrameRegistry#standard()}). */
        public Builder registry(FrameRegistry r) {
            this.registry = Objects.requireNonNull(r, "registry");
            return this;
        }

        public Builder from(CoordinateSystem s) {
            this.source = Objects.requireNonNull(s, "source");
            return this;
        }

        public Builder to(CoordinateSystem t) {
            this.target = Objects.requireNonNull(t, "target");
            return this;
        }

        /** The coordinate epoch (required whenever a step is time-dependent). */
        public Builder epoch(Epoch e) {
            this.epoch = Objects.requireNonNull(e, "epoch");
            return this;
        }

        /**
         * Uses the user's own Helmert parameters from source frame to target frame instead of a registry
         * path (e.g. a set from their geodetic authority).
         *
         * @param parameterSource who published the parameters, shown in the listing
         * @param accuracyMetres their stated accuracy
         */
        public Builder helmert(Helmert h, String parameterSource, double accuracyMetres) {
            this.userHelmert = Objects.requireNonNull(h, "helmert");
            this.userSource = Objects.requireNonNull(parameterSource, "parameterSource");
            if (!(accuracyMetres >= 0) || Double.isInfinite(accuracyMetres)) {
                throw new IllegalArgumentException("accuracy must be finite and >= 0, got " + accuracyMetres);
            }
            this.userAccuracy = accuracyMetres;
            return this;
        }

        /** The geoid model for orthometric heights (at either end). */
        public Builder geoid(io.geotick.transforms.height.GeoidGrid model,
                io.geotick.transforms.height.Interpolation interpolation) {
            this.geoid = new GeoidStep(Objects.requireNonNull(model, "geoid"),
                Objects.requireNonNull(interpolation, "interpolation"));
            return this;
        }

        /**
         * Uses an NTv2 grid shift from source frame to target frame instead of a registry path (geodetic
         * domain; heights pass unchanged, as NTv2 shifts are horizontal only).
         */
        public Builder horizontalGrid(io.geotick.transforms.grid.Ntv2Grid ntv2) {
            this.grid = new HorizontalGridStep(Objects.requireNonNull(ntv2, "grid"), true);
            return this;
        }

        /**
         * Uses an NTv2 grid in reverse, from its SYSTEM_T to its SYSTEM_F, as the shift from source frame to
         * target frame: the forward shift inverted by iteration to &lt; 1e-9° (see {@link
         * io.geotick.transforms.grid.Ntv2Grid#inverse}). For a grid published in one direction only.
         */
        public Builder horizontalGridReverse(io.geotick.transforms.grid.Ntv2Grid ntv2) {
            this.grid = new HorizontalGridStep(Objects.requireNonNull(ntv2, "grid"), false);
            return this;
        }

        /**
         * Uses a Molodensky shift (EPSG 9604, or abridged 9605) from source frame to target frame instead of a
         * registry path, in the geodetic domain. Its ellipsoids must be those of the two frames.
         *
         * @param parameterSource who published the translations, shown in the listing
         * @param accuracyMetres their stated accuracy
         */
        public Builder molodensky(Molodensky m, String parameterSource, double accuracyMetres) {
            this.molodensky = Objects.requireNonNull(m, "molodensky");
            this.molodenskySource = Objects.requireNonNull(parameterSource, "parameterSource");
            if (!(accuracyMetres >= 0) || Double.isInfinite(accuracyMetres)) {
                throw new IllegalArgumentException("accuracy must be finite and >= 0, got " + accuracyMetres);
            }
            this.molodenskyAccuracy = accuracyMetres;
            return this;
        }

        /**
         * The chain.
         *
         * @throws io.geotick.transforms.MissingEpochException if a time-dependent step has no epoch
         * @throws io.geotick.transforms.frames.NoFramePathException if the registry joins no path
         * @throws IllegalArgumentException for orthometric heights without a geoid, or conflicting options
         */
        public ConversionChain build() {
            Objects.requireNonNull(source, "source system (from)");
            Objects.requireNonNull(target, "target system (to)");
            int shifts = (userHelmert != null ? 1 : 0) + (grid != null ? 1 : 0) + (molodensky != null ? 1 : 0);
            if (shifts > 1) {
                throw new IllegalArgumentException("give one of user Helmert parameters, a grid shift or a Molodensky"
                    + " shift, not " + shifts);
            }
            // The layers of each end: a site grid on its base, a map grid on geodetic coordinates.
            List<Op> head = new ArrayList<>();
            List<Op> tail = new ArrayList<>();
            CoordinateSystem s = source;
            CoordinateSystem t = target;
            if (s.kind() == CoordinateKind.SITE) {
                head.add(new SiteStep(s.site().orElseThrow(), false));
                s = s.site().orElseThrow().base();
            }
            if (t.kind() == CoordinateKind.SITE) {
                tail.add(0, new SiteStep(t.site().orElseThrow(), true));
                t = t.site().orElseThrow().base();
            }
            boolean layered = s != source || t != target || s.kind() == CoordinateKind.PROJECTED
                || t.kind() == CoordinateKind.PROJECTED;
            List<Op> ops = new ArrayList<>(head);
            if (!(layered && s.equals(t) && shifts == 0)) {
                if (s.kind() == CoordinateKind.PROJECTED) {
                    ops.add(new ProjectionStep(s.grid().orElseThrow(), false));
                    s = s.core();
                }
                if (t.kind() == CoordinateKind.PROJECTED) {
                    tail.add(0, new ProjectionStep(t.grid().orElseThrow(), true));
                    t = t.core();
                }
                ops.addAll(core(s, t));
            }
            ops.addAll(tail);
            return new ConversionChain(source, target, Optional.ofNullable(epoch), ops);
        }

        /** The steps between two core systems (ECEF or geodetic). */
        private List<Op> core(CoordinateSystem s, CoordinateSystem t) {
            boolean needGeoid = s.height() == HeightKind.ORTHOMETRIC || t.height() == HeightKind.ORTHOMETRIC;
            if (needGeoid && geoid == null) {
                throw new IllegalArgumentException("orthometric heights (" + (s.height()
                    == HeightKind.ORTHOMETRIC ? s : t) + ") need a geoid model; none was given");
            }
            List<Op> ops = new ArrayList<>();
            if (s.height() == HeightKind.ORTHOMETRIC) {
                ops.add(geoid.toEllipsoidal());
            }
            boolean sameFrame = s.frame().equals(t.frame());
            if (grid != null || molodensky != null) {
                if (molodensky != null) {
                    checkEllipsoid("source", molodensky.sourceEllipsoid(), s);
                    checkEllipsoid("target", molodensky.targetEllipsoid(), t);
                }
                if (s.kind() == CoordinateKind.ECEF) {
                    ops.add(Ops.toGeodetic(s.frame()));
                }
                ops.add(grid != null ? grid : MolodenskyStep.of(molodensky, s.frame().name(), t.frame().name(),
                    molodenskySource, molodenskyAccuracy));
                if (t.kind() == CoordinateKind.ECEF) {
                    ops.add(Ops.toEcef(t.frame()));
                }
            } else {
                List<Op> shift = new ArrayList<>();
                if (userHelmert != null) {
                    StepDescription d = userDescription(s + " → " + t, userHelmert, userSource,
                        userAccuracy, false);
                    StepDescription di = userDescription(t + " → " + s, userHelmert, userSource,
                        userAccuracy, true);
                    shift.add(Ops.geocentric(userHelmert, d, di));
                } else if (!sameFrame) {
                    FrameTransformation ft = epoch == null ? registry.transformation(s.frame(), t.frame())
                        : registry.transformation(s.frame(), t.frame(), epoch);
                    for (FrameStep st : ft.steps()) {
                        shift.add(frameOp(st));
                    }
                }
                boolean needEcef = !shift.isEmpty() || s.kind() != t.kind()
                    || !s.frame().ellipsoid().equals(t.frame().ellipsoid());
                if (needEcef && s.kind() == CoordinateKind.GEODETIC) {
                    ops.add(Ops.toEcef(s.frame()));
                }
                ops.addAll(shift);
                if (needEcef && t.kind() == CoordinateKind.GEODETIC) {
                    ops.add(Ops.toGeodetic(t.frame()));
                }
            }
            if (t.height() == HeightKind.ORTHOMETRIC) {
                ops.add(geoid.toOrthometric());
            }
            return ops;
        }

        private static void checkEllipsoid(String end, Ellipsoid e, CoordinateSystem c) {
            if (!e.equals(c.frame().ellipsoid())) {
                throw new IllegalArgumentException("the Molodensky " + end + " ellipsoid " + e.name() + " is not the"
                    + " ellipsoid of " + c + " (" + c.frame().ellipsoid().name() + ")");
            }
        }

        private static Op frameOp(FrameStep s) {
            StepDescription d = s.description();
            List<String> c = new ArrayList<>(d.cautions());
            c.add("inverse of the step as listed");
            StepDescription inv = new StepDescription(s.to() + " → " + s.from(), d.method(), d.epsgMethod(),
                d.epsgTransformation(), d.parameters(), d.source(), d.accuracyMetres(), c);
            return Ops.geocentric(s.transform(), d, inv);
        }

        private static StepDescription userDescription(String name, Helmert h, String src, double acc,
                boolean inverse) {
            List<Parameter> ps = new ArrayList<>();
            h.parameters().toMap().forEach((k, v) -> {
                int sp = k.indexOf(' ');
                ps.add(new Parameter(k.substring(0, sp), v, k.substring(sp + 2, k.length() - 1)));
            });
            List<String> cautions = new ArrayList<>();
            cautions.add("user-supplied parameters in the " + h.convention().methodName().toLowerCase(
                java.util.Locale.ROOT) + " convention; the same numbers in the other convention rotate the"
                + " other way (about 2·r·6.4e6 m apart for a rotation r in radians)");
            if (inverse) {
                cautions.add("applied in reverse as the exact inverse");
            }
            return new StepDescription(name, h.description(), OptionalInt.of(h.convention().epsgGeocentricMethod()),
                OptionalInt.empty(), ps, src, acc, cautions);
        }
    }
}
