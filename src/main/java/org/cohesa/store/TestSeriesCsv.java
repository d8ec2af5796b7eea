package org.cohesa.store;

import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
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
 * Reads a series of dissolving tests (one row per liquid) for a sphere fit, in the forms labs write them
 * (docs/methods.md, "Test files"). Header names in any case:
 * <ul>
 * <li>the liquid: {@code liquid}, {@code solvent} or {@code name} — a library solvent (name, synonym or CAS), a
 *     blend {@code NAME:FRACTION;NAME:FRACTION} (volume fractions) in one quoted field, or a label when the
 *     parameters are given explicitly — and/or {@code CAS} (used when the name cell is empty or absent);</li>
 * <li>the result: {@code score}, {@code result} or {@code soluble}: 1, 0 or a graded number between;
 *     {@code yes}/{@code no}/{@code partial} (also {@code y}/{@code n}); {@code +}/{@code -}/{@code ±} (also
 *     {@code +/-}, {@code +-} and the minus sign −);</li>
 * <li>{@code dD}, {@code dP}, {@code dH} (also δD, δP, δH; optional, MPa^½): explicit parameters;</li>
 * <li>{@code temperature_c} (optional): test temperature, °C; {@code note} (optional, ignored).</li>
 * </ul>
 * Separator: comma, semicolon or tab, whichever the header line uses most (outside quotes); with semicolons or
 * tabs a decimal comma in a number ({@code 0,5}) is read as a decimal point. A UTF-8 byte-order mark is skipped.
 * All-or-nothing: every bad cell is listed and nothing is returned unless the whole file is good.
 */
public final class TestSeriesCsv {

    /** The known columns, by role, each with the header names accepted for it (compared without case). */
    public static final Map<String, List<String>> COLUMNS = columns();

    private static Map<String, List<String>> columns() {
        Map<String, List<String>> m = new LinkedHashMap<>();
        m.put("liquid", List.of("liquid", "solvent", "name"));
        m.put("cas", List.of("cas"));
        m.put("score", List.of("score", "result", "soluble"));
        m.put("dD", List.of("dd", "δd"));
        m.put("dP", List.of("dp", "δp"));
        m.put("dH", List.of("dh", "δh"));
        m.put("temperature_c", List.of("temperature_c"));
        m.put("note", List.of("note"));
        return java.util.Collections.unmodifiableMap(m);
    }

    /** Accepted words for a score, each with its value (compared without case). */
    private static final Map<String, Double> WORDS = Map.ofEntries(
            Map.entry("yes", 1.0), Map.entry("y", 1.0), Map.entry("+", 1.0),
            Map.entry("no", 0.0), Map.entry("n", 0.0), Map.entry("-", 0.0), Map.entry("−", 0.0),
            Map.entry("partial", 0.5), Map.entry("±", 0.5), Map.entry("+/-", 0.5), Map.entry("+-", 0.5));

    private TestSeriesCsv() {
    }

    /**
     * @param source  file name for messages
     * @param library the solvent library liquids are resolved against
     * @throws BadRowsException listing every bad cell, when any row is bad
     */
    public static List<TestResult> read(String source, Reader in, SolventLibrary library) throws IOException {
        String text = slurp(in);
        if (text.startsWith("\uFEFF")) {
            text = text.substring(1);
        }
        char sep = separator(text);
        CSVFormat format = CSVFormat.RFC4180.builder().setDelimiter(sep)
                .setHeader().setSkipHeaderRecord(true).setIgnoreEmptyLines(true).setTrim(true)
                .setCommentMarker('#').setAllowDuplicateHeaderNames(true).setAllowMissingColumnNames(true).get();
        List<RowError> errors = new ArrayList<>();
        List<TestResult> out = new ArrayList<>();
        try (CSVParser p = CSVParser.builder().setReader(new StringReader(text)).setFormat(format).get()) {
            List<String> header = p.getHeaderNames();
            Map<String, String> role = roles(header, errors);
            if (!role.containsKey("score")) {
                errors.add(new RowError(1, "score", String.join(String.valueOf(sep), header),
                        "the header has no result column: name it score, result or soluble"));
            }
            boolean explicit = role.containsKey("dD") && role.containsKey("dP") && role.containsKey("dH");
            if (!role.containsKey("liquid") && !role.containsKey("cas") && !explicit) {
                errors.add(new RowError(1, "liquid", String.join(String.valueOf(sep), header),
                        "the header has no liquid column: name it liquid, solvent, name or CAS (or give dD, dP and dH columns)"));
            }
            if (!errors.isEmpty()) {
                throw new BadRowsException(source, errors);
            }
            for (CSVRecord rec : p) {
                long line = rec.getParser().getCurrentLineNumber();
                if (!rec.isConsistent()) {
                    errors.add(new RowError(line, "-", String.valueOf(rec.size()), "row has " + rec.size()
                            + " fields, the header has " + header.size() + (sep == ',' ? " (quote names that hold a comma, e.g. \"1,4-dioxane\")" : "")));
                    continue;
                }
                TestResult r = row(rec, role, sep, line, library, errors);
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

    /** Role → the header name that carries it; unknown and doubled columns are errors. */
    private static Map<String, String> roles(List<String> header, List<RowError> errors) {
        Map<String, String> role = new LinkedHashMap<>();
        for (String h : header) {
            String k = h.strip().toLowerCase(Locale.ROOT);
            String found = null;
            for (Map.Entry<String, List<String>> e : COLUMNS.entrySet()) {
                if (e.getValue().contains(k)) {
                    found = e.getKey();
                }
            }
            if (found == null) {
                errors.add(new RowError(1, h, h, "unknown column; known columns are liquid (or solvent, name), CAS, score (or result, soluble), "
                        + "dD, dP, dH, temperature_c, note"));
            } else if (role.containsKey(found)) {
                errors.add(new RowError(1, h, h, "a second " + found + " column (the first is '" + role.get(found) + "'); keep one"));
            } else {
                role.put(found, h);
            }
        }
        return role;
    }

    private static TestResult row(CSVRecord rec, Map<String, String> role, char sep, long line, SolventLibrary library, List<RowError> errors) {
        int before = errors.size();
        String liquid = cell(rec, role.get("liquid"));
        String cas = cell(rec, role.get("cas"));
        String scoreColumn = role.get("score");
        Double score = score(cell(rec, scoreColumn), scoreColumn, sep, line, errors);
        Double dD = number(rec, role.get("dD"), sep, line, errors, false);
        Double dP = number(rec, role.get("dP"), sep, line, errors, false);
        Double dH = number(rec, role.get("dH"), sep, line, errors, false);
        int given = (dD == null ? 0 : 1) + (dP == null ? 0 : 1) + (dH == null ? 0 : 1);
        HansenParameters point = null;
        String name = !liquid.isEmpty() ? liquid : cas;
        String nameColumn = !liquid.isEmpty() ? role.get("liquid") : role.getOrDefault("cas", "liquid");
        if (given == 3) {
            if (dD < 0 || dP < 0 || dH < 0 || dD > 60 || dP > 60 || dH > 60) {
                errors.add(new RowError(line, "dD/dP/dH", dD + "/" + dP + "/" + dH, "Hansen parameters must lie between 0 and 60 MPa^½"));
            } else {
                point = HansenParameters.of(dD, dP, dH);
            }
        } else if (given != 0) {
            errors.add(new RowError(line, "dD/dP/dH", cell(rec, role.get("dD")) + "/" + cell(rec, role.get("dP")) + "/" + cell(rec, role.get("dH")),
                    "give all three Hansen parameters or none"));
        } else if (name.isEmpty()) {
            errors.add(new RowError(line, nameColumn, "", "name a library solvent or blend (or its CAS number), or give dD, dP and dH"));
        } else {
            point = resolve(name, nameColumn, line, library, errors);
        }
        Double temperature = number(rec, role.get("temperature_c"), sep, line, errors, false);
        if (temperature != null && temperature <= -273.15) {
            errors.add(new RowError(line, role.get("temperature_c"), cell(rec, role.get("temperature_c")), "must be above absolute zero (−273.15 °C)"));
        }
        if (errors.size() > before) {
            return null;
        }
        String label = name.isEmpty() ? "line " + line : name;
        return new TestResult(label, point, score, temperature);
    }

    private static Double score(String v, String column, char sep, long line, List<RowError> errors) {
        if (v.isEmpty()) {
            errors.add(new RowError(line, column, "", "a result is required: 1/0/0.5, yes/no/partial or +/-/±"));
            return null;
        }
        Double word = WORDS.get(v.toLowerCase(Locale.ROOT));
        if (word != null) {
            return word;
        }
        Double d = parse(v, sep);
        if (d == null) {
            errors.add(new RowError(line, column, v, "not a result: write 1, 0 or a graded number between, yes/no/partial, or +/-/±"));
            return null;
        }
        if (d < 0 || d > 1) {
            errors.add(new RowError(line, column, v, "must lie between 0 (does not dissolve) and 1 (dissolves)"));
            return null;
        }
        return d;
    }

    private static HansenParameters resolve(String liquid, String column, long line, SolventLibrary library, List<RowError> errors) {
        try {
            if (liquid.contains(":")) {
                Blend b = library.resolveBlend(column, liquid);
                if (!b.hasHansen()) {
                    String missing = b.solvents().stream().filter(s -> !s.hasHansen()).map(Solvent::name).findFirst().orElse("?");
                    errors.add(new RowError(line, column, liquid, missing + " has no Hansen parameters in the library; give dD, dP and dH"));
                    return null;
                }
                return b.hansen();
            }
            Solvent s = library.resolve(column, liquid);
            if (!s.hasHansen()) {
                errors.add(new RowError(line, column, liquid, "has no Hansen parameters in the library; give dD, dP and dH"));
                return null;
            }
            return s.hansen();
        } catch (InvalidInputException e) {
            errors.add(new RowError(line, column, liquid, e.reason()));
            return null;
        }
    }

    private static String cell(CSVRecord rec, String col) {
        return col != null && rec.isMapped(col) && rec.isSet(col) ? rec.get(col).strip() : "";
    }

    private static Double number(CSVRecord rec, String col, char sep, long line, List<RowError> errors, boolean required) {
        String v = cell(rec, col);
        if (v.isEmpty()) {
            if (required) {
                errors.add(new RowError(line, col, "", "a number is required"));
            }
            return null;
        }
        Double d = parse(v, sep);
        if (d == null) {
            errors.add(new RowError(line, col, v, "not a number (use a dot as decimal separator)"));
        }
        return d;
    }

    /** A finite number; with a semicolon or tab separator a single decimal comma is accepted. */
    private static Double parse(String v, char sep) {
        String s = sep != ',' && v.matches("[+-]?\\d+,\\d+") ? v.replace(',', '.') : v;
        try {
            double d = Double.parseDouble(s);
            return Double.isFinite(d) ? d : null;
        } catch (NumberFormatException e) {
            return null;
        }
    }

    /** The separator the header line uses most outside quotes: comma, semicolon or tab (comma on a tie). */
    static char separator(String text) {
        int start = 0;
        String header = "";
        while (start < text.length()) {
            int end = text.indexOf('\n', start);
            String line = end < 0 ? text.substring(start) : text.substring(start, end);
            start = end < 0 ? text.length() : end + 1;
            if (!line.isBlank() && !line.stripLeading().startsWith("#")) {
                header = line;
                break;
            }
        }
        int comma = 0;
        int semi = 0;
        int tab = 0;
        boolean quoted = false;
        for (char c : header.toCharArray()) {
            if (c == '"') {
                quoted = !quoted;
            } else if (!quoted) {
                comma += c == ',' ? 1 : 0;
                semi += c == ';' ? 1 : 0;
                tab += c == '\t' ? 1 : 0;
            }
        }
        if (tab > comma && tab >= semi) {
            return '\t';
        }
        return semi > comma ? ';' : ',';
    }

    private static String slurp(Reader in) throws IOException {
        StringBuilder b = new StringBuilder();
        char[] buf = new char[8192];
        int n;
        while ((n = in.read(buf)) > 0) {
            b.append(buf, 0, n);
        }
        return b.toString();
    }
}
