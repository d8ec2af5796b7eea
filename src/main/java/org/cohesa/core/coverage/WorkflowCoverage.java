package org.cohesa.core.coverage;

import java.util.List;

/**
 * For the solvents with Hansen parameters (the ones searches can suggest): how many can take part in the two
 * workflows that need a vapour pressure.
 *
 * @param hansenSolvents             solvents with Hansen parameters
 * @param dryingComputable           … whose evaporation rate at 25 °C can be computed (vapour pressure, molar mass
 *                                   and molar volume known, below the boiling point), so a drying path runs
 * @param blendFlashPointComputable  … for which the flash point of a 50/50 blend with the partner solvent comes out
 *                                   (computed, or "not flammable" / "none below the boiling point" on data)
 * @param partner                    the second component of that test blend
 * @param notDrying                  names of the Hansen-bearing solvents that cannot dry, with the reason
 * @param notFlashPoint              names of those whose blend flash point cannot be computed, with the reason
 */
public record WorkflowCoverage(int hansenSolvents, int dryingComputable, int blendFlashPointComputable, String partner,
        List<String> notDrying, List<String> notFlashPoint) {

    public WorkflowCoverage {
        notDrying = List.copyOf(notDrying);
        notFlashPoint = List.copyOf(notFlashPoint);
    }

    public double dryingFraction() {
        return hansenSolvents == 0 ? 0 : (double) dryingComputable / hansenSolvents;
    }

    public double blendFlashPointFraction() {
        return hansenSolvents == 0 ? 0 : (double) blendFlashPointComputable / hansenSolvents;
    }
}
