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
 * The first word of each line is a fixed label, so a script can pick a value by its label; the unit
 * follows each value (an EPSG grid in feet shows {@code easting 984250.000000 ftUS}, its height still in
 * {@code m}). An
 * {@code epoch} line follows {@code ellipsoid} when a coordinate epoch was given, and one {@code warning}
 * line per caution of the parameter sets used comes last. Grid targets add a {@code zone} line (UTM/UPS)
 * after {@code ellipsoid}, and {@code scale} (unitless, 10 decimals) and {@code convergence} (deg) lines
 * after the values; a height that is not known (easting and northing given without h) has no line.
 * <pre>
 * system       utm
 * ellipsoid    WGS 84
 * zone         31N
 * easting       534325.167455 m
 * northing     5761156.235699 m
 * height            45.000000 m
 * scale              0.9996... 
 * convergence        0.39... deg
 * </pre>
 */
public final class TextOutput {
    private TextOutput() {
    }

    /** The text, with a line separator after each line. */
    public static String render(ConvertedPoint p) {
        List<String[]> rows = new ArrayList<>();
        rows.add(new String[] {"system", p.system().text()});
        rows.add(new String[] {"ellipsoid", p.ellipsoid()});
        p.epoch().ifPresent(e -> rows.add(new String[] {"epoch", e.toString()}));
        p.zone().ifPresent(z -> rows.add(new String[] {"zone", z}));
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
                (" ".repeat(intWidth - s.indexOf('.')) + s + " " + f.axis().unit().symbol()).stripTrailing()});
        }
        for (String w : p.warnings()) {
            rows.add(new String[] {"warning", w});
        }
        StringBuilder sb = new StringBuilder();
        String nl = System.lineSeparator();
        for (String[] r : rows) {
            sb.append(r[0]).append(" ".repeat(width + 2 - r[0].length())).append(r[1]).append(nl);
        }
        return sb.toString();
    }
}
