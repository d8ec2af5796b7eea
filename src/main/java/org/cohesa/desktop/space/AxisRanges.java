package org.cohesa.desktop.space;

import java.util.List;
import org.cohesa.core.hsp.HansenParameters;
import org.cohesa.core.hsp.SolubilitySphere;

/**
 * The plotted ranges of δD, δP and δH (MPa^½), rounded out to whole tick steps so every point and the
 * whole target sphere fit.
 */
public record AxisRanges(double dMin, double dMax, double pMin, double pMax, double hMin, double hMax) {

    /** Covers the liquids of a typical solvent library. */
    public static final AxisRanges DEFAULT = new AxisRanges(12, 22, 0, 30, 0, 45);

    public static final double D_STEP = 2;
    public static final double PH_STEP = 5;

    public static AxisRanges cover(List<HansenParameters> points, SolubilitySphere target) {
        if (points.isEmpty() && target == null) {
            return DEFAULT;
        }
        double dLo = Double.MAX_VALUE;
        double dHi = -Double.MAX_VALUE;
        double pHi = 0;
        double hHi = 0;
        for (HansenParameters p : points) {
            dLo = Math.min(dLo, p.dD());
            dHi = Math.max(dHi, p.dD());
            pHi = Math.max(pHi, p.dP());
            hHi = Math.max(hHi, p.dH());
        }
        if (target != null) {
            HansenParameters c = target.centre();
            // the sphere spans ±R0/2 in δD and ±R0 in δP and δH (Ra² = 4ΔδD² + ΔδP² + ΔδH²)
            dLo = Math.min(dLo, c.dD() - target.r0() / 2);
            dHi = Math.max(dHi, c.dD() + target.r0() / 2);
            pHi = Math.max(pHi, c.dP() + target.r0());
            hHi = Math.max(hHi, c.dH() + target.r0());
        }
        double dMin = Math.max(0, Math.floor(dLo / D_STEP) * D_STEP);
        double dMax = Math.max(dMin + D_STEP * 2, Math.ceil(dHi / D_STEP) * D_STEP);
        return new AxisRanges(dMin, dMax, 0, Math.max(PH_STEP * 2, Math.ceil(pHi / PH_STEP) * PH_STEP),
                0, Math.max(PH_STEP * 2, Math.ceil(hHi / PH_STEP) * PH_STEP));
    }

    /** Tick step for δP and δH: 5 for short axes, 10 for long ones, so labels do not crowd. */
    public double phStep(double span) {
        return span > 30 ? 10 : PH_STEP;
    }
}
