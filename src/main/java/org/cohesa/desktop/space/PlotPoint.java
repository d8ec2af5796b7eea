package org.cohesa.desktop.space;

import org.cohesa.core.hsp.HansenParameters;
import org.cohesa.core.solvent.Solvent;

/**
 * One liquid drawn in the plots.
 *
 * @param name     shown on hover
 * @param hansen   its parameters, MPa^½
 * @param category index into the current {@link Colouring}'s categories
 * @param solvent  the library solvent (for selection sync), or null for synthetic test points
 * @param red      RED to the current target, or null without a target
 */
public record PlotPoint(String name, HansenParameters hansen, int category, Solvent solvent, Double red) {
}
