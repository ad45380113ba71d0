package io.geotick.cli.coord;

import io.geotick.cli.UserInputException;
import io.geotick.geodesy.InvalidCoordinateException;
import io.geotick.geodesy.position.GeodeticPosition;
import io.geotick.transforms.epsg.EpsgSystem;
import io.geotick.transforms.epsg.EpsgSystems;
import io.geotick.transforms.epsg.UnknownEpsgCodeException;
import io.geotick.transforms.fit.SiteModel;
import io.geotick.transforms.frames.Frame;
import io.geotick.transforms.frames.FrameRegistry;
import io.geotick.transforms.frames.UnknownFrameException;
import io.geotick.transforms.projection.ProjectionDomainException;
import io.geotick.transforms.projection.Utm;

/**
 * Reads SYS text into a {@link CoordinateSystemSpec}. This is the only class that knows the SYS syntax:
 * <pre>
 *   SYS    = BASE | BASE "@" FRAME
 *   BASE   = KIND | KIND ":" LAT "," LON "," H
 *   KIND   = geodetic | ecef | enu | ned | aer | geodetic-orthometric     (case ignored)
 *   BASE   = utm | utm:ZONE | ups:N | ups:S | EPSG:CODE                       (map grids, EPSG systems)
 *   FRAME  = a name or alias of the frame registry (geotick frames), e.g. ITRF2020, ETRF2000, OSGB36
 * </pre>
 * An EPSG system implies its frame: the registry frame its datum matches, else a frame for the datum as
 * Proj4J defines it ({@link io.geotick.transforms.epsg.EpsgSystems#registryFrame}); {@code EPSG:n@FRAME}
 * names the realisation instead and must be on the system's ellipsoid.
 * Local kinds (enu, ned, aer) need the origin, geodetic (LAT, LON in degrees, H in metres); the others
 * take none. The {@code @} split is done first, so a map-grid kind with its own parameters
 * ({@code utm:31N@ED50}) fits the same rule. Every error is a {@link UserInputException} quoting the text.
 */
final class SystemSpecParser {
    private SystemSpecParser() {
    }

    static CoordinateSystemSpec parse(String text) {
        return parse(text, FrameRegistry.standard());
    }

    static CoordinateSystemSpec parse(String text, FrameRegistry registry) {
        if (text == null || text.isBlank()) {
            throw new UserInputException("coordinate system is empty; known: " + SystemKind.knownSyntax());
        }
        String t = text.strip();
        int at = t.indexOf('@');
        if (at < 0) {
            return parseBase(text, t, registry);
        }
        String frameName = t.substring(at + 1).strip();
        if (frameName.isEmpty()) {
            throw new UserInputException("coordinate system '" + text + "': the frame after '@' is empty; "
                + "write e.g. ecef@ITRF2020 (geotick frames lists the frames)");
        }
        if (at == 0) {
            throw new UserInputException("coordinate system '" + text + "' has a frame but no kind; write e.g. "
                + "geodetic@" + frameName);
        }
        Frame f;
        try {
            f = registry.frame(frameName);
        } catch (UnknownFrameException e) {
            throw new UserInputException("coordinate system '" + text + "': " + e.getMessage(), e);
        }
        CoordinateSystemSpec base = parseBase(text, t.substring(0, at).strip(), registry);
        if (base.epsg().isPresent() && !base.epsg().get().ellipsoid().equals(f.ellipsoid())) {
            throw new UserInputException("coordinate system '" + text + "': frame " + f.name() + " is on "
                + f.ellipsoid().name() + " but " + base.epsg().get().name() + " is on "
                + base.epsg().get().ellipsoid().name() + "; leave out @" + frameName + " (the code implies its datum)"
                + " or name a frame on " + base.epsg().get().ellipsoid().name());
        }
        return base.withFrame(f);
    }

    private static CoordinateSystemSpec parseBase(String text, String t, FrameRegistry registry) {
        int colon = t.indexOf(':');
        String word = (colon < 0 ? t : t.substring(0, colon)).strip();
        String param = colon < 0 ? "" : t.substring(colon + 1).strip();
        switch (word.toLowerCase(java.util.Locale.ROOT)) {
            case "utm":
                if (colon < 0) {
                    return CoordinateSystemSpec.grid(SystemKind.UTM, java.util.Optional.empty());
                }
                try {
                    return CoordinateSystemSpec.grid(SystemKind.UTM, java.util.Optional.of(Utm.parse(param).zoneName()));
                } catch (ProjectionDomainException e) {
                    throw new UserInputException("coordinate system '" + text + "': " + e.getMessage(), e);
                }
            case "ups":
                if (!param.equalsIgnoreCase("N") && !param.equalsIgnoreCase("S")) {
                    throw new UserInputException("coordinate system '" + text + "': UPS needs its pole, ups:N or "
                        + "ups:S" + (colon < 0 ? "" : " (got '" + param + "')"));
                }
                return CoordinateSystemSpec.grid(SystemKind.UPS,
                    java.util.Optional.of(param.toUpperCase(java.util.Locale.ROOT)));
            case "epsg":
                EpsgSystem s;
                try {
                    s = EpsgSystems.parse(t);
                } catch (UnknownEpsgCodeException e) {
                    throw new UserInputException("coordinate system '" + text + "': " + e.getMessage(), e);
                }
                Frame implied = EpsgSystems.registryFrame(s, registry).orElseGet(() -> EpsgSystems.datumFrame(s));
                return CoordinateSystemSpec.epsg(s, implied);
            case "site":
                return site(text, param, registry);
            default:
                break;
        }
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

    /** A site grid from its model file; the model's source system is parsed by the same rules. */
    private static CoordinateSystemSpec site(String text, String file, FrameRegistry registry) {
        if (file.isEmpty()) {
            throw new UserInputException("coordinate system '" + text + "' needs the model file: site:FILE.json "
                + "(written by geotick fit -o)");
        }
        // Unreadable file: UncheckedIOException (exit 3); invalid content: SiteModelFormatException (exit 4).
        SiteModel m = SiteModel.read(java.nio.file.Path.of(file));
        if (m.sourceSystem().isBlank()) {
            throw new UserInputException("coordinate system '" + text + "': the model states no source system; fit "
                + "it again with geotick fit --from SYS");
        }
        CoordinateSystemSpec source;
        try {
            source = parse(m.sourceSystem(), registry);
        } catch (UserInputException e) {
            throw new io.geotick.transforms.fit.SiteModelFormatException(file + ": source_system '" + m.sourceSystem()
                + "' is not usable: " + e.getMessage(), e);
        }
        if (source.site().isPresent() || (source.kind() == SystemKind.UTM && source.grid().isEmpty())) {
            throw new io.geotick.transforms.fit.SiteModelFormatException(file + ": source_system '" + m.sourceSystem()
                + "' must be a fixed system (not a site grid, not utm without a zone)");
        }
        return CoordinateSystemSpec.site(new CoordinateSystemSpec.Site(file, m, source));
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
