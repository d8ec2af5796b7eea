package org.cohesa.core.structure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * The Stefanis–Panayiotou group method. What could be checked, and against what:
 * <ul>
 *   <li>the tables are a third party's transcription of Int. J. Pharm. 426 (2012) 29, Appendix A; the paper and its
 *       worked examples (Section A.4) could not be read here, so <b>no value is checked against the paper</b>;</li>
 *   <li>the low-value δH contributions (Table A.5/A.6), which the 2012 update kept from the 2008 paper (both editions
 *       give the constant 1.3720), are compared with an independent transcription of the 2008 tables (a TypeScript
 *       table citing Int. J. Thermophys. 29 (2008) 568, found in the public code corpus; repository not named by the
 *       corpus, so from a stored copy) — a check of both transcriptions and of our typing, not of the paper;</li>
 *   <li>group assignments follow the group names of Table A.1/A.2 (common practice, no source: the names say which
 *       atoms each group holds);</li>
 *   <li>the equations are checked by recomputing n-hexane by hand from the tabulated contributions.</li>
 * </ul>
 */
class StefanisPanayiotouMethodTest {

    private static StefanisPanayiotouEstimate sp(String smiles) {
        return StefanisPanayiotouMethod.estimate(StructureParser.parse("smiles", smiles));
    }

    @Test
    void lowValueHydrogenBondingContributionsAgreeWithAnIndependentTranscriptionOfThe2008Tables() {
        // group → low-value δH contribution in the 2008 transcription (five decimals there, four in the 2012 one)
        Map<String, Double> first2008 = Map.ofEntries(Map.entry("-CH3", 0.29901), Map.entry("-CH2-", -0.11610), Map.entry(">CH-", 0.1386),
                Map.entry("CH2=CH-", 1.35521), Map.entry("-CH=CH-", 0.48189), Map.entry("CH2=C<", 0.11148), Map.entry("-CH=C<", -0.03066),
                Map.entry(">C=C<", -0.12117), Map.entry("CH≡C-", 0.43846), Map.entry("C≡C", -0.35107), Map.entry("ACH", 0.13532),
                Map.entry("AC", -0.17405), Map.entry("ACCH3", -0.28733), Map.entry("ACCH2", -0.88084), Map.entry("COO", 0.37204),
                Map.entry("CH-O", -0.40667), Map.entry("CH2N", -1.03686), Map.entry("ACCl", 0.44238), Map.entry("ACF", -0.37183),
                Map.entry("CF3", -0.08871), Map.entry("Cl", 1.12515), Map.entry(">C=O", -0.05529));
        first2008.forEach((g, v) -> assertEquals(v, StefanisPanayiotouTables.FIRST_ORDER.get(g).hLow(), 0.00006, g));
        Map<String, Double> second2008 = Map.of("ring of 5 carbons", 0.19438, "CH3-C=", -0.061370, "-CH2-C=", 0.06599,
                ">C{H or C}-C=", 0.342229, "string in cyclic", -0.280859, "AC(ACHm)2AC(ACHn)2", 0.086424, "(CH3)2-CH-", 0.0,
                "ring of 6 carbons", 0.0);
        second2008.forEach((g, v) -> assertEquals(v, StefanisPanayiotouTables.SECOND_ORDER.get(g).hLow(), 0.00006, g));
        assertEquals(1.3720, StefanisPanayiotouTables.H_LOW_CONSTANT);
        // Where the two transcriptions disagree (the low-value entries of CH3N, CH2Cl, CHCl, CHCl2/CCl, Cl-(C=C) and
        // CH2S/CH2SH sit in the δP column or on another row in the 2008 one), the 2012 one is kept: docs/methods.md.
    }

    @Test
    void nHexaneRecomputedByHandFromTheTables() {
        // 2 -CH3 + 4 -CH2-, no second-order group (W = 0).
        // δD = (2(−123.01) + 4(1.82) + 959.11)^0.4126 = 720.37^0.4126; δP = 2(−1.6444) + 4(−0.3141) + 7.6134 = 3.0682 (≥ 3,
        // so the standard equation stands); δH = 2(−0.7458) + 4(−0.3877) + 7.7003 = 4.6579 (≥ 3).
        StefanisPanayiotouEstimate e = sp("CCCCCC");
        assertEquals(Map.of("-CH3", 2, "-CH2-", 4), e.firstOrder());
        assertTrue(e.secondOrder().isEmpty());
        assertEquals(Math.pow(720.37, 0.4126), e.dD(), 1e-9);
        assertEquals(3.0682, e.dP(), 1e-9);
        assertEquals(4.6579, e.dH(), 1e-9);
        // n-heptane: δP = 3.0682 − 0.3141 = 2.7541 < 3, so the low-value equation: 2(−0.7107) + 5(−0.1361) + 2.6560 = 0.5541
        assertEquals(0.5541, sp("CCCCCCC").dP(), 1e-9);
    }

    @Test
    void groupsAreTheOnesTheirNamesDescribe() {
        // ethyl acetate: CH3COO + CH2 + CH3
        assertEquals(Map.of("CH3COO", 1, "-CH2-", 1, "-CH3", 1), sp("CCOC(C)=O").firstOrder());
        // butanone: CH3CO (listed before CH2CO, as in UNIFAC) + CH2 + CH3, second order CH3(CO)CH2-
        StefanisPanayiotouEstimate mek = sp("CCC(C)=O");
        assertEquals(Map.of("CH3CO", 1, "-CH2-", 1, "-CH3", 1), mek.firstOrder());
        assertEquals(Map.of("CH3(CO)CH2-", 1), mek.secondOrder());
        // isopropanol: OH + CH + 2 CH3; second order (CH3)2-CH- and >CHOH
        StefanisPanayiotouEstimate ipa = sp("CC(C)O");
        assertEquals(Map.of("OH", 1, ">CH-", 1, "-CH3", 2), ipa.firstOrder());
        assertEquals(Map.of("(CH3)2-CH-", 1, ">CHOH", 1), ipa.secondOrder());
        // toluene: 5 ACH + ACCH3 (the ring carbon belongs to ACCH3)
        assertEquals(Map.of("ACH", 5, "ACCH3", 1), sp("Cc1ccccc1").firstOrder());
        // 2-butoxyethanol: C2H5O2 (HO–CH2–CH2–O–) + 3 CH2 + CH3
        assertEquals(Map.of("C2H5O2", 1, "-CH2-", 3, "-CH3", 1), sp("CCCCOCCO").firstOrder());
        // cyclohexanone: CH2CO + 4 CH2; ring of 6 carbons and Ccyclic=O
        StefanisPanayiotouEstimate cy = sp("O=C1CCCCC1");
        assertEquals(Map.of("CH2CO", 1, "-CH2-", 4), cy.firstOrder());
        assertEquals(Map.of("ring of 6 carbons", 1, "Ccyclic=O", 1), cy.secondOrder());
        // pyridine in its Kekulé form: –CH=N– + 2 –CH=CH–, with the pyridine and diene second-order groups
        StefanisPanayiotouEstimate py = sp("c1ccncc1");
        assertEquals(Map.of("-CH=N-", 1, "-CH=CH-", 2), py.firstOrder());
        assertEquals(1, py.secondOrder().get("CcyclicHm=Ncyclic-CcyclicHn=CcyclicHp"));
        // NMP: >C=O + N (an amide N is no amine) + CH3 + 3 CH2; its lactam second-order group
        StefanisPanayiotouEstimate nmp = sp("CN1CCCC1=O");
        assertEquals(Map.of(">C=O", 1, "N", 1, "-CH3", 1, "-CH2-", 3), nmp.firstOrder());
        assertEquals(1, nmp.secondOrder().get("NcyclicHm-Ccyclic=O"));
    }

    @Test
    void outsideTheTablesNoValueIsGiven() {
        // fewer than three carbons (the method's stated range)
        assertFalse(sp("CCO").complete());
        // an element the tables do not hold (phosphorus)
        StefanisPanayiotouEstimate tep = sp("CCOP(=O)(OCC)OCC");
        assertFalse(tep.complete());
        assertTrue(tep.uncovered().stream().anyMatch(u -> u.contains("element P")), tep.uncovered().toString());
        // a first-order group with no δD value (***): HCOO in ethyl formate leaves δD out, δP and δH are given
        StefanisPanayiotouEstimate formate = sp("CCOC=O");
        assertNull(formate.dD());
        assertTrue(formate.dP() != null && formate.dH() != null);
    }
}
