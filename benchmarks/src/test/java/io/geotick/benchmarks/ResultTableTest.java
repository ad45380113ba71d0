package io.geotick.benchmarks;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;

class ResultTableTest {
    // An invented two-benchmark result in the layout of JMH 1.37's JSON output (-rf json).
    private static final String JSON = """
        [ { "benchmark": "io.geotick.benchmarks.geodesy.EcefToGeodeticBenchmark.array_geotick",
            "params": { "heights": "surface" },
            "primaryMetric": { "score": 50.0, "scoreError": 1.5, "scorePercentiles": { "0.0": 48.0 },
                               "scoreUnit": "ns/op" },
            "secondaryMetrics": { "gc.alloc.rate.norm": { "score": 0.001, "scoreUnit": "B/op" } } },
          { "benchmark": "io.geotick.benchmarks.geodesy.EcefToGeodeticBenchmark.array_proj4j",
            "params": { "heights": "surface" },
            "primaryMetric": { "score": 200.0, "scoreError": 4.0, "scorePercentiles": { "0.0": 190.0 },
                               "scoreUnit": "ns/op" },
            "secondaryMetrics": {} },
          { "benchmark": "io.geotick.benchmarks.geodesy.EcefToGeodeticBenchmark.arrayScalar_geotick",
            "params": { "heights": "surface" },
            "primaryMetric": { "score": 100.0, "scoreError": 2.0, "scorePercentiles": { "0.0": 99.0 },
                               "scoreUnit": "ns/op" },
            "secondaryMetrics": {} } ]
        """;

    @Test
    void pairsEachGeotickBenchmarkWithItsPeerAndReportsTheRatioOfTimes() throws Exception {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        ResultTable.print(new ObjectMapper().readTree(JSON), new PrintStream(bytes, true, StandardCharsets.UTF_8));
        String table = bytes.toString(StandardCharsets.UTF_8);
        assertThat(table).contains(
            "| EcefToGeodeticBenchmark.array_geotick | heights=surface | 50.0 | 1.5 | 48.0 | 0.00 | 4.00× proj4j |");
        assertThat(table).contains(
            "| EcefToGeodeticBenchmark.array_proj4j | heights=surface | 200.0 | 4.0 | 190.0 | - | (peer) |");
        // A <variant>Scalar without a peer of its own is paired with the peer of <variant>.
        assertThat(table).contains(
            "| EcefToGeodeticBenchmark.arrayScalar_geotick | heights=surface | 100.0 | 2.0 | 99.0 | - | 2.00× proj4j |");
    }
}
