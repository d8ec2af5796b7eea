package org.cohesa.core.cases;

import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.hsp.SolubilitySphere;

/**
 * One piece of a formulator's work, from the material to the filed record: "replace X in process Y" or "find a liquid
 * for material Z" (immutable; every change gives a new value). Saved in the local database by the store.
 *
 * @param id         0 until the case is first saved
 * @param title      what the user calls it, e.g. "NMP out of the PVDF slurry"
 * @param kind       replacing a liquid, or finding one
 * @param replaced   the liquid replaced (a solvent name or NAME:FRACTION,…), empty when the case only seeks a liquid
 * @param process    the process or product the liquid serves, free text (may be empty)
 * @param material   the material the liquid must dissolve, or null while none is chosen
 * @param limits     the search limits as the form holds them (field key → text), empty until a search has run
 * @param found      the candidates the last search returned, best first, as blend notation
 * @param chosen     the candidates taken further, with their checks
 * @param recordId   the substitution record filed for this case, or null
 * @param created    when the case was started
 * @param updated    when it was last saved
 */
public record SubstitutionCase(long id, String title, Kind kind, String replaced, String process, CaseMaterial material,
        Map<String, String> limits, List<String> found, List<ChosenCandidate> chosen, Long recordId, Instant created, Instant updated) {

    /** Longest title, liquid or process text a case keeps (as record fields do). */
    public static final int MAX_TEXT = 200;

    /** The two jobs a case can be. */
    public enum Kind {
        /** take a liquid out of a process */
        REPLACE("replace a liquid"),
        /** find a liquid for a material */
        FIND("find a liquid");

        private final String words;

        Kind(String words) {
            this.words = words;
        }

        public String words() {
            return words;
        }
    }

    /**
     * The material of a case: a sphere with its name and where it came from (library, fit, typed in).
     *
     * @param dD δD, MPa½; dP δP, MPa½; dH δH, MPa½; r0 interaction radius R0, MPa½
     */
    public record CaseMaterial(String name, String source, double dD, double dP, double dH, double r0) {
        public CaseMaterial {
            name = name == null || name.isBlank() ? "typed-in sphere" : name.strip();
            source = source == null ? "" : source;
            SolubilitySphere.of(dD, dP, dH, r0); // validates: non-negative parameters, positive radius
        }

        public SolubilitySphere sphere() {
            return SolubilitySphere.of(dD, dP, dH, r0);
        }

        public static CaseMaterial of(String name, String source, SolubilitySphere s) {
            return new CaseMaterial(name, source, s.centre().dD(), s.centre().dP(), s.centre().dH(), s.r0());
        }
    }

    /**
     * A candidate taken further and what its checks found; a check not yet run is null.
     *
     * @param blend       blend notation (NAME:FRACTION,…)
     * @param red         RED to the case's material when chosen
     * @param safety      one-line result of the safety check
     * @param drying      one-line result of the drying check
     * @param miscibility one-line result of the phase and water check
     */
    public record ChosenCandidate(String blend, double red, String safety, String drying, String miscibility) {
        public ChosenCandidate {
            if (blend == null || blend.isBlank()) {
                throw new InvalidInputException("candidate", String.valueOf(blend), "a chosen candidate needs its blend");
            }
        }

        public int checksDone() {
            return (safety == null ? 0 : 1) + (drying == null ? 0 : 1) + (miscibility == null ? 0 : 1);
        }

        public ChosenCandidate withSafety(String s) {
            return new ChosenCandidate(blend, red, s, drying, miscibility);
        }

        public ChosenCandidate withDrying(String s) {
            return new ChosenCandidate(blend, red, safety, s, miscibility);
        }

        public ChosenCandidate withMiscibility(String s) {
            return new ChosenCandidate(blend, red, safety, drying, s);
        }
    }

    public SubstitutionCase {
        title = text("title", title, false);
        Objects.requireNonNull(kind, "kind");
        replaced = text("replaced liquid", replaced, true);
        process = text("process", process, true);
        if (kind == Kind.REPLACE && replaced.isEmpty()) {
            throw new InvalidInputException("replaced liquid", "", "a replacement case names the liquid it replaces");
        }
        limits = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(Objects.requireNonNullElse(limits, Map.of())));
        found = List.copyOf(Objects.requireNonNullElse(found, List.of()));
        chosen = List.copyOf(Objects.requireNonNullElse(chosen, List.of()));
        if (recordId != null && recordId <= 0) {
            throw new InvalidInputException("record", String.valueOf(recordId), "a record number is positive");
        }
        Objects.requireNonNull(created, "created");
        updated = Objects.requireNonNullElse(updated, created);
    }

    /** A new, unsaved case. */
    public static SubstitutionCase start(String title, Kind kind, String replaced, String process, Instant now) {
        return new SubstitutionCase(0, title, kind, replaced, process, null, Map.of(), List.of(), List.of(), null, now, now);
    }

    private static String text(String field, String value, boolean mayBeEmpty) {
        String v = value == null ? "" : value.strip();
        if (v.isEmpty() && !mayBeEmpty) {
            throw new InvalidInputException(field, "", "must not be empty");
        }
        if (v.length() > MAX_TEXT) {
            throw new InvalidInputException(field, v.substring(0, 40) + "…", "is longer than " + MAX_TEXT + " characters");
        }
        return v;
    }

    public SubstitutionCase withId(long newId, Instant savedAt) {
        return new SubstitutionCase(newId, title, kind, replaced, process, material, limits, found, chosen, recordId, created, savedAt);
    }

    public SubstitutionCase withMaterial(CaseMaterial m) {
        // candidates and their checks belong to the material they were found for
        boolean same = Objects.equals(m, material);
        return new SubstitutionCase(id, title, kind, replaced, process, m, limits, same ? found : List.of(), same ? chosen : List.of(),
                recordId, created, updated);
    }

    public SubstitutionCase withSearch(Map<String, String> newLimits, List<String> newFound) {
        List<ChosenCandidate> kept = chosen.stream().filter(c -> newFound.contains(c.blend())).toList();
        return new SubstitutionCase(id, title, kind, replaced, process, material, newLimits, newFound, kept, recordId, created, updated);
    }

    public SubstitutionCase withChosen(List<ChosenCandidate> c) {
        return new SubstitutionCase(id, title, kind, replaced, process, material, limits, found, c, recordId, created, updated);
    }

    public SubstitutionCase withRecord(long record) {
        return new SubstitutionCase(id, title, kind, replaced, process, material, limits, found, chosen, record, created, updated);
    }

    public SubstitutionCase withHeader(String newTitle, Kind newKind, String newReplaced, String newProcess) {
        return new SubstitutionCase(id, newTitle, newKind, newReplaced, newProcess, material, limits, found, chosen, recordId, created, updated);
    }

    /** Takes {@code blend} further (no change when it already is). */
    public SubstitutionCase choose(String blend, double red) {
        if (chosen.stream().anyMatch(c -> c.blend().equals(blend))) {
            return this;
        }
        List<ChosenCandidate> c = new ArrayList<>(chosen);
        c.add(new ChosenCandidate(blend, red, null, null, null));
        return withChosen(c);
    }

    /** Drops {@code blend} from the chosen ones. */
    public SubstitutionCase unchoose(String blend) {
        return withChosen(chosen.stream().filter(c -> !c.blend().equals(blend)).toList());
    }

    /** Replaces the chosen candidate with the same blend. */
    public SubstitutionCase update(ChosenCandidate changed) {
        return withChosen(chosen.stream().map(c -> c.blend().equals(changed.blend()) ? changed : c).toList());
    }
}
