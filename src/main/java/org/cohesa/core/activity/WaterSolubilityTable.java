package org.cohesa.core.activity;

import java.util.List;
import java.util.Optional;
import org.cohesa.core.solvent.Solvent;

/** The published mutual solubilities with water, looked up by CAS number (then by name). */
public record WaterSolubilityTable(List<WaterSolubility> rows) {

    /** No data: every judgement falls to the activity model. */
    public static final WaterSolubilityTable NONE = new WaterSolubilityTable(List.of());

    public WaterSolubilityTable {
        rows = List.copyOf(rows);
    }

    public Optional<WaterSolubility> find(Solvent s) {
        if (s.cas() != null && !s.cas().isBlank()) {
            for (WaterSolubility r : rows) {
                if (s.cas().equals(r.cas())) {
                    return Optional.of(r);
                }
            }
        }
        return rows.stream().filter(r -> r.name().equalsIgnoreCase(s.name())).findFirst();
    }
}
