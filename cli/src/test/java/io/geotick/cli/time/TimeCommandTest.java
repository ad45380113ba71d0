package io.geotick.cli.time;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

class TimeCommandTest {
    /** The fields the issue requires, by exact name. */
    private static final List<String> REQUIRED = List.of("utc", "tai", "tt", "gps", "gst", "bdt", "glonass",
        "gps_week", "gps_tow", "gst_week", "gst_tow", "bdt_week", "bdt_tow", "unix", "ntp", "ptp", "mjd_utc",
        "jd_utc", "tai_minus_utc", "leap_table_expires", "warnings");

    @ParameterizedTest(name = "{0} {1}")
    @CsvSource(delimiter = ';', value = {
        "utc; 2016-12-31T23:59:60.5Z",
        "utc; 2017-01-01T02:59:60.5+03:00",
        "utc; 2016-366T23:59:60.5Z",
        "tai; 2017-01-01T00:00:36.5",
        "tt; 2017-01-01T00:01:08.684",
        "gps; 2017-01-01T00:00:17.5",
        "gps; 1930:17.5",
        "gst; 906:17.5",
        "bdt; 574:3.5",
        "glonass; 2017-01-01T02:59:60.5",
        "smeared-utc; 2017-01-01T00:00:00",
        "utc; ptp:1483228836.5",
        "utc; gpss:1167264017.5",
        "tai; mjd:57754.00042245370370",
        "tai; jd:2457754.50042245370370",
    })
    void everyInputFormNamesTheSameInstant(String scale, String value) {
        List<String> args = new ArrayList<>(List.of("time", "--json"));
        if (!value.startsWith("ptp:") && !value.startsWith("gpss:")) {
            args.addAll(List.of("--in", scale));
        }
        args.add(value);
        CliRun r = CliRun.of(args.toArray(String[]::new));
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode j = r.json();
        assertThat(j.get("tai").asText()).isEqualTo("2017-01-01T00:00:36.500");
        assertThat(j.get("utc").asText()).isEqualTo("2016-12-31T23:59:60.500Z");
    }

    @Test
    void jsonCarriesEveryFieldByItsExactName() {
        CliRun r = CliRun.of("time", "--json", "2016-12-31T23:59:60.5Z");
        JsonNode j = r.json();
        List<String> names = new ArrayList<>();
        j.fieldNames().forEachRemaining(names::add);
        assertThat(names).containsAll(REQUIRED);
        assertThat(j.get("gps_week").asLong()).isEqualTo(1930);
        assertThat(j.get("gps_tow").decimalValue()).isEqualByComparingTo("17.5");
        assertThat(j.get("gst_week").asLong()).isEqualTo(906);
        assertThat(j.get("bdt_week").asLong()).isEqualTo(574);
        assertThat(j.get("bdt_tow").decimalValue()).isEqualByComparingTo("3.5");
        assertThat(j.get("unix").decimalValue()).isEqualByComparingTo("1483228800.5");
        assertThat(j.get("ntp").decimalValue()).isEqualByComparingTo("3692217600.5");
        assertThat(j.get("ptp").decimalValue()).isEqualByComparingTo("1483228836.5");
        assertThat(j.get("tai_minus_utc").decimalValue()).isEqualByComparingTo("36");
        assertThat(j.get("glonass").asText()).isEqualTo("2017-01-01T02:59:60.500");
        assertThat(j.get("tt").asText()).isEqualTo("2017-01-01T00:01:08.684");
        assertThat(j.get("leap_table_expires").asText()).matches("\\d{4}-\\d{2}-\\d{2}");
        assertThat(j.get("warnings").isArray()).isTrue();
        assertThat(j.get("warnings").toString()).contains("leap second").contains("Unix");
    }

    @Test
    void noWarningsGiveAnEmptyArray() {
        JsonNode j = CliRun.of("time", "--json", "2020-06-01T12:00:00Z").json();
        assertThat(j.get("warnings").isArray()).isTrue();
        assertThat(j.get("warnings")).isEmpty();
        assertThat(j.get("mjd_utc").decimalValue()).isEqualByComparingTo("59001.5");
        assertThat(j.get("jd_utc").decimalValue()).isEqualByComparingTo("2459002.0");
    }

    @Test
    void unixAndNtpInputsWarnWhenTheyCouldNameTheLeapSecond() {
        CliRun r = CliRun.of("time", "--json", "unix:1483228800.5");
        JsonNode j = r.json();
        assertThat(j.get("utc").asText()).isEqualTo("2017-01-01T00:00:00.500Z");
        assertThat(j.get("warnings").toString()).contains("also names the leap second 2016-12-31T23:59:60.500Z");
        JsonNode n = CliRun.of("time", "--json", "ntp:3692217601").json();
        assertThat(n.get("utc").asText()).isEqualTo("2017-01-01T00:00:01Z");
        JsonNode hex = CliRun.of("time", "--json", "--near", "2017-01-01", "ntp:0xDC12C50180000000").json();
        assertThat(hex.get("utc").asText()).isEqualTo("2017-01-01T00:00:01.500Z");
    }

    @Test
    void truncatedWeeksResolveNearTheReference() {
        JsonNode ten = CliRun.of("time", "--json", "--in", "gps", "--week-bits", "10", "--near", "2017-03-01",
            "906:17.5").json();
        assertThat(ten.get("gps_week").asLong()).isEqualTo(1930);
        JsonNode old = CliRun.of("time", "--json", "--in", "gps", "--week-bits", "10", "--near", "1998-01-01",
            "906:17.5").json();
        assertThat(old.get("gps_week").asLong()).isEqualTo(906);
        JsonNode thirteen = CliRun.of("time", "--json", "--in", "bdt", "--week-bits", "13", "--near", "2017-01-01",
            "574:3.5").json();
        assertThat(thirteen.get("utc").asText()).isEqualTo("2016-12-31T23:59:60.500Z");
        JsonNode assumed = CliRun.of("time", "--json", "--in", "gps", "--week-bits", "10", "906:17.5").json();
        assertThat(assumed.get("warnings").toString()).contains("reference date assumed");
    }

    @Test
    void textOutputIsLabelledAndFilteredByTo() {
        CliRun all = CliRun.of("time", "2016-12-31T23:59:60.5Z");
        assertThat(all.code()).isZero();
        assertThat(all.out()).contains("UTC           2016-12-31T23:59:60.500Z")
            .contains("GPS           2017-01-01T00:00:17.500   week 1930  tow 17.500")
            .contains("Unix          1483228800.500").contains("TAI - UTC     36 s").contains("leap table")
            .contains("warning: inside the leap second");
        CliRun some = CliRun.of("time", "--to", "gps,unix", "2016-12-31T23:59:60.5Z");
        assertThat(some.out()).contains("GPS ").contains("Unix ").doesNotContain("GLONASS").doesNotContain("PTP ");
    }

    @Test
    void pastTheExpiryEveryOutputWarns() {
        CliRun r = CliRun.of("time", "--json", "2031-01-01T00:00:00Z");
        assertThat(r.json().get("warnings").toString()).contains("expired on").contains("assuming no further leap");
        CliRun t = CliRun.of("time", "2031-01-01T00:00:00Z");
        assertThat(t.out()).contains("warning: leap-second table expired on");
    }

    @Test
    void beforeTheEpochsFieldsAreNullAndSaySo() {
        JsonNode j = CliRun.of("time", "--json", "--in", "tai", "1960-01-01T00:00:00").json();
        assertThat(j.get("utc").isNull()).isTrue();
        assertThat(j.get("gps_week").isNull()).isTrue();
        assertThat(j.get("ptp").isNull()).isTrue();
        assertThat(j.get("tai").asText()).isEqualTo("1960-01-01T00:00:00");
        assertThat(j.get("warnings").toString()).contains("1961-01-01").contains("GPS epoch");
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = ';', value = {
        "2017-06-30T23:59:60Z; 2017-06-30T23:59:60",
        "2017-13-01T00:00:00Z; month 13",
        "junk; junk",
        "unix:abc; abc",
        "2017-02-30; day 30",
        "1960-06-01T00:00:00Z; 1960-06-01",
    })
    void badValuesExitTwoNamingTheValue(String value, String named) {
        CliRun r = CliRun.of("time", value);
        assertThat(r.code()).isEqualTo(2);
        assertThat(r.err()).contains(named).doesNotContain("Exception").doesNotContain("\tat ");
    }

    @Test
    void badOptionsExitTwoNamingTheValue() {
        assertThat(CliRun.of("time", "--in", "gps", "--", "-1:0")).satisfies(r -> {
            assertThat(r.code()).isEqualTo(2);
            assertThat(r.err()).contains("-1:0").contains("week -1");
        });
        assertThat(CliRun.of("time", "--in", "loran", "2017-01-01")).satisfies(r -> {
            assertThat(r.code()).isEqualTo(2);
            assertThat(r.err()).contains("loran");
        });
        assertThat(CliRun.of("time", "--to", "utc,xyz", "2017-01-01Z")).satisfies(r -> {
            assertThat(r.code()).isEqualTo(2);
            assertThat(r.err()).contains("xyz");
        });
        assertThat(CliRun.of("time", "--in", "gps", "--week-bits", "11", "906:0")).satisfies(r -> {
            assertThat(r.code()).isEqualTo(2);
            assertThat(r.err()).contains("11");
        });
        assertThat(CliRun.of("time", "--in", "gps", "2017-01-01T00:00:00Z")).satisfies(r -> {
            assertThat(r.code()).isEqualTo(2);
            assertThat(r.err()).contains("2017-01-01T00:00:00Z").contains("gps");
        });
        assertThat(CliRun.of("time", "1930:17")).satisfies(r -> {
            assertThat(r.code()).isEqualTo(2);
            assertThat(r.err()).contains("1930:17").contains("--in gps");
        });
        assertThat(CliRun.of("time", "--in", "gps", "1930:604800")).satisfies(r -> {
            assertThat(r.code()).isEqualTo(2);
            assertThat(r.err()).contains("604800");
        });
        assertThat(CliRun.of("time", "--in", "tai", "unix:0")).satisfies(r -> {
            assertThat(r.code()).isEqualTo(2);
            assertThat(r.err()).contains("unix:0").contains("--in tai");
        });
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = ';', value = {
        "utc; 9999-12-31T23:59:59Z", "glonass; 9999-12-31T23:00:00", "tai; 0000-01-01T00:00:00",
        "utc; unix:253402300799", "utc; ptp:281474976710655", "gps; 99999999999999:0", "utc; gpss:-999999999999",
        "utc; ntp:99999999999999999999", "tt; mjd:99999999999", "tt; jd:0",
    })
    void extremeValuesAreAnsweredOrRefusedNeverAnInternalError(String scale, String value) {
        CliRun r = CliRun.of("time", "--json", "--in", scale, value);
        assertThat(r.code()).as(r.err()).isIn(0, 2);
        assertThat(r.err()).doesNotContain("internal error");
        if (r.code() == 2) {
            assertThat(r.err()).contains(value);
        }
    }

    @Test
    void smearWindowIsConfigurable() {
        JsonNode d = CliRun.of("time", "--json", "2016-12-31T23:00:00Z").json();
        JsonNode narrow = CliRun.of("time", "--json", "--smear-start", "PT-30M", "--smear-length", "PT1H",
            "2016-12-31T23:00:00Z").json();
        assertThat(d.get("smeared_utc").asText()).isNotEqualTo("2016-12-31T23:00:00");
        assertThat(narrow.get("smeared_utc").asText()).isEqualTo("2016-12-31T23:00:00");
        assertThat(narrow.get("smear_length").asText()).isEqualTo("PT1H");
        CliRun bad = CliRun.of("time", "--smear-start", "PT1H", "2016-12-31T23:00:00Z");
        assertThat(bad.code()).isEqualTo(2);
        assertThat(bad.err()).contains("PT1H");
    }
}
