package org.cohesa.core.target;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import org.cohesa.core.InvalidInputException;

/**
 * An immutable view of the material library with name resolution: the name or any synonym works,
 * case and spacing do not matter; a name matching several materials is an error that lists them.
 */
public final class MaterialLibrary {

    private final List<Material> materials;
    private final Map<String, List<Material>> byKey = new LinkedHashMap<>();

    public MaterialLibrary(List<Material> materials) {
        this.materials = List.copyOf(materials);
        for (Material m : this.materials) {
            Set<String> keys = new LinkedHashSet<>();
            keys.add(key(m.name()));
            m.synonyms().forEach(s -> keys.add(key(s)));
            for (String k : keys) {
                byKey.computeIfAbsent(k, x -> new ArrayList<>()).add(m);
            }
        }
    }

    public List<Material> all() {
        return materials;
    }

    public int size() {
        return materials.size();
    }

    /** Materials matching a name or synonym exactly (case-insensitive); the exact name wins over a shared synonym. */
    public List<Material> lookup(String text) {
        if (text == null) {
            return List.of();
        }
        List<Material> hits = byKey.getOrDefault(key(text), List.of());
        if (hits.size() > 1) {
            List<Material> exact = hits.stream().filter(m -> key(m.name()).equals(key(text))).toList();
            if (exact.size() == 1) {
                return exact;
            }
        }
        return hits;
    }

    /**
     * Resolves a name or synonym.
     *
     * @throws InvalidInputException naming {@code field} when nothing or several materials match
     */
    public Material resolve(String field, String text) {
        if (text == null || text.isBlank()) {
            throw new InvalidInputException(field, String.valueOf(text == null ? "" : text), "empty: give a material name or synonym");
        }
        List<Material> hits = lookup(text);
        if (hits.size() == 1) {
            return hits.get(0);
        }
        if (hits.isEmpty()) {
            List<String> near = search(text).stream().map(Material::name).limit(3).toList();
            throw new InvalidInputException(field, String.valueOf(text), "no such material in the library"
                    + (near.isEmpty() ? "" : " (did you mean " + String.join(", ", near) + "?)"));
        }
        throw new InvalidInputException(field, text, "matches several materials: "
                + hits.stream().map(Material::name).collect(Collectors.joining(", ")) + "; use the full name");
    }

    /** Materials whose name, a synonym or kind contains {@code text} (case-insensitive); all for blank text. */
    public List<Material> search(String text) {
        if (text == null || text.isBlank()) {
            return materials;
        }
        String k = key(text);
        return materials.stream().filter(m -> key(m.name()).contains(k) || m.kind().key().equals(k)
                || m.synonyms().stream().anyMatch(s -> key(s).contains(k))).toList();
    }

    static String key(String s) {
        return s.strip().replaceAll("\\s+", " ").toLowerCase(Locale.ROOT);
    }
}
