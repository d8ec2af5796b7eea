package org.cohesa.core.blend;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.Set;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.core.solvent.Solvent;
import org.junit.jupiter.api.Test;

/**
 * The desirability search is exact: with its pruning (hazard order, score bound, geometric bounds) it returns what
 * solving every subset returns, for several weightings, a fixed component and a cost cap. Invented library
 * ({@link SyntheticLibrary}); the check is against brute force, not against a published value.
 */
class DesirabilitySearchTest {

    private static final SolubilitySphere TARGET = SyntheticLibrary.BENCH_TARGET;

    private static BlendSearch.Outcome search(List<Solvent> lib, BlendConstraints c, int k, int top, double limit, Desirability.Weights w,
            boolean pruning) {
        CandidatePool pool = CandidatePool.of(lib, c, TARGET, RankBy.DESIRABILITY);
        return BlendSearch.run(TARGET, pool, c, new BlendSearch.Settings(k, top, RankBy.DESIRABILITY, limit, pruning, 2, w), null, null);
    }

    private static void assertSame(BlendSearch.Outcome pruned, BlendSearch.Outcome brute) {
        assertEquals(brute.blends().size(), pruned.blends().size());
        for (int i = 0; i < brute.blends().size(); i++) {
            RankedBlend a = brute.blends().get(i);
            RankedBlend b = pruned.blends().get(i);
            assertEquals(a.secondary(), b.secondary(), 1e-9, "score at rank " + (i + 1));
            assertEquals(names(a), names(b), "rank " + (i + 1));
            assertEquals(a.red(), b.red(), 1e-9);
        }
        assertTrue(pruned.solved() < brute.solved(), "pruning skipped work: " + pruned.solved() + " of " + brute.solved());
    }

    private static List<String> names(RankedBlend b) {
        return b.components().stream().map(c -> c.solvent().name()).sorted().toList();
    }

    @Test
    void fourComponentDesirabilityEqualsBruteForceForEveryPreference() {
        List<Solvent> lib = SyntheticLibrary.generate(30, 3);
        for (Desirability.Preference p : Desirability.Preference.values()) {
            BlendSearch.Outcome pruned = search(lib, BlendConstraints.NONE, 4, 25, 0.8, p.weights(), true);
            BlendSearch.Outcome brute = search(lib, BlendConstraints.NONE, 4, 25, 0.8, p.weights(), false);
            assertTrue(brute.blends().size() == 25, p + ": enough qualifying blends to make the check bite");
            assertSame(pruned, brute);
        }
    }

    @Test
    void zeroDistanceWeightAndTightLimitEqualBruteForce() {
        List<Solvent> lib = SyntheticLibrary.generate(30, 9);
        Desirability.Weights w = new Desirability.Weights(1, 0.5, 0, 0);
        assertSame(search(lib, BlendConstraints.NONE, 4, 20, 0.5, w, true), search(lib, BlendConstraints.NONE, 4, 20, 0.5, w, false));
    }

    @Test
    void fixedComponentAndCostCapEqualBruteForce() {
        List<Solvent> lib = SyntheticLibrary.generate(28, 4);
        BlendConstraints c = new BlendConstraints(List.of(), List.of(), Set.of(), Set.of(), List.of(new BlendComponent(lib.get(5), 0.15)), 0.05, 0.8,
                Map.of(), null, null, null, null, false, 11.0);
        BlendSearch.Outcome pruned = search(lib, c, 4, 20, 0.9, Desirability.Preference.COST.weights(), true);
        BlendSearch.Outcome brute = search(lib, c, 4, 20, 0.9, Desirability.Preference.COST.weights(), false);
        assertSame(pruned, brute);
        for (RankedBlend b : pruned.blends()) {
            assertEquals(lib.get(5), b.components().get(0).solvent());
        }
    }

    @Test
    void onlyQualifyingBlendsAreReturnedAndTheScoreIsTheDocumentedSum() {
        List<Solvent> lib = SyntheticLibrary.generate(30, 2);
        Desirability.Weights w = Desirability.DEFAULT;
        BlendSearch.Outcome o = search(lib, BlendConstraints.NONE, 3, 40, 0.8, w, true);
        double ref = Desirability.referencePrice(lib);
        for (RankedBlend b : o.blends()) {
            assertTrue(b.red() <= 0.8 + 1e-9, "RED " + b.red());
            Desirability.Explanation ex = Desirability.explain(b.components(), b.red(), 0.8, w, ref);
            assertEquals(ex.score(), b.secondary(), 1e-6, "the search's score equals the explained score");
        }
        for (int i = 1; i < o.blends().size(); i++) {
            assertTrue(o.blends().get(i - 1).secondary() <= o.blends().get(i).secondary() + 1e-12, "best first");
        }
    }

    @Test
    void redRankingIsUnchangedByTheNewDefault() {
        // --rank-by red keeps the earlier exact optimum: closest first, brute force agrees (as BlendSearchTest checks for the old code path).
        List<Solvent> lib = SyntheticLibrary.generate(30, 11);
        CandidatePool pool = CandidatePool.of(lib, BlendConstraints.NONE, TARGET, RankBy.RED);
        BlendSearch.Outcome pruned = BlendSearch.run(TARGET, pool, BlendConstraints.NONE, new BlendSearch.Settings(4, 15, RankBy.RED, 0.8, true, 2), null, null);
        BlendSearch.Outcome brute = BlendSearch.run(TARGET, pool, BlendConstraints.NONE, new BlendSearch.Settings(4, 15, RankBy.RED, 0.8, false, 1), null, null);
        for (int i = 0; i < 15; i++) {
            assertEquals(brute.blends().get(i).red(), pruned.blends().get(i).red(), 1e-9);
        }
        assertEquals(0.0, pruned.blends().get(0).red(), 1e-9, "four solvents around the target reach its centre");
    }
}
