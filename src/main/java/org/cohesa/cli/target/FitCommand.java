package org.cohesa.cli.target;

import org.cohesa.cli.CohesaSubcommand;
import org.cohesa.cli.InputFile;
import org.cohesa.cli.OutputFile;
import org.cohesa.cli.Output;
import org.cohesa.cli.TextTable;

import java.io.IOException;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.cohesa.core.InvalidInputException;

import org.cohesa.core.solvent.SolventLibrary;
import org.cohesa.core.target.ConfidenceRegion;
import org.cohesa.core.target.FitOptions;
import org.cohesa.core.target.FitResult;
import org.cohesa.core.target.Interval;
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
        "FILE is CSV with a header: liquid (library name, CAS, or a blend \"NAME:FRACTION;NAME:FRACTION\" in quotes),",
        "score (1 dissolves, 0 does not, graded values between), optional dD,dP,dH for liquids not in the library,",
        "optional temperature_c and note."})
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

    @Option(names = "--resamples", paramLabel = "N", description = "Bootstrap resamples for the confidence region (default ${DEFAULT-VALUE}; 0 switches it off).")
    int resamples = 200;

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
        SolventLibrary library = ctx().library();
        List<TestResult> results = read(library);
        List<NamedPoint> candidates = library.searchable().stream().map(s -> new NamedPoint(s.name(), s.hansen())).toList();
        FitResult fit = SphereFitter.fit(results, candidates, new FitOptions(seed, resamples, 12, 5));
        if (save) {
            ctx().materials().add(new Material(name, List.of(), materialKind, fit.sphere(),
                    "fit of " + file.getFileName() + " (cohesa fit, seed " + seed + ")",
                    String.format(Locale.ROOT, "fitted from %d test results: %d/%d dissolving inside, %d/%d non-dissolving outside",
                            fit.results(), fit.quality().goodInside(), fit.quality().goodTotal(), fit.quality().badOutside(),
                            fit.quality().badTotal()), true));
        }
        if (png != null) {
            String title = name == null || name.isBlank() ? file.getFileName().toString() : name;
            OutputFile.write("--png", png, overwrite, o -> SpherePlot.png(fit.sphere(), results, title, o));
        }
        if (json()) {
            Output.json(out(), json(fit));
            return;
        }
        print(fit, results.size());
        if (png != null) {
            out().println("wrote " + png);
        }
    }

    private List<TestResult> read(SolventLibrary library) throws IOException {
        return InputFile.read("FILE", file, r -> TestSeriesCsv.read(file.toString(), r, library));
    }

    private Map<String, Object> json(FitResult fit) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("dD", Output.round(fit.sphere().centre().dD(), 2));
        m.put("dP", Output.round(fit.sphere().centre().dP(), 2));
        m.put("dH", Output.round(fit.sphere().centre().dH(), 2));
        m.put("r0", Output.round(fit.sphere().r0(), 2));
        m.put("good_inside", fit.quality().goodInside());
        m.put("good_total", fit.quality().goodTotal());
        m.put("bad_outside", fit.quality().badOutside());
        m.put("bad_total", fit.quality().badTotal());
        m.put("misfits", fit.quality().misfits().stream().map(x -> {
            Map<String, Object> j = new LinkedHashMap<>();
            j.put("name", x.name());
            j.put("score", x.score());
            j.put("red", Output.round(x.red(), 3));
            return j;
        }).toList());
        ConfidenceRegion c = fit.confidence();
        Map<String, Object> conf = new LinkedHashMap<>();
        conf.put("level", c.level());
        conf.put("resamples", c.resamples());
        conf.put("seed", seed);
        conf.put("dD", interval(c.dD()));
        conf.put("dP", interval(c.dP()));
        conf.put("dH", interval(c.dH()));
        conf.put("r0", interval(c.r0()));
        conf.put("bounded", c.bounded());
        conf.put("warnings", c.warnings());
        m.put("confidence", conf);
        m.put("next_tests", fit.nextTests().stream().map(t -> {
            Map<String, Object> j = new LinkedHashMap<>();
            j.put("name", t.name());
            j.put("red", Output.round(t.red(), 3));
            j.put("inside_share", Output.round(t.insideShare(), 3));
            j.put("reason", t.reason());
            return j;
        }).toList());
        return m;
    }

    private static List<Double> interval(Interval i) {
        return List.of(Output.round(i.low(), 2), Output.round(i.high(), 2));
    }

    private void print(FitResult fit, int n) {
        ConfidenceRegion c = fit.confidence();
        out().println("Sphere fitted to " + n + " test results in " + file.getFileName() + " (seed " + seed + ")");
        int pct = (int) Math.round(100 * c.level());
        TextTable t = new TextTable("", "fitted", pct + " % low", pct + " % high");
        t.row("dD MPa^½", Output.fmt(fit.sphere().centre().dD(), 2), Output.fmt(c.dD().low(), 2), Output.fmt(c.dD().high(), 2));
        t.row("dP MPa^½", Output.fmt(fit.sphere().centre().dP(), 2), Output.fmt(c.dP().low(), 2), Output.fmt(c.dP().high(), 2));
        t.row("dH MPa^½", Output.fmt(fit.sphere().centre().dH(), 2), Output.fmt(c.dH().low(), 2), Output.fmt(c.dH().high(), 2));
        t.row("R0 MPa^½", Output.fmt(fit.sphere().r0(), 2), Output.fmt(c.r0().low(), 2), Output.fmt(c.r0().high(), 2));
        t.print(out());
        out().println();
        out().printf(Locale.ROOT, "dissolving liquids inside: %d of %d; non-dissolving liquids outside: %d of %d%n",
                fit.quality().goodInside(), fit.quality().goodTotal(), fit.quality().badOutside(), fit.quality().badTotal());
        if (fit.quality().misfits().isEmpty()) {
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
            out().println("most useful next tests (library liquids the plausible spheres disagree about):");
            TextTable nt = new TextTable("liquid", "RED", "resampled fits holding it");
            for (NextTest x : fit.nextTests()) {
                nt.row(x.name(), Output.fmt(x.red(), 2), Output.fmt(100 * x.insideShare(), 0) + "%");
            }
            nt.print(out());
        }
        if (save) {
            out().println();
            out().println("saved as your material '" + name + "' (see: cohesa material \"" + name + "\")");
        }
        out().println("Screening estimate: confirm the sphere with your own dissolving tests before relying on it.");
    }

}
