package org.cohesa.core.blend;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Locale;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.safety.Cautions;
import org.cohesa.core.safety.SafetyProfile;
import org.cohesa.core.safety.SafetyProfiler;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.core.solvent.Solvent;

/**
 * The blend-design workflow: filter the library by the constraints, search exactly, test each suggestion
 * for a liquid–liquid split, and attach warnings and cautions.
 *
 * <p>The split test is too slow for millions of subsets, so the search keeps more blends than asked
 * ({@link #OVERSAMPLE}× + 10), the phase check runs on those in rank order, and blends predicted to split
 * are dropped (or, when asked, kept with a loud warning) until {@code top} remain; when too many are dropped
 * the search runs again keeping four times as many (up to {@link #MAX_KEEP}). Blends whose split test could
 * not be made (missing data) are listed after all tested ones, with a warning. Each kept blend gets its
 * safety profile ({@code org.cohesa.core.safety}): plain-language cautions and the blend flash point (Liaw et al.
 * 2002); with a minimum flash point, blends whose computed flash point falls below it are left out too.
 */
public final class BlendDesigner {

    /** How many more blends the search keeps than asked for, to replace those that split into two phases. */
    public static final int OVERSAMPLE = 3;

    /** Widest list the search keeps when many suggestions are left out. */
    public static final int MAX_KEEP = 5000;

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
     * @param droppedFlashPoint blends left out because their computed flash point is below the minimum
     */
    public record Result(List<BlendSuggestion> suggestions, CandidatePool pool, long subsets, long solved, int droppedTwoPhase,
            int droppedFlashPoint) {
    }

    private BlendDesigner() {
    }

    public static Result design(List<Solvent> library, Request req, PhaseCheck phaseCheck, ProgressListener progress,
            CancellationToken cancel) {
        CandidatePool pool = CandidatePool.of(library, req.constraints(), req.target(), req.rankBy());
        Map<String, PhaseCheck.Verdict> verdicts = new HashMap<>();
        int keep = req.top() * OVERSAMPLE + 10;
        while (true) {
            BlendSearch.Settings s = BlendSearch.Settings.of(req.maxComponents(), keep, req.rankBy(), req.redLimit());
            BlendSearch.Outcome o = BlendSearch.run(req.target(), pool, req.constraints(), s, progress, cancel);
            Result r = screen(o, pool, req, phaseCheck, verdicts);
            // Too many left out (two phases, flash point) while the search had more to give: search again, wider.
            long tested = r.suggestions().stream().filter(x -> x.phase() == null || x.phase().checked()).count();
            if (tested >= req.top() || o.blends().size() < keep || keep >= MAX_KEEP) {
                return r;
            }
            keep = Math.min(MAX_KEEP, keep * 4);
        }
    }

    private static Result screen(BlendSearch.Outcome o, CandidatePool pool, Request req, PhaseCheck phaseCheck,
            Map<String, PhaseCheck.Verdict> verdicts) {
        List<BlendSuggestion> out = new ArrayList<>();
        int dropped = 0;
        int droppedFlash = 0;
        List<BlendSuggestion> untested = new ArrayList<>();
        for (RankedBlend b : o.blends()) {
            if (out.size() >= req.top()) {
                break;
            }
            PhaseCheck.Verdict v = null;
            if (b.size() > 1) {
                double[] f = b.components().stream().mapToDouble(BlendComponent::fraction).toArray();
                v = verdicts.computeIfAbsent(b.blend().describe(),
                        key -> phaseCheck.check(b.components().stream().map(BlendComponent::solvent).toList(), f, req.kelvin()));
            }
            if (v != null && v.splits() && !req.keepTwoPhase()) {
                dropped++;
                continue;
            }
            List<String> warnings = warnings(b, v, req);
            List<String> cautions;
            Double flash = null;
            String flashBasis;
            try {
                SafetyProfile p = SafetyProfiler.profile(b.blend(), req.kelvin());
                cautions = new ArrayList<>(Cautions.forProfile(p));
                cautions.remove(Cautions.REMINDER); // printed once under the list
                flash = p.flashPoint().celsius();
                flashBasis = p.flashPoint().status().name().toLowerCase(Locale.ROOT).replace('_', ' ')
                        + (p.flashPoint().model() == null ? "" : ", " + p.flashPoint().model())
                        + (p.flashPoint().detail().isEmpty() ? "" : "; " + String.join("; ", p.flashPoint().detail()));
                Double min = req.constraints().minFlashPointC();
                if (min != null && flash != null && flash < min) {
                    droppedFlash++; // each component passes, but the blend's own flash point is lower (non-ideal mixing)
                    continue;
                }
                if (min != null && flash == null && p.flashPoint().status() == SafetyProfile.FlashPointStatus.UNKNOWN) {
                    warnings.add("blend flash point could not be estimated (" + flashBasis + "); only each component's flash point was checked");
                }
            } catch (IllegalArgumentException e) {
                cautions = cautions(b);
                flashBasis = "not estimated: " + e.getMessage();
                warnings.add("safety profile not available (" + e.getMessage() + "); cautions list the components' hazard statements only");
            }
            BlendSuggestion sug = new BlendSuggestion(b, v, warnings, cautions, flash, flashBasis);
            if (v != null && !v.checked()) {
                untested.add(sug); // not known to be one liquid phase: after every blend that was tested
            } else {
                out.add(sug);
            }
        }
        for (BlendSuggestion u : untested) {
            if (out.size() < req.top()) {
                out.add(u);
            }
        }
        return new Result(out, pool, o.subsets(), o.solved(), dropped, droppedFlash);
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

    /** Fallback when no safety profile can be built: the hazard statements of each component, CMR ones called out. */
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
