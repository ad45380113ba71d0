package io.geotick.transforms;

import io.geotick.geodesy.position.EcefPosition;
import java.util.Objects;

/**
 * Propagation of a station position between epochs with its (constant) velocity within one frame:
 * X(t) = X(t₀) + V·(t − t₀). This is the linear station model of the ITRF (IERS Conventions 2010,
 * IERS TN 36, §4.1); it omits post-seismic deformation, seasonal signals and discontinuities, which the
 * ITRF models separately and which reach centimetres to metres at affected stations.
 */
public final class StationMotion {
    private StationMotion() {
    }

    /**
     * The position at {@code to}, given the position at {@code from} and the velocity.
     * Exact for the linear model (one fused product per axis).
     */
    public static EcefPosition propagate(EcefPosition position, EcefVelocity velocity, Epoch from, Epoch to) {
        Objects.requireNonNull(position, "position");
        Objects.requireNonNull(velocity, "velocity");
        if (from == null || to == null) {
            throw new MissingEpochException("propagating a station position with its velocity needs both the"
                + " epoch of the coordinates and the target epoch");
        }
        double dt = to.yearsSince(from);
        return new EcefPosition(Math.fma(velocity.vx(), dt, position.x()),
            Math.fma(velocity.vy(), dt, position.y()), Math.fma(velocity.vz(), dt, position.z()));
    }
}
