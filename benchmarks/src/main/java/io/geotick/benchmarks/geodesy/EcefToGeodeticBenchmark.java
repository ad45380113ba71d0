package io.geotick.benchmarks.geodesy;

import io.geotick.geodesy.ecef.EcefConverter;
import io.geotick.geodesy.ellipsoid.Ellipsoids;
import io.geotick.geodesy.position.EcefPosition;
import io.geotick.geodesy.position.GeodeticPosition;
import java.util.concurrent.TimeUnit;
import org.locationtech.proj4j.ProjCoordinate;
import org.locationtech.proj4j.datum.Ellipsoid;
import org.locationtech.proj4j.datum.GeocentricConverter;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.infra.Blackhole;

/**
 * ECEF → geodetic on WGS 84: geotick's {@link EcefConverter} beside Proj4J's {@link GeocentricConverter}
 * ({@code convertGeocentricToGeodetic}) on the same {@link EcefPoints}. Methods come in pairs
 * {@code <variant>_geotick} / {@code <variant>_proj4j}; every score is time per point.
 *
 * <ul>
 *   <li>{@code point_*}: one point per operation, cycling through the points. geotick through its value
 *       API (an {@link EcefPosition} in, a new {@link GeodeticPosition} out); Proj4J on one reused
 *       {@link ProjCoordinate}, its cheapest use.</li>
 *   <li>{@code array_*}: all {@value EcefPoints#COUNT} points per operation into an output array:
 *       geotick's array variant; Proj4J in a loop that loads the reused coordinate and stores its result.
 *       Proj4J's output is stored as it comes (radians), geotick's in degrees.</li>
 *   <li>{@code arrayScalar_geotick}: geotick's array variant with its SIMD kernel turned off
 *       ({@code -Dgeotick.simd=off}), as a JVM without the vector module runs it; paired with
 *       {@code array_proj4j}.</li>
 * </ul>
 *
 * <p>The forks start with {@code --add-modules jdk.incubator.vector}, so that the array variant runs its
 * SIMD kernel ({@link io.geotick.geodesy.simd.Simd}); Proj4J and the single-point methods are unaffected by
 * the flag.
 */
@State(Scope.Thread)
@Fork(jvmArgsAppend = "--add-modules=jdk.incubator.vector")
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
public class EcefToGeodeticBenchmark {
    @Param({"surface", "orbit"})
    public String heights;

    private EcefConverter geotick;
    private GeocentricConverter proj4j;
    private double[] ecef;
    private EcefPosition[] ecefPositions;
    private final double[] out = new double[3 * EcefPoints.COUNT];
    private final ProjCoordinate coordinate = new ProjCoordinate();
    private int next;

    @Setup
    public void setUp() {
        EcefPoints points = new EcefPoints(heights);
        geotick = EcefConverter.of(Ellipsoids.WGS84);
        proj4j = new GeocentricConverter(Ellipsoid.WGS84);
        ecef = points.ecef;
        ecefPositions = new EcefPosition[EcefPoints.COUNT];
        for (int i = 0; i < EcefPoints.COUNT; i++) {
            ecefPositions[i] = EcefPosition.of(ecef[3 * i], ecef[3 * i + 1], ecef[3 * i + 2]);
        }
    }

    @Benchmark
    public GeodeticPosition point_geotick() {
        int i = next;
        next = (i + 1) & (EcefPoints.COUNT - 1);
        return geotick.toGeodetic(ecefPositions[i]);
    }

    @Benchmark
    public void point_proj4j(Blackhole bh) {
        int i = next;
        next = (i + 1) & (EcefPoints.COUNT - 1);
        ProjCoordinate c = coordinate;
        c.x = ecef[3 * i];
        c.y = ecef[3 * i + 1];
        c.z = ecef[3 * i + 2];
        proj4j.convertGeocentricToGeodetic(c);
        bh.consume(c.x);
        bh.consume(c.y);
        bh.consume(c.z);
    }

    @Benchmark
    @OperationsPerInvocation(EcefPoints.COUNT)
    public double[] array_geotick() {
        geotick.toGeodetic(ecef, 0, out, 0, EcefPoints.COUNT);
        return out;
    }

    @Benchmark
    @OperationsPerInvocation(EcefPoints.COUNT)
    @Fork(jvmArgsAppend = {"--add-modules=jdk.incubator.vector", "-Dgeotick.simd=off"})
    public double[] arrayScalar_geotick() {
        geotick.toGeodetic(ecef, 0, out, 0, EcefPoints.COUNT);
        return out;
    }

    @Benchmark
    @OperationsPerInvocation(EcefPoints.COUNT)
    public double[] array_proj4j() {
        ProjCoordinate c = coordinate;
        for (int i = 0; i < 3 * EcefPoints.COUNT; i += 3) {
            c.x = ecef[i];
            c.y = ecef[i + 1];
            c.z = ecef[i + 2];
            proj4j.convertGeocentricToGeodetic(c);
            out[i] = c.x;
            out[i + 1] = c.y;
            out[i + 2] = c.z;
        }
        return out;
    }
}
