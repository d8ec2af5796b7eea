package org.cohesa.desktop.blend;

import java.util.List;
import java.util.Set;
import org.cohesa.core.blend.SoluteCharacter;
import org.cohesa.core.target.Material;
import org.cohesa.core.target.MaterialKind;
import org.cohesa.desktop.common.TargetChoice;
import org.cohesa.store.MaterialStructures;

/**
 * The acid–base character of the screen's target, read exactly as the command line reads a material's
 * ({@link MaterialStructures#characterOf}: the bundled structure of a library material, or the SMILES a user's
 * material was estimated from or entered with). A target set straight from a structure (not kept) carries that
 * SMILES in its source, so it is read the same way. A typed-in or fitted sphere has no structure: no character.
 */
final class TargetStructure {

    /** Prefixes the screens put before a material's own source in a target's source. */
    private static final List<String> PREFIXES = List.of("material library, source: ", "your material, ");

    private TargetStructure() {
    }

    /** The library material the target is (same name, same sphere), else one that holds only the target's source. */
    static Material materialOf(TargetChoice t, List<Material> library) {
        for (Material m : library) {
            if (m.name().equalsIgnoreCase(t.name()) && m.sphere().equals(t.sphere())) {
                return m;
            }
        }
        String source = t.source();
        for (String p : PREFIXES) {
            if (source.startsWith(p)) {
                source = source.substring(p.length());
            }
        }
        return new Material(t.name(), List.of(), MaterialKind.OTHER, t.sphere(), source.isBlank() ? "typed in" : source, null, true);
    }

    /** Acidic, basic, both or neither (also when no structure is known). */
    static Set<SoluteCharacter> characterOf(TargetChoice t, List<Material> library) {
        return t == null ? Set.of() : MaterialStructures.characterOf(materialOf(t, library));
    }

    /** Whether any structure is known for the target (said beside the switch: "no structure known" is not "neutral"). */
    static boolean hasStructure(TargetChoice t, List<Material> library) {
        return t != null && MaterialStructures.smilesOf(materialOf(t, library)) != null;
    }
}
