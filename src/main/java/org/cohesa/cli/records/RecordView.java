package org.cohesa.cli.records;

import org.cohesa.cli.Output;
import org.cohesa.cli.TextTable;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import org.cohesa.core.records.ChainProblem;
import org.cohesa.core.records.ChainReport;
import org.cohesa.core.records.Evidence;
import org.cohesa.core.records.StatusChange;
import org.cohesa.core.records.SubstitutionRecord;

/** How records look on the command line: JSON for scripts and plain tables for people. */
final class RecordView {

    private RecordView() {
    }

    static ObjectNode json(SubstitutionRecord r, boolean withEvidence) {
        ObjectNode o = Output.mapper().createObjectNode();
        o.put("id", r.id());
        o.put("status", r.status().label());
        o.put("process", r.content().process());
        o.put("site", r.content().site());
        o.put("replaced", r.content().replaced());
        o.put("replacement", r.content().replacement());
        o.put("target", r.content().target());
        o.put("reason", r.content().reason());
        o.put("author", r.author());
        o.put("created", r.created());
        ArrayNode h = o.putArray("history");
        for (StatusChange c : r.history()) {
            ObjectNode e = h.addObject();
            e.put("seq", c.seq());
            e.put("event", c.kind());
            e.put("status", c.status().label());
            e.put("by", c.by());
            e.put("at", c.at());
            e.put("comment", c.comment());
        }
        if (withEvidence) {
            o.set("evidence", r.evidence().tree());
        }
        return o;
    }

    static ObjectNode json(ChainReport report, boolean guardsInPlace) {
        ObjectNode o = Output.mapper().createObjectNode();
        o.put("intact", report.intact());
        o.put("events", report.events());
        o.put("records", report.records());
        o.put("head_hash", report.headHash());
        o.put("append_only_guards", guardsInPlace);
        report.firstProblem().ifPresentOrElse(p -> o.put("first_record", p.recordId()), () -> o.putNull("first_record"));
        ArrayNode ps = o.putArray("problems");
        for (ChainProblem p : report.problems()) {
            ObjectNode e = ps.addObject();
            e.put("kind", p.kind().label());
            e.put("record_id", p.recordId());
            e.put("seq", p.seq());
            e.put("position", p.position());
            e.put("detail", p.detail());
        }
        return o;
    }

    static void printList(PrintWriter out, java.util.List<SubstitutionRecord> records) {
        if (records.isEmpty()) {
            out.println("No substitution records yet. File one with: cohesa record add --help");
            return;
        }
        TextTable t = new TextTable("id", "status", "process", "replaced", "replacement", "author", "created", "last step");
        for (SubstitutionRecord r : records) {
            StatusChange last = r.history().get(r.history().size() - 1);
            t.row(r.id(), r.status().label(), shorten(r.content().process(), 30), shorten(r.content().replaced(), 28),
                    shorten(r.content().replacement(), 28), r.author(), r.created().substring(0, 16).replace('T', ' '),
                    last.kind() + " by " + last.by());
        }
        t.print(out);
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
        head.row("filed by", r.author() + " at " + r.created());
        head.print(out);
        out.println();
        printLiquids(out, r.evidence());
        out.println();
        out.println("history:");
        TextTable h = new TextTable("step", "event", "status", "by", "at", "comment");
        for (StatusChange c : r.history()) {
            h.row(c.seq(), c.kind(), c.status().label(), c.by(), c.at(), c.comment());
        }
        h.print(out);
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
