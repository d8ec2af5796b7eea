package org.cohesa.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.cohesa.core.records.RecordEvent;
import org.cohesa.core.records.RecordStatus;
import org.cohesa.core.records.SubstitutionRecord;
import org.cohesa.store.Database;
import org.cohesa.store.RecordFixtures;
import org.cohesa.store.RecordRepository;
import org.cohesa.store.SolventRepository;
import org.cohesa.store.SqliteRegister;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The PDF report read back with PDFBox's text extraction, with the system font and with the built-in fallback. */
class RecordPdfTest {

    @TempDir
    static Path dir;

    /** One rejected record, filed once for both renderings. */
    @BeforeAll
    static void fileRecord() {
        try (Database db = Database.open(dir.resolve("cohesa.db"))) {
            RecordRepository repo = new RecordRepository(new SqliteRegister(db, "bauthor"), java.time.Clock.systemUTC(), null);
            repo.create(RecordFixtures.draft(new SolventRepository(db).library(), "tablet coating (invented)", "1,4-dioxane:0.3,water:0.7", "ethanol"),
                    "B. Author");
            new RecordRepository(new SqliteRegister(db, "rreviewer"), java.time.Clock.systemUTC(), null)
                    .changeStatus(1, RecordStatus.IN_REVIEW, "R. Reviewer", null);
            new RecordRepository(new SqliteRegister(db, "mmanager"), java.time.Clock.systemUTC(), null).changeStatus(1, RecordStatus.REJECTED, "M. Manager", "drying too slow in the pilot coater");
        }
    }

    private String render(boolean systemFonts) throws Exception {
        try (Database db = Database.openWithoutSync(dir.resolve("cohesa.db"))) {
            RecordRepository repo = new RecordRepository(db);
            SubstitutionRecord r = repo.get(1);
            List<RecordEvent> events = repo.events(1);
            Path pdf = dir.resolve(systemFonts ? "system.pdf" : "fallback.pdf");
            RecordPdf.write(r, events.get(events.size() - 1).hash(), repo.verify(), "test", pdf, systemFonts);
            try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
                // the report proper on one or two pages, then the appendix with every data source in full
                assertTrue(doc.getNumberOfPages() <= 4, doc.getNumberOfPages() + " pages");
                assertTrue(new PDFTextStripper().getText(doc).contains("Appendix: data sources in full"));
                assertEquals("B. Author", doc.getDocumentInformation().getAuthor());
                String text = new PDFTextStripper().getText(doc);
                assertTrue(text.contains(events.get(events.size() - 1).hash()), "the footer carries the newest event hash");
                return text;
            }
        }
    }

    @Test
    void theRankingSectionOfTheEvidenceIsPrinted() throws Exception {
        Path db = dir.resolve("ranked.db");
        SubstitutionRecord r;
        List<RecordEvent> events;
        try (Database d = Database.open(db)) {
            RecordRepository repo = new RecordRepository(new SqliteRegister(d, "bauthor"), java.time.Clock.systemUTC(), null);
            repo.create(RecordFixtures.assembledDraft(new SolventRepository(d).library(), "degreasing (invented)", "dichloromethane", "ethyl acetate"),
                    "B. Author");
            r = repo.get(1);
            events = repo.events(1);
            Path pdf = dir.resolve("ranked.pdf");
            RecordPdf.write(r, events.get(events.size() - 1).hash(), repo.verify(), "test", pdf, false);
            String text;
            try (PDDocument doc = Loader.loadPDF(pdf.toFile())) {
                text = new PDFTextStripper().getText(doc);
            }
            var ranking = r.evidence().section(org.cohesa.core.records.Evidence.Sections.RANKING).orElseThrow();
            // what the record's JSON files is what the PDF prints: heading, RED, weights and each ranking term (ethyl acetate
            // is one component, CHEM21 "recommended" by default scoring — Prat et al., Green Chem. 18 (2016) 288, scores from memory)
            assertTrue(text.contains("Why the replacement ranks as it does") && text.contains("Score without cost"), text);
            assertTrue(text.contains(ranking.get("weights").asText().substring(0, 20)), text);
            assertTrue(ranking.get("why").size() >= 2, ranking.toString());
            assertTrue(text.replaceAll("\\s+", " ").contains("1 component"), text);
        }
    }

    @Test
    void theBuiltInFontWritesDeltaAsD() throws Exception {
        String text = render(false);
        assertTrue(text.contains("dD, dP, dH"), text);
        assertFalse(text.contains("δ"), "Helvetica cannot encode δ");
        for (String fact : List.of("REJECTED", "1,4-dioxane 30 % + water 70 %", "ethanol", "drying too slow in the pilot coater",
                "M. Manager", "H350")) {   // 1,4-dioxane: Carc. 1B, H350 (CLP Annex VI index 603-024-00-5 as given by SUBSPORT+ case 264-EN, carried by the bundled table)
            assertTrue(text.contains(fact), "missing '" + fact + "' in\n" + text);
        }
    }

    @Test
    void aSystemTrueTypeFontWritesDelta() throws Exception {
        String text = render(true);
        boolean unicodeFont = text.contains("δD, δP, δH");
        // CI machines without DejaVu/Arial fall back to dD; either way the parameter row is there
        assertTrue(unicodeFont || text.contains("dD, dP, dH"), text);
        assertTrue(text.contains("rejected"), text);
    }
}
