package io.geotick.cli;

import io.geotick.geodesy.simd.Simd;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.Properties;
import picocli.CommandLine.IVersionProvider;

/**
 * Reads the version that Maven wrote into {@code version.properties} at build time, and names the Java version
 * and whether the array conversions use their SIMD kernels.
 */
final class VersionProvider implements IVersionProvider {
    @Override
    public String[] getVersion() {
        Properties p = new Properties();
        try (InputStream in = VersionProvider.class.getResourceAsStream("version.properties")) {
            if (in != null) {
                p.load(in);
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return new String[] {"geotick " + p.getProperty("version", "unknown"),
            "Java " + System.getProperty("java.version"), Simd.status()};
    }
}
