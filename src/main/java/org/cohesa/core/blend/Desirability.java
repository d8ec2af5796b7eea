package org.cohesa.core.blend;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.core.solvent.Solvent;

/**
 * The one documented desirability that orders qualifying suggestions (RED ≤ the limit and every constraint
 * met); lower is better:
 *
 * <pre>
 *   score = w_hazard · max_i penalty(solvent i)          (worst component, {@link HazardPenalty})
 *         + w_components · (k − 1)                       (k components)
 *         + w_cost · Σ φᵢ priceᵢ / median price           (only solvents with an entered price count)
 *         + w_distance · RED                             (margin from the surface; tie-breaker)
 * </pre>
 *
 * A blend carries the hazards of its worst component: GHS mixture classification takes every ingredient
 * above its generic concentration limit (0.1–0.3 % for CMR, 1–10 % for most health classes; UN GHS Rev. 10
 * ch. 3, from memory), and the search adds nothing below 5 %, so each component brings its hazards with it.
 * Each subset's composition is the one closest to the sphere centre (the largest margin), so the score is a
 * function of the subset alone and the search can bound it exactly. Weights and their reasons: docs/methods.md.
 */
public final class Desirability {

    private Desirability() {
    }

    /**
     * @param hazard     points per hazard point of the worst component
     * @param components points per component beyond the first
     * @param cost       points per "one median price per litre"
     * @param distance   points per unit of RED
     * @param process    points per point of the process term ({@link ProcessUse}: how the solvent must leave the process)
     * @param use        the process the solvent serves; {@link ProcessUse#ANY} for no process term
     * @param reference  the replaced solvent's evaporation rate, for {@link ProcessUse#AS_ORIGINAL}; null otherwise
     */
    public record Weights(double hazard, double components, double cost, double distance, double process, ProcessUse use, ProcessUse.Rate reference) {
        public Weights {
            for (double w : new double[] {hazard, components, cost, distance, process}) {
                if (!(w >= 0) || !Double.isFinite(w) || w > 1000) {
                    throw new IllegalArgumentException("weights must be numbers from 0 to 1000, got " + w);
                }
            }
            java.util.Objects.requireNonNull(use, "use");
        }

        /** Weights without a process term. */
        public Weights(double hazard, double components, double cost, double distance) {
            this(hazard, components, cost, distance, 0, ProcessUse.ANY, null);
        }

        /** The same weights for another process use (and, for {@link ProcessUse#AS_ORIGINAL}, the original's evaporation rate). */
        public Weights withProcess(ProcessUse u, ProcessUse.Rate ref) {
            return new Weights(hazard, components, cost, distance, process, u, ref);
        }

        /** The same weights with another components weight. */
        public Weights withComponents(double w) {
            return new Weights(hazard, w, cost, distance, process, use, reference);
        }

        /** The same weights with another process weight. */
        public Weights withProcessWeight(double w) {
            return new Weights(hazard, components, cost, distance, w, use, reference);
        }

        /** True when the process term counts. */
        public boolean processCounts() {
            return process > 0 && use != ProcessUse.ANY && (use != ProcessUse.AS_ORIGINAL || reference != null);
        }

        /** "hazard 1, components 2, cost 1, distance 1, process 1 (general: RER ≥ 0.1 (n-butyl acetate = 1))". */
        public String describe() {
            return "hazard " + HazardPenalty.fmt(hazard) + ", components " + HazardPenalty.fmt(components) + ", cost "
                    + HazardPenalty.fmt(cost) + ", distance " + HazardPenalty.fmt(distance)
                    + (processCounts() ? ", process " + HazardPenalty.fmt(process) + " (" + use.word() + ": " + use.window(reference) + ")"
                    : ", no process term");
        }
    }

    /** The weighted penalty one component brings: hazard and process term. The blend takes its worst component's. */
    static double componentPenalty(Solvent s, Weights w) {
        return w.hazard() * HazardPenalty.of(s).points() + (w.processCounts() ? w.process() * w.use().of(s, w.reference()).points() : 0);
    }

    /** What the user leans towards; each preset is a set of weights (docs/methods.md gives the reasons). */
    public enum Preference {
        /** The default: no CMR (a constraint), then fewer components, then lower hazard, cost, margin. */
        BALANCED(new Weights(1, 2, 1, 1, 1, ProcessUse.GENERAL, null)),
        /** Hazard counts twice, an extra component half as much. */
        SAFETY(new Weights(2, 1, 0.5, 1, 1, ProcessUse.GENERAL, null)),
        /** Each extra component costs as much as a CMR-suspect statement: singles and pairs first. */
        SIMPLICITY(new Weights(1, 6, 1, 1, 1, ProcessUse.GENERAL, null)),
        /** Price dominates (needs prices). */
        COST(new Weights(1, 2, 5, 1, 1, ProcessUse.GENERAL, null)),
        /** Closest to the centre first, hazard, components and process only break near-ties. */
        CLOSENESS(new Weights(0.25, 1, 0.25, 10, 0.25, ProcessUse.GENERAL, null));

        private final Weights weights;

        Preference(Weights w) {
            this.weights = w;
        }

        public Weights weights() {
            return weights;
        }

        public String word() {
            return name().toLowerCase(Locale.ROOT);
        }

        public static Preference parse(String field, String text) {
            for (Preference p : values()) {
                if (text != null && p.word().equals(text.strip().toLowerCase(Locale.ROOT))) {
                    return p;
                }
            }
            throw new InvalidInputException(field, String.valueOf(text), "choose one of safety, simplicity, cost, closeness (or balanced, the default)");
        }
    }

    /** RED up to which a blend qualifies on a material's sphere: a margin of 0.2 for the sphere's uncertainty (docs/methods.md). */
    public static final double MATERIAL_RED_LIMIT = 0.8;

    /** Radius of the sphere around a replaced solvent, MPa^½ (docs/methods.md, "Replacing a solvent"). */
    public static final double AROUND_ORIGINAL_RADIUS = 4.0;

    /** RED limit on the sphere around a replaced solvent: Ra ≤ the radius (the radius already is the tolerance). */
    public static final double AROUND_ORIGINAL_RED_LIMIT = 1.0;

    /** Default weights (the balanced preference). */
    public static final Weights DEFAULT = Preference.BALANCED.weights();

    /**
     * Weight of each component beyond the first when a single liquid in use is replaced and no preference is named: 3, as
     * much as a Category 1 flammability (a new blend's default is 2). A process that ran on one liquid must recover and
     * recycle it: a blend fractionates on distillation, so the recovered solvent is not the fresh one, and it needs its own
     * specification and analytics (common practice in process chemistry, no source). Used by {@code cohesa replace} and by
     * the desktop's replacement cases alike.
     */
    public static final double REPLACE_COMPONENTS = 3;

    /**
     * Parses "hazard=1,components=2" over a base set of weights (weights not named keep their base value).
     *
     * @throws InvalidInputException naming the field and the bad part
     */
    public static Weights parseWeights(String field, String text, Weights base) {
        double[] w = {base.hazard(), base.components(), base.cost(), base.distance(), base.process()};
        String[] names = {"hazard", "components", "cost", "distance", "process"};
        for (String part : text.split(",")) {
            String p = part.strip();
            if (p.isEmpty()) {
                continue;
            }
            int eq = p.indexOf('=');
            if (eq <= 0) {
                throw new InvalidInputException(field, text, "write NAME=NUMBER pairs, e.g. hazard=1,components=2,cost=1,distance=1,process=1");
            }
            String key = p.substring(0, eq).strip().toLowerCase(Locale.ROOT);
            if (key.equals("boiling")) {
                key = "process"; // the earlier name of the replace boiling term, now one of the process uses
            }
            int idx = -1;
            for (int i = 0; i < names.length; i++) {
                if (names[i].equals(key)) {
                    idx = i;
                }
            }
            if (idx < 0) {
                throw new InvalidInputException(field, p, "unknown weight '" + key + "'; weights are hazard, components, cost, distance, process");
            }
            double v;
            try {
                v = Double.parseDouble(p.substring(eq + 1).strip());
            } catch (NumberFormatException e) {
                throw new InvalidInputException(field, p, "'" + p.substring(eq + 1).strip() + "' is not a number");
            }
            if (!(v >= 0) || v > 1000) {
                throw new InvalidInputException(field, p, "a weight must lie from 0 to 1000");
            }
            w[idx] = v;
        }
        return new Weights(w[0], w[1], w[2], w[3], w[4], base.use(), base.reference());
    }

    /** Median price per litre of the solvents that have one, or NaN when none has. */
    public static double referencePrice(List<Solvent> solvents) {
        double[] p = solvents.stream().map(Solvent::pricePerLitre).filter(Objects::nonNull).mapToDouble(Double::doubleValue).sorted().toArray();
        if (p.length == 0) {
            return Double.NaN;
        }
        double m = p.length % 2 == 1 ? p[p.length / 2] : (p[p.length / 2 - 1] + p[p.length / 2]) / 2;
        return m > 0 ? m : Double.NaN;
    }

    /**
     * The score of a blend and the terms that make it up, in words.
     *
     * @param components the blend
     * @param red        its RED
     * @param redLimit   the qualifying limit
     * @param weights    the weights
     * @param refPrice   median price per litre (NaN: no prices, the cost term is 0)
     */
    public static Explanation explain(List<BlendComponent> components, double red, double redLimit, Weights weights, double refPrice) {
        List<String> why = new ArrayList<>();
        why.add(red <= redLimit * (1 + 1e-9) ? String.format(Locale.ROOT, "inside with margin %.2f (RED %.2f ≤ %.2f)", Math.max(0, 1 - red), red, redLimit)
                : String.format(Locale.ROOT, "RED %.2f, above the limit %.2f", red, redLimit));
        Solvent worst = null;
        double worstPen = -1;
        for (BlendComponent c : components) {
            double p = componentPenalty(c.solvent(), weights);
            if (p > worstPen) {
                worst = c.solvent();
                worstPen = p;
            }
        }
        HazardPenalty worstP = worst == null ? null : HazardPenalty.of(worst);
        double hazard = worstP == null ? 0 : worstP.points();
        List<String> shown = worstP == null ? List.of() : worstP.terms();
        String who = components.size() == 1 ? "" : "worst component " + worst.name() + ": ";
        String boil = "";
        if (worst != null && weights.processCounts()) {
            ProcessUse.Term pt = weights.use().of(worst, weights.reference());
            if (pt.points() > 0) {
                boil = "; " + pt.text() + " (+" + HazardPenalty.fmt(Math.round(weights.process() * pt.points() * 100) / 100.0) + ")";
            }
        }
        why.add((hazard == 0 ? (components.size() == 1 ? "no hazard terms" : who + "no hazard terms")
                : who + "hazard " + HazardPenalty.fmt(hazard) + " (" + String.join(", ", shown) + ")") + boil);
        if (weights.processCounts() && components.stream().allMatch(c -> weights.use().of(c.solvent(), weights.reference()).points() == 0)) {
            why.add("process " + weights.use().word() + ": " + (components.size() == 1 ? "inside " : "every component inside ")
                    + weights.use().window(weights.reference()) + rateNote(components, weights.use()));
        }
        int k = components.size();
        why.add(k + (k == 1 ? " component" : " components"));
        // a sphere position resting on a structure estimate (δP error about 2 MPa½) must say so beside the rank
        List<String> estimated = components.stream().map(BlendComponent::solvent)
                .filter(s -> s.sources().getOrDefault("hsp", "").startsWith("estimate-")).map(Solvent::name).toList();
        if (!estimated.isEmpty()) {
            why.add("Hansen parameters estimated from the structure for " + String.join(", ", estimated) + " (test before relying on it)");
        }
        double cost = 0;
        boolean allPriced = components.stream().allMatch(c -> c.solvent().pricePerLitre() != null);
        if (Double.isNaN(refPrice)) {
            why.add("no prices entered");
        } else {
            double price = components.stream().filter(c -> c.solvent().pricePerLitre() != null)
                    .mapToDouble(c -> c.fraction() * c.solvent().pricePerLitre()).sum();
            cost = price / refPrice;
            why.add(String.format(Locale.ROOT, "price %.2f/L%s", price, allPriced ? "" : " (some components without a price)"));
        }
        double score = Math.max(0, worstPen) + weights.components() * (k - 1) + weights.cost() * cost + weights.distance() * red;
        why.add(String.format(Locale.ROOT, "score %.2f", score));
        return new Explanation(score, hazard, worst == null ? null : worst.name(), why);
    }

    /** ", RER 3.8" or ", RER 0.68–3.8" for an RER window (how fast the components evaporate, n-butyl acetate = 1). */
    private static String rateNote(List<BlendComponent> components, ProcessUse use) {
        if (use == ProcessUse.WORKUP || use == ProcessUse.ANY) {
            return "";
        }
        double lo = Double.POSITIVE_INFINITY;
        double hi = 0;
        boolean estimated = false;
        for (BlendComponent c : components) {
            ProcessUse.Rate r = ProcessUse.rate(c.solvent());
            if (r == null) {
                return "";
            }
            lo = Math.min(lo, r.rer());
            hi = Math.max(hi, r.rer());
            estimated |= r.fromBoilingPoint();
        }
        return ", RER " + (lo == hi ? ProcessUse.rerText(lo) : ProcessUse.rerText(lo) + "–" + ProcessUse.rerText(hi))
                + (estimated ? " (partly estimated from the boiling point)" : "");
    }

    /**
     * @param score         the desirability score (lower is better)
     * @param hazard        the worst component's hazard penalty
     * @param worstSolvent  which component that is
     * @param why           the terms in words, for the table and JSON
     */
    public record Explanation(double score, double hazard, String worstSolvent, List<String> why) {
        public Explanation {
            why = List.copyOf(why);
        }
    }

    /** Penalties of many solvents at once (search set-up). */
    static double[] penalties(List<Solvent> solvents, Weights w) {
        double[] p = new double[solvents.size()];
        Arrays.setAll(p, i -> componentPenalty(solvents.get(i), w));
        return p;
    }
}
