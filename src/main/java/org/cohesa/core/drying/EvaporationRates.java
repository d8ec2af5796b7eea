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
 * Evaporation rates of a blend's components from an open liquid surface, on the relative scale where pure
 * n-butyl acetate = 1 (the scale of ASTM D3539 thin-film evaporometer rates).
 *
 * <p>Mass transfer: each component leaves at a molar flux proportional to its partial vapour pressure at the
 * surface, Jᵢ = kᵢ · xᵢγᵢPᵢˢᵃᵗ(Tₛ) / (R Tₛ), with a gas-side coefficient kᵢ = k·(M_BuAc/Mᵢ)^b. The U.S. EPA
 * pool-evaporation correlation (<i>Risk Management Program Guidance for Offsite Consequence Analysis</i>,
 * EPA 550-B-99-009, 1999, App. D, after Kawamura, P. I., Mackay, D., <i>J. Hazard. Mater.</i> 15 (1987) 343;
 * recalled from memory) has b = 1/3; b is fitted here within 0 … ½.
 *
 * <p>Evaporative cooling: the film sits at the temperature Tₛ where the heat drawn from the air and the
 * substrate pays for the evaporation, h(T − Tₛ) = Σᵢ Jᵢ ΔHᵥₐₚ,ᵢ (the wet-bulb balance; the heat- and
 * mass-transfer analogy of Chilton and Colburn, <i>Ind. Eng. Chem.</i> 26 (1934) 1183, makes h/k a property of
 * the air and the apparatus, the same for every liquid). With β = k/h (m³·K/J):
 * <pre>
 *   T − Tₛ = β · Σᵢ (M_BuAc/Mᵢ)^b · xᵢγᵢ Pᵢˢᵃᵗ(Tₛ) · ΔHᵥₐₚ,ᵢ / (R Tₛ)      (T, Tₛ in K, P in Pa, ΔH in J/mol)
 * </pre>
 * ΔHᵥₐₚ,ᵢ = R T² d ln Pᵢˢᵃᵗ/dT at the air temperature (Clausius–Clapeyron, ideal vapour). β and b are the two
 * constants fitted to published relative evaporation rates ({@link #COOLING}, {@link #MASS_EXPONENT};
 * table, fit and validation in docs/methods.md); β = 0, b = 1/3 is the former isothermal model.
 *
 * <p>With uᵢ the volume of component i still in the film over the film's initial volume and τ the time over the
 * time pure n-butyl acetate needs to evaporate the same volume at the same air temperature:
 * <pre>
 *   duᵢ/dτ = −Vᵢ (M_BuAc/Mᵢ)^b xᵢγᵢ Pᵢˢᵃᵗ(Tₛ)/Tₛ  /  [V_BuAc P_BuAcˢᵃᵗ(Tₛ,BuAc)/Tₛ,BuAc]
 * </pre>
 * Vᵢ molar volume (cm³/mol), Mᵢ molar mass (g/mol). For a pure liquid this is its predicted relative
 * evaporation rate. γᵢ are taken at the air temperature (a few kelvin of cooling change them by a few per cent).
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

    /**
     * β = k/h, m³·K/J, fitted (least squares in ln rate) to the published relative rates of 25 solvents at 25 °C
     * (docs/methods.md, "Evaporation rates"); reproduced by {@code EvaporationCalibrationTest}.
     */
    public static final double COOLING = 1.13e-4;
    /** b, the molar-mass exponent of the mass-transfer coefficient, fitted with {@link #COOLING} (lands on the bound 0). */
    public static final double MASS_EXPONENT = 0.0;

    /** The two fitted constants; {@link #FITTED} for use, {@link #ISOTHERMAL} for the former model (comparison). */
    public record Calibration(double cooling, double massExponent) {
        public static final Calibration FITTED = new Calibration(COOLING, MASS_EXPONENT);
        /** No cooling, EPA's M^(−1/3): the model before the calibration. */
        public static final Calibration ISOTHERMAL = new Calibration(0, 1.0 / 3);

        public Calibration {
            if (!(cooling >= 0 && cooling < 1e-2) || !(massExponent >= 0 && massExponent <= 1)) {
                throw new IllegalArgumentException("calibration out of range: β " + cooling + ", b " + massExponent);
            }
        }
    }

    private static final double R = 8.314462618;
    /** The film is never taken colder than this below the air (a guard for the root search, never reached in use). */
    private static final double MAX_COOLING_K = 80;

    private final double kelvin;
    private final Calibration cal;
    private final VapourCorrelation[] vp;
    private final double[] volume;
    private final double[] massFactor;
    private final double[] hvap;
    private final double reference;
    private final double[] pure;
    private final List<String> notes;

    private EvaporationRates(double kelvin, Calibration cal, VapourCorrelation[] vp, double[] volume, double[] massFactor, List<String> notes) {
        this.kelvin = kelvin;
        this.cal = cal;
        this.vp = vp;
        this.volume = volume;
        this.massFactor = massFactor;
        this.notes = List.copyOf(notes);
        this.hvap = new double[vp.length];
        for (int i = 0; i < vp.length; i++) {
            hvap[i] = hvap(vp[i], kelvin);
        }
        this.reference = pureRate(BUAC_VAPOUR_PRESSURE, BUAC_MOLAR_VOLUME, 1.0, hvap(BUAC_VAPOUR_PRESSURE, kelvin));
        this.pure = new double[vp.length];
        for (int i = 0; i < vp.length; i++) {
            pure[i] = pureRate(vp[i], volume[i], massFactor[i], hvap[i]) / reference;
        }
    }

    /**
     * With the fitted calibration.
     *
     * @throws InvalidInputException naming the solvent that lacks a vapour pressure, molar mass or molar volume,
     *                               or the temperature when a component would boil
     */
    public static EvaporationRates of(List<Solvent> solvents, double kelvin) {
        return of(solvents, kelvin, Calibration.FITTED);
    }

    public static EvaporationRates of(List<Solvent> solvents, double kelvin, Calibration cal) {
        int n = solvents.size();
        VapourCorrelation[] curves = new VapourCorrelation[n];
        double[] v = new double[n];
        double[] f = new double[n];
        List<String> notes = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            Solvent s = solvents.get(i);
            VapourPressure p = VapourPressure.of(s).orElseThrow(() -> new InvalidInputException("blend", s.name(),
                    "no vapour pressure in the library (no vapour-pressure correlation, nor boiling point with ΔHvap)"));
            if (s.molarMass() == null || s.effectiveMolarVolume() == null) {
                throw new InvalidInputException("blend", s.name(), "the library lacks its molar mass or molar volume");
            }
            if (p.pressurePa(kelvin) >= VapourPressure.ATMOSPHERE_PA) {
                throw new InvalidInputException("temperature", String.format(Locale.ROOT, "%.1f °C", kelvin - 273.15),
                        "at or above the boiling point of " + s.name() + ": the blend would boil, not evaporate");
            }
            if (p.isEstimate(kelvin)) {
                notes.add("vapour pressure of " + s.name() + ": " + p.methodAt(kelvin).label());
            }
            curves[i] = p.curve();
            v[i] = s.effectiveMolarVolume();
            f[i] = Math.pow(BUAC_MOLAR_MASS / s.molarMass(), cal.massExponent());
        }
        return new EvaporationRates(kelvin, cal, curves, v, f, notes);
    }

    /** Predicted relative evaporation rate of one pure liquid (n-butyl acetate = 1) at {@code kelvin}. */
    public static double relativeRate(Solvent s, double kelvin) {
        return of(List.of(s), kelvin).pure[0];
    }

    /** Predicted relative evaporation rates of the pure components (n-butyl acetate = 1), in component order. */
    public double[] constants() {
        return pure.clone();
    }

    /**
     * duᵢ/dτ magnitudes for a film of mole fractions x with activity coefficients γ (inactive components give 0),
     * all at the common film temperature.
     */
    public double[] rates(double[] x, double[] gamma, boolean[] active) {
        int n = x.length;
        double[] a = new double[n];
        for (int i = 0; i < n; i++) {
            a[i] = active[i] ? x[i] * gamma[i] : 0;
        }
        double ts = filmKelvin(a);
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            out[i] = a[i] == 0 ? 0 : volume[i] * massFactor[i] * a[i] * vp[i].pressurePa(ts) / ts / reference;
        }
        return out;
    }

    /** Film temperature, K, of a film with surface activities aᵢ = xᵢγᵢ. */
    double filmKelvin(double[] activity) {
        return filmKelvin(kelvin, cal.cooling(), vp, massFactor, hvap, activity);
    }

    /** Newton's method on the heat balance T − Tₛ = β Σ fᵢ aᵢ Pᵢ(Tₛ) ΔHᵢ/(R Tₛ); the root is unique (the right side rises with Tₛ). */
    private static double filmKelvin(double kelvin, double beta, VapourCorrelation[] vp, double[] f, double[] dh, double[] a) {
        if (beta == 0) {
            return kelvin;
        }
        double t = kelvin;
        for (int it = 0; it < 50; it++) {
            double load = 0;
            double slope = 0;
            for (int i = 0; i < a.length; i++) {
                if (a[i] > 0) {
                    double term = f[i] * a[i] * vp[i].pressurePa(t) * dh[i] / (R * t);
                    load += term;
                    slope += term * (dh[i] / (R * t * t) - 1 / t);
                }
            }
            double g = kelvin - t - beta * load;
            double dg = -1 - beta * slope;
            double next = Math.max(kelvin - MAX_COOLING_K, Math.min(kelvin, t - g / dg));
            if (Math.abs(next - t) < 1e-9) {
                return next;
            }
            t = next;
        }
        return t;
    }

    private double pureRate(VapourCorrelation curve, double v, double f, double dh) {
        double t = filmKelvin(kelvin, cal.cooling(), new VapourCorrelation[] {curve}, new double[] {f}, new double[] {dh}, new double[] {1});
        return v * f * curve.pressurePa(t) / t;
    }

    /** Film temperature of the pure liquid i, K. */
    public double pureFilmKelvin(int i) {
        double[] a = new double[vp.length];
        a[i] = 1;
        return filmKelvin(a);
    }

    /** ΔHvap = R T² d ln P/dT, J/mol (central difference, ±0.05 K). */
    static double hvap(VapourCorrelation curve, double kelvin) {
        double h = 0.05;
        return R * kelvin * kelvin * (Math.log(curve.pressurePa(kelvin + h)) - Math.log(curve.pressurePa(kelvin - h))) / (2 * h);
    }

    /** Where vapour pressures are estimates rather than fitted measurements. */
    public List<String> notes() {
        return notes;
    }
}
