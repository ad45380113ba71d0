package io.geotick.timescales.clock;

import io.geotick.timescales.ScaleInstant;
import io.geotick.timescales.TimeScale;
import java.util.Arrays;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * A fitted device-clock model: reference = device + c0 + offset + drift &times; &Delta; + &frac12; driftRate &times; &Delta;&sup2;,
 * where &Delta; is the device reading minus the model's origin in seconds and c0 an exact whole-nanosecond
 * base offset (the first pair's reference &minus; device), so that large offsets (a counter against a
 * calendar time) lose no precision.
 *
 * <p>Accuracy: the polynomial is evaluated in double precision and the correction rounded to the
 * nanosecond; for &Delta; up to 10<sup>8</sup> s (three years) the evaluation error is far below 1 ns. The stated
 * uncertainties are 1&sigma; from the least-squares covariance scaled by the residual variance (common practice;
 * they assume independent, equal errors). Immutable.
 */
public final class ClockModel {
    private final ClockTerms terms;
    private final TimeScale deviceScale;
    private final TimeScale referenceScale;
    private final ScaleInstant origin;
    private final long baseOffsetNanos;
    private final double[] coefficients;
    private final double[][] covariance;
    private final ScaleInstant first;
    private final ScaleInstant last;

    /**
     * A model from its parts (as stored in a model file).
     *
     * @param coefficients offset (s), drift (s/s), drift rate (s/s&sup2;): as many as {@code terms.count()}
     * @param covariance   their covariance, {@code terms.count()} square; empty when unknown (as many pairs
     *                     as parameters: no redundancy)
     * @param first        the earliest device reading of the fit
     * @param last         the latest device reading of the fit
     */
    public static ClockModel of(ClockTerms terms, TimeScale deviceScale, TimeScale referenceScale,
                                ScaleInstant origin, long baseOffsetNanos, double[] coefficients,
                                Optional<double[][]> covariance, ScaleInstant first, ScaleInstant last) {
        return new ClockModel(terms, deviceScale, referenceScale, origin, baseOffsetNanos, coefficients, covariance,
            first, last);
    }

    private ClockModel(ClockTerms terms, TimeScale deviceScale, TimeScale referenceScale, ScaleInstant origin,
                       long baseOffsetNanos, double[] coefficients, Optional<double[][]> covariance,
                       ScaleInstant first, ScaleInstant last) {
        this.terms = Objects.requireNonNull(terms, "terms");
        this.deviceScale = Objects.requireNonNull(deviceScale, "deviceScale");
        this.referenceScale = Objects.requireNonNull(referenceScale, "referenceScale");
        this.origin = Objects.requireNonNull(origin, "origin").to(deviceScale);
        this.baseOffsetNanos = baseOffsetNanos;
        int p = terms.count();
        if (coefficients.length != p) {
            throw new IllegalArgumentException("model '" + terms.id() + "' needs " + p + " coefficients");
        }
        double[][] cov = covariance.orElse(null);
        if (cov != null) {
            if (cov.length != p) {
                throw new IllegalArgumentException("covariance must be " + p + "x" + p);
            }
            for (double[] row : cov) {
                if (row.length != p) {
                    throw new IllegalArgumentException("covariance must be " + p + "x" + p);
                }
                for (double v : row) {
                    if (!Double.isFinite(v)) {
                        throw new IllegalArgumentException("covariance entry " + v + " is not finite");
                    }
                }
            }
        }
        for (double c : coefficients) {
            if (!Double.isFinite(c)) {
                throw new IllegalArgumentException("model coefficient " + c + " is not finite");
            }
        }
        this.coefficients = coefficients.clone();
        this.covariance = cov == null ? null : Arrays.stream(cov).map(double[]::clone).toArray(double[][]::new);
        this.first = Objects.requireNonNull(first, "first");
        this.last = Objects.requireNonNull(last, "last");
    }

    public ClockTerms terms() {
        return terms;
    }

    public TimeScale deviceScale() {
        return deviceScale;
    }

    public TimeScale referenceScale() {
        return referenceScale;
    }

    /** The device reading at which &Delta; = 0. */
    public ScaleInstant origin() {
        return origin;
    }

    /** The exact base offset c0, nanoseconds. */
    public long baseOffsetNanos() {
        return baseOffsetNanos;
    }

    /** Offset, drift and drift rate as estimated (length {@code terms().count()}). */
    public double[] coefficients() {
        return coefficients.clone();
    }

    /** Covariance of the coefficients; empty when unknown (no redundancy in the fit). */
    public Optional<double[][]> covariance() {
        return covariance == null ? Optional.empty()
            : Optional.of(Arrays.stream(covariance).map(double[]::clone).toArray(double[][]::new));
    }

    /** The fitted offset at the origin, seconds (excluding the exact base offset). */
    public double offsetSeconds() {
        return coefficients[0];
    }

    /** Drift in seconds per second (0 for an offset-only model). Negative: the device clock gains. */
    public double drift() {
        return terms.count() > 1 ? coefficients[1] : 0.0;
    }

    /** Drift rate in seconds per second squared (0 unless estimated). */
    public double driftRate() {
        return terms.count() > 2 ? coefficients[2] : 0.0;
    }

    /** 1&sigma; uncertainty of coefficient {@code i}; empty when unknown (no redundancy). */
    public OptionalDouble sigma(int i) {
        return covariance == null ? OptionalDouble.empty() : OptionalDouble.of(Math.sqrt(covariance[i][i]));
    }

    /** The earliest device reading of the fit. */
    public ScaleInstant firstReading() {
        return first;
    }

    /** The latest device reading of the fit. */
    public ScaleInstant lastReading() {
        return last;
    }

    /**
     * Maps a device reading onto the reference scale.
     *
     * @param device a device clock reading (its scale should be {@link #deviceScale()})
     */
    public ClockCorrection apply(ScaleInstant device) {
        double dt = origin.nanosUntil(device) / 1e9;
        double[] g = {1.0, dt, 0.5 * dt * dt};
        int p = terms.count();
        double corr = 0;
        for (int i = 0; i < p; i++) {
            corr += coefficients[i] * g[i];
        }
        OptionalDouble sigma = OptionalDouble.empty();
        if (covariance != null) {
            double var = 0;
            for (int i = 0; i < p; i++) {
                for (int j = 0; j < p; j++) {
                    var += g[i] * covariance[i][j] * g[j];
                }
            }
            sigma = OptionalDouble.of(Math.sqrt(Math.max(var, 0)));
        }
        long corrNanos = Math.addExact(baseOffsetNanos, Math.round(corr * 1e9));
        ScaleInstant ref = device.to(referenceScale).plusNanos(corrNanos);
        boolean outside = device.isBefore(first) || device.isAfter(last);
        return new ClockCorrection(ref, corrNanos, sigma, outside);
    }

    /**
     * The result of applying the model.
     *
     * @param reference        the reference time of the device reading
     * @param correctionNanos  reference &minus; device, nanoseconds
     * @param sigmaSeconds     1&sigma; uncertainty of the correction from the fit's covariance (empty if unknown)
     * @param extrapolated     true when the reading lies outside the span of the fitted readings
     */
    public record ClockCorrection(ScaleInstant reference, long correctionNanos, OptionalDouble sigmaSeconds,
                                  boolean extrapolated) {
    }
}
