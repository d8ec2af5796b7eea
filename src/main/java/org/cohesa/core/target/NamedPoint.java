package org.cohesa.core.target;

import org.cohesa.core.hsp.HansenParameters;

/**
 * A library liquid that could be tested next: its name and parameters.
 *
 * @param name  library name
 * @param point parameters, MPa^½
 */
public record NamedPoint(String name, HansenParameters point) {

    public NamedPoint {
        if (name == null || name.isBlank() || point == null) {
            throw new IllegalArgumentException("a candidate liquid needs a name and parameters");
        }
    }
}
