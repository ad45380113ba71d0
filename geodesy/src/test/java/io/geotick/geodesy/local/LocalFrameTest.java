package io.geotick.geodesy.local;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import io.geotick.geodesy.InvalidCoordinateException;
import io.geotick.geodesy.InvalidCovarianceException;
import io.geotick.geodesy.ecef.EcefConverter;
import io.geotick.geodesy.ellipsoid.Ellipsoids;
import io.geotick.geodesy.position.EcefPosition;
import io.geotick.geodesy.position.GeodeticPosition;
import java.util.Random;
import org.hipparchus.geometry.euclidean.threed.Vector3D;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.RealMatrix;
import org.junit.jupiter.api.Test;

class LocalFrameTest {
    private static final EcefConverter WGS84 = EcefConverter.of(Ellipsoids.WGS84);
    // Invented origin for the tests (no real site).
    private static final LocalFrame FRAME = LocalFrame.at(GeodeticPosition.of(47.25, -122.5, 85.0), Ellipsoids.WGS84);

    private static LocalFrame randomFrame(Random rnd) {
        return LocalFrame.at(GeodeticPosition.of(-90 + 180 * rnd.nextDouble(), -180 + 360 * rnd.nextDouble(),
            -500 + 9000 * rnd.nextDouble()), Ellipsoids.WGS84);
    }

    private static EcefPosition randomPoint(Random rnd) {
        double s = 3e7;
        return EcefPosition.of(s * (2 * rnd.nextDouble() - 1), s * (2 * rnd.nextDouble() - 1), s * (2 * rnd.nextDouble() - 1));
    }

    private static double ulps(EcefPosition p) {
        return Math.ulp(Math.max(Math.abs(p.x()), Math.max(Math.abs(p.y()), Math.abs(p.z()))));
    }

    @Test
    void enuEcefRoundTripIsExactToAFewUlps() {
        Random rnd = new Random(11L);
        for (int i = 0; i < 5000; i++) {
            LocalFrame f = randomFrame(rnd);
            EcefPosition p = randomPoint(rnd);
            EcefPosition back = f.toEcef(f.toEnu(p));
            // Translation, rotation, transposed rotation, translation back: each coordinate within a few
            // ulps of the largest quantity involved (the coordinates or the offset from the origin).
            double tol = 4 * Math.max(Math.max(ulps(p), ulps(f.originEcef())), Math.ulp(p.distanceTo(f.originEcef())));
            assertThat(back.distanceTo(p)).isLessThanOrEqualTo(tol);
            // The distance from the origin is preserved (a rigid motion).
            Enu v = f.toEnu(p);
            double norm = Math.sqrt(v.east() * v.east() + v.north() * v.north() + v.up() * v.up());
            assertThat(norm).isCloseTo(p.distanceTo(f.originEcef()), within(tol));
        }
    }

    @Test
    void upIsTheEllipsoidNormalAndNorthPointsToThePole() {
        // 100 m straight up the normal of the origin is (0, 0, 100) in ENU.
        GeodeticPosition o = FRAME.originGeodetic();
        Enu up = FRAME.toEnu(o.withHeight(o.height() + 100));
        assertThat(up.east()).isCloseTo(0, within(1e-9));
        assertThat(up.north()).isCloseTo(0, within(1e-9));
        assertThat(up.up()).isCloseTo(100, within(1e-9));
        // The north pole lies due north (azimuth 0), above or below the horizon.
        Aer pole = FRAME.toAer(EcefPosition.of(0, 0, 6356752.314245));
        assertThat(pole.azimuth()).isCloseTo(0, within(1e-9));
        // A point 1 km west along the parallel has azimuth ≈ 270°.
        Aer west = FRAME.toAer(GeodeticPosition.of(o.latitude(), o.longitude() - 0.0132, o.height()));
        assertThat(west.azimuth()).isCloseTo(270, within(0.01));
    }

    @Test
    void rotationIsOrthonormalWithDeterminantOne() {
        RealMatrix r = FRAME.rotationToEnu();
        RealMatrix i = r.multiplyTransposed(r);
        for (int a = 0; a < 3; a++) {
            for (int b = 0; b < 3; b++) {
                assertThat(i.getEntry(a, b)).isCloseTo(a == b ? 1 : 0, within(3e-16));
            }
        }
        assertThat(MatrixUtils.createRealMatrix(r.getData()).getTrace()).isFinite();
        assertThat(new org.hipparchus.linear.LUDecomposition(r).getDeterminant()).isCloseTo(1, within(1e-15));
    }

    @Test
    void aerAzimuthIsInZeroTo360AndFollowsTheCompass() {
        assertThat(Aer.fromEnu(Enu.of(0, 10, 0)).azimuth()).isEqualTo(0.0);
        assertThat(Aer.fromEnu(Enu.of(10, 0, 0)).azimuth()).isEqualTo(90.0);
        assertThat(Aer.fromEnu(Enu.of(0, -10, 0)).azimuth()).isEqualTo(180.0);
        assertThat(Aer.fromEnu(Enu.of(-10, 0, 0)).azimuth()).isEqualTo(270.0);
        assertThat(Aer.fromEnu(Enu.of(10, 10, 0)).azimuth()).isEqualTo(45.0);
        Aer zenith = Aer.fromEnu(Enu.of(0, 0, 5));
        assertThat(zenith.azimuth()).isEqualTo(0.0);
        assertThat(zenith.elevation()).isEqualTo(90.0);
        assertThat(zenith.range()).isEqualTo(5.0);
        assertThat(Aer.fromEnu(Enu.of(0, 0, -5)).elevation()).isEqualTo(-90.0);
        assertThat(Aer.fromEnu(Enu.of(0, 0, 0)).range()).isZero();
        // Just west of north: −tiny + 360 must not round to 360, and no negative zero.
        assertThat(Aer.fromEnu(Enu.of(-1e-300, 1, 0)).azimuth()).isGreaterThanOrEqualTo(0).isLessThan(360);
        assertThat(Double.doubleToRawLongBits(Aer.fromEnu(Enu.of(-0.0, 1, 0)).azimuth())).isZero();
        Random rnd = new Random(3L);
        for (int i = 0; i < 20000; i++) {
            double s = Math.pow(10, -6 + 14 * rnd.nextDouble());
            Enu v = Enu.of(s * (2 * rnd.nextDouble() - 1), s * (2 * rnd.nextDouble() - 1), s * (2 * rnd.nextDouble() - 1));
            Aer a = Aer.fromEnu(v);
            assertThat(a.azimuth()).isGreaterThanOrEqualTo(0).isLessThan(360);
            assertThat(a.elevation()).isBetween(-90.0, 90.0);
            Enu back = a.toEnu();
            // A few ulps of the range, plus what the resolution of the angles in degrees allows
            // (ulp(270°) is 1e-15 rad, i.e. up to 9 ulps of the range).
            double tol = 2 * Math.ulp(a.range())
                + a.range() * Math.toRadians(Math.ulp(a.azimuth()) + Math.ulp(a.elevation()));
            assertThat(back.east()).isCloseTo(v.east(), within(tol));
            assertThat(back.north()).isCloseTo(v.north(), within(tol));
            assertThat(back.up()).isCloseTo(v.up(), within(tol));
        }
        assertThatThrownBy(() -> Aer.of(360, 0, 1)).isInstanceOf(InvalidCoordinateException.class)
            .hasMessageContaining("azimuth 360.0");
        assertThatThrownBy(() -> Aer.of(0, 91, 1)).isInstanceOf(InvalidCoordinateException.class);
        assertThatThrownBy(() -> Aer.of(0, 0, -1)).isInstanceOf(InvalidCoordinateException.class);
        assertThatThrownBy(() -> Aer.of(Double.NaN, 0, 1)).isInstanceOf(InvalidCoordinateException.class);
    }

    @Test
    void nedIsEnuWithAxesSwappedAndUpNegated() {
        Random rnd = new Random(5L);
        for (int i = 0; i < 1000; i++) {
            LocalFrame f = randomFrame(rnd);
            EcefPosition p = randomPoint(rnd);
            Enu e = f.toEnu(p);
            Ned n = f.toNed(p);
            assertThat(n.north()).isEqualTo(e.north());
            assertThat(n.east()).isEqualTo(e.east());
            assertThat(n.down()).isEqualTo(-e.up());
            assertThat(f.toEcef(n)).isEqualTo(f.toEcef(e));
            assertThat(n.toEnu()).isEqualTo(e);
        }
    }

    @Test
    void geodeticAndLocalConvertBothWays() {
        GeodeticPosition p = GeodeticPosition.of(47.3, -122.4, 250.0);
        Enu e = FRAME.toEnu(p);
        assertThat(FRAME.toNed(p)).isEqualTo(e.toNed());
        assertThat(FRAME.toAer(p)).isEqualTo(Aer.fromEnu(e));
        for (GeodeticPosition g : new GeodeticPosition[] {FRAME.toGeodetic(e), FRAME.toGeodetic(e.toNed()),
            FRAME.toGeodetic(Aer.fromEnu(e))}) {
            assertThat(g.latitude()).isCloseTo(p.latitude(), within(1e-12));
            assertThat(g.longitude()).isCloseTo(p.longitude(), within(1e-12));
            assertThat(g.height()).isCloseTo(p.height(), within(1e-8));
        }
    }

    @Test
    void aFrameAboutAnEcefOriginMatchesTheGeodeticOne() {
        LocalFrame f = LocalFrame.at(FRAME.originEcef(), Ellipsoids.WGS84);
        assertThat(f.originGeodetic().latitude()).isCloseTo(47.25, within(1e-13));
        RealMatrix a = f.rotationToEnu();
        RealMatrix b = FRAME.rotationToEnu();
        assertThat(a.subtract(b).getNorm1()).isLessThan(1e-15);
        assertThatThrownBy(() -> LocalFrame.at(EcefPosition.of(1, 2, 3), Ellipsoids.WGS84))
            .isInstanceOf(InvalidCoordinateException.class).hasMessageContaining("evolute");
        assertThatThrownBy(() -> LocalFrame.at((GeodeticPosition) null, Ellipsoids.WGS84))
            .isInstanceOf(NullPointerException.class);
        assertThat(FRAME.toString()).contains("WGS 84");
    }

    @Test
    void velocityRotationPreservesTheNormAndInverts() {
        Random rnd = new Random(9L);
        for (int i = 0; i < 5000; i++) {
            LocalFrame f = randomFrame(rnd);
            Vector3D v = new Vector3D(8000 * (2 * rnd.nextDouble() - 1), 8000 * (2 * rnd.nextDouble() - 1),
                8000 * (2 * rnd.nextDouble() - 1));
            Vector3D enu = f.rotateToEnu(v);
            assertThat(enu.getNorm()).isCloseTo(v.getNorm(), within(4 * Math.ulp(v.getNorm())));
            assertThat(f.rotateToEcef(enu).distance(v)).isLessThanOrEqualTo(4 * Math.ulp(v.getNorm()));
        }
        assertThatThrownBy(() -> FRAME.rotateToEnu(Vector3D.NaN)).isInstanceOf(InvalidCoordinateException.class)
            .hasMessageContaining("NaN");
        assertThatThrownBy(() -> FRAME.rotateToEcef(new Vector3D(1, Double.POSITIVE_INFINITY, 0)))
            .isInstanceOf(InvalidCoordinateException.class);
    }

    private static RealMatrix randomCovariance(Random rnd) {
        RealMatrix a = MatrixUtils.createRealMatrix(3, 3);
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                a.setEntry(i, j, 2 * rnd.nextDouble() - 1);
            }
        }
        return a.multiplyTransposed(a); // A Aᵀ is symmetric positive semi-definite
    }

    @Test
    void covarianceRotationRoundTripsAndKeepsTheTrace() {
        Random rnd = new Random(13L);
        for (int i = 0; i < 2000; i++) {
            LocalFrame f = randomFrame(rnd);
            RealMatrix c = randomCovariance(rnd);
            RealMatrix enu = f.covarianceToEnu(c);
            RealMatrix back = f.covarianceToEcef(enu);
            double scale = c.getNorm1();
            for (int a = 0; a < 3; a++) {
                for (int b = 0; b < 3; b++) {
                    assertThat(back.getEntry(a, b)).isCloseTo(c.getEntry(a, b), within(1e-14 * scale));
                    assertThat(enu.getEntry(a, b)).isEqualTo(enu.getEntry(b, a)); // exactly symmetric
                }
            }
            // Trace (total variance) and determinant are invariant under a rotation.
            assertThat(enu.getTrace()).isCloseTo(c.getTrace(), within(1e-14 * scale));
            assertThat(new org.hipparchus.linear.LUDecomposition(enu).getDeterminant())
                .isCloseTo(new org.hipparchus.linear.LUDecomposition(c).getDeterminant(), within(1e-13 * scale * scale * scale));
            // And the ENU covariance is R C Rᵀ entry by entry.
            RealMatrix r = f.rotationToEnu();
            assertThat(enu.subtract(r.multiply(c).multiply(r.transpose())).getNorm1()).isLessThan(1e-14 * scale);
        }
    }

    @Test
    void accuracyOfTakesAnEcefCovariance() {
        // An ENU covariance of σE = 1, σN = 2, σU = 3 m taken to ECEF and back through accuracyOf.
        RealMatrix enu = MatrixUtils.createRealDiagonalMatrix(new double[] {1, 4, 9});
        RealMatrix ecef = FRAME.covarianceToEcef(enu);
        AccuracyFigures a = FRAME.accuracyOf(ecef);
        assertThat(a.sigmaEast()).isCloseTo(1, within(1e-14));
        assertThat(a.sigmaNorth()).isCloseTo(2, within(1e-14));
        assertThat(a.sigmaUp()).isCloseTo(3, within(1e-14));
        assertThat(a.mrse()).isCloseTo(Math.sqrt(14), within(1e-14));
        assertThat(a).isEqualTo(AccuracyFigures.fromEnuCovariance(FRAME.covarianceToEnu(ecef)));
    }

    @Test
    void covarianceRotationRejectsWhatIsNotACovariance() {
        assertThatThrownBy(() -> FRAME.covarianceToEnu(MatrixUtils.createRealMatrix(new double[][] {{1, 2, 0}, {2, 1, 0}, {0, 0, 1}})))
            .isInstanceOf(InvalidCovarianceException.class).hasMessageContaining("positive semi-definite");
        assertThatThrownBy(() -> FRAME.covarianceToEcef(MatrixUtils.createRealMatrix(new double[][] {{1, 0, 0}, {0, 1, 0}, {0, 0, Double.NaN}})))
            .isInstanceOf(InvalidCovarianceException.class).hasMessageContaining("(up, up) = NaN");
        assertThatThrownBy(() -> FRAME.accuracyOf(MatrixUtils.createRealMatrix(4, 4)))
            .isInstanceOf(InvalidCovarianceException.class).hasMessageContaining("4×4");
        assertThatThrownBy(() -> FRAME.covarianceToEnu(MatrixUtils.createRealMatrix(new double[][] {{1, 0, 3}, {0, 1, 0}, {0, 0, 1}})))
            .isInstanceOf(InvalidCovarianceException.class).hasMessageContaining("(x, z)");
    }
}
