package io.geotick.timescales;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import io.geotick.timescales.calendar.DateTimeLabel;
import java.time.Duration;
import org.junit.jupiter.api.Test;

class TimeConverterTest {
    private final TimeConverter tc = TimeConverter.builtIn();

    private ScaleInstant utc(String iso) {
        return tc.parseIso(iso, TimeScale.UTC).value();
    }

    private String on(ScaleInstant t, TimeScale s) {
        return tc.formatIso(t, s).value();
    }

    @Test
    void leapSecondLabelMapsToTaiAndBack() {
        ScaleInstant leap = utc("2016-12-31T23:59:60.5Z");
        assertThat(on(leap, TimeScale.TAI)).isEqualTo("2017-01-01T00:00:36.500");
        assertThat(on(leap, TimeScale.UTC)).isEqualTo("2016-12-31T23:59:60.500Z");
        assertThat(on(leap, TimeScale.GPS)).isEqualTo("2017-01-01T00:00:17.500");
        assertThat(on(leap, TimeScale.BDT)).isEqualTo("2017-01-01T00:00:03.500");
        assertThat(on(leap, TimeScale.TT)).isEqualTo("2017-01-01T00:01:08.684");
        assertThat(on(leap, TimeScale.GLONASS)).isEqualTo("2017-01-01T02:59:60.500");
        assertThat(utc("2017-01-01T00:00:00Z").taiSeconds() - utc("2016-12-31T23:59:59Z").taiSeconds()).isEqualTo(2);
    }

    @Test
    void secondSixtyOnlyOnALeapDay() {
        assertThatThrownBy(() -> utc("2017-06-30T23:59:60Z")).isInstanceOf(TimeInputException.class)
            .hasMessageContaining("2017-06-30T23:59:60Z").hasMessageContaining("no leap second");
        assertThatThrownBy(() -> utc("2016-12-31T12:00:60Z")).isInstanceOf(TimeInputException.class)
            .hasMessageContaining("23:59:60");
        assertThatThrownBy(() -> tc.parseIso("2016-12-31T23:59:60", TimeScale.GPS))
            .isInstanceOf(TimeInputException.class).hasMessageContaining("uniform");
    }

    @Test
    void glonassLeapSecondIsAtThreeInTheMorning() {
        ScaleInstant g = tc.parseIso("2017-01-01T02:59:60.25", TimeScale.GLONASS).value();
        assertThat(g.isSameInstant(utc("2016-12-31T23:59:60.25Z"))).isTrue();
        assertThatThrownBy(() -> tc.parseIso("2017-01-01T03:59:60", TimeScale.GLONASS))
            .isInstanceOf(TimeInputException.class).hasMessageContaining("02:59:60");
        assertThatThrownBy(() -> tc.parseIso("2017-07-01T02:59:60", TimeScale.GLONASS))
            .isInstanceOf(TimeInputException.class).hasMessageContaining("2017-07-01T02:59:60");
    }

    @Test
    void zoneDesignatorOnlyForUtcAndOffsetsApplied() {
        assertThatThrownBy(() -> tc.parseIso("2017-01-01T00:00:00Z", TimeScale.GPS))
            .isInstanceOf(TimeInputException.class).hasMessageContaining("gps");
        assertThat(tc.parseIso("2017-01-01T02:59:60+03:00", TimeScale.UTC).value()
            .isSameInstant(utc("2016-12-31T23:59:60Z"))).isTrue();
        assertThat(tc.parseIso("2016-12-31T19:00:00-05:00", TimeScale.UTC).value()
            .isSameInstant(utc("2017-01-01T00:00:00Z"))).isTrue();
    }

    @Test
    void before1961IsAnError() {
        assertThatThrownBy(() -> utc("1960-12-31T23:59:59Z")).isInstanceOf(TimeInputException.class)
            .hasMessageContaining("1961-01-01");
        ScaleInstant tai = tc.parseIso("1960-06-01T00:00:00", TimeScale.TAI).value();
        assertThatThrownBy(() -> tc.toLabel(tai, TimeScale.UTC)).isInstanceOf(TimeInputException.class)
            .hasMessageContaining("1961");
    }

    @Test
    void roundingIsHalfEvenAndReported() {
        Conversion<ScaleInstant> a = tc.parseIso("2017-01-01T00:00:00.0000000005Z", TimeScale.UTC);
        assertThat(a.value().nano()).isZero();
        assertThat(a.warnings()).extracting(TimeWarning::kind).containsExactly(TimeWarning.Kind.ROUNDED);
        assertThat(tc.parseIso("2017-01-01T00:00:00.0000000015Z", TimeScale.UTC).value().nano()).isEqualTo(2);
        assertThat(tc.parseIso("2017-01-01T00:00:00.123456789000Z", TimeScale.UTC).isClean()).isTrue();
    }

    @Test
    void roundingCarryLandsOnTheLeapSecondOnlyOnALeapDay() {
        assertThat(utc("2016-12-31T23:59:59.9999999999Z").isSameInstant(utc("2016-12-31T23:59:60Z"))).isTrue();
        assertThat(utc("2017-06-30T23:59:59.9999999999Z").isSameInstant(utc("2017-07-01T00:00:00Z"))).isTrue();
    }

    @Test
    void pastExpiryCarriesAWarningNamingTheDate() {
        Conversion<ScaleInstant> c = tc.parseIso("2030-01-01T00:00:00Z", TimeScale.UTC);
        assertThat(c.warnings()).extracting(TimeWarning::kind).containsExactly(TimeWarning.Kind.TABLE_EXPIRED);
        assertThat(c.warnings().get(0).message()).contains("expired on 2026-06-28")
            .contains("assuming no further leap seconds");
        assertThat(tc.toLabel(c.value()).warnings()).hasSize(1);
        assertThat(tc.parseIso("2026-06-27T23:59:59Z", TimeScale.UTC).isClean()).isTrue();
        // a GPS-to-TAI label conversion needs no table: no warning
        assertThat(tc.toLabel(c.value(), TimeScale.GPS).isClean()).isTrue();
    }

    @Test
    void early1960sOffsetsFollowTheFormula() {
        // 1965-01-01T00:00:00 UTC: TAI - UTC = 3.5401300 s exactly
        ScaleInstant t = utc("1965-01-01T00:00:00Z");
        assertThat(tc.taiMinusUtc(t).value().toString()).isEqualTo("3.540130");
        // half a day later the rate adds 0.5 x 0.001296 s
        assertThat(tc.taiMinusUtc(utc("1965-01-01T12:00:00Z")).value().toString()).isEqualTo("3.540778");
        // end of 1971: a positive step of 0.107758 s, labelled 23:59:60.000.. to 23:59:60.107757999
        assertThat(utc("1971-12-31T23:59:60.107757999Z").plusNanos(1)
            .isSameInstant(utc("1972-01-01T00:00:00Z"))).isTrue();
        assertThatThrownBy(() -> utc("1971-12-31T23:59:60.2Z")).isInstanceOf(TimeInputException.class)
            .hasMessageContaining("0.107758");
        // 1968-02-01: a negative step of 0.1 s removes the last 0.1 s of 1968-01-31
        assertThatThrownBy(() -> utc("1968-01-31T23:59:59.95Z")).isInstanceOf(TimeInputException.class)
            .hasMessageContaining("skipped");
        assertThat(tc.formatIso(utc("1968-01-31T23:59:59.85Z"), TimeScale.UTC).value())
            .isEqualTo("1968-01-31T23:59:59.850Z");
    }

    @Test
    void early1960sLabelsRoundTripWithinHalfANanosecond() {
        for (String s : new String[] {"1961-01-01T00:00:00.000000001Z", "1963-05-17T13:14:15.123456789Z",
            "1969-07-20T20:17:40Z", "1971-12-31T23:59:59.999999999Z"}) {
            ScaleInstant t = utc(s);
            assertThat(tc.formatIso(t, TimeScale.UTC).value()).isEqualTo(
                DateTimeLabel.parse(s.substring(0, s.length() - 1)) + "Z");
        }
    }

    @Test
    void smearedUtcSpreadsTheLeapOverTwentyFourHours() {
        ScaleInstant start = utc("2016-12-31T12:00:00Z");
        ScaleInstant end = utc("2017-01-01T12:00:00Z");
        assertThat(start.until(end)).isEqualTo(Duration.ofSeconds(86_401));
        assertThat(on(start, TimeScale.SMEARED_UTC)).isEqualTo("2016-12-31T12:00:00");
        assertThat(on(end, TimeScale.SMEARED_UTC)).isEqualTo("2017-01-01T12:00:00");
        // at the leap second the smeared clock is half a second behind UTC (before) / ahead of the TAI count
        Conversion<String> mid = tc.formatIso(utc("2016-12-31T23:59:60.5Z"), TimeScale.SMEARED_UTC);
        // the middle of the leap second is the middle of the window: 43200.5 x 86400 / 86401 = 43200 exactly
        assertThat(mid.value()).isEqualTo("2017-01-01T00:00:00");
        assertThat(mid.isClean()).isTrue();
        // one SI hour in: 3600 x 86400 / 86401 s = 3599.958333815580... s, rounded half-even and reported
        Conversion<String> hour = tc.formatIso(start.plusSeconds(3600), TimeScale.SMEARED_UTC);
        assertThat(hour.value()).isEqualTo("2016-12-31T12:59:59.958333816");
        assertThat(hour.warnings()).extracting(TimeWarning::kind).containsExactly(TimeWarning.Kind.ROUNDED);
    }

    @Test
    void smearedLabelsRoundTrip() {
        for (String s : new String[] {"2016-12-31T12:00:00.000000001", "2016-12-31T18:00:00",
            "2016-12-31T23:59:59.999999999", "2017-01-01T00:00:00", "2017-01-01T11:59:59.999999999"}) {
            ScaleInstant t = tc.parseIso(s, TimeScale.SMEARED_UTC).value();
            assertThat(tc.toLabel(t, TimeScale.SMEARED_UTC).value().toString())
                .isEqualTo(DateTimeLabel.parse(s).toString());
        }
        assertThatThrownBy(() -> tc.parseIso("2016-12-31T23:59:60", TimeScale.SMEARED_UTC))
            .isInstanceOf(TimeInputException.class).hasMessageContaining("second 60");
    }
}
