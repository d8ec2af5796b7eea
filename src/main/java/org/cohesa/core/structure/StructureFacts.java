package org.cohesa.core.structure;

/**
 * What the structure alone says about a molecule.
 *
 * @param smiles         the SMILES given
 * @param formula        Hill formula
 * @param molarMass      g/mol (IUPAC standard atomic weights)
 * @param heavyAtoms     non-hydrogen atoms
 */
public record StructureFacts(String smiles, String formula, double molarMass, int heavyAtoms) {
}
