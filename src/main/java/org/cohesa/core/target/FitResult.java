package org.cohesa.core.target;

import java.util.List;
import org.cohesa.core.hsp.SolubilitySphere;

/**
 * The outcome of a sphere fit.
 *
 * @param sphere        fitted centre and R0, MPa^½
 * @param quality       how the sphere sorts the test results (wrong-side results as misfits)
 * @param confidence    box for centre and R0 with warnings: for the likelihood fit the extent of its 95 % region,
 *                      for the others the bootstrap box
 * @param nextTests     library liquids that would best tighten the fit, most useful first
 * @param results       number of test results used
 * @param method        how the sphere was fitted
 * @param probabilities likelihood fit: every result with its probability under the fit, least likely first
 *                      (empty for the other methods)
 * @param region        likelihood fit: the likelihood-ratio region (null for the other methods)
 * @param prior         the centre prior used, or null
 * @param notes         plain sentences about the model, near-surface results and the prior
 */
public record FitResult(SolubilitySphere sphere, FitQuality quality, ConfidenceRegion confidence, List<NextTest> nextTests, int results,
                        FitMethod method, List<ResultProbability> probabilities, LikelihoodRegion region, CentrePrior prior,
                        List<String> notes) {

    public FitResult {
        nextTests = List.copyOf(nextTests);
        probabilities = List.copyOf(probabilities);
        notes = List.copyOf(notes);
    }

    /** A fit without likelihood details (classic and consensus methods). */
    public FitResult(SolubilitySphere sphere, FitQuality quality, ConfidenceRegion confidence, List<NextTest> nextTests, int results,
                     FitMethod method) {
        this(sphere, quality, confidence, nextTests, results, method, List.of(), null, null, List.of());
    }

    /** Results named as likely misfits (probability under the fit below 0.1), least likely first. */
    public List<ResultProbability> likelyMisfits() {
        return probabilities.stream().filter(ResultProbability::likelyMisfit).toList();
    }
}
