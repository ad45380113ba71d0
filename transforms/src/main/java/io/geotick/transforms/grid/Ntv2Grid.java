package io.geotick.transforms.grid;

import io.geotick.geodesy.InvalidCoordinateException;
import io.geotick.geodesy.position.GeodeticPosition;
import io.geotick.transforms.FileFailure;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * An NTv2 horizontal grid-shift file, read whole into memory. Immutable and thread-safe.
 *
 * <h2>Layout (NTv2 Developer's Guide, Natural Resources Canada)</h2>
 * Records of 16 bytes: an 8-character keyword and an 8-byte value (integers: 4 bytes and 4 bytes of
 * padding; text: 8 characters; reals: IEEE double). An overview header of 11 records (NUM_OREC, NUM_SREC,
 * NUM_FILE, GS_TYPE, VERSION, SYSTEM_F, SYSTEM_T, MAJOR_F, MINOR_F, MAJOR_T, MINOR_T), then per subgrid a
 * header of 11 records (SUB_NAME, PARENT, CREATED, UPDATED, S_LAT, N_LAT, E_LONG, W_LONG, LAT_INC,
 * LONG_INC, GS_COUNT) followed by GS_COUNT nodes of four IEEE floats (latitude shift, longitude shift,
 * latitude accuracy, longitude accuracy), then an END record. Longitudes are positive WEST; nodes run
 * from the south-east corner westward along each row, rows from south to north. Both byte orders are
 * accepted, detected from NUM_OREC = 11. Units are those of GS_TYPE (SECONDS, MINUTES or DEGREES).
 *
 * <h2>Interpolation</h2>
 * The densest subgrid containing the point is used (a child inside its parent), and the latitude and
 * longitude shifts are interpolated bilinearly between the four surrounding nodes, as the Developer's
 * Guide prescribes. φ' = φ + Δφ, λ' = λ − Δλ_west. Rounding: the float shifts are exact binary values;
 * interpolation adds ~1e-16 relative error, i.e. below 1e-12″. The transformation's real accuracy is the
 * file's (often a few centimetres), which the accuracy columns state per node.
 *
 * <h2>Reverse</h2>
 * By fixed-point iteration s ← t − shift(s), starting at s = t − shift(t); it converges because the shift
 * changes slowly, and stops when the step is below 1e-12° (required: below 1e-9°, else an error).
 * Points outside every subgrid raise {@link OutsideGridException}: never a silent pass-through.
 */
public final class Ntv2Grid {
    private static final int RECORD = 16;

    private final String name;
    private final String systemFrom;
    private final String systemTo;
    private final List<Subgrid> subgrids;
    private final List<Subgrid> roots;

    private Ntv2Grid(String name, String systemFrom, String systemTo, List<Subgrid> subgrids) {
        this.name = name;
        this.systemFrom = systemFrom;
        this.systemTo = systemTo;
        this.subgrids = List.copyOf(subgrids);
        List<Subgrid> r = new ArrayList<>();
        for (Subgrid s : subgrids) {
            if (s.parent == null) {
                r.add(s);
            }
        }
        this.roots = List.copyOf(r);
    }

    /**
     * Reads an NTv2 file.
     *
     * @throws GridFormatException if it is not a valid NTv2 file, naming the problem
     * @throws UncheckedIOException if it cannot be read
     */
    public static Ntv2Grid read(Path file) {
        try {
            return parse(Files.readAllBytes(file), file.toString());
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read NTv2 file " + file + ": " + FileFailure.reason(e), e);
        }
    }

    /** Parses NTv2 bytes; {@code name} is used in messages. */
    public static Ntv2Grid parse(byte[] data, String name) {
        Objects.requireNonNull(data, "data");
        Objects.requireNonNull(name, "name");
        if (data.length < 11 * RECORD) {
            throw new GridFormatException(name + ": truncated NTv2 file: " + data.length
                + " bytes, shorter than the 176-byte overview header");
        }
        ByteBuffer b = ByteBuffer.wrap(data).order(ByteOrder.LITTLE_ENDIAN);
        if (b.getInt(8) != 11) {
            b.order(ByteOrder.BIG_ENDIAN);
            if (b.getInt(8) != 11) {
                throw new GridFormatException(name + ": not an NTv2 file: the first record is '"
                    + text(b, 0) + "' with value " + b.getInt(8) + " in either byte order, expected NUM_OREC 11");
            }
        }
        Reader r = new Reader(b, name);
        r.expectKeyword(0, "NUM_OREC");
        int numOrec = r.intAt(0);
        int numSrec = r.intAt(1, "NUM_SREC");
        int numFile = r.intAt(2, "NUM_FILE");
        String gsType = r.textAt(3, "GS_TYPE").trim();
        String from = r.textAt(5, "SYSTEM_F").trim();
        String to = r.textAt(6, "SYSTEM_T").trim();
        if (numSrec != 11) {
            throw new GridFormatException(name + ": NUM_SREC = " + numSrec + ", expected 11");
        }
        if (numFile < 1 || numFile > 100_000) {
            throw new GridFormatException(name + ": NUM_FILE = " + numFile + " subgrids is not plausible");
        }
        double unit;
        switch (gsType) {
            case "SECONDS":
                unit = 1.0 / 3600;
                break;
            case "MINUTES":
                unit = 1.0 / 60;
                break;
            case "DEGREES":
                unit = 1.0;
                break;
            default:
                throw new GridFormatException(name + ": GS_TYPE '" + gsType
                    + "' is not SECONDS, MINUTES or DEGREES");
        }
        int pos = numOrec * RECORD;
        Map<String, Subgrid> byName = new LinkedHashMap<>();
        List<String> parents = new ArrayList<>();
        for (int k = 0; k < numFile; k++) {
            r.base = pos;
            if (data.length < pos + 11 * RECORD) {
                throw new GridFormatException(name + ": truncated NTv2 file: subgrid " + (k + 1) + " of "
                    + numFile + " header at byte " + pos + " is cut off");
            }
            String sub = r.textAt(0, "SUB_NAME").trim();
            String parent = r.textAt(1, "PARENT").trim();
            double s = r.doubleAt(4, "S_LAT");
            double n = r.doubleAt(5, "N_LAT");
            double e = r.doubleAt(6, "E_LONG");
            double w = r.doubleAt(7, "W_LONG");
            double dLat = r.doubleAt(8, "LAT_INC");
            double dLon = r.doubleAt(9, "LONG_INC");
            int count = r.intAt(10, "GS_COUNT");
            String where = name + ": subgrid '" + sub + "'";
            if (!(dLat > 0) || !(dLon > 0) || !(n > s) || !(w > e) || !Double.isFinite(n + s + e + w)) {
                throw new GridFormatException(where + ": extent S " + s + ", N " + n + ", E " + e + ", W " + w
                    + " with increments " + dLat + ", " + dLon + " is not a valid grid");
            }
            long rows = Math.round((n - s) / dLat) + 1;
            long cols = Math.round((w - e) / dLon) + 1;
            if (Math.abs((rows - 1) * dLat - (n - s)) > 1e-6 * dLat
                    || Math.abs((cols - 1) * dLon - (w - e)) > 1e-6 * dLon) {
                throw new GridFormatException(where + ": extent is not a whole number of increments");
            }
            if (rows * cols != count) {
                throw new GridFormatException(where + ": GS_COUNT = " + count + " but the extent has " + rows
                    + " × " + cols + " = " + rows * cols + " nodes");
            }
            pos += 11 * RECORD;
            long end = pos + (long) count * RECORD;
            if (end > data.length) {
                throw new GridFormatException(name + ": truncated NTv2 file: subgrid '" + sub + "' needs "
                    + count + " nodes up to byte " + end + " but the file has " + data.length + " bytes");
            }
            float[] shifts = new float[2 * count];
            float[] acc = new float[2 * count];
            for (int i = 0; i < count; i++) {
                int p = pos + i * RECORD;
                shifts[2 * i] = b.getFloat(p);
                shifts[2 * i + 1] = b.getFloat(p + 4);
                acc[2 * i] = b.getFloat(p + 8);
                acc[2 * i + 1] = b.getFloat(p + 12);
                if (!Float.isFinite(shifts[2 * i]) || !Float.isFinite(shifts[2 * i + 1])) {
                    throw new GridFormatException(where + ": node " + i + " has a non-finite shift");
                }
            }
            pos = (int) end;
            if (byName.containsKey(sub)) {
                throw new GridFormatException(where + ": subgrid name used twice");
            }
            byName.put(sub, new Subgrid(sub, s * unit, n * unit, e * unit, w * unit, dLat * unit, dLon * unit,
                (int) rows, (int) cols, shifts, acc, unit));
            parents.add(parent);
        }
        if (data.length < pos + 8 || !new String(data, pos, 8, StandardCharsets.US_ASCII).trim().equals("END")) {
            throw new GridFormatException(name + ": truncated or corrupt NTv2 file: no END record after "
                + numFile + " subgrids at byte " + pos);
        }
        List<Subgrid> all = new ArrayList<>(byName.values());
        for (int i = 0; i < all.size(); i++) {
            String p = parents.get(i);
            if (!p.equalsIgnoreCase("NONE")) {
                Subgrid parent = byName.get(p);
                if (parent == null) {
                    throw new GridFormatException(name + ": subgrid '" + all.get(i).name + "' names parent '" + p
                        + "', which is not in the file");
                }
                all.get(i).parent = parent;
                parent.children.add(all.get(i));
            }
        }
        return new Ntv2Grid(name, from, to, all);
    }

    private static String text(ByteBuffer b, int at) {
        byte[] t = new byte[8];
        for (int i = 0; i < 8; i++) {
            t[i] = b.get(at + i);
        }
        return new String(t, StandardCharsets.US_ASCII);
    }

    /** Reads records relative to a base offset, checking keywords. */
    private static final class Reader {
        final ByteBuffer b;
        final String name;
        int base;

        Reader(ByteBuffer b, String name) {
            this.b = b;
            this.name = name;
        }

        void expectKeyword(int rec, String kw) {
            String k = text(b, base + rec * RECORD).trim();
            if (!k.equals(kw)) {
                throw new GridFormatException(name + ": corrupt NTv2 file: record " + rec + " at byte "
                    + (base + rec * RECORD) + " is '" + k + "', expected " + kw);
            }
        }

        int intAt(int rec) {
            return b.getInt(base + rec * RECORD + 8);
        }

        int intAt(int rec, String kw) {
            expectKeyword(rec, kw);
            return intAt(rec);
        }

        String textAt(int rec, String kw) {
            expectKeyword(rec, kw);
            return text(b, base + rec * RECORD + 8);
        }

        double doubleAt(int rec, String kw) {
            expectKeyword(rec, kw);
            return b.getDouble(base + rec * RECORD + 8);
        }
    }

    /** One subgrid; extents in degrees, longitudes positive west as in the file. */
    static final class Subgrid {
        final String name;
        final double south;
        final double north;
        final double east;
        final double west;
        final double dLat;
        final double dLon;
        final int rows;
        final int cols;
        final float[] shifts;
        final float[] accuracy;
        final double unit;
        Subgrid parent;
        final List<Subgrid> children = new ArrayList<>();

        Subgrid(String name, double s, double n, double e, double w, double dLat, double dLon, int rows, int cols,
                float[] shifts, float[] accuracy, double unit) {
            this.name = name;
            this.south = s;
            this.north = n;
            this.east = e;
            this.west = w;
            this.dLat = dLat;
            this.dLon = dLon;
            this.rows = rows;
            this.cols = cols;
            this.shifts = shifts;
            this.accuracy = accuracy;
            this.unit = unit;
        }

        boolean contains(double lat, double lonWest) {
            return lat >= south && lat <= north && lonWest >= east && lonWest <= west;
        }
    }

    /** The file name given when reading. */
    public String name() {
        return name;
    }

    /** SYSTEM_F: the source datum as the file names it. */
    public String systemFrom() {
        return systemFrom;
    }

    /** SYSTEM_T: the target datum as the file names it. */
    public String systemTo() {
        return systemTo;
    }

    /** Subgrid names in file order. */
    public List<String> subgridNames() {
        List<String> n = new ArrayList<>();
        for (Subgrid s : subgrids) {
            n.add(s.name);
        }
        return Collections.unmodifiableList(n);
    }

    /**
     * The interpolated shift at a source-datum point.
     *
     * @param latitude degrees
     * @param longitude degrees, positive east
     * @throws OutsideGridException outside every subgrid
     */
    public Shift shiftAt(double latitude, double longitude) {
        double[] out = new double[4];
        Subgrid g = interpolate(latitude, longitude, out, true);
        return new Shift(out[0] * 3600, out[1] * 3600, out[2], out[3], g.name);
    }

    /**
     * An interpolated shift.
     *
     * @param latitudeSeconds Δφ, arc-seconds, positive north
     * @param longitudeSecondsEast Δλ, arc-seconds, positive EAST (the file's west-positive value negated)
     * @param latitudeAccuracy the file's accuracy value, interpolated (units as the file states them)
     * @param longitudeAccuracy likewise
     * @param subgrid the name of the subgrid used
     */
    public record Shift(double latitudeSeconds, double longitudeSecondsEast, double latitudeAccuracy,
            double longitudeAccuracy, String subgrid) {
    }

    /** Writes (Δφ°, Δλ° east, accuracies) into out; returns the subgrid used. */
    private Subgrid interpolate(double lat, double lon, double[] out, boolean withAccuracy) {
        double lonWest = -lon;
        Subgrid g = null;
        for (Subgrid r : roots) {
            if (r.contains(lat, lonWest)) {
                g = r;
                break;
            }
        }
        if (g == null) {
            throw new OutsideGridException("point (" + lat + "°, " + lon + "°) is outside every subgrid of the"
                + " NTv2 grid " + name + " (" + extent() + ")");
        }
        // Descend to the densest subgrid containing the point.
        boolean deeper = true;
        while (deeper) {
            deeper = false;
            for (Subgrid c : g.children) {
                if (c.contains(lat, lonWest)) {
                    g = c;
                    deeper = true;
                    break;
                }
            }
        }
        double x = (lonWest - g.east) / g.dLon;
        double y = (lat - g.south) / g.dLat;
        int i = Math.min((int) Math.floor(x), g.cols - 2);
        int j = Math.min((int) Math.floor(y), g.rows - 2);
        double fx = x - i;
        double fy = y - j;
        int k00 = j * g.cols + i;
        int k10 = k00 + 1;
        int k01 = k00 + g.cols;
        int k11 = k01 + 1;
        double dlat = bilinear(g.shifts, 2 * k00, 2 * k10, 2 * k01, 2 * k11, fx, fy);
        double dlonW = bilinear(g.shifts, 2 * k00 + 1, 2 * k10 + 1, 2 * k01 + 1, 2 * k11 + 1, fx, fy);
        out[0] = dlat * g.unit;
        out[1] = -dlonW * g.unit;
        if (withAccuracy) {
            out[2] = bilinear(g.accuracy, 2 * k00, 2 * k10, 2 * k01, 2 * k11, fx, fy);
            out[3] = bilinear(g.accuracy, 2 * k00 + 1, 2 * k10 + 1, 2 * k01 + 1, 2 * k11 + 1, fx, fy);
        }
        return g;
    }

    private static double bilinear(float[] v, int a00, int a10, int a01, int a11, double fx, double fy) {
        double bottom = v[a00] + (v[a10] - (double) v[a00]) * fx;
        double top = v[a01] + (v[a11] - (double) v[a01]) * fx;
        return bottom + (top - bottom) * fy;
    }

    private String extent() {
        StringBuilder s = new StringBuilder();
        for (Subgrid r : roots) {
            s.append(s.length() == 0 ? "" : "; ").append("latitude ").append(r.south).append("° to ")
                .append(r.north).append("°, longitude ").append(-r.west).append("° to ").append(-r.east)
                .append('°');
        }
        return s.toString();
    }

    /** Source → target datum for one position (height unchanged). */
    public GeodeticPosition forward(GeodeticPosition p) {
        double[] b = {p.latitude(), p.longitude(), p.height()};
        forward(b, 0, b, 0, 1);
        return new GeodeticPosition(b[0], b[1], b[2]);
    }

    /** Target → source datum for one position, by iteration (height unchanged). */
    public GeodeticPosition inverse(GeodeticPosition p) {
        double[] b = {p.latitude(), p.longitude(), p.height()};
        inverse(b, 0, b, 0, 1);
        return new GeodeticPosition(b[0], b[1], b[2]);
    }

    /**
     * Forward shift of {@code count} (φ°, λ°, h) triples; in-place allowed; allocates one small scratch
     * array per call, none per point.
     *
     * @throws OutsideGridException naming the first point outside the grid
     */
    public void forward(double[] in, int inOffset, double[] out, int outOffset, int count) {
        Objects.checkFromIndexSize(inOffset, 3 * count, in.length);
        Objects.checkFromIndexSize(outOffset, 3 * count, out.length);
        double[] tmp = new double[4];
        for (int i = 0; i < count; i++) {
            int k = inOffset + 3 * i;
            double lat = check(in[k], in[k + 1], in[k + 2], i);
            double lon = in[k + 1];
            interpolate(lat, lon, tmp, false);
            int o = outOffset + 3 * i;
            out[o] = lat + tmp[0];
            out[o + 1] = lon + tmp[1];
            out[o + 2] = in[k + 2];
        }
    }

    /**
     * Reverse shift by iteration (see the class description) of {@code count} triples; in-place allowed.
     *
     * @throws OutsideGridException naming the first point whose source lies outside the grid
     */
    public void inverse(double[] in, int inOffset, double[] out, int outOffset, int count) {
        Objects.checkFromIndexSize(inOffset, 3 * count, in.length);
        Objects.checkFromIndexSize(outOffset, 3 * count, out.length);
        double[] tmp = new double[4];
        for (int i = 0; i < count; i++) {
            int k = inOffset + 3 * i;
            double lat = check(in[k], in[k + 1], in[k + 2], i);
            double lon = in[k + 1];
            double h = in[k + 2];
            interpolate(lat, lon, tmp, false);
            double sLat = lat - tmp[0];
            double sLon = lon - tmp[1];
            double step = Double.POSITIVE_INFINITY;
            for (int it = 0; it < 50 && step >= 1e-12; it++) {
                interpolate(sLat, sLon, tmp, false);
                double nLat = lat - tmp[0];
                double nLon = lon - tmp[1];
                step = Math.max(Math.abs(nLat - sLat), Math.abs(nLon - sLon));
                sLat = nLat;
                sLon = nLon;
            }
            if (!(step < 1e-9)) {
                throw new InvalidCoordinateException("point " + i + ": the reverse NTv2 shift did not converge"
                    + " to 1e-9° (last step " + step + "°)");
            }
            int o = outOffset + 3 * i;
            out[o] = sLat;
            out[o + 1] = sLon;
            out[o + 2] = h;
        }
    }

    private static double check(double lat, double lon, double h, int i) {
        if (!(lat >= -90 && lat <= 90) || !(lon >= -360 && lon <= 360) || !Double.isFinite(h)) {
            throw new InvalidCoordinateException("point " + i + ": (" + lat + "°, " + lon + "°, " + h
                + " m) is not a valid geodetic position");
        }
        return lat;
    }

    @Override
    public String toString() {
        return "NTv2 grid " + name + " (" + systemFrom + " → " + systemTo + ", " + subgrids.size() + " subgrids)";
    }
}
