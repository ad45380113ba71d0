package io.geotick.timescales.leap;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * Chooses the leap table to use: the newest verified one among the built-in table and the optional files
 * (by default the tzdata copy of the IERS list). A file that is missing is skipped; a file that fails to
 * read or verify is skipped too, and the reason is kept in {@link Selection#notes()} so the caller can show
 * it: nothing is dropped silently.
 */
public final class LeapTables {
    /** Where Debian-family tzdata installs the IERS/IETF leap-second list. */
    public static final Path TZDATA_LIST = Path.of("/usr/share/zoneinfo/leap-seconds.list");

    private LeapTables() {
    }

    /**
     * The chosen table and what was considered.
     *
     * @param table the table in force
     * @param notes one line per candidate that was considered and not used, or skipped, with the reason
     */
    public record Selection(LeapTable table, List<String> notes) {
        public Selection {
            notes = List.copyOf(notes);
        }
    }

    /** The newest verified table among the built-in one and {@link #TZDATA_LIST} if it exists. */
    public static Selection standard() {
        return newest(List.of(TZDATA_LIST));
    }

    /**
     * The newest table among the built-in one and the verified {@code files} that exist. On equal update and
     * expiry dates a file wins over the built-in table (it was verified at run time).
     */
    public static Selection newest(List<Path> files) {
        LeapTable best = LeapTable.builtIn();
        List<String> notes = new ArrayList<>();
        for (Path f : files) {
            if (!Files.isRegularFile(f)) {
                notes.add(f + ": not present, skipped");
                continue;
            }
            LeapTable t;
            try {
                t = LeapTable.load(f);
            } catch (IOException e) {
                notes.add(f + ": not readable (" + e.getMessage() + "), skipped");
                continue;
            } catch (LeapListException e) {
                notes.add("skipped: " + e.getMessage());
                continue;
            }
            if (t.isNewerThan(best) || (!best.isNewerThan(t) && best.hashCheck() == HashCheck.BUILT_IN)) {
                notes.add(best.source() + " (updated " + best.updated() + ", expires " + best.expires()
                    + "): older than or as new as " + t.source() + ", not used");
                best = t;
            } else {
                notes.add(t.source() + " (updated " + t.updated() + ", expires " + t.expires()
                    + "): older than " + best.source() + ", not used");
            }
        }
        return new Selection(best, notes);
    }
}
