package io.geotick.transforms.chain;

import static org.assertj.core.api.Assertions.assertThat;

import io.geotick.geodesy.simd.Simd;

/**
 * Array results against single-point results: bit for bit on the scalar code; with the SIMD kernels on
 * (the build's second test pass), within an ulp plus {@code tolerance}, since the ECEF → geodetic kernel's
 * lane arc tangent may differ from the scalar one by about an ulp (see EcefVectorKernelTest).
 */
final class ArrayAgreement {
    private ArrayAgreement() {
    }

    static void assertAgrees(double[] array, double[] singlePoints, double tolerance) {
        if (!Simd.enabled()) {
            assertThat(array).containsExactly(singlePoints);
            return;
        }
        assertThat(array).hasSameSizeAs(singlePoints);
        for (int i = 0; i < array.length; i++) {
            assertThat(Math.abs(array[i] - singlePoints[i])).as("value %s: %s vs %s", i, array[i], singlePoints[i])
                .isLessThanOrEqualTo(Math.ulp(singlePoints[i]) + tolerance);
        }
    }
}
