package org.cohesa.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import org.cohesa.core.records.ChainReport;
import org.cohesa.core.records.SubstitutionRecord;
import org.cohesa.core.solvent.SolventLibrary;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Faults with real processes: a writer JVM killed with SIGKILL in the middle of writing, two writer
 * JVMs (and two connections in threads) at once, and a backup taken while a writer runs.
 */
class RecordProcessesTest {

    @TempDir
    static Path templateDir;
    static Path template;

    @TempDir
    Path dir;
    Path file;

    /** One fresh database with the bundled library (the import takes a moment), copied for each test. */
    @BeforeAll
    static void createTemplate() {
        template = templateDir.resolve("template.db");
        Database.open(template).close();
    }

    @BeforeEach
    void copyTemplate() throws IOException {
        file = dir.resolve("cohesa.db");
        java.nio.file.Files.copy(template, file);
    }

    /** A writer JVM with the test classpath; its "committed N" lines are counted as they arrive. */
    private record Writer(Process process, AtomicInteger committed, Thread reader) {
        void awaitCommitted(int n, long timeoutMs) throws InterruptedException {
            long end = System.currentTimeMillis() + timeoutMs;
            while (committed.get() < n && process.isAlive() && System.currentTimeMillis() < end) {
                Thread.sleep(5);
            }
        }
    }

    private Writer start(int count, String tag) throws IOException {
        String cp = System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
        ProcessBuilder pb = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-XX:TieredStopAtLevel=1", "-Xshare:auto",
                "-Dcohesa.register.key=" + org.cohesa.store.RegisterKeyFile.defaultPath(), "-cp", cp, RecordWriterProcess.class.getName(),
                file.toString(), String.valueOf(count), tag).redirectErrorStream(true);
        Process p = pb.start();
        AtomicInteger committed = new AtomicInteger();
        StringBuilder log = new StringBuilder();
        Thread reader = new Thread(() -> {
            try (BufferedReader r = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8))) {
                String line;
                while ((line = r.readLine()) != null) {
                    if (line.startsWith("committed ")) {
                        committed.set(Integer.parseInt(line.substring(10).strip()));
                    } else if (!line.equals("ready")) {
                        log.append(line).append('\n');
                    }
                }
            } catch (IOException e) {
                // the process was killed while we read: expected in the crash test
            }
        });
        reader.setDaemon(true);
        reader.start();
        return new Writer(p, committed, reader);
    }

    private static void killHard(Process p) throws Exception {
        // SIGKILL: no shutdown hooks, no finally blocks, no chance to finish the transaction
        Process kill = new ProcessBuilder("kill", "-9", String.valueOf(p.pid())).start();
        if (kill.waitFor() != 0) {
            p.destroyForcibly();
        }
        assertTrue(p.waitFor(10, TimeUnit.SECONDS), "the writer did not die");
        assertEquals(137, p.exitValue(), "killed by signal 9 (128 + 9)");
    }

    private long integrityCheck(Database db) throws SQLException {
        try (Statement st = db.connection().createStatement(); ResultSet rs = st.executeQuery("PRAGMA integrity_check")) {
            assertTrue(rs.next());
            assertEquals("ok", rs.getString(1));
        }
        try (Statement st = db.connection().createStatement(); ResultSet rs = st.executeQuery("SELECT COUNT(*) FROM record_event")) {
            rs.next();
            return rs.getLong(1);
        }
    }

    @Test
    void aWriterKilledMidWriteLeavesAConsistentChain() throws Exception {
        int acknowledged = 0;
        for (int round = 0; round < 3; round++) {
            Writer w = start(-1, "crash" + round);
            w.awaitCommitted(12 + 5 * round, 20_000);
            assertTrue(w.process().isAlive(), "the writer must still be writing when it is killed");
            killHard(w.process());
            w.reader().join(2000);
            acknowledged += w.committed().get();
            try (Database db = Database.openWithoutSync(file)) {
                long rows = integrityCheck(db);
                RecordRepository repo = new RecordRepository(db);
                ChainReport report = repo.verify();
                assertTrue(report.intact(), "after kill " + (round + 1) + ": " + report.problems());
                // every write the writer saw committed is there; at most the one in flight when killed is extra
                assertTrue(rows >= acknowledged && rows <= acknowledged + round + 1,
                        "rows " + rows + ", acknowledged " + acknowledged);
                acknowledged = (int) rows;
                // every record folds into a legal history: nothing half-written
                List<SubstitutionRecord> all = repo.all();
                assertEquals(rows, all.stream().mapToLong(r -> r.history().size()).sum());
            }
        }
    }

    @Test
    void twoWriterProcessesAtOnceLoseNothing() throws Exception {
        int perWriter = 16;
        Writer a = start(perWriter, "a");
        Writer b = start(perWriter, "b");
        assertTrue(a.process().waitFor(60, TimeUnit.SECONDS) && b.process().waitFor(60, TimeUnit.SECONDS), "writers finished");
        assertEquals(0, a.process().exitValue());
        assertEquals(0, b.process().exitValue());
        try (Database db = Database.openWithoutSync(file)) {
            RecordRepository repo = new RecordRepository(db);
            ChainReport report = repo.verify();
            assertTrue(report.intact(), report.problems().toString());
            // each writer files perWriter records and sends every second one to review
            assertEquals(2L * (perWriter + perWriter / 2), report.events());
            assertEquals(2L * perWriter, report.records());
            List<SubstitutionRecord> all = repo.all();
            assertEquals(perWriter, all.stream().filter(r -> r.author().equals("writer a")).count());
            assertEquals(perWriter, all.stream().filter(r -> r.author().equals("writer b")).count());
        }
    }

    @Test
    void twoConnectionsInThreadsLoseNothing() throws Exception {
        int perThread = 15;
        List<Thread> threads = new ArrayList<>();
        List<Throwable> failures = new java.util.concurrent.CopyOnWriteArrayList<>();
        for (String tag : new String[] {"left", "right"}) {
            Thread t = new Thread(() -> {
                try (Database db = Database.openWithoutSync(file)) {
                    SolventLibrary lib = new SolventRepository(db).library();
                    RecordRepository repo = new RecordRepository(db);
                    for (int i = 0; i < perThread; i++) {
                        repo.create(RecordFixtures.draft(lib, "thread " + tag + " " + i, "toluene", "ethanol"), tag);
                    }
                } catch (Throwable e) {
                    failures.add(e);
                }
            });
            threads.add(t);
            t.start();
        }
        for (Thread t : threads) {
            t.join(60_000);
        }
        assertTrue(failures.isEmpty(), failures.toString());
        try (Database db = Database.openWithoutSync(file)) {
            ChainReport report = new RecordRepository(db).verify();
            assertTrue(report.intact(), report.problems().toString());
            assertEquals(2L * perThread, report.records());
        }
    }

    @Test
    void aBackupTakenWhileAWriterRunsIsConsistent() throws Exception {
        Writer w = start(-1, "busy");
        w.awaitCommitted(10, 20_000);
        Path copy = dir.resolve("backup.db");
        long live;
        try (Database db = Database.openWithoutSync(file)) {
            db.backupTo(copy);
        } finally {
            live = w.committed().get();
            killHard(w.process());
        }
        try (Database db = Database.openWithoutSync(copy)) {
            integrityCheck(db);
            ChainReport report = new RecordRepository(db).verify();
            assertTrue(report.intact(), report.problems().toString());
            assertTrue(report.events() >= 10 && report.events() <= live + 1, report.events() + " events, writer had " + live);
        }
    }
}
