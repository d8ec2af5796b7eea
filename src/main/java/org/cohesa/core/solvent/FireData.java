package org.cohesa.core.solvent;

/**
 * Fire properties of a pure liquid; any value may be {@code null} when no source gives it.
 *
 * @param flashPointC    closed-cup flash point, °C
 * @param autoignitionC  autoignition temperature, °C
 * @param lflPct         lower flammability limit, vol % in air
 * @param uflPct         upper flammability limit, vol % in air
 */
public record FireData(Double flashPointC, Double autoignitionC, Double lflPct, Double uflPct) {

    public static final FireData NONE = new FireData(null, null, null, null);
}
