package org.cohesa.core.blend;

import java.util.Locale;
import org.cohesa.core.InvalidInputException;

/**
 * What decides between blends after solvency. RED always comes first: with {@link #RED} the list is
 * ordered by RED alone (ties: fewer components, then lower hazard score); with any other key, blends that
 * reach the "good" region RED ≤ limit come first, ordered by that key, and the rest follow ordered by RED.
 */
public enum RankBy {
    /** Closest to the centre of the target sphere first. */
    RED,
    /** Lowest volume-fraction-weighted {@link HazardScore} first. */
    HAZARD,
    /** Lowest blend price per litre (Σ φᵢ priceᵢ) first; needs prices. */
    COST,
    /** Fewest components first. */
    COMPONENTS,
    /** Fastest evaporation first: highest Σ φᵢ p*ᵢ(25 °C), vapour pressure from the Antoine equation (a proxy). */
    EVAPORATION;

    /** Parses the user's word (case-insensitive). */
    public static RankBy parse(String field, String text) {
        if (text != null) {
            for (RankBy r : values()) {
                if (r.name().equalsIgnoreCase(text.strip())) {
                    return r;
                }
            }
        }
        throw new InvalidInputException(field, String.valueOf(text), "choose one of red, hazard, cost, components, evaporation");
    }

    public String word() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** True for the keys that are a linear function of the composition (and so steer the composition itself). */
    public boolean isLinear() {
        return this == HAZARD || this == COST || this == EVAPORATION;
    }
}
