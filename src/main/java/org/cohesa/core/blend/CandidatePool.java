package org.cohesa.core.blend;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.core.solvent.Solvent;

/**
 * The solvents a search may add (those meeting every per-solvent constraint), the fixed components, and an
 * account of what was left out and why, so the output can say "120 of 183 solvents searched".
 *
 * @param free        solvents the search may add, closest to the target first (speeds up pruning)
 * @param fixed       components present in every blend at a set fraction
 * @param librarySize solvents in the library
 * @param leftOut     reason → names of solvents left out for it (first matching reason only)
 */
public record CandidatePool(List<Solvent> free, List<BlendComponent> fixed, int librarySize, Map<String, List<String>> leftOut) {

    public static final String NO_HANSEN = "no Hansen parameters";
    /** Reason of the safety-first default (no CMR). */
    public static final String CMR = "carcinogen, mutagen or reproductive toxicant (H340/H350/H360)";
    /** Reason of the safety-first default (no ICH class 1). */
    public static final String ICH_CLASS_1 = "ICH Q3C class 1 (to be avoided)";
    /** Reason for a solvent ICH Q3C does not list when a class limit is set. */
    public static final String ICH_NOT_LISTED = "not listed in ICH Q3C (needs justification under Q3C; a class limit is set)";
    static final String WATER_CAS = "7732-18-5";

    public CandidatePool {
        free = List.copyOf(free);
        fixed = List.copyOf(fixed);
        Map<String, List<String>> copy = new LinkedHashMap<>();
        leftOut.forEach((k, v) -> copy.put(k, List.copyOf(v)));
        leftOut = java.util.Collections.unmodifiableMap(copy);
    }

    /**
     * Applies the per-solvent constraints to a library.
     *
     * @param library every solvent
     * @param c       the demands
     * @param target  the sphere (orders the free solvents by Ra)
     * @param rankBy  the ranking key (cost ranking needs prices)
     * @throws InvalidInputException when a fixed component breaks a constraint or lacks Hansen parameters
     */
    public static CandidatePool of(List<Solvent> library, BlendConstraints c, SolubilitySphere target, RankBy rankBy) {
        Map<String, List<String>> out = new LinkedHashMap<>();
        List<Solvent> fixedSolvents = c.fixed().stream().map(BlendComponent::solvent).toList();
        for (BlendComponent f : c.fixed()) {
            String why = reason(f.solvent(), c, rankBy, true);
            if (why != null) {
                throw new InvalidInputException("--fixed", f.solvent().name(), "the fixed component breaks a constraint: " + why);
            }
        }
        List<Solvent> free = new ArrayList<>();
        for (Solvent s : library) {
            if (fixedSolvents.contains(s)) {
                continue;
            }
            String why = reason(s, c, rankBy, false);
            if (why == null) {
                free.add(s);
            } else {
                out.computeIfAbsent(why, k -> new ArrayList<>()).add(s.name());
            }
        }
        free.sort(Comparator.comparingDouble((Solvent s) -> target.ra(s.hansen())).thenComparing(Solvent::name));
        return new CandidatePool(free, c.fixed(), library.size(), out);
    }

    /** The left-out reason for solvents that form a salt with a solute of this character. */
    public static String saltWith(SoluteCharacter sc) {
        return "forms a salt with the " + sc.word() + " solute (" + sc.clash().label() + ")";
    }

    /** Number of solvents left out for lack of Hansen parameters. */
    public int withoutHansen() {
        return leftOut.getOrDefault(NO_HANSEN, List.of()).size();
    }

    /** The first constraint a solvent fails, or null when it may take part. */
    static String reason(Solvent s, BlendConstraints c, RankBy rankBy, boolean fixedComponent) {
        if (!s.hasHansen()) {
            return NO_HANSEN;
        }
        if (!fixedComponent && !c.include().isEmpty() && !c.include().contains(s)) {
            return "not in the include list";
        }
        if (c.exclude().contains(s)) {
            return "excluded by name";
        }
        // A solvent belongs to every family it has (chlorobenzene: aromatic and chlorinated); filters look at all of them.
        List<String> fams = s.families().stream().map(f -> f.toLowerCase(Locale.ROOT)).toList();
        if (!fixedComponent && !c.families().isEmpty() && c.families().stream().noneMatch(f -> fams.contains(f.toLowerCase(Locale.ROOT)))) {
            return "family not in the allowed families";
        }
        if (c.excludeFamilies().stream().anyMatch(f -> fams.contains(f.toLowerCase(Locale.ROOT)))) {
            return "family excluded";
        }
        if (c.noCmr() && s.isCmr()) {
            return CMR;
        }
        BlendConstraints.More m = c.more();
        if (m.noIchClass1() && s.ichClass() != null && s.ichClass() == 1) {
            return ICH_CLASS_1;
        }
        for (HazardLimit h : m.healthLimits()) {
            if (h.rejects(s)) {
                return "as bad as or worse than the original on " + h.kind() + " (" + h.because() + ")";
            }
        }
        for (SoluteCharacter sc : m.solute()) {
            if (sc.clash().applies(s)) {
                return saltWith(sc);
            }
        }
        for (ReactiveFlag f : m.excludeReactive()) {
            if (f.applies(s)) {
                return "reactive: " + f.label();
            }
        }
        if (c.boilingMinC() != null || c.boilingMaxC() != null) {
            Double bp = s.boilingPointC();
            if (bp == null) {
                return "boiling point unknown (a window is set)";
            }
            if ((c.boilingMinC() != null && bp < c.boilingMinC()) || (c.boilingMaxC() != null && bp > c.boilingMaxC())) {
                return "boiling point outside the window";
            }
        }
        if (c.minFlashPointC() != null) {
            Double fp = s.flashPointC();
            if (fp == null && isFlammableByStatement(s)) {
                return "flash point unknown (a minimum is set)";
            }
            if (fp != null && fp < c.minFlashPointC()) {
                return "flash point below the minimum";
            }
        }
        if (c.maxIchClass() != null) {
            Integer ich = s.ichClass();
            if (ich == null && !WATER_CAS.equals(s.cas()) && !m.ichUnlistedAllowed()) {
                return ICH_NOT_LISTED;
            }
            if (ich != null && ich < c.maxIchClass()) {
                return "ICH Q3C class of greater concern than allowed";
            }
        }
        if ((c.maxCost() != null || rankBy == RankBy.COST) && s.pricePerLitre() == null) {
            return "no price entered (needed for cost)";
        }
        return null;
    }

    /** A missing flash point means "not flammable" only when no flammable-liquid statement (H224–H226) says otherwise. */
    static boolean isFlammableByStatement(Solvent s) {
        return s.hazardStatements().stream().anyMatch(h -> h.startsWith("H224") || h.startsWith("H225") || h.startsWith("H226"));
    }
}
