package org.cohesa.core.target;

/**
 * How likely a liquid is to dissolve the material, as a function of its RED to the true sphere: the observation
 * model of the likelihood fit.
 *
 * <pre>  P(dissolves | RED) = ε + (1 − 2ε) · σ((1 − RED)/s),   σ(z) = 1/(1 + e^−z)</pre>
 *
 * The logistic link (Cox, D. R., "The regression analysis of binary sequences", <i>J. R. Stat. Soc. B</i> 20
 * (1958) 215) makes the probability fall smoothly through ½ on the surface; the softness s (in RED units) is how
 * wide the band is in which lab results go either way: with s = {@value #DEFAULT_SOFTNESS} a liquid at RED 0.8
 * dissolves with P ≈ 0.86 and one at RED 1.25 with P ≈ 0.09. The lapse rate ε is the chance that a result far from
 * the surface is wrong anyway (a mislabelled vial, a wrong entry); it bounds how hard one such result can pull the
 * fit (the lapse parameter of psychometric functions: Wichmann, F. A., Hill, N. J., "The psychometric function: I.
 * Fitting, sampling, and goodness of fit", <i>Percept. Psychophys.</i> 63 (2001) 1293). Both are fixed, documented
 * values, not fitted: a series of 15–35 yes/no results cannot tell them apart from the position of the surface
 * (with separable results the fitted softness runs to 0). docs/methods.md gives the measurements they were chosen
 * on.
 *
 * <p>A graded score y (0.5 for partial swelling or partial solubility) enters as a fractional observation,
 * y·ln P + (1 − y)·ln(1 − P) (the quasi-likelihood of fractional responses: Papke, L. E., Wooldridge, J. M.,
 * <i>J. Appl. Econometrics</i> 11 (1996) 619): a score of 0.5 is best explained by a liquid on the surface.
 *
 * @param softness s, RED units, &gt; 0
 * @param lapse    ε, probability, 0 &lt; ε &lt; 0.5
 */
public record DissolutionModel(double softness, double lapse) {

    public static final double DEFAULT_SOFTNESS = 0.1;
    public static final double DEFAULT_LAPSE = 0.02;
    /** The documented defaults. */
    public static final DissolutionModel DEFAULT = new DissolutionModel(DEFAULT_SOFTNESS, DEFAULT_LAPSE);

    public DissolutionModel {
        if (!(softness > 0) || softness > 5) {
            throw new IllegalArgumentException("softness must lie in (0, 5], got " + softness);
        }
        if (!(lapse > 0) || lapse >= 0.5) {
            throw new IllegalArgumentException("lapse rate must lie in (0, 0.5), got " + lapse);
        }
    }

    /** P(dissolves) for a liquid at {@code red}. */
    public double pDissolves(double red) {
        return lapse + (1 - 2 * lapse) / (1 + Math.exp(-(1 - red) / softness));
    }

    /** Log-likelihood of score {@code y} (0..1) when P(dissolves) = {@code p}. */
    static double logLikelihood(double y, double p) {
        if (y >= 1) {
            return Math.log(p);
        }
        if (y <= 0) {
            return Math.log1p(-p);
        }
        return y * Math.log(p) + (1 - y) * Math.log1p(-p);
    }

    /**
     * Probability of the result as scored: P for a dissolving result, 1 − P for a non-dissolving one, and
     * y·P + (1 − y)·(1 − P) for a graded score (0.5 for a score of 0.5 wherever the liquid lies: a partial result
     * is never strong evidence against the fit).
     */
    static double probabilityOfResult(double y, double p) {
        return y * p + (1 - y) * (1 - p);
    }

    /** RED half-width of the band around the surface where 0.1 &lt; P &lt; 0.9: results there cannot be told from noise. */
    public double noiseBand() {
        double q = (0.9 - lapse) / (1 - 2 * lapse);
        return softness * Math.log(q / (1 - q));
    }
}
