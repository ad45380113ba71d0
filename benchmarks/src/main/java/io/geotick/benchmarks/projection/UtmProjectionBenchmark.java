package io.geotick.benchmarks.projection;

import io.geotick.transforms.projection.GridPosition;
import io.geotick.transforms.projection.Hemisphere;
import io.geotick.transforms.projection.Utm;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import org.locationtech.proj4j.CRSFactory;
import org.locationtech.proj4j.CoordinateTransform;
import org.locationtech.proj4j.CoordinateTransformFactory;
import org.locationtech.proj4j.ProjCoordinate;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.openjdk.jmh.infra.Blackhole;

/**
 * WGS 84 geodetic → UTM zone 31N, geotick (6th-order Krüger series) beside Proj4J's EPSG:4326 →
 * EPSG:32631 transform, on the same 1 024 random points of the zone (fixed seed). Time per point.
 *
 * <p>Variants (named {@code <variant>_geotick} / {@code <variant>_proj4j} so that {@code benchmarks/run}
 * prints their ratio): {@code point}: geotick one point at a time with scale and convergence
 * ({@link Utm#project(double, double)}, one {@link GridPosition} allocated per point) beside Proj4J's
 * {@code CoordinateTransform.transform} reusing its two coordinate objects; {@code array}: geotick's
 * array variant (coordinates only, allocation-free) beside Proj4J in a loop storing into the same array.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 4, time = 1)
@Measurement(iterations = 6, time = 1)
@Fork(1)
public class UtmProjectionBenchmark {
    private static final int N = 1024;

    private final Utm utm = Utm.zone(31, Hemisphere.NORTH);
    private final double[] latLon = new double[2 * N];
    private final double[] eastNorth = new double[2 * N];
    private CoordinateTransform proj4j;
    private final ProjCoordinate in = new ProjCoordinate();
    private final ProjCoordinate out = new ProjCoordinate();

    @Setup
    public void setUp() {
        SplittableRandom r = new SplittableRandom(32631);
        for (int i = 0; i < N; i++) {
            latLon[2 * i] = r.nextDouble(0, 84);
            latLon[2 * i + 1] = r.nextDouble(0, 6);
        }
        CRSFactory crs = new CRSFactory();
        proj4j = new CoordinateTransformFactory().createTransform(crs.createFromName("EPSG:4326"),
            crs.createFromName("EPSG:32631"));
    }

    /** geotick, one point at a time, with scale and convergence. */
    @Benchmark
    @OperationsPerInvocation(N)
    public void point_geotick(Blackhole bh) {
        for (int i = 0; i < N; i++) {
            bh.consume(utm.project(latLon[2 * i], latLon[2 * i + 1]));
        }
    }

    /** Proj4J, EPSG:4326 → EPSG:32631, one point at a time (coordinates only: it has no scale or convergence). */
    @Benchmark
    @OperationsPerInvocation(N)
    public void point_proj4j(Blackhole bh) {
        for (int i = 0; i < N; i++) {
            in.x = latLon[2 * i + 1];
            in.y = latLon[2 * i];
            proj4j.transform(in, out);
            bh.consume(out.x);
            bh.consume(out.y);
        }
    }

    /** geotick, the interleaved array variant (coordinates only, no allocation). */
    @Benchmark
    @OperationsPerInvocation(N)
    public double[] array_geotick() {
        utm.project(latLon, 0, eastNorth, 0, N);
        return eastNorth;
    }

    /** Proj4J in a loop over the same array, storing its results into the output array. */
    @Benchmark
    @OperationsPerInvocation(N)
    public double[] array_proj4j() {
        for (int i = 0; i < N; i++) {
            in.x = latLon[2 * i + 1];
            in.y = latLon[2 * i];
            proj4j.transform(in, out);
            eastNorth[2 * i] = out.x;
            eastNorth[2 * i + 1] = out.y;
        }
        return eastNorth;
    }
}
