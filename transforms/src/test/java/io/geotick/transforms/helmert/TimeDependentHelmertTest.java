package io.geotick.transforms.helmert;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import io.geotick.geodesy.position.EcefPosition;
import io.geotick.transforms.EcefVelocity;
import io.geotick.transforms.Epoch;
import io.geotick.transforms.MissingEpochException;
import org.junit.jupiter.api.Test;

class TimeDependentHelmertTest {
    private static final TimeDependentHelmert T = TimeDependentHelmert.of(
        HelmertParameters.ofMillimetres(10, 20, 30, 1, 2, 3, 4),
        HelmertParameters.ofMillimetres(1, -1, 2, 0.1, 0.2, -0.3, 0.05), Epoch.of(2010.0),
        RotationConvention.POSITION_VECTOR);
    private static final EcefPosition P = EcefPosition.of(4027894.006, 307045.600, 4919474.910);

    @Test
    void parametersAreLinearInTime() {
        // Source: IOGP Guidance Note 7-2, §4.3.5: P(t) = P(t0) + Ṗ (t − t0).
        HelmertParameters p = T.parametersAt(Epoch.of(2020.0));
        assertThat(p.tx()).isCloseTo(0.020, within(1e-15));
        assertThat(p.rz()).isCloseTo(0.0, within(1e-15));
        assertThat(p.ds()).isCloseTo(0.0045, within(1e-15));
        assertThat(T.epsgMethod()).isEqualTo(1053);
    }

    @Test
    void missingEpochIsAnErrorNamingTheMethod() {
        assertThatThrownBy(() -> T.apply(P, null)).isInstanceOf(MissingEpochException.class)
            .hasMessageContaining("1053").hasMessageContaining("coordinate epoch");
    }

    @Test
    void roundTripAtAnEpoch() {
        Epoch t = Epoch.of(2024.3);
        assertThat(T.at(t).inverse().apply(T.apply(P, t)).distanceTo(P)).isLessThan(2e-9);
    }

    @Test
    void velocityTransformIsTheTimeDerivative() {
        // Source: numerical derivative of the position transformation (common practice).
        EcefVelocity v = EcefVelocity.ofMillimetresPerYear(-14, 18, 11);
        Epoch t = Epoch.of(2020.0);
        EcefVelocity vt = T.applyToVelocity(P, v, t);
        double dt = 1e-3;
        EcefPosition p1 = EcefPosition.of(P.x() + v.vx() * dt, P.y() + v.vy() * dt, P.z() + v.vz() * dt);
        EcefPosition a = T.apply(P, t);
        EcefPosition b = T.apply(p1, Epoch.of(2020.0 + dt));
        assertThat((b.x() - a.x()) / dt).isCloseTo(vt.vx(), within(1e-5));
        assertThat((b.y() - a.y()) / dt).isCloseTo(vt.vy(), within(1e-5));
        assertThat((b.z() - a.z()) / dt).isCloseTo(vt.vz(), within(1e-5));
    }

    @Test
    void epochFactories() {
        assertThat(Epoch.from(java.time.LocalDate.of(2024, 1, 1)).decimalYear()).isEqualTo(2024.0);
        assertThat(Epoch.parse("2023-07-02").decimalYear()).isCloseTo(2023 + 182 / 365.0, within(1e-12));
        assertThat(Epoch.parse("2015.5").decimalYear()).isEqualTo(2015.5);
        assertThatThrownBy(() -> Epoch.parse("soon")).hasMessageContaining("soon");
        assertThatThrownBy(() -> Epoch.of(Double.NaN)).hasMessageContaining("NaN");
    }
}
