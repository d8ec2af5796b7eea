package org.cohesa.core.target;

import java.util.List;
import org.cohesa.core.hsp.SolubilitySphere;

/**
 * The likelihood-ratio confidence region of a likelihood fit: every sphere θ = (δD, δP, δH, R0) with deviance
 * 2·(ℓ(θ̂) − ℓ(θ)) ≤ {@code threshold}, the {@code level} quantile of χ² with 4 degrees of freedom (Wilks, S. S.,
 * "The large-sample distribution of the likelihood ratio for testing composite hypotheses", <i>Ann. Math.
 * Stat.</i> 9 (1938) 60). Its shape is explored by a seeded Metropolis sampler; {@code samples} is a cloud of
 * spheres inside it (for drawing), and the sizes below are taken over the whole sampled set.
 *
 * @param level             nominal coverage, e.g. 0.95
 * @param threshold         deviance limit (χ²₄ quantile)
 * @param maxLogLikelihood  ℓ(θ̂), the log-likelihood (plus log prior) of the fitted sphere
 * @param centreRadius      largest Ra from the fitted centre to a centre in the region, MPa^½ (the region's size)
 * @param r0                range of R0 over the region, MPa^½
 * @param bounded           false when the region runs to the edge of the search space (R0 up to 40, or a
 *                          parameter to its bound): the data do not close the sphere on some side
 * @param boundedNote       one sentence saying whether and why the data bound the sphere
 * @param samples           up to 200 spheres inside the region (the drawing cloud), spread over the sampler's run
 * @param withPrior         true when the likelihood carries a centre prior (the region is then a penalised one)
 * @param model             the observation model the likelihood was computed with
 * @param posteriorMean     the mean sphere over the region samples re-weighted to the plain likelihood (the
 *                          posterior mean under a flat prior on the search box, or under the centre prior)
 */
public record LikelihoodRegion(double level, double threshold, double maxLogLikelihood, double centreRadius, Interval r0,
                               boolean bounded, String boundedNote, List<SolubilitySphere> samples, boolean withPrior,
                               DissolutionModel model, SolubilitySphere posteriorMean) {

    public LikelihoodRegion {
        samples = List.copyOf(samples);
    }
}
