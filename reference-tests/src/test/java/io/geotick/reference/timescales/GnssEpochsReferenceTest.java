package io.geotick.reference.timescales;

import static org.assertj.core.api.Assertions.assertThat;

import io.geotick.timescales.ScaleInstant;
import io.geotick.timescales.TimeConverter;
import io.geotick.timescales.TimeScale;
import io.geotick.timescales.encoding.DecimalSeconds;
import io.geotick.timescales.encoding.WeekSystem;
import io.geotick.timescales.encoding.WeekTime;
import java.time.DayOfWeek;
import org.junit.jupiter.api.Test;

/** GNSS time scales, epochs and week numbering against their interface control documents. */
class GnssEpochsReferenceTest {
    private final TimeConverter tc = TimeConverter.builtIn();

    private ScaleInstant utc(String iso) {
        return tc.parseIso(iso, TimeScale.UTC).value();
    }

    @Test
    void gpsEpochAndRollovers() {
        // Source: IS-GPS-200, 3.3.4 and 20.3.3.3.1.1: GPS time starts at 1980-01-06T00:00:00 UTC (week 0).
        // (from memory)
        WeekTime epoch = WeekSystem.GPS.weekTime(utc("1980-01-06T00:00:00Z"));
        assertThat(epoch.week()).isZero();
        assertThat(epoch.timeOfWeek()).isEqualTo(DecimalSeconds.ZERO);
        assertThat(WeekSystem.GPS.epoch().getDayOfWeek()).isEqualTo(DayOfWeek.SUNDAY);
        // Source: IS-GPS-200, 20.3.3.3.1.1: the 10-bit week number rolls over every 1024 weeks;
        // the first rollover was at 1999-08-22 (GPS week 1024), the second at 2019-04-07 (week 2048) (from memory).
        ScaleInstant r1 = new WeekTime(WeekSystem.GPS, 1024, DecimalSeconds.ZERO).toInstant();
        ScaleInstant r2 = new WeekTime(WeekSystem.GPS, 2048, DecimalSeconds.ZERO).toInstant();
        assertThat(tc.formatIso(r1, TimeScale.GPS).value()).isEqualTo("1999-08-22T00:00:00");
        assertThat(tc.formatIso(r2, TimeScale.GPS).value()).isEqualTo("2019-04-07T00:00:00");
        assertThat(new WeekTime(WeekSystem.GPS, 2048, DecimalSeconds.ZERO).truncatedWeek(10)).isZero();
        // Source: IS-GPS-200 (GPS - UTC = leap seconds since 1980) with IERS Bulletin C: 13 s in 1999, 18 s in 2019.
        // (from memory)
        assertThat(tc.formatIso(r1, TimeScale.UTC).value()).isEqualTo("1999-08-21T23:59:47Z");
        assertThat(tc.formatIso(r2, TimeScale.UTC).value()).isEqualTo("2019-04-06T23:59:42Z");
        // Source: IS-GPS-200: GPS time is TAI - 19 s, a constant offset (from memory).
        assertThat(tc.formatIso(utc("2020-01-01T00:00:00Z"), TimeScale.GPS).value()).isEqualTo("2020-01-01T00:00:18");
    }

    @Test
    void galileoSystemTimeEpoch() {
        // Source: Galileo OS SIS ICD, 5.1.2: GST starts at 00:00 UT on Sunday 22 August 1999 (midnight between
        // 21 and 22 August), when GST was ahead of UTC by 13 s; GST weeks count from that epoch (from memory).
        ScaleInstant start = tc.parseIso("1999-08-22T00:00:00", TimeScale.GST).value();
        assertThat(WeekSystem.GALILEO.weekTime(start).week()).isZero();
        assertThat(tc.formatIso(start, TimeScale.UTC).value()).isEqualTo("1999-08-21T23:59:47Z");
        // Source: Galileo OS SIS ICD, 5.1.2 (GST aligned with GPS time; GGTO broadcast, out of scope here).
        // (from memory)
        assertThat(WeekSystem.GALILEO.weekTime(start).timeOfWeek())
            .isEqualTo(WeekSystem.GPS.weekTime(start).timeOfWeek());
        assertThat(WeekSystem.GPS.weekTime(start).week()).isEqualTo(1024);
        // Source: Galileo OS SIS ICD, 5.1.2: the week number is broadcast in 12 bits (4096 weeks) (from memory).
        assertThat(WeekTime.resolve(WeekSystem.GALILEO, 906, 12, DecimalSeconds.ZERO, utc("2017-01-02T00:00:00Z"))
            .week()).isEqualTo(906);
    }

    @Test
    void beidouTimeEpochAndOffset() {
        // Source: BeiDou ICD (BDS-SIS-ICD-B1I), 4.2: BDT starts at 2006-01-01T00:00:00 UTC, week 0 (from memory).
        ScaleInstant start = utc("2006-01-01T00:00:00Z");
        WeekTime w = WeekSystem.BEIDOU.weekTime(start);
        assertThat(w.week()).isZero();
        assertThat(w.timeOfWeek()).isEqualTo(DecimalSeconds.ZERO);
        // Source: BeiDou ICD, 4.2: BDT = GPST - 14 s (at the BDT epoch GPS - UTC was 14 s) (from memory).
        assertThat(start.to(TimeScale.BDT).until(start.to(TimeScale.GPS)).getSeconds()).isZero();
        assertThat(tc.formatIso(start, TimeScale.GPS).value()).isEqualTo("2006-01-01T00:00:14");
        assertThat(tc.formatIso(start, TimeScale.BDT).value()).isEqualTo("2006-01-01T00:00:00");
        // Source: BeiDou ICD, 5.2.4.3: WN is 13 bits (from memory).
        assertThat(WeekTime.resolve(WeekSystem.BEIDOU, 574, 13, DecimalSeconds.ZERO, utc("2017-01-01T00:00:00Z"))
            .week()).isEqualTo(574);
    }

    @Test
    void glonassIsUtcPlusThreeHours() {
        // Source: GLONASS ICD (edition 5.1, 3.3.3): GLONASS time = UTC(SU) + 03 h 00 min, with UTC leap seconds.
        // (from memory)
        ScaleInstant t = utc("2015-06-30T23:59:60.25Z");
        assertThat(tc.formatIso(t, TimeScale.GLONASS).value()).isEqualTo("2015-07-01T02:59:60.250");
        assertThat(tc.formatIso(utc("2020-01-01T21:00:00Z"), TimeScale.GLONASS).value())
            .isEqualTo("2020-01-02T00:00:00");
    }
}
