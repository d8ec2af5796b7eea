package org.cohesa.core.structure;

import java.util.List;
import java.util.Map;
import org.cohesa.core.solvent.UnifacAssignment;

/**
 * Original-UNIFAC groups found in a structure.
 *
 * @param groups     subgroup id → count (empty when not every atom could be placed in a group)
 * @param complete   true when every non-hydrogen atom belongs to a group, so the assignment is usable
 * @param unplaced   atoms (1-based index and element) no subgroup covers, e.g. {@code "7 (N)"}
 */
public record UnifacGrouping(Map<Integer, Integer> groups, boolean complete, List<String> unplaced) {

    public UnifacGrouping {
        groups = Map.copyOf(groups);
        unplaced = List.copyOf(unplaced);
    }

    /** The assignment in the form solvents store, or {@link UnifacAssignment#NONE} when incomplete. */
    public UnifacAssignment assignment() {
        if (!complete) {
            return UnifacAssignment.NONE;
        }
        return new UnifacAssignment(new java.util.TreeMap<>(groups));
    }
}
