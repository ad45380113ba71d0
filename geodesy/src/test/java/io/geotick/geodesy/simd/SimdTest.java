package io.geotick.geodesy.simd;

import static org.assertj.core.api.Assertions.assertThat;

import java.lang.invoke.MethodHandles;
import org.junit.jupiter.api.Test;

/** Runs in both test passes: without the vector module (kernels off) and with it (on, where supported). */
class SimdTest {
    private static final boolean MODULE = ModuleLayer.boot().findModule("jdk.incubator.vector").isPresent();

    @Test
    void theStatusLineMatchesTheState() {
        if (Simd.enabled()) {
            assertThat(MODULE).isTrue();
            assertThat(Simd.status())
                .matches("SIMD kernels on \\(jdk\\.incubator\\.vector, \\d+ doubles per vector\\)");
        } else if (!MODULE) {
            assertThat(Simd.status())
                .isEqualTo("SIMD kernels off (start Java with --add-modules jdk.incubator.vector to use them)");
        } else {
            assertThat(Simd.status()).startsWith("SIMD kernels off (");
        }
    }

    @Test
    void aKernelThatCannotBeFoundIsNotUsed() {
        assertThat(Simd.kernelConstructor(MethodHandles.lookup(), "io.geotick.geodesy.simd.NoSuchKernel", Object.class))
            .isEmpty();
    }
}
