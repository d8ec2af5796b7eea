package org.cohesa.core.blend;

import java.util.List;
import org.cohesa.core.hsp.HansenParameters;
import org.cohesa.core.solvent.Blend;
import org.cohesa.core.solvent.BlendComponent;

/**
 * One suggestion of the search: the blend with its exact best composition, where it lands in parameter
 * space and how it scores.
 *
 * @param components   solvents and volume fractions (fixed components first), fractions sum to 1
 * @param point        the blend's parameters by the volume-fraction rule, MPa^½
 * @param ra           Hansen distance to the target centre, MPa^½
 * @param red          Ra / R0
 * @param withinLimit  true when RED ≤ the search's RED limit (the "good" region the secondary key works in)
 * @param rankBy       the secondary key the list was ordered by
 * @param secondary    value of the secondary key for this blend: hazard score, price per litre, number of
 *                     components, or vapour pressure at 25 °C in kPa (volume-fraction weighted); NaN for RED
 */
public record RankedBlend(List<BlendComponent> components, HansenParameters point, double ra, double red,
        boolean withinLimit, RankBy rankBy, double secondary) {

    public RankedBlend {
        components = List.copyOf(components);
    }

    public int size() {
        return components.size();
    }

    /** The suggestion as a {@link Blend} value. */
    public Blend blend() {
        return new Blend(components);
    }
}
