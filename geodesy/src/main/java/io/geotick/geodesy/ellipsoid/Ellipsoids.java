package io.geotick.geodesy.ellipsoid;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * The catalogue of named ellipsoids. Each entry carries its defining constants exactly as published and
 * names its source; EPSG ellipsoid codes are given for lookup. Where a source document was not at hand
 * when the entry was written, the entry's source says the constants are from memory: the reference tests
 * check them against the EPSG dataset as carried by Proj4J and against NGA.STND.0036 for WGS 84.
 *
 * <p>Lookup ({@link #byName}) ignores case, spaces, hyphens and underscores, and accepts EPSG codes
 * ({@code "EPSG:7030"}) and a few common aliases ({@code "Hayford"} for International 1924).
 */
public final class Ellipsoids {
    /** WGS 84: a = 6 378 137 m, 1/f = 298.257 223 563. Source: NGA.STND.0036 (EPSG 7030). */
    public static final Ellipsoid WGS84 = Ellipsoid.ofInverseFlattening("WGS 84", 6378137.0, 298.257223563,
        "NGA.STND.0036 v1.0.0 (2014), WGS 84 defining parameters; EPSG ellipsoid 7030");
    /**
     * GRS 80: a = 6 378 137 m, 1/f = 298.257 222 101 (1/f is derived from the defining J₂ and rounded as
     * the EPSG dataset carries it). Source: Moritz, Geodetic Reference System 1980 (EPSG 7019).
     */
    public static final Ellipsoid GRS80 = Ellipsoid.ofInverseFlattening("GRS 1980", 6378137.0, 298.257222101,
        "Moritz, Geodetic Reference System 1980, Bulletin Geodesique 54 (1980); EPSG ellipsoid 7019");
    /** WGS 72: a = 6 378 135 m, 1/f = 298.26 (EPSG 7043, from memory). */
    public static final Ellipsoid WGS72 = Ellipsoid.ofInverseFlattening("WGS 72", 6378135.0, 298.26,
        "EPSG ellipsoid 7043 (constants from memory)");
    /** International 1924 (Hayford 1909): a = 6 378 388 m, 1/f = 297 (EPSG 7022). */
    public static final Ellipsoid INTERNATIONAL_1924 = Ellipsoid.ofInverseFlattening("International 1924",
        6378388.0, 297.0, "Hayford (1909), adopted by the IUGG in 1924; EPSG ellipsoid 7022 (from memory)");
    /** Clarke 1866: a = 6 378 206.4 m, b = 6 356 583.8 m, defined by its axes (EPSG 7008). */
    public static final Ellipsoid CLARKE_1866 = Ellipsoid.ofSemiAxes("Clarke 1866", 6378206.4, 6356583.8,
        "Clarke (1866), defined by a and b; EPSG ellipsoid 7008 (from memory)");
    /** Clarke 1880 (RGS): a = 6 378 249.145 m, 1/f = 293.465 (EPSG 7012). */
    public static final Ellipsoid CLARKE_1880_RGS = Ellipsoid.ofInverseFlattening("Clarke 1880 (RGS)",
        6378249.145, 293.465, "Clarke (1880), RGS variant; EPSG ellipsoid 7012 (from memory)");
    /** Bessel 1841: a = 6 377 397.155 m, 1/f = 299.152 812 8 (EPSG 7004). */
    public static final Ellipsoid BESSEL_1841 = Ellipsoid.ofInverseFlattening("Bessel 1841", 6377397.155,
        299.1528128, "Bessel (1841); EPSG ellipsoid 7004 (from memory)");
    /** Airy 1830: a = 6 377 563.396 m, b = 6 356 256.909 m, defined by its axes (EPSG 7001). */
    public static final Ellipsoid AIRY_1830 = Ellipsoid.ofSemiAxes("Airy 1830", 6377563.396, 6356256.909,
        "Ordnance Survey, A Guide to Coordinate Systems in Great Britain; EPSG ellipsoid 7001 (from memory)");
    /** Airy Modified 1849: a = 6 377 340.189 m, b = 6 356 034.447 m (EPSG 7002). */
    public static final Ellipsoid AIRY_MODIFIED_1849 = Ellipsoid.ofSemiAxes("Airy Modified 1849",
        6377340.189, 6356034.447, "Ordnance Survey Ireland; EPSG ellipsoid 7002 (from memory)");
    /** Krassovsky 1940: a = 6 378 245 m, 1/f = 298.3 (EPSG 7024). */
    public static final Ellipsoid KRASSOVSKY_1940 = Ellipsoid.ofInverseFlattening("Krassovsky 1940",
        6378245.0, 298.3, "Krassovsky (1940); EPSG ellipsoid 7024 (from memory)");
    /** GRS 1967: a = 6 378 160 m, 1/f = 298.247 167 427 (EPSG 7036). */
    public static final Ellipsoid GRS67 = Ellipsoid.ofInverseFlattening("GRS 1967", 6378160.0, 298.247167427,
        "IAG Geodetic Reference System 1967; EPSG ellipsoid 7036 (from memory)");
    /** The sphere of radius 6 378 137 m used by Web Mercator (EPSG 7059). */
    public static final Ellipsoid WGS84_SPHERE = Ellipsoid.sphere("WGS 84 sphere", 6378137.0,
        "sphere of radius a of WGS 84, as used by Popular Visualisation Pseudo-Mercator; EPSG ellipsoid 7059");

    private static final Map<String, Ellipsoid> BY_KEY;
    private static final List<Ellipsoid> ALL = List.of(WGS84, GRS80, WGS72, INTERNATIONAL_1924, CLARKE_1866,
        CLARKE_1880_RGS, BESSEL_1841, AIRY_1830, AIRY_MODIFIED_1849, KRASSOVSKY_1940, GRS67, WGS84_SPHERE);

    static {
        Map<String, Ellipsoid> m = new LinkedHashMap<>();
        for (Ellipsoid e : ALL) {
            m.put(key(e.name()), e);
        }
        alias(m, WGS84, "EPSG:7030");
        alias(m, GRS80, "GRS80", "EPSG:7019");
        alias(m, WGS72, "EPSG:7043");
        alias(m, INTERNATIONAL_1924, "Hayford", "Hayford 1909", "intl", "EPSG:7022");
        alias(m, CLARKE_1866, "EPSG:7008");
        alias(m, CLARKE_1880_RGS, "Clarke 1880", "EPSG:7012");
        alias(m, BESSEL_1841, "Bessel", "EPSG:7004");
        alias(m, AIRY_1830, "Airy", "EPSG:7001");
        alias(m, AIRY_MODIFIED_1849, "EPSG:7002");
        alias(m, KRASSOVSKY_1940, "Krasovsky 1940", "Krassowsky 1940", "EPSG:7024");
        alias(m, GRS67, "GRS67", "EPSG:7036");
        alias(m, WGS84_SPHERE, "EPSG:7059");
        BY_KEY = Collections.unmodifiableMap(m);
    }

    private Ellipsoids() {
    }

    private static void alias(Map<String, Ellipsoid> m, Ellipsoid e, String... names) {
        for (String n : names) {
            m.put(key(n), e);
        }
    }

    private static String key(String name) {
        return name.toLowerCase(Locale.ROOT).replaceAll("[\\s_\\-]", "");
    }

    /** Every catalogued ellipsoid, in a stable order. */
    public static List<Ellipsoid> all() {
        return ALL;
    }

    /**
     * The catalogued ellipsoid of that name, alias or EPSG code.
     *
     * @throws UnknownEllipsoidException if none matches; the message lists the known names
     */
    public static Ellipsoid byName(String name) {
        Ellipsoid e = name == null ? null : BY_KEY.get(key(name));
        if (e == null) {
            StringBuilder known = new StringBuilder();
            for (Ellipsoid k : ALL) {
                known.append(known.length() == 0 ? "" : ", ").append(k.name());
            }
            throw new UnknownEllipsoidException("unknown ellipsoid '" + name + "'; known: " + known);
        }
        return e;
    }
}
