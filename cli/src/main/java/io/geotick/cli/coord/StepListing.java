package io.geotick.cli.coord;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import io.geotick.cli.Json;
import io.geotick.transforms.StepDescription;
import io.geotick.transforms.StepDescription.Parameter;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;

/**
 * The {@code --explain} listing of a conversion's steps, as text and as JSON: for each step its name,
 * method with EPSG method and transformation codes, parameters with units (as evaluated at the coordinate
 * epoch), source, accuracy and cautions. Also used by the demo and by {@code geotick frames}.
 */
public final class StepListing {
    private StepListing() {
    }

    /** A total accuracy for text: "0.010 m", "exact (rounding only)" or "not stated". */
    public static String accuracyText(OptionalDouble a) {
        if (a.isEmpty()) {
            return "not stated";
        }
        double v = a.getAsDouble();
        return v == 0 ? "exact (rounding only)" : v < 0.001 ? number(v) + " m" : String.format(Locale.ROOT, "%.3f m", v);
    }

    /** The numbered listing, each line ending in a line separator. */
    public static String text(List<ExplainedStep> steps, OptionalDouble total) {
        String nl = System.lineSeparator();
        StringBuilder s = new StringBuilder();
        s.append("steps: ").append(steps.size()).append(", expected accuracy ").append(accuracyText(total))
            .append(steps.size() > 1 ? " (root-sum-square of the steps)" : "").append(nl);
        int i = 1;
        for (ExplainedStep e : steps) {
            s.append(i++).append(". ");
            appendStep(s, e.step(), e.accuracyMetres(), "   ");
        }
        return s.toString();
    }

    /** One step: a title line, then indented lines for codes, parameters, source, accuracy, cautions. */
    public static void appendStep(StringBuilder s, StepDescription d, OptionalDouble accuracy, String indent) {
        String nl = System.lineSeparator();
        s.append(d.name()).append(nl);
        s.append(indent).append("method: ").append(d.method());
        if (!d.method().contains("EPSG method")) {
            d.epsgMethod().ifPresent(c -> s.append(" (EPSG method ").append(c).append(')'));
        }
        s.append(nl);
        d.epsgTransformation().ifPresent(c -> s.append(indent).append("EPSG transformation: ").append(c).append(nl));
        for (Parameter p : d.parameters()) {
            s.append(indent).append("  ").append(p.name()).append(" = ").append(number(p.value()))
                .append(p.unit().isEmpty() ? "" : " " + p.unit()).append(nl);
        }
        s.append(indent).append("source: ").append(d.source()).append(nl);
        s.append(indent).append("accuracy: ").append(accuracy.isEmpty() ? "not stated"
            : accuracy.getAsDouble() == 0 ? "exact (rounding only)" : (accuracy.getAsDouble() < 0.001
            ? number(accuracy.getAsDouble()) : Double.toString(accuracy.getAsDouble())) + " m").append(nl);
        for (String c : d.cautions()) {
            s.append(indent).append("caution: ").append(c).append(nl);
        }
    }

    /**
     * A parameter value for text: 12 significant digits, trailing zeros dropped, so that values evaluated
     * at an epoch show as published (-0.00202, not -0.0020200000000000044); JSON keeps every digit.
     */
    static String number(double v) {
        return new BigDecimal(v).round(new MathContext(12)).stripTrailingZeros().toPlainString();
    }

    /** The steps as a JSON array of objects. */
    public static ArrayNode json(List<ExplainedStep> steps) {
        ArrayNode a = Json.MAPPER.createArrayNode();
        for (ExplainedStep e : steps) {
            a.add(json(e.step(), e.accuracyMetres()));
        }
        return a;
    }

    /**
     * One step as JSON: {@code name, method, epsg_method, epsg_transformation} (numbers, or null without a
     * code), {@code parameters} ([{name, value, unit}]), {@code source}, {@code accuracy_m} (null when not
     * stated), {@code cautions}.
     */
    public static ObjectNode json(StepDescription d, OptionalDouble accuracy) {
        ObjectNode o = Json.object();
        o.put("name", d.name());
        o.put("method", d.method());
        if (d.epsgMethod().isPresent()) {
            o.put("epsg_method", d.epsgMethod().getAsInt());
        } else {
            o.putNull("epsg_method");
        }
        if (d.epsgTransformation().isPresent()) {
            o.put("epsg_transformation", d.epsgTransformation().getAsInt());
        } else {
            o.putNull("epsg_transformation");
        }
        ArrayNode ps = o.putArray("parameters");
        for (Parameter p : d.parameters()) {
            ps.addObject().put("name", p.name()).put("value", p.value()).put("unit", p.unit());
        }
        o.put("source", d.source());
        putAccuracy(o, accuracy);
        ArrayNode cs = o.putArray("cautions");
        d.cautions().forEach(cs::add);
        return o;
    }

    /** {@code "accuracy_m"}: the number, or null when not stated. */
    static void putAccuracy(ObjectNode o, OptionalDouble accuracy) {
        if (accuracy.isPresent()) {
            o.put("accuracy_m", accuracy.getAsDouble());
        } else {
            o.putNull("accuracy_m");
        }
    }
}
