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
 * Geodetic → ECEF on WGS 84: geotick's {@link EcefConverter} beside Proj4J's {@link GeocentricConverter}
 * ({@code convertGeodeticToGeocentric}) on the same {@link EcefPoints}. Methods come in pairs
 * {@code <variant>_geotick} / {@code <variant>_proj4j}; every score is time per point.
 *
 * <p>geotick takes degrees and reduces them exactly; Proj4J is handed radians computed in the set-up, so
 * its conversion from degrees is not timed. {@code point_*} converts one point per operation (geotick's
 * value API, allocating the result; Proj4J on one reused {@link ProjCoordinate}); {@code array_*} converts
 * all {@value EcefPoints#COUNT} points per operation into an output array.
 *
 * <p>The forks start with {@code --add-modules jdk.incubator.vector}, so that the array variant runs its
 * SIMD kernel ({@link io.geotick.geodesy.simd.Simd}); {@code arrayScalar_geotick} turns it off
 * ({@code -Dgeotick.simd=off}) and is paired with {@code array_proj4j}.
 */
@State(Scope.Thread)
@Fork(jvmArgsAppend = "--add-modules=jdk.incubator.vector")
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
public class GeodeticToEcefBenchmark {
    @Param({"surface", "orbit"})
    public String heights;

    private EcefConverter geotick;
    private GeocentricConverter proj4j;
    private double[] degrees;
    private double[] radians;
    private GeodeticPosition[] positions;
    private final double[] out = new double[3 * EcefPoints.COUNT];
    private final ProjCoordinate coordinate = new ProjCoordinate();
    private int next;

    @Setup
    public void setUp() {
        EcefPoints points = new EcefPoints(heights);
        geotick = EcefConverter.of(Ellipsoids.WGS84);
        proj4j = new GeocentricConverter(Ellipsoid.WGS84);
        degrees = points.geodeticDegrees;
        radians = points.geodeticRadiansLonLat;
        positions = new GeodeticPosition[EcefPoints.COUNT];
        for (int i = 0; i < EcefPoints.COUNT; i++) {
            positions[i] = GeodeticPosition.of(degrees[3 * i], degrees[3 * i + 1], degrees[3 * i + 2]);
        }
    }

    @Benchmark
    public EcefPosition point_geotick() {
        int i = next;
        next = (i + 1) & (EcefPoints.COUNT - 1);
        return geotick.toEcef(positions[i]);
    }

    @Benchmark
    public void point_proj4j(Blackhole bh) {
        int i = next;
        next = (i + 1) & (EcefPoints.COUNT - 1);
        ProjCoordinate c = coordinate;
        c.x = radians[3 * i];
        c.y = radians[3 * i + 1];
        c.z = radians[3 * i + 2];
        proj4j.convertGeodeticToGeocentric(c);
        bh.consume(c.x);
        bh.consume(c.y);
        bh.consume(c.z);
    }

    @Benchmark
    @OperationsPerInvocation(EcefPoints.COUNT)
    public double[] array_geotick() {
        geotick.toEcef(degrees, 0, out, 0, EcefPoints.COUNT);
        return out;
    }

    @Benchmark
    @OperationsPerInvocation(EcefPoints.COUNT)
    @Fork(jvmArgsAppend = {"--add-modules=jdk.incubator.vector", "-Dgeotick.simd=off"})
    public double[] arrayScalar_geotick() {
        geotick.toEcef(degrees, 0, out, 0, EcefPoints.COUNT);
        return out;
    }

    @Benchmark
    @OperationsPerInvocation(EcefPoints.COUNT)
    public double[] array_proj4j() {
        ProjCoordinate c = coordinate;
        for (int i = 0; i < 3 * EcefPoints.COUNT; i += 3) {
            c.x = radians[i];
            c.y = radians[i + 1];
            c.z = radians[i + 2];
            proj4j.convertGeodeticToGeocentric(c);
            out[i] = c.x;
            out[i + 1] = c.y;
            out[i + 2] = c.z;
        }
        return out;
    }
}
