package org.cohesa.cli.records;

import org.cohesa.cli.AppVersion;
import org.cohesa.cli.Output;
import org.cohesa.cli.Targets;

import org.cohesa.core.records.Evidence;
import org.cohesa.core.records.EvidenceAssembler;
import org.cohesa.core.records.RecordDraft;
import org.cohesa.core.records.SubstitutionRecord;
import org.cohesa.core.records.TargetRef;
import org.cohesa.core.solvent.Blend;
import org.cohesa.core.solvent.SolventLibrary;
import org.cohesa.core.target.Material;
import org.cohesa.store.SourceCatalog;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code cohesa record add}: files a substitution with a snapshot of its evidence, in draft. */
@Command(name = "add", description = "File a substitution record (draft) with a snapshot of the evidence.")
public final class RecordAddCommand extends RecordSubcommand {

    @Option(names = "--process", required = true, paramLabel = "TEXT", description = "Process or product the change applies to.")
    String process;

    @Option(names = "--site", paramLabel = "TEXT", description = "Site or plant.")
    String site;

    @Option(names = "--replaced", required = true, paramLabel = "NAME|BLEND", description = "The solvent or blend (NAME:FRACTION,…) replaced.")
    String replaced;

    @Option(names = "--replacement", required = true, paramLabel = "NAME|BLEND", description = "The replacing solvent or blend.")
    String replacement;

    @Option(names = "--reason", required = true, paramLabel = "TEXT", description = "Why (regulatory, safety, cost, supply …).")
    String reason;

    @Option(names = "--author", required = true, paramLabel = "NAME", description = "Who files the record.")
    String author;

    @ArgGroup(exclusive = true)
    TargetChoice target;

    /** At most one of --target or --material. */
    static final class TargetChoice {
        @Option(names = "--target", paramLabel = "dD,dP,dH,R0", description = "Sphere of the material that must stay dissolved, MPa^½.")
        String sphere;
        @Option(names = "--material", paramLabel = "NAME", description = "The material that must stay dissolved, from the material library.")
        String material;
    }

    @Override
    protected void run() {
        SolventLibrary library = ctx().library();
        Blend from = RecordSupport.liquid(library, "--replaced", replaced);
        Blend to = RecordSupport.liquid(library, "--replacement", replacement);
        SourceCatalog catalog = SourceCatalog.bundled();
        String targetText = null;
        TargetRef targetRef = null;
        if (target != null && target.sphere != null) {
            var sphere = Targets.parseSphere("--target", target.sphere);
            targetText = target.sphere.strip();
            targetRef = new TargetRef("sphere entered by hand", sphere, "entered as " + targetText + " by " + author.strip() + " when filing");
        } else if (target != null && target.material != null) {
            Material m = ctx().materials().library().resolve("--material", target.material);
            targetText = m.name();
            String source = m.source() + catalog.citation(m.source()).map(c -> " — " + c).orElse("");
            targetRef = new TargetRef(m.name(), m.sphere(), source);
        }
        Evidence snapshot = EvidenceAssembler.assemble(from, to, targetRef, catalog.all(), AppVersion.get());
        RecordDraft draft = new RecordDraft(process, site, from.describe(), to.describe(), targetText, reason, snapshot);
        SubstitutionRecord r = repo().create(draft, author);
        if (json()) {
            Output.json(out(), RecordJson.Record.of(r, true));
            return;
        }
        out().println("Filed substitution record " + r.id() + " (draft). Next: cohesa record review " + r.id() + " --by NAME");
        out().println();
        RecordView.printRecord(out(), r);
    }
}
