package org.cohesa.core.solvent;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.cohesa.core.InvalidInputException;

/**
 * Parses our blend notation {@code NAME:FRACTION,NAME:FRACTION} into names and fractions.
 *
 * <p>Names may themselves contain commas and spaces ({@code 1,4-dioxane:0.3,water:0.7}): a component
 * ends only where a fraction is followed by {@code ,} {@code ;} or the end, so the name is everything up to
 * the colon before that fraction. Fractions may be written as a decimal (0.3) or a percentage (30%).
 */
public final class BlendSpec {

    /** One parsed component: the name as typed and its volume fraction. */
    public record Part(String name, double fraction) {
    }

    private static final Pattern PART = Pattern.compile(
            "\\s*([^:]+?)\\s*:\\s*([-+]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][-+]?\\d+)?)\\s*(%?)\\s*(?:[,;]|$)");

    private BlendSpec() {
    }

    /**
     * @param field the option or column the text came from, for the message
     * @param text  e.g. {@code "1,4-dioxane:0.3,water:0.7"}
     */
    public static List<Part> parse(String field, String text) {
        if (text == null || text.isBlank()) {
            throw new InvalidInputException(field, String.valueOf(text), "empty blend; write NAME:FRACTION,NAME:FRACTION");
        }
        List<Part> parts = new ArrayList<>();
        Matcher m = PART.matcher(text);
        int pos = 0;
        while (pos < text.length()) {
            if (!m.find(pos) || m.start() != pos) {
                throw new InvalidInputException(field, text,
                        "cannot read a NAME:FRACTION pair at '" + text.substring(pos).strip() + "'; write e.g. toluene:0.6,ethanol:0.4");
            }
            double f = Double.parseDouble(m.group(2));
            if (!m.group(3).isEmpty()) {
                f /= 100.0;
            }
            if (f < 0 || f > 1) {
                throw new InvalidInputException(field, text, "fraction of " + m.group(1) + " must lie between 0 and 1, got " + m.group(2) + m.group(3));
            }
            parts.add(new Part(m.group(1), f));
            pos = m.end();
            if (pos == m.start()) {
                break;
            }
        }
        double sum = parts.stream().mapToDouble(Part::fraction).sum();
        if (Math.abs(sum - 1.0) > 1e-6) {
            throw new InvalidInputException(field, text, "fractions must sum to 1, they sum to " + String.format(Locale.ROOT, "%.6g", sum));
        }
        return parts;
    }

    /** Shortest decimal text of a fraction, e.g. 0.3 rather than 0.30000000000000004. */
    public static String formatFraction(double f) {
        BigDecimal bd = new BigDecimal(f).round(new java.math.MathContext(6)).stripTrailingZeros();
        return bd.toPlainString();
    }
}
