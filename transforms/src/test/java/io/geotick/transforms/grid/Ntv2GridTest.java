package io.geotick.transforms.grid;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import io.geotick.transforms.chain.ConversionChain;
import io.geotick.transforms.chain.CoordinateSystem;
import io.geotick.transforms.frames.StandardFrames;
import java.io.UncheckedIOException;
import java.nio.ByteOrder;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class Ntv2GridTest {
    /** One 2 × 2 subgrid, 40°..41°N, 0°..1°W, constant shifts 1″ north and 2″ west. */
    private static byte[] constant(String parent, int extraNodes) {
        float[][][] nodes = new float[2][2 + extraNodes][];
        for (float[][] row : nodes) {
            for (int c = 0; c < row.length; c++) {
                row[c] = new float[] {1, 2, 0, 0};
            }
        }
        return Ntv2Writer.write(ByteOrder.BIG_ENDIAN, "OLD", "NEW", List.of(
            new Ntv2Writer.Sub("ONLY", parent, 144000, 147600, 0, 3600, 3600, 3600, nodes)));
    }

    @Test
    void chainUsesTheGridAndItsReverse() {
        Ntv2Grid g = Ntv2Grid.parse(constant("NONE", 0), "constant.gsb");
        assertThat(g.systemFrom()).isEqualTo("OLD");
        ConversionChain c = ConversionChain.builder().from(CoordinateSystem.geodetic(StandardFrames.ED50))
            .to(CoordinateSystem.geodetic(StandardFrames.ED50)).horizontalGrid(g).build();
        double[] p = c.convert(40.5, -0.5, 10);
        assertThat(p[0]).isCloseTo(40.5 + 1 / 3600.0, within(1e-14));
        assertThat(p[1]).isCloseTo(-0.5 - 2 / 3600.0, within(1e-14));
        assertThat(c.steps().get(0).epsgMethod()).hasValue(9615);
        double[] q = c.inverse().convert(p[0], p[1], p[2]);
        assertThat(q[0]).isCloseTo(40.5, within(1e-12));
        assertThat(q[1]).isCloseTo(-0.5, within(1e-12));
        assertThatThrownBy(() -> c.convert(39.9, -0.5, 0)).isInstanceOf(OutsideGridException.class);
    }

    @Test
    void aMissingFileIsNamedWithTheReason(@TempDir Path dir) {
        Path absent = dir.resolve("absent.gsb");
        assertThatThrownBy(() -> Ntv2Grid.read(absent)).isInstanceOf(UncheckedIOException.class)
            .hasMessage("cannot read NTv2 file " + absent + ": no such file or directory");
    }

    @Test
    void structuralErrorsAreNamed() {
        assertThatThrownBy(() -> Ntv2Grid.parse(constant("MISSING", 0), "orphan.gsb"))
            .isInstanceOf(GridFormatException.class).hasMessageContaining("parent 'MISSING'");
        assertThatThrownBy(() -> Ntv2Grid.parse(constant("NONE", 1), "count.gsb"))
            .isInstanceOf(GridFormatException.class).hasMessageContaining("GS_COUNT");
        byte[] noEnd = constant("NONE", 0);
        noEnd[noEnd.length - 16] = 'X';
        assertThatThrownBy(() -> Ntv2Grid.parse(noEnd, "noend.gsb")).isInstanceOf(GridFormatException.class)
            .hasMessageContaining("END");
        byte[] junk = new byte[400];
        assertThatThrownBy(() -> Ntv2Grid.parse(junk, "zeros.gsb")).isInstanceOf(GridFormatException.class)
            .hasMessageContaining("not an NTv2 file");
    }
}
