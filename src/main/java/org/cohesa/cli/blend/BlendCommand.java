package org.cohesa.cli.blend;

import org.cohesa.cli.CohesaSubcommand;
import org.cohesa.cli.Output;
import org.cohesa.cli.Targets;
import org.cohesa.cli.TextTable;

import java.util.ArrayList;
import java.util.List;
import org.cohesa.core.blend.BlendConstraints;
import org.cohesa.core.blend.BlendDesigner;
import org.cohesa.core.blend.BlendSuggestion;
import org.cohesa.core.blend.RankBy;
import org.cohesa.core.blend.RankedBlend;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.solvent.LibraryAtTemperature;
import org.cohesa.core.solvent.SolventLibrary;
import org.cohesa.core.target.Material;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** {@code cohesa blend}: single solvents and 2–4 component blends inside a target sphere, exact and ranked. */
@Command(name = "blend", description = {
        "Design single solvents and 2-4 component blends (volume fractions) for a target sphere under your constraints.",
        "Every subset of the library is searched exactly; each blend's composition is the exact optimum; blends that split into two liquid phases are left out (or flagged)."})
public final class BlendCommand extends CohesaSubcommand {

    @ArgGroup(exclusive = true, multiplicity = "1")
    TargetChoice targetChoice;

    /** Exactly one of --target or --material. */
    static final class TargetChoice {
        @Option(names = "--target", paramLabel = "dD,dP,dH,R0", required = true, description = "Target sphere, MPa^½.")
        String target;
        @Option(names = "--material", paramLabel = "NAME", required = true, description = "A material from the library (see 'materials').")
        String material;
    }

    @Mixin
    BlendOptions options;

    @Override
    protected void execute() {
        Material material = null;
        SolubilitySphere sphere;
        if (targetChoice.target != null) {
            sphere = Targets.parseSphere("--target", targetChoice.target);
        } else {
            material = ctx().materials().library().resolve("--material", targetChoice.material);
            sphere = material.sphere();
        }
        int k = options.maxComponents();
        int top = options.top();
        RankBy rankBy = options.rankBy();
        double redLimit = options.redLimit();
        double kelvin = options.kelvin();
        // the solvents' parameters at the process temperature (the material's sphere stays as measured)
        LibraryAtTemperature atTemperature = LibraryAtTemperature.of(ctx().library(), options.kelvin());
        SolventLibrary lib = atTemperature.library();
        BlendConstraints c = options.forSolute(options.constraints(lib, null), material);
        options.checkPricesExist(lib);
        if (c.fixed().size() >= k) {
            throw new org.cohesa.core.InvalidInputException("--max-components", String.valueOf(k),
                    "must exceed the number of fixed components (" + c.fixed().size() + ")");
        }
        BlendDesigner.Request req = new BlendDesigner.Request(sphere, c, k, top, rankBy, redLimit, options.keepTwoPhase, kelvin,
                options.weights(org.cohesa.core.blend.ProcessUse.defaultFor(material), null));
        BlendDesigner.Result r = BlendDesigner.design(lib.all(), req, PhaseChecks.miscibility(), BlendOptions.waterCheck(lib, c),
                BlendView.progress(spec.commandLine().getErr()), null);
        if (json()) {
            BlendReport.Target t = new BlendReport.Target(sphere.centre().dD(), sphere.centre().dP(), sphere.centre().dH(), sphere.r0(),
                    material == null ? null : material.name(), material == null ? null : material.source(), null);
            Output.json(out(), new BlendReport.Blends(t, BlendReport.Temperature.of(atTemperature), rankBy.word(), redLimit, options.ranking(r, req.weights()), BlendReport.search(r),
                    options.appliedLimits(c), BlendReport.suggestions(r, null), BlendView.SCREENING));
            return;
        }
        out().println("target: δD " + Output.fmt(sphere.centre().dD(), 1) + ", δP " + Output.fmt(sphere.centre().dP(), 1) + ", δH "
                + Output.fmt(sphere.centre().dH(), 1) + ", R0 " + Output.fmt(sphere.r0(), 1) + " MPa^½"
                + (material == null ? "" : " (" + material.name() + ", source " + material.source() + ")"));
        if (atTemperature.describe() != null) {
            out().println(atTemperature.describe());
        }
        out().println(BlendView.summary(r));
        if (options.process == null && req.weights().use() != org.cohesa.core.blend.ProcessUse.GENERAL) {
            out().println("process: " + req.weights().use().word() + " by default for a semicrystalline polymer: it is dissolved warm or hot and the "
                    + "solvent leaves by hot drying or a non-solvent bath, not by evaporation at 25 °C (--process general or film weighs that)");
        }
        BlendView.header(out(), r, c, options, req.weights());
        String secondary = BlendView.secondaryLabel(rankBy);
        List<String> header = new ArrayList<>(List.of("#", "blend (volume %)", "dD", "dP", "dH", "Ra", "RED"));
        if (secondary != null) {
            header.add(secondary);
        }
        header.add("phases");
        TextTable table = new TextTable(header.toArray(String[]::new));
        int rank = 1;
        for (BlendSuggestion s : r.suggestions()) {
            RankedBlend b = s.blend();
            List<Object> row = new ArrayList<>(List.of(rank++, BlendView.describe(b), Output.fmt(b.point().dD(), 2), Output.fmt(b.point().dP(), 2),
                    Output.fmt(b.point().dH(), 2), Output.fmt(b.ra(), 2), Output.fmt(b.red(), 3)));
            if (secondary != null) {
                row.add(BlendView.secondaryText(b));
            }
            row.add(BlendView.phaseText(s));
            table.row(row.toArray());
        }
        if (r.suggestions().isEmpty()) {
            out().println(rankBy == RankBy.DESIRABILITY
                    ? "no blend reaches RED ≤ " + Output.fmt(redLimit, 2) + " under these constraints (--rank-by red shows the closest ones, --red-limit widens the limit)"
                    : "no blend meets the constraints");
        } else {
            table.print(out());
            BlendView.notes(out(), r.suggestions(), options.all);
        }
        out().println(BlendView.SCREENING);
    }
}
