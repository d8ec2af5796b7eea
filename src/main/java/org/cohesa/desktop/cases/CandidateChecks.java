package org.cohesa.desktop.cases;

import java.util.List;
import org.cohesa.core.blend.MeasuredFirstPhaseCheck;
import org.cohesa.core.blend.PhaseCheck;
import org.cohesa.core.activity.WaterBehaviour;
import org.cohesa.core.activity.WaterMiscibility;
import org.cohesa.core.drying.DryingPath;
import org.cohesa.core.drying.DryingRequest;
import org.cohesa.core.drying.DryingSimulator;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.safety.SafetyProfile;
import org.cohesa.core.safety.SafetyProfiler;
import org.cohesa.core.solvent.Blend;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.desktop.blend.CandidateFacts;
import org.cohesa.desktop.common.Numbers;
import org.cohesa.store.WaterMiscibilityCsv;

/**
 * The three checks of a chosen candidate, computed by the core: its safety profile, its drying path against the case's
 * material, and whether it stays one liquid (alone and with water). Each result keeps the full value for the panels and a
 * one-line verdict for the case; a check that cannot be computed says why in that line.
 *
 * @param blend       the candidate
 * @param safety      the safety profile, or null when it could not be computed
 * @param drying      the drying path, or null
 * @param water       how it behaves with water, or null (no water in the library, or no data)
 * @param safetyLine  one-line safety verdict
 * @param dryingLine  one-line drying verdict
 * @param phaseLine   one-line phase verdict (alone and with water)
 */
public record CandidateChecks(Blend blend, SafetyProfile safety, DryingPath drying, WaterBehaviour water, String safetyLine,
        String dryingLine, String phaseLine) {

    /** Runs the three checks at {@code kelvin} (call off the FX thread). */
    public static CandidateChecks run(Blend blend, SolubilitySphere target, double kelvin, List<Solvent> library) {
        SafetyProfile safety = null;
        String safetyLine;
        try {
            safety = SafetyProfiler.profile(blend, kelvin);
            safetyLine = CandidateFacts.flash(safety, blend) + " · " + CandidateFacts.worstIch(blend) + " · "
                    + (safety.cmr().isEmpty() ? "no CMR component" : "CMR: " + safety.cmr().get(0).component());
        } catch (RuntimeException e) {
            safetyLine = "safety profile could not be computed: " + e.getMessage();
        }
        DryingPath drying = null;
        String dryingLine;
        try {
            drying = DryingSimulator.simulate(new DryingRequest(blend, target, kelvin, DryingRequest.DEFAULT_UNTIL, false, 0.025, false));
            dryingLine = dryingLine(drying);
        } catch (RuntimeException e) {
            dryingLine = "drying path could not be computed: " + e.getMessage();
        }
        String phase;
        if (blend.size() == 1) {
            phase = "a single liquid";
        } else {
            // the same test the search applies: published mutual solubilities with water first, the activity model elsewhere
            PhaseCheck.Verdict v = MeasuredFirstPhaseCheck.with(WaterMiscibilityCsv.bundled()).check(blend.solvents(), blend.fractions(), kelvin);
            phase = !v.checked() ? "phase test not possible: " + v.detail()
                    : v.splits() ? "SPLITS into two liquid phases (" + v.model() + ")" : "one liquid phase (" + v.model() + ")";
        }
        WaterBehaviour water = null;
        String waterText;
        Solvent w = library.stream().filter(WaterMiscibility::isWater).findFirst().orElse(null);
        if (w == null) {
            waterText = "with water: not judged (no water in the library)";
        } else if (blend.solvents().stream().allMatch(WaterMiscibility::isWater)) {
            waterText = "it is water";
        } else {
            try {
                water = WaterMiscibility.withWater(blend.solvents(), blend.fractions(), w, kelvin, WaterMiscibilityCsv.bundled());
                waterText = "with water: " + waterWords(water);
            } catch (RuntimeException e) {
                waterText = "with water: not judged (" + e.getMessage() + ")";
            }
        }
        return new CandidateChecks(blend, safety, drying, water, safetyLine, dryingLine, phase + "; " + waterText);
    }

    static String dryingLine(DryingPath p) {
        StringBuilder b = new StringBuilder();
        if (p.points().stream().allMatch(x -> x.red() == null)) {
            b.append("path computed (no material to measure it against)");
        } else if (p.leavesSphereAt() == null) {
            b.append("stays inside the sphere to ").append(Numbers.percent(p.end().evaporated())).append(" evaporated");
        } else {
            b.append("leaves the sphere at ").append(Numbers.percent(p.leavesSphereAt())).append(" evaporated");
        }
        if (p.lastSolvent() != null) {
            b.append("; ").append(p.lastSolvent()).append(" dries last");
        }
        return b.toString();
    }

    static String waterWords(WaterBehaviour w) {
        String kind = switch (w.kind()) {
            case MISCIBLE -> "mixes at every proportion";
            case PARTLY_MISCIBLE -> "mixes at 1:1 but separates at some water contents";
            case IMMISCIBLE -> "separates (two phases at 1:1)";
        };
        return kind + " (" + w.basis().label() + ")";
    }
}
