package io.geotick.reference.transforms;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import io.geotick.geodesy.position.GeodeticPosition;
import io.geotick.transforms.grid.GridFormatException;
import io.geotick.transforms.grid.Ntv2Grid;
import io.geotick.transforms.grid.OutsideGridException;
import io.geotick.transforms.height.GeoidGrid;
import io.geotick.transforms.height.Interpolation;
import java.nio.ByteOrder;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.hipparchus.analysis.BivariateFunction;
import org.hipparchus.analysis.interpolation.BicubicInterpolator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** NTv2 and ISG grids written by the tests in the published layouts, against hand-computed values. */
class GridReferenceTest {
    @TempDir
    Path dir;

    /** Parent: latitude 40°..42°, longitude 0°..2° west, 1° nodes; child: 41°..42°, 1°..2° west, 0.5°. */
    static byte[] sample(ByteOrder order) {
        float[][] lat = {{1, 2, 4}, {3, 5, 8}, {6, 9, 13}};
        float[][] lonW = {{-1, -1.5f, -2.5f}, {-2, -3, -4}, {-3.5f, -4.5f, -6}};
        float[][][] parent = new float[3][3][];
        for (int r = 0; r < 3; r++) {
            for (int c = 0; c < 3; c++) {
                parent[r][c] = new float[] {lat[r][c], lonW[r][c], 0.02f, 0.03f};
            }
        }
        float[][][] child = new float[3][3][];
        for (int r = 0; r < 3; r++) {
            for (int c = 0; c < 3; c++) {
                child[r][c] = new float[] {10 + 3 * r + c, 0.5f, 0.01f, 0.01f};
            }
        }
        return Ntv2Writer.write(order, "ED50", "ETRS89", List.of(
            new Ntv2Writer.Sub("PARENT", "NONE", 144000, 151200, 0, 7200, 3600, 3600, parent),
            new Ntv2Writer.Sub("CHILD", "PARENT", 147600, 151200, 3600, 7200, 1800, 1800, child)));
    }

    @Test
    void ntv2BilinearInBothByteOrders() throws Exception {
        for (ByteOrder order : new ByteOrder[] {ByteOrder.LITTLE_ENDIAN, ByteOrder.BIG_ENDIAN}) {
            Path f = dir.resolve("sample-" + order + ".gsb");
            Files.write(f, sample(order));
            Ntv2Grid g = Ntv2Grid.read(f);
            assertThat(g.subgridNames()).containsExactly("PARENT", "CHILD");
            // Source: NTv2 Developer's Guide (bilinear interpolation of the node shifts), hand computation:
            // point 40.25°N, 0.5°W → x = 0.5, y = 0.25 in the south-east parent cell with nodes
            // Δφ = 1, 2 (south), 3, 5 (north): (1.5 + (4.0 − 1.5)·0.25) = 2.125″;
            // Δλ_west = −1, −1.5, −2, −3: (−1.25 + (−2.5 + 1.25)·0.25) = −1.5625″ (i.e. 1.5625″ east).
            Ntv2Grid.Shift s = g.shiftAt(40.25, -0.5);
            assertThat(s.subgrid()).isEqualTo("PARENT");
            assertThat(s.latitudeSeconds()).isCloseTo(2.125, within(1e-12));
            assertThat(s.longitudeSecondsEast()).isCloseTo(1.5625, within(1e-12));
            GeodeticPosition p = g.forward(GeodeticPosition.of(40.25, -0.5, 12.0));
            assertThat(p.latitude()).isCloseTo(40.25 + 2.125 / 3600, within(1e-13));
            assertThat(p.longitude()).isCloseTo(-0.5 + 1.5625 / 3600, within(1e-13));
            assertThat(p.height()).isEqualTo(12.0);
            // Child: 41.75°N, 1.25°W → x = 0.5, y = 1.5 in the child: Δφ nodes 13, 14 (41.5°) and 16, 17
            // (42°) → 13.5 + (16.5 − 13.5)·0.5 = 15.0″; Δλ_west = 0.5″ everywhere.
            Ntv2Grid.Shift c = g.shiftAt(41.75, -1.25);
            assertThat(c.subgrid()).isEqualTo("CHILD");
            assertThat(c.latitudeSeconds()).isCloseTo(15.0, within(1e-12));
            assertThat(c.longitudeSecondsEast()).isCloseTo(-0.5, within(1e-12));
            assertThat(c.latitudeAccuracy()).isCloseTo(0.01, within(1e-8));
        }
    }

    @Test
    void ntv2ReverseByIterationClosesBelow1e9Degrees() {
        // Source: NTv2 Developer's Guide (reverse by iteration); requirement of issue 4: < 1e-9°.
        Ntv2Grid g = Ntv2Grid.parse(sample(ByteOrder.LITTLE_ENDIAN), "sample");
        for (double lat = 40.01; lat < 41.99; lat += 0.1) {
            for (double lon = -1.99; lon < -0.01; lon += 0.1) {
                GeodeticPosition p = GeodeticPosition.of(lat, lon, 0);
                GeodeticPosition q = g.inverse(g.forward(p));
                assertThat(Math.abs(q.latitude() - lat)).isLessThan(1e-9);
                assertThat(Math.abs(q.longitude() - lon)).isLessThan(1e-9);
            }
        }
    }

    @Test
    void ntv2BadInput() throws Exception {
        byte[] good = sample(ByteOrder.LITTLE_ENDIAN);
        Ntv2Grid g = Ntv2Grid.parse(good, "sample");
        assertThatThrownBy(() -> g.forward(GeodeticPosition.of(45, -1, 0))).isInstanceOf(OutsideGridException.class)
            .hasMessageContaining("outside every subgrid").hasMessageContaining("45.0");
        assertThatThrownBy(() -> Ntv2Grid.parse(java.util.Arrays.copyOf(good, good.length - 40), "cut.gsb"))
            .isInstanceOf(GridFormatException.class).hasMessageContaining("truncated").hasMessageContaining("CHILD");
        byte[] bad = good.clone();
        bad[16 * 11] = 'X'; // first subgrid keyword SUB_NAME → XUB_NAME
        assertThatThrownBy(() -> Ntv2Grid.parse(bad, "bad.gsb")).isInstanceOf(GridFormatException.class)
            .hasMessageContaining("XUB_NAME").hasMessageContaining("SUB_NAME");
        assertThatThrownBy(() -> Ntv2Grid.parse(new byte[] {1, 2, 3}, "tiny.gsb"))
            .isInstanceOf(GridFormatException.class).hasMessageContaining("truncated");
    }

    static String isg(String values) {
        return String.join("\n", "comment lines before the header are allowed (invented test grid)",
            "begin_of_head ================================================",
            "model name     : TEST-GEOID (invented)", "model year     : 2026", "model type     : gravimetric",
            "data type      : geoid", "data units     : meters", "data format    : grid",
            "data ordering  : N-to-S, W-to-E", "ref ellipsoid  : GRS80", "ref frame      : ITRF2014",
            "height datum   : ---", "tide system    : tide-free", "coord type     : geodetic",
            "coord units    : deg", "map projection : ---", "EPSG code      : ---",
            "lat min        :    40.000000", "lat max        :    42.000000",
            "lon min        :     0.000000", "lon max        :     2.000000",
            "delta lat      :     0.500000", "delta lon      :     0.500000",
            "nrows          :            5", "ncols          :            5",
            "nodata         :   -9999.0000", "creation date  :   01/12/2026", "ISG format     :          2.0",
            "end_of_head ==================================================", values);
    }

    /** A biquadratic surface, reproduced exactly by Keys' cubic convolution. */
    static double surface(double lat, double lon) {
        double y = lat - 40;
        return 45 + 0.3 * y * y - 0.2 * lon * y + 0.1 * lon * lon + 0.7 * y - 0.4 * lon;
    }

    static String surfaceValues() {
        StringBuilder s = new StringBuilder();
        for (int r = 0; r < 5; r++) {
            double lat = 42 - 0.5 * r; // N-to-S
            for (int c = 0; c < 5; c++) {
                s.append(String.format(java.util.Locale.ROOT, " %.15f", surface(lat, 0.5 * c)));
            }
            s.append('\n');
        }
        return s.toString();
    }

    @Test
    void isgBilinearHandComputed() throws Exception {
        // Source: ISG format specification v2.0 (layout); hand computation of the bilinear value.
        StringBuilder v = new StringBuilder();
        for (int r = 0; r < 5; r++) {
            for (int c = 0; c < 5; c++) {
                v.append(' ').append(10 * r + c); // row 0 is the northern edge, 42°N
            }
            v.append('\n');
        }
        Path f = dir.resolve("test.isg");
        Files.writeString(f, isg(v.toString()));
        GeoidGrid g = GeoidGrid.read(f);
        assertThat(g.modelName()).isEqualTo("TEST-GEOID (invented)");
        // Nodes: 42°N row values 0..4, 41.5°N row 10..14. At (41.5°, 0°) the value is 10; at (41.75°, 0.25°)
        // the surrounding nodes are 0, 1 (42°) and 10, 11 (41.5°): mean 5.5.
        assertThat(g.undulation(41.5, 0, Interpolation.BILINEAR)).isEqualTo(10.0);
        assertThat(g.undulation(41.75, 0.25, Interpolation.BILINEAR)).isCloseTo(5.5, within(1e-12));
        // (40.1°, 1.9°): nodes at 40° row 40..44 and 40.5° row 30..34, cell columns 3, 4 (1.5°, 2°):
        // fx = 0.8, fy = 0.2: south 43.8, north 33.8 → 43.8 − 10·0.2 = 41.8.
        assertThat(g.undulation(40.1, 1.9, Interpolation.BILINEAR)).isCloseTo(41.8, within(1e-12));
        assertThat(g.orthometricHeight(41.75, 0.25, 100, Interpolation.BILINEAR)).isCloseTo(94.5, within(1e-12));
        assertThat(g.ellipsoidalHeight(41.75, 0.25, 94.5, Interpolation.BILINEAR)).isCloseTo(100, within(1e-12));
    }

    @Test
    void isgBicubicReproducesQuadraticsAndMatchesHipparchus() {
        GeoidGrid g = GeoidGrid.parse(isg(surfaceValues()), "quadratic.isg");
        // Source: Keys (1981): cubic convolution with a = −1/2 reproduces quadratics exactly.
        assertThat(g.undulation(41.1, 0.7, Interpolation.BICUBIC)).isCloseTo(surface(41.1, 0.7), within(1e-12));
        assertThat(g.undulation(40.9, 1.3, Interpolation.BICUBIC)).isCloseTo(surface(40.9, 1.3), within(1e-12));
        // Source: Hipparchus BicubicInterpolator (reference library): bicubic Hermite patches with
        // central-difference derivatives, which equal the Catmull-Rom (Keys a = −1/2) tensor product.
        double[] lats = {40, 40.5, 41, 41.5, 42};
        double[] lons = {0, 0.5, 1, 1.5, 2};
        double[][] v = new double[5][5];
        for (int i = 0; i < 5; i++) {
            for (int j = 0; j < 5; j++) {
                v[i][j] = Math.sin(lats[i] * 3) * Math.cos(lons[j] * 2) * 10 + lats[i];
            }
        }
        StringBuilder s = new StringBuilder();
        for (int r = 4; r >= 0; r--) {
            for (int c = 0; c < 5; c++) {
                s.append(String.format(java.util.Locale.ROOT, " %.17g", v[r][c]));
            }
            s.append('\n');
        }
        GeoidGrid wavy = GeoidGrid.parse(isg(s.toString()), "wavy.isg");
        BivariateFunction ref = new BicubicInterpolator().interpolate(lats, lons, v);
        for (double lat = 40.55; lat < 41.5; lat += 0.1) {
            for (double lon = 0.55; lon < 1.5; lon += 0.1) {
                assertThat(wavy.undulation(lat, lon, Interpolation.BICUBIC)).as("(%s, %s)", lat, lon)
                    .isCloseTo(ref.value(lat, lon), within(1e-9));
            }
        }
    }

    @Test
    void isgBadInput() {
        GeoidGrid g = GeoidGrid.parse(isg(surfaceValues()), "q.isg");
        assertThatThrownBy(() -> g.undulation(43, 1, Interpolation.BILINEAR)).isInstanceOf(OutsideGridException.class)
            .hasMessageContaining("outside the geoid grid").hasMessageContaining("43.0");
        assertThatThrownBy(() -> g.undulation(40.2, 1, Interpolation.BICUBIC)).isInstanceOf(OutsideGridException.class)
            .hasMessageContaining("outermost ring");
        assertThatThrownBy(() -> g.undulation(Double.NaN, 1, Interpolation.BILINEAR)).hasMessageContaining("NaN");
        String values = surfaceValues();
        assertThatThrownBy(() -> GeoidGrid.parse(isg(values.substring(0, values.length() / 2)), "cut.isg"))
            .isInstanceOf(GridFormatException.class).hasMessageContaining("truncated")
            .hasMessageContaining("expected nrows × ncols");
        assertThatThrownBy(() -> GeoidGrid.parse(isg(values.replaceFirst(" 4", " x4")), "junk.isg"))
            .isInstanceOf(GridFormatException.class).hasMessageContaining("line 30").hasMessageContaining("not a number");
        assertThatThrownBy(() -> GeoidGrid.parse(isg(values).replace("nrows          :            5",
            "nrows : 6"), "rows.isg")).isInstanceOf(GridFormatException.class).hasMessageContaining("nrows");
        assertThatThrownBy(() -> GeoidGrid.parse(isg(values).replace("end_of_head", "xx"), "nohead.isg"))
            .isInstanceOf(GridFormatException.class).hasMessageContaining("end_of_head");
        // A node without data: the nodata value at the north-west corner.
        String holes = isg(values.replaceFirst("^ [0-9.]+", " -9999.0000"));
        GeoidGrid h = GeoidGrid.parse(holes, "holes.isg");
        assertThatThrownBy(() -> h.undulation(41.9, 0.1, Interpolation.BILINEAR))
            .isInstanceOf(OutsideGridException.class).hasMessageContaining("no data");
    }
}
