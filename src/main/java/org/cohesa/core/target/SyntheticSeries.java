package org.cohesa.core.target;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.cohesa.core.hsp.SolubilitySphere;

/**
 * Seeded synthetic test series for checking and benchmarking the fit: {@code size} liquids drawn without
 * replacement from a pool (the {@link CommonTestLiquids}), scored against a known sphere (1 inside, 0 outside),
 * optionally with results that go wrong the way lab results do near the surface: {@code flips} results with
 * true RED 0.8–1.25 scored the other way, and {@code graded} other results in the same near-surface band scored 0.5
 * (issue 14's series: two flips and two partial results; the issue gives the band for the flips, and partial
 * swelling is a near-surface result too, so the same band is used). The data are invented for the checks; the
 * spheres and the liquids' parameters are the library's published ones.
 *
 * @param truth   the sphere that scored the series
 * @param results the series
 * @param flipped labels of the flipped results
 * @param graded  labels of the results scored 0.5
 * @param untested the pool liquids not in the series
 */
public record SyntheticSeries(SolubilitySphere truth, List<TestResult> results, List<String> flipped, List<String> graded,
                              List<NamedPoint> untested) {

    /** RED band of the near-surface flips (as in issue 14). */
    public static final double FLIP_LOW = 0.8;
    public static final double FLIP_HIGH = 1.25;

    public SyntheticSeries {
        results = List.copyOf(results);
        flipped = List.copyOf(flipped);
        graded = List.copyOf(graded);
        untested = List.copyOf(untested);
    }

    public static SyntheticSeries draw(SolubilitySphere truth, List<NamedPoint> pool, int size, int flips, int graded, SplittableRandom rng) {
        if (size > pool.size()) {
            throw new IllegalArgumentException("series of " + size + " from a pool of " + pool.size());
        }
        List<NamedPoint> shuffled = new ArrayList<>(pool);
        for (int i = shuffled.size() - 1; i > 0; i--) {
            int j = rng.nextInt(i + 1);
            NamedPoint t = shuffled.get(i);
            shuffled.set(i, shuffled.get(j));
            shuffled.set(j, t);
        }
        List<NamedPoint> chosen = new ArrayList<>(shuffled.subList(0, size));
        List<NamedPoint> rest = new ArrayList<>(shuffled.subList(size, shuffled.size()));
        List<Integer> flipBand = new ArrayList<>();
        for (int i = 0; i < size; i++) {
            double red = truth.red(chosen.get(i).point());
            if (red >= FLIP_LOW && red <= FLIP_HIGH) {
                flipBand.add(i);
            }
        }
        List<Integer> gradeBand = new ArrayList<>(flipBand);
        List<Integer> flipIdx = pick(flipBand, flips, rng);
        gradeBand.removeAll(flipIdx);
        List<Integer> gradeIdx = pick(gradeBand, graded, rng);
        List<TestResult> results = new ArrayList<>();
        List<String> flipped = new ArrayList<>();
        List<String> gradedNames = new ArrayList<>();
        for (int i = 0; i < size; i++) {
            NamedPoint p = chosen.get(i);
            double score = truth.contains(p.point()) ? 1 : 0;
            if (flipIdx.contains(i)) {
                score = 1 - score;
                flipped.add(p.name());
            } else if (gradeIdx.contains(i)) {
                score = 0.5;
                gradedNames.add(p.name());
            }
            results.add(TestResult.of(p.name(), p.point(), score));
        }
        return new SyntheticSeries(truth, results, flipped, gradedNames, rest);
    }

    /** The series with one more liquid, scored against the truth (no flip). */
    public SyntheticSeries plus(NamedPoint liquid) {
        List<TestResult> r = new ArrayList<>(results);
        r.add(TestResult.of(liquid.name(), liquid.point(), truth.contains(liquid.point()) ? 1 : 0));
        List<NamedPoint> u = new ArrayList<>(untested);
        u.removeIf(x -> x.name().equals(liquid.name()));
        return new SyntheticSeries(truth, r, flipped, graded, u);
    }

    private static List<Integer> pick(List<Integer> from, int n, SplittableRandom rng) {
        List<Integer> copy = new ArrayList<>(from);
        List<Integer> out = new ArrayList<>();
        while (out.size() < n && !copy.isEmpty()) {
            out.add(copy.remove(rng.nextInt(copy.size())));
        }
        return out;
    }
}
