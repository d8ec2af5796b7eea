package org.cohesa.core.records;

import org.cohesa.core.hsp.SolubilitySphere;

/**
 * The material that must stay dissolved, as filed with a record.
 *
 * @param label  a material name, or the sphere as typed
 * @param sphere its solubility sphere, MPa^½
 * @param source where the sphere comes from (citation text, "typed by the user" …)
 */
public record TargetRef(String label, SolubilitySphere sphere, String source) {

    public TargetRef {
        if (label == null || label.isBlank() || sphere == null) {
            throw new IllegalArgumentException("a target needs a label and a sphere");
        }
    }
}
