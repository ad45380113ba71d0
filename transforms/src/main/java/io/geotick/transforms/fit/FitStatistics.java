package io.geotick.transforms.fit;

import java.util.List;
import java.util.Objects;
import java.util.OptionalDouble;

/**
 * The statistics of a control-point fit.
 *
 * @param pointsGiven control points given
 * @param pointsUsed control points in the estimate (given minus excluded)
 * @param redundancy r = d·pointsUsed − u (observations minus parameters)
 * @param sigma0 the a-posteriori standard deviation of unit weight σ₀ = √(vᵀv / r), metres; empty when
 *     r = 0 (an exact fit says nothing about precision)
 * @param rms root mean square of the residual vector lengths of the used points, √(Σ|vᵢ|²/n), metres
 * @param outlierThreshold the threshold on standardised residuals
 * @param residuals one residual per given point, in input order
 */
public record FitStatistics(int pointsGiven, int pointsUsed, int redundancy, OptionalDouble sigma0, double rms,
        double outlierThreshold, List<PointResidual> residuals) {

    public FitStatistics {
        Objects.requireNonNull(sigma0, "sigma0");
        residuals = List.copyOf(residuals);
        if (pointsUsed < 0 || pointsUsed > pointsGiven || redundancy < 0) {
            throw new IllegalArgumentException("fit statistics: points given " + pointsGiven + ", used "
                + pointsUsed + ", redundancy " + redundancy + " are inconsistent");
        }
        if (!(rms >= 0 && Double.isFinite(rms))) {
            throw new IllegalArgumentException("fit statistics: rms " + rms + " is not a finite non-negative number");
        }
        if (!(outlierThreshold > 0 && Double.isFinite(outlierThreshold))) {
            throw new IllegalArgumentException("outlier threshold " + outlierThreshold + " is not a positive number");
        }
        if (sigma0.isPresent() && !(sigma0.getAsDouble() >= 0 && Double.isFinite(sigma0.getAsDouble()))) {
            throw new IllegalArgumentException("fit statistics: sigma0 " + sigma0.getAsDouble() + " is not valid");
        }
    }

    /** The residuals flagged as outliers. */
    public List<PointResidual> outliers() {
        return residuals.stream().filter(PointResidual::outlier).toList();
    }
}
