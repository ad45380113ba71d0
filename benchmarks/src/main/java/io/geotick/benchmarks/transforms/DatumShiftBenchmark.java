package io.geotick.benchmarks.transforms;

import io.geotick.geodesy.ecef.EcefConverter;
import io.geotick.geodesy.position.EcefPosition;
import io.geotick.geodesy.position.GeodeticPosition;
import io.geotick.transforms.Epoch;
import io.geotick.transforms.StepDescription;
import io.geotick.transforms.chain.ConversionChain;
import io.geotick.transforms.chain.CoordinateSystem;
import io.geotick.transforms.frames.StandardFrames;
import io.geotick.transforms.helmert.Helmert;
import io.geotick.transforms.helmert.HelmertParameters;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.locationtech.proj4j.BasicCoordinateTransform;
import org.locationtech.proj4j.CRSFactory;
import org.locationtech.proj4j.CoordinateReferenceSystem;
import org.locationtech.proj4j.ProjCoordinate;
import org.locationtech.proj4j.datum.Datum;
import org.locationtech.proj4j.datum.GeocentricConverter;
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

/**
 * Datum shifts beside Proj4J doing the same job in the same run, time per point. Methods are named
 * {@code <variant>_geotick} / {@code <variant>_proj4j} so that {@code benchmarks/run} prints their ratio.
 * Our array variants allocate nothing per point (check with {@code -prof gc}). Points: 1,000 random
 * positions in Great Britain (fixed seed; invented data for measurement only).
 *
 * <ul>
 *   <li>{@code helmert}: the 7-parameter Helmert, ECEF → ECEF, OSGB 1936 → WGS 84 (EPSG 1314, from
 *       memory): our array variant beside Proj4J's geocentric shift of its datum (the same parameters, from
 *       its bundled EPSG:4277 definition) in a loop storing into the same output array.</li>
 *   <li>{@code osgbToWgs84}: the whole geodetic → geodetic job (geodetic → ECEF, Helmert, ECEF → geodetic):
 *       our chain on arrays beside Proj4J's {@code BasicCoordinateTransform} EPSG:4277 → EPSG:4326.</li>
 *   <li>{@code itrfToEtrf}: ECEF@ITRF2020 at epoch 2025.0 → geodetic@ETRF2000, our chain (two 14-parameter
 *       steps via ITRF2014, then ECEF → geodetic on GRS 80) beside the same computation done with Proj4J's
 *       parts, since it has no time-dependent transformation: two geocentric 7-parameter shifts whose
 *       parameters are ours evaluated at the epoch, then its geocentric → geodetic conversion.</li>
 * </ul>
 *
 * <p>The forks start with {@code --add-modules jdk.incubator.vector}, so that our array variants run their
 * SIMD kernels ({@link io.geotick.geodesy.simd.Simd}); each {@code <variant>Scalar_geotick} turns them off
 * ({@code -Dgeotick.simd=off}) and is paired with the same Proj4J peer.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@State(Scope.Benchmark)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(value = 1, jvmArgsAppend = "--add-modules=jdk.incubator.vector")
public class DatumShiftBenchmark {
    static final int N = 1000;
    /** EPSG transformation 1314, OSGB 1936 → WGS 84, position vector (from memory). */
    static final double[] OSGB = {446.448, -125.157, 542.06, 0.15, 0.247, 0.842, -20.489};
    private static final double ARCSEC = Math.PI / (180 * 3600);

    private final double[] ecef = new double[3 * N];
    private final double[] ecefItrf = new double[3 * N];
    private final double[] geodeticOsgb = new double[3 * N];
    private final double[] out = new double[3 * N];
    private final ProjCoordinate projC = new ProjCoordinate();
    private final ProjCoordinate projIn = new ProjCoordinate();
    private final ProjCoordinate projOut = new ProjCoordinate();
    private Helmert helmert;
    private Datum projDatum;
    private Datum projStep1;
    private Datum projStep2;
    private GeocentricConverter projGrs80;
    private ConversionChain osgbToWgs84;
    private ConversionChain itrfToEtrf;
    private BasicCoordinateTransform projOsgbToWgs84;

    @Setup
    public void setUp() {
        helmert = Helmert.positionVector(HelmertParameters.of(OSGB[0], OSGB[1], OSGB[2], OSGB[3], OSGB[4],
            OSGB[5], OSGB[6]));
        EcefConverter airy = EcefConverter.of(StandardFrames.OSGB36.ellipsoid());
        EcefConverter grs80 = EcefConverter.of(StandardFrames.ITRF2020.ellipsoid());
        Random r = new Random(11);
        for (int i = 0; i < N; i++) {
            double lat = 50 + 8 * r.nextDouble();
            double lon = -6 + 8 * r.nextDouble();
            double h = 500 * r.nextDouble();
            geodeticOsgb[3 * i] = lat;
            geodeticOsgb[3 * i + 1] = lon;
            geodeticOsgb[3 * i + 2] = h;
            EcefPosition e = airy.toEcef(GeodeticPosition.of(lat, lon, h));
            ecef[3 * i] = e.x();
            ecef[3 * i + 1] = e.y();
            ecef[3 * i + 2] = e.z();
            EcefPosition g = grs80.toEcef(GeodeticPosition.of(lat, lon, h));
            ecefItrf[3 * i] = g.x();
            ecefItrf[3 * i + 1] = g.y();
            ecefItrf[3 * i + 2] = g.z();
        }
        CRSFactory f = new CRSFactory();
        // Proj4J's bundled EPSG definition of OSGB 1936 carries the same EPSG 1314 parameters.
        CoordinateReferenceSystem osgb = f.createFromName("EPSG:4277");
        projDatum = osgb.getDatum();
        projOsgbToWgs84 = new BasicCoordinateTransform(osgb, f.createFromName("EPSG:4326"));
        osgbToWgs84 = ConversionChain.builder().from(CoordinateSystem.geodetic(StandardFrames.OSGB36))
            .to(CoordinateSystem.geodetic(StandardFrames.WGS84)).build();
        itrfToEtrf = ConversionChain.builder().from(CoordinateSystem.ecef(StandardFrames.ITRF2020))
            .to(CoordinateSystem.geodetic(StandardFrames.ETRF2000)).epoch(Epoch.of(2025.0)).build();
        projStep1 = proj4jDatum(itrfToEtrf.steps().get(0));
        projStep2 = proj4jDatum(itrfToEtrf.steps().get(1));
        projGrs80 = new GeocentricConverter(org.locationtech.proj4j.datum.Ellipsoid.GRS80);
    }

    /** A Proj4J datum whose geocentric shift is our position-vector step at the epoch (radians, 1 + ds). */
    private static Datum proj4jDatum(StepDescription step) {
        double[] v = new double[7];
        String[] names = {"tx", "ty", "tz", "rx", "ry", "rz", "ds"};
        for (StepDescription.Parameter p : step.parameters()) {
            for (int k = 0; k < 7; k++) {
                if (p.name().equals(names[k] + " at epoch")) {
                    v[k] = p.value();
                }
            }
        }
        return new Datum("step", v[0], v[1], v[2], v[3] * ARCSEC, v[4] * ARCSEC, v[5] * ARCSEC,
            1 + v[6] * 1e-6, org.locationtech.proj4j.datum.Ellipsoid.GRS80, step.name());
    }

    /** Our 7-parameter Helmert, array variant, ECEF → ECEF. */
    @Benchmark
    @OperationsPerInvocation(N)
    public double[] helmert_geotick() {
        helmert.apply(ecef, 0, out, 0, N);
        return out;
    }

    /** The same with the SIMD kernels off, as a JVM without the vector module runs it. */
    @Benchmark
    @OperationsPerInvocation(N)
    @Fork(value = 1, jvmArgsAppend = {"--add-modules=jdk.incubator.vector", "-Dgeotick.simd=off"})
    public double[] helmertScalar_geotick() {
        helmert.apply(ecef, 0, out, 0, N);
        return out;
    }

    /** Proj4J's geocentric 7-parameter shift on the same points, results stored into the same array. */
    @Benchmark
    @OperationsPerInvocation(N)
    public double[] helmert_proj4j() {
        proj4jShift(projDatum, projC, ecef, 0, out, 0, N);
        return out;
    }

    /** Proj4J's geocentric shift of {@code datum} over n interleaved points, as our array call does it. */
    static void proj4jShift(Datum datum, ProjCoordinate c, double[] in, int inOffset, double[] out, int outOffset,
            int n) {
        for (int i = 0; i < n; i++) {
            int k = inOffset + 3 * i;
            c.x = in[k];
            c.y = in[k + 1];
            c.z = in[k + 2];
            datum.transformFromGeocentricToWgs84(c);
            int o = outOffset + 3 * i;
            out[o] = c.x;
            out[o + 1] = c.y;
            out[o + 2] = c.z;
        }
    }

    /** Our chain geodetic@OSGB 1936 → geodetic@WGS 84 (geodetic → ECEF → Helmert → geodetic), arrays. */
    @Benchmark
    @OperationsPerInvocation(N)
    public double[] osgbToWgs84_geotick() {
        osgbToWgs84.convert(geodeticOsgb, 0, out, 0, N);
        return out;
    }

    /** The same with the SIMD kernels off, as a JVM without the vector module runs it. */
    @Benchmark
    @OperationsPerInvocation(N)
    @Fork(value = 1, jvmArgsAppend = {"--add-modules=jdk.incubator.vector", "-Dgeotick.simd=off"})
    public double[] osgbToWgs84Scalar_geotick() {
        osgbToWgs84.convert(geodeticOsgb, 0, out, 0, N);
        return out;
    }

    /** Proj4J's datum transformation doing the same job, results stored into the same array. */
    @Benchmark
    @OperationsPerInvocation(N)
    public double[] osgbToWgs84_proj4j() {
        for (int i = 0; i < N; i++) {
            projIn.x = geodeticOsgb[3 * i + 1];
            projIn.y = geodeticOsgb[3 * i];
            projIn.z = geodeticOsgb[3 * i + 2];
            projOsgbToWgs84.transform(projIn, projOut);
            out[3 * i] = projOut.y;
            out[3 * i + 1] = projOut.x;
            out[3 * i + 2] = projOut.z;
        }
        return out;
    }

    /** Our full chain ECEF@ITRF2020 at 2025.0 → geodetic@ETRF2000 (two 14-parameter steps), arrays. */
    @Benchmark
    @OperationsPerInvocation(N)
    public double[] itrfToEtrf_geotick() {
        itrfToEtrf.convert(ecefItrf, 0, out, 0, N);
        return out;
    }

    /** The same with the SIMD kernels off, as a JVM without the vector module runs it. */
    @Benchmark
    @OperationsPerInvocation(N)
    @Fork(value = 1, jvmArgsAppend = {"--add-modules=jdk.incubator.vector", "-Dgeotick.simd=off"})
    public double[] itrfToEtrfScalar_geotick() {
        itrfToEtrf.convert(ecefItrf, 0, out, 0, N);
        return out;
    }

    /** The same job from Proj4J's parts: two geocentric shifts (parameters at the epoch), then → geodetic. */
    @Benchmark
    @OperationsPerInvocation(N)
    public double[] itrfToEtrf_proj4j() {
        ProjCoordinate c = projC;
        for (int i = 0; i < N; i++) {
            c.x = ecefItrf[3 * i];
            c.y = ecefItrf[3 * i + 1];
            c.z = ecefItrf[3 * i + 2];
            projStep1.transformFromGeocentricToWgs84(c);
            projStep2.transformFromGeocentricToWgs84(c);
            projGrs80.convertGeocentricToGeodetic(c);
            out[3 * i] = c.y;
            out[3 * i + 1] = c.x;
            out[3 * i + 2] = c.z;
        }
        return out;
    }
}
