package org.cohesa.store;

import java.nio.file.Path;

/**
 * Where the user's data lives: {@code $COHESA_HOME}, else {@code $XDG_DATA_HOME/cohesa}, else
 * {@code ~/.local/share/cohesa} (on Windows {@code %APPDATA%\Cohesa}).
 */
public final class DataHome {

    public static final String DATABASE_FILE = "cohesa.db";

    private DataHome() {
    }

    public static Path folder() {
        String home = System.getenv("COHESA_HOME");
        if (home != null && !home.isBlank()) {
            return Path.of(home);
        }
        String xdg = System.getenv("XDG_DATA_HOME");
        if (xdg != null && !xdg.isBlank()) {
            return Path.of(xdg, "cohesa");
        }
        String appData = System.getenv("APPDATA");
        if (appData != null && !appData.isBlank()) {
            return Path.of(appData, "Cohesa");
        }
        return Path.of(System.getProperty("user.home"), ".local", "share", "cohesa");
    }

    public static Path defaultDatabase() {
        return folder().resolve(DATABASE_FILE);
    }
}
