package org.cohesa.core.cases;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.cohesa.core.records.RecordStatus;

/** What each step of a case has done and what it still misses, in words the step strip shows. */
public final class CaseProgress {

    /** One step's state: done or not, and the line that says what is there or what is missing. */
    public record State(CaseStep step, boolean done, String text) {
    }

    /**
     * What the case alone does not hold but its steps depend on.
     *
     * @param limitsChanged true when the limits as the form holds them now differ from those the last search ran with
     * @param recordStatus  the filed record's status as the register holds it, or null when not known (not read yet)
     */
    public record Facts(boolean limitsChanged, RecordStatus recordStatus) {
        public static final Facts NONE = new Facts(false, null);
    }

    private CaseProgress() {
    }

    public static List<State> of(SubstitutionCase c) {
        return of(c, Facts.NONE);
    }

    /** The five steps' states, with what the register and the limits form add to the case. */
    public static List<State> of(SubstitutionCase c, Facts facts) {
        List<State> out = new ArrayList<>();
        SubstitutionCase.CaseMaterial m = c.material();
        out.add(m == null ? new State(CaseStep.MATERIAL, false, "no material yet")
                : new State(CaseStep.MATERIAL, true, m.name() + String.format(Locale.ROOT, " · R0 %.1f MPa½", m.r0())));
        if (c.limits().isEmpty()) {
            out.add(new State(CaseStep.LIMITS, false, m == null ? "waits for the material" : "no search run yet"));
        } else if (facts.limitsChanged()) {
            out.add(new State(CaseStep.LIMITS, false, "changed since the last search: search again"));
        } else {
            out.add(new State(CaseStep.LIMITS, true, limitsText(c)));
        }
        if (c.found().isEmpty()) {
            out.add(new State(CaseStep.CANDIDATES, false, c.limits().isEmpty() ? "none yet" : "the search found none: loosen the limits"));
        } else if (c.chosen().isEmpty()) {
            out.add(new State(CaseStep.CANDIDATES, false, c.found().size() + " found, none chosen yet"));
        } else {
            out.add(new State(CaseStep.CANDIDATES, true, c.found().size() + " found, " + c.chosen().size() + " chosen"));
        }
        int need = 3 * c.chosen().size();
        int done = c.chosen().stream().mapToInt(SubstitutionCase.ChosenCandidate::checksDone).sum();
        out.add(c.chosen().isEmpty() ? new State(CaseStep.CHECKS, false, "no candidate chosen")
                : new State(CaseStep.CHECKS, done == need, done + " of " + need + " checks done"));
        out.add(record(c, facts.recordStatus()));
        return out;
    }

    /** The first step not done (the one to work on next), or RECORD when all are. */
    public static CaseStep next(SubstitutionCase c) {
        return of(c).stream().filter(s -> !s.done()).map(State::step).findFirst().orElse(CaseStep.RECORD);
    }

    /** Filed is not the end: the step is done when the record has its decision (approved or rejected). */
    private static State record(SubstitutionCase c, RecordStatus status) {
        if (c.recordId() == null) {
            return new State(CaseStep.RECORD, false, c.chosen().isEmpty() ? "not filed: needs a chosen candidate" : "not filed");
        }
        String r = "record " + c.recordId();
        if (status == null) {
            return new State(CaseStep.RECORD, true, r + " filed");
        }
        return switch (status) {
            case DRAFT -> new State(CaseStep.RECORD, false, r + " draft: send it to review");
            case IN_REVIEW -> new State(CaseStep.RECORD, false, r + " in review: awaits a decision");
            case APPROVED -> new State(CaseStep.RECORD, true, r + " approved");
            case REJECTED -> new State(CaseStep.RECORD, true, r + " rejected");
        };
    }

    private static String limitsText(SubstitutionCase c) {
        List<String> parts = new ArrayList<>();
        String red = c.limits().get("red-limit");
        if (red != null && !red.isBlank()) {
            parts.add("RED ≤ " + red);
        }
        String k = c.limits().get("max-components");
        if (k != null && !k.isBlank()) {
            parts.add("≤ " + k + " components");
        }
        if ("true".equals(c.limits().get("no-cmr"))) {
            parts.add("no CMR");
        }
        String families = c.limits().get("families");
        if (families != null && !families.isBlank()) {
            parts.add("only " + families.replace(";", ", "));
        }
        String water = c.limits().get("with-water");
        if (water != null && water.startsWith("separates")) {
            parts.add("separates from water");
        } else if (water != null && water.startsWith("mixes")) {
            parts.add("mixes with water");
        }
        String flash = c.limits().get("min-blend-flash");
        if (flash != null && !flash.isBlank()) {
            parts.add("blend flash ≥ " + flash + " °C");
        }
        return parts.isEmpty() ? "set" : String.join(" · ", parts);
    }
}
