package io.geotick.geodesy.angle;

import io.geotick.geodesy.InvalidCoordinateException;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.Objects;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Parsing and formatting of latitudes and longitudes in decimal degrees and in degrees, minutes and
 * seconds (DMS) with hemisphere letters. Stateless and thread-safe.
 *
 * <h2>Accepted text (the grammar)</h2>
 * <pre>
 *   angle   = [hemi] [sign] body [hemi]        (at most one hemisphere letter, and not with a sign)
 *   body    = deg [degMark]                                   decimal degrees: 51.4774, 51.4774°
 *           | ideg sep1 min [minMark]                         degrees, decimal minutes: 51°28.642'
 *           | ideg sep1 imin sep2 sec [secMark]               degrees, minutes, seconds: 51°28'38.5"
 *   sep1    = degMark | whitespace | ':'       sep2 = minMark | whitespace | ':'
 *   deg     = 1–3 digits [. digits]            ideg = 1–3 digits
 *   min     = 1–2 digits [. digits] (&lt; 60)    imin = 1–2 digits (&lt; 60)
 *   sec     = 1–2 digits [. digits] (&lt; 60)
 *   degMark = ° º ˚ d deg                      minMark = ' ′ ’ m      secMark = " ″ ” '' s
 *   hemi    = N S (latitude) | E W (longitude), upper case only
 *   sign    = + | - | − (U+2212, the typographic minus)
 * </pre>
 * Whitespace is allowed around marks, between components and around a hemisphere letter. Only the last
 * component may carry a fraction. The decimal separator is the point (a comma is rejected, being a list
 * separator too). Hemisphere letters are upper case and marks lower case so that {@code 38s} (seconds)
 * and {@code 38S} (south) cannot be confused. Examples: {@code 51°28'38.5"N}, {@code 51 28 38.5 N},
 * {@code N51d28m38.5s}, {@code -0.0014}, {@code 0°00'05.3"W}, {@code 51:28:38.5}, {@code W 0 0 5.3}.
 *
 * <p>Rejected, with an {@link InvalidCoordinateException} that quotes the text: empty or blank text,
 * {@code NaN}, {@code Infinity} (reported as not a finite number), exponents, junk characters, minutes or seconds of 60 or more, a
 * fraction on a component that is not the last, a sign together with a hemisphere letter, two
 * hemisphere letters, a letter of the wrong axis (E/W for a latitude, N/S for a longitude), a latitude
 * outside [−90°, 90°] or a longitude outside [−180°, 360°] (bounds checked on the exact decimal value).
 *
 * <p>Accuracy: the components are combined exactly in decimal ({@code d + m/60 + s/3600} to 40
 * significant digits) and rounded once to the nearest double, so a parsed value is the double nearest
 * the value written (decimal degrees are parsed by {@link Double#parseDouble}, correctly rounded).
 *
 * <h2>Formatting</h2>
 * {@link #formatLatitude}/{@link #formatLongitude} write {@code D°MM'SS.s"H}: unpadded degrees, two-digit
 * minutes and seconds, the chosen number of decimals of seconds and a hemisphere letter; the rounding
 * (half away from zero, of the exact binary value) is done on the total number of seconds so that
 * carries propagate: 51°28'59.9996" at three decimals is {@code 51°29'00.000"N}. A value that rounds to
 * zero is written with N or E. Every formatted value parses back to within half a unit of its last digit.
 */
public final class Angles {
    /** Most decimals of seconds (or of degrees) a formatter writes: 1e-12" is 3e-11 m on the Earth. */
    public static final int MAX_DECIMALS = 12;

    private static final String DEG_MARK = "(?:°|º|˚|deg|d)";
    private static final String MIN_MARK = "(?:'|′|’|m)";
    private static final String SEC_MARK = "(?:\"|″|”|''|s)";
    private static final String FRACTION = "(?:\\.\\d+)?";

    private static final Pattern DECIMAL = Pattern.compile("(\\d{1,3}" + FRACTION + ")\\s*" + DEG_MARK + "?");
    private static final Pattern DM = Pattern.compile(
        "(\\d{1,3})(?:\\s*" + DEG_MARK + "\\s*|\\s+|:)(\\d{1,2}" + FRACTION + ")\\s*" + MIN_MARK + "?");
    private static final Pattern DMS = Pattern.compile(
        "(\\d{1,3})(?:\\s*" + DEG_MARK + "\\s*|\\s+|:)(\\d{1,2})(?:\\s*" + MIN_MARK + "\\s*|\\s+|:)"
            + "(\\d{1,2}" + FRACTION + ")\\s*" + SEC_MARK + "?");

    private static final Pattern NOT_FINITE = Pattern.compile("[+\\-\u2212]?(?i:nan|inf|infinity|∞)");

    private static final MathContext MC = new MathContext(40, RoundingMode.HALF_EVEN);
    private static final BigDecimal SIXTY = BigDecimal.valueOf(60);
    private static final BigDecimal THREE_THOUSAND_SIX_HUNDRED = BigDecimal.valueOf(3600);

    private enum Axis {
        LATITUDE("latitude", 'N', 'S', -90, 90),
        LONGITUDE("longitude", 'E', 'W', -180, 360);

        final String noun;
        final char positive;
        final char negative;
        final BigDecimal min;
        final BigDecimal max;

        Axis(String noun, char positive, char negative, int min, int max) {
            this.noun = noun;
            this.positive = positive;
            this.negative = negative;
            this.min = BigDecimal.valueOf(min);
            this.max = BigDecimal.valueOf(max);
        }
    }

    private Angles() {
    }

    /**
     * Parses a latitude in decimal degrees or DMS (grammar above), hemisphere letter N or S.
     *
     * @return degrees, positive north, in [−90, 90]
     * @throws InvalidCoordinateException naming the text if it does not parse or is out of range
     */
    public static double parseLatitude(String text) {
        return parse(text, Axis.LATITUDE);
    }

    /**
     * Parses a longitude in decimal degrees or DMS (grammar above), hemisphere letter E or W.
     *
     * @return degrees, positive east, in [−180, 360]
     * @throws InvalidCoordinateException naming the text if it does not parse or is out of range
     */
    public static double parseLongitude(String text) {
        return parse(text, Axis.LONGITUDE);
    }

    private static double parse(String text, Axis axis) {
        Objects.requireNonNull(text, axis.noun);
        String s = text.strip();
        if (s.isEmpty()) {
            throw invalid(text, axis, "it is empty");
        }
        if (NOT_FINITE.matcher(s).matches()) {
            throw invalid(text, axis, "it is not a finite number");
        }
        boolean negative = false;
        Character hemisphere = null;
        char first = s.charAt(0);
        if (isHemisphereLetter(first)) {
            hemisphere = first;
            s = s.substring(1).strip();
        }
        if (!s.isEmpty() && isHemisphereLetter(s.charAt(s.length() - 1))) {
            if (hemisphere != null) {
                throw invalid(text, axis, "it has two hemisphere letters");
            }
            hemisphere = s.charAt(s.length() - 1);
            s = s.substring(0, s.length() - 1).strip();
        }
        if (!s.isEmpty() && (s.charAt(0) == '-' || s.charAt(0) == '+' || s.charAt(0) == '\u2212')) {
            if (hemisphere != null) {
                throw invalid(text, axis, "it has both a sign and a hemisphere letter");
            }
            negative = s.charAt(0) != '+';
            s = s.substring(1);
        }
        if (hemisphere != null) {
            if (hemisphere == axis.negative) {
                negative = true;
            } else if (hemisphere != axis.positive) {
                throw invalid(text, axis, "the hemisphere letter '" + hemisphere + "' is not one of "
                    + axis.positive + "/" + axis.negative);
            }
        }
        BigDecimal magnitude = parseBody(s, text, axis);
        BigDecimal value = negative ? magnitude.negate() : magnitude;
        if (value.compareTo(axis.min) < 0 || value.compareTo(axis.max) > 0) {
            throw invalid(text, axis, "it is outside [" + axis.min + "°, " + axis.max + "°]");
        }
        double d = value.doubleValue();
        return d == 0 ? 0.0 : d; // no negative zero
    }

    private static boolean isHemisphereLetter(char c) {
        return c == 'N' || c == 'S' || c == 'E' || c == 'W';
    }

    private static BigDecimal parseBody(String s, String text, Axis axis) {
        Matcher m = DECIMAL.matcher(s);
        if (m.matches()) {
            return new BigDecimal(m.group(1));
        }
        m = DM.matcher(s);
        if (m.matches()) {
            BigDecimal minutes = component(m.group(2), "minutes", text, axis);
            return new BigDecimal(m.group(1)).add(minutes.divide(SIXTY, MC));
        }
        m = DMS.matcher(s);
        if (m.matches()) {
            BigDecimal minutes = component(m.group(2), "minutes", text, axis);
            BigDecimal seconds = component(m.group(3), "seconds", text, axis);
            return new BigDecimal(m.group(1)).add(minutes.divide(SIXTY, MC))
                .add(seconds.divide(THREE_THOUSAND_SIX_HUNDRED, MC), MC);
        }
        throw invalid(text, axis, "expected decimal degrees or degrees, minutes and seconds such as "
            + (axis == Axis.LATITUDE ? "51°28'38.5\"N or -12.5" : "0°00'05.3\"W or 120.25"));
    }

    private static BigDecimal component(String digits, String what, String text, Axis axis) {
        BigDecimal v = new BigDecimal(digits);
        if (v.compareTo(SIXTY) >= 0) {
            throw invalid(text, axis, what + " " + digits + " are not below 60");
        }
        return v;
    }

    private static InvalidCoordinateException invalid(String text, Axis axis, String why) {
        return new InvalidCoordinateException("invalid " + axis.noun + " '" + text + "': " + why);
    }

    /**
     * Formats a latitude as {@code D°MM'SS.s"N} or {@code …S}.
     *
     * @param latitude degrees in [−90, 90]
     * @param secondDecimals decimals of seconds, 0 to {@link #MAX_DECIMALS}
     */
    public static String formatLatitude(double latitude, int secondDecimals) {
        checkValue(latitude, Axis.LATITUDE);
        return formatDms(latitude, secondDecimals, Axis.LATITUDE);
    }

    /**
     * Formats a longitude as {@code D°MM'SS.s"E} or {@code …W}. The value is written as given (not
     * normalised): 200° is {@code 200°00'00"E}.
     *
     * @param longitude degrees in [−180, 360]
     * @param secondDecimals decimals of seconds, 0 to {@link #MAX_DECIMALS}
     */
    public static String formatLongitude(double longitude, int secondDecimals) {
        checkValue(longitude, Axis.LONGITUDE);
        return formatDms(longitude, secondDecimals, Axis.LONGITUDE);
    }

    /**
     * Formats an angle as signed decimal degrees with a fixed number of decimals and no exponent, e.g.
     * {@code -0.001400} (rounding half away from zero of the exact binary value; no negative zero).
     *
     * @param degrees any finite value
     * @param decimals 0 to {@link #MAX_DECIMALS}
     */
    public static String formatDecimal(double degrees, int decimals) {
        if (!Double.isFinite(degrees)) {
            throw new InvalidCoordinateException("cannot format the angle " + degrees + "°: not a finite number");
        }
        checkDecimals(decimals);
        BigDecimal r = new BigDecimal(degrees).setScale(decimals, RoundingMode.HALF_UP);
        if (r.signum() == 0) {
            r = r.abs();
        }
        return r.toPlainString();
    }

    private static String formatDms(double degrees, int decimals, Axis axis) {
        checkDecimals(decimals);
        // Total seconds, rounded once at the requested decimals, as an integer count of 10^-decimals".
        BigInteger units = new BigDecimal(degrees).abs().multiply(THREE_THOUSAND_SIX_HUNDRED)
            .setScale(decimals, RoundingMode.HALF_UP).unscaledValue();
        BigInteger perSecond = BigInteger.TEN.pow(decimals);
        BigInteger[] secAndFrac = units.divideAndRemainder(perSecond);
        long totalSeconds = secAndFrac[0].longValueExact();
        long d = totalSeconds / 3600;
        long m = totalSeconds / 60 % 60;
        long s = totalSeconds % 60;
        StringBuilder b = new StringBuilder(24);
        b.append(d).append('°');
        if (m < 10) {
            b.append('0');
        }
        b.append(m).append('\'');
        if (s < 10) {
            b.append('0');
        }
        b.append(s);
        if (decimals > 0) {
            String frac = secAndFrac[1].toString();
            b.append('.');
            for (int i = frac.length(); i < decimals; i++) {
                b.append('0');
            }
            b.append(frac);
        }
        b.append('"');
        boolean negative = degrees < 0 && units.signum() != 0;
        b.append(negative ? axis.negative : axis.positive);
        return b.toString();
    }

    private static void checkValue(double v, Axis axis) {
        if (!(v >= axis.min.doubleValue() && v <= axis.max.doubleValue())) {
            throw new InvalidCoordinateException("cannot format the " + axis.noun + " " + v + "°: outside ["
                + axis.min + "°, " + axis.max + "°]");
        }
    }

    private static void checkDecimals(int decimals) {
        if (decimals < 0 || decimals > MAX_DECIMALS) {
            throw new IllegalArgumentException("decimals must be in [0, " + MAX_DECIMALS + "], got " + decimals);
        }
    }
}
