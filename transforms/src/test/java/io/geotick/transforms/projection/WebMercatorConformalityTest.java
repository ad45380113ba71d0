package io.geotick.transforms.projection;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import io.geotick.geodesy.ellipsoid.Ellipsoids;
import org.junit.jupiter.api.Test;

/** The stated non-conformality of Pseudo-Mercator on WGS 84. */
class WebMercatorConformalityTest {

    @Test
    void meridianAndParallelScalesDifferBy0point674PercentAtTheEquator() {
        // Source: IOGP Guidance Note 7-2 remark (the method is not conformal) and the ratio
        // h/k = ν/M = (1 − e² sin²φ)/(1 − e²), whose maximum e'² = 0.0067395 for WGS 84 (NGA.STND.0036).
        WebMercator w = WebMercator.wgs84();
        double ratio = w.meridianScale(0) / w.parallelScale(0);
        assertThat(ratio - 1).isCloseTo(Ellipsoids.WGS84.secondEccentricitySquared(), within(1e-15));
        assertThat((ratio - 1) * 100).isCloseTo(0.674, within(0.0005));
        assertThat(w.meridianScale(60) / w.parallelScale(60) - 1).isCloseTo(0.0067395 / 4, within(1e-6));
        assertThat(w.meridianScale(89.9) / w.parallelScale(89.9) - 1).isLessThan(1e-7);
    }

    @Test
    void aDirectionAt45DegreesIsTurnedByAbout0point19Degrees() {
        // Source: geometry of a non-conformal map with scales h (north) and k (east): a line of azimuth α
        // has grid bearing atan(k sin α/(h cos α)); at α = 45° on the equator: atan(1/1.0067395).
        WebMercator w = WebMercator.wgs84();
        double lat = 0;
        double d = 1e-4;
        GridPosition o = w.project(lat, 0);
        // A short line at azimuth 45°: equal ground steps north and east.
        double m = Ellipsoids.WGS84.meridianRadius(lat);
        double nu = Ellipsoids.WGS84.primeVerticalRadius(lat);
        GridPosition p = w.project(lat + d, d * m / nu);
        double bearing = Math.toDegrees(Math.atan2(p.easting() - o.easting(), p.northing() - o.northing()));
        assertThat(45 - bearing).isCloseTo(0.193, within(0.001));
        assertThat(w.project(30, 10).convergence()).isZero();
    }
}
