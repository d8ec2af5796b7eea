package org.cohesa.core.structure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.cohesa.core.activity.BundledLiquids;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.solvent.UnifacAssignment;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;

class UnifacGrouperTest {

    static String groups(String smiles) {
        return UnifacGrouper.group(StructureParser.parse("smiles", smiles)).assignment().format();
    }

    @Test
    void splitsTextbookMolecules() {
        // Worked assignments of Fredenslund, Jones, Prausnitz, AIChE J. 21 (1975) 1086 and the DDBST table
        // (ddbst-unifac-assignments.tsv): ethanol CH3+CH2+OH; ethyl acetate CH3+CH2+CH3COO; diethyl ether
        // 2 CH3 + CH2 + CH2O; toluene 5 ACH + ACCH3; acetone CH3 + CH3CO; water; methanol.
        assertEquals("1:1 2:1 14:1", groups("CCO"));
        assertEquals("1:1 2:1 21:1", groups("CCOC(C)=O"));
        assertEquals("1:2 2:1 25:1", groups("CCOCC"));
        assertEquals("9:5 11:1", groups("Cc1ccccc1"));
        assertEquals("1:1 18:1", groups("CC(C)=O"));
        assertEquals("16:1", groups("O"));
        assertEquals("15:1", groups("CO"));
    }

    @Test
    void leavesAStructureWithoutGroupsIncomplete() {
        // A phosphate ester has no original-UNIFAC group for P: the grouping must say so rather than guess.
        UnifacGrouping g = UnifacGrouper.group(StructureParser.parse("smiles", "CCOP(=O)(OCC)OCC"));
        assertTrue(!g.complete() && g.assignment().isEmpty());
        assertTrue(g.unplaced().stream().anyMatch(a -> a.contains("(P)")), g.unplaced().toString());
    }

    /** Bundled solvents whose structure-derived groups differ from the DDBST row, with the reason. */
    static final Map<String, String> DOCUMENTED_BUNDLED_DIFFERENCES = Map.of();

    @Test
    void bundledSolventsGetTheDdbstGroups() {
        // solvent-db/solvents.csv takes its groups from the DDBST assignments where DDBST lists the solvent
        // (src_unifac = ddbst-unifac); the groups found from the SMILES must be the same.
        List<String> problems = new ArrayList<>();
        int checked = 0;
        for (Solvent s : BundledLiquids.library().all()) {
            if (s.smiles() == null || !"ddbst-unifac".equals(s.sources().get("unifac"))) {
                continue;
            }
            checked++;
            String ours = UnifacGrouper.group(StructureParser.parse("smiles", s.smiles())).assignment().format();
            String theirs = new UnifacAssignment(new TreeMap<>(s.unifac().counts())).format();
            if (!ours.equals(theirs) && !DOCUMENTED_BUNDLED_DIFFERENCES.containsKey(s.name())) {
                problems.add(s.name() + " " + s.smiles() + ": ours " + ours + ", DDBST " + theirs);
            }
        }
        assertTrue(checked >= 100, "only " + checked + " bundled solvents have DDBST groups");
        assertTrue(problems.isEmpty(), problems.size() + " differ:\n" + String.join("\n", problems));
    }

    /**
     * Hand-made bundled groups (curation/manual.csv) that the structure splits another way. The structure's split
     * follows the DDBST convention measured below (glycol ether HO-CH-CH2-O- as C2H4O2; an ether O between CH2 and
     * CH joins the CH2); the hand-made ones add up to the same formula, so both are valid UNIFAC inputs.
     */
    static final Map<String, String> HAND_MADE_DIFFERENCES = Map.of(
            "dipropylene glycol", "hand-made 2 OH + CH2O; the structure gives C2H4O2 + OH as DDBST does for glycol ethers",
            "tripropylene glycol methyl ether", "hand-made CHO for the middle ether O; the structure joins it to CH2 (CH2O)");

    @Test
    void handMadeBundledGroupsAreConfirmedByTheStructure() {
        // Solvents DDBST does not list carry hand-made groups (src_unifac = unifac-manual, checked by curate.py to
        // add up to the formula); the structure must give the same split, or the difference is listed here.
        List<String> problems = new ArrayList<>();
        for (Solvent s : BundledLiquids.library().all()) {
            if (s.smiles() == null || !"unifac-manual".equals(s.sources().get("unifac"))) {
                continue;
            }
            String ours = UnifacGrouper.group(StructureParser.parse("smiles", s.smiles())).assignment().format();
            String theirs = new UnifacAssignment(new TreeMap<>(s.unifac().counts())).format();
            if (!ours.equals(theirs) && !HAND_MADE_DIFFERENCES.containsKey(s.name())) {
                problems.add(s.name() + " " + s.smiles() + ": ours " + ours + ", hand-made " + theirs);
            }
        }
        assertTrue(problems.isEmpty(), problems.size() + " differ:\n" + String.join("\n", problems));
    }

    @Test
    void agreesWithTheDdbstAssignmentsOfTheReferenceCompounds() {
        Path ref = ReferenceTables.folder().orElse(null);
        Assumptions.assumeTrue(ref != null, "reference-data folder not found; skipping the DDBST comparison");
        UnifacAgreement agreement = UnifacAgreement.measure(ref);
        System.out.println(agreement.summary());
        // Goal of issue 13: at least 95 % identical over the reference compounds that have a SMILES. Measured
        // 1349 of 1350 (99.9 %, the one difference is heavy water, whose [2H] atoms have no group here); the
        // bound is set at that figure so that a pattern change that loses agreement fails.
        assertTrue(agreement.share() >= 0.999, agreement.summary());
    }
}
