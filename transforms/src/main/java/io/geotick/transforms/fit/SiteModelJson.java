package io.geotick.transforms.fit;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import io.geotick.transforms.helmert.RotationConvention;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * The site-model file, JSON written and read with Jackson. Layout (format version 1):
 * <pre>
 * {
 *   "format": "geotick-site-model", "format_version": 1,
 *   "kind": "similarity-2d" | "affine-2d" | "helmert-3d",
 *   "rotation_convention": "position-vector" | "coordinate-frame",     (helmert-3d only)
 *   "source_system": "…", "target_system": "…",                        (free text, may be "")
 *   "centroid": {"source": [x, y(, z)], "target": [x, y(, z)]},
 *   "parameters": [{"name": "a", "unit": "1", "value": …, "sigma": … | null}, …],
 *   "covariance": [[…], …] | null,
 *   "derived": [{"name": "tx", …}, …],                                  (for people; not read)
 *   "statistics": {"points_given": n, "points_used": n, "redundancy": r, "sigma0_m": … | null,
 *                  "rms_m": …, "outlier_threshold": 3.0},
 *   "residuals": [{"id": "P1", "used": true, "dx": …, "dy": …, "dz": …,
 *                  "standardised": … | null, "outlier": false}, …]
 * }
 * </pre>
 * Read back: everything but {@code derived} and the parameters' {@code sigma}, which are recomputed from
 * the values and the covariance. Numbers are written in Jackson's shortest round-tripping form, so a
 * model read back equals the one written.
 */
final class SiteModelJson {
    static final String FORMAT = "geotick-site-model";
    static final int VERSION = 1;

    private static final ObjectMapper MAPPER = JsonMapper.builder()
        .enable(SerializationFeature.INDENT_OUTPUT)
        .build();

    private SiteModelJson() {
    }

    static String write(SiteModel m) {
        ObjectNode o = MAPPER.createObjectNode();
        o.put("format", FORMAT);
        o.put("format_version", VERSION);
        o.put("kind", m.kind().id());
        if (m.kind() == SiteModelKind.HELMERT_3D) {
            o.put("rotation_convention", m.convention() == RotationConvention.POSITION_VECTOR
                ? "position-vector" : "coordinate-frame");
        }
        o.put("source_system", m.sourceSystem());
        o.put("target_system", m.targetSystem());
        ObjectNode c = o.putObject("centroid");
        array(c.putArray("source"), m.sourceCentroidArray());
        array(c.putArray("target"), m.targetCentroidArray());
        parameters(o.putArray("parameters"), m.parameters());
        Optional<double[][]> cov = m.covariance();
        if (cov.isPresent()) {
            ArrayNode a = o.putArray("covariance");
            for (double[] row : cov.get()) {
                array(a.addArray(), row);
            }
        } else {
            o.putNull("covariance");
        }
        parameters(o.putArray("derived"), m.derivedParameters());
        FitStatistics s = m.statistics();
        ObjectNode st = o.putObject("statistics");
        st.put("points_given", s.pointsGiven());
        st.put("points_used", s.pointsUsed());
        st.put("redundancy", s.redundancy());
        optional(st, "sigma0_m", s.sigma0());
        st.put("rms_m", s.rms());
        st.put("outlier_threshold", s.outlierThreshold());
        ArrayNode rs = o.putArray("residuals");
        for (PointResidual r : s.residuals()) {
            ObjectNode x = rs.addObject();
            x.put("id", r.id());
            x.put("used", r.used());
            x.put("dx", r.dx());
            x.put("dy", r.dy());
            x.put("dz", r.dz());
            optional(x, "standardised", r.standardised());
            x.put("outlier", r.outlier());
        }
        try {
            return MAPPER.writeValueAsString(o);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("site model serialisation failed", e);
        }
    }

    private static void array(ArrayNode a, double[] v) {
        for (double x : v) {
            a.add(x);
        }
    }

    private static void parameters(ArrayNode a, List<FitParameter> ps) {
        for (FitParameter p : ps) {
            ObjectNode x = a.addObject();
            x.put("name", p.name());
            x.put("unit", p.unit());
            x.put("value", p.value());
            optional(x, "sigma", p.sigma());
        }
    }

    private static void optional(ObjectNode o, String key, OptionalDouble v) {
        if (v.isPresent()) {
            o.put(key, v.getAsDouble());
        } else {
            o.putNull(key);
        }
    }

    static SiteModel read(String text, String what) {
        JsonNode n;
        try {
            n = MAPPER.readTree(text);
        } catch (JsonProcessingException e) {
            throw new SiteModelFormatException(what + " is not valid JSON: " + e.getOriginalMessage(), e);
        }
        if (n == null || !n.isObject()) {
            throw new SiteModelFormatException(what + " is not a JSON object");
        }
        String format = text(n, "format", what);
        if (!FORMAT.equals(format)) {
            throw bad(what, "format", "is \"" + format + "\", expected \"" + FORMAT + "\"");
        }
        JsonNode ver = n.get("format_version");
        if (ver == null || !ver.canConvertToExactIntegral()) {
            throw bad(what, "format_version", "is missing or not an integer");
        }
        if (ver.asInt() != VERSION) {
            throw bad(what, "format_version", "is " + ver.asText() + "; this version reads format version "
                + VERSION);
        }
        SiteModelKind kind;
        try {
            kind = SiteModelKind.parse(text(n, "kind", what));
        } catch (IllegalArgumentException e) {
            throw bad(what, "kind", e.getMessage());
        }
        int d = kind.dimension();
        int u = kind.parameterCount();
        RotationConvention conv = RotationConvention.POSITION_VECTOR;
        if (kind == SiteModelKind.HELMERT_3D) {
            try {
                conv = RotationConvention.parse(text(n, "rotation_convention", what));
            } catch (IllegalArgumentException e) {
                throw bad(what, "rotation_convention", e.getMessage());
            }
        }
        String source = text(n, "source_system", what);
        String target = text(n, "target_system", what);
        JsonNode c = object(n, "centroid", what);
        double[] sc = numbers(c.get("source"), d, what, "centroid.source");
        double[] tc = numbers(c.get("target"), d, what, "centroid.target");

        JsonNode ps = n.get("parameters");
        if (ps == null || !ps.isArray() || ps.size() != u) {
            throw bad(what, "parameters", "expected an array of the " + u + " parameters of a " + kind.id());
        }
        List<String> names = Models.names(kind);
        double[] values = new double[u];
        for (int i = 0; i < u; i++) {
            JsonNode p = ps.get(i);
            String field = "parameters[" + i + "]";
            if (!p.isObject()) {
                throw bad(what, field, "is not an object");
            }
            String name = text(p, "name", what + ", " + field);
            if (!names.get(i).equals(name)) {
                throw bad(what, field + ".name", "is \"" + name + "\", expected \"" + names.get(i) + "\"");
            }
            values[i] = number(p, "value", what, field + ".value");
        }
        JsonNode cv = n.get("covariance");
        Optional<double[][]> cov = Optional.empty();
        if (cv == null) {
            throw bad(what, "covariance", "is missing (null when unknown)");
        }
        if (!cv.isNull()) {
            if (!cv.isArray() || cv.size() != u) {
                throw bad(what, "covariance", "expected a " + u + "×" + u + " array of numbers or null");
            }
            double[][] m = new double[u][];
            for (int i = 0; i < u; i++) {
                m[i] = numbers(cv.get(i), u, what, "covariance[" + i + "]");
            }
            cov = Optional.of(m);
        }

        JsonNode st = object(n, "statistics", what);
        int given = integer(st, "points_given", what);
        int usedCount = integer(st, "points_used", what);
        int red = integer(st, "redundancy", what);
        OptionalDouble s0 = optionalNumber(st, "sigma0_m", what, "statistics.sigma0_m");
        double rms = number(st, "rms_m", what, "statistics.rms_m");
        double thr = number(st, "outlier_threshold", what, "statistics.outlier_threshold");
        JsonNode rs = n.get("residuals");
        if (rs == null || !rs.isArray()) {
            throw bad(what, "residuals", "is missing or not an array");
        }
        List<PointResidual> res = new ArrayList<>();
        for (int i = 0; i < rs.size(); i++) {
            JsonNode r = rs.get(i);
            String field = "residuals[" + i + "]";
            if (!r.isObject()) {
                throw bad(what, field, "is not an object");
            }
            JsonNode usedNode = r.get("used");
            JsonNode outNode = r.get("outlier");
            if (usedNode == null || !usedNode.isBoolean() || outNode == null || !outNode.isBoolean()) {
                throw bad(what, field, "needs boolean fields 'used' and 'outlier'");
            }
            try {
                res.add(new PointResidual(text(r, "id", what + ", " + field), usedNode.booleanValue(),
                    number(r, "dx", what, field + ".dx"), number(r, "dy", what, field + ".dy"),
                    number(r, "dz", what, field + ".dz"),
                    optionalNumber(r, "standardised", what, field + ".standardised"), outNode.booleanValue()));
            } catch (IllegalArgumentException e) {
                throw bad(what, field, e.getMessage());
            }
        }
        if (red != d * usedCount - u) {
            throw bad(what, "statistics.redundancy", "is " + red + "; a " + kind.id() + " fitted to " + usedCount
                + " points has " + (d * usedCount - u));
        }
        if (res.size() != given) {
            throw bad(what, "residuals", "has " + res.size() + " entries for " + given + " points given");
        }
        if ((red == 0) != cov.isEmpty()) {
            throw bad(what, "covariance", red == 0 ? "must be null for a fit without redundancy"
                : "is null although the fit has redundancy " + red);
        }
        FitStatistics stats;
        try {
            stats = new FitStatistics(given, usedCount, red, s0, rms, thr, res);
        } catch (IllegalArgumentException e) {
            throw bad(what, "statistics", e.getMessage());
        }
        try {
            return SiteModel.of(kind, conv, values, cov, sc, tc, stats, source, target);
        } catch (IllegalArgumentException e) {
            throw new SiteModelFormatException(what + ": " + e.getMessage(), e);
        }
    }

    private static SiteModelFormatException bad(String what, String field, String why) {
        return new SiteModelFormatException(what + ": field '" + field + "' " + why);
    }

    private static String text(JsonNode n, String field, String what) {
        JsonNode v = n.get(field);
        if (v == null || !v.isTextual()) {
            throw bad(what, field, "is missing or not a string");
        }
        return v.asText();
    }

    private static JsonNode object(JsonNode n, String field, String what) {
        JsonNode v = n.get(field);
        if (v == null || !v.isObject()) {
            throw bad(what, field, "is missing or not an object");
        }
        return v;
    }

    private static double number(JsonNode n, String key, String what, String field) {
        JsonNode v = n.get(key);
        if (v == null || !v.isNumber() || !Double.isFinite(v.doubleValue())) {
            throw bad(what, field, "is missing or not a finite number");
        }
        return v.doubleValue();
    }

    private static OptionalDouble optionalNumber(JsonNode n, String key, String what, String field) {
        JsonNode v = n.get(key);
        if (v == null) {
            throw bad(what, field, "is missing (null when unknown)");
        }
        if (v.isNull()) {
            return OptionalDouble.empty();
        }
        return OptionalDouble.of(number(n, key, what, field));
    }

    private static int integer(JsonNode n, String key, String what) {
        JsonNode v = n.get(key);
        if (v == null || !v.canConvertToExactIntegral() || !v.canConvertToInt()) {
            throw bad(what, "statistics." + key, "is missing or not an integer");
        }
        return v.asInt();
    }

    private static double[] numbers(JsonNode a, int count, String what, String field) {
        if (a == null || !a.isArray() || a.size() != count) {
            throw bad(what, field, "expected an array of " + count + " numbers");
        }
        double[] v = new double[count];
        for (int i = 0; i < count; i++) {
            JsonNode x = a.get(i);
            if (!x.isNumber() || !Double.isFinite(x.doubleValue())) {
                throw bad(what, field + "[" + i + "]", "is not a finite number");
            }
            v[i] = x.doubleValue();
        }
        return v;
    }
}
