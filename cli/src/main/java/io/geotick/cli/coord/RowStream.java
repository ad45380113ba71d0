package io.geotick.cli.coord;

import com.fasterxml.jackson.databind.node.ObjectNode;
import io.geotick.cli.CsvBatch;
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
 * (constant memory: one row in hand). Immutable and thread-safe; each batch ({@link CsvBatch#execute}) has its own reader,
 * writer and warning state.
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

    /** What the header of an empty input should name. */
    String expectedHeader() {
        return String.join(",", keys(conversion.source(), true));
    }

    /**
     * The plan for each header ({@link CsvBatch.Planner}): the cautions of the conversion, and those each row
     * adds, go to {@code warnings} once each; the first ones as soon as the batch starts.
     */
    CsvBatch.Planner planner(Consumer<String> warnings) {
        Set<String> warned = new HashSet<>();
        Consumer<String> once = w -> {
            if (warned.add(w)) {
                warnings.accept(w);
            }
        };
        conversion.warnings().forEach(once);
        return header -> Layout.of(header, conversion, once);
    }

    /** The source's value keys in input order; a grid source's h is optional. */
    private static List<String> keys(CoordinateSystemSpec s, boolean withHeight) {
        List<String> k = s.axes().stream().map(Axis::key).collect(Collectors.toList());
        return withHeight ? k : k.subList(0, 2);
    }

    /** Where the values are in a row, and the target's keys. */
    private static final class Layout implements CsvBatch.Plan {
        final int[] valueIndex;
        final List<String> used;
        final List<String> targetKeys;
        final Conversion conversion;
        final Consumer<String> warnings;

        private Layout(int[] valueIndex, List<String> used, List<String> targetKeys, Conversion conversion,
                Consumer<String> warnings) {
            this.valueIndex = valueIndex;
            this.used = List.copyOf(used);
            this.targetKeys = List.copyOf(targetKeys);
            this.conversion = conversion;
            this.warnings = warnings;
        }

        @Override
        public List<String> valueColumns() {
            return used;
        }

        @Override
        public List<String> outputKeys() {
            return targetKeys;
        }

        @Override
        public ObjectNode convert(String[] cells) {
            List<String> texts = new ArrayList<>(valueIndex.length);
            for (int i : valueIndex) {
                texts.add(cells[i].strip());
            }
            ConvertedPoint p = conversion.convert(texts);
            p.warnings().forEach(warnings);
            return JsonOutput.toJson(p);
        }

        static Layout of(CsvBatch.Header header, Conversion c, Consumer<String> warnings) {
            List<String> names = header.names();
            CoordinateSystemSpec source = c.source();
            List<String> required = keys(source, true);
            boolean optionalHeight = source.kind().isProjected();
            boolean height = !optionalHeight || names.contains(required.get(2));
            List<String> used = height ? required : required.subList(0, 2);
            int[] valueIndex = new int[used.size()];
            for (int i = 0; i < valueIndex.length; i++) {
                valueIndex[i] = header.indexOf(used.get(i));
                if (valueIndex[i] < 0) {
                    throw header.problem("no column '" + used.get(i) + "'; a '" + source
                        + "' source needs " + String.join(",", required.subList(0, 2))
                        + (optionalHeight ? " and optionally " : ",") + required.get(2) + " (got "
                        + String.join(",", names) + ")");
                }
            }
            CoordinateSystemSpec target = c.target();
            if (!height && !target.kind().axes().get(2).label().endsWith("height")) {
                throw header.problem("no column '" + required.get(2) + "': '" + target + "' needs the height (m)");
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
            return new Layout(valueIndex, used, targetKeys, c, warnings);
        }
    }
}
