package org.cohesa.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.cohesa.cli.CliTestSupport.Result;
import org.cohesa.core.SpreadsheetCells;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The hostile-input and fault sweep of the register (issue 17, "Hardening"): exports never replace a file by surprise
 * or a non-regular file, CSV cells are spreadsheet-safe, {@code @file} is text, empty database files are refused, a
 * full disk is reported as one (exit 1) and leaves no file behind, odd targets get one clear line, and direction
 * overrides never reach the terminal.
 */
class RegisterHardeningTest {

    @TempDir
    static Path templateDir;
    static Path template;

    @TempDir
    Path dir;
    Path db;

    @BeforeAll
    static void fileRecords() {
        template = templateDir.resolve("template.db");
        Result r = CliTestSupport.run(template, "record", "add", "--process", "=HYPERLINK(\"http://example.invalid\",\"x\") (invented)",
                "--replaced", "toluene", "--replacement", "ethyl acetate", "--reason", "+cost -test @risk", "--author", "A. Chemist");
        assertEquals(0, r.exitCode(), r.err());
    }

    @BeforeEach
    void copy() throws Exception {
        db = dir.resolve("cohesa.db");
        Files.copy(template, db);
    }

    private Result run(String... args) {
        return CliTestSupport.run(db, args);
    }

    @Test
    void exportsRefuseAnExistingFileUnlessTold() throws Exception {
        Path csv = dir.resolve("register.csv");
        Files.writeString(csv, "keep me");
        for (String[] args : List.of(new String[] {"record", "export", "--csv", csv.toString()},
                new String[] {"record", "export", "1", "--pdf", csv.toString()},
                new String[] {"solvents", "export", csv.toString()})) {
            Result r = run(args);
            assertEquals(2, r.exitCode(), String.join(" ", args) + ": " + r.err());
            assertTrue(r.err().contains("already exists; give --overwrite"), r.err());
            assertEquals("keep me", Files.readString(csv), "the file is untouched");
        }
        Result ok = run("record", "export", "--csv", csv.toString(), "--overwrite");
        assertEquals(0, ok.exitCode(), ok.err());
        assertTrue(Files.readString(csv).startsWith("id,status,"));
        assertEquals(0, run("solvents", "export", csv.toString(), "--overwrite").exitCode());
    }

    @Test
    void aDeviceFolderOrProcFileIsNeverReplaced() throws Exception {
        for (String target : List.of("/dev/null", "/dev/full", dir.toString(), "/proc/self/status", "/proc/cohesa-test.csv")) {
            for (String[] args : List.of(new String[] {"record", "export", "--csv", target, "--overwrite"},
                    new String[] {"solvents", "export", target, "--overwrite"}, new String[] {"backup", target})) {
                Result r = run(args);
                assertEquals(2, r.exitCode(), String.join(" ", args) + ": " + r.out() + r.err());
                assertEquals(1, r.err().strip().lines().count(), "one line: " + r.err());
                assertTrue(r.err().contains(target), String.join(" ", args) + " names the target: " + r.err());
            }
        }
        assertFalse(Files.isRegularFile(Path.of("/dev/null")), "still a device");
    }

    @Test
    void csvCellsThatASpreadsheetWouldRunAreNeutralised() throws Exception {
        Path csv = dir.resolve("register.csv");
        assertEquals(0, run("record", "export", "--csv", csv.toString()).exitCode());
        try (Reader in = Files.newBufferedReader(csv, StandardCharsets.UTF_8);
             CSVParser p = CSVParser.builder().setReader(in).setFormat(CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get()).get()) {
            CSVRecord row = p.getRecords().get(0);
            assertTrue(row.get("process").startsWith("'=HYPERLINK"), row.get("process"));
            assertTrue(row.get("reason").startsWith("'+cost"), row.get("reason"));
            assertEquals(64, row.get("record_head_hash").length());
        }
        // the same for the solvent table; it reads back with the apostrophe removed, and plain numbers stay numbers
        Result add = run("solvents", "add", "--name", "@invented test liquid", "--dD", "16", "--dP", "4", "--dH", "5",
                "--set", "melting_point_c=-95", "--set", "note=-1+1 (invented)");
        assertEquals(0, add.exitCode(), add.err());
        Path lib = dir.resolve("mine.csv");
        assertEquals(0, run("solvents", "export", lib.toString(), "--mine").exitCode());
        String text = Files.readString(lib);
        assertTrue(text.contains("'@invented test liquid"), text);
        assertTrue(text.contains(",-95,"), "a negative number is not guarded: " + text);
        assertTrue(text.contains("'-1+1 (invented)"), text);
        assertEquals(0, run("solvents", "remove", "@invented test liquid").exitCode());
        Result back = run("solvents", "import", lib.toString());
        assertEquals(0, back.exitCode(), back.err());
        assertTrue(run("solvent", "@invented test liquid", "--json").out().contains("\"@invented test liquid\""));
    }

    @Test
    void spreadsheetGuardRoundTrips() {
        // OWASP "CSV Injection": =, +, -, @, tab and carriage return start a formula
        for (String live : List.of("=1+1", "+1+1", "-1+1", "@SUM(A1)", "\t=1", "\r=1")) {
            assertEquals("'" + live, SpreadsheetCells.guard(live));
            assertEquals(live, SpreadsheetCells.unguard(SpreadsheetCells.guard(live)));
        }
        for (String safe : List.of("-95", "+3.5", "-1.2e-3", "toluene", "", "'quoted")) {
            assertEquals(safe, SpreadsheetCells.guard(safe));
        }
    }

    @Test
    void atFileArgumentsStayText() throws Exception {
        Path alice = Path.of("alice");
        boolean created = !Files.exists(alice);
        if (created) {
            Files.writeString(alice, "contents of a file named alice");
        }
        try {
            Result r = run("record", "add", "--process", "p (invented)", "--replaced", "toluene", "--replacement", "ethanol",
                    "--reason", "test", "--author", "@alice", "--json");
            assertEquals(0, r.exitCode(), r.err());
            assertEquals("@alice", r.json().get("author").asText());
        } finally {
            if (created) {
                Files.deleteIfExists(alice);
            }
        }
    }

    @Test
    void anEmptyDatabaseFileIsRefused() throws Exception {
        Path empty = dir.resolve("empty.db");
        Files.createFile(empty);
        Result r = CliTestSupport.run(empty, "record", "list");
        assertEquals(2, r.exitCode(), r.err());
        assertTrue(r.err().contains("empty file (0 bytes)"), r.err());
        assertEquals(0, Files.size(empty), "left as it was");
    }

    @Test
    void directionOverridesAreRefusedInFieldsAndNeverPrintedRaw() throws Exception {
        Result r = run("record", "add", "--process", "thinner \u202Eevil\u202C (invented)", "--replaced", "toluene", "--replacement", "ethanol",
                "--reason", "test", "--author", "A. Chemist");
        assertEquals(2, r.exitCode(), r.err());
        assertTrue(r.err().contains("--process") && r.err().contains("text-direction"), r.err());
        Result name = run("record", "review", "1", "--by", "Q.\u202E Reviewer");
        assertEquals(2, name.exitCode(), name.err());
        // text already stored (by an older version or with SQL) is shown escaped
        assertEquals("a\\u202Eb", org.cohesa.core.TextLimits.visible("a\u202Eb"));
        TextTable t = new TextTable("x");
        t.row("a\u202Eb");
        java.io.StringWriter out = new java.io.StringWriter();
        t.print(new java.io.PrintWriter(out));
        assertFalse(out.toString().contains("\u202E"));
    }

    @Test
    void aFullDiskIsSaidToBeOneAndLeavesNothingBehind() throws Exception {
        assertEquals(1, ErrorHandling.describe(new java.io.IOException("No space left on device")).exitCode());
        assertEquals(1, ErrorHandling.describe(new java.nio.file.FileSystemException("/x/y", null, "No space left on device")).exitCode());
        Path mount = FullDisk.mount(dir);
        assumeTrue(mount != null, "no small file system could be mounted here (needs root and mount); the full-disk run is skipped");
        try {
            // backup: a copy larger than the disk fails with exit 1 and no file, so the retry is not blocked
            Path target = mount.resolve("backup.db");
            Result b = run("backup", target.toString());
            assertEquals(1, b.exitCode(), b.out() + b.err());
            assertTrue(b.err().contains("disk is full"), b.err());
            assertFalse(Files.exists(target), "no file left behind: " + b.err());
            try (var files = Files.list(mount)) {
                assertEquals(0, files.count(), "no temporary file left behind");
            }
            // exports: fill the disk, then exit 1 "disk is full" (not 2, "bad input")
            FullDisk.fill(mount);
            Result e = run("record", "export", "--csv", mount.resolve("register.csv").toString());
            assertEquals(1, e.exitCode(), e.err());
            assertTrue(e.err().contains("disk is full"), e.err());
            assertFalse(Files.exists(mount.resolve("register.csv")));
        } finally {
            FullDisk.unmount(mount);
        }
    }

    /** A 64 KiB tmpfs, where the machine allows mounting one. */
    static final class FullDisk {
        static Path mount(Path parent) {
            try {
                Path m = parent.resolve("small-disk");
                Files.createDirectories(m);
                Process p = new ProcessBuilder("mount", "-t", "tmpfs", "-o", "size=64k", "tmpfs", m.toString()).redirectErrorStream(true).start();
                p.getInputStream().readAllBytes();
                return p.waitFor(20, TimeUnit.SECONDS) && p.exitValue() == 0 ? m : null;
            } catch (Exception e) {
                return null;
            }
        }

        static void fill(Path m) {
            try (var out = Files.newOutputStream(m.resolve("filler"))) {
                byte[] block = new byte[4096];
                while (true) {
                    out.write(block);
                }
            } catch (java.io.IOException full) {
                // the disk is full now
            }
        }

        static void unmount(Path m) throws Exception {
            Process p = new ProcessBuilder("umount", m.toString()).redirectErrorStream(true).start();
            p.getInputStream().readAllBytes();
            p.waitFor(20, TimeUnit.SECONDS);
        }
    }

    @Test
    void selfApprovalIsRefusedWithExit2UnlessTheSiteSwitchesTheRuleOff() {
        // the author's own operating-system account, under another typed name
        Result ownAccount = run("record", "review", "1", "--by", "Q. Reviewer");
        assertEquals(2, ownAccount.exitCode(), ownAccount.err());
        assertTrue(ownAccount.err().startsWith("error: --by 'Q. Reviewer': four-eyes rule: ") && ownAccount.err().contains("filed record 1")
                && ownAccount.err().contains("operating-system account (" + org.cohesa.store.LocalAccount.current() + ")"), ownAccount.err());
        assertEquals(1, ownAccount.err().strip().lines().count(), ownAccount.err());
        assertEquals(0, CliTestSupport.runAs("qreviewer", db, "record", "review", "1", "--by", "Q. Reviewer").exitCode());
        Result self = CliTestSupport.runAs("mmanager", db, "record", "approve", "1", "--by", "q. reviewer", "--comment", "fine");
        assertEquals(2, self.exitCode(), self.err());
        assertTrue(self.err().contains("four-eyes rule") && self.err().contains("reviewed record 1"), self.err());
        assertEquals(1, self.err().strip().lines().count(), self.err());
        Result reviewerAccount = CliTestSupport.runAs("qreviewer", db, "record", "approve", "1", "--by", "M. Manager", "--comment", "fine");
        assertEquals(2, reviewerAccount.exitCode(), reviewerAccount.err());
        assertTrue(reviewerAccount.err().contains("reviewed record 1") && reviewerAccount.err().contains("(qreviewer)"), reviewerAccount.err());
        assertEquals(1, run("record", "show", "1", "--json").json().get("history").size() - 1, "refused steps wrote nothing");
        Result off = run("record", "rule", "four-eyes", "off", "--by", "M. Manager", "--reason", "one-person lab (invented)", "--json");
        assertEquals(0, off.exitCode(), off.err());
        assertFalse(off.json().get("on").asBoolean());
        assertEquals(0, CliTestSupport.runAs("qreviewer", db, "record", "approve", "1", "--by", "Q. Reviewer", "--comment", "fine").exitCode());
        assertEquals("qreviewer", run("record", "show", "1", "--json").json().get("history").get(2).get("account").asText(),
                "the account is recorded with the step");
        assertTrue(run("record", "rule", "four-eyes").out().contains("off (set by M. Manager"));
        assertEquals(0, run("record", "verify").exitCode(), "the switch is part of the intact chain");
    }

    @Test
    void anAnchorFileChecksTheRegisterLater() throws Exception {
        Path anchor = dir.resolve("anchor.json");
        Result a = run("record", "anchor", anchor.toString(), "--json");
        assertEquals(0, a.exitCode(), a.err());
        assertEquals(64, a.json().get("head_hash").asText().length());
        assertEquals(64, a.json().get("mac").asText().length(), "sealed with the register key");
        assertEquals(2, run("record", "anchor", anchor.toString()).exitCode(), "an anchor is not overwritten by accident");
        assertEquals(0, CliTestSupport.runAs("qreviewer", db, "record", "review", "1", "--by", "Q. Reviewer").exitCode());
        Result later = run("record", "verify", "--anchor", anchor.toString(), "--json");
        assertEquals(0, later.exitCode(), later.out());
        assertEquals(1, later.json().get("events_since_anchor").asInt());
        Result hash = run("record", "verify", "--anchor", a.json().get("head_hash").asText());
        assertEquals(0, hash.exitCode(), hash.out());
        Result wrong = run("record", "verify", "--anchor", "ab".repeat(32));
        assertEquals(1, wrong.exitCode(), wrong.out());
        assertTrue(wrong.out().contains("anchor_mismatch"), wrong.out());
        Result junk = run("record", "verify", "--anchor", "not-a-hash");
        assertEquals(2, junk.exitCode(), junk.err());
    }

    @AfterAll
    static void nothing() {
        // the mounts are removed in each test's finally block
    }
}
