package io.geotick.cli.demo;

import picocli.CommandLine.Command;

/** {@code geotick demo}: runs the built-in invented scenario and prints a short report. */
@Command(name = "demo", mixinStandardHelpOptions = true, description = "Run the built-in demo (an invented scenario).")
public final class DemoCommand implements Runnable {
    @Override
    public void run() {
        throw new UnsupportedOperationException("not yet");
    }
}
