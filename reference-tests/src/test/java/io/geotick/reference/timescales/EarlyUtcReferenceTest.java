package io.geotick.reference.timescales;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import io.geotick.timescales.ScaleInstant;
import io.geotick.timescales.TimeConverter;
import io.geotick.timescales.TimeInputException;
import io.geotick.timescales.TimeScale;
import org.junit.jupiter.api.Test;

/**
 * UTC 1961-1971 against the USNO/BIH table of TAI - UTC = A + (MJD - B) x C. The table's values are
 * from memory of the USNO tai-utc.dat file; the checks below use its internal consistency (the offsets are
 * continuous where only the rate changes) and the well-known 0.107758 s final step.
 */
class EarlyUtcReferenceTest {
    private final TimeConverter tc = TimeConverter.builtIn();

    private String dtai(String iso) {
        return tc.taiMinusUtc(tc.parseIso(iso, TimeScale.UTC).value()).value().toString();
    }

    @Test
    void rowStartsMatchTheTable() {
        // Source: USNO/BIH TAI - UTC table, 1961 JAN 1: 1.4228180 S + (MJD - 37300.) X 0.001296 S (from memory).
        assertThat(dtai("1961-01-01T00:00:00Z")).isEqualTo("1.422818");
        // Source: same table, 1961 AUG 1: 1.3728180 S + (MJD - 37300.) X 0.001296 S (from memory).
        // at MJD 37512: 1.372818 + 212 x 0.001296 = 1.647570 s
        assertThat(dtai("1961-08-01T00:00:00Z")).isEqualTo("1.647570");
        // Source: same table, 1966 JAN 1: 4.3131700 S + (MJD - 39126.) X 0.002592 S (from memory).
        assertThat(dtai("1966-01-01T00:00:00Z")).isEqualTo("4.313170");
        // Source: same table, 1968 FEB 1: 4.2131700 S + (MJD - 39126.) X 0.002592 S (from memory):
        // at MJD 39887 the offset is 4.21317 + 761 x 0.002592 = 6.185682 s.
        assertThat(dtai("1968-02-01T00:00:00Z")).isEqualTo("6.185682");
    }

    @Test
    void offsetsAreContinuousWhereOnlyTheRateChanges() {
        // Source: USNO/BIH table (from memory): at 1962-01-01, 1964-01-01 and 1966-01-01 the formula changes
        // without a step; the old and new rows agree to 0.1 us at the boundary.
        assertThat(dtai("1961-12-31T23:59:59.999999999Z")).startsWith("1.8458");
        assertThat(dtai("1962-01-01T00:00:00Z")).isEqualTo("1.845858");
        assertThat(dtai("1964-01-01T00:00:00Z")).isEqualTo("2.765794");
        assertThat(dtai("1963-12-31T23:59:59.999999999Z")).startsWith("2.7657");
        assertThat(dtai("1965-12-31T23:59:59.999999999Z")).startsWith("4.3131");
    }

    @Test
    void stepsOfTheSixties() {
        // Source: USNO/BIH table (from memory): 1961-08-01 a step of -0.05 s, 1968-02-01 a step of -0.1 s
        // (labels removed), 1963-11-01 a step of +0.1 s (labels 23:59:60.0-23:59:60.1 added).
        assertThatThrownBy(() -> tc.parseIso("1961-07-31T23:59:59.97Z", TimeScale.UTC))
            .isInstanceOf(TimeInputException.class).hasMessageContaining("skipped");
        assertThat(tc.parseIso("1961-07-31T23:59:59.94Z", TimeScale.UTC).value()).isNotNull();
        ScaleInstant in = tc.parseIso("1963-10-31T23:59:60.05Z", TimeScale.UTC).value();
        assertThat(tc.formatIso(in, TimeScale.UTC).value()).isEqualTo("1963-10-31T23:59:60.050Z");
        assertThatThrownBy(() -> tc.parseIso("1963-10-31T23:59:60.1Z", TimeScale.UTC))
            .isInstanceOf(TimeInputException.class);
    }

    @Test
    void theEndOf1971() {
        // Source: USNO/BIH table (from memory): just before 1972-01-01 TAI - UTC = 4.2131700 + 2191 x 0.002592
        // = 9.892242 s; from 1972-01-01 it is exactly 10 s (IERS list, first entry): a step of 0.107758 s.
        assertThat(dtai("1971-12-31T23:59:59.999999999Z")).startsWith("9.89224");
        assertThat(dtai("1972-01-01T00:00:00Z")).isEqualTo("10");
        ScaleInstant a = tc.parseIso("1971-12-31T23:59:60Z", TimeScale.UTC).value();
        ScaleInstant b = tc.parseIso("1972-01-01T00:00:00Z", TimeScale.UTC).value();
        assertThat(a.nanosUntil(b)).isEqualTo(107_758_000L);
    }

    @Test
    void before1961IsNotDefined() {
        // Source: USNO/BIH table: it starts at 1961 JAN 1 (from memory); geotick refuses earlier UTC.
        assertThatThrownBy(() -> tc.parseIso("1960-12-31T23:59:59.999999999Z", TimeScale.UTC))
            .isInstanceOf(TimeInputException.class).hasMessageContaining("1961-01-01");
    }
}
