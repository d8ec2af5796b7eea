package org.cohesa.store;

import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.records.EvidenceBuilder;
import org.cohesa.core.records.RecordDraft;
import org.cohesa.core.records.TargetRef;
import org.cohesa.core.solvent.Blend;
import org.cohesa.core.solvent.SolventLibrary;

/** Drafts built from real library solvents for the store tests (the process names are invented test data). */
public final class RecordFixtures {

    private RecordFixtures() {
    }

    /** A draft whose evidence is assembled as `record new` assembles it (safety profile, ranking terms, drying path). */
    public static RecordDraft assembledDraft(SolventLibrary library, String process, String replaced, String replacement) {
        Blend from = library.resolveBlend("--replaced", replaced + ":1");
        Blend to = library.resolveBlend("--replacement", replacement + ":1");
        var evidence = org.cohesa.core.records.EvidenceAssembler.assemble(from, to, null, SourceCatalog.bundled().all(), "test");
        return new RecordDraft(process, "test site (invented)", from.describe(), to.describe(), null, "test: regulatory", evidence);
    }

    public static RecordDraft draft(SolventLibrary library, String process, String replaced, String replacement) {
        Blend from = library.resolveBlend("--replaced", replaced.contains(":") ? replaced : replaced + ":1");
        Blend to = library.resolveBlend("--replacement", replacement.contains(":") ? replacement : replacement + ":1");
        var evidence = new EvidenceBuilder(from, to, "test")
                .target(new TargetRef("invented test sphere", SolubilitySphere.of(18, 9, 8, 7), "invented for tests"))
                .citations(SourceCatalog.bundled().all())
                .build();
        return new RecordDraft(process, "test site (invented)", from.describe(), to.describe(), "18,9,8,7", "test: regulatory", evidence);
    }
}
