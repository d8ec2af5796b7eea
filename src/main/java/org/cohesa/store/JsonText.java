package org.cohesa.store;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.type.TypeReference;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.util.LinkedHashMap;
import java.util.Map;

/** Small JSON columns (source maps, evidence snapshots) through Jackson. */
final class JsonText {

    private static final ObjectMapper MAPPER = new ObjectMapper();

    private JsonText() {
    }

    static Map<String, String> readMap(String json) {
        if (json == null || json.isBlank()) {
            return new LinkedHashMap<>();
        }
        try {
            return MAPPER.readValue(json, new TypeReference<LinkedHashMap<String, String>>() { });
        } catch (JsonProcessingException e) {
            throw new StoreException("a stored JSON column is damaged: " + e.getOriginalMessage(), e);
        }
    }

    static String writeMap(Map<String, String> map) {
        try {
            return MAPPER.writeValueAsString(map);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a string map always serialises", e);
        }
    }
}
