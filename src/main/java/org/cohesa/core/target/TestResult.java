package org.cohesa.core.target;

import org.cohesa.core.hsp.HansenParameters;

/**
 * One dissolving test: a liquid (single solvent, blend or explicit parameters) and how well it dissolved the material.
 *
 * @param label        the liquid as the user wrote it (solvent name, blend or a label for explicit parameters)
 * @param liquid       the liquid's parameters, MPa^½ (blends by the volume-fraction rule)
 * @param score        1 dissolves, 0 does not; values between are graded (partial swelling, partial solubility)
 * @param temperatureC test temperature, °C, or null when not recorded
 */
public record TestResult(String label, HansenParameters liquid, double score, Double temperatureC) {

    /** Scores at or above this count as "dissolves" when the fit is scored good/bad. */
    public static final double GOOD_THRESHOLD = 0.5;

    public TestResult {
        if (label == null || label.isBlank()) {
            throw new IllegalArgumentException("a test result needs a label for its liquid");
        }
        if (liquid == null) {
            throw new IllegalArgumentException("test result " + label + " needs the liquid's parameters");
        }
        if (!Double.isFinite(score) || score < 0 || score > 1) {
            throw new IllegalArgumentException("score of " + label + " must lie between 0 and 1, got " + score);
        }
        if (temperatureC != null && (!Double.isFinite(temperatureC) || temperatureC <= -273.15)) {
            throw new IllegalArgumentException("temperature of " + label + " must be above −273.15 °C, got " + temperatureC);
        }
    }

    public static TestResult of(String label, HansenParameters liquid, double score) {
        return new TestResult(label, liquid, score, null);
    }

    /** True when the score says the liquid dissolves the material (score ≥ 0.5). */
    public boolean good() {
        return score >= GOOD_THRESHOLD;
    }
}
