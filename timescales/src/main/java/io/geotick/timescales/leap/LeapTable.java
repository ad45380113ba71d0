package io.geotick.timescales.leap;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * A table of TAI &minus; UTC since 1972-01-01, with the date it was last updated, the date it expires and
 * where it came from. Immutable and thread-safe.
 *
 * <p>The expiry is the date up to which the publisher guarantees that no further leap second is scheduled
 * beyond those listed. Conversions of instants at or after it carry a
 * {@link io.geotick.timescales.TimeWarning.Kind#TABLE_EXPIRED} warning: geotick then assumes no further leap
 * seconds.
 */
public final class LeapTable {
    /**
     * The built-in entries: 1972-01-01 (10 s) through 2017-01-01 (37 s). Source: IERS Bulletin C and the
     * IERS/IETF leap-second list (the tzdata copy on the build machine, updated 2025-07-07); the
     * reference tests compare every entry with that list when it is present.
     */
    private static final long[][] BUILT_IN_NTP = {
        {2272060800L, 10}, {2287785600L, 11}, {2303683200L, 12}, {2335219200L, 13}, {2366755200L, 14},
        {2398291200L, 15}, {2429913600L, 16}, {2461449600L, 17}, {2492985600L, 18}, {2524521600L, 19},
        {2571782400L, 20}, {2603318400L, 21}, {2634854400L, 22}, {2698012800L, 23}, {2776982400L, 24},
        {2840140800L, 25}, {2871676800L, 26}, {2918937600L, 27}, {2950473600L, 28}, {2982009600L, 29},
        {3029443200L, 30}, {3076704000L, 31}, {3124137600L, 32}, {3345062400L, 33}, {3439756800L, 34},
        {3550089600L, 35}, {3644697600L, 36}, {3692217600L, 37},
    };
    /** {@code #$} of the list the built-in table was built from: 3960835200 = 2025-07-07. */
    static final long BUILT_IN_UPDATED_NTP = 3_960_835_200L;
    /** {@code #@} of the list the built-in table was built from: 3991593600 = 2026-06-28. */
    static final long BUILT_IN_EXPIRES_NTP = 3_991_593_600L;

    private static final LeapTable BUILT_IN = new LeapTable(
        java.util.Arrays.stream(BUILT_IN_NTP).map(e -> LeapEntry.ofNtp(e[0], (int) e[1])).toList(),
        LeapEntry.ofNtp(BUILT_IN_UPDATED_NTP, 0).effective(),
        LeapEntry.ofNtp(BUILT_IN_EXPIRES_NTP, 0).effective(),
        "built-in", HashCheck.BUILT_IN);

    private final List<LeapEntry> entries;
    private final LocalDate updated;
    private final LocalDate expires;
    private final String source;
    private final HashCheck hashCheck;

    LeapTable(List<LeapEntry> entries, LocalDate updated, LocalDate expires, String source, HashCheck hashCheck) {
        this.entries = List.copyOf(entries);
        this.updated = Objects.requireNonNull(updated, "updated");
        this.expires = Objects.requireNonNull(expires, "expires");
        this.source = Objects.requireNonNull(source, "source");
        this.hashCheck = Objects.requireNonNull(hashCheck, "hashCheck");
        if (this.entries.isEmpty()) {
            throw new IllegalArgumentException("a leap table needs at least one entry");
        }
    }

    /**
     * The table compiled into geotick: 1972-01-01 (10 s) through 2017-01-01 (37 s), updated 2025-07-07,
     * expiring 2026-06-28 (the {@code #$} and {@code #@} dates of the IERS list it was checked against).
     */
    public static LeapTable builtIn() {
        return BUILT_IN;
    }

    /**
     * Reads and verifies a leap-second list in the IERS/IETF format (see {@link LeapListParser}).
     *
     * @param text   the file's content
     * @param source how to name the file in messages and reports
     * @throws LeapListException naming the line when the list is malformed or its hash does not verify
     */
    public static LeapTable parse(String text, String source) {
        return LeapListParser.parse(text, source);
    }

    /**
     * Reads and verifies a leap-second list file.
     *
     * @throws IOException       if the file cannot be read
     * @throws LeapListException naming the file and line when it is malformed or its hash does not verify
     */
    public static LeapTable load(Path file) throws IOException {
        return parse(Files.readString(file, StandardCharsets.UTF_8), file.toString());
    }

    /** The entries, oldest first; the first is 1972-01-01 (10 s). */
    public List<LeapEntry> entries() {
        return entries;
    }

    /** The newest entry. */
    public LeapEntry last() {
        return entries.get(entries.size() - 1);
    }

    /** Number of entries (the 1972-01-01 start and each leap second after it). */
    public int size() {
        return entries.size();
    }

    /** When the table's publisher last updated it ({@code #$}). */
    public LocalDate updated() {
        return updated;
    }

    /** The date from which the table no longer guarantees the absence of further leap seconds ({@code #@}). */
    public LocalDate expires() {
        return expires;
    }

    /** True if {@code date} is on or after the expiry date. */
    public boolean isExpiredOn(LocalDate date) {
        return !date.isBefore(expires);
    }

    /** Where the table came from: {@code "built-in"} or the file path. */
    public String source() {
        return source;
    }

    /** How its integrity is known. */
    public HashCheck hashCheck() {
        return hashCheck;
    }

    /**
     * TAI &minus; UTC in whole seconds in force at the start of UTC day {@code date} (1972-01-01 or later).
     *
     * @throws IllegalArgumentException for a date before the first entry (see the utc package for 1961&ndash;1971)
     */
    public int taiMinusUtcOn(LocalDate date) {
        Optional<LeapEntry> e = entryOn(date);
        return e.orElseThrow(() -> new IllegalArgumentException(
            "date " + date + " is before the first entry " + entries.get(0).effective())).taiMinusUtc();
    }

    /** The entry in force on {@code date}, empty before the first entry. */
    public Optional<LeapEntry> entryOn(LocalDate date) {
        LeapEntry found = null;
        for (LeapEntry e : entries) {
            if (e.effective().isAfter(date)) {
                break;
            }
            found = e;
        }
        return Optional.ofNullable(found);
    }

    /** True when this table is newer than {@code other}: later update, or the same update and a later expiry. */
    public boolean isNewerThan(LeapTable other) {
        int c = updated.compareTo(other.updated);
        return c != 0 ? c > 0 : expires.isAfter(other.expires);
    }

    /** Same entries and dates (the source and hash check are not compared). */
    public boolean sameContentAs(LeapTable other) {
        return entries.equals(other.entries) && updated.equals(other.updated) && expires.equals(other.expires);
    }

    @Override
    public String toString() {
        return "LeapTable[" + source + ", " + entries.size() + " entries, last " + last().effective() + " ("
            + last().taiMinusUtc() + " s), updated " + updated + ", expires " + expires + "]";
    }
}
