package io.geotick.cli.frames;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import io.geotick.cli.Cautions;
import io.geotick.cli.ExitCode;
import io.geotick.cli.Json;
import io.geotick.cli.coord.StepListing;
import io.geotick.transforms.StepDescription;
import io.geotick.transforms.frames.Frame;
import io.geotick.transforms.frames.FrameKind;
import io.geotick.transforms.frames.FrameLink;
import io.geotick.transforms.frames.FrameRegistry;
import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code geotick frames}: lists the frame registry, i.e. the frames usable as {@code SYS@FRAME} (with
 * ellipsoid, kind, EPSG CRS code and aliases) and the published parameter sets between them (method,
 * EPSG codes, parameters as published, source, accuracy, whether the coordinate epoch is needed,
 * cautions).
 */
@Command(name = "frames", mixinStandardHelpOptions = true, sortOptions = false,
    description = {"List the reference frames usable as SYS@FRAME in 'geotick coord', and the published "
            + "parameter sets (links) between them.",
        "Paths between frames are found through these links (via ITRF where needed) and",
        "evaluated at the coordinate epoch (--epoch).", ""},
    optionListHeading = "Options:%n",
    footer = {"",
        "Frame kinds: global (coordinates move with the plates: ITRF, WGS 84),",
        "plate-fixed (nearly static on one plate: ETRF2000), static (a classic datum",
        "realised by a network).",
        "Text output: a 'frame' line per frame, then a 'link' block per parameter set.",
        "--json: {\"frames\": [{name, aliases, kind, ellipsoid, epsg_crs, description}],",
        "  \"links\": [{from, to, name, method, epsg_method, epsg_transformation,",
        "  parameters, source, accuracy_m, cautions, needs_epoch, validity}]}.",
        "",
        "The built-in parameter sets were entered from memory of their publications",
        "(each source says so); for survey, cadastral and legal work use the values of",
        "your geodetic authority (geotick coord --helmert) and consult licensed",
        "surveyors.",
        "",
        Cautions.TEXT})
public final class FramesCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Option(names = "--json", description = "Print one JSON object instead of text.")
    boolean json;

    /** The kind as listed: "global", "plate-fixed", "static". */
    static String kindWord(FrameKind k) {
        return k.name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    @Override
    public Integer call() {
        FrameRegistry r = FrameRegistry.standard();
        PrintWriter out = spec.commandLine().getOut();
        if (json) {
            out.println(Json.write(toJson(r)));
        } else {
            out.print(text(r));
        }
        out.flush();
        return ExitCode.OK;
    }

    static ObjectNode toJson(FrameRegistry r) {
        ObjectNode o = Json.object();
        ArrayNode fs = o.putArray("frames");
        for (Frame f : r.frames()) {
            ObjectNode n = fs.addObject();
            n.put("name", f.name());
            ArrayNode a = n.putArray("aliases");
            f.aliases().forEach(a::add);
            n.put("kind", kindWord(f.kind()));
            n.put("ellipsoid", f.ellipsoid().name());
            if (f.epsgCrs().isPresent()) {
                n.put("epsg_crs", f.epsgCrs().getAsInt());
            } else {
                n.putNull("epsg_crs");
            }
            n.put("description", f.description());
        }
        ArrayNode ls = o.putArray("links");
        for (FrameLink l : r.links()) {
            StepDescription d = l.describe();
            ObjectNode n = Json.object();
            n.put("from", l.from().name());
            n.put("to", l.to().name());
            n.setAll(StepListing.json(d, OptionalDouble.of(d.accuracyMetres())));
            n.put("needs_epoch", l.requiresEpoch());
            n.put("validity", l.validity());
            ls.add(n);
        }
        return o;
    }

    static String text(FrameRegistry r) {
        String nl = System.lineSeparator();
        StringBuilder s = new StringBuilder();
        List<Frame> frames = r.frames();
        int w = frames.stream().mapToInt(f -> f.name().length()).max().orElse(0);
        int we = frames.stream().mapToInt(f -> f.ellipsoid().name().length()).max().orElse(0);
        s.append("frames: ").append(frames.size()).append(" (name, kind, ellipsoid, EPSG CRS, aliases)").append(nl);
        for (Frame f : frames) {
            s.append(String.format(Locale.ROOT, "frame  %-" + w + "s  %-11s  %-" + we + "s  %-10s  %s", f.name(),
                kindWord(f.kind()), f.ellipsoid().name(),
                f.epsgCrs().isPresent() ? "EPSG:" + f.epsgCrs().getAsInt() : "-",
                f.aliases().isEmpty() ? "-" : String.join(", ", f.aliases())));
            s.append(nl).append("       ").append(" ".repeat(w)).append("  ").append(f.description()).append(nl);
        }
        s.append(nl).append("links: ").append(r.links().size())
            .append(" (published parameter sets; usable in either direction)").append(nl);
        for (FrameLink l : r.links()) {
            StepDescription d = l.describe();
            s.append("link   ");
            StepListing.appendStep(s, d, OptionalDouble.of(d.accuracyMetres()), "       ");
            s.append("       needs epoch: ").append(l.requiresEpoch() ? "yes" : "no")
                .append(l.validity().isEmpty() ? "" : " (" + l.validity() + ")").append(nl);
        }
        return s.toString();
    }
}
