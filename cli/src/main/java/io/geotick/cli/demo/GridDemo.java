package io.geotick.cli.demo;

import io.geotick.geodesy.ecef.EcefConverter;
import io.geotick.geodesy.ellipsoid.Ellipsoid;
import io.geotick.geodesy.position.EcefPosition;
import io.geotick.geodesy.position.GeodeticPosition;
import io.geotick.transforms.Epoch;
import io.geotick.transforms.chain.ConversionChain;
import io.geotick.transforms.chain.CoordinateSystem;
import io.geotick.transforms.frames.StandardFrames;
import io.geotick.transforms.projection.GridGround;
import io.geotick.transforms.projection.GridPosition;
import io.geotick.transforms.projection.Utm;
import io.geotick.transforms.fit.ControlPoint;
import io.geotick.transforms.fit.SiteFitter;
import io.geotick.transforms.fit.SiteModel;
import io.geotick.transforms.fit.SitePoint;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The map-grid part of the demo: the rover's fix (the datum part's, taken to ETRF2000) on UTM with its
 * scale factor and convergence, and a taped distance on the quay compared with the grid distance through
 * the combined scale factor, and a site grid fitted to four control marks. The fix, the quay mark, the
 * control marks and the site grid are invented.
 */
final class GridDemo implements DemoPart {
    // Invented: a mark at the end of the fictional harbour's quay, in ETRF2000, ellipsoidal height in metres.
    static final GeodeticPosition QUAY_MARK = GeodeticPosition.of(46.2003150, -4.8776300, 16.050);

    @Override
    public String title() {
        return "Map grids (transforms)";
    }

    @Override
    public void run(PrintWriter out) {
        Ellipsoid grs80 = StandardFrames.ETRF2000.ellipsoid();
        Epoch epoch = Epoch.from(DatumDemo.OBSERVED);
        double[] e = ConversionChain.builder().from(CoordinateSystem.ecef(StandardFrames.ITRF2020))
            .to(CoordinateSystem.ecef(StandardFrames.ETRF2000)).epoch(epoch).build()
            .convert(DatumDemo.FIX.x(), DatumDemo.FIX.y(), DatumDemo.FIX.z());
        GeodeticPosition rover = EcefConverter.of(grs80).toGeodetic(EcefPosition.of(e[0], e[1], e[2]));
        Utm zone = Utm.forPosition(rover.latitude(), rover.longitude(), grs80);
        GridPosition g = zone.project(rover);
        out.println("1. The rover's fix in ETRF2000 (part 2) on the harbour's map grid, UTM zone " + zone.zoneName()
            + ",");
        out.println("   chosen from the point (Transverse Mercator, Krueger series, ~5 nm):");
        out.println(f("     easting %.3f m, northing %.3f m, h %.3f m", g.easting(), g.northing(), rover.height()));
        out.println(f("     point scale factor %.8f, convergence %.6f deg (grid north is", g.scale(), g.convergence()));
        out.println(f("     %s of true north: grid bearing = azimuth %s %.6f deg)",
            g.convergence() >= 0 ? "east" : "west", g.convergence() >= 0 ? "-" : "+", Math.abs(g.convergence())));
        out.println();

        GridPosition q = zone.project(QUAY_MARK);
        double grid = GridGround.gridDistance(zone, rover, QUAY_MARK);
        double cf = GridGround.lineCombinedFactor(zone, rover, QUAY_MARK);
        double ground = GridGround.groundDistance(grid, cf);
        out.println("2. The crew tapes the distance from the rover to the quay mark (invented:");
        out.println(f("   mark E %.3f m, N %.3f m, h %.3f m). Grid and ground differ:", q.easting(), q.northing(),
            QUAY_MARK.height()));
        out.println(f("     grid distance        %.4f m", grid));
        out.println(f("     combined factor      %.8f (point scale x elevation factor)", cf));
        out.println(f("     ground distance      %.4f m (grid / combined factor)", ground));
        out.println(f("     difference           %.1f mm, %.0f ppm: a tape agrees with the ground figure,", 1000 * (ground
            - grid), 1e6 * (ground - grid) / grid));
        out.println("     not the grid one; use h above the ellipsoid (an orthometric height leaves out");
        out.println("     the geoid undulation: 30 m of it is 4.7 ppm).");
        out.println();

        // Invented: four harbour control marks with their coordinates on the harbour's own site grid.
        double[][] marks = {{354700.000, 5118150.000, 1000.004, 2999.997}, {355200.000, 5118120.000, 1500.155, 2973.498},
            {355150.000, 5117900.000, 1451.701, 2753.169}, {354750.000, 5117950.000, 1051.386, 2800.366}};
        List<ControlPoint> cps = new ArrayList<>();
        for (int i = 0; i < marks.length; i++) {
            cps.add(ControlPoint.of("H" + (i + 1), marks[i][0], marks[i][1], marks[i][2], marks[i][3]));
        }
        SiteModel site = SiteFitter.similarity(cps).model();
        SitePoint r = site.apply(g.easting(), g.northing());
        out.println("3. The harbour keeps its own site grid, tied to four control marks (invented");
        out.println("   coordinates). A 2D similarity fitted to them by least squares (geotick fit):");
        out.println(f("     scale %.8f, rotation %.6f deg, RMS residual %.1f mm (redundancy %d)",
            site.parameter("scale").value(), site.parameter("rotation").value(), 1000 * site.statistics().rms(),
            site.statistics().redundancy()));
        out.println(f("     the rover on the site grid: x %.3f m, y %.3f m", r.x(), r.y()));
        out.println("   Same from the command line: geotick fit --model similarity --from utm:30N@ETRF2000");
        out.println("   -o harbour.json marks.csv, then geotick coord --to site:harbour.json ...");
    }

    private static String f(String format, Object... args) {
        return String.format(Locale.ROOT, format, args);
    }
}
