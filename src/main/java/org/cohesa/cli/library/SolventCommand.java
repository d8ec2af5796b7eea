package org.cohesa.cli.library;

import org.cohesa.cli.CohesaSubcommand;
import org.cohesa.cli.Output;
import org.cohesa.cli.TextTable;

import java.util.Map;
import org.cohesa.core.coverage.Provenance;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.store.SolventFields;
import org.cohesa.store.SourceCatalog;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

/** {@code cohesa solvent NAME|CAS}: one full record with its sources. */
@Command(name = "solvent", description = "Show one solvent's full record with the source of each value.")
public final class SolventCommand extends CohesaSubcommand {

    @Parameters(paramLabel = "NAME|CAS", description = "Name, synonym or CAS number.")
    String name;

    @Override
    protected void execute() {
        Solvent s = ctx().library().resolve("NAME", name);
        SourceCatalog cat = SourceCatalog.bundled();
        if (json()) {
            Output.json(out(), SolventView.json(s, cat));
            return;
        }
        Map<String, String> row = SolventFields.toRow(s);
        TextTable t = new TextTable("property", "value", "source", "basis");
        for (String col : SolventFields.VALUES) {
            String v = row.get(col);
            if (v == null || v.isEmpty()) {
                continue;
            }
            String key = s.sources().get(sourceGroup(col));
            t.row(col, v, key == null ? "" : key, Provenance.of(key, s.userEntry()).label());
        }
        if (s.pricePerLitre() != null) {
            t.row("price_per_litre", Output.fmt(s.pricePerLitre(), 2), "your entry", Provenance.USER.label());
        }
        t.print(out());
        SolventView.vapourAt25C(s).ifPresent(v -> out().println("vapour pressure at 25 °C: " + Output.fmt(v.kilopascal(), 3) + " kPa — "
                + v.basis()));
        if (!s.hasHansen()) {
            out().println("No published Hansen parameters in the library: kept for its safety data, left out of searches.");
        }
        if (s.note() != null && !s.note().isBlank()) {
            out().println("note: " + s.note());
        }
        out().println();
        out().println("sources:");
        s.sources().values().stream().distinct().forEach(k -> out().println("  " + k + ": " + cat.citation(k).orElse("(see solvent-db/SOURCES.md)")));
    }

    static String sourceGroup(String column) {
        return switch (column) {
            case "name", "synonyms", "cas", "formula", "family", "families" -> "identity";
            case "smiles" -> "smiles";
            case "molar_mass" -> "molar_mass";
            case "density", "molar_volume" -> "density";
            case "dD", "dP", "dH" -> "hsp";
            case "boiling_point_c" -> "boiling_point";
            case "melting_point_c" -> "melting_point";
            case "flash_point_c" -> "flash_point";
            case "autoignition_c" -> "autoignition";
            case "lfl_pct", "ufl_pct" -> "flammability_limits";
            case "hvap_kj_mol" -> "hvap";
            case "hazard_statements" -> "hazard_statements";
            case "peroxide_former" -> "peroxide_former";
            case "ich_class" -> "ich";
            case "unifac_groups" -> "unifac";
            default -> column.startsWith("vp_") ? "vapour_pressure" : column.startsWith("oel") ? "oel" : column;
        };
    }
}
