package org.cohesa.core.target;

import org.apache.commons.math3.analysis.MultivariateFunction;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.apache.commons.math3.optim.InitialGuess;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.PointValuePair;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.nonlinear.scalar.ObjectiveFunction;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.NelderMeadSimplex;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.SimplexOptimizer;

/**
 * Local refinement of a sphere {δD, δP, δH, R0} with the Nelder–Mead simplex method (Nelder, J. A., Mead, R.,
 * "A simplex method for function minimization", <i>Comput. J.</i> 7 (1965) 308) as implemented in Commons Math 3.
 * Points outside the physical bounds (negative parameters, R0 below 0.3) get a steep penalty, so the search
 * stays inside without clamping the objective itself.
 */
final class LocalSearch {

    /** Lower bounds of δD, δP, δH, R0, MPa^½. */
    static final double[] LOWER = {5.0, 0.0, 0.0, 0.3};
    /** Upper bounds of δD, δP, δH, R0, MPa^½: beyond every liquid's and every published polymer's values. */
    static final double[] UPPER = {30.0, 40.0, 50.0, 40.0};

    private static final int MAX_EVALUATIONS = 3000;
    /** First simplex steps, MPa^½: δD counts double in Ra, so it gets half the step. */
    private static final double[] STEPS = {0.3, 0.6, 0.6, 0.6};
    private static final double PENALTY = 1e6;

    private LocalSearch() {
    }

    /** Minimises {@code f} from {@code start} (clamped into the bounds); returns the best point found. */
    static PointValuePair minimise(MultivariateFunction f, double[] start) {
        return minimise(f, start, 1.0);
    }

    /**
     * As {@link #minimise(MultivariateFunction, double[])} with the first simplex scaled by {@code scale}: a small
     * simplex suits a start that is already close (bootstrap refits start from the full fit).
     */
    static PointValuePair minimise(MultivariateFunction f, double[] start, double scale) {
        double[] x0 = clamp(start);
        MultivariateFunction bounded = p -> {
            double out = 0;
            for (int i = 0; i < p.length; i++) {
                out += Math.max(0, LOWER[i] - p[i]) + Math.max(0, p[i] - UPPER[i]);
            }
            return out > 0 ? PENALTY * (1 + out) : f.value(p);
        };
        SimplexOptimizer opt = new SimplexOptimizer(1e-5, 1e-4);
        try {
            return opt.optimize(new MaxEval(MAX_EVALUATIONS), new ObjectiveFunction(bounded), GoalType.MINIMIZE,
                    new InitialGuess(x0), new NelderMeadSimplex(scaled(scale)));
        } catch (TooManyEvaluationsException e) {
            // the budget is generous; should it run out, the start itself stands (the global stage has other starts)
            return new PointValuePair(x0, f.value(x0));
        }
    }

    private static double[] scaled(double scale) {
        double[] s = STEPS.clone();
        for (int i = 0; i < s.length; i++) {
            s[i] *= scale;
        }
        return s;
    }

    static double[] clamp(double[] p) {
        double[] out = new double[p.length];
        for (int i = 0; i < p.length; i++) {
            out[i] = Math.max(LOWER[i], Math.min(UPPER[i], p[i]));
        }
        return out;
    }
}
