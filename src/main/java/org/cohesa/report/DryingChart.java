package org.cohesa.report;

import com.fasterxml.jackson.databind.JsonNode;
import java.awt.Color;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.cohesa.core.records.Evidence;

/**
 * The drying path chart: RED to the target against the percentage of the liquid evaporated, one line per
 * liquid, with the sphere's surface (RED = 1) dashed. Drawn with PDFBox lines from the snapshot's
 * {@code drying} section: {@code {"series": [{"liquid", "notation", "points": [[evaporated, red], …],
 * "leaves_sphere_at", "last_solvent"}], "model", "temperature_c"}}.
 */
final class DryingChart {

    private static final float NOMINAL_HEIGHT = 100;

    private DryingChart() {
    }

    static void draw(PdfLayout l, Evidence ev) throws IOException {
        float height = NOMINAL_HEIGHT * l.scale;
        // heading and chart stay together
        l.ensure(height + 80);
        l.heading("Drying path");
        JsonNode drying = ev.section(Evidence.Sections.DRYING).orElse(null);
        if (drying == null || !drying.path("series").isArray() || drying.path("series").isEmpty()) {
            l.paragraph(drying != null && drying.hasNonNull("note") ? drying.get("note").asText()
                    : "No drying path was computed for this record (it needs a target sphere and the evaporation model).", 9, PdfLayout.INK);
            return;
        }
        List<Series> series = new ArrayList<>();
        double maxRed = 1.2;
        for (JsonNode s : drying.get("series")) {
            List<double[]> pts = new ArrayList<>();
            for (JsonNode p : s.path("points")) {
                if (p.size() == 2 && p.get(0).isNumber() && p.get(1).isNumber()) {
                    pts.add(new double[] {p.get(0).doubleValue(), p.get(1).doubleValue()});
                    maxRed = Math.max(maxRed, p.get(1).doubleValue());
                }
            }
            if (!pts.isEmpty()) {
                boolean replaced = Evidence.Sections.REPLACED.equals(s.path("liquid").asText());
                String name = ev.section(s.path("liquid").asText()).map(RecordPdf::liquidName).orElse(s.path("notation").asText());
                series.add(new Series(s.path("liquid").asText() + ": " + name, pts,
                        replaced ? RecordPdf.VERMILLION : RecordPdf.BLUE, replaced));
            }
        }
        if (series.isEmpty()) {
            List<String> notes = new ArrayList<>();
            for (JsonNode s : drying.get("series")) {
                notes.add(s.path("liquid").asText() + ": last to evaporate " + s.path("last_solvent").asText("?"));
            }
            l.paragraph("No RED along the path (no target sphere was given). " + String.join("; ", notes) + ".", 9, PdfLayout.INK);
            return;
        }
        double yMax = Math.ceil(maxRed * 1.05 / 0.5) * 0.5;
        int ticks = (int) Math.round(yMax / (yMax <= 2 ? 0.25 : 0.5));
        float x0 = PdfLayout.LEFT + 34;
        float x1 = PdfLayout.RIGHT - 150;
        float top = l.y - 6;
        float bottom = top - height;
        // frame and grid
        for (int i = 0; i <= ticks; i++) {
            double v = yMax * i / ticks;
            float gy = (float) (bottom + height * v / yMax);
            l.line(x0, gy, x1, gy, PdfLayout.SHADE, 0.6f);
            l.text(l.fonts.regular, 7, PdfLayout.MUTED, x0 - 24, gy - 2.5f, String.format(Locale.ROOT, "%.2f", v));
        }
        for (int pct = 0; pct <= 100; pct += 20) {
            float gx = x0 + (x1 - x0) * pct / 100f;
            l.line(gx, bottom, gx, bottom - 3, PdfLayout.MUTED, 0.6f);
            l.text(l.fonts.regular, 7, PdfLayout.MUTED, gx - 6, bottom - 12, pct + " %");
        }
        l.strokeRect(x0, bottom, x1 - x0, height, PdfLayout.RULE, 0.8f);
        // the sphere's surface
        float oneY = (float) (bottom + height / yMax);
        l.stream().setLineDashPattern(new float[] {4, 3}, 0);
        l.line(x0, oneY, x1, oneY, PdfLayout.INK, 0.8f);
        l.stream().setLineDashPattern(new float[] {}, 0);
        String surface = "RED = 1: sphere surface";
        l.text(l.fonts.regular, 6.5f, PdfLayout.INK, x1 - l.width(l.fonts.regular, 6.5f, surface) - 3, oneY + 2.5f, surface);
        for (Series s : series) {
            l.stream().setStrokingColor(s.color);
            l.stream().setLineWidth(1.6f);
            if (s.dashed) {
                l.stream().setLineDashPattern(new float[] {2, 2}, 0);
            }
            boolean first = true;
            for (double[] p : s.points) {
                float px = (float) (x0 + (x1 - x0) * Math.min(1, Math.max(0, p[0])));
                float py = (float) (bottom + height * Math.min(yMax, p[1]) / yMax);
                if (first) {
                    l.stream().moveTo(px, py);
                    first = false;
                } else {
                    l.stream().lineTo(px, py);
                }
            }
            l.stream().stroke();
            l.stream().setLineDashPattern(new float[] {}, 0);
        }
        // axis titles and legend
        l.text(l.fonts.regular, 7.5f, PdfLayout.MUTED, x0, bottom - 23, "volume of the liquid evaporated");
        l.text(l.fonts.regular, 7.5f, PdfLayout.MUTED, x0 - 30, top + 5, "RED to target");
        float ly = top - 8;
        for (Series s : series) {
            if (s.dashed) {
                l.stream().setLineDashPattern(new float[] {2, 2}, 0);
            }
            l.line(x1 + 4, ly + 2.5f, x1 + 20, ly + 2.5f, s.color, 1.6f);
            l.stream().setLineDashPattern(new float[] {}, 0);
            for (String line : l.wrap(l.fonts.regular, 7, s.label, 120)) {
                l.text(l.fonts.regular, 7, PdfLayout.INK, x1 + 24, ly, line);
                ly -= 9;
            }
            ly -= 5;
        }
        l.y = bottom - 30;
        List<String> notes = new ArrayList<>();
        for (JsonNode s : drying.get("series")) {
            if (s.hasNonNull("note")) {
                notes.add(s.path("liquid").asText() + ": " + s.get("note").asText());
                continue;
            }
            JsonNode at = s.get("leaves_sphere_at");
            String path = at == null || at.isNull() ? "stays inside the sphere to the end of the path"
                    : at.doubleValue() <= 0 ? "starts outside the sphere"
                    : "leaves the sphere after " + String.format(Locale.ROOT, "%.0f %%", at.doubleValue() * 100) + " has evaporated";
            notes.add(s.path("liquid").asText() + ": " + path
                    + (s.hasNonNull("last_solvent") ? "; last to evaporate: " + s.get("last_solvent").asText() : ""));
        }
        String model = drying.hasNonNull("model") ? "Model: " + drying.get("model").asText()
                + (drying.hasNonNull("temperature_c") ? String.format(Locale.ROOT, ", %.0f °C", drying.get("temperature_c").doubleValue()) : "") + ". " : "";
        l.paragraph(model + String.join(". ", notes) + ".", 8.5f, PdfLayout.INK);
    }

    private record Series(String label, List<double[]> points, Color color, boolean dashed) {
    }
}
