package org.cohesa.core.activity;

import java.util.Locale;
import org.cohesa.core.InvalidInputException;

/**
 * Published mutual solubility of one solvent with water near room temperature (one row of
 * {@code solvent-db/water-miscibility.csv}).
 *
 * @param name                 the solvent as the library names it
 * @param cas                  its CAS number (the key the table is matched by)
 * @param miscible             true when the pair mixes in all proportions at {@code temperatureC}
 * @param solventInWaterWtPct  solubility of the solvent in the water-rich phase, mass %, or null when miscible
 * @param waterInSolventWtPct  water dissolved in the solvent-rich phase, mass %, or null when miscible
 * @param temperatureC         temperature of the values, °C (20–30)
 * @param lcstC                lower critical solution temperature, °C, or null (above it the pair can split)
 * @param ucstC                upper critical solution temperature, °C, or null (above it the pair mixes in all proportions)
 * @param source               source key, cited in docs/methods.md ("Water miscibility")
 * @param basis                how the value came in: "from memory" or "checked against the source"
 * @param note                 free text
 */
public record WaterSolubility(String name, String cas, boolean miscible, Double solventInWaterWtPct, Double waterInSolventWtPct,
                              double temperatureC, Double lcstC, Double ucstC, String source, String basis, String note) {

    public WaterSolubility {
        if (name == null || name.isBlank()) {
            throw new InvalidInputException("name", String.valueOf(name), "a water-miscibility row needs the solvent's name");
        }
        if (miscible && (solventInWaterWtPct != null || waterInSolventWtPct != null)) {
            throw new InvalidInputException("behaviour", name, "a miscible pair has no solubility limits");
        }
        if (!miscible) {
            requirePercent("solvent_in_water_wt_pct", solventInWaterWtPct, name);
            requirePercent("water_in_solvent_wt_pct", waterInSolventWtPct, name);
            if (solventInWaterWtPct + waterInSolventWtPct >= 100) {
                throw new InvalidInputException("solvent_in_water_wt_pct", name,
                        "the two solubilities leave no two-phase range (they add up to 100 % or more)");
            }
        }
        if (!(temperatureC >= 0 && temperatureC <= 40)) {
            throw new InvalidInputException("temperature_c", String.format(Locale.ROOT, "%s", temperatureC), "must lie between 0 and 40 °C");
        }
        if (lcstC != null && ucstC != null && lcstC >= ucstC && !miscible) {
            throw new InvalidInputException("lcst_c", String.valueOf(lcstC), "a partly miscible pair with both critical temperatures needs LCST < UCST");
        }
        note = note == null ? "" : note;
        basis = basis == null ? "" : basis;
    }

    private static void requirePercent(String field, Double v, String name) {
        if (v == null || !(v > 0 && v < 100)) {
            throw new InvalidInputException(field, name + ": " + v, "a partly miscible pair needs a solubility between 0 and 100 mass %");
        }
    }

    /** True when the published values describe the pair at {@code kelvin} (see {@link WaterMiscibility}). */
    boolean near(double kelvin) {
        return Math.abs(kelvin - 273.15 - temperatureC) <= WaterMiscibility.DATA_BAND_K;
    }
}
