package io.geotick.cli;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.MappingIterator;
import com.fasterxml.jackson.databind.SequenceWriter;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.databind.node.POJONode;
import com.fasterxml.jackson.databind.util.RawValue;
import com.fasterxml.jackson.dataformat.csv.CsvMapper;
import com.fasterxml.jackson.dataformat.csv.CsvParser;
import com.fasterxml.jackson.dataformat.csv.CsvSchema;
import io.geotick.transforms.FileFailure;
import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.PrintWriter;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;

/**
 * The machinery shared by the batch modes ({@code --input}) of the subcommands: CSV rows read one at a time by
 * Jackson's {@link MappingIterator} (header row first, line numbers from the parser), each turned by a
 * subcommand's {@link Plan} into one result object, and written as they come as CSV (Jackson
 * {@link SequenceWriter}) or NDJSON (one {@link Json#write} line per row). Constant memory: one row in hand.
 *
 * <p>What every batch mode shares: the header (a byte-order mark before the first name is dropped, names are
 * trimmed, a name twice is refused), the pass-through columns (every column the plan does not consume, in its
 * order, before the results; a pass-through name equal to an output column is refused), the error rows
 * ({@code line N: } + the message of the {@link IllegalArgumentException}, or a field-count mismatch; empty
 * result cells), the output layout (CSV: pass-through, result keys, {@code error}; NDJSON: {@code line} and
 * {@code error} for a failed row, the pass-through fields as strings, the result fields) and the exit code
 * ({@link ExitCode#PARTIAL} with {@code geotick: N of M rows failed} when rows failed). In a CSV cell a JSON
 * string is its text, a number its JSON digits, {@code null} empty, an array its elements joined by
 * {@code "; "}.
 *
 * <p>Only bad input ({@link IllegalArgumentException}) becomes an error row; an invalid data file or an internal
 * failure stops the batch. CSV that cannot be parsed any further stops it with an {@link UncheckedIOException}
 * naming the line, after the rows already written. Thread-safe: all state is per {@link #run}.
 */
public final class CsvBatch {
    /** Configured once; thread-safe. Arrays are the rows both ways, so the header is ours to read and write. */
    private static final CsvMapper CSV = CsvMapper.builder()
        .enable(CsvParser.Feature.WRAP_AS_ARRAY)
        .enable(CsvParser.Feature.SKIP_EMPTY_LINES)
        .disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET)
        .disable(SerializationFeature.FLUSH_AFTER_WRITE_VALUE)
        .build();

    private CsvBatch() {
    }

    /** Opens the output; called once the header has been read and checked, so a bad input creates no file. */
    @FunctionalInterface
    public interface Sink {
        Writer open() throws IOException;
    }

    /**
     * How a batch went.
     *
     * @param rows the data rows read (each gave one output row)
     * @param failed the rows written as error rows
     */
    public record Summary(long rows, long failed) {
    }

    /**
     * The header row as read: trimmed names (no byte-order mark), all distinct.
     *
     * @param names the column names in file order
     * @param where the prefix for a header message ({@code FILE, line N (header): })
     */
    public record Header(List<String> names, String where) {
        public Header {
            names = List.copyOf(names);
        }

        /** The index of a column, or -1. */
        public int indexOf(String name) {
            return names.indexOf(name);
        }

        /** A usage error about the header, prefixed with where it is. */
        public UserInputException problem(String message) {
            return new UserInputException(where + message);
        }
    }

    /** What a subcommand does with the rows of one header: built once the header is read. */
    public interface Plan {
        /** The columns that carry the values (not passed through). */
        List<String> valueColumns();

        /** The result keys, in output order. */
        List<String> outputKeys();

        /**
         * The result object of one row with as many fields as the header; its {@link #outputKeys()} are
         * written (a missing one as an empty cell, or left out of NDJSON).
         *
         * @throws IllegalArgumentException for bad input: the row becomes an error row with this message
         */
        ObjectNode convert(String[] cells);
    }

    /** Builds the plan for a header, or refuses the header with {@link Header#problem}. */
    @FunctionalInterface
    public interface Planner {
        Plan plan(Header header);
    }

    /**
     * The batch mode of a command: reads {@code input} ({@code "-"}: standard input), writes {@code output}
     * ({@code null} or {@code "-"}: {@code out}), and returns the exit code: {@link ExitCode#OK}, or
     * {@link ExitCode#PARTIAL} after {@code geotick: N of M rows failed} on {@code err}.
     *
     * @param emptyHint what the header should name, for the message about an empty input
     * @throws UserInputException for an {@code --output} that is the input, an empty input or a bad header
     * @throws UncheckedIOException if the input cannot be read or parsed, or the output cannot be written
     */
    public static int execute(String input, String output, boolean json, PrintWriter out, PrintWriter err,
            String emptyHint, Planner planner) {
        boolean toStdout = output == null || output.equals("-");
        String outName = toStdout ? "standard output" : output;
        Sink sink = toStdout ? () -> out : () -> Files.newBufferedWriter(Path.of(output), StandardCharsets.UTF_8);
        boolean fromStdin = input.equals("-");
        String inName = fromStdin ? "standard input" : input;
        if (!fromStdin && !toStdout && sameFile(Path.of(input), Path.of(output))) {
            // Opening the output would empty the input before it is read.
            throw new UserInputException("--output " + output + " is the --input file; write to another file");
        }
        Summary s;
        Writer[] opened = new Writer[1];
        Sink tracked = () -> opened[0] = sink.open();
        try (Reader in = fromStdin ? new BufferedReader(new InputStreamReader(System.in, StandardCharsets.UTF_8))
                : Files.newBufferedReader(Path.of(input), StandardCharsets.UTF_8)) {
            try {
                s = run(in, inName, tracked, outName, json, emptyHint, planner);
            } finally {
                if (opened[0] != null && !toStdout) {
                    opened[0].close();
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException((opened[0] == null ? "cannot read " + inName : "cannot write " + outName)
                + ": " + FileFailure.reason(e), e);
        }
        if (toStdout && out.checkError()) {
            throw new UncheckedIOException("cannot write standard output", new IOException("write failed"));
        }
        if (s.failed() > 0) {
            err.println("geotick: " + s.failed() + " of " + s.rows() + " rows failed");
            err.flush();
            return ExitCode.PARTIAL;
        }
        err.flush();
        return ExitCode.OK;
    }

    /**
     * Refuses options that only make sense with {@code --input}, or values that the file replaces.
     *
     * @param input the {@code --input} option, or null
     * @param output the {@code --output} option, or null
     * @param values the values given on the command line
     * @param single what the single-value mode prints (for the message about a stray {@code --output})
     */
    public static void checkUse(String input, String output, List<String> values, String single) {
        if (input == null && output != null) {
            throw new UserInputException("--output applies to --input FILE; " + single + " is printed on standard"
                + " output");
        }
        if (input != null && !values.isEmpty()) {
            throw new UserInputException("with --input the values come from the file; drop the values given on"
                + " the command line (" + values.stream().map(v -> "'" + v + "'").collect(Collectors.joining(" "))
                + ")");
        }
    }

    /**
     * Reads every row of {@code in}, converts it through the plan and writes its output row to the sink.
     * Neither the reader nor the writer is closed; the writer is flushed.
     *
     * @param name the input's name for messages (the file, or "standard input")
     * @param outName the output's name for messages
     * @param emptyHint what the header should name, for the message about an empty input
     */
    public static Summary run(Reader in, String name, Sink sink, String outName, boolean json, String emptyHint,
            Planner planner) {
        try (MappingIterator<String[]> it = CSV.readerFor(String[].class).with(CsvSchema.emptySchema()).readValues(in)) {
            Row first = next(it, name);
            if (first == null) {
                throw new UserInputException(name + " is empty; expected a header row naming the columns " + emptyHint);
            }
            Header header = header(first, name);
            Plan plan = planner.plan(header);
            Layout layout = Layout.of(header, plan, json);
            Writer out;
            try {
                out = sink.open();
            } catch (IOException e) {
                throw new UncheckedIOException("cannot write " + outName + ": " + FileFailure.reason(e), e);
            }
            long rows = 0;
            long failed = 0;
            try (SequenceWriter csv = json ? null : CSV.writer(CsvSchema.emptySchema()).writeValues(out)) {
                if (csv != null) {
                    ArrayNode h = Json.MAPPER.createArrayNode();
                    layout.passNames.forEach(h::add);
                    layout.keys.forEach(h::add);
                    h.add("error");
                    csv.write(h);
                }
                for (Row r = next(it, name); r != null; r = next(it, name)) {
                    rows++;
                    if (!writeRow(r, layout, plan, csv, out)) {
                        failed++;
                    }
                }
                if (csv != null) {
                    csv.flush();
                }
                out.flush();
            } catch (IOException e) {
                throw new UncheckedIOException("cannot write " + outName + ": " + FileFailure.reason(e), e);
            }
            return new Summary(rows, failed);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read " + name + ": " + FileFailure.reason(e), e);
        }
    }

    /** Converts one row and writes its output row; false if it became an error row. */
    private static boolean writeRow(Row r, Layout layout, Plan plan, SequenceWriter csv, Writer out)
            throws IOException {
        String[] cells = r.cells();
        ObjectNode result = null;
        String error = null;
        if (cells.length != layout.width) {
            error = "line " + r.line() + ": " + cells.length + " field" + (cells.length == 1 ? "" : "s")
                + " where the header has " + layout.width;
        } else {
            try {
                result = plan.convert(cells);
            } catch (IllegalArgumentException e) {
                error = "line " + r.line() + ": " + e.getMessage();
            }
        }
        if (csv != null) {
            ArrayNode row = Json.MAPPER.createArrayNode();
            for (int i : layout.passIndex) {
                row.add(i < cells.length ? cells[i] : "");
            }
            for (String k : layout.keys) {
                cell(row, result == null ? null : result.get(k));
            }
            row.add(error == null ? "" : error);
            csv.write(row);
        } else {
            ObjectNode o = Json.object();
            if (error != null) {
                o.put("line", r.line());
                o.put("error", error);
            }
            for (int j = 0; j < layout.passIndex.length; j++) {
                int i = layout.passIndex[j];
                if (i < cells.length) {
                    o.put(layout.passNames.get(j), cells[i]);
                }
            }
            if (result != null) {
                for (String k : layout.keys) {
                    JsonNode v = result.get(k);
                    if (v != null) {
                        o.set(k, v);
                    }
                }
            }
            out.write(Json.write(o));
            out.write('\n');
        }
        return error == null;
    }

    /** One CSV cell from a JSON value (see the class comment). */
    private static void cell(ArrayNode row, JsonNode v) {
        if (v == null || v.isNull()) {
            row.add("");
        } else if (v instanceof POJONode p && p.getPojo() instanceof RawValue raw) {
            row.add(raw.rawValue().toString()); // an exact decimal written raw: its digits, as --json prints them
        } else if (v.isArray()) {
            List<String> parts = new ArrayList<>(v.size());
            v.forEach(e -> parts.add(e.asText()));
            row.add(String.join("; ", parts));
        } else {
            row.add(v);
        }
    }

    private static boolean sameFile(Path a, Path b) {
        try {
            return Files.exists(b) ? Files.isSameFile(a, b) : a.toAbsolutePath().normalize().equals(b.toAbsolutePath()
                .normalize());
        } catch (IOException e) {
            return false; // the input cannot be read: reported when it is opened
        }
    }

    /** One CSV record: its fields and the line it starts on. */
    private record Row(String[] cells, int line) {
    }

    /** The next record, or null at the end; a record the parser cannot read stops the batch. */
    private static Row next(MappingIterator<String[]> it, String name) {
        try {
            if (!it.hasNextValue()) {
                return null;
            }
            String[] cells = it.nextValue();
            // After the record, the token location is the line the record starts on (measured: an empty line
            // skipped before it and a quoted line break inside it are both counted right).
            return new Row(cells, it.getParser().currentTokenLocation().getLineNr());
        } catch (IOException | RuntimeException e) {
            String msg = e.getMessage() == null ? e.toString() : e.getMessage().split("\n")[0];
            IOException io = e instanceof IOException ? (IOException) e : new IOException(msg, e);
            throw new UncheckedIOException(name + ": not readable as CSV near line "
                + it.getParser().currentLocation().getLineNr() + ": " + msg, io);
        }
    }

    private static Header header(Row first, String name) {
        String where = name + ", line " + first.line() + " (header): ";
        String[] cells = first.cells();
        List<String> names = new ArrayList<>(cells.length);
        Set<String> seen = new HashSet<>();
        for (int i = 0; i < cells.length; i++) {
            // A byte-order mark (spreadsheet exports write one) is not part of the first name.
            String n = (i == 0 && cells[i].startsWith("\uFEFF") ? cells[i].substring(1) : cells[i]).strip();
            if (!seen.add(n)) {
                throw new UserInputException(where + "column '" + n + "' appears twice");
            }
            names.add(n);
        }
        return new Header(names, where);
    }

    /** Where the pass-through fields are in a row, and the output columns. */
    private static final class Layout {
        final int width;
        final int[] passIndex;
        final List<String> passNames;
        final List<String> keys;

        private Layout(int width, int[] passIndex, List<String> passNames, List<String> keys) {
            this.width = width;
            this.passIndex = passIndex;
            this.passNames = List.copyOf(passNames);
            this.keys = List.copyOf(keys);
        }

        static Layout of(Header h, Plan plan, boolean json) {
            List<String> used = plan.valueColumns();
            List<String> reserved = new ArrayList<>(plan.outputKeys());
            reserved.add("error");
            if (json) {
                reserved.add("line");
            }
            List<Integer> pass = new ArrayList<>();
            List<String> passNames = new ArrayList<>();
            for (int i = 0; i < h.names().size(); i++) {
                String n = h.names().get(i);
                if (used.contains(n)) {
                    continue;
                }
                if (reserved.contains(n)) {
                    throw h.problem("column '" + n + "' would be passed through, but the output has its own '" + n
                        + "' (output columns: " + String.join(",", reserved) + "); rename it");
                }
                pass.add(i);
                passNames.add(n);
            }
            return new Layout(h.names().size(), pass.stream().mapToInt(Integer::intValue).toArray(), passNames,
                plan.outputKeys());
        }
    }
}
