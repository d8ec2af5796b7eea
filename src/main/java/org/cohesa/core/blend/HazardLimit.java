package org.cohesa.core.blend;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.safety.HazardStatements;
import org.cohesa.core.solvent.Solvent;

/**
 * "Never as bad as the original on this hazard": a candidate qualifies only when its severity in {@code kind}
 * is below {@code level}, the severity of the solvent being replaced.
 *
 * <p>Severity within each GHS hazard class follows the category order of UN GHS Rev. 10 (category 1 is the
 * more severe): carcinogen H350 2, H351 1; mutagen H340 2, H341 1; reproductive toxicant H360 2, H361 1;
 * lactation H362 1; organ damage after one exposure (STOT SE) H370 2, H371 1; after repeated exposure (STOT RE)
 * H372 2, H373 1; acute toxicity, worst route, fatal (H300, H310, H330) 3, toxic (H301, H311, H331) 2, harmful
 * (H302, H312, H332) 1; aspiration H304 1; ozone layer H420 or EUH059 1. STOT SE category 3 (H335 respiratory
 * irritation, H336 drowsiness) is not counted as organ damage: it is the mildest category and carried by
 * nearly every volatile solvent, so it would leave nothing to offer (our choice, said in docs/methods.md). For the same
 * reason acute toxicity category 4 alone ("harmful", H302/H312/H332) is not a <i>default</i> reason ({@link #defaults}):
 * it is the mildest acute category, most ethers and esters carry it by self-classification, and as a default it left
 * out the published substitutes of diethyl ether (2-MeTHF, CPME: H302); {@code --because toxic} still makes it one.
 *
 * @param kind    one of {@link #KINDS}
 * @param level   the original's severity (≥ 1); a candidate at this level or above is left out
 * @param because the original's statements behind it, e.g. "H360D of N-methyl-2-pyrrolidone"
 */
public record HazardLimit(String kind, int level, String because) {

    /** The hazard kinds, in the order they are reported. */
    public static final List<String> KINDS = List.of("carcinogen", "mutagen", "reprotoxic", "lactation", "organ-single", "organ-repeated",
            "acute-toxicity", "aspiration", "ozone");

    /** The kinds a replacement is made for by default: every health hazard of the CMR, STOT and acute-toxicity classes. */
    public static final List<String> DEFAULT_KINDS = List.of("carcinogen", "mutagen", "reprotoxic", "lactation", "organ-single",
            "organ-repeated", "acute-toxicity");

    public HazardLimit {
        if (!KINDS.contains(kind)) {
            throw new IllegalArgumentException("unknown hazard kind " + kind);
        }
        if (level < 1) {
            throw new IllegalArgumentException("level must be at least 1, got " + level);
        }
    }

    /** Severity of one statement in a kind (0: not of that kind). */
    static int severity(String kind, String code) {
        String f = HazardStatements.family(code);
        return switch (kind) {
            case "carcinogen" -> f.equals("H350") ? 2 : f.equals("H351") ? 1 : 0;
            case "mutagen" -> f.equals("H340") ? 2 : f.equals("H341") ? 1 : 0;
            case "reprotoxic" -> f.equals("H360") ? 2 : f.equals("H361") ? 1 : 0;
            case "lactation" -> f.equals("H362") ? 1 : 0;
            case "organ-single" -> f.equals("H370") ? 2 : f.equals("H371") ? 1 : 0;
            case "organ-repeated" -> f.equals("H372") ? 2 : f.equals("H373") ? 1 : 0;
            case "acute-toxicity" -> switch (f) {
                case "H300", "H310", "H330" -> 3;
                case "H301", "H311", "H331" -> 2;
                case "H302", "H312", "H332" -> 1;
                default -> 0;
            };
            case "aspiration" -> f.equals("H304") ? 1 : 0;
            case "ozone" -> f.equals("H420") || f.equals("EUH059") ? 1 : 0;
            default -> 0;
        };
    }

    /** The solvent's severity in a kind (0 when none of its statements is of that kind). */
    public static int level(String kind, Solvent s) {
        int l = 0;
        for (String h : s.hazardStatements()) {
            l = Math.max(l, severity(kind, h));
        }
        return l;
    }

    /** The statements of a solvent in a kind, e.g. "H360D". */
    public static List<String> statements(String kind, Solvent s) {
        return s.hazardStatements().stream().filter(h -> severity(kind, h) > 0).toList();
    }

    /** The limits that follow from the original's own statements in the given kinds (kinds it has no statement in are skipped). */
    public static List<HazardLimit> from(Solvent original, List<String> kinds) {
        List<HazardLimit> out = new ArrayList<>();
        for (String k : kinds) {
            int l = level(k, original);
            if (l > 0) {
                out.add(new HazardLimit(k, l, String.join(" ", statements(k, original)) + " of " + original.name()));
            }
        }
        return out;
    }

    /**
     * The limits {@code replace} applies without {@code --because}: the original's statements in {@link #DEFAULT_KINDS},
     * except acute toxicity when the original is only harmful (category 4), the mildest acute category.
     */
    public static List<HazardLimit> defaults(Solvent original) {
        return from(original, DEFAULT_KINDS).stream().filter(l -> !(l.kind().equals("acute-toxicity") && l.level() == 1)).toList();
    }

    /** True when the solvent is as bad as the original or worse in this kind. */
    public boolean rejects(Solvent s) {
        return level(kind, s) >= level;
    }

    /** The user's word for a reason → hazard kinds ("cmr" → carcinogen, mutagen, reprotoxic); null for a non-hazard reason. */
    public static List<String> kindsOf(String field, String word) {
        String w = word.strip().toLowerCase(Locale.ROOT);
        return switch (w) {
            case "cmr" -> List.of("carcinogen", "mutagen", "reprotoxic");
            case "carcinogen", "carcinogenic", "cancer" -> List.of("carcinogen");
            case "mutagen", "mutagenic" -> List.of("mutagen");
            case "reprotoxic", "reproductive", "fertility" -> List.of("reprotoxic", "lactation");
            case "organ", "stot" -> List.of("organ-single", "organ-repeated");
            case "toxic", "acute-toxicity" -> List.of("acute-toxicity");
            case "aspiration" -> List.of("aspiration");
            case "ozone" -> List.of("ozone");
            case "health" -> DEFAULT_KINDS;
            default -> {
                if (KINDS.contains(w)) {
                    yield List.of(w);
                }
                yield null;
            }
        };
    }

    /** Hazard limits for the user's reasons; throws when the original carries no statement of a named kind. */
    public static List<HazardLimit> forReasons(String field, Solvent original, List<String> kinds, String word) {
        List<HazardLimit> l = from(original, kinds);
        if (l.isEmpty()) {
            throw new InvalidInputException(field, word, original.name() + " carries no hazard statement of that kind ("
                    + String.join(", ", kinds) + "), so it cannot be a reason to replace it");
        }
        return l;
    }
}
