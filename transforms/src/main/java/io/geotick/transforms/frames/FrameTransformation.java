package io.geotick.transforms.frames;

import io.geotick.geodesy.position.EcefPosition;
import io.geotick.transforms.Epoch;
import io.geotick.transforms.StepDescription;
import io.geotick.transforms.helmert.GeocentricTransform;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * The ECEF → ECEF transformation between two frames along a registry path, evaluated at one coordinate
 * epoch. Immutable and thread-safe. Coordinates keep their epoch: this changes the frame, not the time;
 * moving a station in time is {@link io.geotick.transforms.StationMotion}.
 *
 * <p>Expected accuracy: the root-sum-square of the steps' stated accuracies (common practice for
 * independent errors).
 */
public final class FrameTransformation implements GeocentricTransform {
    private final Frame source;
    private final Frame target;
    private final Optional<Epoch> epoch;
    private final List<FrameStep> steps;

    FrameTransformation(Frame source, Frame target, Optional<Epoch> epoch, List<FrameStep> steps) {
        this.source = Objects.requireNonNull(source);
        this.target = Objects.requireNonNull(target);
        this.epoch = Objects.requireNonNull(epoch);
        this.steps = List.copyOf(steps);
    }

    public Frame source() {
        return source;
    }

    public Frame target() {
        return target;
    }

    /** The coordinate epoch it was evaluated at, if one was given. */
    public Optional<Epoch> epoch() {
        return epoch;
    }

    /** The evaluated steps in order (empty for the identity). */
    public List<FrameStep> steps() {
        return steps;
    }

    /** The step descriptions in order. */
    public List<StepDescription> descriptions() {
        List<StepDescription> d = new ArrayList<>();
        for (FrameStep s : steps) {
            d.add(s.description());
        }
        return Collections.unmodifiableList(d);
    }

    /** Root-sum-square of the steps' accuracies, metres. */
    public double accuracyMetres() {
        double s = 0;
        for (FrameStep f : steps) {
            double a = f.description().accuracyMetres();
            s += a * a;
        }
        return Math.sqrt(s);
    }

    @Override
    public EcefPosition apply(EcefPosition p) {
        EcefPosition r = Objects.requireNonNull(p, "source");
        for (FrameStep s : steps) {
            r = s.transform().apply(r);
        }
        return r;
    }

    @Override
    public void apply(double[] in, int inOffset, double[] out, int outOffset, int count) {
        if (steps.isEmpty()) {
            Objects.checkFromIndexSize(inOffset, 3 * count, in.length);
            Objects.checkFromIndexSize(outOffset, 3 * count, out.length);
            System.arraycopy(in, inOffset, out, outOffset, 3 * count);
            return;
        }
        steps.get(0).transform().apply(in, inOffset, out, outOffset, count);
        for (int i = 1; i < steps.size(); i++) {
            steps.get(i).transform().apply(out, outOffset, out, outOffset, count);
        }
    }

    @Override
    public FrameTransformation inverse() {
        List<FrameStep> rev = new ArrayList<>();
        for (int i = steps.size() - 1; i >= 0; i--) {
            FrameStep s = steps.get(i);
            StepDescription d = s.description();
            List<String> c = new ArrayList<>(d.cautions());
            c.add("inverse of the step as listed");
            rev.add(new FrameStep(s.to(), s.from(), s.transform().inverse(), new StepDescription(
                s.to() + " → " + s.from(), d.method(), d.epsgMethod(), d.epsgTransformation(), d.parameters(),
                d.source(), d.accuracyMetres(), c)));
        }
        return new FrameTransformation(target, source, epoch, rev);
    }

    @Override
    public String description() {
        StringBuilder s = new StringBuilder(source.name());
        for (FrameStep f : steps) {
            s.append(" → ").append(f.to().name());
        }
        epoch.ifPresent(e -> s.append(" at epoch ").append(e));
        return s.toString();
    }

    @Override
    public String toString() {
        return description();
    }
}
