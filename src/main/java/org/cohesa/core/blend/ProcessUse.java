package org.cohesa.core.blend;

import java.util.Locale;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.drying.EvaporationRates;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.target.Material;

/**
 * What the solvent has to do after it has dissolved the material: how it must leave the process. Each use has a
 * preferred window, on the relative evaporation rate (RER, n-butyl acetate = 1, the ASTM D3539 scale of
 * {@link EvaporationRates}, predicted at 25 °C by the calibrated film model) or on the normal boiling point, and a
 * component outside it earns points (the desirability's process term, weighted by {@code process} in
 * {@link Desirability.Weights}; the blend takes its worst component, since the slowest liquid decides how long a film
 * stays wet and what is left after stripping). docs/methods.md ("Process term") gives the windows and their reasons:
 *
 * <ul>
 *   <li>{@link #GENERAL} (the default of {@code blend}): the solvent has to leave afterwards by evaporation, process
 *       unknown: RER ≥ 0.3, about as fast as water (published 0.36) or faster, the upper part of the suppliers' "slow" class (fast &gt; 3,
 *       medium 0.8–3, slow &lt; 0.8);</li>
 *   <li>{@link #FILM}: a coating, ink, adhesive or cast film drying in air: RER 0.2–6 (slower leaves solvent in the film
 *       and long tack-free times, faster blushes and leaves no time to level; common practice, no source);</li>
 *   <li>{@link #WORKUP}: a reaction and work-up, the solvent stripped by evaporation or distillation: boiling point
 *       70–139 °C, the best environment class of the CHEM21 guide (Prat et al., Green Chem. 18 (2016) 288: below, VOC
 *       emissions; above, energy-hungry recovery); one point per 20 °C outside;</li>
 *   <li>{@link #CLEANING}: wiping or rinsing parts that must dry without a residue: RER 0.3–8 (common practice, no source);</li>
 *   <li>{@link #AS_ORIGINAL} (the default of {@code replace}): leave the process as the replaced solvent does: RER within
 *       a factor of {@value #AS_ORIGINAL_FACTOR} of the original's (about one supplier evaporation class either way);</li>
 *   <li>{@link #ANY}: no process term.</li>
 * </ul>
 * Outside an RER window: {@value #POINTS_PER_DECADE} points per factor of ten, capped at {@value #CAP}; a liquid whose
 * RER cannot be predicted (no vapour-pressure curve) is placed by its boiling point through
 * log₁₀ RER = {@value #BP_INTERCEPT} − {@value #BP_SLOPE}·t_b/°C, fitted over the bundled library (rms 0.71 decades, a factor of 5: a rough placing;
 * {@code ProcessUseTest} re-fits it); neither known: the cap (it cannot be shown to leave).
 */
public enum ProcessUse {
    GENERAL("general", "removed afterwards by evaporation", 0.3, Double.POSITIVE_INFINITY, null, null),
    FILM("film", "film drying (coating, ink, adhesive, cast film)", 0.2, 6.0, null, null),
    WORKUP("workup", "reaction and work-up, stripped by evaporation or distillation", null, null, 70.0, 139.0),
    CLEANING("cleaning", "cleaning parts that must dry without residue", 0.3, 8.0, null, null),
    AS_ORIGINAL("as-original", "leaves the process as the replaced solvent does", null, null, null, null),
    ANY("any", "no process term", null, null, null, null);

    /** Points per factor of ten outside an RER window. */
    public static final double POINTS_PER_DECADE = 3;
    /** Most points the process term gives one component (before its weight). */
    public static final double CAP = 6;
    /** {@link #AS_ORIGINAL}: the window is the original's RER divided and multiplied by this factor. */
    public static final double AS_ORIGINAL_FACTOR = 3;
    /** Boiling-point fallback for the RER, fitted over the bundled library's predicted rates (ProcessUseTest). */
    public static final double BP_INTERCEPT = 2.596;
    /** Slope of the fallback, decades per °C. */
    public static final double BP_SLOPE = 0.02243;
    /**
     * °C per point outside the work-up window: 20, the width of CHEM21's lower middle band (50–69 °C), on both sides (the
     * guide's upper band, 140–200 °C, is wider, but a high boiler costs a work-up more than its environment score says:
     * an aqueous wash or a high vacuum instead of a rotary evaporator; our choice).
     */
    static final double WORKUP_PER_POINT = 20;

    private final String word;
    private final String meaning;
    private final Double rerMin;
    private final Double rerMax;
    private final Double bpMin;
    private final Double bpMax;

    ProcessUse(String word, String meaning, Double rerMin, Double rerMax, Double bpMin, Double bpMax) {
        this.word = word;
        this.meaning = meaning;
        this.rerMin = rerMin;
        this.rerMax = rerMax;
        this.bpMin = bpMin;
        this.bpMax = bpMax;
    }

    public String word() {
        return word;
    }

    /** What the use means, in words. */
    public String meaning() {
        return meaning;
    }

    /** The window in words, e.g. "RER 0.2–6 (n-butyl acetate = 1)"; {@code reference}: the replaced solvent's rate (AS_ORIGINAL). */
    public String window(Rate reference) {
        if (this == AS_ORIGINAL) {
            return reference == null ? "the original's evaporation rate (unknown: no term)"
                    : "RER " + rerText(reference.rer() / AS_ORIGINAL_FACTOR) + "–" + rerText(reference.rer() * AS_ORIGINAL_FACTOR)
                    + " (the original's " + rerText(reference.rer()) + " ÷× " + HazardPenalty.fmt(AS_ORIGINAL_FACTOR) + ", n-butyl acetate = 1)";
        }
        if (rerMin != null) {
            return rerMax.isInfinite() ? "RER ≥ " + HazardPenalty.fmt(rerMin) + " (n-butyl acetate = 1)"
                    : "RER " + HazardPenalty.fmt(rerMin) + "–" + HazardPenalty.fmt(rerMax) + " (n-butyl acetate = 1)";
        }
        if (bpMin != null) {
            return "boiling point " + HazardPenalty.fmt(bpMin) + "–" + HazardPenalty.fmt(bpMax) + " °C";
        }
        return "none";
    }

    /**
     * The default use of {@code blend} for a target: {@link #GENERAL}, except for a semicrystalline polymer
     * ({@link Material#semicrystalline()}: PVDF, polyethylene, polypropylene, PET), which gets {@link #ANY}. Such a polymer
     * dissolves only warm or hot, near its crystallites' melting range, and the solvent leaves the way that process makes it:
     * an electrode slurry or cast film dried hot (PVDF in NMP is dried at 80–130 °C), a membrane dope coagulated in a
     * non-solvent bath, a hot solution cooled (common practice, no source). Evaporation at 25 °C is not that way, and the
     * general window (RER ≥ 0.3) costs exactly the slow dipolar liquids these polymers are dissolved in (triethyl phosphate,
     * DMSO: 2.5–3 points each) — it put blends of a ketone with ethanol, a PVDF non-solvent, first. {@code --process} names
     * a use when evaporation at room temperature does matter.
     */
    public static ProcessUse defaultFor(Material target) {
        return target != null && target.semicrystalline() ? ANY : GENERAL;
    }

    /** Parses the user's word; {@code asOriginalAllowed} is false where there is no original (blend). */
    public static ProcessUse parse(String field, String text, boolean asOriginalAllowed) {
        if (text != null) {
            for (ProcessUse u : values()) {
                if (u.word.equals(text.strip().toLowerCase(Locale.ROOT)) && (asOriginalAllowed || u != AS_ORIGINAL)) {
                    return u;
                }
            }
        }
        throw new InvalidInputException(field, String.valueOf(text), "choose one of general, film, workup, cleaning"
                + (asOriginalAllowed ? ", as-original" : "") + ", any");
    }

    /**
     * @param points unweighted points, 0 … {@link #CAP}
     * @param text   the term in words for the why, e.g. "RER 0.0065 below 0.2 (film)"; empty when 0 and nothing to say
     */
    public record Term(double points, String text) {
    }

    /** The process term of one solvent; {@code reference} is the replaced solvent's evaporation rate (AS_ORIGINAL; null otherwise). */
    public Term of(Solvent s, Rate reference) {
        if (this == ANY) {
            return new Term(0, "");
        }
        if (bpMin != null) {
            Double bp = s.boilingPointC();
            if (bp == null) {
                return new Term(CAP, "boiling point unknown (" + word + ")");
            }
            double p = bp < bpMin ? (bpMin - bp) / WORKUP_PER_POINT : bp > bpMax ? (bp - bpMax) / WORKUP_PER_POINT : 0;
            return new Term(Math.min(CAP, p), p == 0 ? "" : String.format(Locale.ROOT, "boils at %.0f °C, outside %s (%s)", bp, window(null), word));
        }
        double lo = rerMin == null ? 0 : rerMin;
        double hi = rerMax == null ? 0 : rerMax;
        if (this == AS_ORIGINAL) {
            if (reference == null) {
                return new Term(0, "");
            }
            lo = reference.rer() / AS_ORIGINAL_FACTOR;
            hi = reference.rer() * AS_ORIGINAL_FACTOR;
        }
        Rate r = rate(s);
        if (r == null) {
            return new Term(CAP, "evaporation rate unknown (no vapour pressure nor boiling point; " + word + ")");
        }
        double decades = r.rer() < lo ? Math.log10(lo / r.rer()) : r.rer() > hi ? Math.log10(r.rer() / hi) : 0;
        double p = Math.min(CAP, POINTS_PER_DECADE * decades);
        if (p == 0) {
            return new Term(0, "");
        }
        return new Term(p, String.format(Locale.ROOT, "evaporates %s at RER %s%s, outside %s (%s)", r.rer() < lo ? "slowly" : "fast",
                rerText(r.rer()), r.fromBoilingPoint() ? " (estimated from its boiling point)" : "", window(reference), word));
    }

    /**
     * @param rer              relative evaporation rate, n-butyl acetate = 1
     * @param fromBoilingPoint true when estimated from the boiling point (no vapour-pressure curve)
     */
    public record Rate(double rer, boolean fromBoilingPoint) {
    }

    /** Predicted RER at 25 °C: the calibrated film model, else the boiling-point fallback; null when neither can be made. */
    public static Rate rate(Solvent s) {
        try {
            double rer = EvaporationRates.relativeRate(s, Evaporation.T25);
            if (rer > 0 && Double.isFinite(rer)) {
                return new Rate(rer, false);
            }
        } catch (IllegalArgumentException e) {
            // no vapour pressure, molar mass or volume (or boils at 25 °C): fall back on the boiling point below
        }
        if (s.boilingPointC() == null) {
            return null;
        }
        if (s.boilingPointC() <= 25) {
            return new Rate(1e3, true); // boils at room temperature: faster than any window
        }
        return new Rate(Math.pow(10, BP_INTERCEPT - BP_SLOPE * s.boilingPointC()), true);
    }

    static String rerText(double rer) {
        return rer >= 10 ? String.format(Locale.ROOT, "%.0f", rer) : rer >= 0.1 ? String.format(Locale.ROOT, "%.2f", rer)
                : String.format(Locale.ROOT, "%.2g", rer);
    }
}
