package io.geotick.benchmarks;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * Turns a JMH JSON result file ({@code -rf json}) into a Markdown table: benchmark, parameters, time per
 * point, allocation per point (from {@code -prof gc}) and the speed ratio to its peer. Results in other
 * modes than average time in ns (e.g. throughput) are listed with their unit and without a ratio.
 *
 * <p>Pairing convention: a benchmark method named {@code <variant>_geotick} has as its peer the method
 * {@code <variant>_<library>} of the same class with the same parameters (here the library is
 * {@code proj4j}). The ratio is the peer's time per point divided by geotick's, so 4.0 means geotick
 * converts four times as many points per second. A variant {@code <variant>Scalar_geotick} without a peer
 * of its own (geotick's scalar code measured beside its SIMD kernel) is paired with the peer of
 * {@code <variant>}. Scores are per point because the array benchmarks
 * declare their point count with {@code @OperationsPerInvocation}, which JMH divides out of both the time
 * and the normalised allocation.
 */
public final class ResultTable {
    private static final String OURS = "geotick";
    private static final String SCALAR = "Scalar";

    private ResultTable() {
    }

    /** Prints the table for the JMH JSON file named by the single argument. */
    public static void main(String[] args) throws IOException {
        if (args.length != 1) {
            System.err.println("usage: ResultTable JMH-RESULT.json");
            System.exit(2);
        }
        print(new ObjectMapper().readTree(Path.of(args[0]).toFile()), System.out);
    }

    /** One benchmark result, reduced to what the table shows. */
    record Row(String benchmark, String variant, String library, String params, String unit, double score,
               double error, double bestIteration, double bytesPerPoint) {
        /** Whether the score is a time per point (average-time mode in ns), the unit the ratios need. */
        boolean nsPerPoint() {
            return unit.equals("ns/op");
        }
    }

    private static String className(Row r) {
        return r.benchmark().substring(0, r.benchmark().lastIndexOf('.') + 1);
    }

    /** Reads the rows of a JMH result array. */
    static List<Row> rows(JsonNode results) {
        List<Row> rows = new ArrayList<>();
        for (JsonNode r : results) {
            String full = r.path("benchmark").asText();
            String[] parts = full.split("\\.");
            String benchmark = parts.length >= 2 ? parts[parts.length - 2] + "." + parts[parts.length - 1] : full;
            String method = parts[parts.length - 1];
            int us = method.lastIndexOf('_');
            String variant = us > 0 ? method.substring(0, us) : method;
            String library = us > 0 ? method.substring(us + 1) : "";
            StringBuilder params = new StringBuilder();
            for (Iterator<Map.Entry<String, JsonNode>> it = r.path("params").fields(); it.hasNext(); ) {
                Map.Entry<String, JsonNode> p = it.next();
                params.append(params.length() == 0 ? "" : ",").append(p.getKey()).append('=')
                    .append(p.getValue().asText());
            }
            JsonNode primary = r.path("primaryMetric");
            rows.add(new Row(benchmark, variant, library, params.toString(), unit(primary),
                primary.path("score").asDouble(),
                primary.path("scoreError").asDouble(Double.NaN),
                // The fastest iteration: the lowest time, or in throughput modes the highest rate.
                primary.path("scorePercentiles").path(unit(primary).endsWith("/op") ? "0.0" : "100.0")
                    .asDouble(Double.NaN),
                allocation(r.path("secondaryMetrics"))));
        }
        return rows;
    }

    private static String unit(JsonNode primary) {
        return primary.path("scoreUnit").asText();
    }

    /** The normalised allocation in bytes per operation, NaN when the run had no gc profiler. */
    private static double allocation(JsonNode secondary) {
        // Older JMH versions prefix secondary metric names with a middle dot.
        for (String name : new String[] {"gc.alloc.rate.norm", "·gc.alloc.rate.norm"}) {
            JsonNode m = secondary.path(name);
            if (!m.isMissingNode()) {
                return m.path("score").asDouble();
            }
        }
        return Double.NaN;
    }

    /** Prints the rows as a Markdown table. */
    static void print(JsonNode results, PrintStream out) {
        List<Row> rows = rows(results);
        out.println("| benchmark | params | ns/point | ± (99.9%) | best iteration | B/point | vs peer |");
        out.println("|---|---|---:|---:|---:|---:|---|");
        for (Row r : rows) {
            String ratio = r.library().equals(OURS) ? "-" : "(peer)";
            if (r.library().equals(OURS) && r.nsPerPoint()) {
                // A variant without a peer of its own, <v>Scalar (geotick's scalar code beside its SIMD
                // kernel), is paired with the peer of <v>.
                String peerVariant = hasPeer(rows, r, r.variant()) || !r.variant().endsWith(SCALAR) ? r.variant()
                    : r.variant().substring(0, r.variant().length() - SCALAR.length());
                for (Row peer : rows) {
                    if (isPeer(peer, r, peerVariant)) {
                        ratio = String.format(Locale.ROOT, "%.2f× %s", peer.score() / r.score(), peer.library());
                    }
                }
            } else if (!r.nsPerPoint()) {
                ratio = "-";
            }
            String score = String.format(Locale.ROOT, r.nsPerPoint() ? "%.1f" : "%.3f %s", r.score(), r.unit());
            out.println(String.format(Locale.ROOT, "| %s | %s | %s | %s | %s | %s | %s |", r.benchmark(),
                r.params().isEmpty() ? "-" : r.params(), score, oneDecimal(r.error()),
                oneDecimal(r.bestIteration()),
                Double.isNaN(r.bytesPerPoint()) ? "-" : String.format(Locale.ROOT, "%.2f", r.bytesPerPoint()),
                ratio));
        }
        out.println();
        out.println("ns/point: average time per converted point, ± its 99.9% confidence half-width; best"
            + " iteration: the fastest measurement iteration (least disturbed on a shared machine); B/point: bytes"
            + " allocated per point (JMH gc profiler); vs peer: the peer's ns/point divided by geotick's (above 1 ="
            + " geotick faster).");
    }

    private static boolean hasPeer(List<Row> rows, Row r, String variant) {
        return rows.stream().anyMatch(peer -> isPeer(peer, r, variant));
    }

    private static boolean isPeer(Row peer, Row r, String variant) {
        return !peer.library().equals(OURS) && peer.nsPerPoint() && peer.variant().equals(variant)
            && peer.params().equals(r.params()) && className(peer).equals(className(r));
    }

    private static String oneDecimal(double v) {
        return Double.isNaN(v) ? "-" : String.format(Locale.ROOT, "%.1f", v);
    }
}
