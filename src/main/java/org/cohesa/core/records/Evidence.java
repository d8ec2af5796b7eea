package org.cohesa.core.records;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * The evidence snapshot filed with a record: named sections (liquids, target, comparison, drying, safety,
 * data sources, app version …) frozen as canonical JSON at the moment the record was made. Later changes
 * to the solvent library never alter a filed snapshot; reports render from it alone.
 *
 * <p>Immutable: the value is its canonical text; every accessor hands out a fresh copy of the tree.
 *
 * @param canonicalJson the snapshot as canonical JSON (see {@link CanonicalJson})
 */
public record Evidence(String canonicalJson) {

    public Evidence {
        JsonNode tree = CanonicalJson.parse(canonicalJson);
        if (!tree.isObject()) {
            throw new IllegalArgumentException("an evidence snapshot is a JSON object of sections");
        }
        canonicalJson = CanonicalJson.write(tree);
    }

    /** A snapshot from an object of sections. */
    public static Evidence of(ObjectNode sections) {
        return new Evidence(CanonicalJson.write(sections));
    }

    /** The whole snapshot as a fresh tree. */
    public ObjectNode tree() {
        return (ObjectNode) CanonicalJson.parse(canonicalJson);
    }

    /** The section names, sorted. */
    public List<String> sections() {
        List<String> names = new ArrayList<>();
        tree().fieldNames().forEachRemaining(names::add);
        return names;
    }

    /** One section as a fresh tree, if the snapshot has it. */
    public Optional<JsonNode> section(String name) {
        return Optional.ofNullable(tree().get(name));
    }

    /** Section names of a complete snapshot, in the order reports show them. */
    public static final class Sections {
        public static final String APP_VERSION = "app_version";
        public static final String TARGET = "target";
        public static final String REPLACED = "replaced";
        public static final String REPLACEMENT = "replacement";
        public static final String COMPARISON = "comparison";
        public static final String DRYING = "drying";
        public static final String SAFETY = "safety";
        public static final String CAUTIONS = "cautions";
        /** Why the replacement ranks as it does: the desirability terms ({@link RankingEvidence}). */
        public static final String RANKING = "ranking";
        public static final String DATA_SOURCES = "data_sources";

        private Sections() {
        }
    }
}
