package org.cohesa.core.structure;

import java.util.List;
import java.util.Map;

/**
 * What the Stefanis–Panayiotou group method gives for one structure ({@link StefanisPanayiotouMethod}). A component
 * is null when the structure lies outside the method (an atom no first-order group covers, an element the tables do
 * not hold, fewer than three carbon atoms) or when a first-order group it holds has no value for that component.
 *
 * @param dD           dispersion component, MPa^½
 * @param dP           polar component, MPa^½ (from the low-value equation when the standard one gives below 3)
 * @param dH           hydrogen-bonding component, MPa^½ (likewise)
 * @param firstOrder   first-order groups found, name → count
 * @param secondOrder  second-order groups found, name → count
 * @param uncovered    why a component is missing (atoms without a group, groups without a value), empty when complete
 */
public record StefanisPanayiotouEstimate(Double dD, Double dP, Double dH, Map<String, Integer> firstOrder,
        Map<String, Integer> secondOrder, List<String> uncovered) {

    public StefanisPanayiotouEstimate {
        firstOrder = Map.copyOf(firstOrder);
        secondOrder = Map.copyOf(secondOrder);
        uncovered = List.copyOf(uncovered);
    }

    public boolean complete() {
        return dD != null && dP != null && dH != null;
    }
}
