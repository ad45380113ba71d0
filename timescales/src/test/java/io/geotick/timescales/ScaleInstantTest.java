package io.geotick.timescales;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.time.Duration;
import org.junit.jupiter.api.Test;

class ScaleInstantTest {
    @Test
    void arithmeticIsExactAcrossSecondBoundaries() {
        ScaleInstant a = ScaleInstant.ofTai(10, 999_999_999);
        assertThat(a.plusNanos(1)).isEqualTo(ScaleInstant.ofTai(11, 0));
        assertThat(a.plusNanos(-1_000_000_000L)).isEqualTo(ScaleInstant.ofTai(9, 999_999_999));
        assertThat(ScaleInstant.ofTai(0, -1)).isEqualTo(ScaleInstant.ofTai(-1, 999_999_999));
        assertThat(a.until(ScaleInstant.ofTai(12, 0))).isEqualTo(Duration.ofNanos(1_000_000_001));
        assertThat(a.plus(Duration.ofMillis(1500)).nano()).isEqualTo(499_999_999);
    }

    @Test
    void scaleChangeKeepsThePhysicalInstant() {
        ScaleInstant g = ScaleInstant.ofScaleSeconds(TimeScale.GPS, 100, 0);
        assertThat(g.taiSeconds()).isEqualTo(119);
        assertThat(g.to(TimeScale.BDT).scaleSeconds()).isEqualTo(86);
        assertThat(g.to(TimeScale.TT).scaleSeconds()).isEqualTo(151);
        assertThat(g.to(TimeScale.TT).scaleNano()).isEqualTo(184_000_000);
        assertThat(g.to(TimeScale.TAI).isSameInstant(g)).isTrue();
        assertThat(g.to(TimeScale.TAI)).isNotEqualTo(g);
        assertThat(g.toString()).isEqualTo("gps@TAI+119");
        assertThat(ScaleInstant.ofTai(-1, 500_000_000).toString()).isEqualTo("tai@TAI-0.500");
    }

    @Test
    void utcLikeScalesHaveNoFixedCount() {
        assertThatThrownBy(() -> ScaleInstant.ofScaleSeconds(TimeScale.UTC, 0, 0))
            .isInstanceOf(TimeInputException.class);
        assertThatThrownBy(() -> TimeScale.parse("loran")).isInstanceOf(TimeInputException.class)
            .hasMessageContaining("loran").hasMessageContaining("smeared-utc");
        assertThat(TimeScale.parse("Smeared_UTC")).isEqualTo(TimeScale.SMEARED_UTC);
    }
}
