package io.geotick.cli.coord;

import picocli.CommandLine.Command;

/** {@code geotick coord}: converts one point between coordinate systems. */
@Command(name = "coord", mixinStandardHelpOptions = true, description = "Convert one point between coordinate systems.")
public final class CoordCommand implements Runnable {
    @Override
    public void run() {
        throw new UnsupportedOperationException("not yet");
    }
}
