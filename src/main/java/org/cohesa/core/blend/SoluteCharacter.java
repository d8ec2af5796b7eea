package org.cohesa.core.blend;

import java.util.EnumSet;
import java.util.Locale;
import java.util.Set;
import org.openscience.cdk.exception.InvalidSmilesException;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.silent.SilentChemObjectBuilder;
import org.openscience.cdk.smarts.SmartsPattern;
import org.openscience.cdk.smiles.SmilesParser;

/**
 * Whether a material to dissolve is an acid or a base, read from its structure with CDK SMARTS: an acidic solute
 * (carboxylic or sulfonic acid) forms a salt with an amine solvent, a basic solute (an aliphatic amine, amidine or
 * guanidine) with a carboxylic-acid solvent — an acid–base reaction, not dissolution, and a changed substance
 * (common practice, no source; e.g. salicylic acid with triethylamine). Weak acids and bases are not counted:
 * phenols (pKa near 10), sulfonamides, anilines and pyridine-type nitrogens (conjugate-acid pKa near 2–5), since
 * the common amine and acid solvents do not turn them into salts to a degree that matters for a solvent choice
 * (from memory: pKa of phenol 10.0, anilinium 4.6, pyridinium 5.2; triethylammonium 10.7, acetic acid 4.76).
 */
public enum SoluteCharacter {
    ACIDIC("acidic", ReactiveFlag.AMINE, "amine bases form salts with it"),
    BASIC("basic", ReactiveFlag.ACID, "carboxylic acids form salts with it");

    /** A carboxylic acid or a sulfonic acid (the OH on the carbonyl carbon or on S(=O)2). */
    private static final SmartsPattern ACID = SmartsPattern.create("[$([CX3](=O)[OX2H1]),$([SX4](=O)(=O)[OX2H1])]");
    /**
     * An sp3 amine nitrogen bound only to hydrogen and sp3 carbon (not an amide, aniline, sulfonamide, nitro, N-oxide
     * or hydrazine), or an amidine/guanidine carbon's imine nitrogen.
     */
    private static final SmartsPattern BASE = SmartsPattern.create(
            "[$([NX3;H0,H1,H2;!$(N~[!#6;!#1]);!$(N-[#6;!X4])]),$([NX2;!a]=[CX3]([#7])),$([NX2;!a]=[CX3]([#6])[NX3])]");

    private final String word;
    private final ReactiveFlag clash;
    private final String why;

    SoluteCharacter(String word, ReactiveFlag clash, String why) {
        this.word = word;
        this.clash = clash;
        this.why = why;
    }

    public String word() {
        return word;
    }

    /** The solvents that react with a solute of this character. */
    public ReactiveFlag clash() {
        return clash;
    }

    /** e.g. "amine bases form salts with it". */
    public String why() {
        return why;
    }

    /** Acidic, basic, both (an amino acid) or neither, from a SMILES; empty for a SMILES CDK cannot read. */
    public static Set<SoluteCharacter> ofSmiles(String smiles) {
        Set<SoluteCharacter> out = EnumSet.noneOf(SoluteCharacter.class);
        if (smiles == null || smiles.isBlank()) {
            return out;
        }
        IAtomContainer mol;
        try {
            mol = new SmilesParser(SilentChemObjectBuilder.getInstance()).parseSmiles(smiles.strip());
        } catch (InvalidSmilesException e) {
            return out;
        }
        if (ACID.matches(mol)) {
            out.add(ACIDIC);
        }
        if (BASE.matches(mol)) {
            out.add(BASIC);
        }
        return out;
    }

    /** "acidic" or "basic" (from a field); null for anything else. */
    public static SoluteCharacter ofWord(String w) {
        if (w == null) {
            return null;
        }
        String s = w.strip().toLowerCase(Locale.ROOT);
        for (SoluteCharacter c : values()) {
            if (c.word.equals(s)) {
                return c;
            }
        }
        return null;
    }
}
