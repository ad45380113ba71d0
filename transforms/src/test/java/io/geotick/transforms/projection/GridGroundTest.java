package io.geotick.transforms.projection;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import io.geotick.geodesy.ellipsoid.Ellipsoids;
import io.geotick.geodesy.position.GeodeticPosition;
import org.junit.jupiter.api.Test;

/** Grid ↔ ground factors (common practice, e.g. state-plane and UTM survey reductions). */
class GridGroundTest {

    @Test
    void gaussianMeanRadiusIsTheGeometricMeanOfTheCurvatures() {
        // Source: common practice — R = √(MN); at the equator M = a(1 − e²), N = a, so R = a√(1 − e²) = b²/a·…
        double a = Ellipsoids.WGS84.semiMajorAxis();
        double e2 = Ellipsoids.WGS84.eccentricitySquared();
        assertThat(GridGround.gaussianMeanRadius(Ellipsoids.WGS84, 0)).isCloseTo(a * Math.sqrt(1 - e2),
            within(1e-6));
        // At the pole M = N = a/√(1 − e²).
        assertThat(GridGround.gaussianMeanRadius(Ellipsoids.WGS84, 90)).isCloseTo(a / Math.sqrt(1 - e2),
            within(1e-6));
    }

    @Test
    void elevationAndCombinedFactor() {
        // Source: common practice — elevation factor R/(R + h): about 1 − h/6 371 km (157 ppm per km).
        double ef = GridGround.elevationFactor(Ellipsoids.WGS84, 45, 1000);
        double r = GridGround.gaussianMeanRadius(Ellipsoids.WGS84, 45);
        assertThat(ef).isCloseTo(r / (r + 1000), within(1e-15));
        assertThat((1 - ef) * 1e6).isCloseTo(157, within(1.0));
        Utm z = Utm.zone(31, Hemisphere.NORTH);
        GeodeticPosition p = GeodeticPosition.of(45, 3, 1000);
        // On the central meridian the point scale is k0 = 0.9996.
        assertThat(GridGround.combinedFactor(z, p)).isCloseTo(0.9996 * ef, within(1e-15));
        double ground = 1000.0;
        double grid = GridGround.gridDistance(ground, GridGround.combinedFactor(z, p));
        assertThat(GridGround.groundDistance(grid, GridGround.combinedFactor(z, p))).isCloseTo(ground,
            within(1e-12));
        assertThatThrownBy(() -> GridGround.elevationFactor(Ellipsoids.WGS84, 45, Double.NaN))
            .hasMessageContaining("height NaN");
        assertThatThrownBy(() -> GridGround.groundDistance(-1, 1)).hasMessageContaining("grid distance -1.0");
        assertThatThrownBy(() -> GridGround.groundDistance(1, 0)).hasMessageContaining("factor 0.0");
    }

    @Test
    void groundDistanceOfALineMatchesTheEllipsoidalDistanceScaledToHeight() {
        // Source: common practice — for a short line, ground distance ≈ ellipsoidal distance × (R + h)/R.
        // The ellipsoidal distance of an east-west 0.01° line at 45°N is checked by the arc on the
        // parallel ν cos φ Δλ (the geodesic differs from it by ~1e-10 relative at this length).
        Utm z = Utm.zone(31, Hemisphere.NORTH);
        double h = 500;
        GeodeticPosition a = GeodeticPosition.of(45, 5.0, h);
        GeodeticPosition b = GeodeticPosition.of(45, 5.01, h);
        double nu = Ellipsoids.WGS84.primeVerticalRadius(45);
        double ellipsoidal = nu * Math.cos(Math.toRadians(45)) * Math.toRadians(0.01);
        double r = GridGround.gaussianMeanRadius(Ellipsoids.WGS84, 45);
        double expectedGround = ellipsoidal * (r + h) / r;
        assertThat(GridGround.groundDistance(z, a, b)).isCloseTo(expectedGround, within(1e-6));
        assertThat(GridGround.gridDistance(z, a, b)).isGreaterThan(ellipsoidal * 0.9996);
    }
}
