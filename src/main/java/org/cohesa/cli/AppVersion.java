package org.cohesa.cli;

/** The program version, from the jar manifest (or "dev" when run from classes). */
public final class AppVersion {

    private AppVersion() {
    }

    public static String get() {
        String v = AppVersion.class.getPackage().getImplementationVersion();
        return v == null ? "dev" : v;
    }
}
