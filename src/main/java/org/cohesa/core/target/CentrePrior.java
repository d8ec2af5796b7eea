package org.cohesa.core.target;

import java.util.List;
import java.util.Locale;
import org.cohesa.core.hsp.HansenParameters;
import org.cohesa.core.structure.EstimatedValue;
import org.cohesa.core.structure.StructureEstimate;
import org.cohesa.core.structure.StructureEstimator;

/**
 * Prior knowledge of where the centre lies: independent Gaussians on δD, δP and δH around {@code centre}, with
 * standard deviations {@code sdD}, {@code sdP}, {@code sdH}: log prior = −½·Σ ((δ − δ₀)/sd)². A related material's
 * published sphere, or a centre estimated from the structure, is a guess, not a measurement: the spreads say how far
 * it is trusted. With a prior the fit is a penalised (maximum a posteriori) fit, and the region is that of the
 * penalised likelihood; the output says so.
 *
 * @param centre δD, δP, δH of the guess, MPa^½
 * @param sdD    standard deviation of δD, MPa^½ (0.25–20)
 * @param sdP    standard deviation of δP, MPa^½ (0.25–20)
 * @param sdH    standard deviation of δH, MPa^½ (0.25–20)
 * @param kind   where the guess comes from: a related material's sphere or a structure estimate
 * @param source in words, e.g. "published sphere of polystyrene (memory-hansen2007-a2)"
 * @param cautions what to say beside it (a structure estimate's warnings), possibly empty
 */
public record CentrePrior(HansenParameters centre, double sdD, double sdP, double sdH, Kind kind, String source, List<String> cautions) {

    /** Where a prior comes from. */
    public enum Kind {
        /** The published sphere of a related material: one spread in the Ra metric. */
        RELATED_MATERIAL,
        /** The centre estimated from the material's own structure (the estimator's group route): spreads from the route's measured error. */
        STRUCTURE
    }

    /** Default spread, MPa^½: about the Ra between published spheres of related grades of one polymer (common practice, no source). */
    public static final double DEFAULT_SPREAD = 3.0;

    /**
     * A normal distribution with mean absolute error m has standard deviation m·√(π/2) and its 90th percentile of
     * |error| at 1.645 sd (standard normal quantiles); the structure prior takes the larger of the two readings of
     * the route's measured error.
     */
    private static final double SD_PER_MAE = Math.sqrt(Math.PI / 2);
    private static final double SD_PER_P90 = 1 / 1.6449;

    public CentrePrior {
        if (centre == null) {
            throw new IllegalArgumentException("a prior needs a centre");
        }
        for (double sd : new double[] {sdD, sdP, sdH}) {
            if (!(sd >= 0.25 && sd <= 20)) {
                throw new IllegalArgumentException("prior standard deviations must lie between 0.25 and 20 MPa^½, got " + sd);
            }
        }
        if (kind == null) {
            throw new IllegalArgumentException("a prior needs a kind");
        }
        if (source == null || source.isBlank()) {
            throw new IllegalArgumentException("a prior needs a source");
        }
        cautions = cautions == null ? List.of() : List.copyOf(cautions);
    }

    /**
     * A Gaussian in the Ra metric (Ra² = 4ΔδD² + ΔδP² + ΔδH², Hansen 2007, ch. 1) with standard deviation
     * {@code spread}: δD gets spread/2, δP and δH the spread.
     *
     * @param spread MPa^½ in Ra (0.5–20)
     */
    public static CentrePrior inRa(HansenParameters centre, double spread, String source) {
        if (!(spread >= 0.5 && spread <= 20)) {
            throw new IllegalArgumentException("prior spread must lie between 0.5 and 20 MPa^½, got " + spread);
        }
        return new CentrePrior(centre, spread / 2, spread, spread, Kind.RELATED_MATERIAL, source, List.of());
    }

    /**
     * The centre estimated from the structure, each component with the standard deviation its route showed on the
     * published table ({@link EstimatedValue#expectedMae()}, {@link EstimatedValue#expectedP90()}); a family the
     * estimator handles much worse than average widens the spreads by its own measured error (the estimate's
     * warnings name it).
     *
     * @throws IllegalArgumentException when the estimate lacks a component
     */
    public static CentrePrior fromStructure(StructureEstimate e) {
        if (!e.hasHansen()) {
            throw new IllegalArgumentException("the structure estimate lacks a Hansen component");
        }
        double[] sd = {sd(e.dD()), sd(e.dP()), sd(e.dH())};
        double[] familyMae = StructureEstimator.muchWorseFamilyError(e.family());
        if (familyMae != null) {
            for (int k = 0; k < 3; k++) {
                sd[k] = Math.max(sd[k], familyMae[k] * SD_PER_MAE);
            }
        }
        String source = String.format(Locale.ROOT, "estimated from the structure %s by %s", e.structure().smiles(), e.dD().route());
        // the estimate's notes on UNIFAC groups concern activity models, not the centre
        List<String> cautions = e.warnings().stream().filter(w -> !w.contains("UNIFAC")).toList();
        return new CentrePrior(e.hansen(), sd[0], sd[1], sd[2], Kind.STRUCTURE, source, cautions);
    }

    private static double sd(EstimatedValue v) {
        return Math.max(0.25, Math.max(v.expectedMae() * SD_PER_MAE, v.expectedP90() * SD_PER_P90));
    }

    /** The same centre, kind and source with one spread in the Ra metric instead (see {@link #inRa}). */
    public CentrePrior withRaSpread(double spread) {
        CentrePrior r = inRa(centre, spread, source);
        return new CentrePrior(centre, r.sdD, r.sdP, r.sdH, kind, source, cautions);
    }

    /** Log prior density (up to a constant) of a centre {δD, δP, δH}. */
    double logDensity(double dD, double dP, double dH) {
        double a = (dD - centre.dD()) / sdD;
        double b = (dP - centre.dP()) / sdP;
        double c = (dH - centre.dH()) / sdH;
        return -(a * a + b * b + c * c) / 2;
    }
}
