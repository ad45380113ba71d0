package io.geotick.reference.timescales;

import static org.assertj.core.api.Assertions.assertThat;

import io.geotick.timescales.ScaleInstant;
import io.geotick.timescales.TimeConverter;
import io.geotick.timescales.TimeScale;
import io.geotick.timescales.leap.HashCheck;
import io.geotick.timescales.leap.LeapEntry;
import io.geotick.timescales.leap.LeapTable;
import io.geotick.timescales.leap.LeapTables;
import java.io.IOException;
import java.nio.file.Files;
import java.time.Duration;
import java.time.LocalDate;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;

/** The leap-second table against IERS Bulletin C, the IERS/IETF list and ITU-R TF.460-6. */
class LeapSecondsReferenceTest {
    private final TimeConverter tc = TimeConverter.builtIn();

    @Test
    void bulletinC() {
        // Source: IERS Bulletin C 52 (July 2016): a positive leap second at the end of 2016-12-31;
        // from 2017-01-01T00:00:00 UTC, TAI - UTC = 37 s (from memory of the bulletin's wording).
        ScaleInstant t = tc.parseIso("2017-01-01T00:00:00Z", TimeScale.UTC).value();
        assertThat(tc.taiMinusUtc(t).value().seconds()).isEqualTo(37);
        assertThat(LeapTable.builtIn().last()).isEqualTo(new LeapEntry(LocalDate.of(2017, 1, 1), 37));
        // Source: IERS Bulletin C (each issue since 2017): no leap second since; the built-in table ends there.
        // (from memory)
        assertThat(tc.taiMinusUtc(tc.parseIso("2025-12-31T23:59:59Z", TimeScale.UTC).value()).value().seconds())
            .isEqualTo(37);
        // Source: IERS/IETF leap-second list: the first entry, 1972-01-01, TAI - UTC = 10 s (from memory).
        assertThat(LeapTable.builtIn().entries().get(0)).isEqualTo(new LeapEntry(LocalDate.of(1972, 1, 1), 10));
        assertThat(LeapTable.builtIn().size()).isEqualTo(28);
    }

    @Test
    void tzdataListMatchesEveryBuiltInEntryAndVerifies() throws IOException {
        Assumptions.assumeTrue(Files.isRegularFile(LeapTables.TZDATA_LIST),
            "no tzdata leap-second list at " + LeapTables.TZDATA_LIST + " on this machine (optional source)");
        // Source: IERS/IETF leap-second list as shipped by tzdata (/usr/share/zoneinfo/leap-seconds.list).
        LeapTable file = LeapTable.load(LeapTables.TZDATA_LIST);
        assertThat(file.hashCheck()).isEqualTo(HashCheck.VERIFIED);
        LeapTable builtIn = LeapTable.builtIn();
        for (int i = 0; i < builtIn.size(); i++) {
            assertThat(file.entries().get(i)).as("entry %d", i).isEqualTo(builtIn.entries().get(i));
        }
        assertThat(file.size()).isGreaterThanOrEqualTo(builtIn.size());
        // the built-in table's dates are those of the list it was built from, or the list here is newer
        if (file.updated().equals(builtIn.updated())) {
            assertThat(builtIn.expires()).isEqualTo(file.expires());
        } else {
            assertThat(file.updated()).isAfter(builtIn.updated());
        }
        // the newest verified table wins; on a tie the verified file is preferred
        LeapTables.Selection s = LeapTables.standard();
        assertThat(s.table().source()).isEqualTo(builtIn.isNewerThan(file) ? "built-in"
            : LeapTables.TZDATA_LIST.toString());
    }

    @Test
    void ituLeapSecondIsSecondSixty() {
        // Source: ITU-R Recommendation TF.460-6, 2.2: a positive leap second begins at 23:59:60 and ends at
        // 0h 0m 0s of the first day of the following month (from memory).
        ScaleInstant a = tc.parseIso("2016-12-31T23:59:59Z", TimeScale.UTC).value();
        ScaleInstant b = tc.parseIso("2016-12-31T23:59:60Z", TimeScale.UTC).value();
        ScaleInstant c = tc.parseIso("2017-01-01T00:00:00Z", TimeScale.UTC).value();
        assertThat(a.until(b)).isEqualTo(Duration.ofSeconds(1));
        assertThat(b.until(c)).isEqualTo(Duration.ofSeconds(1));
        // Source: ITU-R TF.460-6, 2.1: the first preference is the end of December and June (from memory).
        for (LeapEntry e : LeapTable.builtIn().entries().subList(1, LeapTable.builtIn().size())) {
            assertThat(e.effective().getDayOfMonth()).isEqualTo(1);
            assertThat(e.effective().getMonthValue()).isIn(1, 7);
        }
    }

    @Test
    void ttIsTaiPlus32Point184Seconds() {
        // Source: IERS Conventions (2010), IERS TN 36, 10.1: TT = TAI + 32.184 s (from memory).
        ScaleInstant t = tc.parseIso("2000-01-01T12:00:00", TimeScale.TAI).value();
        assertThat(tc.formatIso(t, TimeScale.TT).value()).isEqualTo("2000-01-01T12:00:32.184");
        // Source: IERS Conventions (2010), 10.1 / IAU: J2000.0 = 2000-01-01T12:00:00 TT = JD 2451545.0 TT.
        // (from memory)
        ScaleInstant j2000 = tc.parseIso("2000-01-01T12:00:00", TimeScale.TT).value();
        assertThat(tc.toJulianDate(j2000, TimeScale.TT).value().jdDecimal().toPlainString()).isEqualTo("2451545.0");
        // and J2000.0 is 11:58:55.816 UTC (TT - UTC = 32 + 32.184 s in 2000; common practice value)
        assertThat(tc.formatIso(j2000, TimeScale.UTC).value()).isEqualTo("2000-01-01T11:58:55.816Z");
    }
}
