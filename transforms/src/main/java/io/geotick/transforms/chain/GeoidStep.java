package io.geotick.transforms.chain;

import io.geotick.transforms.StepDescription;
import io.geotick.transforms.StepDescription.Parameter;
import io.geotick.transforms.height.GeoidGrid;
import io.geotick.transforms.height.Interpolation;
import java.util.List;
import java.util.Objects;
import java.util.OptionalInt;

/** Ellipsoidal ↔ orthometric heights with a geoid grid, on geodetic triples. */
final class GeoidStep {
    private final GeoidGrid grid;
    private final Interpolation interpolation;

    GeoidStep(GeoidGrid grid, Interpolation interpolation) {
        this.grid = Objects.requireNonNull(grid);
        this.interpolation = Objects.requireNonNull(interpolation);
    }

    Op toOrthometric() {
        return op(true);
    }

    Op toEllipsoidal() {
        return op(false);
    }

    private Op op(boolean toOrthometric) {
        String ref = grid.header().getOrDefault("ref frame", "not stated") + ", ellipsoid "
            + grid.header().getOrDefault("ref ellipsoid", "not stated");
        StepDescription d = new StepDescription(
            toOrthometric ? "ellipsoidal → orthometric height (H = h − N)" : "orthometric → ellipsoidal height (h = H + N)",
            "Geoid undulation from " + grid.modelName() + ", "
                + interpolation.name().toLowerCase(java.util.Locale.ROOT) + " interpolation",
            OptionalInt.empty(), OptionalInt.empty(), List.of(
                new Parameter("latitude spacing", grid.latitudeSpacing(), "degree"),
                new Parameter("longitude spacing", grid.longitudeSpacing(), "degree")),
            "ISG grid " + grid.name() + " (model frame: " + ref + ")", 0,
            List.of("accuracy is that of the geoid model (not stated in ISG files); the model's own frame and"
                + " ellipsoid should match the chain's frame: a mismatch of frames shifts N by up to the datum"
                + " difference in height"));
        return new Op() {
            @Override
            public void apply(double[] buf, int off, int count) {
                for (int i = 0; i < count; i++) {
                    int k = off + 3 * i;
                    double n = grid.undulation(buf[k], buf[k + 1], interpolation);
                    if (!Double.isFinite(buf[k + 2])) {
                        throw new io.geotick.geodesy.InvalidCoordinateException("point " + i + ": height "
                            + buf[k + 2] + " m is not a finite number");
                    }
                    buf[k + 2] = toOrthometric ? buf[k + 2] - n : buf[k + 2] + n;
                }
            }

            @Override
            public Op inverse() {
                return op(!toOrthometric);
            }

            @Override
            public StepDescription description() {
                return d;
            }
        };
    }
}
