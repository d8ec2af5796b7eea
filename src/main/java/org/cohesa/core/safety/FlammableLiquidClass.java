package org.cohesa.core.safety;

/**
 * GHS flammable-liquid category and UN transport packing group from the closed-cup flash point and the
 * initial boiling point, both in °C.
 *
 * <p>GHS: UN, <i>Globally Harmonized System of Classification and Labelling of Chemicals</i>, Rev. 10 (2023),
 * Chapter 2.6, Table 2.6.1: Category 1 flash point &lt; 23 °C and initial boiling point ≤ 35 °C; Category 2
 * flash point &lt; 23 °C and initial boiling point &gt; 35 °C; Category 3 flash point ≥ 23 °C and ≤ 60 °C;
 * Category 4 flash point &gt; 60 °C and ≤ 93 °C. (Category 4 is not adopted by CLP in the EU.)
 *
 * <p>Transport: UN, <i>Recommendations on the Transport of Dangerous Goods, Model Regulations</i>, Rev. 23
 * (2023), Class 3 (2.3.1.1: flash point not more than 60 °C closed cup) and 2.3.2.6 (packing groups):
 * PG I initial boiling point ≤ 35 °C; PG II flash point &lt; 23 °C and initial boiling point &gt; 35 °C;
 * PG III flash point ≥ 23 °C and ≤ 60 °C with initial boiling point &gt; 35 °C. Section numbers from memory.
 * Not modelled: the sustained-combustibility exemption for flash points above 35 °C (2.3.1.3, GHS 2.6.4.5)
 * and the viscous-liquid rules (2.3.2.2); the transport of liquids at or above their flash point.
 */
public final class FlammableLiquidClass {

    /** GHS Table 2.6.1 boundaries, °C. */
    static final double FP_HIGHLY = 23.0;
    static final double IBP_EXTREME = 35.0;
    static final double FP_CAT3_MAX = 60.0;
    static final double FP_CAT4_MAX = 93.0;

    /**
     * A GHS category with the reason in words.
     *
     * @param category 1–4, or null when not a flammable liquid (or not decidable)
     * @param basis    why, e.g. "flash point 12.0 °C < 23 °C and initial boiling point 78.2 °C > 35 °C"
     */
    public record GhsCategory(Integer category, String basis) {
    }

    private FlammableLiquidClass() {
    }

    /**
     * GHS category; {@code flashPointC} null means no flash point (not flammable). When the flash point is below
     * 23 °C and the initial boiling point is unknown the stricter Category 1 is returned and the basis says so.
     */
    public static GhsCategory ghs(Double flashPointC, Double initialBoilingPointC) {
        if (flashPointC == null) {
            return new GhsCategory(null, "no flash point: not a flammable liquid under GHS 2.6");
        }
        double fp = flashPointC;
        if (fp < FP_HIGHLY) {
            if (initialBoilingPointC == null) {
                return new GhsCategory(1, "flash point " + c(fp) + " < 23 °C; initial boiling point unknown, so the stricter Category 1 is assumed");
            }
            return initialBoilingPointC <= IBP_EXTREME
                    ? new GhsCategory(1, "flash point " + c(fp) + " < 23 °C and initial boiling point " + c(initialBoilingPointC) + " ≤ 35 °C")
                    : new GhsCategory(2, "flash point " + c(fp) + " < 23 °C and initial boiling point " + c(initialBoilingPointC) + " > 35 °C");
        }
        if (fp <= FP_CAT3_MAX) {
            return new GhsCategory(3, "23 °C ≤ flash point " + c(fp) + " ≤ 60 °C");
        }
        if (fp <= FP_CAT4_MAX) {
            return new GhsCategory(4, "60 °C < flash point " + c(fp) + " ≤ 93 °C (Category 4 is not adopted by CLP)");
        }
        return new GhsCategory(null, "flash point " + c(fp) + " > 93 °C: not a flammable liquid under GHS 2.6");
    }

    /**
     * UN packing group "I", "II" or "III" for a Class 3 liquid, or null when the liquid is not in Class 3
     * (no flash point, or flash point above 60 °C). An unknown initial boiling point with a flash point below
     * 23 °C gives the stricter "I".
     */
    public static String packingGroup(Double flashPointC, Double initialBoilingPointC) {
        if (flashPointC == null || flashPointC > FP_CAT3_MAX) {
            return null;
        }
        if (initialBoilingPointC == null) {
            return flashPointC < FP_HIGHLY ? "I" : "III";
        }
        if (initialBoilingPointC <= IBP_EXTREME) {
            return "I";
        }
        return flashPointC < FP_HIGHLY ? "II" : "III";
    }

    private static String c(double v) {
        return String.format(java.util.Locale.ROOT, "%.1f °C", v);
    }
}
