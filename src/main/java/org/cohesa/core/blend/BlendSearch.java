package org.cohesa.core.blend;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.PriorityQueue;
import java.util.concurrent.CancellationException;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicLong;
import java.util.concurrent.atomic.AtomicReference;
import org.cohesa.core.hsp.HansenDistance;
import org.cohesa.core.hsp.HansenParameters;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.core.solvent.Solvent;

/**
 * Exhaustive, exact search over every subset of 1 to 4 solvents of a candidate pool for the blends closest
 * to a target sphere (or best on a secondary key among those inside it).
 *
 * <p>Each subset's composition is the exact optimum of {@link SimplexQp}. Subsets are enumerated in index
 * order (never stored), split over the worker threads by the first index, and the best {@code top} are kept
 * in a bounded heap per thread. With pruning on, a subset is solved only when a lower bound on its key does
 * not already exceed the worst key of a full heap; the bounds (see docs/methods.md) are:
 * <ul>
 *   <li>pairs: distance from the target to the line through the two points;</li>
 *   <li>triples: distance from the target to the plane of the three points;</li>
 *   <li>quadruples: for each barycentric coordinate λₘ of the target outside [loₘ, hiₘ], the distance to the
 *       plane λₘ = bound, (violation)·hₘ with hₘ the height of vertex m;</li>
 *   <li>linear secondary keys: Σ loᵢcᵢ + (1 − Σ loᵢ)·min cᵢ, the minimum of the key over the unbounded-above simplex.</li>
 * </ul>
 * Each bound is below the exact value for every composition the constraints allow, so a pruned subset can
 * never have entered the list: the result equals the brute-force result (a test checks it).
 */
public final class BlendSearch {

    /** δD is doubled in the search coordinates so Euclidean distance equals Ra (Hansen 2007). */
    private static final double D_SCALE = Math.sqrt(HansenDistance.DISPERSION_WEIGHT);

    /** Largest number of components a blend may have. */
    public static final int MAX_COMPONENTS = 4;

    /**
     * @param maxComponents 1..4, counting fixed components
     * @param top           how many blends to return
     * @param rankBy        secondary key
     * @param redLimit      RED up to which a blend counts as good (the region where the secondary key chooses the composition)
     * @param pruning       false solves every subset (for checks)
     * @param threads       worker threads (≥ 1)
     */
    public record Settings(int maxComponents, int top, RankBy rankBy, double redLimit, boolean pruning, int threads,
            Desirability.Weights weights) {

        /** Settings with the default desirability weights. */
        public Settings(int maxComponents, int top, RankBy rankBy, double redLimit, boolean pruning, int threads) {
            this(maxComponents, top, rankBy, redLimit, pruning, threads, Desirability.DEFAULT);
        }

        public Settings {
            java.util.Objects.requireNonNull(weights, "weights");
            if (maxComponents < 1 || maxComponents > MAX_COMPONENTS) {
                throw new IllegalArgumentException("components must be 1 to " + MAX_COMPONENTS + ", got " + maxComponents);
            }
            if (top < 1) {
                throw new IllegalArgumentException("top must be at least 1, got " + top);
            }
            if (!(redLimit > 0) || !Double.isFinite(redLimit)) {
                throw new IllegalArgumentException("RED limit must be a positive number, got " + redLimit);
            }
            if (threads < 1) {
                throw new IllegalArgumentException("threads must be at least 1, got " + threads);
            }
            java.util.Objects.requireNonNull(rankBy, "rankBy");
        }

        public static Settings of(int maxComponents, int top, RankBy rankBy, double redLimit) {
            return new Settings(maxComponents, top, rankBy, redLimit, true, Runtime.getRuntime().availableProcessors());
        }

        public static Settings of(int maxComponents, int top, RankBy rankBy, double redLimit, Desirability.Weights weights) {
            return new Settings(maxComponents, top, rankBy, redLimit, true, Runtime.getRuntime().availableProcessors(), weights);
        }
    }

    /**
     * @param blends  best first
     * @param subsets subsets in the search space (all sizes)
     * @param solved  subsets whose composition was computed (the rest were pruned by a bound)
     */
    public record Outcome(List<RankedBlend> blends, long subsets, long solved) {
    }

    private final SolubilitySphere target;
    private final CandidatePool pool;
    private final BlendConstraints constraints;
    private final Settings settings;

    // The problem in the free components' own fractions ψ = φ / (1 − F) (F = fixed fraction).
    private final int n;
    private final double[] x;
    private final double[] y;
    private final double[] z;
    private final double[] lo;
    private final double[] hi;
    private final double[] price;
    private final double costCap;
    private final double[] objective;
    private final double[] hazard;
    private final double tx;
    private final double ty;
    private final double tz;
    private final double scale;
    private final double rho;
    private final int nFixed;
    private final boolean shortcut;
    /** 1e-9 × the largest extent of the candidate points: |det| above flatScale·|n| means a proper tetrahedron. */
    private final double flatScale;
    /** Loosest fraction bounds over the candidates, widened by the barycentric tolerance (slab pre-test of quadruples). */
    private final double slabLo;
    private final double slabHi;

    private final AtomicReference<Cand> bound = new AtomicReference<>();

    // Desirability ranking: the free solvents in order of falling hazard penalty, so that the first index of a
    // subset is its worst component and the score's subset part is known before the subset is looked at.
    private final List<Solvent> order;
    private final boolean desirability;
    private final double[] pen;
    private final double fixedPen;
    private final double[] relPrice;
    private final double fixedRelCost;
    private final double redPerDist;

    private BlendSearch(SolubilitySphere target, CandidatePool pool, BlendConstraints constraints, Settings settings) {
        this.target = target;
        this.pool = pool;
        this.constraints = constraints;
        this.settings = settings;
        desirability = settings.rankBy() == RankBy.DESIRABILITY;
        List<Solvent> free = pool.free();
        if (desirability) {
            double[] p0 = Desirability.penalties(free, settings.weights());
            Integer[] ix = new Integer[free.size()];
            for (int i = 0; i < ix.length; i++) {
                ix[i] = i;
            }
            java.util.Arrays.sort(ix, (a, b) -> Double.compare(p0[b], p0[a])); // stable: ties keep the pool's order (by Ra)
            List<Solvent> sorted = new ArrayList<>(free.size());
            for (Integer i : ix) {
                sorted.add(free.get(i));
            }
            free = List.copyOf(sorted);
        }
        order = free;
        n = free.size();
        nFixed = pool.fixed().size();
        double fixedSum = 0;
        double bx = 0;
        double by = 0;
        double bz = 0;
        double fixedCost = 0;
        for (BlendComponent f : pool.fixed()) {
            HansenParameters h = f.solvent().hansen();
            fixedSum += f.fraction();
            bx += f.fraction() * D_SCALE * h.dD();
            by += f.fraction() * h.dP();
            bz += f.fraction() * h.dH();
            if (f.solvent().pricePerLitre() != null) {
                fixedCost += f.fraction() * f.solvent().pricePerLitre();
            }
        }
        scale = 1.0 - fixedSum;
        HansenParameters c = target.centre();
        double s = scale > 1e-12 ? scale : 1.0;
        tx = (D_SCALE * c.dD() - bx) / s;
        ty = (c.dP() - by) / s;
        tz = (c.dH() - bz) / s;
        rho = settings.redLimit() * target.r0() / s;
        x = new double[n];
        y = new double[n];
        z = new double[n];
        lo = new double[n];
        hi = new double[n];
        hazard = new double[n];
        boolean needPrice = constraints.maxCost() != null || settings.rankBy() == RankBy.COST;
        price = needPrice ? new double[n] : null;
        objective = settings.rankBy().isLinear() ? new double[n] : null;
        for (int i = 0; i < n; i++) {
            Solvent v = free.get(i);
            x[i] = D_SCALE * v.hansen().dD();
            y[i] = v.hansen().dP();
            z[i] = v.hansen().dH();
            double[] r = constraints.rangeOf(v);
            lo[i] = r[0] / s;
            hi[i] = Math.min(1.0, r[1] / s);
            hazard[i] = HazardScore.of(v);
            if (price != null) {
                price[i] = v.pricePerLitre();
            }
            if (objective != null) {
                objective[i] = switch (settings.rankBy()) {
                    case HAZARD -> hazard[i];
                    case COST -> v.pricePerLitre();
                    case EVAPORATION -> -Evaporation.vapourPressureKpa(v);
                    default -> throw new IllegalStateException();
                };
            }
        }
        costCap = constraints.maxCost() == null ? Double.NaN : (constraints.maxCost() - fixedCost) / s;
        redPerDist = s / target.r0();
        if (desirability) {
            pen = Desirability.penalties(free, settings.weights());
            double fp = 0;
            for (BlendComponent f : pool.fixed()) {
                fp = Math.max(fp, Desirability.componentPenalty(f.solvent(), settings.weights()));
            }
            fixedPen = fp;
            List<Solvent> priced = new ArrayList<>(free);
            pool.fixed().forEach(f -> priced.add(f.solvent()));
            double ref = Desirability.referencePrice(priced);
            relPrice = new double[n];
            double frc = 0;
            if (!Double.isNaN(ref)) {
                for (int i = 0; i < n; i++) {
                    Double pr = free.get(i).pricePerLitre();
                    relPrice[i] = pr == null ? 0 : pr / ref;
                }
                for (BlendComponent f : pool.fixed()) {
                    if (f.solvent().pricePerLitre() != null) {
                        frc += f.fraction() * f.solvent().pricePerLitre() / ref;
                    }
                }
            }
            fixedRelCost = frc;
        } else {
            pen = null;
            fixedPen = 0;
            relPrice = null;
            fixedRelCost = 0;
        }
        shortcut = !settings.rankBy().isLinear();
        double extent = 0;
        for (int i = 0; i < n; i++) {
            extent = Math.max(extent, Math.max(Math.abs(x[i] - tx), Math.max(Math.abs(y[i] - ty), Math.abs(z[i] - tz))));
        }
        flatScale = 1e-9 * 2 * Math.sqrt(3) * extent;
        double minLo = Double.POSITIVE_INFINITY;
        double maxHi = 0;
        for (int i = 0; i < n; i++) {
            minLo = Math.min(minLo, lo[i]);
            maxHi = Math.max(maxHi, hi[i]);
        }
        slabLo = minLo - 1e-12;
        slabHi = maxHi + 1e-12;
    }

    /**
     * Runs the search.
     *
     * @throws CancellationException when {@code cancel} is cancelled meanwhile
     */
    public static Outcome run(SolubilitySphere target, CandidatePool pool, BlendConstraints constraints, Settings settings,
            ProgressListener progress, CancellationToken cancel) {
        return new BlendSearch(target, pool, constraints, settings).run(progress == null ? ProgressListener.NONE : progress,
                cancel == null ? new CancellationToken() : cancel);
    }

    private Outcome run(ProgressListener progress, CancellationToken cancel) {
        if (scale <= 1e-12) {
            // The fixed components make up the whole blend: that blend is the only answer.
            return new Outcome(nFixed == 0 ? List.of() : List.of(toRanked(new Cand(new int[0], new double[0], 0, 0, 0, 0, 0))), 1, 1);
        }
        int maxFree = Math.min(settings.maxComponents() - nFixed, n);
        long total = 0;
        for (int k = 1; k <= maxFree; k++) {
            total += choose(n, k);
        }
        Worker[] workers = new Worker[settings.threads()];
        for (int w = 0; w < workers.length; w++) {
            workers[w] = new Worker(cancel);
        }
        AtomicLong done = new AtomicLong();
        for (int k = 1; k <= maxFree; k++) {
            runPhase(k, workers, done, total, progress, cancel);
        }
        List<Cand> all = new ArrayList<>();
        long solved = 0;
        for (Worker w : workers) {
            all.addAll(w.heap);
            solved += w.solved;
        }
        all.sort(KEY);
        List<RankedBlend> out = new ArrayList<>();
        for (int i = 0; i < Math.min(settings.top(), all.size()); i++) {
            out.add(toRanked(all.get(i)));
        }
        return new Outcome(out, total, solved);
    }

    private void runPhase(int k, Worker[] workers, AtomicLong done, long total, ProgressListener progress, CancellationToken cancel) {
        AtomicInteger next = new AtomicInteger();
        RuntimeException[] failure = new RuntimeException[1];
        Thread[] threads = new Thread[workers.length - 1];
        for (int w = 1; w < workers.length; w++) {
            Worker worker = workers[w];
            threads[w - 1] = new Thread(() -> {
                try {
                    worker.phase(k, next, done, total, progress);
                } catch (RuntimeException e) {
                    synchronized (failure) {
                        failure[0] = e;
                    }
                    cancel.cancel();
                }
            }, "cohesa-blend-search-" + w);
            threads[w - 1].setDaemon(true);
            threads[w - 1].start();
        }
        RuntimeException own = null;
        try {
            workers[0].phase(k, next, done, total, progress);
        } catch (RuntimeException e) {
            own = e;
            cancel.cancel();
        }
        for (Thread t : threads) {
            try {
                t.join();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                cancel.cancel();
                throw new CancellationException("interrupted");
            }
        }
        if (own != null) {
            throw own;
        }
        synchronized (failure) {
            if (failure[0] != null) {
                throw failure[0];
            }
        }
    }

    static long choose(int n, int k) {
        if (k < 0 || k > n) {
            return 0;
        }
        long r = 1;
        for (int i = 1; i <= k; i++) {
            r = r * (n - k + i) / i;
        }
        return r;
    }

    // ---- ranking keys -------------------------------------------------------------------------------------

    /** A subset with its composition and rank key (group, p1, p2, p3, then the indices). */
    static final class Cand {
        final int[] idx;
        final double[] psi;
        final double dist;
        final int group;
        final double p1;
        final double p2;
        final double p3;

        Cand(int[] idx, double[] psi, double dist, int group, double p1, double p2, double p3) {
            this.idx = idx;
            this.psi = psi;
            this.dist = dist;
            this.group = group;
            this.p1 = p1;
            this.p2 = p2;
            this.p3 = p3;
        }
    }

    static final Comparator<Cand> KEY = (a, b) -> {
        int c = Integer.compare(a.group, b.group);
        if (c != 0) {
            return c;
        }
        c = Double.compare(a.p1, b.p1);
        if (c != 0) {
            return c;
        }
        c = Double.compare(a.p2, b.p2);
        if (c != 0) {
            return c;
        }
        c = Double.compare(a.p3, b.p3);
        if (c != 0) {
            return c;
        }
        c = Integer.compare(a.idx.length, b.idx.length);
        if (c != 0) {
            return c;
        }
        for (int i = 0; i < a.idx.length; i++) {
            c = Integer.compare(a.idx[i], b.idx[i]);
            if (c != 0) {
                return c;
            }
        }
        return 0;
    };

    /** Compares a key tuple with a candidate's key (indices ignored): &gt; 0 when the tuple is strictly worse. */
    private static int compareTuple(int group, double p1, double p2, double p3, Cand w) {
        int c = Integer.compare(group, w.group);
        if (c != 0) {
            return c;
        }
        c = Double.compare(p1, w.p1);
        if (c != 0) {
            return c;
        }
        c = Double.compare(p2, w.p2);
        return c != 0 ? c : Double.compare(p3, w.p3);
    }

    /** Largest distance (ψ space) a subset of {@code totalK} components may have and still enter, given the bound; −1: none may. */
    private double distanceThreshold(Cand w, int totalK, int i) {
        if (desirability) {
            return desirabilityThreshold(w, totalK, i);
        }
        if (w == null) {
            return Double.POSITIVE_INFINITY;
        }
        RankBy r = settings.rankBy();
        if (r == RankBy.RED) {
            return w.p1;
        }
        if (w.group == 1) {
            return w.p1;
        }
        if (r == RankBy.COMPONENTS) {
            if (totalK > w.p1) {
                return -1;
            }
            return totalK == w.p1 ? Math.min(rho, w.p2) : rho;
        }
        return rho;
    }

    /**
     * The part of the desirability score a subset whose worst (first) member is {@code i} has before its
     * composition is known: the worst component's weighted penalty and the component count. Cost (≥ 0) and distance
     * (≥ 0) can only add to it, so it is a lower bound of the score.
     */
    private double baseScore(int i, int totalK) {
        Desirability.Weights wt = settings.weights();
        return Math.max(pen[i], fixedPen) + wt.components() * (totalK - 1) + wt.cost() * fixedRelCost;
    }

    /** Largest ψ-space distance a subset led by {@code i} may have: inside the RED limit and able to beat the bound; −1: none. */
    private double desirabilityThreshold(Cand w, int totalK, int i) {
        if (w == null) {
            return rho;
        }
        double slack = w.p1 - baseScore(i, totalK);
        double tol = 1e-9 * (1 + Math.abs(w.p1));
        if (slack < -tol) {
            return -1;
        }
        double wd = settings.weights().distance() * redPerDist;
        if (wd > 0) {
            return Math.min(rho, (Math.max(0, slack) + tol) / wd);
        }
        return slack > tol ? rho : Math.min(rho, w.p2);
    }

    /** True when no subset of this size led by {@code i} or by any later-visited index can enter (desirability order only). */
    private boolean desirabilityExhausted(int i, int totalK) {
        Cand w = bound.get();
        return w != null && baseScore(i, totalK) - w.p1 > 1e-9 * (1 + Math.abs(w.p1));
    }

    /** Largest linear-key value a subset may have and still enter (infinite unless the bound is a good blend). */
    private double objectiveThreshold(Cand w) {
        if (w == null || objective == null || w.group != 0) {
            return Double.POSITIVE_INFINITY;
        }
        return w.p1;
    }

    // ---- one worker thread --------------------------------------------------------------------------------

    private final class Worker {
        final PriorityQueue<Cand> heap = new PriorityQueue<>(KEY.reversed());
        final CancellationToken cancel;
        long solved;
        final int[] idx = new int[4];

        Worker(CancellationToken cancel) {
            this.cancel = cancel;
        }

        void phase(int k, AtomicInteger next, AtomicLong done, long total, ProgressListener progress) {
            int c;
            while ((c = next.getAndIncrement()) <= n - k) {
                checkCancel();
                // Desirability: visit the least hazardous leaders first; their penalty only grows from there on.
                int i = desirability && settings.pruning() ? n - k - c : c;
                if (desirability && settings.pruning() && desirabilityExhausted(i, k + nFixed)) {
                    progress.onProgress(done.addAndGet(choose(n - 1 - i, k - 1)), total);
                    continue;
                }
                if (!settings.pruning()) {
                    brute(k, i);
                } else {
                    switch (k) {
                        case 1 -> evaluateAndOffer(1, i, 0, 0, 0);
                        case 2 -> pairs(i);
                        case 3 -> triples(i);
                        default -> quads(i);
                    }
                }
                progress.onProgress(done.addAndGet(choose(n - 1 - i, k - 1)), total);
            }
        }

        private void checkCancel() {
            if (cancel.isCancelled()) {
                throw new CancellationException("blend search cancelled");
            }
        }

        private void brute(int k, int i) {
            int[] c = new int[k];
            c[0] = i;
            for (int a = 1; a < k; a++) {
                c[a] = i + a;
            }
            if (c[k - 1] >= n) {
                return;
            }
            while (true) {
                evaluateAndOffer(k, c[0], k > 1 ? c[1] : 0, k > 2 ? c[2] : 0, k > 3 ? c[3] : 0);
                int a = k - 1;
                while (a >= 1 && c[a] == n - k + a) {
                    a--;
                }
                if (a < 1) {
                    return;
                }
                c[a]++;
                for (int b = a + 1; b < k; b++) {
                    c[b] = c[b - 1] + 1;
                }
            }
        }

        private void pairs(int i) {
            double wx = tx - x[i];
            double wy = ty - y[i];
            double wz = tz - z[i];
            double ww = wx * wx + wy * wy + wz * wz;
            Cand w = bound.get();
            double tau = distanceThreshold(w, 2 + nFixed, i);
            if (tau < 0) {
                return;
            }
            double tau2 = tau * tau;
            double objCap = objectiveThreshold(w);
            for (int j = i + 1; j < n; j++) {
                if (objCap != Double.POSITIVE_INFINITY && objectiveLowerBound(i, j, -1, -1) > objCap) {
                    continue;
                }
                double ex = x[j] - x[i];
                double ey = y[j] - y[i];
                double ez = z[j] - z[i];
                double ee = ex * ex + ey * ey + ez * ez;
                if (ee > 0 && tau2 != Double.POSITIVE_INFINITY) {
                    double we = wx * ex + wy * ey + wz * ez;
                    double line2 = ww - we * we / ee;
                    if (line2 > tau2 * (1 + 1e-12)) {
                        continue;
                    }
                }
                evaluateAndOffer(2, i, j, 0, 0);
            }
        }

        private void triples(int i) {
            double wx = tx - x[i];
            double wy = ty - y[i];
            double wz = tz - z[i];
            for (int j = i + 1; j < n - 1; j++) {
                checkCancel();
                double e1x = x[j] - x[i];
                double e1y = y[j] - y[i];
                double e1z = z[j] - z[i];
                double d00 = e1x * e1x + e1y * e1y + e1z * e1z;
                double d20 = wx * e1x + wy * e1y + wz * e1z;
                // c = w × e1, so that (e1 × e2)·w = c·e2
                double cx = wy * e1z - wz * e1y;
                double cy = wz * e1x - wx * e1z;
                double cz = wx * e1y - wy * e1x;
                Cand w = bound.get();
                double tau = distanceThreshold(w, 3 + nFixed, i);
                if (tau < 0) {
                    return;
                }
                double tau2 = tau * tau * (1 + 1e-12);
                double objCap = objectiveThreshold(w);
                for (int k = j + 1; k < n; k++) {
                    if (objCap != Double.POSITIVE_INFINITY && objectiveLowerBound(i, j, k, -1) > objCap) {
                        continue;
                    }
                    double e2x = x[k] - x[i];
                    double e2y = y[k] - y[i];
                    double e2z = z[k] - z[i];
                    double d11 = e2x * e2x + e2y * e2y + e2z * e2z;
                    double d01 = e1x * e2x + e1y * e2y + e1z * e2z;
                    double nn = d00 * d11 - d01 * d01;
                    if (!(nn > 1e-12 * d00 * d11)) {
                        evaluateAndOffer(3, i, j, k, 0);
                        continue;
                    }
                    double nw = cx * e2x + cy * e2y + cz * e2z;
                    double plane2 = nw * nw / nn;
                    if (plane2 > tau2) {
                        continue;
                    }
                    if (shortcut) {
                        double d21 = wx * e2x + wy * e2y + wz * e2z;
                        double v = (d11 * d20 - d01 * d21) / nn;
                        double u3 = (d00 * d21 - d01 * d20) / nn;
                        double u1 = 1.0 - v - u3;
                        if (within(i, u1) && within(j, v) && within(k, u3) && costOk3(i, j, k, u1, v, u3)) {
                            offerDirect(3, i, j, k, 0, u1, v, u3, 0, Math.sqrt(plane2));
                            continue;
                        }
                    }
                    evaluateAndOffer(3, i, j, k, 0);
                }
            }
        }

        private void quads(int i) {
            double wx = tx - x[i];
            double wy = ty - y[i];
            double wz = tz - z[i];
            for (int j = i + 1; j < n - 2; j++) {
                checkCancel();
                double e1x = x[j] - x[i];
                double e1y = y[j] - y[i];
                double e1z = z[j] - z[i];
                // b = e1 × w
                double bx = e1y * wz - e1z * wy;
                double by = e1z * wx - e1x * wz;
                double bz = e1x * wy - e1y * wx;
                for (int k = j + 1; k < n - 1; k++) {
                    double e2x = x[k] - x[i];
                    double e2y = y[k] - y[i];
                    double e2z = z[k] - z[i];
                    // n12 = e1 × e2 (normal of face i,j,k, opposite l); a = w × e2
                    double nx = e1y * e2z - e1z * e2y;
                    double ny = e1z * e2x - e1x * e2z;
                    double nz = e1x * e2y - e1y * e2x;
                    double nNorm2 = nx * nx + ny * ny + nz * nz;
                    double nNorm = Math.sqrt(nNorm2);
                    double ax = wy * e2z - wz * e2y;
                    double ay = wz * e2x - wx * e2z;
                    double az = wx * e2y - wy * e2x;
                    double k3 = nx * wx + ny * wy + nz * wz;
                    Cand w = bound.get();
                    double tau = distanceThreshold(w, 4 + nFixed, i);
                    if (tau < 0) {
                        return;
                    }
                    double tau2 = tau * tau * (1 + 1e-12);
                    double objCap = objectiveThreshold(w);
                    // With a zero threshold only tetrahedra whose bounded part holds the target can enter. Then
                    // λ_l = k3/det(l) must lie in [minLo, maxHi], and det(l) = n·P_l − n·P_i is linear in P_l: a
                    // slab test of three multiplications rules out most l before any other work.
                    boolean slab = tau2 == 0 && slabLo > 0;
                    double sA = Double.NEGATIVE_INFINITY;
                    double sB = Double.POSITIVE_INFINITY;
                    if (slab) {
                        double c0 = nx * x[i] + ny * y[i] + nz * z[i];
                        if (k3 > 0) {
                            sA = c0 + k3 / slabHi;
                            sB = c0 + k3 / slabLo;
                        } else if (k3 < 0) {
                            sA = c0 + k3 / slabLo;
                            sB = c0 + k3 / slabHi;
                        } else {
                            continue; // the target lies in the plane of i, j, k: λ_l = 0 < minLo for every l
                        }
                    }
                    for (int l = k + 1; l < n; l++) {
                        if (slab) {
                            double dl = nx * x[l] + ny * y[l] + nz * z[l];
                            if (dl < sA || dl > sB) {
                                continue;
                            }
                        }
                        if (objCap != Double.POSITIVE_INFINITY && objectiveLowerBound(i, j, k, l) > objCap) {
                            continue;
                        }
                        double e3x = x[l] - x[i];
                        double e3y = y[l] - y[i];
                        double e3z = z[l] - z[i];
                        double det = nx * e3x + ny * e3y + nz * e3z;
                        // Flatness test relative to the library's extent first (cheap), exact length only when close.
                        if (!(Math.abs(det) > flatScale * nNorm)
                                && !(det * det > 1e-18 * nNorm2 * (e3x * e3x + e3y * e3y + e3z * e3z))) {
                            evaluateAndOffer(4, i, j, k, l); // (nearly) flat tetrahedron: let the exact solver decide
                            continue;
                        }
                        // Barycentric coordinates of the target, cheapest first; with a zero threshold any
                        // coordinate outside its bounds proves a positive distance, so stop at the first one.
                        double inv = 1.0 / det;
                        double ll = k3 * inv;
                        double vl = violation(l, ll);
                        if (vl > 0 && tau2 == 0) {
                            continue;
                        }
                        double lj = (ax * e3x + ay * e3y + az * e3z) * inv;
                        double vj = violation(j, lj);
                        if (vj > 0 && tau2 == 0) {
                            continue;
                        }
                        double lk = (bx * e3x + by * e3y + bz * e3z) * inv;
                        double vk = violation(k, lk);
                        if (vk > 0 && tau2 == 0) {
                            continue;
                        }
                        double li = 1.0 - lj - lk - ll;
                        double vi = violation(i, li);
                        if (vi == 0 && vj == 0 && vk == 0 && vl == 0) {
                            if (shortcut && costOk4(i, j, k, l, li, lj, lk, ll)) {
                                offerDirect(4, i, j, k, l, li, lj, lk, ll, 0.0);
                            } else {
                                evaluateAndOffer(4, i, j, k, l);
                            }
                            continue;
                        }
                        if (tau2 == 0) {
                            continue; // the target is outside this bounded tetrahedron: distance > 0 cannot beat 0
                        }
                        if (tau2 != Double.POSITIVE_INFINITY) {
                            double absDet = Math.abs(det);
                            double lb = 0;
                            if (vl > 0) {
                                lb = Math.max(lb, vl * absDet / nNorm);
                            }
                            if (vk > 0) {
                                lb = Math.max(lb, vk * absDet / crossNorm(e1x, e1y, e1z, e3x, e3y, e3z));
                            }
                            if (vj > 0) {
                                lb = Math.max(lb, vj * absDet / crossNorm(e2x, e2y, e2z, e3x, e3y, e3z));
                            }
                            if (vi > 0) {
                                lb = Math.max(lb, vi * absDet / crossNorm(x[k] - x[j], y[k] - y[j], z[k] - z[j],
                                        x[l] - x[j], y[l] - y[j], z[l] - z[j]));
                            }
                            if (lb * lb > tau2) {
                                continue;
                            }
                        }
                        evaluateAndOffer(4, i, j, k, l);
                    }
                }
            }
        }

        private boolean within(int m, double lambda) {
            return lambda >= lo[m] - 1e-12 && lambda <= hi[m] + 1e-12;
        }

        private double violation(int m, double lambda) {
            if (lambda < lo[m] - 1e-12) {
                return lo[m] - lambda;
            }
            if (lambda > hi[m] + 1e-12) {
                return lambda - hi[m];
            }
            return 0;
        }

        private boolean costOk3(int i, int j, int k, double a, double b, double c) {
            return price == null || Double.isNaN(costCap) || price[i] * a + price[j] * b + price[k] * c <= costCap + 1e-11 * Math.max(1, Math.abs(costCap));
        }

        private boolean costOk4(int i, int j, int k, int l, double a, double b, double c, double d) {
            return price == null || Double.isNaN(costCap)
                    || price[i] * a + price[j] * b + price[k] * c + price[l] * d <= costCap + 1e-11 * Math.max(1, Math.abs(costCap));
        }

        private double objectiveLowerBound(int i, int j, int k, int l) {
            if (objective == null) {
                return Double.NEGATIVE_INFINITY;
            }
            double sumLo = lo[i] + lo[j];
            double acc = lo[i] * objective[i] + lo[j] * objective[j];
            double min = Math.min(objective[i], objective[j]);
            if (k >= 0) {
                sumLo += lo[k];
                acc += lo[k] * objective[k];
                min = Math.min(min, objective[k]);
            }
            if (l >= 0) {
                sumLo += lo[l];
                acc += lo[l] * objective[l];
                min = Math.min(min, objective[l]);
            }
            return acc + (1.0 - sumLo) * min;
        }

        /** Offers a subset whose composition the closed form gave (interior of the bounded face). */
        private void offerDirect(int k, int i, int j, int kk, int l, double a, double b, double c, double d, double dist) {
            if (desirability) {
                int[] ix = k == 3 ? new int[] {i, j, kk} : new int[] {i, j, kk, l};
                double[] psi = k == 3 ? new double[] {a, b, c} : new double[] {a, b, c, d};
                Cand dc = desirabilityCand(ix, psi, dist);
                if (dc != null) {
                    offer(dc);
                }
                return;
            }
            double haz = hazard[i] * a + hazard[j] * b + (k > 2 ? hazard[kk] * c : 0) + (k > 3 ? hazard[l] * d : 0);
            int totalK = k + nFixed;
            int group;
            double p1;
            double p2;
            if (settings.rankBy() == RankBy.RED) {
                group = 0;
                p1 = dist;
                p2 = totalK;
            } else {
                boolean inside = dist <= rho * (1 + 1e-12);
                group = inside ? 0 : 1;
                p1 = inside ? totalK : dist;
                p2 = inside ? dist : totalK;
            }
            Cand w = bound.get();
            if (w != null && compareTuple(group, p1, p2, haz, w) > 0) {
                return;
            }
            int[] ix = k == 3 ? new int[] {i, j, kk} : new int[] {i, j, kk, l};
            double[] psi = k == 3 ? new double[] {a, b, c} : new double[] {a, b, c, d};
            offer(new Cand(ix, psi, dist, group, p1, p2, haz));
        }

        private void evaluateAndOffer(int k, int i, int j, int kk, int l) {
            idx[0] = i;
            idx[1] = j;
            idx[2] = kk;
            idx[3] = l;
            double[][] p = new double[k][];
            double[] plo = new double[k];
            double[] phi = new double[k];
            double[] g = price != null && !Double.isNaN(costCap) ? new double[k] : null;
            double[] c = objective != null ? new double[k] : null;
            double sumLo = 0;
            for (int a = 0; a < k; a++) {
                int m = idx[a];
                p[a] = new double[] {x[m], y[m], z[m]};
                plo[a] = lo[m];
                phi[a] = hi[m];
                sumLo += lo[m];
                if (g != null) {
                    g[a] = price[m];
                }
                if (c != null) {
                    c[a] = objective[m];
                }
            }
            if (sumLo > 1 + 1e-12) {
                return;
            }
            double[] t = {tx, ty, tz};
            solved++;
            SimplexQp.Solution sol = SimplexQp.closest(p, t, plo, phi, g, costCap);
            if (sol == null) {
                return;
            }
            double dist = Math.sqrt(sol.distanceSquared());
            double[] psi = sol.fractions();
            double obj = Double.NaN;
            boolean inside = dist <= rho * (1 + 1e-12);
            if (c != null && inside) {
                SimplexQp.Solution in = SimplexQp.bestInside(p, t, plo, phi, g, costCap, c, rho);
                if (in != null) {
                    psi = in.fractions();
                    dist = Math.sqrt(in.distanceSquared());
                }
            }
            if (desirability) {
                Cand dc = desirabilityCand(java.util.Arrays.copyOf(idx, k), psi, dist);
                if (dc != null) {
                    offer(dc);
                }
                return;
            }
            double haz = 0;
            for (int a = 0; a < k; a++) {
                haz += hazard[idx[a]] * psi[a];
            }
            if (c != null) {
                obj = 0;
                for (int a = 0; a < k; a++) {
                    obj += c[a] * psi[a];
                }
            }
            int totalK = k + nFixed;
            int group;
            double p1;
            double p2;
            double p3;
            switch (settings.rankBy()) {
                case RED -> {
                    group = 0;
                    p1 = dist;
                    p2 = totalK;
                    p3 = haz;
                }
                case COMPONENTS -> {
                    group = inside ? 0 : 1;
                    p1 = inside ? totalK : dist;
                    p2 = inside ? dist : totalK;
                    p3 = haz;
                }
                default -> {
                    group = inside ? 0 : 1;
                    p1 = inside ? obj : dist;
                    p2 = inside ? dist : obj;
                    p3 = totalK;
                }
            }
            offer(new Cand(java.util.Arrays.copyOf(idx, k), psi, dist, group, p1, p2, p3));
        }

        /** The desirability key of a subset at its closest composition, or null when it does not qualify (RED above the limit). */
        private Cand desirabilityCand(int[] ix, double[] psi, double dist) {
            if (dist > rho * (1 + 1e-12)) {
                return null;
            }
            Desirability.Weights wt = settings.weights();
            double worst = fixedPen;
            double cost = fixedRelCost;
            for (int a = 0; a < ix.length; a++) {
                worst = Math.max(worst, pen[ix[a]]);
                cost += scale * psi[a] * relPrice[ix[a]];
            }
            int totalK = ix.length + nFixed;
            double score = worst + wt.components() * (totalK - 1) + wt.cost() * cost + wt.distance() * dist * redPerDist;
            Cand w = bound.get();
            if (w != null && compareTuple(0, score, dist, totalK, w) > 0) {
                return null;
            }
            return new Cand(ix, psi, dist, 0, score, dist, totalK);
        }

        private void offer(Cand c) {
            if (heap.size() < settings.top()) {
                heap.add(c);
            } else if (KEY.compare(c, heap.peek()) < 0) {
                heap.poll();
                heap.add(c);
            } else {
                return;
            }
            if (heap.size() == settings.top()) {
                publish(heap.peek());
            }
        }
    }

    private static double crossNorm(double ax, double ay, double az, double bx, double by, double bz) {
        double cx = ay * bz - az * by;
        double cy = az * bx - ax * bz;
        double cz = ax * by - ay * bx;
        return Math.sqrt(cx * cx + cy * cy + cz * cz);
    }

    private void publish(Cand worst) {
        while (true) {
            Cand cur = bound.get();
            if (cur != null && KEY.compare(cur, worst) <= 0) {
                return;
            }
            if (bound.compareAndSet(cur, worst)) {
                return;
            }
        }
    }

    // ---- back to the user's world ------------------------------------------------------------------------

    private RankedBlend toRanked(Cand c) {
        List<BlendComponent> comps = new ArrayList<>(pool.fixed());
        double s = scale;
        double sum = pool.fixed().stream().mapToDouble(BlendComponent::fraction).sum();
        for (int a = 0; a < c.idx.length; a++) {
            double phi = s * c.psi[a];
            sum += phi;
            comps.add(new BlendComponent(order.get(c.idx[a]), phi));
        }
        // Normalise away rounding so the fractions sum to exactly 1 within the blend tolerance.
        if (!comps.isEmpty() && Math.abs(sum - 1.0) > 1e-12) {
            double fix = 1.0 - sum;
            BlendComponent last = comps.get(comps.size() - 1);
            comps.set(comps.size() - 1, new BlendComponent(last.solvent(), Math.max(0, Math.min(1, last.fraction() + fix))));
        }
        double d = 0;
        double p = 0;
        double h = 0;
        for (BlendComponent bc : comps) {
            d += bc.fraction() * bc.solvent().hansen().dD();
            p += bc.fraction() * bc.solvent().hansen().dP();
            h += bc.fraction() * bc.solvent().hansen().dH();
        }
        HansenParameters point = new HansenParameters(Math.max(0, d), Math.max(0, p), Math.max(0, h));
        double ra = target.ra(point);
        double red = ra / target.r0();
        double secondary = switch (settings.rankBy()) {
            case DESIRABILITY -> c.p1;
            case RED -> Double.NaN;
            case COMPONENTS -> comps.size();
            case HAZARD -> comps.stream().mapToDouble(bc -> bc.fraction() * HazardScore.of(bc.solvent())).sum();
            case COST -> comps.stream().mapToDouble(bc -> bc.fraction() * bc.solvent().pricePerLitre()).sum();
            case EVAPORATION -> comps.stream().mapToDouble(bc -> bc.fraction() * Evaporation.vapourPressureKpa(bc.solvent())).sum();
        };
        return new RankedBlend(comps, point, ra, red, red <= settings.redLimit() * (1 + 1e-9), settings.rankBy(), secondary);
    }

    /** The constraints this search ran under. */
    BlendConstraints constraints() {
        return constraints;
    }
}
