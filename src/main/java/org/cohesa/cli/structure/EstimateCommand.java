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

    /**
     * The estimate with, when ΔHvap is given, δt from it ({@code dt}) and δH as its remainder ({@code dH_remainder},
     * only with δD and δP from n_D and μ); both null otherwise.
     */
    record Report(@com.fasterxml.jackson.annotation.JsonUnwrapped StructureEstimate estimate,
            @com.fasterxml.jackson.annotation.JsonProperty("dt") EstimatedValue total,
            @com.fasterxml.jackson.annotation.JsonProperty("dH_remainder") EstimatedValue remainder) {
    }

    @Override
    protected void execute() {
        var m = measured.properties();
        StructureEstimate e = StructureEstimates.estimate("SMILES", smiles, m);
        Report r = new Report(e, org.cohesa.core.structure.StructureEstimator.totalFromVaporisation(e, m),
                org.cohesa.core.structure.StructureEstimator.hydrogenBondingRemainder(e, m));
        if (json()) {
            Output.json(out(), r);
            return;
        }
        print(r);
    }

    void print(Report r) {
        StructureEstimate e = r.estimate();
        out().println(e.structure().smiles() + "  " + e.structure().formula() + "  "
                + Output.fmt(e.structure().molarMass(), 2) + " g/mol  family: " + e.family());
        TextTable t = new TextTable("quantity", "value", "± MAE", "P90", "route");
        row(t, "δD MPa½", e.dD());
        row(t, "δP MPa½", e.dP());
        row(t, "δH MPa½", e.dH());
        row(t, "Vm cm³/mol", e.molarVolume());
        if (r.total() != null) {
            row(t, "δt MPa½", r.total());
        }
        if (r.remainder() != null) {
            row(t, "δH remainder", r.remainder());
        }
        t.print(out());
        if (r.total() != null && e.hasHansen()) {
            double sum = Math.sqrt(e.dD().value() * e.dD().value() + e.dP().value() * e.dP().value() + e.dH().value() * e.dH().value());
            out().println("check: √(δD² + δP² + δH²) = " + Output.fmt(sum, 1) + " against δt " + Output.fmt(r.total().value(), 1) + " from ΔHvap"
                    + (Math.abs(sum - r.total().value()) > r.total().expectedP90() ? ": more than 90 % of that route's errors apart" : ": within that route's P90")
                    + (r.remainder() != null ? "; the group δH is kept (closer on the published table than the remainder)" : ""));
        }
        for (org.cohesa.core.structure.GroupMethodValues g : e.groupMethods()) {
            out().println("group method " + g.method() + ": δD " + one(g.dD()) + ", δP " + one(g.dP()) + ", δH " + one(g.dH())
                    + (g.firstOrder().isEmpty() ? "" : "  groups " + counts(g.firstOrder())
                            + (g.secondOrder().isEmpty() ? "" : "; second order " + counts(g.secondOrder()))));
        }
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

    private static String one(Double v) {
        return v == null ? "—" : Output.fmt(v, 1);
    }

    private static String counts(Map<String, Integer> groups) {
        StringBuilder sb = new StringBuilder();
        new java.util.TreeMap<>(groups).forEach((g, n) -> sb.append(sb.length() == 0 ? "" : ", ").append(g).append(" ×").append(n));
        return sb.toString();
    }

        private static String format(Map<Integer, Integer> groups) {
        StringBuilder sb = new StringBuilder();
        groups.entrySet().stream().sorted(Map.Entry.comparingByKey())
                .forEach(g -> sb.append(sb.length() == 0 ? "" : " ").append(String.format(Locale.ROOT, "%d:%d", g.getKey(), g.getValue())));
        return sb.toString();
    }
}
