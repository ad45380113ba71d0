package io.geotick.cli.demo;

import io.geotick.cli.coord.ExplainedStep;
import io.geotick.cli.coord.StepListing;
import io.geotick.geodesy.ecef.EcefConverter;
import io.geotick.geodesy.ellipsoid.Ellipsoid;
import io.geotick.geodesy.local.Enu;
import io.geotick.geodesy.local.LocalFrame;
import io.geotick.geodesy.position.EcefPosition;
import io.geotick.geodesy.position.GeodeticPosition;
import io.geotick.transforms.Epoch;
import io.geotick.transforms.chain.ConversionChain;
import io.geotick.transforms.chain.CoordinateSystem;
import io.geotick.transforms.frames.FrameLink;
import io.geotick.transforms.frames.FrameRegistry;
import io.geotick.transforms.frames.StandardFrames;
import io.geotick.transforms.helmert.Helmert;
import io.geotick.transforms.helmert.HelmertParameters;
import io.geotick.transforms.molodensky.Molodensky;
import java.io.PrintWriter;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The datum-shift part of the demo: the rover's fix, delivered in ITRF2020 at the date of observation,
 * shifted to ETRF2000 and to ED50 (beside it, the same translations by Molodensky's formulas), and what a
 * mixed-up epoch or rotation convention would have cost.
 * The fix, the date and the company are invented; the parameter sets are the registry's.
 */
final class DatumDemo implements DemoPart {
    // Invented: the fix as the (fictional) Quillan Survey Co. correction service delivers it, ITRF2020.
    static final EcefPosition FIX = EcefPosition.of(4406214.692, -376365.730, 4580724.072);
    // Invented: the date of observation.
    static final LocalDate OBSERVED = LocalDate.of(2026, 11, 20);

    @Override
    public String title() {
        return "Datum shifts (transforms)";
    }

    @Override
    public void run(PrintWriter out) {
        Epoch epoch = Epoch.from(OBSERVED);
        FrameRegistry registry = FrameRegistry.standard();
        Ellipsoid grs80 = StandardFrames.ETRF2000.ellipsoid();
        EcefConverter onGrs80 = EcefConverter.of(grs80);

        out.println("1. Quillan Survey Co. (a fictional company) receives the rover's fix from its");
        out.println(f("   correction service in ITRF2020, observed on %s (coordinate epoch %.4f):", OBSERVED,
            epoch.decimalYear()));
        out.println(f("     x %.3f m, y %.3f m, z %.3f m", FIX.x(), FIX.y(), FIX.z()));
        out.println("   The harbour's maps are in ETRF2000, its old charts in ED50.");
        out.println();

        ConversionChain toEtrf = ConversionChain.builder().from(CoordinateSystem.ecef(StandardFrames.ITRF2020))
            .to(CoordinateSystem.ecef(StandardFrames.ETRF2000)).epoch(epoch).build();
        EcefPosition etrf = apply(toEtrf, FIX);
        GeodeticPosition etrfGeo = onGrs80.toGeodetic(etrf);
        LocalFrame there = LocalFrame.at(etrfGeo, grs80);
        out.println("2. ITRF2020 -> ETRF2000 at the coordinate epoch:");
        out.println(f("     latitude %.9f deg, longitude %.9f deg, height %.3f m (GRS 1980)", etrfGeo.latitude(),
            etrfGeo.longitude(), etrfGeo.height()));
        out.println(f("     the frame change moves the point by %.3f m; %s", FIX.distanceTo(etrf),
            "without it the map would be off by that much"));
        out.println();

        out.println("3. What the common mix-ups would have cost (distance from the correct ETRF2000 point):");
        ConversionChain at2010 = ConversionChain.builder().from(CoordinateSystem.ecef(StandardFrames.ITRF2020))
            .to(CoordinateSystem.ecef(StandardFrames.ETRF2000)).epoch(Epoch.of(2010.0)).build();
        report(out, there, "epoch 2010.0 (the table's reference epoch) instead of the date", apply(at2010, FIX));
        report(out, there, "the date of the report (2027-03-01) instead of the observation",
            apply(ConversionChain.builder().from(CoordinateSystem.ecef(StandardFrames.ITRF2020))
                .to(CoordinateSystem.ecef(StandardFrames.ETRF2000)).epoch(Epoch.from(LocalDate.of(2027, 3, 1)))
                .build(), FIX));
        // The EUREF set is position vector; entering the same numbers as coordinate frame rotates the other way.
        EcefPosition itrf2014 = apply(ConversionChain.builder().from(CoordinateSystem.ecef(StandardFrames.ITRF2020))
            .to(CoordinateSystem.ecef(StandardFrames.ITRF2014)).epoch(epoch).build(), FIX);
        HelmertParameters euref = euref(registry).timeDependentHelmert().orElseThrow().parametersAt(epoch);
        report(out, there, "the EUREF set entered as coordinate-frame rotation",
            Helmert.coordinateFrame(euref).apply(itrf2014));
        report(out, there, "no frame change at all (ITRF2020 taken as ETRF2000)", FIX);
        out.println("   An epoch error of months costs millimetres; of years, centimetres to decimetres;");
        out.println("   a wrong rotation convention or a skipped step costs decimetres to metres.");
        out.println();

        ConversionChain toEd50 = ConversionChain.builder().from(CoordinateSystem.ecef(StandardFrames.ITRF2020))
            .to(CoordinateSystem.geodetic(StandardFrames.ED50)).epoch(epoch).build();
        double[] ed50 = toEd50.convert(FIX.x(), FIX.y(), FIX.z());
        double dNorth = Math.toRadians(ed50[0] - etrfGeo.latitude()) * grs80.meridianRadius(etrfGeo.latitude());
        double dEast = Math.toRadians(ed50[1] - etrfGeo.longitude()) * grs80.primeVerticalRadius(etrfGeo.latitude())
            * Math.cos(Math.toRadians(etrfGeo.latitude()));
        out.println("4. ITRF2020 -> ED50 for the old charts (via WGS 84, taken as ITRF2020 at this epoch):");
        out.println(f("     latitude %.9f deg, longitude %.9f deg, height %.3f m (International 1924)", ed50[0],
            ed50[1], ed50[2]));
        out.println(f("     the same point's ED50 latitude and longitude differ from its ETRF2000 ones by"));
        out.println(f("     %.1f m north and %.1f m east: plotting one as the other misplaces it by %.1f m.",
            dNorth, dEast, Math.hypot(dNorth, dEast)));
        out.println(f("     Expected accuracy of this chain: %s (ED50's published set is a regional mean).",
            StepListing.accuracyText(java.util.OptionalDouble.of(toEd50.accuracyMetres()))));
        // The registry's ED50 → WGS 84 translations, reversed, by Molodensky's formulas (EPSG 9604) on geodetic
        // coordinates instead of the geocentric route: the difference is the formulas' first-order approximation.
        FrameLink ed50Link = registry.links().stream().filter(l -> l.from().equals(StandardFrames.ED50)
            && l.to().equals(StandardFrames.WGS84)).findFirst().orElseThrow();
        HelmertParameters t = ed50Link.parameters().orElseThrow();
        double[] wgs = ConversionChain.builder().from(CoordinateSystem.ecef(StandardFrames.ITRF2020))
            .to(CoordinateSystem.geodetic(StandardFrames.WGS84)).epoch(epoch).build().convert(FIX.x(), FIX.y(), FIX.z());
        double[] mol = ConversionChain.builder().from(CoordinateSystem.geodetic(StandardFrames.WGS84))
            .to(CoordinateSystem.geodetic(StandardFrames.ED50)).molodensky(Molodensky.of(StandardFrames.WGS84.ellipsoid(),
                StandardFrames.ED50.ellipsoid(), -t.tx(), -t.ty(), -t.tz()), ed50Link.source(), ed50Link.accuracyMetres())
            .build().convert(wgs[0], wgs[1], wgs[2]);
        EcefConverter onIntl = EcefConverter.of(StandardFrames.ED50.ellipsoid());
        double apart = onIntl.toEcef(GeodeticPosition.of(mol[0], mol[1], mol[2]))
            .distanceTo(onIntl.toEcef(GeodeticPosition.of(ed50[0], ed50[1], ed50[2])));
        out.println(f("     Molodensky's formulas (EPSG 9604, geotick coord --molodensky) with the same"));
        out.println(f("     translations land %.3f m from this geocentric result: their first-order approximation.",
            apart));
        out.println();

        out.println("5. The ITRF2020 -> ETRF2000 steps, as 'geotick coord --explain' lists them:");
        List<ExplainedStep> steps = new ArrayList<>();
        toEtrf.steps().forEach(d -> steps.add(ExplainedStep.of(d)));
        for (String line : StepListing.text(steps, java.util.OptionalDouble.of(toEtrf.accuracyMetres())).split("\\R")) {
            out.println("   " + line);
        }
        out.println("   The same from the command line:");
        out.println(f("     geotick coord --from ecef@ITRF2020 --to geodetic@ETRF2000 --epoch %s --explain \\",
            OBSERVED));
        out.println(f("       %.3f %.3f %.3f", FIX.x(), FIX.y(), FIX.z()));
    }

    private static FrameLink euref(FrameRegistry r) {
        return r.links().stream().filter(l -> l.from().equals(StandardFrames.ITRF2014)
            && l.to().equals(StandardFrames.ETRF2000)).findFirst().orElseThrow();
    }

    private static EcefPosition apply(ConversionChain c, EcefPosition p) {
        double[] r = c.convert(p.x(), p.y(), p.z());
        return EcefPosition.of(r[0], r[1], r[2]);
    }

    private static void report(PrintWriter out, LocalFrame correct, String what, EcefPosition wrong) {
        Enu d = correct.toEnu(wrong);
        out.println(f("     %-62s %7.3f m", what + ":", Math.sqrt(d.east() * d.east() + d.north() * d.north()
            + d.up() * d.up())));
    }

    private static String f(String format, Object... args) {
        return String.format(Locale.ROOT, format, args);
    }
}
