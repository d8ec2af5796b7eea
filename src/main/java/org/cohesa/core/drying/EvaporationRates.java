package org.cohesa.core.drying;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.solvent.Dippr101;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.solvent.VapourCorrelation;
import org.cohesa.core.solvent.VapourPressure;

/**
 * Evaporation rate constants of a blend's components from an open liquid surface, on the relative scale
 * where pure n-butyl acetate = 1.
 *
 * <p>Model: each component leaves at a molar flux proportional to its partial vapour pressure at the
 * surface and to a gas-side mass-transfer coefficient, Jᵢ = kᵢ · xᵢγᵢPᵢˢᵃᵗ / (RT), with the molar-mass
 * dependence kᵢ ∝ Mᵢ^(−1/3) of the pool-evaporation correlation of the U.S. EPA, <i>Risk Management Program
 * Guidance for Offsite Consequence Analysis</i>, EPA 550-B-99-009 (1999), Appendix D (mass evaporation rate
 * ∝ u^0.78 · M^(2/3) · A · Pˢᵃᵗ / T, i.e. molar rate ∝ M^(−1/3) · Pˢᵃᵗ; formula recalled from memory; the
 * guidance derives it from Kawamura, P. I., Mackay, D., <i>J. Hazard. Mater.</i> 15 (1987) 343). Air speed,
 * area and temperature are the same for every component and cancel on the relative scale.
 *
 * <p>With uᵢ the volume of component i still in the film divided by the film's initial volume (constant
 * area, no volume change on mixing) and τ the time divided by the time pure n-butyl acetate needs to
 * evaporate the same initial volume at the same temperature:
 * <pre>
 *   duᵢ/dτ = −cᵢ · xᵢ · γᵢ,     cᵢ = Vᵢ · (M_BuAc/Mᵢ)^(1/3) · Pᵢˢᵃᵗ(T) / (V_BuAc · P_BuAcˢᵃᵗ(T))
 * </pre>
 * Vᵢ molar volume (cm³/mol), Mᵢ molar mass (g/mol), Pˢᵃᵗ in Pa; cᵢ is dimensionless and equals the
 * predicted relative evaporation rate of the pure liquid (n-butyl acetate = 1), the scale on which
 * ASTM D3539-type rates are tabulated.
 */
public final class EvaporationRates {

    /** n-Butyl acetate, the reference liquid: molar mass, g/mol (C6H12O2, IUPAC atomic weights). */
    public static final double BUAC_MOLAR_MASS = 116.16;
    /** n-Butyl acetate molar volume, cm³/mol: 116.16 / 0.8825 g/cm³ (density, CRC Handbook 95th ed., 2014). */
    public static final double BUAC_MOLAR_VOLUME = 116.16 / 0.8825;
    /**
     * n-Butyl acetate vapour pressure, Pa and K: DIPPR 101 coefficients of Perry's Chemical Engineers' Handbook, 8th ed.
     * (2008), Table 2-8, valid 199.65–575.4 K — the curve the bundled table holds for it (solvent-db/SOURCES.md), so
     * that the library's n-butyl acetate evaporates at exactly 1 on this scale. (Poling's Antoine set, valid only from
     * 301 K, gives 11 % more at 25 °C.)
     */
    public static final VapourCorrelation BUAC_VAPOUR_PRESSURE = new Dippr101(122.82, -9253.2, -14.99, 1.047E-05, 2, 199.65, 575.4,
            "perry-2008-dippr101");

    private final double[] c;
    private final List<String> notes;

    private EvaporationRates(double[] c, List<String> notes) {
        this.c = c;
        this.notes = List.copyOf(notes);
    }

    /**
     * @throws InvalidInputException naming the solvent that lacks a vapour pressure, molar mass or molar volume,
     *                               or the temperature when a component would boil
     */
    public static EvaporationRates of(List<Solvent> solvents, double kelvin) {
        double reference = BUAC_MOLAR_VOLUME * BUAC_VAPOUR_PRESSURE.pressurePa(kelvin);
        double[] c = new double[solvents.size()];
        List<String> notes = new ArrayList<>();
        for (int i = 0; i < c.length; i++) {
            Solvent s = solvents.get(i);
            VapourPressure vp = VapourPressure.of(s).orElseThrow(() -> new InvalidInputException("blend", s.name(),
                    "no vapour pressure in the library (no vapour-pressure correlation, nor boiling point with ΔHvap)"));
            if (s.molarMass() == null || s.effectiveMolarVolume() == null) {
                throw new InvalidInputException("blend", s.name(), "the library lacks its molar mass or molar volume");
            }
            double p = vp.pressurePa(kelvin);
            if (p >= VapourPressure.ATMOSPHERE_PA) {
                throw new InvalidInputException("temperature", String.format(Locale.ROOT, "%.1f °C", kelvin - 273.15),
                        "at or above the boiling point of " + s.name() + ": the blend would boil, not evaporate");
            }
            if (vp.isEstimate(kelvin)) {
                notes.add("vapour pressure of " + s.name() + ": " + vp.methodAt(kelvin).label());
            }
            c[i] = s.effectiveMolarVolume() * Math.cbrt(BUAC_MOLAR_MASS / s.molarMass()) * p / reference;
        }
        return new EvaporationRates(c, notes);
    }

    /** Predicted relative evaporation rate of one pure liquid (n-butyl acetate = 1) at {@code kelvin}. */
    public static double relativeRate(Solvent s, double kelvin) {
        return of(List.of(s), kelvin).c[0];
    }

    /** cᵢ, dimensionless, in component order. */
    public double[] constants() {
        return c.clone();
    }

    double constant(int i) {
        return c[i];
    }

    /** Where vapour pressures are estimates rather than fitted measurements. */
    public List<String> notes() {
        return notes;
    }
}
