package org.cohesa.cli.library;

import org.cohesa.cli.Args;
import org.cohesa.cli.CohesaSubcommand;
import org.cohesa.cli.Output;
import org.cohesa.cli.TextTable;

import java.util.List;
import java.util.Map;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.target.Material;
import org.cohesa.core.target.MaterialKind;
import org.cohesa.store.SourceCatalog;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code cohesa materials [TEXT]}: search the material library; subcommands manage the user's own materials. */
@Command(name = "materials", description = "List or search the material library (published solubility spheres) by name, abbreviation or kind.",
        subcommands = {MaterialsCommand.Add.class, MaterialsCommand.Remove.class})
public final class MaterialsCommand extends CohesaSubcommand {

    @Parameters(arity = "0..1", paramLabel = "TEXT", description = "Part of a name or abbreviation, or a kind (polymer, resin, drug, pigment, other).")
    String text;

    @Option(names = "--mine", description = "Only your own materials.")
    boolean mine;

    @Override
    protected void execute() {
        List<Material> all = ctx().materials().all();
        List<Material> hits = new org.cohesa.core.target.MaterialLibrary(all).search(text).stream()
                .filter(m -> !mine || m.userEntry()).toList();
        if (json()) {
            SourceCatalog cat = SourceCatalog.bundled();
            Output.json(out(), hits.stream().map(m -> MaterialView.json(m, cat)).toList());
            return;
        }
        TextTable t = new TextTable("name", "kind", "dD", "dP", "dH", "R0", "source", "origin");
        for (Material m : hits) {
            t.row(m.name(), m.kind().key(), Output.fmt(m.sphere().centre().dD(), 1), Output.fmt(m.sphere().centre().dP(), 1),
                    Output.fmt(m.sphere().centre().dH(), 1), Output.fmt(m.sphere().r0(), 1), m.source(), m.userEntry() ? "yours" : "bundled");
        }
        t.print(out());
        out().println(hits.size() + " of " + all.size() + " materials; values marked memory-… are recalled from the literature and need checking");
    }

    /** {@code cohesa materials add}: the user's own sphere, typed in. */
    @Command(name = "add", description = "Add your own material with a known sphere.")
    static final class Add extends CohesaSubcommand {
        @Option(names = "--name", required = true, description = "Name of the material.") String name;
        @Option(names = "--dD", description = "δD of the centre, MPa^½.") String dD;
        @Option(names = "--dP", description = "δP of the centre, MPa^½.") String dP;
        @Option(names = "--dH", description = "δH of the centre, MPa^½.") String dH;
        @Option(names = "--r0", description = "Interaction radius R0, MPa^½ (required unless --smiles is given).") String r0;
        @Option(names = "--smiles", description = "Structure of a drug substance or other small molecule: the centre is estimated from it "
                + "(give --dD/--dP/--dH to override); without --r0 a default screening radius is used, with a caution.") String smiles;
        @Option(names = "--kind", description = "polymer, resin, drug, pigment or other (default other; drug with --smiles).") String kind;
        @Option(names = "--source", description = "Where the sphere comes from (default: 'user entry').") String source;
        @Option(names = "--synonym", description = "Another name (repeatable).") List<String> synonyms = List.of();
        @Option(names = "--note", description = "Free note.") String note;

        @Override
        protected void execute() {
            MaterialKind k;
            String kindText = kind != null ? kind : smiles != null ? "drug" : "other";
            try {
                k = MaterialKind.parse(kindText);
            } catch (IllegalArgumentException e) {
                throw new InvalidInputException("--kind", kindText, "must be one of " + MaterialKind.allowed());
            }
            org.cohesa.store.StructureEntries.Centre c;
            if (smiles != null) {
                c = org.cohesa.cli.structure.MaterialFromStructure.centre(smiles, dD, dP, dH, r0);
            } else {
                for (String[] req : new String[][] {{"--dD", dD}, {"--dP", dP}, {"--dH", dH}, {"--r0", r0}}) {
                    if (req[1] == null) {
                        throw new InvalidInputException(req[0], "(missing)", "is required (or give --smiles to estimate the centre from the structure)");
                    }
                }
                c = new org.cohesa.store.StructureEntries.Centre(parameter("--dD", dD), parameter("--dP", dP), parameter("--dH", dH),
                        radius(r0), null, java.util.List.of());
            }
            SolubilitySphere s = SolubilitySphere.of(c.dD(), c.dP(), c.dH(), c.r0());
            String src = source != null ? source : c.source() != null ? c.source() : "user entry";
            String fullNote = c.lines().isEmpty() ? note
                    : (note == null || note.isBlank() ? "" : note + "; ") + String.join("; ", c.lines());
            Material m = new Material(name, synonyms, k, s, src, fullNote, true);
            ctx().materials().add(m);
            if (json()) {
                Output.json(out(), MaterialView.json(m, SourceCatalog.bundled()));
            } else {
                out().println("added " + m.name());
                c.lines().forEach(l -> out().println("  " + l));
            }
        }

        static double parameter(String field, String text) {
            double d = Args.number(field, text);
            if (d < 0 || d > 60) {
                throw new InvalidInputException(field, text, "must be a number from 0 to 60 MPa^½");
            }
            return d;
        }

        static double radius(String text) {
            double d = Args.number("--r0", text);
            if (d <= 0 || d > 60) {
                throw new InvalidInputException("--r0", text, "must be a positive number up to 60 MPa^½");
            }
            return d;
        }
    }

    /** {@code cohesa materials remove NAME}. */
    @Command(name = "remove", description = "Remove one of your own materials.")
    static final class Remove extends CohesaSubcommand {
        @Parameters(paramLabel = "NAME") String name;

        @Override
        protected void execute() {
            String resolved = ctx().materials().library().resolve("NAME", name).name();
            ctx().materials().remove(resolved);
            if (json()) {
                Output.json(out(), Map.of("removed", resolved));
            } else {
                out().println("removed " + resolved);
            }
        }
    }
}
