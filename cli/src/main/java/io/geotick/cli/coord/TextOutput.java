package io.geotick.cli.coord;

import java.util.ArrayList;
import java.util.List;

/**
 * Renders a {@link ConvertedPoint} as text: one {@code label value} pair per line, values with their
 * units, numbers lined up on the decimal point. Angles show 11 decimals of a degree and lengths 6 decimals
 * of a metre (about 1 µm either way, see {@link Unit}); {@code --json} carries full precision.
 * <pre>
 * system     geodetic
 * ellipsoid  WGS 84
 * latitude    53.80939444444 deg
 * longitude    2.12955000000 deg
 * height      73.000000 m
 * </pre>
 * The first word of each line is a fixed label, so a script can pick a value by its label.
 */
public final class TextOutput {
    private TextOutput() {
    }

    /** The text, with a line separator after each line. */
    public static String render(ConvertedPoint p) {
        List<String[]> rows = new ArrayList<>();
        rows.add(new String[] {"system", p.system().text()});
        rows.add(new String[] {"ellipsoid", p.ellipsoid()});
        int width = "ellipsoid".length();
        int intWidth = 0;
        List<String> numbers = new ArrayList<>();
        for (OutputField f : p.values()) {
            String s = f.axis().formatText(f.value());
            numbers.add(s);
            intWidth = Math.max(intWidth, s.indexOf('.'));
            width = Math.max(width, f.axis().label().length());
        }
        for (int i = 0; i < numbers.size(); i++) {
            OutputField f = p.values().get(i);
            String s = numbers.get(i);
            rows.add(new String[] {f.axis().label(),
                " ".repeat(intWidth - s.indexOf('.')) + s + " " + f.axis().unit().symbol()});
        }
        StringBuilder sb = new StringBuilder();
        String nl = System.lineSeparator();
        for (String[] r : rows) {
            sb.append(r[0]).append(" ".repeat(width + 2 - r[0].length())).append(r[1]).append(nl);
        }
        return sb.toString();
    }
}
