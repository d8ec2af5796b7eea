package org.cohesa.core.hsp;

/**
 * Teas fractional parameters, the coordinates of the triangular Teas plot.
 *
 * <p>f_d = δD/(δD+δP+δH), f_p = δP/(δD+δP+δH), f_h = δH/(δD+δP+δH); they sum to 1 (Teas, J. P.,
 * "Graphic analysis of resin solubilities", <i>J. Paint Technol.</i> 40 (1968) 19–25; also Hansen 2007,
 * ch. 1). Dimensionless; often quoted ×100.
 */
public record TeasFractions(double fd, double fp, double fh) {

    public TeasFractions {
        for (double f : new double[] {fd, fp, fh}) {
            if (!Double.isFinite(f) || f < 0 || f > 1) {
                throw new IllegalArgumentException("Teas fractions must lie in [0, 1], got " + f);
            }
        }
    }

    /** The fractions of a point; fails for the all-zero point, which has no Teas coordinates. */
    public static TeasFractions of(HansenParameters p) {
        double sum = p.dD() + p.dP() + p.dH();
        if (sum <= 0) {
            throw new IllegalArgumentException("Teas fractions are undefined when δD + δP + δH = 0");
        }
        return new TeasFractions(p.dD() / sum, p.dP() / sum, p.dH() / sum);
    }
}
