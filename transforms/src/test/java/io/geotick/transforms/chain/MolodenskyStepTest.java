package io.geotick.transforms.chain;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import io.geotick.geodesy.InvalidCoordinateException;
import io.geotick.geodesy.ellipsoid.Ellipsoids;
import io.geotick.geodesy.position.EcefPosition;
import io.geotick.geodesy.position.GeodeticPosition;
import io.geotick.transforms.StepDescription;
import io.geotick.transforms.frames.StandardFrames;
import io.geotick.transforms.helmert.Helmert;
import io.geotick.transforms.helmert.HelmertParameters;
import io.geotick.transforms.molodensky.Molodensky;
import java.util.Arrays;
import org.junit.jupiter.api.Test;

/** The Molodensky step of a chain. */
class MolodenskyStepTest {
    private static final CoordinateSystem WGS = CoordinateSystem.geodetic(StandardFrames.WGS84);
    private static final CoordinateSystem ED = CoordinateSystem.geodetic(StandardFrames.ED50);

    private static Molodensky m(boolean abridged) {
        // The translations of the IOGP Guidance Note 7-2 §4.4 examples, WGS 84 → ED50 (from memory).
        return abridged ? Molodensky.abridged(Ellipsoids.WGS84, Ellipsoids.INTERNATIONAL_1924, 84.87, 96.49, 116.95)
            : Molodensky.of(Ellipsoids.WGS84, Ellipsoids.INTERNATIONAL_1924, 84.87, 96.49, 116.95);
    }

    @Test
    void geodeticEndsApplyTheMethodAndListIt() {
        for (boolean abridged : new boolean[] {false, true}) {
            ConversionChain c = ConversionChain.builder().from(WGS).to(ED).molodensky(m(abridged), "an authority", 1.0)
                .build();
            assertThat(c.steps()).hasSize(1);
            StepDescription d = c.steps().get(0);
            assertThat(d.name()).isEqualTo("WGS 84 → ED50");
            assertThat(d.epsgMethod()).hasValue(abridged ? 9605 : 9604);
            assertThat(d.method()).contains(abridged ? "Abridged Molodensky" : "Molodensky");
            assertThat(d.parameters()).extracting(StepDescription.Parameter::name).containsExactly("dX", "dY", "dZ",
                "da", "df");
            assertThat(d.parameter("da").orElseThrow().value()).isEqualTo(251.0);
            assertThat(d.source()).isEqualTo("an authority");
            assertThat(d.accuracyMetres()).isEqualTo(1.0);
            assertThat(d.cautions().get(0)).contains("first-order", "metre");
            GeodeticPosition p = GeodeticPosition.of(53.8, 2.13, 73);
            GeodeticPosition want = m(abridged).apply(p);
            assertThat(c.convert(53.8, 2.13, 73)).containsExactly(want.latitude(), want.longitude(), want.height());
        }
    }

    @Test
    void inverseIteratesToRounding() {
        ConversionChain c = ConversionChain.builder().from(WGS).to(ED).molodensky(m(false), "src", 0.5).build();
        ConversionChain r = c.inverse();
        assertThat(r.steps().get(0).name()).isEqualTo("ED50 → WGS 84");
        assertThat(r.steps().get(0).method()).contains("reverse by iteration");
        assertThat(r.steps().get(0).cautions()).anyMatch(s -> s.contains("sign reversal"));
        double[] pts = {-75, -170, 0, -20, 10, 5000, 0, 0, -100, 45, 179.5, 20, 80, 60, 8000};
        double[] q = pts.clone();
        c.convert(q, 0, q, 0, 5);
        r.convert(q, 0, q, 0, 5);
        for (int i = 0; i < 5; i++) {
            // Closes to rounding (about 1e-14° and 1e-9 m), far below the 1-2 cm of EPSG's sign reversal.
            assertThat(q[3 * i]).isCloseTo(pts[3 * i], within(1e-12));
            assertThat(q[3 * i + 1]).isCloseTo(pts[3 * i + 1], within(1e-12));
            assertThat(q[3 * i + 2]).isCloseTo(pts[3 * i + 2], within(1e-7));
        }
        assertThat(r.inverse().steps().get(0)).isEqualTo(c.steps().get(0));
    }

    @Test
    void ecefEndsGoThroughGeodetic() {
        ConversionChain c = ConversionChain.builder().from(CoordinateSystem.ecef(StandardFrames.WGS84))
            .to(CoordinateSystem.ecef(StandardFrames.ED50)).molodensky(m(false), "src", 1).build();
        assertThat(c.steps()).extracting(StepDescription::name).containsExactly("ECEF → geodetic on WGS 84 (WGS 84)",
            "WGS 84 → ED50", "geodetic → ECEF on International 1924 (ED50)");
        // Against the geocentric translation route it approximates: a few centimetres for this shift.
        double[] x = {3_790_000, 140_000, 5_120_000};
        double[] got = c.convert(x[0], x[1], x[2]);
        EcefPosition exact = Helmert.positionVector(HelmertParameters.ofTranslation(84.87, 96.49, 116.95)).apply(
            EcefPosition.of(x[0], x[1], x[2]));
        assertThat(EcefPosition.of(got[0], got[1], got[2]).distanceTo(exact)).isLessThan(0.05);
    }

    @Test
    void wrongEllipsoidsAndConflictsAreRefused() {
        assertThatThrownBy(() -> ConversionChain.builder().from(ED).to(WGS).molodensky(m(false), "s", 1).build())
            .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("source ellipsoid WGS 84")
            .hasMessageContaining("geodetic@ED50");
        assertThatThrownBy(() -> ConversionChain.builder().from(WGS).to(ED).molodensky(m(false), "s", 1)
            .helmert(Helmert.positionVector(HelmertParameters.ZERO), "h", 1).build())
            .hasMessageContaining("not 2");
        assertThatThrownBy(() -> ConversionChain.builder().molodensky(m(false), "s", -1)).hasMessageContaining("-1");
        ConversionChain c = ConversionChain.builder().from(WGS).to(ED).molodensky(m(true), "s", 1).build();
        double[] pole = {10, 0, 0, 90, 0, 0};
        assertThatThrownBy(() -> c.convert(pole, 0, pole, 0, 2)).isInstanceOf(InvalidCoordinateException.class)
            .hasMessageContaining("point 1");
        double[] back = {10, 0, 0, 90, 0, 0};
        assertThatThrownBy(() -> c.inverse().convert(back, 0, back, 0, 2)).hasMessageStartingWith("point 1: ");
        assertThat(Arrays.stream(c.convert(10, 0, 0)).allMatch(Double::isFinite)).isTrue();
    }
}
