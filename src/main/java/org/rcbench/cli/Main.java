package org.rcbench.cli;

/** Entry point of the fat jar. Not a JavaFX {@code Application}: the GUI is started by a subcommand. */
public final class Main {
    private Main() {
    }

    public static void main(String[] args) {
        System.exit(Cli.run(args, System.out, System.err));
    }
}
