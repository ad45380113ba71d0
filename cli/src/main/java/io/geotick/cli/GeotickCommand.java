package io.geotick.cli;

import io.geotick.cli.coord.CoordCommand;
import io.geotick.cli.demo.DemoCommand;
import io.geotick.cli.fit.FitCommand;
import io.geotick.cli.frames.FramesCommand;
import io.geotick.cli.time.ClockCommand;
import io.geotick.cli.time.LeapCommand;
import io.geotick.cli.time.TimeCommand;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** The top-level {@code geotick} command; the work is done by its subcommands. */
@Command(name = "geotick",
    mixinStandardHelpOptions = true,
    versionProvider = VersionProvider.class,
    description = "Exact coordinate and time-scale conversions for satellite-positioning data.",
    footer = {"", Cautions.TEXT, "",
        "Exit codes: 0 ok; 1 internal error; 2 bad usage or input;",
        "  3 file not readable or writable; 4 invalid data file;",
        "  5 batch finished with error rows."},
    subcommands = {
        CoordCommand.class,
        FramesCommand.class,
        FitCommand.class,
        TimeCommand.class,
        LeapCommand.class,
        ClockCommand.class,
        DemoCommand.class,
    })
public final class GeotickCommand implements Runnable {
    @Spec
    CommandSpec spec;

    @Override
    public void run() {
        throw new ParameterException(spec.commandLine(), "a subcommand is required (see geotick --help)");
    }
}
