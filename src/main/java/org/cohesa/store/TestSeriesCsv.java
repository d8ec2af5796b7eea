package org.cohesa.store;

import java.io.IOException;
import java.io.Reader;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.cohesa.core.BadRowsException;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.RowError;
import org.cohesa.core.hsp.HansenParameters;
import org.cohesa.core.solvent.Blend;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.solvent.SolventLibrary;
import org.cohesa.core.target.TestResult;

/**
 * Reads a series of dissolving tests (one row per liquid) for a sphere fit. Columns:
 * <ul>
 * <li>{@code liquid}: a library solvent (name, synonym or CAS), or a blend {@code NAME:FRACTION;NAME:FRACTION}
 *     (volume fractions) in one quoted field, or a label when the parameters are given explicitly;</li>
 * <li>{@code score}: 1 dissolves, 0 does not, graded values between (partial swelling);</li>
 * <li>{@code dD}, {@code dP}, {@code dH} (optional, MPa^½): explicit parameters for liquids not in the library;</li>
 * <li>{@code temperature_c} (optional): test temperature, °C; {@code note} (optional, ignored).</li>
 * </ul>
 * All-or-nothing: every bad cell is listed and nothing is returned unless the whole file is good.
 */
public final class TestSeriesCsv {

    /** The known columns. */
    public static final List<String> COLUMNS = List.of("liquid", "score", "dD", "dP", "dH", "temperature_c", "note");

    private static final CSVFormat READ = CSVFormat.RFC4180.builder()
            .setHeader().setSkipHeaderRecord(true).setIgnoreEmptyLines(true).setTrim(true)
            .setCommentMarker('#').get();

    private TestSeriesCsv() {
    }

    /**
     * @param source  file name for messages
     * @param library the solvent library liquids are resolved against
     * @throws BadRowsException listing every bad cell, when any row is bad
     */
    public static List<TestResult> read(String source, Reader in, SolventLibrary library) throws IOException {
        List<RowError> errors = new ArrayList<>();
        List<TestResult> out = new ArrayList<>();
        try (CSVParser p = CSVParser.builder().setReader(in).setFormat(READ).get()) {
            List<String> header = p.getHeaderNames();
            if (!header.contains("score")) {
                errors.add(new RowError(1, "score", String.join(",", header), "the header has no 'score' column"));
            }
            boolean explicit = header.contains("dD") && header.contains("dP") && header.contains("dH");
            if (!header.contains("liquid") && !explicit) {
                errors.add(new RowError(1, "liquid", String.join(",", header), "the header needs a 'liquid' column or dD, dP and dH columns"));
            }
            for (String h : header) {
                if (!COLUMNS.contains(h)) {
                    errors.add(new RowError(1, h, h, "unknown column; known columns are " + String.join(", ", COLUMNS)));
                }
            }
            if (!errors.isEmpty()) {
                throw new BadRowsException(source, errors);
            }
            for (CSVRecord rec : p) {
                long line = rec.getParser().getCurrentLineNumber();
                if (!rec.isConsistent()) {
                    errors.add(new RowError(line, "-", String.valueOf(rec.size()), "row has " + rec.size()
                            + " fields, the header has " + header.size()));
                    continue;
                }
                TestResult r = row(rec, line, library, errors);
                if (r != null) {
                    out.add(r);
                }
            }
        }
        if (errors.isEmpty() && out.isEmpty()) {
            errors.add(new RowError(2, "-", "", "the file holds no test results"));
        }
        if (!errors.isEmpty()) {
            throw new BadRowsException(source, errors);
        }
        return out;
    }

    private static TestResult row(CSVRecord rec, long line, SolventLibrary library, List<RowError> errors) {
        int before = errors.size();
        String liquid = cell(rec, "liquid");
        Double score = number(rec, "score", line, errors, true);
        if (score != null && (score < 0 || score > 1)) {
            errors.add(new RowError(line, "score", cell(rec, "score"), "must lie between 0 (does not dissolve) and 1 (dissolves)"));
        }
        Double dD = number(rec, "dD", line, errors, false);
        Double dP = number(rec, "dP", line, errors, false);
        Double dH = number(rec, "dH", line, errors, false);
        int given = (dD == null ? 0 : 1) + (dP == null ? 0 : 1) + (dH == null ? 0 : 1);
        HansenParameters point = null;
        if (given == 3) {
            if (dD < 0 || dP < 0 || dH < 0 || dD > 60 || dP > 60 || dH > 60) {
                errors.add(new RowError(line, "dD/dP/dH", cell(rec, "dD") + "/" + cell(rec, "dP") + "/" + cell(rec, "dH"),
                        "Hansen parameters must lie between 0 and 60 MPa^½"));
            } else {
                point = HansenParameters.of(dD, dP, dH);
            }
        } else if (given != 0) {
            errors.add(new RowError(line, "dD/dP/dH", cell(rec, "dD") + "/" + cell(rec, "dP") + "/" + cell(rec, "dH"),
                    "give all three Hansen parameters or none"));
        } else if (liquid.isEmpty()) {
            errors.add(new RowError(line, "liquid", "", "name a library solvent or blend, or give dD, dP and dH"));
        } else {
            point = resolve(liquid, line, library, errors);
        }
        Double temperature = number(rec, "temperature_c", line, errors, false);
        if (temperature != null && temperature <= -273.15) {
            errors.add(new RowError(line, "temperature_c", cell(rec, "temperature_c"), "must be above absolute zero (−273.15 °C)"));
        }
        if (errors.size() > before) {
            return null;
        }
        String label = liquid.isEmpty() ? "line " + line : liquid;
        return new TestResult(label, point, score, temperature);
    }

    private static HansenParameters resolve(String liquid, long line, SolventLibrary library, List<RowError> errors) {
        try {
            if (liquid.contains(":")) {
                Blend b = library.resolveBlend("liquid", liquid);
                if (!b.hasHansen()) {
                    String missing = b.solvents().stream().filter(s -> !s.hasHansen()).map(Solvent::name).findFirst().orElse("?");
                    errors.add(new RowError(line, "liquid", liquid, missing + " has no Hansen parameters in the library; give dD, dP and dH"));
                    return null;
                }
                return b.hansen();
            }
            Solvent s = library.resolve("liquid", liquid);
            if (!s.hasHansen()) {
                errors.add(new RowError(line, "liquid", liquid, "has no Hansen parameters in the library; give dD, dP and dH"));
                return null;
            }
            return s.hansen();
        } catch (InvalidInputException e) {
            errors.add(new RowError(line, "liquid", liquid, e.reason()));
            return null;
        }
    }

    private static String cell(CSVRecord rec, String col) {
        return rec.isMapped(col) && rec.isSet(col) ? rec.get(col).strip() : "";
    }

    private static Double number(CSVRecord rec, String col, long line, List<RowError> errors, boolean required) {
        String v = cell(rec, col);
        if (v.isEmpty()) {
            if (required) {
                errors.add(new RowError(line, col, "", "a number is required"));
            }
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
