package org.cohesa.cli.library;

import com.fasterxml.jackson.annotation.JsonProperty;
import java.util.List;
import java.util.Map;
import org.cohesa.core.coverage.LibraryCoverage;
import org.cohesa.core.coverage.PropertyCoverage;
import org.cohesa.core.coverage.WorkflowCoverage;

/** What {@code cohesa solvents --coverage --json} prints: {@link LibraryCoverage} as records serialised by Jackson. */
record CoverageReport(
        int solvents,
        List<Property> properties,
        @JsonProperty("vapour_pressure_at_25c") Map<String, Integer> vapourPressureAt25C,
        Workflows workflows,
        String basis) {

    /** One property: how many have it and what the values rest on (source-key rules of solvent-db/SOURCES.md). */
    record Property(String property, String label, int have, int of, double fraction, int measured, int estimated,
            @JsonProperty("from_memory") int fromMemory, int derived, @JsonProperty("your_entries") int yourEntries, int unsourced) {
    }

    record Workflows(@JsonProperty("hansen_solvents") int hansenSolvents,
            @JsonProperty("drying_computable") int dryingComputable,
            @JsonProperty("drying_fraction") double dryingFraction,
            @JsonProperty("blend_flash_point_computable") int blendFlashPointComputable,
            @JsonProperty("blend_flash_point_fraction") double blendFlashPointFraction,
            @JsonProperty("flash_point_test_partner") String partner,
            @JsonProperty("not_drying") List<String> notDrying,
            @JsonProperty("no_blend_flash_point") List<String> noBlendFlashPoint) {
    }

    static final String BASIS = "measured = a published table or paper (measured, evaluated or tabulated values); estimated = source key "
            + "'estimate-…'; from memory = source key 'memory-…' (recalled, unchecked); derived = computed from other values or "
            + "assigned by rule (molar mass from the formula, hand-made UNIFAC groups). Drying: evaporation rate at 25 °C computable; "
            + "blend flash point: a 50/50 blend with the partner gets a verdict on data.";

    static CoverageReport of(LibraryCoverage c) {
        List<Property> props = c.properties().stream().map(CoverageReport::property).toList();
        WorkflowCoverage w = c.workflows();
        return new CoverageReport(c.solvents(), props, c.vapourPressureAt25C(),
                new Workflows(w.hansenSolvents(), w.dryingComputable(), round(w.dryingFraction()), w.blendFlashPointComputable(),
                        round(w.blendFlashPointFraction()), w.partner(), w.notDrying(), w.notFlashPoint()), BASIS);
    }

    private static Property property(PropertyCoverage p) {
        return new Property(p.property(), p.label(), p.have(), p.solvents(), round(p.fraction()), p.measured(), p.estimated(), p.memory(),
                p.derived(), p.user(), p.unsourced());
    }

    private static double round(double x) {
        return Math.round(x * 1000) / 1000.0;
    }
}
