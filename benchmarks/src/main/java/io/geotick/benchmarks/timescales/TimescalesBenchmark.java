package io.geotick.benchmarks.timescales;

import io.geotick.timescales.ScaleInstant;
import io.geotick.timescales.TimeConverter;
import io.geotick.timescales.bulk.BulkConverter;
import io.geotick.timescales.encoding.UnixTime;
import io.geotick.timescales.encoding.WeekSystem;
import io.geotick.timescales.encoding.WeekTime;
import io.geotick.timescales.utc.UtcModel;
import java.time.Instant;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.infra.Blackhole;

/**
 * UTC &harr; GPS week/time of week and leap-second lookups, geotick's exact conversion beside java.time
 * {@link Instant} arithmetic in the same run. The java.time variants use a fixed GPS &minus; UTC of 18 s, the
 * usual shortcut: that ignores the leap-second history and is wrong before 2017 by up to 18 s.
 *
 * <p>Inputs: 1024 Unix times spread over 1990&ndash;2025 (fixed seed). Single variants convert one value per
 * call (cycling through the inputs); array variants convert all 1024 and report the time per element.
 * Run: {@code java -jar benchmarks/target/benchmarks-jmh.jar Timescales -f 1 -wi 2 -i 3 -w 1 -r 1 -prof gc}.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
public class TimescalesBenchmark {
    static final int N = 1024;
    static final long GPS_EPOCH_UNIX = 315_964_800L;
    static final long FIXED_GPS_MINUS_UTC = 18L;
    static final long WEEK = 604_800L;

    long[] unix = new long[N];
    int[] nanos = new int[N];
    int[] weekOut = new int[N];
    long[] towOut = new long[N];
    long[] unixOut = new long[N];
    int[] nanosOut = new int[N];
    int[] weekIn = new int[N];
    long[] towIn = new long[N];
    int cursor;

    TimeConverter converter;
    UtcModel utc;
    BulkConverter bulk;

    @Setup
    public void setUp() {
        Random r = new Random(20170101L);
        long from = 631_152_000L; // 1990-01-01
        long to = 1_735_689_600L; // 2025-01-01
        for (int i = 0; i < N; i++) {
            unix[i] = from + (long) (r.nextDouble() * (to - from));
            nanos[i] = r.nextInt(1_000_000_000);
        }
        converter = TimeConverter.builtIn();
        utc = converter.utcModel();
        bulk = BulkConverter.of(utc);
        bulk.unixToGpsWeek(unix, nanos, 0, N, weekIn, towIn);
    }

    private int next() {
        int i = cursor;
        cursor = (i + 1) & (N - 1);
        return i;
    }

    // ---- UTC -> GPS week / time of week, one value ----

    @Benchmark
    public long geotickUtcToGpsWeekSingle() {
        int i = next();
        long gps = utc.unixToTaiSeconds(unix[i]) - 19;
        long week = WeekSystem.GPS.weekOfScaleSeconds(gps);
        long tow = WeekSystem.GPS.secondOfWeekOfScaleSeconds(gps) * 1_000_000_000L + nanos[i];
        return week * 31 + tow;
    }

    @Benchmark
    public long javaTimeUtcToGpsWeekSingle() {
        int i = next();
        Instant t = Instant.ofEpochSecond(unix[i], nanos[i]).plusSeconds(FIXED_GPS_MINUS_UTC);
        long s = t.getEpochSecond() - GPS_EPOCH_UNIX;
        long week = Math.floorDiv(s, WEEK);
        long tow = Math.floorMod(s, WEEK) * 1_000_000_000L + t.getNano();
        return week * 31 + tow;
    }

    /** The allocating object API (ScaleInstant, WeekTime, warnings list), for reference. */
    @Benchmark
    public Object geotickObjectApiUtcToGpsWeek() {
        int i = next();
        ScaleInstant t = converter.fromUnix(UnixTime.of(unix[i], nanos[i])).value();
        WeekTime w = WeekSystem.GPS.weekTime(t);
        return w;
    }

    // ---- arrays ----

    @Benchmark
    @OperationsPerInvocation(N)
    public void geotickUtcToGpsWeekArray(Blackhole bh) {
        bh.consume(bulk.unixToGpsWeek(unix, nanos, 0, N, weekOut, towOut));
    }

    @Benchmark
    @OperationsPerInvocation(N)
    public void javaTimeUtcToGpsWeekArray(Blackhole bh) {
        for (int i = 0; i < N; i++) {
            Instant t = Instant.ofEpochSecond(unix[i], nanos[i]).plusSeconds(FIXED_GPS_MINUS_UTC);
            long s = t.getEpochSecond() - GPS_EPOCH_UNIX;
            weekOut[i] = (int) Math.floorDiv(s, WEEK);
            towOut[i] = Math.floorMod(s, WEEK) * 1_000_000_000L + t.getNano();
        }
        bh.consume(weekOut);
    }

    @Benchmark
    @OperationsPerInvocation(N)
    public void geotickGpsWeekToUtcArray(Blackhole bh) {
        bh.consume(bulk.gpsWeekToUnix(weekIn, towIn, 0, N, unixOut, nanosOut));
    }

    @Benchmark
    @OperationsPerInvocation(N)
    public void javaTimeGpsWeekToUtcArray(Blackhole bh) {
        for (int i = 0; i < N; i++) {
            long tow = towIn[i];
            Instant t = Instant.ofEpochSecond(GPS_EPOCH_UNIX + weekIn[i] * WEEK + tow / 1_000_000_000L,
                tow % 1_000_000_000L).minusSeconds(FIXED_GPS_MINUS_UTC);
            unixOut[i] = t.getEpochSecond();
            nanosOut[i] = t.getNano();
        }
        bh.consume(unixOut);
    }

    // ---- leap-second lookup ----

    @Benchmark
    public long geotickLeapLookup() {
        return utc.taiMinusUtcAtUnix(unix[next()]);
    }

    /** java.time has no leap table: the nearest equivalent is adding a constant offset to an Instant. */
    @Benchmark
    public long javaTimeConstantOffset() {
        return Instant.ofEpochSecond(unix[next()]).plusSeconds(37).getEpochSecond();
    }

    @Benchmark
    @OperationsPerInvocation(N)
    public long geotickLeapLookupArray() {
        long sum = 0;
        for (int i = 0; i < N; i++) {
            sum += utc.taiMinusUtcAtUnix(unix[i]);
        }
        return sum;
    }

    @Benchmark
    @OperationsPerInvocation(N)
    public long javaTimeConstantOffsetArray() {
        long sum = 0;
        for (int i = 0; i < N; i++) {
            sum += Instant.ofEpochSecond(unix[i]).plusSeconds(37).getEpochSecond();
        }
        return sum;
    }
}
