package io.geotick.geodesy.ellipsoid;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import io.geotick.geodesy.InvalidCoordinateException;
import java.util.Random;
import org.hipparchus.analysis.integration.IterativeLegendreFieldGaussIntegrator;
import org.hipparchus.dfp.Dfp;
import org.hipparchus.dfp.DfpField;
import org.junit.jupiter.api.Test;

class EllipsoidTest {
    private static final Ellipsoid WGS84 = Ellipsoids.WGS84;

    @Test
    void derivedQuantitiesAreTheDefiningConstantsFormulasCorrectlyRounded() {
        // Source: the relations b = a(1 − f), e² = f(2 − f), e'² = e²/(1 − e²), n = f/(2 − f),
        // R₁ = (2a + b)/3 (IOGP Guidance Note 7-2, §1.2; Moritz 1980 for R₁), evaluated here in 40-digit
        // arithmetic from the defining a and 1/f, against which the doubles may differ by rounding only.
        DfpField field = new DfpField(40);
        for (Ellipsoid e : Ellipsoids.all()) {
            if (!e.isDefinedByInverseFlattening()) {
                continue;
            }
            Dfp a = field.newDfp(e.semiMajorAxis());
            Dfp f = field.getOne().divide(field.newDfp(e.inverseFlattening()));
            Dfp b = a.multiply(f.negate().add(1));
            Dfp e2 = f.multiply(f.negate().add(2));
            Dfp ep2 = e2.divide(e2.negate().add(1));
            Dfp n = f.divide(f.negate().add(2));
            Dfp r1 = a.multiply(2).add(b).divide(3);
            assertThat(e.semiMinorAxis()).as(e.name()).isCloseTo(b.toDouble(), within(Math.ulp(b.toDouble())));
            assertThat(e.eccentricitySquared()).as(e.name())
                .isCloseTo(e2.toDouble(), within(2 * Math.ulp(e2.toDouble())));
            assertThat(e.secondEccentricitySquared()).as(e.name())
                .isCloseTo(ep2.toDouble(), within(3 * Math.ulp(ep2.toDouble())));
            assertThat(e.thirdFlattening()).as(e.name())
                .isCloseTo(n.toDouble(), within(2 * Math.ulp(n.toDouble())));
            assertThat(e.meanRadius()).as(e.name()).isCloseTo(r1.toDouble(), within(2 * Math.ulp(r1.toDouble())));
        }
        // Axes-defined: f = (a − b)/a, checked the same way on Clarke 1866.
        Ellipsoid c = Ellipsoids.CLARKE_1866;
        Dfp a = field.newDfp(c.semiMajorAxis());
        Dfp f = a.subtract(field.newDfp(c.semiMinorAxis())).divide(a);
        assertThat(c.flattening()).isCloseTo(f.toDouble(), within(Math.ulp(f.toDouble())));
        assertThat(c.inverseFlattening()).isCloseTo(field.getOne().divide(f).toDouble(), within(1e-11));
    }

    @Test
    void radiiOfCurvatureAtTheEquatorAndThePole() {
        // Source: M(0) = a(1 − e²) = b²/a, N(0) = a, M(90°) = N(90°) = a²/b (any geodesy text).
        double a = WGS84.semiMajorAxis();
        double b = WGS84.semiMinorAxis();
        assertThat(WGS84.primeVerticalRadius(0)).isEqualTo(a);
        assertThat(WGS84.meridianRadius(0)).isCloseTo(b * b / a, within(1e-8));
        assertThat(WGS84.meridianRadius(90)).isCloseTo(a * a / b, within(1e-8));
        assertThat(WGS84.primeVerticalRadius(90)).isCloseTo(a * a / b, within(1e-8));
        assertThat(WGS84.meridianRadius(-90)).isEqualTo(WGS84.meridianRadius(90));
        // Mean radius of WGS 84: 6 371 008.771 m (NGA.STND.0036 table 3.5 value, from memory).
        assertThat(WGS84.meanRadius()).isCloseTo(6371008.7714, within(1e-4));
    }

    @Test
    void aSphereHasEqualRadiiEverywhere() {
        Ellipsoid s = Ellipsoid.sphere("test sphere", 1000.0, "invented for the test");
        assertThat(s.inverseFlattening()).isInfinite();
        assertThat(s.eccentricitySquared()).isZero();
        assertThat(s.meridianRadius(37)).isEqualTo(1000.0);
        assertThat(s.primeVerticalRadius(37)).isEqualTo(1000.0);
        assertThat(s.meridianArc(90)).isCloseTo(500 * Math.PI, within(1e-12));
    }

    /**
     * The meridian arc series against ∫₀^φ M(φ') dφ' by Gauss-Legendre quadrature carried out in 40-digit
     * arithmetic (Hipparchus {@link IterativeLegendreFieldGaussIntegrator} over {@link Dfp}), so that the
     * reference itself is exact to far below a nanometre.
     */
    @Test
    void meridianArcAgreesWithNumericalQuadratureToANanometre() {
        DfpField field = new DfpField(40);
        // One integrator for all: it caches its 40-digit Gauss-Legendre nodes, the slow part. Successive
        // refinements must agree to 1e-21 relative (1e-14 m), far below the nanometre checked.
        IterativeLegendreFieldGaussIntegrator<Dfp> integrator =
            new IterativeLegendreFieldGaussIntegrator<>(field, 12, 1e-21, 1e-14, 1, 64);
        for (Ellipsoid e : new Ellipsoid[] {Ellipsoids.WGS84, Ellipsoids.CLARKE_1880_RGS}) {
            Dfp a = field.newDfp(e.semiMajorAxis());
            Dfp f = field.newDfp(e.semiMinorAxis()).divide(a).negate().add(1);
            if (e.isDefinedByInverseFlattening()) {
                f = field.getOne().divide(field.newDfp(e.inverseFlattening()));
            }
            Dfp e2 = f.multiply(f.negate().add(2));
            Dfp m0 = a.multiply(e2.negate().add(1));
            for (double lat : new double[] {-90, -30, -1e-3, 0, 1e-6, 45, 60, 89.99, 90}) {
                Dfp phi = field.newDfp(lat).multiply(field.getPi()).divide(180);
                // M is even in φ, so the arc to a negative latitude is minus the arc to |φ|.
                Dfp arc = lat == 0 ? field.getZero() : integrator.integrate(100_000, x -> {
                    Dfp s = x.sin();
                    Dfp w2 = e2.multiply(s).multiply(s).negate().add(1);
                    return m0.divide(w2.multiply(w2.sqrt()));
                }, field.getZero(), phi.abs());
                if (lat < 0) {
                    arc = arc.negate();
                }
                double series = e.meridianArc(lat);
                double err = Math.abs(series - arc.toDouble());
                // 1 nm of series truncation plus the final rounding of a ~1e7 m double (0.5 ulp = 0.9 nm).
                assertThat(err).as("%s at %s°", e.name(), lat).isLessThanOrEqualTo(1e-9 + Math.ulp(series));
            }
        }
    }

    @Test
    void meridianQuadrantEqualsRectifyingRadiusTimesHalfPi() {
        // Source: definition of the rectifying radius A (Karney 2011, J. Geodesy 85, eq. 14).
        assertThat(WGS84.meridianArc(90)).isCloseTo(WGS84.rectifyingRadius() * Math.PI / 2, within(2e-9));
        // WGS 84 meridian quadrant 10 001 965.729 m (common practice, from memory).
        assertThat(WGS84.meridianArc(90)).isCloseTo(10001965.729, within(1e-3));
        assertThat(WGS84.meridianArc(-35)).isEqualTo(-WGS84.meridianArc(35));
    }

    @Test
    void latitudeConversionsRoundTripAndAgreeWithEachOther() {
        Random rnd = new Random(20240601L);
        double oneMinusF = 1 - WGS84.flattening();
        for (int i = 0; i < 2000; i++) {
            double phi = -90 + 180 * rnd.nextDouble();
            double psi = WGS84.geocentricLatitude(phi);
            double beta = WGS84.parametricLatitude(phi);
            assertThat(WGS84.geodeticLatitudeFromGeocentric(psi)).isCloseTo(phi, within(3 * Math.ulp(90.0)));
            assertThat(WGS84.geodeticLatitudeFromParametric(beta)).isCloseTo(phi, within(3 * Math.ulp(90.0)));
            // |ψ| ≤ |β| ≤ |φ|, and tan ψ = (1 − f) tan β (since 1 − e² = (1 − f)²).
            assertThat(Math.abs(psi)).isLessThanOrEqualTo(Math.abs(beta));
            assertThat(Math.abs(beta)).isLessThanOrEqualTo(Math.abs(phi));
            if (Math.abs(phi) < 89) { // relative check; tan grows fast near the poles
                double tanPsi = Math.tan(Math.toRadians(psi));
                double expected = oneMinusF * Math.tan(Math.toRadians(beta));
                assertThat(Math.abs(tanPsi - expected)).isLessThanOrEqualTo(5e-14 * Math.abs(expected));
            }
        }
        assertThat(WGS84.geocentricLatitude(0)).isEqualTo(0.0);
        assertThat(WGS84.geocentricLatitude(90)).isEqualTo(90.0);
        assertThat(WGS84.parametricLatitude(-90)).isEqualTo(-90.0);
        // Largest geodetic − geocentric difference, near 45°: about 11.5 arc-minutes on WGS 84 (common practice, from memory).
        assertThat((45 - WGS84.geocentricLatitude(45)) * 60).isCloseTo(11.5, within(0.05));
    }

    @Test
    void badArgumentsAreRejectedWithTheValue() {
        assertThatThrownBy(() -> WGS84.meridianRadius(90.5)).isInstanceOf(InvalidCoordinateException.class)
            .hasMessageContaining("90.5");
        assertThatThrownBy(() -> WGS84.meridianArc(Double.NaN)).isInstanceOf(InvalidCoordinateException.class)
            .hasMessageContaining("NaN");
        assertThatThrownBy(() -> Ellipsoid.ofInverseFlattening("x", 6e6, 0.5, "s"))
            .isInstanceOf(InvalidCoordinateException.class).hasMessageContaining("0.5");
        assertThatThrownBy(() -> Ellipsoid.ofInverseFlattening("x", Double.POSITIVE_INFINITY, 300, "s"))
            .isInstanceOf(InvalidCoordinateException.class).hasMessageContaining("Infinity");
        assertThatThrownBy(() -> Ellipsoid.ofSemiAxes("x", 6e6, 6.1e6, "s"))
            .isInstanceOf(InvalidCoordinateException.class).hasMessageContaining("6100000.0");
        assertThatThrownBy(() -> Ellipsoid.ofSemiAxes("x", 6e6, -1, "s"))
            .isInstanceOf(InvalidCoordinateException.class);
        assertThatThrownBy(() -> Ellipsoid.ofSemiAxes("x", 6e6, 1e-12, "s"))
            .isInstanceOf(InvalidCoordinateException.class).hasMessageContaining("too small");
        assertThatThrownBy(() -> Ellipsoid.ofSemiAxes(null, 6e6, 6e6, "s")).isInstanceOf(NullPointerException.class);
        assertThatThrownBy(() -> Ellipsoid.ofSemiAxes(" ", 6e6, 6e6, "s"))
            .isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void equalityIsByNameAndDefiningConstants() {
        Ellipsoid copy = Ellipsoid.ofInverseFlattening("WGS 84", 6378137.0, 298.257223563, "another source");
        assertThat(copy).isEqualTo(WGS84).hasSameHashCodeAs(WGS84);
        assertThat(Ellipsoid.ofInverseFlattening("other", 6378137.0, 298.257223563, "s")).isNotEqualTo(WGS84);
        assertThat(WGS84.toString()).contains("6378137.0").contains("298.257223563");
    }
}
