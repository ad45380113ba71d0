package io.geotick.reference.transforms;

import static org.assertj.core.api.Assertions.assertThat;

import io.geotick.transforms.chain.ConversionChain;
import io.geotick.transforms.chain.CoordinateSystem;
import io.geotick.transforms.frames.Frame;
import io.geotick.transforms.frames.StandardFrames;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.locationtech.proj4j.BasicCoordinateTransform;
import org.locationtech.proj4j.CRSFactory;
import org.locationtech.proj4j.CoordinateReferenceSystem;
import org.locationtech.proj4j.ProjCoordinate;

/** Full geodetic → geodetic chains through the registry against Proj4J's datum transformation. */
class ChainReferenceTest {

    @Test
    void classicDatumsToWgs84AgreeWithProj4j() {
        // Source: Proj4J 1.4.1 (reference library) with the same published parameter sets (from memory):
        // ED50 EPSG 1133, OSGB 1936 EPSG 1314, NAD27 EPSG 1173, WGS 72 EPSG 1237.
        check(StandardFrames.ED50, Proj4jReference.geographic("intl", -87, -98, -121, 0, 0, 0, 0));
        // Proj4J's "airy" carries b = 6356256.910 m, rounded from EPSG 7001's 6356256.909 m (a 1 mm
        // difference that shows as ~1 mm here), so the axes are given explicitly.
        check(StandardFrames.OSGB36, Proj4jReference.geographic("6377563.396,6356256.909", 446.448, -125.157, 542.06, 0.15, 0.247,
            0.842, -20.489));
        check(StandardFrames.NAD27, Proj4jReference.geographic("clrk66", -8, 160, 176, 0, 0, 0, 0));
        check(StandardFrames.WGS72, Proj4jReference.geographic("WGS72", 0, 0, 4.5, 0, 0, 0.554, 0.219));
    }

    private static void check(Frame frame, CoordinateReferenceSystem source) {
        CoordinateReferenceSystem wgs84 = new CRSFactory().createFromName("EPSG:4326");
        BasicCoordinateTransform proj = new BasicCoordinateTransform(source, wgs84);
        ConversionChain ours = ConversionChain.builder().from(CoordinateSystem.geodetic(frame))
            .to(CoordinateSystem.geodetic(StandardFrames.WGS84)).build();
        Random r = new Random(3);
        double worstHorizontal = 0;
        for (int i = 0; i < 500; i++) {
            double lat = -80 + 160 * r.nextDouble();
            double lon = -179 + 358 * r.nextDouble();
            double[] o = ours.convert(lat, lon, 0);
            ProjCoordinate p = proj.transform(new ProjCoordinate(lon, lat, 0), new ProjCoordinate());
            double dn = (o[0] - p.y) * 111_000;
            double de = (o[1] - p.x) * 111_000 * Math.cos(Math.toRadians(lat));
            worstHorizontal = Math.max(worstHorizontal, Math.hypot(dn, de));
        }
        // Agreement stated: the same formulas; Proj4J's iterative ECEF → geodetic stops at about 1e-12 rad
        // (≈ 6e-6 m), so the bound is 1e-5 m horizontally.
        assertThat(worstHorizontal).as("worst horizontal difference to Proj4J for " + frame + ", m")
            .isLessThan(1e-5);
    }
}
