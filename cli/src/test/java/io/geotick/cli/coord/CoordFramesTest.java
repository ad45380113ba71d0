package io.geotick.cli.coord;

import static io.geotick.cli.coord.CoordCommandTest.coord;
import static io.geotick.cli.coord.CoordCommandTest.fieldNames;
import static io.geotick.cli.coord.CoordCommandTest.json;
import static io.geotick.cli.coord.CoordCommandTest.textFields;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import io.geotick.cli.CliRun;
import io.geotick.transforms.Epoch;
import io.geotick.transforms.chain.ConversionChain;
import io.geotick.transforms.chain.CoordinateSystem;
import io.geotick.transforms.frames.StandardFrames;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * {@code geotick coord} with frames ({@code SYS@FRAME}), {@code --epoch}, {@code --explain},
 * {@code --helmert}/{@code --convention} and {@code --geoid}, end to end through {@code Main.run}.
 */
class CoordFramesTest {
    // Source: IOGP Guidance Note 7-2, §4.3.3.1 worked example, WGS 72 → WGS 84, EPSG method 1033
    // (values from memory): tz = 4.5 m, rz = +0.554″, ds = +0.219 ppm;
    // X 3657660.66, Y 255768.55, Z 5201382.11 → Y 255778.43, Z 5201387.75 m (X: see X_HAND).
    static final String[] WGS72_POINT = {"3657660.66", "255768.55", "5201382.11"};
    static final double Y84 = 255778.43;
    static final double Z84 = 5201387.75;
    // The example's X was recalled as 3657660.78, but the formula gives 3657660.774 by hand:
    // (3657660.66 − rz·Y)·(1 + 0.219e-6) with rz·Y = 0.554·π/648000·255768.55 = 0.686961 m
    // (the same discrepancy is stated in the transforms reference tests); checked against the hand value.
    static final double X_HAND = 3657660.7741;
    // The published values are rounded to 1 cm.
    static final double TOL_CM = 0.005;

    static String[] args(String... a) {
        return a;
    }

    static String[] with(String[] a, String... b) {
        return CoordCommandTest.concat(a, b);
    }

    // ---- user Helmert parameters against the IOGP worked example ----

    @Test
    void helmertPositionVectorMatchesIogpExample() throws Exception {
        // Source: IOGP Guidance Note 7-2, §4.3.3.1 worked example (values from memory), see WGS72_POINT.
        JsonNode n = json(coord(with(args("--from", "ecef@WGS72", "--to", "ecef@WGS84", "--helmert",
            "0,0,4.5,0,0,0.554,0.219", "--convention", "position-vector", "--json"), WGS72_POINT)));
        assertThat(n.get("y").doubleValue()).isCloseTo(Y84, within(TOL_CM));
        assertThat(n.get("z").doubleValue()).isCloseTo(Z84, within(TOL_CM));
        // Source: hand computation of the EPSG 1033 formula, see X_HAND.
        assertThat(n.get("x").doubleValue()).isCloseTo(X_HAND, within(0.0001));
        assertThat(n.get("from").asText()).isEqualTo("ecef@WGS 72");
        assertThat(n.get("to").asText()).isEqualTo("ecef@WGS 84");
    }

    @Test
    void helmertCoordinateFrameWithNegatedRotationGivesTheSamePoint() throws Exception {
        // Source: IOGP Guidance Note 7-2, §4.3.3.2 worked example (EPSG method 1032): the same transformation
        // written with rz = −0.554″ gives the same target point (values from memory).
        JsonNode cf = json(coord(with(args("--from", "ecef@WGS72", "--to", "ecef@WGS84", "--helmert",
            "0,0,4.5,0,0,-0.554,0.219", "--convention", "coordinate-frame", "--json"), WGS72_POINT)));
        assertThat(cf.get("y").doubleValue()).isCloseTo(Y84, within(TOL_CM));
        assertThat(cf.get("z").doubleValue()).isCloseTo(Z84, within(TOL_CM));
        assertThat(cf.get("x").doubleValue()).isCloseTo(X_HAND, within(0.0001));
    }

    @Test
    void theOtherConventionRotatesTheOtherWay() throws Exception {
        // Source: IOGP Guidance Note 7-2, §4.3.3 (the conventions differ in the sign of the rotations):
        // entering +0.554″ as coordinate frame turns Y the other way by 2·rz·X = 2·(0.554·π/648000)·3657660.66
        // = 19.65 m (geometry, hand computation).
        JsonNode wrong = json(coord(with(args("--from", "ecef@WGS72", "--to", "ecef@WGS84", "--helmert",
            "0,0,4.5,0,0,0.554,0.219", "--convention", "coordinate-frame", "--json"), WGS72_POINT)));
        assertThat(Y84 - wrong.get("y").doubleValue()).isCloseTo(19.65, within(0.01));
    }

    @Test
    void helmertWithoutFramesAppliesOnTheBareEllipsoid() throws Exception {
        // Source: IOGP Guidance Note 7-2, §4.3.3.1 worked example (values from memory): ECEF → ECEF needs no
        // frame, so the bare use gives the same point.
        JsonNode n = json(coord(with(args("--from", "ecef", "--to", "ecef", "--helmert", "0,0,4.5,0,0,0.554,0.219",
            "--convention", "pv", "--json"), WGS72_POINT)));
        assertThat(n.get("y").doubleValue()).isCloseTo(Y84, within(TOL_CM));
        assertThat(n.get("z").doubleValue()).isCloseTo(Z84, within(TOL_CM));
        assertThat(n.get("x").doubleValue()).isCloseTo(X_HAND, within(0.0001));
        assertThat(n.get("from").asText()).isEqualTo("ecef");
        assertThat(n.get("ellipsoid").asText()).isEqualTo("WGS 84");
    }

    @Test
    void registrySetForWgs72IsEpsg1237() throws Exception {
        // Source: IOGP Guidance Note 7-2, §4.3.3.1 worked example (values from memory). Without --helmert the
        // registry's EPSG 1237 set applies, with ds = 0.2263 ppm instead of the example's 0.219: the points
        // differ by 0.0073 ppm of the radius, |X|·7.3e-9 ≈ 4.6 cm (hand computation); 5 cm is allowed.
        CliRun r = coord(with(args("--from", "ecef@WGS72", "--to", "ecef@WGS84", "--json", "--explain"), WGS72_POINT));
        JsonNode n = json(r);
        assertThat(n.get("y").doubleValue()).isCloseTo(Y84, within(0.05));
        assertThat(n.get("z").doubleValue()).isCloseTo(Z84, within(0.05));
        assertThat(n.get("steps")).hasSize(1);
        assertThat(n.get("steps").get(0).get("epsg_transformation").intValue()).isEqualTo(1237);
        assertThat(n.get("steps").get(0).get("epsg_method").intValue()).isEqualTo(1033);
        assertThat(n.get("accuracy_m").doubleValue()).isEqualTo(2.0);
        assertThat(n.get("epoch").isNull()).isTrue();
    }

    // ---- ITRF at an epoch ----

    @Test
    void itrf2020ToItrf2014AtAnEpochMatchesTheIersTableByHand() throws Exception {
        // Source: IERS ITRS Centre (IGN), transformation parameters from ITRF2020 to ITRF2014, t0 = 2015.0,
        // position vector (values from memory): T = (−1.4, −0.9, 1.4) mm, rates (0, −0.1, 0.2) mm/yr,
        // D = −0.42 ppb, rate 0, rotations 0. At 2024.5: T = (−1.4, −1.85, 3.3) mm; X' = X + T + D·X
        // (IOGP Guidance Note 7-2, §4.3.3 formula with zero rotations; hand computation).
        double x = 4027894.006;
        double y = 307045.600;
        double z = 4919474.910;
        JsonNode n = json(coord("--from", "ecef@ITRF2020", "--to", "ecef@ITRF2014", "--epoch", "2024.5", "--json",
            Double.toString(x), Double.toString(y), Double.toString(z)));
        double d = -0.42e-9;
        assertThat(n.get("x").doubleValue()).isCloseTo(x - 0.0014 + d * x, within(1e-6));
        assertThat(n.get("y").doubleValue()).isCloseTo(y - 0.00185 + d * y, within(1e-6));
        assertThat(n.get("z").doubleValue()).isCloseTo(z + 0.0033 + d * z, within(1e-6));
        assertThat(n.get("epoch").doubleValue()).isEqualTo(2024.5);
    }

    @Test
    void itrfToEtrfAgreesWithTheLibraryChain() throws Exception {
        // Consistency: the command gives the very numbers of the transforms library's chain (whose values are
        // checked against IERS/EUREF in the reference tests).
        double[] p = {4027894.006, 307045.600, 4919474.910};
        JsonNode n = json(coord("--from", "ecef@ITRF2020", "--to", "geodetic@ETRF2000", "--epoch", "2024-07-01",
            "--json", "4027894.006", "307045.600", "4919474.910"));
        double[] lib = ConversionChain.builder().from(CoordinateSystem.ecef(StandardFrames.ITRF2020))
            .to(CoordinateSystem.geodetic(StandardFrames.ETRF2000)).epoch(Epoch.parse("2024-07-01")).build()
            .convert(p[0], p[1], p[2]);
        assertThat(n.get("lat").doubleValue()).isCloseTo(lib[0], within(1e-12));
        assertThat(n.get("lon").doubleValue()).isCloseTo(lib[1], within(1e-12));
        assertThat(n.get("h").doubleValue()).isCloseTo(lib[2], within(1e-8));
        assertThat(n.get("ellipsoid").asText()).isEqualTo("GRS 1980");
        assertThat(n.get("epoch").doubleValue()).isEqualTo(Epoch.parse("2024-07-01").decimalYear());
    }

    // ---- --explain ----

    @Test
    void explainListsTheStepsWithMethodsParametersSourcesAndAccuracy() {
        CliRun r = coord("--from", "ecef@ITRF2020", "--to", "geodetic@ETRF2000", "--epoch", "2024.5", "--explain",
            "4027894.006", "307045.600", "4919474.910");
        assertThat(r.exitCode()).isZero();
        assertThat(r.err()).isEmpty();
        String out = r.out();
        assertThat(out).contains("steps: 3, expected accuracy 0.010 m");
        assertThat(out).contains("1. ITRF2020 → ITRF2014", "2. ITRF2014 → ETRF2000", "3. ECEF → geodetic on GRS 1980");
        assertThat(out).contains("Time-dependent Position Vector transformation (EPSG method 1053)");
        assertThat(out).contains("coordinate epoch = 2024.5 year", "reference epoch = 2010 year", "arc-second/yr");
        assertThat(out).contains("source: IERS ITRS Centre", "source: EUREF Technical Note 1", "source: IOGP");
        assertThat(out).contains("accuracy: 0.003 m", "accuracy: 0.01 m", "accuracy: exact (rounding only)");
        // The result comes first, labelled as without --explain.
        assertThat(textFields(out.substring(0, out.indexOf("steps:"))).keySet())
            .startsWith("system", "ellipsoid", "epoch", "latitude", "longitude", "height");
    }

    @Test
    void explainJsonHasStepsAndAccuracy() throws Exception {
        JsonNode n = json(coord("--from", "ecef@ITRF2020", "--to", "geodetic@ETRF2000", "--epoch", "2024.5",
            "--explain", "--json", "4027894.006", "307045.600", "4919474.910"));
        assertThat(fieldNames(n)).containsExactly("lat", "lon", "h", "system", "ellipsoid", "from", "to", "epoch",
            "warnings", "steps", "accuracy_m");
        JsonNode steps = n.get("steps");
        assertThat(steps).hasSize(3);
        JsonNode s = steps.get(1);
        assertThat(fieldNames(s)).containsExactly("name", "method", "epsg_method", "epsg_transformation",
            "parameters", "source", "accuracy_m", "cautions");
        assertThat(s.get("name").asText()).isEqualTo("ITRF2014 → ETRF2000");
        assertThat(s.get("epsg_method").intValue()).isEqualTo(1053);
        assertThat(s.get("epsg_transformation").isNull()).isTrue();
        assertThat(s.get("accuracy_m").doubleValue()).isEqualTo(0.01);
        JsonNode first = s.get("parameters").get(0);
        assertThat(first.get("name").asText()).isEqualTo("coordinate epoch");
        assertThat(first.get("value").doubleValue()).isEqualTo(2024.5);
        assertThat(first.get("unit").asText()).isEqualTo("year");
        assertThat(steps.get(2).get("epsg_method").intValue()).isEqualTo(9602);
        // Root-sum-square of 3 mm, 10 mm and 0 (the registry's stated accuracies).
        assertThat(n.get("accuracy_m").doubleValue()).isCloseTo(Math.hypot(0.003, 0.01), within(1e-15));
    }

    @Test
    void userHelmertAccuracyIsNotStatedUnlessGiven() throws Exception {
        String[] base = with(args("--from", "ecef@WGS72", "--to", "ecef@WGS84", "--helmert", "0,0,4.5,0,0,0.554,0.219",
            "--convention", "position-vector", "--explain"), WGS72_POINT);
        String text = coord(base).out();
        assertThat(text).contains("expected accuracy not stated", "accuracy: not stated", "--helmert-accuracy")
            .doesNotContain("exact");
        JsonNode n = json(coord(with(base, "--json")));
        assertThat(n.get("accuracy_m").isNull()).isTrue();
        assertThat(n.get("steps").get(0).get("accuracy_m").isNull()).isTrue();
        JsonNode m = json(coord(with(base, "--json", "--helmert-accuracy", "0.05")));
        assertThat(m.get("accuracy_m").doubleValue()).isEqualTo(0.05);
        assertThat(m.get("steps").get(0).get("source").asText()).contains("--helmert");
    }

    @Test
    void explainWithoutFramesListsTheGeometricSteps() {
        String out = coord("--from", "geodetic", "--to", "enu:55,5,200", "--explain", "53.8", "2.1", "73").out();
        assertThat(out).contains("steps: 2, expected accuracy exact (rounding only)");
        assertThat(out).contains("geodetic → ECEF on WGS 84 (--ellipsoid)", "EPSG method 9602", "EPSG method 9836",
            "origin latitude = 55 degree");
    }

    // ---- warnings, ellipsoids, same frame, local frames ----

    @Test
    void wgs84CarriesItsCautionAsAWarning() throws Exception {
        JsonNode n = json(coord("--from", "ecef@ITRF2020", "--to", "geodetic@WGS84", "--epoch", "2025.0", "--json",
            "4027894.006", "307045.600", "4919474.910"));
        assertThat(n.get("warnings")).hasSize(1);
        assertThat(n.get("warnings").get(0).asText()).contains("WGS 84 is treated as identical", "1-2 cm");
        Map<String, String> t = textFields(coord("--from", "ecef@ITRF2020", "--to", "geodetic@WGS84", "--epoch",
            "2025.0", "4027894.006", "307045.600", "4919474.910").out());
        assertThat(t.get("warning")).contains("WGS 84");
        assertThat(t.get("epoch")).isEqualTo("2025.0");
        // A purely geometric conversion has no warnings field.
        assertThat(json(coord("--from", "ecef", "--to", "geodetic", "--json", "4027894.006", "307045.600",
            "4919474.910")).has("warnings")).isFalse();
    }

    @Test
    void aFrameImpliesItsEllipsoid() throws Exception {
        // Source: Ordnance Survey, OSGB 1936 uses the Airy 1830 ellipsoid (common practice).
        JsonNode n = json(coord("--from", "geodetic@OSGB36", "--to", "ecef@OSGB36", "--json", "52", "-1", "80"));
        assertThat(n.get("ellipsoid").asText()).isEqualTo("Airy 1830");
        JsonNode bare = json(coord("--from", "geodetic", "--to", "ecef", "--ellipsoid", "Airy 1830", "--json", "52",
            "-1", "80"));
        // Same frame at both ends: no frame step, so the numbers are those of the bare ellipsoid.
        assertThat(n.get("x").doubleValue()).isEqualTo(bare.get("x").doubleValue());
        assertThat(n.get("z").doubleValue()).isEqualTo(bare.get("z").doubleValue());
        // Naming the frame's own ellipsoid again is accepted.
        assertThat(coord("--from", "geodetic@ETRF2000", "--to", "ecef@ETRF2000", "--ellipsoid", "GRS 1980", "52", "-1",
            "80").exitCode()).isZero();
    }

    @Test
    void localFrameAtAFrame() throws Exception {
        // Source: IOGP Guidance Note 7-2, §4.1.2, EPSG method 9836 worked example on WGS 84 (values from memory):
        // origin 55°N, 5°E, 200 m; the §4.1.1 point has E = -189013.869, N = -128642.040, U = -4220.171 m.
        JsonNode n = json(coord("--from", "ecef@WGS84", "--to", "enu:55,5,200@WGS84", "--json", "3771793.968",
            "140253.342", "5124304.349"));
        assertThat(n.get("e").doubleValue()).isCloseTo(-189013.869, within(0.002));
        assertThat(n.get("n").doubleValue()).isCloseTo(-128642.040, within(0.002));
        assertThat(n.get("u").doubleValue()).isCloseTo(-4220.171, within(0.002));
        assertThat(n.get("system").asText()).isEqualTo("enu:55,5,200@WGS 84");
    }

    // ---- geoid ----

    static final String FLAT_ISG = String.join("\n", "begin_of_head ====", "model name : FLAT", "lat min : 40",
        "lat max : 41", "lon min : 0", "lon max : 1", "delta lat : 1", "delta lon : 1", "nrows : 2", "ncols : 2",
        "nodata : -9999", "ISG format : 2.0", "end_of_head ====", "47.0 48.0", "45.0 46.0", "");

    @Test
    void geoidGivesOrthometricHeights(@TempDir Path dir) throws Exception {
        Path isg = dir.resolve("flat.isg");
        Files.writeString(isg, FLAT_ISG);
        // Source: ISG format v2.0 layout (rows north to south); hand-computed bilinear interpolation: at the
        // cell centre (40.5°, 0.5°) N is the mean of the four nodes, (47 + 48 + 45 + 46)/4 = 46.5 m.
        JsonNode n = json(coord("--from", "geodetic-orthometric@ETRF2000", "--to", "geodetic@ETRF2000", "--geoid",
            isg.toString(), "--json", "40.5", "0.5", "100"));
        assertThat(n.get("h").doubleValue()).isCloseTo(146.5, within(1e-9));
        JsonNode back = json(coord("--from", "geodetic", "--to", "geodetic-orthometric", "--geoid", isg.toString(),
            "--json", "40.5", "0.5", "146.5"));
        assertThat(fieldNames(back)).startsWith("lat", "lon", "H");
        assertThat(back.get("H").doubleValue()).isCloseTo(100, within(1e-9));
        assertThat(coord("--from", "geodetic", "--to", "geodetic-orthometric", "--geoid", isg.toString(), "--explain",
            "40.5", "0.5", "146.5").out()).contains("orthometric-height", "ellipsoidal → orthometric height",
            "Geoid undulation from FLAT");
    }

    @Test
    void corruptGeoidFileExitsFour(@TempDir Path dir) throws Exception {
        Path isg = dir.resolve("truncated.isg");
        Files.writeString(isg, FLAT_ISG.substring(0, FLAT_ISG.lastIndexOf("45.0")));
        CliRun r = coord("--from", "geodetic-orthometric", "--to", "geodetic", "--geoid", isg.toString(), "40.5",
            "0.5", "100");
        assertThat(r.exitCode()).isEqualTo(4);
        assertThat(r.err()).startsWith("geotick: ").contains("truncated.isg").doesNotContain("\tat ");
        assertThat(r.out()).isEmpty();
    }

    @Test
    void missingGeoidFileExitsThree(@TempDir Path dir) throws IOException {
        CliRun r = coord("--from", "geodetic-orthometric", "--to", "geodetic", "--geoid",
            dir.resolve("none.isg").toString(), "40.5", "0.5", "100");
        assertThat(r.exitCode()).isEqualTo(3);
        assertThat(r.err()).contains("none.isg");
    }

    // ---- bad input: exit 2, one line naming the problem ----

    static Stream<Arguments> badInputs() {
        String[] p = {"4027894.006", "307045.600", "4919474.910"};
        List<Arguments> a = new ArrayList<>();
        a.add(Arguments.of(with(args("--from", "ecef@ITRF2099", "--to", "ecef@ITRF2020"), p),
            "'ecef@ITRF2099': unknown frame 'ITRF2099'; known frames: ITRF2020"));
        a.add(Arguments.of(with(args("--from", "ecef@ITRF2020", "--to", "geodetic@ETRF2000"), p),
            "the step ITRF2020 → ITRF2014 (time-dependent Helmert"));
        a.add(Arguments.of(with(args("--from", "ecef@ITRF2020", "--to", "geodetic@ETRF2000"), p), "give --epoch"));
        a.add(Arguments.of(with(args("--from", "ecef@ITRF2020", "--to", "ecef@WGS84"), p), "needs the coordinate epoch"));
        a.add(Arguments.of(with(args("--from", "ecef@ITRF2020", "--to", "ecef@WGS84", "--epoch", "1999.0"), p),
            "no chain of parameter sets joins ITRF2020 and WGS 84 for coordinates at epoch 1999.0"));
        a.add(Arguments.of(with(args("--from", "ecef@ITRF2020", "--to", "ecef@ETRF2000", "--epoch", "yesterday"), p),
            "--epoch: epoch 'yesterday' is neither a decimal year"));
        a.add(Arguments.of(with(args("--from", "ecef@ITRF2020", "--to", "ecef@ETRF2000", "--epoch", "1700"), p),
            "--epoch '1700': epoch 1700.0 is not a decimal year in [1800, 2200]"));
        a.add(Arguments.of(with(args("--from", "ecef@ITRF2020", "--to", "ecef@ETRF2000", "--epoch", "2024-02-30"), p),
            "epoch '2024-02-30'"));
        a.add(Arguments.of(with(args("--from", "ecef@ITRF2020", "--to", "geodetic"), p),
            "'ecef@ITRF2020' names a frame but 'geodetic' does not"));
        a.add(Arguments.of(with(args("--from", "geodetic@ETRF2000", "--to", "ecef@ETRF2000", "--ellipsoid", "WGS 84"),
            "50", "4", "100"), "--ellipsoid 'WGS 84' is not the ellipsoid of frame ETRF2000 (GRS 1980)"));
        a.add(Arguments.of(with(args("--from", "ecef@WGS72", "--to", "ecef@WGS84", "--helmert", "0,0,4.5,0,0,0.554",
            "--convention", "position-vector"), p), "--helmert '0,0,4.5,0,0,0.554' has 6 values; it takes 7"));
        a.add(Arguments.of(with(args("--from", "ecef@WGS72", "--to", "ecef@WGS84", "--helmert", "0,0,4.5,0,0,abc,0.2",
            "--convention", "position-vector"), p), "--helmert RZ (arc-seconds) 'abc' is not a number"));
        a.add(Arguments.of(with(args("--from", "ecef@WGS72", "--to", "ecef@WGS84", "--helmert", "0,0,4.5,0,0,NaN,0.2",
            "--convention", "position-vector"), p), "'NaN' is not a number"));
        a.add(Arguments.of(with(args("--from", "ecef@WGS72", "--to", "ecef@WGS84", "--helmert",
            "0,0,4.5,0,0,0.554,0.219"), p), "--helmert needs --convention position-vector or coordinate-frame"));
        a.add(Arguments.of(with(args("--from", "ecef@WGS72", "--to", "ecef@WGS84", "--helmert",
            "0,0,4.5,0,0,0.554,0.219", "--convention", "clockwise"), p), "rotation convention 'clockwise'"));
        a.add(Arguments.of(with(args("--from", "ecef", "--to", "ecef", "--convention", "position-vector"), p),
            "--convention applies to --helmert"));
        a.add(Arguments.of(with(args("--from", "ecef@WGS84", "--to", "ecef@WGS84", "--helmert", "1,2,3,0,0,0,0",
            "--convention", "cf"), p), "--helmert between WGS 84 and itself"));
        a.add(Arguments.of(with(args("--from", "ecef", "--to", "ecef", "--helmert", "1,2,3,0,0,0,0", "--convention",
            "cf", "--helmert-accuracy", "-1"), p), "--helmert-accuracy -1 m is negative"));
        a.add(Arguments.of(with(args("--from", "geodetic-orthometric", "--to", "geodetic"), "40", "0", "1"),
            "needs a geoid model: give --geoid FILE.isg"));
        a.add(Arguments.of(with(args("--from", "geodetic", "--to", "ecef", "--geoid", "x.isg"), "40", "0", "1"),
            "--geoid is used only with a geodetic-orthometric system"));
        return a.stream();
    }

    @ParameterizedTest(name = "{1}")
    @MethodSource("badInputs")
    void badInputGivesExitTwoAndNamesTheProblem(String[] args, String expected) {
        CliRun r = coord(args);
        assertThat(r.exitCode()).as(r.err()).isEqualTo(2);
        assertThat(r.out()).isEmpty();
        assertThat(r.err().lines()).hasSize(1);
        assertThat(r.err()).startsWith("geotick: ").contains(expected).doesNotContain("Exception").doesNotContain("\tat ");
    }

    // ---- help ----

    @Test
    void helpStatesFrameOptionsUnitsAndCautions() {
        CliRun r = coord("--help");
        assertThat(r.exitCode()).isZero();
        assertThat(r.out())
            .contains("--epoch", "--explain", "--helmert", "--convention", "--helmert-accuracy", "--geoid")
            .contains("SYS@FRAME", "ecef@ITRF2020", "geodetic@ETRF2000", "geodetic-orthometric", "geotick frames")
            .contains("metres", "arc-seconds", "ppm", "position-vector", "coordinate-frame", "EPSG 1033/9606")
            .contains("about 0.1 m", "1-2 cm", "geodetic authority", "licensed surveyors");
    }
}
