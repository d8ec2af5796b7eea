package org.cohesa.core.blend;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.cohesa.core.safety.FlammableLiquidClass;
import org.cohesa.core.safety.HazardListBasis;
import org.cohesa.core.safety.HazardStatements;
import org.cohesa.core.safety.SafetyProfiler;
import org.cohesa.core.safety.SolventGuide;
import org.cohesa.core.solvent.Solvent;

/**
 * The hazard penalty of one solvent in the desirability ranking ({@link Desirability}), in points, with the
 * terms that make it up so every rank can say why. Our own weighting (common practice, no source); the
 * classifications it reads are published: GHS Rev. 10 hazard classes and flammable-liquid categories, the
 * CHEM21 ranking (Prat et al., Green Chem. 18 (2016) 288: published final rank, else computed by {@link SolventGuide}) and
 * ICH Q3C(R8) classes. docs/methods.md ("Ranking") gives the table and the reasons for each weight.
 *
 * <ul>
 *   <li>health, each hazard class once: CMR category 1 (H340, H350, H360…) 8; suspected CMR (H341, H351,
 *       H361…) 4; lactation H362 2; fatal (H300, H310, H330) 6; toxic (H301, H311, H331) 4; harmful (H302,
 *       H312, H332) 0.5 (with the irritants, as CHEM21's health score ranks them); organ damage (H370, H372) 4, possible (H371, H373) 2; respiratory sensitiser H334 3;
 *       skin sensitiser H317 1; corrosive or serious eye damage (H314, H318) 1.5; aspiration H304 1;
 *       irritation or drowsiness (H315, H319, H335, H336, EUH066) 0.5;</li>
 *   <li>flammability, GHS category of the liquid (flash point and boiling point, else its H224–H227):
 *       1 → 3, 2 → 2, 3 → 1, 4 → 0.5, not flammable 0;</li>
 *   <li>exposure, 8-h TWA limit: ≤ 1 ppm 3, ≤ 10 ppm 2, ≤ 50 ppm 1, ≤ 200 ppm 0.5, above 0; no limit known
 *       1 (unknown is not safe: a solvent no agency has set a limit for has thin toxicology, and a liquid with a
 *       generous published limit must not rank below it); skin notation + 0.5;</li>
 *   <li>process suitability: a reactive solvent ({@link ReactiveFlag} other than peroxide former, which is counted
 *       below) 2: it reacts with bases, amines or the solute and is a worse first try; the CHEM21 panel moved the reactive
 *       solvents it ranked one or two classes below their computed rank (Table 7: pyridine, triethylamine, nitromethane; 1.8
 *       points on average at a guide term's full weight);</li>
 *   <li>solvent guide (CHEM21: the paper's final ranking where it lists the solvent, else the computed ranking by
 *       default): recommended 0, problematic 0.5, hazardous 1.25, highly hazardous 2 — half of what a term of its own
 *       would weigh, because the guide's safety and health scores are computed from the flash point and H statements
 *       counted above;</li>
 *   <li>ICH Q3C: class 1 5, class 2 1.5, class 3 0, not listed 0.5 (needs justification under Q3C);</li>
 *   <li>environment: ozone H420 3; aquatic acute/chronic 1–2 (H400, H410, H411) 1, (H412, H413) 0.5;
 *       peroxide former 0.5; halogenated (Cl, Br, I in the formula, or the chlorinated family) 1.5: halogenated waste
 *       must be segregated and incinerated, and the published selection guides place most of them low.</li>
 * </ul>
 * A solvent with no hazard statements and no source for them (the library does not know) gets 2 points: unknown is
 * not safe, and it must not outrank a liquid whose statements are known to be mild. A list recalled from memory and not
 * checked ({@link HazardListBasis#RECALLED}) is possibly incomplete: its health terms count at least those 2 points (CHEM21
 * scores a solvent without registered data health 5, between H318's 4 and a suspected CMR's 6, whose weights here are 1.5
 * and 4). Water scores 0.
 *
 * @param points total penalty, ≥ 0
 * @param terms  the non-zero parts in words with their points, largest first, e.g. "H361d suspected reprotoxic 4"
 */
public record HazardPenalty(double points, List<String> terms) {

    static final String WATER_CAS = "7732-18-5";

    /** Penalty of a solvent whose hazard statements the library does not record (no source): unknown is not safe. */
    static final double UNKNOWN_STATEMENTS = 2;

    /** Penalty of a solvent with no 8-h exposure limit in the library. */
    static final double NO_EXPOSURE_LIMIT = 1;

    /** Penalty of a solvent that takes part in reactions ({@link ReactiveFlag}, peroxide formers apart): as much as a Category 2 flammability. */
    static final double REACTIVE = 2;

    public HazardPenalty {
        terms = List.copyOf(terms);
    }

    private record Health(double points, String label, Set<String> families) {
    }

    private static final List<Health> HEALTH = List.of(
            new Health(8, "carcinogen/mutagen/reprotoxic cat. 1", Set.of("H340", "H350", "H360")),
            new Health(4, "suspected carcinogen/mutagen/reprotoxic", Set.of("H341", "H351", "H361")),
            new Health(2, "harms breast-fed children", Set.of("H362")),
            new Health(6, "fatal on exposure", Set.of("H300", "H310", "H330")),
            new Health(4, "toxic", Set.of("H301", "H311", "H331")),
            // acute toxicity category 4 weighs as an irritant, as in the CHEM21 health score (Prat 2016 Table 4: H302, H312,
            // H332 score 2, the same as H315, H319, H335, H336)
            new Health(0.5, "harmful", Set.of("H302", "H312", "H332")),
            new Health(4, "organ damage", Set.of("H370", "H372")),
            new Health(2, "possible organ damage", Set.of("H371", "H373")),
            new Health(3, "respiratory sensitiser", Set.of("H334")),
            new Health(1, "skin sensitiser", Set.of("H317")),
            new Health(1.5, "corrosive/eye damage", Set.of("H314", "H318")),
            new Health(1, "aspiration", Set.of("H304")),
            new Health(0.5, "irritant/drowsiness", Set.of("H315", "H319", "H335", "H336", "EUH066")));

    /** The penalty of one solvent. */
    public static HazardPenalty of(Solvent s) {
        if (WATER_CAS.equals(s.cas())) {
            return new HazardPenalty(0, List.of());
        }
        List<Term> t = new ArrayList<>();
        HazardListBasis basis = HazardListBasis.of(s);
        if (basis == HazardListBasis.NOT_RECORDED) {
            t.add(new Term(UNKNOWN_STATEMENTS, "hazard statements not recorded"));
        }
        double health = 0;
        for (Health h : HEALTH) {
            Set<String> codes = new LinkedHashSet<>();
            for (String code : s.hazardStatements()) {
                if (h.families().contains(HazardStatements.family(code))) {
                    codes.add(code);
                }
            }
            if (!codes.isEmpty()) {
                t.add(new Term(h.points(), String.join("/", codes) + " " + h.label()));
                health += h.points();
            }
        }
        if (basis == HazardListBasis.RECALLED && health < UNKNOWN_STATEMENTS) {
            // a recalled list is possibly incomplete: its health part counts at least as much as an unknown list's
            // (CHEM21 scores a solvent without registered data health 5, between H318's 4 and H351's 6; 2 points lies
            // between our 1.5 and 4 for those; docs/methods.md, "Ranking")
            t.add(new Term(UNKNOWN_STATEMENTS - health, "hazard list recalled, not checked: health counted as at least "
                    + fmt(UNKNOWN_STATEMENTS)));
        }
        Integer cat = flammableCategory(s);
        if (cat != null) {
            double p = switch (cat) {
                case 1 -> 3;
                case 2 -> 2;
                case 3 -> 1;
                default -> 0.5;
            };
            t.add(new Term(p, "flammable Category " + cat));
        }
        Double twa = s.exposure().twaPpm();
        if (twa == null) {
            t.add(new Term(NO_EXPOSURE_LIMIT, "no exposure limit known"));
        } else {
            double p = twa <= 1 ? 3 : twa <= 10 ? 2 : twa <= 50 ? 1 : twa <= 200 ? 0.5 : 0;
            if (p > 0) {
                t.add(new Term(p, "exposure limit " + fmt(twa) + " ppm"));
            }
        }
        if (s.exposure().skin()) {
            t.add(new Term(0.5, "skin notation"));
        }
        SolventGuide.Scores guide = SolventGuide.score(s);
        double guidePoints = switch (guide.rank()) {
            case RECOMMENDED -> 0;
            // half the weight of a term of its own: the guide's scores restate the flash point, H statements and boiling
            // point counted above; what it adds is the panel's judgement and criteria we do not count (docs/methods.md)
            case PROBLEMATIC -> 0.5;
            case HAZARDOUS -> 1.25;
            case HIGHLY_HAZARDOUS -> 2;
        };
        if (guidePoints > 0) {
            t.add(new Term(guidePoints, "guide: " + guide.rank().label() + (guide.published() ? " (CHEM21 published)" : " (computed)")));
        }
        Integer ich = s.ichClass();
        if (ich == null) {
            t.add(new Term(0.5, "not listed in ICH Q3C"));
        } else if (ich == 1) {
            t.add(new Term(5, "ICH class 1"));
        } else if (ich == 2) {
            t.add(new Term(1.5, "ICH class 2"));
        }
        for (String code : s.hazardStatements()) {
            String f = HazardStatements.family(code);
            if (f.equals("H420")) {
                t.add(new Term(3, "H420 ozone"));
            }
        }
        if (has(s, "H400", "H410", "H411")) {
            t.add(new Term(1, "toxic to aquatic life"));
        } else if (has(s, "H412", "H413")) {
            t.add(new Term(0.5, "harmful to aquatic life"));
        }
        if (s.peroxideFormer()) {
            t.add(new Term(0.5, "peroxide former"));
        }
        List<String> reactive = ReactiveFlag.of(s).stream().filter(f -> f != ReactiveFlag.PEROXIDE).map(ReactiveFlag::label).toList();
        if (!reactive.isEmpty()) {
            t.add(new Term(REACTIVE, "reactive: " + String.join(", ", reactive)));
        }
        if (halogenated(s)) {
            t.add(new Term(1.5, "halogenated (Cl/Br/I)"));
        }
        t.sort((a, b) -> Double.compare(b.points(), a.points()));
        double sum = t.stream().mapToDouble(Term::points).sum();
        return new HazardPenalty(sum, t.stream().map(x -> x.label() + " " + fmt(x.points())).toList());
    }

    /** GHS category from flash point and boiling point, else from the liquid's own H224–H227 statement; null when not flammable. */
    static Integer flammableCategory(Solvent s) {
        if (s.flashPointC() != null) {
            Integer c = FlammableLiquidClass.ghs(s.flashPointC(), s.boilingPointC()).category();
            if (c != null) {
                return c;
            }
        }
        return SafetyProfiler.labelledCategory(s);
    }

    /** Chlorine, bromine or iodine in the Hill formula, or the chlorinated family. */
    static boolean halogenated(Solvent s) {
        String f = s.formula();
        if (f != null && f.matches(".*(Cl|Br|I)(?![a-z]).*")) {
            return true;
        }
        return s.inFamily("chlorinated");
    }

    private static boolean has(Solvent s, String... families) {
        for (String code : s.hazardStatements()) {
            String f = HazardStatements.family(code);
            for (String x : families) {
                if (f.equals(x)) {
                    return true;
                }
            }
        }
        return false;
    }

    private record Term(double points, String label) {
    }

    static String fmt(double v) {
        return v == Math.rint(v) ? String.valueOf((long) v) : String.format(Locale.ROOT, "%.2f", v).replaceAll("0+$", "");
    }
}
