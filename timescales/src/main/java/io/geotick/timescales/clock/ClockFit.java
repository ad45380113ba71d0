package io.geotick.timescales.clock;

import io.geotick.timescales.ScaleInstant;
import java.util.List;
import java.util.OptionalDouble;

/**
 * The outcome of a clock fit.
 *
 * @param model          the fitted model
 * @param pairsRead      pairs given
 * @param pairsUsed      pairs in the final fit (outliers excluded when asked)
 * @param residualRms    RMS of the residuals of the used pairs, seconds
 * @param residualSigma  residual standard deviation sqrt(RSS / (n &minus; p)), seconds (empty when n = p)
 * @param residuals      residual (observed &minus; model) of every pair, seconds, in input order
 * @param outliers       pairs whose residual exceeded the threshold
 */
public record ClockFit(ClockModel model, int pairsRead, int pairsUsed, double residualRms, OptionalDouble residualSigma,
                       List<Residual> residuals, List<Residual> outliers) {
    public ClockFit {
        residuals = List.copyOf(residuals);
        outliers = List.copyOf(outliers);
    }

    /**
     * One pair's residual.
     *
     * @param line     the pair's line
     * @param device   its device reading
     * @param seconds  observed minus modelled correction, seconds
     * @param excluded true when the pair was left out of the final fit
     */
    public record Residual(int line, ScaleInstant device, double seconds, boolean excluded) {
    }
}
