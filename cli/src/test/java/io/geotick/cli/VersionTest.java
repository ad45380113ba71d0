package io.geotick.cli;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

class VersionTest {
    @Test
    void versionNamesTheReleaseJavaAndWhetherTheSimdKernelsAreOn() {
        CliRun r = CliRun.of("--version");
        assertThat(r.exitCode()).isZero();
        // The tests run without the vector module, as the launcher does: the kernels are off, and the line
        // says how to turn them on.
        assertThat(r.out()).startsWith("geotick ").contains("Java " + System.getProperty("java.version"))
            .contains("SIMD kernels off (start Java with --add-modules jdk.incubator.vector to use them)");
        assertThat(r.err()).isEmpty();
    }
}
