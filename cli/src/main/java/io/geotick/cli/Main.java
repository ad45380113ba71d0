package io.geotick.cli;

/** Entry point of the geotick command-line tool. */
public final class Main {
    private Main() {
    }

    public static void main(String[] args) {
        System.out.println("geotick");
    }
}
