package org.cohesa.core.structure;

import java.util.LinkedHashMap;
import java.util.Map;
import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.smarts.SmartsPattern;

/**
 * The chemical family a structure is judged by when its estimated Hansen parameters are validated and when a
 * user is warned: the first family of this list whose pattern the structure holds (so a halogenated acid counts
 * as highly halogenated or as an acid before it counts as halogenated). Common practice, no source: the families
 * are the usual functional-group classes.
 */
public final class StructureFamily {

    private static final Map<String, SmartsPattern> ORDER = new LinkedHashMap<>();

    static {
        ORDER.put("acid", p("[CX3](=O)[OX2H1]"));
        ORDER.put("amide", p("[NX3][CX3]=[OX1]"));
        ORDER.put("nitro", p("[NX3](~[OX1])~[OX1]"));
        ORDER.put("nitrile", p("C#N"));
        ORDER.put("phosphorus", p("[#15]"));
        ORDER.put("sulfur", p("[#16]"));
        ORDER.put("amine", p("[NX3;!$(N~[#8])]"));
        ORDER.put("polyol", p("[OX2H1][#6].[OX2H1][#6]"));
        ORDER.put("heteroaromatic", p("[n,o,s]"));
        ORDER.put("ester", p("[#6][CX3](=O)[OX2][#6]"));
        ORDER.put("carbonyl", p("[#6][CX3]=O"));
        ORDER.put("alcohol", p("[OX2H1][#6]"));
        ORDER.put("ether", p("[OX2]([#6])[#6]"));
        ORDER.put("halogenated", p("[F,Cl,Br,I]"));
        ORDER.put("aromatic hydrocarbon", p("c"));
    }

    private StructureFamily() {
    }

    private static SmartsPattern p(String smarts) {
        return SmartsPattern.create(smarts).setPrepare(false);
    }

    /** Family key, e.g. "ester", "highly halogenated" (three or more halogen atoms), "aliphatic hydrocarbon". */
    public static String of(Structure structure) {
        IAtomContainer mol = structure.copyOfMolecule();
        SmartsPattern.prepare(mol);
        int halogens = 0;
        for (IAtom a : mol.atoms()) {
            switch (a.getSymbol()) {
                case "F", "Cl", "Br", "I" -> halogens++;
                default -> {
                }
            }
        }
        if (halogens >= 3) {
            return "highly halogenated";
        }
        for (Map.Entry<String, SmartsPattern> e : ORDER.entrySet()) {
            if (e.getValue().matches(mol)) {
                return e.getKey();
            }
        }
        boolean onlyCarbon = true;
        for (IAtom a : mol.atoms()) {
            onlyCarbon &= a.getSymbol().equals("C");
        }
        return onlyCarbon ? "aliphatic hydrocarbon" : "other";
    }
}
