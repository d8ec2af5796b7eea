package org.cohesa.store;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.cohesa.core.BadRowsException;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.RowError;
import org.cohesa.core.activity.WaterSolubility;
import org.cohesa.core.activity.WaterSolubilityTable;

/**
 * Reads {@code solvent-db/water-miscibility.csv}, the published mutual solubilities of solvents with water. Columns:
 * name, cas, behaviour ({@code miscible} or {@code partial}), solvent_in_water_wt_pct, water_in_solvent_wt_pct (mass %,
 * empty when miscible), temperature_c, lcst_c, ucst_c (°C, empty when none is published), source (key cited in
 * docs/methods.md), basis ("from memory", "checked against the source", "checked against a handbook" or "checked against a
 * tertiary source"), note. All-or-nothing: every bad cell is listed.
 */
public final class WaterMiscibilityCsv {

    public static final String FILE = "water-miscibility.csv";
    public static final List<String> COLUMNS = List.of("name", "cas", "behaviour", "solvent_in_water_wt_pct", "water_in_solvent_wt_pct",
            "temperature_c", "lcst_c", "ucst_c", "source", "basis", "note");

    private static final CSVFormat READ = CSVFormat.RFC4180.builder()
            .setHeader().setSkipHeaderRecord(true).setIgnoreEmptyLines(true).setTrim(true).get();
    private static WaterSolubilityTable bundled;

    private WaterMiscibilityCsv() {
    }

    /** The table shipped with the program (read once). */
    public static synchronized WaterSolubilityTable bundled() {
        if (bundled == null) {
            BundledData file = BundledData.resource(FILE);
            try (Reader in = new InputStreamReader(new ByteArrayInputStream(file.bytes()), StandardCharsets.UTF_8)) {
                bundled = read(FILE, in);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
        return bundled;
    }

    /** @throws BadRowsException listing every bad cell */
    public static WaterSolubilityTable read(String source, Reader in) throws IOException {
        List<RowError> errors = new ArrayList<>();
        List<WaterSolubility> rows = new ArrayList<>();
        try (CSVParser p = CSVParser.builder().setReader(in).setFormat(READ).get()) {
            List<String> header = p.getHeaderNames();
            for (String col : COLUMNS) {
                if (!header.contains(col)) {
                    errors.add(new RowError(1, col, String.join(",", header), "the header has no '" + col + "' column"));
                }
            }
            if (!errors.isEmpty()) {
                throw new BadRowsException(source, errors);
            }
            Set<String> seen = new HashSet<>();
            for (CSVRecord rec : p) {
                long line = rec.getParser().getCurrentLineNumber();
                if (!rec.isConsistent()) {
                    errors.add(new RowError(line, "-", String.valueOf(rec.size()), "row has " + rec.size() + " fields, the header has " + header.size()));
                    continue;
                }
                int before = errors.size();
                String behaviour = rec.get("behaviour");
                if (!behaviour.equals("miscible") && !behaviour.equals("partial")) {
                    errors.add(new RowError(line, "behaviour", behaviour, "must be 'miscible' or 'partial'"));
                }
                Double s1 = number(rec, "solvent_in_water_wt_pct", line, errors);
                Double s2 = number(rec, "water_in_solvent_wt_pct", line, errors);
                Double t = number(rec, "temperature_c", line, errors);
                Double lcst = number(rec, "lcst_c", line, errors);
                Double ucst = number(rec, "ucst_c", line, errors);
                if (t == null && errors.size() == before) {
                    errors.add(new RowError(line, "temperature_c", "", "the temperature of the values is required"));
                }
                if (rec.get("source").isEmpty()) {
                    errors.add(new RowError(line, "source", "", "every row needs a source key"));
                }
                if (errors.size() > before) {
                    continue;
                }
                try {
                    WaterSolubility row = new WaterSolubility(rec.get("name"), rec.get("cas"), behaviour.equals("miscible"), s1, s2, t, lcst, ucst,
                            rec.get("source"), rec.get("basis"), rec.get("note"));
                    if (!seen.add(row.cas().isEmpty() ? row.name().toLowerCase(Locale.ROOT) : row.cas())) {
                        errors.add(new RowError(line, "cas", row.cas(), "appears twice in the file"));
                    } else {
                        rows.add(row);
                    }
                } catch (InvalidInputException e) {
                    errors.add(new RowError(line, e.field(), e.value(), e.reason()));
                }
            }
        }
        if (!errors.isEmpty()) {
            throw new BadRowsException(source, errors);
        }
        return new WaterSolubilityTable(rows);
    }

    private static Double number(CSVRecord rec, String col, long line, List<RowError> errors) {
        String v = rec.get(col);
        if (v.isEmpty()) {
            return null;
        }
        try {
            double d = Double.parseDouble(v);
            if (!Double.isFinite(d)) {
                throw new NumberFormatException();
            }
            return d;
        } catch (NumberFormatException e) {
            errors.add(new RowError(line, col, v, "not a number (use a dot as decimal separator)"));
            return null;
        }
    }
}
