package io.geotick.transforms.fit;

import java.util.List;
import java.util.Objects;
import java.util.stream.Collectors;

/**
 * The result of a control-point fit: the model, the points it was fitted to and the options used.
 *
 * @param model the fitted model (its {@link SiteModel#statistics() statistics} hold residuals and flags)
 * @param points the control points given, in input order
 * @param options the options of the fit
 */
public record SiteFit(SiteModel model, List<ControlPoint> points, FitOptions options) {

    public SiteFit {
        Objects.requireNonNull(model, "model");
        Objects.requireNonNull(options, "options");
        points = List.copyOf(points);
    }

    /** The fit statistics (shortcut for {@code model().statistics()}). */
    public FitStatistics statistics() {
        return model.statistics();
    }

    /**
     * Fits again without the points flagged as outliers (in addition to those already excluded). The flags
     * of the new fit are computed afresh; an excluded point's residual is then its prediction error.
     * Returns this fit when nothing is flagged.
     *
     * @throws SiteFitException when too few points remain, naming the count
     */
    public SiteFit refitWithoutOutliers() {
        List<PointResidual> out = model.statistics().outliers().stream().filter(PointResidual::used).toList();
        if (out.isEmpty()) {
            return this;
        }
        FitOptions o = options.excluding(out.stream().map(PointResidual::id).collect(Collectors.toSet()));
        SiteFit f = SiteFitter.fit(model.kind(), points, o);
        return new SiteFit(f.model().withSystems(model.sourceSystem(), model.targetSystem()), points, o);
    }
}
