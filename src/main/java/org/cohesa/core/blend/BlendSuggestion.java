package org.cohesa.core.blend;

import java.util.List;
import java.util.Objects;

/**
 * A ranked blend as shown to the user: the search result, the phase verdict, what to watch out for, and why it
 * stands where it stands.
 *
 * @param blend    the blend with its exact composition and scores
 * @param phase    the liquid–liquid split verdict (null for a single solvent, which cannot split)
 * @param warnings reasons not to trust the suggestion as it stands (two liquid phases, outside the sphere)
 * @param cautions hazards of the blend in plain words (screening information; the SDS decides)
 * @param flashPointC        the blend's flash point, °C (library value for one liquid, computed for a blend), or null
 * @param flashPointBasis    how the flash point was obtained (method and model, or why it is unknown)
 * @param why      the terms that placed it, e.g. "inside with margin 0.31 (RED 0.69 ≤ 0.80)", "2 components", "score 4.12"
 * @param score    its desirability score (lower is better; computed for every ranking so lists can be compared)
 * @param flags    process-suitability flags of its components, e.g. "triethylamine: amine or pyridine base"
 * @param variants near-duplicates folded under it (same solvents but one, shared fractions within
 *                 {@link SuggestionList#FOLD_TOLERANCE}), best first
 */
public record BlendSuggestion(RankedBlend blend, PhaseCheck.Verdict phase, List<String> warnings, List<String> cautions,
        Double flashPointC, String flashPointBasis, List<String> why, double score, List<String> flags, List<RankedBlend> variants) {

    public BlendSuggestion {
        warnings = List.copyOf(warnings);
        cautions = List.copyOf(cautions);
        why = List.copyOf(Objects.requireNonNullElse(why, List.of()));
        flags = List.copyOf(Objects.requireNonNullElse(flags, List.of()));
        variants = List.copyOf(Objects.requireNonNullElse(variants, List.of()));
    }

    /** A suggestion without ranking reasons (callers that only need the screening). */
    public BlendSuggestion(RankedBlend blend, PhaseCheck.Verdict phase, List<String> warnings, List<String> cautions,
            Double flashPointC, String flashPointBasis) {
        this(blend, phase, warnings, cautions, flashPointC, flashPointBasis, List.of(), Double.NaN, List.of(), List.of());
    }

    public boolean twoPhase() {
        return phase != null && phase.splits();
    }

    /** The same suggestion with these variants folded under it. */
    public BlendSuggestion withVariants(List<RankedBlend> v) {
        return new BlendSuggestion(blend, phase, warnings, cautions, flashPointC, flashPointBasis, why, score, flags, v);
    }

    /** The same suggestion with one more reason in front of the others' last (the score). */
    public BlendSuggestion withReason(String reason) {
        List<String> w = new java.util.ArrayList<>(why);
        w.add(Math.max(0, w.size() - 1), reason);
        return new BlendSuggestion(blend, phase, warnings, cautions, flashPointC, flashPointBasis, w, score, flags, variants);
    }
}
