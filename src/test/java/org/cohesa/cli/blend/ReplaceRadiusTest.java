package org.cohesa.cli.blend;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Locale;
import org.cohesa.core.activity.BundledLiquids;
import org.cohesa.core.hsp.HansenParameters;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.target.Material;
import org.cohesa.store.BundledData;
import org.cohesa.store.MaterialCsv;
import org.junit.jupiter.api.Test;

/**
 * Why replace qualifies substitutes at Ra ≤ 4 MPa^½ from the original (radius 4, RED limit 1.0): over every pair of bundled
 * solvents and the bundled material spheres (Hansen 2007 Table A.2, from memory), a candidate at Ra r from an original
 * dissolves (RED ≤ 1) the share of the materials the original dissolves computed here. The radius is the largest whole Ra
 * whose outer shell still keeps at least 80 % of them (our choice of share, docs/methods.md); the former effective radius
 * 4 × 0.8 = 3.2 stopped short of it.
 */
class ReplaceRadiusTest {

    @Test
    void theShellUpToTheRadiusKeepsFourFifthsOfTheOriginalsMaterialsAndTheNextDoesNot() throws Exception {
        BundledData b = BundledData.resource("materials.csv");
        List<Material> materials = MaterialCsv.read(b.name(), new InputStreamReader(new ByteArrayInputStream(b.bytes()), StandardCharsets.UTF_8), false);
        List<HansenParameters> solvents = BundledLiquids.library().all().stream().filter(Solvent::hasHansen).map(Solvent::hansen).toList();
        double[] inner = keptShare(solvents, materials, 3.2, 4.0);
        double[] outer = keptShare(solvents, materials, 4.0, 5.0);
        String text = String.format(Locale.ROOT, "Ra 3.2–4: %.3f of %.0f; Ra 4–5: %.3f of %.0f", inner[0], inner[1], outer[0], outer[1]);
        assertTrue(materials.size() >= 50 && inner[1] > 10_000, text);
        assertTrue(inner[0] >= 0.80, text);
        assertTrue(outer[0] < 0.80, text);
        assertEquals(4.0, ReplaceCommand.DEFAULT_RADIUS * ReplaceCommand.CENTRED_RED_LIMIT, 1e-12, "effective radius");
        System.out.println(text);
    }

    /** Share of (original, candidate, material dissolved by the original) with the candidate dissolving it too; and the count. */
    private static double[] keptShare(List<HansenParameters> solvents, List<Material> materials, double from, double to) {
        long kept = 0;
        long all = 0;
        for (HansenParameters o : solvents) {
            List<Material> dissolved = materials.stream().filter(m -> m.sphere().red(o) <= 1).toList();
            for (HansenParameters c : solvents) {
                double ra = o.distanceTo(c);
                if (c == o || ra <= from || ra > to) {
                    continue;
                }
                for (Material m : dissolved) {
                    all++;
                    if (m.sphere().red(c) <= 1) {
                        kept++;
                    }
                }
            }
        }
        return new double[] {(double) kept / all, all};
    }
}
