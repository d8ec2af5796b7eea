package org.cohesa.cli.safety;

import org.cohesa.cli.Args;
import org.cohesa.cli.CohesaSubcommand;
import org.cohesa.cli.Output;
import org.cohesa.cli.TextTable;

import java.util.List;
import java.util.Locale;
import org.cohesa.core.safety.Cautions;
import org.cohesa.core.safety.IchQ3c;
import org.cohesa.core.safety.SafetyProfile;
import org.cohesa.core.safety.SafetyProfiler;
import org.cohesa.core.safety.SolventGuide;
import org.cohesa.core.safety.VapourExposure;
import org.cohesa.core.solvent.Blend;
import org.cohesa.core.solvent.SolventLibrary;
import org.cohesa.core.InvalidInputException;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code cohesa hazards}: the safety and compliance profile of one solvent or a blend. */
@Command(name = "hazards", description = {
        "Safety and compliance profile of a solvent or blend: flash point, GHS flammable-liquid category, UN packing group,",
        "hazard statements, CMR flags, saturated-vapour exposure, ICH Q3C(R8) class and the CHEM21 solvent-guide rank.",
        "Results are screening estimates: the supplier's SDS, local codes and your site's licensed safety professionals decide."})
public final class HazardsCommand extends CohesaSubcommand {

    static final class Liquid {
        @Option(names = "--solvent", paramLabel = "NAME", required = true, description = "One solvent (name, synonym or CAS number).")
        String solvent;

        @Option(names = "--blend", paramLabel = "NAME:FRACTION,...", required = true,
                description = "A blend by volume fractions, e.g. \"ethanol:0.4,water:0.6\" (fractions sum to 1; 40%% also works).")
        String blend;
    }

    @ArgGroup(exclusive = true, multiplicity = "1")
    Liquid liquid;

    @Option(names = "--temperature", paramLabel = "C", defaultValue = "25",
            description = "Liquid temperature for the vapour-exposure estimate, °C (default ${DEFAULT-VALUE}).")
    String temperature;

    @Option(names = "--ideal", description = "Use the ideal solution (activity coefficients = 1) on purpose, e.g. for comparison; the output names it.")
    boolean ideal;

    @Override
    protected void execute() {
        double celsius = Args.number("--temperature", temperature);
        if (celsius < -100 || celsius > 300) {
            throw new InvalidInputException("--temperature", temperature, "must lie between −100 and 300 °C");
        }
        SolventLibrary lib = ctx().library();
        Blend blend = liquid.solvent != null ? Blend.pure(lib.resolve("--solvent", liquid.solvent)) : lib.resolveBlend("--blend", liquid.blend);
        SafetyProfile p = SafetyProfiler.profile(blend, celsius + 273.15, ideal);
        List<String> cautions = Cautions.forProfile(p);
        if (json()) {
            Output.json(out(), HazardsReport.of(p, cautions));
        } else {
            print(p, cautions);
        }
    }

    private void print(SafetyProfile p, List<String> cautions) {
        var o = out();
        o.println("Safety profile of " + (p.isPure() ? p.components().get(0).name() : p.blend().describe() + " (volume fractions)"));
        o.println();
        String fp = p.flashPoint().celsius() == null ? switch (p.flashPoint().status()) {
            case NOT_FLAMMABLE -> "none (not flammable in our data)";
            case NONE_BELOW_BOILING -> "none below the boiling point";
            default -> "unknown";
        } : Output.fmt(p.flashPoint().celsius(), 1) + " °C";
        TextTable t = new TextTable("item", "value", "basis");
        t.row("flash point", fp, p.flashPoint().model());
        for (String d : p.flashPoint().detail()) {
            t.row("", "", d);
        }
        t.row("initial boiling point", p.initialBoilingPointC() == null ? "unknown" : Output.fmt(p.initialBoilingPointC(), 1) + " °C", p.initialBoilingPointBasis());
        t.row("GHS flammable liquid", p.ghs().category() == null ? "not classified" : "Category " + p.ghs().category(), p.ghs().basis() + " (GHS Rev. 10)");
        t.row("UN packing group", p.packingGroup() == null ? "not Class 3" : p.packingGroup(), "UN Model Regulations Rev. 23, 2.3.2.6");
        boolean waterOnly = p.exposure().components().stream().allMatch(c -> c.status().startsWith("water"));
        String index = waterOnly ? "not applicable (water)" : !p.exposure().anyCounted() ? "unknown (no limit known)"
                : Output.fmt(p.exposure().index(), 2) + (p.exposure().complete() ? "" : " (lower bound)");
        t.row(p.isPure() ? "vapour hazard ratio" : "mixture exposure index", index,
                String.format(Locale.ROOT, "saturated vapour at %.1f °C / OEL, additive (ACGIH mixtures formula)", p.temperatureC()));
        t.row("activity model", p.activityModel() == null ? "none" : p.activityModel(), "");
        t.row("solvent guide rank", p.guideRank().label(), "CHEM21 (Prat et al. 2016)" + (p.isPure() ? "" : "; least favourable component"));
        t.print(o);

        o.println();
        o.println("Hazard statements (component, % by volume):");
        if (p.hazardStatements().isEmpty()) {
            o.println("  none in our data");
        }
        for (SafetyProfile.HazardLine h : p.hazardStatements()) {
            StringBuilder who = new StringBuilder();
            for (SafetyProfile.Carrier c : h.carriers()) {
                who.append(who.length() == 0 ? "" : ", ").append(c.name()).append(' ').append(Output.fmt(c.volumePercent(), 0)).append('%');
            }
            o.println("  " + h.code() + "  " + h.text() + "  [" + who + "]");
        }

        o.println();
        TextTable ex = new TextTable("component", "vapour ppm", "limit ppm", "kind", "jurisdiction", "skin", "ratio", "status");
        for (VapourExposure.Component c : p.exposure().components()) {
            ex.row(c.name(), Output.fmt(c.saturatedPpm(), 0), Output.fmt(c.limitPpm(), 1), c.limitKind(), c.jurisdiction(), c.skin() ? "yes" : "no",
                    Output.fmt(c.ratio(), 2), c.status());
        }
        ex.print(o);
        p.exposure().notes().forEach(n -> o.println("  note: " + n));

        o.println();
        TextTable ich = new TextTable("component", "ICH class", "PDE mg/day", "limit ppm", "basis", "CHEM21 S/H/E", "rank");
        for (int i = 0; i < p.ich().size(); i++) {
            SafetyProfile.IchLine l = p.ich().get(i);
            SolventGuide.Scores s = p.guide().get(i).scores();
            ich.row(l.component(), l.entry() == null ? "not listed" : l.entry().solventClass(), l.entry() == null ? null : Output.fmt(l.entry().pdeMgPerDay(), 1),
                    l.entry() == null ? null : Output.fmt(l.entry().limitPpm(), 0),
                    l.entry() == null ? "" : l.entry().basisText(),
                    s.safety() + "/" + s.health() + "/" + s.environment(), s.rank().label() + (s.published() ? " (published)" : " (computed)"));
        }
        ich.print(o);
        o.println("  " + IchQ3c.VERSION + "; " + SolventGuide.METHOD);

        o.println();
        o.println("Cautions:");
        for (String c : cautions) {
            o.println("  - " + c);
        }
    }
}
