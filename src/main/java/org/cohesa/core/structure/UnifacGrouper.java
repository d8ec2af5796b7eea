package org.cohesa.core.structure;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.smarts.SmartsPattern;

/**
 * Splits a structure into original-UNIFAC subgroups: each pattern of {@link UnifacPatterns#ORDER} in turn claims
 * the atoms of its matches that no earlier pattern claimed. The molecule is usable for UNIFAC only when every
 * non-hydrogen atom ends up in a group.
 */
public final class UnifacGrouper {

    private static final List<Compiled> PATTERNS = UnifacPatterns.ORDER.stream()
            .map(p -> new Compiled(p, SmartsPattern.create(p.smarts()).setPrepare(false))).toList();

    private record Compiled(UnifacGroupPattern group, SmartsPattern pattern) {
    }

    private UnifacGrouper() {
    }

    /** Name of an original-UNIFAC subgroup as the table writes it (e.g. 14 → "OH"), or "#id" when unknown here. */
    public static String name(int subgroup) {
        return UnifacPatterns.ORDER.stream().filter(p -> p.subgroup() == subgroup).map(UnifacGroupPattern::name).findFirst()
                .orElse("#" + subgroup);
    }

    public static UnifacGrouping group(Structure structure) {
        IAtomContainer mol = structure.copyOfMolecule();
        SmartsPattern.prepare(mol);
        boolean[] claimed = new boolean[mol.getAtomCount()];
        Map<Integer, Integer> counts = new TreeMap<>();
        for (Compiled c : PATTERNS) {
            for (int[] match : c.pattern().matchAll(mol).uniqueAtoms()) {
                if (anyClaimed(claimed, match)) {
                    continue;
                }
                if (c.group().hydrogens() >= 0 && hydrogens(mol, match) != c.group().hydrogens()) {
                    continue;
                }
                for (int i : match) {
                    claimed[i] = true;
                }
                counts.merge(c.group().subgroup(), 1, Integer::sum);
            }
        }
        List<String> unplaced = new ArrayList<>();
        for (int i = 0; i < claimed.length; i++) {
            if (!claimed[i]) {
                unplaced.add((i + 1) + " (" + mol.getAtom(i).getSymbol() + ")");
            }
        }
        return new UnifacGrouping(unplaced.isEmpty() ? counts : Map.of(), unplaced.isEmpty(), unplaced);
    }

    private static boolean anyClaimed(boolean[] claimed, int[] match) {
        for (int i : match) {
            if (claimed[i]) {
                return true;
            }
        }
        return false;
    }

    private static int hydrogens(IAtomContainer mol, int[] match) {
        int h = 0;
        for (int i : match) {
            IAtom a = mol.getAtom(i);
            h += a.getImplicitHydrogenCount() == null ? 0 : a.getImplicitHydrogenCount();
        }
        return h;
    }
}
