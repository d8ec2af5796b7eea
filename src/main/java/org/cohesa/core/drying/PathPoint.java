package org.cohesa.core.drying;

import java.util.Map;
import org.cohesa.core.hsp.HansenParameters;

/**
 * One point of a drying path.
 *
 * @param evaporated  fraction of the initial volume evaporated, 0–1
 * @param time        time relative to pure n-butyl acetate evaporating the same volume (see {@link EvaporationRates})
 * @param composition volume fractions of the remaining liquid by solvent name (insertion order = blend order)
 * @param hansen      the remaining liquid's parameters by volume mixing, MPa^½, or null when a component has none
 * @param red         RED to the target sphere, or null without a target
 */
public record PathPoint(double evaporated, double time, Map<String, Double> composition, HansenParameters hansen, Double red) {

    public PathPoint {
        composition = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(composition));
    }
}
