package org.cohesa.core.records;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.core.json.JsonReadFeature;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;

/**
 * The one text form of a JSON value that the hash chain is computed over: object keys sorted by their
 * UTF-16 code units, no whitespace, numbers as plain decimals without trailing zeros (so 1.50, 1.5 and
 * 15E-1 are the same "1.5"), strings escaped by Jackson. Because numbers are read back as exact decimals,
 * parsing a canonical text and writing it again gives the same bytes on every platform and JDK.
 */
public final class CanonicalJson {

    /** Significant digits kept when a computed double enters a snapshot: far beyond any input's accuracy. */
    public static final int SIGNIFICANT_DIGITS = 12;

    private static final JsonNodeFactory NODES = JsonNodeFactory.withExactBigDecimals(true);
    private static final ObjectMapper MAPPER = JsonMapper.builder()
            .nodeFactory(NODES)
            .enable(DeserializationFeature.USE_BIG_DECIMAL_FOR_FLOATS)
            .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
            .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION)
            .disable(JsonReadFeature.ALLOW_NON_NUMERIC_NUMBERS)
            .enable(com.fasterxml.jackson.core.JsonGenerator.Feature.WRITE_BIGDECIMAL_AS_PLAIN)
            .build();

    private CanonicalJson() {
    }

    public static JsonNodeFactory nodes() {
        return NODES;
    }

    /** A fresh, empty object node. */
    public static ObjectNode object() {
        return NODES.objectNode();
    }

    /** A fresh, empty array node. */
    public static ArrayNode array() {
        return NODES.arrayNode();
    }

    /** A computed number rounded to {@value #SIGNIFICANT_DIGITS} significant digits as an exact decimal. */
    public static BigDecimal number(double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("a snapshot number must be finite, got " + value);
        }
        return normal(new BigDecimal(value).round(new MathContext(SIGNIFICANT_DIGITS)));
    }

    /** Parses JSON text (numbers as exact decimals); rejects duplicate keys and trailing text. */
    public static JsonNode parse(String text) {
        try {
            return MAPPER.readTree(text);
        } catch (JsonProcessingException e) {
            throw new IllegalArgumentException("not valid JSON: " + e.getOriginalMessage(), e);
        }
    }

    /** The canonical text of {@code node}. */
    public static String write(JsonNode node) {
        try {
            return MAPPER.writeValueAsString(canonical(node));
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a JSON tree always serialises", e);
        }
    }

    /** A deep copy with keys sorted and numbers normalised. */
    public static JsonNode canonical(JsonNode node) {
        if (node == null || node.isNull() || node.isMissingNode()) {
            return NODES.nullNode();
        }
        if (node.isObject()) {
            List<String> keys = new ArrayList<>();
            Iterator<String> it = node.fieldNames();
            it.forEachRemaining(keys::add);
            keys.sort(null);
            ObjectNode out = NODES.objectNode();
            for (String k : keys) {
                out.set(k, canonical(node.get(k)));
            }
            return out;
        }
        if (node.isArray()) {
            ArrayNode out = NODES.arrayNode();
            node.forEach(e -> out.add(canonical(e)));
            return out;
        }
        if (node.isNumber()) {
            if (node.isDouble() || node.isFloat()) {
                return NODES.numberNode(number(node.doubleValue()));
            }
            return NODES.numberNode(normal(node.decimalValue()));
        }
        return node.deepCopy();
    }

    private static BigDecimal normal(BigDecimal d) {
        BigDecimal s = d.stripTrailingZeros();
        // keep integers with a zero scale so 10 stays "10" rather than "1E+1" before plain writing
        return s.scale() < 0 ? s.setScale(0) : s;
    }
}
