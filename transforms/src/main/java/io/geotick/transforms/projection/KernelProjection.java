package io.geotick.transforms.projection;

import io.geotick.geodesy.position.GeodeticPosition;

/**
 * The shared frame of the in-house projections: each supplies a forward and an inverse kernel that write
 * into an array at an offset, and this class builds the single-point and the allocation-free array
 * methods of {@link MapProjection} from them, so that array results are bit-for-bit the single-point
 * ones and a bad point in an array is reported by its index.
 */
abstract class KernelProjection implements MapProjection {

    /**
     * Forward into out[off] = E, out[off+1] = N and, when {@code full}, out[off+2] = point scale k,
     * out[off+3] = convergence γ (degrees). Validates the point (throwing {@link ProjectionDomainException}).
     */
    abstract void forward(double latitude, double longitude, double[] out, int off, boolean full);

    /** Inverse into out[off] = φ, out[off+1] = λ (degrees). Validates the grid point. */
    abstract void inverse(double easting, double northing, double[] out, int off);

    @Override
    public final GridPosition project(double latitude, double longitude) {
        double[] buf = new double[4];
        forward(latitude, longitude, buf, 0, true);
        return new GridPosition(buf[0], buf[1], buf[2], buf[3]);
    }

    @Override
    public final GeodeticPosition unproject(double easting, double northing) {
        double[] buf = new double[2];
        inverse(easting, northing, buf, 0);
        return GeodeticPosition.of(buf[0], buf[1]);
    }

    @Override
    public final void project(double[] src, int srcOff, double[] dst, int dstOff, int count) {
        Checks.arrays(src, srcOff, dst, dstOff, count);
        for (int i = 0; i < count; i++) {
            double lat = src[srcOff + 2 * i];
            double lon = src[srcOff + 2 * i + 1];
            try {
                forward(lat, lon, dst, dstOff + 2 * i, false);
            } catch (ProjectionDomainException e) {
                throw Checks.atIndex(i, e);
            }
        }
    }

    @Override
    public final void unproject(double[] src, int srcOff, double[] dst, int dstOff, int count) {
        Checks.arrays(src, srcOff, dst, dstOff, count);
        for (int i = 0; i < count; i++) {
            double e = src[srcOff + 2 * i];
            double n = src[srcOff + 2 * i + 1];
            try {
                inverse(e, n, dst, dstOff + 2 * i);
            } catch (ProjectionDomainException ex) {
                throw Checks.atIndex(i, ex);
            }
        }
    }
}
