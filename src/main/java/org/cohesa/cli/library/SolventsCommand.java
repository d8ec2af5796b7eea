package org.cohesa.cli.library;

import org.cohesa.cli.CohesaSubcommand;
import org.cohesa.cli.InputFile;
import org.cohesa.cli.Output;
import org.cohesa.cli.TextTable;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.RowError;
import org.cohesa.core.coverage.LibraryCoverage;
import org.cohesa.core.coverage.PropertyCoverage;
import org.cohesa.core.coverage.WorkflowCoverage;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.solvent.SolventLibrary;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.databind.SequenceWriter;
import org.cohesa.store.SolventCsv;
import org.cohesa.store.SolventFields;
import org.cohesa.store.SourceCatalog;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code cohesa solvents [TEXT]}: search the library; subcommands manage the user's own entries. */
@Command(name = "solvents", description = "List or search the solvent library by name, synonym or CAS.",
        subcommands = {SolventsCommand.Add.class, SolventsCommand.Import.class, SolventsCommand.Export.class,
                SolventsCommand.Remove.class, SolventsCommand.Price.class})
public final class SolventsCommand extends CohesaSubcommand {

    @Parameters(arity = "0..1", paramLabel = "TEXT", description = "Part of a name, synonym or CAS number.")
    String text;

    @Option(names = "--mine", description = "Only your own entries.")
    boolean mine;

    @Option(names = "--coverage", description = "Per property: how many solvents have a value, and how many of those are measured, "
            + "estimated or recalled from memory; and how many solvents with Hansen parameters can be dried and flash-point-checked.")
    boolean coverage;

    @Override
    protected void execute() throws IOException {
        if (coverage) {
            printCoverage();
            return;
        }
        // streamed from the database: a library of 100,000 entries is listed without holding it in memory
        SourceCatalog cat = SourceCatalog.bundled();
        TextTable t = json() ? null : new TextTable("name", "CAS", "dD", "dP", "dH", "Vm", "bp °C", "flash °C", "ICH", "origin");
        int[] shown = {0};
        try (SequenceWriter w = json() ? Output.mapper().writer().without(JsonGenerator.Feature.AUTO_CLOSE_TARGET).writeValuesAsArray(out()) : null) {
            java.util.function.Consumer<Solvent> show = s -> {
                shown[0]++;
                if (w == null) {
                    row(t, s);
                    return;
                }
                try {
                    w.write(SolventView.json(s, cat));
                } catch (IOException e) {
                    throw new java.io.UncheckedIOException(e);
                }
            };
            if (text == null || text.isBlank()) {
                ctx().solvents().forEach(mine, show);
            } else {
                // best matches first, as the library's search orders them; only the hits are kept
                List<List<Solvent>> byRelevance = List.of(new ArrayList<>(), new ArrayList<>(), new ArrayList<>(), new ArrayList<>());
                ctx().solvents().forEach(mine, s -> {
                    int rank = SolventLibrary.relevance(s, text);
                    if (rank < 4) {
                        byRelevance.get(rank).add(s);
                    }
                });
                byRelevance.forEach(l -> l.forEach(show));
            }
        } catch (java.io.UncheckedIOException e) {
            throw e.getCause();
        }
        if (json()) {
            out().println();
            return;
        }
        t.print(out());
        out().println(shown[0] + " of " + ctx().solvents().count() + " solvents");
    }

    private static void row(TextTable t, Solvent s) {
        t.row(s.name(), s.cas(), s.hasHansen() ? Output.fmt(s.hansen().dD(), 1) : "-",
                s.hasHansen() ? Output.fmt(s.hansen().dP(), 1) : "-", s.hasHansen() ? Output.fmt(s.hansen().dH(), 1) : "-",
                Output.fmt(s.effectiveMolarVolume(), 1), Output.fmt(s.boilingPointC(), 1), Output.fmt(s.flashPointC(), 1),
                s.ichClass(), s.userEntry() ? "yours" : "bundled");
    }

    private void printCoverage() {
        List<Solvent> all = ctx().library().all().stream().filter(s -> !mine || s.userEntry())
                .filter(s -> text == null || ctx().library().search(text).contains(s)).toList();
        Solvent partner = ctx().library().all().stream().filter(s -> s.name().equals(COVERAGE_PARTNER)).findFirst()
                .or(() -> ctx().library().all().stream().filter(s -> s.flashPointC() != null && s.vapourPressure() != null).findFirst())
                .orElseThrow(() -> new InvalidInputException("--coverage", "-", "the library has no solvent with a flash point and a vapour pressure"));
        LibraryCoverage c = LibraryCoverage.of(all, partner);
        if (json()) {
            Output.json(out(), CoverageReport.of(c));
            return;
        }
        TextTable t = new TextTable("property", "have", "of", "%", "measured", "estimated", "from memory", "derived", "yours");
        for (PropertyCoverage p : c.properties()) {
            t.row(p.label(), p.have(), p.solvents(), Output.fmt(100 * p.fraction(), 0), p.measured(), p.estimated(), p.memory(), p.derived(),
                    p.user());
        }
        t.print(out());
        Map<String, Integer> vp = c.vapourPressureAt25C();
        out().println("vapour pressure at 25 °C: " + vp.get("correlation") + " from a published correlation inside its range, "
                + vp.get("extrapolated") + " extrapolated outside it, " + vp.get("estimate") + " estimated, " + vp.get("none") + " none");
        WorkflowCoverage w = c.workflows();
        out().println("of " + w.hansenSolvents() + " solvents with Hansen parameters: drying path computable for " + w.dryingComputable()
                + " (" + Output.fmt(100 * w.dryingFraction(), 1) + " %), blend flash point for " + w.blendFlashPointComputable() + " ("
                + Output.fmt(100 * w.blendFlashPointFraction(), 1) + " %, tested as 50/50 with " + w.partner() + ")");
        if (!w.notDrying().isEmpty()) {
            out().println("no drying path: " + String.join(", ", w.notDrying().stream().map(n -> n.split(":")[0]).toList()));
        }
        if (!w.notFlashPoint().isEmpty()) {
            out().println("no blend flash point: " + String.join(", ", w.notFlashPoint().stream().map(n -> n.split(":")[0]).toList()));
        }
        out().println("measured = from a published table or paper; estimated = an estimate (error in docs/methods.md); "
                + "from memory = recalled, not yet checked; derived = computed from other values. Sources: solvent-db/SOURCES.md.");
    }

    /** The second component of the 50/50 test blend of the coverage's flash-point check. */
    static final String COVERAGE_PARTNER = "n-butyl acetate";

    /** {@code cohesa solvents add}: a user entry from options. */
    @Command(name = "add", description = "Add your own solvent. Any column of the CSV format can be set with --set column=value.")
    static final class Add extends CohesaSubcommand {
        @Option(names = "--name", required = true, description = "Name as chemists write it.") String name;
        @Option(names = "--cas", description = "CAS number.") String cas;
        @Option(names = "--dD", description = "δD, MPa^½.") String dD;
        @Option(names = "--dP", description = "δP, MPa^½.") String dP;
        @Option(names = "--dH", description = "δH, MPa^½.") String dH;
        @Option(names = "--molar-volume", description = "cm³/mol.") String molarVolume;
        @Option(names = "--boiling-point", description = "°C.") String boilingPoint;
        @Option(names = "--flash-point", description = "closed cup, °C.") String flashPoint;
        @Option(names = "--price", description = "Price per litre, any currency.") String price;
        @Option(names = "--smiles", description = "Structure: formula, molar mass, UNIFAC groups and the Hansen parameters and molar volume"
                + " you do not give are estimated from it (marked estimated, with route and error in the note).") String smiles;
        @Option(names = "--refractive-index", paramLabel = "N_D", description = "With --smiles: measured refractive index n_D (δD from the molar refraction, as the desktop form).")
        String refractiveIndex;
        @Option(names = "--dipole", paramLabel = "DEBYE", description = "With --smiles: dipole moment, debye (δP by Hansen–Beerbower, as the desktop form).")
        String dipole;
        @Option(names = "--set", paramLabel = "COLUMN=VALUE", description = "Any other column, e.g. --set hazard_statements=\"H225 H319\".")
        Map<String, String> set = new LinkedHashMap<>();

        @Override
        protected void execute() {
            Map<String, String> row = new LinkedHashMap<>();
            row.put("name", name);
            put(row, "cas", cas);
            put(row, "dD", dD);
            put(row, "dP", dP);
            put(row, "dH", dH);
            put(row, "molar_volume", molarVolume);
            put(row, "boiling_point_c", boilingPoint);
            put(row, "flash_point_c", flashPoint);
            put(row, "price_per_litre", price);
            for (Map.Entry<String, String> e : set.entrySet()) {
                if (!SolventFields.EXPORT_COLUMNS.contains(e.getKey())) {
                    throw new InvalidInputException("--set", e.getKey() + "=" + e.getValue(), "unknown column '" + e.getKey() + "'");
                }
                row.put(e.getKey(), e.getValue());
            }
            if (smiles == null && (refractiveIndex != null || dipole != null)) {
                throw new InvalidInputException(refractiveIndex != null ? "--refractive-index" : "--dipole",
                        refractiveIndex != null ? refractiveIndex : dipole, "is used with --smiles only (it moves a structure estimate to the property route)");
            }
            List<String> estimated = smiles == null ? List.of()
                    : org.cohesa.cli.structure.SolventFromStructure.fill(row, smiles, refractiveIndex, dipole);
            List<RowError> errors = new ArrayList<>();
            Solvent s = SolventFields.fromRow(row, 1, true, errors);
            if (s == null) {
                RowError e = errors.get(0);
                throw new InvalidInputException(option(e.column()), e.value(), e.reason());
            }
            ctx().solvents().add(s);
            if (json()) {
                Output.json(out(), SolventView.json(ctx().library().resolve("name", s.name()), SourceCatalog.bundled()));
            } else {
                out().println("added " + s.name() + (s.hasHansen() ? "" : " (no Hansen parameters: left out of searches)"));
                estimated.forEach(line -> out().println("  " + line));
            }
        }

        private static void put(Map<String, String> row, String col, String v) {
            if (v != null) {
                row.put(col, v);
            }
        }

        private static String option(String column) {
            return switch (column) {
                case "molar_volume" -> "--molar-volume";
                case "boiling_point_c" -> "--boiling-point";
                case "flash_point_c" -> "--flash-point";
                case "price_per_litre" -> "--price";
                case "name", "cas", "dD", "dP", "dH" -> "--" + column;
                default -> column;
            };
        }
    }

    /** {@code cohesa solvents import FILE}: all rows or none. */
    @Command(name = "import", description = "Import your own solvents from a CSV file (columns as in 'solvents export'). Any bad row: nothing is imported and every bad cell is listed.")
    static final class Import extends CohesaSubcommand {
        @Parameters(paramLabel = "FILE") Path file;

        @Override
        protected void execute() throws IOException {
            List<Solvent> rows;
            rows = InputFile.read("FILE", file, r -> SolventCsv.read(file.toString(), r, true));
            ctx().solvents().importAll(rows);
            if (json()) {
                Output.json(out(), Map.of("imported", rows.size(), "names", rows.stream().map(Solvent::name).toList()));
            } else {
                out().println("imported " + rows.size() + " solvents from " + file);
            }
        }
    }

    /** {@code cohesa solvents export FILE}. */
    @Command(name = "export", description = "Write solvents to a CSV file that 'solvents import' reads back. An existing file is replaced only"
            + " with --overwrite; text a spreadsheet would run as a formula is written with a leading apostrophe.")
    static final class Export extends CohesaSubcommand {
        @Parameters(paramLabel = "FILE") Path file;
        @Option(names = "--mine", description = "Only your own entries (default: the whole library).") boolean mine;
        @Option(names = "--overwrite", description = "Replace FILE if it exists (never a folder, device or other non-regular file).")
        boolean overwrite;

        /** What was written. */
        record Json(int exported, String file) {
        }

        @Override
        protected void execute() throws IOException {
            org.cohesa.cli.OutputFile.check("FILE", file, overwrite);
            List<Solvent> all = ctx().library().all().stream().filter(s -> !mine || s.userEntry()).toList();
            org.cohesa.cli.OutputFile.write("FILE", file, overwrite, out -> {
                Writer w = new java.io.OutputStreamWriter(out, StandardCharsets.UTF_8);
                SolventCsv.write(w, all);
            });
            if (json()) {
                Output.json(out(), new Json(all.size(), file.toString()));
            } else {
                out().println("exported " + all.size() + " solvents to " + file);
            }
        }
    }

    /** {@code cohesa solvents remove NAME}. */
    @Command(name = "remove", description = "Remove one of your own solvents.")
    static final class Remove extends CohesaSubcommand {
        @Parameters(paramLabel = "NAME") String name;

        @Override
        protected void execute() {
            String resolved = ctx().library().resolve("NAME", name).name();
            ctx().solvents().remove(name);
            if (json()) {
                Output.json(out(), Map.of("removed", resolved));
            } else {
                out().println("removed " + resolved);
            }
        }
    }

    /** {@code cohesa solvents price NAME PRICE}: the user's price, used by cost constraints. */
    @Command(name = "price", description = "Set your price per litre for a solvent (any currency; 'none' clears it).")
    static final class Price extends CohesaSubcommand {
        @Parameters(index = "0", paramLabel = "NAME") String name;
        @Parameters(index = "1", paramLabel = "PRICE") String price;

        @Override
        protected void execute() {
            Double p = null;
            if (!price.equalsIgnoreCase("none")) {
                try {
                    p = Double.parseDouble(price);
                } catch (NumberFormatException e) {
                    throw new InvalidInputException("PRICE", price, "not a number");
                }
            }
            ctx().solvents().setPrice(name, p);
            String resolved = ctx().library().resolve("NAME", name).name();
            if (json()) {
                Map<String, Object> m = new LinkedHashMap<>();
                m.put("name", resolved);
                m.put("price_per_litre", p);
                Output.json(out(), m);
            } else {
                out().println(resolved + ": price per litre " + (p == null ? "cleared" : Output.fmt(p, 2)));
            }
        }
    }
}
