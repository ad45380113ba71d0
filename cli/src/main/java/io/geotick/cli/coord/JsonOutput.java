package io.geotick.cli.coord;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import io.geotick.cli.Json;

/**
 * Renders a {@link ConvertedPoint} as one JSON object: the target's values as top-level number fields
 * under their keys ({@code lat, lon, h} | {@code lat, lon, H} | {@code x, y, z} | {@code e, n, u} |
 * {@code n, e, d} | {@code az, el, range} | {@code easting, northing, h} (h only when known), then for grid
 * targets {@code zone} (UTM/UPS: "31N", "N"), {@code scale} and {@code convergence} (degrees) and {@code unit}
 * (the unit of easting and northing: "m", or the EPSG system's, e.g. "ft", "ftUS"; h stays metres)), then
 * {@code "system"} (the canonical SYS text of the target),
 * {@code "ellipsoid"} (its name), {@code "from"} and {@code "to"} (the canonical SYS texts),
 * {@code "epoch"} (decimal year, or null when none was given), {@code "warnings"} (only when there are
 * any) and, with {@code --explain}, {@code "steps"} (see {@link StepListing#json}) and {@code "accuracy_m"}
 * (root-sum-square of the steps; null if a step's accuracy is not stated). Numbers are written at full
 * double precision: the text reads back to the identical double.
 * <pre>
 * {"lat":53.80939443996212,"lon":2.1295500013207684,"h":72.99993067204181,"system":"geodetic",
 *  "ellipsoid":"WGS 84","from":"ecef","to":"geodetic","epoch":null}
 * </pre>
 */
public final class JsonOutput {
    private JsonOutput() {
    }

    /** The JSON object, without the steps. */
    public static ObjectNode toJson(ConvertedPoint p) {
        return toJson(p, false);
    }

    /** The JSON object; {@code explain} adds the steps and the combined accuracy. */
    public static ObjectNode toJson(ConvertedPoint p, boolean explain) {
        ObjectNode o = Json.object();
        for (OutputField f : p.values()) {
            if (f.axis() == SystemKind.GridAxes.SCALE) {
                p.zone().ifPresent(z -> o.put("zone", z));
            }
            o.put(f.axis().key(), f.value());
        }
        if (p.system().kind().isProjected()) {
            // The unit of easting and northing ("m", "ft", "ftUS" …); h is always metres.
            o.put("unit", p.values().get(0).axis().unit().symbol());
        }
        o.put("system", p.system().text());
        o.put("ellipsoid", p.ellipsoid());
        o.put("from", p.source().text());
        o.put("to", p.system().text());
        if (p.epoch().isPresent()) {
            o.put("epoch", p.epoch().get().decimalYear());
        } else {
            o.putNull("epoch");
        }
        if (!p.warnings().isEmpty()) {
            ArrayNode w = o.putArray("warnings");
            p.warnings().forEach(w::add);
        }
        if (explain) {
            o.set("steps", StepListing.json(p.steps()));
            StepListing.putAccuracy(o, p.accuracyMetres());
        }
        return o;
    }

    /** The compact one-line JSON text (no line separator), without the steps. */
    public static String render(ConvertedPoint p) {
        return Json.write(toJson(p, false));
    }

    /** The compact one-line JSON text (no line separator). */
    public static String render(ConvertedPoint p, boolean explain) {
        return Json.write(toJson(p, explain));
    }
}
