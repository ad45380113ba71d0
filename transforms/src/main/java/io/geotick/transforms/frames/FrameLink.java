package io.geotick.transforms.frames;

import io.geotick.transforms.Epoch;
import io.geotick.transforms.MissingEpochException;
import io.geotick.transforms.StepDescription;
import io.geotick.transforms.StepDescription.Parameter;
import io.geotick.transforms.helmert.GeocentricTransform;
import io.geotick.transforms.helmert.GeocentricTranslation;
import io.geotick.transforms.helmert.Helmert;
import io.geotick.transforms.helmert.HelmertParameters;
import io.geotick.transforms.helmert.RotationConvention;
import io.geotick.transforms.helmert.TimeDependentHelmert;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * One published parameter set between two frames, with its source, EPSG transformation code (where it
 * has one), stated accuracy and cautions. Immutable. A link is used in both directions: the reverse is
 * the exact inverse of the transformation evaluated at the epoch (the EPSG reverse, sign reversal,
 * differs from it by second-order terms that are stated by {@link Helmert#signReversalDifference} and
 * lie far below the published accuracy of every set in the standard registry).
 */
public final class FrameLink {
    /** The kind of link. */
    public enum Kind {
        /** Geocentric translations, EPSG 1031 / 9603. */
        GEOCENTRIC_TRANSLATIONS,
        /** 7-parameter Helmert, EPSG 1033 / 9606 or 1032 / 9607. */
        HELMERT,
        /** 14-parameter time-dependent Helmert, EPSG 1053 / 1056: needs the coordinate epoch. */
        TIME_DEPENDENT_HELMERT,
        /**
         * Identity by convention, valid only for coordinate epochs in a date range (WGS 84 taken as the ITRF
         * realisation it was aligned to at that date): needs the coordinate epoch.
         */
        ALIGNMENT_BY_DATE
    }

    private final Frame from;
    private final Frame to;
    private final Kind kind;
    private final HelmertParameters parameters;
    private final RotationConvention convention;
    private final TimeDependentHelmert timeDependent;
    private final Epoch validFrom;
    private final Epoch validUntil;
    private final OptionalInt epsgTransformation;
    private final String source;
    private final double accuracy;
    private final List<String> cautions;

    private FrameLink(Frame from, Frame to, Kind kind, HelmertParameters parameters, RotationConvention convention,
            TimeDependentHelmert timeDependent, Epoch validFrom, Epoch validUntil, int epsg, String source,
            double accuracy, List<String> cautions) {
        this.from = Objects.requireNonNull(from, "from");
        this.to = Objects.requireNonNull(to, "to");
        if (from.equals(to)) {
            throw new IllegalArgumentException("a link must join two different frames, got " + from + " twice");
        }
        this.kind = kind;
        this.parameters = parameters;
        this.convention = convention;
        this.timeDependent = timeDependent;
        this.validFrom = validFrom;
        this.validUntil = validUntil;
        this.epsgTransformation = epsg > 0 ? OptionalInt.of(epsg) : OptionalInt.empty();
        this.source = Objects.requireNonNull(source, "source");
        if (!(accuracy >= 0) || Double.isInfinite(accuracy)) {
            throw new IllegalArgumentException("accuracy must be finite and >= 0, got " + accuracy);
        }
        this.accuracy = accuracy;
        this.cautions = List.copyOf(cautions);
    }

    /**
     * Geocentric translations from {@code from} to {@code to} (EPSG 9603).
     *
     * @param epsgTransformation EPSG transformation code, or 0 if it has none
     * @param accuracy published accuracy, metres
     */
    public static FrameLink geocentricTranslations(Frame from, Frame to, double tx, double ty, double tz,
            int epsgTransformation, String source, double accuracy, String... cautions) {
        return new FrameLink(from, to, Kind.GEOCENTRIC_TRANSLATIONS, HelmertParameters.ofTranslation(tx, ty, tz),
            null, null, null, null, epsgTransformation, source, accuracy, List.of(cautions));
    }

    /** A 7-parameter Helmert set in the given convention (small-angle, as EPSG defines the methods). */
    public static FrameLink helmert(Frame from, Frame to, HelmertParameters parameters,
            RotationConvention convention, int epsgTransformation, String source, double accuracy,
            String... cautions) {
        return new FrameLink(from, to, Kind.HELMERT, Objects.requireNonNull(parameters, "parameters"),
            Objects.requireNonNull(convention, "convention"), null, null, null, epsgTransformation, source,
            accuracy, List.of(cautions));
    }

    /** A 14-parameter time-dependent Helmert set. */
    public static FrameLink timeDependent(Frame from, Frame to, TimeDependentHelmert transformation,
            int epsgTransformation, String source, double accuracy, String... cautions) {
        return new FrameLink(from, to, Kind.TIME_DEPENDENT_HELMERT, null, null,
            Objects.requireNonNull(transformation, "transformation"), null, null, epsgTransformation, source,
            accuracy, List.of(cautions));
    }

    /**
     * An identity by convention valid for coordinate epochs in [validFrom, validUntil); {@code validUntil}
     * empty means open-ended.
     */
    public static FrameLink alignmentByDate(Frame from, Frame to, Epoch validFrom, Optional<Epoch> validUntil,
            String source, double accuracy, String... cautions) {
        return new FrameLink(from, to, Kind.ALIGNMENT_BY_DATE, null, null, null,
            Objects.requireNonNull(validFrom, "validFrom"), validUntil.orElse(null), 0, source, accuracy,
            List.of(cautions));
    }

    public Frame from() {
        return from;
    }

    public Frame to() {
        return to;
    }

    public Kind kind() {
        return kind;
    }

    /** EPSG transformation code, if the set has one. */
    public OptionalInt epsgTransformation() {
        return epsgTransformation;
    }

    /** Where the parameters come from. */
    public String source() {
        return source;
    }

    /** Published (or stated) accuracy, metres. */
    public double accuracyMetres() {
        return accuracy;
    }

    /** Cautions, each with its size. */
    public List<String> cautions() {
        return cautions;
    }

    /** The static parameters (translations / Helmert), if this is such a link. */
    public Optional<HelmertParameters> parameters() {
        return Optional.ofNullable(parameters);
    }

    /** The time-dependent transformation, if this is such a link. */
    public Optional<TimeDependentHelmert> timeDependentHelmert() {
        return Optional.ofNullable(timeDependent);
    }

    /** True when the coordinate epoch is needed to use this link. */
    public boolean requiresEpoch() {
        return kind == Kind.TIME_DEPENDENT_HELMERT || kind == Kind.ALIGNMENT_BY_DATE;
    }

    /** Whether the link may be used for coordinates at that epoch (date-ranged links only). */
    public boolean validAt(Epoch epoch) {
        if (kind != Kind.ALIGNMENT_BY_DATE) {
            return true;
        }
        return epoch.compareTo(validFrom) >= 0 && (validUntil == null || epoch.compareTo(validUntil) < 0);
    }

    /** The date range of an alignment link, as text; empty for other links. */
    public String validity() {
        return kind != Kind.ALIGNMENT_BY_DATE ? ""
            : "coordinate epochs from " + validFrom + (validUntil == null ? " on" : " until " + validUntil);
    }

    /** The other end of the link. */
    Frame other(Frame f) {
        return f.equals(from) ? to : from;
    }

    /**
     * This link evaluated in the given direction at the given epoch.
     *
     * @param forward true for from → to
     * @param epoch the coordinate epoch, required when {@link #requiresEpoch()}
     * @throws MissingEpochException if the epoch is needed and absent
     */
    public FrameStep resolve(boolean forward, Optional<Epoch> epoch) {
        Objects.requireNonNull(epoch, "epoch");
        Frame s = forward ? from : to;
        Frame t = forward ? to : from;
        String title = s + " → " + t;
        List<Parameter> ps = new ArrayList<>();
        List<String> notes = new ArrayList<>(cautions);
        GeocentricTransform transform;
        String method;
        OptionalInt epsgMethod;
        switch (kind) {
            case GEOCENTRIC_TRANSLATIONS: {
                GeocentricTranslation g = GeocentricTranslation.of(parameters.tx(), parameters.ty(),
                    parameters.tz());
                transform = forward ? g : g.inverse();
                method = "Geocentric translations";
                epsgMethod = OptionalInt.of(9603);
                addTranslations(ps, parameters);
                if (!forward) {
                    notes.add("applied in reverse: translations negated (exact inverse)");
                }
                break;
            }
            case HELMERT: {
                Helmert h = Helmert.of(parameters, convention, io.geotick.transforms.helmert.RotationForm.SMALL_ANGLE);
                transform = forward ? h : h.inverse();
                method = convention.methodName() + ", small-angle";
                epsgMethod = OptionalInt.of(convention.epsgGeocentricMethod());
                addSeven(ps, parameters, "");
                if (!forward) {
                    notes.add("applied in reverse as the exact inverse; the EPSG reverse by sign reversal"
                        + " differs by second-order terms (up to ~1 cm for 20 ppm sets, far below the accuracy)");
                }
                break;
            }
            case TIME_DEPENDENT_HELMERT: {
                Epoch e = epoch.orElseThrow(() -> new MissingEpochException("the step " + title
                    + " (time-dependent Helmert, EPSG method " + timeDependent.epsgMethod() + ", reference epoch "
                    + timeDependent.referenceEpoch() + ") needs the coordinate epoch; none was given"));
                Helmert h = timeDependent.at(e);
                transform = forward ? h : h.inverse();
                method = "Time-dependent " + timeDependent.convention().methodName();
                epsgMethod = OptionalInt.of(timeDependent.epsgMethod());
                ps.add(new Parameter("coordinate epoch", e.decimalYear(), "year"));
                ps.add(new Parameter("reference epoch", timeDependent.referenceEpoch().decimalYear(), "year"));
                addSeven(ps, h.parameters(), " at epoch");
                addSeven(ps, timeDependent.rates(), " rate");
                if (!forward) {
                    notes.add("applied in reverse as the exact inverse of the parameters at the coordinate"
                        + " epoch (sign reversal would differ by < 1e-9 m for ITRF-sized parameters)");
                }
                break;
            }
            case ALIGNMENT_BY_DATE: {
                Epoch e = epoch.orElseThrow(() -> new MissingEpochException("the step " + title
                    + " takes " + from + " as the " + to + " realisation of the coordinate epoch (" + validity()
                    + "); it needs the coordinate epoch; none was given"));
                if (!validAt(e)) {
                    throw new IllegalArgumentException("the step " + title + " is valid only for " + validity()
                        + ", not at epoch " + e);
                }
                transform = GeocentricTranslation.of(0, 0, 0);
                method = "Identity by alignment (" + validity() + ")";
                epsgMethod = OptionalInt.empty();
                ps.add(new Parameter("coordinate epoch", e.decimalYear(), "year"));
                break;
            }
            default:
                throw new IllegalStateException(kind.toString());
        }
        StepDescription d = new StepDescription(title, method, epsgMethod, epsgTransformation, ps, source,
            accuracy, notes);
        return new FrameStep(s, t, transform, d);
    }

    /**
     * The link as published, for registry listings: parameters at the reference epoch and their rates
     * for a time-dependent set, the date range for an alignment; nothing is evaluated.
     */
    public StepDescription describe() {
        List<Parameter> ps = new ArrayList<>();
        String method;
        OptionalInt epsgMethod;
        switch (kind) {
            case GEOCENTRIC_TRANSLATIONS:
                method = "Geocentric translations";
                epsgMethod = OptionalInt.of(9603);
                addTranslations(ps, parameters);
                break;
            case HELMERT:
                method = convention.methodName() + ", small-angle";
                epsgMethod = OptionalInt.of(convention.epsgGeocentricMethod());
                addSeven(ps, parameters, "");
                break;
            case TIME_DEPENDENT_HELMERT:
                method = "Time-dependent " + timeDependent.convention().methodName();
                epsgMethod = OptionalInt.of(timeDependent.epsgMethod());
                ps.add(new Parameter("reference epoch", timeDependent.referenceEpoch().decimalYear(), "year"));
                addSeven(ps, timeDependent.parametersAtReference(), "");
                addSeven(ps, timeDependent.rates(), " rate");
                break;
            default:
                method = "Identity by alignment (" + validity() + ")";
                epsgMethod = OptionalInt.empty();
                break;
        }
        return new StepDescription(from + " → " + to, method, epsgMethod, epsgTransformation, ps, source, accuracy,
            cautions);
    }

    private static void addTranslations(List<Parameter> ps, HelmertParameters p) {
        ps.add(new Parameter("tx", p.tx(), "m"));
        ps.add(new Parameter("ty", p.ty(), "m"));
        ps.add(new Parameter("tz", p.tz(), "m"));
    }

    private static void addSeven(List<Parameter> ps, HelmertParameters p, String suffix) {
        String per = suffix.equals(" rate") ? "/yr" : "";
        ps.add(new Parameter("tx" + suffix, p.tx(), "m" + per));
        ps.add(new Parameter("ty" + suffix, p.ty(), "m" + per));
        ps.add(new Parameter("tz" + suffix, p.tz(), "m" + per));
        ps.add(new Parameter("rx" + suffix, p.rx(), "arc-second" + per));
        ps.add(new Parameter("ry" + suffix, p.ry(), "arc-second" + per));
        ps.add(new Parameter("rz" + suffix, p.rz(), "arc-second" + per));
        ps.add(new Parameter("ds" + suffix, p.ds(), "ppm" + per));
    }

    @Override
    public String toString() {
        return from + " → " + to + " (" + kind + ", " + source + ")";
    }
}
