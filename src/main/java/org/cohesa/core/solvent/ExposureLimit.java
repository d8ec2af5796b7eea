package org.cohesa.core.solvent;

/**
 * Occupational exposure limits of one jurisdiction; any value may be {@code null}.
 *
 * @param twaPpm        8-hour time-weighted average, ppm (vapour, 25 °C)
 * @param stelPpm       15-minute short-term exposure limit, ppm
 * @param ceilingPpm    ceiling limit, ppm
 * @param skin          true when the jurisdiction adds a skin notation (absorption through the skin)
 * @param jurisdiction  whose limits these are, e.g. "Ontario"
 */
public record ExposureLimit(Double twaPpm, Double stelPpm, Double ceilingPpm, boolean skin, String jurisdiction) {

    public static final ExposureLimit NONE = new ExposureLimit(null, null, null, false, null);

    /** True when at least one numeric limit is known. */
    public boolean isKnown() {
        return twaPpm != null || stelPpm != null || ceilingPpm != null;
    }
}
