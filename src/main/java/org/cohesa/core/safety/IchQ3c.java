package org.cohesa.core.safety;

import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;

/**
 * ICH Q3C(R8) residual-solvent classes, PDEs and Option 1 limits, joined by CAS number, from our curated
 * table {@code ich-q3c.csv}.
 *
 * <p>Source: ICH, <i>Impurities: Guideline for Residual Solvents Q3C(R8)</i>, Step 4, 22 April 2021, Tables 1–4.
 * Option 1 limit (ppm) = 1000 × PDE (mg/day) / dose, with a daily dose of 10 g (the guideline's Option 1).
 * Most rows are recalled from memory of the guideline (each {@link Entry#fromMemory()} says so); the three
 * R8 additions were confirmed from a published summary of the revision.
 */
public final class IchQ3c {

    /** The guideline version every output names. */
    public static final String VERSION = "ICH Q3C(R8), Step 4, 22 April 2021";

    private static final String RESOURCE = "ich-q3c.csv";
    private static final Map<String, Entry> BY_CAS = load();

    /**
     * One row of the guideline's tables.
     *
     * @param cas           CAS number
     * @param name          the guideline's name
     * @param solventClass  1, 2, 3 or 4
     * @param pdeMgPerDay   permitted daily exposure, mg/day (null for classes 1 and 4)
     * @param limitPpm      Option 1 concentration limit, ppm (null for class 4)
     * @param basis         "memory", "r8-summary" or "guideline-text" (read from a stored copy of the guideline text)
     */
    public record Entry(String cas, String name, int solventClass, Double pdeMgPerDay, Double limitPpm, String basis) {

        /** True when the row was recalled from memory and not yet checked against the guideline text. */
        public boolean fromMemory() {
            return "memory".equals(basis);
        }

        /** How the row was checked, in words for reports: "from memory", "R8 addition, ...", "checked against the guideline text". */
        public String basisText() {
            return switch (basis) {
                case "memory" -> "from memory";
                case "r8-summary" -> "R8 addition, confirmed from a published summary";
                case "guideline-text" -> "checked against the guideline text";
                default -> basis;
            };
        }
    }

    private IchQ3c() {
    }

    /** The entry for a CAS number, or empty when the solvent is not listed in the guideline. */
    public static Optional<Entry> byCas(String cas) {
        return cas == null ? Optional.empty() : Optional.ofNullable(BY_CAS.get(cas.strip()));
    }

    /** All entries by CAS, in table order. */
    public static Map<String, Entry> all() {
        return BY_CAS;
    }

    private static Map<String, Entry> load() {
        Map<String, Entry> m = new LinkedHashMap<>();
        try (InputStream in = IchQ3c.class.getResourceAsStream(RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException("missing resource " + RESOURCE);
            }
            CSVFormat fmt = CSVFormat.DEFAULT.builder().setCommentMarker('#').setHeader().setSkipHeaderRecord(true).get();
            for (CSVRecord r : fmt.parse(new InputStreamReader(in, StandardCharsets.UTF_8))) {
                String cas = r.get("cas").strip();
                m.put(cas, new Entry(cas, r.get("name").strip(), Integer.parseInt(r.get("class").strip()),
                        number(r.get("pde_mg_per_day")), number(r.get("option1_limit_ppm")), r.get("basis").strip()));
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read " + RESOURCE, e);
        }
        return Collections.unmodifiableMap(m);
    }

    private static Double number(String s) {
        return s == null || s.isBlank() ? null : Double.valueOf(s.strip());
    }
}
