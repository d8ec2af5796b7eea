package org.cohesa.report;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.pdmodel.font.PDType0Font;
import org.apache.pdfbox.pdmodel.font.PDType1Font;
import org.apache.pdfbox.pdmodel.font.Standard14Fonts;

/**
 * The report's fonts: a TrueType font found on the machine (DejaVu Sans, free to embed under the
 * Bitstream Vera licence; Arial on Windows and macOS), embedded as a subset so δ, ½ and ≤ print as
 * themselves; else the built-in Helvetica, where characters it cannot encode are written in ASCII
 * (δD becomes dD).
 */
final class PdfFonts {

    private static final List<String[]> CANDIDATES = List.of(
            new String[] {"/usr/share/fonts/truetype/dejavu/DejaVuSans.ttf", "/usr/share/fonts/truetype/dejavu/DejaVuSans-Bold.ttf"},
            new String[] {"/usr/share/fonts/TTF/DejaVuSans.ttf", "/usr/share/fonts/TTF/DejaVuSans-Bold.ttf"},
            new String[] {"/usr/share/fonts/dejavu/DejaVuSans.ttf", "/usr/share/fonts/dejavu/DejaVuSans-Bold.ttf"},
            new String[] {"/usr/share/fonts/dejavu-sans-fonts/DejaVuSans.ttf", "/usr/share/fonts/dejavu-sans-fonts/DejaVuSans-Bold.ttf"},
            new String[] {"/System/Library/Fonts/Supplemental/Arial.ttf", "/System/Library/Fonts/Supplemental/Arial Bold.ttf"},
            new String[] {"C:\\Windows\\Fonts\\arial.ttf", "C:\\Windows\\Fonts\\arialbd.ttf"});

    final PDFont regular;
    final PDFont bold;
    final boolean unicode;

    private PdfFonts(PDFont regular, PDFont bold, boolean unicode) {
        this.regular = regular;
        this.bold = bold;
        this.unicode = unicode;
    }

    /** The best fonts available here; {@code allowSystemFonts=false} forces the built-in fallback (tests). */
    static PdfFonts load(PDDocument doc, boolean allowSystemFonts) throws IOException {
        if (allowSystemFonts) {
            for (String[] pair : CANDIDATES) {
                Path r = Path.of(pair[0]);
                Path b = Path.of(pair[1]);
                if (Files.isReadable(r) && Files.isReadable(b)) {
                    return new PdfFonts(PDType0Font.load(doc, r.toFile()), PDType0Font.load(doc, b.toFile()), true);
                }
            }
        }
        return new PdfFonts(new PDType1Font(Standard14Fonts.FontName.HELVETICA),
                new PDType1Font(Standard14Fonts.FontName.HELVETICA_BOLD), false);
    }

    /** Text the font can show: unencodable characters replaced by ASCII stand-ins. */
    String printable(PDFont font, String text) {
        if (text == null) {
            return "";
        }
        StringBuilder sb = new StringBuilder();
        text.codePoints().forEach(cp -> {
            String ch = new String(Character.toChars(cp));
            if (cp == '\n' || cp == '\r' || cp == '\t') {
                sb.append(' ');
            } else if (canEncode(font, ch)) {
                sb.append(ch);
            } else {
                sb.append(switch (cp) {
                    case 'δ' -> "d";
                    case 'Δ' -> "D";
                    case '≤' -> "<=";
                    case '≥' -> ">=";
                    case '→' -> "->";
                    case '₀' -> "0";
                    case '…' -> "...";
                    case '−' -> "-";
                    default -> "?";
                });
            }
        });
        return sb.toString();
    }

    private static boolean canEncode(PDFont font, String ch) {
        try {
            font.encode(ch);
            return font.getStringWidth(ch) >= 0;
        } catch (IOException | IllegalArgumentException e) {
            return false;
        }
    }
}
