package io.geotick.transforms.projection;

import io.geotick.geodesy.ellipsoid.Ellipsoid;
import io.geotick.geodesy.ellipsoid.Ellipsoids;
import io.geotick.geodesy.position.GeodeticPosition;
import java.util.Locale;
import java.util.Objects;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * A Universal Transverse Mercator zone: Transverse Mercator ({@link TransverseMercator}, the 6th-order
 * Krüger series) with k₀ = 0.9996, central meridian λ₀ = 6°·zone − 183°, false easting 500 000 m, and
 * false northing 0 m (north) or 10 000 000 m (south). Immutable and thread-safe.
 *
 * <p>Zone rules (the UTM grid definition, NGA/DMA TM 8358.2; common practice):
 * <ul>
 *   <li>zones 1–60 of 6° from 180°W eastward: zone = ⌊(λ + 180°)/6°⌋ + 1, with λ = 180° in zone 1
 *       (the same meridian as −180°);</li>
 *   <li>Norway: zone 32 is widened to 3°E–12°E for 56°N ≤ φ &lt; 64°N (band V), so 31V covers only
 *       0°–3°E;</li>
 *   <li>Svalbard, 72°N ≤ φ ≤ 84°N (band X): zones 31X (0°–9°E), 33X (9°–21°E), 35X (21°–33°E) and
 *       37X (33°–42°E); 32X, 34X and 36X are not used;</li>
 *   <li>latitude bands of 8° lettered C…X from 80°S (I and O omitted), band X 12° tall (72°–84°N);</li>
 *   <li>UTM limits 80°S ≤ φ ≤ 84°N; beyond them use {@link Ups}.</li>
 * </ul>
 *
 * <p>Explicit zones: a zone may be asked for any point within {@value #MAX_DISTANCE_FROM_CM}° of its
 * central meridian (the zone's own 3° half-width plus the widened Norway/Svalbard zones and a neighbour
 * zone's worth of overlap); farther points are refused with a {@link ProjectionDomainException}, since
 * a coordinate so far from its zone is almost always a wrong zone, and its scale error exceeds 1%.
 * Points across the equator are accepted in either hemisphere's zone (negative northings in a northern
 * zone, northings above 10 000 000 m in a southern one), as used for data that straddle the equator.
 */
public final class Utm extends KernelProjection {
    /** k₀ of every UTM zone. */
    public static final double SCALE_FACTOR = 0.9996;
    /** False easting, metres. */
    public static final double FALSE_EASTING = 500_000.0;
    /** False northing of southern zones, metres. */
    public static final double FALSE_NORTHING_SOUTH = 10_000_000.0;
    /** Southern UTM limit, degrees. */
    public static final double MIN_LATITUDE = -80.0;
    /** Northern UTM limit, degrees. */
    public static final double MAX_LATITUDE = 84.0;
    /** How far from the central meridian an explicit zone is accepted, degrees. */
    public static final double MAX_DISTANCE_FROM_CM = 9.0;

    private static final String BANDS = "CDEFGHJKLMNPQRSTUVWX";
    private static final Pattern ZONE = Pattern.compile("\\s*(\\d{1,2})\\s*([A-Za-z])\\s*");
    /** Rounding slack on latitudes that come back from the inverse, degrees (~1 µm). */
    private static final double INVERSE_SLACK = 1e-8;

    private final int zone;
    private final Hemisphere hemisphere;
    private final TransverseMercator tm;

    private Utm(int zone, Hemisphere hemisphere, Ellipsoid ellipsoid) {
        this.zone = zone;
        this.hemisphere = hemisphere;
        this.tm = TransverseMercator.named(ellipsoid, centralMeridianOf(zone), SCALE_FACTOR, FALSE_EASTING,
            hemisphere == Hemisphere.SOUTH ? FALSE_NORTHING_SOUTH : 0.0,
            "UTM zone " + zone + hemisphere.letter() + " (" + ellipsoid.name() + ")");
    }

    /**
     * UTM zone {@code zone} on WGS 84.
     *
     * @throws ProjectionDomainException if the zone is not in 1–60
     */
    public static Utm zone(int zone, Hemisphere hemisphere) {
        return zone(zone, hemisphere, Ellipsoids.WGS84);
    }

    /** UTM zone {@code zone} on another ellipsoid (e.g. International 1924 for ED50 grids). */
    public static Utm zone(int zone, Hemisphere hemisphere, Ellipsoid ellipsoid) {
        checkZone(zone);
        return new Utm(zone, Objects.requireNonNull(hemisphere, "hemisphere"),
            Objects.requireNonNull(ellipsoid, "ellipsoid"));
    }

    /**
     * A zone from text such as {@code "31N"} or {@code "33S"}: the number 1–60 and the hemisphere letter
     * N or S. MGRS-style band letters are not accepted, since N and S are also band letters (band S lies
     * in the northern hemisphere); the message says so.
     *
     * @throws ProjectionDomainException naming the text
     */
    public static Utm parse(String text) {
        return parse(text, Ellipsoids.WGS84);
    }

    /** {@link #parse(String)} on another ellipsoid. */
    public static Utm parse(String text, Ellipsoid ellipsoid) {
        Matcher m = ZONE.matcher(text == null ? "" : text);
        if (!m.matches()) {
            throw new ProjectionDomainException("UTM zone '" + text + "' is not a zone number 1-60 followed by "
                + "N or S, e.g. 31N");
        }
        int zone = Integer.parseInt(m.group(1));
        char h = m.group(2).toUpperCase(Locale.ROOT).charAt(0);
        if (h != 'N' && h != 'S') {
            throw new ProjectionDomainException("UTM zone '" + text + "': '" + m.group(2) + "' is not N or S "
                + "(give the hemisphere, not a latitude band letter)");
        }
        checkZone(zone);
        return zone(zone, h == 'N' ? Hemisphere.NORTH : Hemisphere.SOUTH, ellipsoid);
    }

    /** The zone and hemisphere for a point, with the Norway and Svalbard exceptions, on WGS 84. */
    public static Utm forPosition(double latitude, double longitude) {
        return forPosition(latitude, longitude, Ellipsoids.WGS84);
    }

    /** {@link #forPosition(double, double)} on another ellipsoid. */
    public static Utm forPosition(double latitude, double longitude, Ellipsoid ellipsoid) {
        return zone(zoneNumber(latitude, longitude), Hemisphere.ofLatitude(latitude), ellipsoid);
    }

    /** {@link #forPosition(double, double)} for a geodetic position. */
    public static Utm forPosition(GeodeticPosition position) {
        return forPosition(position.latitude(), position.longitude());
    }

    /**
     * The UTM zone number 1–60 of a point, with the Norway and Svalbard exceptions.
     *
     * @throws ProjectionDomainException if the latitude is outside 80°S–84°N or a value is not a number
     */
    public static int zoneNumber(double latitude, double longitude) {
        checkLatitude(latitude);
        Checks.longitude(longitude);
        double lon = Math.IEEEremainder(longitude, 360.0);
        if (lon == 180.0) {
            lon = -180.0;
        }
        int zone = (int) Math.floor((lon + 180.0) / 6.0) + 1;
        if (zone > 60) {
            zone = 60;
        }
        if (latitude >= 56.0 && latitude < 64.0 && lon >= 3.0 && lon < 12.0) {
            return 32;
        }
        if (latitude >= 72.0 && lon >= 0.0 && lon < 42.0) {
            if (lon < 9.0) {
                return 31;
            } else if (lon < 21.0) {
                return 33;
            } else if (lon < 33.0) {
                return 35;
            } else {
                return 37;
            }
        }
        return zone;
    }

    /**
     * The latitude band letter C…X (8° bands from 80°S, X spanning 72°–84°N).
     *
     * @throws ProjectionDomainException outside 80°S–84°N
     */
    public static char latitudeBand(double latitude) {
        checkLatitude(latitude);
        int i = (int) Math.floor((latitude + 80.0) / 8.0);
        return BANDS.charAt(Math.min(i, BANDS.length() - 1));
    }

    /** The central meridian of a zone, degrees: 6°·zone − 183°. */
    public static double centralMeridianOf(int zone) {
        checkZone(zone);
        return 6.0 * zone - 183.0;
    }

    private static void checkZone(int zone) {
        if (zone < 1 || zone > 60) {
            throw new ProjectionDomainException("UTM zone " + zone + " is outside 1-60");
        }
    }

    private static void checkLatitude(double latitude) {
        Checks.latitude(latitude); // not a latitude at all (91°, NaN) before "beyond the UTM limits"
        if (!(latitude >= MIN_LATITUDE && latitude <= MAX_LATITUDE)) {
            throw new ProjectionDomainException("latitude " + latitude + "° is outside the UTM limits "
                + "80°S to 84°N (use UPS beyond them)");
        }
    }

    /** The zone number 1–60. */
    public int zone() {
        return zone;
    }

    /** The hemisphere (which false northing applies). */
    public Hemisphere hemisphere() {
        return hemisphere;
    }

    /** The zone as text, e.g. {@code "31N"}; {@link #parse} reads it back. */
    public String zoneName() {
        return Integer.toString(zone) + hemisphere.letter();
    }

    /** The central meridian, degrees. */
    public double centralMeridian() {
        return tm.centralMeridian();
    }

    /** The underlying Transverse Mercator. */
    public TransverseMercator transverseMercator() {
        return tm;
    }

    /**
     * The EPSG code of this zone on WGS 84: 32600 + zone (north) or 32700 + zone (south).
     *
     * @throws ProjectionDomainException if the ellipsoid is not WGS 84 (no single code applies)
     */
    public int epsgCode() {
        if (!tm.ellipsoid().equals(Ellipsoids.WGS84)) {
            throw new ProjectionDomainException("no EPSG code for UTM on " + tm.ellipsoid().name()
                + " without naming the datum");
        }
        return (hemisphere == Hemisphere.NORTH ? 32600 : 32700) + zone;
    }

    @Override
    public String name() {
        return tm.name();
    }

    @Override
    public Ellipsoid ellipsoid() {
        return tm.ellipsoid();
    }

    @Override
    void forward(double latitude, double longitude, double[] out, int off, boolean full) {
        checkPoint(latitude, longitude);
        tm.forward(latitude, longitude, out, off, full);
    }

    @Override
    void inverse(double easting, double northing, double[] out, int off) {
        tm.inverse(easting, northing, out, off);
        double lat = out[off];
        double dlon = Checks.deltaLongitude(out[off + 1], tm.centralMeridian());
        if (!(lat >= MIN_LATITUDE - INVERSE_SLACK && lat <= MAX_LATITUDE + INVERSE_SLACK)
                || Math.abs(dlon) > MAX_DISTANCE_FROM_CM + INVERSE_SLACK) {
            throw new ProjectionDomainException("grid point (E " + easting + ", N " + northing + ") in zone "
                + zoneName() + " maps to (" + lat + "°, " + out[off + 1] + "°), outside the zone's domain "
                + "(80°S-84°N, within " + MAX_DISTANCE_FROM_CM
                + "° of the central meridian)");
        }
    }

    private void checkPoint(double latitude, double longitude) {
        checkLatitude(latitude);
        Checks.longitude(longitude);
        double dlon = Checks.deltaLongitude(longitude, tm.centralMeridian());
        if (!(Math.abs(dlon) <= MAX_DISTANCE_FROM_CM)) {
            throw new ProjectionDomainException("longitude " + longitude + "° is " + Math.abs(dlon)
                + "° from the central meridian " + tm.centralMeridian() + "° of UTM zone " + zoneName()
                + "; at most " + MAX_DISTANCE_FROM_CM + "° is accepted (wrong zone?)");
        }
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Utm && ((Utm) o).zone == zone && ((Utm) o).hemisphere == hemisphere
            && ((Utm) o).ellipsoid().equals(ellipsoid());
    }

    @Override
    public int hashCode() {
        return Objects.hash(zone, hemisphere, ellipsoid());
    }

    @Override
    public String toString() {
        return name();
    }
}
