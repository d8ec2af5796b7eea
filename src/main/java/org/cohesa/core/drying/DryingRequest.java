package org.cohesa.core.drying;

import java.util.Locale;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.activity.WaterSolubilityTable;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.solvent.Blend;

/**
 * What to simulate.
 *
 * @param blend             the liquid blend by volume fractions
 * @param target            the material's sphere, or null (then no RED)
 * @param kelvin            film temperature, K (isothermal)
 * @param until             fraction of the initial volume to evaporate, 0 &lt; until &lt; 1 (default 0.95)
 * @param ideal             true for γ = 1 (comparison), false for UNIFAC / Flory–Huggins
 * @param pathStep          spacing of the reported path points in evaporated fraction (default 0.05)
 * @param checkMiscibility  test every reported point for a liquid–liquid split (costs a few ms per point)
 * @param waterData         published mutual solubilities with water, which decide a solvent–water pair before the model
 *                          does ({@link org.cohesa.core.activity.WaterMiscibility}); {@link WaterSolubilityTable#NONE} for the model alone
 */
public record DryingRequest(Blend blend, SolubilitySphere target, double kelvin, double until, boolean ideal, double pathStep,
                            boolean checkMiscibility, WaterSolubilityTable waterData) {

    public static final double DEFAULT_UNTIL = 0.95;
    public static final double DEFAULT_STEP = 0.05;
    public static final double DEFAULT_KELVIN = 298.15;

    public DryingRequest {
        if (blend == null) {
            throw new IllegalArgumentException("a drying path needs a blend");
        }
        if (!Double.isFinite(kelvin) || kelvin <= 0) {
            throw new InvalidInputException("temperature", String.valueOf(kelvin - 273.15), "must be above absolute zero");
        }
        if (!(until > 0 && until <= 0.999)) {
            throw new InvalidInputException("until", fmt(until), "must lie between 0 and 0.999 (fraction of the initial volume evaporated)");
        }
        if (!(pathStep > 0 && pathStep <= 0.5)) {
            throw new InvalidInputException("step", fmt(pathStep), "must lie between 0 and 0.5");
        }
        if (waterData == null) {
            waterData = WaterSolubilityTable.NONE;
        }
    }

    /** Without published water data: liquid–liquid splits by the activity model alone. */
    public DryingRequest(Blend blend, SolubilitySphere target, double kelvin, double until, boolean ideal, double pathStep,
                         boolean checkMiscibility) {
        this(blend, target, kelvin, until, ideal, pathStep, checkMiscibility, WaterSolubilityTable.NONE);
    }

    /** Defaults: 25 °C, to 95 % evaporated, activity-corrected, points every 5 %, no miscibility checks. */
    public static DryingRequest of(Blend blend, SolubilitySphere target) {
        return new DryingRequest(blend, target, DEFAULT_KELVIN, DEFAULT_UNTIL, false, DEFAULT_STEP, false, WaterSolubilityTable.NONE);
    }

    private static String fmt(double v) {
        return String.format(Locale.ROOT, "%s", v);
    }
}
