package org.cohesa.cli.structure;

import org.cohesa.cli.Args;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.structure.MeasuredProperties;
import org.cohesa.core.structure.StructureEstimate;
import org.cohesa.store.StructureEntries;

/** The sphere of a material added by its structure, from the options ({@link StructureEntries#materialCentre}). */
public final class MaterialFromStructure {

    private MaterialFromStructure() {
    }

    /** The SMILES of a material whose centre {@link #centre} estimated (its source says so), or null for any other source. */
    public static String estimatedFrom(String source) {
        return StructureEntries.estimatedFrom(source);
    }

    public static StructureEntries.Centre centre(String smiles, String dD, String dP, String dH, String r0) {
        StructureEstimate e = StructureEstimates.estimate("--smiles", smiles, MeasuredProperties.NONE);
        Double r = null;
        if (r0 != null) {
            r = Args.number("--r0", r0);
            if (r <= 0 || r > 60) {
                throw new InvalidInputException("--r0", r0, "must be a positive number up to 60 MPa^½");
            }
        }
        return StructureEntries.materialCentre(e, SolventFromStructure.FIELDS, smiles, component("--dD", dD), component("--dP", dP),
                component("--dH", dH), r);
    }

    private static Double component(String field, String text) {
        if (text == null) {
            return null;
        }
        double v = Args.number(field, text);
        if (v < 0 || v > 60) {
            throw new InvalidInputException(field, text, "must be a number from 0 to 60 MPa^½");
        }
        return v;
    }
}
