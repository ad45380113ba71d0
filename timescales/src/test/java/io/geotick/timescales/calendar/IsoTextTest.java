package io.geotick.timescales.calendar;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import io.geotick.timescales.TimeInputException;
import org.junit.jupiter.api.Test;

class IsoTextTest {
    @Test
    void readsCalendarOrdinalAndDateOnlyForms() {
        assertThat(DateTimeLabel.parse("2016-366T23:59:60.5").toString()).isEqualTo("2016-12-31T23:59:60.500");
        assertThat(DateTimeLabel.parse("2017-01-01").toString()).isEqualTo("2017-01-01T00:00:00");
        assertThat(DateTimeLabel.parse("2017-01-01 12:30").toString()).isEqualTo("2017-01-01T12:30:00");
        assertThat(DateTimeLabel.parse("2017-01-01T12:30:00,25").nano()).isEqualTo(250_000_000);
        assertThat(DateTimeLabel.parse("2016-12-31T23:59:60").toOrdinalDate()).isEqualTo("2016-366");
        assertThat(IsoText.parse("2017-01-01T03:00:00+0300").value().offsetSeconds()).isEqualTo(10_800);
    }

    @Test
    void badFieldsAreNamed() {
        assertThatThrownBy(() -> DateTimeLabel.parse("2017-13-01T00:00:00"))
            .isInstanceOf(TimeInputException.class).hasMessageContaining("month 13");
        assertThatThrownBy(() -> DateTimeLabel.parse("2017-02-29T00:00:00"))
            .isInstanceOf(TimeInputException.class).hasMessageContaining("day 29").hasMessageContaining("February");
        assertThatThrownBy(() -> DateTimeLabel.parse("2017-01-01T24:00:00"))
            .isInstanceOf(TimeInputException.class).hasMessageContaining("hour 24");
        assertThatThrownBy(() -> DateTimeLabel.parse("2017-367")).isInstanceOf(TimeInputException.class)
            .hasMessageContaining("day of year 367");
        assertThatThrownBy(() -> DateTimeLabel.parse("yesterday")).isInstanceOf(TimeInputException.class)
            .hasMessageContaining("'yesterday'");
        assertThatThrownBy(() -> DateTimeLabel.parse("2017-01-01T00:00:00Z"))
            .isInstanceOf(TimeInputException.class).hasMessageContaining("zone");
    }

    @Test
    void shiftKeepsTheLeapSecond() {
        DateTimeLabel l = DateTimeLabel.parse("2016-12-31T23:59:60.5");
        assertThat(l.shiftedKeepingLeapSecond(3 * 3600).toString()).isEqualTo("2017-01-01T02:59:60.500");
        assertThat(l.shiftedKeepingLeapSecond(3 * 3600).shiftedKeepingLeapSecond(-3 * 3600)).isEqualTo(l);
        assertThat(DateTimeLabel.ofEpochDay(17166, DateTimeLabel.NANOS_PER_DAY + 5)).isEqualTo(
            DateTimeLabel.parse("2016-12-31T23:59:60.000000005"));
    }
}
