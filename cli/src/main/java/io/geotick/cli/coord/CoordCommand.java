package io.geotick.cli.coord;

import io.geotick.cli.Cautions;
import io.geotick.cli.CsvBatch;
import io.geotick.cli.ExitCode;
import io.geotick.cli.UserInputException;
import io.geotick.geodesy.ellipsoid.Ellipsoids;
import io.geotick.transforms.Epoch;
import io.geotick.transforms.grid.Ntv2Grid;
import io.geotick.transforms.height.GeoidGrid;
import io.geotick.transforms.helmert.Helmert;
import io.geotick.transforms.helmert.HelmertParameters;
import io.geotick.transforms.helmert.RotationConvention;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code geotick coord}: converts one point between coordinate systems, or with {@code --input} every row of a
 * CSV file through the same conversion ({@link RowStream}).
 *
 * <p>The work is split so that each part can grow on its own: {@link SystemSpecParser} reads the SYS
 * texts into {@link CoordinateSystemSpec}s (with their frames), {@link Conversion} takes the point through
 * ECEF and the frame steps of the transforms library, and {@link TextOutput}, {@link JsonOutput} and
 * {@link StepListing} render the same {@link ConvertedPoint}. Bad input surfaces as an {@link IllegalArgumentException} whose message names the
 * value; {@link io.geotick.cli.Main} turns it into one line and exit code 2.
 */
@Command(name = "coord",
    mixinStandardHelpOptions = true,
    sortOptions = false,
    customSynopsis = {"geotick coord --from SYS --to SYS [--ellipsoid NAME] [--epoch EPOCH]",
        "      [--helmert TX,TY,TZ,RX,RY,RZ,DS --convention CONV [--helmert-accuracy M]",
        "       | --ntv2 FILE.gsb [--ntv2-reverse]",
        "       | --molodensky DX,DY,DZ [--abridged] [--molodensky-accuracy M]]",
        "      [--geoid FILE.isg] [--explain] [--json] [--] V1 V2 V3",
        "       geotick coord --from SYS --to SYS [same options] --input FILE|-",
        "      [--output FILE] [--json]"},
    description = {
        "Convert one point, or every row of a CSV file (--input), between coordinate systems and "
            + "reference frames.",
        "",
        "Systems (SYS) and their values V1 V2 V3, typed and printed in this order:",
        "  geodetic        latitude (deg, north positive), longitude (deg, east",
        "                  positive), ellipsoidal height (m)",
        "  ecef            x, y, z (m), Earth-centred Earth-fixed",
        "  enu:LAT,LON,H   east, north, up (m) in the local tangent frame about the",
        "                  geodetic origin LAT, LON (deg), H (m)",
        "  ned:LAT,LON,H   north, east, down (m) about the same kind of origin",
        "  aer:LAT,LON,H   azimuth (deg clockwise from north, 0 to below 360),",
        "                  elevation (deg), slant range (m) seen from the origin",
        "  geodetic-orthometric",
        "                  latitude, longitude (deg), orthometric height H = h - N (m)",
        "                  above the geoid of --geoid",
        "  utm:ZONE        UTM easting, northing (m), h (m, ellipsoidal, passed through);",
        "                  ZONE is 1-60 and N or S, e.g. utm:31N, utm:33S",
        "  utm             as a target: UTM with the zone chosen from the point",
        "                  (Norway and Svalbard exceptions included, 80S to 84N)",
        "  ups:N, ups:S    Universal Polar Stereographic easting, northing, h (m),",
        "                  north of 83.5N or south of 79.5S",
        "  EPSG:n          a projected (easting, northing in the system's unit, h in m)",
        "                  or geographic (latitude, longitude, h) system by its EPSG",
        "                  code, from the EPSG definitions bundled with Proj4J; the code",
        "                  implies its datum (EPSG:n@FRAME names the realisation",
        "                  instead). Systems defined in feet take and print easting and",
        "                  northing in feet (ft or ftUS, shown after each value)",
        "  site:FILE.json  a site grid fitted by 'geotick fit' (-o FILE.json): x, y and h",
        "                  (2D models) or x, y, z (helmert3d), in metres; reached through",
        "                  the model's source system (and its frame), as source or target",
        "A grid source takes E N h, or E N alone when the height is not known (it is",
        "then not printed). Grid targets also print the zone (UTM/UPS), the point",
        "scale factor and the meridian convergence (deg, true to grid north, clockwise).",
        "",
        "Frames (SYS@FRAME): append @FRAME to a system, e.g. ecef@ITRF2020,",
        "geodetic@ETRF2000, geodetic@OSGB36, enu:52,-1,80@OSGB36 (the origin is then in",
        "that frame).",
        "'geotick frames' lists the frames and the published parameter sets between",
        "them. Give a frame at both ends or at neither:",
        "  * neither: a purely geometric conversion on --ellipsoid (default WGS 84);",
        "  * both: each end on its frame's ellipsoid (--ellipsoid, if given, must be",
        "    that ellipsoid) and the registry's path between the frames, evaluated",
        "    at --epoch. Time-dependent steps (ITRF to ITRF, ITRF to ETRF2000,",
        "    WGS 84 to ITRF by date) refuse to run without --epoch: no default.",
        "",
        "Your own datum shift replaces the registry's path (one of the three):",
        "  --helmert        7 parameters, ECEF to ECEF, with --convention;",
        "  --ntv2           an NTv2 grid: its horizontal shift, in the file's direction",
        "                   (its SYSTEM_F to SYSTEM_T), from the --from frame to the",
        "                   --to frame, bilinear as the NTv2 format prescribes; heights",
        "                   pass through unchanged; a point outside the grid is an",
        "                   error, never passed through unshifted; --ntv2-reverse",
        "                   applies it from SYSTEM_T to SYSTEM_F instead (by iteration);",
        "  --molodensky     Molodensky (EPSG 9604) or, with --abridged, abridged",
        "                   Molodensky (9605) from the --from ellipsoid to the --to",
        "                   ellipsoid, with your translations DX,DY,DZ in metres; a",
        "                   first-order formula, about a metre or better for classic",
        "                   datum shifts (--explain states its approximation).",
        "",
        "Angles are decimal degrees. Negative values may follow the options directly",
        "or after '--', which ends the options.",
        "",
        "Streams (--input FILE, '-' for standard input): every row of a CSV file with",
        "a header row goes through the one conversion, built once from the options",
        "above; rows are read and written one at a time. The value columns are named",
        "like the --from system's --json keys (lat,lon,h | x,y,z | e,n,u | n,e,d |",
        "az,el,range | lat,lon,H | easting,northing,h), in any order; a grid source",
        "may leave out h (height unknown). Other columns (id, time ...) are passed",
        "through unchanged, in their order, before the results. Empty lines are not",
        "rows. Output (--output FILE, default standard output): CSV with the",
        "pass-through columns, the target's --json keys (grid targets: zone, scale,",
        "convergence, unit too) at full double precision, then 'error'; with --json,",
        "one JSON object per line (NDJSON). Every row gives one output row: a row",
        "that cannot be converted gets an error naming its line and the problem",
        "(the message a single point would give), and the batch goes on. The",
        "cautions are printed once on standard error. --explain is refused with",
        "--input (run it on one point).",
        ""},
    parameterListHeading = "Values:%n",
    optionListHeading = "Options:%n",
    footer = {
        "",
        "Output: one 'label value unit' line per value, after 'system' and 'ellipsoid'",
        "lines (and an 'epoch' line when given); one 'warning' line per caution of the",
        "parameter sets used. Text rounds angles to 1e-11 deg and lengths to 1e-6 m",
        "(both about 1 um). --explain then lists every step: method with EPSG codes,",
        "parameters with units at the epoch, source, accuracy, cautions.",
        "--json prints one object with the values as top-level numbers at full double",
        "precision: lat, lon, h | lat, lon, H | x, y, z | e, n, u | n, e, d |",
        "az, el, range | easting, northing, h with zone (UTM/UPS), scale,",
        "convergence (deg) and \"unit\" (of easting and northing: m, ft, ftUS ...),",
        "plus \"system\", \"ellipsoid\", \"from\", \"to\", \"epoch\"",
        "(decimal year or null), \"warnings\" (when there are any) and, with --explain,",
        "\"steps\" and \"accuracy_m\".",
        "",
        "Examples (invented points):",
        "  geotick coord --from geodetic --to ecef -12.3456 130.9876 25",
        "  geotick coord --from ecef --to aer:-12.3456,130.9876,25 --json \\",
        "      -- -4088131.4 4702626.4 -1357035.1",
        "  geotick coord --from ecef@ITRF2020 --to geodetic@ETRF2000 \\",
        "      --epoch 2026-03-15 --explain 4027894.006 307045.600 4919474.910",
        "  geotick coord --from geodetic --to utm --json 51.4321 7.0123 95",
        "  geotick coord --from utm:33S --to geodetic 412345.6 6123456.7 12.5",
        "  geotick coord --from geodetic@OSGB36 --to EPSG:27700 --explain 52.1 -1.4 80",
        "  geotick coord --from ecef@WGS72 --to ecef@WGS84 --convention position-vector \\",
        "      --helmert 0,0,4.5,0,0,0.554,0.219 3657660.66 255768.55 5201382.11",
        "  geotick coord --from geodetic@ED50 --to geodetic@ETRF2000 --ntv2 my-grid.gsb \\",
        "      --explain 40.42 -3.70 650",
        "  geotick coord --from geodetic@WGS84 --to geodetic@ED50 \\",
        "      --molodensky 84.87,96.49,116.95 --abridged 53.81 2.13 73",
        "  geotick coord --from geodetic --to utm:32N --input marks.csv --output out.csv",
        "    with marks.csv (invented):   id,lat,lon,h",
        "                                 M1,48.1372,11.5756,519.4",
        "    gives out.csv:               id,easting,northing,h,zone,scale,",
        "                                 convergence,unit,error",
        "                                 M1,691611.2155328812,5334758.052842829,",
        "                                 519.4,32N,1.0000511428481584,",
        "                                 1.9187458763514231,m,",
        "    (each output record on one line; wrapped here)",
        "",
        "WGS 84 is taken as the ITRF realisation it was aligned to at the coordinate",
        "epoch: about 0.1 m agreement for G1150 (2002-2012), 1-2 cm from G1762 on, as",
        "the registry states; positions from broadcast orbits are only good to ~1 m.",
        "Survey, cadastral and legal work defers to the local geodetic authority and",
        "licensed surveyors: use their published parameters (--helmert) and grids",
        "(--ntv2).",
        "",
        "Exit codes: 0 ok; 2 bad usage or input, a point outside the --ntv2 grid (the",
        "  message names the value or point), with --input a bad header (a missing",
        "  value column is named with the expected names); 3 file not readable",
        "  (--input, or CSV that cannot be parsed on) or not writable (--output);",
        "  4 invalid NTv2 grid, geoid or site-model file; 5 --input finished with",
        "  error rows ('geotick: N of M rows failed' on standard error).",
        "",
        Cautions.TEXT})
public final class CoordCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Option(names = "--from", required = true, paramLabel = "SYS",
        description = "System of the input values, optionally @FRAME.")
    String from;

    @Option(names = "--to", required = true, paramLabel = "SYS",
        description = "System of the output values, optionally @FRAME.")
    String to;

    @Option(names = "--ellipsoid", paramLabel = "NAME",
        description = "Ellipsoid of geodetic values and local origins when no frame is named, by name or EPSG "
            + "code (e.g. 'GRS 1980', EPSG:7004); an unknown name lists the known ones. Default: WGS 84. "
            + "With frames, each frame's own ellipsoid is used and this option must match it.")
    String ellipsoid;

    @Option(names = "--epoch", paramLabel = "EPOCH",
        description = "Coordinate epoch: a decimal year (2024.5) or a date (2024-07-01, taken at 0 h). "
            + "Required by time-dependent steps; the coordinates keep this epoch (frames change, time does not).")
    String epoch;

    @Option(names = "--helmert", paramLabel = "TX,TY,TZ,RX,RY,RZ,DS",
        description = "Your own 7-parameter Helmert set from source to target, from your geodetic authority: "
            + "translations TX,TY,TZ in metres, rotations RX,RY,RZ in arc-seconds, scale difference DS in ppm "
            + "(scale 1 + DS*1e-6), small-angle matrix as EPSG defines the methods. Between two @FRAMEs it "
            + "replaces the registry's path; without frames it applies between the ECEF positions on "
            + "--ellipsoid. Needs --convention.")
    String helmert;

    @Option(names = "--convention", paramLabel = "CONV",
        description = "Rotation convention of --helmert, as your source prints it: position-vector "
            + "(EPSG 1033/9606) or coordinate-frame (EPSG 1032/9607). Required with --helmert: the same "
            + "numbers rotate the other way in the other convention (about 60 m per arc-second).")
    String convention;

    @Option(names = "--helmert-accuracy", paramLabel = "M",
        description = "Accuracy of the --helmert set in metres, as its source states it; without it the "
            + "accuracy is shown as 'not stated'.")
    String helmertAccuracy;

    @Option(names = "--ntv2", paramLabel = "FILE.gsb",
        description = "NTv2 grid-shift file (the published binary layout, either byte order, subgrids): its "
            + "horizontal shift from the --from frame to the --to frame, bilinear; heights pass through unchanged. "
            + "Replaces the registry's path; a point outside the grid is an error, never passed through. "
            + "No grid is built in.")
    Path ntv2;

    @Option(names = "--ntv2-reverse",
        description = "With --ntv2: apply the grid against its direction, from its SYSTEM_T to its SYSTEM_F "
            + "(the forward shift inverted by iteration to < 1e-9 deg), for a grid published one way only.")
    boolean ntv2Reverse;

    @Option(names = "--molodensky", paramLabel = "DX,DY,DZ",
        description = "Your own geocentric translations DX,DY,DZ in metres for a Molodensky shift (EPSG 9604) "
            + "from the --from ellipsoid to the --to ellipsoid (each end's frame, or --ellipsoid at both), in "
            + "the geodetic domain. Replaces the registry's path.")
    String molodensky;

    @Option(names = "--abridged", description = "With --molodensky: the abridged formulas (EPSG 9605).")
    boolean abridged;

    @Option(names = "--molodensky-accuracy", paramLabel = "M",
        description = "Accuracy of the --molodensky translations in metres, as their source states it; without "
            + "it the accuracy is shown as 'not stated'.")
    String molodenskyAccuracy;

    @Option(names = "--geoid", paramLabel = "FILE.isg",
        description = "Geoid-undulation grid in the ISG text format, for geodetic-orthometric systems "
            + "(bilinear interpolation). No geoid model is built in.")
    Path geoid;

    @Option(names = "--explain", description = "List every step after the result (with --json: \"steps\").")
    boolean explain;

    @Option(names = "--json", description = "Print one JSON object instead of text (with --input: one object per "
        + "row, NDJSON).")
    boolean json;

    @Option(names = "--input", paramLabel = "FILE",
        description = "Convert every row of a CSV file with a header row ('-': standard input) instead of one "
            + "point: value columns named like the --from system's JSON keys (lat,lon,h | x,y,z | "
            + "easting,northing[,h] ...), other columns passed through. Output: CSV (or NDJSON with --json).")
    String input;

    @Option(names = "--output", paramLabel = "FILE",
        description = "With --input: write the rows to FILE instead of standard output ('-': standard output).")
    String output;

    @Parameters(paramLabel = "V", arity = "0..*", description = "The point's three values in the --from system.")
    List<String> values = new ArrayList<>();

    @Override
    public Integer call() {
        CoordinateSystemSpec source = CoordinateSystemSpec.parse(from);
        CoordinateSystemSpec target = CoordinateSystemSpec.parse(to);
        Conversion.Builder b = Conversion.builder(source, target);
        if (ellipsoid != null) {
            b.ellipsoid(Ellipsoids.byName(ellipsoid));
        }
        if (epoch != null) {
            b.epoch(epoch(epoch));
        }
        userHelmert().ifPresent(b::helmert);
        userMolodensky().ifPresent(b::molodensky);
        if (ntv2 != null) {
            if (helmert != null || molodensky != null) {
                throw new UserInputException("--ntv2 and " + (helmert != null ? "--helmert" : "--molodensky")
                    + " are two datum shifts; give one");
            }
            b.ntv2(Ntv2Grid.read(ntv2)).ntv2Reverse(ntv2Reverse);
        } else if (ntv2Reverse) {
            throw new UserInputException("--ntv2-reverse needs --ntv2 FILE.gsb");
        }
        if (geoid != null) {
            Conversion.checkGeoidUse(source, target);
            b.geoid(GeoidGrid.read(geoid));
        }
        CsvBatch.checkUse(input, output, values, "a single point");
        if (input != null) {
            if (explain) {
                throw new UserInputException("--explain lists the steps of one point and is not used with --input;"
                    + " run it on one point of the file");
            }
            return stream(b.build());
        }
        ConvertedPoint result = b.build().convert(values);
        PrintWriter out = spec.commandLine().getOut();
        if (json) {
            out.println(JsonOutput.render(result, explain));
        } else {
            out.print(TextOutput.render(result));
            if (explain) {
                out.println();
                out.print(StepListing.text(result.steps(), result.accuracyMetres()));
            }
        }
        out.flush();
        return ExitCode.OK;
    }

    /**
     * The batch mode: every row of {@code --input} through the one conversion (see {@link RowStream} and
     * {@link CsvBatch#execute}). Exit 0 if every row converted, {@link ExitCode#PARTIAL} with a one-line summary
     * on stderr if any became an error row.
     */
    private int stream(Conversion conversion) {
        PrintWriter err = spec.commandLine().getErr();
        RowStream rows = RowStream.of(conversion, json);
        return CsvBatch.execute(input, output, json, spec.commandLine().getOut(), err, rows.expectedHeader(),
            rows.planner(w -> err.println("geotick: warning: " + w)));
    }

    /** The coordinate epoch; a number outside the supported range is named as such, not as unreadable. */
    static Epoch epoch(String text) {
        try {
            return Epoch.parse(text);
        } catch (IllegalArgumentException e) {
            Throwable c = e.getCause();
            if (c instanceof IllegalArgumentException && !(c instanceof NumberFormatException)) {
                throw new UserInputException("--epoch '" + text + "': " + c.getMessage(), e);
            }
            throw new UserInputException("--epoch: " + e.getMessage(), e);
        }
    }

    private java.util.Optional<Conversion.UserMolodensky> userMolodensky() {
        if (molodensky == null) {
            if (abridged || molodenskyAccuracy != null) {
                throw new UserInputException((abridged ? "--abridged" : "--molodensky-accuracy")
                    + " applies to --molodensky, which is not given");
            }
            return java.util.Optional.empty();
        }
        if (helmert != null) {
            throw new UserInputException("--molodensky and --helmert are two datum shifts; give one");
        }
        String[] parts = molodensky.split(",", -1);
        if (parts.length != 3) {
            throw new UserInputException("--molodensky '" + molodensky + "' has " + parts.length + " value"
                + (parts.length == 1 ? "" : "s") + "; it takes 3: DX,DY,DZ (m)");
        }
        String[] names = {"DX (m)", "DY (m)", "DZ (m)"};
        double[] v = new double[3];
        for (int i = 0; i < 3; i++) {
            v[i] = NumberArgs.decimal("--molodensky " + names[i], parts[i].strip());
        }
        OptionalDouble acc = OptionalDouble.empty();
        if (molodenskyAccuracy != null) {
            double a = NumberArgs.length("--molodensky-accuracy", molodenskyAccuracy);
            if (a < 0) {
                throw new UserInputException("--molodensky-accuracy " + molodenskyAccuracy + " m is negative");
            }
            acc = OptionalDouble.of(a);
        }
        return java.util.Optional.of(new Conversion.UserMolodensky(v[0], v[1], v[2], abridged, acc));
    }

    private java.util.Optional<Conversion.UserHelmert> userHelmert() {
        if (helmert == null) {
            if (convention != null || helmertAccuracy != null) {
                throw new UserInputException((convention != null ? "--convention" : "--helmert-accuracy")
                    + " applies to --helmert, which is not given");
            }
            return java.util.Optional.empty();
        }
        if (convention == null) {
            throw new UserInputException("--helmert needs --convention position-vector or coordinate-frame: the"
                + " same numbers rotate the other way in the other convention (about 60 m per arc-second)");
        }
        String[] parts = helmert.split(",", -1);
        String[] names = {"TX (m)", "TY (m)", "TZ (m)", "RX (arc-seconds)", "RY (arc-seconds)", "RZ (arc-seconds)",
            "DS (ppm)"};
        if (parts.length != names.length) {
            throw new UserInputException("--helmert '" + helmert + "' has " + parts.length + " value"
                + (parts.length == 1 ? "" : "s") + "; it takes 7: TX,TY,TZ (m), RX,RY,RZ (arc-seconds), DS (ppm)");
        }
        double[] v = new double[names.length];
        for (int i = 0; i < v.length; i++) {
            v[i] = NumberArgs.decimal("--helmert " + names[i], parts[i].strip());
        }
        RotationConvention c = RotationConvention.parse(convention);
        OptionalDouble acc = OptionalDouble.empty();
        if (helmertAccuracy != null) {
            double a = NumberArgs.length("--helmert-accuracy", helmertAccuracy);
            if (a < 0) {
                throw new UserInputException("--helmert-accuracy " + helmertAccuracy + " m is negative");
            }
            acc = OptionalDouble.of(a);
        }
        HelmertParameters p = HelmertParameters.of(v[0], v[1], v[2], v[3], v[4], v[5], v[6]);
        Helmert h = c == RotationConvention.POSITION_VECTOR ? Helmert.positionVector(p) : Helmert.coordinateFrame(p);
        return java.util.Optional.of(new Conversion.UserHelmert(h, acc));
    }
}
