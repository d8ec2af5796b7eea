package org.cohesa.cli.safety;

import com.fasterxml.jackson.annotation.JsonProperty;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.cohesa.cli.Output;
import org.cohesa.core.safety.IchQ3c;
import org.cohesa.core.safety.SafetyProfile;
import org.cohesa.core.safety.SolventGuide;
import org.cohesa.core.safety.VapourExposure;

/**
 * What {@code cohesa hazards --json} prints: the safety profile as records serialised by Jackson. Temperatures in
 * °C, concentrations in ppm (mol/mol × 10⁶ in air), PDE in mg/day, shares of the blend in % by volume.
 */
record HazardsReport(
        String liquid,
        @JsonProperty("temperature_c") Double temperatureC,
        @JsonProperty("flash_point_c") Double flashPointC,
        @JsonProperty("flash_point_status") String flashPointStatus,
        @JsonProperty("flash_point_model") String flashPointModel,
        @JsonProperty("flash_point_notes") List<String> flashPointNotes,
        @JsonProperty("initial_boiling_point_c") Double initialBoilingPointC,
        @JsonProperty("initial_boiling_point_basis") String initialBoilingPointBasis,
        @JsonProperty("ghs_flammable_category") Integer ghsFlammableCategory,
        @JsonProperty("ghs_basis") String ghsBasis,
        @JsonProperty("packing_group") String packingGroup,
        @JsonProperty("hazard_statements") List<Statement> hazardStatements,
        List<Cmr> cmr,
        @JsonProperty("aspiration_hazard") List<String> aspirationHazard,
        @JsonProperty("peroxide_formers") List<String> peroxideFormers,
        @JsonProperty("exposure_index") Double exposureIndex,
        @JsonProperty("exposure_index_complete") boolean exposureIndexComplete,
        @JsonProperty("vapour_hazard_ratio") Double vapourHazardRatio,
        @JsonProperty("activity_model") String activityModel,
        List<Exposure> exposure,
        @JsonProperty("exposure_notes") List<String> exposureNotes,
        @JsonProperty("ich_q3c") List<Ich> ichQ3c,
        @JsonProperty("ich_q3c_version") String ichQ3cVersion,
        @JsonProperty("guide_rank") String guideRank,
        @JsonProperty("guide_method") String guideMethod,
        @JsonProperty("guide_scores") List<Guide> guideScores,
        List<String> cautions) {

    record Statement(String code, String text, List<Carrier> components) {
    }

    record Carrier(String name, @JsonProperty("volume_percent") Double volumePercent) {
    }

    record Cmr(String name, String effect, String code, String category, @JsonProperty("volume_percent") Double volumePercent) {
    }

    record Exposure(String name, @JsonProperty("saturated_vapour_ppm") Double saturatedVapourPpm, @JsonProperty("twa_ppm") Double twaPpm,
                    @JsonProperty("stel_ppm") Double stelPpm, @JsonProperty("limit_used") String limitUsed, String jurisdiction, boolean skin,
                    Double ratio, String status) {
    }

    record Ich(String name, @JsonProperty("class") Integer solventClass, @JsonProperty("pde_mg_per_day") Double pdeMgPerDay,
               @JsonProperty("limit_ppm") Double limitPpm, String basis) {
    }

    record Guide(String name, int safety, int health, int environment, String rank, @JsonProperty("rank_basis") String rankBasis, List<String> notes) {
    }

    static HazardsReport of(SafetyProfile p, List<String> cautions) {
        List<Statement> hs = new ArrayList<>();
        for (SafetyProfile.HazardLine h : p.hazardStatements()) {
            hs.add(new Statement(h.code(), h.text(),
                    h.carriers().stream().map(c -> new Carrier(c.name(), Output.round(c.volumePercent(), 2))).toList()));
        }
        List<Cmr> cmr = p.cmr().stream()
                .map(c -> new Cmr(c.component(), c.effect(), c.code(), c.category(), Output.round(c.volumePercent(), 2))).toList();
        Double index = p.exposure().anyCounted() ? Output.round(p.exposure().index(), 3) : null;
        List<Exposure> ex = new ArrayList<>();
        for (VapourExposure.Component c : p.exposure().components()) {
            ex.add(new Exposure(c.name(), Output.round(c.saturatedPpm(), 1), c.twaPpm(), c.stelPpm(), c.limitKind(), c.jurisdiction(), c.skin(),
                    Output.round(c.ratio(), 3), c.status()));
        }
        List<Ich> ich = new ArrayList<>();
        for (SafetyProfile.IchLine l : p.ich()) {
            IchQ3c.Entry e = l.entry();
            ich.add(new Ich(l.component(), e == null ? null : e.solventClass(), e == null ? null : e.pdeMgPerDay(), e == null ? null : e.limitPpm(),
                    e == null ? "not listed in the guideline" : e.basisText()));
        }
        List<Guide> g = p.guide().stream().map(l -> new Guide(l.component(), l.scores().safety(), l.scores().health(),
                l.scores().environment(), l.scores().rank().label(), l.scores().basis(), l.scores().notes())).toList();
        return new HazardsReport(p.blend().describe(), Output.round(p.temperatureC(), 2), Output.round(p.flashPoint().celsius(), 1),
                p.flashPoint().status().name().toLowerCase(Locale.ROOT), p.flashPoint().model(), p.flashPoint().detail(),
                Output.round(p.initialBoilingPointC(), 1), p.initialBoilingPointBasis(), p.ghs().category(),
                p.ghs().basis() + " (GHS Rev. 10, Table 2.6.1)", p.packingGroup(), hs, cmr, p.aspirationHazards(), p.peroxideFormers(),
                index, p.exposure().complete(), index, p.activityModel(), ex, p.exposure().notes(), ich, IchQ3c.VERSION,
                p.guideRank().label(), SolventGuide.METHOD + (p.isPure() ? "" : "; blend = least favourable component (our rule)"), g, cautions);
    }
}
