package io.geotick.cli.coord;

import io.geotick.cli.Cautions;
import io.geotick.cli.ExitCode;
import io.geotick.geodesy.ellipsoid.Ellipsoid;
import io.geotick.geodesy.ellipsoid.Ellipsoids;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code geotick coord}: converts one point between coordinate systems.
 *
 * <p>The work is split so that each part can grow on its own: {@link SystemSpecParser} reads the SYS
 * texts into {@link CoordinateSystemSpec}s, {@link Conversion} takes the point through ECEF (with room for
 * frame and grid steps), and {@link TextOutput} and {@link JsonOutput} render the same
 * {@link ConvertedPoint}. Bad input surfaces as an {@link IllegalArgumentException} whose message names the
 * value; {@link io.geotick.cli.Main} turns it into one line and exit code 2.
 */
@Command(name = "coord",
    mixinStandardHelpOptions = true,
    sortOptions = false,
    customSynopsis = "geotick coord --from SYS --to SYS [--ellipsoid NAME] [--json] [--] V1 V2 V3",
    description = {
        "Convert one point between coordinate systems.",
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
        "",
        "Angles are decimal degrees. Negative values may follow the options directly",
        "or after '--', which ends the options.",
        ""},
    parameterListHeading = "Values:%n",
    optionListHeading = "Options:%n",
    footer = {
        "",
        "Output: one 'label value unit' line per value, after 'system' and 'ellipsoid'",
        "lines. Text rounds angles to 1e-11 deg and lengths to 1e-6 m (both about 1 um);",
        "--json prints one object with the values as top-level numbers at full double",
        "precision: lat, lon, h | x, y, z | e, n, u | n, e, d | az, el, range, plus",
        "\"system\" and \"ellipsoid\".",
        "",
        "Examples (invented points):",
        "  geotick coord --from geodetic --to ecef -12.3456 130.9876 25",
        "  geotick coord --from ecef --to aer:-12.3456,130.9876,25 --json \\",
        "      -- -4088131.4 4702626.4 -1357035.1",
        "",
        "Exit codes: 0 ok; 2 bad usage or input (the message names the value).",
        "",
        Cautions.TEXT})
public final class CoordCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Option(names = "--from", required = true, paramLabel = "SYS", description = "System of the input values.")
    String from;

    @Option(names = "--to", required = true, paramLabel = "SYS", description = "System of the output values.")
    String to;

    @Option(names = "--ellipsoid", paramLabel = "NAME", defaultValue = "WGS 84",
        description = "Ellipsoid of geodetic values and local origins, by name or EPSG code "
            + "(e.g. 'GRS 1980', EPSG:7004); an unknown name lists the known ones. Default: ${DEFAULT-VALUE}.")
    String ellipsoid;

    @Option(names = "--json", description = "Print one JSON object instead of text.")
    boolean json;

    @Parameters(paramLabel = "V", arity = "0..*", description = "The point's three values in the --from system.")
    List<String> values = new ArrayList<>();

    @Override
    public Integer call() {
        CoordinateSystemSpec source = CoordinateSystemSpec.parse(from);
        CoordinateSystemSpec target = CoordinateSystemSpec.parse(to);
        Ellipsoid e = Ellipsoids.byName(ellipsoid);
        ConvertedPoint result = Conversion.of(source, target, e).convert(values);
        PrintWriter out = spec.commandLine().getOut();
        if (json) {
            out.println(JsonOutput.render(result));
        } else {
            out.print(TextOutput.render(result));
        }
        out.flush();
        return ExitCode.OK;
    }
}
