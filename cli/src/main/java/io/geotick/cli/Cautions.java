package io.geotick.cli;

/** The cautions printed in {@code --help} and by the demo; the README carries the same text. */
public final class Cautions {
    public static final String TEXT = ""
        + "Cautions:%n"
        + "  * Not for safety-of-life navigation (aviation, marine, rescue).%n"
        + "  * WGS 84 is taken as equal to the ITRF realisation of its date; the two agree%n"
        + "    at the decimetre level (about 0.1 m), not better. Frames, epochs and their%n"
        + "    stated accuracies are shown by --explain.%n"
        + "  * Survey, cadastral and legal work defers to the local geodetic authority and%n"
        + "    to licensed surveyors; use their published parameters and grids.%n";

    private Cautions() {
    }
}
