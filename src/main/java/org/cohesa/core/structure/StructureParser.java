package org.cohesa.core.structure;

import java.util.Map;
import java.util.Set;
import org.cohesa.core.InvalidInputException;
import org.openscience.cdk.exception.InvalidSmilesException;
import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.interfaces.IBond;
import org.openscience.cdk.interfaces.IMolecularFormula;
import org.openscience.cdk.silent.SilentChemObjectBuilder;
import org.openscience.cdk.smiles.SmilesParser;
import org.openscience.cdk.tools.manipulator.AtomContainerManipulator;
import org.openscience.cdk.tools.manipulator.MolecularFormulaManipulator;

/**
 * Reads a SMILES into a {@link Structure}, refusing what the group-contribution methods of this package do not
 * cover, each with one line naming the field and the value:
 * <ul>
 *   <li>text that is not SMILES (CDK's parser, Daylight SMILES with OpenSMILES extensions);</li>
 *   <li>more than one component (salts, mixtures, hydrates: {@code .} in the SMILES);</li>
 *   <li>a net charge (ions); charge-separated neutral groups such as nitro {@code [N+](=O)[O-]} are kept;</li>
 *   <li>radicals and other atoms whose valence is not a closed-shell one (e.g. {@code [CH3]});</li>
 *   <li>metals and any element outside C, H, N, O, S, P, F, Cl, Br, I, Si, B (the elements the UNIFAC and
 *       Hansen group tables have groups for).</li>
 * </ul>
 */
public final class StructureParser {

    /** Longest SMILES accepted: far above any solvent or drug substance; keeps a pasted file from being parsed. */
    public static final int MAX_LENGTH = 500;

    private static final Set<String> ELEMENTS = Set.of("C", "H", "N", "O", "S", "P", "F", "Cl", "Br", "I", "Si", "B");

    /** Closed-shell valences of each element at formal charge 0; a charge shifts them (see {@link #valenceFits}). */
    private static final Map<String, int[]> VALENCES = Map.ofEntries(
            Map.entry("C", new int[] {4}), Map.entry("H", new int[] {1}), Map.entry("N", new int[] {3}),
            Map.entry("O", new int[] {2}), Map.entry("S", new int[] {2, 4, 6}), Map.entry("P", new int[] {3, 5}),
            Map.entry("F", new int[] {1}), Map.entry("Cl", new int[] {1}), Map.entry("Br", new int[] {1}),
            Map.entry("I", new int[] {1}), Map.entry("Si", new int[] {4}), Map.entry("B", new int[] {3}));

    private static final Set<String> METALS = Set.of("Li", "Na", "K", "Rb", "Cs", "Be", "Mg", "Ca", "Sr", "Ba", "Al", "Ga",
            "In", "Tl", "Sn", "Pb", "Bi", "Sc", "Ti", "V", "Cr", "Mn", "Fe", "Co", "Ni", "Cu", "Zn", "Y", "Zr", "Nb", "Mo",
            "Tc", "Ru", "Rh", "Pd", "Ag", "Cd", "Hf", "Ta", "W", "Re", "Os", "Ir", "Pt", "Au", "Hg", "La", "Ce", "Pr", "Nd",
            "Sm", "Eu", "Gd", "Tb", "Dy", "Ho", "Er", "Tm", "Yb", "Lu", "U", "Th");

    private StructureParser() {
    }

    /** Parses {@code smiles}; {@code field} names the input in error messages (e.g. "smiles"). */
    public static Structure parse(String field, String smiles) {
        if (smiles == null || smiles.isBlank()) {
            throw new InvalidInputException(field, smiles == null ? "" : smiles, "a SMILES is required");
        }
        String text = smiles.strip();
        if (text.length() > MAX_LENGTH) {
            throw new InvalidInputException(field, text.substring(0, 40) + "…", "longer than " + MAX_LENGTH + " characters");
        }
        if (text.chars().anyMatch(Character::isWhitespace)) {
            throw new InvalidInputException(field, text, "a SMILES has no spaces (give one structure)");
        }
        if (text.contains(".")) {
            throw new InvalidInputException(field, text,
                    "has several components (a salt, hydrate or mixture); the estimation methods cover one neutral molecule");
        }
        IAtomContainer mol;
        try {
            mol = new SmilesParser(SilentChemObjectBuilder.getInstance()).parseSmiles(text);
        } catch (InvalidSmilesException e) {
            throw new InvalidInputException(field, text, "not a valid SMILES (" + firstLine(e.getMessage()) + ")");
        }
        if (mol.getAtomCount() == 0) {
            throw new InvalidInputException(field, text, "holds no atoms");
        }
        int netCharge = 0;
        for (IAtom atom : mol.atoms()) {
            String el = atom.getSymbol();
            if (METALS.contains(el)) {
                throw new InvalidInputException(field, text, "contains the metal " + el + "; the estimation methods cover organic molecules only");
            }
            if (!ELEMENTS.contains(el)) {
                throw new InvalidInputException(field, text, "contains " + el + ", an element the group tables do not cover");
            }
            int charge = atom.getFormalCharge() == null ? 0 : atom.getFormalCharge();
            netCharge += charge;
            if (!valenceFits(atom, mol, charge)) {
                throw new InvalidInputException(field, text, "atom " + (mol.indexOf(atom) + 1) + " (" + el
                        + ") has an open-shell valence (a radical or a missing hydrogen); give the closed-shell molecule");
            }
        }
        if (netCharge != 0) {
            throw new InvalidInputException(field, text, "has a net charge of " + (netCharge > 0 ? "+" : "") + netCharge
                    + " (an ion); give the neutral molecule, the methods do not cover salts");
        }
        // explicit [H] atoms become implicit counts, so that group patterns see one form
        mol = AtomContainerManipulator.suppressHydrogens(mol);
        IMolecularFormula formula = MolecularFormulaManipulator.getMolecularFormula(mol);
        String hill = MolecularFormulaManipulator.getString(formula);
        double mass = MolecularFormulaManipulator.getMass(formula, MolecularFormulaManipulator.MolWeight);
        return new Structure(text, hill, mass, mol);
    }

    /**
     * Closed-shell check: bond orders plus hydrogens must equal one of the element's usual valences, shifted by the
     * formal charge as isoelectronic reasoning gives (N+ like C: 4; O- like F: 1; O+ like N: 3; C- like N: 3).
     * CDK's parser kekulises aromatic input, so bond orders are whole numbers here.
     */
    private static boolean valenceFits(IAtom atom, IAtomContainer mol, int charge) {
        int used = atom.getImplicitHydrogenCount() == null ? 0 : atom.getImplicitHydrogenCount();
        for (IBond bond : mol.getConnectedBondsList(atom)) {
            used += bond.getOrder() == null || bond.getOrder() == IBond.Order.UNSET ? 1 : bond.getOrder().numeric();
        }
        if (mol.getConnectedSingleElectronsCount(atom) > 0) {
            return false;
        }
        for (int v : VALENCES.get(atom.getSymbol())) {
            int shifted = switch (atom.getSymbol()) {
                case "N", "P", "O", "S" -> v + charge;      // N+ 4, O+ 3, O- 1, S+ 3, S- 1
                case "C", "Si" -> v - Math.abs(charge);     // carbanion or carbocation: 3
                case "B" -> v - charge;                     // B- like C: 4
                default -> v - Math.abs(charge);
            };
            if (used == shifted) {
                return true;
            }
        }
        return false;
    }

    private static String firstLine(String message) {
        if (message == null) {
            return "no detail";
        }
        String line = message.lines().findFirst().orElse(message).strip();
        return line.endsWith(":") ? line.substring(0, line.length() - 1) : line;
    }
}
