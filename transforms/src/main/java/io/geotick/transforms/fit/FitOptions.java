package io.geotick.transforms.fit;

import io.geotick.transforms.helmert.RotationConvention;
import java.util.Objects;
import java.util.Set;

/**
 * Options of a control-point fit.
 *
 * @param outlierThreshold a point is flagged when its standardised residual exceeds this (default 3)
 * @param excludedIds ids of control points left out of the estimate (their residuals are still reported)
 * @param convention the sign convention in which 3D Helmert rotations are reported (default position
 *     vector); the fitted transformation is the same either way
 */
public record FitOptions(double outlierThreshold, Set<String> excludedIds, RotationConvention convention) {

    /** The default outlier threshold, 3 (common practice for a standardised residual). */
    public static final double DEFAULT_THRESHOLD = 3.0;

    public FitOptions {
        Objects.requireNonNull(convention, "convention");
        excludedIds = Set.copyOf(excludedIds);
        if (!(outlierThreshold > 0 && Double.isFinite(outlierThreshold))) {
            throw new IllegalArgumentException("outlier threshold " + outlierThreshold
                + " is not a positive finite number");
        }
    }

    /** Threshold 3, nothing excluded, position-vector rotations. */
    public static FitOptions defaults() {
        return new FitOptions(DEFAULT_THRESHOLD, Set.of(), RotationConvention.POSITION_VECTOR);
    }

    /** These options with another outlier threshold. */
    public FitOptions withOutlierThreshold(double threshold) {
        return new FitOptions(threshold, excludedIds, convention);
    }

    /** These options with these ids excluded as well. */
    public FitOptions excluding(Set<String> ids) {
        java.util.Set<String> s = new java.util.HashSet<>(excludedIds);
        s.addAll(ids);
        return new FitOptions(outlierThreshold, s, convention);
    }

    /** These options with another convention for reporting Helmert rotations. */
    public FitOptions withConvention(RotationConvention c) {
        return new FitOptions(outlierThreshold, excludedIds, c);
    }
}
