package org.cohesa.core.solvent;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;
import org.cohesa.core.hsp.HansenParameters;
import org.cohesa.core.hsp.VolumeMixing;

/**
 * A liquid blend by volume fractions (a single solvent is a one-component blend).
 * Fractions sum to 1 within {@link VolumeMixing#FRACTION_SUM_TOLERANCE}; a solvent appears once.
 */
public record Blend(List<BlendComponent> components) {

    public Blend {
        if (components == null || components.isEmpty()) {
            throw new IllegalArgumentException("a blend needs at least one component");
        }
        components = List.copyOf(components);
        double[] f = components.stream().mapToDouble(BlendComponent::fraction).toArray();
        VolumeMixing.requireFractions(f);
        long distinct = components.stream().map(c -> c.solvent().name().toLowerCase()).distinct().count();
        if (distinct != components.size()) {
            throw new IllegalArgumentException("a solvent appears twice in the blend " + describe(components));
        }
    }

    public static Blend pure(Solvent s) {
        return new Blend(List.of(new BlendComponent(s, 1.0)));
    }

    public int size() {
        return components.size();
    }

    public List<Solvent> solvents() {
        return components.stream().map(BlendComponent::solvent).toList();
    }

    public double[] fractions() {
        return components.stream().mapToDouble(BlendComponent::fraction).toArray();
    }

    /** True when every component has Hansen parameters. */
    public boolean hasHansen() {
        return components.stream().allMatch(c -> c.solvent().hasHansen());
    }

    /** The blend's parameters by the volume-fraction rule; fails naming the component without parameters. */
    public HansenParameters hansen() {
        List<HansenParameters> ps = new ArrayList<>();
        for (BlendComponent c : components) {
            if (!c.solvent().hasHansen()) {
                throw new IllegalArgumentException(c.solvent().name() + " has no Hansen parameters in the library");
            }
            ps.add(c.solvent().hansen());
        }
        return VolumeMixing.mix(fractions(), ps);
    }

    /** "toluene:0.6,ethanol:0.4" style text (our blend notation). */
    public String describe() {
        return describe(components);
    }

    private static String describe(List<BlendComponent> cs) {
        return cs.stream().map(c -> c.solvent().name() + ":" + BlendSpec.formatFraction(c.fraction())).collect(Collectors.joining(","));
    }
}
