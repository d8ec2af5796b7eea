package org.cohesa.store;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Pattern;
import org.cohesa.core.RowError;
import org.cohesa.core.hsp.HansenParameters;
import org.cohesa.core.solvent.Antoine;
import org.cohesa.core.solvent.ExposureLimit;
import org.cohesa.core.solvent.FireData;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.solvent.UnifacAssignment;
import org.cohesa.core.solvent.VapourCorrelation;

/**
 * The one definition of a solvent's fields as text: the CSV columns of {@code solvent-db/solvents.csv},
 * of user import/export files, the database columns and the JSON field names are all these names.
 */
public final class SolventFields {

    /** Value columns, in file order. */
    public static final List<String> VALUES = List.of(
            "name", "synonyms", "cas", "formula", "smiles", "family", "families",
            "molar_mass", "density", "molar_volume", "dD", "dP", "dH",
            "boiling_point_c", "melting_point_c", "flash_point_c", "autoignition_c", "lfl_pct", "ufl_pct",
            "vp_equation", "vp_c1", "vp_c2", "vp_c3", "vp_c4", "vp_c5", "vp_tmin_k", "vp_tmax_k", "vp_tc_k", "vp_pc_pa",
            "hvap_kj_mol", "oel_twa_ppm", "oel_stel_ppm", "oel_ceiling_ppm", "oel_skin", "oel_jurisdiction",
            "hazard_statements", "peroxide_former", "ich_class", "unifac_groups");

    /** Property groups that carry a source key; the CSV column is {@code src_} + group. */
    public static final List<String> SOURCE_GROUPS = List.of(
            "identity", "smiles", "molar_mass", "density", "hsp", "boiling_point", "melting_point", "flash_point", "autoignition",
            "flammability_limits", "vapour_pressure", "hvap", "oel", "hazard_statements", "peroxide_former", "ich", "unifac");

    /** The vapour-pressure coefficient columns c1…c5 (their meaning depends on {@code vp_equation}, see solvent-db/README.md). */
    public static final List<String> VP_COEFFICIENTS = List.of("vp_c1", "vp_c2", "vp_c3", "vp_c4", "vp_c5");

    /**
     * Older columns still accepted in user files (schema before version 5): the Antoine log10/Pa/K constants and their
     * source key. They are read as an {@code antoine-log10} correlation and never written.
     */
    public static final List<String> LEGACY_COLUMNS = List.of(
            "antoine_a", "antoine_b", "antoine_c", "antoine_tmin_k", "antoine_tmax_k", "src_antoine");

    /** Columns of a user export: values, price, sources, note. */
    public static final List<String> EXPORT_COLUMNS;

    static {
        List<String> cols = new ArrayList<>(VALUES);
        cols.add("price_per_litre");
        SOURCE_GROUPS.forEach(g -> cols.add("src_" + g));
        cols.add("note");
        EXPORT_COLUMNS = List.copyOf(cols);
    }

    private static final List<String> NUMERIC = List.of(
            "molar_mass", "density", "molar_volume", "dD", "dP", "dH",
            "boiling_point_c", "melting_point_c", "flash_point_c", "autoignition_c", "lfl_pct", "ufl_pct",
            "vp_c1", "vp_c2", "vp_c3", "vp_c4", "vp_c5", "vp_tmin_k", "vp_tmax_k", "vp_tc_k", "vp_pc_pa",
            "antoine_a", "antoine_b", "antoine_c", "antoine_tmin_k", "antoine_tmax_k",
            "hvap_kj_mol", "oel_twa_ppm", "oel_stel_ppm", "oel_ceiling_ppm", "price_per_litre");

    private static final Pattern CAS = Pattern.compile("\\d{2,7}-\\d{2}-\\d");
    private static final Pattern H_CODE = Pattern.compile("(EU)?H\\d{3}[A-Za-z]{0,2}(\\+H\\d{3}[A-Za-z]{0,2})*");

    private SolventFields() {
    }

    public static boolean isNumeric(String column) {
        return NUMERIC.contains(column);
    }

    /**
     * Builds a solvent from text cells, adding every problem to {@code errors} (so a whole file can be
     * checked before anything is stored). Returns null when the row has errors.
     */
    public static Solvent fromRow(Map<String, String> row, long line, boolean userEntry, List<RowError> errors) {
        int before = errors.size();
        Cells c = new Cells(row, line, errors);
        String name = c.text("name");
        if (name == null) {
            errors.add(new RowError(line, "name", "", "a name is required"));
        }
        String cas = c.text("cas");
        if (cas != null && !validCas(cas)) {
            errors.add(new RowError(line, "cas", cas, "not a valid CAS number (form 1234-56-7 with a correct check digit)"));
        }
        Double mm = c.positive("molar_mass");
        Double rho = c.positive("density");
        Double vm = c.positive("molar_volume");
        Double dD = c.nonNegative("dD");
        Double dP = c.nonNegative("dP");
        Double dH = c.nonNegative("dH");
        int hspCount = (dD == null ? 0 : 1) + (dP == null ? 0 : 1) + (dH == null ? 0 : 1);
        if (hspCount != 0 && hspCount != 3 && errors.size() == before) {
            errors.add(new RowError(line, "dD/dP/dH", c.raw("dD") + "/" + c.raw("dP") + "/" + c.raw("dH"),
                    "give all three Hansen parameters or none"));
        }
        Double bp = c.number("boiling_point_c");
        Double mp = c.number("melting_point_c");
        if (bp != null && mp != null && mp >= bp) {
            errors.add(new RowError(line, "melting_point_c", c.raw("melting_point_c"), "melting point must be below the boiling point " + bp));
        }
        FireData fire = new FireData(c.number("flash_point_c"), c.number("autoignition_c"), c.percent("lfl_pct"), c.percent("ufl_pct"));
        VapourCorrelation vapour = vapourCorrelation(c, line, errors, before);
        Double hvap = c.positive("hvap_kj_mol");
        ExposureLimit oel = new ExposureLimit(c.positive("oel_twa_ppm"), c.positive("oel_stel_ppm"), c.positive("oel_ceiling_ppm"),
                c.flag("oel_skin"), c.text("oel_jurisdiction"));
        List<String> hazards = new ArrayList<>();
        String hText = c.text("hazard_statements");
        if (hText != null) {
            for (String h : hText.trim().split("[\\s,;]+")) {
                if (!H_CODE.matcher(h).matches()) {
                    errors.add(new RowError(line, "hazard_statements", h, "not a GHS hazard code such as H225 or H361d"));
                } else {
                    hazards.add(h);
                }
            }
        }
        boolean peroxide = c.flag("peroxide_former");
        Integer ich = null;
        String ichText = c.text("ich_class");
        if (ichText != null) {
            if (!ichText.matches("[123]")) {
                errors.add(new RowError(line, "ich_class", ichText, "ICH Q3C class must be 1, 2 or 3 (empty when not listed)"));
            } else {
                ich = Integer.parseInt(ichText);
            }
        }
        UnifacAssignment unifac = UnifacAssignment.NONE;
        String uText = c.text("unifac_groups");
        if (uText != null) {
            try {
                unifac = UnifacAssignment.parse(uText);
            } catch (IllegalArgumentException e) {
                errors.add(new RowError(line, "unifac_groups", uText, e.getMessage()));
            }
        }
        Double price = c.nonNegative("price_per_litre");
        Map<String, String> sources = new LinkedHashMap<>();
        for (String g : SOURCE_GROUPS) {
            String s = c.text("src_" + g);
            if (s != null) {
                sources.put(g, s);
            }
        }
        if (!sources.containsKey("vapour_pressure") && c.text("src_antoine") != null) {
            sources.put("vapour_pressure", c.text("src_antoine"));
        }
        if (errors.size() > before) {
            return null;
        }
        List<String> synonyms = c.text("synonyms") == null ? List.of()
                : Arrays.stream(c.text("synonyms").split(";")).map(String::strip).filter(x -> !x.isEmpty()).toList();
        List<String> families = c.text("families") == null ? List.of()
                : Arrays.stream(c.text("families").split(";")).map(String::strip).filter(x -> !x.isEmpty()).toList();
        return new Solvent(name, synonyms, cas, c.text("formula"), c.text("smiles"), c.text("family"), families, mm, rho, vm,
                hspCount == 3 ? new HansenParameters(dD, dP, dH) : null, bp, mp, fire, vapour, hvap, oel, hazards, peroxide,
                ich, unifac, price, sources, c.text("note"), userEntry);
    }

    /** The solvent as text cells keyed by {@link #EXPORT_COLUMNS}; empty string for unknown values. */
    public static Map<String, String> toRow(Solvent s) {
        Map<String, String> r = new LinkedHashMap<>();
        r.put("name", s.name());
        r.put("synonyms", String.join(";", s.synonyms()));
        r.put("cas", text(s.cas()));
        r.put("formula", text(s.formula()));
        r.put("smiles", text(s.smiles()));
        r.put("family", text(s.family()));
        r.put("families", String.join(";", s.families()));
        r.put("molar_mass", num(s.molarMass()));
        r.put("density", num(s.density()));
        r.put("molar_volume", num(s.molarVolume()));
        HansenParameters h = s.hansen();
        r.put("dD", h == null ? "" : num(h.dD()));
        r.put("dP", h == null ? "" : num(h.dP()));
        r.put("dH", h == null ? "" : num(h.dH()));
        r.put("boiling_point_c", num(s.boilingPointC()));
        r.put("melting_point_c", num(s.meltingPointC()));
        r.put("flash_point_c", num(s.fire().flashPointC()));
        r.put("autoignition_c", num(s.fire().autoignitionC()));
        r.put("lfl_pct", num(s.fire().lflPct()));
        r.put("ufl_pct", num(s.fire().uflPct()));
        VapourCorrelation vp = s.vapourPressure();
        r.put("vp_equation", vp == null ? "" : vp.equation());
        for (int i = 0; i < VP_COEFFICIENTS.size(); i++) {
            r.put(VP_COEFFICIENTS.get(i), vp == null ? "" : num(vp.coefficients().get(i)));
        }
        r.put("vp_tmin_k", vp == null ? "" : num(vp.tminK()));
        r.put("vp_tmax_k", vp == null ? "" : num(vp.tmaxK()));
        r.put("vp_tc_k", vp == null ? "" : num(vp.tcK()));
        r.put("vp_pc_pa", vp == null ? "" : num(vp.pcPa()));
        r.put("hvap_kj_mol", num(s.hvapKjPerMol()));
        r.put("oel_twa_ppm", num(s.exposure().twaPpm()));
        r.put("oel_stel_ppm", num(s.exposure().stelPpm()));
        r.put("oel_ceiling_ppm", num(s.exposure().ceilingPpm()));
        r.put("oel_skin", s.exposure().skin() ? "yes" : "");
        r.put("oel_jurisdiction", text(s.exposure().jurisdiction()));
        r.put("hazard_statements", String.join(" ", s.hazardStatements()));
        r.put("peroxide_former", s.peroxideFormer() ? "yes" : "");
        r.put("ich_class", s.ichClass() == null ? "" : s.ichClass().toString());
        r.put("unifac_groups", s.unifac().format());
        r.put("price_per_litre", num(s.pricePerLitre()));
        for (String g : SOURCE_GROUPS) {
            r.put("src_" + g, text(s.sources().get(g)));
        }
        if (vp != null && r.get("src_vapour_pressure").isEmpty() && vp.source() != null) {
            r.put("src_vapour_pressure", vp.source());
        }
        r.put("note", text(s.note()));
        return r;
    }

    /**
     * The vapour-pressure correlation of a row: the {@code vp_*} columns, or the older five Antoine columns of a user
     * file. Every problem is added to {@code errors}; returns null when the row gives none or has errors.
     */
    private static VapourCorrelation vapourCorrelation(Cells c, long line, List<RowError> errors, int before) {
        String source = c.text("src_vapour_pressure") != null ? c.text("src_vapour_pressure") : c.text("src_antoine");
        List<String> legacy = List.of("antoine_a", "antoine_b", "antoine_c", "antoine_tmin_k", "antoine_tmax_k");
        List<String> modern = new ArrayList<>(VP_COEFFICIENTS);
        modern.addAll(List.of("vp_tmin_k", "vp_tmax_k", "vp_tc_k", "vp_pc_pa"));
        boolean anyLegacy = legacy.stream().anyMatch(col -> c.text(col) != null);
        boolean anyModern = c.text("vp_equation") != null || modern.stream().anyMatch(col -> c.text(col) != null);
        if (anyLegacy && anyModern) {
            errors.add(new RowError(line, "antoine_a", c.raw("antoine_a"),
                    "give the vapour pressure either as vp_equation and vp_* columns or as the older antoine_* columns, not both"));
            return null;
        }
        if (anyLegacy) {
            Double a = c.number("antoine_a");
            Double b = c.number("antoine_b");
            Double cc = c.number("antoine_c");
            Double tmin = c.positive("antoine_tmin_k");
            Double tmax = c.positive("antoine_tmax_k");
            int count = (a == null ? 0 : 1) + (b == null ? 0 : 1) + (cc == null ? 0 : 1) + (tmin == null ? 0 : 1) + (tmax == null ? 0 : 1);
            if (errors.size() > before) {
                return null;
            }
            if (count != 5) {
                errors.add(new RowError(line, "antoine_a..antoine_tmax_k", c.raw("antoine_a"), "give all five Antoine values or none"));
                return null;
            }
            if (tmax <= tmin) {
                errors.add(new RowError(line, "antoine_tmax_k", c.raw("antoine_tmax_k"), "must be above antoine_tmin_k " + tmin));
                return null;
            }
            return new Antoine(a, b, cc, tmin, tmax, source);
        }
        if (!anyModern) {
            return null;
        }
        List<Double> coefficients = new ArrayList<>();
        for (String col : VP_COEFFICIENTS) {
            coefficients.add(c.number(col));
        }
        Double tmin = c.positive("vp_tmin_k");
        Double tmax = c.positive("vp_tmax_k");
        Double tc = c.positive("vp_tc_k");
        Double pc = c.positive("vp_pc_pa");
        if (errors.size() > before) {
            return null;
        }
        String equation = c.text("vp_equation");
        if (equation == null) {
            errors.add(new RowError(line, "vp_equation", "", "name the equation of the vp_* coefficients (e.g. antoine-log10, dippr-101, wagner-2.5-5)"));
            return null;
        }
        try {
            return VapourCorrelation.of(equation, coefficients, tmin, tmax, tc, pc, source);
        } catch (IllegalArgumentException e) {
            errors.add(new RowError(line, "vp_equation", equation, e.getMessage()));
            return null;
        }
    }

    /** CAS check digit: the last digit equals Σ(i·dᵢ) mod 10 over the other digits, counted from the right. */
    public static boolean validCas(String cas) {
        if (!CAS.matcher(cas).matches()) {
            return false;
        }
        String digits = cas.replace("-", "");
        int check = digits.charAt(digits.length() - 1) - '0';
        int sum = 0;
        for (int i = digits.length() - 2, w = 1; i >= 0; i--, w++) {
            sum += w * (digits.charAt(i) - '0');
        }
        return sum % 10 == check;
    }

    static String num(Double d) {
        if (d == null) {
            return "";
        }
        if (d == Math.rint(d) && Math.abs(d) < 1e15) {
            return String.valueOf(d.longValue());
        }
        return new java.math.BigDecimal(d).round(new java.math.MathContext(10)).stripTrailingZeros().toPlainString();
    }

    private static String text(String s) {
        return s == null ? "" : s;
    }

    /** Reads typed values from a row, recording each refusal. */
    private static final class Cells {
        private final Map<String, String> row;
        private final long line;
        private final List<RowError> errors;

        Cells(Map<String, String> row, long line, List<RowError> errors) {
            this.row = row;
            this.line = line;
            this.errors = errors;
        }

        String raw(String col) {
            String v = row.get(col);
            return v == null ? "" : v;
        }

        String text(String col) {
            String v = row.get(col);
            return v == null || v.isBlank() ? null : v.strip();
        }

        Double number(String col) {
            String v = text(col);
            if (v == null) {
                return null;
            }
            try {
                double d = Double.parseDouble(v);
                if (!Double.isFinite(d) || v.indexOf(',') >= 0) {
                    throw new NumberFormatException();
                }
                return d;
            } catch (NumberFormatException e) {
                errors.add(new RowError(line, col, v, "not a number (use a dot as decimal separator)"));
                return null;
            }
        }

        Double nonNegative(String col) {
            Double d = number(col);
            if (d != null && d < 0) {
                errors.add(new RowError(line, col, raw(col), "must not be negative"));
                return null;
            }
            return d;
        }

        Double positive(String col) {
            Double d = number(col);
            if (d != null && d <= 0) {
                errors.add(new RowError(line, col, raw(col), "must be positive"));
                return null;
            }
            return d;
        }

        Double percent(String col) {
            Double d = nonNegative(col);
            if (d != null && d > 100) {
                errors.add(new RowError(line, col, raw(col), "a volume percentage must lie between 0 and 100"));
                return null;
            }
            return d;
        }

        boolean flag(String col) {
            String v = text(col);
            return v != null && (v.equalsIgnoreCase("yes") || v.equalsIgnoreCase("true") || v.equals("1"));
        }
    }
}
