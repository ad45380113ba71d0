package io.geotick.transforms.chain;

import io.geotick.geodesy.InvalidCoordinateException;
import io.geotick.transforms.StepDescription;
import io.geotick.transforms.StepDescription.Parameter;
import io.geotick.transforms.molodensky.Molodensky;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.OptionalInt;

/**
 * A Molodensky shift (EPSG 9604, or abridged 9605) on geodetic triples: source ellipsoid → target
 * ellipsoid forward. The reverse iterates the forward formula, s ← s + (t − M(s)), so that a round trip
 * closes to rounding; it differs from EPSG's reverse by sign reversal (swapped ellipsoids, negated
 * translations) by a small multiple of Δ²/R, which the listing states. One small scratch array per call,
 * none per point.
 */
final class MolodenskyStep implements Op {
    /** The approximation of the method, with its size; listed with every Molodensky step. */
    static final String APPROXIMATION = "Molodensky's formulas are a first-order expansion of the geocentric"
        + " translation route (EPSG 9603, IOGP Guidance Note 7-2 §4.4): for classic datum shifts (translations of"
        + " 100-200 m, ellipsoids differing like International 1924 and WGS 84) the standard form stays within a"
        + " few centimetres of that route and the abridged form within about 0.1 m in height and a few millimetres"
        + " horizontally (measured by the tests on the Guidance Note's North Sea example: abridged 0.07 m in"
        + " height, 2 mm horizontally); accurate to about a metre or better for such shifts (common practice),"
        + " worse for larger translations or heights of many kilometres (terms of order Δ²/R and Δ·h/R omitted)";

    private final Molodensky molodensky;
    private final boolean forward;
    private final StepDescription description;
    private final StepDescription reverseDescription;

    private MolodenskyStep(Molodensky m, boolean forward, StepDescription description,
            StepDescription reverseDescription) {
        this.molodensky = m;
        this.forward = forward;
        this.description = description;
        this.reverseDescription = reverseDescription;
    }

    /**
     * The forward step between two named ends.
     *
     * @param from how the listing names the source (e.g. the frame)
     * @param to how the listing names the target
     * @param source who published the translations
     * @param accuracyMetres their stated accuracy
     */
    static MolodenskyStep of(Molodensky m, String from, String to, String source, double accuracyMetres) {
        Objects.requireNonNull(m, "molodensky");
        return new MolodenskyStep(m, true, describe(m, from + " → " + to, source, accuracyMetres, false),
            describe(m, to + " → " + from, source, accuracyMetres, true));
    }

    private static StepDescription describe(Molodensky m, String name, String source, double accuracy,
            boolean reverse) {
        double[] t = m.translations();
        List<Parameter> ps = List.of(new Parameter("dX", t[0], "m"), new Parameter("dY", t[1], "m"),
            new Parameter("dZ", t[2], "m"), new Parameter("da", m.deltaA(), "m"), new Parameter("df", m.deltaF(), ""));
        List<String> cautions = new ArrayList<>();
        cautions.add(APPROXIMATION);
        cautions.add("from " + m.sourceEllipsoid().name() + " to " + m.targetEllipsoid().name() + " (da = a_target"
            + " - a_source, df = f_target - f_source); the translations are the source's, geocentric, in metres");
        if (reverse) {
            cautions.add("applied in reverse by iterating the forward formula until it reproduces the input to"
                + " rounding; EPSG's reverse by sign reversal differs from that by a small multiple of Δ²/R (up to"
                + " 1-2 cm for ED50-sized shifts)");
        }
        return new StepDescription(name, m.description() + (reverse ? ", reverse by iteration" : ""),
            OptionalInt.of(m.epsgMethod()), OptionalInt.empty(), ps, source, accuracy, cautions);
    }

    @Override
    public void apply(double[] buf, int off, int count) {
        if (forward) {
            molodensky.apply(buf, off, buf, off, count);
            return;
        }
        double[] s = new double[3];
        for (int i = 0; i < count; i++) {
            int k = off + 3 * i;
            double tLat = buf[k];
            double tLon = buf[k + 1];
            double tH = buf[k + 2];
            s[0] = tLat;
            s[1] = tLon;
            s[2] = tH;
            evaluate(s, i);
            // Start at t − (M(t) − t), then correct by the forward residual.
            double lat = 2 * tLat - s[0];
            double lon = 2 * tLon - s[1];
            double h = 2 * tH - s[2];
            double stepAngle = Double.POSITIVE_INFINITY;
            double stepHeight = Double.POSITIVE_INFINITY;
            for (int it = 0; it < 8 && (stepAngle > 1e-14 || stepHeight > 1e-9); it++) {
                s[0] = lat;
                s[1] = lon;
                s[2] = h;
                evaluate(s, i);
                double dLat = tLat - s[0];
                double dLon = tLon - s[1];
                double dH = tH - s[2];
                lat += dLat;
                lon += dLon;
                h += dH;
                stepAngle = Math.max(Math.abs(dLat), Math.abs(dLon));
                stepHeight = Math.abs(dH);
            }
            if (!(stepAngle < 1e-11 && stepHeight < 1e-6)) {
                throw new InvalidCoordinateException("point " + i + ": the reverse " + molodensky.description()
                    + " did not converge (last step " + stepAngle + "°, " + stepHeight + " m)");
            }
            buf[k] = lat;
            buf[k + 1] = lon;
            buf[k + 2] = h;
        }
    }

    /** M(s) in place, the point's index restored in a failure message. */
    private void evaluate(double[] s, int index) {
        try {
            molodensky.apply(s, 0, s, 0, 1);
        } catch (InvalidCoordinateException e) {
            String msg = e.getMessage() == null ? "" : e.getMessage();
            throw new InvalidCoordinateException("point " + index + ": "
                + (msg.startsWith("point 0: ") ? msg.substring("point 0: ".length()) : msg));
        }
    }

    @Override
    public Op inverse() {
        return new MolodenskyStep(molodensky, !forward, reverseDescription, description);
    }

    @Override
    public StepDescription description() {
        return description;
    }
}
