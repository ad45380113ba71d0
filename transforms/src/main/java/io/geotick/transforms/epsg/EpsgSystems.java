package io.geotick.transforms.epsg;

import io.geotick.geodesy.ellipsoid.Ellipsoid;
import io.geotick.geodesy.ellipsoid.Ellipsoids;
import io.geotick.geodesy.position.EcefPosition;
import io.geotick.transforms.StepDescription.Parameter;
import io.geotick.transforms.frames.Frame;
import io.geotick.transforms.frames.FrameKind;
import io.geotick.transforms.frames.FrameLink;
import io.geotick.transforms.frames.FrameRegistry;
import io.geotick.transforms.frames.FrameStep;
import io.geotick.transforms.helmert.Helmert;
import io.geotick.transforms.helmert.HelmertParameters;
import io.geotick.transforms.helmert.RotationConvention;
import io.geotick.transforms.projection.Hemisphere;
import io.geotick.transforms.projection.LambertConformalConic;
import io.geotick.transforms.projection.MapProjection;
import io.geotick.transforms.projection.PolarStereographic;
import io.geotick.transforms.projection.TransverseMercator;
import io.geotick.transforms.projection.WebMercator;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.concurrent.ConcurrentHashMap;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.locationtech.proj4j.CRSFactory;
import org.locationtech.proj4j.CoordinateReferenceSystem;
import org.locationtech.proj4j.UnsupportedParameterException;
import org.locationtech.proj4j.datum.Datum;
import org.locationtech.proj4j.proj.ExtendedTransverseMercatorProjection;
import org.locationtech.proj4j.proj.LambertConformalConicProjection;
import org.locationtech.proj4j.proj.LongLatProjection;
import org.locationtech.proj4j.proj.MercatorProjection;
import org.locationtech.proj4j.proj.Projection;
import org.locationtech.proj4j.proj.StereographicAzimuthalProjection;
import org.locationtech.proj4j.proj.TransverseMercatorProjection;
import org.locationtech.proj4j.units.Units;

/**
 * EPSG coordinate reference systems through Proj4J's bundled EPSG definitions, read with its Java API
 * ({@code CRSFactory}, the projection object and its parameters, the datum's shift to WGS 84).
 * Thread-safe; systems are cached.
 *
 * <p>The projection is mapped to the project's own implementation when the method is one of:
 * Transverse Mercator (EPSG 9807, including Proj4J's UTM variant), Lambert Conic Conformal 1SP/2SP
 * (9801/9802), polar stereographic variant A (9810, latitude of true scale at the pole) and
 * Pseudo-Mercator (1024, EPSG:3857). Those are more accurate than Proj4J's (its Transverse Mercator is a
 * lower-order series: 1 mm within 3° of the central meridian, centimetres beyond; the differences are
 * recorded in the reference tests). Any other method keeps Proj4J's projection object, with scale and
 * convergence by numerical differentiation and an accuracy stated as Proj4J's, not measured here.
 *
 * <p>Parameters that Proj4J stores in radians come back in degrees with a rounding residue
 * (2.9999999999999916° for 3°); a value within 1e-12° of a multiple of 1e-9° is snapped to it.
 *
 * <p><b>Units.</b> A system defined in another unit than the metre (US survey feet for most US State Plane
 * grids, international feet, Clarke's links …) gets that {@link LinearUnit}: its {@link EpsgSystem#projection()}
 * gives and takes eastings and northings in the unit. The projection itself computes in metres: Proj4J's
 * definitions hold the false easting and northing in metres whatever the unit (for EPSG:2263 x₀ is
 * 300 000.0000000001 m = 984 250 ftUS), and Proj4J's own projection multiplies its metre result, false
 * origin included, by its metres-to-unit factor (checked in the reference tests: its results for EPSG:2263
 * and EPSG:2222 are in feet). The unit is read from the definition's unit name (metre, international foot,
 * US survey foot exactly as published) or its decimal length in metres (taken exactly as given, named from
 * the EPSG unit table); it must agree with Proj4J's factor to 1e-12. A unit name that Proj4J does not resolve
 * (it would take the values as metres, as for EPSG:3140's links) is refused. Heights stay metres: the
 * definitions Proj4J can read have no vertical unit (it refuses those that do).
 */
public final class EpsgSystems {
    private static final Pattern CODE = Pattern.compile("(?i)\\s*EPSG\\s*:\\s*(\\d{1,9})\\s*");
    private static final double ARC_SECONDS_PER_RADIAN = 180 * 3600 / Math.PI;
    private static final CRSFactory FACTORY = new CRSFactory();
    private static final Map<Integer, EpsgSystem> CACHE = new ConcurrentHashMap<>();
    private static final String PROJ4J_ACCURACY = "computed by Proj4J's own projection (no in-house "
        + "implementation of this method); accuracy is Proj4J's, not measured here: expect millimetres, not "
        + "nanometres; scale and convergence by numerical differentiation (1e-12 relative)";

    private EpsgSystems() {
    }

    /**
     * Reads {@code "EPSG:n"} (case and spaces around the colon ignored).
     *
     * @throws UnknownEpsgCodeException if the text is not of that form or the code is unknown, naming it
     */
    public static EpsgSystem parse(String text) {
        Matcher m = CODE.matcher(text == null ? "" : text);
        if (!m.matches()) {
            throw new UnknownEpsgCodeException("'" + text + "' is not an EPSG code; write EPSG:n, e.g. EPSG:27700");
        }
        return byCode(Integer.parseInt(m.group(1)));
    }

    /**
     * The system of that EPSG code.
     *
     * @throws UnknownEpsgCodeException naming the code, if Proj4J's EPSG definitions do not have it or it
     *     is neither projected nor geographic
     */
    public static EpsgSystem byCode(int code) {
        EpsgSystem s = CACHE.get(code);
        if (s == null) {
            s = read(code);
            CACHE.put(code, s);
        }
        return s;
    }

    /** Serialised: Proj4J's factory and its EPSG file reader make no thread-safety promise. */
    private static synchronized EpsgSystem read(int code) {
        CoordinateReferenceSystem crs;
        try {
            crs = FACTORY.createFromName("EPSG:" + code);
        } catch (UnsupportedParameterException e) {
            // Proj4J's parser refuses what it cannot model, notably a vertical unit (compound systems such as
            // EPSG:7407, NAD27 / Texas North + NGVD29 height in US survey feet).
            boolean vertical = String.valueOf(e.getMessage()).contains("vunits");
            throw new UnknownEpsgCodeException("EPSG:" + code + " is in the EPSG definitions bundled with Proj4J, "
                + "but Proj4J cannot read it" + (vertical ? ": it is a compound system with a vertical part in its"
                + " own unit; use the code of its horizontal system" : " (" + e.getMessage() + ")"));
        } catch (RuntimeException e) {
            throw new UnknownEpsgCodeException("unknown EPSG code " + code + ": not in the EPSG definitions "
                + "bundled with Proj4J");
        }
        if (crs == null || crs.getProjection() == null) {
            throw new UnknownEpsgCodeException("unknown EPSG code " + code + ": not in the EPSG definitions "
                + "bundled with Proj4J");
        }
        Projection p = crs.getProjection();
        // EPSG:3857 is defined on WGS 84; Proj4J models its spherical formulas with a sphere of radius a.
        Ellipsoid ellipsoid = code == 3857 ? Ellipsoids.WGS84 : ellipsoid(p.getEllipsoid());
        Datum d = crs.getDatum();
        Optional<HelmertParameters> shift = toWgs84(d);
        List<String> cautions = new ArrayList<>();
        if (p instanceof LongLatProjection) {
            return new EpsgSystem(code, EpsgSystem.Kind.GEOGRAPHIC, ellipsoid, d.getName(), shift, Optional.empty(),
                Optional.empty(), LinearUnit.METRE, cautions);
        }
        LinearUnit unit = unit(code, crs.getParameters(), p.getFromMetres());
        Mapped m = map(code, p, ellipsoid);
        if (!m.method.inHouse()) {
            cautions.addAll(m.method.cautions());
        }
        ProjectionMethod method = unit.isMetre() ? m.method : inUnit(m.method, unit, p);
        return new EpsgSystem(code, EpsgSystem.Kind.PROJECTED, ellipsoid, d.getName(), shift,
            Optional.of(m.projection), Optional.of(method), unit, cautions);
    }

    /**
     * Units of the decimal lengths the EPSG definitions bundled with Proj4J give as "metres per unit": the
     * names are those of the EPSG unit-of-measure table (from memory); the lengths are Proj4J's decimals
     * exactly, which is what its own results use.
     */
    private static final Map<String, String[]> DECIMAL_UNITS = Map.ofEntries(
        Map.entry("0.3047972654", new String[] {"Clarke's foot", "ftCla"}),
        Map.entry("0.9143917962", new String[] {"Clarke's yard", "ydCla"}),
        Map.entry("0.201166195164", new String[] {"Clarke's link", "lkCla"}),
        Map.entry("0.3047997101815088", new String[] {"Gold Coast foot", "ftGC"}),
        Map.entry("0.3047994715386762", new String[] {"British foot (Sears 1922)", "ftSe"}),
        Map.entry("0.9143984146160287", new String[] {"British yard (Sears 1922)", "ydSe"}),
        Map.entry("20.11676512155263", new String[] {"British chain (Sears 1922)", "chSe"}),
        Map.entry("20.116756", new String[] {"British chain (Sears 1922 truncated)", "chSeT"}),
        Map.entry("20.11678249437587", new String[] {"British chain (Benoit 1895 B)", "chBnB"}),
        Map.entry("0.9143985307444408", new String[] {"Indian yard", "ydInd"}),
        Map.entry("1.0000135965", new String[] {"German legal metre", "GLM"}));

    /**
     * The grid unit of a definition, from its unit name or its decimal length in metres (which takes
     * precedence, as in Proj4J's parser); checked against the factor Proj4J computes with.
     *
     * @throws UnknownEpsgCodeException for a unit name Proj4J does not resolve (it would silently take the
     *     values as metres), or a unit that disagrees with Proj4J's factor
     */
    static LinearUnit unit(int code, String[] parameters, double proj4jFromMetres) {
        String unitName = null;
        String toMeter = null;
        for (String s : parameters == null ? new String[0] : parameters) {
            String t = s.startsWith("+") ? s.substring(1) : s;
            if (t.startsWith("units=")) {
                unitName = t.substring("units=".length());
            } else if (t.startsWith("to_meter=")) {
                toMeter = t.substring("to_meter=".length());
            }
        }
        String from = "EPSG:" + code + " in the EPSG definitions bundled with Proj4J";
        LinearUnit u;
        if (toMeter != null) {
            String key;
            try {
                key = new java.math.BigDecimal(toMeter).stripTrailingZeros().toPlainString();
            } catch (NumberFormatException e) {
                throw new UnknownEpsgCodeException(from + " gives its unit as '" + toMeter + "' m, not a number");
            }
            String[] named = DECIMAL_UNITS.get(key);
            u = "0.3048".equals(key) ? LinearUnit.INTERNATIONAL_FOOT : "1".equals(key) ? LinearUnit.METRE
                : named != null ? LinearUnit.ofDecimal(named[0], named[1], key, key + " m as given for " + from
                    + " (the unit's name from memory of the EPSG unit table)")
                : LinearUnit.ofDecimal("unit of " + key + " m", "u" + key, key, key + " m as given for " + from);
        } else if (unitName == null || unitName.equals("m")) {
            u = LinearUnit.METRE;
        } else if (unitName.equals("ft")) {
            u = LinearUnit.INTERNATIONAL_FOOT;
        } else if (unitName.equals("us-ft")) {
            u = LinearUnit.US_SURVEY_FOOT;
        } else if (unitName.equals("km")) {
            u = LinearUnit.ofRatio("kilometre", "km", 1000, 1, "1000 m (SI, common practice)");
        } else {
            org.locationtech.proj4j.units.Unit pu = Units.findUnits(unitName);
            if (pu == Units.METRES && !unitName.equals("metre") && !unitName.equals("metres")) {
                throw new UnknownEpsgCodeException("EPSG:" + code + " is defined, in the EPSG definitions bundled with"
                    + " Proj4J, in the unit '" + unitName + "', which Proj4J does not convert (it would give the values"
                    + " as metres); geotick does not guess the unit");
            }
            String v = new java.math.BigDecimal(Double.toString(pu.value)).stripTrailingZeros().toPlainString();
            u = LinearUnit.ofDecimal(pu.name, pu.abbreviation, v, v + " m: Proj4J's value for its unit '" + unitName
                + "', used by " + from);
        }
        if (Math.abs(u.metresPerUnit() * proj4jFromMetres - 1) > 1e-12) {
            throw new UnknownEpsgCodeException(from + ": its unit " + u + " disagrees with the factor Proj4J computes"
                + " with (" + (1 / proj4jFromMetres) + " m per unit)");
        }
        return u;
    }

    /**
     * The method of a system in another unit than the metre: the parameters of the computation in metres,
     * then the false easting and northing in the unit (as the EPSG dataset states them) and the unit's length;
     * a caution says how the values are converted.
     */
    private static ProjectionMethod inUnit(ProjectionMethod m, LinearUnit u, Projection p) {
        List<Parameter> ps = new ArrayList<>(m.parameters());
        ps.add(new Parameter("false easting in the grid unit", u.fromMetres(p.getFalseEasting()), u.symbol()));
        ps.add(new Parameter("false northing in the grid unit", u.fromMetres(p.getFalseNorthing()), u.symbol()));
        ps.add(new Parameter("grid unit: 1 " + u.symbol() + " (" + u.name() + ", " + u.definition() + " m exactly)",
            u.metresPerUnit(), "m"));
        List<String> cautions = new ArrayList<>(m.cautions());
        cautions.add("eastings and northings are in the grid unit " + u.symbol() + " (" + u.name() + ", "
            + u.definition() + " m): computed in metres, then divided by the exact length of the unit (one rounding,"
            + " half an ulp); heights stay in metres");
        return new ProjectionMethod(m.method(), m.epsgMethod(), ps, m.source() + "; unit: " + u.source(),
            m.accuracyMetres(), cautions, m.inHouse());
    }

    private record Mapped(MapProjection projection, ProjectionMethod method) {
    }

    private static Mapped map(int code, Projection p, Ellipsoid e) {
        double lat0 = snap(p.getProjectionLatitudeDegrees());
        double lon0 = snap(p.getProjectionLongitudeDegrees());
        double k0 = p.getScaleFactor();
        double fe = p.getFalseEasting();
        double fn = p.getFalseNorthing();
        String where = "EPSG:" + code + " parameters from the EPSG definitions bundled with Proj4J";
        if (p instanceof TransverseMercatorProjection || p instanceof ExtendedTransverseMercatorProjection) {
            // Proj4J's two Transverse Mercator classes (plain and the extended one it uses for UTM) are the
            // same method with these parameters.
            TransverseMercator tm = TransverseMercator.of(e, lon0, k0, fe, fn, lat0);
            return new Mapped(tm, new ProjectionMethod(ProjectionMethod.TM_METHOD, OptionalInt.of(9807), List.of(
                new Parameter("latitude of natural origin", lat0, "degree"),
                new Parameter("longitude of natural origin", lon0, "degree"),
                new Parameter("scale factor at natural origin", k0, ""),
                new Parameter("false easting", fe, "m"), new Parameter("false northing", fn, "m")),
                ProjectionMethod.TM_SOURCE + "; " + where, 5e-9, List.of(ProjectionMethod.TM_ACCURACY), true));
        }
        if (p instanceof LambertConformalConicProjection) {
            double lat1 = snap(p.getProjectionLatitude1Degrees());
            double lat2 = snap(p.getProjectionLatitude2Degrees());
            String closed = "closed formulas: rounding only (below 1 nm)";
            if (lat1 == lat2 && lat1 == lat0) {
                return new Mapped(LambertConformalConic.oneStandardParallel(e, lat0, lon0, k0, fe, fn),
                    new ProjectionMethod("Lambert Conic Conformal (1SP), closed formulas", OptionalInt.of(9801),
                        List.of(new Parameter("latitude of natural origin", lat0, "degree"),
                            new Parameter("longitude of natural origin", lon0, "degree"),
                            new Parameter("scale factor at natural origin", k0, ""),
                            new Parameter("false easting", fe, "m"), new Parameter("false northing", fn, "m")),
                        "IOGP Guidance Note 7-2 (EPSG method 9801); " + where, 0, List.of(closed), true));
            }
            if (k0 == 1.0) {
                return new Mapped(LambertConformalConic.twoStandardParallels(e, lat0, lon0, lat1, lat2, fe, fn),
                    new ProjectionMethod("Lambert Conic Conformal (2SP), closed formulas", OptionalInt.of(9802),
                        List.of(new Parameter("latitude of false origin", lat0, "degree"),
                            new Parameter("longitude of false origin", lon0, "degree"),
                            new Parameter("latitude of 1st standard parallel", lat1, "degree"),
                            new Parameter("latitude of 2nd standard parallel", lat2, "degree"),
                            new Parameter("easting at false origin", fe, "m"),
                            new Parameter("northing at false origin", fn, "m")),
                        "IOGP Guidance Note 7-2 (EPSG method 9802); " + where, 0, List.of(closed), true));
            }
        }
        if (p instanceof StereographicAzimuthalProjection && Math.abs(lat0) == 90
                && Math.abs(snap(p.getTrueScaleLatitudeDegrees())) == 90) {
            Hemisphere pole = lat0 > 0 ? Hemisphere.NORTH : Hemisphere.SOUTH;
            return new Mapped(PolarStereographic.variantA(e, pole, lon0, k0, fe, fn),
                new ProjectionMethod("Polar Stereographic (variant A), closed formulas", OptionalInt.of(9810),
                    List.of(new Parameter("latitude of natural origin", lat0, "degree"),
                        new Parameter("longitude of natural origin", lon0, "degree"),
                        new Parameter("scale factor at natural origin", k0, ""),
                        new Parameter("false easting", fe, "m"), new Parameter("false northing", fn, "m")),
                    "IOGP Guidance Note 7-2 (EPSG method 9810); " + where, 0,
                    List.of("closed formulas: rounding only (below 1 nm)"), true));
        }
        if (p instanceof MercatorProjection && code == 3857) {
            return new Mapped(WebMercator.wgs84(), new ProjectionMethod("Popular Visualisation Pseudo-Mercator,"
                + " closed formulas", OptionalInt.of(1024), List.of(
                    new Parameter("longitude of natural origin", 0, "degree"),
                    new Parameter("false easting", 0, "m"), new Parameter("false northing", 0, "m")),
                "IOGP Guidance Note 7-2 (EPSG method 1024); " + where, 0, List.of("Pseudo-Mercator is not"
                    + " conformal: spherical formulas on ellipsoidal latitudes make the meridian scale exceed the"
                    + " parallel scale by up to 0.67 % (at the equator); 'scale' is the parallel scale"), true));
        }
        String method = p.getName() == null ? p.getClass().getSimpleName() : p.getName();
        String name = "EPSG:" + code + " (" + p + ", Proj4J)";
        return new Mapped(new Proj4jProjection(p, e, name), new ProjectionMethod("Proj4J projection '" + method
            + "' (" + p + "); not implemented in-house", OptionalInt.empty(), List.of(
                new Parameter("latitude of origin", lat0, "degree"), new Parameter("longitude of origin", lon0,
                    "degree"), new Parameter("scale factor", k0, ""), new Parameter("false easting", fe, "m"),
                new Parameter("false northing", fn, "m")), where, 0.001, List.of(PROJ4J_ACCURACY), false));
    }

    /** Proj4J stores angles in radians: undo the conversion's rounding residue. */
    static double snap(double degrees) {
        double r = Math.rint(degrees * 1e9) / 1e9;
        return Math.abs(r - degrees) < 1e-12 ? r + 0.0 : degrees;
    }

    /**
     * The catalogued ellipsoid with the same axes (a within 0.1 mm, b within 2 mm), else one from Proj4J's.
     * The tolerance on b admits Proj4J's Airy 1830, whose b is 6 356 256.910 m against EPSG's 6 356 256.909 m;
     * the catalogued (EPSG) axes are then used, a difference below 1 mm in position (reference tests).
     */
    static Ellipsoid ellipsoid(org.locationtech.proj4j.datum.Ellipsoid pe) {
        double a = pe.getEquatorRadius();
        double e2 = pe.getEccentricitySquared();
        double b = a * Math.sqrt(1 - e2);
        // The closest in b: WGS 84 and GRS 1980 differ by only 0.1 mm there.
        Ellipsoid best = null;
        for (Ellipsoid e : Ellipsoids.all()) {
            if (Math.abs(e.semiMajorAxis() - a) < 1e-4 && Math.abs(e.semiMinorAxis() - b) < 0.002
                    && (e2 == 0) == (e.eccentricitySquared() == 0)
                    && (best == null || Math.abs(e.semiMinorAxis() - b) < Math.abs(best.semiMinorAxis() - b))) {
                best = e;
            }
        }
        if (best != null) {
            return best;
        }
        String source = "axes from the EPSG definitions bundled with Proj4J";
        return e2 == 0 ? Ellipsoid.sphere(pe.getName(), a, source)
            : Ellipsoid.ofSemiAxes(pe.getName(), a, a * Math.sqrt(1 - e2), source);
    }

    /** Proj4J keeps rotations in radians and the scale as 1 + ds·1e-6; the Helmert types want arc-seconds and ppm. */
    private static Optional<HelmertParameters> toWgs84(Datum d) {
        double[] t = d.getTransformToWGS84();
        if (t == null || (t.length != 3 && t.length != 7)) {
            return Optional.empty();
        }
        if (t.length == 3) {
            return Optional.of(HelmertParameters.ofTranslation(t[0], t[1], t[2]));
        }
        return Optional.of(HelmertParameters.of(t[0], t[1], t[2], t[3] * ARC_SECONDS_PER_RADIAN,
            t[4] * ARC_SECONDS_PER_RADIAN, t[5] * ARC_SECONDS_PER_RADIAN, (t[6] - 1) * 1e6));
    }

    /**
     * The registry frame of the system's datum, where one matches: WGS 84 for a WGS 84 datum (and for
     * EPSG:3857), else a frame on the same ellipsoid whose registry set to WGS 84 moves test points to within
     * 1 mm of Proj4J's shift (so both give the same chain). A zero shift on another ellipsoid (ETRS89, NAD83,
     * GDA94 … as Proj4J defines them) matches nothing: those frames drift from WGS 84 and the caller should
     * name one.
     */
    public static Optional<Frame> registryFrame(EpsgSystem s, FrameRegistry registry) {
        Frame wgs84 = registry.frame("WGS 84");
        if (s.code() == 3857 || (s.ellipsoid().equals(Ellipsoids.WGS84) && "WGS84".equals(s.datumName()))) {
            return Optional.of(wgs84);
        }
        if (s.toWgs84().isEmpty()) {
            return Optional.empty();
        }
        Helmert mine = Helmert.positionVector(s.toWgs84().get());
        for (FrameLink l : registry.links()) {
            if (l.requiresEpoch() || (l.kind() != FrameLink.Kind.HELMERT
                    && l.kind() != FrameLink.Kind.GEOCENTRIC_TRANSLATIONS)) {
                continue;
            }
            boolean forward = l.to().equals(wgs84);
            Frame datum = forward ? l.from() : l.to();
            if ((!forward && !l.from().equals(wgs84)) || !datum.ellipsoid().equals(s.ellipsoid())) {
                continue;
            }
            FrameStep step = l.resolve(forward, Optional.empty());
            if (sameShift(mine, step)) {
                return Optional.of(datum);
            }
        }
        return Optional.empty();
    }

    private static boolean sameShift(Helmert mine, FrameStep step) {
        double[][] points = {{3_980_000, -10_000, 4_970_000}, {4_200_000, 1_200_000, 4_600_000},
            {-2_700_000, -4_300_000, 3_800_000}};
        for (double[] q : points) {
            EcefPosition p = EcefPosition.of(q[0], q[1], q[2]);
            EcefPosition a = mine.apply(p);
            EcefPosition b = step.transform().apply(p);
            if (Math.sqrt(sq(a.x() - b.x()) + sq(a.y() - b.y()) + sq(a.z() - b.z())) > 0.001) {
                return false;
            }
        }
        return true;
    }

    private static double sq(double v) {
        return v * v;
    }

    /**
     * A frame for a datum that matches no registry frame, named after the system, on its ellipsoid; join it
     * to the registry with {@link #datumLink}.
     */
    public static Frame datumFrame(EpsgSystem s) {
        return Frame.of("datum of " + s.name(), FrameKind.STATIC, s.ellipsoid(), s.code(), "the datum of " + s.name()
            + " as defined in the EPSG definitions bundled with Proj4J (" + s.datumName() + ", " + s.ellipsoid().name()
            + ")");
    }

    /**
     * The link from {@link #datumFrame} to the registry's WGS 84: Proj4J's shift (position vector), or empty
     * if the definition has none. Its accuracy is not stated by Proj4J; it is entered as 0 and callers should
     * show it as not stated.
     */
    public static Optional<FrameLink> datumLink(EpsgSystem s, FrameRegistry registry) {
        if (s.toWgs84().isEmpty()) {
            return Optional.empty();
        }
        HelmertParameters h = s.toWgs84().get();
        String src = "shift to WGS 84 of " + s.name() + " from the EPSG definitions bundled with Proj4J";
        FrameLink l = h.isTranslationOnly()
            ? FrameLink.geocentricTranslations(datumFrame(s), registry.frame("WGS 84"), h.tx(), h.ty(), h.tz(), 0, src,
                0)
            : FrameLink.helmert(datumFrame(s), registry.frame("WGS 84"), h, RotationConvention.POSITION_VECTOR, 0, src,
                0);
        return Optional.of(l);
    }

    /** The shift as text for messages: "tx 446.448 m, ty …, ds -20.489 ppm (position vector)". */
    public static String shiftText(HelmertParameters h) {
        if (h.isTranslationOnly()) {
            return String.format(Locale.ROOT, "tx %s m, ty %s m, tz %s m (geocentric translations)", n(h.tx()),
                n(h.ty()), n(h.tz()));
        }
        return String.format(Locale.ROOT, "tx %s m, ty %s m, tz %s m, rx %s\", ry %s\", rz %s\", ds %s ppm"
            + " (position vector)", n(h.tx()), n(h.ty()), n(h.tz()), n(h.rx()), n(h.ry()), n(h.rz()), n(h.ds()));
    }

    private static String n(double v) {
        return new java.math.BigDecimal(v).round(new java.math.MathContext(9)).stripTrailingZeros().toPlainString();
    }
}
