package org.cohesa.core.target;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import org.apache.commons.math3.distribution.ChiSquaredDistribution;
import org.apache.commons.math3.optim.PointValuePair;
import org.cohesa.core.hsp.SolubilitySphere;

/**
 * The likelihood fit (docs/methods.md, "Sphere fit"): each score is a noisy observation of "inside", with
 * P(dissolves) falling smoothly with RED ({@link DissolutionModel}); the sphere is the maximum of the likelihood
 * (times the centre prior, when one is given) over δD, δP, δH and R0.
 *
 * <p>Multi-start: the cells of the consensus grid that sort the results best ({@link Consensus}, a cheap scan of
 * the whole region of the dissolving liquids), the score-weighted centroid of the dissolving liquids with a radius
 * that holds them, the prior centre, and seeded jitter around the best cells; each start is refined by
 * Nelder–Mead ({@link LocalSearch}, Commons Math 3) and the best optimum is kept. The region is the
 * likelihood-ratio region ({@link LikelihoodRegion}), explored by {@link RegionSampler} chains started at every
 * optimum inside it (so a region with two lobes is seen as such); a sampled sphere better than the optimum
 * restarts the local search from there. Next tests: {@link InformationAdvisor}.
 */
public final class LikelihoodFitter {

    /** Kept samples per chain from the best optimum; chains from other optima keep half as many. */
    private static final int KEPT = 1500;
    /** Most spheres handed out for drawing. */
    private static final int CLOUD = 200;
    /** Two optima closer than this (Ra, MPa^½, and |ΔR0|) count as one. */
    private static final double SAME_OPTIMUM = 1.0;

    private LikelihoodFitter() {
    }

    /** The deviance limit of the nominal level: the χ²₄ quantile (9.49 at 95 %). */
    public static double threshold(double level) {
        return new ChiSquaredDistribution(null, 4).inverseCumulativeProbability(level);
    }

    public static FitResult fit(List<TestResult> results, List<NamedPoint> candidates, FitOptions options) {
        SphereFitter.requireUsable(results);
        SphereFitter.Data data = SphereFitter.Data.of(results);
        DissolutionModel model = options.model();
        CentrePrior prior = options.prior();
        LikelihoodObjective f = new LikelihoodObjective(data, null, model, prior);
        SplittableRandom rng = new SplittableRandom(options.seed());
        List<PointValuePair> optima = optima(data, f, options.starts(), prior, rng);
        double[] best = optima.get(0).getPoint();
        double lBest = -optima.get(0).getValue();
        double level = SphereFitter.LEVEL;
        double limit = threshold(level);

        List<double[]> pts = new ArrayList<>();
        List<Double> ls = new ArrayList<>();
        List<double[]> chainStarts = new ArrayList<>();
        chainStarts.add(best);
        for (PointValuePair o : optima) {
            double[] p = o.getPoint();
            if (2 * (lBest + o.getValue()) <= limit && chainStarts.stream().noneMatch(q -> same(p, q)) && chainStarts.size() < 3) {
                chainStarts.add(p);
            }
        }
        for (int c = 0; c < chainStarts.size(); c++) {
            RegionSampler.Chain chain = RegionSampler.run(f, chainStarts.get(c), c == 0 ? KEPT : KEPT / 2, rng);
            pts.addAll(chain.points());
            ls.addAll(chain.logL());
        }
        int top = argmax(ls);
        if (ls.get(top) > lBest + 1e-9) {
            PointValuePair p = LocalSearch.minimise(f, pts.get(top), 0.3);
            if (-p.getValue() > lBest) {
                best = p.getPoint();
                lBest = -p.getValue();
            }
        }
        SolubilitySphere sphere = SolubilitySphere.of(best[0], best[1], best[2], best[3]);

        // the region: sampled spheres within the deviance limit (the fitted sphere itself always)
        List<double[]> inside = new ArrayList<>();
        inside.add(best);
        for (int j = 0; j < pts.size(); j++) {
            if (2 * (lBest - ls.get(j)) <= limit) {
                inside.add(pts.get(j));
            }
        }
        double[] lo = best.clone();
        double[] hi = best.clone();
        double radius = 0;
        for (double[] p : inside) {
            for (int k = 0; k < 4; k++) {
                lo[k] = Math.min(lo[k], p[k]);
                hi[k] = Math.max(hi[k], p[k]);
            }
            radius = Math.max(radius, SphereFitter.Data.ra(p, best));
        }
        Interval[] box = new Interval[4];
        for (int k = 0; k < 4; k++) {
            box[k] = new Interval(lo[k], hi[k]);
        }
        long bad = results.stream().filter(r -> !r.good()).count();
        String boundedNote = boundedNote(lo, hi, bad);
        boolean bounded = boundedNote.startsWith("bounded");
        List<SolubilitySphere> cloud = new ArrayList<>();
        int stride = Math.max(1, inside.size() / CLOUD);
        for (int j = 0; j < inside.size() && cloud.size() < CLOUD; j += stride) {
            double[] p = inside.get(j);
            cloud.add(SolubilitySphere.of(p[0], p[1], p[2], p[3]));
        }
        // posterior weights of the tempered samples: L^(1 − 1/T) relative to the best
        double[] w = new double[pts.size()];
        double[] mean = new double[4];
        double mass = 0;
        for (int j = 0; j < w.length; j++) {
            w[j] = Math.exp((ls.get(j) - lBest) * (1 - 1 / RegionSampler.TEMPERATURE));
            mass += w[j];
            for (int k = 0; k < 4; k++) {
                mean[k] += w[j] * pts.get(j)[k];
            }
        }
        for (int k = 0; k < 4; k++) {
            mean[k] /= mass;
        }
        LikelihoodRegion region = new LikelihoodRegion(level, limit, lBest, radius, box[3], bounded, boundedNote, cloud, prior != null, model,
                SolubilitySphere.of(mean[0], mean[1], mean[2], mean[3]));

        List<NamedPoint> untested = SphereFitter.untested(results, candidates);
        List<String> warnings = new ArrayList<>(BoundsCheck.warnings(data, best, box, results, untested));
        if (!bounded) {
            warnings.add(0, boundedNote);
        }
        ConfidenceRegion confidence = new ConfidenceRegion(level, inside.size(), box[0], box[1], box[2], box[3], warnings);

        List<ResultProbability> probabilities = probabilities(results, sphere, model);
        List<NextTest> next = InformationAdvisor.suggest(best, data, cloud, untested, model, prior, options.nextTests());
        List<String> notes = notes(probabilities, model, prior);
        RadiusCentreTradeOff.of(inside).filter(RadiusCentreTradeOff::matters).ifPresent(t -> notes.add(t.note()));
        return new FitResult(sphere, SphereFitter.quality(results, sphere), confidence, next, results.size(), FitMethod.LIKELIHOOD,
                probabilities, region, prior, notes);
    }

    /**
     * True when {@code sphere} lies inside the fit's likelihood-ratio region: its deviance from the fitted sphere
     * is within the region's threshold (the coverage check of the synthetic series).
     */
    public static boolean regionHolds(FitResult fit, List<TestResult> results, SolubilitySphere sphere) {
        LikelihoodRegion r = fit.region();
        if (r == null) {
            throw new IllegalArgumentException("the fit has no likelihood region (method " + fit.method().key() + ")");
        }
        return 2 * (r.maxLogLikelihood() - logLikelihood(results, r.model(), fit.prior(), sphere)) <= r.threshold();
    }

    /** Log-likelihood (plus log prior) of {@code sphere} for the series. */
    public static double logLikelihood(List<TestResult> results, DissolutionModel model, CentrePrior prior, SolubilitySphere sphere) {
        LikelihoodObjective f = new LikelihoodObjective(SphereFitter.Data.of(results), null, model, prior);
        return f.logPosterior(new double[] {sphere.centre().dD(), sphere.centre().dP(), sphere.centre().dH(), sphere.r0()});
    }

    /** Every result with its probability under {@code sphere}, least likely first. */
    public static List<ResultProbability> probabilities(List<TestResult> results, SolubilitySphere sphere, DissolutionModel model) {
        double band = model.noiseBand();
        List<ResultProbability> out = new ArrayList<>();
        for (TestResult r : results) {
            double red = sphere.red(r.liquid());
            double p = model.pDissolves(red);
            double q = DissolutionModel.probabilityOfResult(r.score(), p);
            out.add(new ResultProbability(r.label(), r.score(), red, p, q, q < ResultProbability.MISFIT_PROBABILITY,
                    Math.abs(red - 1) < band));
        }
        out.sort(Comparator.comparingDouble(ResultProbability::probability));
        return out;
    }

    private static List<PointValuePair> optima(SphereFitter.Data data, LikelihoodObjective f, int starts, CentrePrior prior,
                                               SplittableRandom rng) {
        double[] ones = new double[data.size()];
        Arrays.fill(ones, 1.0);
        List<Consensus.Cell> coarse = new ArrayList<>(Consensus.coarse(data, ones));
        coarse.sort(Comparator.comparingDouble(c -> -c.logZ()));
        List<double[]> s = new ArrayList<>();
        int fromGrid = Math.max(1, starts / 2);
        for (int i = 0; i < fromGrid && i < coarse.size(); i++) {
            Consensus.Cell c = coarse.get(i);
            s.add(new double[] {c.sx() / 2, c.sy(), c.sz(), c.bestR()});
        }
        double[] centroid = data.goodCentroid(ones);
        s.add(new double[] {centroid[0], centroid[1], centroid[2], data.goodReach(centroid, ones)});
        if (prior != null) {
            double[] pc = prior.centre().toArray();
            s.add(new double[] {pc[0], pc[1], pc[2], data.goodReach(pc, ones)});
        }
        int base = s.size();
        while (s.size() < Math.max(starts, base + 1)) {
            double[] b = s.get(rng.nextInt(base));
            s.add(new double[] {b[0] + rng.nextGaussian() * 0.5, b[1] + rng.nextGaussian(), b[2] + rng.nextGaussian(),
                    b[3] * (0.8 + 0.4 * rng.nextDouble())});
        }
        List<PointValuePair> out = new ArrayList<>();
        for (double[] x : s) {
            out.add(LocalSearch.minimise(f, x));
        }
        out.sort(Comparator.comparingDouble(PointValuePair::getValue));
        // polish the best with a small simplex: Nelder–Mead can stall on a ridge of the likelihood
        PointValuePair polished = LocalSearch.minimise(f, out.get(0).getPoint(), 0.2);
        if (polished.getValue() < out.get(0).getValue()) {
            out.set(0, polished);
        }
        return out;
    }

    private static boolean same(double[] a, double[] b) {
        return SphereFitter.Data.ra(a, b) < SAME_OPTIMUM && Math.abs(a[3] - b[3]) < SAME_OPTIMUM;
    }

    private static int argmax(List<Double> v) {
        int best = 0;
        for (int i = 1; i < v.size(); i++) {
            if (v.get(i) > v.get(best)) {
                best = i;
            }
        }
        return best;
    }

    /** Whether the region stays clear of the search box (δD 5–30, δP ≤ 40, δH ≤ 50, R0 ≤ 40; δP, δH ≥ 0 are physical). */
    private static String boundedNote(double[] lo, double[] hi, long bad) {
        if (bad == 0) {
            return "not bounded: no liquid failed to dissolve the material, so nothing closes the sphere from outside";
        }
        List<String> open = new ArrayList<>();
        // within 1 MPa^½ of an edge counts as reaching it: a finite chain comes close to an open edge without touching it
        if (lo[0] <= LocalSearch.LOWER[0] + 1 || hi[0] >= LocalSearch.UPPER[0] - 1) {
            open.add("δD");
        }
        if (hi[1] >= LocalSearch.UPPER[1] - 1) {
            open.add("δP");
        }
        if (hi[2] >= LocalSearch.UPPER[2] - 1) {
            open.add("δH");
        }
        if (hi[3] >= LocalSearch.UPPER[3] - 2) {
            open.add("R0");
        }
        if (open.isEmpty()) {
            return "bounded: the 95 % region closes on every side";
        }
        return String.format(Locale.ROOT, "not bounded: the 95 %% region runs to the edge of the search space in %s; "
                + "test liquids on the open side", String.join(", ", open));
    }

    private static List<String> notes(List<ResultProbability> probabilities, DissolutionModel model, CentrePrior prior) {
        List<String> notes = new ArrayList<>();
        double band = model.noiseBand();
        notes.add(String.format(Locale.ROOT, "model: P(dissolves) = %.2f + %.2f·σ((1 − RED)/%.2f); results within RED %.2f–%.2f of the "
                + "surface (0.1 < P < 0.9) cannot be told from noise, whichever way they went", model.lapse(), 1 - 2 * model.lapse(),
                model.softness(), 1 - band, 1 + band));
        long near = probabilities.stream().filter(ResultProbability::nearSurface).count();
        if (near > 0) {
            notes.add(near + " result(s) lie in that band near the surface; a wrong one there would not show as a misfit");
        }
        if (prior != null) {
            notes.add(String.format(Locale.ROOT, "prior: the centre was pulled towards %.1f/%.1f/%.1f (%s), standard deviation δD %.1f, "
                    + "δP %.1f, δH %.1f MPa^½; the region is that of the penalised likelihood", prior.centre().dD(), prior.centre().dP(),
                    prior.centre().dH(), prior.source(), prior.sdD(), prior.sdP(), prior.sdH()));
            if (prior.kind() == CentrePrior.Kind.STRUCTURE) {
                notes.add("the structure estimate is a guess from group contributions (errors measured on liquids, where drug-like solids may "
                        + "do worse); the tests decide wherever they bound the sphere");
            }
            prior.cautions().forEach(c -> notes.add("prior caution: " + c));
        }
        return notes;
    }
}
