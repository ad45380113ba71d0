package io.geotick.cli.demo;

import static org.assertj.core.api.Assertions.assertThat;

import io.geotick.cli.CliRun;
import java.util.List;
import org.junit.jupiter.api.Test;

/** {@code geotick demo} runs, says its scenario is invented, and prints every part. */
class DemoCommandTest {
    @Test
    void runsAndSaysTheScenarioIsInvented() {
        CliRun r = CliRun.of("demo");
        assertThat(r.exitCode()).isZero();
        assertThat(r.err()).isEmpty();
        assertThat(r.out()).contains("Invented scenario").contains("fictional").contains("made up");
        assertThat(r.out()).doesNotContain("NaN").doesNotContain("Infinity");
        assertThat(r.out()).contains("Cautions:");
    }

    @Test
    void printsEachPartUnderItsTitle() {
        String out = CliRun.of("demo").out();
        List<DemoPart> parts = DemoCommand.parts();
        assertThat(parts).isNotEmpty();
        for (DemoPart p : parts) {
            assertThat(out).contains(p.title());
        }
    }

    @Test
    void geodesyPartCoversFixLocalFramesSatelliteAndRoundTrips() {
        String out = CliRun.of("demo").out();
        assertThat(out).contains("ECEF", "latitude", "east", "azimuth", "GPS altitude", "Round trips", " nm");
        assertThat(out).contains("above the horizon");
    }
}
