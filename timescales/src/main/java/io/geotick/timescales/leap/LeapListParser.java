package io.geotick.timescales.leap;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads the IERS/IETF leap-second list ({@code leap-seconds.list}).
 *
 * <p>Format (IERS, as distributed with tzdata):
 * <ul>
 *   <li>data lines {@code NTPSECONDS DTAI [# comment]}: from NTP second {@code NTPSECONDS} (seconds since
 *       1900-01-01T00:00:00, 86 400 per day) TAI &minus; UTC is {@code DTAI} seconds;</li>
 *   <li>{@code #$ NTPSECONDS}: when the file was last updated;</li>
 *   <li>{@code #@ NTPSECONDS}: when it expires;</li>
 *   <li>{@code #h W1 W2 W3 W4 W5}: the SHA-1 digest, as five 32-bit words in hexadecimal (leading zeros of a
 *       word may be omitted), of the concatenated digits of the {@code #$} value, the {@code #@} value and
 *       the two numbers of every data line, in file order, with all white space and comments removed;</li>
 *   <li>any other line starting with {@code #} is a comment; blank lines are ignored.</li>
 * </ul>
 *
 * <p>Beyond the format, geotick requires what its conversions rely on: the first entry is 1972-01-01 with
 * 10 s (where the 1961&ndash;1971 table ends), entries fall on 00:00 UTC, dates strictly increase and each step
 * is one second either way. Any failure is a {@link LeapListException} naming the line.
 */
public final class LeapListParser {
    private static final Pattern DATA = Pattern.compile("\\s*(\\d+)\\s+(-?\\d+)\\s*(?:#.*)?");
    private static final Pattern VALUE = Pattern.compile("#[$@]\\s*(\\d+)\\s*");
    private static final Pattern HASH = Pattern.compile(
        "#h\\s+([0-9a-fA-F]{1,8})\\s+([0-9a-fA-F]{1,8})\\s+([0-9a-fA-F]{1,8})\\s+([0-9a-fA-F]{1,8})"
            + "\\s+([0-9a-fA-F]{1,8})\\s*");
    /** NTP seconds of 1972-01-01, where every list must start (with TAI &minus; UTC = 10 s). */
    private static final long NTP_1972 = 2_272_060_800L;

    private LeapListParser() {
    }

    /**
     * Parses and verifies a list.
     *
     * @param text   the content
     * @param source the name used in messages (a path)
     * @throws LeapListException on any malformed line, a missing or bad hash, a missing update or expiry line
     */
    public static LeapTable parse(String text, String source) {
        String[] lines = text.split("\r?\n", -1);
        String updated = null;
        String expires = null;
        long[] hash = null;
        int hashLine = 0;
        List<LeapEntry> entries = new ArrayList<>();
        StringBuilder hashed = new StringBuilder();
        StringBuilder dataDigits = new StringBuilder();
        long prevNtp = Long.MIN_VALUE;
        int prevDtai = 0;
        for (int i = 0; i < lines.length; i++) {
            int no = i + 1;
            String line = lines[i];
            String t = line.strip();
            if (t.isEmpty()) {
                continue;
            }
            if (t.startsWith("#$") || t.startsWith("#@")) {
                Matcher m = VALUE.matcher(t);
                if (!m.matches()) {
                    throw fail(source, no, line, "expected '" + t.substring(0, 2) + " NTPSECONDS'");
                }
                if (t.charAt(1) == '$') {
                    if (updated != null) {
                        throw fail(source, no, line, "a second '#$' (last update) line");
                    }
                    updated = m.group(1);
                } else {
                    if (expires != null) {
                        throw fail(source, no, line, "a second '#@' (expiry) line");
                    }
                    expires = m.group(1);
                }
                continue;
            }
            if (t.startsWith("#h")) {
                Matcher m = HASH.matcher(t);
                if (!m.matches()) {
                    throw fail(source, no, line, "expected '#h' and five hexadecimal words");
                }
                if (hash != null) {
                    throw fail(source, no, line, "a second '#h' (hash) line");
                }
                hash = new long[5];
                for (int k = 0; k < 5; k++) {
                    hash[k] = Long.parseLong(m.group(k + 1), 16);
                }
                hashLine = no;
                continue;
            }
            if (t.startsWith("#")) {
                continue;
            }
            Matcher m = DATA.matcher(line);
            if (!m.matches()) {
                throw fail(source, no, line, "expected 'NTPSECONDS TAI-UTC [# comment]'");
            }
            long ntp;
            int dtai;
            try {
                ntp = Long.parseLong(m.group(1));
                dtai = Integer.parseInt(m.group(2));
            } catch (NumberFormatException e) {
                throw fail(source, no, line, "number out of range");
            }
            if (ntp % 86_400L != 0) {
                throw fail(source, no, line, "NTP second " + ntp + " is not at 00:00:00 UTC of a day");
            }
            if (entries.isEmpty()) {
                if (ntp != NTP_1972 || dtai != 10) {
                    throw fail(source, no, line, "the first entry must be '2272060800 10' (1972-01-01, 10 s)");
                }
            } else {
                if (ntp <= prevNtp) {
                    throw fail(source, no, line, "date is not after the previous entry's");
                }
                if (Math.abs(dtai - prevDtai) != 1) {
                    throw fail(source, no, line, "TAI-UTC changes by " + (dtai - prevDtai)
                        + " s; a leap second is a step of 1 s");
                }
            }
            prevNtp = ntp;
            prevDtai = dtai;
            entries.add(LeapEntry.ofNtp(ntp, dtai));
            dataDigits.append(m.group(1)).append(m.group(2));
        }
        if (entries.isEmpty()) {
            throw new LeapListException(source + ": no data lines (NTPSECONDS TAI-UTC)", 0);
        }
        if (updated == null) {
            throw new LeapListException(source + ": no '#$' line (last update)", 0);
        }
        if (expires == null) {
            throw new LeapListException(source + ": no '#@' line (expiry date)", 0);
        }
        if (hash == null) {
            throw new LeapListException(source + ": no '#h' line (SHA-1 hash): the list cannot be verified", 0);
        }
        hashed.append(updated).append(expires).append(dataDigits);
        long[] actual = sha1Words(hashed.toString());
        for (int k = 0; k < 5; k++) {
            if (actual[k] != hash[k]) {
                throw new LeapListException(source + ": line " + hashLine + ": SHA-1 hash does not verify: '"
                    + lines[hashLine - 1].strip() + "' but the content hashes to " + words(actual), hashLine);
            }
        }
        return new LeapTable(entries, LeapEntry.ofNtp(Long.parseLong(updated), 0).effective(),
            LeapEntry.ofNtp(Long.parseLong(expires), 0).effective(), source, HashCheck.VERIFIED);
    }

    /**
     * The {@code #h} line for a list with these update, expiry and entries (for writing test lists).
     */
    public static String hashLine(long updatedNtp, long expiresNtp, List<LeapEntry> entries) {
        StringBuilder sb = new StringBuilder().append(updatedNtp).append(expiresNtp);
        for (LeapEntry e : entries) {
            sb.append(e.ntpSeconds()).append(e.taiMinusUtc());
        }
        return "#h\t" + words(sha1Words(sb.toString()));
    }

    private static String words(long[] w) {
        StringBuilder sb = new StringBuilder();
        for (long x : w) {
            sb.append(sb.length() == 0 ? "" : " ").append(Long.toHexString(x));
        }
        return sb.toString();
    }

    private static long[] sha1Words(String s) {
        byte[] d;
        try {
            d = MessageDigest.getInstance("SHA-1").digest(s.getBytes(StandardCharsets.US_ASCII));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-1 unavailable", e);
        }
        long[] w = new long[5];
        for (int k = 0; k < 5; k++) {
            for (int b = 0; b < 4; b++) {
                w[k] = (w[k] << 8) | (d[k * 4 + b] & 0xFF);
            }
        }
        return w;
    }

    private static LeapListException fail(String source, int no, String line, String why) {
        return new LeapListException(source + ": line " + no + ": '" + line.strip() + "': " + why, no);
    }
}
