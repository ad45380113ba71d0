package io.geotick.cli.time;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import io.geotick.cli.DataFileException;
import io.geotick.cli.Json;
import io.geotick.timescales.ScaleInstant;
import io.geotick.timescales.TimeConverter;
import io.geotick.timescales.TimeScale;
import io.geotick.timescales.clock.ClockFit;
import io.geotick.timescales.clock.ClockModel;
import io.geotick.timescales.clock.ClockTerms;
import io.geotick.timescales.encoding.DecimalSeconds;
import io.geotick.transforms.FileFailure;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * The clock-model file: a JSON object written by {@code clock fit} and read by {@code clock apply}.
 *
 * <p>Fields read back: {@code format} ({@value #FORMAT}), {@code terms}, {@code device_scale},
 * {@code reference_scale}, {@code origin_tai}, {@code first_tai}, {@code last_tai} (exact TAI seconds since
 * 1970 TAI as decimal text), {@code base_offset_ns}, {@code offset_s}, {@code drift}, {@code drift_rate},
 * {@code covariance}. The other fields (uncertainties, drift in ppm and s/day, residuals, outliers) are for
 * people.
 */
final class ClockModelFile {
    static final String FORMAT = "geotick-clock-model/1";

    private ClockModelFile() {
    }

    static ObjectNode toJson(ClockFit fit, TimeConverter tc) {
        ClockModel m = fit.model();
        ObjectNode o = Json.object();
        o.put("format", FORMAT);
        o.put("terms", m.terms().id());
        o.put("device_scale", m.deviceScale().id());
        o.put("reference_scale", m.referenceScale().id());
        o.put("origin", iso(tc, m.origin()));
        o.put("origin_tai", tai(m.origin()));
        o.put("first_tai", tai(m.firstReading()));
        o.put("last_tai", tai(m.lastReading()));
        o.put("base_offset_ns", m.baseOffsetNanos());
        num(o, "offset_s", m.offsetSeconds());
        num(o, "drift", m.drift());
        num(o, "drift_rate", m.driftRate());
        ObjectNode sigma = o.putObject("sigma");
        num(sigma, "offset_s", m.sigma(0));
        num(sigma, "drift", m.terms().count() > 1 ? m.sigma(1) : OptionalDouble.of(0.0));
        num(sigma, "drift_rate", m.terms().count() > 2 ? m.sigma(2) : OptionalDouble.of(0.0));
        num(o, "drift_ppm", m.drift() * 1e6);
        num(o, "drift_s_per_day", m.drift() * 86_400);
        if (m.covariance().isPresent()) {
            ArrayNode cov = o.putArray("covariance");
            for (double[] row : m.covariance().get()) {
                ArrayNode r = cov.addArray();
                for (double v : row) {
                    r.add(v);
                }
            }
        } else {
            o.putNull("covariance");
        }
        o.put("pairs_read", fit.pairsRead());
        o.put("pairs_used", fit.pairsUsed());
        num(o, "residual_rms_s", fit.residualRms());
        num(o, "residual_sigma_s", fit.residualSigma());
        ArrayNode out = o.putArray("outliers");
        for (ClockFit.Residual r : fit.outliers()) {
            ObjectNode x = out.addObject();
            x.put("line", r.line());
            x.put("device", iso(tc, r.device()));
            x.put("residual_s", r.seconds());
            x.put("excluded", r.excluded());
        }
        return o;
    }

    /** Puts a double. */
    static void num(ObjectNode o, String key, double v) {
        o.put(key, v);
    }

    /** Puts a double, or null when unknown. */
    static void num(ObjectNode o, String key, OptionalDouble v) {
        if (v.isPresent()) {
            o.put(key, v.getAsDouble());
        } else {
            o.putNull(key);
        }
    }

    private static String tai(ScaleInstant t) {
        return DecimalSeconds.format(t.taiSeconds(), t.nano());
    }

    static String iso(TimeConverter tc, ScaleInstant t) {
        try {
            return tc.formatIso(t).value();
        } catch (IllegalArgumentException e) {
            return "TAI " + tai(t);
        }
    }

    static ClockModel read(Path file) {
        JsonNode n;
        try {
            n = Json.MAPPER.readTree(Files.readString(file));
        } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
            throw new DataFileException("clock model " + file + " is not valid JSON: "
                + e.getOriginalMessage(), e);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read clock model " + file + ": " + FileFailure.reason(e), e);
        }
        try {
            if (!FORMAT.equals(text(n, "format"))) {
                throw bad(file, "format", "expected \"" + FORMAT + "\"");
            }
            ClockTerms terms = ClockTerms.parse(text(n, "terms"));
            TimeScale dev = TimeScale.parse(text(n, "device_scale"));
            TimeScale ref = TimeScale.parse(text(n, "reference_scale"));
            ScaleInstant origin = instant(n, "origin_tai", file);
            ScaleInstant first = instant(n, "first_tai", file);
            ScaleInstant last = instant(n, "last_tai", file);
            long base = number(n, "base_offset_ns", file).longValue();
            double[] c = {number(n, "offset_s", file).doubleValue(), number(n, "drift", file).doubleValue(),
                number(n, "drift_rate", file).doubleValue()};
            int p = terms.count();
            double[] coeff = java.util.Arrays.copyOf(c, p);
            JsonNode cov = n.get("covariance");
            Optional<double[][]> cv = Optional.empty();
            if (cov != null && !cov.isNull()) {
                if (!cov.isArray() || cov.size() != p) {
                    throw bad(file, "covariance", "expected a " + p + "x" + p + " array of numbers or null");
                }
                double[][] c2 = new double[p][p];
                for (int i = 0; i < p; i++) {
                    JsonNode row = cov.get(i);
                    if (!row.isArray() || row.size() != p) {
                        throw bad(file, "covariance", "expected a " + p + "x" + p + " array of numbers or null");
                    }
                    for (int j = 0; j < p; j++) {
                        if (!row.get(j).isNumber()) {
                            throw bad(file, "covariance", "entry [" + i + "][" + j + "] is not a number");
                        }
                        c2[i][j] = row.get(j).doubleValue();
                    }
                }
                cv = Optional.of(c2);
            }
            return ClockModel.of(terms, dev, ref, origin.to(dev), base, coeff, cv, first.to(dev), last.to(dev));
        } catch (DataFileException e) {
            throw e;
        } catch (IllegalArgumentException e) {
            throw new DataFileException("clock model " + file + ": " + e.getMessage(), e);
        }
    }

    private static String text(JsonNode n, String field) {
        JsonNode v = n.get(field);
        if (v == null || !v.isTextual()) {
            throw new IllegalArgumentException("field '" + field + "' is missing or not a string");
        }
        return v.asText();
    }

    private static JsonNode number(JsonNode n, String field, Path file) {
        JsonNode v = n.get(field);
        if (v == null || !v.isNumber()) {
            throw bad(file, field, "missing or not a number");
        }
        return v;
    }

    private static ScaleInstant instant(JsonNode n, String field, Path file) {
        DecimalSeconds d = DecimalSeconds.parse(text(n, field), field).value();
        return ScaleInstant.ofTai(d.seconds(), d.nano());
    }

    private static DataFileException bad(Path file, String field, String why) {
        return new DataFileException("clock model " + file + ": field '" + field + "': " + why, null);
    }
}
