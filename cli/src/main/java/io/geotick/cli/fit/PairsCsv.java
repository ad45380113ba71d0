package io.geotick.cli.fit;

import com.fasterxml.jackson.databind.MappingIterator;
import com.fasterxml.jackson.dataformat.csv.CsvMapper;
import com.fasterxml.jackson.dataformat.csv.CsvParser;
import com.fasterxml.jackson.dataformat.csv.CsvSchema;
import io.geotick.cli.UserInputException;
import io.geotick.transforms.FileFailure;
import io.geotick.transforms.fit.ControlPoint;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;

/**
 * Reads the control-point pairs of {@code geotick fit} with jackson-dataformat-csv. Layout: a header row,
 * then one row per point: {@code id}, the source coordinates (2 for the 2D models, 3 for the Helmert), then
 * the site-grid coordinates (as many), e.g. {@code id,easting,northing,site_x,site_y}. The header names
 * the columns for messages; only the first column must be {@code id}. Blank lines are skipped; every other
 * row is used or reported: all bad rows are listed (line, field, value) and nothing is fitted.
 */
final class PairsCsv {
    private static final int MAX_LISTED = 20;

    private PairsCsv() {
    }

    static List<ControlPoint> read(Path file, int dimension) {
        CsvMapper mapper = new CsvMapper();
        mapper.enable(CsvParser.Feature.WRAP_AS_ARRAY).enable(CsvParser.Feature.SKIP_EMPTY_LINES)
            .enable(CsvParser.Feature.TRIM_SPACES);
        List<ControlPoint> points = new ArrayList<>();
        List<String> errors = new ArrayList<>();
        int columns = 1 + 2 * dimension;
        String[] header = null;
        Set<String> ids = new HashSet<>();
        try (MappingIterator<String[]> it = mapper.readerFor(String[].class).with(CsvSchema.emptySchema())
                .readValues(file.toFile())) {
            while (true) {
                String[] row;
                int line;
                try {
                    if (!it.hasNextValue()) {
                        break;
                    }
                    row = it.nextValue();
                    line = it.getParser().currentTokenLocation().getLineNr();
                } catch (IOException | RuntimeException e) {
                    throw new UserInputException(file + ": not readable as CSV near line "
                        + it.getParser().currentLocation().getLineNr() + ": " + e.getMessage().split("\n")[0], e);
                }
                if (header == null) {
                    header = row;
                    if (row.length != columns || !row[0].strip().toLowerCase(Locale.ROOT).equals("id")) {
                        throw new UserInputException(file + ", line " + line + ": the header must have " + columns
                            + " columns, id then " + dimension + " source and " + dimension + " site-grid coordinates"
                            + " (e.g. " + (dimension == 2 ? "id,easting,northing,site_x,site_y"
                            : "id,x,y,z,site_x,site_y,site_z") + "); got " + row.length + ": " + String.join(",", row));
                    }
                    continue;
                }
                String problem = check(row, header, columns, ids);
                if (problem != null) {
                    errors.add("line " + line + ": " + problem);
                    continue;
                }
                double[] v = new double[columns - 1];
                for (int i = 1; i < columns; i++) {
                    v[i - 1] = Double.parseDouble(row[i].strip());
                }
                points.add(dimension == 2 ? ControlPoint.of(row[0].strip(), v[0], v[1], v[2], v[3])
                    : ControlPoint.of(row[0].strip(), v[0], v[1], v[2], v[3], v[4], v[5]));
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read " + file + ": " + FileFailure.reason(e), e);
        }
        if (header == null) {
            throw new UserInputException(file + " is empty: it needs a header row and the control points");
        }
        if (!errors.isEmpty()) {
            StringBuilder s = new StringBuilder(file + ": " + errors.size() + " bad row" + (errors.size() == 1 ? "" : "s")
                + ", nothing fitted:");
            errors.stream().limit(MAX_LISTED).forEach(e -> s.append(System.lineSeparator()).append("  ").append(e));
            if (errors.size() > MAX_LISTED) {
                s.append(System.lineSeparator()).append("  … and ").append(errors.size() - MAX_LISTED).append(" more");
            }
            throw new UserInputException(s.toString());
        }
        return points;
    }

    /** What is wrong with a data row, naming the field, or null when it is fine. */
    private static String check(String[] row, String[] header, int columns, Set<String> ids) {
        if (row.length != columns) {
            return row.length + " field" + (row.length == 1 ? "" : "s") + ", expected " + columns + " ("
                + String.join(",", header) + ")";
        }
        String id = row[0].strip();
        if (id.isEmpty()) {
            return "field '" + header[0].strip() + "' is empty";
        }
        if (!ids.add(id)) {
            return "id '" + id + "' appears twice";
        }
        for (int i = 1; i < columns; i++) {
            String t = row[i].strip();
            String name = header[i].strip();
            if (t.isEmpty()) {
                return "field '" + name + "' is empty";
            }
            double v;
            try {
                v = Double.parseDouble(t);
            } catch (NumberFormatException e) {
                return "field '" + name + "': '" + t + "' is not a number";
            }
            if (!Double.isFinite(v) || t.toLowerCase(Locale.ROOT).contains("x")) {
                return "field '" + name + "': '" + t + "' is not a finite decimal number";
            }
        }
        return null;
    }
}
