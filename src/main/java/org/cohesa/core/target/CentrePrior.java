package org.cohesa.core.target;

import org.cohesa.core.hsp.HansenParameters;

/**
 * Prior knowledge of where the centre lies: a Gaussian in the Ra metric around {@code centre}, with standard
 * deviation {@code spread}: log prior = −Ra(c, centre)²/(2·spread²). A related material's published sphere (or a
 * centre estimated from the structure) is a guess, not a measurement: the spread says how far the user trusts it.
 * With a prior the fit is a penalised (maximum a posteriori) fit, and the region is that of the penalised
 * likelihood; the output says so.
 *
 * @param centre δD, δP, δH of the guess, MPa^½
 * @param spread standard deviation in Ra, MPa^½ (0.5–20)
 * @param source where the guess comes from, e.g. "published sphere of polystyrene (memory-hansen2007-a2)"
 */
public record CentrePrior(HansenParameters centre, double spread, String source) {

    public CentrePrior {
        if (centre == null) {
            throw new IllegalArgumentException("a prior needs a centre");
        }
        if (!(spread >= 0.5 && spread <= 20)) {
            throw new IllegalArgumentException("prior spread must lie between 0.5 and 20 MPa^½, got " + spread);
        }
        if (source == null || source.isBlank()) {
            throw new IllegalArgumentException("a prior needs a source");
        }
    }

    /** Default spread, MPa^½: about the Ra between published spheres of related grades of one polymer (common practice, no source). */
    public static final double DEFAULT_SPREAD = 3.0;

    /** Log prior density (up to a constant) of a centre {δD, δP, δH}. */
    double logDensity(double dD, double dP, double dH) {
        double a = 2 * (dD - centre.dD());
        double b = dP - centre.dP();
        double c = dH - centre.dH();
        return -(a * a + b * b + c * c) / (2 * spread * spread);
    }
}
