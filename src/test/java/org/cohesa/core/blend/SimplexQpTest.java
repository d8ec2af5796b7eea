package org.cohesa.core.blend;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.apache.commons.math3.optim.MaxIter;
import org.apache.commons.math3.optim.PointValuePair;
import org.apache.commons.math3.optim.linear.LinearConstraint;
import org.apache.commons.math3.optim.linear.LinearConstraintSet;
import org.apache.commons.math3.optim.linear.LinearObjectiveFunction;
import org.apache.commons.math3.optim.linear.Relationship;
import org.apache.commons.math3.optim.linear.SimplexSolver;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.junit.jupiter.api.Test;

/**
 * The exact per-subset optimum against independent references: a brute-force grid that zooms in on its best
 * point (the objective is convex, so the zoom converges to the global optimum) and Commons Math's simplex LP
 * solver for the linear part.
 */
class SimplexQpTest {

    /** Min |Σψp − t|² over the bounded simplex by a zooming grid (independent of the face enumeration). */
    static double gridClosest(double[][] p, double[] t, double[] lo, double[] hi, double[] g, double gMax) {
        return zoom(p, t, lo, hi, g, gMax, null, Double.NaN)[0];
    }

    /** Returns {best value, distance²}; value = distance² when c is null, else c·ψ under |m − t| ≤ ρ. */
    static double[] zoom(double[][] p, double[] t, double[] lo, double[] hi, double[] g, double gMax, double[] c, double rho) {
        int k = p.length;
        int dims = k - 1;
        double[] centre = new double[Math.max(dims, 1)];
        for (int a = 0; a < dims; a++) {
            centre[a] = (lo[a] + hi[a]) / 2;
        }
        double half = 0.5;
        double bestVal = Double.POSITIVE_INFINITY;
        double bestD2 = Double.NaN;
        int steps = dims == 3 ? 16 : 40;
        for (int level = 0; level < 70; level++) {
            double[] bestHere = null;
            int[] counter = new int[Math.max(dims, 1)];
            int total = 1;
            for (int a = 0; a < dims; a++) {
                total *= steps + 1;
            }
            for (int cell = 0; cell < total; cell++) {
                int rem = cell;
                double[] psi = new double[k];
                double sum = 0;
                for (int a = 0; a < dims; a++) {
                    counter[a] = rem % (steps + 1);
                    rem /= steps + 1;
                    psi[a] = centre[a] - half + 2 * half * counter[a] / steps;
                    sum += psi[a];
                }
                psi[k - 1] = 1 - sum;
                boolean ok = true;
                for (int a = 0; a < k && ok; a++) {
                    ok = psi[a] >= lo[a] - 1e-15 && psi[a] <= hi[a] + 1e-15;
                }
                if (ok && g != null) {
                    double cost = 0;
                    for (int a = 0; a < k; a++) {
                        cost += g[a] * psi[a];
                    }
                    ok = cost <= gMax + 1e-15;
                }
                if (!ok) {
                    continue;
                }
                double d2 = 0;
                for (int ax = 0; ax < 3; ax++) {
                    double v = -t[ax];
                    for (int a = 0; a < k; a++) {
                        v += psi[a] * p[a][ax];
                    }
                    d2 += v * v;
                }
                double val = d2;
                if (c != null) {
                    if (d2 > rho * rho) {
                        continue;
                    }
                    val = 0;
                    for (int a = 0; a < k; a++) {
                        val += c[a] * psi[a];
                    }
                }
                if (val < bestVal) {
                    bestVal = val;
                    bestD2 = d2;
                    bestHere = psi;
                }
            }
            if (bestHere != null) {
                System.arraycopy(bestHere, 0, centre, 0, dims);
            }
            half *= 0.75;
        }
        return new double[] {bestVal, bestD2};
    }

    private static double[][] randomPoints(SplittableRandom r, int k) {
        double[][] p = new double[k][];
        for (int a = 0; a < k; a++) {
            p[a] = new double[] {2 * (14 + 7 * r.nextDouble()), 20 * r.nextDouble(), 25 * r.nextDouble()};
        }
        return p;
    }

    @Test
    void closestAgreesWithZoomingGridOnRandomCases() {
        SplittableRandom r = new SplittableRandom(20261201L);
        for (int trial = 0; trial < 60; trial++) {
            int k = 2 + trial % 3;
            double[][] p = randomPoints(r, k);
            double[] t = {2 * (14 + 7 * r.nextDouble()), 20 * r.nextDouble(), 25 * r.nextDouble()};
            double[] lo = new double[k];
            double[] hi = new double[k];
            for (int a = 0; a < k; a++) {
                lo[a] = trial % 2 == 0 ? 0.05 : 0.1 * r.nextDouble();
                hi[a] = trial % 4 < 2 ? 1.0 : 0.5 + 0.5 * r.nextDouble();
            }
            SimplexQp.Solution s = SimplexQp.closest(p, t, lo, hi, null, Double.NaN);
            double ref = gridClosest(p, t, lo, hi, null, Double.NaN);
            assertNotNull(s, "trial " + trial);
            // Distance agrees to 1e-6 MPa^½ and the exact one is never worse than a feasible grid point.
            assertEquals(Math.sqrt(ref), Math.sqrt(s.distanceSquared()), 1e-6, "trial " + trial);
            assertTrue(s.distanceSquared() <= ref + 1e-12, "trial " + trial);
            assertFeasible(s.fractions(), lo, hi);
            assertKkt(p, t, lo, hi, null, Double.NaN, null, Double.NaN, s.fractions(), "trial " + trial);
        }
    }

    @Test
    void closestWithCostCapAgreesWithZoomingGrid() {
        SplittableRandom r = new SplittableRandom(7);
        for (int trial = 0; trial < 30; trial++) {
            int k = 2 + trial % 3;
            double[][] p = randomPoints(r, k);
            double[] t = {36, 9, 8};
            double[] lo = new double[k];
            double[] hi = new double[k];
            double[] g = new double[k];
            for (int a = 0; a < k; a++) {
                lo[a] = 0.05;
                hi[a] = 1;
                g[a] = 1 + 9 * r.nextDouble();
            }
            double cap = 2 + 6 * r.nextDouble();
            SimplexQp.Solution s = SimplexQp.closest(p, t, lo, hi, g, cap);
            double ref = gridClosest(p, t, lo, hi, g, cap);
            if (ref == Double.POSITIVE_INFINITY) {
                assertNull(s, "trial " + trial + ": the grid found no composition under the cap");
                continue;
            }
            assertNotNull(s, "trial " + trial);
            // The grid can stall in the thin slice the cap leaves, so it only brackets the value; the KKT
            // certificate (Commons Math least squares for the multipliers) proves optimality to 1e-6.
            assertTrue(s.distanceSquared() <= ref + 1e-12, "trial " + trial);
            assertEquals(Math.sqrt(ref), Math.sqrt(s.distanceSquared()), 1e-3, "trial " + trial);
            assertKkt(p, t, lo, hi, g, cap, null, Double.NaN, s.fractions(), "trial " + trial);
            double cost = 0;
            for (int a = 0; a < k; a++) {
                cost += g[a] * s.fractions()[a];
            }
            assertTrue(cost <= cap + 1e-9, "cost cap kept");
        }
    }

    @Test
    void bestInsideIsNeverBeatenByAFeasibleGridPoint() {
        SplittableRandom r = new SplittableRandom(99);
        int checked = 0;
        for (int trial = 0; trial < 60; trial++) {
            int k = 2 + trial % 3;
            double[][] p = randomPoints(r, k);
            double[] t = {36, 9, 8};
            double[] lo = new double[k];
            double[] hi = new double[k];
            double[] c = new double[k];
            for (int a = 0; a < k; a++) {
                lo[a] = 0.05;
                hi[a] = 1;
                c[a] = 10 * r.nextDouble();
            }
            double rho = 6 + 6 * r.nextDouble();
            SimplexQp.Solution s = SimplexQp.bestInside(p, t, lo, hi, null, Double.NaN, c, rho);
            double[] ref = zoom(p, t, lo, hi, null, Double.NaN, c, rho);
            if (ref[0] == Double.POSITIVE_INFINITY) {
                SimplexQp.Solution closest = SimplexQp.closest(p, t, lo, hi, null, Double.NaN);
                if (s == null) {
                    assertTrue(closest.distanceSquared() > rho * rho * (1 - 1e-9), "no grid point inside and none exact");
                }
                continue;
            }
            assertNotNull(s, "trial " + trial);
            checked++;
            assertTrue(s.objective() <= ref[0] + 1e-9, "exact optimum " + s.objective() + " vs grid " + ref[0]);
            assertEquals(ref[0], s.objective(), 1e-4, "trial " + trial);
            assertKkt(p, t, lo, hi, null, Double.NaN, c, rho, s.fractions(), "trial " + trial);
            assertTrue(s.distanceSquared() <= rho * rho * (1 + 1e-9), "stays inside the ball");
            assertFeasible(s.fractions(), lo, hi);
        }
        assertTrue(checked > 20, "enough cases reached the ball: " + checked);
    }

    @Test
    void bestInsideWithALargeBallIsTheLinearProgrammeOptimumOfCommonsMath() {
        // With a ball containing the whole polytope the problem is a pure LP: Commons Math's SimplexSolver solves it.
        SplittableRandom r = new SplittableRandom(3);
        for (int trial = 0; trial < 20; trial++) {
            int k = 2 + trial % 3;
            double[][] p = randomPoints(r, k);
            double[] lo = new double[k];
            double[] hi = new double[k];
            double[] c = new double[k];
            java.util.List<LinearConstraint> cons = new java.util.ArrayList<>();
            double[] ones = new double[k];
            java.util.Arrays.fill(ones, 1);
            cons.add(new LinearConstraint(ones, Relationship.EQ, 1));
            for (int a = 0; a < k; a++) {
                lo[a] = 0.1 * r.nextDouble();
                hi[a] = 0.6 + 0.4 * r.nextDouble();
                c[a] = 10 * r.nextDouble();
                double[] e = new double[k];
                e[a] = 1;
                cons.add(new LinearConstraint(e, Relationship.GEQ, lo[a]));
                cons.add(new LinearConstraint(e.clone(), Relationship.LEQ, hi[a]));
            }
            PointValuePair lp = new SimplexSolver().optimize(new MaxIter(1000), new LinearObjectiveFunction(c, 0),
                    new LinearConstraintSet(cons), GoalType.MINIMIZE);
            SimplexQp.Solution s = SimplexQp.bestInside(p, new double[] {36, 9, 8}, lo, hi, null, Double.NaN, c, 1e4);
            assertNotNull(s);
            assertEquals(lp.getValue(), s.objective(), 1e-9, "trial " + trial);
        }
    }

    @Test
    void targetInsideTheBoundedTetrahedronGivesZeroDistanceAndItsBarycentricFractions() {
        // Worked by hand: the target is the mixture 0.1/0.2/0.3/0.4 of four corners of a box.
        double[][] p = {{30, 0, 0}, {40, 0, 0}, {30, 10, 0}, {30, 0, 10}};
        double[] t = {30 + 0.2 * 10, 0.3 * 10, 0.4 * 10};
        double[] lo = {0.05, 0.05, 0.05, 0.05};
        double[] hi = {1, 1, 1, 1};
        SimplexQp.Solution s = SimplexQp.closest(p, t, lo, hi, null, Double.NaN);
        assertEquals(0, s.distanceSquared(), 0);
        assertEquals(0.1, s.fractions()[0], 1e-12);
        assertEquals(0.2, s.fractions()[1], 1e-12);
        assertEquals(0.3, s.fractions()[2], 1e-12);
        assertEquals(0.4, s.fractions()[3], 1e-12);
    }

    @Test
    void emptyPolytopeHasNoSolution() {
        double[][] p = {{30, 0, 0}, {40, 0, 0}};
        assertNull(SimplexQp.closest(p, new double[] {35, 0, 0}, new double[] {0.6, 0.6}, new double[] {1, 1}, null, Double.NaN));
    }

    /**
     * Karush–Kuhn–Tucker certificate (Nocedal &amp; Wright 2006, theorem 12.1; sufficient for convex problems):
     * the objective's gradient is a combination of the active constraints' gradients with multipliers of the
     * right sign. Multipliers come from a least-squares fit (Commons Math QR); the residual must vanish.
     */
    static void assertKkt(double[][] p, double[] t, double[] lo, double[] hi, double[] g, double gMax, double[] c, double rho,
            double[] psi, String what) {
        int k = p.length;
        double[] r = new double[3];
        for (int ax = 0; ax < 3; ax++) {
            r[ax] = -t[ax];
            for (int a = 0; a < k; a++) {
                r[ax] += psi[a] * p[a][ax];
            }
        }
        double[] ballGrad = new double[k];
        for (int a = 0; a < k; a++) {
            ballGrad[a] = 2 * (r[0] * p[a][0] + r[1] * p[a][1] + r[2] * p[a][2]);
        }
        double[] grad = c != null ? c.clone() : ballGrad.clone();
        java.util.List<double[]> cols = new java.util.ArrayList<>();
        java.util.List<Integer> sign = new java.util.ArrayList<>(); // +1: multiplier must be ≥ 0; 0: free
        double[] ones = new double[k];
        java.util.Arrays.fill(ones, 1);
        cols.add(ones);
        sign.add(0);
        double tol = 1e-8;
        for (int a = 0; a < k; a++) {
            if (psi[a] <= lo[a] + tol) {
                double[] e = new double[k];
                e[a] = -1; // −ψ_a ≤ −lo
                cols.add(e);
                sign.add(1);
            } else if (psi[a] >= hi[a] - tol) {
                double[] e = new double[k];
                e[a] = 1;
                cols.add(e);
                sign.add(1);
            }
        }
        if (g != null) {
            double cost = 0;
            for (int a = 0; a < k; a++) {
                cost += g[a] * psi[a];
            }
            if (cost >= gMax - 1e-8 * Math.max(1, gMax)) {
                cols.add(g.clone());
                sign.add(1);
            }
        }
        if (c != null) {
            double d2 = r[0] * r[0] + r[1] * r[1] + r[2] * r[2];
            if (d2 >= rho * rho * (1 - 1e-8)) {
                cols.add(ballGrad);
                sign.add(1);
            }
        }
        // grad + Σ μ_j col_j = 0  →  least squares for μ.
        org.apache.commons.math3.linear.RealMatrix a = new org.apache.commons.math3.linear.Array2DRowRealMatrix(k, cols.size());
        for (int j = 0; j < cols.size(); j++) {
            for (int i = 0; i < k; i++) {
                a.setEntry(i, j, cols.get(j)[i]);
            }
        }
        org.apache.commons.math3.linear.RealVector rhs = new org.apache.commons.math3.linear.ArrayRealVector(grad).mapMultiply(-1);
        org.apache.commons.math3.linear.RealVector mu = new org.apache.commons.math3.linear.QRDecomposition(a, 1e-14).getSolver().solve(rhs);
        double resid = a.operate(mu).subtract(rhs).getNorm();
        double scale = Math.max(1, new org.apache.commons.math3.linear.ArrayRealVector(grad).getNorm());
        assertTrue(resid <= 1e-6 * scale, what + ": stationarity residual " + resid);
        for (int j = 0; j < cols.size(); j++) {
            if (sign.get(j) == 1) {
                assertTrue(mu.getEntry(j) >= -1e-6 * scale, what + ": multiplier " + j + " = " + mu.getEntry(j));
            }
        }
    }

    private static void assertFeasible(double[] psi, double[] lo, double[] hi) {
        double sum = 0;
        for (int a = 0; a < psi.length; a++) {
            assertTrue(psi[a] >= lo[a] - 1e-9 && psi[a] <= hi[a] + 1e-9, "fraction " + psi[a] + " within bounds");
            sum += psi[a];
        }
        assertEquals(1.0, sum, 1e-9);
    }
}
