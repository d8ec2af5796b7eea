package org.cohesa.cli;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import java.io.PrintWriter;
import java.util.Locale;

/** Formatting shared by the commands: JSON through Jackson, numbers for tables. */
public final class Output {

    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private Output() {
    }

    public static void json(PrintWriter out, Object value) {
        try {
            out.println(JSON.writeValueAsString(value));
            out.flush();
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("cannot write JSON: " + e.getOriginalMessage(), e);
        }
    }

    public static ObjectMapper mapper() {
        return JSON;
    }

    /** A number with {@code decimals} places, or "-" for null. */
    public static String fmt(Double d, int decimals) {
        return d == null ? "-" : String.format(Locale.ROOT, "%." + decimals + "f", d);
    }

    public static String fmt(double d, int decimals) {
        return String.format(Locale.ROOT, "%." + decimals + "f", d);
    }

    /** Rounds for JSON so scripts get stable, readable numbers (null stays null). */
    public static Double round(Double d, int decimals) {
        if (d == null || !Double.isFinite(d)) {
            return d == null ? null : d;
        }
        double f = Math.pow(10, decimals);
        return Math.round(d * f) / f;
    }
}
