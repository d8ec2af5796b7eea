package org.cohesa.core.target;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.stream.IntStream;

/**
 * The consensus sphere: the average of all spheres, weighted by how well each sorts the test results.
 *
 * <p>A sphere (c, R) is charged a misfit cost C = Σ wᵢ·(1 − yᵢ) over liquids inside it and Σ wᵢ·yᵢ over liquids
 * outside (for scores 0/1 this counts the misplaced liquids; a graded score 0.5 costs the same on either side).
 * Each sphere gets the weight e^(−β·C), i.e. each misplaced result is taken as a wrong result with odds
 * e^−β ≈ 1:150, and the reported sphere is the weighted mean of centre and radius over a grid of centres (R is
 * integrated exactly, since C is a step function of R). With clean data this is the centre of mass of the set of
 * spheres that sort every result correctly, the estimate with the smallest expected squared error when nothing
 * else is known about where the true sphere lies in that set (a posterior mean under a uniform prior: Gelman et al.,
 * <i>Bayesian Data Analysis</i>, 3rd ed., CRC Press, 2013, ch. 2). Fitting methods that return one extreme member
 * of that set — the smallest sphere, or the one with the widest margin — can sit at its edge. Distances are in the
 * Ra metric (δD doubled; Hansen 2007, ch. 1).
 */
final class Consensus {

    /** Weight exponent β per unit of misfit cost. */
    static final double BETA = 10.0;
    /** Radius range integrated over, MPa^½. */
    static final double R_MIN = 0.3;
    static final double R_MAX = 40.0;
    /** Most test results the packed sort below handles. */
    static final int MAX_RESULTS = 4096;
    private static final int INDEX_BITS = 12;
    private static final long INDEX_MASK = (1L << INDEX_BITS) - 1;

    /** Coarse-grid step (scaled units, i.e. MPa^½ in the Ra metric). */
    static final double COARSE_STEP = 1.5;
    /** Grid points per axis of the fine grid, at most. */
    static final int FINE_POINTS = 18;

    private Consensus() {
    }

    /** The profile over R of one centre. */
    static final class Profile {
        double minCost;
        /** ln ∫ e^(−β·C(R)) dR. */
        double logZ;
        /** E[R | centre]. */
        double meanR;
        /** Midpoint of the first R interval of least cost. */
        double bestR;
    }

    /** Scratch buffers for one thread. */
    static final class Work {
        final long[] keys;
        final Profile profile = new Profile();

        Work(int n) {
            keys = new long[n];
        }
    }

    /**
     * Misfit-cost profile of the centre (sx = 2δD, sy = δP, sz = δH).
     */
    static Profile profile(SphereFitter.Data d, double[] w, double sx, double sy, double sz, Work work) {
        int n = d.size();
        long[] keys = work.keys;
        double cost0 = 0;
        for (int i = 0; i < n; i++) {
            double dx = d.scaled[i][0] - sx;
            double dy = d.scaled[i][1] - sy;
            double dz = d.scaled[i][2] - sz;
            double ra = Math.sqrt(dx * dx + dy * dy + dz * dz);
            // non-negative doubles sort like their bit patterns; the low bits carry the row index
            keys[i] = (Double.doubleToRawLongBits(ra) & ~INDEX_MASK) | i;
            cost0 += w[i] * d.scores[i];
        }
        Arrays.sort(keys, 0, n);
        double minCost = Double.POSITIVE_INFINITY;
        double bestR = R_MIN;
        double cost = cost0;
        double prev = R_MIN;
        for (int k = 0; k <= n; k++) {
            double next = k < n ? Math.min(R_MAX, Double.longBitsToDouble(keys[k] & ~INDEX_MASK)) : R_MAX;
            if (next > prev) {
                if (cost < minCost - 1e-12) {
                    minCost = cost;
                    bestR = (prev + next) / 2;
                }
                prev = next;
            }
            if (k < n) {
                int i = (int) (keys[k] & INDEX_MASK);
                cost += w[i] * (1 - 2 * d.scores[i]);
            }
        }
        double z = 0;
        double m1 = 0;
        cost = cost0;
        prev = R_MIN;
        for (int k = 0; k <= n; k++) {
            double next = k < n ? Math.min(R_MAX, Double.longBitsToDouble(keys[k] & ~INDEX_MASK)) : R_MAX;
            if (next > prev) {
                double excess = cost - minCost;
                if (excess < 8) {
                    // beyond that the weight is below e^-40 of the best interval's and cannot matter
                    double e = Math.exp(-BETA * excess);
                    z += e * (next - prev);
                    m1 += e * (next * next - prev * prev) / 2;
                }
                prev = next;
            }
            if (k < n) {
                int i = (int) (keys[k] & INDEX_MASK);
                cost += w[i] * (1 - 2 * d.scores[i]);
            }
        }
        Profile p = work.profile;
        p.minCost = minCost;
        p.logZ = -BETA * minCost + Math.log(z);
        p.meanR = m1 / z;
        p.bestR = bestR;
        return p;
    }

    /** One grid cell with its weight. */
    record Cell(double sx, double sy, double sz, double logZ, double meanR, double minCost, double bestR) {
    }

    /** The coarse cells over the scaled bounding box of the dissolving liquids, padded by two steps. */
    static List<Cell> coarse(SphereFitter.Data d, double[] w) {
        double[] lo = {Double.MAX_VALUE, Double.MAX_VALUE, Double.MAX_VALUE};
        double[] hi = {-Double.MAX_VALUE, -Double.MAX_VALUE, -Double.MAX_VALUE};
        for (int i : d.goodIndices(w)) {
            for (int k = 0; k < 3; k++) {
                lo[k] = Math.min(lo[k], d.scaled[i][k]);
                hi[k] = Math.max(hi[k], d.scaled[i][k]);
            }
        }
        for (int k = 0; k < 3; k++) {
            lo[k] = Math.max(k == 0 ? 2 * LocalSearch.LOWER[0] : 0, lo[k] - 2 * COARSE_STEP);
            hi[k] += 2 * COARSE_STEP;
        }
        return grid(d, w, lo, hi, COARSE_STEP);
    }

    /**
     * Cells of a regular grid with spacing {@code step} over [lo, hi] (scaled units). Slabs of constant δD are
     * computed in parallel, each into its own slot, so the result (and its order) does not depend on the threads.
     */
    static List<Cell> grid(SphereFitter.Data d, double[] w, double[] lo, double[] hi, double step) {
        int nx = (int) Math.floor((hi[0] - lo[0]) / step) + 1;
        int ny = (int) Math.floor((hi[1] - lo[1]) / step) + 1;
        int nz = (int) Math.floor((hi[2] - lo[2]) / step) + 1;
        Cell[] cells = new Cell[nx * ny * nz];
        IntStream.range(0, nx).parallel().forEach(a -> {
            Work work = new Work(d.size());
            double sx = lo[0] + a * step;
            for (int b = 0; b < ny; b++) {
                double sy = lo[1] + b * step;
                for (int c = 0; c < nz; c++) {
                    double sz = lo[2] + c * step;
                    Profile p = profile(d, w, sx, sy, sz, work);
                    cells[(a * ny + b) * nz + c] = new Cell(sx, sy, sz, p.logZ, p.meanR, p.minCost, p.bestR);
                }
            }
        });
        return Arrays.asList(cells);
    }

    /**
     * Two refinements: a grid over the coarse cells that carry weight (within e^−12 of the best), then a finer one
     * over the cells of that grid within e^−8 of the best, each padded by one step of the grid before.
     */
    static List<Cell> fine(SphereFitter.Data d, double[] w, List<Cell> coarse) {
        List<Cell> first = refine(d, w, coarse, COARSE_STEP, 12);
        double firstStep = first.size() < 2 ? COARSE_STEP : stepOf(first);
        return refine(d, w, first, firstStep, 8);
    }

    private static double stepOf(List<Cell> cells) {
        // cells are generated with the z index fastest: neighbours 0 and 1 differ by one step in δH
        return Math.abs(cells.get(1).sz() - cells.get(0).sz());
    }

    private static List<Cell> refine(SphereFitter.Data d, double[] w, List<Cell> coarse, double coarseStep, double window) {
        double max = coarse.stream().mapToDouble(Cell::logZ).max().orElseThrow();
        double[] lo = {Double.MAX_VALUE, Double.MAX_VALUE, Double.MAX_VALUE};
        double[] hi = {-Double.MAX_VALUE, -Double.MAX_VALUE, -Double.MAX_VALUE};
        for (Cell c : coarse) {
            if (c.logZ() >= max - window) {
                double[] v = {c.sx(), c.sy(), c.sz()};
                for (int k = 0; k < 3; k++) {
                    lo[k] = Math.min(lo[k], v[k] - coarseStep);
                    hi[k] = Math.max(hi[k], v[k] + coarseStep);
                }
            }
        }
        lo[0] = Math.max(2 * LocalSearch.LOWER[0], lo[0]);
        lo[1] = Math.max(0, lo[1]);
        lo[2] = Math.max(0, lo[2]);
        double extent = Math.max(hi[0] - lo[0], Math.max(hi[1] - lo[1], hi[2] - lo[2]));
        double step = Math.max(0.05, extent / (FINE_POINTS - 1));
        return grid(d, w, lo, hi, step);
    }

    /** Weighted summary of grid cells: mean sphere and weighted percentiles. */
    record Summary(double[] mean, List<Cell> cells, double[] weights) {

        /** Weighted percentile of coordinate k (0 δD, 1 δP, 2 δH, 3 R0 by its conditional mean), q in [0, 1]. */
        double percentile(int k, double q) {
            int n = cells.size();
            Integer[] order = new Integer[n];
            double[] v = new double[n];
            for (int i = 0; i < n; i++) {
                order[i] = i;
                v[i] = value(cells.get(i), k);
            }
            Arrays.sort(order, (a, b) -> Double.compare(v[a], v[b]));
            double total = Arrays.stream(weights).sum();
            double acc = 0;
            for (Integer i : order) {
                acc += weights[i];
                if (acc >= q * total) {
                    return v[i];
                }
            }
            return v[order[n - 1]];
        }

        static double value(Cell c, int k) {
            return switch (k) {
                case 0 -> c.sx() / 2;
                case 1 -> c.sy();
                case 2 -> c.sz();
                default -> c.meanR();
            };
        }
    }

    static Summary summarise(List<Cell> cells) {
        double max = cells.stream().mapToDouble(Cell::logZ).max().orElseThrow();
        double[] weights = new double[cells.size()];
        double[] mean = new double[4];
        double total = 0;
        for (int i = 0; i < cells.size(); i++) {
            Cell c = cells.get(i);
            double wt = Math.exp(c.logZ() - max);
            weights[i] = wt;
            total += wt;
            mean[0] += wt * c.sx() / 2;
            mean[1] += wt * c.sy();
            mean[2] += wt * c.sz();
            mean[3] += wt * c.meanR();
        }
        for (int k = 0; k < 4; k++) {
            mean[k] /= total;
        }
        return new Summary(mean, cells, weights);
    }
}
