package org.cohesa.cli.library;

import java.util.LinkedHashMap;
import java.util.Map;
import org.cohesa.core.coverage.Provenance;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.solvent.VapourPressure;
import org.cohesa.store.SolventFields;
import org.cohesa.store.SourceCatalog;

/** A solvent as a JSON object: the field names of the CSV files, numbers as numbers, sources with citations. */
public final class SolventView {

    private SolventView() {
    }

    /**
     * The source of one property group: its key, whether the value is measured, estimated, from memory, derived or
     * the user's ({@link Provenance}), and the citation of {@code solvent-db/SOURCES.md}.
     */
    record Source(String key, String basis, String citation) {
    }

    /** The vapour pressure at 25 °C and what it rests on there (a correlation inside its range, extrapolated, or an estimate). */
    record VapourAt25C(double kilopascal, String kind, String basis) {
    }

    static java.util.Optional<VapourAt25C> vapourAt25C(Solvent s) {
        return VapourPressure.of(s).map(vp -> {
            VapourPressure.Basis b = vp.methodAt(298.15);
            return new VapourAt25C(Math.round(vp.pressurePa(298.15) / 1e3 * 1e4) / 1e4, b.kind().name().toLowerCase(java.util.Locale.ROOT),
                    b.label());
        });
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
        s.sources().forEach((group, key) -> sources.put(group, new Source(key, Provenance.of(key, s.userEntry()).label(),
                catalog.citation(key).orElse(null))));
        m.put("sources", sources);
        m.put("vapour_pressure_at_25c", vapourAt25C(s).orElse(null));
        m.put("note", s.note());
        if (!s.hasHansen()) {
            m.put("searchable", false);
            m.put("why_not_searchable", "no published Hansen parameters in the library; kept for its safety data");
        }
        return m;
    }
}
