package org.cohesa.core.blend;

import org.cohesa.core.activity.FloryHuggins;
import org.cohesa.core.activity.WaterJudgement;
import org.cohesa.core.activity.WaterMiscibility;
import org.cohesa.core.activity.WaterSolubilityTable;

/**
 * The blend designer's two-phase test: a blend with water is judged by {@link WaterMiscibility#judge} (published
 * mutual solubilities with water first, the activity model elsewhere), any other blend by the activity model
 * ({@link org.cohesa.core.activity.Miscibility}). Why water first: neither UNIFAC set has parameters for every
 * solvent–water pair, and the Flory–Huggins fallback that then decides mixes aromatic fluorides, for one, with water
 * (docs/methods.md, "Water miscibility").
 */
public final class MeasuredFirstPhaseCheck {

    private MeasuredFirstPhaseCheck() {
    }

    /** @param data published mutual solubilities with water ({@link WaterSolubilityTable#NONE}: the model alone) */
    public static PhaseCheck with(WaterSolubilityTable data) {
        return (components, fractions, kelvin) -> {
            WaterJudgement j;
            try {
                j = WaterMiscibility.judge(components, fractions, kelvin, data);
            } catch (IllegalArgumentException e) {
                // Missing data (e.g. no molar volume for the Flory–Huggins fallback): say so rather than guess.
                return PhaseCheck.Verdict.notChecked(e.getMessage());
            }
            if (j.basis() == WaterJudgement.Basis.MODEL && FloryHuggins.NAME.equals(j.model())
                    && components.stream().anyMatch(WaterMiscibility::isWater)) {
                // Hansen–Flory–Huggins puts water's small molar volume into χ and mixes hydrophobic liquids with it
                // (fluorobenzene–water at 10 % water: one phase by the model, water dissolves to well under 0.1 %):
                // with water and no data or UNIFAC parameters, the blend is not known to be one phase.
                return PhaseCheck.Verdict.notChecked("not known to be one liquid phase: " + j.detail()
                        + "; the Hansen–Flory–Huggins fallback is not trusted with water, and no published mutual solubility covers this blend");
            }
            return new PhaseCheck.Verdict(true, j.splits(), j.model(), j.detail(), j.basis().label());
        };
    }
}
