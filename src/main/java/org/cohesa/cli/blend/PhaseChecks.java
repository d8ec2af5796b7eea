package org.cohesa.cli.blend;

import org.cohesa.core.blend.MeasuredFirstPhaseCheck;
import org.cohesa.core.blend.PhaseCheck;
import org.cohesa.store.WaterMiscibilityCsv;

/** The blend designer's two-phase test: published mutual solubilities with water first, the activity model elsewhere. */
final class PhaseChecks {

    private PhaseChecks() {
    }

    static PhaseCheck miscibility() {
        return MeasuredFirstPhaseCheck.with(WaterMiscibilityCsv.bundled());
    }
}
