package io.geotick.timescales.calendar;

import io.geotick.timescales.Conversion;
import io.geotick.timescales.TimeInputException;
import io.geotick.timescales.TimeWarning;
import io.geotick.timescales.encoding.DecimalSeconds;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * ISO 8601 date-time text: a label and, optionally, a UTC designator {@code Z} or a UTC offset.
 *
 * <p>Accepted forms (extended format): {@code YYYY-MM-DD}, {@code YYYY-DDD} (ordinal), each optionally
 * followed by {@code T} (or a space) and {@code hh:mm}, {@code hh:mm:ss} or {@code hh:mm:ss.fraction}
 * (a comma may stand for the point; any number of fraction digits, more than nine are rounded half-even and
 * reported), then optionally {@code Z}, {@code ±hh:mm}, {@code ±hhmm} or {@code ±hh}.
 *
 * @param label         the label as written (before applying any offset)
 * @param zoned         true when a {@code Z} or an offset was written
 * @param offsetSeconds the UTC offset written (0 for {@code Z} or when not zoned)
 * @param carryNano     true when the fraction rounded up to a whole second: {@code label} then holds the
 *                      nanosecond .999999999 and one more nanosecond is to be added to the instant (so that
 *                      23:59:59.9999999999 becomes 23:59:60 on a leap day and the next day's 00:00:00 otherwise)
 */
public record IsoText(DateTimeLabel label, boolean zoned, int offsetSeconds, boolean carryNano) {
    private static final Pattern ISO = Pattern.compile(
        "(\\d{4})-(?:(\\d{2})-(\\d{2})|(\\d{3}))"
            + "(?:[Tt ](\\d{2}):(\\d{2})(?::(\\d{2})(?:[.,](\\d+))?)?)?"
            + "(?:([Zz])|([+-])(\\d{2})(?::?(\\d{2}))?)?");

    /** True when a zone designator ({@code Z} or an offset) was written. */
    public boolean isZoned() {
        return zoned;
    }

    /**
     * Reads ISO 8601 text.
     *
     * @throws TimeInputException naming the text when it is malformed or a field is out of range
     */
    public static Conversion<IsoText> parse(String text) {
        String t = text.trim();
        Matcher m = ISO.matcher(t);
        if (!m.matches()) {
            throw new TimeInputException("'" + text + "' is not an ISO 8601 date-time "
                + "(expected e.g. 2017-01-01T00:00:00Z or 2016-366T23:59:60)");
        }
        int year = Integer.parseInt(m.group(1));
        int hour = m.group(5) == null ? 0 : Integer.parseInt(m.group(5));
        int minute = m.group(6) == null ? 0 : Integer.parseInt(m.group(6));
        int second = m.group(7) == null ? 0 : Integer.parseInt(m.group(7));
        String frac = m.group(8) == null ? "" : m.group(8);
        // the fraction, rounded half-even to the nanosecond; .9999999995 and above rounds to a whole second
        DecimalSeconds f = frac.isEmpty() ? DecimalSeconds.ZERO
            : DecimalSeconds.parse("0." + frac, "fraction of '" + text + "'").value();
        boolean rounded = frac.length() > 9 && !frac.substring(9).chars().allMatch(c -> c == '0');
        boolean carry = f.seconds() == 1;
        long nano = carry ? 999_999_999L : f.nano(); // the last nanosecond is added to the instant (see carryNano)
        DateTimeLabel label = m.group(4) != null
            ? DateTimeLabel.ofYearDay(year, Integer.parseInt(m.group(4)), hour, minute, second, (int) nano, text)
            : DateTimeLabel.of(year, Integer.parseInt(m.group(2)), Integer.parseInt(m.group(3)), hour, minute,
                second, (int) nano, text);
        boolean zoned = m.group(9) != null || m.group(10) != null;
        int offset = 0;
        if (m.group(10) != null) {
            int oh = Integer.parseInt(m.group(11));
            int om = m.group(12) == null ? 0 : Integer.parseInt(m.group(12));
            if (oh > 23 || om > 59) {
                throw new TimeInputException("UTC offset in '" + text + "' is out of range");
            }
            offset = (oh * 3600 + om * 60) * ("-".equals(m.group(10)) ? -1 : 1);
        }
        IsoText v = new IsoText(label, zoned, offset, carry);
        return Conversion.of(v, rounded ? List.of(TimeWarning.rounded("fraction of '" + text + "'")) : List.of());
    }

}
