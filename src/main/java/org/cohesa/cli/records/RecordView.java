package org.cohesa.cli.records;

import org.cohesa.cli.Output;
import org.cohesa.cli.TextTable;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.PrintWriter;
import org.cohesa.core.records.Evidence;
import org.cohesa.core.records.StatusChange;
import org.cohesa.core.records.SubstitutionRecord;

/** How records look on the command line: JSON for scripts and plain tables for people. */
final class RecordView {

    private RecordView() {
    }

    static void printRecord(PrintWriter out, SubstitutionRecord r) {
        out.println("Substitution record " + r.id() + " — " + r.status().label());
        TextTable head = new TextTable("field", "value");
        head.row("process", r.content().process());
        head.row("site", r.content().site());
        head.row("replaced", r.content().replaced());
        head.row("replacement", r.content().replacement());
        head.row("target", r.content().target());
        head.row("reason", r.content().reason());
        head.row("filed by", r.author() + account(r.history().get(0)) + " at " + r.created());
        head.row("head hash", r.headHash());
        head.print(out);
        out.println();
        printLiquids(out, r.evidence());
        out.println();
        out.println("history:");
        TextTable h = new TextTable("step", "event", "status", "by", "account", "at", "comment");
        for (StatusChange c : r.history()) {
            h.row(c.seq(), c.kind(), c.status().label(), c.by(), c.account(), c.at(), c.comment());
        }
        h.print(out);
        if (r.damage() != null) {
            out.println("warning: this record's stored history is damaged (" + r.damage() + "); run cohesa record verify");
        }
        out.println();
        r.evidence().section(Evidence.Sections.CAUTIONS).ifPresent(cs -> cs.forEach(c -> out.println("caution: " + c.asText())));
        out.println("evidence sections: " + String.join(", ", r.evidence().sections()));
    }

    private static void printLiquids(PrintWriter out, Evidence ev) {
        JsonNode a = ev.section(Evidence.Sections.REPLACED).orElse(null);
        JsonNode b = ev.section(Evidence.Sections.REPLACEMENT).orElse(null);
        if (a == null || b == null) {
            return;
        }
        TextTable t = new TextTable("evidence", "replaced", "replacement");
        t.row("liquid", a.path("notation").asText("-"), b.path("notation").asText("-"));
        for (String k : new String[] {"dD", "dP", "dH", "ra_to_target", "red", "flash_point_c"}) {
            if (a.has(k) || b.has(k)) {
                t.row(k, num(a.get(k)), num(b.get(k)));
            }
        }
        ev.section(Evidence.Sections.COMPARISON).map(c -> c.get("ra_replacement_to_replaced"))
                .ifPresent(ra -> t.row("Ra between them", num(ra), ""));
        t.print(out);
    }

    private static String account(StatusChange c) {
        return c.account() == null ? "" : " (account " + c.account() + ")";
    }

    private static String num(JsonNode n) {
        return n == null || n.isNull() ? "-" : n.isNumber() ? Output.fmt(n.doubleValue(), 2) : n.asText();
    }

    static String shorten(String s, int max) {
        if (s == null) {
            return "-";
        }
        return s.length() <= max ? s : s.substring(0, max - 1) + "…";
    }
}
