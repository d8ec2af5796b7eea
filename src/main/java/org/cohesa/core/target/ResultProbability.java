package org.cohesa.core.target;

/**
 * One test result seen through the likelihood fit.
 *
 * @param name        the liquid as written in the test series
 * @param score       measured score 0..1
 * @param red         RED to the fitted sphere
 * @param pDissolves  P(dissolves) at that RED under the fit's {@link DissolutionModel}
 * @param probability probability of the result as scored (P for a dissolving result, 1 − P for a non-dissolving
 *                    one, y·P + (1 − y)·(1 − P) for a graded score y)
 * @param likelyMisfit true when the probability is below {@link #MISFIT_PROBABILITY}: check this result first
 * @param nearSurface true when the liquid lies in the band around the surface where 0.1 &lt; P &lt; 0.9: a result
 *                    there cannot be told from noise, either way
 */
public record ResultProbability(String name, double score, double red, double pDissolves, double probability, boolean likelyMisfit,
                                boolean nearSurface) {

    /** Results less likely than this under the fit are named as likely misfits. */
    public static final double MISFIT_PROBABILITY = 0.1;
}
