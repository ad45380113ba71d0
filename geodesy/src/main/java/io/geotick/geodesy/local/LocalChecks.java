package io.geotick.geodesy.local;

import io.geotick.geodesy.InvalidCoordinateException;

/** Shared validation of local-frame components. */
final class LocalChecks {
    private LocalChecks() {
    }

    static void finite(String what, double v) {
        if (!Double.isFinite(v)) {
            throw new InvalidCoordinateException(what + " = " + v + " m is not a finite number");
        }
    }
}
