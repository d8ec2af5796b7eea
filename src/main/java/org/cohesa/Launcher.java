package org.cohesa;

import org.cohesa.cli.CohesaCommand;
import org.cohesa.desktop.DesktopLauncher;

/**
 * Entry point of {@code cohesa.jar}: no arguments opens the desktop app, any argument runs the command line.
 * It must not extend {@code javafx.application.Application}: the JavaFX launcher refuses a fat jar whose
 * main class does.
 */
public final class Launcher {

    private Launcher() {
    }

    public static void main(String[] args) {
        boolean desktop = args.length == 0 || (args.length >= 1 && args[0].startsWith("--screenshot="));
        if (!desktop) {
            CohesaCommand.main(args);
            return;
        }
        if (!DesktopLauncher.displayAvailable()) {
            System.err.println("cohesa: no display found, so the desktop app cannot open; use the command line instead: java -jar cohesa.jar --help");
            System.exit(1);
        }
        DesktopLauncher.launch(args);
    }
}
