package io.geotick.transforms.epsg;

import io.geotick.geodesy.InvalidCoordinateException;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import java.util.Objects;

/**
 * A unit of length in which a grid's eastings and northings are expressed: its name, a short symbol, and
 * its length in metres as an exact rational number (the published definition, e.g. 1200/3937 m for the US
 * survey foot, or the decimal a definition file gives). Immutable and thread-safe.
 *
 * <p>Conversions are done from the exact ratio, not from a rounded factor: {@link #toMetres} and
 * {@link #fromMetres} compute x·p/q with an error-free product ({@code Math.fma}) and an exact division
 * remainder, which gives the correctly rounded result (checked against {@code BigDecimal} in the unit
 * tests) when p and q are at most 2⁵³; otherwise they go through 40-digit decimal arithmetic, rounded once
 * to a double. Either way the conversion adds at most half an ulp of the result: below 1 nm for any
 * coordinate up to 10⁷ units.
 *
 * <p>The constants: {@link #METRE}, {@link #INTERNATIONAL_FOOT} (0.3048 m exactly) and
 * {@link #US_SURVEY_FOOT} (1200/3937 m exactly). Other units come from {@link #ofRatio} or
 * {@link #ofDecimal}, each with the source of its definition.
 */
public final class LinearUnit {
    private static final BigInteger MAX_EXACT = BigInteger.ONE.shiftLeft(53);
    private static final MathContext WIDE = new MathContext(40);

    /** The metre. Source: the SI base unit of length (common practice). */
    public static final LinearUnit METRE = new LinearUnit("metre", "m", BigInteger.ONE, BigInteger.ONE, "1",
        "SI base unit of length (common practice); EPSG unit 9001 (from memory)");

    /**
     * The international foot, 0.3048 m exactly. Source: NIST Handbook 44, Appendix C, and the US Federal
     * Register notice of 1959 (international yard = 0.9144 m, foot = 0.3048 m), from memory; EPSG unit 9002
     * (from memory).
     */
    public static final LinearUnit INTERNATIONAL_FOOT = ofDecimal("international foot", "ft", "0.3048",
        "0.3048 m exactly: NIST Handbook 44, Appendix C; US Federal Register 1959 (from memory); EPSG unit 9002"
            + " (from memory)");

    /**
     * The US survey foot, 1200/3937 m exactly (0.304 800 609 601 219 2… m). Source: the US Metric Act of 1866
     * as kept for geodetic surveys by the US Federal Register notice of 1959, NGS (retired for new work from
     * 2023, still the unit of the NAD83 State Plane grids that use feet), from memory; EPSG unit 9003 (from
     * memory).
     */
    public static final LinearUnit US_SURVEY_FOOT = ofRatio("US survey foot", "ftUS", 1200, 3937,
        "1200/3937 m exactly: US Federal Register 1959, NGS (from memory); EPSG unit 9003 (from memory)");

    private final String name;
    private final String symbol;
    private final BigInteger numerator;
    private final BigInteger denominator;
    private final String definition;
    private final String source;
    private final double metresPerUnit;
    /** Numerator and denominator as doubles when both are at most 2⁵³ (exact), else NaN. */
    private final double p;
    private final double q;

    private LinearUnit(String name, String symbol, BigInteger numerator, BigInteger denominator, String definition,
            String source) {
        this.name = name;
        this.symbol = symbol;
        BigInteger g = numerator.gcd(denominator);
        this.numerator = numerator.divide(g);
        this.denominator = denominator.divide(g);
        this.definition = definition;
        this.source = source;
        this.metresPerUnit = new BigDecimal(this.numerator).divide(new BigDecimal(this.denominator), WIDE)
            .doubleValue();
        boolean exact = this.numerator.compareTo(MAX_EXACT) <= 0 && this.denominator.compareTo(MAX_EXACT) <= 0;
        this.p = exact ? this.numerator.doubleValue() : Double.NaN;
        this.q = exact ? this.denominator.doubleValue() : Double.NaN;
    }

    /**
     * A unit of {@code numerator/denominator} metres exactly.
     *
     * @param name the unit's name, e.g. "US survey foot"
     * @param symbol a short symbol without spaces, e.g. "ftUS"
     * @param source where the definition comes from
     * @throws IllegalArgumentException if the name or symbol is blank, the symbol has spaces, or the ratio is
     *     not positive, naming the value
     */
    public static LinearUnit ofRatio(String name, String symbol, long numerator, long denominator, String source) {
        if (numerator <= 0 || denominator <= 0) {
            throw new IllegalArgumentException("unit " + name + ": " + numerator + "/" + denominator
                + " m is not a positive length");
        }
        return new LinearUnit(checkName(name), checkSymbol(symbol), BigInteger.valueOf(numerator),
            BigInteger.valueOf(denominator), denominator == 1 ? Long.toString(numerator) : numerator + "/"
                + denominator, Objects.requireNonNull(source, "source"));
    }

    /**
     * A unit of exactly the given decimal number of metres, e.g. "0.3048" or "0.201166195164".
     *
     * @throws IllegalArgumentException if the text is not a positive decimal number (naming it), or the name
     *     or symbol is unusable
     */
    public static LinearUnit ofDecimal(String name, String symbol, String metresPerUnit, String source) {
        Objects.requireNonNull(metresPerUnit, "metresPerUnit");
        BigDecimal d;
        try {
            d = new BigDecimal(metresPerUnit.strip());
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("unit " + name + ": '" + metresPerUnit + "' is not a decimal number"
                + " of metres", e);
        }
        if (d.signum() <= 0) {
            throw new IllegalArgumentException("unit " + name + ": " + metresPerUnit + " m is not a positive length");
        }
        d = d.stripTrailingZeros();
        BigInteger num = d.scale() > 0 ? d.unscaledValue() : d.toBigIntegerExact();
        BigInteger den = d.scale() > 0 ? BigInteger.TEN.pow(d.scale()) : BigInteger.ONE;
        return new LinearUnit(checkName(name), checkSymbol(symbol), num, den, d.toPlainString(),
            Objects.requireNonNull(source, "source"));
    }

    private static String checkName(String name) {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a unit needs a name, got '" + name + "'");
        }
        return name;
    }

    private static String checkSymbol(String symbol) {
        if (symbol == null || symbol.isBlank() || symbol.chars().anyMatch(Character::isWhitespace)) {
            throw new IllegalArgumentException("unit symbol '" + symbol + "' must be non-empty, without spaces");
        }
        return symbol;
    }

    /** The name, e.g. "US survey foot". */
    public String name() {
        return name;
    }

    /** The short symbol, e.g. "m", "ft", "ftUS". */
    public String symbol() {
        return symbol;
    }

    /** Where the definition comes from. */
    public String source() {
        return source;
    }

    /** The numerator of the unit's length in metres, in lowest terms (1200 for the US survey foot). */
    public BigInteger numerator() {
        return numerator;
    }

    /** The denominator of the unit's length in metres, in lowest terms (3937 for the US survey foot). */
    public BigInteger denominator() {
        return denominator;
    }

    /** The unit's length in metres as defined: "1", "0.3048", "1200/3937". */
    public String definition() {
        return definition;
    }

    /** The unit's length in metres, the double nearest the exact ratio (for display; conversions use the ratio). */
    public double metresPerUnit() {
        return metresPerUnit;
    }

    /** Whether this is the metre. */
    public boolean isMetre() {
        return numerator.equals(BigInteger.ONE) && denominator.equals(BigInteger.ONE);
    }

    /**
     * A length in this unit, in metres: value × p/q, correctly rounded (see the class comment).
     *
     * @throws InvalidCoordinateException if the value is not finite or the result overflows, naming the value
     */
    public double toMetres(double value) {
        return convert(value, numerator, denominator, p, q, symbol, "m");
    }

    /**
     * A length in metres, in this unit: metres × q/p, correctly rounded (see the class comment).
     *
     * @throws InvalidCoordinateException if the value is not finite or the result overflows, naming the value
     */
    public double fromMetres(double metres) {
        return convert(metres, denominator, numerator, q, p, "m", symbol);
    }

    private static double convert(double x, BigInteger a, BigInteger b, double da, double db, String fromSymbol,
            String toSymbol) {
        if (!Double.isFinite(x)) {
            throw new InvalidCoordinateException("length " + x + " " + fromSymbol + " is not a finite number");
        }
        double r;
        if (x == 0 || a.equals(b)) {
            r = x;
        } else if (!Double.isNaN(da)) {
            r = mulDiv(x, da, db);
        } else {
            r = new BigDecimal(x).multiply(new BigDecimal(a)).divide(new BigDecimal(b), WIDE).doubleValue();
        }
        if (!Double.isFinite(r)) {
            throw new InvalidCoordinateException("length " + x + " " + fromSymbol + " is too large to express in "
                + toSymbol);
        }
        return r;
    }

    /**
     * x·a/b for integers a, b ≤ 2⁵³ (exact doubles): x·a = hi + lo exactly (fma), hi = q·b + r with the
     * remainder r exact (fma; it is representable because q is the rounded quotient), and then
     * x·a/b = q + (r + lo)/b, where the correction's own rounding is ~2⁻⁵² of an ulp of the result.
     */
    private static double mulDiv(double x, double a, double b) {
        double hi = x * a;
        double lo = Math.fma(x, a, -hi);
        double quotient = hi / b;
        double rem = Math.fma(-quotient, b, hi);
        return quotient + (rem + lo) / b;
    }

    /** Units are equal when name, symbol and exact length agree. */
    @Override
    public boolean equals(Object o) {
        return o instanceof LinearUnit && ((LinearUnit) o).name.equals(name) && ((LinearUnit) o).symbol.equals(symbol)
            && ((LinearUnit) o).numerator.equals(numerator) && ((LinearUnit) o).denominator.equals(denominator);
    }

    @Override
    public int hashCode() {
        return Objects.hash(name, symbol, numerator, denominator);
    }

    /** "US survey foot (ftUS, 1200/3937 m)". */
    @Override
    public String toString() {
        return name + " (" + symbol + ", " + definition + " m)";
    }
}
