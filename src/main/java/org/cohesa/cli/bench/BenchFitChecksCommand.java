package org.cohesa.cli.bench;

import com.fasterxml.jackson.annotation.JsonProperty;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import org.cohesa.cli.CohesaSubcommand;
import org.cohesa.cli.InputFile;
import org.cohesa.cli.Output;
import org.cohesa.cli.TextTable;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.cli.structure.StructureEstimates;
import org.cohesa.core.structure.MeasuredProperties;
import org.cohesa.core.structure.StructureEstimate;
import org.cohesa.core.target.CentrePrior;
import org.cohesa.core.target.CommonTestLiquids;
import org.cohesa.core.target.FitLimits;
import org.cohesa.core.target.MaterialKind;
import org.cohesa.core.target.FitValidation;
import org.cohesa.core.target.Material;
import org.cohesa.core.target.NamedPoint;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * {@code cohesa bench fit-checks}: the sphere fit measured on seeded synthetic series (issue 14): centre and R0
 * error, coverage of the 95 % region, detection of flipped results, the classic baseline side by side, and the
 * next-test benefit curve. The figures in docs/methods.md come from this command.
 */
@Command(name = "fit-checks", description = {
        "Measure the sphere fit on seeded synthetic series: published library spheres, series of 15, 20 and 30 of the",
        "35 common test liquids: clean; with two results flipped near the surface (RED 0.8-1.25); and issue 14's own",
        "series, two flips and two more near-surface results scored 0.5; likelihood fit and classic baseline side by side; then the centre error after 5 suggested tests vs 5 random common liquids;",
        "then drug substances fitted without and with a prior estimated from their structure."})
final class BenchFitChecksCommand extends CohesaSubcommand {

    /** The five spheres of issue 14. */
    static final List<String> ISSUE_SPHERES = List.of("polystyrene", "poly(methyl methacrylate)", "polycarbonate",
            "cellulose acetate butyrate", "ethyl cellulose");

    @Option(names = "--trials", paramLabel = "N", description = "Trials per scenario (default ${DEFAULT-VALUE}).")
    int trials = 30;

    @Option(names = "--design-trials", paramLabel = "N", description = "Trials of the next-test curve (default ${DEFAULT-VALUE}).")
    int designTrials = 30;

    @Option(names = "--classic-resamples", paramLabel = "N", description = "Bootstrap resamples of the classic fit's box (default ${DEFAULT-VALUE}; 0 skips its coverage).")
    int classicResamples = 100;

    @Option(names = "--spheres", paramLabel = "SET", description = "validation (the five spheres of issue 14, default; never used to choose a setting), "
            + "dev (the development set: every other published library sphere of a polymer, resin or other material with at least 4 of the "
            + "common liquids inside and 4 outside; drug substances, whose radius is a default, left out) or library (dev plus validation).")
    String spheres = "validation";

    @Option(names = "--seed", paramLabel = "N", description = "Seed (default ${DEFAULT-VALUE}).")
    long seed = 14;

    @Option(names = "--liquids", paramLabel = "FILE", description = "Draw the series from the liquids in FILE (one library name, "
            + "synonym or CAS per line, # starts a comment; at least 30) instead of the 35 common test liquids, e.g. your lab's own "
            + "list. The spheres stay those the set names on the common list; those for which FILE's liquids cannot give a "
            + "usable series (3 inside, 3 outside, the flips and partial results near the surface) are left out.")
    Path liquids;

    @Option(names = "--limits", description = "Instead of the figures above, measure what limits the centre error: the same series fitted "
            + "with more starts, from the classic fit, with R0 fixed at the truth, with the whole list scored, with a sharper softness and with a leave-one-out "
            + "prior from the library's other published spheres, and the Bayes estimators, integrated softness, banded partial results and "
            + "bias correction tried against it; per-axis errors, each variant's paired difference from the program's fit, and each sphere's own error.")
    boolean limits;

    record Row(int liquids, int flips, @JsonProperty("scored_half") int scoredHalf, int trials, @JsonProperty("centre_error_median") double centreMedian,
               @JsonProperty("centre_error_max") double centreMax, @JsonProperty("r0_error_median") double r0Median,
               @JsonProperty("region_coverage") double regionCoverage, @JsonProperty("box_coverage") double boxCoverage,
               @JsonProperty("flips_detected") Double flipsDetected, double bounded,
               @JsonProperty("classic_centre_error_median") double classicCentreMedian,
               @JsonProperty("classic_r0_error_median") double classicR0Median,
               @JsonProperty("classic_box_coverage") Double classicBoxCoverage,
               @JsonProperty("classic_flips_detected") Double classicFlipsDetected) {
    }

    record Curve(int trials, @JsonProperty("start_liquids") int startLiquids, List<Double> suggested, List<Double> random) {
    }

    /** Structure prior on the bundled drug substances: the same clean series fitted without and with it. */
    record PriorRow(int liquids, int trials, @JsonProperty("centre_error_median") double plainCentre,
                    @JsonProperty("centre_error_median_with_prior") double priorCentre, @JsonProperty("r0_error_median") double plainR0,
                    @JsonProperty("r0_error_median_with_prior") double priorR0, @JsonProperty("prior_centre_error_median") double guess,
                    @JsonProperty("region_coverage") double plainCoverage, @JsonProperty("region_coverage_with_prior") double priorCoverage) {
    }

    record LimitsScenario(int liquids, int flips, @JsonProperty("scored_half") int scoredHalf, int trials, List<FitLimits.Line> lines,
                          @JsonProperty("log_likelihood_gap_median") double gap, @JsonProperty("fit_worse_than_truth") int worse,
                          @JsonProperty("classic_start_higher") int classicHigher,
                          @JsonProperty("per_sphere") List<SphereLine> perSphere) {
    }

    record SphereLine(String material, int trials, @JsonProperty("centre_error_median") double centreMedian,
                      @JsonProperty("mean_offset") double[] meanOffset) {
    }

    record LimitsReport(String benchmark, String spheres, @JsonProperty("liquid_list") String liquidList, long seed,
                        @JsonProperty("library_spheres") int librarySpheres, List<LimitsScenario> scenarios, double seconds) {
    }

    record Report(String benchmark, String spheres, @JsonProperty("liquid_list") String liquidList, long seed,
                  @JsonProperty("liquids") List<String> liquids, List<Row> rows,
                  @JsonProperty("next_tests") Curve nextTests, @JsonProperty("structure_prior") List<PriorRow> structurePrior,
                  @JsonProperty("structure_prior_cases") List<String> structurePriorCases,
                  @JsonProperty("related_prior") List<PriorRow> relatedPrior, @JsonProperty("related_prior_cases") List<String> relatedPriorCases,
                  @JsonProperty("seconds") double seconds) {
    }

    /**
     * Material → a related library material whose published sphere serves as its prior (default spread, 3 MPa^½ in
     * Ra): grades of one family, as a formulator would pick them (common practice, no source).
     */
    static final List<List<String>> RELATED_PRIORS = List.of(
            List.of("poly(methyl methacrylate)", "poly(ethyl methacrylate)"), List.of("poly(ethyl methacrylate)", "poly(methyl methacrylate)"),
            List.of("cellulose acetate butyrate", "cellulose acetate"), List.of("cellulose acetate", "cellulose acetate butyrate"),
            List.of("ethyl cellulose", "cellulose acetate butyrate"), List.of("polybutadiene", "styrene-butadiene rubber"),
            List.of("styrene-butadiene rubber", "polybutadiene"), List.of("low-density polyethylene", "polypropylene"));

    /**
     * Structures of the bundled drug substances whose centres come from Alshehri et al. 2022 (PubChem isomeric SMILES
     * without stereo marks, from memory). Sulfanilamide, quinine and nitroglycerin are left out: the group method has
     * no increment for part of them.
     */
    static final java.util.Map<String, String> DRUG_STRUCTURES = new java.util.LinkedHashMap<>();

    static {
        DRUG_STRUCTURES.put("paracetamol", "CC(=O)Nc1ccc(O)cc1");
        DRUG_STRUCTURES.put("aspirin", "CC(=O)Oc1ccccc1C(=O)O");
        DRUG_STRUCTURES.put("salicylic acid", "OC(=O)c1ccccc1O");
        DRUG_STRUCTURES.put("dopamine", "NCCc1ccc(O)c(O)c1");
        DRUG_STRUCTURES.put("camphor", "CC1(C)C2CCC1(C)C(=O)C2");
        DRUG_STRUCTURES.put("acetanilide", "CC(=O)Nc1ccccc1");
        DRUG_STRUCTURES.put("thymol", "CC(C)c1ccc(C)cc1O");
        DRUG_STRUCTURES.put("eugenol", "COc1cc(CC=C)ccc1O");
        DRUG_STRUCTURES.put("benzoic acid", "OC(=O)c1ccccc1");
    }

    @Override
    protected void execute() throws java.io.IOException {
        if (trials < 1 || trials > 1000) {
            throw new InvalidInputException("--trials", String.valueOf(trials), "must lie between 1 and 1000");
        }
        if (designTrials < 0 || designTrials > 1000) {
            throw new InvalidInputException("--design-trials", String.valueOf(designTrials), "must lie between 0 and 1000");
        }
        if (classicResamples < 0 || classicResamples > 1000) {
            throw new InvalidInputException("--classic-resamples", String.valueOf(classicResamples), "must lie between 0 and 1000");
        }
        if (!List.of("validation", "dev", "library").contains(spheres)) {
            throw new InvalidInputException("--spheres", spheres, "must be validation, dev or library");
        }
        long start = System.nanoTime();
        List<NamedPoint> common = CommonTestLiquids.resolve(ctx().library());
        List<NamedPoint> pool = liquids == null ? common : listed(liquids);
        List<SolubilitySphere> truths = new ArrayList<>();
        int dropped = 0;
        for (Material m : ctx().materials().library().all()) {
            if (m.userEntry()) {
                continue;
            }
            // the sets are defined on the common list, so that another list is measured on the same spheres
            long in = common.stream().filter(p -> m.sphere().contains(p.point())).count();
            boolean validation = ISSUE_SPHERES.contains(m.name());
            boolean dev = !validation && m.kind() != MaterialKind.DRUG && in >= 4 && common.size() - in >= 4;
            if (spheres.equals("validation") ? validation : spheres.equals("dev") ? dev : validation || dev) {
                if (drawable(m.sphere(), pool)) {
                    truths.add(m.sphere());
                } else {
                    dropped++;
                }
            }
        }
        if (truths.isEmpty()) {
            throw new InvalidInputException("--liquids", String.valueOf(liquids), "none of the " + spheres + " spheres can be tested with these liquids");
        }
        if (limits) {
            limits(truths, pool, start);
            return;
        }
        List<Row> rows = new ArrayList<>();
        for (int size : new int[] {15, 20, 30}) {
            // clean; two near-surface flips (the issue's checks); the issue's own series: two flips and two results scored 0.5
            for (int[] fg : new int[][] {{0, 0}, {2, 0}, {2, 2}}) {
                int flips = fg[0];
                int half = fg[1];
                FitValidation.Figures f = FitValidation.run(truths, pool, new FitValidation.Scenario(size, flips, half), trials,
                        seed * 1000 + size * 10 + flips + 5 * half, true, classicResamples);
                double n = f.trials();
                rows.add(new Row(size, flips, half, f.trials(), Output.round(f.centreMedian(), 3), Output.round(f.centreMax(), 3),
                        Output.round(f.r0Median(), 3), Output.round(f.regionCovered() / n, 3), Output.round(f.boxCovered() / n, 3),
                        flips > 0 ? Output.round(f.detected() / n, 3) : null, Output.round(f.bounded() / n, 3),
                        Output.round(f.classicCentreMedian(), 3), Output.round(f.classicR0Median(), 3),
                        f.classicBoxCovered() < 0 ? null : Output.round(f.classicBoxCovered() / n, 3),
                        flips > 0 ? Output.round(f.classicDetected() / n, 3) : null));
            }
        }
        Curve curve = null;
        if (designTrials > 0) {
            List<NamedPoint> candidates = ctx().library().searchable().stream().map(s -> new NamedPoint(s.name(), s.hansen())).toList();
            FitValidation.DesignCurve c = FitValidation.nextTestBenefit(truths, pool, candidates, 15, 5, designTrials, seed, true);
            List<Double> s = new ArrayList<>();
            List<Double> r = new ArrayList<>();
            for (int k = 0; k < c.suggested().length; k++) {
                s.add(Output.round(c.suggested()[k], 3));
                r.add(Output.round(c.random()[k], 3));
            }
            curve = new Curve(c.trials(), c.startSize(), s, r);
        }
        List<FitValidation.PriorCase> cases = drugCases(pool);
        List<PriorRow> priorRows = priorRows(cases, pool, seed * 1000 + 500);
        List<FitValidation.PriorCase> related = relatedCases(pool);
        List<PriorRow> relatedRows = priorRows(related, pool, seed * 1000 + 700);
        double seconds = Output.round((System.nanoTime() - start) / 1e9, 1);
        String set = spheres + " (" + truths.size() + " spheres" + (dropped > 0 ? ", " + dropped + " left out for the list" : "") + ")";
        Report report = new Report("fit-checks", set, liquids == null ? "the 35 common test liquids" : liquids.toString(), seed,
                pool.stream().map(NamedPoint::name).toList(), rows, curve, priorRows,
                cases.stream().map(FitValidation.PriorCase::name).toList(), relatedRows,
                related.stream().map(FitValidation.PriorCase::name).toList(), seconds);
        if (json()) {
            Output.json(out(), report);
            return;
        }
        out().printf(Locale.ROOT, "sphere fit on synthetic series: %s, %d trials per row, seed %d; centre error |Δ(δD, δP, δH)| and R0 error in MPa^½%n",
                report.spheres(), trials, seed);
        out().printf(Locale.ROOT, "series drawn from %s%n", report.liquidList());
        TextTable t = new TextTable("liquids", "flips", "scored 0.5", "centre med", "centre max", "R0 med", "region cover", "box cover", "flips found",
                "bounded", "classic centre", "classic R0", "classic box", "classic flips found");
        for (Row x : rows) {
            t.row(x.liquids(), x.flips(), x.scoredHalf(), Output.fmt(x.centreMedian(), 2), Output.fmt(x.centreMax(), 2), Output.fmt(x.r0Median(), 2),
                    pct(x.regionCoverage()), pct(x.boxCoverage()), x.flipsDetected() == null ? "-" : pct(x.flipsDetected()), pct(x.bounded()),
                    Output.fmt(x.classicCentreMedian(), 2), Output.fmt(x.classicR0Median(), 2),
                    x.classicBoxCoverage() == null ? "-" : pct(x.classicBoxCoverage()),
                    x.classicFlipsDetected() == null ? "-" : pct(x.classicFlipsDetected()));
        }
        t.print(out());
        if (curve != null) {
            out().printf(Locale.ROOT, "%nnext-test benefit (%d trials, clean series of %d liquids, median centre error after k added tests):%n",
                    curve.trials(), curve.startLiquids());
            TextTable c = new TextTable("added", "5 suggested tests", "5 random common liquids");
            for (int k = 0; k < curve.suggested().size(); k++) {
                c.row(k, Output.fmt(curve.suggested().get(k), 2), Output.fmt(curve.random().get(k), 2));
            }
            c.print(out());
        }
        out().printf(Locale.ROOT, "%nstructure prior (%s: centre from Alshehri et al. 2022, R0 7.0; prior from each structure by the group method; "
                + "clean series, median errors, MPa^½):%n", String.join(", ", report.structurePriorCases()));
        TextTable p = new TextTable("liquids", "trials", "centre, no prior", "centre, structure prior", "R0, no prior", "R0, structure prior",
                "prior centre alone", "region cover, no prior", "region cover, with prior");
        for (PriorRow x : priorRows) {
            p.row(x.liquids(), x.trials(), Output.fmt(x.plainCentre(), 2), Output.fmt(x.priorCentre(), 2), Output.fmt(x.plainR0(), 2),
                    Output.fmt(x.priorR0(), 2), Output.fmt(x.guess(), 2), pct(x.plainCoverage()), pct(x.priorCoverage()));
        }
        p.print(out());
        out().printf(Locale.ROOT, "%nrelated-material prior (%s; prior: the related material's published centre, spread %.0f MPa^½ in Ra):%n",
                String.join(", ", report.relatedPriorCases()), CentrePrior.DEFAULT_SPREAD);
        TextTable q = new TextTable("liquids", "trials", "centre, no prior", "centre, related prior", "R0, no prior", "R0, related prior",
                "prior centre alone", "region cover, no prior", "region cover, with prior");
        for (PriorRow x : relatedRows) {
            q.row(x.liquids(), x.trials(), Output.fmt(x.plainCentre(), 2), Output.fmt(x.priorCentre(), 2), Output.fmt(x.plainR0(), 2),
                    Output.fmt(x.priorR0(), 2), Output.fmt(x.guess(), 2), pct(x.plainCoverage()), pct(x.priorCoverage()));
        }
        q.print(out());
        out().printf(Locale.ROOT, "%.1f s on %d cores%n", seconds, Runtime.getRuntime().availableProcessors());
    }

    /** The published library spheres a leave-one-out prior may use: every bundled material but the drug substances (default radii). */
    private List<SolubilitySphere> librarySpheres() {
        return ctx().materials().library().all().stream().filter(m -> !m.userEntry() && m.kind() != MaterialKind.DRUG).map(Material::sphere).toList();
    }

    private String materialName(SolubilitySphere s) {
        return ctx().materials().library().all().stream().filter(m -> !m.userEntry() && m.sphere().equals(s)).map(Material::name).findFirst()
                .orElse(s.toString());
    }

    private void limits(List<SolubilitySphere> truths, List<NamedPoint> pool, long start) {
        List<SolubilitySphere> library = librarySpheres();
        List<LimitsScenario> out = new ArrayList<>();
        for (int[] sf : new int[][] {{15, 0, 0}, {20, 0, 0}, {30, 0, 0}, {30, 2, 0}, {30, 2, 2}}) {
            FitLimits.Figures f = FitLimits.run(truths, library, pool, new FitValidation.Scenario(sf[0], sf[1], sf[2]), trials,
                    seed * 1000 + 900 + sf[0] + sf[1] + 5 * sf[2]);
            List<FitLimits.Line> lines = f.lines().stream().map(l -> new FitLimits.Line(l.what(), Output.round(l.centreMedian(), 3),
                    Output.round(l.centreMean(), 3), Output.round(l.r0Median(), 3), Output.round(l.dDMedian(), 3), Output.round(l.dPMedian(), 3),
                    Output.round(l.dHMedian(), 3), Output.round(l.pairedMeanDifference(), 3), Output.round(l.pairedStandardError(), 3))).toList();
            List<SphereLine> per = f.perSphere().stream().map(p -> new SphereLine(materialName(p.truth()), p.trials(), Output.round(p.centreMedian(), 3),
                    new double[] {Output.round(p.meanOffsetDD(), 2), Output.round(p.meanOffsetDP(), 2), Output.round(p.meanOffsetDH(), 2),
                            Output.round(p.meanOffsetR0(), 2)})).toList();
            out.add(new LimitsScenario(sf[0], sf[1], sf[2], f.trials(), lines, Output.round(f.logLikelihoodGapMedian(), 3), f.fitWorseThanTruth(),
                    f.classicStartHigher(), per));
        }
        LimitsReport report = new LimitsReport("fit-checks --limits", spheres + " (" + truths.size() + " spheres)",
                liquids == null ? "the 35 common test liquids" : liquids.toString(), seed, library.size(), out,
                Output.round((System.nanoTime() - start) / 1e9, 1));
        if (json()) {
            Output.json(out(), report);
            return;
        }
        out().printf(Locale.ROOT, "what limits the centre error: %s, %d trials per scenario, seed %d, series drawn from %s; median errors in MPa^½%n",
                report.spheres(), trials, seed, report.liquidList());
        for (LimitsScenario x : out) {
            out().printf(Locale.ROOT, "%n%d liquids, %d flips, %d scored 0.5 (%d trials); fitted minus true log-likelihood: median %.2f nats, below 0 in %d trials; "
                    + "a start at the classic fit reached a higher likelihood in %d%n", x.liquids(), x.flips(), x.scoredHalf(), x.trials(), x.gap(), x.worse(),
                    x.classicHigher());
            TextTable t = new TextTable("fit", "centre med", "centre mean", "R0 med", "|ΔδD| med", "|ΔδP| med", "|ΔδH| med", "vs program: mean Δ ± se");
            for (FitLimits.Line l : x.lines()) {
                t.row(l.what(), Output.fmt(l.centreMedian(), 2), Output.fmt(l.centreMean(), 2), Output.fmt(l.r0Median(), 2), Output.fmt(l.dDMedian(), 2),
                        Output.fmt(l.dPMedian(), 2), Output.fmt(l.dHMedian(), 2),
                        Output.fmt(l.pairedMeanDifference(), 2) + " ± " + Output.fmt(l.pairedStandardError(), 2));
            }
            t.print(out());
            TextTable p = new TextTable("sphere", "trials", "centre med", "mean ΔδD", "mean ΔδP", "mean ΔδH", "mean ΔR0");
            for (SphereLine s : x.perSphere()) {
                p.row(s.material(), s.trials(), Output.fmt(s.centreMedian(), 2), Output.fmt(s.meanOffset()[0], 2), Output.fmt(s.meanOffset()[1], 2),
                        Output.fmt(s.meanOffset()[2], 2), Output.fmt(s.meanOffset()[3], 2));
            }
            p.print(out());
        }
        out().printf(Locale.ROOT, "%.1f s on %d cores%n", report.seconds(), Runtime.getRuntime().availableProcessors());
    }

    private List<PriorRow> priorRows(List<FitValidation.PriorCase> cases, List<NamedPoint> pool, long base) {
        List<PriorRow> out = new ArrayList<>();
        for (int size : new int[] {15, 20, 30}) {
            FitValidation.PriorFigures f = FitValidation.priorBenefit(cases, pool, size, trials, base + size);
            double n = f.trials();
            out.add(new PriorRow(size, f.trials(), Output.round(f.plainCentreMedian(), 3), Output.round(f.priorCentreMedian(), 3),
                    Output.round(f.plainR0Median(), 3), Output.round(f.priorR0Median(), 3), Output.round(f.priorGuessMedian(), 3),
                    Output.round(f.plainCovered() / n, 3), Output.round(f.priorCovered() / n, 3)));
        }
        return out;
    }

    /** {@link #RELATED_PRIORS} as truths with priors, those with at least 6 common liquids inside and 6 outside. */
    private List<FitValidation.PriorCase> relatedCases(List<NamedPoint> pool) {
        List<FitValidation.PriorCase> out = new ArrayList<>();
        for (List<String> pair : RELATED_PRIORS) {
            Material m = ctx().materials().library().resolve("material", pair.get(0));
            Material r = ctx().materials().library().resolve("related material", pair.get(1));
            long in = pool.stream().filter(p -> m.sphere().contains(p.point())).count();
            if (in < 6 || pool.size() - in < 6) {
                continue;
            }
            out.add(new FitValidation.PriorCase(m.name() + " ← " + r.name(), m.sphere(),
                    CentrePrior.inRa(r.sphere().centre(), CentrePrior.DEFAULT_SPREAD, "published sphere of " + r.name())));
        }
        return out;
    }

    /**
     * The bundled drug substances of {@link #DRUG_STRUCTURES} as truths with their structure priors, those with at least
     * 6 of the common liquids inside and 6 outside (so that a series of 15 holds both kinds).
     */
    private List<FitValidation.PriorCase> drugCases(List<NamedPoint> pool) {
        List<FitValidation.PriorCase> cases = new ArrayList<>();
        for (var e : DRUG_STRUCTURES.entrySet()) {
            Material m = ctx().materials().library().resolve("drug substance", e.getKey());
            long in = pool.stream().filter(p -> m.sphere().contains(p.point())).count();
            if (in < 6 || pool.size() - in < 6) {
                continue;
            }
            StructureEstimate est = StructureEstimates.estimate("drug structure", e.getValue(), MeasuredProperties.NONE);
            cases.add(new FitValidation.PriorCase(m.name(), m.sphere(), CentrePrior.fromStructure(est)));
        }
        return cases;
    }

    /** Whether series of 15 and 30 liquids with two flips and two partial results can be drawn from {@code pool} for {@code truth}. */
    private static boolean drawable(SolubilitySphere truth, List<NamedPoint> pool) {
        try {
            for (int size : new int[] {15, 30}) {
                FitValidation.usable(truth, pool, new FitValidation.Scenario(size, 2, 2), new java.util.SplittableRandom(size));
            }
            return true;
        } catch (IllegalArgumentException e) {
            return false;
        }
    }

    /** The liquids of {@code file}: one library name, synonym or CAS per line; blank lines and # comments skipped. */
    private List<NamedPoint> listed(Path file) throws java.io.IOException {
        List<String> lines = InputFile.read("--liquids", file, r -> new java.io.BufferedReader(r).lines().toList());
        LinkedHashMap<String, NamedPoint> out = new LinkedHashMap<>();
        for (String line : lines) {
            String name = line.replace("\uFEFF", "").replaceFirst("#.*", "").strip();
            if (!name.isEmpty()) {
                var s = ctx().library().resolve("--liquids", name);
                if (s.hansen() == null) {
                    throw new InvalidInputException("--liquids", name, "has no Hansen parameters in the library");
                }
                out.putIfAbsent(s.name(), new NamedPoint(s.name(), s.hansen()));
            }
        }
        if (out.size() < 30) {
            throw new InvalidInputException("--liquids", file.toString(), "lists " + out.size() + " different liquids; the series of 30 need at least 30");
        }
        return List.copyOf(out.values());
    }

    private static String pct(double share) {
        return Output.fmt(100 * share, 0) + " %";
    }
}
