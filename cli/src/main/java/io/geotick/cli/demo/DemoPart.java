package io.geotick.cli.demo;

import java.io.PrintWriter;

/**
 * One part of {@code geotick demo}: a short scene of the invented scenario that exercises one module and
 * prints its report. Parts are listed in {@link DemoCommand#parts()}. A part must do well under a second
 * of work, use only invented data and never fail on a correct build (a failure is a bug: exit code 1).
 */
public interface DemoPart {
    /** The heading printed above the part's report. */
    String title();

    /** Runs the scene and prints its report. */
    void run(PrintWriter out);
}
