package org.cohesa.report;

import com.fasterxml.jackson.databind.JsonNode;
import java.awt.Color;
import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.Calendar;
import java.util.GregorianCalendar;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TimeZone;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentInformation;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.cohesa.core.records.ChainReport;
import org.cohesa.core.records.Evidence;
import org.cohesa.core.records.RecordStatus;
import org.cohesa.core.records.StatusChange;
import org.cohesa.core.records.SubstitutionRecord;

/**
 * One substitution record as a report a quality department can file: summary, the two liquids side by
 * side, the drying path chart, the status history, the cautions and the data sources. Everything is
 * rendered from the record's evidence snapshot, never from today's library.
 */
public final class RecordPdf {

    /** Okabe–Ito colour-blind-safe colours (Okabe, M., Ito, K., "Color Universal Design", 2008). */
    static final Color BLUE = new Color(0x00, 0x72, 0xB2);
    static final Color VERMILLION = new Color(0xD5, 0x5E, 0x00);
    static final Color ORANGE = new Color(0xE6, 0x9F, 0x00);
    static final Color GREY = new Color(0x6b, 0x6b, 0x6b);

    private static final DateTimeFormatter STAMP = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm 'UTC'").withZone(ZoneOffset.UTC);

    private RecordPdf() {
    }

    /**
     * @param lastEventHash SHA-256 of the record's newest event, printed in the footer so a filed copy can
     *                      be matched with the register later
     * @param chain         the register's verification when printing
     */
    public static void write(SubstitutionRecord r, String lastEventHash, ChainReport chain, String appVersion, Path file) throws IOException {
        write(r, lastEventHash, chain, appVersion, file, true);
    }

    /** @param systemFonts false forces the built-in font (to test the fallback) */
    public static void write(SubstitutionRecord r, String lastEventHash, ChainReport chain, String appVersion, Path file,
                             boolean systemFonts) throws IOException {
        // a long record (many hazards, many sources) is set a little tighter rather than spill onto a third page
        float[] scales = {1f, 0.92f, 0.85f};
        for (int i = 0; i < scales.length; i++) {
            int[] bodyPages = {0};
            try (PDDocument doc = render(r, lastEventHash, chain, appVersion, systemFonts, scales[i], bodyPages)) {
                if (bodyPages[0] <= 2 || i == scales.length - 1) {
                    doc.save(file.toFile());
                    return;
                }
            }
        }
    }

    /** @param bodyPages receives the number of pages before the appendix (the report proper is kept to two) */
    private static PDDocument render(SubstitutionRecord r, String lastEventHash, ChainReport chain, String appVersion, boolean systemFonts,
                                     float scale, int[] bodyPages) throws IOException {
        PDDocument doc = new PDDocument();
        try {
            PdfFonts fonts = PdfFonts.load(doc, systemFonts);
            info(doc, r);
            try (PdfLayout l = new PdfLayout(doc, fonts, scale)) {
                title(l, r);
                summary(l, r, chain);
                liquids(l, r.evidence());
                ranking(l, r.evidence());
                DryingChart.draw(l, r.evidence());
                history(l, r);
                cautions(l, r.evidence());
                sources(l, r.evidence());
                bodyPages[0] = doc.getNumberOfPages();
                appendix(l, r.evidence());
            }
            footers(doc, fonts, r, lastEventHash, appVersion);
            return doc;
        } catch (IOException | RuntimeException e) {
            doc.close();
            throw e;
        }
    }

    private static void info(PDDocument doc, SubstitutionRecord r) {
        PDDocumentInformation i = doc.getDocumentInformation();
        i.setTitle("Solvent substitution record " + r.id() + ": " + r.content().process());
        i.setAuthor(r.author());
        i.setSubject(r.content().replaced() + " replaced by " + r.content().replacement());
        i.setCreator("Cohesa");
        Calendar c = new GregorianCalendar(TimeZone.getTimeZone("UTC"), Locale.ROOT);
        c.setTimeInMillis(Instant.parse(r.created()).toEpochMilli());
        i.setCreationDate(c);
    }

    private static void title(PdfLayout l, SubstitutionRecord r) throws IOException {
        l.text(l.fonts.regular, 8.5f, PdfLayout.MUTED, PdfLayout.LEFT, l.y - 8, "COHESA  ·  SOLVENT SUBSTITUTION RECORD");
        l.y -= 30;
        l.text(l.fonts.bold, 17, PdfLayout.INK, PdfLayout.LEFT, l.y, "Record No. " + r.id());
        badge(l, r.status());
        l.y -= 16;
        List<String> sub = l.wrap(l.fonts.regular, 11, r.content().process() + (r.content().site() == null ? "" : "  ·  " + r.content().site()),
                PdfLayout.RIGHT - PdfLayout.LEFT);
        for (String s : sub) {
            l.text(l.fonts.regular, 11, PdfLayout.INK, PdfLayout.LEFT, l.y, s);
            l.y -= 14;
        }
        l.line(PdfLayout.LEFT, l.y, PdfLayout.RIGHT, l.y, PdfLayout.INK, 1.2f);
        l.y -= 4;
    }

    private static void badge(PdfLayout l, RecordStatus status) throws IOException {
        String text = status.label().replace('_', ' ').toUpperCase(Locale.ROOT);
        Color c = switch (status) {
            case APPROVED -> BLUE;
            case REJECTED -> VERMILLION;
            case IN_REVIEW -> ORANGE;
            case DRAFT -> GREY;
        };
        float w = l.width(l.fonts.bold, 10, text) + 16;
        float x = PdfLayout.RIGHT - w;
        l.strokeRect(x, l.y - 5, w, 19, c, 1.4f);
        l.text(l.fonts.bold, 10, c, x + 8, l.y + 1, text);
    }

    private static void summary(PdfLayout l, SubstitutionRecord r, ChainReport chain) throws IOException {
        l.heading("Summary");
        Evidence ev = r.evidence();
        List<String[]> rows = new ArrayList<>();
        rows.add(new String[] {"Replaced", ev.section(Evidence.Sections.REPLACED).map(RecordPdf::liquidName).orElse(r.content().replaced())});
        rows.add(new String[] {"Replacement", ev.section(Evidence.Sections.REPLACEMENT).map(RecordPdf::liquidName).orElse(r.content().replacement())});
        rows.add(new String[] {"Target", target(ev, r.content().target())});
        rows.add(new String[] {"Reason", r.content().reason()});
        rows.add(new String[] {"Filed", r.author() + ", " + stamp(r.created())});
        StatusChange last = r.history().get(r.history().size() - 1);
        rows.add(new String[] {"Status", r.status().label().replace('_', ' ') + " (" + last.by() + ", " + stamp(last.at()) + ")"});
        rows.add(new String[] {"Register integrity", (chain.intact()
                ? "register intact when printed (" + chain.events() + " events" + (chain.keyChecked() ? ", HMAC seal checked" : ", seal not checked: no key")
                + ")" : "REGISTER BROKEN when printed: " + chain.firstProblem().map(p -> p.describe()).orElse(""))});
        // the whole head hash, so this page can later be checked with: cohesa record verify --anchor HASH
        rows.add(new String[] {"Register head hash", chain.headHash()});
        rows.add(new String[] {"Evidence taken with", "Cohesa " + ev.section(Evidence.Sections.APP_VERSION).map(JsonNode::asText).orElse("?")});
        l.table(new float[] {0.22f, 0.78f}, rows, false, true, 8.6f);
    }

    private static String target(Evidence ev, String typed) {
        return ev.section(Evidence.Sections.TARGET).map(t -> t.path("label").asText() + ": δD " + n(t.get("dD"), 1) + ", δP "
                + n(t.get("dP"), 1) + ", δH " + n(t.get("dH"), 1) + ", R0 " + n(t.get("r0"), 1) + " MPa½ (" + t.path("source").asText() + ")")
                .orElse(typed == null ? "none given (no RED computed)" : typed);
    }

    private static void liquids(PdfLayout l, Evidence ev) throws IOException {
        l.heading("Replaced and replacement side by side");
        JsonNode a = ev.section(Evidence.Sections.REPLACED).orElse(null);
        JsonNode b = ev.section(Evidence.Sections.REPLACEMENT).orElse(null);
        if (a == null || b == null) {
            l.paragraph("This snapshot holds no liquid data.", 9, PdfLayout.INK);
            return;
        }
        JsonNode safety = ev.section(Evidence.Sections.SAFETY).orElse(null);
        JsonNode sa = safety == null ? null : safety.get(Evidence.Sections.REPLACED);
        JsonNode sb = safety == null ? null : safety.get(Evidence.Sections.REPLACEMENT);
        List<String[]> rows = new ArrayList<>();
        rows.add(new String[] {"", "Replaced", "Replacement"});
        rows.add(new String[] {"Liquid (volume %)", liquidName(a), liquidName(b)});
        rows.add(new String[] {"δD, δP, δH (MPa½)", triple(a), triple(b)});
        if (a.has("red") || b.has("red")) {
            rows.add(new String[] {"Ra to target (MPa½)", n(a.get("ra_to_target"), 2), n(b.get("ra_to_target"), 2)});
            rows.add(new String[] {"RED to target", red(a), red(b)});
        }
        ev.section(Evidence.Sections.COMPARISON).map(c -> c.get("ra_replacement_to_replaced")).filter(JsonNode::isNumber)
                .ifPresent(ra -> rows.add(new String[] {"Ra between the two (MPa½)", "reference", n(ra, 2)}));
        rows.add(new String[] {"Flash point (°C)", flash(a, sa), flash(b, sb)});
        rows.add(new String[] {"GHS flammable liquid; UN packing group", ghs(sa), ghs(sb)});
        rows.add(new String[] {"Boiling point (°C)", perComponent(a, "boiling_point_c"), perComponent(b, "boiling_point_c")});
        rows.add(new String[] {"Hazard statements", hazards(a), hazards(b)});
        rows.add(new String[] {"OEL TWA / STEL (ppm)", oels(a), oels(b)});
        if (sa != null || sb != null) {
            rows.add(new String[] {"Saturated vapour at 25 °C (× OEL)", exposure(sa), exposure(sb)});
        }
        rows.add(new String[] {"ICH Q3C class", ich(a, sa), ich(b, sb)});
        if (sa != null || sb != null) {
            rows.add(new String[] {"Solvent-guide rank (CHEM21)", safetyText(sa, "guide_rank"), safetyText(sb, "guide_rank")});
        }
        l.table(new float[] {0.26f, 0.37f, 0.37f}, rows, true, true, 8.2f);
    }

    /** The evidence's ranking section: why the replacement ranks as it does (the terms replace prints as its why). */
    private static void ranking(PdfLayout l, Evidence ev) throws IOException {
        JsonNode rk = ev.section(Evidence.Sections.RANKING).orElse(null);
        if (rk == null) {
            return; // a record filed before the section existed
        }
        l.ensure(90);
        l.heading("Why the replacement ranks as it does");
        if (!rk.has("why")) {
            l.paragraph(rk.path("note").asText("no ranking terms filed"), 9, PdfLayout.INK);
            return;
        }
        List<String[]> rows = new ArrayList<>();
        rows.add(new String[] {"Sphere", rk.path("sphere").asText()});
        rows.add(new String[] {"RED (limit)", n(rk.get("red"), 3) + "  (" + n(rk.get("red_limit"), 2) + "; "
                + (rk.path("qualifies").asBoolean() ? "qualifies" : "does not qualify") + ")"});
        rows.add(new String[] {"Weights", rk.path("weights").asText()});
        rows.add(new String[] {"Score without cost", n(rk.get("score_without_cost"), 2) + "  (lower is better)"});
        List<String> terms = new ArrayList<>();
        rk.path("why").forEach(t -> terms.add(t.asText()));
        rows.add(new String[] {"Terms", String.join("; ", terms)});
        l.table(new float[] {0.26f, 0.74f}, rows, false, true, 8.2f);
        l.paragraph(rk.path("note").asText(), 7.5f, PdfLayout.MUTED);
    }

    /** "toluene", or "ethyl acetate 50 % + n-butyl acetate 50 %" for a blend (volume percent). */
    static String liquidName(JsonNode liquid) {
        JsonNode cs = liquid.path("components");
        if (cs.size() == 1) {
            return cs.get(0).path("name").asText();
        }
        if (cs.isEmpty()) {
            return liquid.path("notation").asText("—");
        }
        List<String> parts = new ArrayList<>();
        for (JsonNode c : cs) {
            parts.add(c.path("name").asText() + " " + String.format(Locale.ROOT, "%.4g", c.path("fraction").doubleValue() * 100)
                    .replaceAll("\\.?0+$", "") + " %");
        }
        return String.join(" + ", parts);
    }

    private static String triple(JsonNode liquid) {
        if (!liquid.has("dD")) {
            return "not in the library";
        }
        return n(liquid.get("dD"), 1) + ", " + n(liquid.get("dP"), 1) + ", " + n(liquid.get("dH"), 1);
    }

    private static String red(JsonNode liquid) {
        JsonNode red = liquid.get("red");
        if (red == null || !red.isNumber()) {
            return "—";
        }
        return n(red, 2) + (red.doubleValue() < 1 ? "  (inside the sphere)" : "  (outside the sphere)");
    }

    private static String flash(JsonNode liquid, JsonNode safety) {
        if (safety != null && safety.path("flash_point_c").isNumber()) {
            String status = safety.path("flash_point_status").asText();
            return n(safety.get("flash_point_c"), 0) + (status.equals("computed") ? " (model estimate: Liaw 2002, "
                    + safety.path("activity_model").asText() + ")" : " (closed cup, library)");
        }
        if (safety != null && safety.hasNonNull("flash_point_status") && !safety.path("flash_point_status").asText().equals("library")) {
            return safety.path("flash_point_status").asText().replace('_', ' ');
        }
        if (liquid.get("flash_point_c") != null) {
            return n(liquid.get("flash_point_c"), 0) + " (closed cup, library)";
        }
        return perComponent(liquid, "flash_point_c");
    }

    private static String ghs(JsonNode safety) {
        if (safety == null || !safety.hasNonNull("ghs_flammable_category")) {
            return "not in this snapshot";
        }
        return safety.get("ghs_flammable_category").asText()
                + "; " + (safety.hasNonNull("packing_group") ? "PG " + safety.get("packing_group").asText() : "not Class 3");
    }

    private static String exposure(JsonNode safety) {
        if (safety == null || !safety.path("exposure_index").isNumber()) {
            return "no OEL to compare";
        }
        return n(safety.get("exposure_index"), 0) + (safety.path("exposure_index_complete").asBoolean(true) ? "" : " (components without OEL left out)");
    }

    /** ICH Q3C class and Option 1 limit from the safety profile, else the class from the library. */
    private static String ich(JsonNode liquid, JsonNode safety) {
        if (safety == null || !safety.path("ich_q3c").isArray()) {
            return perComponent(liquid, "ich_class");
        }
        List<String> parts = new ArrayList<>();
        JsonNode lines = safety.get("ich_q3c");
        for (JsonNode x : lines) {
            String text = x.path("class").isNumber()
                    ? "class " + x.get("class").asInt() + (x.path("limit_ppm").isNumber() ? ", " + n(x.get("limit_ppm"), 0) + " ppm" : "")
                    : "not listed";
            parts.add(lines.size() == 1 ? text : x.path("component").asText() + ": " + text);
        }
        return String.join("; ", parts);
    }

    private static String safetyText(JsonNode safety, String key) {
        if (safety == null || safety.get(key) == null || safety.get(key).isNull()) {
            return "not in this snapshot";
        }
        return safety.get(key).asText();
    }

    /** One value for a pure liquid; "name: value" per component for a blend. */
    private static String perComponent(JsonNode liquid, String key) {
        JsonNode cs = liquid.path("components");
        if (cs.size() == 1) {
            JsonNode v = cs.get(0).get(key);
            return v == null || v.isNull() ? "not listed" : v.isNumber() ? n(v, key.equals("ich_class") ? 0 : 1) : v.asText();
        }
        List<String> parts = new ArrayList<>();
        for (JsonNode c : cs) {
            JsonNode v = c.get(key);
            parts.add(c.path("name").asText() + ": " + (v == null || v.isNull() ? "not listed" : v.isNumber() ? n(v, key.equals("ich_class") ? 0 : 1) : v.asText()));
        }
        return String.join("; ", parts);
    }

    private static String hazards(JsonNode liquid) {
        List<String> parts = new ArrayList<>();
        JsonNode cs = liquid.path("components");
        for (JsonNode c : cs) {
            List<String> h = new ArrayList<>();
            c.path("hazard_statements").forEach(x -> h.add(x.asText()));
            String text = h.isEmpty() ? "none listed" : String.join(" ", h);
            if (c.path("cmr").asBoolean()) {
                text += " (CMR)";
            }
            parts.add(cs.size() == 1 ? text : c.path("name").asText() + ": " + text);
        }
        return String.join("; ", parts);
    }

    private static String oels(JsonNode liquid) {
        List<String> parts = new ArrayList<>();
        JsonNode cs = liquid.path("components");
        for (JsonNode c : cs) {
            JsonNode o = c.get("oel");
            String text = o == null ? "none listed"
                    : n(o.get("twa_ppm"), 0) + " / " + n(o.get("stel_ppm"), 0)
                    + (o.path("skin").asBoolean() ? ", skin" : "")
                    + (o.hasNonNull("jurisdiction") ? " (" + o.get("jurisdiction").asText() + ")" : "");
            parts.add(cs.size() == 1 ? text : c.path("name").asText() + ": " + text);
        }
        return String.join("; ", parts);
    }

    private static void history(PdfLayout l, SubstitutionRecord r) throws IOException {
        // keep the short history on one page: a quality reviewer reads it as one block
        l.ensure(60 + 26f * r.history().size());
        l.heading("Status history");
        List<String[]> rows = new ArrayList<>();
        rows.add(new String[] {"Step", "Event", "Status after", "By", "When (UTC)", "Comment"});
        for (StatusChange c : r.history()) {
            // who did it: the name typed and, beneath it, the account that acted (OS user, or the shared register's login)
            rows.add(new String[] {String.valueOf(c.seq()), c.kind().replace('_', ' '), c.status().label().replace('_', ' '),
                    c.by() + (c.account() == null ? "" : " (" + c.account() + ")"),
                    stamp(c.at()).replace(" UTC", ""),
                    c.comment() == null ? "" : c.comment()});
        }
        l.table(new float[] {0.06f, 0.15f, 0.12f, 0.16f, 0.2f, 0.31f}, rows, true, false, 8.2f);
    }

    private static void cautions(PdfLayout l, Evidence ev) throws IOException {
        List<String> texts = new ArrayList<>();
        ev.section(Evidence.Sections.CAUTIONS).ifPresent(cs -> cs.forEach(c -> texts.add(c.asText())));
        if (texts.isEmpty()) {
            return;
        }
        float size = 8.2f * l.scale;
        float leading = size + 2.2f * l.scale;
        List<String> lines = new ArrayList<>();
        for (String t : texts) {
            lines.addAll(l.wrap(l.fonts.regular, size, "•  " + t, PdfLayout.RIGHT - PdfLayout.LEFT - 20));
        }
        float h = lines.size() * leading + 10;
        l.ensure(h + 40);
        l.heading("Cautions");
        l.fillRect(PdfLayout.LEFT, l.y - h, 3, h, VERMILLION);
        float ty = l.y - 5 - size;
        for (String line : lines) {
            boolean continuation = !line.startsWith("•");
            l.text(l.fonts.regular, size, PdfLayout.INK, PdfLayout.LEFT + (continuation ? 21 : 12), ty, line);
            ty -= leading;
        }
        l.y -= h + 6;
    }

    private static void sources(PdfLayout l, Evidence ev) throws IOException {
        JsonNode src = ev.section(Evidence.Sections.DATA_SOURCES).orElse(null);
        if (src == null || src.isEmpty()) {
            return;
        }
        l.heading("Data sources");
        float size = 6.6f * l.scale;
        float width = PdfLayout.RIGHT - PdfLayout.LEFT;
        for (Map.Entry<String, JsonNode> e : (Iterable<Map.Entry<String, JsonNode>>) src::fields) {
            // one line per source: the key in bold, the citation cut to the line (the snapshot keeps it whole)
            String key = e.getKey();
            float keyWidth = l.width(l.fonts.bold, size, key + "  ");
            String text = citation(e.getValue().asText());
            while (text.length() > 20 && l.width(l.fonts.regular, size, text) > width - keyWidth) {
                int cut = text.lastIndexOf(' ', text.length() - 8);
                text = text.substring(0, cut > 20 ? cut : text.length() - 8).replaceAll("[ ,;:(—–-]+$", "") + " […]";
                text = text.replace(" […] […]", " […]");
            }
            l.ensure(size + 4);
            l.y -= size + 2.5f * l.scale;
            l.text(l.fonts.bold, size, PdfLayout.INK, PdfLayout.LEFT, l.y, key);
            l.text(l.fonts.regular, size, PdfLayout.INK, PdfLayout.LEFT + keyWidth, l.y, text);
        }
        l.y -= 4;
        l.paragraph("Citations are shortened here; every source is given in full in the appendix.", 6.6f, PdfLayout.MUTED);
    }

    /** Every data source with its whole citation, on pages of its own after the report. */
    private static void appendix(PdfLayout l, Evidence ev) throws IOException {
        JsonNode src = ev.section(Evidence.Sections.DATA_SOURCES).orElse(null);
        if (src == null || src.isEmpty()) {
            return;
        }
        l.newPage();
        l.heading("Appendix: data sources in full");
        for (Map.Entry<String, JsonNode> e : (Iterable<Map.Entry<String, JsonNode>>) src::fields) {
            String full = e.getValue().asText().replace("**", "").replace("*", "").replace("`", "").strip();
            l.paragraph(e.getKey() + " — " + full, 7.4f, PdfLayout.INK);
        }
    }

    private static void footers(PDDocument doc, PdfFonts fonts, SubstitutionRecord r, String lastEventHash, String appVersion) throws IOException {
        int total = doc.getNumberOfPages();
        String hashNote = "step " + r.history().size() + " SHA-256 " + lastEventHash;
        for (int i = 0; i < total; i++) {
            PDPage page = doc.getPage(i);
            try (PDPageContentStream cs = new PDPageContentStream(doc, page, PDPageContentStream.AppendMode.APPEND, true, true)) {
                cs.setStrokingColor(PdfLayout.RULE);
                cs.setLineWidth(0.5f);
                cs.moveTo(PdfLayout.LEFT, 44);
                cs.lineTo(PdfLayout.RIGHT, 44);
                cs.stroke();
                String left = "Record No. " + r.id() + "  ·  " + hashNote;
                writeAt(cs, fonts, 6.5f, PdfLayout.LEFT, 24, "Printed by Cohesa " + appVersion + " on " + STAMP.format(Instant.now())
                        + ". Screening estimates: the supplier's SDS, local codes and the site's licensed safety professionals decide.");
                String right = "page " + (i + 1) + " of " + total;
                writeAt(cs, fonts, 7, PdfLayout.LEFT, 33, left);
                float w = fonts.regular.getStringWidth(fonts.printable(fonts.regular, right)) / 1000f * 7;
                writeAt(cs, fonts, 7, PdfLayout.RIGHT - w, 33, right);
            }
        }
    }

    private static void writeAt(PDPageContentStream cs, PdfFonts fonts, float size, float x, float y, String text) throws IOException {
        cs.beginText();
        cs.setFont(fonts.regular, size);
        cs.setNonStrokingColor(PdfLayout.MUTED);
        cs.newLineAtOffset(x, y);
        cs.showText(fonts.printable(fonts.regular, text));
        cs.endText();
    }

    /**
     * A citation as plain text (the catalogue is Markdown), cut at a word near {@value #CITATION_CHARS} characters:
     * enough to find the source; the full text stays in the record's evidence snapshot.
     */
    static String citation(String markdown) {
        String plain = markdown.replace("**", "").replace("*", "").replace("`", "").strip();
        if (plain.length() <= CITATION_CHARS) {
            return plain;
        }
        int cut = plain.lastIndexOf(' ', CITATION_CHARS);
        return plain.substring(0, cut > 60 ? cut : CITATION_CHARS).replaceAll("[,;:(—–-]+$", "") + " […]";
    }

    private static final int CITATION_CHARS = 170;

    static String n(JsonNode v, int decimals) {
        if (v == null || v.isNull() || !v.isNumber()) {
            return "—";
        }
        return String.format(Locale.ROOT, "%." + decimals + "f", v.doubleValue());
    }

    private static String stamp(String at) {
        try {
            return STAMP.format(Instant.parse(at));
        } catch (RuntimeException e) {
            return at;
        }
    }
}
