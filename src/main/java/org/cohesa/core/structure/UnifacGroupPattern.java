package org.cohesa.core.structure;

/**
 * One original-UNIFAC subgroup as a SMARTS pattern whose every atom belongs to the group (context atoms are
 * written as recursive SMARTS {@code $(...)}, so they are not claimed).
 *
 * @param subgroup  subgroup id (Hansen et al., Ind. Eng. Chem. Res. 30 (1991) 2352 numbering)
 * @param name      subgroup name as the table writes it
 * @param smarts    Daylight SMARTS
 * @param hydrogens total hydrogens the matched atoms must carry, or -1 for no condition (used for the ring
 *                  groups, whose subgroup depends on how many ring positions are substituted)
 */
record UnifacGroupPattern(int subgroup, String name, String smarts, int hydrogens) {

    static UnifacGroupPattern of(int subgroup, String name, String smarts) {
        return new UnifacGroupPattern(subgroup, name, smarts, -1);
    }

    static UnifacGroupPattern ring(int subgroup, String name, String smarts, int hydrogens) {
        return new UnifacGroupPattern(subgroup, name, smarts, hydrogens);
    }
}
