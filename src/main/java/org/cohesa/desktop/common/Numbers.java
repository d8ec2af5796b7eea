package org.cohesa.desktop.common;

import java.util.Locale;

/** Number formats shared by tables, labels, copies and exports (dot decimal separator everywhere). */
public final class Numbers {

    private Numbers() {
    }

    /** One decimal, e.g. Hansen parameters in MPa^½ as the handbook tables print them. */
    public static String one(Double d) {
        return d == null || !Double.isFinite(d) ? "" : String.format(Locale.ROOT, "%.1f", d);
    }

    /** Two decimals, e.g. RED and volume fractions. */
    public static String two(Double d) {
        return d == null || !Double.isFinite(d) ? "" : String.format(Locale.ROOT, "%.2f", d);
    }

    /** Whole number or one decimal as needed, e.g. temperatures. */
    public static String plain(Double d) {
        if (d == null || !Double.isFinite(d)) {
            return "";
        }
        if (d == Math.rint(d) && Math.abs(d) < 1e9) {
            return String.valueOf(d.longValue());
        }
        return String.format(Locale.ROOT, "%.1f", d);
    }

    /** Percentage with no decimals: 0.25 becomes "25 %". */
    public static String percent(double fraction) {
        return String.format(Locale.ROOT, "%.0f %%", fraction * 100);
    }
}
