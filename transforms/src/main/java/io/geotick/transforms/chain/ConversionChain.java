package io.geotick.transforms.chain;

import io.geotick.geodesy.InvalidCoordinateException;
import io.geotick.transforms.Epoch;
import io.geotick.transforms.StepDescription;
import io.geotick.transforms.StepDescription.Parameter;
import io.geotick.transforms.frames.FrameRegistry;
import io.geotick.transforms.frames.FrameStep;
import io.geotick.transforms.frames.FrameTransformation;
import io.geotick.transforms.helmert.GeocentricTransform;
import io.geotick.transforms.helmert.Helmert;
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
 * <p>The steps, in order: orthometric → ellipsoidal height (if the source heights are orthometric);
 * geodetic → ECEF on the source ellipsoid; the frame path from the registry (or the user's own Helmert
 * parameters, or an NTv2 grid shift in the geodetic domain); ECEF → geodetic on the target ellipsoid;
 * ellipsoidal → orthometric height. Conversions that would cancel (same frame, same kind) are left out.
 * The coordinates keep their epoch: the chain changes frames, not time.
 *
 * <p>Coordinates are triples: ECEF (x, y, z) in metres, geodetic (latitude °, longitude °, height m).
 * Expected accuracy ({@link #accuracyMetres()}): root-sum-square of the steps' stated accuracies.
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
     * Allocates nothing beyond what the steps document (none of the built-in steps allocate).
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
         * The chain.
         *
         * @throws io.geotick.transforms.MissingEpochException if a time-dependent step has no epoch
         * @throws io.geotick.transforms.frames.NoFramePathException if the registry joins no path
         * @throws IllegalArgumentException for orthometric heights without a geoid, or conflicting options
         */
        public ConversionChain build() {
            Objects.requireNonNull(source, "source system (from)");
            Objects.requireNonNull(target, "target system (to)");
            if (userHelmert != null && grid != null) {
                throw new IllegalArgumentException("give either user Helmert parameters or a grid shift, not both");
            }
            boolean needGeoid = source.height() == HeightKind.ORTHOMETRIC
                || target.height() == HeightKind.ORTHOMETRIC;
            if (needGeoid && geoid == null) {
                throw new IllegalArgumentException("orthometric heights (" + (source.height()
                    == HeightKind.ORTHOMETRIC ? source : target) + ") need a geoid model; none was given");
            }
            List<Op> ops = new ArrayList<>();
            if (source.height() == HeightKind.ORTHOMETRIC) {
                ops.add(geoid.toEllipsoidal());
            }
            boolean sameFrame = source.frame().equals(target.frame());
            if (grid != null) {
                if (source.kind() == CoordinateKind.ECEF) {
                    ops.add(Ops.toGeodetic(source.frame()));
                }
                ops.add(grid);
                if (target.kind() == CoordinateKind.ECEF) {
                    ops.add(Ops.toEcef(target.frame()));
                }
            } else {
                List<Op> shift = new ArrayList<>();
                if (userHelmert != null) {
                    StepDescription d = userDescription(source + " → " + target, userHelmert, userSource,
                        userAccuracy, false);
                    StepDescription di = userDescription(target + " → " + source, userHelmert, userSource,
                        userAccuracy, true);
                    shift.add(Ops.geocentric(userHelmert, d, di));
                } else if (!sameFrame) {
                    FrameTransformation ft = epoch == null ? registry.transformation(source.frame(), target.frame())
                        : registry.transformation(source.frame(), target.frame(), epoch);
                    for (FrameStep s : ft.steps()) {
                        shift.add(frameOp(s));
                    }
                }
                boolean needEcef = !shift.isEmpty() || source.kind() != target.kind()
                    || !source.frame().ellipsoid().equals(target.frame().ellipsoid());
                if (needEcef && source.kind() == CoordinateKind.GEODETIC) {
                    ops.add(Ops.toEcef(source.frame()));
                }
                ops.addAll(shift);
                if (needEcef && target.kind() == CoordinateKind.GEODETIC) {
                    ops.add(Ops.toGeodetic(target.frame()));
                }
            }
            if (target.height() == HeightKind.ORTHOMETRIC) {
                ops.add(geoid.toOrthometric());
            }
            return new ConversionChain(source, target, Optional.ofNullable(epoch), ops);
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
