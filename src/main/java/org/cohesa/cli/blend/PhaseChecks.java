package org.cohesa.cli.blend;

import org.cohesa.core.activity.Miscibility;
import org.cohesa.core.activity.MiscibilityResult;
import org.cohesa.core.blend.PhaseCheck;

/** The blend designer's two-phase test: the activity-coefficient engineer's {@link Miscibility} check. */
final class PhaseChecks {

    private PhaseChecks() {
    }

    static PhaseCheck miscibility() {
        return (components, fractions, kelvin) -> {
            MiscibilityResult r;
            try {
                r = Miscibility.check(components, fractions, kelvin);
            } catch (IllegalArgumentException e) {
                // Missing data (e.g. no molar volume for the Flory–Huggins fallback): say so rather than guess.
                return PhaseCheck.Verdict.notChecked(e.getMessage());
            }
            return new PhaseCheck.Verdict(true, r.splits(), r.model(), r.detail());
        };
    }
}
