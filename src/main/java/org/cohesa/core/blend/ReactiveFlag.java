package org.cohesa.core.blend;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.openscience.cdk.exception.InvalidSmilesException;
import org.openscience.cdk.interfaces.IAtomContainer;
import org.openscience.cdk.silent.SilentChemObjectBuilder;
import org.openscience.cdk.smarts.SmartsPattern;
import org.openscience.cdk.smiles.SmilesParser;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.solvent.Solvent;

/**
 * Process-suitability flags: solvents that take part in reactions a reaction or extraction solvent must not
 * (common practice, no source). Carboxylic acids protonate bases and esterify; amines (and pyridines) are bases and
 * nucleophiles; nitroalkanes are energetic and form explosive salts with bases; peroxide formers (EUH019, the
 * library's flag) concentrate explosive peroxides on distillation; 1,3-dicarbonyl compounds (acetoacetates,
 * malonates, acetylacetone) carry an acidic active methylene group that forms enolates with bases and condenses with
 * amines, aldehydes and isocyanates (the chemistry acetoacetate crosslinkers are built on); α,β-unsaturated ketones
 * and esters (mesityl oxide, isophorone) are Michael acceptors that add amines, thiols and enolates.
 */
public enum ReactiveFlag {
    ACID("carboxylic acid"),
    AMINE("amine or pyridine base"),
    NITRO("nitroalkane"),
    PEROXIDE("peroxide former"),
    ACTIVE_METHYLENE("1,3-dicarbonyl (active methylene)"),
    MICHAEL_ACCEPTOR("α,β-unsaturated carbonyl (Michael acceptor)");

    /** C(=O)–CH2/CH–C(=O): the acidic methylene between two carbonyls of a β-keto ester, malonate or 1,3-diketone. */
    private static final SmartsPattern DICARBONYL = SmartsPattern.create("[CX3](=O)[CX4;H1,H2][CX3](=O)");
    private static final Map<String, Boolean> DICARBONYL_SEEN = new ConcurrentHashMap<>();
    /** C=C–C(=O): a carbon–carbon double bond conjugated with a ketone or ester carbonyl (aromatic rings are not matched). */
    private static final SmartsPattern ENONE = SmartsPattern.create("[CX3]=[CX3][CX3]=O");
    private static final Map<String, Boolean> ENONE_SEEN = new ConcurrentHashMap<>();

    private final String label;

    ReactiveFlag(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }

    public String word() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** True when the flag applies to the solvent (family keys "acid" and "amine", a nitro group in the structure, the peroxide flag). */
    public boolean applies(Solvent s) {
        return switch (this) {
            case ACID -> s.inFamily("acid") || s.inFamily("carboxylic_acid") || s.name().toLowerCase(Locale.ROOT).endsWith(" acid");
            case AMINE -> s.inFamily("amine");
            case NITRO -> (s.smiles() != null && (s.smiles().contains("[N+](=O)[O-]") || s.smiles().contains("N(=O)=O")))
                    || s.name().toLowerCase(Locale.ROOT).startsWith("nitro");
            case PEROXIDE -> s.peroxideFormer();
            case ACTIVE_METHYLENE -> s.smiles() != null && DICARBONYL_SEEN.computeIfAbsent(s.smiles(), x -> matches(DICARBONYL, x));
            case MICHAEL_ACCEPTOR -> s.smiles() != null && ENONE_SEEN.computeIfAbsent(s.smiles(), x -> matches(ENONE, x));
        };
    }

    private static boolean matches(SmartsPattern pattern, String smiles) {
        try {
            IAtomContainer mol = new SmilesParser(SilentChemObjectBuilder.getInstance()).parseSmiles(smiles);
            return pattern.matches(mol);
        } catch (InvalidSmilesException e) {
            return false;
        }
    }

    /** The flags that apply to a solvent. */
    public static List<ReactiveFlag> of(Solvent s) {
        List<ReactiveFlag> out = new ArrayList<>();
        for (ReactiveFlag f : values()) {
            if (f.applies(s)) {
                out.add(f);
            }
        }
        return out;
    }

    /**
     * The chemical reactivity a substitute would bring that the replaced solvent does not have: every flag but
     * {@link #PEROXIDE} that the original does not carry. A substitute does the original's job in the same chemistry; a
     * process run in an inert solvent (dichloromethane, toluene, NMP) was not designed for a solvent that protonates,
     * adds or condenses with the reagents or the product (common practice in process chemistry, no source), and the CHEM21
     * panel moved the reactive solvents it ranked one or two classes below their computed rank (Prat et al., Green Chem.
     * 18 (2016) 288, Table 7: pyridine recommended → hazardous, triethylamine problematic → hazardous, nitromethane
     * hazardous → highly hazardous). Peroxide formation is a storage hazard, not a reaction with the process, and stays a
     * penalty ({@link HazardPenalty}). A reactive original (pyridine, acetic acid) keeps its own kind among the candidates.
     */
    public static java.util.Set<ReactiveFlag> newTo(Solvent original) {
        java.util.Set<ReactiveFlag> out = java.util.EnumSet.noneOf(ReactiveFlag.class);
        for (ReactiveFlag f : values()) {
            if (f != PEROXIDE && !f.applies(original)) {
                out.add(f);
            }
        }
        return out;
    }

    /** "acid", "amine", "nitro", "peroxide", "dicarbonyl", "enone", "all" or "none" (an empty list). */
    public static List<ReactiveFlag> parse(String field, String text) {
        List<ReactiveFlag> out = new ArrayList<>();
        for (String p : text.split(",")) {
            String w = p.strip().toLowerCase(Locale.ROOT);
            if (w.isEmpty()) {
                continue;
            }
            if (w.equals("all")) {
                return List.of(values());
            }
            if (w.equals("none")) {
                continue;
            }
            ReactiveFlag f = switch (w) {
                case "acid", "acids", "carboxylic-acid" -> ACID;
                case "amine", "amines", "base" -> AMINE;
                case "nitro", "nitroalkane", "nitroalkanes" -> NITRO;
                case "peroxide", "peroxides", "peroxide-former" -> PEROXIDE;
                case "dicarbonyl", "active-methylene", "keto-ester" -> ACTIVE_METHYLENE;
                case "enone", "michael-acceptor", "unsaturated-carbonyl" -> MICHAEL_ACCEPTOR;
                default -> throw new InvalidInputException(field, p.strip(), "choose from acid, amine, nitro, peroxide, dicarbonyl, enone, all, none");
            };
            if (!out.contains(f)) {
                out.add(f);
            }
        }
        return out;
    }
}
