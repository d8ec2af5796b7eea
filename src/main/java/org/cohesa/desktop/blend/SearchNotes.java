package org.cohesa.desktop.blend;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.cohesa.core.blend.SoluteCharacter;
import org.cohesa.core.blend.BlendConstraints;
import org.cohesa.core.blend.BlendDesigner;
import org.cohesa.core.blend.CandidatePool;

/** What a search searched and what it left out, in the form's words (the screen shows it above the candidates). */
final class SearchNotes {

    private SearchNotes() {
    }

    /** One paragraph: solvents searched, left out by each limit, blends dropped by the blend-level limits. */
    static String summary(BlendDesigner.Result r, BlendConstraints c) {
        CandidatePool p = r.pool();
        StringBuilder b = new StringBuilder(String.format(Locale.ROOT, "Searched %d of %d solvents (%d without Hansen parameters).",
                p.free().size(), p.librarySize(), p.withoutHansen()));
        for (Map.Entry<String, List<String>> e : p.leftOut().entrySet()) {
            if (e.getKey().equals(CandidatePool.NO_HANSEN) || e.getKey().equals(CandidatePool.CMR) || e.getKey().equals(CandidatePool.ICH_CLASS_1)
                    || c.more().solute().stream().anyMatch(sc -> e.getKey().equals(CandidatePool.saltWith(sc)))) {
                continue;
            }
            b.append(' ').append(e.getValue().size()).append(" left out: ").append(e.getKey()).append('.');
        }
        if (r.droppedTwoPhase() > 0) {
            b.append(' ').append(r.droppedTwoPhase()).append(" blends left out: two liquid phases.");
        }
        if (r.droppedFlashPoint() > 0) {
            b.append(' ').append(r.droppedFlashPoint()).append(" blends left out: blend flash point below ")
                    .append(c.more().minBlendFlashPointC()).append(" °C or unknown.");
        }
        if (r.droppedWater() > 0) {
            b.append(' ').append(r.droppedWater()).append(" blends left out: do not ").append(c.more().withWater() == null ? "behave with water as asked"
                    : c.more().withWater().word().equals("immiscible") ? "separate from water" : "mix with water").append('.');
        }
        if (c.more().minBlendFlashPointC() != null) {
            b.append(" Flash point limit applied to the blend's computed flash point (Liaw et al. 2002), not to each component.");
        }
        return b.toString();
    }

    /** One line per safety default (no CMR, no ICH class 1) that left solvents out, naming them and the switch that lets them in. */
    static List<String> safetyDefaults(CandidatePool p) {
        List<String> out = new ArrayList<>();
        List<String> cmr = p.leftOut().get(CandidatePool.CMR);
        if (cmr != null && !cmr.isEmpty()) {
            out.add("CMR (" + cmr.size() + "): " + String.join(", ", cmr) + " — untick “No CMR” to let them take part");
        }
        List<String> ich = p.leftOut().get(CandidatePool.ICH_CLASS_1);
        if (ich != null && !ich.isEmpty()) {
            out.add("ICH Q3C class 1, to be avoided (" + ich.size() + "): " + String.join(", ", ich) + " — tick “Allow ICH class 1” to let them take part");
        }
        return out;
    }

    /**
     * One line per acid–base character of the material: the salt formers left out (named, with the switch that lets
     * them in), or, when the switch lets them in, that they take part — the desktop's words for the command line's
     * "the material is acidic by its structure: amine solvents left out … (--allow-salt-formers keeps them)".
     */
    static List<String> saltFormers(CandidatePool p, String material, Set<SoluteCharacter> character, boolean allowed) {
        List<String> out = new ArrayList<>();
        for (SoluteCharacter sc : character) {
            String head = material + " is " + sc.word() + " by its structure, " + sc.why();
            if (allowed) {
                out.add(head + ": " + sc.clash().label() + " solvents take part because “Allow salt formers” is ticked");
                continue;
            }
            List<String> names = p.leftOut().getOrDefault(CandidatePool.saltWith(sc), List.of());
            if (!names.isEmpty()) {
                out.add("Salt formers, " + head + " (" + names.size() + "): " + String.join(", ", names)
                        + " — tick “Allow salt formers” to let them take part");
            }
        }
        return out;
    }
}
