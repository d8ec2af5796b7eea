package org.cohesa.report;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.Closeable;
import java.io.IOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.cohesa.core.SpreadsheetCells;
import org.cohesa.core.records.Evidence;
import org.cohesa.core.records.RecordStatus;
import org.cohesa.core.records.StatusChange;
import org.cohesa.core.records.SubstitutionRecord;

/**
 * The register as CSV (RFC 4180 through Commons CSV): one row per record with who filed, reviewed and decided it and
 * when, and the hash of the record's newest event. Rows are written one at a time, so a register of any size is
 * exported in constant memory. Text cells a spreadsheet would run as a formula are written with a leading apostrophe
 * ({@link SpreadsheetCells}).
 */
public final class RegisterCsv implements Closeable {

    public static final List<String> HEADER = List.of("id", "status", "process", "site", "replaced", "replacement", "target",
            "reason", "author", "author_account", "created", "reviewer", "reviewer_account", "reviewed_at",
            "decided_by", "decided_by_account", "decision", "decided_at", "decision_comment",
            "red_replaced", "red_replacement", "ra_replacement_to_replaced", "app_version", "record_head_hash");

    private final CSVPrinter printer;

    private RegisterCsv(Writer out) throws IOException {
        CSVFormat format = CSVFormat.RFC4180.builder().setHeader(HEADER.toArray(String[]::new)).setRecordSeparator("\n").get();
        this.printer = new CSVPrinter(out, format);
    }

    /** Starts a register file (writes the header). */
    public static RegisterCsv open(Writer out) throws IOException {
        return new RegisterCsv(out);
    }

    /**
     * One record's row.
     *
     * @param headHash the hash of the record's newest event (what an auditor compares with the register)
     */
    public void row(SubstitutionRecord r, String headHash) throws IOException {
        StatusChange filed = r.history().get(0);
        StatusChange review = step(r, RecordStatus.IN_REVIEW);
        StatusChange decision = r.status() == RecordStatus.APPROVED || r.status() == RecordStatus.REJECTED
                ? r.history().get(r.history().size() - 1) : null;
        Evidence ev = r.evidence();
        List<Object> cells = new ArrayList<>(HEADER.size());
        cells.add(r.id());
        cells.add(r.status().label());
        cells.add(r.content().process());
        cells.add(r.content().site());
        cells.add(r.content().replaced());
        cells.add(r.content().replacement());
        cells.add(r.content().target());
        cells.add(r.content().reason());
        cells.add(r.author());
        cells.add(filed.account());
        cells.add(r.created());
        cells.add(review == null ? null : review.by());
        cells.add(review == null ? null : review.account());
        cells.add(review == null ? null : review.at());
        cells.add(decision == null ? null : decision.by());
        cells.add(decision == null ? null : decision.account());
        cells.add(decision == null ? null : decision.status().label());
        cells.add(decision == null ? null : decision.at());
        cells.add(decision == null ? null : decision.comment());
        cells.add(number(ev, Evidence.Sections.REPLACED, "red"));
        cells.add(number(ev, Evidence.Sections.REPLACEMENT, "red"));
        cells.add(number(ev, Evidence.Sections.COMPARISON, "ra_replacement_to_replaced"));
        cells.add(ev.section(Evidence.Sections.APP_VERSION).map(JsonNode::asText).orElse(null));
        cells.add(headHash);
        printer.printRecord(cells.stream().map(SpreadsheetCells::guardValue).toList());
    }

    /** Writes a whole list (tests, the desktop screen); the command line streams with {@link #row}. */
    public static void write(List<SubstitutionRecord> records, Writer out) throws IOException {
        try (RegisterCsv csv = open(out)) {
            for (SubstitutionRecord r : records) {
                csv.row(r, r.headHash());
            }
        }
    }

    @Override
    public void close() throws IOException {
        printer.close(true);
    }

    private static StatusChange step(SubstitutionRecord r, RecordStatus status) {
        return r.history().stream().filter(c -> c.status() == status).findFirst().orElse(null);
    }

    private static String number(Evidence ev, String section, String key) {
        return ev.section(section).map(s -> s.get(key)).filter(JsonNode::isNumber).map(JsonNode::asText).orElse(null);
    }
}
