package org.cohesa.core.blend;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.cohesa.core.hsp.HansenParameters;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.core.solvent.Solvent;
import org.junit.jupiter.api.Test;

/** Folding near-duplicates and spreading solvents (our rules, docs/methods.md "Diverse answers"; invented solvents). */
class SuggestionListTest {

    private static final List<Solvent> S = SyntheticLibrary.generate(8, 1);

    private static BlendSuggestion blend(Object... parts) {
        List<BlendComponent> c = new ArrayList<>();
        for (int i = 0; i < parts.length; i += 2) {
            c.add(new BlendComponent(S.get((Integer) parts[i]), (Double) parts[i + 1]));
        }
        RankedBlend b = new RankedBlend(c, new HansenParameters(18, 9, 8), 1, 0.2, true, RankBy.DESIRABILITY, 1);
        return new BlendSuggestion(b, null, List.of(), List.of(), null, "");
    }

    @Test
    void aSwapWithCloseSharedFractionsIsFoldedUnderTheBetterSibling() {
        BlendSuggestion a = blend(0, 0.60, 1, 0.40);
        BlendSuggestion b = blend(0, 0.62, 2, 0.38); // one solvent swapped, the shared one within 5 %
        BlendSuggestion c = blend(0, 0.30, 3, 0.70); // the shared solvent 30 points away: another idea
        List<BlendSuggestion> out = SuggestionList.arrange(List.of(a, b, c), 10, Set.of());
        assertEquals(2, out.size());
        assertEquals(1, out.get(0).variants().size(), "b is a variant of a");
        assertEquals(b.blend(), out.get(0).variants().get(0));
        assertTrue(out.get(1).variants().isEmpty());
    }

    @Test
    void anAddedComponentFoldsButASimplerBlendIsNeverFoldedUnderALargerOne() {
        BlendSuggestion triple = blend(0, 0.50, 1, 0.45, 2, 0.05);
        BlendSuggestion pair = blend(0, 0.52, 1, 0.48);
        List<BlendSuggestion> out = SuggestionList.arrange(List.of(triple, pair), 10, Set.of());
        assertEquals(2, out.size(), "the pair stays an idea of its own");
        assertTrue(SuggestionList.nearDuplicate(pair.blend(), triple.blend()), "the triple would fold under the pair");
        assertFalse(SuggestionList.nearDuplicate(triple.blend(), pair.blend()));
    }

    @Test
    void noSolventFillsMoreThanHalfUnlessTheListCannotBeFilledOtherwise() {
        List<BlendSuggestion> ranked = List.of(blend(0, 0.5, 1, 0.5), blend(0, 0.2, 2, 0.8), blend(0, 0.8, 3, 0.2), blend(4, 1.0), blend(5, 1.0));
        List<BlendSuggestion> out = SuggestionList.arrange(ranked, 4, Set.of());
        long withZero = out.stream().filter(s -> s.blend().components().get(0).solvent().equals(S.get(0))).count();
        assertEquals(2, withZero, "solvent 0 in at most half of 4");
        assertEquals(4, out.size());
        List<BlendSuggestion> few = SuggestionList.arrange(ranked.subList(0, 3), 4, Set.of());
        assertEquals(3, few.size(), "with fewer ideas than asked the rule gives way");
    }
}
