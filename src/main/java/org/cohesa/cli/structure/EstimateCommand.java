package org.cohesa.cli.structure;

import java.util.Locale;
import java.util.Map;
import org.cohesa.cli.CohesaSubcommand;
import org.cohesa.cli.Output;
import org.cohesa.cli.TextTable;
import org.cohesa.core.structure.EstimatedValue;
import org.cohesa.core.structure.StructureEstimate;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Parameters;

/** {@code cohesa estimate SMILES}: Hansen parameters, molar volume and UNIFAC groups from a structure; nothing stored. */
@Command(name = "estimate", description = "Estimate Hansen parameters, molar volume and UNIFAC groups from a SMILES, with the route and "
        + "expected error of each value (nothing is stored). Measured properties you give move a component to the property route.")
public final class EstimateCommand extends CohesaSubcommand {

    @Parameters(paramLabel = "SMILES", description = "The structure, e.g. CCOC(C)=O for ethyl acetate (one neutral molecule).")
    String smiles;

    @Mixin
    MeasuredOptions measured = new MeasuredOptions();

    @Override
    protected void execute() {
        StructureEstimate e = StructureEstimates.estimate("SMILES", smiles, measured.properties());
        if (json()) {
            Output.json(out(), e);
            return;
        }
        print(e);
    }

    void print(StructureEstimate e) {
        out().println(e.structure().smiles() + "  " + e.structure().formula() + "  "
                + Output.fmt(e.structure().molarMass(), 2) + " g/mol  family: " + e.family());
        TextTable t = new TextTable("quantity", "value", "± MAE", "P90", "route");
        row(t, "δD MPa½", e.dD());
        row(t, "δP MPa½", e.dP());
        row(t, "δH MPa½", e.dH());
        row(t, "Vm cm³/mol", e.molarVolume());
        t.print(out());
        out().println("UNIFAC (original): " + (e.unifac().complete() ? StructureEstimates.groupNames(e.unifac().groups()) : "none (atoms "
                + String.join(", ", e.unifac().unplaced()) + " have no group)"));
        if (!e.lleGroups().isEmpty()) {
            out().println("UNIFAC (liquid–liquid set): " + format(e.lleGroups()));
        }
        for (String w : e.warnings()) {
            out().println("caution: " + w);
        }
    }

    private static void row(TextTable t, String label, EstimatedValue v) {
        if (v == null) {
            t.row(label, "—", "", "", "not covered by the method");
            return;
        }
        t.row(label, Output.fmt(v.value(), 1), v.estimated() ? Output.fmt(v.expectedMae(), 1) : "", v.estimated() ? Output.fmt(v.expectedP90(), 1) : "",
                v.route() + (v.estimated() ? "" : ""));
    }

    private static String format(Map<Integer, Integer> groups) {
        StringBuilder sb = new StringBuilder();
        groups.entrySet().stream().sorted(Map.Entry.comparingByKey())
                .forEach(g -> sb.append(sb.length() == 0 ? "" : " ").append(String.format(Locale.ROOT, "%d:%d", g.getKey(), g.getValue())));
        return sb.toString();
    }
}
