package io.geotick.cli.coord;

import java.util.Locale;

/**
 * The unit of a coordinate value, with the symbol and the number of decimals the text output shows.
 *
 * <p>Text output is rounded so that the last shown digit is about a micrometre on the ground: 1e-11°
 * of latitude is 1.1 µm, and lengths show 1e-6 m. JSON output is not rounded (see {@link JsonOutput}).
 */
public enum Unit {
    /** Degrees of arc; 11 decimals (1e-11° ≈ 1.1 µm along a meridian). */
    DEGREE("deg", 11),
    /** Metres; 6 decimals (1 µm). */
    METRE("m", 6);

    private final String symbol;
    private final int textDecimals;

    Unit(String symbol, int textDecimals) {
        this.symbol = symbol;
        this.textDecimals = textDecimals;
    }

    /** The ASCII symbol shown after a value ("deg", "m"). */
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
}
