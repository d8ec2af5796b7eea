package org.cohesa.core.activity;

/**
 * Outcome of a liquid–liquid split test.
 *
 * @param splits true when the mixture is predicted to separate into two liquid phases at that composition
 * @param model  the activity model that served, e.g. "UNIFAC LLE (Magnussen 1981)"
 * @param detail one readable sentence: the composition of the most different trial phase and the
 *               tangent-plane distance, or why a fallback model was used
 */
public record MiscibilityResult(boolean splits, String model, String detail) {
}
