package org.cohesa.core.solvent;

import java.util.ArrayList;
import java.util.List;
import org.cohesa.core.InvalidInputException;

/**
 * The solvent library with every solvent's Hansen parameters shifted to a process temperature by
 * {@link HansenAtTemperature} (Hansen–Beerbower, Hansen's handbook, 2nd ed. (2007), ch. 1; see docs/methods.md). The
 * material's sphere is not shifted: it is taken as measured. A solvent the shift refuses (too close to its critical
 * point, or no boiling point to estimate its expansion from) is kept unshifted out of the searches and named.
 *
 * @param library   the shifted library (the same solvents, same order)
 * @param kelvin    the process temperature, K
 * @param shifted   true when the temperature differs from 25 °C
 * @param leftOut   names of solvents with Hansen parameters the shift could not handle (their parameters removed)
 */
public record LibraryAtTemperature(SolventLibrary library, double kelvin, boolean shifted, List<String> leftOut) {

    public LibraryAtTemperature {
        leftOut = List.copyOf(leftOut);
    }

    /** Within 0.05 K of 25 °C the library is used as stored. */
    public static LibraryAtTemperature of(SolventLibrary lib, double kelvin) {
        if (Math.abs(kelvin - HansenAtTemperature.REFERENCE_KELVIN) < 0.05) {
            return new LibraryAtTemperature(lib, kelvin, false, List.of());
        }
        List<Solvent> out = new ArrayList<>();
        List<String> refused = new ArrayList<>();
        for (Solvent s : lib.all()) {
            if (!s.hasHansen()) {
                out.add(s);
                continue;
            }
            try {
                out.add(s.withHansen(HansenAtTemperature.at(s, kelvin)));
            } catch (InvalidInputException e) {
                refused.add(s.name());
                out.add(s.withHansen(null));
            }
        }
        return new LibraryAtTemperature(new SolventLibrary(out), kelvin, true, refused);
    }

    /** One line for the output, or null at 25 °C. */
    public String describe() {
        if (!shifted) {
            return null;
        }
        String t = String.format(java.util.Locale.ROOT, "%.0f °C", kelvin - 273.15);
        return "solvent parameters shifted from 25 °C to " + t + " (Hansen–Beerbower); the target sphere is taken as measured"
                + (leftOut.isEmpty() ? "" : "; left out, too close to their critical point or without data for the shift: "
                        + String.join(", ", leftOut));
    }
}
