package org.cohesa.core.records;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import org.cohesa.core.safety.Cautions;
import org.cohesa.core.safety.SafetyProfile;

/**
 * Turns the safety workflow's profiles of the two liquids into the snapshot's {@code safety} section and
 * the caution sentences (both computed by {@code org.cohesa.core.safety}; this class only files them).
 */
public final class SafetyEvidence {

    private SafetyEvidence() {
    }

    /** The {@code safety} section: {@code {"replaced": {…}, "replacement": {…}}}. */
    public static ObjectNode section(SafetyProfile replaced, SafetyProfile replacement) {
        ObjectNode o = CanonicalJson.object();
        o.set(Evidence.Sections.REPLACED, liquid(replaced));
        o.set(Evidence.Sections.REPLACEMENT, liquid(replacement));
        return o;
    }

    /** The caution sentences for both liquids, each once, the shared reminder last. */
    public static List<String> cautions(SafetyProfile replaced, SafetyProfile replacement) {
        Set<String> out = new LinkedHashSet<>();
        for (String c : Cautions.forProfile(replaced)) {
            if (!c.equals(Cautions.REMINDER)) {
                out.add("Replaced liquid: " + c);
            }
        }
        for (String c : Cautions.forProfile(replacement)) {
            if (!c.equals(Cautions.REMINDER)) {
                out.add("Replacement: " + c);
            }
        }
        out.add(Cautions.REMINDER);
        return List.copyOf(out);
    }

    static ObjectNode liquid(SafetyProfile p) {
        ObjectNode o = CanonicalJson.object();
        o.put("temperature_c", CanonicalJson.number(p.temperatureC()));
        SafetyProfile.FlashPoint fp = p.flashPoint();
        if (fp.celsius() != null) {
            o.put("flash_point_c", CanonicalJson.number(fp.celsius()));
        }
        o.put("flash_point_status", fp.status().name().toLowerCase(java.util.Locale.ROOT));
        o.put("flash_point_method", fp.model());
        ArrayNode notes = o.putArray("flash_point_notes");
        fp.detail().forEach(notes::add);
        if (p.initialBoilingPointC() != null) {
            o.put("initial_boiling_point_c", CanonicalJson.number(p.initialBoilingPointC()));
        }
        Integer cat = p.ghs().category();
        o.put("ghs_flammable_category", cat == null ? "not classified" : "Category " + cat);
        o.put("ghs_basis", p.ghs().basis());
        o.put("packing_group", p.packingGroup());
        ArrayNode hs = o.putArray("hazard_statements");
        for (SafetyProfile.HazardLine h : p.hazardStatements()) {
            ObjectNode x = hs.addObject();
            x.put("code", h.code());
            x.put("text", h.text());
            ArrayNode carriers = x.putArray("carriers");
            for (SafetyProfile.Carrier c : h.carriers()) {
                carriers.addObject().put("name", c.name()).put("volume_percent", CanonicalJson.number(c.volumePercent()));
            }
        }
        ArrayNode cmr = o.putArray("cmr");
        for (SafetyProfile.CmrEntry c : p.cmr()) {
            cmr.addObject().put("component", c.component()).put("effect", c.effect()).put("code", c.code())
                    .put("category", c.category()).put("volume_percent", CanonicalJson.number(c.volumePercent()));
        }
        if (p.exposure().anyCounted()) {
            o.put("exposure_index", CanonicalJson.number(p.exposure().index()));
            o.put("exposure_index_complete", p.exposure().complete());
        }
        o.put("activity_model", p.activityModel());
        ArrayNode ich = o.putArray("ich_q3c");
        for (SafetyProfile.IchLine l : p.ich()) {
            ObjectNode x = ich.addObject();
            x.put("component", l.component());
            if (l.entry() != null) {
                x.put("class", l.entry().solventClass());
                if (l.entry().pdeMgPerDay() != null) {
                    x.put("pde_mg_per_day", CanonicalJson.number(l.entry().pdeMgPerDay()));
                }
                if (l.entry().limitPpm() != null) {
                    x.put("limit_ppm", CanonicalJson.number(l.entry().limitPpm()));
                }
                x.put("basis", l.entry().basis());
            } else {
                x.putNull("class");
            }
        }
        o.put("guide_rank", p.guideRank() == null ? null : p.guideRank().label());
        return o;
    }
}
