package org.cohesa.store;

import java.io.IOException;
import java.io.Reader;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.cohesa.core.BadRowsException;
import org.cohesa.core.RowError;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.target.Material;
import org.cohesa.core.target.MaterialKind;

/**
 * Reads material tables ({@code solvent-db/materials.csv}): columns name, synonyms (separated by {@code ;}),
 * kind, dD, dP, dH, r0 (MPa^½), source, note. All-or-nothing: every bad cell is listed.
 */
public final class MaterialCsv {

    /** The columns, in file order. */
    public static final List<String> COLUMNS = List.of("name", "synonyms", "kind", "dD", "dP", "dH", "r0", "source", "note");

    private static final Set<String> REQUIRED = Set.of("name", "kind", "dD", "dP", "dH", "r0", "source");

    private static final CSVFormat READ = CSVFormat.RFC4180.builder()
            .setHeader().setSkipHeaderRecord(true).setIgnoreEmptyLines(true).setTrim(true).get();

    private MaterialCsv() {
    }

    /**
     * @param source    file name for messages
     * @param userEntry whether the rows are the user's own materials
     * @throws BadRowsException listing every bad cell, when any row is bad
     */
    public static List<Material> read(String source, Reader in, boolean userEntry) throws IOException {
        List<RowError> errors = new ArrayList<>();
        List<Material> out = new ArrayList<>();
        try (CSVParser p = CSVParser.builder().setReader(in).setFormat(READ).get()) {
            List<String> header = p.getHeaderNames();
            for (String col : REQUIRED) {
                if (!header.contains(col)) {
                    errors.add(new RowError(1, col, String.join(",", header), "the header has no '" + col + "' column"));
                }
            }
            for (String h : header) {
                if (!COLUMNS.contains(h)) {
                    errors.add(new RowError(1, h, h, "unknown column; known columns are " + String.join(", ", COLUMNS)));
                }
            }
            if (!errors.isEmpty()) {
                throw new BadRowsException(source, errors);
            }
            Set<String> seen = new HashSet<>();
            for (CSVRecord rec : p) {
                long line = rec.getParser().getCurrentLineNumber();
                if (!rec.isConsistent()) {
                    errors.add(new RowError(line, "-", String.valueOf(rec.size()), "row has " + rec.size()
                            + " fields, the header has " + header.size()));
                    continue;
                }
                Material m = row(rec, line, userEntry, errors);
                if (m != null && !seen.add(m.name().toLowerCase(Locale.ROOT))) {
                    errors.add(new RowError(line, "name", m.name(), "appears twice in the file"));
                } else if (m != null) {
                    out.add(m);
                }
            }
        }
        if (!errors.isEmpty()) {
            throw new BadRowsException(source, errors);
        }
        return out;
    }

    private static Material row(CSVRecord rec, long line, boolean userEntry, List<RowError> errors) {
        int before = errors.size();
        String name = cell(rec, "name");
        if (name.isEmpty()) {
            errors.add(new RowError(line, "name", "", "a name is required"));
        }
        MaterialKind kind = null;
        try {
            kind = MaterialKind.parse(cell(rec, "kind"));
        } catch (IllegalArgumentException e) {
            errors.add(new RowError(line, "kind", cell(rec, "kind"), "must be one of " + MaterialKind.allowed()));
        }
        double dD = number(rec, "dD", line, errors, false);
        double dP = number(rec, "dP", line, errors, false);
        double dH = number(rec, "dH", line, errors, false);
        double r0 = number(rec, "r0", line, errors, true);
        String src = cell(rec, "source");
        if (src.isEmpty()) {
            errors.add(new RowError(line, "source", "", "every material needs a source key"));
        }
        if (errors.size() > before) {
            return null;
        }
        List<String> synonyms = Arrays.stream(cell(rec, "synonyms").split(";")).map(String::strip).filter(s -> !s.isEmpty()).toList();
        String note = cell(rec, "note");
        return new Material(name, synonyms, kind, SolubilitySphere.of(dD, dP, dH, r0), src, note.isEmpty() ? null : note, userEntry);
    }

    private static String cell(CSVRecord rec, String col) {
        return rec.isMapped(col) && rec.isSet(col) ? rec.get(col).strip() : "";
    }

    private static double number(CSVRecord rec, String col, long line, List<RowError> errors, boolean strictlyPositive) {
        String v = cell(rec, col);
        if (v.isEmpty()) {
            errors.add(new RowError(line, col, "", "a number is required (MPa^½)"));
            return Double.NaN;
        }
        double d;
        try {
            d = Double.parseDouble(v);
        } catch (NumberFormatException e) {
            errors.add(new RowError(line, col, v, "not a number (use a dot as decimal separator)"));
            return Double.NaN;
        }
        if (!Double.isFinite(d) || d < 0 || (strictlyPositive && d == 0) || d > 60) {
            errors.add(new RowError(line, col, v, strictlyPositive ? "must be a positive number up to 60 MPa^½"
                    : "must be a number from 0 to 60 MPa^½"));
            return Double.NaN;
        }
        return d;
    }
}
