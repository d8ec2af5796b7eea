package org.cohesa.cli;

import org.cohesa.core.InvalidInputException;
import org.cohesa.core.hsp.SolubilitySphere;

/** Parses the sphere notation {@code dD,dP,dH,R0} used by --target options. */
public final class Targets {

    private Targets() {
    }

    public static SolubilitySphere parseSphere(String field, String text) {
        String[] parts = text == null ? new String[0] : text.split("[,;\\s]+");
        if (parts.length != 4) {
            throw new InvalidInputException(field, String.valueOf(text), "write the sphere as dD,dP,dH,R0 in MPa^½, e.g. 18.0,9.0,8.0,7.0");
        }
        double[] v = new double[4];
        String[] names = {"dD", "dP", "dH", "R0"};
        for (int i = 0; i < 4; i++) {
            try {
                v[i] = Double.parseDouble(parts[i].strip());
            } catch (NumberFormatException e) {
                throw new InvalidInputException(field, text, names[i] + " '" + parts[i] + "' is not a number");
            }
            if (!Double.isFinite(v[i]) || v[i] < 0) {
                throw new InvalidInputException(field, text, names[i] + " must be a number ≥ 0, got " + parts[i]);
            }
        }
        if (v[3] <= 0) {
            throw new InvalidInputException(field, text, "R0 must be positive, got " + parts[3]);
        }
        return SolubilitySphere.of(v[0], v[1], v[2], v[3]);
    }
}
