package org.cohesa.core.records;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.cohesa.core.drying.DryingPath;
import org.cohesa.core.drying.PathPoint;

/**
 * Files the drying workflow's paths of the two liquids ({@code org.cohesa.core.drying}) as the snapshot's
 * {@code drying} section: per liquid the RED along the path ({@code [evaporated, red]} pairs), where it
 * leaves the sphere, the solvent left last and the model that served.
 */
public final class DryingEvidence {

    private DryingEvidence() {
    }

    public static ObjectNode section(DryingPath replaced, DryingPath replacement, String replacedNotation, String replacementNotation,
                                     double temperatureC) {
        return section(replaced, replacement, null, null, replacedNotation, replacementNotation, temperatureC);
    }

    /**
     * Both liquids' series; a liquid whose path could not be computed (null) gets a series with its {@code note} and no
     * points, so the other liquid's path is still filed.
     */
    public static ObjectNode section(DryingPath replaced, DryingPath replacement, String whyNotReplaced, String whyNotReplacement,
                                     String replacedNotation, String replacementNotation, double temperatureC) {
        ObjectNode o = CanonicalJson.object();
        o.put("temperature_c", CanonicalJson.number(temperatureC));
        DryingPath any = replacement != null ? replacement : replaced;
        o.put("model", any == null ? null : any.model());
        ArrayNode series = o.putArray("series");
        series.add(replaced != null ? series(Evidence.Sections.REPLACED, replacedNotation, replaced)
                : missing(Evidence.Sections.REPLACED, replacedNotation, whyNotReplaced));
        series.add(replacement != null ? series(Evidence.Sections.REPLACEMENT, replacementNotation, replacement)
                : missing(Evidence.Sections.REPLACEMENT, replacementNotation, whyNotReplacement));
        return o;
    }

    private static ObjectNode missing(String liquid, String notation, String why) {
        ObjectNode s = CanonicalJson.object();
        s.put("liquid", liquid);
        s.put("notation", notation);
        s.put("note", "no drying path: " + why);
        s.putArray("points");
        return s;
    }

    private static ObjectNode series(String liquid, String notation, DryingPath p) {
        ObjectNode s = CanonicalJson.object();
        s.put("liquid", liquid);
        s.put("notation", notation);
        s.put("model", p.model());
        if (p.modelNote() != null && !p.modelNote().isBlank()) {
            s.put("model_note", p.modelNote());
        }
        ArrayNode pts = s.putArray("points");
        for (PathPoint pt : p.points()) {
            if (pt.red() != null) {
                pts.addArray().add(CanonicalJson.number(pt.evaporated())).add(CanonicalJson.number(pt.red()));
            }
        }
        if (p.leavesSphereAt() != null) {
            s.put("leaves_sphere_at", CanonicalJson.number(p.leavesSphereAt()));
        } else {
            s.putNull("leaves_sphere_at");
        }
        s.put("last_solvent", p.lastSolvent());
        s.put("evaporated_to", CanonicalJson.number(p.end().evaporated()));
        ArrayNode ex = s.putArray("exhausted");
        for (DryingPath.Exhaustion e : p.exhausted()) {
            ex.addObject().put("solvent", e.solvent()).put("evaporated", CanonicalJson.number(e.evaporated()));
        }
        ArrayNode notes = s.putArray("notes");
        p.notes().forEach(notes::add);
        return s;
    }
}
