package org.cohesa.store;

import java.io.IOException;
import java.io.Reader;
import java.io.Writer;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.apache.commons.csv.CSVFormat;
import org.cohesa.core.SpreadsheetCells;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVPrinter;
import org.apache.commons.csv.CSVRecord;
import org.cohesa.core.BadRowsException;
import org.cohesa.core.RowError;
import org.cohesa.core.solvent.Solvent;

/**
 * Reads and writes solvent tables as CSV (RFC 4180, header row, names with commas quoted).
 * Reading is all-or-nothing: every bad cell of the file is reported, and nothing is returned unless
 * the whole file is good.
 */
public final class SolventCsv {

    private static final CSVFormat READ = CSVFormat.RFC4180.builder()
            .setHeader().setSkipHeaderRecord(true).setIgnoreEmptyLines(true).setTrim(true).get();

    private SolventCsv() {
    }

    /**
     * @param source    file name for messages
     * @param userEntry whether the rows are the user's own entries
     * @throws BadRowsException listing every bad cell, when any row is bad
     */
    public static List<Solvent> read(String source, Reader in, boolean userEntry) throws IOException {
        List<RowError> errors = new ArrayList<>();
        List<Solvent> out = new ArrayList<>();
        try (CSVParser p = CSVParser.builder().setReader(in).setFormat(READ).get()) {
            List<String> header = p.getHeaderNames();
            if (!header.contains("name")) {
                errors.add(new RowError(1, "name", String.join(",", header), "the header has no 'name' column"));
                throw new BadRowsException(source, errors);
            }
            Set<String> known = new HashSet<>(SolventFields.EXPORT_COLUMNS);
            known.addAll(SolventFields.LEGACY_COLUMNS);
            for (String h : header) {
                if (!known.contains(h)) {
                    errors.add(new RowError(1, h, h, "unknown column; known columns are those of 'cohesa solvents export'"));
                }
            }
            Set<String> seen = new HashSet<>();
            for (CSVRecord rec : p) {
                long line = rec.getParser().getCurrentLineNumber();
                if (!rec.isConsistent()) {
                    errors.add(new RowError(line, "-", String.valueOf(rec.size()), "row has " + rec.size()
                            + " fields, the header has " + header.size()));
                    continue;
                }
                Map<String, String> row = new LinkedHashMap<>(rec.toMap());
                row.replaceAll((k, v) -> SpreadsheetCells.unguard(v));
                Solvent s = SolventFields.fromRow(row, line, userEntry, errors);
                if (s != null && !seen.add(s.name().toLowerCase(Locale.ROOT))) {
                    errors.add(new RowError(line, "name", s.name(), "appears twice in the file"));
                } else if (s != null) {
                    out.add(s);
                }
            }
        } catch (IllegalStateException | java.io.UncheckedIOException e) {
            errors.add(new RowError(0, "-", "-", "not readable as CSV: " + e.getMessage()));
        }
        if (!errors.isEmpty()) {
            throw new BadRowsException(source, errors);
        }
        return out;
    }

    /** Writes solvents with every column of {@link SolventFields#EXPORT_COLUMNS}; the file reads back unchanged. */
    public static void write(Writer out, List<Solvent> solvents) throws IOException {
        CSVFormat fmt = CSVFormat.RFC4180.builder().setHeader(SolventFields.EXPORT_COLUMNS.toArray(String[]::new)).get();
        try (CSVPrinter printer = new CSVPrinter(out, fmt)) {
            for (Solvent s : solvents) {
                printer.printRecord(SolventFields.toRow(s).values().stream().map(SpreadsheetCells::guard).toList());
            }
        }
    }
}
