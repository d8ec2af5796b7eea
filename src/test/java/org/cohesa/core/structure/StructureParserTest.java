package org.cohesa.core.structure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.activity.BundledLiquids;
import org.cohesa.core.solvent.Solvent;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class StructureParserTest {

    @Test
    void everyBundledSmilesGivesTheTablesFormulaAndMolarMass() {
        // Round trip against solvent-db/solvents.csv: its formula comes from PubChem (cross-checked with the CRC
        // ΔHvap table by curate.py) and its molar mass is computed there from the formula; CDK derives both from
        // the SMILES alone. Agreement to 2 parts in 10^4 allows for the two atomic-weight tables' last digits (the
        // table uses the IUPAC abridged Cl 35.45, CDK's isotope abundances give 35.453: 0.012 g/mol for CCl4; S 32.06
        // against 32.066 puts carbon disulfide 1.5e-4 apart).
        List<String> problems = new ArrayList<>();
        int checked = 0;
        for (Solvent s : BundledLiquids.library().all()) {
            if (s.smiles() == null) {
                continue;
            }
            checked++;
            Structure st;
            try {
                st = StructureParser.parse("smiles", s.smiles());
            } catch (InvalidInputException e) {
                problems.add(s.name() + ": " + e.getMessage());
                continue;
            }
            if (s.formula() != null && !s.formula().equals(st.formula())) {
                problems.add(s.name() + ": formula " + st.formula() + " from " + s.smiles() + ", table " + s.formula());
            }
            if (s.molarMass() != null && Math.abs(s.molarMass() - st.molarMass()) > 2e-4 * s.molarMass()) {
                problems.add(s.name() + ": molar mass " + st.molarMass() + " from the SMILES, table " + s.molarMass());
            }
        }
        assertTrue(checked >= 150, "only " + checked + " bundled solvents have a SMILES");
        assertTrue(problems.isEmpty(), String.join("\n", problems));
    }

    @Test
    void readsFormulaAndMassOfAKnownMolecule() {
        // Ethyl acetate C4H8O2, 88.106 g/mol (IUPAC 2013 standard atomic weights; PubChem CID 8857 gives 88.11).
        Structure st = StructureParser.parse("smiles", "CCOC(C)=O");
        assertEquals("C4H8O2", st.formula());
        assertEquals(88.106, st.molarMass(), 0.005);
        assertEquals(6, st.heavyAtomCount());
    }

    @Test
    void keepsChargeSeparatedNeutralGroupsAndExplicitHydrogens() {
        // Nitromethane written with the usual charge-separated nitro group; methane with explicit hydrogens.
        assertEquals("CH3NO2", StructureParser.parse("smiles", "C[N+](=O)[O-]").formula());
        Structure methane = StructureParser.parse("smiles", "[H]C([H])([H])[H]");
        assertEquals("CH4", methane.formula());
        assertEquals(1, methane.heavyAtomCount());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "C1CC|not a valid SMILES",
        "CC(C|not a valid SMILES",
        "c1cccc1|not a valid SMILES",
        "[CH3]|open-shell valence",
        "CC[O]|open-shell valence",
        "[Na+].[Cl-]|several components",
        "CC(=O)[O-]|net charge of -1",
        "C[N+](C)(C)C|net charge of +1",
        "CC[Sn](CC)(CC)CC|metal Sn",
        "C[Se]C|element the group tables do not cover",
        "CC O|no spaces",
    })
    void refusesWhatTheMethodsDoNotCoverInOneLine(String smiles, String reason) {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> StructureParser.parse("smiles", smiles));
        assertEquals("smiles", e.field());
        assertTrue(e.getMessage().contains(reason), e.getMessage());
        assertTrue(e.getMessage().startsWith("smiles '"), e.getMessage());
        assertEquals(1, e.getMessage().lines().count(), e.getMessage());
    }
}
