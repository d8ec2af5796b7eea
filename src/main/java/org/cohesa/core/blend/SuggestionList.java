package org.cohesa.core.blend;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.core.solvent.Solvent;

/**
 * Turns the exact ranked list into distinct ideas (docs/methods.md, "Diverse answers"):
 * <ol>
 *   <li>a near-duplicate — the same solvents but one (one swapped, or one added), with every shared solvent's
 *       fraction within {@link #FOLD_TOLERANCE} — is folded under its better sibling as a variant; a blend is never
 *       folded under a blend with more components, so singles and pairs stay ideas of their own;</li>
 *   <li>no solvent appears in more than half of the list: a suggestion that would make a solvent exceed that share
 *       waits until the list cannot be filled otherwise;</li>
 * </ol>
 * Both rules only reorder or fold what the exact search found; the order inside each group stays the score order.
 */
public final class SuggestionList {

    /** Largest difference of a shared solvent's volume fraction for two blends to count as the same idea (5 % by volume, our choice). */
    public static final double FOLD_TOLERANCE = 0.05;

    private SuggestionList() {
    }

    /** True when b is a near-duplicate of a (b no simpler than a). */
    static boolean nearDuplicate(RankedBlend a, RankedBlend b) {
        int ka = a.size();
        int kb = b.size();
        if (kb < ka || kb > ka + 1 || kb < 2) {
            return false;
        }
        Map<Solvent, Double> fa = fractions(a);
        Map<Solvent, Double> fb = fractions(b);
        int shared = 0;
        for (Map.Entry<Solvent, Double> e : fa.entrySet()) {
            Double other = fb.get(e.getKey());
            if (other != null) {
                shared++;
                if (Math.abs(other - e.getValue()) > FOLD_TOLERANCE + 1e-12) {
                    return false;
                }
            }
        }
        return kb == ka ? shared == ka - 1 : shared == ka;
    }

    private static Map<Solvent, Double> fractions(RankedBlend b) {
        Map<Solvent, Double> m = new HashMap<>();
        for (BlendComponent c : b.components()) {
            m.merge(c.solvent(), c.fraction(), Double::sum);
        }
        return m;
    }

    /**
     * Folds near-duplicates and spreads the solvents, keeping at most {@code top} ideas.
     *
     * @param ranked best first
     * @param top    how many ideas
     * @param fixed  fixed components (they are in every blend and do not count against the share rule)
     */
    public static List<BlendSuggestion> arrange(List<BlendSuggestion> ranked, int top, Set<Solvent> fixed) {
        Arrangement a = place(ranked, top, fixed);
        List<BlendSuggestion> out = new ArrayList<>(a.placed());
        for (BlendSuggestion w : a.waiting()) {
            if (out.size() >= top) {
                break;
            }
            out.add(w); // fewer distinct ideas than asked: the share rule gives way
        }
        return out.stream().map(l -> l.withVariants(a.variants().getOrDefault(l, List.of()))).collect(Collectors.toList());
    }

    /**
     * How many distinct ideas {@link #arrange} can make of the list without the share rule giving way (to decide
     * whether to search wider: a list that had to give way may only lack candidates further down).
     */
    public static int ideas(List<BlendSuggestion> ranked, int top, Set<Solvent> fixed) {
        return place(ranked, top, fixed).placed().size();
    }

    private record Arrangement(List<BlendSuggestion> placed, List<BlendSuggestion> waiting,
            Map<BlendSuggestion, List<RankedBlend>> variants) {
    }

    private static Arrangement place(List<BlendSuggestion> ranked, int top, Set<Solvent> fixed) {
        List<BlendSuggestion> leaders = new ArrayList<>();
        Map<BlendSuggestion, List<RankedBlend>> variants = new java.util.IdentityHashMap<>();
        for (BlendSuggestion s : ranked) {
            BlendSuggestion home = null;
            for (BlendSuggestion l : leaders) {
                if (nearDuplicate(l.blend(), s.blend())) {
                    home = l;
                    break;
                }
            }
            if (home != null) {
                variants.computeIfAbsent(home, k -> new ArrayList<>()).add(s.blend());
            } else {
                leaders.add(s);
            }
        }
        int cap = Math.max(1, top / 2);
        List<BlendSuggestion> placed = new ArrayList<>();
        List<BlendSuggestion> waiting = new ArrayList<>();
        Map<Solvent, Integer> uses = new HashMap<>();
        for (BlendSuggestion l : leaders) {
            if (placed.size() >= top) {
                break;
            }
            boolean crowded = solvents(l, fixed).stream().anyMatch(v -> uses.getOrDefault(v, 0) >= cap);
            if (crowded) {
                waiting.add(l);
                continue;
            }
            placed.add(l);
            solvents(l, fixed).forEach(v -> uses.merge(v, 1, Integer::sum));
        }
        return new Arrangement(placed, waiting, variants);
    }

    private static List<Solvent> solvents(BlendSuggestion s, Set<Solvent> fixed) {
        return s.blend().components().stream().map(BlendComponent::solvent).filter(v -> !fixed.contains(v)).toList();
    }

    /** True when a single solvent or a 2-component blend is among the first {@code n}. */
    public static boolean simpleAmongFirst(List<BlendSuggestion> list, int n) {
        for (int i = 0; i < Math.min(n, list.size()); i++) {
            if (list.get(i).blend().size() <= 2) {
                return true;
            }
        }
        return false;
    }
}
