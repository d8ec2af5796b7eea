package org.cohesa.core.structure;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import org.openscience.cdk.graph.Cycles;
import org.openscience.cdk.interfaces.IAtom;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.interfaces.IBond;
import org.openscience.cdk.smarts.SmartsPattern;

/**
 * Hansen parameters by the group-contribution method of E. Stefanis and C. Panayiotou, Int. J. Thermophys. 29 (2008)
 * 568–585, in the updated version of Int. J. Pharm. 426 (2012) 29–43, Appendix A (contributions in
 * {@link StefanisPanayiotouTables}):
 * <ul>
 *   <li>δD = (Σ NiCi + W Σ MjDj + 959.11)^0.4126 (Eq. A.2);</li>
 *   <li>δP = Σ NiCi + W Σ MjDj + 7.6134 (A.3), and where that gives below 3 MPa^½ the low-value equation with its own
 *       contributions (Table A.5/A.6) and constant 2.6560 (A.5);</li>
 *   <li>δH = Σ NiCi + W Σ MjDj + 7.7003 (A.4), below 3 MPa^½ likewise with constant 1.3720 (A.6);</li>
 * </ul>
 * Ni counts first-order group i, Mj second-order group j, W = 1 when any second-order group occurs; MPa^½.
 *
 * <p>First-order groups are found by SMARTS in a fixed order, most specific first, each heavy atom in exactly one
 * group (a group's pattern matches the atoms it owns; neighbours it names are context only). Groups that name an
 * aromatic carbon (ACH, AC, ACCH3, ACOH, ACCl…) hold benzene-type carbons; a ring with a heteroatom (pyridine,
 * furan, thiophene) is read in its Kekulé form, as the paper's pyridine group (CcyclicHm=Ncyclic–CcyclicHn=CcyclicHp)
 * implies. Second-order groups overlap the first-order ones freely. The method is stated for organic compounds of
 * C, H, O, N, S and halogens with at least three carbon atoms; outside that, or with an atom no group covers, no value
 * is given. A first-order group with no published value for a component ("***") leaves that component out; a
 * second-order group without one adds nothing to it (a correction that was not fitted). A result below zero (the
 * low-value equations can give one) is reported as 0.
 */
public final class StefanisPanayiotouMethod {

    /** Name → SMARTS of the atoms the group owns, in matching order (Table A.1; "except as above" groups last). */
    private static final Map<String, SmartsPattern> FIRST = new LinkedHashMap<>();
    /** Name → SMARTS and how occurrences are counted (Table A.2). */
    private static final List<SecondOrder> SECOND = new ArrayList<>();

    private record SecondOrder(String name, SmartsPattern pattern, int keyAtom) {
    }

    private static final String KETONE_C = "[CX3;$(C(-[#6])(-[#6])=O)]";
    private static final String NOT_AMIDE = "!$(N[CX3]=[OX1])";

    static {
        first("COOH", "[CX3](=O)[OX2H1]");
        first("CH3COO", "[CH3X4][CX3](=O)[OX2H0]");
        first("CH2COO", "[CH2X4][CX3](=O)[OX2H0]");
        first("HCOO", "[CX3H1](=O)[OX2H0]");
        first("COO", "[CX3](=O)[OX2H0]");
        first("CONH2", "[CX3](=O)[NX3H2]");
        first("CON(CH3)2", "[CX3](=O)[NX3H0]([CH3X4])[CH3X4]");
        first("CH3CO", "[CH3X4]" + KETONE_C + "=O");
        first("CH2CO", "[CH2X4]" + KETONE_C + "=O");
        first("CHO", "[CX3H1;$(C[#6])]=O");
        first("C2H5O2", "[OX2H1][CH2X4][CH2X4][OX2H0;$(O[#6])]");
        first("ACOH", "c[OX2H1]");
        first("OH", "[OX2H1;$(O[CX4])]");
        first("CH2O (cyclic)", "[CH2X4;R][OX2H0;R]");
        first("CH3O", "[CH3X4][OX2H0]");
        first("CH2O", "[CH2X4][OX2H0]");
        first("CH-O", "[CH1X4][OX2H0]");
        first("O", "[OX2H0]");
        first("CH2CN", "[CH2X4][CX2]#[NX1]");
        first("CN", "[CX2]#[NX1]");
        first("O=C=N-", "[OX1]=[CX2]=[NX2]");
        first("CH2NO2", "[CH2X4][NX3](~[OX1])~[OX1]");
        first("CHNO2", "[CH1X4][NX3](~[OX1])~[OX1]");
        first("ACNO2", "c[NX3](~[OX1])~[OX1]");
        first("SO2", "[SX4](=[OX1])=[OX1]");
        first(">C=S", "[CX3]=[SX1]");
        first("CH2SH", "[CH2X4][SX2H1]");
        first("SH", "[SX2H1]");
        first("CH3S", "[CH3X4][SX2H0]");
        first("CH2S", "[CH2X4][SX2H0]");
        first("S", "[SX2H0]");
        first("ACNH2", "c[NX3H2]");
        first("CH2NH2", "[CH2X4][NX3H2]");
        first("CHNH2", "[CH1X4][NX3H2]");
        first("CH3NH", "[CH3X4][NX3H1;" + NOT_AMIDE + "]");
        first("CH2NH", "[CH2X4][NX3H1;" + NOT_AMIDE + "]");
        first("CH3N", "[CH3X4][NX3H0;" + NOT_AMIDE + "]");
        first("CH2N", "[CH2X4][NX3H0;" + NOT_AMIDE + "]");
        first("NH", "[NX3H1]");
        first("N", "[NX3H0]");
        first("-CH=N-", "[CX3H1]=[NX2]");
        first(">C=N-", "[CX3H0]=[NX2]");
        first("CF3", "[CX4](F)(F)F");
        first("CF2", "[CX4](F)F");
        first("ACF", "cF");
        first("CF", "[CX4]F");
        first("F", "F");
        first("Cl-(C=C)", "[Cl;$(Cl[CX3]=[CX3])]");
        first("CCl3", "[CX4H0](Cl)(Cl)Cl");
        first("CHCl2", "[CX4H1](Cl)Cl");
        first("CCl2", "[CX4H0](Cl)Cl");
        first("CHCl", "[CX4H1]Cl");
        first("CH2Cl", "[CH2X4]Cl");
        first("CCl", "[CX4H0]Cl");
        first("ACCl", "cCl");
        first("Cl", "Cl");
        first("Br", "Br");
        first("I", "I");
        first(">C=O", "[CX3]=[OX1]");
        first("ACCH3", "c[CH3X4]");
        first("ACCH2", "c[CH2X4]");
        first("ACH", "[cH1]");
        first("AC", "[cH0]");
        first("CH2=C=CH-", "[CH2X3]=[CX2]=[CH1X3]");
        first("CH2=C=C<", "[CH2X3]=[CX2]=[CH0X3]");
        first("CH2=CH-", "[CH2X3]=[CH1X3]");
        first("-CH=CH-", "[CH1X3]=[CH1X3]");
        first("CH2=C<", "[CH2X3]=[CH0X3]");
        first("-CH=C<", "[CH1X3]=[CH0X3]");
        first(">C=C<", "[CH0X3]=[CH0X3]");
        first("CH≡C-", "[CH1X2]#[CX2]");
        first("C≡C", "[CH0X2]#[CH0X2]");
        first("-CH3", "[CH3X4]");
        first("-CH2-", "[CH2X4]");
        first(">CH-", "[CH1X4]");
        first(">C<", "[CH0X4]");

        // key atom ≥ 0: occurrences are the distinct atoms at that position; −1: distinct atom sets
        second("(CH3)2-CH-", "[CH3X4][CH1X4][CH3X4]", 1);
        second("(CH3)3-C-", "[CH3X4][CH0X4]([CH3X4])[CH3X4]", 1);
        second("-C=C-C=C-", "C=C-C=C", -1);
        // the olefinic second-order groups are for chain double bonds (ring C=C carries none in the paper's examples)
        second("CH3-C=", "[CH3X4][CX3]=!@[CX3]", 0);
        second("-CH2-C=", "[CH2X4][CX3]=!@[CX3]", 0);
        second(">C{H or C}-C=", "[CX4;H1,H0][CX3]=!@[CX3]", 0);
        second("string in cyclic", "[C;R]-!@[CH2X4;!R]-[#6;!R]", 0);
        second("CH3(CO)CH2-", "[CH3X4][CX3](=O)[CH2X4]", 1);
        second("Ccyclic=O", "[C;R]=[OX1]", 0);
        second("ACCOOH", "c[CX3](=O)[OX2H1]", 1);
        second(">C{H or C}-COOH", "[CX4;H1,H0][CX3](=O)[OX2H1]", 1);
        second("CH3(CO)OC{H or C}<", "[CH3X4][CX3](=O)[OX2][CX4;H1,H0]", 1);
        second("(CO)C{H2}COO", "[CX3](=O)[CH2X4][CX3](=O)[OX2H0]", 1);
        second("(CO)O(CO)", "[CX3](=O)[OX2][CX3]=O", 2);
        second("ACHO", "c[CX3H1]=O", 1);
        second(">CHOH", "[CH1X4][OX2H1]", 0);
        second(">C<OH", "[CH0X4][OX2H1]", 0);
        second("-C(OH)C(OH)-", "[OX2H1][CX4][CX4][OX2H1]", -1);
        second("-C(OH)C(N)", "[OX2H1][CX4][CX4][NX3]", -1);
        second("Ccyclic-OH", "[C;R][OX2H1]", 0);
        second("C-O-C=C", "[CX4][OX2][CX3]=[CX3]", 1);
        second("AC-O-C", "c[OX2][CX4]", 1);
        second("ACCOO", "c[CX3](=O)[OX2H0]", 1);
        second("AC-O-AC", "c[OX2]c", 1);
        second(">N{H or C}(in cyclic)", "[N;R;X3]", 0);
        second("-S-(in cyclic)", "[S;R]", 0);
        second("ACBr", "cBr", 1);
        second("(C=C)-Br", "Br[CX3]=[CX3]", 0);
        second("AC(ACHm)2AC(ACHn)2", "c1cccc2ccccc12", -1);
        second("Ocyclic-Ccyclic=O", "[OX2;R][CX3;R]=O", 1);
        second("NcyclicHm-Ccyclic=O", "[NX3;R][CX3;R]=O", 1);
        second("-O-CHm-O-CHn-", "[OX2][CX4]([OX2][CX4])", 1);
        second("C(=O)-C-C(=O)", "[CX3](=O)[CX4][CX3]=O", 2);
        second("CcyclicHm=Ncyclic-CcyclicHn=CcyclicHp", "[C;R]=[NX2;R][C;R]=[C;R]", 1);
    }

    private StefanisPanayiotouMethod() {
    }

    private static void first(String name, String smarts) {
        if (!StefanisPanayiotouTables.FIRST_ORDER.containsKey(name)) {
            throw new IllegalStateException("no contributions for first-order group " + name);
        }
        FIRST.put(name, SmartsPattern.create(smarts).setPrepare(false));
    }

    private static void second(String name, String smarts, int keyAtom) {
        if (!StefanisPanayiotouTables.SECOND_ORDER.containsKey(name)) {
            throw new IllegalStateException("no contributions for second-order group " + name);
        }
        SECOND.add(new SecondOrder(name, SmartsPattern.create(smarts).setPrepare(false), keyAtom));
    }

    private static final Set<String> ELEMENTS = Set.of("C", "O", "N", "S", "F", "Cl", "Br", "I");

    public static StefanisPanayiotouEstimate estimate(Structure structure) {
        IAtomContainer mol = structure.copyOfMolecule();
        SmartsPattern.prepare(mol);
        kekuliseHeteroaromaticRings(mol);
        Set<String> uncovered = new TreeSet<>();
        int carbons = 0;
        for (IAtom a : mol.atoms()) {
            if (!ELEMENTS.contains(a.getSymbol())) {
                uncovered.add("element " + a.getSymbol());
            }
            carbons += a.getSymbol().equals("C") ? 1 : 0;
        }
        if (carbons < 3) {
            uncovered.add("fewer than three carbon atoms (outside the method's stated range)");
        }
        Map<String, Integer> firstOrder = new LinkedHashMap<>();
        Set<Integer> used = new HashSet<>();
        for (Map.Entry<String, SmartsPattern> g : FIRST.entrySet()) {
            for (int[] match : g.getValue().matchAll(mol).uniqueAtoms()) {
                boolean free = true;
                for (int i : match) {
                    free &= !used.contains(i);
                }
                if (free) {
                    for (int i : match) {
                        used.add(i);
                    }
                    firstOrder.merge(g.getKey(), 1, Integer::sum);
                }
            }
        }
        for (IAtom a : mol.atoms()) {
            if (!used.contains(mol.indexOf(a))) {
                uncovered.add("atom " + a.getSymbol() + (a.isAromatic() ? " (aromatic)" : "") + " in no first-order group");
            }
        }
        Map<String, Integer> secondOrder = secondOrderGroups(mol);
        if (!uncovered.isEmpty()) {
            return new StefanisPanayiotouEstimate(null, null, null, firstOrder, secondOrder, new ArrayList<>(uncovered));
        }
        Double sumD = sum(firstOrder, secondOrder, Component.D, false, uncovered);
        Double sumP = sum(firstOrder, secondOrder, Component.P, false, uncovered);
        Double sumH = sum(firstOrder, secondOrder, Component.H, false, uncovered);
        Double dD = null;
        if (sumD != null) {
            double bracket = sumD + StefanisPanayiotouTables.D_CONSTANT;
            dD = bracket > 0 ? Math.pow(bracket, StefanisPanayiotouTables.D_EXPONENT) : null;
        }
        Double dP = sumP == null ? null : sumP + StefanisPanayiotouTables.P_CONSTANT;
        if (dP != null && dP < StefanisPanayiotouTables.LOW_THRESHOLD) {
            Double low = sum(firstOrder, secondOrder, Component.P, true, uncovered);
            dP = low == null ? null : Math.max(0, low + StefanisPanayiotouTables.P_LOW_CONSTANT);
        }
        Double dH = sumH == null ? null : sumH + StefanisPanayiotouTables.H_CONSTANT;
        if (dH != null && dH < StefanisPanayiotouTables.LOW_THRESHOLD) {
            Double low = sum(firstOrder, secondOrder, Component.H, true, uncovered);
            dH = low == null ? null : Math.max(0, low + StefanisPanayiotouTables.H_LOW_CONSTANT);
        }
        return new StefanisPanayiotouEstimate(dD, dP, dH, firstOrder, secondOrder, new ArrayList<>(uncovered));
    }

    private enum Component {
        D, P, H
    }

    private static Double value(StefanisPanayiotouTables.Contribution c, Component k, boolean low) {
        return switch (k) {
            case D -> c.d();
            case P -> low ? c.pLow() : c.p();
            case H -> low ? c.hLow() : c.h();
        };
    }

    /**
     * Σ NiCi + W Σ MjDj for one component, or null when a first-order group has no value for it. In the low-value
     * equations a group without a Table A.5/A.6 value contributes nothing: those tables list only the groups that
     * occur in the low-value compounds the equations were fitted to.
     */
    private static Double sum(Map<String, Integer> firstOrder, Map<String, Integer> secondOrder, Component k, boolean low, Set<String> uncovered) {
        double s = 0;
        for (Map.Entry<String, Integer> g : firstOrder.entrySet()) {
            Double v = value(StefanisPanayiotouTables.FIRST_ORDER.get(g.getKey()), k, low);
            if (v == null && !low) {
                uncovered.add("no δ" + k + " value (***) for group " + g.getKey());
                return null;
            }
            s += v == null ? 0 : v * g.getValue();
        }
        for (Map.Entry<String, Integer> g : secondOrder.entrySet()) {
            Double v = value(StefanisPanayiotouTables.SECOND_ORDER.get(g.getKey()), k, low);
            s += v == null ? 0 : v * g.getValue();
        }
        return s;
    }

    static Map<String, Integer> secondOrderGroups(IAtomContainer mol) {
        Map<String, Integer> out = new LinkedHashMap<>();
        for (int[] path : Cycles.sssr(mol).paths()) {
            int size = path.length - 1;
            if (size != 3 && size != 5 && size != 6) {
                continue;
            }
            boolean carbocycle = true;
            for (int i = 0; i < size; i++) {
                IAtom a = mol.getAtom(path[i]);
                carbocycle &= a.getSymbol().equals("C") && !a.isAromatic();
            }
            if (carbocycle) {
                out.merge("ring of " + size + " carbons", 1, Integer::sum);
            }
        }
        for (SecondOrder g : SECOND) {
            int n;
            if (g.keyAtom() < 0) {
                n = g.pattern().matchAll(mol).uniqueAtoms().count();
            } else {
                Set<Integer> keys = new HashSet<>();
                for (int[] m : g.pattern().matchAll(mol)) {
                    keys.add(m[g.keyAtom()]);
                }
                n = keys.size();
            }
            if (n > 0) {
                out.merge(g.name(), n, Integer::sum);
            }
        }
        return out;
    }

    /**
     * Clears the aromatic flags of every ring that holds a heteroatom, so that its atoms and bonds are matched in the
     * Kekulé form the parser gave them (C=N, C=C, ring O and S), as the method's groups describe such rings.
     */
    private static void kekuliseHeteroaromaticRings(IAtomContainer mol) {
        for (int[] path : Cycles.sssr(mol).paths()) {
            boolean aromatic = true;
            boolean hetero = false;
            for (int i = 0; i < path.length - 1; i++) {
                IAtom a = mol.getAtom(path[i]);
                aromatic &= a.isAromatic();
                hetero |= !a.getSymbol().equals("C");
            }
            if (!aromatic || !hetero) {
                continue;
            }
            for (int i = 0; i < path.length - 1; i++) {
                mol.getAtom(path[i]).setIsAromatic(false);
                IBond b = mol.getBond(mol.getAtom(path[i]), mol.getAtom(path[i + 1]));
                if (b != null) {
                    b.setIsAromatic(false);
                }
            }
        }
    }
}
