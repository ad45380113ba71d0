package io.geotick.geodesy.position;

import io.geotick.geodesy.InvalidCoordinateException;

/**
 * Geodetic coordinates on an ellipsoid: latitude and longitude in degrees, ellipsoidal height in metres.
 * The ellipsoid is not part of the value; the converter or frame that uses it supplies it.
 *
 * <p>Validation: latitude in [−90°, 90°]; longitude finite in [−360°, 360°] (kept as given, not
 * normalised); height finite. Anything else is an {@link InvalidCoordinateException} naming the value.
 *
 * @param latitude geodetic latitude φ, degrees, positive north
 * @param longitude longitude λ, degrees, positive east of Greenwich
 * @param height ellipsoidal height h, metres above the ellipsoid
 */
public record GeodeticPosition(double latitude, double longitude, double height) {

    public GeodeticPosition {
        checkLatitude(latitude);
        checkLongitude(longitude);
        checkHeight(height);
    }

    /** The position at latitude, longitude (degrees) and ellipsoidal height (metres). */
    public static GeodeticPosition of(double latitude, double longitude, double height) {
        return new GeodeticPosition(latitude, longitude, height);
    }

    /** The position on the ellipsoid surface (h = 0). */
    public static GeodeticPosition of(double latitude, double longitude) {
        return new GeodeticPosition(latitude, longitude, 0.0);
    }

    /** This position with another height. */
    public GeodeticPosition withHeight(double newHeight) {
        return new GeodeticPosition(latitude, longitude, newHeight);
    }

    /** Latitude in radians. */
    public double latitudeRadians() {
        return Math.toRadians(latitude);
    }

    /** Longitude in radians. */
    public double longitudeRadians() {
        return Math.toRadians(longitude);
    }

    /** Throws unless the latitude is a number in [−90°, 90°]; returns it. */
    public static double checkLatitude(double latitude) {
        if (!(latitude >= -90.0 && latitude <= 90.0)) {
            throw new InvalidCoordinateException("latitude " + latitude + "° is outside [-90°, 90°]");
        }
        return latitude;
    }

    /** Throws unless the longitude is a number in [−360°, 360°]; returns it. */
    public static double checkLongitude(double longitude) {
        if (!(longitude >= -360.0 && longitude <= 360.0)) {
            throw new InvalidCoordinateException("longitude " + longitude + "° is outside [-360°, 360°]");
        }
        return longitude;
    }

    /** Throws unless the height is finite; returns it. */
    public static double checkHeight(double height) {
        if (!Double.isFinite(height)) {
            throw new InvalidCoordinateException("height " + height + " m is not a finite number");
        }
        return height;
    }
}
