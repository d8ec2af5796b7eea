package org.cohesa.cli.target;

import com.fasterxml.jackson.annotation.JsonInclude;
import com.fasterxml.jackson.annotation.JsonProperty;
import java.util.List;
import org.cohesa.cli.Output;
import org.cohesa.core.target.CentrePrior;
import org.cohesa.core.target.ConfidenceRegion;
import org.cohesa.core.target.FitResult;
import org.cohesa.core.target.Interval;
import org.cohesa.core.target.LikelihoodRegion;

/**
 * What {@code cohesa fit --json} prints, as records serialised by Jackson. All δ, R0 and sizes in MPa^½.
 */
@JsonInclude(JsonInclude.Include.NON_NULL)
record FitReport(
        String method,
        double dD,
        double dP,
        double dH,
        double r0,
        @JsonProperty("good_inside") int goodInside,
        @JsonProperty("good_total") int goodTotal,
        @JsonProperty("bad_outside") int badOutside,
        @JsonProperty("bad_total") int badTotal,
        List<Wrong> misfits,
        @JsonProperty("likely_misfits") List<Result> likelyMisfits,
        List<Result> results,
        Confidence confidence,
        Region region,
        Prior prior,
        @JsonProperty("next_tests") List<Next> nextTests,
        List<String> notes) {

    /** A result on the wrong side of the fitted surface. */
    record Wrong(String name, double score, double red) {
    }

    /** A result with its probability under the likelihood fit. */
    record Result(String name, double score, double red, @JsonProperty("p_dissolves") double pDissolves, double probability,
                  @JsonProperty("likely_misfit") boolean likelyMisfit, @JsonProperty("near_surface") boolean nearSurface) {
    }

    record Confidence(double level, int resamples, long seed, List<Double> dD, List<Double> dP, List<Double> dH, List<Double> r0,
                      boolean bounded, List<String> warnings) {
    }

    /** The likelihood-ratio region: its threshold, size, R0 range, whether the data close it, and a cloud of spheres in it. */
    record Region(double level, @JsonProperty("deviance_limit") double devianceLimit, @JsonProperty("centre_radius") double centreRadius,
                  List<Double> r0, boolean bounded, @JsonProperty("bounded_note") String boundedNote, @JsonProperty("with_prior") boolean withPrior,
                  double softness, double lapse, List<List<Double>> samples) {
    }

    /** The centre prior: its centre, the standard deviation of each component (MPa^½), its kind and source. */
    record Prior(String kind, double dD, double dP, double dH, @JsonProperty("sd_dD") double sdD, @JsonProperty("sd_dP") double sdP,
                 @JsonProperty("sd_dH") double sdH, String source) {
    }

    record Next(String name, double red, @JsonProperty("inside_share") double insideShare,
                @JsonProperty("expected_shrinkage") Double expectedShrinkage, String reason) {
    }

    static FitReport of(FitResult fit, long seed) {
        var c = fit.sphere().centre();
        var q = fit.quality();
        List<Wrong> wrong = q.misfits().stream().map(m -> new Wrong(m.name(), m.score(), Output.round(m.red(), 3))).toList();
        List<Result> results = fit.probabilities().stream().map(r -> new Result(r.name(), r.score(), Output.round(r.red(), 3),
                Output.round(r.pDissolves(), 3), Output.round(r.probability(), 3), r.likelyMisfit(), r.nearSurface())).toList();
        boolean likelihood = fit.region() != null;
        ConfidenceRegion cr = fit.confidence();
        Confidence conf = new Confidence(cr.level(), cr.resamples(), seed, interval(cr.dD()), interval(cr.dP()), interval(cr.dH()),
                interval(cr.r0()), cr.bounded(), cr.warnings());
        Region region = null;
        if (likelihood) {
            LikelihoodRegion r = fit.region();
            List<List<Double>> samples = r.samples().stream().map(s -> List.of(Output.round(s.centre().dD(), 2), Output.round(s.centre().dP(), 2),
                    Output.round(s.centre().dH(), 2), Output.round(s.r0(), 2))).toList();
            region = new Region(r.level(), Output.round(r.threshold(), 3), Output.round(r.centreRadius(), 2), interval(r.r0()), r.bounded(),
                    r.boundedNote(), r.withPrior(), r.model().softness(), r.model().lapse(), samples);
        }
        var p = fit.prior();
        Prior prior = p == null ? null : new Prior(p.kind() == CentrePrior.Kind.STRUCTURE ? "structure estimate" : "related material",
                p.centre().dD(), p.centre().dP(), p.centre().dH(), Output.round(p.sdD(), 2), Output.round(p.sdP(), 2), Output.round(p.sdH(), 2),
                p.source());
        List<Next> next = fit.nextTests().stream().map(t -> new Next(t.name(), Output.round(t.red(), 3), Output.round(t.insideShare(), 3),
                likelihood ? Output.round(t.expectedShrinkage(), 3) : null, t.reason())).toList();
        return new FitReport(fit.method().key(), Output.round(c.dD(), 2), Output.round(c.dP(), 2), Output.round(c.dH(), 2),
                Output.round(fit.sphere().r0(), 2), q.goodInside(), q.goodTotal(), q.badOutside(), q.badTotal(), wrong,
                likelihood ? results.stream().filter(Result::likelyMisfit).toList() : null, likelihood ? results : null, conf, region, prior,
                next, fit.notes());
    }

    private static List<Double> interval(Interval i) {
        return List.of(Output.round(i.low(), 2), Output.round(i.high(), 2));
    }
}
