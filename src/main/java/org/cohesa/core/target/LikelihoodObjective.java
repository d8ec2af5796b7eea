package org.cohesa.core.target;

import org.apache.commons.math3.analysis.MultivariateFunction;

/**
 * Negative log-likelihood (minus the log prior, when there is one) of a sphere {δD, δP, δH, R0} given the test
 * series, under {@link DissolutionModel}. Ra in the Hansen metric, Ra² = 4ΔδD² + ΔδP² + ΔδH² (Hansen 2007, ch. 1).
 */
final class LikelihoodObjective implements MultivariateFunction {

    private final SphereFitter.Data data;
    private final double[] weights;
    private final DissolutionModel model;
    private final CentrePrior prior;

    LikelihoodObjective(SphereFitter.Data data, double[] weights, DissolutionModel model, CentrePrior prior) {
        this.data = data;
        this.weights = weights;
        this.model = model;
        this.prior = prior;
    }

    @Override
    public double value(double[] p) {
        return -logPosterior(p);
    }

    /** Log-likelihood plus log prior of {δD, δP, δH, R0}. */
    double logPosterior(double[] p) {
        double r = p[3];
        if (!(r > 0)) {
            return Double.NEGATIVE_INFINITY;
        }
        double sum = 0;
        for (int i = 0; i < data.size(); i++) {
            double w = weights == null ? 1 : weights[i];
            if (w == 0) {
                continue;
            }
            double red = SphereFitter.Data.ra(data.points[i], p) / r;
            sum += w * DissolutionModel.logLikelihood(data.scores[i], model.pDissolves(red));
        }
        if (prior != null) {
            sum += prior.logDensity(p[0], p[1], p[2]);
        }
        return sum;
    }
}
