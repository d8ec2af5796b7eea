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
        ObjectNode o = CanonicalJson.object();
        o.put("temperature_c", CanonicalJson.number(temperatureC));
        o.put("model", replacement.model());
        ArrayNode series = o.putArray("series");
        series.add(series(Evidence.Sections.REPLACED, replacedNotation, replaced));
        series.add(series(Evidence.Sections.REPLACEMENT, replacementNotation, replacement));
        return o;
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
