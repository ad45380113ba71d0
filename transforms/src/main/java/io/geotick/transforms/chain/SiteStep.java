package io.geotick.transforms.chain;

import io.geotick.transforms.StepDescription;
import io.geotick.transforms.StepDescription.Parameter;
import io.geotick.transforms.fit.FitParameter;
import io.geotick.transforms.fit.FitStatistics;
import io.geotick.transforms.fit.SiteModel;
import io.geotick.transforms.fit.SiteModelKind;
import io.geotick.transforms.fit.SiteTransform;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.OptionalInt;

/**
 * A fitted site model on triples of its base system: base → site forward ({@link SiteModel#apply}), site →
 * base through the model's inverse (exact to rounding; the fitted matrix is checked to be invertible). The
 * 2D models carry the third value through. Allocation-free.
 */
final class SiteStep implements Op {
    private final CoordinateSystem.Site site;
    private final boolean forward;
    private final SiteTransform transform;
    private final StepDescription description;

    SiteStep(CoordinateSystem.Site site, boolean forward) {
        this.site = Objects.requireNonNull(site);
        this.forward = forward;
        this.transform = forward ? site.model() : site.model().inverse();
        this.description = describe(site, forward);
    }

    private static StepDescription describe(CoordinateSystem.Site site, boolean forward) {
        SiteModel m = site.model();
        FitStatistics st = m.statistics();
        List<Parameter> ps = new ArrayList<>();
        for (FitParameter p : m.parameters()) {
            ps.add(new Parameter(p.name(), p.value(), "1".equals(p.unit()) ? "" : p.unit()));
        }
        for (FitParameter p : m.derivedParameters()) {
            ps.add(new Parameter(p.name() + " (derived)", p.value(), "1".equals(p.unit()) ? "" : p.unit()));
        }
        String base = site.base().toString();
        String rms = String.format(Locale.ROOT, "%.4f m", st.rms());
        List<String> cautions = new ArrayList<>();
        cautions.add("accuracy shown is the fit's RMS residual (" + rms + ", redundancy " + st.redundancy()
            + "); valid only inside the control points' area, errors grow outside it");
        if (st.redundancy() == 0) {
            cautions.add("the fit has no redundancy: it is exact at its control points and says nothing about its"
                + " accuracy (RMS 0 is not a statement of exactness)");
        }
        if (m.kind() != SiteModelKind.HELMERT_3D) {
            cautions.add("a 2D model: the third value of " + base + " passes through unchanged");
        }
        String source = "site model " + site.name() + ": " + st.pointsUsed() + " control points used of "
            + st.pointsGiven() + ", RMS residual " + rms
            + (st.sigma0().isPresent() ? String.format(Locale.ROOT, ", sigma0 %.4f m", st.sigma0().getAsDouble()) : "")
            + (m.sourceSystem().isBlank() ? "" : "; fitted from " + m.sourceSystem());
        return new StepDescription(forward ? base + " → " + site.name() : site.name() + " → " + base,
            m.kind().id() + " fitted by least squares to " + st.pointsUsed() + " control points"
                + (forward ? "" : ", inverse (exact to rounding)"),
            OptionalInt.empty(), OptionalInt.empty(), ps, source, st.rms(), cautions);
    }

    @Override
    public void apply(double[] buf, int off, int count) {
        transform.apply(buf, off, buf, off, count);
    }

    @Override
    public Op inverse() {
        return new SiteStep(site, !forward);
    }

    @Override
    public StepDescription description() {
        return description;
    }
}
