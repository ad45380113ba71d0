package io.geotick.reference.transforms;

import org.locationtech.proj4j.CRSFactory;
import org.locationtech.proj4j.CoordinateReferenceSystem;
import org.locationtech.proj4j.ProjCoordinate;
import org.locationtech.proj4j.datum.Datum;

/**
 * Proj4J as a reference library, used only here in the tests through its Java API. Its datum shifts
 * apply "to WGS 84" parameters in the position-vector convention with the small-angle matrix.
 */
final class Proj4jReference {
    private static final CRSFactory FACTORY = new CRSFactory();

    private Proj4jReference() {
    }

    /**
     * A geographic CRS with 7 "to WGS 84" parameters (m, ″, ppm; PV) on a named Proj4J ellipsoid, or on
     * explicit axes when {@code ellipsoid} is written "a,b".
     */
    static CoordinateReferenceSystem geographic(String ellipsoid, double... toWgs84) {
        StringBuilder p = new StringBuilder();
        for (double v : toWgs84) {
            p.append(p.length() == 0 ? "" : ",").append(v);
        }
        String[] axes = ellipsoid.split(",");
        String[] ell = axes.length == 2 ? new String[] {"+a=" + axes[0], "+b=" + axes[1]}
            : new String[] {"+ellps=" + ellipsoid};
        String[] all = new String[ell.length + 3];
        all[0] = "+proj=longlat";
        System.arraycopy(ell, 0, all, 1, ell.length);
        all[ell.length + 1] = "+towgs84=" + p;
        all[ell.length + 2] = "+no_defs";
        return FACTORY.createFromParameters("reference", all);
    }

    /** Proj4J's geocentric "to WGS 84" shift applied to one ECEF point (metres). */
    static double[] toWgs84Geocentric(CoordinateReferenceSystem crs, double x, double y, double z) {
        Datum d = crs.getDatum();
        ProjCoordinate c = new ProjCoordinate(x, y, z);
        d.transformFromGeocentricToWgs84(c);
        return new double[] {c.x, c.y, c.z};
    }
}
