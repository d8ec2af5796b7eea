package org.cohesa.core.drying;

import java.util.List;
import org.apache.commons.math3.analysis.MultivariateFunction;
import org.apache.commons.math3.optim.InitialGuess;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.PointValuePair;
import org.apache.commons.math3.optim.SimpleBounds;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.nonlinear.scalar.ObjectiveFunction;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.BOBYQAOptimizer;
import org.cohesa.core.solvent.Solvent;

/**
 * Fits the two constants of {@link EvaporationRates} (cooling β, molar-mass exponent b) to published relative
 * evaporation rates of pure liquids: least squares in ln(predicted/published), BOBYQA within β ∈ [0, 10⁻³] m³·K/J
 * and b ∈ [0, ½] (Powell, M. J. D., "The BOBYQA algorithm for bound constrained optimization without derivatives",
 * Cambridge report NA2009/06; Commons Math implementation).
 */
public final class EvaporationCalibration {

    /** A published relative evaporation rate (n-butyl acetate = 1) of a pure liquid. */
    public record MeasuredRate(Solvent solvent, double relativeRate) {
        public MeasuredRate {
            if (!(relativeRate > 0)) {
                throw new IllegalArgumentException("a relative evaporation rate must be positive: " + relativeRate);
            }
        }
    }

    /** The fitted constants and the root-mean-square ln error on the fitted solvents. */
    public record Fit(EvaporationRates.Calibration calibration, double rmsLnError, int solvents) {
    }

    private static final double BETA_SCALE = 1e-4;

    private EvaporationCalibration() {
    }

    public static Fit fit(List<MeasuredRate> data, double kelvin) {
        if (data.size() < 3) {
            throw new IllegalArgumentException("need at least three measured rates to fit two constants");
        }
        MultivariateFunction sse = p -> {
            EvaporationRates.Calibration cal = new EvaporationRates.Calibration(p[0] * BETA_SCALE, p[1]);
            double s = 0;
            for (MeasuredRate m : data) {
                double e = Math.log(predicted(m.solvent(), kelvin, cal) / m.relativeRate());
                s += e * e;
            }
            return s;
        };
        PointValuePair best = new BOBYQAOptimizer(5, 0.5, 1e-7).optimize(new MaxEval(5000), new ObjectiveFunction(sse), GoalType.MINIMIZE,
                new InitialGuess(new double[] {1.0, 1.0 / 3}), new SimpleBounds(new double[] {0, 0}, new double[] {10, 0.5}));
        double[] p = best.getPoint();
        return new Fit(new EvaporationRates.Calibration(p[0] * BETA_SCALE, p[1]), Math.sqrt(best.getValue() / data.size()), data.size());
    }

    /** Predicted relative rate of a pure liquid with a given calibration. */
    public static double predicted(Solvent s, double kelvin, EvaporationRates.Calibration cal) {
        return EvaporationRates.of(List.of(s), kelvin, cal).constants()[0];
    }

    /** exp|ln(predicted/published)|: 1 is exact, 2 is a factor two either way. */
    public static double factorError(double predicted, double published) {
        return Math.exp(Math.abs(Math.log(predicted / published)));
    }
}
