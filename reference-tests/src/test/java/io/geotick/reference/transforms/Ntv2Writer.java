package io.geotick.reference.transforms;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.util.List;

/**
 * Writes NTv2 files in the published layout (NTv2 Developer's Guide, Natural Resources Canada): 16-byte
 * records of an 8-character keyword and an 8-byte value; overview header of 11 records, per subgrid a
 * header of 11 records and GS_COUNT nodes of four floats, nodes from the south-east corner westward,
 * rows south to north, longitudes positive west; an END record.
 */
final class Ntv2Writer {
    /** A subgrid; extents in arc-seconds (longitudes positive west); nodes[row][col] = {dlat, dlonW, acc, acc}. */
    record Sub(String name, String parent, double s, double n, double e, double w, double dLat, double dLon,
            float[][][] nodes) {
    }

    private Ntv2Writer() {
    }

    static byte[] write(ByteOrder order, String from, String to, List<Sub> subs) {
        int size = 11 * 16;
        for (Sub s : subs) {
            size += 11 * 16 + s.nodes().length * s.nodes()[0].length * 16;
        }
        size += 16;
        ByteBuffer b = ByteBuffer.allocate(size).order(order);
        integer(b, "NUM_OREC", 11);
        integer(b, "NUM_SREC", 11);
        integer(b, "NUM_FILE", subs.size());
        text(b, "GS_TYPE", "SECONDS");
        text(b, "VERSION", "NTv2.0");
        text(b, "SYSTEM_F", from);
        text(b, "SYSTEM_T", to);
        real(b, "MAJOR_F", 6378388.0);
        real(b, "MINOR_F", 6356911.946);
        real(b, "MAJOR_T", 6378137.0);
        real(b, "MINOR_T", 6356752.314);
        for (Sub s : subs) {
            int rows = s.nodes().length;
            int cols = s.nodes()[0].length;
            text(b, "SUB_NAME", s.name());
            text(b, "PARENT", s.parent());
            text(b, "CREATED", "20261201");
            text(b, "UPDATED", "20261201");
            real(b, "S_LAT", s.s());
            real(b, "N_LAT", s.n());
            real(b, "E_LONG", s.e());
            real(b, "W_LONG", s.w());
            real(b, "LAT_INC", s.dLat());
            real(b, "LONG_INC", s.dLon());
            integer(b, "GS_COUNT", rows * cols);
            for (int r = 0; r < rows; r++) {
                for (int c = 0; c < cols; c++) {
                    for (float v : s.nodes()[r][c]) {
                        b.putFloat(v);
                    }
                }
            }
        }
        key(b, "END");
        b.putDouble(0);
        return b.array();
    }

    private static void key(ByteBuffer b, String k) {
        b.put(String.format("%-8s", k).getBytes(StandardCharsets.US_ASCII));
    }

    private static void integer(ByteBuffer b, String k, int v) {
        key(b, k);
        b.putInt(v);
        b.putInt(0);
    }

    private static void text(ByteBuffer b, String k, String v) {
        key(b, k);
        b.put(String.format("%-8s", v).getBytes(StandardCharsets.US_ASCII), 0, 8);
    }

    private static void real(ByteBuffer b, String k, double v) {
        key(b, k);
        b.putDouble(v);
    }
}
