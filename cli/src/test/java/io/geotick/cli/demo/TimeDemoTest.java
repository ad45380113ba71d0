package io.geotick.cli.demo;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.PrintWriter;
import java.io.StringWriter;
import org.junit.jupiter.api.Test;

class TimeDemoTest {
    @Test
    void saysItIsInventedAndReconcilesTheStreams() {
        StringWriter s = new StringWriter();
        TimeDemo.run(new PrintWriter(s, true));
        assertThat(s.toString()).contains("invented scenario").contains("week 906")
            .contains("2016-12-31T23:59:60.500Z").contains("offset from the GNSS fix: 0 s")
            .contains("gains 0.4").contains("0.500 s");
    }
}
