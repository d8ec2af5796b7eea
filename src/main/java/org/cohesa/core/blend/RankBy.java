package org.cohesa.core.blend;

import java.util.Locale;
import org.cohesa.core.InvalidInputException;

/**
 * What decides between blends after solvency. With {@link #DESIRABILITY} (the default) only blends with
 * RED ≤ limit qualify and one documented score orders them; with {@link #RED} the list is ordered by RED alone
 * (ties: fewer components, then lower hazard score); with any other key, blends that reach the "good" region
 * RED ≤ limit come first, ordered by that key, and the rest follow ordered by RED.
 */
public enum RankBy {
    /**
     * The default: among blends with RED ≤ the limit only (the rest are not suggested), the lowest
     * {@link Desirability} score first (hazard of the worst component, components, cost, margin).
     */
    DESIRABILITY,
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
        throw new InvalidInputException(field, String.valueOf(text), "choose one of desirability, red, hazard, cost, components, evaporation");
    }

    public String word() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** True for the keys that are a linear function of the composition (and so steer the composition itself). */
    public boolean isLinear() {
        return this == HAZARD || this == COST || this == EVAPORATION;
    }
}
