package io.geotick.cli.demo;

import io.geotick.geodesy.ecef.EcefConverter;
import io.geotick.geodesy.ellipsoid.Ellipsoid;
import io.geotick.geodesy.ellipsoid.Ellipsoids;
import io.geotick.geodesy.local.Aer;
import io.geotick.geodesy.local.Enu;
import io.geotick.geodesy.local.LocalFrame;
import io.geotick.geodesy.position.EcefPosition;
import io.geotick.geodesy.position.GeodeticPosition;
import java.io.PrintWriter;
import java.util.Locale;

/**
 * The geodesy part of the demo: a rover's ECEF fix to geodetic, the rover and a GPS satellite seen from
 * the harbour base station (ENU and AER), and round-trip errors. All positions are invented.
 */
final class GeodesyDemo implements DemoPart {
    private static final Ellipsoid WGS84 = Ellipsoids.WGS84;

    // Invented: the base station's surveyed position (the harbour's "BM-Q1" benchmark).
    private static final GeodeticPosition BASE = GeodeticPosition.of(46.20314159, -4.88752653, 18.402);
    // Invented: the rover receiver's fix as it reports it, ECEF to the millimetre.
    private static final EcefPosition ROVER_FIX = EcefPosition.of(4406214.692, -376365.730, 4580724.072);
    // Invented: a satellite at GPS altitude (about 20,200 km), ECEF to the centimetre.
    private static final EcefPosition SATELLITE = EcefPosition.of(19412357.70, -7451705.96, 16513242.31);

    @Override
    public String title() {
        return "Positions and local frames (geodesy)";
    }

    @Override
    public void run(PrintWriter out) {
        EcefConverter conv = EcefConverter.of(WGS84);
        LocalFrame base = LocalFrame.at(BASE, WGS84);

        out.println("1. The rover's receiver reports its fix in ECEF (WGS 84):");
        out.println(f("     x %.3f m, y %.3f m, z %.3f m", ROVER_FIX.x(), ROVER_FIX.y(), ROVER_FIX.z()));
        GeodeticPosition rover = conv.toGeodetic(ROVER_FIX);
        out.println("   as geodetic coordinates:");
        out.println(f("     latitude %.9f deg, longitude %.9f deg, height %.3f m",
            rover.latitude(), rover.longitude(), rover.height()));
        out.println();

        out.println(f("2. The base station BM-Q1 stands at latitude %.8f deg, longitude %.8f deg,",
            BASE.latitude(), BASE.longitude()));
        out.println(f("   height %.3f m. The rover seen from the base, in its local frame:", BASE.height()));
        Enu enu = base.toEnu(ROVER_FIX);
        Aer aer = Aer.fromEnu(enu);
        out.println(f("     east %.3f m, north %.3f m, up %.3f m", enu.east(), enu.north(), enu.up()));
        out.println(f("     azimuth %.4f deg, elevation %.4f deg, slant range %.3f m",
            aer.azimuth(), aer.elevation(), aer.range()));
        out.println(f("     horizontal distance %.3f m", Math.hypot(enu.east(), enu.north())));
        out.println();

        Aer sat = base.toAer(SATELLITE);
        GeodeticPosition satGeo = conv.toGeodetic(SATELLITE);
        out.println(f("3. A satellite at GPS altitude (%.1f km above the ellipsoid), seen from the base:",
            satGeo.height() / 1000));
        out.println(f("     azimuth %.4f deg, elevation %.4f deg, range %.3f km", sat.azimuth(), sat.elevation(),
            sat.range() / 1000));
        out.println(sat.elevation() > 0 ? "     above the horizon: in view of the base station"
            : "     below the horizon: not in view of the base station");
        out.println();

        out.println("4. Round trips (convert and convert back; distance between start and end):");
        double r1 = ROVER_FIX.distanceTo(conv.toEcef(conv.toGeodetic(ROVER_FIX)));
        Enu back = base.toEnu(base.toEcef(enu));
        double r2 = Math.sqrt(sq(back.east() - enu.east()) + sq(back.north() - enu.north()) + sq(back.up() - enu.up()));
        double r3 = SATELLITE.distanceTo(conv.toEcef(conv.toGeodetic(SATELLITE)));
        out.println("     (1 ulp: the spacing of doubles at the size of the ECEF coordinates involved)");
        out.println(f("     rover ECEF -> geodetic -> ECEF      %6.3f nm   1 ulp = %.3f nm", r1 * 1e9,
            ulp(ROVER_FIX) * 1e9));
        out.println(f("     rover ENU -> ECEF -> ENU            %6.3f nm   1 ulp = %.3f nm", r2 * 1e9,
            ulp(base.toEcef(enu)) * 1e9));
        out.println(f("     satellite ECEF -> geodetic -> ECEF  %6.3f nm   1 ulp = %.3f nm", r3 * 1e9,
            ulp(SATELLITE) * 1e9));
        out.println("   Errors of a nanometre or a few ulps are the limit of double arithmetic, not of the method.");
    }

    /** The spacing of doubles at the largest coordinate of a position. */
    private static double ulp(EcefPosition p) {
        return Math.ulp(Math.max(Math.abs(p.x()), Math.max(Math.abs(p.y()), Math.abs(p.z()))));
    }

    private static double sq(double v) {
        return v * v;
    }

    private static String f(String format, Object... args) {
        return String.format(Locale.ROOT, format, args);
    }
}
