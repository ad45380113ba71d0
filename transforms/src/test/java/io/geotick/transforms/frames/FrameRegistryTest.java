package io.geotick.transforms.frames;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import io.geotick.geodesy.position.EcefPosition;
import io.geotick.transforms.Epoch;
import io.geotick.transforms.MissingEpochException;
import io.geotick.transforms.StepDescription;
import java.util.Optional;
import org.junit.jupiter.api.Test;

class FrameRegistryTest {
    private static final FrameRegistry R = FrameRegistry.standard();
    private static final EcefPosition P = EcefPosition.of(4027894.006, 307045.600, 4919474.910);

    @Test
    void lookupIgnoresCaseSpacesAndKnowsAliases() {
        assertThat(R.frame("wgs84")).isEqualTo(StandardFrames.WGS84);
        assertThat(R.frame("OSGB36")).isEqualTo(StandardFrames.OSGB36);
        assertThat(R.frame("EPSG:4230")).isEqualTo(StandardFrames.ED50);
        assertThat(R.frame("itrf-2020")).isEqualTo(StandardFrames.ITRF2020);
        assertThat(R.frames()).hasSize(11);
    }

    @Test
    void unknownFrameNamesItAndListsKnownOnes() {
        assertThatThrownBy(() -> R.frame("ITRF1066")).isInstanceOf(UnknownFrameException.class)
            .hasMessageContaining("'ITRF1066'").hasMessageContaining("ITRF2020").hasMessageContaining("ED50");
    }

    @Test
    void staticPathNeedsNoEpoch() {
        FrameTransformation t = R.transformation(StandardFrames.ED50, StandardFrames.WGS84);
        assertThat(t.steps()).hasSize(1);
        StepDescription d = t.descriptions().get(0);
        assertThat(d.epsgTransformation()).hasValue(1133);
        assertThat(d.epsgMethod()).hasValue(9603);
        assertThat(d.accuracyMetres()).isEqualTo(10.0);
        assertThat(d.parameter("tx").orElseThrow().value()).isEqualTo(-87.0);
        assertThat(t.apply(P).x() - P.x()).isEqualTo(-87.0);
    }

    @Test
    void timeDependentStepWithoutEpochIsAnError() {
        assertThatThrownBy(() -> R.transformation(StandardFrames.ITRF2020, StandardFrames.ETRF2000))
            .isInstanceOf(MissingEpochException.class).hasMessageContaining("ITRF2020 → ITRF2014")
            .hasMessageContaining("coordinate epoch");
        assertThatThrownBy(() -> R.transformation(StandardFrames.ED50, StandardFrames.ITRF2020))
            .isInstanceOf(MissingEpochException.class).hasMessageContaining("WGS 84");
    }

    @Test
    void pathGoesViaItrfAtTheEpoch() {
        FrameTransformation t = R.transformation(StandardFrames.ED50, StandardFrames.ETRF2000, Epoch.of(2022.5));
        assertThat(t.description()).isEqualTo("ED50 → WGS 84 → ITRF2014 → ETRF2000 at epoch 2022.5");
        assertThat(t.accuracyMetres()).isBetween(10.0, 10.01);
        // In 2018, WGS 84 (G1762) is taken as ITRF2008: the path changes with the date.
        FrameTransformation u = R.transformation(StandardFrames.WGS84, StandardFrames.ETRF2000, Epoch.of(2018.0));
        assertThat(u.description()).isEqualTo("WGS 84 → ITRF2008 → ITRF2020 → ITRF2014 → ETRF2000 at epoch 2018.0");
        assertThat(u.descriptions().get(0).cautions().get(0)).contains("1-2 cm");
    }

    @Test
    void epochOutsideEveryAlignmentHasNoPath() {
        assertThatThrownBy(() -> R.transformation(StandardFrames.WGS84, StandardFrames.ITRF2020, Epoch.of(1990.0)))
            .isInstanceOf(NoFramePathException.class).hasMessageContaining("1990.0");
    }

    @Test
    void roundTripsThroughEveryLink() {
        Epoch e = Epoch.of(2023.0);
        for (Frame a : R.frames()) {
            for (Frame b : R.frames()) {
                FrameTransformation t = R.transformation(a, b, e);
                assertThat(t.inverse().apply(t.apply(P)).distanceTo(P)).as(a + " → " + b).isLessThan(1e-8);
                double[] arr = {P.x(), P.y(), P.z()};
                t.apply(arr, 0, arr, 0, 1);
                assertThat(EcefPosition.of(arr[0], arr[1], arr[2]).distanceTo(t.apply(P))).isZero();
            }
        }
    }

    @Test
    void timeDependentStepListsItsEvaluatedParameters() {
        FrameTransformation t = R.transformation("ITRF2020", "ITRF2014", Optional.of(Epoch.of(2025.0)));
        StepDescription d = t.descriptions().get(0);
        assertThat(d.epsgMethod()).hasValue(1053);
        assertThat(d.parameter("ty at epoch").orElseThrow().value()).isCloseTo(-0.0019, org.assertj.core.api.Assertions.within(1e-15));
        assertThat(d.toText()).contains("reference epoch = 2015.0 year").contains("source: IERS");
    }

    @Test
    void customRegistryKeepsTheStandardOnes() {
        Frame local = Frame.of("LOCAL", FrameKind.STATIC, io.geotick.geodesy.ellipsoid.Ellipsoids.BESSEL_1841, 0,
            "an invented local datum");
        FrameRegistry r = R.toBuilder().add(local).add(FrameLink.geocentricTranslations(local,
            StandardFrames.WGS84, 1, 2, 3, 0, "invented for this test", 1.0)).build();
        assertThat(r.transformation(local, StandardFrames.ED50).steps()).hasSize(2);
        assertThatThrownBy(() -> R.toBuilder().add(local).add(local).build()).hasMessageContaining("LOCAL");
    }
}
