package io.geotick.timescales.bulk;

import static org.assertj.core.api.Assertions.assertThat;

import io.geotick.timescales.ScaleInstant;
import io.geotick.timescales.TimeConverter;
import io.geotick.timescales.TimeScale;
import io.geotick.timescales.encoding.WeekSystem;
import io.geotick.timescales.encoding.WeekTime;
import org.junit.jupiter.api.Test;

class BulkConverterTest {
    private final TimeConverter tc = TimeConverter.builtIn();
    private final BulkConverter bulk = BulkConverter.of(tc.utcModel());

    @Test
    void agreesWithTheObjectApiAroundALeapSecond() {
        long[] unix = {1483228799L, 1483228800L, 1483228801L, 1435708799L, 1435708800L, 362793600L};
        int[] nanos = {999_999_999, 0, 5, 1, 2, 3};
        int[] week = new int[unix.length];
        long[] tow = new long[unix.length];
        assertThat(bulk.unixToGpsWeek(unix, nanos, 0, unix.length, week, tow)).isZero();
        for (int i = 0; i < unix.length; i++) {
            ScaleInstant t = tc.fromUnix(io.geotick.timescales.encoding.UnixTime.of(unix[i], nanos[i])).value();
            WeekTime w = WeekSystem.GPS.weekTime(t);
            assertThat(week[i]).isEqualTo(w.week());
            assertThat(tow[i]).isEqualTo(w.timeOfWeek().toNanos());
        }
        long[] unixBack = new long[unix.length];
        int[] nanosBack = new int[unix.length];
        assertThat(bulk.gpsWeekToUnix(week, tow, 0, unix.length, unixBack, nanosBack)).isZero();
        assertThat(unixBack).containsExactly(unix);
        assertThat(nanosBack).containsExactly(nanos);
    }

    @Test
    void flagsTheLeapSecondAndTheExpiry() {
        ScaleInstant leap = tc.parseIso("2016-12-31T23:59:60.25Z", TimeScale.UTC).value();
        WeekTime w = WeekSystem.GPS.weekTime(leap);
        long[] u = new long[1];
        int[] n = new int[1];
        int flags = bulk.gpsWeekToUnix(new int[] {(int) w.week()}, new long[] {w.timeOfWeek().toNanos()}, 0, 1, u, n);
        assertThat(flags & BulkConverter.LEAP_SECOND_REPEAT).isNotZero();
        assertThat(u[0]).isEqualTo(1483228800L);
        assertThat(n[0]).isEqualTo(250_000_000);
        int f2 = bulk.unixToGpsWeek(new long[] {1_900_000_000L}, new int[1], 0, 1, new int[1], new long[1]);
        assertThat(f2).isEqualTo(BulkConverter.PAST_EXPIRY);
        assertThat(bulk.unixToGpsSecondsSinceEpoch(315964800L)).isZero();
    }
}
