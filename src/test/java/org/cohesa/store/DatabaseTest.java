package org.cohesa.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.Statement;
import java.util.List;
import org.cohesa.core.BadRowsException;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.solvent.Solvent;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class DatabaseTest {

    @TempDir
    Path dir;

    private static final String HEADER = "name,cas,dD,dP,dH,boiling_point_c,src_hsp\n";

    // Hansen parameters: Alshehri et al. 2022 (toluene, acetone); the second version of the table below is a made-up
    // update used only to exercise the sync
    private static BundledData bundled(String rows) {
        return new BundledData("solvents.csv", (HEADER + rows).getBytes(StandardCharsets.UTF_8));
    }

    private static List<Solvent> readUser(String csv) throws Exception {
        return SolventCsv.read("user.csv", new StringReader(csv), true);
    }

    @Test
    void firstRunBuildsTheDatabaseFromTheShippedTable() {
        try (Database db = Database.open(dir.resolve("a/b/cohesa.db"))) {
            SolventRepository repo = new SolventRepository(db);
            List<Solvent> all = repo.all();
            assertFalse(all.isEmpty());
            assertTrue(all.stream().noneMatch(Solvent::userEntry));
            assertEquals(BundledData.resource("solvents.csv").sha256(), repo.bundledHash().orElseThrow());
            Solvent toluene = repo.library().resolve("x", "toluene");
            // Alshehri et al. 2022 lists toluene at (18.0, 1.4, 2.0) MPa^½
            assertEquals(18.0, toluene.hansen().dD(), 1e-9);
            // every bundled value names a source that SOURCES.md cites
            assertTrue(SourceCatalog.bundled().citation(toluene.sources().get("hsp")).isPresent(), toluene.sources().toString());
        }
    }

    @Test
    void bundledUpdateNeverTouchesUserEntriesOrPrices() throws Exception {
        Path file = dir.resolve("cohesa.db");
        try (Database db = Database.open(file, bundled("toluene,108-88-3,18.0,1.4,2.0,110.6,alshehri2022\n"))) {
            SolventRepository repo = new SolventRepository(db);
            repo.add(readUser("name,dD,dP,dH\nmy thinner,16.0,4.0,6.0\n").get(0));
            repo.setPrice("toluene", 2.5);
        }
        try (Database db = Database.open(file, bundled("toluene,108-88-3,18.0,1.4,2.0,110.6,alshehri2022\nacetone,67-64-1,15.5,10.4,7.0,56.1,alshehri2022\n"))) {
            SolventRepository repo = new SolventRepository(db);
            List<String> names = repo.all().stream().map(Solvent::name).toList();
            assertEquals(List.of("acetone", "my thinner", "toluene"), names);
            assertTrue(repo.library().resolve("x", "my thinner").userEntry());
            assertEquals(2.5, repo.library().resolve("x", "toluene").pricePerLitre());
        }
    }

    @Test
    void userEntryWinsOverANewBundledRowOfTheSameName() throws Exception {
        Path file = dir.resolve("cohesa.db");
        try (Database db = Database.open(file, bundled("toluene,108-88-3,18.0,1.4,2.0,110.6,alshehri2022\n"))) {
            new SolventRepository(db).add(readUser("name,dD,dP,dH\nacetone,15.0,10.0,7.0\n").get(0));
        }
        try (Database db = Database.open(file, bundled("toluene,108-88-3,18.0,1.4,2.0,110.6,alshehri2022\nacetone,67-64-1,15.5,10.4,7.0,56.1,alshehri2022\n"))) {
            Solvent acetone = new SolventRepository(db).library().resolve("x", "acetone");
            assertTrue(acetone.userEntry());
            assertEquals(15.0, acetone.hansen().dD(), 1e-12);
        }
    }

    @Test
    void migratesADatabaseFromSchemaVersionOne() throws Exception {
        Path file = dir.resolve("old.db");
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file); Statement st = c.createStatement()) {
            for (String sql : Migrations.ALL.get(0).statements()) {
                st.execute(sql);
            }
            st.execute("PRAGMA user_version = 1");
            st.execute("INSERT INTO solvent (name, origin, dD, dP, dH, sources) VALUES ('old blend base', 'user', 16, 5, 7, '{}')");
        }
        try (Database db = Database.open(file, bundled("toluene,108-88-3,18.0,1.4,2.0,110.6,alshehri2022\n"))) {
            assertEquals(Migrations.latest(), Migrations.currentVersion(db.connection()));
            SolventRepository repo = new SolventRepository(db);
            assertTrue(repo.library().resolve("x", "old blend base").userEntry());
            repo.setPrice("old blend base", 4.0);   // the table added by schema version 2
            assertEquals(4.0, repo.library().resolve("x", "old blend base").pricePerLitre());
        }
    }

    @Test
    void refusesADatabaseFromANewerProgram() throws Exception {
        Path file = dir.resolve("new.db");
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file); Statement st = c.createStatement()) {
            st.execute("PRAGMA user_version = 999");
        }
        StoreException e = assertThrows(StoreException.class, () -> Database.open(file));
        assertTrue(e.getMessage().contains("newer than this program knows"), e.getMessage());
    }

    @Test
    void importWithAnyBadRowImportsNothingAndListsEveryBadCell() throws Exception {
        String csv = "name,cas,dD,dP,dH,flash_point_c\n"
                + "good one,,16,5,7,20\n"
                + "bad number,,abc,5,7,\n"
                + "bad cas,123-45-6,16,5,7,\n"
                + "negative,,16,-5,7,\n";
        BadRowsException e = assertThrows(BadRowsException.class, () -> readUser(csv));
        assertEquals(3, e.errors().size());
        assertEquals("line 3, column dD, value 'abc': not a number (use a dot as decimal separator)", e.errors().get(0).describe());
        assertEquals("cas", e.errors().get(1).column());
        assertEquals(4, e.errors().get(1).line());
        assertEquals("dP", e.errors().get(2).column());
        assertEquals(5, e.errors().get(2).line());
    }

    @Test
    void importClashingWithTheLibraryStoresNothing() throws Exception {
        try (Database db = Database.open(dir.resolve("c.db"), bundled("toluene,108-88-3,18.0,1.4,2.0,110.6,alshehri2022\n"))) {
            SolventRepository repo = new SolventRepository(db);
            List<Solvent> rows = readUser("name,dD,dP,dH\nnew one,16,5,7\nToluene,18,1,2\n");
            assertThrows(InvalidInputException.class, () -> repo.importAll(rows));
            assertEquals(1, repo.all().size());
        }
    }

    @Test
    void failedTransactionLeavesNothingHalfWritten() throws Exception {
        try (Database db = Database.open(dir.resolve("t.db"), bundled("toluene,108-88-3,18.0,1.4,2.0,110.6,alshehri2022\n"))) {
            assertThrows(StoreException.class, () -> db.inTransaction(c -> {
                try (Statement st = c.createStatement()) {
                    st.executeUpdate("INSERT INTO solvent (name, origin) VALUES ('half', 'user')");
                    st.executeUpdate("INSERT INTO solvent (name, origin) VALUES ('half', 'user')");   // violates UNIQUE
                }
                return null;
            }));
            try (Statement st = db.connection().createStatement(); ResultSet rs = st.executeQuery("SELECT count(*) FROM solvent")) {
                rs.next();
                assertEquals(1, rs.getInt(1));
            }
        }
    }

    @Test
    void bundledRowsCannotBeEditedOrRemoved() {
        try (Database db = Database.open(dir.resolve("d.db"), bundled("toluene,108-88-3,18.0,1.4,2.0,110.6,alshehri2022\n"))) {
            SolventRepository repo = new SolventRepository(db);
            InvalidInputException e = assertThrows(InvalidInputException.class, () -> repo.remove("toluene"));
            assertTrue(e.getMessage().contains("bundled data"), e.getMessage());
        }
    }

    @Test
    void exportReadsBackUnchanged() throws Exception {
        try (Database db = Database.open(dir.resolve("e.db"))) {
            List<Solvent> all = new SolventRepository(db).all();
            java.io.StringWriter w = new java.io.StringWriter();
            SolventCsv.write(w, all);
            List<Solvent> back = SolventCsv.read("export.csv", new StringReader(w.toString()), false);
            assertEquals(all, back);
        }
    }

    @Test
    void casCheckDigitFollowsTheRegistryRule() {
        // CAS Registry: check digit = Σ i·d_i mod 10 (common practice, no source); water 7732-18-5, ethanol 64-17-5
        assertTrue(SolventFields.validCas("7732-18-5"));
        assertTrue(SolventFields.validCas("64-17-5"));
        assertFalse(SolventFields.validCas("64-17-6"));
        assertFalse(SolventFields.validCas("6417-5"));
    }
}
