package org.cohesa;

import java.io.PrintWriter;
import java.util.List;

/** Lets tests in other packages run the launcher's no-display demonstration against a scratch database. */
public final class LauncherAccess {

    private LauncherAccess() {
    }

    public static int demonstrate(PrintWriter out, PrintWriter err, List<String> extraArgs) {
        return Launcher.demonstrate(out, err, extraArgs);
    }
}
