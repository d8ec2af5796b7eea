package org.cohesa.core.structure;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The published tables of {@code ../shared/reference-data} (see its README for the original publications), read
 * for the structure tests. Tests that need them skip when the folder is absent.
 */
final class ReferenceTables {

    private static final List<Path> CANDIDATES = List.of(Path.of("..", "shared", "reference-data"),
            Path.of("..", "..", "shared", "reference-data"), Path.of("/work/shared/reference-data"));

    private ReferenceTables() {
    }

    static Optional<Path> folder() {
        String given = System.getProperty("cohesa.referenceData", System.getenv("COHESA_REFERENCE_DATA"));
        if (given != null && !given.isBlank()) {
            Path p = Path.of(given);
            return Files.isDirectory(p) ? Optional.of(p) : Optional.empty();
        }
        return CANDIDATES.stream().filter(Files::isDirectory).findFirst();
    }

    static List<String[]> tsv(Path folder, String file, boolean header) {
        try {
            List<String[]> rows = new ArrayList<>();
            for (String line : Files.readAllLines(folder.resolve(file), StandardCharsets.UTF_8)) {
                if (header) {
                    header = false;
                    continue;
                }
                if (!line.isBlank()) {
                    rows.add(line.split("\t", -1));
                }
            }
            return rows;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** PubChem identifiers (chemical-identifiers-pubchem-small.tsv): one row per compound, keyed by the given field. */
    static Map<String, String[]> identifiersBy(Path folder, int field) {
        Map<String, String[]> out = new HashMap<>();
        for (String[] r : tsv(folder, "chemical-identifiers-pubchem-small.tsv", false)) {
            if (r.length > 6 && !r[field].isBlank()) {
                out.putIfAbsent(r[field], r);
            }
        }
        return out;
    }
}
