package org.cohesa.desktop.common;

import com.fasterxml.jackson.annotation.JsonIgnoreProperties;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/**
 * What the desktop app remembers between runs: window placement, the last screen, the last target and the
 * plot settings. Kept as a small JSON file beside the database ({@code desktop-settings.json} in the data
 * folder), written atomically (temporary file, then move) so a crash never leaves half a file. An unreadable
 * file is ignored: the app then starts with defaults.
 */
@JsonIgnoreProperties(ignoreUnknown = true)
public final class Settings {

    public static final String FILE_NAME = "desktop-settings.json";
    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    public double windowX = Double.NaN;
    public double windowY = Double.NaN;
    public double windowWidth = 1280;
    public double windowHeight = 820;
    public boolean maximized;
    public String screen = "library";
    public String colourBy = "FAMILY";
    public boolean doubledDd = true;
    /** The last target: a library material's name or a typed-in sphere; null centre when none was set. */
    public String targetName;
    public String targetSource;
    public Double targetDd;
    public Double targetDp;
    public Double targetDh;
    public Double targetR0;

    /** Reads the settings, or returns defaults when the file is missing or unreadable. */
    public static Settings load(Path file) {
        if (file == null || !Files.isRegularFile(file)) {
            return new Settings();
        }
        try {
            return JSON.readValue(file.toFile(), Settings.class);
        } catch (IOException | RuntimeException e) {
            return new Settings();
        }
    }

    public void save(Path file) throws IOException {
        Path parent = file.toAbsolutePath().getParent();
        Files.createDirectories(parent);
        Path tmp = Files.createTempFile(parent, "settings", ".tmp");
        try {
            JSON.writeValue(tmp.toFile(), this);
            Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } finally {
            Files.deleteIfExists(tmp);
        }
    }

    public boolean hasTarget() {
        return targetDd != null && targetDp != null && targetDh != null && targetR0 != null;
    }
}
