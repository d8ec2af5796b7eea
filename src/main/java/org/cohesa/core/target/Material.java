package org.cohesa.core.target;

import java.util.List;
import java.util.Objects;
import org.cohesa.core.TextLimits;
import org.cohesa.core.hsp.SolubilitySphere;

/**
 * A material that must dissolve (resin, polymer, pigment, drug substance) with its solubility sphere.
 *
 * @param name      name as formulators write it, e.g. "poly(methyl methacrylate)"
 * @param synonyms  other names, abbreviations and trade grades
 * @param kind      polymer, resin, drug, pigment or other
 * @param sphere    centre (δD, δP, δH) and radius R0, MPa^½
 * @param source    source key (cited in solvent-db/SOURCES.md for bundled rows; free text for the user's own)
 * @param note      curation note (grade, confidence, how it was obtained)
 * @param userEntry true for the user's own materials (typed in or saved from a fit), false for bundled data
 */
public record Material(String name, List<String> synonyms, MaterialKind kind, SolubilitySphere sphere, String source,
                       String note, boolean userEntry) {

    public Material {
        name = TextLimits.name("name", name);
        note = TextLimits.text("note", note);
        synonyms = List.copyOf(Objects.requireNonNullElse(synonyms, List.of()));
        kind = Objects.requireNonNullElse(kind, MaterialKind.OTHER);
        if (sphere == null) {
            throw new IllegalArgumentException("material " + name + " needs a sphere (dD, dP, dH, R0)");
        }
        if (source == null || source.isBlank()) {
            throw new IllegalArgumentException("material " + name + " needs a source");
        }
        source = source.strip();
    }

    /** A copy marked as a user entry or as bundled data. */
    /** The note phrase that marks a semicrystalline polymer (solvent-db/materials.csv, or a user's note). */
    public static final String SEMICRYSTALLINE = "semicrystalline";

    /**
     * True when the note marks the material semicrystalline: its crystallites dissolve only near their melting range, so a
     * solvent inside the sphere at 25 °C may only swell it (common practice, no source).
     */
    public boolean semicrystalline() {
        return note != null && note.toLowerCase(java.util.Locale.ROOT).contains(SEMICRYSTALLINE);
    }

    public Material withUserEntry(boolean user) {
        return new Material(name, synonyms, kind, sphere, source, note, user);
    }
}
