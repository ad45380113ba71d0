package io.geotick.reference.fit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import io.geotick.transforms.Epoch;
import io.geotick.transforms.StepDescription;
import io.geotick.transforms.chain.ConversionChain;
import io.geotick.transforms.chain.CoordinateSystem;
import io.geotick.transforms.fit.ControlPoint;
import io.geotick.transforms.fit.SiteFitter;
import io.geotick.transforms.fit.SiteModel;
import io.geotick.transforms.frames.FrameRegistry;
import io.geotick.transforms.frames.StandardFrames;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * A fitted site grid as a step of a conversion chain, against an exact similarity computed by hand.
 * The marks are an invented scenario; the expected values are hand computations.
 *
 * <p>The site grid: site = T + L·(p − O) with O = (450 000, 5 700 000) m on UTM zone 31N of ETRF2000,
 * T = (1000, 2000) m and L = [[1.2, −0.5], [0.5, 1.2]], i.e. scale √(1.2² + 0.5²) = 1.3 exactly and
 * rotation atan2(0.5, 1.2) = 22.619864948040426° (counter-clockwise). With d = p − O:
 * x' = 1000 + 1.2·dx − 0.5·dy, y' = 2000 + 0.5·dx + 1.2·dy.
 */
class SiteChainReferenceTest {
    private static final double E0 = 450_000;
    private static final double N0 = 5_700_000;
    // Source: hand-computed exact case (class comment). Control marks: d → site.
    //   (0, 0) → (1000, 2000); (400, 0) → (1000 + 480, 2000 + 200) = (1480, 2200);
    //   (0, 300) → (1000 − 150, 2000 + 360) = (850, 2360); (400, 300) → (1330, 2560);
    //   (−200, 100) → (1000 − 240 − 50, 2000 − 100 + 120) = (710, 2020).
    private static final double[][] MARKS = {{0, 0, 1000, 2000}, {400, 0, 1480, 2200}, {0, 300, 850, 2360},
        {400, 300, 1330, 2560}, {-200, 100, 710, 2020}};
    // Source: hand-computed exact case. Held-out points, not used in the fit:
    //   (120, 50) → (1000 + 144 − 25, 2000 + 60 + 60) = (1119, 2120);
    //   (250, −80) → (1000 + 300 + 40, 2000 + 125 − 96) = (1340, 2029);
    //   (−100, 220) → (1000 − 120 − 110, 2000 − 50 + 264) = (770, 2214).
    private static final double[][] HELD_OUT = {{120, 50, 1119, 2120}, {250, -80, 1340, 2029},
        {-100, 220, 770, 2214}};

    private static SiteModel model() {
        List<ControlPoint> cps = new ArrayList<>();
        for (int i = 0; i < MARKS.length; i++) {
            double[] m = MARKS[i];
            cps.add(ControlPoint.of("K" + i, E0 + m[0], N0 + m[1], m[2], m[3]));
        }
        return SiteFitter.similarity(cps).model().withSystems("utm:31N@ETRF2000", "site grid (hand case)");
    }

    @Test
    void fittedSiteStepReproducesHeldOutPoints() {
        SiteModel m = model();
        // Source: hand-computed exact case: scale 1.3, rotation atan2(0.5, 1.2).
        assertThat(m.parameter("scale").value()).isCloseTo(1.3, within(1e-12));
        assertThat(m.parameter("rotation").value()).isCloseTo(Math.toDegrees(Math.atan2(0.5, 1.2)), within(1e-10));
        CoordinateSystem site = CoordinateSystem.site(m);
        CoordinateSystem utm = CoordinateSystem.parse("utm:31N@ETRF2000", FrameRegistry.standard());
        ConversionChain c = ConversionChain.builder().from(utm).to(site).build();
        assertThat(c.steps()).extracting(StepDescription::name)
            .containsExactly("utm:31N@ETRF2000 → site grid (hand case)");
        for (double[] h : HELD_OUT) {
            double[] r = c.convert(E0 + h[0], N0 + h[1], 17.25);
            assertThat(r[0]).isCloseTo(h[2], within(1e-9)); // Source: hand-computed exact case
            assertThat(r[1]).isCloseTo(h[3], within(1e-9)); // Source: hand-computed exact case
            assertThat(r[2]).isEqualTo(17.25); // a 2D model passes the height through
            double[] back = c.inverse().convert(h[2], h[3], 17.25);
            assertThat(back[0]).isCloseTo(E0 + h[0], within(1e-9)); // Source: hand-computed exact case
            assertThat(back[1]).isCloseTo(N0 + h[1], within(1e-9)); // Source: hand-computed exact case
        }
        // An exact fit: residuals at rounding level, redundancy 2·5 − 4 = 6 (Source: hand count).
        assertThat(m.statistics().redundancy()).isEqualTo(6);
        assertThat(c.steps().get(0).accuracyMetres()).isLessThan(1e-9);
    }

    @Test
    void throughGeodeticAndAnotherFrameAndBack() {
        CoordinateSystem site = CoordinateSystem.site(model());
        ConversionChain toGeo = ConversionChain.builder().from(site)
            .to(CoordinateSystem.geodetic(StandardFrames.ETRF2000)).build();
        ConversionChain toSite = toGeo.inverse();
        ConversionChain toItrf = ConversionChain.builder().from(site)
            .to(CoordinateSystem.ecef(StandardFrames.ITRF2020)).epoch(Epoch.of(2024.5)).build();
        assertThat(toGeo.steps()).hasSize(2);
        assertThat(toItrf.steps().get(0).method()).contains("inverse");
        double[] buf = new double[3 * HELD_OUT.length];
        for (int i = 0; i < HELD_OUT.length; i++) {
            buf[3 * i] = HELD_OUT[i][2];
            buf[3 * i + 1] = HELD_OUT[i][3];
            buf[3 * i + 2] = 40.0;
        }
        double[] geo = buf.clone();
        toGeo.convert(geo, 0, geo, 0, HELD_OUT.length);
        double[] again = geo.clone();
        toSite.convert(again, 0, again, 0, HELD_OUT.length);
        double[] itrf = buf.clone();
        toItrf.convert(itrf, 0, itrf, 0, HELD_OUT.length);
        toItrf.inverse().convert(itrf, 0, itrf, 0, HELD_OUT.length);
        for (int i = 0; i < buf.length; i++) {
            // Round trip through the Krüger series and back: measured 0 (bit for bit here).
            assertThat(again[i]).isCloseTo(buf[i], within(1e-9));
            // Through ECEF and the ITRF2020 → ITRF2014 → ETRF2000 Helmerts and back: a few ulps of ECEF
            // coordinates (an ulp is 0.93 nm at 6,400 km), times the site scale 1.3; measured 1.6e-9 m.
            assertThat(itrf[i]).isCloseTo(buf[i], within(3e-9));
        }
        // The geodetic point lies at the held-out mark's UTM position: the chain's site → UTM step alone, then
        // the projection inverse, must agree with the hand-computed UTM coordinates (site grid only here).
        ConversionChain siteToUtm = ConversionChain.builder().from(site)
            .to(CoordinateSystem.parse("utm:31N@ETRF2000", FrameRegistry.standard())).build();
        double[] u = siteToUtm.convert(1119, 2120, 0);
        assertThat(u[0]).isCloseTo(E0 + 120, within(1e-9)); // Source: hand-computed exact case
        assertThat(u[1]).isCloseTo(N0 + 50, within(1e-9)); // Source: hand-computed exact case
    }
}
