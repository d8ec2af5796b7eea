package org.cohesa.cli.library;

import java.util.LinkedHashMap;
import java.util.Map;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.store.SolventFields;
import org.cohesa.store.SourceCatalog;

/** A solvent as a JSON object: the field names of the CSV files, numbers as numbers, sources with citations. */
public final class SolventView {

    private SolventView() {
    }

    public static Map<String, Object> json(Solvent s, SourceCatalog catalog) {
        Map<String, Object> m = new LinkedHashMap<>();
        Map<String, String> row = SolventFields.toRow(s);
        for (String col : SolventFields.VALUES) {
            String v = row.get(col);
            if (col.equals("synonyms")) {
                m.put(col, s.synonyms());
            } else if (col.equals("families")) {
                m.put(col, s.families());
            } else if (col.equals("hazard_statements")) {
                m.put(col, s.hazardStatements());
            } else if (col.equals("oel_skin")) {
                m.put(col, s.exposure().skin());
            } else if (col.equals("peroxide_former")) {
                m.put(col, s.peroxideFormer());
            } else if (col.equals("ich_class")) {
                m.put(col, s.ichClass());
            } else if (SolventFields.isNumeric(col)) {
                m.put(col, v.isEmpty() ? null : Double.valueOf(v));
            } else {
                m.put(col, v.isEmpty() ? null : v);
            }
        }
        m.put("molar_volume", s.effectiveMolarVolume());
        m.put("price_per_litre", s.pricePerLitre());
        m.put("user_entry", s.userEntry());
        Map<String, Object> sources = new LinkedHashMap<>();
        s.sources().forEach((group, key) -> {
            Map<String, Object> src = new LinkedHashMap<>();
            src.put("key", key);
            src.put("citation", catalog.citation(key).orElse(null));
            sources.put(group, src);
        });
        m.put("sources", sources);
        m.put("note", s.note());
        if (!s.hasHansen()) {
            m.put("searchable", false);
            m.put("why_not_searchable", "no published Hansen parameters in the library; kept for its safety data");
        }
        return m;
    }
}
