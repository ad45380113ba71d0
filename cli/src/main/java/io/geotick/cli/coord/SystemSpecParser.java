package io.geotick.cli.coord;

import io.geotick.cli.UserInputException;
import io.geotick.geodesy.InvalidCoordinateException;
import io.geotick.geodesy.position.GeodeticPosition;

/**
 * Reads SYS text into a {@link CoordinateSystemSpec}. This is the only class that knows the SYS syntax:
 * <pre>
 *   SYS    = KIND | KIND ":" LAT "," LON "," H
 *   KIND   = geodetic | ecef | enu | ned | aer        (case ignored)
 * </pre>
 * Local kinds (enu, ned, aer) need the origin, geodetic (LAT, LON in degrees, H in metres); the others
 * take none. Every error is a {@link UserInputException} quoting the text.
 *
 * <p>FRAME PLUG-IN POINT: reference frames will be written {@code SYS@FRAME}; the {@code @} split is
 * done first, below, and today refuses any frame.
 */
final class SystemSpecParser {
    private SystemSpecParser() {
    }

    static CoordinateSystemSpec parse(String text) {
        if (text == null || text.isBlank()) {
            throw new UserInputException("coordinate system is empty; known: " + SystemKind.knownSyntax());
        }
        String t = text.strip();
        int at = t.indexOf('@');
        if (at >= 0) {
            throw new UserInputException("coordinate system '" + text + "': reference frames ('@"
                + t.substring(at + 1) + "') are not supported yet; known: " + SystemKind.knownSyntax());
        }
        int colon = t.indexOf(':');
        String word = (colon < 0 ? t : t.substring(0, colon)).strip();
        SystemKind kind = SystemKind.byWord(word).orElseThrow(() -> new UserInputException(
            "unknown coordinate system '" + text + "'; known: " + SystemKind.knownSyntax()));
        if (!kind.needsOrigin()) {
            if (colon >= 0) {
                throw new UserInputException("coordinate system '" + text + "': " + kind.word()
                    + " takes no parameters; write '" + kind.word() + "'");
            }
            return CoordinateSystemSpec.of(kind);
        }
        if (colon < 0) {
            throw new UserInputException("coordinate system '" + text + "' needs its origin: " + kind.syntax()
                + " (latitude and longitude in degrees, height in metres)");
        }
        return CoordinateSystemSpec.local(kind, origin(text, t.substring(colon + 1)));
    }

    private static GeodeticPosition origin(String text, String params) {
        String[] parts = params.split(",", -1);
        if (parts.length != 3) {
            throw new UserInputException("coordinate system '" + text + "': the origin needs 3 values "
                + "LAT,LON,H, got " + parts.length);
        }
        try {
            double lat = NumberArgs.angle("origin latitude", parts[0].strip());
            double lon = NumberArgs.angle("origin longitude", parts[1].strip());
            double h = NumberArgs.length("origin height", parts[2].strip());
            return GeodeticPosition.of(lat, lon, h);
        } catch (UserInputException e) {
            throw new UserInputException("coordinate system '" + text + "': " + e.getMessage(), e);
        } catch (InvalidCoordinateException e) {
            throw new UserInputException("coordinate system '" + text + "': origin " + e.getMessage(), e);
        }
    }
}
