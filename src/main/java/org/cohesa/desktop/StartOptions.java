package org.cohesa.desktop;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.hsp.SolubilitySphere;

/**
 * Options of the desktop app, all optional:
 * {@code --screenshot=FILE} (render once to PNG and exit), {@code --screen=NAME} (which screen to open),
 * {@code --view=3d|p-h|d-p|d-h|teas} (which plot on the parameter-space screen),
 * {@code --target=dD,dP,dH,R0} (start with this sphere), {@code --select=NAME} (select a solvent),
 * {@code --measure-frames=N} (rotate the 3D view with N points, print frame times, exit),
 * {@code --blend=NAME:FRACTION,...} (compute this blend's drying path and safety profile at start),
 * {@code --search=K} (run the blend search with up to K components against the target at start),
 * {@code --size=WxH} (window size of a screenshot or frame measurement, default 1400x860),
 * {@code --turn=YAW,PITCH} (turn the 3D view by these degrees from its starting angle, for screenshots).
 */
public record StartOptions(Path screenshot, Screen screen, int view, SolubilitySphere target, String select, int measurePoints,
                           String blend, int search, int width, int height, String caseReplacing, double[] turn) {

    static final List<String> NAMES = List.of("screenshot", "screen", "view", "target", "select", "measure-frames", "blend", "search", "size", "case", "turn");
    private static final List<String> VIEWS = List.of("3d", "p-h", "d-p", "d-h", "teas");

    /** True for an argument the desktop app understands (the launcher sends everything else to the command line). */
    public static boolean isDesktopOption(String arg) {
        return NAMES.stream().anyMatch(n -> arg.startsWith("--" + n + "="));
    }

    private static int search(String k) {
        if (k == null) {
            return 0;
        }
        try {
            int v = Integer.parseInt(k.strip());
            if (v >= 1 && v <= 4) {
                return v;
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        throw new InvalidInputException("--search", k, "give the most components, 1 to 4");
    }

    /** @throws InvalidInputException naming the bad option */
    public static StartOptions parse(Map<String, String> named) {
        String shot = named.get("screenshot");
        Screen screen = null;
        if (named.containsKey("screen")) {
            screen = Screen.byKey(named.get("screen"));
            if (screen == null) {
                throw new InvalidInputException("--screen", named.get("screen"), "unknown screen; use one of " + Screen.keys());
            }
        }
        int view = -1;
        if (named.containsKey("view")) {
            view = VIEWS.indexOf(named.get("view").strip().toLowerCase(java.util.Locale.ROOT));
            if (view < 0) {
                throw new InvalidInputException("--view", named.get("view"), "unknown view; use one of " + String.join(", ", VIEWS));
            }
        }
        SolubilitySphere target = null;
        if (named.containsKey("target")) {
            String t = named.get("target");
            String[] parts = t.split(",");
            try {
                if (parts.length != 4) {
                    throw new IllegalArgumentException("give four numbers dD,dP,dH,R0");
                }
                target = SolubilitySphere.of(Double.parseDouble(parts[0].strip()), Double.parseDouble(parts[1].strip()),
                        Double.parseDouble(parts[2].strip()), Double.parseDouble(parts[3].strip()));
            } catch (IllegalArgumentException e) {
                throw new InvalidInputException("--target", t, e instanceof NumberFormatException ? "not a number" : e.getMessage());
            }
        }
        int points = 0;
        if (named.containsKey("measure-frames")) {
            try {
                points = Integer.parseInt(named.get("measure-frames").strip());
            } catch (NumberFormatException e) {
                points = -1;
            }
            if (points < 1 || points > 100_000) {
                throw new InvalidInputException("--measure-frames", named.get("measure-frames"), "give the number of points, 1 to 100000");
            }
        }
        int[] size = size(named.get("size"));
        return new StartOptions(shot == null ? null : Path.of(shot), screen, view, target, named.get("select"), points, named.get("blend"),
                search(named.get("search")), size[0], size[1], caseReplacing(named.get("case")), turn(named.get("turn")));
    }

    /** {@code --turn=YAW,PITCH}: degrees to turn the 3D view by (about the vertical, then the horizontal); none when absent. */
    private static double[] turn(String text) {
        if (text == null) {
            return null;
        }
        String[] parts = text.strip().split(",");
        try {
            if (parts.length == 2) {
                double yaw = Double.parseDouble(parts[0].strip());
                double pitch = Double.parseDouble(parts[1].strip());
                if (Math.abs(yaw) <= 360 && Math.abs(pitch) <= 180) {
                    return new double[] {yaw, pitch};
                }
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        throw new InvalidInputException("--turn", text, "give YAW,PITCH in degrees, e.g. 60,15 (|yaw| ≤ 360, |pitch| ≤ 180)");
    }

    /** {@code --case=LIQUID}: an invented demo case replacing LIQUID (for screenshots); with --search its first two candidates are chosen and checked. */
    private static String caseReplacing(String text) {
        if (text == null) {
            return null;
        }
        if (text.isBlank()) {
            throw new InvalidInputException("--case", text, "name the liquid the demo case replaces, e.g. --case=toluene");
        }
        return text.strip();
    }

    private static int[] size(String text) {
        if (text == null) {
            return new int[] {1400, 860};
        }
        String[] parts = text.strip().toLowerCase(java.util.Locale.ROOT).split("x");
        try {
            if (parts.length == 2) {
                int w = Integer.parseInt(parts[0].strip());
                int h = Integer.parseInt(parts[1].strip());
                if (w >= 640 && h >= 480 && w <= 7680 && h <= 4320) {
                    return new int[] {w, h};
                }
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        throw new InvalidInputException("--size", text, "give WIDTHxHEIGHT in pixels, e.g. 1280x800 (640x480 to 7680x4320)");
    }
}
