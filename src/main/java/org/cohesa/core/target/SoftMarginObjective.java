package org.cohesa.core.target;

import org.apache.commons.math3.analysis.MultivariateFunction;

/**
 * The fit objective: a soft classification loss on the signed distance of each liquid from the sphere surface.
 *
 * <p>For a sphere (centre c, radius R0) a liquid at Hansen distance Ra lies a distance m = R0 − Ra inside the surface
 * (negative outside), measured in MPa^½ in the space where Ra is the Euclidean distance (δD doubled; Hansen 2007,
 * ch. 1). With z = m/τ, the loss of a liquid with score y ∈ [0, 1] is the cross-entropy between y and the logistic
 * σ(z) = 1/(1 + e^−z):
 * <pre>  ℓ = y·ln(1 + e^−z) + (1 − y)·ln(1 + e^z)</pre>
 * (logistic regression, Cox, J. R. Stat. Soc. B 20 (1958) 215). A dissolving liquid (y = 1) costs almost nothing
 * once it is a few τ inside, a non-dissolving one (y = 0) once it is a few τ outside, and a graded score such as
 * 0.5 is cheapest on the surface itself. Liquids far from the surface drop out, so the surface settles between the
 * closest dissolving and non-dissolving liquids, as in a maximum-margin classifier (for separable data the
 * logistic loss tends to the maximum-margin solution as τ → 0: Rosset, Zhu, Hastie, J. Mach. Learn. Res. 5
 * (2004) 941). A liquid on the wrong side costs about |m|/τ, growing only linearly, so a single wrong result pulls
 * with bounded force. A small term λ·R0 keeps the sphere from growing without limit when the data leave it open.
 */
final class SoftMarginObjective implements MultivariateFunction {

    /** Softness τ of the surface, MPa^½: about a quarter of the typical spacing of library liquids near a surface. */
    static final double SOFTNESS = 0.35;

    /** Weight λ of R0 in the loss, per MPa^½: small, it only decides between otherwise equal spheres. */
    static final double RADIUS_WEIGHT = 0.01;

    private final double[][] scaled;
    private final double[] scores;
    private final double[] weights;

    /**
     * @param scaled  liquids as {2δD, δP, δH}, MPa^½
     * @param scores  scores 0..1
     * @param weights multiplicity of each liquid (1 for the data, bootstrap counts for a resample)
     */
    SoftMarginObjective(double[][] scaled, double[] scores, double[] weights) {
        this.scaled = scaled;
        this.scores = scores;
        this.weights = weights;
    }

    /** @param p {δD, δP, δH, R0} of the sphere, MPa^½ */
    @Override
    public double value(double[] p) {
        double cx = 2 * p[0];
        double cy = p[1];
        double cz = p[2];
        double r = p[3];
        double sum = 0;
        for (int i = 0; i < scaled.length; i++) {
            double w = weights[i];
            if (w == 0) {
                continue;
            }
            double dx = scaled[i][0] - cx;
            double dy = scaled[i][1] - cy;
            double dz = scaled[i][2] - cz;
            double z = (r - Math.sqrt(dx * dx + dy * dy + dz * dz)) / SOFTNESS;
            double y = scores[i];
            sum += w * (y * softplus(-z) + (1 - y) * softplus(z));
        }
        return sum + RADIUS_WEIGHT * r;
    }

    /**
     * ln(1 + e^u) without overflow. Beyond |u| = 10, ln(1 + x) is replaced by x for x = e^−|u| (relative error
     * below 3·10⁻⁵ of a term that is itself below 5·10⁻⁵), and beyond |u| = 25 the tail e^−|u| &lt; 1.4·10⁻¹¹ is
     * dropped: this saves the logarithm and the exponential for most liquids.
     */
    static double softplus(double u) {
        if (u > 25) {
            return u;
        }
        if (u < -25) {
            return 0;
        }
        if (u > 10) {
            return u + Math.exp(-u);
        }
        if (u < -10) {
            return Math.exp(u);
        }
        return u > 0 ? u + Math.log(1 + Math.exp(-u)) : Math.log(1 + Math.exp(u));
    }
}
