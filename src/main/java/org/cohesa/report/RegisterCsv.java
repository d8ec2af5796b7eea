package org.cohesa.report;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.io.Writer;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.cohesa.core.records.Evidence;
import org.cohesa.core.records.StatusChange;
import org.cohesa.core.records.SubstitutionRecord;

/** The register as CSV (RFC 4180 through Commons CSV): one row per record, newest decision included. */
public final class RegisterCsv {

    public static final List<String> HEADER = List.of("id", "status", "process", "site", "replaced", "replacement", "target",
            "reason", "author", "created", "decided_by", "decided_at", "decision_comment",
            "red_replaced", "red_replacement", "ra_replacement_to_replaced", "app_version");

    private RegisterCsv() {
    }

    public static void write(List<SubstitutionRecord> records, Writer out) throws IOException {
        CSVFormat format = CSVFormat.RFC4180.builder().setHeader(HEADER.toArray(String[]::new)).setRecordSeparator("\n").get();
        try (CSVPrinter p = new CSVPrinter(out, format)) {
            for (SubstitutionRecord r : records) {
                StatusChange last = r.history().get(r.history().size() - 1);
                boolean decided = r.status().name().equals("APPROVED") || r.status().name().equals("REJECTED");
                Evidence ev = r.evidence();
                p.printRecord(r.id(), r.status().label(), r.content().process(), r.content().site(), r.content().replaced(),
                        r.content().replacement(), r.content().target(), r.content().reason(), r.author(), r.created(),
                        decided ? last.by() : null, decided ? last.at() : null, decided ? last.comment() : null,
                        number(ev, Evidence.Sections.REPLACED, "red"), number(ev, Evidence.Sections.REPLACEMENT, "red"),
                        number(ev, Evidence.Sections.COMPARISON, "ra_replacement_to_replaced"),
                        ev.section(Evidence.Sections.APP_VERSION).map(JsonNode::asText).orElse(null));
            }
        }
    }

    private static String number(Evidence ev, String section, String key) {
        return ev.section(section).map(s -> s.get(key)).filter(JsonNode::isNumber).map(JsonNode::asText).orElse(null);
    }
}
