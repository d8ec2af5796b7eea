package org.cohesa.core.blend;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.cohesa.core.hsp.HansenParameters;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.core.solvent.Solvent;
import org.junit.jupiter.api.Test;

/** A rank that rests on estimated Hansen parameters says so in its reasons (common practice, no source). */
class EstimatedParametersWhyTest {

    private static Solvent liquid(String name, String hspSource) {
        return new Solvent(name, List.of(), null, null, null, null, List.of(), 100.0, 0.9, 100.0, HansenParameters.of(16, 5, 5), 120.0,
                null, null, null, null, null, List.of(), false, null, null, null, Map.of("hsp", hspSource), null, false);
    }

    @Test
    void anEstimatedComponentIsNamedAndAPublishedOneIsNot() {
        Solvent estimated = liquid("estimated liquid", "estimate-structure-groups");
        Solvent published = liquid("published liquid", "alshehri-2022");
        List<String> why = Desirability.explain(List.of(new BlendComponent(estimated, 0.5), new BlendComponent(published, 0.5)),
                0.4, 0.8, Desirability.DEFAULT, Double.NaN).why();
        assertTrue(why.stream().anyMatch(w -> w.startsWith("Hansen parameters estimated from the structure for estimated liquid")), why.toString());
        assertFalse(why.stream().anyMatch(w -> w.contains("published liquid (test")), why.toString());
        List<String> plain = Desirability.explain(List.of(new BlendComponent(published, 1.0)), 0.4, 0.8, Desirability.DEFAULT, Double.NaN).why();
        assertFalse(plain.stream().anyMatch(w -> w.contains("estimated from the structure")), plain.toString());
    }
}
