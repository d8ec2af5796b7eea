package org.cohesa.core.solvent;

/**
 * One liquid of a blend with its volume fraction.
 *
 * @param solvent  the liquid
 * @param fraction volume fraction φ, 0 &lt; φ ≤ 1
 */
public record BlendComponent(Solvent solvent, double fraction) {

    public BlendComponent {
        if (solvent == null) {
            throw new IllegalArgumentException("a blend component needs a solvent");
        }
        if (!Double.isFinite(fraction) || fraction < 0 || fraction > 1) {
            throw new IllegalArgumentException("volume fraction of " + solvent.name() + " must lie in [0, 1], got " + fraction);
        }
    }
}
