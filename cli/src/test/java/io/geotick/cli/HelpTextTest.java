package io.geotick.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import picocli.CommandLine;

/**
 * The help screens fit an 80-column terminal without picocli breaking our lines mid-phrase, and each
 * command's first description line, which the top-level command list shows alone, is a whole sentence.
 */
class HelpTextTest {
    @Test
    void everyHelpLineFitsEightyColumns() {
        CommandLine top = Main.commandLine();
        assertThat(top.getUsageMessage().lines()).allSatisfy(l -> assertThat(l.length()).as(l).isLessThanOrEqualTo(80));
        for (Map.Entry<String, CommandLine> e : top.getSubcommands().entrySet()) {
            assertThat(e.getValue().getUsageMessage().lines())
                .allSatisfy(l -> assertThat(l.length()).as(e.getKey() + ": " + l).isLessThanOrEqualTo(80));
        }
    }

    @Test
    void theCommandListShowsWholeSentences() {
        for (Map.Entry<String, CommandLine> e : Main.commandLine().getSubcommands().entrySet()) {
            String[] description = e.getValue().getCommandSpec().usageMessage().description();
            assertThat(description).as(e.getKey()).isNotEmpty();
            assertThat(description[0].strip()).as(e.getKey()).endsWith(".");
        }
    }

    @Test
    void noDescriptionOrFooterLineIsWiderThanTheScreen() {
        // Source lines wider than 80 columns are wrapped by picocli, which leaves a word or two alone on
        // the next line; the first description line is exempt (the command list wraps it as a whole).
        List<String> wide = new ArrayList<>();
        for (Map.Entry<String, CommandLine> e : Main.commandLine().getSubcommands().entrySet()) {
            CommandLine.Model.UsageMessageSpec u = e.getValue().getCommandSpec().usageMessage();
            String[] d = u.description();
            for (int i = 1; i < d.length; i++) {
                if (d[i].length() > 80) {
                    wide.add(e.getKey() + ": " + d[i]);
                }
            }
            for (String f : u.footer()) {
                for (String line : f.split("\n|%n")) {
                    if (line.length() > 80) {
                        wide.add(e.getKey() + ": " + line);
                    }
                }
            }
        }
        assertThat(wide).isEmpty();
    }
}
