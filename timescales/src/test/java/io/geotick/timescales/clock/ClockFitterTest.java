package io.geotick.timescales.clock;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import io.geotick.timescales.ScaleInstant;
import io.geotick.timescales.TimeScale;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

class ClockFitterTest {
    /** A quartz clock that gains 0.5 s a day (common practice figure), offset 2.5 s, 1 ms noise. */
    private static List<ClockPair> quartz(int n, double ratePerSecSquared, int outlierAt) {
        Random rnd = new Random(42);
        List<ClockPair> out = new ArrayList<>();
        ScaleInstant t0 = ScaleInstant.ofTai(1_700_000_000L, 0);
        double drift = -0.5 / 86_400;
        for (int i = 0; i < n; i++) {
            double dt = i * 3600.0;
            double corr = 2.5 + drift * dt + 0.5 * ratePerSecSquared * dt * dt + rnd.nextGaussian() * 1e-3;
            if (i == outlierAt) {
                corr += 1.0;
            }
            ScaleInstant device = t0.plusSeconds(i * 3600L).plusNanos(rnd.nextInt(1000));
            ScaleInstant ref = device.plusNanos(Math.round(corr * 1e9));
            out.add(new ClockPair(device.to(TimeScale.UTC), ref.to(TimeScale.UTC), i + 2));
        }
        return out;
    }

    @Test
    void recoversOffsetAndDriftWithUncertainties() {
        ClockFit fit = ClockFitter.fit(quartz(48, 0, -1), ClockTerms.DRIFT, 3, false);
        ClockModel m = fit.model();
        double totalOffset = m.baseOffsetNanos() / 1e9 + m.offsetSeconds();
        assertThat(totalOffset).isCloseTo(2.5, within(2e-3));
        assertThat(m.drift() * 86_400).isCloseTo(-0.5, within(1e-3));
        assertThat(m.sigma(1).orElseThrow() * 86_400).isBetween(1e-6, 1e-3);
        assertThat(fit.residualRms()).isCloseTo(1e-3, within(5e-4));
        assertThat(fit.outliers()).isEmpty();
        assertThat(fit.pairsUsed()).isEqualTo(48);
    }

    @Test
    void driftRateIsEstimatedWhenAsked() {
        double rate = 2e-11;
        ClockFit fit = ClockFitter.fit(quartz(200, rate, -1), ClockTerms.DRIFT_RATE, 3, false);
        assertThat(fit.model().driftRate()).isCloseTo(rate, within(1e-12));
        assertThat(fit.model().drift() * 86_400).isCloseTo(-0.5, within(1e-3));
    }

    @Test
    void outliersAreReportedAndCanBeExcluded() {
        List<ClockPair> pairs = quartz(48, 0, 20);
        ClockFit kept = ClockFitter.fit(pairs, ClockTerms.DRIFT, 3, false);
        assertThat(kept.outliers()).extracting(ClockFit.Residual::line).containsExactly(22);
        ClockFit dropped = ClockFitter.fit(pairs, ClockTerms.DRIFT, 3, true);
        assertThat(dropped.pairsUsed()).isEqualTo(47);
        assertThat(dropped.outliers()).singleElement().satisfies(r -> {
            assertThat(r.line()).isEqualTo(22);
            assertThat(r.excluded()).isTrue();
            assertThat(r.seconds()).isCloseTo(1.0, within(0.01));
        });
        assertThat(dropped.residualRms()).isLessThan(2e-3);
    }

    @Test
    void applyMapsDeviceTimesAndFlagsExtrapolation() {
        List<ClockPair> pairs = quartz(48, 0, -1);
        ClockModel m = ClockFitter.fit(pairs, ClockTerms.DRIFT, 3, false).model();
        ClockPair p = pairs.get(10);
        ClockModel.ClockCorrection c = m.apply(p.device());
        assertThat(c.reference().scale()).isEqualTo(TimeScale.UTC);
        assertThat(Math.abs(c.reference().nanosUntil(p.reference()))).isLessThan(5_000_000L);
        assertThat(c.extrapolated()).isFalse();
        assertThat(m.apply(p.device().plusSeconds(10 * 86_400L)).extrapolated()).isTrue();
    }

    @Test
    void degenerateInputsAreRejected() {
        List<ClockPair> one = quartz(1, 0, -1);
        assertThatThrownBy(() -> ClockFitter.fit(one, ClockTerms.DRIFT, 3, false))
            .isInstanceOf(ClockFitException.class).hasMessageContaining("at least 2");
        ClockPair p = one.get(0);
        List<ClockPair> same = List.of(p, new ClockPair(p.device(), p.reference().plusNanos(5), 3));
        assertThatThrownBy(() -> ClockFitter.fit(same, ClockTerms.DRIFT, 3, false))
            .isInstanceOf(ClockFitException.class).hasMessageContaining("same instant");
        ClockFit exact = ClockFitter.fit(one, ClockTerms.OFFSET, 3, false);
        assertThat(exact.model().offsetSeconds()).isZero();
        // one pair, one parameter: no redundancy, so no uncertainty (empty, never NaN)
        assertThat(exact.model().sigma(0)).isEmpty();
        assertThat(exact.residualSigma()).isEmpty();
        assertThat(exact.model().apply(p.device()).sigmaSeconds()).isEmpty();
    }
}
