package io.geotick.transforms.frames;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import io.geotick.geodesy.position.EcefPosition;
import io.geotick.transforms.EcefVelocity;
import io.geotick.transforms.Epoch;
import io.geotick.transforms.MissingEpochException;
import io.geotick.transforms.StationMotion;
import io.geotick.transforms.StepDescription;
import org.junit.jupiter.api.Test;

class StationMotionTest {
    @Test
    void linearPropagationAndBack() {
        // Source: IERS Conventions (2010), TN 36, §4.1: X(t) = X(t0) + V (t − t0).
        EcefPosition x = EcefPosition.of(4027894.006, 307045.600, 4919474.910);
        EcefVelocity v = EcefVelocity.ofMillimetresPerYear(-13.6, 17.2, 10.9);
        EcefPosition y = StationMotion.propagate(x, v, Epoch.of(2015.0), Epoch.of(2025.0));
        assertThat(y.x() - x.x()).isCloseTo(-0.136, within(1e-9));
        assertThat(y.y() - x.y()).isCloseTo(0.172, within(1e-9));
        assertThat(y.z() - x.z()).isCloseTo(0.109, within(1e-9));
        assertThat(StationMotion.propagate(y, v, Epoch.of(2025.0), Epoch.of(2015.0)).distanceTo(x))
            .isLessThan(2e-9);
        assertThatThrownBy(() -> StationMotion.propagate(x, v, null, Epoch.of(2025.0)))
            .isInstanceOf(MissingEpochException.class).hasMessageContaining("epoch");
        assertThatThrownBy(() -> EcefVelocity.of(Double.NaN, 0, 0)).hasMessageContaining("NaN");
    }

    @Test
    void everyLinkDescribesItselfWithSourceAndAccuracy() {
        for (FrameLink l : FrameRegistry.standard().links()) {
            StepDescription d = l.describe();
            assertThat(d.source()).as(l.toString()).isNotBlank();
            assertThat(d.accuracyMetres()).as(l.toString()).isPositive();
            assertThat(d.toText()).contains(l.from().name());
        }
        StepDescription etrf = FrameRegistry.standard().links().stream()
            .filter(l -> l.to().equals(StandardFrames.ETRF2000)).findFirst().orElseThrow().describe();
        assertThat(etrf.parameter("rz rate").orElseThrow().value()).isCloseTo(-0.000792, within(1e-15));
        assertThat(etrf.parameter("reference epoch").orElseThrow().value()).isEqualTo(2010.0);
    }
}
