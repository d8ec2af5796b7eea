package org.cohesa.core.blend;

/**
 * Exact solutions of the two small convex problems behind every blend suggestion, for 1 to 4 components.
 *
 * <p>The blend point is m(ψ) = Σ ψᵢ pᵢ (volume-fraction mixing rule, Hansen 2007, ch. 1) with the
 * component points pᵢ given in Hansen-scaled coordinates (2δD, δP, δH), so that the Euclidean distance
 * |m − t| is the Hansen distance Ra (MPa^½). The feasible compositions form the polytope
 * Ψ = {Σψᵢ = 1, loᵢ ≤ ψᵢ ≤ hiᵢ, optionally g·ψ ≤ G} (the optional row is the cost cap).
 * <ul>
 *   <li>{@link #closest}: min |m(ψ) − t|² over Ψ (a convex quadratic programme);</li>
 *   <li>{@link #bestInside}: min c·ψ over Ψ ∩ {|m(ψ) − t| ≤ ρ} (a linear objective over a polytope cut by a ball).</li>
 * </ul>
 * Both are solved exactly by enumerating the faces of Ψ (each variable free, at its lower or at its
 * upper bound; the cost row active or not). On a face the free variables live in an affine subspace; there
 * the first problem is an unconstrained least-squares problem (normal equations) and the second has the
 * closed form z* = z_c − √((ρ² − q_min)/(wᵀH⁻¹w))·H⁻¹w (minimum of a linear function over an ellipsoid). A
 * convex problem attains its minimum in the relative interior of some face, where it equals the face's own
 * unconstrained optimum; so the best feasible face optimum is the global optimum (the classical active-set
 * argument: Nocedal, J., Wright, S. J., <i>Numerical Optimization</i>, 2nd ed., Springer 2006, ch. 16). A face
 * whose normal matrix is singular is skipped: its optimum set is then an unbounded affine set that also meets
 * the face's boundary, a lower face already enumerated. With k ≤ 4 there are at most 3⁴·2 = 162 faces.
 */
public final class SimplexQp {

    /** Distances below this (MPa^½) count as zero: the target point itself is reachable. */
    public static final double ZERO_DISTANCE = 1e-9;

    private static final double FEASIBLE_TOL = 1e-11;
    private static final double SINGULAR_TOL = 1e-12;

    private SimplexQp() {
    }

    /** A composition and its squared distance to the target; {@code objective} is c·ψ for {@link #bestInside}. */
    public record Solution(double[] fractions, double distanceSquared, double objective) {
    }

    /**
     * Closest blend point to the target.
     *
     * @param p      component points, p[i] = {2δD, δP, δH}
     * @param t      target point in the same coordinates
     * @param lo     lower bound of each fraction
     * @param hi     upper bound of each fraction
     * @param g      cost row (price of each component) or null for none
     * @param gMax   cost cap G for g·ψ ≤ G (ignored when g is null)
     * @return the optimum, or null when Ψ is empty
     */
    public static Solution closest(double[][] p, double[] t, double[] lo, double[] hi, double[] g, double gMax) {
        return solve(p, t, lo, hi, g, gMax, null, Double.NaN);
    }

    /**
     * Cheapest composition (by the linear objective c) whose blend point lies within ρ of the target.
     * Ties on the objective (within 1e-12 relative) go to the composition closer to the target.
     *
     * @return the optimum, or null when no feasible composition reaches the ball
     */
    public static Solution bestInside(double[][] p, double[] t, double[] lo, double[] hi, double[] g, double gMax,
            double[] c, double rho) {
        if (c == null) {
            throw new IllegalArgumentException("bestInside needs an objective row");
        }
        return solve(p, t, lo, hi, g, gMax, c, rho);
    }

    private static Solution solve(double[][] p, double[] t, double[] lo, double[] hi, double[] g, double gMax,
            double[] c, double rho) {
        int k = p.length;
        if (k < 1 || k > 4 || lo.length != k || hi.length != k) {
            throw new IllegalArgumentException("1 to 4 components with one bound pair each, got " + k);
        }
        int faces = 1;
        for (int i = 0; i < k; i++) {
            faces *= 3;
        }
        int costStates = g == null ? 1 : 2;
        Face face = new Face(k);
        Solution best = null;
        for (int cs = 0; cs < costStates; cs++) {
            for (int code = 0; code < faces; code++) {
                Solution s = face.evaluate(p, t, lo, hi, g, gMax, code, cs == 1, c, rho);
                if (s != null && better(s, best, c != null)) {
                    best = s;
                }
            }
        }
        return best;
    }

    private static boolean better(Solution s, Solution best, boolean byObjective) {
        if (best == null) {
            return true;
        }
        if (!byObjective) {
            return s.distanceSquared() < best.distanceSquared();
        }
        double tol = 1e-12 * Math.max(1.0, Math.abs(best.objective()));
        if (s.objective() < best.objective() - tol) {
            return true;
        }
        return s.objective() <= best.objective() + tol && s.distanceSquared() < best.distanceSquared();
    }

    /** Scratch space for one face: variables' states, affine parametrisation, normal matrix. */
    private static final class Face {
        final int k;
        final int[] state;
        final int[] free;
        final double[] y0;
        final double[][] nBasis;
        final double[][] b;
        final double[][] h;
        final double[] rhs;
        final double[] z;
        final double[] psi;

        Face(int k) {
            this.k = k;
            state = new int[k];
            free = new int[k];
            y0 = new double[k];
            nBasis = new double[k][k];
            b = new double[3][k];
            h = new double[k][k];
            rhs = new double[k];
            z = new double[k];
            psi = new double[k];
        }

        Solution evaluate(double[][] p, double[] t, double[] lo, double[] hi, double[] g, double gMax, int code,
                boolean costActive, double[] c, double rho) {
            int m = 0;
            double fixedSum = 0;
            double fixedCost = 0;
            int cc = code;
            for (int i = 0; i < k; i++) {
                state[i] = cc % 3;
                cc /= 3;
                if (state[i] == 0) {
                    free[m++] = i;
                } else {
                    psi[i] = state[i] == 1 ? lo[i] : hi[i];
                    if (state[i] == 2 && hi[i] == lo[i]) {
                        return null; // same point as the lower-bound face
                    }
                    fixedSum += psi[i];
                    if (g != null) {
                        fixedCost += g[i] * psi[i];
                    }
                }
            }
            int rows = costActive ? 2 : 1;
            if (m < rows) {
                return null;
            }
            // Equality rows on the free variables: Σy = 1 − fixedSum; optionally Σ g y = G − fixedCost.
            if (!affine(rows, m, 1.0 - fixedSum, g, gMax - fixedCost)) {
                return null;
            }
            int d = m - rows;
            double[] c0 = new double[3];
            for (int a = 0; a < 3; a++) {
                double v = -t[a];
                for (int i = 0; i < k; i++) {
                    if (state[i] != 0) {
                        v += psi[i] * p[i][a];
                    }
                }
                for (int f = 0; f < m; f++) {
                    v += y0[f] * p[free[f]][a];
                }
                c0[a] = v;
                for (int col = 0; col < d; col++) {
                    double s = 0;
                    for (int f = 0; f < m; f++) {
                        s += p[free[f]][a] * nBasis[f][col];
                    }
                    b[a][col] = s;
                }
            }
            for (int col = 0; col < d; col++) {
                z[col] = 0;
            }
            double objConst = 0;
            double[] w = new double[d];
            if (c != null) {
                for (int i = 0; i < k; i++) {
                    if (state[i] != 0) {
                        objConst += c[i] * psi[i];
                    }
                }
                for (int f = 0; f < m; f++) {
                    objConst += c[free[f]] * y0[f];
                }
                for (int col = 0; col < d; col++) {
                    double s = 0;
                    for (int f = 0; f < m; f++) {
                        s += c[free[f]] * nBasis[f][col];
                    }
                    w[col] = s;
                }
            }
            if (d > 0) {
                for (int r = 0; r < d; r++) {
                    for (int s = 0; s < d; s++) {
                        h[r][s] = b[0][r] * b[0][s] + b[1][r] * b[1][s] + b[2][r] * b[2][s];
                    }
                    rhs[r] = -(b[0][r] * c0[0] + b[1][r] * c0[1] + b[2][r] * c0[2]);
                }
                double[] zc = SmallLinear.solve(h, rhs, d, SINGULAR_TOL);
                if (zc == null) {
                    return null;
                }
                System.arraycopy(zc, 0, z, 0, d);
                if (c != null) {
                    double qMin = residualSquared(c0, d);
                    double rho2 = rho * rho;
                    if (qMin > rho2) {
                        return null;
                    }
                    double wNorm = 0;
                    for (double x : w) {
                        wNorm += x * x;
                    }
                    double objScale = 0;
                    for (int f = 0; f < m; f++) {
                        objScale = Math.max(objScale, Math.abs(c[free[f]]));
                    }
                    if (wNorm > 1e-24 * Math.max(1.0, objScale * objScale)) {
                        double[] hw = SmallLinear.solve(h, w, d, SINGULAR_TOL);
                        if (hw == null) {
                            return null;
                        }
                        double whw = 0;
                        for (int r = 0; r < d; r++) {
                            whw += w[r] * hw[r];
                        }
                        if (!(whw > 0)) {
                            return null;
                        }
                        double step = Math.sqrt(Math.max(0, rho2 - qMin) / whw);
                        for (int r = 0; r < d; r++) {
                            z[r] -= step * hw[r];
                        }
                    }
                }
            }
            // Free variables from z; feasibility on this face.
            for (int f = 0; f < m; f++) {
                double v = y0[f];
                for (int col = 0; col < d; col++) {
                    v += nBasis[f][col] * z[col];
                }
                int i = free[f];
                if (v < lo[i] - FEASIBLE_TOL || v > hi[i] + FEASIBLE_TOL) {
                    return null;
                }
                psi[i] = Math.min(hi[i], Math.max(lo[i], v));
            }
            if (g != null && !costActive) {
                double cost = 0;
                for (int i = 0; i < k; i++) {
                    cost += g[i] * psi[i];
                }
                if (cost > gMax + FEASIBLE_TOL * Math.max(1.0, Math.abs(gMax))) {
                    return null;
                }
            }
            double dist2 = residualSquared(c0, d);
            if (c != null && dist2 > rho * rho * (1 + 1e-9) + 1e-18) {
                return null;
            }
            if (dist2 < ZERO_DISTANCE * ZERO_DISTANCE) {
                dist2 = 0;
            }
            double obj = 0;
            if (c != null) {
                for (int i = 0; i < k; i++) {
                    obj += c[i] * psi[i];
                }
            }
            return new Solution(psi.clone(), dist2, obj);
        }

        private double residualSquared(double[] c0, int d) {
            double s = 0;
            for (int a = 0; a < 3; a++) {
                double v = c0[a];
                for (int col = 0; col < d; col++) {
                    v += b[a][col] * z[col];
                }
                s += v * v;
            }
            return s;
        }

        /**
         * Particular solution y0 and null-space basis N of the equality rows on the m free variables.
         * Row 1: all ones (sum); row 2 (optional): the cost coefficients. Returns false when inconsistent.
         */
        private boolean affine(int rows, int m, double sumRhs, double[] g, double costRhs) {
            if (rows == 1) {
                // y0 = equal shares; N columns e_j − e_last (independent, spanning {Σ = 0}).
                for (int f = 0; f < m; f++) {
                    y0[f] = sumRhs / m;
                    for (int col = 0; col < m - 1; col++) {
                        nBasis[f][col] = (f == col ? 1.0 : 0.0) - (f == m - 1 ? 1.0 : 0.0);
                    }
                }
                return true;
            }
            // Two rows: [1 … 1; g_1 … g_m]. Pick the pair of columns with the largest 2×2 determinant as pivots.
            int pa = -1;
            int pb = -1;
            double bestDet = 0;
            double gScale = 0;
            for (int f = 0; f < m; f++) {
                gScale = Math.max(gScale, Math.abs(g[free[f]]));
            }
            for (int a = 0; a < m; a++) {
                for (int bb = a + 1; bb < m; bb++) {
                    double det = g[free[bb]] - g[free[a]];
                    if (Math.abs(det) > Math.abs(bestDet)) {
                        bestDet = det;
                        pa = a;
                        pb = bb;
                    }
                }
            }
            if (pa < 0 || Math.abs(bestDet) <= 1e-12 * Math.max(1.0, gScale)) {
                return false; // equal prices on the free variables: the cost row is then fixed by the sum row
            }
            // Solve for pivots (ya, yb) given the other free variables s: ya + yb = S − Σs, ga ya + gb yb = C − Σ g s.
            double ga = g[free[pa]];
            double gb = g[free[pb]];
            for (int f = 0; f < m; f++) {
                y0[f] = 0;
            }
            y0[pa] = (gb * sumRhs - costRhs) / (gb - ga);
            y0[pb] = (costRhs - ga * sumRhs) / (gb - ga);
            int col = 0;
            for (int f = 0; f < m; f++) {
                if (f == pa || f == pb) {
                    continue;
                }
                double gf = g[free[f]];
                for (int r = 0; r < m; r++) {
                    nBasis[r][col] = 0;
                }
                nBasis[f][col] = 1;
                // pivots absorb: a + b = −1, ga a + gb b = −gf
                nBasis[pa][col] = (gf - gb) / (gb - ga);
                nBasis[pb][col] = (ga - gf) / (gb - ga);
                col++;
            }
            return true;
        }
    }
}
