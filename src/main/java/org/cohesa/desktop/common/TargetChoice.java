package org.cohesa.desktop.common;

import org.cohesa.core.hsp.SolubilitySphere;

/**
 * The target the screens work against: a solubility sphere with a name and where it came from
 * (a library material with its source, a fit to the user's tests, or typed in).
 */
public record TargetChoice(String name, SolubilitySphere sphere, String source) {

    public TargetChoice {
        if (sphere == null) {
            throw new IllegalArgumentException("a target needs a sphere");
        }
        name = name == null || name.isBlank() ? "typed-in sphere" : name.strip();
        source = source == null ? "" : source;
    }
}
