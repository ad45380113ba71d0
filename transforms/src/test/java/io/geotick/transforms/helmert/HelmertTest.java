package io.geotick.transforms.helmert;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import io.geotick.geodesy.InvalidCoordinateException;
import io.geotick.geodesy.position.EcefPosition;
import java.util.Random;
import org.junit.jupiter.api.Test;

class HelmertTest {
    // Parameter sets of realistic size (OSGB 1936 → WGS 84, EPSG 1314, from memory); used here only as
    // "large" values for algebraic checks.
    private static final HelmertParameters LARGE = HelmertParameters.of(446.448, -125.157, 542.06, 0.15, 0.247,
        0.842, -20.489);
    private static final EcefPosition P = EcefPosition.of(3909833.018, -147097.1376, 5020322.2012);

    @Test
    void conventionsDifferOnlyInTheSignOfTheRotations() {
        // Source: IOGP Guidance Note 7-2, §4.3.3: PV and CF are the same transformation with rotations negated.
        Helmert pv = Helmert.positionVector(LARGE);
        Helmert cf = Helmert.coordinateFrame(LARGE.withRotationsNegated());
        assertThat(pv.apply(P).distanceTo(cf.apply(P))).isLessThan(1e-9);
        assertThat(pv.inConvention(RotationConvention.COORDINATE_FRAME).apply(P).distanceTo(pv.apply(P)))
            .isLessThan(1e-9);
        // The classic mix-up (same numbers, wrong convention) moves the point by tens of metres here.
        assertThat(Helmert.coordinateFrame(LARGE).apply(P).distanceTo(pv.apply(P))).isGreaterThan(20);
    }

    @Test
    void exactInverseRoundTripsToTheNanometre() {
        // Source: algebraic identity (common practice: round trip of every method).
        Random r = new Random(7);
        for (RotationForm form : RotationForm.values()) {
            for (RotationConvention c : RotationConvention.values()) {
                Helmert h = Helmert.of(LARGE, c, form);
                GeocentricTransform inv = h.inverse();
                for (int i = 0; i < 1000; i++) {
                    EcefPosition p = EcefPosition.of(6.4e6 * (2 * r.nextDouble() - 1),
                        6.4e6 * (2 * r.nextDouble() - 1), 6.4e6 * (2 * r.nextDouble() - 1));
                    assertThat(inv.apply(h.apply(p)).distanceTo(p)).isLessThan(3e-9);
                }
                assertThat(inv.inverse()).isSameAs(h);
            }
        }
    }

    @Test
    void signReversalIsFirstOrderOnly() {
        // Source: IOGP Guidance Note 7-2, §4.3.3 (reverse by sign reversal is an approximation); the size
        // of the second-order terms is |D|²R + |D||T| ≈ (2e-5)²·6.4e6 + 2e-5·700 ≈ 1.6e-2 m here.
        Helmert h = Helmert.positionVector(LARGE);
        EcefPosition t = h.apply(P);
        double diff = h.signReversalDifference(t);
        assertThat(diff).isBetween(1e-3, 3e-2);
        assertThat(h.reversedBySignReversal().apply(t).distanceTo(P)).isCloseTo(diff, within(1e-6));
    }

    @Test
    void rigorousAndSmallAngleDifferBySecondOrderTerms() {
        // Source: r²R/2 estimate of the omitted terms (common practice); r = 10″ → ~3e-3 m... 1e-2 m.
        HelmertParameters big = HelmertParameters.of(0, 0, 0, 10, -10, 10, 0);
        Helmert small = Helmert.positionVector(big);
        Helmert rig = small.withForm(RotationForm.RIGOROUS);
        double d = small.apply(P).distanceTo(rig.apply(P));
        double r = 10 * Math.PI / 648000;
        assertThat(d).isBetween(0.1 * r * r * 6.4e6, 3 * r * r * 6.4e6);
        // The rigorous matrix is orthogonal: it preserves lengths exactly.
        assertThat(rig.apply(P).norm()).isCloseTo(P.norm(), within(1e-8));
    }

    @Test
    void rigorousSingleAxisRotationIsTheTextbookFrameRotation() {
        // Source: coordinate-frame rotation of the axes by θ about Z (IOGP GN 7-2, §4.3.3: axes rotate,
        // points stay): x' = x cos θ + y sin θ, y' = −x sin θ + y cos θ; position vector turns the point
        // the other way.
        double arcsec = 3600 * 30; // 30°: large enough that the small-angle form is visibly wrong
        double t = Math.toRadians(30);
        Helmert cf = Helmert.of(HelmertParameters.of(0, 0, 0, 0, 0, arcsec, 0), RotationConvention.COORDINATE_FRAME,
            RotationForm.RIGOROUS);
        EcefPosition q = cf.apply(P);
        assertThat(q.x()).isCloseTo(P.x() * Math.cos(t) + P.y() * Math.sin(t), within(1e-8));
        assertThat(q.y()).isCloseTo(-P.x() * Math.sin(t) + P.y() * Math.cos(t), within(1e-8));
        assertThat(q.z()).isCloseTo(P.z(), within(1e-8));
        EcefPosition pv = cf.inConvention(RotationConvention.POSITION_VECTOR).apply(P);
        assertThat(pv.distanceTo(q)).isLessThan(1e-8);
        EcefPosition back = Helmert.of(HelmertParameters.of(0, 0, 0, 0, 0, arcsec, 0),
            RotationConvention.POSITION_VECTOR, RotationForm.RIGOROUS).apply(q);
        assertThat(back.distanceTo(P)).isLessThan(1e-8);
    }

    @Test
    void timeDependentSignReversalIsFirstOrder() {
        TimeDependentHelmert t = TimeDependentHelmert.of(HelmertParameters.ofMillimetres(-84.68, -19.42, 32.01,
            -0.4254, 2.2578, 2.4015, 9.710), HelmertParameters.ofMillimetres(1.42, 1.34, 0.90, 1.5461, 1.1820,
            1.1551, 0.109), io.geotick.transforms.Epoch.of(1994.0), RotationConvention.COORDINATE_FRAME);
        io.geotick.transforms.Epoch e = io.geotick.transforms.Epoch.of(2013.9);
        EcefPosition g = t.apply(P, e);
        double d = t.reversedBySignReversal().apply(g, e).distanceTo(t.at(e).inverse().apply(g));
        assertThat(d).isBetween(1e-10, 1e-6);
    }

    @Test
    void arrayVariantMatchesSinglePointsAndWorksInPlace() {
        Helmert h = Helmert.coordinateFrame(LARGE);
        double[] buf = {P.x(), P.y(), P.z(), 1e6, 2e6, 3e6};
        double[] copy = buf.clone();
        h.apply(buf, 0, buf, 0, 2);
        EcefPosition a = h.apply(P);
        EcefPosition b = h.apply(EcefPosition.of(copy[3], copy[4], copy[5]));
        assertThat(buf).containsExactly(a.x(), a.y(), a.z(), b.x(), b.y(), b.z());
    }

    @Test
    void nanIsRejectedNamingThePoint() {
        Helmert h = Helmert.positionVector(LARGE);
        double[] buf = {1, 2, 3, 4, Double.NaN, 6};
        assertThatThrownBy(() -> h.apply(buf, 0, buf, 0, 2)).isInstanceOf(InvalidCoordinateException.class)
            .hasMessageContaining("point 1").hasMessageContaining("NaN");
        assertThatThrownBy(() -> HelmertParameters.of(0, 0, Double.NaN, 0, 0, 0, 0))
            .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("tz");
    }

    @Test
    void geocentricTranslationInverseIsExact() {
        GeocentricTranslation t = GeocentricTranslation.of(-87, -98, -121);
        assertThat(t.inverse().apply(t.apply(P)).distanceTo(P)).isLessThan(2e-9);
        assertThat(t.description()).contains("9603");
    }

    @Test
    void conventionParsing() {
        assertThat(RotationConvention.parse("position-vector")).isEqualTo(RotationConvention.POSITION_VECTOR);
        assertThat(RotationConvention.parse("9607")).isEqualTo(RotationConvention.COORDINATE_FRAME);
        assertThatThrownBy(() -> RotationConvention.parse("sideways")).hasMessageContaining("sideways");
    }
}
