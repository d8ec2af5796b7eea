package org.cohesa;

import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
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

    /** The material of the command-line demonstration shown when there is no display. */
    static final String DEMO_MATERIAL = "PMMA";

    /**
     * Without a display the desktop cannot open, but "build, then run" must still show the program doing its job:
     * a short blend search for a bundled material on the command line, then where to go next. Exit code of the search.
     */
    static int demonstrateWithoutDisplay() {
        PrintWriter out = new PrintWriter(new OutputStreamWriter(System.out, StandardCharsets.UTF_8), true);
        PrintWriter err = new PrintWriter(new OutputStreamWriter(System.err, StandardCharsets.UTF_8), true);
        return demonstrate(out, err, List.of());
    }

    /** The demonstration itself; {@code extraArgs} (e.g. {@code --db FILE}) go to the search. */
    static int demonstrate(PrintWriter out, PrintWriter err, List<String> extraArgs) {
        String jar = jarPath();
        List<String> demo = List.of("blend", "--material", DEMO_MATERIAL, "--top", "3");
        out.println("No display found, so the desktop app cannot open here. The command line does the same work; for example");
        out.println("  java -jar " + jar + " " + String.join(" ", demo));
        out.println();
        List<String> args = new ArrayList<>(demo);
        args.addAll(extraArgs);
        int code = CohesaCommand.run(args.toArray(String[]::new), out, err);
        out.println();
        out.println("Every workflow runs from the command line: java -jar " + jar + " --help");
        out.println("On a machine with a display, java -jar " + jar + " opens the desktop app.");
        out.flush();
        return code;
    }

    /** The jar this runs from, relative to the working folder when it lies inside it (e.g. target/cohesa.jar). */
    static String jarPath() {
        try {
            Path p = Path.of(Launcher.class.getProtectionDomain().getCodeSource().getLocation().toURI()).toAbsolutePath().normalize();
            if (!p.toString().endsWith(".jar")) {
                return "target/cohesa.jar";
            }
            Path cwd = Path.of("").toAbsolutePath();
            return p.startsWith(cwd) ? cwd.relativize(p).toString() : p.toString();
        } catch (URISyntaxException | SecurityException | IllegalArgumentException e) {
            return "target/cohesa.jar";
        }
    }

    public static void main(String[] args) {
        boolean desktop = args.length == 0 || java.util.Arrays.stream(args).allMatch(StartOptions::isDesktopOption);
        if (!desktop) {
            CohesaCommand.main(args);
            return;
        }
        if (!DesktopLauncher.displayAvailable()) {
            System.exit(demonstrateWithoutDisplay());
        }
        DesktopLauncher.launch(args);
    }
}
