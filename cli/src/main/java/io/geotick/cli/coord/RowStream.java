package io.geotick.cli.coord;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.MappingIterator;
import com.fasterxml.jackson.databind.SequenceWriter;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.dataformat.csv.CsvMapper;
import com.fasterxml.jackson.dataformat.csv.CsvParser;
import com.fasterxml.jackson.dataformat.csv.CsvSchema;
import io.geotick.cli.Json;
import io.geotick.cli.UserInputException;
import java.io.IOException;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;
import java.util.function.Consumer;
import java.util.stream.Collectors;

/**
 * The batch mode of {@code geotick coord} ({@code --input}): CSV rows stream through one {@link Conversion},
 * built once, and come out as CSV rows or NDJSON objects, one per input row, written as they are read
 * (constant memory: one row in hand). Immutable and thread-safe; each {@link #run} has its own reader and
 * writer state.
 *
 * <p><b>Input.</b> CSV with a header row (read by Jackson's CSV parser; empty lines are not rows). The
 * columns named like the source system's JSON keys ({@code lat,lon,h}, {@code x,y,z},
 * {@code easting,northing,h} …, matched exactly after trimming the header name and a byte-order mark) carry the values, in any
 * column order; spaces around a value are ignored. A grid source may leave out the {@code h} column: the
 * height is then unknown, as with E N alone in the single-point mode. Every other column is passed through
 * unchanged, in its order. Duplicate names and pass-through names that would collide with an output column
 * are refused (usage error), as is a header without a required column (naming it and listing the expected
 * names).
 *
 * <p><b>Output.</b> CSV: the pass-through columns, then the target's keys exactly as the single-point
 * {@code --json} names them ({@link JsonOutput}: values, then {@code zone}, {@code scale},
 * {@code convergence}, {@code unit} for grid targets), then {@code error}. The values are taken from the
 * single-point JSON object of the row and written by Jackson in the same way, so the digits are those of
 * {@code --json} (Java's {@link Double#toString}: they read back to the identical double). NDJSON
 * ({@code --json}): one object per line with the pass-through fields (strings) and the target's fields; a
 * failed row is {@code {"line": N, "error": "…", …pass-through fields}}.
 *
 * <p><b>Errors.</b> A row that cannot be converted never stops the batch: it becomes an error row whose
 * message is {@code line N: } followed by the single-point mode's message for the same values (a value out
 * of range, not a number, empty, a point outside the NTv2 grid), or says that the row's field count differs
 * from the header's. Only bad input ({@link IllegalArgumentException}) becomes an error row; an invalid data
 * file or an internal failure stops the batch as in the single-point mode. CSV that cannot be parsed any
 * further (an unclosed quote) stops it with an {@link UncheckedIOException} naming the line, after the rows
 * already written. The cautions of the conversion (and any a row adds) go to the warning sink once each.
 */
final class RowStream {
    /** Configured once; thread-safe. Arrays are the rows both ways, so the header is ours to read and write. */
    private static final CsvMapper CSV = CsvMapper.builder()
        .enable(CsvParser.Feature.WRAP_AS_ARRAY)
        .enable(CsvParser.Feature.SKIP_EMPTY_LINES)
        .disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET)
        .disable(SerializationFeature.FLUSH_AFTER_WRITE_VALUE)
        .build();

    private final Conversion conversion;
    private final boolean json;

    private RowStream(Conversion conversion, boolean json) {
        this.conversion = conversion;
        this.json = json;
    }

    /**
     * A stream of rows through {@code conversion}.
     *
     * @param json NDJSON output instead of CSV
     */
    static RowStream of(Conversion conversion, boolean json) {
        return new RowStream(Objects.requireNonNull(conversion, "conversion"), json);
    }

    /** Opens the output; called once the header has been read and checked, so a bad input creates no file. */
    @FunctionalInterface
    interface Sink {
        Writer open() throws IOException;
    }

    /**
     * How a batch went.
     *
     * @param rows the data rows read (each gave one output row)
     * @param failed the rows written as error rows
     */
    record Summary(long rows, long failed) {
    }

    /**
     * Reads every row of {@code in}, converts it and writes its output row to the sink. Neither the reader nor
     * the writer is closed; the writer is flushed.
     *
     * @param in the CSV text
     * @param name the input's name for messages (the file, or "standard input")
     * @param sink opens the output writer
     * @param outName the output's name for messages
     * @param warnings receives each distinct caution once
     * @throws UserInputException for an empty input or a bad header
     * @throws UncheckedIOException if the input cannot be read or parsed, or the output cannot be written
     */
    Summary run(Reader in, String name, Sink sink, String outName, Consumer<String> warnings) {
        Set<String> warned = new HashSet<>();
        conversion.warnings().forEach(w -> warn(w, warned, warnings));
        try (MappingIterator<String[]> it = CSV.readerFor(String[].class).with(CsvSchema.emptySchema()).readValues(in)) {
            Row first = next(it, name);
            if (first == null) {
                throw new UserInputException(name + " is empty; expected a header row naming the columns "
                    + String.join(",", keys(conversion.source(), true)));
            }
            Layout layout = Layout.of(first.cells(), first.line(), name, conversion, json);
            Writer out;
            try {
                out = sink.open();
            } catch (IOException e) {
                throw new UncheckedIOException("cannot write " + outName + ": " + reason(e), e);
            }
            long rows = 0;
            long failed = 0;
            try (SequenceWriter csv = json ? null : CSV.writer(CsvSchema.emptySchema()).writeValues(out)) {
                if (csv != null) {
                    ArrayNode header = Json.MAPPER.createArrayNode();
                    layout.passNames.forEach(header::add);
                    layout.targetKeys.forEach(header::add);
                    header.add("error");
                    csv.write(header);
                }
                for (Row r = next(it, name); r != null; r = next(it, name)) {
                    rows++;
                    if (!convertRow(r, layout, csv, out, warned, warnings)) {
                        failed++;
                    }
                }
                if (csv != null) {
                    csv.flush();
                }
                out.flush();
            } catch (IOException e) {
                throw new UncheckedIOException("cannot write " + outName + ": " + reason(e), e);
            }
            return new Summary(rows, failed);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read " + name + ": " + reason(e), e);
        }
    }

    /** Converts one row and writes its output row; false if it became an error row. */
    private boolean convertRow(Row r, Layout layout, SequenceWriter csv, Writer out, Set<String> warned,
            Consumer<String> warnings) throws IOException {
        String[] cells = r.cells();
        ObjectNode result = null;
        String error = null;
        if (cells.length != layout.width) {
            error = "line " + r.line() + ": " + cells.length + " field" + (cells.length == 1 ? "" : "s")
                + " where the header has " + layout.width;
        } else {
            List<String> texts = new ArrayList<>(layout.valueIndex.length);
            for (int i : layout.valueIndex) {
                texts.add(cells[i].strip());
            }
            try {
                ConvertedPoint p = conversion.convert(texts);
                p.warnings().forEach(w -> warn(w, warned, warnings));
                result = JsonOutput.toJson(p);
            } catch (IllegalArgumentException e) {
                error = "line " + r.line() + ": " + e.getMessage();
            }
        }
        if (csv != null) {
            ArrayNode row = Json.MAPPER.createArrayNode();
            for (int i : layout.passIndex) {
                row.add(i < cells.length ? cells[i] : "");
            }
            for (String k : layout.targetKeys) {
                JsonNode v = result == null ? null : result.get(k);
                if (v == null) {
                    row.add("");
                } else {
                    row.add(v);
                }
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
                for (String k : layout.targetKeys) {
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

    /** An I/O failure in words: the file-system exceptions carry only the path as their message. */
    static String reason(IOException e) {
        if (e instanceof java.nio.file.NoSuchFileException) {
            return "no such file or directory";
        }
        if (e instanceof java.nio.file.AccessDeniedException) {
            return "permission denied";
        }
        if (e instanceof java.nio.file.FileSystemException f && f.getReason() != null) {
            return f.getReason();
        }
        return e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
    }

    private static void warn(String w, Set<String> warned, Consumer<String> warnings) {
        if (warned.add(w)) {
            warnings.accept(w);
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

    /** The source's value keys in input order; a grid source's h is optional. */
    private static List<String> keys(CoordinateSystemSpec s, boolean withHeight) {
        List<String> k = s.axes().stream().map(Axis::key).collect(Collectors.toList());
        return withHeight ? k : k.subList(0, 2);
    }

    /** Where the values and pass-through fields are in a row, and the output columns. */
    private static final class Layout {
        final int width;
        final int[] valueIndex;
        final int[] passIndex;
        final List<String> passNames;
        final List<String> targetKeys;

        private Layout(int width, int[] valueIndex, int[] passIndex, List<String> passNames, List<String> targetKeys) {
            this.width = width;
            this.valueIndex = valueIndex;
            this.passIndex = passIndex;
            this.passNames = List.copyOf(passNames);
            this.targetKeys = List.copyOf(targetKeys);
        }

        static Layout of(String[] header, int line, String name, Conversion c, boolean json) {
            String where = name + ", line " + line + " (header): ";
            List<String> names = new ArrayList<>(header.length);
            Set<String> seen = new HashSet<>();
            for (int i = 0; i < header.length; i++) {
                // A byte-order mark (spreadsheet exports write one) is not part of the first name.
                String n = (i == 0 && header[i].startsWith("\uFEFF") ? header[i].substring(1) : header[i]).strip();
                if (!seen.add(n)) {
                    throw new UserInputException(where + "column '" + n + "' appears twice");
                }
                names.add(n);
            }
            CoordinateSystemSpec source = c.source();
            List<String> required = keys(source, true);
            boolean optionalHeight = source.kind().isProjected();
            boolean height = !optionalHeight || names.contains(required.get(2));
            List<String> used = height ? required : required.subList(0, 2);
            int[] valueIndex = new int[used.size()];
            for (int i = 0; i < valueIndex.length; i++) {
                valueIndex[i] = names.indexOf(used.get(i));
                if (valueIndex[i] < 0) {
                    throw new UserInputException(where + "no column '" + used.get(i) + "'; a '" + source
                        + "' source needs " + String.join(",", required.subList(0, 2))
                        + (optionalHeight ? " and optionally " : ",") + required.get(2) + " (got "
                        + String.join(",", names) + ")");
                }
            }
            CoordinateSystemSpec target = c.target();
            if (!height && !target.kind().axes().get(2).label().endsWith("height")) {
                throw new UserInputException(where + "no column '" + required.get(2) + "': '" + target
                    + "' needs the height (m)");
            }
            List<String> targetKeys = new ArrayList<>();
            List<Axis> axes = target.axes();
            for (int i = 0; i < axes.size(); i++) {
                if (i != 2 || height) {
                    targetKeys.add(axes.get(i).key());
                }
            }
            if (target.kind().isProjected()) {
                if (target.kind() == SystemKind.UTM || target.kind() == SystemKind.UPS) {
                    targetKeys.add("zone");
                }
                targetKeys.add(SystemKind.GridAxes.SCALE.key());
                targetKeys.add(SystemKind.GridAxes.CONVERGENCE.key());
                targetKeys.add("unit");
            }
            List<String> reserved = new ArrayList<>(targetKeys);
            reserved.add("error");
            if (json) {
                reserved.add("line");
            }
            List<Integer> pass = new ArrayList<>();
            List<String> passNames = new ArrayList<>();
            for (int i = 0; i < names.size(); i++) {
                String n = names.get(i);
                if (used.contains(n)) {
                    continue;
                }
                if (reserved.contains(n)) {
                    throw new UserInputException(where + "column '" + n + "' would be passed through, but the"
                        + " output has its own '" + n + "' (output columns: " + String.join(",", reserved)
                        + "); rename it");
                }
                pass.add(i);
                passNames.add(n);
            }
            return new Layout(names.size(), valueIndex, pass.stream().mapToInt(Integer::intValue).toArray(),
                passNames, targetKeys);
        }
    }
}
