package org.cohesa.cli.formulas;

import org.cohesa.cli.CohesaSubcommand;
import org.cohesa.cli.Output;
import org.cohesa.cli.Targets;
import org.cohesa.cli.TextTable;

import org.cohesa.core.hsp.HansenParameters;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.solvent.Blend;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code cohesa distance}: Ra and RED of a solvent or blend to a sphere. */
@Command(name = "distance", description = "Hansen distance Ra and RED of a solvent or blend to a target sphere.")
public final class DistanceCommand extends CohesaSubcommand {

    @Option(names = "--target", required = true, paramLabel = "dD,dP,dH,R0", description = "Target sphere, MPa^½.")
    String target;

    @ArgGroup(exclusive = true, multiplicity = "1")
    LiquidChoice liquid;

    /** Exactly one of --solvent or --blend. */
    static final class LiquidChoice {
        @Option(names = "--solvent", paramLabel = "NAME", required = true, description = "A library solvent by name, synonym or CAS.") String solvent;
        @Option(names = "--blend", paramLabel = "NAME:FRACTION,...", required = true, description = "A blend by volume fractions that sum to 1, e.g. toluene:0.6,ethanol:0.4.") String blend;
    }

    @Override
    protected void execute() {
        SolubilitySphere sphere = Targets.parseSphere("--target", target);
        Blend b = liquid.solvent != null
                ? Blend.pure(ctx().library().resolve("--solvent", liquid.solvent))
                : ctx().library().resolveBlend("--blend", liquid.blend);
        if (!b.hasHansen()) {
            String missing = b.solvents().stream().filter(s -> !s.hasHansen()).map(s -> s.name()).findFirst().orElse("?");
            throw new org.cohesa.core.InvalidInputException(liquid.solvent != null ? "--solvent" : "--blend", missing,
                    "has no Hansen parameters in the library");
        }
        HansenParameters p = b.hansen();
        double ra = sphere.ra(p);
        double red = sphere.red(p);
        if (json()) {
            Output.json(out(), new DistanceReport(b.describe(), Output.round(p.dD(), 3), Output.round(p.dP(), 3), Output.round(p.dH(), 3),
                    Output.round(ra, 4), Output.round(red, 4), red < 1));
            return;
        }
        TextTable t = new TextTable("liquid", "dD", "dP", "dH", "Ra", "RED", "verdict");
        t.row(b.describe(), Output.fmt(p.dD(), 2), Output.fmt(p.dP(), 2), Output.fmt(p.dH(), 2), Output.fmt(ra, 2), Output.fmt(red, 3),
                red < 1 ? "inside the sphere" : "outside the sphere");
        t.print(out());
    }
}

/** {@code cohesa distance --json}: the liquid's parameters (MPa½), Ra (MPa½) and RED to the target. */
record DistanceReport(String liquid, double dD, double dP, double dH, double ra, double red, boolean inside) {
}
