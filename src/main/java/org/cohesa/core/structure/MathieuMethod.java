package org.cohesa.core.structure;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import org.openscience.cdk.graph.Cycles;
import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.interfaces.IBond;
import org.openscience.cdk.smarts.SmartsPattern;

/**
 * Hansen parameters and liquid molar volume from the structure by the additive method of D. Mathieu, ACS Omega 3
 * (2018) 17049 (increments in {@link MathieuIncrements}):
 * <ul>
 *   <li>V = Σ atom-code volume increments + ring increments (5-, 6-, smaller, larger rings; aromatic rings);</li>
 *   <li>R = Σ atom-code molar refraction increments; δD = √(93.8 + (2016 + 75044/V)(R/V)²);</li>
 *   <li>δP = √(E_P/V), E_P = Σ polar fragments: carboxylic acid, nitro on carbon, cyclic carbonate, ester
 *       O–C=O, amide carbonyl (every match counts), then each remaining polar multiple bond between unlike
 *       atoms (C=O, C≡N, P=O), then every heteroatom by element and hydrogen count (O(0), O(1), N(1), N(2),
 *       Cl(0); tertiary N and F add nothing);</li>
 *   <li>δH = √(E_H/V), E_H = Σ per N and O atom (nitro N excepted), per halogen, and per hydrogen by what
 *       carries it (C, amine N, amide N, NH2, OH, carboxylic OH).</li>
 * </ul>
 * All energies J/mol, volumes cm³/mol, parameters MPa^½ (J/cm³)^½. A structure with a fragment the method has
 * no value for (e.g. aromatic C–N or C–O bonds of pyridines and furans, S, Br, I in the polar part) gets no value
 * for that component: the method is not stretched beyond its tables.
 */
public final class MathieuMethod {

    private static final Map<String, SmartsPattern> POLAR_GROUPS = new LinkedHashMap<>();

    static {
        POLAR_GROUPS.put("COOH", pattern("[CX3](=O)[OX2H1]"));
        POLAR_GROUPS.put("NitroOnC", pattern("[#6][$([NX3](=O)=O),$([NX3+](=O)[O-])]"));
        POLAR_GROUPS.put("Carbonate", pattern("[OX2;R][CX3;R](=O)[OX2]"));
        POLAR_GROUPS.put("Ester", pattern("[OX2][CX3]=O"));
        POLAR_GROUPS.put("COinAmide", pattern("[NX3][CX3](=[OX1])[#6]"));
        POLAR_GROUPS.put("SO2", pattern("O=S=O"));
    }

    private static final SmartsPattern AMIDE = pattern("[NX3][CX3](=[OX1])[#6]");
    private static final SmartsPattern ACID = pattern("[CX3](=O)[OX2H1]");

    private MathieuMethod() {
    }

    private static SmartsPattern pattern(String smarts) {
        return SmartsPattern.create(smarts).setPrepare(false);
    }

    public static MathieuEstimate estimate(Structure structure) {
        IAtomContainer mol = structure.copyOfMolecule();
        SmartsPattern.prepare(mol);
        Set<String> uncovered = new TreeSet<>();

        double volume = 0;
        double refraction = 0;
        for (IAtom atom : mol.atoms()) {
            String code = atomCode(mol, atom);
            Double v = MathieuIncrements.VOLUME.get(code);
            Double r = MathieuIncrements.REFRACTION.get(code);
            if (v == null || r == null) {
                uncovered.add("atom " + code);
                continue;
            }
            volume += v;
            refraction += r;
        }
        for (int[] path : Cycles.sssr(mol).paths()) {
            int size = path.length - 1;
            volume += MathieuIncrements.VOLUME.get(size > 6 ? "R>6" : size < 5 ? "R<5" : "R" + size);
            boolean aromatic = true;
            for (int i = 0; i < size; i++) {
                aromatic &= mol.getAtom(path[i]).isAromatic();
            }
            if (aromatic) {
                volume += MathieuIncrements.VOLUME.get("aromat");
            }
        }
        if (!uncovered.isEmpty() || volume <= 0) {
            return new MathieuEstimate(null, null, null, null, null, new ArrayList<>(uncovered));
        }
        double dD = MathieuIncrements.dispersion(volume, refraction);
        Double dP = component(polarFragments(mol), MathieuIncrements.POLAR, volume, uncovered);
        Double dH = component(hydrogenBondingFragments(mol), MathieuIncrements.HYDROGEN_BONDING, volume, uncovered);
        return new MathieuEstimate(volume, refraction, dD, dP, dH, new ArrayList<>(uncovered));
    }

    private static Double component(Map<String, Integer> fragments, Map<String, Double> energies, double volume, Set<String> uncovered) {
        double e = 0;
        boolean ok = true;
        for (Map.Entry<String, Integer> f : fragments.entrySet()) {
            Double each = energies.get(f.getKey());
            if (each == null) {
                uncovered.add("fragment " + f.getKey());
                ok = false;
            } else {
                e += each * f.getValue();
            }
        }
        // a small negative sum (acids with few other polar groups) means no polar cohesion: 0, as the method does
        return ok ? Math.sqrt(Math.max(e / volume, 0)) : null;
    }

    /** Element + neighbours (hydrogens included) + hydrogens, "a" when aromatic; e.g. C43, C31a, O10. */
    static String atomCode(IAtomContainer mol, IAtom atom) {
        int h = hydrogens(atom);
        int degree = mol.getConnectedBondsCount(atom) + h;
        return atom.getSymbol() + degree + h + (atom.isAromatic() ? "a" : "");
    }

    private static int hydrogens(IAtom atom) {
        return atom.getImplicitHydrogenCount() == null ? 0 : atom.getImplicitHydrogenCount();
    }

    static Map<String, Integer> polarFragments(IAtomContainer mol) {
        Map<String, Integer> out = new LinkedHashMap<>();
        Set<Integer> counted = new HashSet<>();
        // every match of a complex group counts, overlaps included, and every heteroatom counts again below: the
        // increments were fitted that way (an acid is COOH + ester + O(1) + O(0); the COOH value is negative)
        for (Map.Entry<String, SmartsPattern> g : POLAR_GROUPS.entrySet()) {
            for (int[] match : g.getValue().matchAll(mol).uniqueAtoms()) {
                for (int i : match) {
                    counted.add(i);
                }
                out.merge(g.getKey(), 1, Integer::sum);
            }
        }
        for (IBond bond : mol.bonds()) {
            String order = bond.isAromatic() ? "~" : bond.getOrder() == IBond.Order.DOUBLE ? "=" : bond.getOrder() == IBond.Order.TRIPLE ? "#" : null;
            if (order == null) {
                continue;
            }
            String a = bond.getBegin().getSymbol();
            String b = bond.getEnd().getSymbol();
            if (a.equals(b)) {
                continue;
            }
            int ia = mol.indexOf(bond.getBegin());
            int ib = mol.indexOf(bond.getEnd());
            if (counted.contains(ia) || counted.contains(ib)) {
                continue;
            }
            counted.add(ia);
            counted.add(ib);
            String key = a.compareTo(b) < 0 ? a + order + b : b + order + a;
            out.merge(key, 1, Integer::sum);
        }
        for (IAtom atom : mol.atoms()) {
            String el = atom.getSymbol();
            if (el.equals("C") || (el.equals("P") && mol.getConnectedBondsCount(atom) + hydrogens(atom) > 3)) {
                continue;
            }
            String key = el + "(" + hydrogens(atom) + ")";
            if (key.equals("N(0)") || key.equals("F(0)")) {
                continue;
            }
            out.merge(key, 1, Integer::sum);
        }
        return out;
    }

    static Map<String, Integer> hydrogenBondingFragments(IAtomContainer mol) {
        Set<Integer> amideN = firstAtoms(AMIDE, mol, 0);
        Set<Integer> acidO = firstAtoms(ACID, mol, 2);
        Map<String, Integer> out = new LinkedHashMap<>();
        for (IAtom atom : mol.atoms()) {
            String el = atom.getSymbol();
            int idx = mol.indexOf(atom);
            if ((el.equals("N") || el.equals("O")) && !isNitroN(mol, atom)) {
                out.merge(el, 1, Integer::sum);
            }
            if (el.equals("F") || el.equals("Cl") || el.equals("Br") || el.equals("I")) {
                out.merge("X", 1, Integer::sum);
            }
            int h = hydrogens(atom);
            if (h == 0) {
                continue;
            }
            switch (el) {
                case "C" -> out.merge("HC", h, Integer::sum);
                case "N" -> {
                    if (amideN.contains(idx)) {
                        out.merge("HNamide", h, Integer::sum);
                    } else if (h == 2) {
                        out.merge("H2N", 2, Integer::sum);
                    } else if (h == 1) {
                        out.merge("HN", 1, Integer::sum);
                    }
                }
                case "O" -> out.merge(acidO.contains(idx) ? "HO_COOH" : "HO", h, Integer::sum);
                default -> {
                }
            }
        }
        return out;
    }

    private static boolean isNitroN(IAtomContainer mol, IAtom atom) {
        if (!atom.getSymbol().equals("N") || mol.getConnectedBondsCount(atom) + hydrogens(atom) != 3) {
            return false;
        }
        int terminalO = 0;
        for (IAtom n : mol.getConnectedAtomsList(atom)) {
            if (n.getSymbol().equals("O") && mol.getConnectedBondsCount(n) + hydrogens(n) == 1) {
                terminalO++;
            }
        }
        return terminalO > 1;
    }

    private static Set<Integer> firstAtoms(SmartsPattern p, IAtomContainer mol, int position) {
        Set<Integer> out = new HashSet<>();
        for (int[] m : p.matchAll(mol)) {
            out.add(m[position]);
        }
        return out;
    }
}
