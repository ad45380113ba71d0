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

    @Test
    void datumPartShowsTheShiftsAndTheCostOfMixUps() {
        String out = CliRun.of("demo").out();
        assertThat(out).contains("Datum shifts", "ITRF2020", "ETRF2000", "ED50", "fictional company");
        assertThat(out).containsPattern("Molodensky's formulas \\(EPSG 9604.*\\R.* land 0\\.0\\d\\d m from this geocentric");
        assertThat(out).contains("coordinate-frame rotation", "reference epoch", "steps: 2", "source: EUREF");
        assertThat(out).contains("geotick coord --from ecef@ITRF2020 --to geodetic@ETRF2000");
    }

    @Test
    void gridPartShowsUtmScaleConvergenceAndGroundDistance() {
        String out = CliRun.of("demo").out();
        assertThat(out).contains("Map grids", "UTM zone 30N", "point scale factor", "convergence",
            "combined factor", "ground distance", "invented");
        // The fix lies west of zone 30's central meridian (3°W) in the northern hemisphere: negative
        // convergence and a point scale below 1 inside ±180 km of it (common practice).
        assertThat(out).contains("west of true north");
        assertThat(out).containsPattern("point scale factor 0\\.9998\\d+");
        assertThat(out).contains("site grid", "2D similarity fitted", "RMS residual", "geotick fit --model similarity");
    }
}
