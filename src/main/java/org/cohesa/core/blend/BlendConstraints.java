package org.cohesa.core.blend;

import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.core.solvent.Solvent;

/**
 * Everything a formulator can demand of a suggested blend. Null or empty means "no such demand".
 *
 * @param include          only these solvents may be used (empty: the whole library)
 * @param exclude          never use these
 * @param families         only these chemical families (the library's family keys, e.g. "ester")
 * @param excludeFamilies  never these families
 * @param fixed            components every blend must contain at the given volume fraction ("keep 20 % water")
 * @param minFraction      least volume fraction of any component the search adds (default 0.05)
 * @param maxFraction      largest volume fraction of any component the search adds (default 1)
 * @param fractionRanges   per-solvent [min, max] volume fraction overriding the two above
 * @param boilingMinC      lowest normal boiling point allowed, °C
 * @param boilingMaxC      highest normal boiling point allowed, °C
 * @param minFlashPointC   least closed-cup flash point of every component, °C
 * @param maxIchClass      worst ICH Q3C class accepted (1 is the worst concern, 3 the mildest): 2 leaves out class 1
 * @param noCmr            leave out carcinogens, mutagens and reproductive toxicants (H340, H350, H360 families)
 * @param maxCost          largest blend price per litre Σ φᵢ priceᵢ (only solvents with an entered price take part)
 * @param more             the safety-first and process demands ({@link More})
 */
public record BlendConstraints(
        List<Solvent> include,
        List<Solvent> exclude,
        Set<String> families,
        Set<String> excludeFamilies,
        List<BlendComponent> fixed,
        double minFraction,
        double maxFraction,
        Map<Solvent, double[]> fractionRanges,
        Double boilingMinC,
        Double boilingMaxC,
        Double minFlashPointC,
        Integer maxIchClass,
        boolean noCmr,
        Double maxCost,
        More more) {

    /**
     * Demands beyond the per-solvent basics.
     *
     * @param noIchClass1          leave out ICH Q3C class 1 solvents (a safety-first default of the command line)
     * @param ichUnlistedAllowed   with {@code maxIchClass}, let solvents ICH Q3C does not list through (they need a
     *                             justification under Q3C); false leaves them out
     * @param healthLimits         hazard kinds a candidate must be strictly milder on (what a solvent is replaced for)
     * @param excludeReactive      process-suitability flags to leave out ({@link ReactiveFlag})
     * @param minBlendFlashPointC  least computed flash point of the blend itself (Liaw et al. 2002), °C; components may be lower
     * @param blendBoilingMinC     lowest computed initial boiling point (bubble point) of the blend, °C
     * @param blendBoilingMaxC     highest computed initial boiling point (bubble point) of the blend, °C
     * @param withWater            how the blend must behave with water (null: no demand)
     * @param solute               the material's acid–base character ({@link SoluteCharacter}): solvents that form a
     *                             salt with it are left out (empty: not known, or the user allowed them)
     */
    public record More(boolean noIchClass1, boolean ichUnlistedAllowed, List<HazardLimit> healthLimits, Set<ReactiveFlag> excludeReactive,
            Double minBlendFlashPointC, Double blendBoilingMinC, Double blendBoilingMaxC, WaterCheck.Need withWater,
            Set<SoluteCharacter> solute) {

        public static final More NONE = new More(false, false, List.of(), Set.of(), null, null, null, null);

        /** Demands without a solute character. */
        public More(boolean noIchClass1, boolean ichUnlistedAllowed, List<HazardLimit> healthLimits, Set<ReactiveFlag> excludeReactive,
                Double minBlendFlashPointC, Double blendBoilingMinC, Double blendBoilingMaxC, WaterCheck.Need withWater) {
            this(noIchClass1, ichUnlistedAllowed, healthLimits, excludeReactive, minBlendFlashPointC, blendBoilingMinC, blendBoilingMaxC,
                    withWater, Set.of());
        }

        /** A copy that leaves out the solvents reacting with a solute of these characters. */
        public More withSolute(Set<SoluteCharacter> characters) {
            return new More(noIchClass1, ichUnlistedAllowed, healthLimits, excludeReactive, minBlendFlashPointC, blendBoilingMinC,
                    blendBoilingMaxC, withWater, characters);
        }

        /** A copy that leaves out the solvents carrying any of these reactivity flags (and no others). */
        public More withReactive(Set<ReactiveFlag> flags) {
            return new More(noIchClass1, ichUnlistedAllowed, healthLimits, flags, minBlendFlashPointC, blendBoilingMinC,
                    blendBoilingMaxC, withWater, solute);
        }

        /** A copy with these "never as bad as the original" limits in place of the present ones. */
        public More withHealthLimits(List<HazardLimit> limits) {
            return new More(noIchClass1, ichUnlistedAllowed, limits, excludeReactive, minBlendFlashPointC, blendBoilingMinC,
                    blendBoilingMaxC, withWater, solute);
        }

        /** A copy with another water demand (null: none). */
        public More withWater(WaterCheck.Need need) {
            return new More(noIchClass1, ichUnlistedAllowed, healthLimits, excludeReactive, minBlendFlashPointC, blendBoilingMinC,
                    blendBoilingMaxC, need, solute);
        }

        /** Demands without a water demand. */
        public More(boolean noIchClass1, boolean ichUnlistedAllowed, List<HazardLimit> healthLimits, Set<ReactiveFlag> excludeReactive,
                Double minBlendFlashPointC, Double blendBoilingMinC, Double blendBoilingMaxC) {
            this(noIchClass1, ichUnlistedAllowed, healthLimits, excludeReactive, minBlendFlashPointC, blendBoilingMinC, blendBoilingMaxC, null);
        }

        public More {
            healthLimits = List.copyOf(Objects.requireNonNullElse(healthLimits, List.of()));
            excludeReactive = Set.copyOf(Objects.requireNonNullElse(excludeReactive, Set.of()));
            solute = Set.copyOf(Objects.requireNonNullElse(solute, Set.of()));
            if (blendBoilingMinC != null && blendBoilingMaxC != null && blendBoilingMinC > blendBoilingMaxC) {
                throw new IllegalArgumentException("blend boiling window " + blendBoilingMinC + ".." + blendBoilingMaxC + " °C is empty");
            }
        }
    }

    /** The basic demands alone (no safety-first defaults, no process demands). */
    public BlendConstraints(List<Solvent> include, List<Solvent> exclude, Set<String> families, Set<String> excludeFamilies,
            List<BlendComponent> fixed, double minFraction, double maxFraction, Map<Solvent, double[]> fractionRanges, Double boilingMinC,
            Double boilingMaxC, Double minFlashPointC, Integer maxIchClass, boolean noCmr, Double maxCost) {
        this(include, exclude, families, excludeFamilies, fixed, minFraction, maxFraction, fractionRanges, boilingMinC, boilingMaxC,
                minFlashPointC, maxIchClass, noCmr, maxCost, More.NONE);
    }

    /** A copy that also leaves out this solvent by name. */
    public BlendConstraints alsoExcluding(Solvent s) {
        List<Solvent> ex = new java.util.ArrayList<>(exclude);
        if (!ex.contains(s)) {
            ex.add(s);
        }
        return new BlendConstraints(include, ex, families, excludeFamilies, fixed, minFraction, maxFraction, fractionRanges, boilingMinC,
                boilingMaxC, minFlashPointC, maxIchClass, noCmr, maxCost, more);
    }

    /** A copy with other further demands. */
    public BlendConstraints with(More m) {
        return new BlendConstraints(include, exclude, families, excludeFamilies, fixed, minFraction, maxFraction, fractionRanges, boilingMinC,
                boilingMaxC, minFlashPointC, maxIchClass, noCmr, maxCost, m);
    }

    /** Default least fraction of a component the search adds: below 5 % a component hardly changes a blend's parameters and is hard to dose. */
    public static final double DEFAULT_MIN_FRACTION = 0.05;

    public static final BlendConstraints NONE = new BlendConstraints(List.of(), List.of(), Set.of(), Set.of(), List.of(),
            DEFAULT_MIN_FRACTION, 1.0, Map.of(), null, null, null, null, false, null);

    public BlendConstraints {
        include = List.copyOf(Objects.requireNonNullElse(include, List.of()));
        exclude = List.copyOf(Objects.requireNonNullElse(exclude, List.of()));
        families = Set.copyOf(Objects.requireNonNullElse(families, Set.of()));
        excludeFamilies = Set.copyOf(Objects.requireNonNullElse(excludeFamilies, Set.of()));
        fixed = List.copyOf(Objects.requireNonNullElse(fixed, List.of()));
        fractionRanges = Map.copyOf(Objects.requireNonNullElse(fractionRanges, Map.of()));
        more = Objects.requireNonNullElse(more, More.NONE);
        if (!(minFraction >= 0 && minFraction < 1)) {
            throw new IllegalArgumentException("minimum fraction must lie in [0, 1), got " + minFraction);
        }
        if (!(maxFraction > 0 && maxFraction <= 1) || maxFraction < minFraction) {
            throw new IllegalArgumentException("maximum fraction must lie in (0, 1] and not below the minimum " + minFraction + ", got " + maxFraction);
        }
        for (Map.Entry<Solvent, double[]> e : fractionRanges.entrySet()) {
            double[] r = e.getValue();
            if (r.length != 2 || !(r[0] >= 0 && r[1] <= 1 && r[0] <= r[1])) {
                throw new IllegalArgumentException("fraction range of " + e.getKey().name() + " must satisfy 0 ≤ min ≤ max ≤ 1");
            }
        }
        double fixedSum = fixed.stream().mapToDouble(BlendComponent::fraction).sum();
        if (fixedSum > 1 + 1e-9) {
            throw new IllegalArgumentException("fixed fractions add up to " + fixedSum + ", more than 1");
        }
        if (boilingMinC != null && boilingMaxC != null && boilingMinC > boilingMaxC) {
            throw new IllegalArgumentException("boiling-point window " + boilingMinC + ".." + boilingMaxC + " °C is empty");
        }
        if (maxIchClass != null && (maxIchClass < 1 || maxIchClass > 3)) {
            throw new IllegalArgumentException("ICH Q3C class must be 1, 2 or 3, got " + maxIchClass);
        }
        if (maxCost != null && !(maxCost >= 0)) {
            throw new IllegalArgumentException("maximum cost must be a number ≥ 0, got " + maxCost);
        }
    }

    /** Sum of the fixed components' fractions. */
    public double fixedFraction() {
        return fixed.stream().mapToDouble(BlendComponent::fraction).sum();
    }

    /** [min, max] volume fraction allowed for a component the search adds. */
    public double[] rangeOf(Solvent s) {
        double[] r = fractionRanges.get(s);
        return r != null ? r.clone() : new double[] {minFraction, maxFraction};
    }
}
