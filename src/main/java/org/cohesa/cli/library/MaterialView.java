package org.cohesa.cli.library;

import java.util.LinkedHashMap;
import java.util.Map;
import org.cohesa.core.target.Material;
import org.cohesa.store.SourceCatalog;

/** A material as a JSON object: name, dD, dP, dH, r0, source first (scripts rely on these), then the rest. */
final class MaterialView {

    private MaterialView() {
    }

    static Map<String, Object> json(Material m, SourceCatalog catalog) {
        Map<String, Object> j = new LinkedHashMap<>();
        j.put("name", m.name());
        j.put("dD", m.sphere().centre().dD());
        j.put("dP", m.sphere().centre().dP());
        j.put("dH", m.sphere().centre().dH());
        j.put("r0", m.sphere().r0());
        j.put("source", m.source());
        j.put("citation", catalog.citation(m.source()).orElse(null));
        j.put("kind", m.kind().key());
        j.put("synonyms", m.synonyms());
        j.put("note", m.note());
        j.put("user_entry", m.userEntry());
        return j;
    }
}
