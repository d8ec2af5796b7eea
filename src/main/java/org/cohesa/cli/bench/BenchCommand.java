package org.cohesa.cli.bench;

import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonProperty;
import com.fasterxml.jackson.annotation.JsonUnwrapped;

import org.cohesa.cli.CohesaSubcommand;
import org.cohesa.cli.Output;
import org.cohesa.cli.TextTable;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import org.cohesa.core.hsp.HansenParameters;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.target.FitOptions;
import org.cohesa.core.target.SphereFitter;
import org.cohesa.core.target.TestResult;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * {@code cohesa bench ...}: timing runs of the heavy computations on this machine (speed targets live here, not in
 * unit tests). Each workflow adds its own subcommand.
 */
@Command(name = "bench", description = "Time the heavy computations on this machine (median of several runs).",
        subcommands = {BenchCommand.Fit.class, BenchFitChecksCommand.class, BenchCommand.Dry.class, BenchBlendCommand.class, BenchCommand.Hazards.class})
public final class BenchCommand implements Runnable {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /** Median, minimum and maximum of run times in seconds, and the cores they ran on. */
    record Timing(int runs, @JsonProperty("median_s") double medianS, @JsonProperty("min_s") double minS,
            @JsonProperty("max_s") double maxS, int cores) {

        static Timing of(double[] seconds) {
            double[] s = seconds.clone();
            Arrays.sort(s);
            double median = s.length % 2 == 1 ? s[s.length / 2] : (s[s.length / 2 - 1] + s[s.length / 2]) / 2;
            return new Timing(s.length, Output.round(median, 4), Output.round(s[0], 4), Output.round(s[s.length - 1], 4),
                    Runtime.getRuntime().availableProcessors());
        }
    }

    /** What {@code bench fit --json} prints. */
    record FitBench(String benchmark, String method, int results, int resamples, @JsonUnwrapped Timing timing) {
    }

    /**
     * What {@code bench dry --json} and {@code bench hazards --json} print; {@code until} (fraction evaporated) is
     * given for drying only.
     */
    @JsonInclude(JsonInclude.Include.NON_NULL)
    record BlendBench(String benchmark, String blend, int components, Double until, String model, int warmup,
            @JsonUnwrapped Timing timing, @JsonProperty("median_ms") double medianMs) {
    }

    /** Refuses run counts outside the ranges every bench command accepts. */
    static void requireRuns(int runs, int maxRuns, int warmup) {
        if (runs < 1 || runs > maxRuns) {
            throw new org.cohesa.core.InvalidInputException("--runs", String.valueOf(runs), "must lie between 1 and " + maxRuns);
        }
        if (warmup < 0 || warmup > 100_000) {
            throw new org.cohesa.core.InvalidInputException("--warmup", String.valueOf(warmup), "must lie between 0 and 100000");
        }
    }

    /** Runs {@code task} {@code warmup} times untimed, then {@code runs} times timed; the run times in seconds. */
    static double[] time(int warmup, int runs, Runnable task) {
        for (int i = 0; i < warmup; i++) {
            task.run();
        }
        double[] t = new double[runs];
        for (int i = 0; i < runs; i++) {
            long start = System.nanoTime();
            task.run();
            t[i] = (System.nanoTime() - start) / 1e9;
        }
        return t;
    }

    /** Prints one blend benchmark (its identity plus the statistics of {@code t}) as JSON or as a table row. */
    static void reportBlendBench(CohesaSubcommand cmd, String benchmark, Double until, int warmup, String label,
            org.cohesa.core.solvent.Blend b, String model, double[] t) {
        double[] sorted = t.clone();
        Arrays.sort(sorted);
        int n = sorted.length;
        double median = n % 2 == 1 ? sorted[n / 2] : (sorted[n / 2 - 1] + sorted[n / 2]) / 2;
        if (cmd.json()) {
            Output.json(cmd.out(), new BlendBench(benchmark, b.describe(), b.size(), until, model, warmup, Timing.of(t),
                    Output.round(median * 1e3, 3)));
            return;
        }
        TextTable tt = new TextTable("benchmark", "components", "model", "runs", "median ms", "min ms", "max ms");
        tt.row(label, b.size(), model, n, Output.fmt(median * 1e3, 2), Output.fmt(sorted[0] * 1e3, 2), Output.fmt(sorted[n - 1] * 1e3, 2));
        tt.print(cmd.out());
        cmd.out().println("blend: " + b.describe() + "; " + Runtime.getRuntime().availableProcessors() + " cores");
    }

    /** {@code cohesa bench fit}: a sphere fit of N invented results with bootstrap resamples. */
    @Command(name = "fit", description = "Time a sphere fit: N invented test results (liquids drawn at random, scored against a known sphere) "
            + "with bootstrap resamples; prints the median of several runs after one warm-up run.")
    static final class Fit extends CohesaSubcommand {
        @Option(names = "--results", description = "Test results per fit (default ${DEFAULT-VALUE}).") int results = 60;
        @Option(names = "--resamples", description = "Bootstrap resamples (default ${DEFAULT-VALUE}).") int resamples = 200;
        @Option(names = "--runs", description = "Timed runs (default ${DEFAULT-VALUE}).") int runs = 7;
        @Option(names = "--seed", description = "Seed of the invented data and of the fit (default ${DEFAULT-VALUE}).") long seed = 5;
        @Option(names = "--method", description = "Fit method: likelihood (default), classic or consensus.") String method = "likelihood";
        @Option(names = "--prior-smiles", paramLabel = "SMILES", description = "Also time the likelihood fit with a centre prior estimated from this structure.")
        String priorSmiles;

        @Override
        protected void execute() {
            if (results < 3 || results > 4000) {
                throw new org.cohesa.core.InvalidInputException("--results", String.valueOf(results), "must lie between 3 and 4000");
            }
            if (runs < 1 || runs > 1000) {
                throw new org.cohesa.core.InvalidInputException("--runs", String.valueOf(runs), "must lie between 1 and 1000");
            }
            if (resamples < 0 || resamples > 10_000) {
                throw new org.cohesa.core.InvalidInputException("--resamples", String.valueOf(resamples), "must lie between 0 and 10000");
            }
            org.cohesa.core.target.FitMethod fitMethod;
            try {
                fitMethod = org.cohesa.core.target.FitMethod.parse(method);
            } catch (IllegalArgumentException e) {
                throw new org.cohesa.core.InvalidInputException("--method", method, "must be one of " + org.cohesa.core.target.FitMethod.allowed());
            }
            List<TestResult> data = invented(results, seed);
            FitOptions plain = new FitOptions(seed, resamples, 12, 5).withMethod(fitMethod);
            String label = fitMethod.key();
            FitOptions options = plain;
            if (priorSmiles != null) {
                if (fitMethod != org.cohesa.core.target.FitMethod.LIKELIHOOD) {
                    throw new org.cohesa.core.InvalidInputException("--prior-smiles", priorSmiles, "a prior works with --method likelihood only");
                }
                var estimate = org.cohesa.cli.structure.StructureEstimates.estimate("--prior-smiles", priorSmiles,
                        org.cohesa.core.structure.MeasuredProperties.NONE);
                if (!estimate.hasHansen()) {
                    throw new org.cohesa.core.InvalidInputException("--prior-smiles", priorSmiles, "the group method cannot estimate this structure's centre");
                }
                options = plain.withPrior(org.cohesa.core.target.CentrePrior.fromStructure(estimate));
                label = fitMethod.key() + " with structure prior";
            }
            FitOptions timed = options;
            double[] t = time(1, runs, () -> SphereFitter.fit(data, List.of(), timed));
            Timing timing = Timing.of(t);
            if (json()) {
                Output.json(out(), new FitBench("fit", label, results, resamples, timing));
                return;
            }
            out().printf(Locale.ROOT, "sphere fit (%s), %d results, %d bootstrap resamples, %d cores: median %.3f s (min %.3f, max %.3f) over %d runs%n",
                    label, results, resamples, timing.cores(), timing.medianS(), timing.minS(), timing.maxS(), runs);
        }

        /**
         * Invented data (for timing only): liquids uniform in δD 14–21, δP 0–20, δH 0–25 MPa^½, scored 1 inside the
         * sphere (18.5, 9, 7.5; R0 7) and 0 outside — the same design as the reference script in the shared bench.
         */
        static List<TestResult> invented(int n, long seed) {
            SplittableRandom rng = new SplittableRandom(seed);
            SolubilitySphere truth = SolubilitySphere.of(18.5, 9.0, 7.5, 7.0);
            List<TestResult> out = new ArrayList<>();
            for (int i = 0; i < n; i++) {
                HansenParameters p = HansenParameters.of(14 + 7 * rng.nextDouble(), 20 * rng.nextDouble(), 25 * rng.nextDouble());
                out.add(TestResult.of("liquid " + (i + 1), p, truth.contains(p) ? 1 : 0));
            }
            return out;
        }
    }

    /**
     * {@code cohesa bench dry}: one drying path to 95 % evaporated (default: a 4-component lacquer thinner, original
     * UNIFAC, 25 °C), timed after warm-up; the median goes into docs/performance.md (issue 5 target: under 50 ms).
     */
    @Command(name = "dry", description = "Time one drying path (default: a 4-component lacquer thinner to 95 %% evaporated, UNIFAC, 25 °C).")
    static final class Dry extends CohesaSubcommand {

        static final String DEFAULT_BLEND = "acetone:0.3,ethyl acetate:0.2,toluene:0.3,n-butyl acetate:0.2";

        @Option(names = "--blend", paramLabel = "NAME:FRACTION,...", description = "Blend to time (default ${DEFAULT-VALUE}).")
        String blend = DEFAULT_BLEND;
        @Option(names = "--runs", description = "Timed runs (default ${DEFAULT-VALUE}).") int runs = 51;
        @Option(names = "--warmup", description = "Untimed warm-up runs (default ${DEFAULT-VALUE}).") int warmup = 30;
        @Option(names = "--ideal", description = "Time the ideal-solution path instead.") boolean ideal;

        @Override
        protected void execute() {
            requireRuns(runs, 100_000, warmup);
            org.cohesa.core.solvent.Blend b = ctx().library().resolveBlend("--blend", blend);
            org.cohesa.core.drying.DryingRequest req = new org.cohesa.core.drying.DryingRequest(b, null,
                    org.cohesa.core.drying.DryingRequest.DEFAULT_KELVIN, org.cohesa.core.drying.DryingRequest.DEFAULT_UNTIL, ideal,
                    org.cohesa.core.drying.DryingRequest.DEFAULT_STEP, false);
            String model = org.cohesa.core.drying.DryingSimulator.simulate(req).model();
            double[] t = time(warmup, runs, () -> org.cohesa.core.drying.DryingSimulator.simulate(req));
            reportBlendBench(this, "dry", org.cohesa.core.drying.DryingRequest.DEFAULT_UNTIL, warmup, "dry to 95 %", b, model, t);
        }
    }

    /**
     * {@code cohesa bench hazards}: one complete safety profile ({@link org.cohesa.core.safety.SafetyProfiler#profile} plus
     * {@link org.cohesa.core.safety.Cautions#forProfile}) of a blend: activity model, blend flash point, bubble point,
     * exposure, ICH, CHEM21 and cautions; the median goes into docs/performance.md.
     */
    @Command(name = "hazards", description = "Time one safety profile with its cautions (default: ethanol/ethyl acetate/water, UNIFAC, 25 °C).")
    static final class Hazards extends CohesaSubcommand {

        static final String DEFAULT_BLEND = "ethanol:0.3,ethyl acetate:0.3,water:0.4";

        @Option(names = "--blend", paramLabel = "NAME:FRACTION,...", description = "Blend to time (default ${DEFAULT-VALUE}).")
        String blend = DEFAULT_BLEND;
        @Option(names = "--runs", description = "Timed runs (default ${DEFAULT-VALUE}).") int runs = 201;
        @Option(names = "--warmup", description = "Untimed warm-up runs (default ${DEFAULT-VALUE}).") int warmup = 100;

        @Override
        protected void execute() {
            requireRuns(runs, 100_000, warmup);
            org.cohesa.core.solvent.Blend b = ctx().library().resolveBlend("--blend", blend);
            double kelvin = 298.15;
            String model = org.cohesa.core.safety.SafetyProfiler.profile(b, kelvin).activityModel();
            double[] t = time(warmup, runs,
                    () -> org.cohesa.core.safety.Cautions.forProfile(org.cohesa.core.safety.SafetyProfiler.profile(b, kelvin)));
            reportBlendBench(this, "hazards", null, warmup, "safety profile + cautions", b, model, t);
        }
    }
}
