package org.cohesa.report;

import java.awt.Color;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.font.PDFont;

/**
 * A small flowing layout over PDFBox: a cursor that moves down an A4 page, wrapped paragraphs, ruled
 * tables and section headings, with a new page whenever the next block would not fit.
 */
final class PdfLayout implements AutoCloseable {

    static final float LEFT = 50;
    static final float RIGHT = PDRectangle.A4.getWidth() - 50;
    static final float TOP = PDRectangle.A4.getHeight() - 48;
    static final float BOTTOM = 58;
    static final Color INK = new Color(0x22, 0x22, 0x22);
    static final Color MUTED = new Color(0x5f, 0x63, 0x68);
    static final Color RULE = new Color(0xb8, 0xbc, 0xc2);
    static final Color SHADE = new Color(0xee, 0xf0, 0xf3);

    final PDDocument doc;
    final PdfFonts fonts;
    /** Multiplies body text sizes; below 1 when a long record is set tighter to stay on two pages. */
    final float scale;
    private final List<PDPage> pages = new ArrayList<>();
    private PDPageContentStream cs;
    float y;

    PdfLayout(PDDocument doc, PdfFonts fonts, float scale) throws IOException {
        this.doc = doc;
        this.fonts = fonts;
        this.scale = scale;
        newPage();
    }

    List<PDPage> pages() {
        return pages;
    }

    PDPageContentStream stream() {
        return cs;
    }

    void newPage() throws IOException {
        if (cs != null) {
            cs.close();
        }
        PDPage page = new PDPage(PDRectangle.A4);
        doc.addPage(page);
        pages.add(page);
        cs = new PDPageContentStream(doc, page);
        y = TOP;
    }

    /** Starts a new page unless {@code height} points still fit above the bottom margin. */
    void ensure(float height) throws IOException {
        if (y - height < BOTTOM) {
            newPage();
        }
    }

    float width(PDFont font, float size, String text) {
        try {
            return font.getStringWidth(fonts.printable(font, text)) / 1000f * size;
        } catch (IOException e) {
            return text.length() * size * 0.5f;
        }
    }

    void text(PDFont font, float size, Color color, float x, float baseline, String text) throws IOException {
        cs.beginText();
        cs.setFont(font, size);
        cs.setNonStrokingColor(color);
        cs.newLineAtOffset(x, baseline);
        cs.showText(fonts.printable(font, text));
        cs.endText();
    }

    /** Breaks {@code text} into lines no wider than {@code max}; long words are cut. */
    List<String> wrap(PDFont font, float size, String text, float max) {
        List<String> lines = new ArrayList<>();
        for (String para : (text == null ? "" : text).split("\n")) {
            StringBuilder line = new StringBuilder();
            for (String word : para.split(" ")) {
                String candidate = line.length() == 0 ? word : line + " " + word;
                if (width(font, size, candidate) <= max) {
                    line.setLength(0);
                    line.append(candidate);
                    continue;
                }
                if (line.length() > 0) {
                    lines.add(line.toString());
                    line.setLength(0);
                }
                String w = word;
                while (width(font, size, w) > max && w.length() > 1) {
                    int cut = w.length() - 1;
                    while (cut > 1 && width(font, size, w.substring(0, cut)) > max) {
                        cut--;
                    }
                    lines.add(w.substring(0, cut));
                    w = w.substring(cut);
                }
                line.append(w);
            }
            lines.add(line.toString());
        }
        return lines;
    }

    void heading(String title) throws IOException {
        ensure(40);
        y -= 14;
        text(fonts.bold, 11.5f, INK, LEFT, y, title);
        y -= 4;
        line(LEFT, y, RIGHT, y, RULE, 0.8f);
        y -= 8;
    }

    void paragraph(String text, float nominalSize, Color color) throws IOException {
        float size = nominalSize * scale;
        for (String l : wrap(fonts.regular, size, text, RIGHT - LEFT)) {
            ensure(size + 3);
            y -= size + 2.5f;
            text(fonts.regular, size, color, LEFT, y, l);
        }
        y -= 3;
    }

    void line(float x1, float y1, float x2, float y2, Color color, float width) throws IOException {
        cs.setStrokingColor(color);
        cs.setLineWidth(width);
        cs.moveTo(x1, y1);
        cs.lineTo(x2, y2);
        cs.stroke();
    }

    void fillRect(float x, float yBottom, float w, float h, Color color) throws IOException {
        cs.setNonStrokingColor(color);
        cs.addRect(x, yBottom, w, h);
        cs.fill();
    }

    void strokeRect(float x, float yBottom, float w, float h, Color color, float width) throws IOException {
        cs.setStrokingColor(color);
        cs.setLineWidth(width);
        cs.addRect(x, yBottom, w, h);
        cs.stroke();
    }

    /**
     * A ruled table. {@code widths} are fractions of the text width; the first row is the header when
     * {@code header} is true; cells in the first column are bold when {@code labelColumn} is true.
     */
    void table(float[] widths, List<String[]> rows, boolean header, boolean labelColumn, float nominalSize) throws IOException {
        float size = nominalSize * scale;
        float total = RIGHT - LEFT;
        float pad = 3.5f * scale;
        float leading = size + 2.6f;
        for (int r = 0; r < rows.size(); r++) {
            String[] row = rows.get(r);
            boolean isHeader = header && r == 0;
            List<List<String>> cells = new ArrayList<>();
            int lines = 1;
            for (int c = 0; c < widths.length; c++) {
                PDFont f = isHeader || (labelColumn && c == 0) ? fonts.bold : fonts.regular;
                List<String> w = wrap(f, size, c < row.length && row[c] != null ? row[c] : "—", widths[c] * total - 2 * pad);
                cells.add(w);
                lines = Math.max(lines, w.size());
            }
            float h = lines * leading + 2 * pad - 1;
            ensure(h);
            if (isHeader) {
                fillRect(LEFT, y - h, total, h, SHADE);
            }
            float x = LEFT;
            for (int c = 0; c < widths.length; c++) {
                PDFont f = isHeader || (labelColumn && c == 0) ? fonts.bold : fonts.regular;
                float ty = y - pad - size + 0.5f;
                for (String l : cells.get(c)) {
                    text(f, size, isHeader ? MUTED : INK, x + pad, ty, l);
                    ty -= leading;
                }
                x += widths[c] * total;
            }
            line(LEFT, y - h, RIGHT, y - h, RULE, 0.4f);
            if (r == 0) {
                line(LEFT, y, RIGHT, y, RULE, 0.8f);
            }
            y -= h;
        }
        y -= 6;
    }

    @Override
    public void close() throws IOException {
        if (cs != null) {
            cs.close();
            cs = null;
        }
    }
}
