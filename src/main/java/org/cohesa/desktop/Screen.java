package org.cohesa.desktop;

import java.util.Locale;

/** The workbench's screens: the case list, the panes of a case's steps, then the reference screens; {@code key} is the name used by {@code --screen=} and the settings. */
public enum Screen {
    CASES("cases", "Cases"),
    TARGET("target", "Material"),
    LIMITS("limits", "Limits"),
    BLENDS("blends", "Candidates"),
    CHECKS("checks", "Checks"),
    RECORD("record", "Record"),
    LIBRARY("library", "Library"),
    DRYING("drying", "Drying"),
    SPACE("space", "Parameter space"),
    RECORDS("register", "Register");

    private final String key;
    private final String title;

    Screen(String key, String title) {
        this.key = key;
        this.title = title;
    }

    public String key() {
        return key;
    }

    public String title() {
        return title;
    }

    /** The screen named {@code key} (case-insensitive), or null. */
    public static Screen byKey(String key) {
        if (key == null) {
            return null;
        }
        for (Screen s : values()) {
            if (s.key.equals(key.strip().toLowerCase(Locale.ROOT))) {
                return s;
            }
        }
        return null;
    }

    /** "library, target, …" for messages. */
    public static String keys() {
        StringBuilder b = new StringBuilder();
        for (Screen s : values()) {
            b.append(b.length() == 0 ? "" : ", ").append(s.key);
        }
        return b.toString();
    }
}
