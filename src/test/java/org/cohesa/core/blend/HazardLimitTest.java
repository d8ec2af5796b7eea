package org.cohesa.core.blend;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.cohesa.core.activity.BundledLiquids;
import org.cohesa.core.solvent.Solvent;
import org.junit.jupiter.api.Test;

/**
 * The default reasons replace reads from the original's statements. Severity follows the GHS category order (UN GHS Rev. 10,
 * acute toxicity categories 1–4: H300 > H301 > H302; from memory); category 4 alone ("harmful") is not a default reason.
 */
class HazardLimitTest {

    @Test
    void harmfulAloneIsNoDefaultReasonButToxicIs() {
        // diethyl ether: H224 H302 H336 (Annex VI, checked against GisChem in the bundled data) — replaced for nothing by default
        Solvent ether = BundledLiquids.get("diethyl ether");
        assertTrue(HazardLimit.from(ether, HazardLimit.DEFAULT_KINDS).stream().anyMatch(l -> l.kind().equals("acute-toxicity")));
        assertTrue(HazardLimit.defaults(ether).isEmpty(), HazardLimit.defaults(ether).toString());
        // methanol: H301 H311 H331 (toxic, category 3) and H370 — both stay reasons
        List<HazardLimit> methanol = HazardLimit.defaults(BundledLiquids.get("methanol"));
        assertTrue(methanol.stream().anyMatch(l -> l.kind().equals("acute-toxicity") && l.level() == 2), methanol.toString());
        assertTrue(methanol.stream().anyMatch(l -> l.kind().equals("organ-single")), methanol.toString());
        // NMP: H360D stays the reason (category 1B, level 2)
        assertEquals(2, HazardLimit.defaults(BundledLiquids.get("N-methyl-2-pyrrolidone")).stream()
                .filter(l -> l.kind().equals("reprotoxic")).findFirst().orElseThrow().level());
    }

    @Test
    void aReplacedBlendsDefaultReasonsTakeEachKindAtItsWorstComponent() {
        Solvent toluene = BundledLiquids.get("toluene");
        Solvent nmp = BundledLiquids.get("N-methyl-2-pyrrolidone");
        // one liquid: the same reasons as replace without --because
        assertEquals(ReplacementReasons.of("--because", toluene, List.of()), ReplacementReasons.defaultsFor(List.of(toluene)));
        // toluene (H361d, reprotoxic level 1; supplier SDS in the bundled data) with NMP (H360D, level 2): the blend is
        // replaced for reprotoxic at level 2, from NMP, and for toluene's H373 as well
        ReplacementReasons blend = ReplacementReasons.defaultsFor(List.of(toluene, nmp));
        HazardLimit repro = blend.limits().stream().filter(l -> l.kind().equals("reprotoxic")).findFirst().orElseThrow();
        assertEquals(2, repro.level());
        assertTrue(repro.because().contains("N-methyl-2-pyrrolidone"), repro.because());
        assertTrue(blend.limits().stream().anyMatch(l -> l.kind().equals("organ-repeated")), blend.limits().toString());
        assertEquals(blend.limits().size(), blend.words().size());
    }
}
