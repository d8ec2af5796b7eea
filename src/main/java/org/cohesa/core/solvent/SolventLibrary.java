package org.cohesa.core.solvent;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import org.cohesa.core.InvalidInputException;

/**
 * An in-memory, immutable view of the solvent library with name resolution as chemists write names:
 * a name, a synonym or a CAS number all work, case and spacing do not matter, and a name that
 * matches several solvents is an error that lists them.
 */
public final class SolventLibrary {

    private final List<Solvent> solvents;
    private final Map<String, List<Solvent>> byKey = new LinkedHashMap<>();

    public SolventLibrary(List<Solvent> solvents) {
        this.solvents = List.copyOf(solvents);
        for (Solvent s : this.solvents) {
            Set<String> keys = new LinkedHashSet<>();
            keys.add(key(s.name()));
            if (s.cas() != null && !s.cas().isBlank()) {
                keys.add(key(s.cas()));
            }
            s.synonyms().forEach(syn -> keys.add(key(syn)));
            for (String k : keys) {
                byKey.computeIfAbsent(k, x -> new ArrayList<>()).add(s);
            }
        }
    }

    public List<Solvent> all() {
        return solvents;
    }

    /** Solvents with Hansen parameters: the ones that can take part in searches. */
    public List<Solvent> searchable() {
        return solvents.stream().filter(Solvent::hasHansen).toList();
    }

    public int size() {
        return solvents.size();
    }

    /**
     * Resolves a name, synonym or CAS number; the exact name wins over a synonym shared with others.
     *
     * @throws InvalidInputException naming {@code field} when nothing or several solvents match
     */
    public Solvent resolve(String field, String text) {
        if (text == null || text.isBlank()) {
            throw new InvalidInputException(field, String.valueOf(text == null ? "" : text), "empty: give a solvent name, synonym or CAS number");
        }
        List<Solvent> hits = lookup(text);
        if (hits.size() == 1) {
            return hits.get(0);
        }
        if (hits.isEmpty()) {
            List<String> near = suggestions(text, 3);
            throw new InvalidInputException(field, text, "no such solvent in the library"
                    + (near.isEmpty() ? "" : " (did you mean " + String.join(", ", near) + "?)"));
        }
        throw new InvalidInputException(field, text, "matches several solvents: "
                + hits.stream().map(Solvent::name).collect(Collectors.joining(", ")) + "; use the full name or the CAS number");
    }

    /** All solvents matching a name, synonym or CAS exactly (case-insensitive). */
    public List<Solvent> lookup(String text) {
        if (text == null) {
            return List.of();
        }
        List<Solvent> hits = byKey.getOrDefault(key(text), List.of());
        if (hits.size() > 1) {
            List<Solvent> exactName = hits.stream().filter(s -> key(s.name()).equals(key(text))).toList();
            if (exactName.size() == 1) {
                return exactName;
            }
        }
        return hits;
    }

    /**
     * Solvents whose name, a synonym or CAS contains {@code text} (case-insensitive), best matches first:
     * exact name, then names starting with the text, then names containing it, then synonym, CAS or family hits.
     * All solvents, in library order, for blank text.
     */
    public List<Solvent> search(String text) {
        if (text == null || text.isBlank()) {
            return solvents;
        }
        String k = key(text);
        return solvents.stream()
                .map(s -> Map.entry(s, relevance(s, k, text.strip())))
                .filter(e -> e.getValue() < 4)
                .sorted(Comparator.comparingInt(Map.Entry<Solvent, Integer>::getValue))
                .map(Map.Entry::getKey).toList();
    }

    /**
     * How well {@code s} matches a search for {@code text}: 0 exact name, 1 name starts with it, 2 name contains it,
     * 3 CAS, synonym or family contains it, 4 no match (what {@link #search} sorts and filters by).
     */
    public static int relevance(Solvent s, String text) {
        return relevance(s, key(text), text.strip());
    }

    private static int relevance(Solvent s, String key, String raw) {
        String name = key(s.name());
        if (name.equals(key)) {
            return 0;
        }
        if (name.startsWith(key)) {
            return 1;
        }
        if (name.contains(key)) {
            return 2;
        }
        boolean other = (s.cas() != null && s.cas().contains(raw)) || s.synonyms().stream().anyMatch(syn -> key(syn).contains(key))
                || (s.family() != null && key(s.family()).replace('_', ' ').contains(key.replace('_', ' ')));
        return other ? 3 : 4;
    }

    /** Parses and resolves our blend notation into a {@link Blend}. */
    public Blend resolveBlend(String field, String text) {
        List<BlendComponent> cs = new ArrayList<>();
        for (BlendSpec.Part p : BlendSpec.parse(field, text)) {
            cs.add(new BlendComponent(resolve(field, p.name()), p.fraction()));
        }
        try {
            return new Blend(cs);
        } catch (IllegalArgumentException e) {
            throw new InvalidInputException(field, text, e.getMessage());
        }
    }

    /**
     * Resolves a list option whose values may be repeated options, comma-separated, or both, where names
     * themselves may contain commas ("1,4-dioxane"): at each position the longest run of comma-separated
     * pieces that names a solvent wins.
     */
    public List<Solvent> resolveList(String field, List<String> values) {
        List<Solvent> out = new ArrayList<>();
        for (String value : values) {
            String[] pieces = value.split(",");
            int i = 0;
            while (i < pieces.length) {
                if (pieces[i].isBlank()) {
                    i++;
                    continue;
                }
                int matchedEnd = -1;
                for (int j = pieces.length; j > i; j--) {
                    String candidate = String.join(",", java.util.Arrays.copyOfRange(pieces, i, j)).strip();
                    if (lookup(candidate).size() == 1) {
                        matchedEnd = j;
                        break;
                    }
                }
                if (matchedEnd < 0) {
                    out.add(resolve(field, pieces[i].strip()));
                    i++;
                } else {
                    Solvent s = lookup(String.join(",", java.util.Arrays.copyOfRange(pieces, i, matchedEnd)).strip()).get(0);
                    if (!out.contains(s)) {
                        out.add(s);
                    }
                    i = matchedEnd;
                }
            }
        }
        return out;
    }

    /** Up to {@code n} library names closest to {@code text} by edit distance, for "did you mean". */
    public List<String> suggestions(String text, int n) {
        String k = key(text);
        return solvents.stream()
                .map(s -> Map.entry(s.name(), Math.min(editDistance(k, key(s.name())),
                        s.synonyms().stream().mapToInt(x -> editDistance(k, key(x))).min().orElse(Integer.MAX_VALUE))))
                .filter(e -> e.getValue() <= Math.max(2, k.length() / 3))
                .sorted(Comparator.comparingInt(Map.Entry<String, Integer>::getValue).thenComparing(Map.Entry::getKey))
                .limit(n).map(Map.Entry::getKey).toList();
    }

    static String key(String s) {
        return s.strip().replaceAll("\\s+", " ").toLowerCase(Locale.ROOT);
    }

    private static int editDistance(String a, String b) {
        int[] prev = new int[b.length() + 1];
        int[] cur = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            prev[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            cur[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                cur[j] = Math.min(Math.min(cur[j - 1] + 1, prev[j] + 1), prev[j - 1] + cost);
            }
            int[] t = prev;
            prev = cur;
            cur = t;
        }
        return prev[b.length()];
    }

    /**
     * Family names as a user types them ("ester; alcohol", or several values each "ester,ketone") → the family keys,
     * lower case, each checked against the families this library has (a solvent counts under every family it has).
     * @throws InvalidInputException naming {@code field} and the first unknown family
     */
    public Set<String> familyKeys(String field, Iterable<String> texts) {
        Set<String> known = new java.util.TreeSet<>();
        all().forEach(s -> s.families().forEach(f -> known.add(f.toLowerCase(Locale.ROOT))));
        Set<String> out = new LinkedHashSet<>();
        for (String text : texts) {
            if (text == null) {
                continue;
            }
            for (String part : text.split("[;,]")) {
                String k = part.strip().toLowerCase(Locale.ROOT);
                if (k.isEmpty()) {
                    continue;
                }
                if (!known.contains(k)) {
                    throw new InvalidInputException(field, part.strip(), "no solvent of that family in the library; families: " + String.join(", ", known));
                }
                out.add(k);
            }
        }
        return out;
    }
}
