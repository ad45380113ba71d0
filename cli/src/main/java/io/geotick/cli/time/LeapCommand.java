package io.geotick.cli.time;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.databind.util.RawValue;
import io.geotick.cli.Json;
import io.geotick.timescales.Conversion;
import io.geotick.timescales.ScaleInstant;
import io.geotick.timescales.TimeConverter;
import io.geotick.timescales.TimeScale;
import io.geotick.timescales.encoding.DecimalSeconds;
import io.geotick.timescales.leap.HashCheck;
import io.geotick.timescales.leap.LeapEntry;
import io.geotick.timescales.leap.LeapTable;
import io.geotick.timescales.leap.LeapTables;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code geotick leap}: the leap-second table in force and where it came from. */
@Command(name = "leap", mixinStandardHelpOptions = true,
    description = {"Show the leap-second table in force.",
        "",
        "Prints its source, entry count, last step, TAI - UTC now (or --at),",
        "update and expiry dates, and whether its SHA-1 hash verified. Without",
        "--file the newest verified table among the built-in one and",
        "/usr/share/zoneinfo/leap-seconds.list is used."})
public final class LeapCommand implements Runnable {
    @Spec
    CommandSpec spec;

    @Option(names = "--file", paramLabel = "PATH", description = "Read and verify this leap-second list instead.")
    Path file;

    @Option(names = "--json", description = "Print one JSON object (with every step).")
    boolean json;

    @Option(names = "--list", description = "Also list every step (text output).")
    boolean list;

    @Option(names = "--at", paramLabel = "DATE",
        description = "Give TAI - UTC at this ISO 8601 time (UTC) instead of now.")
    String at;

    @Override
    public void run() {
        LeapTables.Selection sel;
        if (file != null) {
            sel = new LeapTables.Selection(LeapOptions.load(file), List.of());
        } else {
            sel = LeapTables.standard();
        }
        LeapTable t = sel.table();
        TimeConverter tc = TimeConverter.of(t);
        ScaleInstant when = at == null ? TimeCommand.now(tc) : tc.parseIso(at, TimeScale.UTC).value();
        Conversion<String> whenText = tc.formatIso(when, TimeScale.UTC);
        Conversion<DecimalSeconds> dtai = tc.taiMinusUtc(when);
        List<String> warnings = new ArrayList<>();
        whenText.warnings().forEach(w -> add(warnings, w.message()));
        dtai.warnings().forEach(w -> add(warnings, w.message()));
        boolean expired = tc.isPastExpiry(when);
        LeapEntry first = t.entries().get(0);
        LeapEntry last = t.last();
        String leapSecond = last.effective().minusDays(1) + "T23:59:60Z";
        PrintWriter out = spec.commandLine().getOut();
        if (json) {
            ObjectNode o = Json.object();
            o.put("source", t.source());
            o.put("hash_verified", t.hashCheck() == HashCheck.VERIFIED);
            o.put("hash_check", t.hashCheck() == HashCheck.VERIFIED ? "verified" : "built-in");
            o.put("entries", t.size());
            ObjectNode f = o.putObject("first_entry");
            f.put("date", first.effective().toString());
            f.put("tai_minus_utc", first.taiMinusUtc());
            ObjectNode l = o.putObject("last_step");
            l.put("date", last.effective().toString());
            l.put("tai_minus_utc", last.taiMinusUtc());
            l.put("leap_second", leapSecond);
            o.put("at", whenText.value());
            o.putRawValue("tai_minus_utc", new RawValue(dtai.value().toString()));
            o.put("updated", t.updated().toString());
            o.put("expires", t.expires().toString());
            o.put("expired", expired);
            ArrayNode notes = o.putArray("notes");
            sel.notes().forEach(notes::add);
            ArrayNode steps = o.putArray("steps");
            for (LeapEntry e : t.entries()) {
                ObjectNode s = steps.addObject();
                s.put("date", e.effective().toString());
                s.put("tai_minus_utc", e.taiMinusUtc());
                s.put("ntp", e.ntpSeconds());
            }
            ArrayNode w = o.putArray("warnings");
            warnings.forEach(w::add);
            out.println(Json.write(o));
        } else {
            out.printf("%-15s %s%n", "source", t.source());
            out.printf("%-15s %s%n", "hash", t.hashCheck() == HashCheck.VERIFIED ? "verified (SHA-1 matches #h)"
                : "built-in (compiled in; checked by geotick's tests against the IERS list)");
            out.printf("%-15s %d (%s %d s ... %s %d s)%n", "entries", t.size(), first.effective(),
                first.taiMinusUtc(), last.effective(), last.taiMinusUtc());
            out.printf("%-15s %s: TAI - UTC = %d s (leap second %s)%n", "last step", last.effective(),
                last.taiMinusUtc(), leapSecond);
            out.printf("%-15s %s s at %s%n", "TAI - UTC", dtai.value(), whenText.value());
            out.printf("%-15s %s%n", "updated", t.updated());
            out.printf("%-15s %s%s%n", "expires", t.expires(), expired ? "  (expired)" : "");
            if (list) {
                out.println("steps:");
                for (LeapEntry e : t.entries()) {
                    out.printf("  %s  %3d s  (NTP %d)%n", e.effective(), e.taiMinusUtc(), e.ntpSeconds());
                }
            }
            sel.notes().forEach(n -> out.println("note: " + n));
            warnings.forEach(w -> out.println("warning: " + w));
        }
        out.flush();
    }

    private static void add(List<String> list, String s) {
        if (!list.contains(s)) {
            list.add(s);
        }
    }
}
