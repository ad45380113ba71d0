package io.geotick.reference.epsg;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import io.geotick.geodesy.position.GeodeticPosition;
import io.geotick.transforms.epsg.EpsgSystem;
import io.geotick.transforms.epsg.EpsgSystems;
import io.geotick.transforms.epsg.LinearUnit;
import io.geotick.transforms.epsg.UnknownEpsgCodeException;
import io.geotick.transforms.projection.GridPosition;
import io.geotick.transforms.projection.MapProjection;
import java.math.BigInteger;
import java.util.HashMap;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.locationtech.proj4j.CRSFactory;
import org.locationtech.proj4j.CoordinateReferenceSystem;
import org.locationtech.proj4j.CoordinateTransform;
import org.locationtech.proj4j.CoordinateTransformFactory;
import org.locationtech.proj4j.ProjCoordinate;
import org.locationtech.proj4j.proj.Projection;
import org.locationtech.proj4j.units.Units;

/**
 * EPSG systems defined in feet (US survey and international) and other units: values in the system's unit,
 * checked against Proj4J as a reference library (whose results are in the system's unit, verified below),
 * against published worked examples and the published definitions of the grids, and by round trips.
 *
 * <p>Measured agreement with Proj4J, 2 000 seeded points over each zone (in the system's unit):
 * Lambert 2SP in ftUS and ft (EPSG:2263, 2227, 32040, 2992) 1.5–1.8e-8 units (5 nm), which is rounding plus
 * Proj4J's US-foot factor 0.304800609601219 m (6.6e-16 relative short of 1200/3937 m); Transverse Mercator
 * (EPSG:2236 ftUS, EPSG:2222 ft) 2.2–3.9e-7 units (0.07–0.12 µm), Proj4J's lower-order TM series within
 * 1.5° of the central meridian; Cassini-Soldner in Clarke's links (EPSG:30200, Proj4J's own projection in
 * both) 1.6e-10 links. Inverses (Proj4J's grid values back to latitude and longitude): within 1.1e-12°
 * (0.1 µm) of Proj4J's own inverse.
 */
class EpsgUnitsReferenceTest {
    private static final CRSFactory CRS = new CRSFactory();
    private static final Map<Integer, Projection> PROJECTIONS = new HashMap<>();

    /** Proj4J's own projection object of the code (its file is read once per code). */
    private static synchronized Projection proj4jProjection(int code) {
        return PROJECTIONS.computeIfAbsent(code, c -> CRS.createFromName("EPSG:" + c).getProjection());
    }

    private static double[] proj4j(int code, double lat, double lon) {
        ProjCoordinate out = proj4jProjection(code).project(new ProjCoordinate(lon, lat), new ProjCoordinate());
        return new double[] {out.x, out.y};
    }

    @Test
    void proj4jGivesItsResultsInTheSystemsUnitWithTheFalseOriginInMetres() {
        // Source: Proj4J 1.4.1 as reference library. EPSG:2263 (NAD83 / New York Long Island (ftUS)) holds its
        // false easting as 300 000.0000000001 m with US survey feet as unit; projecting the false origin, its
        // projection and its coordinate transform from EPSG:4269 (NAD83 geographic) both give 984 250 ftUS:
        // the false easting is in metres internally and the output is in feet.
        CoordinateReferenceSystem ny = CRS.createFromName("EPSG:2263");
        Projection p = ny.getProjection();
        assertThat(p.getUnits()).isEqualTo(Units.US_FEET);
        assertThat(p.getFalseEasting()).isEqualTo(300000.0000000001);
        double lat0 = 40.16666666666666;
        double[] viaProjection = proj4j(2263, lat0, -74);
        CoordinateTransform t = new CoordinateTransformFactory().createTransform(CRS.createFromName("EPSG:4269"), ny);
        ProjCoordinate viaTransform = t.transform(new ProjCoordinate(-74, lat0), new ProjCoordinate());
        assertThat(viaProjection[0]).isCloseTo(984250, within(1e-8));
        assertThat(viaTransform.x).isEqualTo(viaProjection[0]);
        assertThat(viaTransform.y).isCloseTo(0, within(1e-8));
        // Source: same, EPSG:2222 (NAD83 / Arizona East (ft)): false easting 213 360 m = 700 000 international feet.
        assertThat(proj4jProjection(2222).getFalseEasting()).isEqualTo(213360.0);
        assertThat(proj4j(2222, 31, -110.1666666666667)[0]).isCloseTo(700000, within(1e-8));
        // Proj4J's US survey foot is 0.304800609601219 m, the exact 1200/3937 m = 0.30480060960121920… rounded to
        // 15 digits: 6.6e-16 relative, 4 nm at 6.5 million feet.
        // Source: US survey foot = 1200/3937 m (NGS; US Federal Register 1959), from memory.
        assertThat(1 / p.getFromMetres()).isEqualTo(0.304800609601219);
        assertThat(Math.abs(0.304800609601219 / (1200.0 / 3937) - 1)).isLessThan(7e-16);
    }

    @Test
    void systemsKnowTheirUnit() {
        // Source: EPSG names of the systems, "(ftUS)" and "(ft)" (from memory); Proj4J 1.4.1's definitions.
        assertThat(EpsgSystems.byCode(2263).unit()).isEqualTo(LinearUnit.US_SURVEY_FOOT);
        assertThat(EpsgSystems.byCode(32040).unit()).isEqualTo(LinearUnit.US_SURVEY_FOOT);
        assertThat(EpsgSystems.byCode(2222).unit()).isEqualTo(LinearUnit.INTERNATIONAL_FOOT);
        assertThat(EpsgSystems.byCode(2992).unit()).isEqualTo(LinearUnit.INTERNATIONAL_FOOT);
        assertThat(EpsgSystems.byCode(27700).unit()).isEqualTo(LinearUnit.METRE);
        assertThat(EpsgSystems.byCode(4326).unit()).isEqualTo(LinearUnit.METRE);
        // Source: Clarke's link = 0.201166195164 m (EPSG unit table, from memory), as Proj4J's definition of
        // EPSG:30200 (Trinidad 1903 / Trinidad Grid) gives it: taken exactly, 50291548791/250000000000 m.
        LinearUnit lk = EpsgSystems.byCode(30200).unit();
        assertThat(lk.symbol()).isEqualTo("lkCla");
        assertThat(lk.name()).isEqualTo("Clarke's link");
        assertThat(lk.numerator()).isEqualTo(BigInteger.valueOf(50291548791L));
        assertThat(lk.denominator()).isEqualTo(BigInteger.valueOf(250000000000L));
        // The metre projection behind a feet system: the same point, the easting converted exactly.
        EpsgSystem ny = EpsgSystems.byCode(2263);
        assertThat(ny.projection().orElseThrow().project(40.5, -74).easting()).isEqualTo(LinearUnit.US_SURVEY_FOOT
            .fromMetres(ny.metricProjection().orElseThrow().project(40.5, -74).easting()));
        assertThat(EpsgSystems.byCode(27700).metricProjection()).isEqualTo(EpsgSystems.byCode(27700).projection());
    }

    @ParameterizedTest(name = "EPSG:{0} in {1}")
    @CsvSource({
        // code, unit symbol, centre latitude, central longitude, half-widths (deg), tolerance (system unit)
        // Source: Proj4J 1.4.1 as reference library for each; measured maxima in the class comment.
        // NAD83 / New York Long Island (ftUS), Lambert 2SP: 1.7e-8 ftUS.
        "2263, ftUS, 40.8, -73.5, 0.5, 1.5, 3e-8",
        // NAD83 / California zone 3 (ftUS), Lambert 2SP: 1.8e-8 ftUS.
        "2227, ftUS, 37.7, -120.5, 1.0, 2.5, 3e-8",
        // NAD27 / Texas South Central (ftUS), Lambert 2SP on Clarke 1866: 1.7e-8 ftUS.
        "32040, ftUS, 29.3, -99, 1.0, 3, 3e-8",
        // NAD83 / Florida East (ftUS), Transverse Mercator: 2.2e-7 ftUS (Proj4J's TM series).
        "2236, ftUS, 27, -81, 2, 1.5, 4e-7",
        // NAD83 / Arizona East (ft), Transverse Mercator: 3.9e-7 ft.
        "2222, ft, 33, -110.1666666666667, 2, 1.5, 6e-7",
        // NAD83 / Oregon GIC Lambert (ft), Lambert 2SP: 1.5e-8 ft.
        "2992, ft, 44, -120.5, 2.5, 4.5, 3e-8",
        // Trinidad 1903 / Trinidad Grid (Clarke's links), Cassini-Soldner by Proj4J in both: 1.6e-10 links.
        "30200, lkCla, 10.5, -61.3333333333, 0.5, 0.8, 1e-9"})
    void againstProj4jInTheSystemsUnit(int code, String symbol, double lat0, double lon0, double halfLat,
            double halfLon, double tolerance) {
        EpsgSystem s = EpsgSystems.byCode(code);
        assertThat(s.unit().symbol()).isEqualTo(symbol);
        MapProjection m = s.projection().orElseThrow();
        Random r = new Random(11);
        double[] lats = new double[2000];
        for (int i = 0; i < 2000; i++) {
            double lat = lat0 + (r.nextDouble() * 2 - 1) * halfLat;
            double lon = lon0 + (r.nextDouble() * 2 - 1) * halfLon;
            lats[i] = lat;
            GridPosition g = m.project(lat, lon);
            double[] ref = proj4j(code, lat, lon);
            assertThat(Math.hypot(g.easting() - ref[0], g.northing() - ref[1])).as("EPSG:%d at %s, %s", code, lat, lon)
                .isLessThanOrEqualTo(tolerance);
            // Source: Proj4J 1.4.1 inverse, as reference library: the grid point in feet back to the point.
            ProjCoordinate back = proj4jProjection(code).inverseProject(new ProjCoordinate(ref[0], ref[1]),
                new ProjCoordinate());
            GeodeticPosition mine = m.unproject(ref[0], ref[1]);
            // Measured: at most 1.1e-12° (0.1 µm; EPSG:2222, Proj4J's TM series), 1.4e-14° for EPSG:30200.
            assertThat(mine.latitude()).isCloseTo(back.y, within(1e-11));
            assertThat(mine.longitude()).isCloseTo(back.x, within(1e-11));
        }
        // Scale and convergence are those of the metre projection: unitless and degrees, not converted.
        GridPosition g = m.project(lats[0], lon0 + 0.3);
        GridPosition metric = s.metricProjection().orElseThrow().project(lats[0], lon0 + 0.3);
        assertThat(g.scale()).isEqualTo(metric.scale());
        assertThat(g.convergence()).isEqualTo(metric.convergence());
        assertThat(g.easting()).isEqualTo(s.unit().fromMetres(metric.easting()));
    }

    @Test
    void iogpLambert2spTexasSouthCentralInUsSurveyFeet() {
        // Source: IOGP Guidance Note 7-2, Lambert Conic Conformal (2SP) worked example (from memory): NAD27 /
        // Texas South Central (EPSG:32040), Clarke 1866, false origin 27°50'N 99°W, standard parallels 28°23'N
        // and 30°17'N, false easting 2 000 000 ftUS; 28°30'N 96°W → E 2 963 503.91 ftUS, N 254 759.80 ftUS.
        EpsgSystem s = EpsgSystems.byCode(32040);
        assertThat(s.unit()).isEqualTo(LinearUnit.US_SURVEY_FOOT);
        assertThat(s.method().orElseThrow().inHouse()).isTrue();
        GridPosition g = s.projection().orElseThrow().project(28.5, -96);
        assertThat(g.easting()).isCloseTo(2963503.91, within(0.005));
        assertThat(g.northing()).isCloseTo(254759.80, within(0.005));
        // The false easting as EPSG states it, 2 000 000 ftUS, from Proj4J's 609 601.2192024384 m.
        assertThat(s.method().orElseThrow().parameters()).anySatisfy(p -> {
            assertThat(p.name()).isEqualTo("false easting in the grid unit");
            assertThat(p.value()).isCloseTo(2000000, within(1e-8));
            assertThat(p.unit()).isEqualTo("ftUS");
        });
        GeodeticPosition back = s.projection().orElseThrow().unproject(2963503.91, 254759.80);
        // 0.005 ftUS of rounding in the published grid values is about 5e-8° on the ground.
        assertThat(back.latitude()).isCloseTo(28.5, within(5e-8));
        assertThat(back.longitude()).isCloseTo(-96, within(5e-8));
    }

    @Test
    void iogpCassiniSoldnerTrinidadInClarkesLinks() {
        // Source: IOGP Guidance Note 7-2, Cassini-Soldner worked example (from memory): Trinidad 1903 / Trinidad
        // Grid (EPSG:30200), Clarke 1858, origin 10°26'30"N 61°20'W, false origin 430 000 / 325 000 links;
        // 10°N 62°W → E 66 644.94 links, N 82 536.22 links. Computed by Proj4J's Cassini (no in-house method),
        // now in metres and converted to Clarke's links here.
        EpsgSystem s = EpsgSystems.byCode(30200);
        assertThat(s.method().orElseThrow().inHouse()).isFalse();
        GridPosition g = s.projection().orElseThrow().project(10, -62);
        assertThat(g.easting()).isCloseTo(66644.94, within(0.005));
        assertThat(g.northing()).isCloseTo(82536.22, within(0.005));
        // In metres: 66 644.94 lk × 0.201166195164 m = 13 406.71 m (Proj4J's own factor, EPSG's Clarke's link).
        assertThat(s.metricProjection().orElseThrow().project(10, -62).easting())
            .isCloseTo(66644.94 * 0.201166195164, within(0.002));
        // Point scale of the metre projection (unitless): Cassini has k = 1 along the central meridian.
        assertThat(s.projection().orElseThrow().project(9.5, -61.33333333333334).scale()).isCloseTo(1, within(1e-9));
    }

    @ParameterizedTest(name = "EPSG:{0}")
    @CsvSource({
        // code, latitude, longitude of the (false) origin, published false easting and northing in the unit
        // Source: EPSG definitions of the State Plane zones (from memory): New York Long Island FE 984 250 ftUS
        // (= 300 000 m); California zone 3 FE 6 561 666.667 ftUS, FN 1 640 416.667 ftUS (= 2 000 000 m and
        // 500 000 m, stated to 0.001 ft); Arizona East (ft) FE 700 000 ft (= 213 360 m); Oregon GIC Lambert (ft)
        // FE 1 312 335.958 ft (= 400 000 m, stated to 0.001 ft); Florida East (ftUS) FE 656 166.667 ftUS.
        "2263, 40.16666666666666, -74, 984250, 0",
        "2227, 36.5, -120.5, 6561666.667, 1640416.667",
        "2222, 31, -110.1666666666667, 700000, 0",
        "2992, 41.75, -120.5, 1312335.958, 0",
        "2236, 24.33333333333333, -81, 656166.667, 0"})
    void falseOriginsAsPublishedInFeet(int code, double lat, double lon, double fe, double fn) {
        GridPosition g = EpsgSystems.byCode(code).projection().orElseThrow().project(lat, lon);
        // The published values are rounded to 0.001 ft; the exact ones to 1e-8 ft.
        assertThat(g.easting()).isCloseTo(fe, within(fe % 1 == 0 ? 1e-8 : 0.0005));
        assertThat(g.northing()).isCloseTo(fn, within(fn % 1 == 0 ? 1e-8 : 0.0005));
    }

    @ParameterizedTest(name = "EPSG:{0}")
    @CsvSource({"2263, 40.8, -73.5", "2222, 33, -110.1666666666667", "32040, 29.3, -99"})
    void roundTripsInFeet(int code, double lat0, double lon0) {
        MapProjection m = EpsgSystems.byCode(code).projection().orElseThrow();
        Random r = new Random(3);
        for (int i = 0; i < 2000; i++) {
            double lat = lat0 + (r.nextDouble() * 2 - 1);
            double lon = lon0 + (r.nextDouble() * 2 - 1);
            GridPosition g = m.project(lat, lon);
            GeodeticPosition b = m.unproject(g.easting(), g.northing());
            // Measured: 5e-14° (6 nm on the ground) geodetic → grid → geodetic.
            assertThat(b.latitude()).isCloseTo(lat, within(1e-12));
            assertThat(b.longitude()).isCloseTo(lon, within(1e-12));
            // Grid → geodetic → grid, measured 1.2e-8 ft (4 nm).
            GridPosition again = m.project(b.latitude(), b.longitude());
            assertThat(Math.hypot(again.easting() - g.easting(), again.northing() - g.northing())).isLessThan(3e-8);
        }
        // Array variants are the single-point values, bit for bit, in place too.
        double[] pts = {lat0, lon0, lat0 + 0.4, lon0 - 0.7};
        m.project(pts, 0, pts, 0, 2);
        assertThat(pts[2]).isEqualTo(m.project(lat0 + 0.4, lon0 - 0.7).easting());
        assertThat(pts[3]).isEqualTo(m.project(lat0 + 0.4, lon0 - 0.7).northing());
        double e = pts[0];
        double n = pts[1];
        m.unproject(pts, 0, pts, 0, 2);
        assertThat(pts[0]).isEqualTo(m.unproject(e, n).latitude());
        assertThat(pts[1]).isEqualTo(m.unproject(e, n).longitude());
    }

    @Test
    void unitsThatCannotBeResolvedAreRefused() {
        // Source: Proj4J 1.4.1: EPSG:3140 (Viti Levu 1912 / Viti Levu Grid) is defined in 'link', a unit name its
        // unit table does not resolve, so its own results would be metres; EPSG:7407 (NAD27 / Texas North +
        // NGVD29 height) has a vertical unit its parser refuses.
        assertThat(CRS.createFromName("EPSG:3140").getProjection().getFromMetres()).isEqualTo(1.0);
        assertThatThrownBy(() -> EpsgSystems.byCode(3140)).isInstanceOf(UnknownEpsgCodeException.class)
            .hasMessageContaining("EPSG:3140").hasMessageContaining("'link'").hasMessageContaining("does not guess");
        assertThatThrownBy(() -> EpsgSystems.byCode(7407)).isInstanceOf(UnknownEpsgCodeException.class)
            .hasMessageContaining("EPSG:7407").hasMessageContaining("compound").hasMessageNotContaining("+");
    }

    @Test
    void unitProjectionsReportBadGridValuesByTheirUnit() {
        MapProjection m = EpsgSystems.byCode(2263).projection().orElseThrow();
        assertThatThrownBy(() -> m.unproject(Double.NaN, 0)).isInstanceOf(IllegalArgumentException.class)
            .hasMessageContaining("easting NaN ftUS");
        double[] pts = {988212.2, 211939.3, Double.NaN, 0};
        assertThatThrownBy(() -> m.unproject(pts, 0, new double[4], 0, 2)).isInstanceOf(IllegalArgumentException.class)
            .hasMessageStartingWith("point 1: ");
        assertThat(m.name()).endsWith(", in ftUS");
    }
}
