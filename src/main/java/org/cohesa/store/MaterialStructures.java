package org.cohesa.store;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.cohesa.core.blend.SoluteCharacter;
import org.cohesa.core.target.Material;

/**
 * The structures of materials: {@code solvent-db/material-structures.csv} (name, cas, smiles, source, basis) for the
 * bundled drug substances, and for a user's material the SMILES its centre was estimated from or entered with
 * ({@link StructureEntries}). Used to read a solute's acid–base character ({@link SoluteCharacter}).
 */
public final class MaterialStructures {

    public static final String FILE = "material-structures.csv";
    private static final CSVFormat READ = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).setIgnoreEmptyLines(true).setTrim(true).get();
    private static final String USER_ENTRY = "user entry (structure ";
    private static Map<String, String> bundled;

    private MaterialStructures() {
    }

    private static synchronized Map<String, String> bundled() {
        if (bundled == null) {
            Map<String, String> m = new HashMap<>();
            BundledData file = BundledData.resource(FILE);
            try (Reader in = new InputStreamReader(new ByteArrayInputStream(file.bytes()), StandardCharsets.UTF_8);
                 CSVParser p = CSVParser.builder().setReader(in).setFormat(READ).get()) {
                for (CSVRecord r : p) {
                    m.put(r.get("name").toLowerCase(Locale.ROOT), r.get("smiles"));
                }
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
            bundled = Map.copyOf(m);
        }
        return bundled;
    }

    /** The material's SMILES, or null when none is known. */
    public static String smilesOf(Material m) {
        String s = StructureEntries.estimatedFrom(m.source());
        if (s != null) {
            return s;
        }
        String src = m.source();
        if (src.startsWith(USER_ENTRY) && src.endsWith(")")) {
            return src.substring(USER_ENTRY.length(), src.length() - 1).strip();
        }
        return m.userEntry() ? null : bundled().get(m.name().toLowerCase(Locale.ROOT));
    }

    /** The material's acid–base character from its structure (empty when it has none or no structure is known). */
    public static Set<SoluteCharacter> characterOf(Material m) {
        return SoluteCharacter.ofSmiles(smilesOf(m));
    }
}
