package org.cohesa.core.blend;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.Set;
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
     * @param rankBy        the ranking ({@link RankBy#DESIRABILITY} by default)
     * @param redLimit      RED up to which a blend qualifies (desirability) or counts as good (other keys)
     * @param keepTwoPhase  keep blends that split (with a warning) instead of dropping them
     * @param kelvin        temperature of the split test, K
     * @param weights       desirability weights
     */
    public record Request(SolubilitySphere target, BlendConstraints constraints, int maxComponents, int top, RankBy rankBy,
            double redLimit, boolean keepTwoPhase, double kelvin, Desirability.Weights weights) {

        /** A request with the default desirability weights. */
        public Request(SolubilitySphere target, BlendConstraints constraints, int maxComponents, int top, RankBy rankBy,
                double redLimit, boolean keepTwoPhase, double kelvin) {
            this(target, constraints, maxComponents, top, rankBy, redLimit, keepTwoPhase, kelvin, Desirability.DEFAULT);
        }

        public Request {
            java.util.Objects.requireNonNull(weights, "weights");
        }
    }

    /**
     * @param suggestions       best first, near-duplicates folded into their variants
     * @param pool              what was searched and what was left out
     * @param subsets           subsets in the search space
     * @param solved            subsets solved exactly (the rest were pruned by a bound)
     * @param droppedTwoPhase   blends left out because they split into two liquid phases
     * @param droppedFlashPoint blends left out because their computed flash point is below the minimum
     * @param droppedBoiling    blends left out because their computed initial boiling point is outside the blend window
     * @param referencePrice    median price per litre of the searched solvents, NaN when none has a price
     * @param droppedWater      blends left out because they do not behave with water as demanded
     */
    public record Result(List<BlendSuggestion> suggestions, CandidatePool pool, long subsets, long solved, int droppedTwoPhase,
            int droppedFlashPoint, int droppedBoiling, double referencePrice, int droppedWater) {
    }

    private BlendDesigner() {
    }

    public static Result design(List<Solvent> library, Request req, PhaseCheck phaseCheck, ProgressListener progress,
            CancellationToken cancel) {
        return design(library, req, phaseCheck, WaterCheck.NONE, progress, cancel);
    }

    /** The workflow with a check of how each blend behaves with water (used when the constraints demand it). */
    public static Result design(List<Solvent> library, Request req, PhaseCheck phaseCheck, WaterCheck waterCheck, ProgressListener progress,
            CancellationToken cancel) {
        Checks checks = new Checks(phaseCheck, waterCheck, new HashMap<>(), new HashMap<>());
        CandidatePool pool = CandidatePool.of(library, req.constraints(), req.target(), req.rankBy());
        List<Solvent> priced = new ArrayList<>(pool.free());
        pool.fixed().forEach(f -> priced.add(f.solvent()));
        double refPrice = Desirability.referencePrice(priced);
        Set<Solvent> fixed = new HashSet<>();
        pool.fixed().forEach(f -> fixed.add(f.solvent()));
        int keep = req.top() * OVERSAMPLE + 10;
        while (true) {
            BlendSearch.Settings s = BlendSearch.Settings.of(req.maxComponents(), keep, req.rankBy(), req.redLimit(), req.weights());
            BlendSearch.Outcome o = BlendSearch.run(req.target(), pool, req.constraints(), s, progress, cancel);
            Screened sc = screen(o.blends(), req, checks, refPrice, fixed, req.top());
            List<BlendSuggestion> list = SuggestionList.arrange(sc.ordered(), req.top(), fixed);
            // Too many left out (two phases, flash point) or folded while the search had more to give: search again, wider.
            long tested = list.stream().filter(x -> x.phase() == null || x.phase().checked()).count();
            // the share rule may only give way when the search has nothing more to give, so widen while it had to
            boolean distinct = SuggestionList.ideas(sc.ordered(), req.top(), fixed) >= Math.min(req.top(), list.size());
            if ((tested >= req.top() && distinct) || o.blends().size() < keep || keep >= MAX_KEEP) {
                list = keepSimpleInView(list, pool, req, checks, refPrice, fixed, progress, cancel);
                return new Result(list, pool, o.subsets(), o.solved(), sc.droppedTwoPhase, sc.droppedFlash, sc.droppedBoiling, refPrice,
                        sc.droppedWater);
            }
            keep = Math.min(MAX_KEEP, keep * 4);
        }
    }

    /** Where the single-or-pair guarantee puts its answer: within the first five. */
    static final int SIMPLE_WITHIN = 5;

    /**
     * Single solvents and 2-component blends that qualify are never crowded out: when none is among the first five, the
     * best one (by the same score) takes the fifth place (docs/methods.md).
     */
    private static List<BlendSuggestion> keepSimpleInView(List<BlendSuggestion> list, CandidatePool pool, Request req, Checks checks,
            double refPrice, Set<Solvent> fixed, ProgressListener progress, CancellationToken cancel) {
        int within = Math.min(SIMPLE_WITHIN, req.top());
        if (req.rankBy() != RankBy.DESIRABILITY || req.maxComponents() - pool.fixed().size() < 1
                || SuggestionList.simpleAmongFirst(list, within) || pool.fixed().size() >= 2) {
            return list;
        }
        int k = Math.min(2, req.maxComponents());
        BlendSearch.Settings s = BlendSearch.Settings.of(k, 20, req.rankBy(), req.redLimit(), req.weights());
        BlendSearch.Outcome o = BlendSearch.run(req.target(), pool, req.constraints(), s, progress, cancel);
        Screened sc = screen(o.blends(), req, checks, refPrice, fixed, 1);
        BlendSuggestion simple = sc.tested().isEmpty() ? null : sc.tested().get(0);
        if (simple == null) {
            return list;
        }
        List<BlendSuggestion> out = new ArrayList<>(list);
        out.removeIf(x -> x.blend().components().equals(simple.blend().components()));
        int at = Math.min(within - 1, out.size());
        out.add(at, simple.withReason("kept in view: the best single solvent or 2-component blend is never crowded out"));
        while (out.size() > req.top()) {
            out.remove(out.size() - 1);
        }
        return out;
    }

    /** The per-blend tests with their caches (a blend is tested once however often the search is widened). */
    private record Checks(PhaseCheck phase, WaterCheck water, Map<String, PhaseCheck.Verdict> verdicts,
            Map<String, org.cohesa.core.activity.WaterBehaviour> waterVerdicts) {
    }

    private record Screened(List<BlendSuggestion> tested, List<BlendSuggestion> untested, int droppedTwoPhase, int droppedFlash,
            int droppedBoiling, int droppedWater) {
        List<BlendSuggestion> ordered() {
            List<BlendSuggestion> all = new ArrayList<>(tested);
            all.addAll(untested); // not known to be one liquid phase: after every blend that was tested
            return all;
        }
    }

    /** Phase check, safety profile, blend limits and reasons for the ranked blends, until {@code top} distinct ideas are tested. */
    private static Screened screen(List<RankedBlend> blends, Request req, Checks checks, double refPrice, Set<Solvent> fixed, int top) {
        Map<String, PhaseCheck.Verdict> verdicts = checks.verdicts();
        PhaseCheck phaseCheck = checks.phase();
        WaterCheck.Need need = req.constraints().more().withWater();
        int droppedWater = 0;
        List<BlendSuggestion> out = new ArrayList<>();
        List<BlendSuggestion> untested = new ArrayList<>();
        int dropped = 0;
        int droppedFlash = 0;
        int droppedBoiling = 0;
        BlendConstraints c = req.constraints();
        Double minFlash = max(c.minFlashPointC(), c.more().minBlendFlashPointC());
        Double bMin = c.more().blendBoilingMinC();
        Double bMax = c.more().blendBoilingMaxC();
        for (RankedBlend b : blends) {
            if (out.size() >= top && SuggestionList.ideas(out, top, fixed) >= top) {
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
            org.cohesa.core.activity.WaterBehaviour water = null;
            if (need != null) {
                double[] f = b.components().stream().mapToDouble(BlendComponent::fraction).toArray();
                water = checks.waterVerdicts().computeIfAbsent(b.blend().describe(),
                        key -> checks.water().check(b.components().stream().map(BlendComponent::solvent).toList(), f, req.kelvin()));
                if (!need.metBy(water)) {
                    droppedWater++;
                    continue;
                }
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
                if (minFlash != null && flash != null && flash < minFlash) {
                    droppedFlash++; // each component may pass, but the blend's own flash point is lower (non-ideal mixing)
                    continue;
                }
                if (minFlash != null && flash == null && p.flashPoint().status() == SafetyProfile.FlashPointStatus.UNKNOWN) {
                    warnings.add("blend flash point could not be estimated (" + flashBasis + ")"
                            + (c.minFlashPointC() != null ? "; only each component's flash point was checked" : "; the blend flash-point limit is NOT checked"));
                }
                if (bMin != null || bMax != null) {
                    Double ibp = p.initialBoilingPointC();
                    if (ibp == null || (bMin != null && ibp < bMin) || (bMax != null && ibp > bMax)) {
                        droppedBoiling++; // unknown counts as outside: a window that cannot be checked is not met
                        continue;
                    }
                }
            } catch (IllegalArgumentException e) {
                cautions = cautions(b);
                flashBasis = "not estimated: " + e.getMessage();
                warnings.add("safety profile not available (" + e.getMessage() + "); cautions list the components' hazard statements only");
                if (bMin != null || bMax != null || c.more().minBlendFlashPointC() != null) {
                    droppedBoiling += (bMin != null || bMax != null) ? 1 : 0;
                    droppedFlash += (bMin != null || bMax != null) ? 0 : 1;
                    continue;
                }
            }
            Desirability.Explanation ex = Desirability.explain(b.components(), b.red(), req.redLimit(), req.weights(), refPrice);
            List<String> why = new ArrayList<>();
            if (req.rankBy() != RankBy.DESIRABILITY) {
                why.add("ranked by " + req.rankBy().word() + (req.rankBy() == RankBy.RED ? String.format(Locale.ROOT, " (RED %.3f)", b.red())
                        : String.format(Locale.ROOT, " (%.3g)", b.secondary())));
            }
            why.addAll(ex.why());
            if (water != null) {
                why.add(why.size() - 1, "with water: " + water.kind().label() + " (" + water.basis().label() + ")");
            }
            for (SoluteCharacter sc : c.more().solute()) {
                why.add(why.size() - 1, "solute " + sc.word() + ": no " + sc.clash().label() + " among the components (" + sc.why() + ")");
            }
            List<String> flags = new ArrayList<>();
            for (BlendComponent bc : b.components()) {
                for (ReactiveFlag rf : ReactiveFlag.of(bc.solvent())) {
                    flags.add(bc.solvent().name() + ": " + rf.label());
                }
            }
            BlendSuggestion sug = new BlendSuggestion(b, v, warnings, cautions, flash, flashBasis, why, ex.score(), flags, List.of());
            if (v != null && !v.checked()) {
                untested.add(sug);
            } else {
                out.add(sug);
            }
        }
        return new Screened(out, untested, dropped, droppedFlash, droppedBoiling, droppedWater);
    }

    private static Double max(Double a, Double b) {
        return a == null ? b : b == null ? a : Double.valueOf(Math.max(a, b));
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
        if (b.red() > req.redLimit() * (1 + 1e-9) && req.rankBy() != RankBy.DESIRABILITY) {
            w.add(String.format(Locale.ROOT, "RED %.2f is above the limit %.2f", b.red(), req.redLimit()));
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
