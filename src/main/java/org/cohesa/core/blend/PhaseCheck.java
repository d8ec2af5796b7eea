package org.cohesa.core.blend;

import java.util.List;
import org.cohesa.core.solvent.Solvent;

/**
 * A liquid–liquid split test of a blend at its composition and temperature (the app plugs in the
 * activity-coefficient model of {@code org.cohesa.core.activity}).
 */
@FunctionalInterface
public interface PhaseCheck {

    /**
     * @param checked false when the test could not be made (missing data); the blend is then not known to be one phase
     * @param splits  true when the blend separates into two liquid phases
     * @param model   the model that decided, e.g. "UNIFAC (LLE, Magnussen 1981)", or null when not checked
     * @param detail  a sentence for the user
     * @param basis   what judged it: "measured" (published mutual solubility with water), "measured with water,
     *                model elsewhere", or "model" (the activity model alone); null when not checked
     */
    record Verdict(boolean checked, boolean splits, String model, String detail, String basis) {

        /** A verdict of the activity model alone. */
        public Verdict(boolean checked, boolean splits, String model, String detail) {
            this(checked, splits, model, detail, checked ? "model" : null);
        }

        public static Verdict notChecked(String why) {
            return new Verdict(false, false, null, why, null);
        }
    }

    /**
     * @param components      the liquids
     * @param volumeFractions their volume fractions, same order, summing to 1
     * @param kelvin          temperature, K
     */
    Verdict check(List<Solvent> components, double[] volumeFractions, double kelvin);
}
