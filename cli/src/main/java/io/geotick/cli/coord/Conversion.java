package io.geotick.cli.coord;

import io.geotick.geodesy.ellipsoid.Ellipsoid;
import io.geotick.geodesy.position.EcefPosition;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * Converts points from one coordinate system to another through ECEF:
 * source values → ECEF → (steps) → ECEF → target values. Immutable and thread-safe.
 *
 * <p>Every path goes through ECEF so that each system needs only its own {@link SystemAdapter}; the
 * ECEF round trip adds at most a few nanometres (the geodesy module's stated bounds: the forward
 * conversions are exact to a few ulps, the ECEF → geodetic inverse is within 1 nm).
 *
 * <p>FRAME PLUG-IN POINT: {@link #steps} is where frame changes and grid shifts go (see {@link EcefStep});
 * today it is empty.
 */
public final class Conversion {
    private final CoordinateSystemSpec source;
    private final CoordinateSystemSpec target;
    private final Ellipsoid ellipsoid;
    private final SystemAdapter from;
    private final SystemAdapter to;
    private final List<EcefStep> steps;

    private Conversion(CoordinateSystemSpec source, CoordinateSystemSpec target, Ellipsoid ellipsoid,
        List<EcefStep> steps) {
        this.source = source;
        this.target = target;
        this.ellipsoid = ellipsoid;
        this.from = SystemAdapter.of(source, ellipsoid);
        this.to = SystemAdapter.of(target, ellipsoid);
        this.steps = List.copyOf(steps);
    }

    /**
     * The conversion between two systems on one ellipsoid (local-frame origins are on it too).
     *
     * @throws io.geotick.geodesy.InvalidCoordinateException if a local origin is unusable
     */
    public static Conversion of(CoordinateSystemSpec source, CoordinateSystemSpec target, Ellipsoid ellipsoid) {
        return new Conversion(Objects.requireNonNull(source, "source"), Objects.requireNonNull(target, "target"),
            Objects.requireNonNull(ellipsoid, "ellipsoid"), new ArrayList<>());
    }

    public CoordinateSystemSpec source() {
        return source;
    }

    public CoordinateSystemSpec target() {
        return target;
    }

    public Ellipsoid ellipsoid() {
        return ellipsoid;
    }

    /**
     * Converts one point given as typed: exactly three values in the source's axis order.
     *
     * @throws io.geotick.cli.UserInputException if the count is wrong or a value is not a number
     * @throws io.geotick.geodesy.InvalidCoordinateException if a value is out of range, or the point has
     *     no value in the target (inside the Earth's evolute, for geodetic)
     */
    public ConvertedPoint convert(List<String> texts) {
        return convert(source.kind().parseValues(texts));
    }

    /** Converts one point given in the source's axis order. */
    public ConvertedPoint convert(double[] values) {
        EcefPosition p = from.toEcef(values);
        for (EcefStep s : steps) {
            p = s.apply(p);
        }
        double[] out = to.fromEcef(p);
        List<Axis> axes = target.kind().axes();
        List<OutputField> fields = new ArrayList<>(axes.size());
        for (int i = 0; i < axes.size(); i++) {
            fields.add(new OutputField(axes.get(i), out[i]));
        }
        return new ConvertedPoint(target, ellipsoid.name(), fields);
    }
}
