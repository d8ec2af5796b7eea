package org.cohesa.core.target;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * Whether the results fix one sphere or a family along which centre and radius slide together (the limit measured
 * by {@link FitLimits}: on a side no tested liquid reaches, a larger sphere centred further out sorts the results as
 * well as a smaller one centred inside the cloud of liquids). Over the spheres of the 95 % region, each centre
 * coordinate is regressed on R0 by least squares (slope cov(δ, R0)/var(R0)); the share of the centre's spread in the
 * Ra metric (Ra² = 4ΔδD² + ΔδP² + ΔδH², Hansen 2007, ch. 1) that R0 explains is
 * R² = Σ wₖ·cov(δₖ, R0)²/var(R0) / Σ wₖ·var(δₖ), w = (4, 1, 1) (the coefficient of determination of a linear
 * regression; e.g. Draper, Smith, <i>Applied Regression Analysis</i>, 3rd ed., Wiley 1998, ch. 1).
 *
 * @param slope     centre shift per MPa^½ of R0, {δD, δP, δH} (dimensionless)
 * @param rSquared  share of the centre's spread explained by R0
 * @param r0Low     5th percentile of R0 over the region, MPa^½
 * @param r0High    95th percentile of R0 over the region, MPa^½
 */
public record RadiusCentreTradeOff(double[] slope, double rSquared, double r0Low, double r0High) {

    /** Below this share the centre's spread is not mainly the trade-off. */
    static final double MIN_R_SQUARED = 0.5;
    /** Below this R0 spread (MPa^½) the region fixes the radius well enough for the note to be noise. */
    static final double MIN_R0_SPREAD = 1.0;
    private static final String[] AXES = {"δD", "δP", "δH"};

    public RadiusCentreTradeOff {
        slope = slope.clone();
    }

    /** The trade-off over {@code spheres} ({δD, δP, δH, R0} each), or empty when fewer than 20 are given or R0 does not vary. */
    static Optional<RadiusCentreTradeOff> of(List<double[]> spheres) {
        int n = spheres.size();
        if (n < 20) {
            return Optional.empty();
        }
        double[] mean = new double[4];
        for (double[] p : spheres) {
            for (int k = 0; k < 4; k++) {
                mean[k] += p[k] / n;
            }
        }
        double varR = 0;
        double[] cov = new double[3];
        double[] var = new double[3];
        for (double[] p : spheres) {
            double r = p[3] - mean[3];
            varR += r * r;
            for (int k = 0; k < 3; k++) {
                double d = p[k] - mean[k];
                cov[k] += d * r;
                var[k] += d * d;
            }
        }
        if (!(varR > 1e-12)) {
            return Optional.empty();
        }
        double[] w = {4, 1, 1};
        double explained = 0;
        double total = 0;
        double[] slope = new double[3];
        for (int k = 0; k < 3; k++) {
            slope[k] = cov[k] / varR;
            explained += w[k] * cov[k] * cov[k] / varR;
            total += w[k] * var[k];
        }
        List<Double> r0 = new ArrayList<>();
        spheres.forEach(p -> r0.add(p[3]));
        r0.sort(Double::compare);
        return Optional.of(new RadiusCentreTradeOff(slope, total > 0 ? explained / total : 0, r0.get((int) (0.05 * (n - 1))),
                r0.get((int) Math.ceil(0.95 * (n - 1)))));
    }

    /** True when R0 varies by at least 1 MPa^½ over the region and explains at least half the centre's spread. */
    public boolean matters() {
        return rSquared >= MIN_R_SQUARED && r0High - r0Low >= MIN_R0_SPREAD;
    }

    /**
     * The axes (δD, δP, δH, each with its sign) towards which the centre moves as R0 grows: the one with the largest
     * shift in the Ra metric and every other with at least half of it.
     */
    public String direction() {
        double[] w = {2, 1, 1};
        double top = 0;
        for (int k = 0; k < 3; k++) {
            top = Math.max(top, Math.abs(w[k] * slope[k]));
        }
        List<String> out = new ArrayList<>();
        for (int k = 0; k < 3; k++) {
            if (Math.abs(w[k] * slope[k]) >= top / 2) {
                out.add((slope[k] >= 0 ? "+" : "−") + AXES[k]);
            }
        }
        return String.join(", ", out);
    }

    /** One sentence for the fit's notes. */
    public String note() {
        double span = r0High - r0Low;
        return String.format(Locale.ROOT, "centre and radius slide together: across the 95 %% region R0 runs %.1f–%.1f MPa^½ and the centre moves "
                + "with it by %+.1f/%+.1f/%+.1f (δD/δP/δH) over that span (R² %.2f); a larger sphere centred further towards %s sorts these "
                + "results about as well as a smaller one — non-dissolving liquids on that side tell them apart", r0Low, r0High, slope[0] * span,
                slope[1] * span, slope[2] * span, rSquared, direction());
    }
}
