package org.cohesa.core.structure;

/**
 * One estimated (or given) quantity with the route that produced it and the error that route showed on the
 * published table (docs/methods.md, "Hansen parameters from a structure").
 *
 * @param value       the value (MPa^½ for Hansen components, cm³/mol for a molar volume)
 * @param route       how it was obtained, e.g. "group contribution (Mathieu 2018)", "measured (given)"
 * @param expectedMae mean absolute error of the route on the validation set (same unit), 0 for a given value
 * @param expectedP90 90th percentile of the absolute error (same unit), 0 for a given value
 * @param estimated   false when the user gave the value
 */
public record EstimatedValue(double value, String route, double expectedMae, double expectedP90, boolean estimated) {

    static EstimatedValue given(double value) {
        return new EstimatedValue(value, "measured (given)", 0, 0, false);
    }
}
