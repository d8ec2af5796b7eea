package org.cohesa.core.blend;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.EnumSet;
import java.util.Set;
import org.junit.jupiter.api.Test;

/** Acid–base character of a solute from its structure (CDK SMARTS). */
class SoluteCharacterTest {

    @Test
    void carboxylicAndSulfonicAcidsAreAcidicWeakAcidsAreNot() {
        // pKa: salicylic acid 2.97, benzoic acid 4.20, aspirin 3.5, methanesulfonic acid −1.9 (CRC Handbook, "Dissociation
        // constants of organic acids and bases"; from memory): acidic. Phenol 10.0, thymol 10.6 (same; from memory): not counted.
        assertEquals(Set.of(SoluteCharacter.ACIDIC), SoluteCharacter.ofSmiles("OC(=O)c1ccccc1O"));
        assertEquals(Set.of(SoluteCharacter.ACIDIC), SoluteCharacter.ofSmiles("OC(=O)c1ccccc1"));
        assertEquals(Set.of(SoluteCharacter.ACIDIC), SoluteCharacter.ofSmiles("CC(=O)Oc1ccccc1C(=O)O"));
        assertEquals(Set.of(SoluteCharacter.ACIDIC), SoluteCharacter.ofSmiles("CS(=O)(=O)O"));
        assertEquals(Set.of(), SoluteCharacter.ofSmiles("CC(C)c1ccc(C)cc1O"));
    }

    @Test
    void aliphaticAminesAreBasicAmidesAnilinesAndPyridinesAreNot() {
        // Conjugate-acid pKa: triethylamine 10.7, quinuclidine (quinine's basic N) 11.0, dopamine's amine 10.6 — basic;
        // acetanilide (amide, about 0.5), aniline 4.6, pyridine 5.2, sulfanilamide's aniline 2.4 — not counted
        // (CRC Handbook, dissociation constants; from memory).
        assertEquals(Set.of(SoluteCharacter.BASIC), SoluteCharacter.ofSmiles("CCN(CC)CC"));
        assertEquals(Set.of(SoluteCharacter.BASIC), SoluteCharacter.ofSmiles("COc1ccc2nccc(C(O)C3CC4CCN3CC4C=C)c2c1"));
        assertEquals(Set.of(SoluteCharacter.BASIC), SoluteCharacter.ofSmiles("NCCc1ccc(O)c(O)c1"));
        assertEquals(Set.of(), SoluteCharacter.ofSmiles("CC(=O)Nc1ccccc1"));
        assertEquals(Set.of(), SoluteCharacter.ofSmiles("Nc1ccccc1"));
        assertEquals(Set.of(), SoluteCharacter.ofSmiles("c1ccncc1"));
        assertEquals(Set.of(), SoluteCharacter.ofSmiles("Nc1ccc(cc1)S(N)(=O)=O"));
        assertEquals(Set.of(), SoluteCharacter.ofSmiles("O=[N+]([O-])OCC(O[N+](=O)[O-])CO[N+](=O)[O-]"));
    }

    @Test
    void anAminoAcidIsBoth() {
        // Glycine: carboxylic acid and primary amine (a zwitterion; common practice, no source).
        assertEquals(EnumSet.allOf(SoluteCharacter.class), SoluteCharacter.ofSmiles("NCC(=O)O"));
    }
}
