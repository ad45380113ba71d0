package io.geotick.cli.coord;

import com.fasterxml.jackson.databind.node.ObjectNode;
import io.geotick.cli.Json;

/**
 * Renders a {@link ConvertedPoint} as one JSON object: the target's values as top-level number fields
 * under their keys ({@code lat, lon, h} | {@code x, y, z} | {@code e, n, u} | {@code n, e, d} |
 * {@code az, el, range}), then {@code "system"} (the canonical SYS text) and {@code "ellipsoid"} (its
 * name). Numbers are written at full double precision: the text reads back to the identical double.
 * <pre>
 * {"lat":53.80939443996212,"lon":2.1295500013207684,"h":72.99993067204181,"system":"geodetic","ellipsoid":"WGS 84"}
 * </pre>
 */
public final class JsonOutput {
    private JsonOutput() {
    }

    /** The JSON object. */
    public static ObjectNode toJson(ConvertedPoint p) {
        ObjectNode o = Json.object();
        for (OutputField f : p.values()) {
            o.put(f.axis().key(), f.value());
        }
        o.put("system", p.system().text());
        o.put("ellipsoid", p.ellipsoid());
        return o;
    }

    /** The compact one-line JSON text (no line separator). */
    public static String render(ConvertedPoint p) {
        return Json.write(toJson(p));
    }
}
