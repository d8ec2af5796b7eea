package org.cohesa.desktop.blend;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.SimpleBooleanProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.blend.BlendConstraints;
import org.cohesa.core.blend.BlendDesigner;
import org.cohesa.core.blend.BlendSuggestion;
import org.cohesa.core.blend.CancellationToken;
import org.cohesa.core.blend.MeasuredFirstPhaseCheck;
import org.cohesa.core.blend.PhaseCheck;
import org.cohesa.core.blend.RankBy;
import org.cohesa.core.blend.HazardLimit;
import org.cohesa.core.blend.ReactiveExclusion;
import org.cohesa.core.blend.ReactiveFlag;
import org.cohesa.core.blend.ReplacementReasons;
import org.cohesa.core.blend.SoluteCharacter;
import org.cohesa.core.blend.WaterCheck;
import org.cohesa.core.blend.WaterInPolymer;
import org.cohesa.core.activity.WaterMiscibility;
import org.cohesa.core.activity.WaterSolubilityTable;
import org.cohesa.store.WaterMiscibilityCsv;
import org.cohesa.core.safety.SafetyProfile;
import org.cohesa.core.safety.SafetyProfiler;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.solvent.SolventLibrary;
import org.cohesa.desktop.common.Session;
import org.cohesa.desktop.common.TargetChoice;

/**
 * View-model of the blend-design screen: the constraints as text and choices (validated into
 * {@link BlendConstraints} when the search starts), the search ({@link BlendDesigner}) off the FX thread with
 * progress and cancel, and the ranked suggestions each with its safety profile ({@link SafetyProfiler}).
 */
public final class BlendModel {

    /** One suggestion with its safety profile (null when the profile could not be computed). */
    public record Row(int rank, BlendSuggestion suggestion, SafetyProfile safety, String safetyProblem) {
        public org.cohesa.core.solvent.Blend blend() {
            return suggestion.blend().blend();
        }
    }

    private final Session session;
    public final ObjectProperty<Integer> maxComponents = new SimpleObjectProperty<>(3);
    public final ObjectProperty<Integer> top = new SimpleObjectProperty<>(20);
    public final ObjectProperty<RankBy> rankBy = new SimpleObjectProperty<>(RankBy.DESIRABILITY); // as the command line
    /** How the liquid leaves the process (the desirability's process term); {@code general} as `cohesa blend`. */
    public final ObjectProperty<org.cohesa.core.blend.ProcessUse> process = new SimpleObjectProperty<>(org.cohesa.core.blend.ProcessUse.GENERAL);
    public final StringProperty include = new SimpleStringProperty("");
    public final StringProperty exclude = new SimpleStringProperty("");
    public final StringProperty fixed = new SimpleStringProperty("");
    public final StringProperty minFractionPercent = new SimpleStringProperty("5");
    public final StringProperty boilingMin = new SimpleStringProperty("");
    public final StringProperty boilingMax = new SimpleStringProperty("");
    public final StringProperty minFlashPoint = new SimpleStringProperty("");
    public final ObjectProperty<String> maxIchClass = new SimpleObjectProperty<>("any");
    public final BooleanProperty noCmr = new SimpleBooleanProperty(true);
    public final StringProperty maxCost = new SimpleStringProperty("");
    public final StringProperty redLimit = new SimpleStringProperty("0.8"); // as the command line: a margin of 0.2 from the surface
    public final StringProperty temperatureC = new SimpleStringProperty("25");
    /** Only solvents of these families (any of a solvent's families counts), "a; b". */
    public final StringProperty families = new SimpleStringProperty("");
    /** Never solvents of these families (any of a solvent's families counts), "a; b". */
    public final StringProperty excludeFamilies = new SimpleStringProperty("");
    /** Process-suitability flags to leave out (reactive solvents). */
    public final java.util.Map<ReactiveFlag, BooleanProperty> excludeReactive = new java.util.EnumMap<>(ReactiveFlag.class);
    /**
     * In a case that replaces a liquid, under "as the replaced liquid" and with no reactive box ticked: leave out every
     * reactivity the replaced liquid lacks (on by default, as `cohesa replace`; off is its {@code --exclude-reactive none}).
     */
    public final BooleanProperty reactiveAsReplaced = new SimpleBooleanProperty(true);
    /**
     * In a case that replaces a liquid: the reasons named for replacing it ({@link ReplacementReasons}, the rule of
     * {@code cohesa replace --because}), reason word → ticked. None ticked: the liquid's own health statements.
     */
    public final java.util.Map<String, BooleanProperty> replacedBecause = new java.util.LinkedHashMap<>();
    /**
     * How the blend must behave with water: {@link #WATER_ANY}, {@link #WATER_SEPARATES}, {@link #WATER_MIXES} or
     * {@link #WATER_NOT_EVEN_AS_REPLACED} (no demand, and a replacement case drops the replaced liquid's own, as
     * {@code cohesa replace --with-water any}).
     */
    public final ObjectProperty<String> withWater = new SimpleObjectProperty<>(WATER_ANY);
    /** Least computed flash point of the blend itself, °C (components may be lower). */
    public final StringProperty minBlendFlash = new SimpleStringProperty("");
    /** Let ICH Q3C class 1 solvents take part (left out by default, as on the command line). */
    public final BooleanProperty allowIchClass1 = new SimpleBooleanProperty(false);
    /**
     * Let amine solvents take part for an acidic material and carboxylic acids for a basic one (left out by default,
     * as on the command line without {@code --allow-salt-formers}: they form a salt with it, they do not dissolve it).
     */
    public final BooleanProperty allowSaltFormers = new SimpleBooleanProperty(false);
    private final StringProperty searchNote = new SimpleStringProperty("");
    private final ObservableList<String> leftOutBySafety = FXCollections.observableArrayList();
    private final ObservableList<Row> rows = FXCollections.observableArrayList();
    private final ObservableList<Row> compared = FXCollections.observableArrayList();
    private CancellationToken cancel;

    public static final String WATER_ANY = "no demand";
    public static final String WATER_SEPARATES = "separates from water (extraction)";
    public static final String WATER_MIXES = "mixes with water (waterborne)";
    public static final String WATER_NOT_EVEN_AS_REPLACED = "no demand, not even the replaced liquid's";

    public BlendModel(Session session) {
        this.session = session;
        for (ReactiveFlag f : ReactiveFlag.values()) {
            excludeReactive.put(f, new SimpleBooleanProperty(false));
        }
        for (String w : REASON_LABELS.keySet()) {
            replacedBecause.put(w, new SimpleBooleanProperty(false));
        }
        // a case that replaces a liquid ranks by leaving the process as that liquid does, as `cohesa replace` does
        session.replacingProperty().addListener((o, a, r) -> process.set(r == null || r.isBlank()
                ? org.cohesa.core.blend.ProcessUse.GENERAL : org.cohesa.core.blend.ProcessUse.AS_ORIGINAL));
        // suggestions belong to the target they were searched for: a new target (picked, fitted, typed) clears them
        session.targetProperty().addListener((o, a, t) -> {
            rows.clear();
            compared.clear();
            searchNote.set("");
            leftOutBySafety.clear();
            // as `cohesa blend`: a semicrystalline polymer is dissolved hot and dried hot or coagulated, so no evaporation
            // window by default (ProcessUse.defaultFor); a use the user chose, and a replacement case's "as the replaced
            // liquid", stay
            String replacing = session.replacingProperty().get();
            if (t != null && (replacing == null || replacing.isBlank()) && process.get() == defaultUse(a)) {
                process.set(defaultUse(t));
            }
        });
        session.jobs().runningProperty().addListener((o, a, running) -> {
            if (!running && cancel != null) {
                cancel = null;
            }
        });
    }

    public Session session() {
        return session;
    }

    public ObservableList<Row> rows() {
        return rows;
    }

    /** Up to four suggestions shown side by side. */
    public ObservableList<Row> compared() {
        return compared;
    }

    /** What the last search searched and left out, in one paragraph (empty before a search). */
    public StringProperty searchNoteProperty() {
        return searchNote;
    }

    /** What the safety-first defaults (no CMR, no ICH class 1) left out of the last search, one line per default. */
    public ObservableList<String> leftOutBySafety() {
        return leftOutBySafety;
    }

    /** The form as field key → text, as a case stores it. */
    public java.util.Map<String, String> limits() {
        java.util.Map<String, String> m = new java.util.LinkedHashMap<>();
        m.put("max-components", String.valueOf(maxComponents.get()));
        m.put("top", String.valueOf(top.get()));
        m.put("rank-by", rankBy.get().name());
        m.put("process", process.get().word());
        m.put("include", include.get());
        m.put("exclude", exclude.get());
        m.put("families", families.get());
        m.put("exclude-families", excludeFamilies.get());
        m.put("fixed", fixed.get());
        m.put("min-fraction", minFractionPercent.get());
        m.put("bp-min", boilingMin.get());
        m.put("bp-max", boilingMax.get());
        m.put("min-flash", minFlashPoint.get());
        m.put("min-blend-flash", minBlendFlash.get());
        m.put("ich", maxIchClass.get());
        m.put("allow-ich-class-1", String.valueOf(allowIchClass1.get()));
        m.put("no-cmr", String.valueOf(noCmr.get()));
        m.put("allow-salt-formers", String.valueOf(allowSaltFormers.get()));
        m.put("max-cost", maxCost.get());
        m.put("red-limit", redLimit.get());
        m.put("temperature", temperatureC.get());
        m.put("with-water", withWater.get());
        m.put("exclude-reactive", excludeReactive.entrySet().stream().filter(e -> e.getValue().get()).map(e -> e.getKey().word())
                .collect(java.util.stream.Collectors.joining(",")));
        // only a case that replaces a liquid has the rule: elsewhere it is no limit at all
        m.put("reactive-as-replaced", replacing() ? String.valueOf(reactiveAsReplaced.get()) : "");
        m.put("replaced-because", replacing() ? String.join(",", tickedReasons()) : "");
        return m;
    }

    /** Puts stored limits back into the form; keys it does not know are ignored, missing ones keep the form's value. */
    public void applyLimits(java.util.Map<String, String> m) {
        java.util.function.BiConsumer<String, StringProperty> text = (k, p) -> {
            if (m.containsKey(k)) {
                p.set(m.get(k) == null ? "" : m.get(k));
            }
        };
        integer(m.get("max-components"), 1, 4, maxComponents);
        integer(m.get("top"), 1, 100, top);
        if (m.get("rank-by") != null) {
            java.util.Arrays.stream(RankBy.values()).filter(r -> r.name().equals(m.get("rank-by"))).findFirst().ifPresent(rankBy::set);
        }
        if (m.get("process") != null) {
            java.util.Arrays.stream(org.cohesa.core.blend.ProcessUse.values()).filter(u -> u.word().equals(m.get("process")))
                    .findFirst().ifPresent(process::set);
        }
        text.accept("include", include);
        text.accept("exclude", exclude);
        text.accept("families", families);
        text.accept("exclude-families", excludeFamilies);
        text.accept("fixed", fixed);
        text.accept("min-fraction", minFractionPercent);
        text.accept("bp-min", boilingMin);
        text.accept("bp-max", boilingMax);
        text.accept("min-flash", minFlashPoint);
        text.accept("min-blend-flash", minBlendFlash);
        text.accept("max-cost", maxCost);
        text.accept("red-limit", redLimit);
        text.accept("temperature", temperatureC);
        if (m.get("ich") != null) {
            maxIchClass.set(m.get("ich"));
        }
        if (m.get("with-water") != null) {
            withWater.set(m.get("with-water"));
        }
        if (m.get("allow-ich-class-1") != null) {
            allowIchClass1.set(Boolean.parseBoolean(m.get("allow-ich-class-1")));
        }
        if (m.get("no-cmr") != null) {
            noCmr.set(Boolean.parseBoolean(m.get("no-cmr")));
        }
        if (m.get("allow-salt-formers") != null) {
            allowSaltFormers.set(Boolean.parseBoolean(m.get("allow-salt-formers")));
        }
        if (m.get("reactive-as-replaced") != null && !m.get("reactive-as-replaced").isBlank()) {
            reactiveAsReplaced.set(Boolean.parseBoolean(m.get("reactive-as-replaced")));
        }
        if (m.get("exclude-reactive") != null) {
            java.util.Set<String> on = java.util.Set.of(m.get("exclude-reactive").split(","));
            excludeReactive.forEach((f, p) -> p.set(on.contains(f.word())));
        }
        if (m.get("replaced-because") != null) {
            java.util.Set<String> on = java.util.Set.copyOf(ReplacementReasons.split(List.of(m.get("replaced-because"))));
            replacedBecause.forEach((w, p) -> p.set(on.contains(w)));
        }
    }

    private static void integer(String text, int lo, int hi, ObjectProperty<Integer> p) {
        try {
            if (text != null) {
                int v = Integer.parseInt(text.strip());
                if (v >= lo && v <= hi) {
                    p.set(v);
                }
            }
        } catch (NumberFormatException e) {
            // a damaged stored value keeps the form's own
        }
    }

    /**
     * The default weights with the form's process use. "As the replaced liquid" measures from the rate of the liquid
     * the case replaces (its largest component when it is a blend), as `cohesa replace` does; without one it falls
     * back on {@code general}.
     */
    public org.cohesa.core.blend.Desirability.Weights processWeights(SolventLibrary lib) {
        org.cohesa.core.blend.ProcessUse use = process.get();
        if (use != org.cohesa.core.blend.ProcessUse.AS_ORIGINAL) {
            return org.cohesa.core.blend.Desirability.DEFAULT.withProcess(use, null);
        }
        org.cohesa.core.solvent.Solvent original = replacedMainComponent(lib);
        org.cohesa.core.blend.ProcessUse.Rate rate = original == null ? null : org.cohesa.core.blend.ProcessUse.rate(original);
        return rate == null ? org.cohesa.core.blend.Desirability.DEFAULT.withProcess(org.cohesa.core.blend.ProcessUse.GENERAL, null)
                : org.cohesa.core.blend.Desirability.DEFAULT.withProcess(use, rate)
                        .withComponents(org.cohesa.core.blend.Desirability.REPLACE_COMPONENTS);
    }

    /** The liquid the case replaces, resolved in the library; null when it replaces nothing or the liquid is no longer there. */
    private org.cohesa.core.solvent.Blend replacedLiquid(SolventLibrary lib) {
        String text = session.replacingProperty().get();
        if (text == null || text.isBlank()) {
            return null;
        }
        try {
            return text.contains(":") ? lib.resolveBlend("replaced liquid", text)
                    : org.cohesa.core.solvent.Blend.pure(lib.resolve("replaced liquid", text.strip()));
        } catch (IllegalArgumentException e) {
            return null;
        }
    }

    /** The replaced liquid's largest component (the reference for its rate), or null. */
    private org.cohesa.core.solvent.Solvent replacedMainComponent(SolventLibrary lib) {
        org.cohesa.core.solvent.Blend b = replacedLiquid(lib);
        return b == null ? null : b.components().stream().max(java.util.Comparator.comparingDouble(org.cohesa.core.solvent.BlendComponent::fraction))
                .map(org.cohesa.core.solvent.BlendComponent::solvent).orElse(null);
    }

    /**
     * The reasons a case that replaces a liquid is made for, by the command line's rule ({@link ReplacementReasons}, as
     * {@code cohesa replace --because}): the ticked reasons, judged on the replaced liquid (its largest component when it is
     * a blend, as the process rate); with none ticked, its own health statements ({@link HazardLimit#defaults}, as without
     * {@code --because}), for a replaced blend each kind at the level of its worst component. Null when the case replaces
     * nothing or the liquid is no longer in the library.
     *
     * @throws InvalidInputException naming "replaced because" when a ticked reason does not apply to the liquid
     */
    ReplacementReasons replacementReasons(SolventLibrary lib) {
        org.cohesa.core.solvent.Blend b = replacedLiquid(lib);
        if (b == null) {
            return null;
        }
        List<String> ticked = tickedReasons();
        return ticked.isEmpty() ? ReplacementReasons.defaultsFor(b.components().stream().map(org.cohesa.core.solvent.BlendComponent::solvent).toList())
                : ReplacementReasons.of(REASONS_FIELD, replacedMainComponent(lib), ticked);
    }

    /** The field the reasons are named under in messages. */
    public static final String REASONS_FIELD = "replaced because";

    /** The reasons offered in the form (words of {@link ReplacementReasons#NAMES}) with their labels, in our words. */
    public static final java.util.Map<String, String> REASON_LABELS = reasonLabels();

    private static java.util.Map<String, String> reasonLabels() {
        java.util.Map<String, String> m = new java.util.LinkedHashMap<>();
        m.put("reprotoxic", "harms fertility or the unborn");
        m.put("carcinogen", "may cause cancer");
        m.put("mutagen", "damages genes");
        m.put("organ", "damages organs");
        m.put("toxic", "toxic");
        m.put("aspiration", "aspiration hazard");
        m.put("ozone", "harms the ozone layer");
        m.put("flammable", "too flammable");
        m.put("ich", "needs a milder ICH class");
        m.put("high-boiling", "boils too high");
        m.put("low-boiling", "boils too low");
        return java.util.Collections.unmodifiableMap(m);
    }

    /** The ticked reasons' words, in the form's order. */
    List<String> tickedReasons() {
        return replacedBecause.entrySet().stream().filter(e -> e.getValue().get()).map(java.util.Map.Entry::getKey).toList();
    }

    /** What the reasons ask now, in one line beside them (empty when the case replaces nothing). */
    public String reasonsRuleText() {
        if (!replacing()) {
            return "";
        }
        ReplacementReasons r;
        try {
            r = replacementReasons(new SolventLibrary(List.copyOf(session.solvents())));
        } catch (InvalidInputException e) {
            return e.reason();
        }
        if (r == null) {
            return "The replaced liquid is not in the library: no reason can be judged.";
        }
        String head = tickedReasons().isEmpty() ? "None ticked: its own health statements" : "Ticked";
        return r.words().isEmpty() ? head + ": it carries no CMR, organ-damage or acute-toxicity statement above \"harmful\", so nothing is asked."
                : head + ", so no candidate is as bad on: " + String.join("; ", r.words()) + ".";
    }

    /** The liquid the case replaces when it is a single library solvent (not a blend), else null. */
    private Solvent replacedSingleLiquid(SolventLibrary lib) {
        org.cohesa.core.solvent.Blend b = replacedLiquid(lib);
        return b != null && b.components().size() == 1 ? b.components().get(0).solvent() : null;
    }

    /** Runs the search against the current target. @throws InvalidInputException naming the first bad field */
    public void search(Runnable then) {
        TargetChoice target = session.target();
        if (target == null) {
            throw new InvalidInputException("target", "", "set a target first (target screen: pick a material, fit or type in a sphere)");
        }
        SolventLibrary lib = new SolventLibrary(List.copyOf(session.solvents()));
        Set<SoluteCharacter> character = soluteCharacter();
        double kelvin = number("temperature", temperatureC.get(), 25.0) + 273.15;
        List<String> waterRules = new ArrayList<>();
        BlendConstraints ruled = reactivityRule(lib, waterRules(lib, forSolute(constraints(lib), character), kelvin, waterRules), waterRules);
        // as `cohesa replace`: the liquid being replaced is no candidate for its own replacement
        Solvent replaced = replacedSingleLiquid(lib);
        if (replaced != null && !ruled.exclude().contains(replaced)) {
            ruled = ruled.alsoExcluding(replaced);
            waterRules.add("the replaced liquid itself (" + replaced.name() + ") is no candidate");
        }
        // as `cohesa replace`: the ticked reasons, or without any every CMR, organ-damage and acute-toxicity statement of
        // the replaced liquid (category 4 "harmful" alone excepted), and no candidate as bad on one takes part
        ReplacementReasons reasons = replacementReasons(lib);
        if (reasons != null) {
            ruled = reasons.applyTo(ruled, "boiling point min./max.", REASONS_FIELD);
            for (HazardLimit h : reasons.limits()) {
                waterRules.add("replaced for " + h.kind() + " (" + h.because() + "): no candidate carries the same or a worse statement of that kind");
            }
            for (String w : reasons.words().subList(reasons.limits().size(), reasons.words().size())) {
                waterRules.add("replaced for " + w);
            }
        }
        BlendConstraints c = ruled;
        int k = maxComponents.get();
        if (c.fixed().size() >= k) {
            throw new InvalidInputException("most components", String.valueOf(k), "must exceed the number of fixed components");
        }
        double limit = positive("RED limit", redLimit.get(), 1.0);
        BlendDesigner.Request req = new BlendDesigner.Request(target.sphere(), c, k, top.get(), rankBy.get(), limit, false, kelvin,
                processWeights(lib));
        CancellationToken token = new CancellationToken();
        cancel = token;
        Object[] notes = new Object[2];
        boolean allowed = allowSaltFormers.get();
        WaterCheck water = waterCheck(lib, c.more().withWater());
        session.jobs().run("Searching blends", p -> {
            Thread watcher = new Thread(() -> {
                while (!token.isCancelled()) {
                    if (p.isCancelled()) {
                        token.cancel();
                    }
                    try {
                        Thread.sleep(100);
                    } catch (InterruptedException e) {
                        return;
                    }
                }
            }, "blend-cancel-watch");
            watcher.setDaemon(true);
            watcher.start();
            try {
                BlendDesigner.Result r = BlendDesigner.design(lib.all(), req, miscibility(), water,
                        (done, total) -> p.update(total == 0 ? -1 : 0.9 * done / (double) total, null), token);
                List<Row> out = new ArrayList<>();
                notes[0] = SearchNotes.summary(r, c);
                // the material's own rule first: the safety defaults' lists are the same for every search
                List<String> defaults = new ArrayList<>(SearchNotes.saltFormers(r.pool(), target.name(), character, allowed));
                defaults.addAll(waterRules);
                defaults.addAll(SearchNotes.safetyDefaults(r.pool()));
                notes[1] = defaults;
                int i = 1;
                for (BlendSuggestion s : r.suggestions()) {
                    if (p.isCancelled()) {
                        break;
                    }
                    p.update(0.9 + 0.1 * i / Math.max(1, r.suggestions().size()), "Safety profile of suggestion " + i + "…");
                    SafetyProfile safety = null;
                    String problem = null;
                    try {
                        safety = SafetyProfiler.profile(s.blend().blend(), kelvin);
                    } catch (RuntimeException e) {
                        problem = e.getMessage();
                    }
                    out.add(new Row(i++, s, safety, problem));
                }
                return out;
            } finally {
                token.cancel();
            }
        }, out -> {
            searchNote.set((String) notes[0]);
            @SuppressWarnings("unchecked")
            List<String> defaults = (List<String>) notes[1];
            leftOutBySafety.setAll(defaults);
            rows.setAll(out);
            compared.clear();
            session.jobs().say(out.size() + " candidates for " + target.name() + (out.isEmpty() ? ": loosen the constraints." : "."));
            if (then != null) {
                then.run();
            }
        });
    }

    /** The target's acid–base character from its structure, as the command line reads a material's (empty: none or unknown). */
    public Set<SoluteCharacter> soluteCharacter() {
        return TargetStructure.characterOf(session.target(), List.copyOf(session.materials()));
    }

    /** True when a structure is known for the target (so "neither acidic nor basic" means something). */
    public boolean targetHasStructure() {
        return TargetStructure.hasStructure(session.target(), List.copyOf(session.materials()));
    }

    /**
     * The constraints with the solvents that form a salt with the material left out, unless the switch allows them:
     * the same core rule as the command line's (BlendConstraints.More.withSolute, applied by CandidatePool).
     */
    BlendConstraints forSolute(BlendConstraints c, Set<SoluteCharacter> character) {
        return allowSaltFormers.get() || character.isEmpty() ? c : c.with(c.more().withSolute(character));
    }

    /**
     * The command line's two water rules, from the same core code: water is no component for a polymer or resin it does
     * not dissolve ({@link WaterInPolymer}) unless the user names it (Include only, Fixed) or asks for a blend that mixes
     * with water; and a case that replaces a liquid under "as the replaced liquid" asks every candidate to behave with
     * water as that liquid does (separate for an extraction, mix for a water-miscible process), unless "With water" is set.
     * Each rule applied adds its line to {@code notes}.
     */
    BlendConstraints waterRules(SolventLibrary lib, BlendConstraints c, double kelvin, List<String> notes) {
        Solvent water = lib.all().stream().filter(WaterMiscibility::isWater).findFirst().orElse(null);
        TargetChoice t = session.target();
        if (water == null || t == null) {
            return c;
        }
        boolean asked = c.include().stream().anyMatch(WaterMiscibility::isWater)
                || c.fixed().stream().anyMatch(f -> WaterMiscibility.isWater(f.solvent()))
                || c.more().withWater() == WaterCheck.Need.MISCIBLE;
        BlendConstraints out = c;
        if (!asked) {
            java.util.Optional<String> why = WaterInPolymer.reasonToLeaveOut(TargetStructure.materialOf(t, List.copyOf(session.materials())), water);
            if (why.isPresent()) {
                out = out.alsoExcluding(water);
                notes.add(why.get().replaceFirst("\\(docs/methods\\.md;.*\\)$",
                        "(docs/methods.md; naming water under Include only or Fixed, or With water: " + WATER_MIXES + ", keeps it)"));
            }
        }
        Solvent original = process.get() == org.cohesa.core.blend.ProcessUse.AS_ORIGINAL ? replacedMainComponent(lib) : null;
        if (out.more().withWater() == null && !WATER_NOT_EVEN_AS_REPLACED.equals(withWater.get()) && original != null
                && !WaterMiscibility.isWater(original)) {
            org.cohesa.core.activity.WaterBehaviour wb;
            try {
                wb = WaterMiscibility.withWater(List.of(original), new double[] {1.0}, water, kelvin, WaterMiscibilityCsv.bundled());
            } catch (IllegalArgumentException e) {
                wb = null; // no judgement possible for the replaced liquid: no water demand
            }
            WaterCheck.Need need = wb == null ? null : switch (wb.kind()) {
                case IMMISCIBLE -> WaterCheck.Need.IMMISCIBLE;
                case MISCIBLE -> WaterCheck.Need.MISCIBLE;
                case PARTLY_MISCIBLE -> null;
            };
            if (need != null) {
                out = out.with(out.more().withWater(need));
                notes.add("with water as the replaced liquid: " + original.name() + " is " + wb.kind().label() + " with water (" + wb.detail()
                        + "), so every candidate must be too (With water: \"" + WATER_NOT_EVEN_AS_REPLACED
                        + "\" drops this, or Leaves the process by another use)");
            }
        }
        return out;
    }

    /**
     * The reactive solvents to leave out, by the command line's rule from the same core code ({@link ReactiveExclusion}): ticked
     * boxes decide; with none ticked, a case that replaces a liquid under "as the replaced liquid" leaves out every reactivity
     * that liquid lacks (an acid, a base, a nitroalkane, an active methylene, a Michael acceptor) unless the switch is off.
     */
    ReactiveExclusion reactiveExclusion(SolventLibrary lib) {
        Set<ReactiveFlag> ticked = java.util.EnumSet.noneOf(ReactiveFlag.class);
        excludeReactive.forEach((flag, on) -> {
            if (on.get()) {
                ticked.add(flag);
            }
        });
        Set<ReactiveFlag> named = !ticked.isEmpty() ? ticked : reactiveAsReplaced.get() ? null : Set.of();
        return ReactiveExclusion.of(named, process.get() == org.cohesa.core.blend.ProcessUse.AS_ORIGINAL ? replacedMainComponent(lib) : null);
    }

    BlendConstraints reactivityRule(SolventLibrary lib, BlendConstraints c, List<String> notes) {
        ReactiveExclusion r = reactiveExclusion(lib);
        if (r.fromReplaced()) {
            notes.add("reactivity as the replaced liquid: " + r.lack() + ", so no candidate is (untick \"" + REACTIVE_AS_REPLACED
                    + "\" to let them in, or tick the kinds to leave out instead)");
        }
        return r.applyTo(c);
    }

    /** The switch's words in the form (and in the notes that name it). */
    public static final String REACTIVE_AS_REPLACED = "No reactivity the replaced liquid lacks";

    /** True when the session's case replaces a liquid. */
    boolean replacing() {
        String r = session.replacingProperty().get();
        return r != null && !r.isBlank();
    }

    /** What the reactivity switch does now, in one line beside it (empty when the case replaces nothing). */
    public String reactiveRuleText() {
        if (!replacing()) {
            return "";
        }
        if (excludeReactive.values().stream().anyMatch(BooleanProperty::get)) {
            return "The ticked kinds decide instead: only they are left out.";
        }
        if (process.get() != org.cohesa.core.blend.ProcessUse.AS_ORIGINAL) {
            return "Applies only when the liquid leaves the process as the replaced liquid does.";
        }
        ReactiveExclusion r = reactiveExclusion(new SolventLibrary(List.copyOf(session.solvents())));
        if (r.fromReplaced()) {
            return r.lack() + ", so no candidate may be one. Untick to let them in.";
        }
        Solvent original = replacedMainComponent(new SolventLibrary(List.copyOf(session.solvents())));
        if (original == null) {
            return "The replaced liquid is not in the library: nothing to compare with.";
        }
        return reactiveAsReplaced.get() ? original.name() + " carries every kind: none is left out."
                : "Off: candidates may bring a reactivity " + original.name() + " lacks.";
    }

    /** The default process use for a target, as `cohesa blend` takes it ({@link org.cohesa.core.blend.ProcessUse#defaultFor}). */
    private org.cohesa.core.blend.ProcessUse defaultUse(TargetChoice t) {
        return org.cohesa.core.blend.ProcessUse.defaultFor(t == null ? null : TargetStructure.materialOf(t, List.copyOf(session.materials())));
    }

    /** The two-phase test: published mutual solubilities with water first, the activity model elsewhere (as the command line). */
    static PhaseCheck miscibility() {
        return MeasuredFirstPhaseCheck.with(WaterMiscibilityCsv.bundled());
    }

    BlendConstraints constraints(SolventLibrary lib) {
        List<Solvent> inc = names(lib, "include only", include.get());
        List<Solvent> exc = names(lib, "exclude", exclude.get());
        List<BlendComponent> fix = new ArrayList<>();
        String f = fixed.get() == null ? "" : fixed.get().strip();
        if (!f.isEmpty()) {
            for (String part : f.split(";")) {
                int colon = part.lastIndexOf(':');
                if (colon <= 0) {
                    throw new InvalidInputException("fixed", part, "write NAME:FRACTION, e.g. water:0.2 (several separated by ;)");
                }
                double frac = number("fixed", part.substring(colon + 1), null);
                if (frac <= 0 || frac >= 1) {
                    throw new InvalidInputException("fixed", part, "the fraction must lie between 0 and 1");
                }
                fix.add(new BlendComponent(lib.resolve("fixed", part.substring(0, colon).strip()), frac));
            }
        }
        double minF = number("minimum fraction (%)", minFractionPercent.get(), 5.0) / 100;
        if (minF < 0 || minF >= 1) {
            throw new InvalidInputException("minimum fraction (%)", minFractionPercent.get(), "must lie between 0 and 100");
        }
        Integer ich = "any".equals(maxIchClass.get()) || maxIchClass.get() == null ? null : Integer.valueOf(maxIchClass.get().substring(0, 1));
        Set<String> fams = families(lib, "families", families.get());
        Set<String> notFams = families(lib, "exclude families", excludeFamilies.get());
        Set<ReactiveFlag> reactive = java.util.EnumSet.noneOf(ReactiveFlag.class); // the ticked boxes; reactivityRule decides the rest
        excludeReactive.forEach((flag, on) -> {
            if (on.get()) {
                reactive.add(flag);
            }
        });
        WaterCheck.Need water = WATER_SEPARATES.equals(withWater.get()) ? WaterCheck.Need.IMMISCIBLE
                : WATER_MIXES.equals(withWater.get()) ? WaterCheck.Need.MISCIBLE : null;
        try {
            return new BlendConstraints(inc, exc, fams, notFams, fix, minF, 1.0, java.util.Map.of(),
                    optional("boiling point min.", boilingMin.get()), optional("boiling point max.", boilingMax.get()),
                    optional("minimum flash point", minFlashPoint.get()), ich, noCmr.get(), optional("maximum cost", maxCost.get()))
                    .with(new BlendConstraints.More(!allowIchClass1.get(), false, List.of(), reactive,
                            optional("minimum blend flash point", minBlendFlash.get()), null, null, water));
        } catch (IllegalArgumentException e) {
            throw e instanceof InvalidInputException ? e : new InvalidInputException("constraints", "", e.getMessage());
        }
    }

    /** "ester; alcohol" → the family keys, each checked against the families the library has. */
    static Set<String> families(SolventLibrary lib, String field, String text) {
        return text == null || text.isBlank() ? Set.of() : lib.familyKeys(field, List.of(text));
    }

    /** The judgement for a water demand: published mutual solubilities with water first, the activity model elsewhere. */
    static WaterCheck waterCheck(SolventLibrary lib, WaterCheck.Need need) {
        if (need == null) {
            return WaterCheck.NONE;
        }
        Solvent water = lib.all().stream().filter(WaterMiscibility::isWater).findFirst()
                .orElseThrow(() -> new InvalidInputException("with water", need.word(), "the library has no water entry to judge with"));
        WaterSolubilityTable data = WaterMiscibilityCsv.bundled();
        return (components, fractions, kelvin) -> {
            try {
                return WaterMiscibility.withWater(components, fractions, water, kelvin, data);
            } catch (IllegalArgumentException e) {
                return null; // not judged (missing data): does not meet the demand
            }
        };
    }

    private static List<Solvent> names(SolventLibrary lib, String field, String text) {
        if (text == null || text.isBlank()) {
            return List.of();
        }
        List<Solvent> out = new ArrayList<>();
        for (String n : text.split(";")) {
            if (!n.isBlank()) {
                out.add(lib.resolve(field, n.strip()));
            }
        }
        return out;
    }

    private static Double optional(String field, String text) {
        return text == null || text.isBlank() ? null : number(field, text, null);
    }

    private static double positive(String field, String text, Double dflt) {
        double v = number(field, text, dflt);
        if (v <= 0) {
            throw new InvalidInputException(field, text, "must be positive");
        }
        return v;
    }

    private static double number(String field, String text, Double dflt) {
        if ((text == null || text.isBlank()) && dflt != null) {
            return dflt;
        }
        try {
            double v = Double.parseDouble(text.strip());
            if (!Double.isFinite(v)) {
                throw new NumberFormatException();
            }
            return v;
        } catch (NumberFormatException | NullPointerException e) {
            throw new InvalidInputException(field, String.valueOf(text), "not a number (use a dot as decimal separator)");
        }
    }
}
