package org.cohesa.cli.structure;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.cohesa.cli.Args;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.structure.MeasuredProperties;
import org.cohesa.core.structure.StructureEstimate;

/** The sphere of a material added by its structure: estimated centre, given or default radius, and what to say about both. */
public final class MaterialFromStructure {

    /**
     * Default interaction radius for a small-molecule drug substance with no measured sphere, MPa^½: 7.0, the
     * Δδ below which Greenhalgh et al., J. Pharm. Sci. 88 (1999) 1182 found drug–excipient pairs miscible (from
     * memory; the bundled drug substances use the same default). A screening value only.
     */
    public static final double DEFAULT_R0 = 7.0;

    /** Centre and radius with the lines that say how they were obtained. */
    public record Centre(double dD, double dP, double dH, double r0, String source, List<String> lines) {
    }

    private static final String ESTIMATED_FROM = "estimated from the structure ";
    private static final String ESTIMATED_BY = " (Mathieu 2018 group contribution)";

    private MaterialFromStructure() {
    }

    /** The SMILES of a material whose centre {@link #centre} estimated (its source says so), or null for any other source. */
    public static String estimatedFrom(String source) {
        if (source == null || !source.startsWith(ESTIMATED_FROM) || !source.endsWith(ESTIMATED_BY)) {
            return null;
        }
        String smiles = source.substring(ESTIMATED_FROM.length(), source.length() - ESTIMATED_BY.length()).strip();
        return smiles.isEmpty() || smiles.contains(" ") ? null : smiles;
    }

    public static Centre centre(String smiles, String dD, String dP, String dH, String r0) {
        StructureEstimate e = StructureEstimates.estimate("--smiles", smiles, MeasuredProperties.NONE);
        List<String> lines = new ArrayList<>();
        boolean anyGiven = dD != null || dP != null || dH != null;
        if (anyGiven && (dD == null || dP == null || dH == null)) {
            throw new InvalidInputException("--dD/--dP/--dH", smiles, "give all three centre components or none (none: estimated from --smiles)");
        }
        double d;
        double p;
        double h;
        String source;
        if (anyGiven) {
            d = component("--dD", dD);
            p = component("--dP", dP);
            h = component("--dH", dH);
            source = "user entry (structure " + e.structure().smiles() + ")";
        } else {
            StructureEstimates.requireHansen("--smiles", smiles, e);
            d = round(e.dD().value());
            p = round(e.dP().value());
            h = round(e.dH().value());
            source = ESTIMATED_FROM + e.structure().smiles() + ESTIMATED_BY;
            lines.add(SolventFromStructure.line("δD", e.dD()));
            lines.add(SolventFromStructure.line("δP", e.dP()));
            lines.add(SolventFromStructure.line("δH", e.dH()));
        }
        double r;
        if (r0 != null) {
            r = Args.number("--r0", r0);
            if (r <= 0 || r > 60) {
                throw new InvalidInputException("--r0", r0, "must be a positive number up to 60 MPa^½");
            }
        } else {
            r = DEFAULT_R0;
            lines.add(String.format(Locale.ROOT, "caution: R0 %.1f is a default screening radius for small-molecule solids, not a measurement "
                    + "(a radius cannot be estimated from the structure); measure the sphere with 'cohesa fit' from dissolving tests "
                    + "('cohesa fit FILE --prior-smiles SMILES' starts from this estimate)", r));
        }
        e.warnings().forEach(w -> lines.add("caution: " + w));
        return new Centre(d, p, h, r, source, lines);
    }

    private static double component(String field, String text) {
        double v = Args.number(field, text);
        if (v < 0 || v > 60) {
            throw new InvalidInputException(field, text, "must be a number from 0 to 60 MPa^½");
        }
        return v;
    }

    private static double round(double v) {
        return Math.round(v * 10) / 10.0;
    }
}
