package org.cohesa.cli.drying;

import org.cohesa.cli.Args;
import org.cohesa.cli.OutputFile;
import org.cohesa.cli.CohesaSubcommand;
import org.cohesa.cli.Output;
import org.cohesa.cli.Targets;
import org.cohesa.cli.TextTable;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.drying.DryingPath;
import org.cohesa.core.drying.DryingRequest;
import org.cohesa.core.drying.DryingSimulator;
import org.cohesa.core.drying.PathPoint;
import org.cohesa.core.drying.TailSolventAdvisor;
import org.cohesa.core.drying.TailSuggestion;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.solvent.Blend;
import org.cohesa.core.solvent.SolventLibrary;
import org.cohesa.report.png.DryingPlot;
import org.cohesa.store.WaterMiscibilityCsv;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code cohesa dry}: how a blend's composition, parameters and RED move while it evaporates. */
@Command(name = "dry", description = {
        "Simulate the evaporation of a blend from an open film (isothermal) and follow its composition, δD/δP/δH and RED to a target.",
        "Activity coefficients from original UNIFAC (Hansen–Flory–Huggins where a solvent has no groups); --ideal for γ = 1.",
        "Time is relative: 1 = the time pure n-butyl acetate needs to evaporate the same volume. Screening estimates only."})
public final class DryCommand extends CohesaSubcommand {

    @Option(names = "--blend", required = true, paramLabel = "NAME:FRACTION,...", description = "The blend by volume fractions, e.g. \"acetone:0.3,n-butyl acetate:0.7\".")
    String blend;

    @ArgGroup(exclusive = true)
    TargetChoice targetChoice;

    static final class TargetChoice {
        @Option(names = "--target", paramLabel = "dD,dP,dH,R0", description = "Target sphere, MPa^½.") String target;
        @Option(names = "--material", paramLabel = "NAME", description = "A material from the library (see 'materials').") String material;
    }

    @Option(names = "--temperature", paramLabel = "C", description = "Film temperature, °C (default 25).")
    String temperature = "25";

    @Option(names = "--until", paramLabel = "FRACTION", description = "Evaporated fraction of the initial volume to stop at, e.g. 0.95 or 95%% (default 0.95).")
    String until = "0.95";

    @Option(names = "--ideal", description = "Ideal solution (γ = 1) instead of UNIFAC, to compare.")
    boolean ideal;

    @Option(names = "--csv", paramLabel = "FILE", description = "Also write the path as CSV (one row per point, units in the header).")
    Path csv;

    @Option(names = "--png", paramLabel = "FILE", description = "Also draw the path as a PNG plot (composition and, with a target, RED).")
    Path png;

    @Option(names = "--overwrite", description = "Replace an existing --csv or --png file.")
    boolean overwrite;

    @Override
    protected void execute() throws IOException {
        SolventLibrary library = ctx().library();
        Blend b = library.resolveBlend("--blend", blend);
        SolubilitySphere sphere = null;
        String targetLabel = null;
        if (targetChoice != null && targetChoice.target != null) {
            sphere = Targets.parseSphere("--target", targetChoice.target);
            targetLabel = targetChoice.target;
        } else if (targetChoice != null && targetChoice.material != null) {
            var m = ctx().materials().library().resolve("--material", targetChoice.material);
            sphere = m.sphere();
            targetLabel = m.name();
        }
        double tC = Args.number("--temperature", temperature);
        if (tC <= -273.15 || tC > 300) {
            throw new InvalidInputException("--temperature", temperature, "must lie between −273.15 and 300 °C");
        }
        double untilF = fraction("--until", until);
        if (csv != null) {
            OutputFile.check("--csv", csv, overwrite);
        }
        if (png != null) {
            OutputFile.check("--png", png, overwrite);
        }
        DryingRequest req = new DryingRequest(b, sphere, tC + 273.15, untilF, ideal, DryingRequest.DEFAULT_STEP, true,
                WaterMiscibilityCsv.bundled());
        DryingPath path;
        try {
            path = DryingSimulator.simulate(req);
        } catch (InvalidInputException e) {
            throw relabel(e);
        }
        List<TailSuggestion> tails = List.of();
        if (sphere != null && path.leavesSphereAt() != null && path.leavesSphereAt() > 0) {
            tails = TailSolventAdvisor.suggest(req, library.all(), 3);
        }
        List<String> cautions = cautions(path);
        if (!tails.isEmpty()) {
            cautions.add(0, "check the hazard statements of a suggested tail solvent before use: it is the solvent that stays longest in the film and the room");
        }
        java.util.function.Function<String, List<String>> hazards = name -> library.lookup(name).stream().findFirst()
                .map(s -> s.hazardStatements()).orElse(List.of());
        List<String> written = writeFiles(b, path);
        if (json()) {
            Output.json(out(), DryReport.of(b, targetLabel, tC, path, tails, cautions, hazards, written));
            return;
        }
        table(b, targetLabel, tC, path, tails, cautions, hazards);
        for (String w : written) {
            out().println("wrote " + w);
        }
    }

    private List<String> writeFiles(Blend b, DryingPath path) throws IOException {
        List<String> written = new ArrayList<>();
        if (csv != null) {
            OutputFile.write("--csv", csv, overwrite, o -> PathCsv.write(path, o));
            written.add(csv.toString());
        }
        if (png != null) {
            OutputFile.write("--png", png, overwrite, o -> DryingPlot.png(path, "Drying path of " + b.describe(), o));
            written.add(png.toString());
        }
        return written;
    }

    private void table(Blend b, String targetLabel, double tC, DryingPath path, List<TailSuggestion> tails, List<String> cautions,
                       java.util.function.Function<String, List<String>> hazards) {
        out().println("blend: " + b.describe() + "   at " + Output.fmt(tC, 1) + " °C" + (targetLabel == null ? "" : "   target: " + targetLabel));
        out().println("activity model: " + path.model() + (path.modelNote().isEmpty() ? "" : " (" + path.modelNote() + ")"));
        List<String> header = new ArrayList<>(List.of("evaporated %", "time (BuAc=1)"));
        List<String> names = new ArrayList<>(path.points().get(0).composition().keySet());
        names.forEach(n -> header.add("φ " + n));
        header.addAll(List.of("δD MPa½", "δP MPa½", "δH MPa½"));
        if (path.points().get(0).red() != null) {
            header.add("RED");
        }
        TextTable t = new TextTable(header.toArray(String[]::new));
        for (PathPoint p : path.points()) {
            List<Object> row = new ArrayList<>();
            row.add(Output.fmt(100 * p.evaporated(), 1));
            row.add(Output.fmt(p.time(), 3));
            for (String n : names) {
                row.add(Output.fmt(p.composition().get(n), 3));
            }
            row.add(p.hansen() == null ? "-" : Output.fmt(p.hansen().dD(), 2));
            row.add(p.hansen() == null ? "-" : Output.fmt(p.hansen().dP(), 2));
            row.add(p.hansen() == null ? "-" : Output.fmt(p.hansen().dH(), 2));
            if (p.red() != null) {
                row.add(Output.fmt(p.red(), 3));
            }
            t.row(row.toArray());
        }
        t.print(out());
        out().println("(evaporated: % of the initial volume; φ: volume fraction of the liquid left; time relative to pure n-butyl acetate = 1)");
        if (targetLabel != null) {
            out().println(path.leavesSphereAt() == null ? "stays inside the sphere up to " + Output.fmt(100 * path.end().evaporated(), 1) + " % evaporated"
                    : path.leavesSphereAt() == 0 ? "starts outside the sphere"
                    : "leaves the sphere at " + Output.fmt(100 * path.leavesSphereAt(), 1) + " % evaporated");
        }
        out().println("left last: " + path.lastSolvent());
        for (DryingPath.Exhaustion e : path.exhausted()) {
            out().println("practically gone: " + e.solvent() + " at " + Output.fmt(100 * e.evaporated(), 1) + " % evaporated (less than "
                    + Output.fmt(100 * DryingSimulator.PRACTICALLY_GONE, 1) + " % of it left)");
        }
        if (path.phases() != null) {
            out().println("liquid phases (" + path.phases().basis().label() + "): " + path.phases().detail());
        }
        if (!tails.isEmpty()) {
            out().println("slow tail solvents that keep the path inside:");
            TextTable tt = new TextTable("add", "volume fraction", "relative rate", "max RED", "left last", "hazard statements");
            for (TailSuggestion s : tails) {
                tt.row(s.solvent(), Output.fmt(s.fraction(), 2), Output.fmt(s.relativeRate(), 3), Output.fmt(s.maxRed(), 3), s.lastSolvent(),
                        String.join(" ", hazards.apply(s.solvent())));
            }
            tt.print(out());
        } else if (path.leavesSphereAt() != null && path.leavesSphereAt() > 0) {
            out().println("no slow tail solvent from the library keeps this path inside the sphere (tried up to 30 % of the blend)");
        }
        for (String n : path.notes()) {
            out().println("note: " + n);
        }
        for (String c : cautions) {
            out().println("caution: " + c);
        }
    }

    private static List<String> cautions(DryingPath path) {
        List<String> c = new ArrayList<>();
        if (path.splitsAt() != null) {
            c.add(String.format(Locale.ROOT, "the liquid is predicted to separate into two phases at %.1f %% evaporated; "
                    + "the path after that point assumes one phase and is not reliable", 100 * path.splitsAt()));
        }
        c.add("evaporating solvents release flammable and harmful vapour: ventilate, keep ignition sources away");
        c.add("these are screening estimates (ideal film, constant temperature, no humidity or resin effects); "
                + "the supplier's SDS, local codes and your site's licensed safety professionals decide, and blends must be tested in the lab");
        return c;
    }

    /** The core names fields without dashes; the command line shows its own option names. */
    private static InvalidInputException relabel(InvalidInputException e) {
        String field = switch (e.field()) {
            case "temperature" -> "--temperature";
            case "until" -> "--until";
            case "blend" -> "--blend";
            default -> e.field();
        };
        return new InvalidInputException(field, e.value(), e.reason());
    }

    static double fraction(String field, String text) {
        String s = text == null ? "" : text.strip();
        boolean pct = s.endsWith("%");
        double v = Args.number(field, pct ? s.substring(0, s.length() - 1).strip() : s);
        if (pct) {
            v /= 100;
        }
        if (!(v > 0 && v <= 0.999)) {
            throw new InvalidInputException(field, text, "must lie between 0 and 0.999 (or 0 and 99.9%)");
        }
        return v;
    }
}
