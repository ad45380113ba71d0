package io.geotick.cli.time;

import io.geotick.timescales.TimeConverter;
import io.geotick.timescales.leap.LeapTable;
import io.geotick.timescales.leap.LeapTables;
import io.geotick.timescales.utc.SmearWindow;
import io.geotick.transforms.FileFailure;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import picocli.CommandLine.Option;

/** Options shared by the time commands: which leap table, which smear window. */
public final class LeapOptions {
    @Option(names = "--leap-file", paramLabel = "PATH",
        description = "Leap-second list (IERS/IETF format, SHA-1 verified) to use instead of the newest of the "
            + "built-in table and the system's tzdata copy.")
    Path leapFile;

    @Option(names = "--smear-start", paramLabel = "DURATION",
        description = "Start of the smear window relative to the leap second, ISO 8601 duration "
            + "such as PT-12H (a minus sign inside: before the leap second; default: PT-12H).")
    Duration smearStart;

    @Option(names = "--smear-length", paramLabel = "DURATION",
        description = "Length of the smear window, ISO 8601 duration (default: PT24H).")
    Duration smearLength;

    /** The table chosen and the notes about the candidates. */
    LeapTables.Selection selection() {
        if (leapFile != null) {
            return new LeapTables.Selection(load(leapFile), List.of());
        }
        return LeapTables.standard();
    }

    /** Loads and verifies a leap-second list; an unreadable file is an I/O failure (exit 3). */
    static LeapTable load(Path file) {
        try {
            return LeapTable.load(file);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read leap-second list " + file + ": " + FileFailure.reason(e), e);
        }
    }

    /** The converter for the chosen table and window. */
    TimeConverter converter(LeapTable table) {
        SmearWindow w;
        if (smearStart == null && smearLength == null) {
            w = SmearWindow.CENTRED_24H;
        } else {
            Duration len = smearLength == null ? Duration.ofHours(24) : smearLength;
            w = smearStart == null ? SmearWindow.centred(len) : new SmearWindow(smearStart, len);
        }
        return TimeConverter.of(table, w);
    }
}
