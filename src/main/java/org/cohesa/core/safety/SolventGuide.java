package org.cohesa.core.safety;

import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.cohesa.core.solvent.Solvent;

/**
 * Solvent-guide ranking computed by the CHEM21 method: Prat, D., Wells, A., Hayler, J., Sneddon, H.,
 * McElroy, C. R., Abou-Shehada, S., Dunn, P. J., "CHEM21 selection guide of classical- and less
 * classical-solvents", <i>Green Chem.</i> 18 (2016) 288–296, doi:10.1039/C5GC01008J.
 *
 * <p>Three scores from 1 (best) to 10, then a ranking. The scoring tables below are recalled from memory of the
 * paper and are marked so; the parts of the method we cannot apply for lack of data are named in the notes.
 * <ul>
 * <li><b>Safety</b> (from memory): flash point &gt; 60 °C → 1; 23–60 °C → 3; 0–22 °C → 4; −1 to −20 °C → 5;
 *   &lt; −20 °C → 7. Without a flash point: H224 → 7, H225 → 4, H226 → 3, otherwise 1. Plus 1 each for an
 *   autoignition temperature &lt; 200 °C, a resistivity &gt; 10⁸ Ω·m (static accumulation), peroxide formation
 *   (EUH019). The paper's further +1 for a decomposition energy &gt; 500 J/g is not applied (no data).
 *   Resistivity is not in our library: hydrocarbons (families aliphatic, aromatic, terpene) get the point,
 *   as their resistivities lie far above 10⁸ Ω·m (from memory); other liquids do not.</li>
 * <li><b>Health</b> (the paper's Table 4 as transcribed in the repository the published rows come from,
 *   unilker/NMRSolvents {@code tool/check_chem21.py}, whose rule check reproduces every printed score; before, from memory):
 *   the most severe H3xx statement sets the score — 2 for H304, H371, H373, H302, H312, H332, H336, EUH070, H315, H317,
 *   H319, H335, EUH066; 4 for H318, H334; 6 for H341, H351, H361, H370, H372, H301, H311, H331; 7 for H314 (Table 7 prints
 *   health 7 for acetic acid, formic acid and acetic anhydride, whose worst statement is H314); 9 for H300, H310, H330, H340,
 *   H350, H360. No H3xx statement: 1.
 *   Plus 1 when the boiling point is below 85 °C. Our own placements (not in the recalled table): H334 → 4,
 *   H362 → 6, the GHS-only H303/H305/H313/H316/H320/H333 → 2.</li>
 * <li><b>Environment</b> (from memory): boiling point 70–139 °C → 3; 50–69 or 140–200 °C → 5; &lt; 50 or
 *   &gt; 200 °C → 7; H412/H413 → at least 5; H400/H410/H411 and H420 (ozone) → 7. Without a boiling point we assume 5
 *   (our choice). Water scores 1 in all three (as in the paper).</li>
 * <li><b>No registered data</b> (the paper's "n.a.", Table 8: γ-valerolactone, diethyl succinate, p-cymene): health 5 and
 *   environment at least 5. Registration itself is not in our library; we apply the default to a solvent whose hazard list
 *   is recalled from memory or not recorded ({@link HazardListBasis}), since nothing published was checked for it.</li>
 * <li><b>Ranking</b> (from memory): any score ≥ 8, or two scores ≥ 7 → hazardous; one score of 7, or two
 *   scores of 4–6 → problematic; otherwise recommended. This is the paper's "ranking by default"; the
 *   paper then revised some solvents after discussion (e.g. methanol and acetone to recommended), which a
 *   computation cannot reproduce.</li>
 * </ul>
 *
 * <p><b>Published ranks first.</b> For the 74 solvents of the paper's Tables 7 and 8 that our library holds
 * ({@code chem21-ranks.csv}, with its provenance) {@link #score} returns the paper's own three scores and its
 * <i>final</i> ranking (Table 7: after the panel's discussion, e.g. acetone, methanol and anisole to recommended,
 * DMSO, acetonitrile and cyclohexanone to problematic, pyridine and triethylamine to hazardous; Table 8: the ranking by
 * default, confirmed as final by the paper). Every other solvent gets the computed ranking by default, and
 * {@link Scores#basis()} says which.
 */
public final class SolventGuide {

    /** Citation printed beside the ranking. */
    public static final String METHOD = "CHEM21 (Prat et al., Green Chem. 18 (2016) 288): the paper's final ranking (Tables 7-8) where it lists the solvent, else its ranking by default computed with scoring tables from memory";

    private static final String RESOURCE = "chem21-ranks.csv";
    private static final Map<String, Published> PUBLISHED = load();

    /**
     * One row of the paper's Table 7 or 8.
     *
     * @param cas         CAS number as in our library
     * @param name        the paper's name
     * @param table       7 (classical solvents) or 8 (less classical)
     * @param defaultRank the ranking by default printed by the paper
     * @param finalRank   the final ranking (Table 7: after discussion; Table 8: the default, confirmed)
     */
    public record Published(String cas, String name, int table, int safety, int health, int environment,
                            GuideRank defaultRank, GuideRank finalRank) {
    }

    private static final String WATER_CAS = "7732-18-5";

    /**
     * Health score the paper gives a solvent without registered hazard data ("n.a."; Table 8: γ-valerolactone, diethyl
     * succinate, p-cymene), here also a solvent whose list is recalled or not recorded ({@link HazardListBasis}).
     */
    static final int NOT_REGISTERED_HEALTH = 5;

    /**
     * Least environment score of such a solvent: an "n.a." H4xx column scores like H412, 5 (the rule that reproduces the printed
     * Table 8 scores; no printed row tells it apart from the boiling-point score: p-cymene, 177 °C, 5; the two esters, above 200 °C, 7).
     */
    static final int NOT_REGISTERED_ENVIRONMENT = 5;
    private static final Set<String> STATIC_ACCUMULATING_FAMILIES = Set.of("aliphatic", "aromatic", "terpene");

    /**
     * @param safety      1–10
     * @param health      1–10
     * @param environment 1–10
     * @param rank        the paper's final ranking where it lists the solvent, else the computed ranking by default
     * @param notes       which inputs were missing or assumed
     * @param published   true when scores and rank are the paper's own (Table 7 or 8), false when computed here
     */
    public record Scores(int safety, int health, int environment, GuideRank rank, List<String> notes, boolean published) {
        public Scores {
            notes = List.copyOf(notes);
        }

        /** Where the rank comes from, in words. */
        public String basis() {
            return published ? "published final ranking" : "computed ranking by default";
        }
    }

    /** Every row of the published tables held here, in table order. */
    public static List<Published> publishedRows() {
        return List.copyOf(PUBLISHED.values());
    }

    /** The paper's row for a CAS number, or empty when neither table lists the solvent. */
    public static Optional<Published> published(String cas) {
        return cas == null ? Optional.empty() : Optional.ofNullable(PUBLISHED.get(cas.strip()));
    }

    private SolventGuide() {
    }

    /** Scores and ranks one solvent: the paper's own row where it has one, else computed. */
    public static Scores score(Solvent s) {
        Optional<Published> p = published(s.cas());
        if (p.isPresent()) {
            Published r = p.get();
            List<String> notes = new ArrayList<>();
            notes.add("Prat et al. 2016 Table " + r.table() + (r.table() == 7
                    ? ", ranking after discussion (by default: " + r.defaultRank().label() + ")"
                    : ", ranking by default confirmed as final"));
            return new Scores(r.safety(), r.health(), r.environment(), r.finalRank(), notes, true);
        }
        return computed(s);
    }

    /** The ranking by default computed from the library's data, ignoring the published tables. */
    public static Scores computed(Solvent s) {
        List<String> notes = new ArrayList<>();
        if (WATER_CAS.equals(s.cas())) {
            return new Scores(1, 1, 1, GuideRank.RECOMMENDED, notes, false);
        }
        int safety = safety(s, notes);
        int health = health(s, notes);
        int environment = environment(s, notes);
        HazardListBasis basis = HazardListBasis.of(s);
        if (basis.mayBeIncomplete() && (health < NOT_REGISTERED_HEALTH || environment < NOT_REGISTERED_ENVIRONMENT)) {
            // the paper's default for a solvent without registered hazard data ("n.a." in Tables 7-8: health 5,
            // environment at least 5; Table 8 scores γ-valerolactone, diethyl succinate and p-cymene so)
            health = Math.max(health, NOT_REGISTERED_HEALTH);
            environment = Math.max(environment, NOT_REGISTERED_ENVIRONMENT);
            notes.add((basis == HazardListBasis.RECALLED ? "hazard statements recalled, not checked" : "hazard statements not recorded")
                    + ": health and environment scores at least 5, the paper's default for a solvent without registered data");
        }
        return new Scores(safety, health, environment, rank(safety, health, environment), notes, false);
    }

    private static Map<String, Published> load() {
        Map<String, Published> m = new LinkedHashMap<>();
        try (InputStream in = SolventGuide.class.getResourceAsStream(RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException("missing resource " + RESOURCE);
            }
            CSVFormat fmt = CSVFormat.DEFAULT.builder().setCommentMarker('#').setHeader().setSkipHeaderRecord(true).get();
            for (CSVRecord r : fmt.parse(new InputStreamReader(in, StandardCharsets.UTF_8))) {
                String cas = r.get("cas").strip();
                m.put(cas, new Published(cas, r.get("chem21_name").strip(), Integer.parseInt(r.get("table").strip()),
                        Integer.parseInt(r.get("safety").strip()), Integer.parseInt(r.get("health").strip()),
                        Integer.parseInt(r.get("environment").strip()), GuideRank.parse(r.get("default_rank")),
                        GuideRank.parse(r.get("final_rank"))));
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read " + RESOURCE, e);
        }
        return Collections.unmodifiableMap(m);
    }

    /** The ranking rule of the paper (from memory). */
    public static GuideRank rank(int safety, int health, int environment) {
        int[] all = {safety, health, environment};
        int red = 0;
        int yellow = 0;
        for (int v : all) {
            if (v >= 8) {
                return GuideRank.HAZARDOUS;
            }
            if (v >= 7) {
                red++;
            } else if (v >= 4) {
                yellow++;
            }
        }
        if (red >= 2) {
            return GuideRank.HAZARDOUS;
        }
        if (red == 1 || yellow >= 2) {
            return GuideRank.PROBLEMATIC;
        }
        return GuideRank.RECOMMENDED;
    }

    static int safety(Solvent s, List<String> notes) {
        int score;
        Double fp = s.flashPointC();
        if (fp != null) {
            if (fp > 60) {
                score = 1;
            } else if (fp >= 23) {
                score = 3;
            } else if (fp >= 0) {
                score = 4;
            } else if (fp >= -20) {
                score = 5;
            } else {
                score = 7;
            }
        } else if (has(s, "H224")) {
            score = 7;
            notes.add("no flash point in the library: safety score from H224");
        } else if (has(s, "H225")) {
            score = 4;
            notes.add("no flash point in the library: safety score from H225 (lowest score of that class; may be higher)");
        } else if (has(s, "H226")) {
            score = 3;
            notes.add("no flash point in the library: safety score from H226");
        } else {
            score = 1;
        }
        Double ait = s.fire().autoignitionC();
        if (ait != null && ait < 200) {
            score++;
        }
        if (s.family() != null && STATIC_ACCUMULATING_FAMILIES.contains(s.family().toLowerCase(Locale.ROOT))) {
            score++;
        }
        if (s.peroxideFormer() || has(s, "EUH019")) {
            score++;
        }
        return Math.min(score, 10);
    }

    static int health(Solvent s, List<String> notes) {
        int worst = 1;
        for (String code : s.hazardStatements()) {
            worst = Math.max(worst, healthPoints(code));
        }
        Double bp = s.boilingPointC();
        if (bp == null) {
            notes.add("no boiling point in the library: the health score's +1 for a boiling point below 85 °C was not tested");
        } else if (bp < 85) {
            worst++;
        }
        return Math.min(worst, 10);
    }

    static int healthPoints(String code) {
        String f = HazardStatements.family(code);
        return switch (f) {
            case "H340", "H350", "H360" -> 9;
            case "H300", "H310", "H330" -> 9;
            case "H314" -> 7;
            case "H341", "H351", "H361", "H362", "H370", "H372", "H301", "H311", "H331" -> 6;
            case "H318", "H334" -> 4;
            case "H371", "H373", "H302", "H303", "H304", "H305", "H312", "H313", "H315", "H316", "H317", "H319", "H320",
                    "H332", "H333", "H335", "H336", "EUH070", "EUH066" -> 2;
            default -> 1;
        };
    }

    static int environment(Solvent s, List<String> notes) {
        int score;
        Double bp = s.boilingPointC();
        if (bp == null) {
            // a missing boiling point must not look like the best class: take the middle score, and say so
            score = 5;
            notes.add("no boiling point in the library: environment score assumed 5 before the H4xx statements");
        } else if (bp >= 70 && bp < 140) {
            score = 3;
        } else if ((bp >= 50 && bp < 70) || (bp >= 140 && bp <= 200)) {
            score = 5;
        } else {
            score = 7;
        }
        for (String code : s.hazardStatements()) {
            switch (HazardStatements.family(code)) {
                case "H400", "H410", "H411", "H420" -> score = Math.max(score, 7);
                case "H412", "H413" -> score = Math.max(score, 5);
                default -> {
                }
            }
        }
        return score;
    }

    private static boolean has(Solvent s, String code) {
        return s.hazardStatements().stream().anyMatch(h -> h.equalsIgnoreCase(code));
    }
}
