package org.cohesa.cli.target;

import org.cohesa.cli.CohesaSubcommand;
import org.cohesa.cli.InputFile;
import org.cohesa.cli.OutputFile;
import org.cohesa.cli.Output;
import org.cohesa.cli.TextTable;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import org.cohesa.core.InvalidInputException;

import org.cohesa.cli.structure.MaterialFromStructure;
import org.cohesa.cli.structure.StructureEstimates;
import org.cohesa.core.solvent.SolventLibrary;
import org.cohesa.core.structure.MeasuredProperties;
import org.cohesa.core.structure.StructureEstimate;
import org.cohesa.core.target.CentrePrior;
import org.cohesa.core.target.ConfidenceRegion;
import org.cohesa.core.target.FitMethod;
import org.cohesa.core.target.LikelihoodRegion;
import org.cohesa.core.target.ResultProbability;
import org.cohesa.core.target.FitOptions;
import org.cohesa.core.target.FitResult;
import org.cohesa.core.target.Material;
import org.cohesa.core.target.MaterialKind;
import org.cohesa.core.target.Misfit;
import org.cohesa.core.target.NamedPoint;
import org.cohesa.core.target.NextTest;
import org.cohesa.core.target.SphereFitter;
import org.cohesa.core.target.TestResult;
import org.cohesa.report.png.SpherePlot;
import org.cohesa.store.TestSeriesCsv;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code cohesa fit FILE.csv}: a solubility sphere from the user's dissolving tests. */
@Command(name = "fit", description = {
        "Fit a solubility sphere to your dissolving tests.",
        "FILE is a table with a header, comma, semicolon or tab separated (UTF-8, a byte-order mark is fine); header names in any case:",
        "  liquid, solvent or name: a library name, synonym or CAS, or a blend \"NAME:FRACTION;NAME:FRACTION\" in quotes; or a CAS column;",
        "  score, result or soluble: 1/0 or a graded number between, yes/no/partial (y/n), or +/-/±;",
        "  optional dD,dP,dH for liquids not in the library, temperature_c and note.",
        "With semicolons or tabs a decimal comma (0,5) is read as 0.5."})
public final class FitCommand extends CohesaSubcommand {

    @Parameters(paramLabel = "FILE", description = "CSV file of test results.")
    Path file;

    @Option(names = "--name", paramLabel = "NAME", description = "Name of the material (needed with --save).")
    String name;

    @Option(names = "--save", description = "Save the fitted sphere as your own material under --name.")
    boolean save;

    @Option(names = "--kind", paramLabel = "KIND", description = "Kind of material for --save: polymer, resin, drug, pigment, other (default other).")
    String kind = "other";

    @Option(names = "--seed", paramLabel = "N", description = "Seed of the random starts and resamples (same seed, same result; default ${DEFAULT-VALUE}).")
    long seed = FitOptions.DEFAULT_SEED;

    @Option(names = "--resamples", paramLabel = "N", description = "Bootstrap resamples for the box of the classic and consensus fits (default ${DEFAULT-VALUE}; 0 switches it off; the likelihood region needs none).")
    int resamples = 200;

    @Option(names = "--method", paramLabel = "METHOD", description = "How to fit: likelihood (default: results may be wrong, more so near "
            + "the surface; gives each result's probability and a likelihood region), classic (the published desirability fit, "
            + "with a bootstrap box) or consensus (the earlier weighted-mean fit).")
    String method = FitMethod.LIKELIHOOD.key();

    @Option(names = "--prior", paramLabel = "MATERIAL", description = "Likelihood fit only: pull the centre towards the published sphere of a "
            + "related library material (a Gaussian prior in Ra), or towards the estimate of one of your materials added by --smiles "
            + "(as --prior-smiles); the output says so.")
    String prior;

    @Option(names = "--prior-smiles", paramLabel = "SMILES", description = "Likelihood fit only: pull the centre towards the centre estimated "
            + "from the material's own structure (a drug substance, an additive; group contribution: mean of Mathieu 2018 and Stefanis–Panayiotou where both cover it), each component by its "
            + "measured error (the output says so).")
    String priorSmiles;

    @Option(names = "--prior-spread", paramLabel = "MPA", description = "Spread of the prior centre, MPa^½ in Ra (default 3 for --prior; "
            + "for --prior-smiles each component's spread comes from the estimator's measured error unless this is given).")
    Double priorSpread;

    @Option(names = "--allow-cmr", description = "Let the suggested next tests include carcinogenic, mutagenic or reprotoxic liquids "
            + "(H340/H350/H360) and ICH Q3C class 1 solvents; left out by default, as in blend.")
    boolean allowCmr;

    @Option(names = "--png", paramLabel = "FILE", description = "Also draw the fitted sphere and the tested liquids as a PNG (three projections).")
    Path png;

    @Option(names = "--overwrite", description = "Replace an existing --png file.")
    boolean overwrite;

    @Override
    protected void execute() throws IOException {
        if (png != null) {
            OutputFile.check("--png", png, overwrite);
        }
        if (save && (name == null || name.isBlank())) {
            throw new InvalidInputException("--save", "without --name", "give the material a name with --name NAME");
        }
        MaterialKind materialKind;
        try {
            materialKind = MaterialKind.parse(kind);
        } catch (IllegalArgumentException e) {
            throw new InvalidInputException("--kind", kind, "must be one of " + MaterialKind.allowed());
        }
        if (resamples < 0 || resamples > 10_000) {
            throw new InvalidInputException("--resamples", String.valueOf(resamples), "must lie between 0 and 10000");
        }
        FitMethod fitMethod;
        try {
            fitMethod = FitMethod.parse(method);
        } catch (IllegalArgumentException e) {
            throw new InvalidInputException("--method", method, "must be one of " + FitMethod.allowed());
        }
        CentrePrior centrePrior = prior(fitMethod);
        SolventLibrary library = ctx().library();
        List<TestResult> results = read(library);
        // a lab should not be sent to test a carcinogen or reprotoxicant to refine a sphere: safety first, as in blend
        List<NamedPoint> candidates = library.searchable().stream()
                .filter(s -> allowCmr || !(s.isCmr() || Integer.valueOf(1).equals(s.ichClass())))
                .map(s -> new NamedPoint(s.name(), s.hansen())).toList();
        FitResult fit = SphereFitter.fit(results, candidates, new FitOptions(seed, resamples, 12, 5).withMethod(fitMethod).withPrior(centrePrior));
        if (save) {
            ctx().materials().add(new Material(name, List.of(), materialKind, fit.sphere(),
                    "fit of " + file.getFileName() + " (cohesa fit, " + fit.method().key() + ", seed " + seed + ")",
                    String.format(Locale.ROOT, "fitted from %d test results: %d/%d dissolving inside, %d/%d non-dissolving outside",
                            fit.results(), fit.quality().goodInside(), fit.quality().goodTotal(), fit.quality().badOutside(),
                            fit.quality().badTotal()), true));
        }
        if (png != null) {
            String title = name == null || name.isBlank() ? file.getFileName().toString() : name;
            OutputFile.write("--png", png, overwrite, o -> SpherePlot.png(fit.sphere(), results, title, o));
        }
        if (json()) {
            Output.json(out(), FitReport.of(fit, seed));
            return;
        }
        print(fit, results.size());
        if (png != null) {
            out().println("wrote " + png);
        }
    }

    /** The centre prior of --prior or --prior-smiles, or null. */
    private CentrePrior prior(FitMethod fitMethod) {
        if (prior != null && priorSmiles != null) {
            throw new InvalidInputException("--prior-smiles", priorSmiles, "give either --prior or --prior-smiles, not both");
        }
        String field = prior != null ? "--prior" : "--prior-smiles";
        String value = prior != null ? prior : priorSmiles;
        if (value == null) {
            if (priorSpread != null) {
                throw new InvalidInputException("--prior-spread", String.valueOf(priorSpread), "needs --prior or --prior-smiles");
            }
            return null;
        }
        if (fitMethod != FitMethod.LIKELIHOOD) {
            throw new InvalidInputException(field, value, "a prior works with --method likelihood only");
        }
        if (priorSpread != null && !(priorSpread >= 0.5 && priorSpread <= 20)) {
            throw new InvalidInputException("--prior-spread", String.valueOf(priorSpread), "must lie between 0.5 and 20 MPa^½");
        }
        String smiles = priorSmiles;
        if (prior != null) {
            Material related = ctx().materials().library().resolve("--prior", prior);
            smiles = related.userEntry() ? MaterialFromStructure.estimatedFrom(related.source()) : null;
            if (smiles == null) {
                return CentrePrior.inRa(related.sphere().centre(), priorSpread == null ? CentrePrior.DEFAULT_SPREAD : priorSpread,
                        (related.userEntry() ? "your material " : "published sphere of ") + related.name() + " (" + related.source() + ")");
            }
            // a material added by its structure: its centre is that estimate, so it gets the estimate's spreads
        }
        StructureEstimate e = StructureEstimates.estimate(field, smiles, MeasuredProperties.NONE);
        if (!e.hasHansen()) {
            throw new InvalidInputException(field, value, "the group method cannot estimate "
                    + (e.dD() == null ? "δD" : e.dP() == null ? "δP" : "δH") + " for this structure, so it cannot serve as a prior; "
                    + "use --prior with a related material instead");
        }
        CentrePrior p = CentrePrior.fromStructure(e);
        return priorSpread == null ? p : p.withRaSpread(priorSpread);
    }

    private List<TestResult> read(SolventLibrary library) throws IOException {
        return InputFile.read("FILE", file, r -> TestSeriesCsv.read(file.toString(), r, library));
    }

    private void print(FitResult fit, int n) {
        ConfidenceRegion c = fit.confidence();
        LikelihoodRegion region = fit.region();
        String withPrior = fit.prior() == null ? ""
                : fit.prior().kind() == CentrePrior.Kind.STRUCTURE ? " with a prior from the structure" : " with a prior from a related material";
        out().println("Sphere fitted to " + n + " test results in " + file.getFileName() + " (" + fit.method().key() + " fit" + withPrior
                + ", seed " + seed + ")");
        int pct = (int) Math.round(100 * c.level());
        String span = region != null ? " region" : " box";
        TextTable t = new TextTable("", "fitted", pct + " %" + span + " low", pct + " %" + span + " high");
        t.row("dD MPa^½", Output.fmt(fit.sphere().centre().dD(), 2), Output.fmt(c.dD().low(), 2), Output.fmt(c.dD().high(), 2));
        t.row("dP MPa^½", Output.fmt(fit.sphere().centre().dP(), 2), Output.fmt(c.dP().low(), 2), Output.fmt(c.dP().high(), 2));
        t.row("dH MPa^½", Output.fmt(fit.sphere().centre().dH(), 2), Output.fmt(c.dH().low(), 2), Output.fmt(c.dH().high(), 2));
        t.row("R0 MPa^½", Output.fmt(fit.sphere().r0(), 2), Output.fmt(c.r0().low(), 2), Output.fmt(c.r0().high(), 2));
        t.print(out());
        out().println();
        if (region != null) {
            out().printf(Locale.ROOT, "%d %% likelihood region: centres up to Ra %.1f MPa^½ from the fitted one, R0 %.1f–%.1f; %s%n", pct,
                    region.centreRadius(), region.r0().low(), region.r0().high(), region.boundedNote());
        }
        out().printf(Locale.ROOT, "dissolving liquids inside: %d of %d; non-dissolving liquids outside: %d of %d%n",
                fit.quality().goodInside(), fit.quality().goodTotal(), fit.quality().badOutside(), fit.quality().badTotal());
        if (region != null) {
            printProbabilities(fit);
        } else if (fit.quality().misfits().isEmpty()) {
            out().println("misfits: none, every result lies on its side of the surface");
        } else {
            out().println("misfits (on the wrong side of the surface; check these results first):");
            TextTable m = new TextTable("liquid", "score", "RED", "why it is a misfit");
            for (Misfit x : fit.quality().misfits()) {
                m.row(x.name(), Output.fmt(x.score(), 2), Output.fmt(x.red(), 2),
                        x.score() >= TestResult.GOOD_THRESHOLD ? "dissolved, but lies outside" : "did not dissolve, but lies inside");
            }
            m.print(out());
        }
        if (!c.warnings().isEmpty()) {
            out().println();
            c.warnings().forEach(w -> out().println("warning: " + w));
        }
        if (!fit.nextTests().isEmpty()) {
            out().println();
            if (region != null) {
                out().println("most useful next tests (by expected information: how much their results would shrink the region; test them as a batch):");
                TextTable nt = new TextTable("liquid", "RED", "plausible spheres holding it", "region shrinks by");
                for (NextTest x : fit.nextTests()) {
                    nt.row(x.name(), Output.fmt(x.red(), 2), Output.fmt(100 * x.insideShare(), 0) + "%",
                            Output.fmt(100 * x.expectedShrinkage(), 0) + "%");
                }
                nt.print(out());
                out().println("(shrinkage of the region's spread expected once this and the tests above it are scored)");
                if (!allowCmr) {
                    out().println("(CMR liquids (H340/H350/H360) and ICH class 1 solvents are not suggested; --allow-cmr brings them back)");
                }
                out().println("Before testing a liquid, read its SDS: many test liquids are flammable or toxic, some reprotoxic.");
            } else {
                out().println("most useful next tests (library liquids the plausible spheres disagree about):");
                TextTable nt = new TextTable("liquid", "RED", "resampled fits holding it");
                for (NextTest x : fit.nextTests()) {
                    nt.row(x.name(), Output.fmt(x.red(), 2), Output.fmt(100 * x.insideShare(), 0) + "%");
                }
                nt.print(out());
            }
        }
        if (!fit.notes().isEmpty()) {
            out().println();
            fit.notes().forEach(x -> out().println("note: " + x));
        }
        if (save) {
            out().println();
            out().println("saved as your material '" + name + "' (see: cohesa material \"" + name + "\")");
        }
        out().println("Screening estimate: confirm the sphere with your own dissolving tests before relying on it.");
    }

    private void printProbabilities(FitResult fit) {
        List<ResultProbability> likely = fit.likelyMisfits();
        if (likely.isEmpty()) {
            out().printf(Locale.ROOT, "likely misfits: none (no result has a probability below %.2f under the fit)%n", ResultProbability.MISFIT_PROBABILITY);
        } else {
            out().printf(Locale.ROOT, "likely misfits (probability below %.2f under the fit; check these results first):%n", ResultProbability.MISFIT_PROBABILITY);
            TextTable m = new TextTable("liquid", "score", "RED", "P(dissolves)", "P(this result)");
            for (ResultProbability r : likely) {
                m.row(r.name(), Output.fmt(r.score(), 2), Output.fmt(r.red(), 2), Output.fmt(r.pDissolves(), 2), Output.fmt(r.probability(), 3));
            }
            m.print(out());
        }
        List<ResultProbability> doubtful = fit.probabilities().stream().filter(r -> !r.likelyMisfit() && r.probability() < 0.5).toList();
        if (!doubtful.isEmpty()) {
            out().println("near the surface, on the unexpected side (cannot be told from noise):");
            TextTable m = new TextTable("liquid", "score", "RED", "P(dissolves)", "P(this result)");
            for (ResultProbability r : doubtful) {
                m.row(r.name(), Output.fmt(r.score(), 2), Output.fmt(r.red(), 2), Output.fmt(r.pDissolves(), 2), Output.fmt(r.probability(), 3));
            }
            m.print(out());
        }
    }
}
