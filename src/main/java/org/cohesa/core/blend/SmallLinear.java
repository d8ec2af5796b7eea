package org.cohesa.core.blend;

/**
 * Gaussian elimination with partial pivoting for the tiny (at most 4×4) systems of the blend solvers,
 * written out because the hot path must not allocate Commons Math matrices millions of times.
 */
final class SmallLinear {

    private SmallLinear() {
    }

    /**
     * Solves a·x = r for the leading d×d block; returns null when a pivot falls below {@code tol} times the
     * largest diagonal entry (the system is singular for our purposes). Inputs are not modified.
     */
    static double[] solve(double[][] a, double[] r, int d, double tol) {
        double[][] m = new double[d][d + 1];
        double scale = 0;
        for (int i = 0; i < d; i++) {
            for (int j = 0; j < d; j++) {
                m[i][j] = a[i][j];
            }
            m[i][d] = r[i];
            scale = Math.max(scale, Math.abs(a[i][i]));
        }
        if (!(scale > 0)) {
            return null;
        }
        for (int col = 0; col < d; col++) {
            int piv = col;
            for (int i = col + 1; i < d; i++) {
                if (Math.abs(m[i][col]) > Math.abs(m[piv][col])) {
                    piv = i;
                }
            }
            if (Math.abs(m[piv][col]) <= tol * scale) {
                return null;
            }
            double[] tmp = m[piv];
            m[piv] = m[col];
            m[col] = tmp;
            for (int i = col + 1; i < d; i++) {
                double f = m[i][col] / m[col][col];
                for (int j = col; j <= d; j++) {
                    m[i][j] -= f * m[col][j];
                }
            }
        }
        double[] x = new double[d];
        for (int i = d - 1; i >= 0; i--) {
            double s = m[i][d];
            for (int j = i + 1; j < d; j++) {
                s -= m[i][j] * x[j];
            }
            x[i] = s / m[i][i];
        }
        return x;
    }
}
