package org.cohesa.core.target;

import java.util.List;
import org.cohesa.core.hsp.HansenParameters;

/**
 * Uncertainty of a fitted sphere: a box for the centre and an interval for R0, plus plain warnings when the data
 * do not pin the sphere down.
 *
 * @param level     nominal coverage of the intervals, e.g. 0.95
 * @param resamples bootstrap resamples behind the box (0 when the bootstrap was switched off)
 * @param dD        interval for δD of the centre, MPa^½
 * @param dP        interval for δP of the centre, MPa^½
 * @param dH        interval for δH of the centre, MPa^½
 * @param r0        interval for R0, MPa^½
 * @param warnings  plain sentences; empty when the data bound the sphere on every side the library can reach
 */
public record ConfidenceRegion(double level, int resamples, Interval dD, Interval dP, Interval dH, Interval r0, List<String> warnings) {

    public ConfidenceRegion {
        warnings = List.copyOf(warnings);
    }

    /** True when the box holds {@code centre}. */
    public boolean containsCentre(HansenParameters centre) {
        return dD.contains(centre.dD()) && dP.contains(centre.dP()) && dH.contains(centre.dH());
    }

    /** True when no warning was raised. */
    public boolean bounded() {
        return warnings.isEmpty();
    }
}
