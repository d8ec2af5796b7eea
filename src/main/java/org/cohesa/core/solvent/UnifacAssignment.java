package org.cohesa.core.solvent;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * A molecule's original-UNIFAC subgroup counts (subgroup id → number of occurrences).
 *
 * <p>Subgroup ids follow Fredenslund, Jones, Prausnitz, <i>AIChE J.</i> 21 (1975) 1086 with the revised
 * tables of Hansen et al., <i>Ind. Eng. Chem. Res.</i> 30 (1991) 2352. Written as text in the form
 * {@code "1:1 2:1 14:1"} (ethanol: CH3, CH2, OH).
 */
public record UnifacAssignment(Map<Integer, Integer> counts) {

    public static final UnifacAssignment NONE = new UnifacAssignment(Map.of());

    public UnifacAssignment {
        for (Map.Entry<Integer, Integer> e : counts.entrySet()) {
            if (e.getKey() == null || e.getKey() <= 0 || e.getValue() == null || e.getValue() <= 0) {
                throw new IllegalArgumentException("UNIFAC subgroup counts must be positive id:count pairs, got " + e);
            }
        }
        counts = Collections.unmodifiableMap(new LinkedHashMap<>(counts));
    }

    public boolean isEmpty() {
        return counts.isEmpty();
    }

    /** Parses {@code "1:1 2:1 14:1"}; blank text gives {@link #NONE}. */
    public static UnifacAssignment parse(String text) {
        if (text == null || text.isBlank()) {
            return NONE;
        }
        Map<Integer, Integer> counts = new LinkedHashMap<>();
        for (String pair : text.trim().split("\\s+")) {
            String[] parts = pair.split(":");
            if (parts.length != 2) {
                throw new IllegalArgumentException("UNIFAC group '" + pair + "' is not of the form id:count");
            }
            try {
                counts.merge(Integer.parseInt(parts[0]), Integer.parseInt(parts[1]), Integer::sum);
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException("UNIFAC group '" + pair + "' is not of the form id:count", e);
            }
        }
        return new UnifacAssignment(counts);
    }

    /** The text form, {@code "1:1 2:1 14:1"}. */
    public String format() {
        StringBuilder sb = new StringBuilder();
        counts.forEach((id, n) -> sb.append(sb.length() == 0 ? "" : " ").append(id).append(':').append(n));
        return sb.toString();
    }
}
