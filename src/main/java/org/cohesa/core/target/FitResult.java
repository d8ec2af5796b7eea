package org.cohesa.core.target;

import java.util.List;
import org.cohesa.core.hsp.SolubilitySphere;

/**
 * The outcome of a sphere fit.
 *
 * @param sphere     fitted centre and R0, MPa^½
 * @param quality    how the sphere sorts the test results
 * @param confidence bootstrap box for centre and R0, with warnings
 * @param nextTests  library liquids that would best tighten the fit, most useful first
 * @param results    number of test results used
 */
public record FitResult(SolubilitySphere sphere, FitQuality quality, ConfidenceRegion confidence, List<NextTest> nextTests, int results) {

    public FitResult {
        nextTests = List.copyOf(nextTests);
    }
}
