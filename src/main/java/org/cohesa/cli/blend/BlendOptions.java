package org.cohesa.cli.blend;

import org.cohesa.cli.Args;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.blend.BlendConstraints;
import org.cohesa.core.blend.BlendSearch;
import org.cohesa.core.blend.Desirability;
import org.cohesa.core.blend.ReactiveFlag;
import org.cohesa.core.blend.WaterCheck;
import org.cohesa.core.activity.WaterMiscibility;
import org.cohesa.core.activity.WaterSolubilityTable;
import org.cohesa.store.WaterMiscibilityCsv;
import org.cohesa.core.blend.RankBy;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.solvent.SolventLibrary;
import picocli.CommandLine.Option;
import org.cohesa.core.blend.ProcessUse;

/** The constraint and ranking options shared by {@code blend} and {@code replace}. */
public final class BlendOptions {

    @Option(names = "--max-components", paramLabel = "1..4", description = "Most components per blend, fixed ones included (default ${DEFAULT-VALUE}).")
    String maxComponents = "3";

    @Option(names = "--include", paramLabel = "NAMES", description = "Use only these solvents (repeat or separate with commas).")
    List<String> include = new ArrayList<>();

    @Option(names = "--exclude", paramLabel = "NAMES", description = "Never use these solvents (repeat or separate with commas).")
    List<String> exclude = new ArrayList<>();

    @Option(names = "--family", paramLabel = "FAMILIES", description = "Use only these chemical families, e.g. ester,alcohol.")
    List<String> family = new ArrayList<>();

    @Option(names = "--exclude-family", paramLabel = "FAMILIES", description = "Never use these chemical families.")
    List<String> excludeFamily = new ArrayList<>();

    @Option(names = "--fixed", paramLabel = "NAME:FRACTION", description = "Keep this solvent at this volume fraction in every blend (repeatable), e.g. water:0.2.")
    List<String> fixed = new ArrayList<>();

    @Option(names = "--min-fraction", paramLabel = "F", description = "Least volume fraction of any added component (default ${DEFAULT-VALUE}).")
    String minFraction = String.valueOf(BlendConstraints.DEFAULT_MIN_FRACTION);

    @Option(names = "--max-fraction", paramLabel = "F", description = "Largest volume fraction of any added component (default ${DEFAULT-VALUE}).")
    String maxFraction = "1";

    @Option(names = "--fraction-range", paramLabel = "NAME:MIN..MAX", description = "Volume-fraction range of one solvent when it is used (repeatable).")
    List<String> fractionRange = new ArrayList<>();

    @Option(names = "--boiling-range", paramLabel = "C..C", description = "Normal boiling point window, °C (either end may be left open, e.g. 60..).")
    String boilingRange;

    @Option(names = "--min-flash-point", paramLabel = "C", description = "Least closed-cup flash point of every component, °C.")
    String minFlashPoint;

    @Option(names = "--max-ich-class", paramLabel = "N", description = "Worst ICH Q3C class accepted (class 1 is the worst concern): 2 leaves out class 1, 3 leaves out classes 1 and 2.")
    String maxIchClass;

    @Option(names = "--no-cmr", description = "Leave out carcinogens, mutagens and reproductive toxicants (H340, H350, H360); the default, kept for scripts.")
    boolean noCmr;

    @Option(names = "--allow-cmr", description = "Let carcinogens, mutagens and reproductive toxicants (H340, H350, H360 and sub-categories) take part; left out by default.")
    boolean allowCmr;

    @Option(names = "--allow-ich-class-1", description = "Let ICH Q3C class 1 solvents (to be avoided: benzene, carbon tetrachloride…) take part; left out by default.")
    boolean allowIchClass1;

    @Option(names = "--ich-unlisted", paramLabel = "keep|leave-out", description = "With --max-ich-class: keep or leave out solvents ICH Q3C does not list (they need a justification under Q3C; default ${DEFAULT-VALUE}).")
    String ichUnlisted = "leave-out";

    @Option(names = "--allow-salt-formers", description = "Keep amine solvents for an acidic material and acid solvents for a basic one (by default they are left out: they form salts with it).")
    boolean allowSaltFormers;

    @Option(names = "--exclude-reactive", paramLabel = "FLAGS", description = "Leave out reactive solvents: acid (carboxylic acids), amine (amines, pyridines), nitro (nitroalkanes), peroxide (peroxide formers), dicarbonyl (acetoacetates, malonates: active methylene), enone (mesityl oxide, isophorone: Michael acceptors), all, or none (replace: keep the reactivities the original lacks, which it leaves out by default).")
    List<String> excludeReactive = new ArrayList<>();

    @Option(names = "--min-blend-flash-point", paramLabel = "C", description = "Least computed flash point of the blend itself, °C (Liaw et al. 2002); components may be lower.")
    String minBlendFlashPoint;

    @Option(names = "--blend-boiling-range", paramLabel = "C..C", description = "Window for the blend's computed initial boiling point (bubble point), °C; an end may be open.")
    String blendBoilingRange;

    @Option(names = "--prefer", paramLabel = "LEANING", description = "What weighs most in the ranking: safety, simplicity, cost or closeness (default: balanced; see docs/methods.md).")
    String prefer;

    @Option(names = "--weights", paramLabel = "NAME=W,...", description = "Expert: desirability weights hazard, components, cost, distance (e.g. hazard=2,components=1); unnamed ones keep the --prefer value.")
    String weights;

    @Option(names = "--with-water", paramLabel = "miscible|immiscible|any", description = "How the blend must behave with water: immiscible (separates at 1:1, an extraction solvent), miscible (one phase at every water content, a waterborne cosolvent) or any (no demand; replace otherwise keeps the original's own behaviour with water under --process as-original); measured mutual solubilities first, the activity model elsewhere.")
    String withWater;

    @Option(names = "--all", description = "Show the near-duplicates folded under each suggestion (same solvents but one, fractions within 5 %%).")
    boolean all;

    @Option(names = "--max-cost", paramLabel = "X", description = "Largest blend price per litre (uses your entered prices; solvents without a price are left out).")
    String maxCost;

    @Option(names = "--rank-by", paramLabel = "KEY", description = "desirability (the default: qualifying blends by one documented score), or red (closest to the centre first, the exact earlier behaviour), hazard, cost, components, evaporation.")
    String rankBy = "desirability";

    @Option(names = "--red-limit", paramLabel = "RED", description = "RED up to which a blend qualifies (desirability) or counts as good for the other keys (default 0.8: a margin of 0.2 from a material's sphere surface; replace around the original: 1.0, its radius already is the tolerance).")
    String redLimit;

    @Option(names = "--process", paramLabel = "USE", description = {
            "How the solvent must leave afterwards (a ranking term, docs/methods.md): general (blend default: it evaporates, RER ≥ 0.3, n-butyl acetate = 1),",
            "film (coatings, inks, adhesives drying in air: RER 0.2–6), workup (stripped after a reaction: boiling point 70–139 °C), cleaning (RER 0.3–8),",
            "as-original (replace default: within a factor of 3 of the original's RER) or any (no process term)."})
    String process;

    /** The limit used when --red-limit is not given (the commands set it: 0.8, or 1.0 around a replaced solvent). */
    private double defaultRedLimit = 0.8;

    @Option(names = "--top", paramLabel = "N", description = "How many suggestions (default ${DEFAULT-VALUE}).")
    String top = "10";

    @Option(names = "--temperature", paramLabel = "C", description = "Process temperature, °C (default ${DEFAULT-VALUE}): the solvents' Hansen parameters are shifted to it (Hansen–Beerbower; the target sphere is taken as measured) and the two-phase test runs at it.")
    String temperature = "25";

    @Option(names = "--keep-two-phase", description = "Show blends predicted to split into two liquid phases (with a warning) instead of leaving them out.")
    boolean keepTwoPhase;

    int maxComponents() {
        int k = Args.integer("--max-components", maxComponents);
        if (k < 1 || k > BlendSearch.MAX_COMPONENTS) {
            throw new InvalidInputException("--max-components", maxComponents, "must be 1, 2, 3 or 4");
        }
        return k;
    }

    int top() {
        int n = Args.integer("--top", top);
        if (n < 1 || n > 1000) {
            throw new InvalidInputException("--top", top, "must be 1 to 1000");
        }
        return n;
    }

    RankBy rankBy() {
        return RankBy.parse("--rank-by", rankBy);
    }

    /** Sets the limit used when the user gives none. */
    void defaultRedLimit(double limit) {
        defaultRedLimit = limit;
    }

    double redLimit() {
        if (redLimit == null) {
            return defaultRedLimit;
        }
        double r = Args.number("--red-limit", redLimit);
        if (!(r > 0) || r > 10) {
            throw new InvalidInputException("--red-limit", redLimit, "must be above 0 and at most 10");
        }
        return r;
    }

    double kelvin() {
        double c = Args.number("--temperature", temperature);
        if (c < -100 || c > 200) {
            throw new InvalidInputException("--temperature", temperature, "must lie between −100 and 200 °C");
        }
        return c + 273.15;
    }

    /**
     * The desirability weights: the preference's, then the expert's overrides, then the process use (--process, else
     * {@code dflt}); {@code original} is the replaced solvent (replace) or null (blend: no as-original use).
     */
    Desirability.Weights weights(ProcessUse dflt, org.cohesa.core.solvent.Solvent original) {
        Desirability.Weights base = prefer == null ? Desirability.DEFAULT : Desirability.Preference.parse("--prefer", prefer).weights();
        Desirability.Weights w = weights == null ? base : Desirability.parseWeights("--weights", weights, base);
        ProcessUse use = process == null ? dflt : ProcessUse.parse("--process", process, original != null);
        return w.withProcess(use, use == ProcessUse.AS_ORIGINAL ? ProcessUse.rate(original) : null);
    }

    /** The ranking settings as printed under --json. */
    BlendReport.Ranking ranking(org.cohesa.core.blend.BlendDesigner.Result r, Desirability.Weights w) {
        BlendReport.Process p = new BlendReport.Process(w.use().word(), w.use().meaning(), w.use().window(w.reference()), w.process(),
                w.processCounts());
        return new BlendReport.Ranking(rankBy().word(), preferWord(), w.describe(), redLimit(), BlendView.costNote(this, r), p);
    }

    /** Ranking or limiting by cost needs prices: with none in the library, say so in one line with the command that sets them. */
    void checkPricesExist(SolventLibrary lib) {
        boolean any = lib.all().stream().anyMatch(s -> s.pricePerLitre() != null);
        if (any) {
            return;
        }
        String why = "no solvent in the library has a price yet; set prices with 'cohesa solvents price NAME PRICE' (any currency)";
        if (maxCost != null) {
            throw new InvalidInputException("--max-cost", maxCost, why);
        }
        if (rankBy() == RankBy.COST) {
            throw new InvalidInputException("--rank-by", rankBy, why);
        }
    }

    /** The constraints with the solvents that form a salt with the material left out (unless --allow-salt-formers). */
    BlendConstraints forSolute(BlendConstraints c, org.cohesa.core.target.Material material) {
        if (material == null) {
            return c;
        }
        BlendConstraints out = allowSaltFormers ? c : c.with(c.more().withSolute(org.cohesa.store.MaterialStructures.characterOf(material)));
        if (material.semicrystalline()) {
            String clause = semicrystallineNote(material).replaceFirst("(?i)^semicrystalline:?\\s*", "");
            materialNotes.add("caution: " + material.name() + " is semicrystalline" + (clause.isEmpty() ? "" : " (" + clause + ")")
                    + ": its crystallites dissolve only near their melting range, so at " + org.cohesa.cli.Output.fmt(kelvin() - 273.15, 0)
                    + " °C the suggestions may only swell it; dissolve at the temperature you will use and search there with --temperature C");
        }
        Solvent water = c.include().stream().filter(WaterMiscibility::isWater).findFirst().orElse(null);
        boolean asked = water != null || c.fixed().stream().anyMatch(f -> WaterMiscibility.isWater(f.solvent()))
                || c.more().withWater() == WaterCheck.Need.MISCIBLE;
        boolean wouldTakePart = c.include().isEmpty(); // an include list without water leaves it out anyway
        if (!asked && wouldTakePart && waterEntry != null) {
            java.util.Optional<String> why = org.cohesa.core.blend.WaterInPolymer.reasonToLeaveOut(material, waterEntry);
            if (why.isPresent()) {
                out = out.alsoExcluding(waterEntry);
                materialNotes.add(why.get());
            }
        }
        return out;
    }

    /** The note's clause that says how the material dissolves ("semicrystalline: …", up to its first semicolon). */
    static String semicrystallineNote(org.cohesa.core.target.Material m) {
        String n = m.note();
        int at = n.toLowerCase(Locale.ROOT).indexOf(org.cohesa.core.target.Material.SEMICRYSTALLINE);
        int end = n.indexOf(';', at);
        return n.substring(at, end < 0 ? n.length() : end).strip();
    }

    /** The library's water entry, set by {@link #constraints} (null when the library has none). */
    private Solvent waterEntry;

    /** Lines about what the material's own nature left out (printed with the applied limits, and in JSON among them). */
    final List<String> materialNotes = new ArrayList<>();

    /** The applied limits as printed and in JSON: the constraints' own lines, then the material's. */
    List<String> appliedLimits(BlendConstraints c) {
        List<String> l = new ArrayList<>(BlendView.appliedLimits(c));
        l.addAll(materialNotes);
        return l;
    }

    /** The preference word shown in the output. */
    String preferWord() {
        return prefer == null ? Desirability.Preference.BALANCED.word() : Desirability.Preference.parse("--prefer", prefer).word();
    }

    /** True when the user asked for cost to weigh (ranking, preference, weight or limit). */
    boolean costAsked() {
        return maxCost != null || "cost".equalsIgnoreCase(rankBy == null ? "" : rankBy.strip()) || "cost".equalsIgnoreCase(prefer == null ? "" : prefer.strip())
                || (weights != null && weights.toLowerCase(Locale.ROOT).contains("cost"));
    }

    /** Builds the constraints with the command line's safety-first defaults; {@code alsoExclude} is left out too (the replaced solvent). */
    BlendConstraints constraints(SolventLibrary lib, Solvent alsoExclude) {
        BlendConstraints base = basicConstraints(lib, alsoExclude);
        waterEntry = lib.all().stream().filter(WaterMiscibility::isWater).findFirst().orElse(null);
        if (noCmr && allowCmr) {
            throw new InvalidInputException("--allow-cmr", "--no-cmr", "--no-cmr and --allow-cmr contradict each other");
        }
        String unl = ichUnlisted.strip().toLowerCase(Locale.ROOT);
        if (!unl.equals("keep") && !unl.equals("leave-out")) {
            throw new InvalidInputException("--ich-unlisted", ichUnlisted, "write keep or leave-out");
        }
        Set<ReactiveFlag> reactive = java.util.Objects.requireNonNullElse(reactiveNamed(), Set.of());
        Double minBlendFlash = minBlendFlashPoint == null ? null : Args.number("--min-blend-flash-point", minBlendFlashPoint);
        Double[] bb = range("--blend-boiling-range", blendBoilingRange);
        BlendConstraints c = new BlendConstraints(base.include(), base.exclude(), base.families(), base.excludeFamilies(), base.fixed(),
                base.minFraction(), base.maxFraction(), base.fractionRanges(), base.boilingMinC(), base.boilingMaxC(), base.minFlashPointC(),
                base.maxIchClass(), !allowCmr, base.maxCost());
        WaterCheck.Need water = null;
        if (withWater != null) {
            water = switch (withWater.strip().toLowerCase(Locale.ROOT)) {
                case "miscible" -> WaterCheck.Need.MISCIBLE;
                case "immiscible" -> WaterCheck.Need.IMMISCIBLE;
                case "any" -> null;
                default -> throw new InvalidInputException("--with-water", withWater, "write miscible, immiscible or any");
            };
        }
        return c.with(new BlendConstraints.More(!allowIchClass1, unl.equals("keep"), List.of(), reactive, minBlendFlash, bb[0], bb[1], water));
    }

    /** True when the user chose the weights: a --prefer, or a --weights that names components. */
    boolean preferenceNamed() {
        return prefer != null || (weights != null && weights.toLowerCase(Locale.ROOT).contains("components"));
    }

    /** True when the user named a water demand (any included), so replace does not add the original's own. */
    boolean waterDemandGiven() {
        return withWater != null;
    }

    /** The reactive flags --exclude-reactive names (empty for "none"), or null when it is not given (the default rule applies). */
    Set<ReactiveFlag> reactiveNamed() {
        if (excludeReactive.isEmpty()) {
            return null;
        }
        Set<ReactiveFlag> out = new LinkedHashSet<>();
        for (String r : excludeReactive) {
            out.addAll(ReactiveFlag.parse("--exclude-reactive", r));
        }
        return out;
    }

    /** True when the process use is the original's (replace's default, or named). */
    boolean processAsOriginal() {
        return process == null || ProcessUse.parse("--process", process, true) == ProcessUse.AS_ORIGINAL;
    }

    /** How the solvent alone behaves with water (published mutual solubilities first, the LLE model elsewhere); null when it cannot be judged. */
    static org.cohesa.core.activity.WaterBehaviour waterBehaviour(SolventLibrary lib, Solvent s, double kelvin) {
        Solvent water = lib.all().stream().filter(WaterMiscibility::isWater).findFirst().orElse(null);
        if (water == null || WaterMiscibility.isWater(s)) {
            return null;
        }
        try {
            return WaterMiscibility.withWater(List.of(s), new double[] {1.0}, water, kelvin, WaterMiscibilityCsv.bundled());
        } catch (IllegalArgumentException e) {
            return null;
        }
    }

    /** The water judgement for --with-water: published mutual solubilities (solvent-db/water-miscibility.csv), else the LLE model. */
    static WaterCheck waterCheck(SolventLibrary lib, BlendConstraints c) {
        if (c.more().withWater() == null) {
            return WaterCheck.NONE;
        }
        Solvent water = lib.all().stream().filter(WaterMiscibility::isWater).findFirst()
                .orElseThrow(() -> new InvalidInputException("--with-water", c.more().withWater().word(), "the library has no water entry to judge with"));
        WaterSolubilityTable data = WaterMiscibilityCsv.bundled();
        return (components, fractions, kelvin) -> {
            try {
                return WaterMiscibility.withWater(components, fractions, water, kelvin, data);
            } catch (IllegalArgumentException e) {
                return null; // not judged (missing data): does not meet the demand
            }
        };
    }

    /** "60..120", "60..", "..120" → {min, max}; null text → {null, null}. */
    static Double[] range(String field, String text) {
        if (text == null) {
            return new Double[] {null, null};
        }
        String[] parts = text.split("\\.\\.", -1);
        if (parts.length != 2 || (parts[0].isBlank() && parts[1].isBlank())) {
            throw new InvalidInputException(field, text, "write MIN..MAX in °C, e.g. 60..120 (an end may be open: 60..)");
        }
        Double lo = parts[0].isBlank() ? null : Args.number(field, parts[0].strip());
        Double hi = parts[1].isBlank() ? null : Args.number(field, parts[1].strip());
        if (lo != null && hi != null && lo > hi) {
            throw new InvalidInputException(field, text, "the lower end is above the upper end");
        }
        return new Double[] {lo, hi};
    }

    private BlendConstraints basicConstraints(SolventLibrary lib, Solvent alsoExclude) {
        List<Solvent> inc = lib.resolveList("--include", include);
        List<Solvent> exc = new ArrayList<>(lib.resolveList("--exclude", exclude));
        if (alsoExclude != null && !exc.contains(alsoExclude)) {
            exc.add(alsoExclude);
        }
        Set<String> fams = families(lib, "--family", family);
        Set<String> excFams = families(lib, "--exclude-family", excludeFamily);
        List<BlendComponent> fixedComponents = new ArrayList<>();
        for (String f : fixed) {
            int colon = f.lastIndexOf(':');
            if (colon <= 0) {
                throw new InvalidInputException("--fixed", f, "write NAME:FRACTION, e.g. water:0.2");
            }
            Solvent s = lib.resolve("--fixed", f.substring(0, colon).strip());
            double frac = fraction("--fixed", f, f.substring(colon + 1).strip());
            if (frac <= 0 || frac >= 1) {
                throw new InvalidInputException("--fixed", f, "the fraction must lie between 0 and 1 (exclusive)");
            }
            if (fixedComponents.stream().anyMatch(c -> c.solvent().equals(s))) {
                throw new InvalidInputException("--fixed", f, s.name() + " is fixed twice");
            }
            if (exc.contains(s)) {
                throw new InvalidInputException("--fixed", f, s.name() + " is also excluded");
            }
            fixedComponents.add(new BlendComponent(s, frac));
        }
        double fixedSum = fixedComponents.stream().mapToDouble(BlendComponent::fraction).sum();
        if (fixedSum >= 1 - 1e-9) {
            throw new InvalidInputException("--fixed", String.join(" ", fixed), "fixed fractions must leave room for the search (they sum to " + fixedSum + ")");
        }
        double min = fraction("--min-fraction", minFraction, minFraction);
        double max = fraction("--max-fraction", maxFraction, maxFraction);
        if (min >= 1) {
            throw new InvalidInputException("--min-fraction", minFraction, "must be below 1");
        }
        if (max <= 0 || max < min) {
            throw new InvalidInputException("--max-fraction", maxFraction, "must be above 0 and not below --min-fraction " + minFraction);
        }
        Map<Solvent, double[]> ranges = new LinkedHashMap<>();
        for (String r : fractionRange) {
            int colon = r.lastIndexOf(':');
            String[] mm = colon > 0 ? r.substring(colon + 1).split("\\.\\.", -1) : new String[0];
            if (mm.length != 2) {
                throw new InvalidInputException("--fraction-range", r, "write NAME:MIN..MAX, e.g. ethanol:0.1..0.4");
            }
            Solvent s = lib.resolve("--fraction-range", r.substring(0, colon).strip());
            double lo = fraction("--fraction-range", r, mm[0].strip());
            double hi = fraction("--fraction-range", r, mm[1].strip());
            if (lo > hi) {
                throw new InvalidInputException("--fraction-range", r, "MIN is above MAX");
            }
            ranges.put(s, new double[] {lo, hi});
        }
        Double bpMin = null;
        Double bpMax = null;
        if (boilingRange != null) {
            String[] parts = boilingRange.split("\\.\\.", -1);
            if (parts.length != 2 || (parts[0].isBlank() && parts[1].isBlank())) {
                throw new InvalidInputException("--boiling-range", boilingRange, "write MIN..MAX in °C, e.g. 60..120 (an end may be open: 60..)");
            }
            bpMin = parts[0].isBlank() ? null : Args.number("--boiling-range", parts[0].strip());
            bpMax = parts[1].isBlank() ? null : Args.number("--boiling-range", parts[1].strip());
            if (bpMin != null && bpMax != null && bpMin > bpMax) {
                throw new InvalidInputException("--boiling-range", boilingRange, "the lower end is above the upper end");
            }
        }
        Double flash = minFlashPoint == null ? null : Args.number("--min-flash-point", minFlashPoint);
        Integer ich = null;
        if (maxIchClass != null) {
            ich = Args.integer("--max-ich-class", maxIchClass);
            if (ich < 1 || ich > 3) {
                throw new InvalidInputException("--max-ich-class", maxIchClass, "ICH Q3C classes are 1, 2 and 3");
            }
        }
        Double cost = null;
        if (maxCost != null) {
            cost = Args.number("--max-cost", maxCost);
            if (cost < 0) {
                throw new InvalidInputException("--max-cost", maxCost, "must be ≥ 0");
            }
        }
        try {
            return new BlendConstraints(inc, exc, fams, excFams, fixedComponents, min, max, ranges, bpMin, bpMax, flash, ich, noCmr, cost);
        } catch (IllegalArgumentException e) {
            throw new InvalidInputException("constraints", String.join(" ", fixed), e.getMessage());
        }
    }

    private static Set<String> families(SolventLibrary lib, String field, List<String> values) {
        return lib.familyKeys(field, values);
    }

    /** A fraction written as 0.2 or 20%. */
    static double fraction(String field, String whole, String text) {
        String t = text.strip();
        boolean pct = t.endsWith("%");
        double v;
        try {
            v = Double.parseDouble(pct ? t.substring(0, t.length() - 1) : t);
        } catch (NumberFormatException e) {
            throw new InvalidInputException(field, whole, "'" + text + "' is not a fraction (write 0.2 or 20%)");
        }
        if (pct) {
            v /= 100;
        }
        if (!(v >= 0 && v <= 1)) {
            throw new InvalidInputException(field, whole, "a fraction must lie between 0 and 1, got " + text);
        }
        return v;
    }
}
