package org.cohesa.desktop;

import javafx.application.Application;

/** Starts the JavaFX application; kept apart so the command line never loads JavaFX classes. */
public final class DesktopLauncher {

    private DesktopLauncher() {
    }

    /** True when an X11 or Wayland display is reachable (always true off Linux). */
    public static boolean displayAvailable() {
        String os = System.getProperty("os.name", "").toLowerCase(java.util.Locale.ROOT);
        if (!os.contains("linux")) {
            return true;
        }
        return notBlank(System.getenv("DISPLAY")) || notBlank(System.getenv("WAYLAND_DISPLAY"));
    }

    public static void launch(String[] args) {
        Application.launch(CohesaApp.class, args);
    }

    private static boolean notBlank(String s) {
        return s != null && !s.isBlank();
    }
}
