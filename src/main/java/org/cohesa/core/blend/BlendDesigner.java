package org.cohesa.core.blend;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.core.solvent.Solvent;

/**
 * The blend-design workflow: filter the library by the constraints, search exactly, test each suggestion
 * for a liquid–liquid split, and attach warnings and cautions.
 *
 * <p>The split test is too slow for millions of subsets, so the search keeps more blends than asked
 * ({@link #OVERSAMPLE}× + 10), the phase check runs on those in rank order, and blends predicted to split
 * are dropped (or, when asked, kept with a loud warning) until {@code top} remain.
 */
public final class BlendDesigner {

    /** How many more blends the search keeps than asked for, to replace those that split into two phases. */
    public static final int OVERSAMPLE = 3;

    /**
     * @param maxComponents 1..4 including fixed components
     * @param top           how many suggestions
     * @param rankBy        secondary key
     * @param redLimit      RED up to which a blend counts as good
     * @param keepTwoPhase  keep blends that split (with a warning) instead of dropping them
     * @param kelvin        temperature of the split test, K
     */
    public record Request(SolubilitySphere target, BlendConstraints constraints, int maxComponents, int top, RankBy rankBy,
            double redLimit, boolean keepTwoPhase, double kelvin) {
    }

    /**
     * @param suggestions       best first
     * @param pool              what was searched and what was left out
     * @param subsets           subsets in the search space
     * @param solved            subsets solved exactly (the rest were pruned by a bound)
     * @param droppedTwoPhase   blends left out because they split into two liquid phases
     */
    public record Result(List<BlendSuggestion> suggestions, CandidatePool pool, long subsets, long solved, int droppedTwoPhase) {
    }

    private BlendDesigner() {
    }

    public static Result design(List<Solvent> library, Request req, PhaseCheck phaseCheck, ProgressListener progress,
            CancellationToken cancel) {
        CandidatePool pool = CandidatePool.of(library, req.constraints(), req.target(), req.rankBy());
        int keep = req.top() * OVERSAMPLE + 10;
        BlendSearch.Settings s = BlendSearch.Settings.of(req.maxComponents(), keep, req.rankBy(), req.redLimit());
        BlendSearch.Outcome o = BlendSearch.run(req.target(), pool, req.constraints(), s, progress, cancel);
        List<BlendSuggestion> out = new ArrayList<>();
        int dropped = 0;
        for (RankedBlend b : o.blends()) {
            if (out.size() >= req.top()) {
                break;
            }
            PhaseCheck.Verdict v = null;
            if (b.size() > 1) {
                double[] f = b.components().stream().mapToDouble(BlendComponent::fraction).toArray();
                v = phaseCheck.check(b.components().stream().map(BlendComponent::solvent).toList(), f, req.kelvin());
            }
            if (v != null && v.splits() && !req.keepTwoPhase()) {
                dropped++;
                continue;
            }
            out.add(new BlendSuggestion(b, v, warnings(b, v, req), cautions(b)));
        }
        return new Result(out, pool, o.subsets(), o.solved(), dropped);
    }

    static List<String> warnings(RankedBlend b, PhaseCheck.Verdict v, Request req) {
        List<String> w = new ArrayList<>();
        if (v != null && v.splits()) {
            w.add(String.format(Locale.ROOT, "TWO LIQUID PHASES predicted at %.0f °C (%s): %s; not a usable blend as it stands",
                    req.kelvin() - 273.15, v.model(), v.detail()));
        }
        if (v != null && !v.checked()) {
            w.add("two-phase test NOT made (" + v.detail() + "): check miscibility in the lab before use");
        }
        if (b.red() >= 1) {
            w.add(String.format(Locale.ROOT, "outside the target sphere (RED %.2f): not expected to dissolve the material", b.red()));
        }
        if (req.rankBy() == RankBy.EVAPORATION) {
            for (BlendComponent c : b.components()) {
                if (!Evaporation.hasData(c.solvent())) {
                    w.add(c.solvent().name() + ": no vapour-pressure data; counted as non-volatile in the evaporation ranking");
                }
            }
        }
        return w;
    }

    /** Hazard statements of each component, CMR ones called out first. */
    static List<String> cautions(RankedBlend b) {
        List<String> c = new ArrayList<>();
        for (BlendComponent bc : b.components()) {
            Solvent s = bc.solvent();
            if (s.isCmr()) {
                c.add(s.name() + ": carcinogen, mutagen or reproductive toxicant (" + String.join(" ", s.hazardStatements()) + ")");
            } else if (!s.hazardStatements().isEmpty()) {
                c.add(s.name() + ": " + String.join(" ", s.hazardStatements()));
            } else {
                c.add(s.name() + ": no GHS hazard statements recorded in the library");
            }
            if (s.peroxideFormer()) {
                c.add(s.name() + ": forms explosive peroxides on storage");
            }
        }
        return c;
    }
}
