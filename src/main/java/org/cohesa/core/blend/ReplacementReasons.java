package org.cohesa.core.blend;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.safety.FlammableLiquidClass;
import org.cohesa.core.solvent.Solvent;

/**
 * Why a solvent is being replaced, and the constraints that follow: no candidate may be as bad as the original on a named
 * reason. One rule for {@code cohesa replace --because} and the desktop's replacement case.
 *
 * <p>A hazard reason (reprotoxic, carcinogen, …; {@link HazardLimit#kindsOf}) becomes a {@link HazardLimit} at the original's
 * own severity. "flammable" asks for the next GHS flammable-liquid category boundary above the original's (UN GHS Rev. 10,
 * Table 2.6.1: category 1–2 → flash point ≥ 23 °C, 3 → ≥ 60.5 °C, 4 → ≥ 93.5 °C, i.e. no longer a category-4 liquid).
 * "ich" asks for the next milder ICH Q3C class. "high-boiling" / "low-boiling" ask every component to boil below / above
 * the original (0.5 °C apart, so a liquid boiling at the same tabulated point is no improvement). With no reason named the
 * original's own health statements are the reasons ({@link HazardLimit#defaults}).
 *
 * @param limits          the hazard limits
 * @param minFlashPointC  least component flash point, °C (null: no demand)
 * @param maxIchClass     mildest-but-one ICH Q3C class allowed, as {@link BlendConstraints#maxIchClass} (null: no demand)
 * @param boilingMinC     least component boiling point, °C (null: no demand)
 * @param boilingMaxC     greatest component boiling point, °C (null: no demand)
 * @param words           each reason in a line, e.g. "reprotoxic (H360D of N-methyl-2-pyrrolidone)"
 */
public record ReplacementReasons(List<HazardLimit> limits, Double minFlashPointC, Integer maxIchClass, Double boilingMinC,
        Double boilingMaxC, List<String> words) {

    /** The reasons a user can name, in the order they are offered. */
    public static final List<String> NAMES = List.of("reprotoxic", "carcinogen", "mutagen", "cmr", "organ", "toxic", "aspiration", "health",
            "ozone", "flammable", "ich", "high-boiling", "low-boiling");

    public ReplacementReasons {
        limits = List.copyOf(limits);
        words = List.copyOf(words);
    }

    /** Reasons as typed: each entry may hold several separated by commas; blanks are dropped. */
    public static List<String> split(List<String> typed) {
        List<String> out = new ArrayList<>();
        for (String b : typed) {
            for (String w : b.split(",")) {
                if (!w.isBlank()) {
                    out.add(w.strip());
                }
            }
        }
        return out;
    }

    /**
     * The reasons named for replacing {@code original} (none: its own health statements).
     *
     * @throws InvalidInputException naming {@code field} and the word, for an unknown reason or one the original does not have
     */
    public static ReplacementReasons of(String field, Solvent original, List<String> given) {
        List<HazardLimit> limits = new ArrayList<>();
        Double minFlash = null;
        Integer maxIch = null;
        Double bpMin = null;
        Double bpMax = null;
        List<String> words = new ArrayList<>();
        if (given.isEmpty()) {
            limits.addAll(HazardLimit.defaults(original));
        }
        for (String w : given) {
            List<String> kinds = HazardLimit.kindsOf(field, w);
            if (kinds != null) {
                for (HazardLimit h : HazardLimit.forReasons(field, original, kinds, w)) {
                    if (limits.stream().noneMatch(x -> x.kind().equals(h.kind()))) {
                        limits.add(h);
                    }
                }
                continue;
            }
            switch (w.toLowerCase(Locale.ROOT)) {
                case "flammable", "flammability" -> {
                    Integer cat = FlammableLiquidClass.ghs(original.flashPointC(), original.boilingPointC()).category();
                    if (cat == null) {
                        throw new InvalidInputException(field, w, original.name() + " is not a flammable liquid in the library (no flash point)");
                    }
                    // Strictly less flammable: the next GHS category boundary above the original's (Table 2.6.1).
                    minFlash = cat <= 2 ? 23.0 : cat == 3 ? 60.5 : 93.5;
                    words.add("flammable (GHS Category " + cat + " → components and blend flash point ≥ " + fmt(minFlash, 1) + " °C)");
                }
                case "ich", "ich-class" -> {
                    Integer ich = original.ichClass();
                    if (ich == null || ich == 3) {
                        throw new InvalidInputException(field, w, original.name() + " is " + (ich == null ? "not listed in ICH Q3C" : "already ICH Q3C class 3")
                                + ", so a milder class cannot be asked for");
                    }
                    maxIch = ich + 1;
                    words.add("ICH Q3C class " + ich + " (→ class " + maxIch + (maxIch < 3 ? " or milder" : "") + " only)");
                }
                case "high-boiling" -> {
                    requireBoilingPoint(field, original, w);
                    bpMax = original.boilingPointC() - 0.5;
                    words.add("high boiling point " + fmt(original.boilingPointC(), 0) + " °C (→ components boil lower)");
                }
                case "low-boiling" -> {
                    requireBoilingPoint(field, original, w);
                    bpMin = original.boilingPointC() + 0.5;
                    words.add("low boiling point " + fmt(original.boilingPointC(), 0) + " °C (→ components boil higher)");
                }
                default -> throw new InvalidInputException(field, w, "choose from " + String.join(", ", NAMES));
            }
        }
        List<String> all = new ArrayList<>();
        for (HazardLimit h : limits) {
            all.add(h.kind() + " (" + h.because() + ")");
        }
        all.addAll(words);
        return new ReplacementReasons(limits, minFlash, maxIch, bpMin, bpMax, all);
    }

    /**
     * The default reasons for replacing a blend: each component's own health statements ({@link HazardLimit#defaults}),
     * each kind at the level of its worst component. For one liquid this equals {@code of(field, liquid, List.of())}.
     */
    public static ReplacementReasons defaultsFor(List<Solvent> components) {
        java.util.Map<String, HazardLimit> worst = new java.util.LinkedHashMap<>();
        for (Solvent s : components) {
            for (HazardLimit h : HazardLimit.defaults(s)) {
                worst.merge(h.kind(), h, (a, n) -> n.level() > a.level() ? n : a);
            }
        }
        List<String> words = worst.values().stream().map(h -> h.kind() + " (" + h.because() + ")").toList();
        return new ReplacementReasons(List.copyOf(worst.values()), null, null, null, null, words);
    }

    private static void requireBoilingPoint(String field, Solvent s, String w) {
        if (s.boilingPointC() == null) {
            throw new InvalidInputException(field, w, s.name() + " has no boiling point in the library");
        }
    }

    /**
     * The constraints tightened by the reasons (a user's own limits stay when they are stricter).
     *
     * @param windowField named when the reasons and the boiling window leave no boiling point
     * @param field       named when the constraints refuse the reasons
     */
    public BlendConstraints applyTo(BlendConstraints c, String windowField, String field) {
        Double minFlash = stricter(minFlashPointC, c.minFlashPointC(), true);
        Integer ich = maxIchClass == null ? c.maxIchClass() : c.maxIchClass() == null ? maxIchClass : Integer.valueOf(Math.max(maxIchClass, c.maxIchClass()));
        Double bpMin = stricter(boilingMinC, c.boilingMinC(), true);
        Double bpMax = stricter(boilingMaxC, c.boilingMaxC(), false);
        if (bpMin != null && bpMax != null && bpMin > bpMax) {
            throw new InvalidInputException(windowField, fmt(bpMin, 0) + ".." + fmt(bpMax, 0), "the reasons and the window leave no boiling point");
        }
        BlendConstraints.More m = c.more();
        List<HazardLimit> all = new ArrayList<>(m.healthLimits());
        all.addAll(limits);
        try {
            return new BlendConstraints(c.include(), c.exclude(), c.families(), c.excludeFamilies(), c.fixed(), c.minFraction(), c.maxFraction(),
                    c.fractionRanges(), bpMin, bpMax, minFlash, ich, c.noCmr(), c.maxCost(),
                    new BlendConstraints.More(m.noIchClass1(), m.ichUnlistedAllowed(), all, m.excludeReactive(), m.minBlendFlashPointC(),
                            m.blendBoilingMinC(), m.blendBoilingMaxC(), m.withWater(), m.solute()));
        } catch (IllegalArgumentException e) {
            throw new InvalidInputException(field, String.join(",", words), e.getMessage());
        }
    }

    /** The stricter of two optional limits: the larger lower limit or the smaller upper limit. */
    private static Double stricter(Double a, Double b, boolean lower) {
        if (a == null) {
            return b;
        }
        if (b == null) {
            return a;
        }
        return lower ? Double.valueOf(Math.max(a, b)) : Double.valueOf(Math.min(a, b));
    }

    private static String fmt(double d, int decimals) {
        return String.format(Locale.ROOT, "%." + decimals + "f", d);
    }
}
