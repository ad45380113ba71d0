package io.geotick.cli.fit;

import com.fasterxml.jackson.databind.JsonNode;
import io.geotick.cli.Cautions;
import io.geotick.cli.ExitCode;
import io.geotick.cli.Json;
import io.geotick.cli.UserInputException;
import io.geotick.cli.coord.CoordinateSystemSpec;
import io.geotick.transforms.fit.ControlPoint;
import io.geotick.transforms.fit.FitOptions;
import io.geotick.transforms.fit.FitParameter;
import io.geotick.transforms.fit.FitStatistics;
import io.geotick.transforms.fit.PointResidual;
import io.geotick.transforms.fit.SiteFit;
import io.geotick.transforms.fit.SiteFitter;
import io.geotick.transforms.fit.SiteModel;
import io.geotick.transforms.fit.SiteModelKind;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code geotick fit}: estimates a site grid from control-point pairs (the transforms library's
 * {@link SiteFitter}: least squares with Hipparchus) and reports parameters with uncertainties, residuals
 * per point, RMS and outlier flags; {@code -o} saves the model for {@code geotick coord --to site:FILE}.
 */
@Command(name = "fit", mixinStandardHelpOptions = true, sortOptions = false,
    customSynopsis = {"geotick fit --model similarity|affine|helmert3d [--from SYS]",
        "      [-o SITE.json] [--json] [--outlier-threshold K] [--exclude-outliers] PAIRS.csv"},
    description = {
        "Fit a site grid to control points by least squares.",
        "",
        "Models: a 2D similarity (4 parameters), a 2D affine (6) or a 3D Helmert (7),",
        "with parameter uncertainties, residuals per point, RMS and outlier flags",
        "(standardised residual above K).",
        "",
        "PAIRS.csv: a header row, then one row per point: id, the source coordinates",
        "(2, or 3 for helmert3d) in the --from system's order, then the site-grid",
        "coordinates (as many), e.g.",
        "  id,easting,northing,site_x,site_y",
        "  CP1,355012.412,5118102.330,1012.405,2100.118",
        "Every row is used or reported: any bad row (named by line and field) stops",
        "the fit.",
        ""},
    optionListHeading = "Options:%n",
    footer = {"",
        "The 2D models act on the first two values of --from (e.g. easting, northing",
        "of utm:30N@ETRF2000) and pass the height through; helmert3d acts on all three",
        "(e.g. ecef@ETRF2000). With --from, the saved model can be used as a system in",
        "geotick coord: --to site:SITE.json (and --from site:SITE.json, through its",
        "inverse). A fitted grid is valid inside the area of its control points;",
        "outside it errors grow.",
        "Units: source values are in the --from system's unit (an EPSG grid in US",
        "survey feet takes ftUS, as geotick coord prints it); the report's m labels",
        "(translations, residuals, sigma0, rms) stand for the site grid's own unit,",
        "metres in the usual case.",
        "",
        "Example (invented file):",
        "  geotick fit --model similarity --from utm:30N@ETRF2000 \\",
        "    -o quay.json quay-marks.csv",
        "",
        "Exit codes: 0 ok; 2 bad usage, bad rows or a degenerate fit (the message names",
        "  them); 3 file not readable or writable.",
        "",
        Cautions.TEXT})
public final class FitCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Option(names = "--model", required = true, paramLabel = "MODEL",
        description = "similarity (2D, 4 parameters), affine (2D, 6) or helmert3d (3D, 7).")
    String model;

    @Option(names = "--from", paramLabel = "SYS",
        description = "The system of the source coordinates, as geotick coord names it (e.g. utm:30N@ETRF2000, "
            + "EPSG:27700, ecef@ETRF2000); stored in the model so that coord can use it. Without it the model "
            + "states no source system and coord cannot use it.")
    String from;

    @Option(names = {"-o", "--output"}, paramLabel = "SITE.json", description = "Write the fitted model to this file.")
    Path output;

    @Option(names = "--json", description = "Print the report as one JSON object (the model file's content).")
    boolean json;

    @Option(names = "--outlier-threshold", paramLabel = "K",
        description = "Flag a point whose largest standardised residual exceeds K (default 3).")
    String threshold;

    @Option(names = "--exclude-outliers",
        description = "Refit once without the flagged points; they stay in the report with their prediction "
            + "residuals, marked excluded.")
    boolean excludeOutliers;

    @Parameters(index = "0", paramLabel = "PAIRS.csv", description = "The control-point pairs.")
    Path pairs;

    @Override
    public Integer call() {
        SiteModelKind kind = kind(model);
        String source = "";
        String sourceUnitNote = "";
        if (from != null) {
            CoordinateSystemSpec s = CoordinateSystemSpec.parse(from);
            if (s.text().equals("utm")) {
                throw new UserInputException("--from 'utm': a site model needs a fixed source system; give the zone, "
                    + "e.g. utm:31N");
            }
            if (s.text().startsWith("site:")) {
                throw new UserInputException("--from '" + from + "': a site model cannot start from another site grid");
            }
            source = s.text();
            // A grid in feet: the model maps the values as typed, in that unit (as `coord --to site:` feeds
            // them); what the report labels m is in the site grid's own unit, metres in the usual case.
            io.geotick.cli.coord.Unit u = s.axes().get(0).unit();
            if (u != io.geotick.cli.coord.Unit.METRE && u != io.geotick.cli.coord.Unit.DEGREE) {
                sourceUnitNote = "note         the --from values are in " + u.symbol() + " (the unit of " + s.text()
                    + "); the values labelled m below are in the site grid's own unit";
            }
        }
        FitOptions options = FitOptions.defaults();
        if (threshold != null) {
            double k;
            try {
                k = Double.parseDouble(threshold.strip());
            } catch (NumberFormatException e) {
                throw new UserInputException("--outlier-threshold '" + threshold + "' is not a number");
            }
            if (!(k > 0) || Double.isInfinite(k)) {
                throw new UserInputException("--outlier-threshold " + threshold + " must be a positive number");
            }
            options = options.withOutlierThreshold(k);
        }
        List<ControlPoint> points = PairsCsv.read(pairs, kind.dimension());
        SiteFit fit = SiteFitter.fit(kind, points, options);
        List<String> excluded = List.of();
        if (excludeOutliers) {
            excluded = fit.statistics().outliers().stream().map(PointResidual::id).toList();
            fit = fit.refitWithoutOutliers();
        }
        SiteModel m = fit.model().withSystems(source, "site grid fitted to " + pairs.getFileName());
        if (output != null) {
            m.write(output);
        }
        PrintWriter out = spec.commandLine().getOut();
        if (json) {
            JsonNode n;
            try {
                n = Json.MAPPER.readTree(m.toJson());
            } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
                throw new IllegalStateException("the model's own JSON did not read back", e);
            }
            out.println(Json.write(n));
        } else {
            if (!sourceUnitNote.isEmpty()) {
                out.println(sourceUnitNote);
            }
            out.print(text(m, excluded));
            if (output != null) {
                out.println("model written to " + output);
            }
        }
        out.flush();
        return ExitCode.OK;
    }

    static SiteModelKind kind(String text) {
        String t = text.strip().toLowerCase(Locale.ROOT);
        switch (t) {
            case "similarity":
                return SiteModelKind.SIMILARITY_2D;
            case "affine":
                return SiteModelKind.AFFINE_2D;
            case "helmert3d":
                return SiteModelKind.HELMERT_3D;
            default:
                try {
                    return SiteModelKind.parse(t);
                } catch (IllegalArgumentException e) {
                    throw new UserInputException("--model '" + text + "' is none of similarity, affine, helmert3d");
                }
        }
    }

    /** The text report: model, statistics, parameters with uncertainties, residuals with flags. */
    static String text(SiteModel m, List<String> excluded) {
        StringBuilder s = new StringBuilder();
        String nl = System.lineSeparator();
        FitStatistics st = m.statistics();
        s.append("model        ").append(m.kind().id()).append(nl);
        s.append("from         ").append(m.sourceSystem().isEmpty() ? "(not stated)" : m.sourceSystem()).append(nl);
        s.append("points       ").append(st.pointsUsed()).append(" used of ").append(st.pointsGiven()).append(nl);
        s.append("redundancy   ").append(st.redundancy()).append(nl);
        s.append("sigma0       ").append(st.sigma0().isPresent() ? f("%.4f m", st.sigma0().getAsDouble())
            : "not known (no redundancy)").append(nl);
        s.append("rms          ").append(f("%.4f m", st.rms())).append(nl);
        s.append("parameters").append(nl);
        for (FitParameter p : m.parameters()) {
            s.append(f("  %-9s %s %s", p.name(), sig(p.value()), "1".equals(p.unit()) ? "" : p.unit()).stripTrailing());
            s.append(p.sigma().isPresent() ? f("  ± %.3g", p.sigma().getAsDouble()) : "  ± not known").append(nl);
        }
        for (FitParameter p : m.derivedParameters()) {
            s.append(f("  %-9s %s %s", p.name(), sig(p.value()), "1".equals(p.unit()) ? "" : p.unit()).stripTrailing())
                .append(p.sigma().isPresent() ? f("  ± %.3g", p.sigma().getAsDouble()) : "").append("  (derived)")
                .append(nl);
        }
        s.append(f("residuals (observed - fitted, m; flagged above %s)", num(st.outlierThreshold()))).append(nl);
        for (PointResidual r : st.residuals()) {
            OptionalDouble w = r.standardised();
            s.append(f("  %-10s dx %9.4f  dy %9.4f", r.id(), r.dx(), r.dy()));
            if (m.kind().dimension() == 3) {
                s.append(f("  dz %9.4f", r.dz()));
            }
            s.append(w.isPresent() ? f("  w %6.2f", w.getAsDouble()) : "  w    -  ");
            s.append(r.outlier() ? "  OUTLIER" : "").append(!r.used() ? "  excluded" : "").append(nl);
        }
        if (!excluded.isEmpty()) {
            s.append("refitted without ").append(String.join(", ", excluded)).append(" (--exclude-outliers)").append(nl);
        } else if (!st.outliers().isEmpty()) {
            s.append("warning      outliers flagged; check those points or refit with --exclude-outliers").append(nl);
        }
        return s.toString();
    }

    /** 12 significant digits (the JSON report and the model file keep every digit). */
    private static String sig(double v) {
        if (v != 0 && Math.abs(v) < 1e-6) {
            return f("%.3e", v);
        }
        return new java.math.BigDecimal(v).round(new java.math.MathContext(12)).stripTrailingZeros().toPlainString();
    }

    private static String num(double v) {
        return new java.math.BigDecimal(v).stripTrailingZeros().toPlainString();
    }

    private static String f(String format, Object... args) {
        return String.format(Locale.ROOT, format, args);
    }
}
