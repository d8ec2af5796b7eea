package org.cohesa.core.target;

import java.util.Arrays;
import java.util.Locale;
import java.util.stream.Collectors;

/**
 * How a sphere is fitted to dissolving tests (docs/methods.md, "Sphere fit").
 */
public enum FitMethod {
    /** Maximum likelihood under {@link DissolutionModel}: results may be wrong, more so near the surface. The default. */
    LIKELIHOOD("likelihood"),
    /** The published desirability fit (Hansen 2007, ch. 1–2): the smallest sphere that places the liquids best. */
    CLASSIC("classic"),
    /** The weighted mean of all spheres that sort the results best (our earlier method, kept for comparison). */
    CONSENSUS("consensus");

    private final String key;

    FitMethod(String key) {
        this.key = key;
    }

    public String key() {
        return key;
    }

    /** @throws IllegalArgumentException for an unknown key */
    public static FitMethod parse(String text) {
        String k = text == null ? "" : text.strip().toLowerCase(Locale.ROOT);
        for (FitMethod m : values()) {
            if (m.key.equals(k)) {
                return m;
            }
        }
        throw new IllegalArgumentException("unknown fit method " + text);
    }

    public static String allowed() {
        return Arrays.stream(values()).map(FitMethod::key).collect(Collectors.joining(", "));
    }
}
