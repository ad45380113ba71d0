package io.geotick.benchmarks.transforms;

import io.geotick.transforms.helmert.Helmert;
import io.geotick.transforms.helmert.HelmertParameters;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.locationtech.proj4j.CRSFactory;
import org.locationtech.proj4j.ProjCoordinate;
import org.locationtech.proj4j.datum.Datum;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * The 7-parameter Helmert on arrays with the output placed at chosen distances from the input, beside
 * Proj4J on the same placements. Why: the SIMD kernel's time depends on where the output array lies
 * relative to the input, modulo 4 KiB (the page offset the processor compares first when it decides
 * whether a load may depend on an earlier store). In {@link DatumShiftBenchmark} that distance is
 * wherever the JVM happened to put the arrays, so the figure varies from one JVM start to the next; here
 * both live in one array, so the distance is fixed and every placement class is measured.
 *
 * <p>{@code outputOffsetMod4K}: (address of the first output coordinate − address of the first input
 * coordinate) mod 4096, in bytes. Points: 1,000 random positions in Great Britain on OSGB 1936, fixed seed
 * (invented data for measurement only); parameters: EPSG transformation 1314 (from memory), as in
 * {@link DatumShiftBenchmark}.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@State(Scope.Benchmark)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(value = 1, jvmArgsAppend = "--add-modules=jdk.incubator.vector")
public class HelmertPlacementBenchmark {
    static final int N = 1000;

    @Param({"0", "512", "1024", "1536", "2048", "2560", "3072", "3584"})
    int outputOffsetMod4K;

    /** Input at 0 … 3N − 1, output at {@link #outAt}; room for any placement. */
    private final double[] buffer = new double[6 * N + 512];
    private int outAt;
    private Helmert helmert;
    private Datum projDatum;
    private final ProjCoordinate projC = new ProjCoordinate();

    @Setup
    public void setUp() {
        double[] p = DatumShiftBenchmark.OSGB;
        helmert = Helmert.positionVector(HelmertParameters.of(p[0], p[1], p[2], p[3], p[4], p[5], p[6]));
        Random r = new Random(11);
        for (int i = 0; i < N; i++) {
            double lat = Math.toRadians(50 + 8 * r.nextDouble());
            double lon = Math.toRadians(-6 + 8 * r.nextDouble());
            double radius = 6.38e6 + 500 * r.nextDouble();
            buffer[3 * i] = radius * Math.cos(lat) * Math.cos(lon);
            buffer[3 * i + 1] = radius * Math.cos(lat) * Math.sin(lon);
            buffer[3 * i + 2] = radius * Math.sin(lat);
        }
        // The output starts after the input, at the first element whose byte distance from the input's start
        // is the wanted value modulo 4096.
        int gapBytes = Math.floorMod(outputOffsetMod4K - 8 * 3 * N, 4096);
        outAt = 3 * N + gapBytes / 8;
        // Proj4J's bundled EPSG definition of OSGB 1936 carries the same EPSG 1314 parameters.
        projDatum = new CRSFactory().createFromName("EPSG:4277").getDatum();
    }

    /** Our 7-parameter Helmert, array variant, ECEF → ECEF. */
    @Benchmark
    @OperationsPerInvocation(N)
    public double[] helmert_geotick() {
        helmert.apply(buffer, 0, buffer, outAt, N);
        return buffer;
    }

    /** Proj4J's geocentric 7-parameter shift on the same points and placement. */
    @Benchmark
    @OperationsPerInvocation(N)
    public double[] helmert_proj4j() {
        DatumShiftBenchmark.proj4jShift(projDatum, projC, buffer, 0, buffer, outAt, N);
        return buffer;
    }
}
