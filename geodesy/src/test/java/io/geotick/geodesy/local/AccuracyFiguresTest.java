package io.geotick.geodesy.local;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import io.geotick.geodesy.InvalidCovarianceException;
import org.hipparchus.analysis.integration.IterativeLegendreGaussIntegrator;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.special.Erf;
import org.junit.jupiter.api.Test;

class AccuracyFiguresTest {

    private static RealMatrix m(double[][] d) {
        return MatrixUtils.createRealMatrix(d);
    }

    @Test
    void diagonalCaseByHand() {
        // σE = 3 m, σN = 4 m, σU = 2 m, uncorrelated. By hand: DRMS = 5, 2DRMS = 10, MRSE = √29,
        // ellipse 4 × 3 m with its major axis north (0°), vertical 95% = 1.959964 × 2.
        AccuracyFigures f = AccuracyFigures.fromEnuCovariance(m(new double[][] {{9, 0, 0}, {0, 16, 0}, {0, 0, 4}}));
        assertThat(f.sigmaEast()).isEqualTo(3.0);
        assertThat(f.sigmaNorth()).isEqualTo(4.0);
        assertThat(f.sigmaUp()).isEqualTo(2.0);
        assertThat(f.drms()).isEqualTo(5.0);
        assertThat(f.twoDrms()).isEqualTo(10.0);
        assertThat(f.mrse()).isCloseTo(Math.sqrt(29), within(1e-15));
        assertThat(f.semiMajorAxis()).isCloseTo(4.0, within(1e-14));
        assertThat(f.semiMinorAxis()).isCloseTo(3.0, within(1e-14));
        assertThat(f.semiMajorAxisAzimuth()).isCloseTo(0.0, within(1e-12));
        // Source: the two-sided 95% point of the normal distribution, 1.959964 (any statistics table).
        assertThat(f.vertical95()).isCloseTo(3.919928, within(1e-6));
        assertThat(AccuracyFigures.NORMAL_95).isEqualTo(Math.sqrt(2) * Erf.erfInv(0.95), within(1e-15));
        // East-dominant ellipse points east.
        AccuracyFigures g = AccuracyFigures.fromEnuCovariance(m(new double[][] {{16, 0, 0}, {0, 9, 0}, {0, 0, 1}}));
        assertThat(g.semiMajorAxisAzimuth()).isCloseTo(90.0, within(1e-12));
    }

    @Test
    void rotatedEllipseRecoversItsAxesAndOrientation() {
        double a = 5.0;
        double b = 2.0;
        for (double az = 0; az < 180; az += 7.5) {
            // Major axis along the unit vector (sin az, cos az) in (east, north).
            double se = Math.sin(Math.toRadians(az));
            double cn = Math.cos(Math.toRadians(az));
            double cee = a * a * se * se + b * b * cn * cn;
            double cnn = a * a * cn * cn + b * b * se * se;
            double cen = (a * a - b * b) * se * cn;
            AccuracyFigures f = AccuracyFigures.fromEnuCovariance(
                m(new double[][] {{cee, cen, 0.3}, {cen, cnn, -0.2}, {0.3, -0.2, 9}}));
            assertThat(f.semiMajorAxis()).isCloseTo(a, within(1e-13));
            assertThat(f.semiMinorAxis()).isCloseTo(b, within(1e-13));
            // Closed form for a 2×2 symmetric matrix: λ = (c_EE + c_NN)/2 ± √(((c_EE − c_NN)/2)² + c_EN²).
            double mean = (cee + cnn) / 2;
            double rad = Math.hypot((cee - cnn) / 2, cen);
            assertThat(f.semiMajorAxis() * f.semiMajorAxis()).isCloseTo(mean + rad, within(1e-12));
            assertThat(f.semiMinorAxis() * f.semiMinorAxis()).isCloseTo(mean - rad, within(1e-12));
            assertThat(f.semiMajorAxisAzimuth()).as("azimuth %s", az).isCloseTo(az, within(1e-10));
            // Rotation-invariant figures: DRMS² = σa² + σb² (the trace).
            assertThat(f.drms()).isCloseTo(Math.hypot(a, b), within(1e-14));
            assertThat(f.cep50()).isCloseTo(AccuracyFigures.circularErrorProbable50(a, b), within(1e-12));
        }
    }

    @Test
    void cepHasTheClosedFormsAtTheTwoExtremes() {
        // Circle: P(r) = 1 − exp(−r²/2σ²) → CEP = σ√(2 ln 2) = 1.1774σ. Line: CEP = √2 erf⁻¹(½) σ = 0.6745σ.
        AccuracyFigures circle = AccuracyFigures.fromEnuCovariance(m(new double[][] {{4, 0, 0}, {0, 4, 0}, {0, 0, 1}}));
        assertThat(circle.cep50()).isCloseTo(2 * 1.1774100225154747, within(1e-14));
        assertThat(circle.semiMajorAxisAzimuth()).isZero();
        assertThat(AccuracyFigures.circularErrorProbable50(1, 0)).isCloseTo(0.6744897501960817, within(1e-15));
        // Nearly circular and nearly flat ellipses (integration path) join the closed forms continuously.
        assertThat(AccuracyFigures.circularErrorProbable50(1, 1 - 1e-9)).isCloseTo(1.1774100225154747, within(1e-8));
        assertThat(AccuracyFigures.circularErrorProbable50(1, 1e-9)).isCloseTo(0.6744897501960817, within(1e-8));
    }

    /**
     * An independent route to the probability inside the CEP circle: P(r) = ∫_{−r}^{r} φ_a(x)·erf(√(r² − x²)
     * /(σb√2)) dx (the normal density in east times the probability of north fitting the chord), by
     * Gauss-Legendre quadrature. At r = CEP50 it must be one half.
     */
    @Test
    void probabilityInsideTheCepIsOneHalfByAnIndependentIntegral() {
        for (double k : new double[] {0.01, 0.1, 0.3, 0.5, 0.7, 0.9, 0.99}) {
            double sa = 2.5;
            double sb = k * sa;
            double r = AccuracyFigures.circularErrorProbable50(sa, sb);
            IterativeLegendreGaussIntegrator in = new IterativeLegendreGaussIntegrator(16, 1e-13, 1e-15);
            // Substitute x = r sin t to remove the square-root endpoint singularity.
            double p = in.integrate(1_000_000, t -> {
                double x = r * Math.sin(t);
                double chord = r * Math.cos(t);
                double density = Math.exp(-x * x / (2 * sa * sa)) / (sa * Math.sqrt(2 * Math.PI));
                return density * Erf.erf(chord / (sb * Math.sqrt(2))) * r * Math.cos(t);
            }, -Math.PI / 2, Math.PI / 2);
            assertThat(p).as("σb/σa = %s", k).isCloseTo(0.5, within(1e-11));
        }
    }

    @Test
    void theCommonRuleOfThumbIsWithinAFewPercentForRatiosAbovePointThree() {
        // Source: CEP ≈ 0.589(σa + σb) for σb/σa > 0.3 (van Diggelen, GPS World, January 2007; from memory).
        double worst = 0;
        for (double k = 0.3; k <= 1.0; k += 0.01) {
            double exact = AccuracyFigures.circularErrorProbable50(1, k);
            worst = Math.max(worst, Math.abs(0.589 * (1 + k) / exact - 1));
        }
        // Measured: at most 2.22% (near σb/σa = 0.35, 2.10% at 0.3), falling to 0.05% for a circle.
        assertThat(worst).isLessThan(0.023);
    }

    @Test
    void ellipseScaleForAProbability() {
        // Source: 2D normal, P(inside kσ ellipse) = 1 − exp(−k²/2) (any multivariate statistics text).
        assertThat(AccuracyFigures.ellipseScale(1 - Math.exp(-0.5))).isCloseTo(1.0, within(1e-15));
        assertThat(AccuracyFigures.ellipseScale(0.95)).isCloseTo(2.4477468, within(1e-7));
        assertThatThrownBy(() -> AccuracyFigures.ellipseScale(1.0)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> AccuracyFigures.ellipseScale(Double.NaN)).isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void singularCovariancesAreAccepted() {
        // A fixed height, and a perfectly correlated (rank-one) horizontal error.
        AccuracyFigures f = AccuracyFigures.fromEnuCovariance(m(new double[][] {{1, 1, 0}, {1, 1, 0}, {0, 0, 0}}));
        assertThat(f.sigmaUp()).isZero();
        assertThat(f.semiMinorAxis()).isLessThan(1e-7);
        assertThat(f.semiMajorAxis()).isCloseTo(Math.sqrt(2), within(1e-14));
        assertThat(f.semiMajorAxisAzimuth()).isCloseTo(45.0, within(1e-10));
        AccuracyFigures zero = AccuracyFigures.fromEnuCovariance(MatrixUtils.createRealMatrix(3, 3));
        assertThat(zero.cep50()).isZero();
        assertThat(zero.mrse()).isZero();
    }

    @Test
    void invalidMatricesAreRejectedWithTheReason() {
        assertThatThrownBy(() -> AccuracyFigures.fromEnuCovariance(m(new double[][] {{1, 0}, {0, 1}})))
            .isInstanceOf(InvalidCovarianceException.class).hasMessageContaining("3×3").hasMessageContaining("2×2");
        assertThatThrownBy(() -> AccuracyFigures.fromEnuCovariance(
            m(new double[][] {{1, 0, 0}, {0, Double.NaN, 0}, {0, 0, 1}})))
            .isInstanceOf(InvalidCovarianceException.class).hasMessageContaining("(north, north) = NaN");
        assertThatThrownBy(() -> AccuracyFigures.fromEnuCovariance(
            m(new double[][] {{1, 0.5, 0}, {0.4, 1, 0}, {0, 0, 1}})))
            .isInstanceOf(InvalidCovarianceException.class).hasMessageContaining("not symmetric")
            .hasMessageContaining("0.5").hasMessageContaining("0.4");
        assertThatThrownBy(() -> AccuracyFigures.fromEnuCovariance(
            m(new double[][] {{1, 2, 0}, {2, 1, 0}, {0, 0, 1}})))
            .isInstanceOf(InvalidCovarianceException.class).hasMessageContaining("positive semi-definite")
            .hasMessageContaining("eigenvalue -0.99999");
        assertThatThrownBy(() -> AccuracyFigures.fromEnuCovariance(
            m(new double[][] {{-1, 0, 0}, {0, 1, 0}, {0, 0, 1}})))
            .isInstanceOf(InvalidCovarianceException.class).hasMessageContaining("variance of east");
        assertThatThrownBy(() -> AccuracyFigures.fromEnuCovariance(null)).isInstanceOf(NullPointerException.class);
    }

    @Test
    void roundingAsymmetryIsToleratedAndSymmetrised() {
        double eps = 1e-14;
        AccuracyFigures f = AccuracyFigures.fromEnuCovariance(
            m(new double[][] {{4, 1 + eps, 0}, {1, 4, 0}, {0, 0, 1}}));
        RealMatrix c = f.enuCovariance();
        assertThat(c.getEntry(0, 1)).isEqualTo(c.getEntry(1, 0));
        assertThat(f).isEqualTo(AccuracyFigures.fromEnuCovariance(c)).hasSameHashCodeAs(AccuracyFigures.fromEnuCovariance(c));
        assertThat(f.toString()).contains("CEP50=");
    }
}
