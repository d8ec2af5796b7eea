package org.cohesa.core.blend;

import java.util.List;

/**
 * A ranked blend as shown to the user: the search result, the phase verdict, and what to watch out for.
 *
 * @param blend    the blend with its exact composition and scores
 * @param phase    the liquid–liquid split verdict (null for a single solvent, which cannot split)
 * @param warnings reasons not to trust the suggestion as it stands (two liquid phases, outside the sphere)
 * @param cautions hazards of the blend in plain words (screening information; the SDS decides)
 * @param flashPointC        the blend's flash point, °C (library value for one liquid, computed for a blend), or null
 * @param flashPointBasis    how the flash point was obtained (method and model, or why it is unknown)
 */
public record BlendSuggestion(RankedBlend blend, PhaseCheck.Verdict phase, List<String> warnings, List<String> cautions,
        Double flashPointC, String flashPointBasis) {

    public BlendSuggestion {
        warnings = List.copyOf(warnings);
        cautions = List.copyOf(cautions);
    }

    public boolean twoPhase() {
        return phase != null && phase.splits();
    }
}
