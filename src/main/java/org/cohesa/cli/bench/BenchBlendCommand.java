package org.cohesa.cli.bench;

import org.cohesa.cli.Args;
import org.cohesa.cli.CohesaSubcommand;
import org.cohesa.cli.Output;
import org.cohesa.cli.blend.BlendView;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.blend.BlendConstraints;
import org.cohesa.core.blend.BlendSearch;
import org.cohesa.core.blend.CandidatePool;
import org.cohesa.core.blend.RankBy;
import org.cohesa.core.blend.SyntheticLibrary;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.target.Material;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * {@code cohesa bench blend}: times the exact blend search on an invented library (fixed seed) with the
 * parameter spread of real solvents; prints the median of several timed runs after warm-up runs.
 */
@Command(name = "blend", description = "Time the exact blend search on a reproducible synthetic library (invented data, fixed seed).")
public final class BenchBlendCommand extends CohesaSubcommand {

    @Option(names = "--library-size", paramLabel = "N", description = "Solvents in the synthetic library (default ${DEFAULT-VALUE}).")
    String librarySize = "250";

    @Option(names = "--components", paramLabel = "K", description = "Most components per blend, 1..4 (default ${DEFAULT-VALUE}).")
    String components = "3";

    @Option(names = "--top", paramLabel = "N", description = "Blends kept (default ${DEFAULT-VALUE}).")
    String top = "50";

    @Option(names = "--runs", paramLabel = "R", description = "Timed runs (default ${DEFAULT-VALUE}).")
    String runs = "7";

    @Option(names = "--warmup", paramLabel = "W", description = "Untimed warm-up runs (default ${DEFAULT-VALUE}).")
    String warmup = "3";

    @Option(names = "--rank-by", paramLabel = "KEY", description = "Ranking (default ${DEFAULT-VALUE}, the ranking blend uses by default).")
    String rankBy = "desirability";

    @Option(names = "--red-limit", paramLabel = "RED", description = "RED limit (default ${DEFAULT-VALUE}, as blend).")
    String redLimit = "0.8";

    @Option(names = "--threads", paramLabel = "T", description = "Worker threads (default: all cores).")
    String threads;

    @Option(names = "--seed", paramLabel = "S", description = "Seed of the synthetic library (default ${DEFAULT-VALUE}).")
    String seed = "1";

    @Option(names = "--material", paramLabel = "NAME", description = "Time the search over the real library for this material's sphere (with the safety-first defaults) instead of the synthetic library.")
    String material;

    @Override
    protected void execute() {
        int n = bounded("--library-size", librarySize, 1, 5000);
        int k = bounded("--components", components, 1, 4);
        int topN = bounded("--top", top, 1, 10000);
        int r = bounded("--runs", runs, 1, 1000);
        int w = bounded("--warmup", warmup, 0, 1000);
        int cores = Runtime.getRuntime().availableProcessors();
        int t = threads == null ? cores : bounded("--threads", threads, 1, 256);
        long s;
        try {
            s = Long.parseLong(seed.strip());
        } catch (NumberFormatException e) {
            throw new InvalidInputException("--seed", seed, "not a whole number");
        }
        RankBy rank = RankBy.parse("--rank-by", rankBy);
        double limit = Args.number("--red-limit", redLimit);
        if (!(limit > 0) || limit > 10) {
            throw new InvalidInputException("--red-limit", redLimit, "must be above 0 and at most 10");
        }
        List<Solvent> lib;
        SolubilitySphere target;
        BlendConstraints cons;
        String data;
        if (material != null) {
            Material m = ctx().materials().library().resolve("--material", material);
            lib = ctx().library().all();
            target = m.sphere();
            // the command line's safety-first defaults: no CMR, no ICH class 1
            cons = new BlendConstraints(List.of(), List.of(), java.util.Set.of(), java.util.Set.of(), List.of(), BlendConstraints.DEFAULT_MIN_FRACTION,
                    1.0, Map.of(), null, null, null, null, true, null,
                    new BlendConstraints.More(true, false, List.of(), java.util.Set.of(), null, null, null));
            data = "bundled library (" + lib.size() + " solvents, " + lib.stream().filter(Solvent::hasHansen).count() + " with Hansen parameters), "
                    + m.name() + " sphere, no CMR, no ICH class 1";
        } else {
            lib = SyntheticLibrary.generate(n, s);
            target = SyntheticLibrary.BENCH_TARGET;
            cons = BlendConstraints.NONE;
            data = "synthetic library, invented (seed " + s + "): δD 14–21, δP 0–20, δH 0–25 MPa^½ uniform; target 18,9,8 R0 8";
        }
        CandidatePool pool = CandidatePool.of(lib, cons, target, rank);
        BlendSearch.Settings settings = new BlendSearch.Settings(k, topN, rank, limit, true, t);
        BlendSearch.Outcome last = null;
        for (int i = 0; i < w; i++) {
            last = BlendSearch.run(target, pool, cons, settings, null, null);
        }
        double[] secs = new double[r];
        for (int i = 0; i < r; i++) {
            long t0 = System.nanoTime();
            last = BlendSearch.run(target, pool, cons, settings, k == 4 ? BlendView.progress(spec.commandLine().getErr()) : null, null);
            secs[i] = (System.nanoTime() - t0) / 1e9;
        }
        double[] sorted = secs.clone();
        Arrays.sort(sorted);
        double median = r % 2 == 1 ? sorted[r / 2] : (sorted[r / 2 - 1] + sorted[r / 2]) / 2;
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("library_size", lib.size());
        m.put("searched", pool.free().size());
        m.put("components", k);
        m.put("top", topN);
        m.put("rank_by", rank.word());
        m.put("min_fraction", BlendConstraints.DEFAULT_MIN_FRACTION);
        m.put("subsets", last.subsets());
        m.put("solved_exactly", last.solved());
        m.put("seconds_median", Output.round(median, 4));
        m.put("seconds_min", Output.round(sorted[0], 4));
        m.put("seconds_max", Output.round(sorted[r - 1], 4));
        List<Double> all = new ArrayList<>();
        for (double x : secs) {
            all.add(Output.round(x, 4));
        }
        m.put("seconds_runs", all);
        m.put("warmup_runs", w);
        m.put("threads", t);
        m.put("cores", cores);
        m.put("java", System.getProperty("java.version"));
        m.put("red_limit", limit);
        m.put("best_red", last.blends().isEmpty() ? null : Output.round(last.blends().get(0).red(), 6));
        m.put("best_components", last.blends().isEmpty() ? null : last.blends().get(0).size());
        m.put("data", data);
        if (json()) {
            Output.json(out(), m);
            return;
        }
        for (Map.Entry<String, Object> e : m.entrySet()) {
            out().println(String.format(Locale.ROOT, "%-16s %s", e.getKey(), e.getValue()));
        }
    }

    private static int bounded(String field, String text, int min, int max) {
        int v = Args.integer(field, text);
        if (v < min || v > max) {
            throw new InvalidInputException(field, text, "must be " + min + " to " + max);
        }
        return v;
    }
}
