package io.geotick.timescales.leap;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class LeapListParserTest {
    static String list(long updated, long expires, List<LeapEntry> entries) {
        StringBuilder sb = new StringBuilder("# a test list\n#$\t" + updated + "\n#@\t" + expires + "\n#\n");
        for (LeapEntry e : entries) {
            sb.append(e.ntpSeconds()).append('\t').append(e.taiMinusUtc()).append("\t# ").append(e.effective())
                .append('\n');
        }
        sb.append("#\n").append(LeapListParser.hashLine(updated, expires, entries)).append('\n');
        return sb.toString();
    }

    static String builtInList() {
        return list(LeapTable.BUILT_IN_UPDATED_NTP, LeapTable.BUILT_IN_EXPIRES_NTP, LeapTable.builtIn().entries());
    }

    @Test
    void aWellFormedListVerifies() {
        LeapTable t = LeapTable.parse(builtInList(), "test.list");
        assertThat(t.hashCheck()).isEqualTo(HashCheck.VERIFIED);
        assertThat(t.sameContentAs(LeapTable.builtIn())).isTrue();
        assertThat(t.expires()).hasToString("2026-06-28");
        assertThat(t.updated()).hasToString("2025-07-07");
        assertThat(t.size()).isEqualTo(28);
    }

    @Test
    void aTamperedEntryFailsTheHashNamingTheLine() {
        String bad = builtInList().replace("#$\t3960835200", "#$\t3960835201");
        assertThatThrownBy(() -> LeapTable.parse(bad, "bad.list")).isInstanceOf(LeapListException.class)
            .hasMessageContaining("bad.list").hasMessageContaining("SHA-1").hasMessageContaining("line 34");
    }

    @Test
    void malformedLinesAreNamed() {
        String bad = builtInList().replace("2287785600\t11", "2287785600\televen");
        assertThatThrownBy(() -> LeapTable.parse(bad, "m.list")).isInstanceOf(LeapListException.class)
            .hasMessageContaining("line 6").hasMessageContaining("eleven")
            .satisfies(e -> assertThat(((LeapListException) e).line()).isEqualTo(6));
        String noExpiry = builtInList().replaceAll("#@\t\\d+\n", "");
        assertThatThrownBy(() -> LeapTable.parse(noExpiry, "m.list")).hasMessageContaining("#@");
        String noHash = builtInList().replaceAll("#h.*\n", "");
        assertThatThrownBy(() -> LeapTable.parse(noHash, "m.list")).hasMessageContaining("#h");
        String midday = builtInList().replace("2287785600\t11", "2287785601\t11");
        assertThatThrownBy(() -> LeapTable.parse(midday, "m.list")).hasMessageContaining("00:00:00");
    }

    @Test
    void stepsMustBeOneSecondAndInOrder() {
        List<LeapEntry> e = new ArrayList<>(LeapTable.builtIn().entries());
        e.add(new LeapEntry(java.time.LocalDate.of(2030, 1, 1), 39));
        assertThatThrownBy(() -> LeapTable.parse(list(3_960_835_200L, 3_991_593_600L, e), "s.list"))
            .hasMessageContaining("changes by 2 s");
        List<LeapEntry> back = new ArrayList<>(LeapTable.builtIn().entries());
        back.add(new LeapEntry(java.time.LocalDate.of(2016, 1, 1), 38));
        assertThatThrownBy(() -> LeapTable.parse(list(3_960_835_200L, 3_991_593_600L, back), "o.list"))
            .hasMessageContaining("not after");
    }

    @Test
    void hashWordsMayOmitLeadingZeros() {
        // a list whose digest has a word below 0x10000000 would be written without the leading zero;
        // parse accepts 1-8 digits per word and compares numerically.
        String text = builtInList();
        String hashLine = text.lines().filter(l -> l.startsWith("#h")).findFirst().orElseThrow();
        String padded = "#h " + String.join(" ", java.util.Arrays.stream(hashLine.substring(2).trim().split("\\s+"))
            .map(w -> String.format("%8s", w).replace(' ', '0')).toList());
        assertThat(LeapTable.parse(text.replace(hashLine, padded), "p.list").hashCheck()).isEqualTo(HashCheck.VERIFIED);
    }

    @Test
    void theNewestVerifiedTableWinsAndSkipsAreReported(@TempDir Path dir) throws IOException {
        List<LeapEntry> e = new ArrayList<>(LeapTable.builtIn().entries());
        e.add(new LeapEntry(java.time.LocalDate.of(2027, 1, 1), 38));
        Path newer = dir.resolve("newer.list");
        Files.writeString(newer, list(3_990_000_000L, 4_000_000_000L, e));
        Path broken = dir.resolve("broken.list");
        Files.writeString(broken, builtInList().replace("#$\t3960835200", "#$\t3960835201"));
        Path missing = dir.resolve("missing.list");
        LeapTables.Selection s = LeapTables.newest(List.of(missing, broken, newer));
        assertThat(s.table().source()).isEqualTo(newer.toString());
        assertThat(s.table().last().taiMinusUtc()).isEqualTo(38);
        assertThat(s.notes()).anyMatch(n -> n.contains("missing.list") && n.contains("not present"))
            .anyMatch(n -> n.contains("broken.list") && n.contains("SHA-1"))
            .anyMatch(n -> n.contains("built-in"));
        Path same = dir.resolve("same.list");
        Files.writeString(same, builtInList());
        assertThat(LeapTables.newest(List.of(same)).table().source()).isEqualTo(same.toString());
    }
}
