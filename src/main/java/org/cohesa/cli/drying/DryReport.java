package org.cohesa.cli.drying;

import com.fasterxml.jackson.annotation.JsonProperty;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;
import org.cohesa.cli.Output;
import org.cohesa.core.drying.DryingPath;
import org.cohesa.core.drying.DryingSimulator;
import org.cohesa.core.drying.PathPoint;
import org.cohesa.core.drying.TailSuggestion;
import org.cohesa.core.solvent.Blend;

/**
 * What {@code cohesa dry --json} prints, as records serialised by Jackson. Units: evaporated as a fraction of the
 * initial volume, time relative to pure n-butyl acetate, composition in volume fractions, δ in MPa½.
 */
record DryReport(
        String blend,
        String target,
        @JsonProperty("temperature_c") double temperatureC,
        String model,
        @JsonProperty("model_note") String modelNote,
        List<Point> path,
        @JsonProperty("leaves_sphere_at") Double leavesSphereAt,
        @JsonProperty("last_solvent") String lastSolvent,
        @JsonProperty("practically_gone") List<RunsOut> practicallyGone,
        @JsonProperty("practically_gone_below") double practicallyGoneBelow,
        @JsonProperty("two_phases_at") Double twoPhasesAt,
        Phases phases,
        @JsonProperty("tail_suggestions") List<Tail> tailSuggestions,
        List<String> notes,
        List<String> cautions,
        @JsonProperty("files_written") List<String> filesWritten) {

    record Point(double evaporated, double time, Map<String, Double> composition, Double dD, Double dP, Double dH, Double red) {
    }

    /** A component practically gone (below {@code practically_gone_below} of its initial volume). */
    record RunsOut(String solvent, double evaporated, double time) {
    }

    /** The liquid–liquid judgement: what decided it (measured, measured with water and model elsewhere, model). */
    record Phases(boolean splits, String basis, String model, String detail) {
    }

    record Tail(String solvent, double fraction, @JsonProperty("relative_rate") double relativeRate, @JsonProperty("max_red") double maxRed,
                @JsonProperty("last_solvent") String lastSolvent, @JsonProperty("hazard_statements") List<String> hazardStatements) {
    }

    static DryReport of(Blend b, String targetLabel, double tC, DryingPath path, List<TailSuggestion> tails, List<String> cautions,
                        Function<String, List<String>> hazards, List<String> written) {
        List<Point> pts = path.points().stream().map(DryReport::point).toList();
        List<RunsOut> out = path.exhausted().stream()
                .map(e -> new RunsOut(e.solvent(), Output.round(e.evaporated(), 6), Output.round(e.time(), 6))).toList();
        List<Tail> ts = tails.stream().map(s -> new Tail(s.solvent(), s.fraction(), Output.round(s.relativeRate(), 4),
                Output.round(s.maxRed(), 4), s.lastSolvent(), hazards.apply(s.solvent()))).toList();
        return new DryReport(b.describe(), targetLabel, tC, path.model(), path.modelNote().isEmpty() ? null : path.modelNote(), pts,
                round(path.leavesSphereAt(), 6), path.lastSolvent(), out, DryingSimulator.PRACTICALLY_GONE, round(path.splitsAt(), 6),
                path.phases() == null ? null : new Phases(path.phases().splits(), path.phases().basis().label(), path.phases().model(),
                        path.phases().detail()),
                ts, path.notes(), cautions, written);
    }

    private static Point point(PathPoint p) {
        Map<String, Double> comp = new LinkedHashMap<>();
        p.composition().forEach((k, v) -> comp.put(k, Output.round(v, 6)));
        return new Point(Output.round(p.evaporated(), 6), Output.round(p.time(), 6), comp,
                p.hansen() == null ? null : Output.round(p.hansen().dD(), 4),
                p.hansen() == null ? null : Output.round(p.hansen().dP(), 4),
                p.hansen() == null ? null : Output.round(p.hansen().dH(), 4),
                round(p.red(), 5));
    }

    private static Double round(Double d, int decimals) {
        return d == null ? null : Output.round(d, decimals);
    }
}
