package io.geotick.timescales.encoding;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import io.geotick.timescales.Conversion;
import io.geotick.timescales.ScaleInstant;
import io.geotick.timescales.TimeConverter;
import io.geotick.timescales.TimeInputException;
import io.geotick.timescales.TimeScale;
import io.geotick.timescales.TimeWarning;
import org.junit.jupiter.api.Test;

class EncodingsTest {
    private final TimeConverter tc = TimeConverter.builtIn();

    private ScaleInstant utc(String iso) {
        return tc.parseIso(iso, TimeScale.UTC).value();
    }

    @Test
    void decimalSecondsParseAndPrintExactly() {
        assertThat(DecimalSeconds.parse("-0.5", "x").value().toString()).isEqualTo("-0.500");
        assertThat(DecimalSeconds.parse("-0.5", "x").value().seconds()).isEqualTo(-1);
        assertThat(DecimalSeconds.parse("12.000000001", "x").value().toString()).isEqualTo("12.000000001");
        assertThat(DecimalSeconds.parse(".25", "x").value().toString()).isEqualTo("0.250");
        assertThat(DecimalSeconds.parse("1.0000000025", "x").value().nano()).isEqualTo(2);
        assertThat(DecimalSeconds.parse("1.0000000035", "x").value().nano()).isEqualTo(4);
        assertThat(DecimalSeconds.parse("-1.0000000025", "x").value().toString()).isEqualTo("-1.000000002");
        assertThat(DecimalSeconds.parse("1.0000000025", "x").warnings()).hasSize(1);
        assertThatThrownBy(() -> DecimalSeconds.parse("1e9", "Unix seconds"))
            .isInstanceOf(TimeInputException.class).hasMessageContaining("Unix seconds '1e9'");
        assertThatThrownBy(() -> DecimalSeconds.parse("99999999999999999999", "x"))
            .isInstanceOf(TimeInputException.class).hasMessageContaining("out of range");
    }

    @Test
    void unixTimeRepeatsInsideALeapSecondAndSaysSo() {
        Conversion<UnixTime> u = tc.toUnix(utc("2016-12-31T23:59:60.5Z"));
        assertThat(u.value().toString()).isEqualTo("1483228800.500");
        assertThat(u.warnings()).extracting(TimeWarning::kind).containsExactly(TimeWarning.Kind.LEAP_SECOND_REPEAT);
        Conversion<ScaleInstant> back = tc.fromUnix(u.value());
        assertThat(tc.formatIso(back.value(), TimeScale.UTC).value()).isEqualTo("2017-01-01T00:00:00.500Z");
        assertThat(back.warnings()).extracting(TimeWarning::kind).containsExactly(TimeWarning.Kind.LEAP_SECOND_REPEAT);
        assertThat(tc.fromUnix(UnixTime.of(1483228801, 0)).isClean()).isTrue();
        assertThat(tc.toUnix(utc("2017-01-01T00:00:00Z")).value()).isEqualTo(UnixTime.of(1483228800, 0));
    }

    @Test
    void ntpEpochErasAndFractions() {
        ScaleInstant t = utc("2017-01-01T00:00:00.5Z");
        NtpTimestamp n = tc.toNtp(t).value();
        assertThat(n.era()).isZero();
        assertThat(n.seconds()).isEqualTo(3_692_217_600L);
        assertThat(n.fraction()).isEqualTo(0x8000_0000L);
        assertThat(n.toHex()).isEqualTo("DC12C500.80000000");
        ScaleInstant era1 = utc("2036-02-07T06:28:16Z");
        NtpTimestamp e1 = tc.toNtp(era1).value();
        assertThat(e1.era()).isEqualTo(1);
        assertThat(e1.seconds()).isZero();
        assertThat(NtpTimestamp.parseHex("00000000.00000000", e1.primeEpochSeconds()).era()).isEqualTo(1);
        assertThat(NtpTimestamp.parseHex("0xFFFFFFFF00000000", e1.primeEpochSeconds()).era()).isZero();
        // one fraction unit is 0.23 ns: rounded to 0 ns, reported
        Conversion<UnixTime> fine = new NtpTimestamp(0, 3_692_217_600L, 1).toUnix();
        assertThat(fine.value().nano()).isZero();
        assertThat(fine.warnings()).hasSize(1);
        assertThat(tc.fromNtp(n).value().isSameInstant(t)).isTrue();
    }

    @Test
    void ptpIsTaiSinceNineteenSeventyTai() {
        PtpTimestamp p = PtpTimestamp.from(utc("2017-01-01T00:00:00Z"));
        assertThat(p.seconds()).isEqualTo(1_483_228_837L);
        assertThat(PtpTimestamp.parse("0").value().toInstant()).isEqualTo(ScaleInstant.ofTai(0, 0));
        assertThatThrownBy(() -> PtpTimestamp.parse("-1").value()).isInstanceOf(TimeInputException.class)
            .hasMessageContaining("-1");
    }

    @Test
    void gnssWeeksAndTruncatedWeeks() {
        ScaleInstant t = utc("2017-01-01T00:00:00Z");
        WeekTime g = WeekSystem.GPS.weekTime(t);
        assertThat(g.toString()).isEqualTo("1930:18");
        assertThat(WeekSystem.GALILEO.weekTime(t).week()).isEqualTo(906);
        assertThat(WeekSystem.BEIDOU.weekTime(t).toString()).isEqualTo("574:4");
        assertThat(g.toInstant().isSameInstant(t)).isTrue();
        assertThat(WeekTime.parse(WeekSystem.GPS, "1930:18").value()).isEqualTo(g);
        ScaleInstant near2017 = utc("2017-06-01T00:00:00Z");
        ScaleInstant near1999 = utc("1999-01-01T00:00:00Z");
        assertThat(WeekTime.resolve(WeekSystem.GPS, 906, 10, g.timeOfWeek(), near2017).week()).isEqualTo(1930);
        assertThat(WeekTime.resolve(WeekSystem.GPS, 906, 10, g.timeOfWeek(), near1999).week()).isEqualTo(906);
        assertThat(WeekTime.resolve(WeekSystem.GPS, 1930, 13, g.timeOfWeek(), near1999).week()).isEqualTo(1930);
        assertThat(g.truncatedWeek(10)).isEqualTo(906);
        assertThatThrownBy(() -> WeekTime.parse(WeekSystem.GPS, "-1:0")).isInstanceOf(TimeInputException.class)
            .hasMessageContaining("week -1");
        assertThatThrownBy(() -> WeekTime.parse(WeekSystem.GPS, "1930:604800"))
            .isInstanceOf(TimeInputException.class).hasMessageContaining("604800");
        assertThatThrownBy(() -> WeekTime.resolve(WeekSystem.GPS, 1024, 10, g.timeOfWeek(), near2017))
            .isInstanceOf(TimeInputException.class).hasMessageContaining("1024");
        assertThatThrownBy(() -> WeekSystem.GPS.weekTime(utc("1979-01-01T00:00:00Z")))
            .isInstanceOf(TimeInputException.class).hasMessageContaining("before the GPS epoch");
    }

    @Test
    void julianDatesOnANamedScale() {
        ScaleInstant tt = tc.parseIso("2017-01-01T00:00:00", TimeScale.TT).value();
        JulianDate jd = tc.toJulianDate(tt, TimeScale.TT).value();
        assertThat(jd.mjdDecimal().toPlainString()).isEqualTo("57754.0");
        assertThat(jd.jdDecimal().toPlainString()).isEqualTo("2457754.5");
        ScaleInstant odd = tc.parseIso("2017-01-01T01:02:03.123456789", TimeScale.TT).value();
        JulianDate j2 = tc.toJulianDate(odd, TimeScale.TT).value();
        Conversion<JulianDate> back = JulianDate.parseMjd(TimeScale.TT, j2.mjdDecimal().toPlainString());
        assertThat(back.value()).isEqualTo(j2);
        assertThat(JulianDate.parseJd(TimeScale.TT, j2.jdDecimal().toPlainString()).value()).isEqualTo(j2);
        assertThatThrownBy(() -> JulianDate.parseMjd(TimeScale.UTC, "x57754"))
            .isInstanceOf(TimeInputException.class).hasMessageContaining("x57754");
    }
}
