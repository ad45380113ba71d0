package io.geotick.transforms.epsg;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import io.geotick.geodesy.ellipsoid.Ellipsoids;
import io.geotick.geodesy.position.GeodeticPosition;
import io.geotick.transforms.projection.GridPosition;
import io.geotick.transforms.projection.MapProjection;
import io.geotick.transforms.projection.ProjectionDomainException;
import io.geotick.transforms.projection.TransverseMercator;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import org.junit.jupiter.api.Test;

/** An {@link EpsgSystem} keeps its projection in its unit; the wrapper's conversions and errors. */
class EpsgSystemUnitTest {
    // An invented grid for the wrapper's mechanics: TM on GRS 1980, CM 81°W, k0 0.9999, FE 200 000 m.
    private static final TransverseMercator TM = TransverseMercator.of(Ellipsoids.GRS80, -81, 0.9999, 200000, 0, 24);
    private static final ProjectionMethod METHOD = new ProjectionMethod("test", OptionalInt.empty(), List.of(), "test",
        0, List.of(), true);

    private static EpsgSystem system(MapProjection p, LinearUnit u) {
        return new EpsgSystem(1, EpsgSystem.Kind.PROJECTED, Ellipsoids.GRS80, "test", Optional.empty(), Optional.of(p),
            Optional.of(METHOD), u, List.of());
    }

    @Test
    void theProjectionIsInTheSystemsUnitAndTheMetricOneStaysAvailable() {
        EpsgSystem s = system(TM, LinearUnit.US_SURVEY_FOOT);
        MapProjection ft = s.projection().orElseThrow();
        assertThat(s.metricProjection()).containsSame(TM);
        GridPosition m = TM.project(27, -80.5);
        GridPosition f = ft.project(27, -80.5);
        assertThat(f.easting()).isEqualTo(LinearUnit.US_SURVEY_FOOT.fromMetres(m.easting()));
        assertThat(f.northing()).isEqualTo(LinearUnit.US_SURVEY_FOOT.fromMetres(m.northing()));
        assertThat(f.scale()).isEqualTo(m.scale());
        assertThat(f.convergence()).isEqualTo(m.convergence());
        GeodeticPosition back = ft.unproject(f.easting(), f.northing());
        assertThat(back).isEqualTo(TM.unproject(LinearUnit.US_SURVEY_FOOT.toMetres(f.easting()),
            LinearUnit.US_SURVEY_FOOT.toMetres(f.northing())));
        assertThat(ft.ellipsoid()).isEqualTo(Ellipsoids.GRS80);
        // A metre system keeps the projection object itself; re-wrapping in the same unit changes nothing.
        assertThat(system(TM, LinearUnit.METRE).projection()).containsSame(TM);
        assertThat(system(ft, LinearUnit.US_SURVEY_FOOT).projection()).containsSame(ft);
    }

    @Test
    void mismatchedUnitsAreRefused() {
        MapProjection ft = system(TM, LinearUnit.US_SURVEY_FOOT).projection().orElseThrow();
        assertThatThrownBy(() -> system(ft, LinearUnit.INTERNATIONAL_FOOT)).isInstanceOf(IllegalArgumentException.class)
            .hasMessageContaining("ftUS").hasMessageContaining("not ft");
        assertThatThrownBy(() -> new EpsgSystem(2, EpsgSystem.Kind.GEOGRAPHIC, Ellipsoids.GRS80, "test",
            Optional.empty(), Optional.empty(), Optional.empty(), LinearUnit.INTERNATIONAL_FOOT, List.of()))
            .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("EPSG:2");
    }

    @Test
    void arrayVariantsAreTheSinglePointValuesAndNameTheBadPoint() {
        MapProjection ft = system(TM, LinearUnit.INTERNATIONAL_FOOT).projection().orElseThrow();
        double[] src = {27, -80.5, 25.5, -81.7, 29, -79};
        double[] dst = new double[8];
        ft.project(src, 0, dst, 2, 3);
        for (int i = 0; i < 3; i++) {
            GridPosition g = ft.project(src[2 * i], src[2 * i + 1]);
            assertThat(dst[2 + 2 * i]).isEqualTo(g.easting());
            assertThat(dst[3 + 2 * i]).isEqualTo(g.northing());
        }
        double[] grid = dst.clone();
        ft.unproject(dst, 2, dst, 2, 3);
        for (int i = 0; i < 3; i++) {
            GeodeticPosition g = ft.unproject(grid[2 + 2 * i], grid[3 + 2 * i]);
            assertThat(dst[2 + 2 * i]).isEqualTo(g.latitude());
            assertThat(dst[3 + 2 * i]).isEqualTo(g.longitude());
        }
        double[] bad = {grid[2], grid[3], grid[4], Double.POSITIVE_INFINITY};
        assertThatThrownBy(() -> ft.unproject(bad, 0, new double[4], 0, 2)).isInstanceOf(ProjectionDomainException.class)
            .hasMessageStartingWith("point 1: northing Infinity ft");
        double[] far = {27, -80.5, 27, 100};
        assertThatThrownBy(() -> ft.project(far, 0, new double[4], 0, 2)).isInstanceOf(ProjectionDomainException.class)
            .hasMessageStartingWith("point 1");
    }
}
