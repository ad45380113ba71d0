package io.geotick.transforms.height;

import io.geotick.geodesy.InvalidCoordinateException;
import io.geotick.transforms.FileFailure;
import io.geotick.transforms.grid.GridFormatException;
import io.geotick.transforms.grid.OutsideGridException;
import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;

/**
 * A geoid-undulation grid N(φ, λ) read from the ISG text format v2.0 (International Service for the
 * Geoid, ISG format specification). Immutable and thread-safe.
 *
 * <h2>Format accepted</h2>
 * Optional comment lines, then a header between {@code begin_of_head} and {@code end_of_head} of
 * {@code key : value} lines, then the node values, row by row. Required keys: {@code lat min}, {@code lat
 * max}, {@code lon min}, {@code lon max}, {@code delta lat}, {@code delta lon}, {@code nrows}, {@code ncols},
 * {@code nodata}; also read: {@code model name}, {@code data ordering} (N-to-S, W-to-E as v2.0 prescribes,
 * or S-to-N, W-to-E), {@code coord units} (only {@code deg}), {@code data format} (only {@code grid}),
 * {@code data units} ({@code meters}), {@code ISG format}, {@code ref ellipsoid}, {@code ref frame}. The
 * grid is node-registered: nrows = (lat max − lat min)/delta lat + 1 and likewise for columns; other
 * layouts are refused with a {@link GridFormatException} naming the line.
 *
 * <h2>Heights</h2>
 * Orthometric H = h − N, ellipsoidal h = H + N (the usual approximation that neglects the deflection of
 * the vertical, below 1 mm in practice). The heights refer to the geoid model's own ellipsoid and frame
 * (header {@code ref ellipsoid}, {@code ref frame}).
 */
public final class GeoidGrid {
    private final String name;
    private final Map<String, String> header;
    private final double latMin;
    private final double lonMin;
    private final double dLat;
    private final double dLon;
    private final int rows;
    private final int cols;
    // Row-major from SOUTH to north, west to east: value(r, c) at (latMin + r dLat, lonMin + c dLon).
    private final double[] values;
    private final double latMax;
    private final double lonMax;

    private GeoidGrid(String name, Map<String, String> header, double latMin, double latMax, double lonMin,
            double lonMax, double dLat, double dLon, int rows, int cols, double[] values) {
        this.name = name;
        this.header = Collections.unmodifiableMap(new LinkedHashMap<>(header));
        this.latMin = latMin;
        this.latMax = latMax;
        this.lonMin = lonMin;
        this.lonMax = lonMax;
        this.dLat = dLat;
        this.dLon = dLon;
        this.rows = rows;
        this.cols = cols;
        this.values = values;
    }

    /**
     * Reads an ISG file (UTF-8).
     *
     * @throws GridFormatException naming the line for a malformed or truncated file
     * @throws UncheckedIOException if it cannot be read
     */
    public static GeoidGrid read(Path file) {
        try (BufferedReader r = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            return parse(r, file.toString());
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read ISG file " + file + ": " + FileFailure.reason(e), e);
        }
    }

    /** Parses ISG text; {@code name} is used in messages. */
    public static GeoidGrid parse(String text, String name) {
        try {
            return parse(new StringReader(text), name);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Parses ISG text from a reader (not closed). */
    public static GeoidGrid parse(Reader in, String name) throws IOException {
        BufferedReader r = in instanceof BufferedReader ? (BufferedReader) in : new BufferedReader(in);
        Map<String, String> h = new LinkedHashMap<>();
        Map<String, Integer> lineOf = new LinkedHashMap<>();
        String line;
        int ln = 0;
        boolean inHead = false;
        boolean headDone = false;
        while ((line = r.readLine()) != null) {
            ln++;
            String t = line.strip();
            if (!inHead) {
                if (t.startsWith("begin_of_head")) {
                    inHead = true;
                }
                continue;
            }
            if (t.startsWith("end_of_head")) {
                headDone = true;
                break;
            }
            if (t.isEmpty()) {
                continue;
            }
            int c = t.indexOf(':');
            if (c < 0) {
                throw new GridFormatException(name + ", line " + ln + ": header line '" + t
                    + "' is not of the form 'key : value' (is the 'end_of_head' line missing?)");
            }
            String key = t.substring(0, c).strip().toLowerCase(Locale.ROOT);
            h.put(key, t.substring(c + 1).strip());
            lineOf.put(key, ln);
        }
        if (!inHead) {
            throw new GridFormatException(name + ": not an ISG file: no 'begin_of_head' line");
        }
        if (!headDone) {
            throw new GridFormatException(name + ": truncated ISG file: no 'end_of_head' line after line " + ln);
        }
        Header hd = new Header(h, lineOf, name);
        String format = h.getOrDefault("data format", "grid");
        if (!format.equalsIgnoreCase("grid")) {
            throw hd.error("data format", "only 'grid' is supported, not '" + format + "'");
        }
        String units = h.getOrDefault("coord units", "deg");
        if (!units.equalsIgnoreCase("deg")) {
            throw hd.error("coord units", "only 'deg' is supported, not '" + units + "'");
        }
        String dataUnits = h.getOrDefault("data units", "meters");
        if (!dataUnits.equalsIgnoreCase("meters") && !dataUnits.equalsIgnoreCase("metres")) {
            throw hd.error("data units", "only meters are supported, not '" + dataUnits + "'");
        }
        String ordering = h.getOrDefault("data ordering", "N-to-S, W-to-E").replace(" ", "")
            .toLowerCase(Locale.ROOT);
        boolean northFirst;
        if (ordering.equals("n-to-s,w-to-e")) {
            northFirst = true;
        } else if (ordering.equals("s-to-n,w-to-e")) {
            northFirst = false;
        } else {
            throw hd.error("data ordering", "'" + h.get("data ordering")
                + "' is not 'N-to-S, W-to-E' or 'S-to-N, W-to-E'");
        }
        double latMin = hd.number("lat min");
        double latMax = hd.number("lat max");
        double lonMin = hd.number("lon min");
        double lonMax = hd.number("lon max");
        double dLat = hd.number("delta lat");
        double dLon = hd.number("delta lon");
        int rows = hd.integer("nrows");
        int cols = hd.integer("ncols");
        double nodata = hd.number("nodata");
        if (!(dLat > 0) || !(dLon > 0) || !(latMax > latMin) || !(lonMax > lonMin) || latMin < -90
                || latMax > 90 || rows < 2 || cols < 2) {
            throw new GridFormatException(name + ": header extent lat " + latMin + ".." + latMax + ", lon "
                + lonMin + ".." + lonMax + ", deltas " + dLat + ", " + dLon + ", " + rows + " × " + cols
                + " nodes is not a valid grid");
        }
        if (Math.abs((latMax - latMin) / dLat + 1 - rows) > 1e-6) {
            throw hd.error("nrows", rows + " does not match (lat max − lat min)/delta lat + 1 = "
                + ((latMax - latMin) / dLat + 1) + " (only node-registered grids are supported)");
        }
        if (Math.abs((lonMax - lonMin) / dLon + 1 - cols) > 1e-6) {
            throw hd.error("ncols", cols + " does not match (lon max − lon min)/delta lon + 1 = "
                + ((lonMax - lonMin) / dLon + 1) + " (only node-registered grids are supported)");
        }
        double[] v = new double[rows * cols];
        int n = 0;
        long total = (long) rows * cols;
        while ((line = r.readLine()) != null) {
            ln++;
            String t = line.strip();
            if (t.isEmpty()) {
                continue;
            }
            for (String tok : t.split("\\s+")) {
                if (n >= total) {
                    throw new GridFormatException(name + ", line " + ln + ": more than nrows × ncols = " + total
                        + " values");
                }
                double x;
                try {
                    x = Double.parseDouble(tok);
                } catch (NumberFormatException e) {
                    throw new GridFormatException(name + ", line " + ln + ": '" + tok + "' is not a number");
                }
                if (!Double.isFinite(x)) {
                    throw new GridFormatException(name + ", line " + ln + ": value '" + tok + "' is not finite");
                }
                int row = (int) (n / cols);
                int col = (int) (n % cols);
                int southRow = northFirst ? rows - 1 - row : row;
                v[southRow * cols + col] = x == nodata ? Double.NaN : x;
                n++;
            }
        }
        if (n != total) {
            throw new GridFormatException(name + ": truncated ISG file: " + n + " values after the header, expected"
                + " nrows × ncols = " + rows + " × " + cols + " = " + total);
        }
        return new GeoidGrid(name, h, latMin, latMax, lonMin, lonMax, dLat, dLon, rows, cols, v);
    }

    private static final class Header {
        final Map<String, String> h;
        final Map<String, Integer> lines;
        final String name;

        Header(Map<String, String> h, Map<String, Integer> lines, String name) {
            this.h = h;
            this.lines = lines;
            this.name = name;
        }

        GridFormatException error(String key, String what) {
            Integer l = lines.get(key);
            return new GridFormatException(name + (l == null ? "" : ", line " + l) + ": header '" + key + "': "
                + what);
        }

        double number(String key) {
            String s = h.get(key);
            if (s == null) {
                throw new GridFormatException(name + ": header key '" + key + "' is missing");
            }
            try {
                double d = Double.parseDouble(s);
                if (!Double.isFinite(d)) {
                    throw error(key, "'" + s + "' is not finite");
                }
                return d;
            } catch (NumberFormatException e) {
                throw error(key, "'" + s + "' is not a number");
            }
        }

        int integer(String key) {
            double d = number(key);
            if (d != Math.rint(d) || d > 1e8) {
                throw error(key, "'" + h.get(key) + "' is not a whole number of nodes");
            }
            return (int) d;
        }
    }

    /** The file name given when reading. */
    public String name() {
        return name;
    }

    /** Node spacing in latitude, degrees. */
    public double latitudeSpacing() {
        return dLat;
    }

    /** Node spacing in longitude, degrees. */
    public double longitudeSpacing() {
        return dLon;
    }

    /** Southern edge (first node row), degrees. */
    public double southLatitude() {
        return latMin;
    }

    /** Northern edge, degrees. */
    public double northLatitude() {
        return latMax;
    }

    /** Western edge, degrees. */
    public double westLongitude() {
        return lonMin;
    }

    /** Eastern edge, degrees. */
    public double eastLongitude() {
        return lonMax;
    }

    /** The model name from the header, or the file name. */
    public String modelName() {
        return header.getOrDefault("model name", name);
    }

    /** Every header entry (keys lower-case), in file order. */
    public Map<String, String> header() {
        return header;
    }

    /**
     * The undulation N in metres at (φ, λ) in degrees.
     *
     * @throws OutsideGridException outside the grid, on nodes without data, or (bicubic) in the outermost
     *     ring of cells; the message names the point and the extent
     * @throws InvalidCoordinateException for NaN or out-of-range coordinates
     */
    public double undulation(double latitude, double longitude, Interpolation interpolation) {
        if (!(latitude >= -90 && latitude <= 90) || !(longitude >= -360 && longitude <= 360)) {
            throw new InvalidCoordinateException("(" + latitude + "°, " + longitude
                + "°) is not a valid latitude and longitude");
        }
        double lon = longitude;
        if (lon < lonMin && lon + 360 <= lonMax) {
            lon += 360;
        } else if (lon > lonMax && lon - 360 >= lonMin) {
            lon -= 360;
        }
        if (latitude < latMin || latitude > latMax || lon < lonMin || lon > lonMax) {
            throw new OutsideGridException("point (" + latitude + "°, " + longitude + "°) is outside the geoid grid "
                + modelName() + " (latitude " + latMin + "° to " + latMax + "°, longitude " + lonMin + "° to "
                + lonMax + "°)");
        }
        double y = (latitude - latMin) / dLat;
        double x = (lon - lonMin) / dLon;
        int j = Math.min((int) Math.floor(y), rows - 2);
        int i = Math.min((int) Math.floor(x), cols - 2);
        double fy = y - j;
        double fx = x - i;
        double n;
        if (interpolation == Interpolation.BILINEAR) {
            double v00 = node(j, i, latitude, longitude);
            double v01 = node(j, i + 1, latitude, longitude);
            double v10 = node(j + 1, i, latitude, longitude);
            double v11 = node(j + 1, i + 1, latitude, longitude);
            double south = v00 + (v01 - v00) * fx;
            double north = v10 + (v11 - v10) * fx;
            n = south + (north - south) * fy;
        } else {
            if (i < 1 || j < 1 || i > cols - 3 || j > rows - 3) {
                throw new OutsideGridException("point (" + latitude + "°, " + longitude + "°) lies in the outermost"
                    + " ring of cells of the geoid grid " + modelName() + ", where bicubic interpolation lacks"
                    + " the nodes it needs; use bilinear there");
            }
            n = 0;
            for (int a = 0; a < 4; a++) {
                double row = 0;
                for (int b = 0; b < 4; b++) {
                    row += keys(fx, b) * node(j - 1 + a, i - 1 + b, latitude, longitude);
                }
                n += keys(fy, a) * row;
            }
        }
        return n;
    }

    /** Keys' cubic convolution weight (a = −1/2) of node k ∈ {0..3}, at offset k − 1 from the cell origin. */
    private static double keys(double t, int k) {
        double t2 = t * t;
        double t3 = t2 * t;
        switch (k) {
            case 0:
                return (-t3 + 2 * t2 - t) / 2;
            case 1:
                return (3 * t3 - 5 * t2 + 2) / 2;
            case 2:
                return (-3 * t3 + 4 * t2 + t) / 2;
            default:
                return (t3 - t2) / 2;
        }
    }

    private double node(int row, int col, double lat, double lon) {
        double v = values[row * cols + col];
        if (Double.isNaN(v)) {
            throw new OutsideGridException("point (" + lat + "°, " + lon + "°) needs the geoid grid node at ("
                + (latMin + row * dLat) + "°, " + (lonMin + col * dLon) + "°) of " + modelName()
                + ", which has no data");
        }
        return v;
    }

    /** Orthometric height H = h − N. */
    public double orthometricHeight(double latitude, double longitude, double ellipsoidalHeight,
            Interpolation interpolation) {
        checkHeight(ellipsoidalHeight);
        return ellipsoidalHeight - undulation(latitude, longitude, interpolation);
    }

    /** Ellipsoidal height h = H + N. */
    public double ellipsoidalHeight(double latitude, double longitude, double orthometricHeight,
            Interpolation interpolation) {
        checkHeight(orthometricHeight);
        return orthometricHeight + undulation(latitude, longitude, interpolation);
    }

    private static void checkHeight(double h) {
        if (!Double.isFinite(h)) {
            throw new InvalidCoordinateException("height " + h + " m is not a finite number");
        }
    }

    @Override
    public String toString() {
        return "geoid grid " + modelName() + " (" + rows + " × " + cols + " nodes, latitude " + latMin + "° to "
            + latMax + "°, longitude " + lonMin + "° to " + lonMax + "°)";
    }
}
