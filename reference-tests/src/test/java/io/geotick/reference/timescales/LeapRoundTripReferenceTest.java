package io.geotick.reference.timescales;

import static org.assertj.core.api.Assertions.assertThat;

import io.geotick.timescales.Conversion;
import io.geotick.timescales.ScaleInstant;
import io.geotick.timescales.TimeConverter;
import io.geotick.timescales.TimeScale;
import io.geotick.timescales.TimeWarning;
import io.geotick.timescales.calendar.DateTimeLabel;
import io.geotick.timescales.encoding.DecimalSeconds;
import io.geotick.timescales.encoding.JulianDate;
import io.geotick.timescales.encoding.NtpTimestamp;
import io.geotick.timescales.encoding.PtpTimestamp;
import io.geotick.timescales.encoding.UnixTime;
import io.geotick.timescales.encoding.WeekSystem;
import io.geotick.timescales.encoding.WeekTime;
import io.geotick.timescales.leap.LeapEntry;
import io.geotick.timescales.leap.LeapTable;
import io.geotick.timescales.leap.LeapTables;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Round trips across every leap second since 1972, for every scale and every encoding, at the last nanosecond
 * before the step, inside it (start, middle, last nanosecond) and at the first nanosecond after.
 *
 * <p>Source of the steps: the IERS/IETF leap-second list (the tzdata copy when present and verified, else the
 * built-in table, which the other reference test compares with it entry by entry); the 1972-01-01 step of
 * 0.107758 s is included (USNO/BIH 1961-1971 table, from memory).
 */
class LeapRoundTripReferenceTest {
    private static final TimeConverter TC = TimeConverter.of(LeapTables.standard().table());
    private static final long NPD = DateTimeLabel.NANOS_PER_DAY;

    static Stream<Arguments> steps() {
        LeapTable t = TC.leapTable();
        List<Arguments> out = new ArrayList<>();
        for (LeapEntry e : t.entries()) {
            long stepNanos = e.effective().getYear() == 1972 && e.effective().getMonthValue() == 1 ? 107_758_000L
                : 1_000_000_000L;
            out.add(Arguments.of(e.effective().toString(), e.effective().toEpochDay(), stepNanos));
        }
        return out.stream();
    }

    @ParameterizedTest(name = "leap step at {0}")
    @MethodSource("steps")
    void everyScaleAndEncodingRoundTrips(String date, long day, long stepNanos) {
        // the five UTC labels around the step
        DateTimeLabel[] labels = {
            DateTimeLabel.ofEpochDay(day - 1, NPD - 1),                 // 23:59:59.999999999
            DateTimeLabel.ofEpochDay(day - 1, NPD),                     // 23:59:60.000000000
            DateTimeLabel.ofEpochDay(day - 1, NPD + stepNanos / 2),     // inside
            DateTimeLabel.ofEpochDay(day - 1, NPD + stepNanos - 1),     // last nanosecond of the step
            DateTimeLabel.ofEpochDay(day, 0),                           // 00:00:00.000000000
            DateTimeLabel.ofEpochDay(day, 1),                           // 00:00:00.000000001
        };
        ScaleInstant prev = null;
        for (DateTimeLabel l : labels) {
            ScaleInstant t = TC.fromLabel(TimeScale.UTC, l).value();
            if (prev != null) {
                assertThat(prev.isBefore(t)).as("labels in time order at %s", l).isTrue();
            }
            prev = t;
            boolean inside = l.isLeapSecondLabel();
            checkScales(t, l);
            checkUnixNtp(t, l, inside);
            checkPtpAndWeeks(t);
            checkJulianDates(t, inside);
        }
        // the step's length in SI seconds
        ScaleInstant before = TC.fromLabel(TimeScale.UTC, labels[0]).value();
        ScaleInstant after = TC.fromLabel(TimeScale.UTC, labels[4]).value();
        assertThat(before.nanosUntil(after)).isEqualTo(stepNanos + 1);
    }

    private static void checkScales(ScaleInstant t, DateTimeLabel utcLabel) {
        for (TimeScale s : TimeScale.values()) {
            Conversion<DateTimeLabel> label = TC.toLabel(t, s);
            ScaleInstant back = TC.fromLabel(s, label.value()).value();
            String iso = TC.formatIso(t, s).value();
            ScaleInstant backIso = TC.parseIso(iso, s).value();
            ScaleInstant backOrdinal = TC.parseIso(label.value().toOrdinalString()
                + (s == TimeScale.UTC ? "Z" : ""), s).value();
            if (s == TimeScale.SMEARED_UTC) {
                // smeared labels are rounded to the nanosecond (<= 0.5 ns each way): within 1 ns
                assertThat(Math.abs(t.nanosUntil(back))).as("%s %s", s, iso).isLessThanOrEqualTo(1);
                assertThat(Math.abs(t.nanosUntil(backIso))).isLessThanOrEqualTo(1);
                assertThat(TC.toLabel(back, s).value()).isEqualTo(label.value());
                assertThat(label.value().isLeapSecondLabel()).isFalse();
            } else {
                assertThat(back.isSameInstant(t)).as("%s label %s", s, label.value()).isTrue();
                assertThat(backIso.isSameInstant(t)).as("%s ISO %s", s, iso).isTrue();
                assertThat(backOrdinal.isSameInstant(t)).as("%s ordinal", s).isTrue();
            }
            if (s == TimeScale.UTC) {
                assertThat(label.value()).isEqualTo(utcLabel);
            }
        }
    }

    private static void checkUnixNtp(ScaleInstant t, DateTimeLabel l, boolean inside) {
        Conversion<UnixTime> u = TC.toUnix(t);
        Conversion<ScaleInstant> back = TC.fromUnix(UnixTime.parse(u.value().toString()).value());
        if (inside) {
            // POSIX time has no value for 23:59:60.x: it repeats the next second's value, and says so both ways
            assertThat(u.warnings()).extracting(TimeWarning::kind).contains(TimeWarning.Kind.LEAP_SECOND_REPEAT);
            assertThat(TC.toLabel(back.value(), TimeScale.UTC).value())
                .isEqualTo(DateTimeLabel.ofEpochDay(l.epochDay() + 1, l.nanoOfDay() - NPD));
            assertThat(back.warnings()).extracting(TimeWarning::kind).contains(TimeWarning.Kind.LEAP_SECOND_REPEAT);
        } else {
            assertThat(back.value().isSameInstant(t)).as("unix %s", u.value()).isTrue();
            NtpTimestamp n = TC.toNtp(t).value();
            ScaleInstant fromDecimal = TC.fromUnix(NtpTimestamp.parseToUnix(
                u.value().toDecimalSeconds().plus(DecimalSeconds.of(NtpTimestamp.UNIX_OFFSET, 0)).toString())
                .value()).value();
            assertThat(fromDecimal.isSameInstant(t)).as("ntp decimal").isTrue();
            // the 64-bit form has 2^-32 s resolution: within 1 ns after the round trip
            ScaleInstant fromWire = TC.fromNtp(NtpTimestamp.parseHex(n.toHex(), n.primeEpochSeconds())).value();
            assertThat(Math.abs(t.nanosUntil(fromWire))).as("ntp 64-bit %s", n.toHex()).isLessThanOrEqualTo(1);
        }
    }

    private static void checkPtpAndWeeks(ScaleInstant t) {
        PtpTimestamp p = PtpTimestamp.from(t);
        assertThat(PtpTimestamp.parse(p.toString()).value().toInstant().isSameInstant(t)).isTrue();
        for (WeekSystem ws : WeekSystem.values()) {
            DecimalSeconds since = ws.secondsSinceEpoch(t);
            assertThat(ws.parseSecondsSinceEpoch(since.toString()).value().isSameInstant(t)).isTrue();
            if (since.isNegative()) {
                continue; // no week numbers before the system's epoch
            }
            WeekTime w = ws.weekTime(t);
            assertThat(WeekTime.parse(ws, w.toString()).value().toInstant().isSameInstant(t)).as("%s %s", ws, w)
                .isTrue();
            for (int bits : new int[] {10, 12, 13}) {
                WeekTime r = WeekTime.resolve(ws, w.truncatedWeek(bits), bits, w.timeOfWeek(), t);
                assertThat(r).as("%s %d-bit", ws, bits).isEqualTo(w);
            }
        }
    }

    private static void checkJulianDates(ScaleInstant t, boolean inside) {
        for (TimeScale s : TimeScale.values()) {
            if (s == TimeScale.SMEARED_UTC) {
                continue;
            }
            Conversion<JulianDate> jd = TC.toJulianDate(t, s);
            JulianDate mjd = JulianDate.parseMjd(s, jd.value().mjdDecimal().toPlainString()).value();
            JulianDate jdd = JulianDate.parseJd(s, jd.value().jdDecimal().toPlainString()).value();
            assertThat(mjd).as("%s MJD %s", s, jd.value()).isEqualTo(jd.value());
            assertThat(jdd).as("%s JD", s).isEqualTo(jd.value());
            ScaleInstant back = TC.fromJulianDate(mjd).value();
            boolean repeats = inside && (s == TimeScale.UTC || s == TimeScale.GLONASS);
            if (repeats) {
                assertThat(jd.warnings()).extracting(TimeWarning::kind).contains(TimeWarning.Kind.LEAP_SECOND_REPEAT);
                assertThat(t.isBefore(back)).isTrue();
            } else {
                assertThat(back.isSameInstant(t)).as("%s JD round trip", s).isTrue();
            }
        }
    }
}
