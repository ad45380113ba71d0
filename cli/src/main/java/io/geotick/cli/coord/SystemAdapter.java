package io.geotick.cli.coord;

import io.geotick.geodesy.ecef.EcefConverter;
import io.geotick.geodesy.ellipsoid.Ellipsoid;
import io.geotick.geodesy.local.Aer;
import io.geotick.geodesy.local.Enu;
import io.geotick.geodesy.local.LocalFrame;
import io.geotick.geodesy.local.Ned;
import io.geotick.geodesy.position.EcefPosition;
import io.geotick.geodesy.position.GeodeticPosition;

/**
 * Takes a point of one coordinate system to ECEF and back, on one ellipsoid: the two ends of a
 * {@link Conversion}. Values are in the axis order of the system's {@link SystemKind}. Implementations
 * build the geodesy module's validating value types, so an out-of-range value (latitude 91°, azimuth
 * 360°) fails there with an {@link io.geotick.geodesy.InvalidCoordinateException} naming it.
 *
 * <p>A projected grid system, when added, is one more adapter: grid → geodetic → ECEF and back.
 */
interface SystemAdapter {
    /** The point's ECEF position. */
    EcefPosition toEcef(double[] values);

    /** The ECEF position expressed in this system, in axis order. */
    double[] fromEcef(EcefPosition p);

    /** The adapter for a system on an ellipsoid. */
    static SystemAdapter of(CoordinateSystemSpec spec, Ellipsoid ellipsoid) {
        switch (spec.kind()) {
            case GEODETIC:
                return new Geodetic(EcefConverter.of(ellipsoid));
            case ECEF:
                return new Ecef();
            case ENU:
            case NED:
            case AER:
                return new Local(spec.kind(), LocalFrame.at(spec.origin().orElseThrow(), ellipsoid));
            default:
                throw new IllegalStateException("no adapter for " + spec.kind());
        }
    }

    /** Geodetic latitude, longitude, height. */
    final class Geodetic implements SystemAdapter {
        private final EcefConverter converter;

        Geodetic(EcefConverter converter) {
            this.converter = converter;
        }

        @Override
        public EcefPosition toEcef(double[] v) {
            return converter.toEcef(GeodeticPosition.of(v[0], v[1], v[2]));
        }

        @Override
        public double[] fromEcef(EcefPosition p) {
            GeodeticPosition g = converter.toGeodetic(p);
            return new double[] {g.latitude(), g.longitude(), g.height()};
        }
    }

    /** ECEF itself. */
    final class Ecef implements SystemAdapter {
        @Override
        public EcefPosition toEcef(double[] v) {
            return EcefPosition.of(v[0], v[1], v[2]);
        }

        @Override
        public double[] fromEcef(EcefPosition p) {
            return new double[] {p.x(), p.y(), p.z()};
        }
    }

    /** ENU, NED or AER in a local tangent frame. */
    final class Local implements SystemAdapter {
        private final SystemKind kind;
        private final LocalFrame frame;

        Local(SystemKind kind, LocalFrame frame) {
            this.kind = kind;
            this.frame = frame;
        }

        @Override
        public EcefPosition toEcef(double[] v) {
            switch (kind) {
                case ENU:
                    return frame.toEcef(Enu.of(v[0], v[1], v[2]));
                case NED:
                    return frame.toEcef(Ned.of(v[0], v[1], v[2]));
                default:
                    return frame.toEcef(Aer.of(v[0], v[1], v[2]));
            }
        }

        @Override
        public double[] fromEcef(EcefPosition p) {
            switch (kind) {
                case ENU: {
                    Enu e = frame.toEnu(p);
                    return new double[] {e.east(), e.north(), e.up()};
                }
                case NED: {
                    Ned n = frame.toNed(p);
                    return new double[] {n.north(), n.east(), n.down()};
                }
                default: {
                    Aer a = frame.toAer(p);
                    return new double[] {a.azimuth(), a.elevation(), a.range()};
                }
            }
        }
    }
}
