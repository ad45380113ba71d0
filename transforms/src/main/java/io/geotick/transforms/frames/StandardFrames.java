package io.geotick.transforms.frames;

import io.geotick.geodesy.ellipsoid.Ellipsoids;
import io.geotick.transforms.Epoch;
import io.geotick.transforms.helmert.HelmertParameters;
import io.geotick.transforms.helmert.RotationConvention;
import io.geotick.transforms.helmert.TimeDependentHelmert;
import java.time.LocalDate;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * The frames and parameter sets of the built-in registry ({@link FrameRegistry#standard()}).
 *
 * <p>Every value below was entered from memory of the cited publication, not copied from the document
 * at hand, and says so in its source text; EPSG codes likewise. The reference tests check them against
 * independent computations and Proj4J; before relying on one for production work, compare it with the
 * publication of your geodetic authority.
 *
 * <ul>
 *   <li>ITRF2020 → ITRF2014 / ITRF2008 / ITRF2005 / ITRF2000: IERS ITRS Centre (IGN), transformation
 *       parameters from ITRF2020 to past ITRFs, epoch 2015.0, position-vector convention (EPSG 1053).</li>
 *   <li>ITRF2014 → ETRF2000: EUREF Technical Note 1 (Altamimi), epoch 2010.0, position vector.</li>
 *   <li>WGS 84 ↔ ITRF: WGS 84 taken as the ITRF realisation it was aligned to at the coordinate epoch
 *       (G1150 ≈ ITRF2000 from 2002-01-20, G1674/G1762 ≈ ITRF2008 from 2012-02-08, G2139 ≈ ITRF2014
 *       from 2021-01-03, G2296 ≈ ITRF2020 from 2024-01-07), with that approximation's size as a caution.</li>
 *   <li>WGS 72 → WGS 84, ED50 → WGS 84, OSGB 1936 → WGS 84, NAD27 → WGS 84: the classic published sets.</li>
 * </ul>
 */
public final class StandardFrames {
    public static final Frame ITRF2020 = new Frame("ITRF2020", List.of("ITRF 2020"), FrameKind.GLOBAL,
        Ellipsoids.GRS80, OptionalInt.of(9988), "International Terrestrial Reference Frame 2020 (IERS)");
    public static final Frame ITRF2014 = new Frame("ITRF2014", List.of("ITRF 2014"), FrameKind.GLOBAL,
        Ellipsoids.GRS80, OptionalInt.of(7789), "International Terrestrial Reference Frame 2014 (IERS)");
    public static final Frame ITRF2008 = new Frame("ITRF2008", List.of("ITRF 2008"), FrameKind.GLOBAL,
        Ellipsoids.GRS80, OptionalInt.of(5332), "International Terrestrial Reference Frame 2008 (IERS)");
    public static final Frame ITRF2005 = new Frame("ITRF2005", List.of("ITRF 2005"), FrameKind.GLOBAL,
        Ellipsoids.GRS80, OptionalInt.of(4896), "International Terrestrial Reference Frame 2005 (IERS)");
    public static final Frame ITRF2000 = new Frame("ITRF2000", List.of("ITRF 2000"), FrameKind.GLOBAL,
        Ellipsoids.GRS80, OptionalInt.of(4919), "International Terrestrial Reference Frame 2000 (IERS)");
    public static final Frame WGS84 = new Frame("WGS 84", List.of("WGS84", "EPSG:4978"), FrameKind.GLOBAL,
        Ellipsoids.WGS84, OptionalInt.of(4326),
        "World Geodetic System 1984 (NGA), aligned to the ITRF of its realisation's date");
    public static final Frame ETRF2000 = new Frame("ETRF2000", List.of("ETRF 2000", "ETRS89/ETRF2000"),
        FrameKind.PLATE_FIXED, Ellipsoids.GRS80, OptionalInt.of(7930),
        "European Terrestrial Reference Frame 2000 (EUREF), fixed to the stable part of the Eurasian plate");
    public static final Frame WGS72 = new Frame("WGS 72", List.of("WGS72"), FrameKind.STATIC, Ellipsoids.WGS72,
        OptionalInt.of(4322), "World Geodetic System 1972");
    public static final Frame ED50 = new Frame("ED50", List.of("European Datum 1950"), FrameKind.STATIC,
        Ellipsoids.INTERNATIONAL_1924, OptionalInt.of(4230), "European Datum 1950");
    public static final Frame OSGB36 = new Frame("OSGB 1936", List.of("OSGB36"), FrameKind.STATIC,
        Ellipsoids.AIRY_1830, OptionalInt.of(4277), "Ordnance Survey of Great Britain 1936");
    public static final Frame NAD27 = new Frame("NAD27", List.of("North American Datum 1927"), FrameKind.STATIC,
        Ellipsoids.CLARKE_1866, OptionalInt.of(4267), "North American Datum 1927");

    private static final String IGN = "IERS ITRS Centre (IGN), transformation parameters from ITRF2020 to past"
        + " ITRFs, position-vector convention, t0 = 2015.0 (values from memory)";
    /** EPSG records transformations between these frames (from memory); their codes were not at hand to check. */
    private static final String NO_EPSG_CODE = "EPSG transformation code not recorded here: not verified";
    private static final Epoch T2015 = Epoch.of(2015.0);

    static final FrameRegistry REGISTRY = build();

    private StandardFrames() {
    }

    private static FrameLink itrf(Frame to, double[] p, double[] r, double accuracy) {
        return FrameLink.timeDependent(ITRF2020, to, TimeDependentHelmert.of(
            HelmertParameters.ofMillimetres(p[0], p[1], p[2], 0, 0, 0, p[3]),
            HelmertParameters.ofMillimetres(r[0], r[1], r[2], 0, 0, 0, r[3]), T2015,
            RotationConvention.POSITION_VECTOR), 0, IGN + "; table row " + to.name() + "; " + NO_EPSG_CODE, accuracy);
    }

    private static FrameRegistry build() {
        FrameRegistry.Builder b = FrameRegistry.builder();
        for (Frame f : List.of(ITRF2020, ITRF2014, ITRF2008, ITRF2005, ITRF2000, WGS84, ETRF2000, WGS72, ED50,
                OSGB36, NAD27)) {
            b.add(f);
        }
        // IGN table (mm, ppb; rotations and their rates are zero in all four rows). Accuracy: the
        // parameters' stated uncertainties are a few tenths of a mm; the frames agree at the few-mm level.
        b.add(itrf(ITRF2014, new double[] {-1.4, -0.9, 1.4, -0.42}, new double[] {0.0, -0.1, 0.2, 0.00}, 0.003));
        b.add(itrf(ITRF2008, new double[] {0.2, 1.0, 3.3, -0.29}, new double[] {0.0, -0.1, 0.1, 0.03}, 0.003));
        b.add(itrf(ITRF2005, new double[] {2.7, 0.1, -1.4, 0.65}, new double[] {0.3, -0.1, 0.1, 0.03}, 0.005));
        b.add(itrf(ITRF2000, new double[] {-0.2, 0.8, -34.2, 2.25}, new double[] {0.1, 0.0, -1.7, 0.11}, 0.01));
        b.add(FrameLink.timeDependent(ITRF2014, ETRF2000, TimeDependentHelmert.of(
            HelmertParameters.ofMillimetres(54.7, 52.2, -74.1, 1.701, 10.290, -16.632, 2.12),
            HelmertParameters.ofMillimetres(0.1, 0.1, -1.9, 0.081, 0.490, -0.792, 0.11), Epoch.of(2010.0),
            RotationConvention.POSITION_VECTOR), 0,
            "EUREF Technical Note 1 (Altamimi), ITRF2014 → ETRF2000, t0 = 2010.0 (values from memory); "
                + NO_EPSG_CODE, 0.01,
            "ETRF2000 is tied to the Eurasian plate; outside its stable part (e.g. across plate boundaries)"
                + " coordinates drift by cm/yr relative to it"));
        String align = "WGS 84 realisations and their ITRF alignment as published by NGA (dates from memory)";
        String caution = "WGS 84 is treated as identical to the ITRF realisation it was aligned to at the"
            + " coordinate epoch; NGA states agreement at about 1-2 cm rms for G1762 onward and about 10 cm for"
            + " G1150; positions computed with broadcast orbits are only as good as those (~1 m)";
        b.add(FrameLink.alignmentByDate(WGS84, ITRF2000, Epoch.from(LocalDate.of(2002, 1, 20)),
            Optional.of(Epoch.from(LocalDate.of(2012, 2, 8))), align + " (G1150 ≈ ITRF2000)", 0.1, caution));
        b.add(FrameLink.alignmentByDate(WGS84, ITRF2008, Epoch.from(LocalDate.of(2012, 2, 8)),
            Optional.of(Epoch.from(LocalDate.of(2021, 1, 3))), align + " (G1674/G1762 ≈ ITRF2008)", 0.02,
            caution));
        b.add(FrameLink.alignmentByDate(WGS84, ITRF2014, Epoch.from(LocalDate.of(2021, 1, 3)),
            Optional.of(Epoch.from(LocalDate.of(2024, 1, 7))), align + " (G2139 ≈ ITRF2014)", 0.02, caution));
        b.add(FrameLink.alignmentByDate(WGS84, ITRF2020, Epoch.from(LocalDate.of(2024, 1, 7)), Optional.empty(),
            align + " (G2296 ≈ ITRF2020)", 0.02, caution));
        // DMA/NIMA TR8350.2 set (ds = 0.2263 ppm). The IOGP Guidance Note 7-2 worked example uses
        // ds = 0.219 ppm instead; the two differ by 0.0073 ppm, up to 5 cm at the Earth's surface.
        b.add(FrameLink.helmert(WGS72, WGS84, HelmertParameters.of(0, 0, 4.5, 0, 0, 0.554, 0.2263),
            RotationConvention.POSITION_VECTOR, 1237,
            "EPSG transformation 1237, WGS 72 to WGS 84 (1), from NIMA TR8350.2 (values and code from memory;"
                + " the values agree with the EPSG-derived definitions bundled with Proj4J)", 2.0));
        b.add(FrameLink.geocentricTranslations(ED50, WGS84, -87, -98, -121, 1133,
            "EPSG transformation 1133, ED50 to WGS 84 (1), DMA mean for western Europe (values and code from"
                + " memory)", 10.0,
            "a regional mean: residual distortions of the ED50 network reach several metres"));
        b.add(FrameLink.helmert(OSGB36, WGS84, HelmertParameters.of(446.448, -125.157, 542.06, 0.15, 0.247,
            0.842, -20.489), RotationConvention.POSITION_VECTOR, 1314,
            "EPSG transformation 1314, OSGB36 to WGS 84 (6), Ordnance Survey (values and code from memory)", 2.0,
            "a single Helmert set for Great Britain: the national grid-based transformation is needed for"
                + " better than ~2 m"));
        b.add(FrameLink.geocentricTranslations(NAD27, WGS84, -8, 160, 176, 1173,
            "EPSG transformation 1173, NAD27 to WGS 84 (4), DMA mean for the contiguous United States (values"
                + " and code from memory)", 10.0,
            "a continental mean: NAD27 distortions reach 10 m; grid-based transformations do much better"));
        return b.build();
    }
}
