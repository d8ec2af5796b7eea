package org.cohesa.core.structure;

import org.openscience.cdk.interfaces.IAtomContainer;

/**
 * One parsed molecule: the SMILES it came from, its Hill formula and molar mass, and the CDK molecule the group
 * methods match their patterns on. Made only by {@link StructureParser}, which has already refused what the
 * estimation methods do not cover (several components, net charge, radicals, metals and other elements).
 *
 * <p>The CDK molecule is mutable, so it never leaves this package: callers get {@link #copyOfMolecule()}.
 */
public final class Structure {

    private final String smiles;
    private final String formula;
    private final double molarMass;
    private final IAtomContainer molecule;

    Structure(String smiles, String formula, double molarMass, IAtomContainer molecule) {
        this.smiles = smiles;
        this.formula = formula;
        this.molarMass = molarMass;
        this.molecule = molecule;
    }

    /** The SMILES as the user gave it (stripped). */
    public String smiles() {
        return smiles;
    }

    /** Hill formula, e.g. {@code C4H8O2}. */
    public String formula() {
        return formula;
    }

    /** Molar mass, g/mol, from IUPAC standard atomic weights (CDK's isotope table). */
    public double molarMass() {
        return molarMass;
    }

    /** Number of non-hydrogen atoms. */
    public int heavyAtomCount() {
        return molecule.getAtomCount();
    }

    IAtomContainer molecule() {
        return molecule;
    }

    /** A copy of the molecule for callers outside the package (e.g. a depiction). */
    public IAtomContainer copyOfMolecule() {
        try {
            return molecule.clone();
        } catch (CloneNotSupportedException e) {
            throw new IllegalStateException("CDK molecule cannot be copied", e);
        }
    }

    /** The summary as a value. */
    public StructureFacts facts() {
        return new StructureFacts(smiles, formula, molarMass, heavyAtomCount());
    }

    @Override
    public String toString() {
        return smiles + " (" + formula + ")";
    }
}
