package org.cohesa.core.blend;

import java.util.List;
import java.util.Locale;
import org.cohesa.core.activity.WaterBehaviour;
import org.cohesa.core.solvent.Solvent;

/**
 * How a suggested blend behaves when water is added: the blend designer's hook for "must separate from water"
 * (extraction) and "must mix with water" (waterborne cosolvent). The judgement itself is
 * {@link org.cohesa.core.activity.WaterMiscibility#withWater}: measured mutual solubilities first, the activity model
 * elsewhere; this interface lets the caller supply the data table.
 */
@FunctionalInterface
public interface WaterCheck {

    /** No water demand: nothing is checked. */
    WaterCheck NONE = (components, fractions, kelvin) -> null;

    WaterBehaviour check(List<Solvent> components, double[] volumeFractions, double kelvin);

    /** What the user demands of the blend with water. */
    enum Need {
        /** one liquid phase at every tested water content (a cosolvent for a waterborne system) */
        MISCIBLE,
        /** two liquid phases at 1:1 by volume (an extraction solvent) */
        IMMISCIBLE;

        public String word() {
            return name().toLowerCase(Locale.ROOT);
        }

        public boolean metBy(WaterBehaviour b) {
            return b != null && (this == MISCIBLE ? b.kind() == WaterBehaviour.Kind.MISCIBLE : b.kind() == WaterBehaviour.Kind.IMMISCIBLE);
        }
    }
}
