package org.cohesa.core.blend;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.CancellationException;
import java.util.concurrent.atomic.AtomicLong;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.core.solvent.Solvent;
import org.junit.jupiter.api.Test;

/** The pruned search returns exactly what solving every subset returns, and respects every constraint. */
class BlendSearchTest {

    private static final SolubilitySphere TARGET = SyntheticLibrary.BENCH_TARGET;

    private static BlendSearch.Outcome search(List<Solvent> lib, BlendConstraints c, int k, int top, RankBy r, boolean pruning, int threads) {
        CandidatePool pool = CandidatePool.of(lib, c, TARGET, r);
        return BlendSearch.run(TARGET, pool, c, new BlendSearch.Settings(k, top, r, 1.0, pruning, threads), null, null);
    }

    private static void assertSameResults(BlendSearch.Outcome pruned, BlendSearch.Outcome brute) {
        assertEquals(brute.blends().size(), pruned.blends().size());
        for (int i = 0; i < brute.blends().size(); i++) {
            RankedBlend a = brute.blends().get(i);
            RankedBlend b = pruned.blends().get(i);
            assertEquals(names(a), names(b), "rank " + (i + 1));
            assertEquals(a.red(), b.red(), 1e-9, "rank " + (i + 1));
            for (int j = 0; j < a.size(); j++) {
                assertEquals(a.components().get(j).fraction(), b.components().get(j).fraction(), 1e-7, "rank " + (i + 1));
            }
        }
        assertTrue(pruned.solved() < brute.solved(), "pruning skipped work: " + pruned.solved() + " of " + brute.solved());
    }

    private static List<String> names(RankedBlend b) {
        return b.components().stream().map(c -> c.solvent().name()).toList();
    }

    @Test
    void fourComponentSearchWithPruningEqualsBruteForceOnSixtySolvents() {
        List<Solvent> lib = SyntheticLibrary.generate(60, 11);
        BlendSearch.Outcome pruned = search(lib, BlendConstraints.NONE, 4, 25, RankBy.RED, true, 2);
        BlendSearch.Outcome brute = search(lib, BlendConstraints.NONE, 4, 25, RankBy.RED, false, 2);
        assertEquals(BlendSearch.choose(60, 1) + BlendSearch.choose(60, 2) + BlendSearch.choose(60, 3) + BlendSearch.choose(60, 4), brute.subsets());
        assertEquals(brute.subsets(), brute.solved(), "brute force solves every subset");
        assertSameResults(pruned, brute);
    }

    @Test
    void secondaryKeysWithPruningEqualBruteForce() {
        List<Solvent> lib = SyntheticLibrary.generate(26, 5);
        for (RankBy r : List.of(RankBy.HAZARD, RankBy.COMPONENTS, RankBy.COST, RankBy.EVAPORATION)) {
            BlendSearch.Outcome pruned = search(lib, BlendConstraints.NONE, 4, 15, r, true, 2);
            BlendSearch.Outcome brute = search(lib, BlendConstraints.NONE, 4, 15, r, false, 1);
            assertSameResults(pruned, brute);
        }
    }

    @Test
    void fixedComponentAndCostCapWithPruningEqualBruteForce() {
        List<Solvent> lib = SyntheticLibrary.generate(40, 8);
        BlendConstraints c = new BlendConstraints(List.of(), List.of(), Set.of(), Set.of(),
                List.of(new BlendComponent(lib.get(3), 0.2)), 0.05, 0.7, Map.of(), null, null, null, null, false, 9.0);
        BlendSearch.Outcome pruned = search(lib, c, 4, 20, RankBy.RED, true, 2);
        BlendSearch.Outcome brute = search(lib, c, 4, 20, RankBy.RED, false, 2);
        assertSameResults(pruned, brute);
        for (RankedBlend b : pruned.blends()) {
            assertEquals(lib.get(3), b.components().get(0).solvent(), "the fixed component comes first");
            assertEquals(0.2, b.components().get(0).fraction(), 1e-12);
        }
    }

    @Test
    void resultsNeverBreakAConstraintThatWasSet() {
        // Property-style: many seeded random constraint sets; every result is checked against each constraint.
        List<Solvent> lib = SyntheticLibrary.generate(45, 21);
        java.util.SplittableRandom r = new java.util.SplittableRandom(4242);
        int checked = 0;
        for (int trial = 0; trial < 40; trial++) {
            List<Solvent> exclude = List.of(lib.get(r.nextInt(lib.size())), lib.get(r.nextInt(lib.size())));
            Set<String> excludeFamilies = r.nextBoolean() ? Set.of("ketone") : Set.of();
            List<Solvent> include = new ArrayList<>();
            if (r.nextInt(3) == 0) {
                for (Solvent s : lib) {
                    if (r.nextBoolean()) {
                        include.add(s);
                    }
                }
            }
            List<BlendComponent> fixed = new ArrayList<>();
            if (r.nextInt(3) == 0) {
                Solvent f = lib.get(r.nextInt(lib.size()));
                if (!exclude.contains(f) && !excludeFamilies.contains(f.family()) && !f.isCmr()) {
                    fixed.add(new BlendComponent(f, 0.1 + 0.2 * r.nextDouble()));
                }
            }
            double min = 0.02 + 0.15 * r.nextDouble();
            double max = Math.max(min + 0.05, 0.5 + 0.5 * r.nextDouble());
            Double bpMin = r.nextBoolean() ? 60.0 : null;
            Double bpMax = r.nextBoolean() ? 190.0 : null;
            Double flash = r.nextBoolean() ? 10.0 : null;
            Integer ich = r.nextBoolean() ? 2 : null;
            boolean noCmr = r.nextBoolean();
            Double maxCost = r.nextBoolean() ? 6 + 8 * r.nextDouble() : null;
            BlendConstraints c;
            try {
                c = new BlendConstraints(include, exclude, Set.of(), excludeFamilies, fixed, min, Math.min(1, max), Map.of(),
                        bpMin, bpMax, flash, ich, noCmr, maxCost);
                CandidatePool.of(lib, c, TARGET, RankBy.RED);
            } catch (IllegalArgumentException e) {
                continue; // the random fixed component broke a random constraint: the library refuses, as it should
            }
            RankBy rank = RankBy.values()[r.nextInt(RankBy.values().length)];
            BlendSearch.Outcome o = search(lib, c, 2 + r.nextInt(3), 10, rank, true, 2);
            for (RankedBlend b : o.blends()) {
                checked++;
                double cost = 0;
                double sum = 0;
                for (BlendComponent bc : b.components()) {
                    Solvent s = bc.solvent();
                    sum += bc.fraction();
                    boolean isFixed = fixed.stream().anyMatch(f -> f.solvent().equals(s));
                    assertTrue(!exclude.contains(s), "excluded " + s.name());
                    assertTrue(!excludeFamilies.contains(s.family()), "family " + s.family());
                    if (!include.isEmpty() && !isFixed) {
                        assertTrue(include.contains(s), "not included " + s.name());
                    }
                    if (!isFixed) {
                        assertTrue(bc.fraction() >= min - 1e-9 && bc.fraction() <= Math.min(1, max) + 1e-9,
                                "fraction " + bc.fraction() + " outside " + min + ".." + max);
                    }
                    if (bpMin != null) {
                        assertTrue(s.boilingPointC() >= bpMin);
                    }
                    if (bpMax != null) {
                        assertTrue(s.boilingPointC() <= bpMax);
                    }
                    if (flash != null) {
                        assertTrue(s.flashPointC() >= flash);
                    }
                    if (ich != null) {
                        assertTrue(s.ichClass() >= ich);
                    }
                    if (noCmr) {
                        assertTrue(!s.isCmr());
                    }
                    cost += bc.fraction() * s.pricePerLitre();
                }
                assertEquals(1.0, sum, 1e-9);
                assertTrue(b.size() <= 4);
                if (maxCost != null) {
                    assertTrue(cost <= maxCost + 1e-9, "cost " + cost + " above " + maxCost);
                }
                for (BlendComponent f : fixed) {
                    assertTrue(b.components().stream().anyMatch(bc -> bc.solvent().equals(f.solvent())
                            && Math.abs(bc.fraction() - f.fraction()) < 1e-12), "fixed component kept");
                }
            }
        }
        assertTrue(checked > 100, "enough results checked: " + checked);
    }

    @Test
    void progressReachesTheTotalAndCancellationStopsTheSearch() {
        List<Solvent> lib = SyntheticLibrary.generate(40, 2);
        CandidatePool pool = CandidatePool.of(lib, BlendConstraints.NONE, TARGET, RankBy.RED);
        AtomicLong last = new AtomicLong();
        AtomicLong total = new AtomicLong();
        BlendSearch.run(TARGET, pool, BlendConstraints.NONE, BlendSearch.Settings.of(4, 10, RankBy.RED, 1.0),
                (done, all) -> {
                    last.accumulateAndGet(done, Math::max);
                    total.set(all);
                }, null);
        assertEquals(total.get(), last.get());
        CancellationToken token = new CancellationToken();
        token.cancel();
        assertThrows(CancellationException.class, () -> BlendSearch.run(TARGET, pool, BlendConstraints.NONE,
                BlendSearch.Settings.of(4, 10, RankBy.RED, 1.0), null, token));
    }

    @Test
    void linearKeyPicksTheLeastHazardousCompositionInsideTheLimit() {
        List<Solvent> lib = SyntheticLibrary.generate(30, 9);
        BlendSearch.Outcome o = search(lib, BlendConstraints.NONE, 3, 10, RankBy.HAZARD, true, 2);
        double prev = Double.NEGATIVE_INFINITY;
        for (RankedBlend b : o.blends()) {
            if (!b.withinLimit()) {
                continue;
            }
            assertTrue(b.red() <= 1.0 + 1e-9);
            assertTrue(b.secondary() >= prev - 1e-12, "ordered by hazard");
            prev = b.secondary();
        }
    }
}
