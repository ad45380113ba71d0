package io.geotick.cli.demo;

import io.geotick.timescales.ScaleInstant;
import io.geotick.timescales.TimeConverter;
import io.geotick.timescales.TimeScale;
import io.geotick.timescales.clock.ClockFit;
import io.geotick.timescales.clock.ClockFitter;
import io.geotick.timescales.clock.ClockModel;
import io.geotick.timescales.clock.ClockPair;
import io.geotick.timescales.clock.ClockTerms;
import io.geotick.timescales.encoding.DecimalSeconds;
import io.geotick.timescales.encoding.WeekSystem;
import io.geotick.timescales.encoding.WeekTime;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The timestamp-reconciliation part of {@code geotick demo}: an invented scenario, computed live with the
 * timescales library on the built-in leap table (so the output is the same on every machine).
 */
public final class TimeDemo {
    /** Fixed jitter of the invented sensor readings, seconds (no randomness: the output is reproducible). */
    private static final double[] JITTER = {0.0008, -0.0011, 0.0004, -0.0002, 0.0009, -0.0007, 0.0001, -0.0005};

    private TimeDemo() {
    }

    /** Prints the scenario and its reconciliation. */
    public static void run(PrintWriter out) {
        TimeConverter tc = TimeConverter.builtIn();
        out.println("Timestamp reconciliation (an invented scenario; no real vessel, data or equipment):");
        out.println("  A survey launch logs three streams across the leap second at the end of 2016-12-31.");
        out.println();

        // 1. An old GNSS receiver reports a 10-bit GPS week.
        DecimalSeconds tow = DecimalSeconds.of(17, 500_000_000);
        ScaleInstant near = tc.parseIso("2017-01-01T00:00:00Z", TimeScale.UTC).value();
        WeekTime full = WeekTime.resolve(WeekSystem.GPS, 906, 10, tow, near);
        ScaleInstant fix = full.toInstant();
        ScaleInstant naive = new WeekTime(WeekSystem.GPS, 906, tow).toInstant();
        out.println("  1. GNSS receiver (10-bit week): week 906, time of week 17.5 s");
        out.printf("     full week near the survey date: %d -> %s%n", full.week(), iso(tc, fix));
        out.printf("     (read without the rollover it would be %s, 1024 weeks early)%n", iso(tc, naive));

        // 2. A logger disciplined by a smearing time server.
        String smearedStamp = "2017-01-01T00:00:00";
        ScaleInstant logger = tc.parseIso(smearedStamp, TimeScale.SMEARED_UTC).value();
        out.printf("  2. Echo-sounder logger on a smearing time server: %s (smeared UTC)%n", smearedStamp);
        out.printf("     as UTC: %s; offset from the GNSS fix: %s s%n", iso(tc, logger),
            DecimalSeconds.ofNanos(fix.nanosUntil(logger)));
        ScaleInstant misread = tc.parseIso(smearedStamp + "Z", TimeScale.UTC).value();
        out.printf("     (taken for plain UTC it would be off by %s s)%n",
            DecimalSeconds.ofNanos(logger.nanosUntil(misread)));

        // 3. A motion sensor whose quartz clock gains about half a second a day.
        ScaleInstant t0 = tc.parseIso("2016-12-31T12:00:00Z", TimeScale.UTC).value();
        List<ClockPair> pairs = new ArrayList<>();
        for (int i = 0; i < JITTER.length; i++) {
            ScaleInstant ref = t0.plusSeconds(i * 5400L);
            ScaleInstant device = ref.plusNanos(sensorError(t0.nanosUntil(ref) / 1e9, JITTER[i]));
            pairs.add(new ClockPair(device.to(TimeScale.UTC), ref.to(TimeScale.UTC), i + 1));
        }
        ClockFit fit = ClockFitter.fit(pairs, ClockTerms.DRIFT, 3, false);
        ClockModel m = fit.model();
        out.printf("  3. Motion sensor: %d readings paired with GNSS time, device clock showing %s to %s%n",
            pairs.size(), iso(tc, m.firstReading()), iso(tc, m.lastReading()));
        out.printf(Locale.ROOT, "     fitted: the sensor clock gains %.3f s/day (+/- %.3f) and was %.4f s ahead at its "
            + "first reading;%n     residual RMS %.1f ms%n", -m.drift() * 86_400, m.sigma(1).orElseThrow() * 86_400,
            -(m.baseOffsetNanos() / 1e9 + m.offsetSeconds()), fit.residualRms() * 1e3);
        ScaleInstant sensorStamp = fix.plusNanos(sensorError(t0.nanosUntil(fix) / 1e9, 0));
        ClockModel.ClockCorrection c = m.apply(sensorStamp.to(TimeScale.UTC));
        out.printf("     its event stamp %s corrects to %s (%s s from the GNSS fix)%n", iso(tc, sensorStamp),
            iso(tc, c.reference()), DecimalSeconds.ofNanos(fix.nanosUntil(c.reference())));
        out.println();
        out.println("  All three streams name the same instant, inside the leap second 2016-12-31T23:59:60Z,");
        out.println("  once the rollover, the smear and the clock drift are undone.");
    }

    /** device - reference of the invented sensor: +1.2 s at the start, gaining 0.5 s a day, plus jitter. */
    private static long sensorError(double secondsSinceStart, double jitter) {
        return Math.round((1.2 + 0.5 / 86_400 * secondsSinceStart + jitter) * 1e9);
    }

    private static String iso(TimeConverter tc, ScaleInstant t) {
        return tc.formatIso(t, TimeScale.UTC).value();
    }
}
