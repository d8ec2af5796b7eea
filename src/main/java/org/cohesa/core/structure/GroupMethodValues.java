package org.cohesa.core.structure;

import java.util.List;
import java.util.Map;

/**
 * What one group method gave for a structure before the estimator combined them (see {@link StructureEstimator}):
 * shown beside the chosen values so a user can see both methods and, for Stefanis–Panayiotou, the groups found.
 *
 * @param method       the method, e.g. "Mathieu 2018", "Stefanis–Panayiotou 2008/2012"
 * @param dD           its δD, MPa^½, or null when it gives none
 * @param dP           its δP, or null
 * @param dH           its δH, or null
 * @param firstOrder   first-order groups found, name → count (empty for Mathieu, whose fragments are atom codes)
 * @param secondOrder  second-order groups found (empty for Mathieu)
 * @param uncovered    what the method's tables do not hold for this structure (empty when it covers it)
 */
public record GroupMethodValues(String method, Double dD, Double dP, Double dH, Map<String, Integer> firstOrder,
        Map<String, Integer> secondOrder, List<String> uncovered) {

    public GroupMethodValues {
        firstOrder = Map.copyOf(firstOrder);
        secondOrder = Map.copyOf(secondOrder);
        uncovered = List.copyOf(uncovered);
    }

    static GroupMethodValues of(MathieuEstimate m) {
        return new GroupMethodValues("Mathieu 2018", m.dD(), m.dP(), m.dH(), Map.of(), Map.of(), m.uncovered());
    }

    static GroupMethodValues of(StefanisPanayiotouEstimate s) {
        return new GroupMethodValues("Stefanis–Panayiotou 2008/2012", s.dD(), s.dP(), s.dH(), s.firstOrder(), s.secondOrder(), s.uncovered());
    }
}
