package io.geotick.transforms.chain;

import io.geotick.geodesy.ecef.EcefConverter;
import io.geotick.transforms.StepDescription;
import io.geotick.transforms.StepDescription.Parameter;
import io.geotick.transforms.frames.Frame;
import io.geotick.transforms.helmert.GeocentricTransform;
import java.util.List;
import java.util.OptionalInt;

/** The step kinds of a chain. */
final class Ops {
    private Ops() {
    }

    private static StepDescription conversion(String name, Frame f) {
        return new StepDescription(name, "Geographic/geocentric conversion", OptionalInt.of(9602), OptionalInt.empty(),
            List.of(new Parameter("a", f.ellipsoid().semiMajorAxis(), "m"),
                new Parameter("1/f", f.ellipsoid().inverseFlattening(), "")),
            "IOGP Guidance Note 7-2, §4.1.1; ellipsoid " + f.ellipsoid().name() + " (" + f.ellipsoid().source()
                + ")", 0, List.of());
    }

    /** Geodetic → ECEF on the frame's ellipsoid. */
    static Op toEcef(Frame f) {
        EcefConverter c = EcefConverter.of(f.ellipsoid());
        StepDescription d = conversion("geodetic → ECEF on " + f.ellipsoid().name() + " (" + f + ")", f);
        return new Op() {
            @Override
            public void apply(double[] buf, int off, int count) {
                c.toEcef(buf, off, buf, off, count);
            }

            @Override
            public Op inverse() {
                return toGeodetic(f);
            }

            @Override
            public StepDescription description() {
                return d;
            }
        };
    }

    /** ECEF → geodetic on the frame's ellipsoid. */
    static Op toGeodetic(Frame f) {
        EcefConverter c = EcefConverter.of(f.ellipsoid());
        StepDescription d = conversion("ECEF → geodetic on " + f.ellipsoid().name() + " (" + f + ")", f);
        return new Op() {
            @Override
            public void apply(double[] buf, int off, int count) {
                c.toGeodetic(buf, off, buf, off, count);
            }

            @Override
            public Op inverse() {
                return toEcef(f);
            }

            @Override
            public StepDescription description() {
                return d;
            }
        };
    }

    /** An ECEF → ECEF transformation with its description; the inverse uses the transform's exact inverse. */
    static Op geocentric(GeocentricTransform t, StepDescription d, StepDescription inverseDescription) {
        return new Op() {
            @Override
            public void apply(double[] buf, int off, int count) {
                t.apply(buf, off, buf, off, count);
            }

            @Override
            public Op inverse() {
                return geocentric(t.inverse(), inverseDescription, d);
            }

            @Override
            public StepDescription description() {
                return d;
            }
        };
    }
}
