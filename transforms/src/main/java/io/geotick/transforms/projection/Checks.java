package io.geotick.transforms.projection;

/** Input checks shared by the projections; every message names the value. Package-private. */
final class Checks {
    private Checks() {
    }

    static void latitude(double latitude) {
        if (!(latitude >= -90.0 && latitude <= 90.0)) {
            throw new ProjectionDomainException("latitude " + latitude + "° is outside [-90°, 90°]");
        }
    }

    static void longitude(double longitude) {
        if (!(longitude >= -360.0 && longitude <= 360.0)) {
            throw new ProjectionDomainException("longitude " + longitude + "° is outside [-360°, 360°]");
        }
    }

    static void grid(double easting, double northing) {
        if (!Double.isFinite(easting)) {
            throw new ProjectionDomainException("easting " + easting + " is not a finite number");
        }
        if (!Double.isFinite(northing)) {
            throw new ProjectionDomainException("northing " + northing + " is not a finite number");
        }
    }

    static double finiteParameter(String what, double v) {
        if (!Double.isFinite(v)) {
            throw new ProjectionDomainException(what + " " + v + " is not a finite number");
        }
        return v;
    }

    static double positiveParameter(String what, double v) {
        if (!(v > 0) || Double.isInfinite(v)) {
            throw new ProjectionDomainException(what + " " + v + " must be finite and positive");
        }
        return v;
    }

    static double latitudeParameter(String what, double v) {
        if (!(v >= -90.0 && v <= 90.0)) {
            throw new ProjectionDomainException(what + " " + v + "° is outside [-90°, 90°]");
        }
        return v;
    }

    static double longitudeParameter(String what, double v) {
        if (!(v >= -180.0 && v <= 180.0)) {
            throw new ProjectionDomainException(what + " " + v + "° is outside [-180°, 180°]");
        }
        return v;
    }

    /**
     * lon − lon0 reduced to [−180°, 180°], for |lon| ≤ 360° and |lon0| ≤ 180°. Each ±360 step is exact
     * (Sterbenz: the difference lies within [180°, 720°] in magnitude); branches instead of
     * {@code Math.IEEEremainder}, which is a slow library call.
     */
    static double deltaLongitude(double longitude, double centralMeridian) {
        double d = longitude - centralMeridian;
        if (d > 180.0) {
            d -= 360.0;
            if (d > 180.0) {
                d -= 360.0;
            }
        } else if (d < -180.0) {
            d += 360.0;
            if (d < -180.0) {
                d += 360.0;
            }
        }
        return d;
    }

    /** A longitude (degrees) folded into (−180°, 180°]. */
    static double normalizeLongitude(double longitude) {
        double l = Math.IEEEremainder(longitude, 360.0);
        return l == -180.0 ? 180.0 : l;
    }

    static void arrays(double[] src, int srcOff, double[] dst, int dstOff, int count) {
        if (count < 0) {
            throw new IllegalArgumentException("count " + count + " is negative");
        }
        if (srcOff < 0 || (long) srcOff + 2L * count > src.length) {
            throw new IndexOutOfBoundsException("source holds " + src.length + " values; offset " + srcOff
                + " + 2 × " + count + " points does not fit");
        }
        if (dstOff < 0 || (long) dstOff + 2L * count > dst.length) {
            throw new IndexOutOfBoundsException("destination holds " + dst.length + " values; offset "
                + dstOff + " + 2 × " + count + " points does not fit");
        }
    }

    static ProjectionDomainException atIndex(int index, ProjectionDomainException e) {
        return new ProjectionDomainException("point " + index + ": " + e.getMessage());
    }
}
