package org.cohesa.core.structure;

import java.util.List;

/**
 * The original-UNIFAC subgroups as SMARTS, in the order they claim atoms: whole molecules that are their own
 * group first, then multi-atom functional groups, then the hydrocarbon groups that take what is left.
 *
 * <p>Subgroups and their atoms: Fredenslund, Jones, Prausnitz, AIChE J. 21 (1975) 1086, with the revised and
 * extended tables of Hansen, Rasmussen, Fredenslund, Schiller, Gmehling, Ind. Eng. Chem. Res. 30 (1991) 2352
 * and Wittig, Lohmann, Gmehling, Ind. Eng. Chem. Res. 42 (2003) 183 (the reference folder's
 * {@code unifac-subgroups.tsv}). Where a molecule can be cut in more than one way (which carbon an ether oxygen
 * or an ester joins), the order here follows the published DDBST assignments; the agreement is measured in
 * {@code docs/methods.md}. The patterns are our own.
 */
final class UnifacPatterns {

    private UnifacPatterns() {
    }

    /** Not an amide nitrogen and not a nitro nitrogen. */
    private static final String AMINE_N = "NX3;!$(N[CX3]=[O,S]);!$(N~[OX1]);!$(N=*)";

    static final List<UnifacGroupPattern> ORDER = List.of(
            // ---- molecules that are one group
            UnifacGroupPattern.of(16, "H2O", "[OH2]"),
            UnifacGroupPattern.of(15, "CH3OH", "[CH3][OH]"),
            UnifacGroupPattern.of(58, "CS2", "S=C=S"),
            UnifacGroupPattern.of(52, "CCL4", "ClC(Cl)(Cl)Cl"),
            UnifacGroupPattern.of(50, "CHCL3", "Cl[CH](Cl)Cl"),
            UnifacGroupPattern.of(47, "CH2CL2", "Cl[CH2]Cl"),
            UnifacGroupPattern.of(86, "CCL3F", "FC(Cl)(Cl)Cl"),
            UnifacGroupPattern.of(92, "CCLF3", "ClC(F)(F)F"),
            UnifacGroupPattern.of(93, "CCL2F2", "FC(F)(Cl)Cl"),
            UnifacGroupPattern.of(88, "HCCL2F", "F[CH](Cl)Cl"),
            UnifacGroupPattern.of(91, "HCCLF2", "Cl[CH](F)F"),
            UnifacGroupPattern.of(67, "DMSO", "[CH3][SX3](=O)[CH3]"),
            UnifacGroupPattern.of(72, "DMF", "[CH1](=O)N([CH3])[CH3]"),
            UnifacGroupPattern.of(73, "HCON(CH2)2", "[CH1](=O)N([CH2])[CH2]"),
            UnifacGroupPattern.of(85, "NMP", "[CH3]N1[CH2][CH2][CH2]C1=O"),
            UnifacGroupPattern.of(105, "MORPH", "[CH2]1[CH2]O[CH2][CH2][NH]1"),
            UnifacGroupPattern.of(61, "FURFURAL", "[CH1](=O)c1[cH][cH][cH]o1"),
            UnifacGroupPattern.of(62, "DOH", "[OH][CH2][CH2][OH]"),
            UnifacGroupPattern.of(68, "ACRY", "[CH2]=[CH]C#N"),
            UnifacGroupPattern.of(40, "CH3CN", "[CH3]C#N"),
            UnifacGroupPattern.of(54, "CH3NO2", "[CH3][NX3](~[OX1])~[OX1]"),
            UnifacGroupPattern.of(43, "HCOOH", "[CH1](=O)[OH]"),
            UnifacGroupPattern.of(59, "CH3SH", "[CH3][SH]"),
            UnifacGroupPattern.of(28, "CH3NH2", "[CH3][NH2]"),
            // ---- aromatic rings that are one group (subgroup by substituted positions)
            UnifacGroupPattern.ring(37, "C5H5N", "n1ccccc1", 5),
            UnifacGroupPattern.ring(38, "C5H4N", "n1ccccc1", 4),
            UnifacGroupPattern.ring(39, "C5H3N", "n1ccccc1", 3),
            UnifacGroupPattern.ring(106, "C4H4S", "s1cccc1", 4),
            UnifacGroupPattern.ring(107, "C4H3S", "s1cccc1", 3),
            UnifacGroupPattern.ring(108, "C4H2S", "s1cccc1", 2),
            // ---- chlorinated carbons (before the esters: ClCH2-COO- is CH2Cl + COO in DDBST)
            UnifacGroupPattern.of(87, "CCL2F", "FC(Cl)Cl"),
            UnifacGroupPattern.of(90, "CCLF2", "ClC(F)F"),
            UnifacGroupPattern.of(89, "HCCLF", "F[CH1]Cl"),
            UnifacGroupPattern.of(51, "CCL3", "[CX4](Cl)(Cl)Cl"),
            UnifacGroupPattern.of(48, "CHCL2", "[CH1](Cl)Cl"),
            UnifacGroupPattern.of(49, "CCL2", "[CX4H0](Cl)Cl"),
            UnifacGroupPattern.of(44, "CH2CL", "[CH2]Cl"),
            UnifacGroupPattern.of(45, "CHCL", "[CH1;X4]Cl"),
            UnifacGroupPattern.of(46, "CCL", "[CX4H0]Cl"),
            // ---- carboxylic acids, esters, formates
            UnifacGroupPattern.of(42, "COOH", "[CX3](=O)[OH]"),
            UnifacGroupPattern.of(23, "HCOO", "[CH1](=O)[OX2H0;$(O[#6])]"),
            UnifacGroupPattern.of(21, "CH3COO", "[CH3][CX3](=O)[OX2H0;$(O[#6])]"),
            UnifacGroupPattern.of(22, "CH2COO", "[CH2][CX3](=O)[OX2H0;$(O[#6])]"),
            UnifacGroupPattern.of(77, "COO", "[CX3;$(C[#6])](=O)[OX2H0;$(O[#6])]"),
            // ---- amides (acyl carbon on carbon; formamides are the DMF groups above)
            UnifacGroupPattern.of(97, "AM(CH3)2", "[CX3;$(C[#6])](=O)N([CH3])[CH3]"),
            UnifacGroupPattern.of(98, "AMCH3CH2", "[CX3;$(C[#6])](=O)N([CH3])[CH2]"),
            UnifacGroupPattern.of(99, "AM(CH2)2", "[CX3;$(C[#6])](=O)N([CH2])[CH2]"),
            UnifacGroupPattern.of(95, "AMHCH3", "[CX3;$(C[#6])](=O)[NH1][CH3]"),
            UnifacGroupPattern.of(96, "AMHCH2", "[CX3;$(C[#6])](=O)[NH1][CH2]"),
            UnifacGroupPattern.of(94, "AMH2", "[CX3;$(C[#6])](=O)[NH2]"),
            // ---- ketones and aldehydes
            UnifacGroupPattern.of(18, "CH3CO", "[CH3][CX3H0;$(C[#6])](=O)"),
            UnifacGroupPattern.of(19, "CH2CO", "[CH2][CX3H0;$(C[#6])](=O)"),
            UnifacGroupPattern.of(20, "CHO", "[CX3H1;$(C[#6])]=O"),
            // ---- nitriles, nitro compounds, isocyanates, sulfones
            UnifacGroupPattern.of(41, "CH2CN", "[CH2]C#N"),
            UnifacGroupPattern.of(55, "CH2NO2", "[CH2][NX3](~[OX1])~[OX1]"),
            UnifacGroupPattern.of(56, "CHNO2", "[CH1][NX3](~[OX1])~[OX1]"),
            UnifacGroupPattern.of(57, "ACNO2", "c[NX3](~[OX1])~[OX1]"),
            UnifacGroupPattern.of(109, "NCO", "N=C=O"),
            UnifacGroupPattern.of(118, "(CH2)2SU", "[CH2][SX4](=O)(=O)[CH2]"),
            UnifacGroupPattern.of(119, "CH2CHSU", "[CH2][SX4](=O)(=O)[CH1]"),
            // ---- glycol ethers: HO-CH2-CH2-O- and HO-CH-CH2-O- (either way round)
            UnifacGroupPattern.of(100, "C2H5O2", "[OH][CH2][CH2][OX2H0;!R;$(O[#6]);!$(O[CX3]=O)]"),
            UnifacGroupPattern.of(101, "C2H4O2", "[OH][CH1][CH2][OX2H0;!R;$(O[#6]);!$(O[CX3]=O)]"),
            UnifacGroupPattern.of(101, "C2H4O2", "[OH][CH2][CH1][OX2H0;!R;$(O[#6]);!$(O[CX3]=O)]"),
            // ---- halogens
            UnifacGroupPattern.of(53, "ACCL", "cCl"),
            UnifacGroupPattern.of(69, "CL-(C=C)", "[Cl;$(ClC=C)]"),
            UnifacGroupPattern.of(74, "CF3", "[CX4](F)(F)F"),
            UnifacGroupPattern.of(75, "CF2", "[CX4](F)F"),
            UnifacGroupPattern.of(76, "CF", "[CX4]F"),
            UnifacGroupPattern.of(71, "ACF", "cF"),
            UnifacGroupPattern.of(64, "BR", "Br"),
            UnifacGroupPattern.of(63, "I", "I"),
            // ---- amines (not amides, not nitro)
            UnifacGroupPattern.of(36, "ACNH2", "c[NH2]"),
            UnifacGroupPattern.of(29, "CH2NH2", "[CH2][NH2;" + AMINE_N + "]"),
            UnifacGroupPattern.of(30, "CHNH2", "[CH1][NH2;" + AMINE_N + "]"),
            UnifacGroupPattern.of(31, "CH3NH", "[CH3][NH1;" + AMINE_N + "]"),
            UnifacGroupPattern.of(32, "CH2NH", "[CH2][NH1;" + AMINE_N + "]"),
            UnifacGroupPattern.of(33, "CHNH", "[CH1][NH1;" + AMINE_N + "]"),
            UnifacGroupPattern.of(34, "CH3N", "[CH3][NH0;" + AMINE_N + "]"),
            UnifacGroupPattern.of(35, "CH2N", "[CH2][NH0;" + AMINE_N + "]"),
            // ---- sulfur
            UnifacGroupPattern.of(60, "CH2SH", "[CH2][SH]"),
            UnifacGroupPattern.of(102, "CH3S", "[CH3][SX2]"),
            UnifacGroupPattern.of(103, "CH2S", "[CH2][SX2]"),
            UnifacGroupPattern.of(104, "CHS", "[CH1][SX2]"),
            // ---- phenols, alcohols, ethers
            UnifacGroupPattern.of(17, "ACOH", "c[OH]"),
            UnifacGroupPattern.of(14, "OH", "[OH;$(O[C,N,Si;!$(C=O)])]"),
            UnifacGroupPattern.of(27, "THF", "[CH2;R][OX2;R;$(O[CX4])]"),
            UnifacGroupPattern.of(24, "CH3O", "[CH3][OX2H0;$(O[#6])]"),
            UnifacGroupPattern.of(25, "CH2O", "[CH2][OX2H0;$(O[#6])]"),
            UnifacGroupPattern.of(26, "CHO", "[CH1;X4][OX2H0;$(O[#6])]"),
            // ---- silicon
            UnifacGroupPattern.of(82, "SIH2O", "[SiH2][OX2H0;$(O[Si])]"),
            UnifacGroupPattern.of(83, "SIHO", "[SiH1][OX2H0;$(O[Si])]"),
            UnifacGroupPattern.of(84, "SIO", "[SiH0][OX2H0;$(O[Si])]"),
            UnifacGroupPattern.of(78, "SIH3", "[SiH3]"),
            UnifacGroupPattern.of(79, "SIH2", "[SiH2]"),
            UnifacGroupPattern.of(80, "SIH", "[SiH1]"),
            UnifacGroupPattern.of(81, "SI", "[SiH0]"),
            // ---- carbon that is left: triple, double, aromatic, aliphatic
            UnifacGroupPattern.of(65, "CH=-C", "[CH1]#C"),
            UnifacGroupPattern.of(66, "C=-C", "C#C"),
            UnifacGroupPattern.of(5, "CH2=CH", "[CH2]=[CH1]"),
            UnifacGroupPattern.of(7, "CH2=C", "[CH2]=[CH0]"),
            UnifacGroupPattern.of(6, "CH=CH", "[CH1]=[CH1]"),
            UnifacGroupPattern.of(8, "CH=C", "[CH1]=[CH0]"),
            UnifacGroupPattern.of(70, "C=C", "[CH0]=[CH0]"),
            UnifacGroupPattern.of(11, "ACCH3", "c[CH3]"),
            UnifacGroupPattern.of(12, "ACCH2", "c[CH2]"),
            UnifacGroupPattern.of(13, "ACCH", "c[CH1;X4]"),
            UnifacGroupPattern.of(9, "ACH", "[cH]"),
            UnifacGroupPattern.of(10, "AC", "[cH0]"),
            UnifacGroupPattern.of(1, "CH3", "[CH3;X4]"),
            UnifacGroupPattern.of(2, "CH2", "[CH2;X4]"),
            UnifacGroupPattern.of(3, "CH", "[CH1;X4]"),
            UnifacGroupPattern.of(4, "C", "[CH0;X4]"));
}
