package org.cohesa.cli;

import org.cohesa.core.activity.Miscibility;
import org.cohesa.core.activity.MiscibilityResult;
import org.cohesa.core.blend.PhaseCheck;

/** The blend designer's two-phase test: the activity-coefficient engineer's {@link Miscibility} check. */
final class PhaseChecks {

    private PhaseChecks() {
    }

    static PhaseCheck miscibility() {
        return (components, fractions, kelvin) -> {
            MiscibilityResult r = Miscibility.check(components, fractions, kelvin);
            return new PhaseCheck.Verdict(r.splits(), r.model(), r.detail());
        };
    }
}
