package org.cohesa.cli.blend;

import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonProperty;
import com.fasterxml.jackson.annotation.JsonUnwrapped;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.cohesa.cli.Output;
import org.cohesa.core.blend.BlendDesigner;
import org.cohesa.core.blend.BlendSuggestion;
import org.cohesa.core.blend.CandidatePool;
import org.cohesa.core.blend.RankBy;
import org.cohesa.core.blend.RankedBlend;
import org.cohesa.core.solvent.BlendComponent;
import org.cohesa.core.solvent.BlendSpec;

/**
 * What {@code blend --json} and {@code replace --json} print, as records serialised by Jackson. Parameters in
 * MPa^½, temperatures in °C, fractions by volume.
 */
final class BlendReport {

    private BlendReport() {
    }

    record Part(String name, double fraction) {
        static List<Part> of(List<BlendComponent> comps) {
            return comps.stream().map(c -> new Part(c.solvent().name(), Double.parseDouble(BlendSpec.formatFraction(c.fraction())))).toList();
        }
    }

    record Phase(boolean checked, boolean splits, String model, String detail, String basis) {
    }

    record Variant(List<Part> components, double red, @JsonProperty("ra") double ra) {
    }

    /** The replace command's side-by-side columns (left out for blend). */
    record Comparison(@JsonProperty("ra_to_original") double raToOriginal, @JsonProperty("boiling_point_c_min") Double boilingPointCMin,
            @JsonProperty("boiling_point_c_max") Double boilingPointCMax, @JsonProperty("boiling_point_c_text") String boilingPointCText,
            @JsonProperty("lowest_component_flash_point_c") Double lowestComponentFlashPointC, @JsonProperty("ich_class") String ichClass,
            @JsonProperty("hazard_statements") List<String> hazardStatements) {
    }

    record Suggestion(int rank, List<Part> components, @JsonProperty("dD") double dD, @JsonProperty("dP") double dP, @JsonProperty("dH") double dH,
            double ra, double red, @JsonProperty("within_red_limit") boolean withinRedLimit, @JsonProperty("rank_by") String rankBy,
            @JsonInclude(JsonInclude.Include.NON_NULL) Double secondary, Double score, List<String> why, Phase phase,
            @JsonProperty("flash_point_c") Double flashPointC, @JsonProperty("flash_point_basis") String flashPointBasis, List<String> warnings,
            List<String> cautions, List<String> flags, List<Variant> variants, @JsonUnwrapped Comparison comparison) {
    }

    static Suggestion suggestion(int rank, BlendSuggestion s, Comparison comparison) {
        RankedBlend b = s.blend();
        Phase phase = s.phase() == null ? new Phase(true, false, null, "a single liquid cannot split", null)
                : new Phase(s.phase().checked(), s.phase().splits(), s.phase().model(), s.phase().detail(), s.phase().basis());
        List<Variant> variants = s.variants().stream().map(v -> new Variant(Part.of(v.components()), Output.round(v.red(), 4), Output.round(v.ra(), 4))).toList();
        return new Suggestion(rank, Part.of(b.components()), Output.round(b.point().dD(), 3), Output.round(b.point().dP(), 3), Output.round(b.point().dH(), 3),
                Output.round(b.ra(), 4), Output.round(b.red(), 4), b.withinLimit(), b.rankBy().word(),
                b.rankBy() == RankBy.RED || b.rankBy() == RankBy.DESIRABILITY ? null : Output.round(b.secondary(), 4),
                Double.isNaN(s.score()) ? null : Output.round(s.score(), 4), s.why(), phase,
                s.flashPointC() == null ? null : Output.round(s.flashPointC(), 1), s.flashPointBasis(), s.warnings(), s.cautions(), s.flags(), variants,
                comparison);
    }

    static List<Suggestion> suggestions(BlendDesigner.Result r, java.util.function.Function<BlendSuggestion, Comparison> comparison) {
        List<Suggestion> out = new ArrayList<>();
        int rank = 1;
        for (BlendSuggestion s : r.suggestions()) {
            out.add(suggestion(rank++, s, comparison == null ? null : comparison.apply(s)));
        }
        return out;
    }

    /** One safety-first default and what it left out. */
    record Default(String reason, List<String> names, @JsonProperty("brought_back_by") String broughtBackBy) {
    }

    static List<Default> defaults(CandidatePool p) {
        List<Default> d = new ArrayList<>();
        List<String> cmr = p.leftOut().get(CandidatePool.CMR);
        if (cmr != null) {
            d.add(new Default(CandidatePool.CMR, cmr, "--allow-cmr"));
        }
        List<String> ich = p.leftOut().get(CandidatePool.ICH_CLASS_1);
        if (ich != null) {
            d.add(new Default(CandidatePool.ICH_CLASS_1, ich, "--allow-ich-class-1"));
        }
        return d;
    }

    record Search(@JsonProperty("library_size") int librarySize, int searched, @JsonProperty("without_hansen") int withoutHansen,
            @JsonProperty("left_out") Map<String, Integer> leftOut, @JsonProperty("left_out_names") Map<String, List<String>> leftOutNames,
            @JsonProperty("without_hansen_names") List<String> withoutHansenNames, long subsets, @JsonProperty("solved_exactly") long solvedExactly,
            @JsonProperty("two_phase_left_out") int twoPhaseLeftOut, @JsonProperty("below_blend_flash_point_left_out") int belowBlendFlashPointLeftOut,
            @JsonProperty("outside_blend_boiling_range_left_out") int outsideBlendBoilingRangeLeftOut,
            @JsonProperty("water_demand_not_met_left_out") int waterDemandNotMetLeftOut,
            @JsonProperty("left_out_by_safety_defaults") List<Default> leftOutBySafetyDefaults) {
    }

    static Search search(BlendDesigner.Result r) {
        CandidatePool p = r.pool();
        Map<String, Integer> counts = new LinkedHashMap<>();
        p.leftOut().forEach((reason, names) -> counts.put(reason, names.size()));
        return new Search(p.librarySize(), p.free().size(), p.withoutHansen(), counts, p.leftOut(),
                p.leftOut().getOrDefault(CandidatePool.NO_HANSEN, List.of()), r.subsets(), r.solved(), r.droppedTwoPhase(), r.droppedFlashPoint(),
                r.droppedBoiling(), r.droppedWater(), defaults(p));
    }

    record Ranking(@JsonProperty("rank_by") String rankBy, String prefer, String weights, @JsonProperty("red_limit") double redLimit,
            @JsonProperty("cost_note") String costNote, Process process) {
    }

    /** The process term of the ranking: the use, what it means, its preferred window, its weight and whether it counted. */
    record Process(String use, String meaning, String window, double weight, boolean counted) {
    }

    record Target(@JsonProperty("dD") double dD, @JsonProperty("dP") double dP, @JsonProperty("dH") double dH, double r0,
            @JsonInclude(JsonInclude.Include.NON_NULL) String material, @JsonInclude(JsonInclude.Include.NON_NULL) String source,
            @JsonInclude(JsonInclude.Include.NON_NULL) @JsonProperty("centred_on_original") Boolean centredOnOriginal) {
    }

    record Blends(Target target, Temperature temperature, @JsonProperty("rank_by") String rankBy, @JsonProperty("red_limit") double redLimit,
            Ranking ranking, Search search, @JsonProperty("applied_limits") List<String> appliedLimits, List<Suggestion> blends, String notice) {
    }

    /**
     * The process temperature of a blend or replace run: whether the solvents' Hansen parameters were shifted to it
     * (Hansen–Beerbower), that the target sphere is taken as measured, and the solvents the shift could not handle
     * (left out of the search; they are also counted under "no Hansen parameters").
     */
    record Temperature(@JsonProperty("process_temperature_c") double processTemperatureC,
            @JsonProperty("solvent_parameters_shifted") boolean solventParametersShifted, String method,
            @JsonProperty("target_sphere") String targetSphere, @JsonProperty("left_out_for_the_shift") List<String> leftOutForTheShift) {

        static Temperature of(org.cohesa.core.solvent.LibraryAtTemperature at) {
            return new Temperature(Output.round(at.kelvin() - 273.15, 2), at.shifted(),
                    at.shifted() ? "Hansen–Beerbower shift from 25 °C (docs/methods.md)" : "none: parameters as stored (25 °C)",
                    "taken as measured (not shifted)", at.leftOut());
        }
    }

    record Original(String name, @JsonProperty("dD") double dD, @JsonProperty("dP") double dP, @JsonProperty("dH") double dH, double red,
            @JsonProperty("flash_point_c") Double flashPointC, @JsonProperty("replaced_for") List<String> replacedFor, @JsonUnwrapped Comparison comparison) {
    }

    record Replacement(Original original, Target target, Temperature temperature, @JsonProperty("rank_by") String rankBy, Ranking ranking, Search search,
            @JsonProperty("applied_limits") List<String> appliedLimits, List<Suggestion> candidates, String notice) {
    }
}
