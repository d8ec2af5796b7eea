package org.cohesa.core.target;

import java.util.ArrayList;
import java.util.List;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.solvent.SolventLibrary;

/**
 * A fixed list of 35 common test liquids: those most labs keep on the shelf and use for a solubility series,
 * spread over the whole (δD, δP, δH) space from alkanes to water (common practice, no source). The synthetic
 * series of the fit's checks and benchmarks draw from it, and it is the pool of "random common liquids" the
 * next-test suggestions are measured against. Three deliberately chosen lists (even coverage of δ-space, expected
 * information, more corners) were measured against it and did no better (docs/methods.md, docs/fit-lists/).
 */
public final class CommonTestLiquids {

    public static final List<String> NAMES = List.of(
            "n-hexane", "n-heptane", "cyclohexane", "toluene", "xylene", "chlorobenzene", "diethyl ether", "1,4-dioxane",
            "tetrahydrofuran", "chloroform", "dichloromethane", "ethyl acetate", "n-butyl acetate", "acetone", "methyl ethyl ketone",
            "methyl isobutyl ketone", "cyclohexanone", "acetonitrile", "N,N-dimethylformamide", "N,N-dimethylacetamide",
            "dimethyl sulfoxide", "N-methyl-2-pyrrolidone", "propylene carbonate", "gamma-butyrolactone", "methanol", "ethanol",
            "2-propanol", "1-butanol", "benzyl alcohol", "diacetone alcohol", "1-methoxy-2-propanol", "2-butoxyethanol", "acetic acid",
            "ethylene glycol", "water");

    private CommonTestLiquids() {
    }

    /** The list resolved in {@code library}, in list order. */
    public static List<NamedPoint> resolve(SolventLibrary library) {
        List<NamedPoint> out = new ArrayList<>();
        for (String n : NAMES) {
            Solvent s = library.resolve("common test liquid", n);
            out.add(new NamedPoint(n, s.hansen()));
        }
        return out;
    }
}
