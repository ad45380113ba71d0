package io.geotick.cli.coord;

import io.geotick.transforms.epsg.LinearUnit;
import java.util.Locale;

/**
 * The unit of a coordinate value, with the symbol and the number of decimals the text output shows.
 * Immutable.
 *
 * <p>Text output is rounded so that the last shown digit is about a micrometre on the ground: 1e-11°
 * of latitude is 1.1 µm, and lengths show 1e-6 m. A grid unit other than the metre ({@link #of(LinearUnit)},
 * e.g. US survey feet) shows 6 decimals, one more per power of ten for a unit longer than a metre (the German
 * legal metre 7, chains 8), so that its last digit is at most 1 µm. JSON output is not rounded (see {@link JsonOutput}).
 */
public final class Unit {
    /** Degrees of arc; 11 decimals (1e-11° ≈ 1.1 µm along a meridian). */
    public static final Unit DEGREE = new Unit("deg", 11);
    /** Metres; 6 decimals (1 µm). */
    public static final Unit METRE = new Unit("m", 6);
    /** A unitless factor (point scale); 10 decimals (0.1 mm in 1 000 km). */
    public static final Unit FACTOR = new Unit("", 10);

    private final String symbol;
    private final int textDecimals;

    private Unit(String symbol, int textDecimals) {
        this.symbol = symbol;
        this.textDecimals = textDecimals;
    }

    /** The unit of a grid's eastings and northings: {@link #METRE} for the metre, else its symbol ("ftUS"). */
    public static Unit of(LinearUnit u) {
        if (u.isMetre()) {
            return METRE;
        }
        int decimals = 6 + Math.max(0, (int) Math.ceil(Math.log10(u.metresPerUnit())));
        return new Unit(u.symbol(), decimals);
    }

    /** The ASCII symbol shown after a value ("deg", "m", "ftUS"). */
    public String symbol() {
        return symbol;
    }

    /** Decimals shown in text output. */
    public int textDecimals() {
        return textDecimals;
    }

    /** The value rounded for text output, never "-0.000…" (a negative value that rounds to zero shows as 0). */
    public String formatText(double value) {
        String s = String.format(Locale.ROOT, "%." + textDecimals + "f", value);
        if (s.startsWith("-") && s.chars().skip(1).allMatch(c -> c == '0' || c == '.')) {
            s = s.substring(1);
        }
        return s;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Unit && ((Unit) o).symbol.equals(symbol) && ((Unit) o).textDecimals == textDecimals;
    }

    @Override
    public int hashCode() {
        return symbol.hashCode() * 31 + textDecimals;
    }

    @Override
    public String toString() {
        return symbol.isEmpty() ? "factor" : symbol;
    }
}
