package org.cohesa;

import org.cohesa.cli.CohesaCommand;
import org.cohesa.desktop.DesktopLauncher;
import org.cohesa.desktop.StartOptions;

/**
 * Entry point of {@code cohesa.jar}: no arguments (or only the desktop options of {@code StartOptions}, such as
 * {@code --screenshot=FILE --screen=NAME}) opens the desktop app, any other argument runs the command line.
 * It must not extend {@code javafx.application.Application}: the JavaFX launcher refuses a fat jar whose
 * main class does.
 */
public final class Launcher {

    private Launcher() {
    }

    public static void main(String[] args) {
        boolean desktop = args.length == 0 || java.util.Arrays.stream(args).allMatch(StartOptions::isDesktopOption);
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
