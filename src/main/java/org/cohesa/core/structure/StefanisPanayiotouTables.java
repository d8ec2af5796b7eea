package org.cohesa.core.structure;

import java.util.Map;

/**
 * Group contributions of the Stefanis–Panayiotou method for Hansen parameters, in the authors' updated version:
 * E. Stefanis, C. Panayiotou, "A new expanded solubility parameter approach", Int. J. Pharm. 426 (2012) 29–43,
 * doi:10.1016/j.ijpharm.2012.01.001, Appendix A (Tables A.1 first-order, A.2 second-order, A.5/A.6 for low δP and
 * δH), which updates the method of Int. J. Thermophys. 29 (2008) 568–585, doi:10.1007/s10765-008-0415-z.
 *
 * <p><b>Transcription, not checked against the paper here.</b> The numbers are those of a third-party transcription
 * (GitHub stanlo229/fluoropolymer_replacement_virtual_screening, {@code hsp/group_tables.py}, commit 960a8d07),
 * whose author states that every value was compared line by line with Appendix A; the paper itself could not be
 * read here (docs/methods.md, "Stefanis–Panayiotou"). The group names are the paper's; the SMARTS that find them
 * are our own ({@link StefanisPanayiotouMethod}).
 *
 * <p>Units: δD contributions enter δD = (Σ NiCi + W Σ MjDj + 959.11)^0.4126; δP and δH contributions are MPa^½.
 * A null is the paper's "***" (no value: the group did not occur in the compounds the component was fitted to).
 */
final class StefanisPanayiotouTables {

    private StefanisPanayiotouTables() {
    }

    /** One group's contributions: δD, δP, δH (Tables A.1/A.2) and δP, δH for the low-value equations (A.5/A.6). */
    record Contribution(Double d, Double p, Double h, Double pLow, Double hLow) {
    }

    /** Eqs. A.2–A.4 constants and the low-value (< 3 MPa^½) constants of Eqs. A.5–A.6. */
    static final double D_CONSTANT = 959.11;
    static final double D_EXPONENT = 0.4126;
    static final double P_CONSTANT = 7.6134;
    static final double H_CONSTANT = 7.7003;
    static final double P_LOW_CONSTANT = 2.6560;
    static final double H_LOW_CONSTANT = 1.3720;
    static final double LOW_THRESHOLD = 3.0;

    private static Contribution c(Double d, Double p, Double h) {
        return new Contribution(d, p, h, null, null);
    }

    private static Contribution c(Double d, Double p, Double h, Double pLow, Double hLow) {
        return new Contribution(d, p, h, pLow, hLow);
    }

    /** First-order groups, Table A.1 (with Table A.5 low-value contributions where given). */
    static final Map<String, Contribution> FIRST_ORDER = Map.ofEntries(
            Map.entry("-CH3", c(-123.01, -1.6444, -0.7458, -0.7107, 0.2990)),
            Map.entry("-CH2-", c(1.82, -0.3141, -0.3877, -0.1361, -0.1161)),
            Map.entry(">CH-", c(82.94, 0.6051, -0.2064, 0.6477, 0.1386)),
            Map.entry(">C<", c(182.13, 2.0249, -0.0113)),
            Map.entry("CH2=CH-", c(-126.15, -2.0170, -1.1783, -0.2511, 1.3552)),
            Map.entry("-CH=CH-", c(28.65, -0.5037, -0.1253, -0.1503, 0.4819)),
            Map.entry("CH2=C<", c(-31.62, -0.9052, -0.7191, 0.6956, 0.1115)),
            Map.entry("-CH=C<", c(62.48, -1.1018, -1.7171, 1.2761, -0.0307)),
            Map.entry(">C=C<", c(50.10, 0.9957, -1.9773, null, -0.1212)),
            Map.entry("CH2=C=CH-", c(-161.71, null, -0.7545, -0.2453, null)),
            Map.entry("CH2=C=C<", c(6.64, null, -1.7087, 1.2654, null)),
            Map.entry("CH≡C-", c(45.86, -1.5147, 1.2582, -0.7049, 0.4385)),
            Map.entry("C≡C", c(9.56, -0.9552, -1.0176, null, -0.3511)),
            Map.entry("ACH", c(29.87, -0.5771, -0.3554, -0.1930, 0.1353)),
            Map.entry("AC", c(98.84, 0.7661, -0.1553, 0.1745, -0.1740)),
            Map.entry("ACCH3", c(27.67, -0.6212, -1.1409, -0.4493, -0.2873)),
            Map.entry("ACCH2", c(89.07, 0.8019, -0.2298, -0.2857, -0.8808)),
            Map.entry("CH3CO", c(-29.41, 2.1567, -1.1683)),
            Map.entry("CH2CO", c(114.74, 3.6103, -0.3929)),
            Map.entry("CHO", c(-31.35, 3.3159, 0.2062)),
            Map.entry("COOH", c(-38.16, 0.7153, 3.8422, 2.9098, null)),
            Map.entry("CH3COO", c(-53.86, -0.6075, 1.7051, 1.7711, null)),
            Map.entry("CH2COO", c(89.11, 3.4942, 1.3893, 2.2096, null)),
            Map.entry("HCOO", c(null, 1.7056, 2.3049)),
            Map.entry("COO", c(27.57, 3.3401, 1.1999, 1.4783, 0.3720)),
            Map.entry("OH", c(-29.97, 1.0587, 7.3609)),
            Map.entry("ACOH", c(58.52, 1.0520, 6.9757)),
            Map.entry("CH3O", c(-68.07, 0.0089, 0.2676, -0.3600, null)),
            Map.entry("CH2O", c(13.40, 0.8132, -0.1196)),
            Map.entry("CH-O", c(111.46, 1.6001, 0.4873, null, -0.4067)),
            Map.entry("C2H5O2", c(15.51, 3.3880, 8.5893)),
            Map.entry("CH2O (cyclic)", c(49.32, 0.1227, 0.1763, -0.2919, null)),
            Map.entry("CH2NH2", c(-49.96, -0.3449, 2.7280)),
            Map.entry("CHNH2", c(18.53, -1.4337, 0.5647)),
            Map.entry("CH3NH", c(null, 0.5060, 5.7321)),
            Map.entry("CH2NH", c(96.18, 0.2616, 1.4053, 0.8875, null)),
            Map.entry("CH3N", c(170.59, 1.0575, 1.8500, null, -0.1700)),
            Map.entry("CH2N", c(152.54, 2.6766, 1.5557, 0.7055, -1.0369)),
            Map.entry("ACNH2", c(253.66, 1.6493, 4.4945)),
            Map.entry("CONH2", c(-1.22, 5.9361, 5.3646)),
            Map.entry("CON(CH3)2", c(95.97, 5.5309, 3.2455)),
            Map.entry("CH2SH", c(214.84, -0.9940, 4.5321)),
            Map.entry("CH3S", c(null, 0.2451, -1.2669)),
            Map.entry("CH2S", c(168.57, 0.5730, -0.0838, null, 0.1461)),
            Map.entry("I", c(197.67, 0.1060, 0.3321)),
            Map.entry("Br", c(109.79, 0.5207, -0.9087)),
            Map.entry("CH2Cl", c(47.17, 0.5013, -0.4498, null, 0.4895)),
            Map.entry("CHCl", c(73.01, 2.6796, -1.3563, null, 0.1300)),
            Map.entry("CCl", c(385.39, 1.8196, 0.1473)),
            Map.entry("CHCl2", c(197.67, 1.6255, -3.0669, null, 0.5254)),
            Map.entry("CCl2", c(72.60, 0.1035, -1.3220)),
            Map.entry("CCl3", c(null, 1.1060, -2.5679)),
            Map.entry("ACCl", c(141.54, -0.0941, -0.7512, -0.0927, 0.4424)),
            Map.entry("ACF", c(27.74, 0.1293, -0.6613, null, -0.3718)),
            Map.entry("Cl-(C=C)", c(45.32, 2.2673, -0.5258, null, 0.6606)),
            Map.entry("CF3", c(-13.79, -2.1381, -1.2997, null, -0.0887)),
            Map.entry("CH2NO2", c(null, 6.6451, -1.0669)),
            Map.entry("CHNO2", c(null, 7.7753, -2.1087)),
            Map.entry("ACNO2", c(219.22, 4.4640, -0.7302)),
            Map.entry("CH2CN", c(-29.09, 6.3586, -0.7297)),
            Map.entry("CF2", c(-103.83, null, null)),
            Map.entry("CF", c(20.32, null, null)),
            Map.entry("F", c(-80.11, null, null)),
            Map.entry("O", c(18.09, 3.5248, 0.0883, -0.5555, null)),
            Map.entry("Cl", c(76.35, 1.7491, -0.2917, null, 1.1251)),
            Map.entry(">C=N-", c(-10.55, -0.1692, -5.3820)),
            Map.entry("-CH=N-", c(186.40, 2.7015, 0.5507)),
            Map.entry("NH", c(null, -0.0746, 2.0646)),
            Map.entry("CN", c(49.36, 6.3705, -0.5239)),
            Map.entry("O=C=N-", c(15.22, 1.4695, 4.1129)),
            Map.entry("SH", c(190.87, 1.8229, 4.9279)),
            Map.entry("S", c(201.91, 8.5982, -0.4013, 0.0445, null)),
            Map.entry("SO2", c(182.83, 11.0254, -0.3602)),
            Map.entry(">C=S", c(-0.46, 0.5216, 3.0519)),
            Map.entry(">C=O", c(-127.16, 0.7691, 1.7033, null, -0.0553)),
            Map.entry("N", c(267.06, 2.2212, 1.3655)));

    /** Second-order groups, Table A.2 (with Table A.6 low-value contributions where given). */
    static final Map<String, Contribution> SECOND_ORDER = Map.ofEntries(
            Map.entry("(CH3)2-CH-", c(7.63, 0.0365, 0.3019, 0.2246, 0.0)),
            Map.entry("(CH3)3-C-", c(-0.03, 1.1593, -0.1924)),
            Map.entry("ring of 5 carbons", c(-81.93, -2.3673, 0.2586, -0.9657, 0.1944)),
            Map.entry("ring of 6 carbons", c(-26.15, -3.6661, null, -0.9615, 0.0)),
            Map.entry("-C=C-C=C-", c(-5.69, -3.3100, -1.2207, 0.6463, null)),
            Map.entry("CH3-C=", c(-4.45, 0.3461, 0.4418, -0.0063, -0.0614)),
            Map.entry("-CH2-C=", c(-29.67, -2.3189, -0.5613, 0.0192, 0.0660)),
            Map.entry(">C{H or C}-C=", c(-5.38, null, -1.0241, -0.4460, 0.3422)),
            Map.entry("string in cyclic", c(-54.05, null, null, null, -0.2809)),
            Map.entry("CH3(CO)CH2-", c(3.57, -0.4108, -0.3628)),
            Map.entry("Ccyclic=O", c(-46.57, 0.1972, -0.4496)),
            Map.entry("ACCOOH", c(-37.57, -0.6284, -0.8552)),
            Map.entry(">C{H or C}-COOH", c(null, -0.2450, 1.2554)),
            Map.entry("CH3(CO)OC{H or C}<", c(-40.56, -0.0652, 0.3864)),
            Map.entry("(CO)C{H2}COO", c(null, -2.3624, 0.8545)),
            Map.entry("(CO)O(CO)", c(-92.46, -0.9818, 1.5759)),
            Map.entry("ACHO", c(46.84, -1.8120, -0.9192)),
            Map.entry(">CHOH", c(16.54, 0.2366, -0.2453)),
            Map.entry(">C<OH", c(-5.97, -0.0069, 1.3813)),
            Map.entry("-C(OH)C(OH)-", c(null, 0.6669, 0.2493)),
            Map.entry("-C(OH)C(N)", c(-7.03, 0.8750, -0.7322)),
            Map.entry("Ccyclic-OH", c(-6.40, -3.6065, 0.5836)),
            Map.entry("C-O-C=C", c(25.23, 0.5480, 1.1279)),
            Map.entry("AC-O-C", c(35.82, 0.7781, 0.6689)),
            Map.entry("ACCOO", c(-38.39, 0.3670, -0.2340, null, 0.0)),
            Map.entry("AC-O-AC", c(-136.10, -3.4995, 1.8763)),
            Map.entry(">N{H or C}(in cyclic)", c(53.29, -1.6876, -0.0132)),
            Map.entry("-S-(in cyclic)", c(91.57, 0.2513, 0.2663)),
            Map.entry("ACBr", c(33.35, -0.4478, 0.3149)),
            Map.entry("(C=C)-Br", c(-85.85, 0.0686, -1.1154)),
            Map.entry("ring of 3 carbons", c(15.35, 1.7962, -0.7224)),
            Map.entry("AC(ACHm)2AC(ACHn)2", c(-33.14, -1.4784, 0.7468, 0.0669, 0.0864)),
            Map.entry("Ocyclic-Ccyclic=O", c(13.89, 2.7261, 0.2185)),
            Map.entry("NcyclicHm-Ccyclic=O", c(93.54, 2.0813, 1.2226)),
            Map.entry("-O-CHm-O-CHn-", c(31.52, 0.3293, 0.2527, 0.0, null)),
            Map.entry("C(=O)-C-C(=O)", c(-61.38, -0.4126, 1.2240)),
            Map.entry("CcyclicHm=Ncyclic-CcyclicHn=CcyclicHp", c(53.11, -0.5075, -2.1004)));
}
