package io.geotick.cli.time;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import io.geotick.timescales.leap.LeapEntry;
import io.geotick.timescales.leap.LeapListParser;
import io.geotick.timescales.leap.LeapTable;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class LeapCommandTest {
    /** A valid list with the built-in entries, update and expiry given in NTP seconds. */
    static String list(long updated, long expires) {
        List<LeapEntry> e = LeapTable.builtIn().entries();
        StringBuilder sb = new StringBuilder("#$ " + updated + "\n#@ " + expires + "\n");
        e.forEach(x -> sb.append(x.ntpSeconds()).append('\t').append(x.taiMinusUtc()).append('\n'));
        return sb.append(LeapListParser.hashLine(updated, expires, e)).append('\n').toString();
    }

    @Test
    void textShowsTheTableInForce() {
        CliRun r = CliRun.of("leap", "--at", "2020-01-01T00:00:00Z", "--list");
        assertThat(r.code()).as(r.err()).isZero();
        int n = io.geotick.timescales.leap.LeapTables.standard().table().size();
        assertThat(r.out()).contains("source").contains("entries         " + n).contains("last step")
            .contains("TAI - UTC       37 s at 2020-01-01T00:00:00Z").contains("expires").contains("1972-07-01   11 s");
    }

    @Test
    void jsonFieldsAndAVerifiedFile(@TempDir Path dir) throws IOException {
        Path f = dir.resolve("leap.list");
        Files.writeString(f, list(3_960_835_200L, 3_991_593_600L));
        CliRun r = CliRun.of("leap", "--json", "--file", f.toString(), "--at", "1999-01-01T00:00:00Z");
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode j = r.json();
        assertThat(j.get("source").asText()).isEqualTo(f.toString());
        assertThat(j.get("hash_verified").asBoolean()).isTrue();
        assertThat(j.get("entries").asInt()).isEqualTo(28);
        assertThat(j.get("last_step").get("date").asText()).isEqualTo("2017-01-01");
        assertThat(j.get("last_step").get("tai_minus_utc").asInt()).isEqualTo(37);
        assertThat(j.get("tai_minus_utc").asInt()).isEqualTo(32);
        assertThat(j.get("expires").asText()).isEqualTo("2026-06-28");
        assertThat(j.get("expired").asBoolean()).isFalse();
        assertThat(j.get("steps")).hasSize(28);
        assertThat(j.get("warnings")).isEmpty();
    }

    @Test
    void pastTheExpiryTheReportWarns() {
        CliRun r = CliRun.of("leap", "--at", "2040-01-01T00:00:00Z");
        assertThat(r.out()).contains("(expired)").contains("warning: leap-second table expired on");
    }

    @Test
    void badFilesExitFourOrThree(@TempDir Path dir) throws IOException {
        Path f = dir.resolve("tampered.list");
        Files.writeString(f, list(3_960_835_200L, 3_991_593_600L).replace("3692217600\t37", "3692217600\t36"));
        CliRun r = CliRun.of("leap", "--file", f.toString());
        assertThat(r.code()).isEqualTo(4);
        assertThat(r.err()).contains("tampered.list").contains("line 30");
        CliRun t = CliRun.of("time", "--leap-file", f.toString(), "2017-01-01Z");
        assertThat(t.code()).isEqualTo(4);
        Path g = dir.resolve("hash.list");
        Files.writeString(g, list(3_960_835_200L, 3_991_593_600L).replace("#$ 3960835200", "#$ 3960835201"));
        CliRun h = CliRun.of("leap", "--file", g.toString());
        assertThat(h.code()).isEqualTo(4);
        assertThat(h.err()).contains("SHA-1").contains("line 31");
        CliRun missing = CliRun.of("leap", "--file", dir.resolve("none.list").toString());
        assertThat(missing.code()).isEqualTo(3);
        assertThat(missing.err()).contains("none.list").contains("no such file");
    }
}
