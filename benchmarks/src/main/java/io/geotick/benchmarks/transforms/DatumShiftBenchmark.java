package io.geotick.benchmarks.transforms;

import io.geotick.geodesy.ecef.EcefConverter;
import io.geotick.geodesy.position.EcefPosition;
import io.geotick.geodesy.position.GeodeticPosition;
import io.geotick.transforms.Epoch;
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
 * Throughput of the 7-parameter Helmert on arrays and of full chains, each beside Proj4J doing the same
 * job in the same run. Our array variants allocate nothing per point (check with {@code -prof gc}).
 * Parameters: OSGB 1936 → WGS 84, EPSG 1314 (from memory); points: 1,000 random positions.
 */
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@State(Scope.Benchmark)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class DatumShiftBenchmark {
    static final int N = 1000;
    private static final double[] OSGB = {446.448, -125.157, 542.06, 0.15, 0.247, 0.842, -20.489};

    private final double[] ecef = new double[3 * N];
    private final double[] geodeticOsgb = new double[3 * N];
    private final double[] out = new double[3 * N];
    private final ProjCoordinate[] projEcef = new ProjCoordinate[N];
    private final ProjCoordinate projIn = new ProjCoordinate();
    private final ProjCoordinate projOut = new ProjCoordinate();
    private Helmert helmert;
    private Datum projDatum;
    private ConversionChain osgbToWgs84;
    private ConversionChain itrfToEtrf;
    private BasicCoordinateTransform projOsgbToWgs84;

    @Setup
    public void setUp() {
        helmert = Helmert.positionVector(HelmertParameters.of(OSGB[0], OSGB[1], OSGB[2], OSGB[3], OSGB[4],
            OSGB[5], OSGB[6]));
        EcefConverter airy = EcefConverter.of(StandardFrames.OSGB36.ellipsoid());
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
            projEcef[i] = new ProjCoordinate(e.x(), e.y(), e.z());
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
    }

    /** Our 7-parameter Helmert, array variant, ECEF → ECEF. */
    @Benchmark
    @OperationsPerInvocation(N)
    public double[] helmertArray() {
        helmert.apply(ecef, 0, out, 0, N);
        return out;
    }

    /** Proj4J's geocentric 7-parameter shift on the same points. */
    @Benchmark
    @OperationsPerInvocation(N)
    public void proj4jHelmert(Blackhole bh) {
        for (int i = 0; i < N; i++) {
            ProjCoordinate c = projEcef[i];
            c.x = ecef[3 * i];
            c.y = ecef[3 * i + 1];
            c.z = ecef[3 * i + 2];
            projDatum.transformFromGeocentricToWgs84(c);
            bh.consume(c.x + c.y + c.z);
        }
    }

    /** Our chain geodetic@OSGB 1936 → geodetic@WGS 84 (geodetic → ECEF → Helmert → geodetic), arrays. */
    @Benchmark
    @OperationsPerInvocation(N)
    public double[] chainOsgbToWgs84() {
        osgbToWgs84.convert(geodeticOsgb, 0, out, 0, N);
        return out;
    }

    /** Proj4J's datum transformation doing the same job. */
    @Benchmark
    @OperationsPerInvocation(N)
    public void proj4jOsgbToWgs84(Blackhole bh) {
        for (int i = 0; i < N; i++) {
            projIn.x = geodeticOsgb[3 * i + 1];
            projIn.y = geodeticOsgb[3 * i];
            projIn.z = geodeticOsgb[3 * i + 2];
            projOsgbToWgs84.transform(projIn, projOut);
            bh.consume(projOut.x + projOut.y);
        }
    }

    /** Our full chain ECEF@ITRF2020 at 2025.0 → geodetic@ETRF2000 (two 14-parameter steps), arrays. */
    @Benchmark
    @OperationsPerInvocation(N)
    public double[] chainItrf2020ToEtrf2000() {
        itrfToEtrf.convert(ecef, 0, out, 0, N);
        return out;
    }
}
