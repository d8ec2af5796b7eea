package org.cohesa.core.cases;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** What each step of a case has done and what it still misses, in words the step strip shows. */
public final class CaseProgress {

    /** One step's state: done or not, and the line that says what is there or what is missing. */
    public record State(CaseStep step, boolean done, String text) {
    }

    private CaseProgress() {
    }

    public static List<State> of(SubstitutionCase c) {
        List<State> out = new ArrayList<>();
        SubstitutionCase.CaseMaterial m = c.material();
        out.add(m == null ? new State(CaseStep.MATERIAL, false, "no material yet")
                : new State(CaseStep.MATERIAL, true, m.name() + String.format(Locale.ROOT, " · R0 %.1f MPa½", m.r0())));
        out.add(c.limits().isEmpty() ? new State(CaseStep.LIMITS, false, m == null ? "waits for the material" : "no search run yet")
                : new State(CaseStep.LIMITS, true, limitsText(c)));
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
        out.add(c.recordId() == null ? new State(CaseStep.RECORD, false, "not filed")
                : new State(CaseStep.RECORD, true, "record " + c.recordId() + " filed"));
        return out;
    }

    /** The first step not done (the one to work on next), or RECORD when all are. */
    public static CaseStep next(SubstitutionCase c) {
        return of(c).stream().filter(s -> !s.done()).map(State::step).findFirst().orElse(CaseStep.RECORD);
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
        String flash = c.limits().get("min-blend-flash");
        if (flash != null && !flash.isBlank()) {
            parts.add("blend flash ≥ " + flash + " °C");
        }
        return parts.isEmpty() ? "set" : String.join(" · ", parts);
    }
}
