package io.geotick.timescales;

import io.geotick.timescales.calendar.DateTimeLabel;
import io.geotick.timescales.calendar.IsoText;
import io.geotick.timescales.encoding.DecimalSeconds;
import io.geotick.timescales.encoding.JulianDate;
import io.geotick.timescales.encoding.NtpTimestamp;
import io.geotick.timescales.encoding.UnixTime;
import io.geotick.timescales.leap.LeapTable;
import io.geotick.timescales.leap.LeapTables;
import io.geotick.timescales.utc.SmearWindow;
import io.geotick.timescales.utc.SmearedUtc;
import io.geotick.timescales.utc.UtcModel;
import java.util.List;
import java.util.Objects;

/**
 * Labels instants on every {@link TimeScale} and reads them back, with one leap table and one smear window.
 * Immutable and thread-safe; build one and share it.
 *
 * <p>Rules:
 * <ul>
 *   <li>uniform scales (TAI, TT, GPS, GST, BDT): label = TAI label &minus; the scale's fixed offset, 86 400-s days;</li>
 *   <li>UTC: from the 1961&ndash;1971 table and the leap table ({@link UtcModel});</li>
 *   <li>GLONASS: the UTC label + 3 h, so its leap second is 02:59:60 (GLONASS ICD: GLONASS time = UTC(SU) + 3 h);</li>
 *   <li>smeared UTC: {@link SmearedUtc} with the configured {@link SmearWindow}.</li>
 * </ul>
 * Every result carries its warnings: past the leap table's expiry, rounded to the nanosecond, or a
 * leap-second value repeated by Unix-like encodings. Bad input raises {@link TimeInputException}.
 */
public final class TimeConverter {
    private static final long GLONASS_SHIFT_SECONDS = 3 * 3600L;

    private final LeapTable table;
    private final UtcModel utc;
    private final SmearedUtc smeared;

    private TimeConverter(LeapTable table, SmearWindow window) {
        this.table = Objects.requireNonNull(table, "table");
        this.utc = UtcModel.of(table);
        this.smeared = SmearedUtc.of(utc, Objects.requireNonNull(window, "window"));
    }

    /** A converter using {@code table} and the default 24-hour centred smear window. */
    public static TimeConverter of(LeapTable table) {
        return new TimeConverter(table, SmearWindow.CENTRED_24H);
    }

    /** A converter using {@code table} and {@code window} for smeared UTC. */
    public static TimeConverter of(LeapTable table, SmearWindow window) {
        return new TimeConverter(table, window);
    }

    /** A converter on the built-in leap table. */
    public static TimeConverter builtIn() {
        return of(LeapTable.builtIn());
    }

    /** A converter on the newest verified table ({@link LeapTables#standard()}). */
    public static TimeConverter standard() {
        return of(LeapTables.standard().table());
    }

    /** This converter with another smear window. */
    public TimeConverter withSmearWindow(SmearWindow window) {
        return new TimeConverter(table, window);
    }

    /** The leap table. */
    public LeapTable leapTable() {
        return table;
    }

    /** The UTC model built from the leap table (for the allocation-free primitives). */
    public UtcModel utcModel() {
        return utc;
    }

    /** The smear window. */
    public SmearWindow smearWindow() {
        return smeared.window();
    }

    // ---- calendar labels ----

    /**
     * The instant of a label on {@code scale}.
     *
     * @throws TimeInputException if the label does not exist on that scale (a second of 60 where the scale has
     *                            no leap second, a UTC date before 1961, a skipped label)
     */
    public Conversion<ScaleInstant> fromLabel(TimeScale scale, DateTimeLabel label) {
        switch (scale) {
            case UTC:
                return utc.toTai(label).map(t -> t.to(TimeScale.UTC));
            case GLONASS:
                if (label.isLeapSecondLabel() && (label.hour() != 2 || label.minute() != 59)) {
                    throw new TimeInputException("GLONASS label " + label + " does not exist: GLONASS time has its "
                        + "leap second at 02:59:60 (UTC 23:59:60 + 3 h)");
                }
                DateTimeLabel u = label.shiftedKeepingLeapSecond(-GLONASS_SHIFT_SECONDS);
                try {
                    return utc.toTai(u).map(t -> t.to(TimeScale.GLONASS));
                } catch (TimeInputException e) {
                    throw new TimeInputException("GLONASS label " + label + " (UTC " + u + "): " + e.getMessage(), e);
                }
            case SMEARED_UTC:
                return smeared.toTai(label).map(t -> t.to(TimeScale.SMEARED_UTC));
            default:
                if (label.isLeapSecondLabel()) {
                    throw new TimeInputException(scale.id().toUpperCase(java.util.Locale.ROOT) + " label " + label
                        + " does not exist: " + scale.id() + " is a uniform scale without leap seconds");
                }
                long secs = Math.addExact(Math.multiplyExact(label.epochDay(), 86_400L), label.secondOfDay());
                return Conversion.exact(ScaleInstant.ofScaleSeconds(scale, secs, label.nano()));
        }
    }

    /** The label of {@code t} on its own scale. */
    public Conversion<DateTimeLabel> toLabel(ScaleInstant t) {
        return toLabel(t, t.scale());
    }

    /**
     * The label of an instant on {@code scale}.
     *
     * @throws TimeInputException for UTC-like scales before 1961, or a label outside years 0000&ndash;9999
     */
    public Conversion<DateTimeLabel> toLabel(ScaleInstant t, TimeScale scale) {
        switch (scale) {
            case UTC:
                return utc.toLabel(t);
            case GLONASS:
                return utc.toLabel(t).map(l -> l.shiftedKeepingLeapSecond(GLONASS_SHIFT_SECONDS));
            case SMEARED_UTC:
                return smeared.toLabel(t);
            default:
                ScaleInstant s = t.to(scale);
                long secs = s.scaleSeconds();
                return Conversion.exact(DateTimeLabel.ofEpochDay(Math.floorDiv(secs, 86_400L),
                    Math.floorMod(secs, 86_400L) * 1_000_000_000L + s.scaleNano()));
        }
    }

    /**
     * Reads ISO 8601 text ({@link IsoText}). With {@code Z} or a UTC offset the text is UTC whatever
     * {@code scale} says, but only if {@code scale} is UTC: a zone on another scale is an error, since
     * {@code Z} means UTC. Without a zone the label is read on {@code scale}.
     */
    public Conversion<ScaleInstant> parseIso(String text, TimeScale scale) {
        Conversion<IsoText> p = IsoText.parse(text);
        IsoText iso = p.value();
        DateTimeLabel label = iso.label();
        if (iso.isZoned()) {
            if (scale != TimeScale.UTC) {
                throw new TimeInputException("'" + text + "' carries a UTC zone designator but the input scale is "
                    + scale.id() + "; write " + scale.id() + " labels without 'Z' or an offset");
            }
            label = label.shiftedKeepingLeapSecond(-iso.offsetSeconds());
        }
        Conversion<ScaleInstant> r;
        try {
            r = fromLabel(scale, label);
        } catch (TimeInputException e) {
            throw new TimeInputException("'" + text + "': " + e.getMessage(), e);
        }
        Conversion<ScaleInstant> out = p.then(x -> r);
        return iso.carryNano() ? out.map(t -> t.plusNanos(1)) : out;
    }

    /** ISO 8601 text of an instant on its scale: with {@code Z} for UTC, without a zone otherwise. */
    public Conversion<String> formatIso(ScaleInstant t) {
        return formatIso(t, t.scale());
    }

    /** ISO 8601 text of an instant on {@code scale}: with {@code Z} for UTC, without a zone otherwise. */
    public Conversion<String> formatIso(ScaleInstant t, TimeScale scale) {
        return toLabel(t, scale).map(l -> scale == TimeScale.UTC ? l + "Z" : l.toString());
    }

    // ---- Unix, NTP, Julian dates ----

    /** The Unix time of an instant; inside a leap second the value repeats the next second's (warned). */
    public Conversion<UnixTime> toUnix(ScaleInstant t) {
        Conversion<DateTimeLabel> l = utc.toLabel(t);
        Conversion<UnixTime> u = l.map(UnixTime::ofLabel);
        if (l.value().isLeapSecondLabel()) {
            return u.withWarnings(List.of(repeatWarning("Unix time", l.value())));
        }
        return u;
    }

    /** The instant of a Unix time (read on UTC); a value that could also be a leap second is warned. */
    public Conversion<ScaleInstant> fromUnix(UnixTime u) {
        DateTimeLabel label = u.toLabel();
        Conversion<ScaleInstant> r = fromLabel(TimeScale.UTC, label);
        return r.withWarnings(ambiguity(() -> "Unix time " + u, label));
    }

    /** The NTP timestamp of an instant (the fraction rounded to 2^-32 s; see {@link NtpTimestamp}). */
    public Conversion<NtpTimestamp> toNtp(ScaleInstant t) {
        return toUnix(t).map(NtpTimestamp::ofUnix);
    }

    /** The instant of an NTP timestamp (read on UTC). */
    public Conversion<ScaleInstant> fromNtp(NtpTimestamp ntp) {
        return ntp.toUnix().then(this::fromUnix);
    }

    /** The Julian date of an instant on {@code scale}; on UTC or GLONASS a leap second repeats (warned). */
    public Conversion<JulianDate> toJulianDate(ScaleInstant t, TimeScale scale) {
        Conversion<DateTimeLabel> l = toLabel(t, scale);
        Conversion<JulianDate> jd = l.map(x -> JulianDate.ofLabel(scale, x));
        if (l.value().isLeapSecondLabel()) {
            return jd.withWarnings(List.of(repeatWarning("the Julian date on " + scale.id(), l.value())));
        }
        return jd;
    }

    /** The instant of a Julian date on its scale. */
    public Conversion<ScaleInstant> fromJulianDate(JulianDate jd) {
        DateTimeLabel label = jd.toLabel();
        Conversion<ScaleInstant> r = fromLabel(jd.scale(), label);
        return jd.scale() == TimeScale.UTC
            ? r.withWarnings(ambiguity(() -> "MJD " + jd.mjdDecimal().toPlainString(), label)) : r;
    }

    /** TAI &minus; UTC at an instant (the offset before the step inside a leap second). */
    public Conversion<DecimalSeconds> taiMinusUtc(ScaleInstant t) {
        return utc.taiMinusUtc(t);
    }

    /** True when the instant is at or after the leap table's expiry. */
    public boolean isPastExpiry(ScaleInstant t) {
        return utc.isPastExpiry(t);
    }

    private static TimeWarning repeatWarning(String encoding, DateTimeLabel leap) {
        return new TimeWarning(TimeWarning.Kind.LEAP_SECOND_REPEAT, "inside the leap second " + leap + "Z: "
            + encoding + " has no value of its own for it and repeats the value of the following second");
    }

    private List<TimeWarning> ambiguity(java.util.function.Supplier<String> what, DateTimeLabel label) {
        return utc.stepJustBefore(label).map(d -> List.of(new TimeWarning(TimeWarning.Kind.LEAP_SECOND_REPEAT,
            what.get() + " also names the leap second " + d + "T23:59:60" + fractionOf(label)
                + "Z; read as the later second " + label + "Z"))).orElse(List.of());
    }

    private static String fractionOf(DateTimeLabel l) {
        StringBuilder sb = new StringBuilder();
        DecimalSeconds.appendFraction(sb, l.nano());
        return sb.toString();
    }
}
