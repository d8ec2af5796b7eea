package org.cohesa.cli.library;

import org.cohesa.cli.CohesaSubcommand;
import org.cohesa.cli.Output;
import org.cohesa.cli.TextTable;

import org.cohesa.core.target.Material;
import org.cohesa.store.SourceCatalog;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

/** {@code cohesa material NAME}: one material's sphere with its source. */
@Command(name = "material", description = "Show one material's solubility sphere (δD, δP, δH, R0) with its source.")
public final class MaterialCommand extends CohesaSubcommand {

    @Parameters(paramLabel = "NAME", description = "Name, abbreviation or trade grade, e.g. PMMA.")
    String name;

    @Override
    protected void execute() {
        Material m = ctx().materials().library().resolve("NAME", name);
        SourceCatalog cat = SourceCatalog.bundled();
        if (json()) {
            Output.json(out(), MaterialView.json(m, cat));
            return;
        }
        TextTable t = new TextTable("property", "value");
        t.row("name", m.name());
        t.row("also known as", m.synonyms().isEmpty() ? "-" : String.join("; ", m.synonyms()));
        t.row("kind", m.kind().key());
        t.row("dD MPa^½", Output.fmt(m.sphere().centre().dD(), 1));
        t.row("dP MPa^½", Output.fmt(m.sphere().centre().dP(), 1));
        t.row("dH MPa^½", Output.fmt(m.sphere().centre().dH(), 1));
        t.row("R0 MPa^½", Output.fmt(m.sphere().r0(), 1));
        t.row("origin", m.userEntry() ? "yours" : "bundled");
        t.print(out());
        if (m.note() != null && !m.note().isBlank()) {
            out().println("note: " + m.note());
        }
        out().println("source: " + m.source() + cat.citation(m.source()).map(c -> " — " + c).orElse(""));
        out().println("Use it as a target: --target " + Output.fmt(m.sphere().centre().dD(), 1) + "," + Output.fmt(m.sphere().centre().dP(), 1)
                + "," + Output.fmt(m.sphere().centre().dH(), 1) + "," + Output.fmt(m.sphere().r0(), 1));
    }
}
