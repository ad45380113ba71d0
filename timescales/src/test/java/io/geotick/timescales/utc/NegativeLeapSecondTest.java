package io.geotick.timescales.utc;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import io.geotick.timescales.ScaleInstant;
import io.geotick.timescales.TimeConverter;
import io.geotick.timescales.TimeInputException;
import io.geotick.timescales.TimeScale;
import io.geotick.timescales.leap.LeapEntry;
import io.geotick.timescales.leap.LeapListParser;
import io.geotick.timescales.leap.LeapTable;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** A hypothetical negative leap second at the end of 2029 (never happened; the model must still hold). */
class NegativeLeapSecondTest {
    private static TimeConverter withNegativeStep() {
        List<LeapEntry> e = new ArrayList<>(LeapTable.builtIn().entries());
        e.add(new LeapEntry(LocalDate.of(2030, 1, 1), 36));
        long upd = 3_960_835_200L;
        long exp = 4_100_000_000L;
        StringBuilder sb = new StringBuilder("#$ " + upd + "\n#@ " + exp + "\n");
        e.forEach(x -> sb.append(x.ntpSeconds()).append(' ').append(x.taiMinusUtc()).append('\n'));
        sb.append(LeapListParser.hashLine(upd, exp, e)).append('\n');
        return TimeConverter.of(LeapTable.parse(sb.toString(), "negative.list"));
    }

    @Test
    void theLastSecondOfTheDayIsSkipped() {
        TimeConverter tc = withNegativeStep();
        assertThatThrownBy(() -> tc.parseIso("2029-12-31T23:59:59.5Z", TimeScale.UTC))
            .isInstanceOf(TimeInputException.class).hasMessageContaining("skipped");
        ScaleInstant before = tc.parseIso("2029-12-31T23:59:58.999999999Z", TimeScale.UTC).value();
        ScaleInstant after = tc.parseIso("2030-01-01T00:00:00Z", TimeScale.UTC).value();
        assertThat(before.plusNanos(1).isSameInstant(after)).isTrue();
        assertThat(tc.formatIso(before.plusNanos(1), TimeScale.UTC).value()).isEqualTo("2030-01-01T00:00:00Z");
        assertThat(tc.formatIso(before, TimeScale.UTC).value()).isEqualTo("2029-12-31T23:59:58.999999999Z");
        assertThatThrownBy(() -> tc.parseIso("2029-12-31T23:59:60Z", TimeScale.UTC))
            .isInstanceOf(TimeInputException.class);
        // the smeared clock spreads the removal too and stays continuous
        ScaleInstant mid = tc.parseIso("2029-12-31T23:59:59.5", TimeScale.SMEARED_UTC).value();
        assertThat(tc.toLabel(mid, TimeScale.SMEARED_UTC).value().toString()).isEqualTo("2029-12-31T23:59:59.500");
    }
}
