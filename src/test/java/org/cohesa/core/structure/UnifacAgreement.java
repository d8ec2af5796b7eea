package org.cohesa.core.structure;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import org.cohesa.core.InvalidInputException;

/**
 * Structure-derived original-UNIFAC groups against the published DDBST assignments
 * ({@code ddbst-unifac-assignments.tsv}, joined by InChIKey to the PubChem SMILES of
 * {@code chemical-identifiers-pubchem-small.tsv}).
 */
record UnifacAgreement(int compared, int identical, int refused, Map<String, List<String>> differencesByKind) {

    double share() {
        return compared == 0 ? 0 : identical / (double) compared;
    }

    static UnifacAgreement measure(Path ref) {
        Map<String, String[]> byKey = ReferenceTables.identifiersBy(ref, 6);
        Map<Integer, String> names = new TreeMap<>();
        for (String[] r : ReferenceTables.tsv(ref, "unifac-subgroups.tsv", true)) {
            names.put(Integer.parseInt(r[0]), r[1]);
        }
        int compared = 0;
        int identical = 0;
        int refused = 0;
        Map<String, List<String>> kinds = new TreeMap<>();
        for (String[] row : ReferenceTables.tsv(ref, "ddbst-unifac-assignments.tsv", false)) {
            if (!row[1].trim().startsWith("1")) {
                continue; // DDBST gives no complete original-UNIFAC assignment
            }
            String[] id = byKey.get(row[0]);
            if (id == null || id[4].isBlank()) {
                continue;
            }
            Map<Integer, Integer> theirs = parse(row[2]);
            Structure st;
            try {
                st = StructureParser.parse("smiles", id[4]);
            } catch (InvalidInputException e) {
                refused++;
                kinds.computeIfAbsent("refused by the parser: " + e.reason().replaceAll("\\(.*", "").strip(), k -> new ArrayList<>())
                        .add(id[4]);
                continue;
            }
            compared++;
            UnifacGrouping g = UnifacGrouper.group(st);
            if (g.complete() && g.groups().equals(theirs)) {
                identical++;
                continue;
            }
            String kind = g.complete() ? kindOf(g.groups(), theirs, names) : "no group for an atom";
            kinds.computeIfAbsent(kind, k -> new ArrayList<>()).add(id[4] + " ours " + format(g.groups()) + " DDBST " + format(theirs));
        }
        return new UnifacAgreement(compared, identical, refused, kinds);
    }

    private static String kindOf(Map<Integer, Integer> ours, Map<Integer, Integer> theirs, Map<Integer, String> names) {
        List<String> only = new ArrayList<>();
        List<String> missing = new ArrayList<>();
        java.util.Set<Integer> all = new java.util.TreeSet<>(ours.keySet());
        all.addAll(theirs.keySet());
        for (int k : all) {
            int d = ours.getOrDefault(k, 0) - theirs.getOrDefault(k, 0);
            if (d > 0) {
                only.add(names.getOrDefault(k, "#" + k));
            } else if (d < 0) {
                missing.add(names.getOrDefault(k, "#" + k));
            }
        }
        return "ours " + String.join("+", only) + " where DDBST has " + String.join("+", missing);
    }

    static Map<Integer, Integer> parse(String text) {
        Map<Integer, Integer> m = new TreeMap<>();
        String[] t = text.trim().split("\\s+");
        for (int i = 0; i + 1 < t.length; i += 2) {
            m.merge(Integer.parseInt(t[i]), Integer.parseInt(t[i + 1]), Integer::sum);
        }
        return m;
    }

    private static String format(Map<Integer, Integer> m) {
        StringBuilder sb = new StringBuilder();
        m.forEach((k, v) -> sb.append(sb.length() == 0 ? "" : " ").append(k).append(':').append(v));
        return sb.toString();
    }

    String summary() {
        StringBuilder sb = new StringBuilder(String.format(Locale.ROOT,
                "UNIFAC groups vs DDBST: %d of %d identical (%.1f %%); %d SMILES refused by the parser%n",
                identical, compared, 100 * share(), refused));
        differencesByKind.entrySet().stream()
                .sorted(Comparator.comparingInt((Map.Entry<String, List<String>> e) -> -e.getValue().size()))
                .forEach(e -> sb.append(String.format(Locale.ROOT, "  %4d  %s   e.g. %s%n", e.getValue().size(), e.getKey(),
                        String.join(" | ", e.getValue().subList(0, Math.min(3, e.getValue().size()))))));
        return sb.toString();
    }
}
