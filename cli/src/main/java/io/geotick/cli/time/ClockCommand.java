package io.geotick.cli.time;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** {@code geotick clock}: device-clock models ({@code fit}, {@code apply}). */
@Command(name = "clock", mixinStandardHelpOptions = true,
    description = {"Fit and apply device-clock models (offset, drift, drift rate).",
        "",
        "'fit' estimates a device clock's offset and drift from paired readings;",
        "'apply' corrects device timestamps with the fitted model. A quartz clock",
        "typically gains or loses up to about half a second a day."},
    subcommands = {ClockFitCommand.class, ClockApplyCommand.class})
public final class ClockCommand implements Runnable {
    @Spec
    CommandSpec spec;

    @Override
    public void run() {
        throw new ParameterException(spec.commandLine(), "a subcommand is required: fit or apply");
    }
}
