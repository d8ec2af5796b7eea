package org.cohesa.desktop.space;

import java.util.List;
import java.util.Locale;
import javafx.scene.paint.Color;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.desktop.common.Palette;

/**
 * How the points of the parameter-space plots are coloured. Each choice sorts solvents into a few
 * categories, each with a label and a colour from {@link Palette}; the legend lists them.
 */
public enum Colouring {

    FAMILY("Chemical family", List.of(
            new Category("alcohols, glycols", Palette.BLUE),
            new Category("esters, carbonates, lactones", Palette.ORANGE),
            new Category("ketones", Palette.REDDISH_PURPLE),
            new Category("ethers, glycol ethers", Palette.SKY_BLUE),
            new Category("hydrocarbons", Palette.YELLOW),
            new Category("chlorinated", Palette.VERMILLION),
            new Category("dipolar aprotic, nitriles, amines", Palette.BLUISH_GREEN),
            new Category("water, acids, other", Palette.LIGHT))),
    RED("Inside / outside the target", List.of(
            new Category("inside (RED < 1)", Palette.SKY_BLUE),
            new Category("outside (RED ≥ 1)", Palette.ORANGE),
            new Category("no target set", Palette.NO_DATA))),
    ICH_CLASS("ICH Q3C class", List.of(
            new Category("class 1 (avoid)", Palette.VERMILLION),
            new Category("class 2 (limit)", Palette.ORANGE),
            new Category("class 3 (low toxic potential)", Palette.SKY_BLUE),
            new Category("not listed", Palette.NO_DATA))),
    HAZARD("Hazard statements", List.of(
            new Category("carcinogen, mutagen or reprotoxic (H340, H350, H360)", Palette.VERMILLION),
            new Category("suspected CMR (H341, H351, H361)", Palette.ORANGE),
            new Category("other H-statements", Palette.YELLOW),
            new Category("none listed", Palette.SKY_BLUE)));

    /** One legend entry. */
    public record Category(String label, Color colour) {
    }

    private final String title;
    private final List<Category> categories;

    Colouring(String title, List<Category> categories) {
        this.title = title;
        this.categories = categories;
    }

    public String title() {
        return title;
    }

    public List<Category> categories() {
        return categories;
    }

    @Override
    public String toString() {
        return title;
    }

    /** Index into {@link #categories()} for a solvent; {@code target} may be null. */
    public int categoryOf(Solvent s, SolubilitySphere target) {
        return switch (this) {
            case FAMILY -> familyGroup(s.family());
            case RED -> target == null || !s.hasHansen() ? 2 : (target.red(s.hansen()) < 1 ? 0 : 1);
            case ICH_CLASS -> s.ichClass() == null ? 3 : s.ichClass() - 1;
            case HAZARD -> hazardGroup(s.hazardStatements());
        };
    }

    static int familyGroup(String family) {
        String f = family == null ? "" : family.toLowerCase(Locale.ROOT);
        return switch (f) {
            case "alcohol", "glycol" -> 0;
            case "ester", "carbonate", "lactone" -> 1;
            case "ketone" -> 2;
            case "ether", "glycol_ether", "glycol_ether_acetate" -> 3;
            case "aliphatic", "aromatic", "terpene", "hydrocarbon" -> 4;
            case "chlorinated" -> 5;
            case "dipolar_aprotic", "nitrile", "amine", "amide" -> 6;
            default -> 7;
        };
    }

    private static int hazardGroup(List<String> h) {
        if (h.stream().anyMatch(x -> x.startsWith("H340") || x.startsWith("H350") || x.startsWith("H360"))) {
            return 0;
        }
        if (h.stream().anyMatch(x -> x.startsWith("H341") || x.startsWith("H351") || x.startsWith("H361"))) {
            return 1;
        }
        return h.isEmpty() ? 3 : 2;
    }
}
