package org.cohesa.core.target;

import java.util.List;

/**
 * How well a sphere sorts the test results.
 *
 * @param goodInside  dissolving liquids (score ≥ 0.5) with RED &lt; 1
 * @param goodTotal   dissolving liquids
 * @param badOutside  non-dissolving liquids (score &lt; 0.5) with RED ≥ 1
 * @param badTotal    non-dissolving liquids
 * @param misfits     the liquids on the wrong side, worst first
 */
public record FitQuality(int goodInside, int goodTotal, int badOutside, int badTotal, List<Misfit> misfits) {

    public FitQuality {
        misfits = List.copyOf(misfits);
    }

    /** Share of all results on the right side, 0..1. */
    public double accuracy() {
        int n = goodTotal + badTotal;
        return n == 0 ? 0 : (goodInside + badOutside) / (double) n;
    }
}
