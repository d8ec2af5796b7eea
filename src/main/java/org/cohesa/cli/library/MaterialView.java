package org.cohesa.cli.library;

import com.fasterxml.jackson.annotation.JsonProperty;
import java.util.List;
import org.cohesa.core.target.Material;
import org.cohesa.store.SourceCatalog;

/**
 * A material as {@code materials --json} and {@code material NAME --json} print it, serialised by Jackson: name, dD,
 * dP, dH, r0, source first (scripts rely on these), then the rest. δ and R0 in MPa½.
 */
record MaterialView(
        String name,
        @JsonProperty("dD") double dD,
        @JsonProperty("dP") double dP,
        @JsonProperty("dH") double dH,
        double r0,
        String source,
        String citation,
        String kind,
        List<String> synonyms,
        String note,
        @JsonProperty("user_entry") boolean userEntry) {

    static MaterialView json(Material m, SourceCatalog catalog) {
        return new MaterialView(m.name(), m.sphere().centre().dD(), m.sphere().centre().dP(),
                m.sphere().centre().dH(), m.sphere().r0(), m.source(), catalog.citation(m.source()).orElse(null),
                m.kind().key(), List.copyOf(m.synonyms()), m.note(), m.userEntry());
    }
}
