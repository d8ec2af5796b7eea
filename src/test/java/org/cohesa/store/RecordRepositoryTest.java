package org.cohesa.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.List;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.records.ChainProblem;
import org.cohesa.core.records.ChainReport;
import org.cohesa.core.records.RecordStatus;
import org.cohesa.core.records.SubstitutionRecord;
import org.cohesa.core.solvent.SolventLibrary;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The register in SQLite: status steps, append-only storage, and tampering done with plain SQL outside the app. */
class RecordRepositoryTest {

    /** Filed once per class (opening a fresh database imports the whole bundled table), copied for each test. */
    @TempDir
    static Path templateDir;
    static Path template;

    @TempDir
    Path dir;
    Path file;

    @BeforeAll
    static void fileThreeRecords() {
        template = templateDir.resolve("template.db");
        try (Database db = Database.open(template)) {
            SolventLibrary lib = new SolventRepository(db).library();
            RecordRepository repo = new RecordRepository(db);
            repo.create(RecordFixtures.draft(lib, "degreasing bath (invented)", "toluene", "ethyl acetate"), "A. Author");
            repo.create(RecordFixtures.draft(lib, "tablet coating (invented)", "1,4-dioxane", "ethanol:0.7,water:0.3"), "B. Author");
            RecordRepository reviewer = new RecordRepository(new SqliteRegister(db, "rreviewer"), java.time.Clock.systemUTC(), null);
            reviewer.changeStatus(1, RecordStatus.IN_REVIEW, "R. Reviewer", null);
            repo.create(RecordFixtures.draft(lib, "ink wash (invented)", "n-hexane", "ethyl acetate:0.5,ethanol:0.5"), "C. Author");
            reviewer.changeStatus(2, RecordStatus.IN_REVIEW, "R. Reviewer", "looks complete");
            new RecordRepository(new SqliteRegister(db, "mmanager"), java.time.Clock.systemUTC(), null)
                    .changeStatus(1, RecordStatus.APPROVED, "M. Manager", "lab trials passed");
        }
    }

    @BeforeEach
    void copyTemplate() throws java.io.IOException {
        file = dir.resolve("cohesa.db");
        java.nio.file.Files.copy(template, file);
    }

    private <T> T withRepo(java.util.function.Function<RecordRepository, T> f) {
        try (Database db = Database.openWithoutSync(file)) {
            return f.apply(new RecordRepository(db));
        }
    }

    /** Plain SQL through a connection of its own, as a person with a database tool would do it. */
    private void outsideEdit(String... sql) throws SQLException {
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file); Statement st = c.createStatement()) {
            st.execute("DROP TRIGGER IF EXISTS record_event_append_only_update");
            st.execute("DROP TRIGGER IF EXISTS record_event_append_only_delete");
            for (String s : sql) {
                st.execute(s);
            }
        }
    }

    private ChainProblem firstProblem() {
        ChainReport r = withRepo(RecordRepository::verify);
        assertFalse(r.intact(), "the edit must be detected");
        return r.firstProblem().orElseThrow();
    }

    @Test
    void historyIsAppendedAndTheChainIsIntact() {
        SubstitutionRecord r = withRepo(repo -> repo.get(1));
        assertEquals(RecordStatus.APPROVED, r.status());
        assertEquals(List.of("created", "sent_to_review", "approved"), r.history().stream().map(h -> h.kind()).toList());
        assertEquals("lab trials passed", r.history().get(2).comment());
        assertEquals("M. Manager", r.history().get(2).by());
        ChainReport report = withRepo(RecordRepository::verify);
        assertTrue(report.intact(), report.problems().toString());
        assertEquals(6, report.events());
        assertEquals(3, report.records());
        assertTrue(withRepo(RecordRepository::guardsInPlace));
    }

    @Test
    void illegalMovesAndUnknownRecordsChangeNothing() {
        long before = withRepo(repo -> (long) repo.chain().size());
        assertThrows(InvalidInputException.class, () -> withRepo(repo -> repo.changeStatus(3, RecordStatus.APPROVED, "X", "skip review")));
        assertThrows(InvalidInputException.class, () -> withRepo(repo -> repo.changeStatus(1, RecordStatus.REJECTED, "X", "too late")));
        assertThrows(InvalidInputException.class, () -> withRepo(repo -> repo.changeStatus(42, RecordStatus.IN_REVIEW, "X", null)));
        assertThrows(InvalidInputException.class, () -> withRepo(repo -> repo.changeStatus(3, RecordStatus.IN_REVIEW, " ", null)));
        long after = withRepo(repo -> (long) repo.chain().size());
        assertEquals(before, after);
        assertTrue(withRepo(RecordRepository::verify).intact());
    }

    @Test
    void theAppsOwnConnectionCannotRewriteOrDeleteEvents() {
        try (Database db = Database.openWithoutSync(file); Statement st = db.connection().createStatement()) {
            SQLException e = assertThrows(SQLException.class, () -> st.execute("UPDATE record_event SET actor = 'someone else' WHERE id = 1"));
            assertTrue(e.getMessage().contains("append-only"), e.getMessage());
            assertThrows(SQLException.class, () -> st.execute("DELETE FROM record_event WHERE id = 2"));
        } catch (SQLException e) {
            throw new AssertionError(e);
        }
    }

    @Test
    void aRowEditedWithPlainSqlIsNamed() throws SQLException {
        outsideEdit("UPDATE record_event SET payload = replace(payload, 'toluene', 'xylene') WHERE record_id = 1 AND seq = 1");
        ChainProblem p = firstProblem();
        assertEquals(ChainProblem.Kind.ALTERED, p.kind());
        assertEquals(1, p.recordId());
    }

    @Test
    void aChangedApproverIsNamed() throws SQLException {
        outsideEdit("UPDATE record_event SET actor = 'Someone Senior' WHERE record_id = 1 AND seq = 3");
        ChainProblem p = firstProblem();
        assertEquals(ChainProblem.Kind.ALTERED, p.kind());
        assertEquals(1, p.recordId());
        assertEquals(3, p.seq());
    }

    @Test
    void aDeletedRowIsNamed() throws SQLException {
        outsideEdit("DELETE FROM record_event WHERE record_id = 2 AND seq = 2");
        ChainProblem p = firstProblem();
        assertEquals(ChainProblem.Kind.DELETED, p.kind());
        assertEquals(2, p.recordId());
    }

    @Test
    void aDeletedWholeRecordIsNamed() throws SQLException {
        outsideEdit("DELETE FROM record_event WHERE record_id = 3");
        ChainProblem p = firstProblem();
        assertEquals(ChainProblem.Kind.DELETED, p.kind());
        assertEquals(3, p.recordId());
    }

    @Test
    void twoSwappedRowsAreNamed() throws SQLException {
        // positions 2 (record 2 filed) and 3 (record 1 sent to review) change places
        outsideEdit("UPDATE record_event SET id = -1 WHERE id = 2",
                "UPDATE record_event SET id = 2 WHERE id = 3",
                "UPDATE record_event SET id = 3 WHERE id = -1");
        ChainProblem p = firstProblem();
        assertEquals(ChainProblem.Kind.REORDERED, p.kind());
        assertEquals(1, p.recordId());
        assertEquals(2, p.position());
    }

    @Test
    void aDeletedNewestRowIsNamedThroughTheHeadNote() throws SQLException {
        outsideEdit("DELETE FROM record_event WHERE id = (SELECT MAX(id) FROM record_event)");
        ChainProblem p = firstProblem();
        assertEquals(ChainProblem.Kind.DELETED, p.kind());
        assertEquals(1, p.recordId());
        assertEquals(3, p.seq());
    }

    @Test
    void anEditWithTheSqlite3ToolIsNamed() throws Exception {
        assumeTrue(onPath("sqlite3"), "sqlite3 command-line tool not installed; the JDBC tamper tests cover the same edits");
        Process p = new ProcessBuilder("sqlite3", file.toString(),
                "DROP TRIGGER record_event_append_only_update; UPDATE record_event SET payload = replace(payload, 'lab trials passed', 'no trials needed') WHERE id = 6;")
                .redirectErrorStream(true).start();
        String out = new String(p.getInputStream().readAllBytes());
        assertEquals(0, p.waitFor(), out);
        ChainProblem problem = firstProblem();
        assertEquals(ChainProblem.Kind.ALTERED, problem.kind());
        assertEquals(1, problem.recordId());
        assertFalse(withRepo(RecordRepository::guardsInPlace), "the dropped guard is noticed");
    }

    static boolean onPath(String tool) {
        String path = System.getenv("PATH");
        if (path == null) {
            return false;
        }
        for (String d : path.split(java.io.File.pathSeparator)) {
            if (java.nio.file.Files.isExecutable(Path.of(d, tool))) {
                return true;
            }
        }
        return false;
    }
}
