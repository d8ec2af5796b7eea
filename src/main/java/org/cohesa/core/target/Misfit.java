package org.cohesa.core.target;

/**
 * A test result on the wrong side of the fitted surface: a dissolving liquid outside (RED ≥ 1) or a
 * non-dissolving one inside (RED &lt; 1).
 *
 * @param name  the liquid as written in the test series
 * @param score the measured score, 0..1
 * @param red   RED = Ra/R0 to the fitted sphere
 */
public record Misfit(String name, double score, double red) {
}
