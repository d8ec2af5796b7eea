package org.cohesa.core.safety;

import java.io.IOException;
import java.io.InputStreamReader;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import org.cohesa.core.solvent.Antoine;
import org.cohesa.core.solvent.ExposureLimit;
import org.cohesa.core.solvent.FireData;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.solvent.SolventLibrary;
import org.cohesa.core.solvent.UnifacAssignment;
import org.cohesa.store.BundledData;
import org.cohesa.store.SolventCsv;

/** Builders for test solvents and access to the bundled library. */
final class TestSolvents {

    private TestSolvents() {
    }

    /** A solvent with only what the CHEM21 scoring reads (inputs named at each call site). */
    static Solvent guideInput(String name, String cas, String family, Double bpC, Double fpC, Double aitC, boolean peroxide, String hazards) {
        return new Solvent(name, List.of(), cas, null, null, family, null, null, null, null, null, bpC, null,
                new FireData(fpC, aitC, null, null), null, null, ExposureLimit.NONE,
                hazards.isBlank() ? List.of() : Arrays.asList(hazards.split(" ")), peroxide, null, UnifacAssignment.NONE, null, Map.of(), null, false);
    }

    /** A solvent for vapour–liquid computations. */
    static Solvent vle(String name, String cas, double molarVolume, Double fpC, Antoine antoine, ExposureLimit limit, String hazards) {
        return new Solvent(name, List.of(), cas, null, null, "test", null, null, null, molarVolume, null, null, null,
                new FireData(fpC, null, null, null), antoine, null, limit,
                hazards.isBlank() ? List.of() : Arrays.asList(hazards.split(" ")), false, null, UnifacAssignment.NONE, null, Map.of(), null, false);
    }

    /** The bundled solvent table as shipped in the jar. */
    static SolventLibrary bundled() {
        BundledData d = BundledData.resource("solvents.csv");
        try (Reader r = new InputStreamReader(new java.io.ByteArrayInputStream(d.bytes()), StandardCharsets.UTF_8)) {
            return new SolventLibrary(SolventCsv.read("solvents.csv", r, false));
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
    }
}
