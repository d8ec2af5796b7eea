package org.cohesa.core.safety;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.cohesa.core.drying.EvaporationRates;
import org.cohesa.core.solvent.Blend;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.core.solvent.SolventLibrary;
import org.junit.jupiter.api.Test;

/**
 * Where a vapour pressure is used outside the published range of its correlation, the safety and drying output says
 * so. N-methyl-2-pyrrolidone's bundled curve is the Landolt–Börnstein IV/20 Antoine set fitted from 336 to 477 K
 * (solvent-db/SOURCES.md, key landolt-iv20-antoine), so at 25 °C and at a blend flash point near 20 °C it is extrapolated.
 */
class ExtrapolationNoticeTest {

    private static final SolventLibrary LIB = TestSolvents.bundled();

    @Test
    void theBlendFlashPointNamesACurveExtrapolatedAtTheBlendsFlashPoint() {
        Blend b = new Blend(List.of(new BlendComponent(LIB.resolve("s", "NMP"), 0.5), new BlendComponent(LIB.resolve("s", "ethanol"), 0.5)));
        SafetyProfile p = SafetyProfiler.profile(b, 298.15);
        assertTrue(p.flashPoint().celsius() < LIB.resolve("s", "NMP").flashPointC(), p.flashPoint().toString());
        assertTrue(p.flashPoint().detail().stream().anyMatch(d -> d.contains("N-methyl-2-pyrrolidone") && d.contains("at the blend flash point")
                && d.contains("extrapolated below its range")), p.flashPoint().detail().toString());
    }

    @Test
    void dryingAt25CNamesTheExtrapolation() {
        EvaporationRates r = EvaporationRates.of(List.of(LIB.resolve("s", "NMP"), LIB.resolve("s", "n-butyl acetate")), 298.15);
        assertTrue(r.notes().stream().anyMatch(n -> n.contains("N-methyl-2-pyrrolidone") && n.contains("extrapolated below its range")),
                r.notes().toString());
    }
}
