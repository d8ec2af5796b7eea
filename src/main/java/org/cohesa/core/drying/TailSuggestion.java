package org.cohesa.core.drying;

/**
 * A slow solvent that, added to a blend, keeps its drying path inside the target sphere.
 *
 * @param solvent        the tail solvent's name
 * @param fraction       volume fraction of it in the new blend (the original components scaled down to make room)
 * @param relativeRate   its predicted relative evaporation rate (n-butyl acetate = 1)
 * @param maxRed         the largest RED along the new path up to the requested evaporated fraction
 * @param lastSolvent    the solvent left last on the new path
 */
public record TailSuggestion(String solvent, double fraction, double relativeRate, double maxRed, String lastSolvent) {
}
