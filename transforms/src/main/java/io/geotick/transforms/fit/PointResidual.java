package io.geotick.transforms.fit;

import java.util.Objects;
import java.util.OptionalDouble;

/**
 * The residual of one control point, observed minus fitted: v = target − model(source), in metres.
 *
 * @param id the control point's id
 * @param used true when the point took part in the estimate, false when it was excluded
 * @param dx residual in x
 * @param dy residual in y
 * @param dz residual in z (0 for the 2D models)
 * @param standardised the largest |vᵢ|/(σ₀·√q) over the point's coordinates, where q is the cofactor of
 *     the residual (1 − hᵢᵢ for a used point, 1 + hᵢᵢ for the prediction at an excluded one); empty when
 *     σ₀ is unknown (no redundancy) or q vanishes (a point the fit must reproduce exactly)
 * @param outlier true when {@code standardised} exceeds the fit's threshold
 */
public record PointResidual(String id, boolean used, double dx, double dy, double dz,
        OptionalDouble standardised, boolean outlier) {

    public PointResidual {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(standardised, "standardised");
        if (!Double.isFinite(dx) || !Double.isFinite(dy) || !Double.isFinite(dz)) {
            throw new IllegalArgumentException("residual of point '" + id + "' is not finite");
        }
    }

    /** The length of the residual vector, metres. */
    public double length() {
        return Math.sqrt(dx * dx + dy * dy + dz * dz);
    }
}
