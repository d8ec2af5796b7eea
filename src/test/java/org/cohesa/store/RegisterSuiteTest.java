package org.cohesa.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

import org.cohesa.core.InvalidInputException;
import org.cohesa.core.records.Anchor;
import org.cohesa.core.records.ChainProblem;
import org.cohesa.core.records.ChainReport;
import org.cohesa.core.records.EventHash;
import org.cohesa.core.records.RecordDraft;
import org.cohesa.core.records.RecordEvent;
import org.cohesa.core.records.RecordStatus;
import org.cohesa.core.records.RegisterKey;
import org.cohesa.core.records.SubstitutionRecord;
import org.cohesa.core.solvent.SolventLibrary;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The records suite on both stores (the local SQLite file and the shared PostgreSQL register): filing, review and
 * approval with the four-eyes rule, the database's own append-only guards, and the attacks of issue 17 done with plain
 * SQL as an owner of the database would do them — each detected with the key and/or an anchor, and reported as
 * undetectable where neither is given. PostgreSQL runs are skipped with a message when no server is available
 * ({@link RegisterStores}).
 */
class RegisterSuiteTest {

    @TempDir
    static Path shared;
    static Path libraryDb;
    static SolventLibrary library;

    @TempDir
    Path dir;
    RegisterStores.Store store;
    Path keyFile;

    @BeforeAll
    static void loadLibrary() {
        libraryDb = shared.resolve("library.db");
        try (Database db = Database.open(libraryDb)) {
            library = new SolventRepository(db).library();
        }
    }

    static List<String> stores() {
        return RegisterStores.names();
    }

    private void use(String name) {
        if (name.equals("postgresql")) {
            String why = RegisterStores.postgresUnavailable();
            assumeTrue(why == null, why);
            store = RegisterStores.postgres();
        } else {
            store = RegisterStores.sqlite(dir);
        }
        keyFile = dir.resolve("register.key");
    }

    @AfterEach
    void closeStore() {
        if (store != null) {
            store.close();
        }
    }

    private RecordRepository as(String person) {
        return store.as(person, keyFile);
    }

    /** Checks with the register's own seal: the key file on SQLite, the server's secret on PostgreSQL (step 9). */
    static final boolean SEALED = true;
    /** Checks without any secret (what someone sees who has neither the key file nor a server that holds the secret). */
    static final boolean UNSEALED = false;

    private RegisterKey keyFile() {
        return RegisterKeyFile.load("--key", keyFile).orElse(null);
    }

    /** The id of what seals the register (the key file's key, or the server's secret). */
    private String sealId() {
        return as("erin").sealId(keyFile()).orElseThrow();
    }

    private static RecordDraft draft(String process) {
        return RecordFixtures.draft(library, process + " (invented)", "toluene", "ethyl acetate:0.5,n-butyl acetate:0.5");
    }

    /** Record 1 approved (alice files, bob reviews, carol approves), record 2 in review, record 3 draft: 6 events. */
    private void fileThree() {
        as("alice").create(draft("degreasing bath"), "A. Author");
        as("alice").create(draft("tablet coating"), "A. Author");
        as("bob").changeStatus(1, RecordStatus.IN_REVIEW, "B. Reviewer", null);
        as("carol").create(draft("ink wash"), "C. Author");
        as("bob").changeStatus(2, RecordStatus.IN_REVIEW, "B. Reviewer", "looks complete");
        as("carol").changeStatus(1, RecordStatus.APPROVED, "M. Manager", "lab trials passed");
    }

    private ChainReport verify(boolean sealed, Anchor anchor) {
        return sealed ? as("erin").verify(keyFile(), anchor) : as("erin").verifyWithoutSeal(anchor);
    }

    private Anchor anchorNow() {
        ChainReport r = verify(SEALED, null);
        assertTrue(r.intact(), r.problems().toString());
        return new Anchor(r.headHash(), r.events(), r.records(), RecordEvent.formatAt(Instant.now()), sealId(), null);
    }

    // ---------------------------------------------------------------- the register as people use it

    @ParameterizedTest(name = "{0}")
    @MethodSource("stores")
    void eventsAreSealedAndCarryTheActingAccount(String name) {
        use(name);
        fileThree();
        ChainReport r = verify(SEALED, null);
        assertTrue(r.intact(), r.problems().toString());
        assertEquals(6, r.events());
        assertEquals(3, r.records());
        assertEquals(6, r.sealedEvents());
        SubstitutionRecord one = as("erin").get(1);
        assertEquals(RecordStatus.APPROVED, one.status());
        assertEquals(List.of("alice", "bob", "carol"), one.history().stream().map(h -> h.account()).toList(), "the acting accounts");
        assertEquals(List.of("A. Author", "B. Reviewer", "M. Manager"), one.history().stream().map(h -> h.by()).toList(), "the typed names");
        assertTrue(as("erin").guardsInPlace());
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("stores")
    void illegalMovesAndUnknownRecordsChangeNothing(String name) {
        use(name);
        fileThree();
        long before = as("erin").chain().size();
        assertThrows(InvalidInputException.class, () -> as("erin").changeStatus(3, RecordStatus.APPROVED, "E. Someone", "skip review"));
        assertThrows(InvalidInputException.class, () -> as("erin").changeStatus(1, RecordStatus.REJECTED, "E. Someone", "too late"));
        assertThrows(InvalidInputException.class, () -> as("erin").changeStatus(42, RecordStatus.IN_REVIEW, "E. Someone", null));
        assertEquals(before, as("erin").chain().size());
        assertTrue(verify(SEALED, null).intact());
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("stores")
    void fourEyesAuthorCannotReviewAndReviewerCannotApprove(String name) {
        use(name);
        as("alice").create(draft("enamel thinner"), "A. Author");
        InvalidInputException self = assertThrows(InvalidInputException.class,
                () -> as("bob").changeStatus(1, RecordStatus.IN_REVIEW, "a. author", null));
        assertTrue(self.getMessage().contains("four-eyes"), self.getMessage());
        InvalidInputException ownAccount = assertThrows(InvalidInputException.class,
                () -> as("alice").changeStatus(1, RecordStatus.IN_REVIEW, "B. Reviewer", null));
        assertTrue(ownAccount.getMessage().contains("filed record 1") && ownAccount.getMessage().contains("(alice)"), ownAccount.getMessage());
        as("bob").changeStatus(1, RecordStatus.IN_REVIEW, "B. Reviewer", null);
        InvalidInputException reviewer = assertThrows(InvalidInputException.class,
                () -> as("carol").changeStatus(1, RecordStatus.APPROVED, "B. Reviewer", "ok"));
        assertTrue(reviewer.getMessage().contains("reviewed record 1"), reviewer.getMessage());
        InvalidInputException author = assertThrows(InvalidInputException.class,
                () -> as("carol").changeStatus(1, RecordStatus.APPROVED, "A.  Author", "ok"));
        assertTrue(author.getMessage().contains("filed record 1"), author.getMessage());
        // the same account at the keyboard under another typed name: refused on both stores (OS account, login)
        InvalidInputException reviewerAccount = assertThrows(InvalidInputException.class,
                () -> as("bob").changeStatus(1, RecordStatus.APPROVED, "M. Manager", "ok"));
        assertTrue(reviewerAccount.getMessage().contains("reviewed record 1") && reviewerAccount.getMessage().contains("(bob)"),
                reviewerAccount.getMessage());
        InvalidInputException authorAccount = assertThrows(InvalidInputException.class,
                () -> as("alice").changeStatus(1, RecordStatus.APPROVED, "M. Manager", "ok"));
        assertTrue(authorAccount.getMessage().contains("filed record 1") && authorAccount.getMessage().contains("(alice)"),
                authorAccount.getMessage());
        assertEquals(1, authorAccount.getMessage().lines().count(), "one line");
        as("carol").changeStatus(1, RecordStatus.APPROVED, "M. Manager", "lab trials passed");
        assertEquals(3, as("erin").chain().size(), "refused steps wrote nothing");
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("stores")
    void theSiteCanSwitchFourEyesOffAndTheSwitchIsRecorded(String name) {
        use(name);
        assertTrue(as("erin").fourEyes().on(), "on by default");
        if (name.equals("postgresql")) {
            // on the shared register only the owner or a register administrator switches rules (the server refuses others)
            InvalidInputException notAdmin = assertThrows(InvalidInputException.class,
                    () -> as("alice").setFourEyes(false, "A. Author", "I want to approve my own"));
            assertTrue(notAdmin.getMessage().contains("cohesa_register_admin"), notAdmin.getMessage());
            assertEquals(0, as("erin").chain().size(), "nothing written");
        }
        as("erin").setFourEyes(false, "M. Manager", "one-person lab (invented)");
        as("alice").create(draft("enamel thinner"), "A. Author");
        as("alice").changeStatus(1, RecordStatus.IN_REVIEW, "A. Author", null);
        as("alice").changeStatus(1, RecordStatus.APPROVED, "A. Author", "self-approved under the site rule");
        var rule = as("erin").fourEyes();
        assertFalse(rule.on());
        assertEquals("M. Manager", rule.by());
        assertEquals("erin", rule.account());
        assertEquals("one-person lab (invented)", rule.reason());
        assertEquals(List.of("alice", "alice", "alice"), as("erin").get(1).history().stream().map(h -> h.account()).toList(),
                "one account filed, reviewed and approved, as the rule now allows, and the register shows it");
        ChainReport r = verify(SEALED, null);
        assertTrue(r.intact(), r.problems().toString());
        assertEquals(4, r.events(), "the switch is an event of the chain");
        assertEquals(1, as("erin").all().size(), "the register's settings are not a record");
        as("erin").setFourEyes(true, "M. Manager", "second person hired");
        assertTrue(as("erin").fourEyes().on());
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("stores")
    void theDatabaseRefusesToRewriteOrDeleteEvents(String name) throws SQLException {
        use(name);
        fileThree();
        try (Connection c = store.admin(); Statement st = c.createStatement()) {
            SQLException e = assertThrows(SQLException.class, () -> st.execute("UPDATE record_event SET actor = 'someone else' WHERE record_id = 1"));
            assertTrue(e.getMessage().contains("append-only"), e.getMessage());
            if (!c.getAutoCommit()) {
                c.rollback();
            }
            assertThrows(SQLException.class, () -> st.execute("DELETE FROM record_event WHERE record_id = 2"));
        }
        if (name.equals("postgresql")) {
            // a writer's login cannot claim another account, nor touch the events at all
            try (Connection bob = RegisterStores.adminConnection(store.address("bob"), null); Statement st = bob.createStatement()) {
                SQLException e = assertThrows(SQLException.class, () -> st.execute("INSERT INTO record_event (record_id, seq, kind, payload, actor,"
                        + " account, at, prev_record_id, prev_seq, prev_hash, hash) VALUES (9, 1, 'created', '{}', 'x', 'alice', 'x', 0, 0, 'x', 'y')"));
                assertTrue(e.getMessage().contains("account"), e.getMessage());
                assertThrows(SQLException.class, () -> st.execute("TRUNCATE record_event"));
            }
        }
        assertTrue(verify(SEALED, null).intact());
    }

    /** An event row as a client bypassing the program would insert it (the server's triggers judge it before anything else). */
    private static String rawEvent(long recordId, int seq, String kind, String account, String payload) {
        return "INSERT INTO record_event (record_id, seq, kind, payload, actor, account, at, prev_record_id, prev_seq, prev_hash, hash)"
                + " VALUES (" + recordId + ", " + seq + ", '" + kind + "', '" + payload + "', 'Somebody Else', '" + account + "', 'x', 0, 0, 'x', '"
                + java.util.UUID.randomUUID() + "')";
    }

    @Test
    void theServerHoldsTheFourEyesRuleAgainstAnyClient() throws SQLException {
        use("postgresql");
        as("alice").create(draft("enamel thinner"), "A. Author");
        as("bob").changeStatus(1, RecordStatus.IN_REVIEW, "B. Reviewer", null);
        try (Connection alice = RegisterStores.adminConnection(store.address("alice"), null); Statement st = alice.createStatement()) {
            // the author's login approving with plain SQL under another typed name, past the program's own check
            SQLException own = assertThrows(SQLException.class, () -> st.execute(rawEvent(1, 3, "approved", "alice", "{\"comment\":\"ok\"}")));
            assertTrue(own.getMessage().contains("four-eyes rule: the login alice filed record 1"), own.getMessage());
            SQLException rule = assertThrows(SQLException.class, () -> st.execute(rawEvent(0, 1, "rule_set", "alice",
                    "{\"reason\":\"x\",\"rule\":\"four_eyes\",\"value\":\"off\"}")));
            assertTrue(rule.getMessage().contains("may not switch register rules"), rule.getMessage());
        }
        try (Connection bob = RegisterStores.adminConnection(store.address("bob"), null); Statement st = bob.createStatement()) {
            SQLException reviewer = assertThrows(SQLException.class, () -> st.execute(rawEvent(1, 3, "approved", "bob", "{\"comment\":\"ok\"}")));
            assertTrue(reviewer.getMessage().contains("four-eyes rule: the login bob reviewed record 1"), reviewer.getMessage());
        }
        ChainReport r = verify(SEALED, null);
        assertTrue(r.intact(), r.problems().toString());
        assertEquals(2, r.events(), "nothing was written");
        assertTrue(as("erin").guardsInPlace(), "the four-eyes trigger counts among the guards");
        as("carol").changeStatus(1, RecordStatus.APPROVED, "M. Manager", "a third login");
    }

    @Test
    void theServerHoldsTheChainSecretAndNoLoginCanUseIt() throws SQLException {
        use("postgresql");
        fileThree();
        assertTrue(as("erin").sealedByServer(), "a new shared register gets a server-held secret");
        assertTrue(java.nio.file.Files.notExists(keyFile), "no key file is read or created for it");
        ChainReport r = verify(SEALED, null);
        assertTrue(r.intact() && r.keyChecked() && r.sealedEvents() == 6, r.toString());
        try (Connection alice = RegisterStores.adminConnection(store.address("alice"), null); Statement st = alice.createStatement()) {
            // a writer can read neither the secret nor a seal for a message of her choosing
            SQLException secret = assertThrows(SQLException.class, () -> st.executeQuery("SELECT secret FROM cohesa_register_secret"));
            assertTrue(secret.getMessage().contains("permission denied"), secret.getMessage());
            SQLException oracle = assertThrows(SQLException.class, () -> st.executeQuery("SELECT cohesa_register_mac('event:' || repeat('0', 64))"));
            assertTrue(oracle.getMessage().contains("permission denied"), oracle.getMessage());
            // nor move the head back over events to have the server seal a shortened chain
            SQLException back = assertThrows(SQLException.class, () -> st.execute("UPDATE record_chain_head SET events = events - 1"));
            assertTrue(back.getMessage().contains("one event at a time"), back.getMessage());
            // a seal sent by the client (e.g. computed with an old key file) is replaced by the server's own
            st.execute("INSERT INTO record_event (record_id, seq, kind, payload, actor, account, at, prev_record_id, prev_seq, prev_hash, hash, mac)"
                    + " VALUES (3, 2, 'sent_to_review', '{\"comment\":null}', 'A. Author', 'alice', 'x', 0, 0, 'x', 'f00d', 'client-mac')");
            try (ResultSet rs = st.executeQuery("SELECT mac FROM record_event WHERE hash = 'f00d'")) {
                assertTrue(rs.next());
                assertEquals(64, rs.getString(1).length(), "the server's HMAC, not the client's: " + rs.getString(1));
            }
        }
        // that row was not written by Cohesa (its hash is wrong), and the seal does not make it pass
        assertEquals(ChainProblem.Kind.ALTERED, firstKind(verify(SEALED, null)));
    }

    @Test
    void aSharedRegisterWithoutAServerSecretIsSealedWithTheKeyFile() throws SQLException {
        use("postgresql");
        // the state of a register that already held key-file-sealed events when step 9 arrived (or of a server without
        // pgcrypto): no secret row, so the server's seal triggers stand aside and the key file seals, as before step 9
        try (Connection c = store.admin(); Statement st = c.createStatement()) {
            st.execute("DELETE FROM cohesa_register_secret");
        }
        fileThree();
        assertFalse(as("erin").sealedByServer());
        RegisterKey key = RegisterKeyFile.load("--key", keyFile).orElseThrow(() -> new AssertionError("the first write made a key file"));
        assertEquals(key.id(), as("erin").head().keyId(), "the head names the key file's key");
        ChainReport r = verify(SEALED, null);
        assertTrue(r.intact() && r.keyChecked() && r.sealedEvents() == 6, r.toString());
        // a write with another key file is refused, so the register is never sealed with two keys
        RecordRepository other = store.as("alice", dir.resolve("other.key"));
        InvalidInputException wrong = assertThrows(InvalidInputException.class, () -> other.create(draft("x"), "A. Author"));
        assertTrue(wrong.getMessage().contains("sealed with key " + key.id()), wrong.getMessage());
        // the attacks are caught by the key file as on the local register
        outside(c -> forgeAppend(c, 2, 3, "approved", "M. Manager", "{\"comment\":\"forged\"}"));
        assertEquals(ChainProblem.Kind.FORGED, firstKind(verify(SEALED, null)));
    }

    // ---------------------------------------------------------------- attacks with plain SQL (issue 17, Checks)

    /** Outside edits by the database's owner, guards removed first. */
    private void outside(SqlEdit edit) throws SQLException {
        try (Connection c = store.admin()) {
            store.dropGuards(c);
            edit.run(c);
            if (!c.getAutoCommit()) {
                c.commit();
            }
        }
    }

    @FunctionalInterface
    interface SqlEdit {
        void run(Connection c) throws SQLException;
    }

    private static List<RecordEvent> rows(Connection c) throws SQLException {
        List<RecordEvent> out = new ArrayList<>();
        try (Statement st = c.createStatement(); ResultSet rs = st.executeQuery("SELECT * FROM record_event ORDER BY id")) {
            while (rs.next()) {
                out.add(new RecordEvent(rs.getLong("id"), rs.getLong("record_id"), rs.getInt("seq"), rs.getString("kind"), rs.getString("actor"),
                        rs.getString("account"), rs.getString("at"), rs.getString("payload"), rs.getLong("prev_record_id"), rs.getInt("prev_seq"),
                        rs.getString("prev_hash"), rs.getString("hash"), rs.getString("mac")));
            }
        }
        return out;
    }

    private static void setHead(Connection c, long events, RecordEvent last, long maxRecordId) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("UPDATE record_chain_head SET events = ?, last_hash = ?, last_record_id = ?, last_seq = ?,"
                + " max_record_id = ? WHERE singleton = 1")) {
            ps.setLong(1, events);
            ps.setString(2, last.hash());
            ps.setLong(3, last.recordId());
            ps.setInt(4, last.seq());
            ps.setLong(5, maxRecordId);
            ps.executeUpdate();
        }
    }

    /** Appends a correctly hashed event (one SHA-256, no key) after the newest one and moves the head to it. */
    private static void forgeAppend(Connection c, long recordId, int seq, String kind, String actor, String payload) throws SQLException {
        List<RecordEvent> es = rows(c);
        RecordEvent prev = es.get(es.size() - 1);
        String at = RecordEvent.formatAt(Instant.now());
        String hash = EventHash.of(recordId, seq, kind, actor, "mallory", at, payload, prev.recordId(), prev.seq(), prev.hash());
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO record_event (record_id, seq, kind, payload, actor, account, at,"
                + " prev_record_id, prev_seq, prev_hash, hash, mac) VALUES (?, ?, ?, ?, ?, 'mallory', ?, ?, ?, ?, ?, NULL)")) {
            ps.setLong(1, recordId);
            ps.setInt(2, seq);
            ps.setString(3, kind);
            ps.setString(4, payload);
            ps.setString(5, actor);
            ps.setString(6, at);
            ps.setLong(7, prev.recordId());
            ps.setInt(8, prev.seq());
            ps.setString(9, prev.hash());
            ps.setString(10, hash);
            ps.executeUpdate();
        }
        RecordEvent forged = new RecordEvent(0, recordId, seq, kind, actor, "mallory", at, payload, prev.recordId(), prev.seq(), prev.hash(), hash, null);
        setHead(c, es.size() + 1, forged, Math.max(recordId, es.stream().mapToLong(RecordEvent::recordId).max().orElse(0)));
    }

    private static void assertUndetectedWithoutKeyOrAnchor(ChainReport r) {
        assertTrue(r.intact(), "without key or anchor this edit is not detectable: " + r.problems());
        assertTrue(r.limits().stream().anyMatch(l -> l.startsWith("no register key given")), "and the report says so: " + r.limits());
        assertTrue(r.limits().stream().anyMatch(l -> l.startsWith("no anchor given")), r.limits().toString());
    }

    private static ChainProblem.Kind firstKind(ChainReport r) {
        assertFalse(r.intact(), "detected");
        return r.firstProblem().orElseThrow().kind();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("stores")
    void truncationWithAFixedUpHeadRow(String name) throws SQLException {
        use(name);
        fileThree();
        Anchor anchor = anchorNow();
        outside(c -> {
            List<RecordEvent> es = rows(c);
            try (Statement st = c.createStatement()) {
                st.execute("DELETE FROM record_event WHERE id IN (" + es.get(4).position() + ", " + es.get(5).position() + ")");
            }
            setHead(c, 4, es.get(3), 3);
        });
        assertUndetectedWithoutKeyOrAnchor(verify(UNSEALED, null));
        assertEquals(ChainProblem.Kind.FORGED, firstKind(verify(SEALED, null)), "the head's HMAC no longer matches");
        assertEquals(ChainProblem.Kind.ANCHOR_MISMATCH, firstKind(verify(UNSEALED, anchor)), "the anchored head is gone");
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("stores")
    void aRecomputedChain(String name) throws SQLException {
        use(name);
        fileThree();
        Anchor anchor = anchorNow();
        // record 1's reason is changed and every later hash and the head recomputed, with this project's docs in hand
        outside(c -> {
            List<RecordEvent> es = rows(c);
            String prevHash = EventHash.GENESIS;
            long prevRecord = 0;
            int prevSeq = 0;
            RecordEvent last = null;
            for (RecordEvent e : es) {
                String payload = e.recordId() == 1 && e.seq() == 1 ? e.payload().replace("test: regulatory", "test: cost") : e.payload();
                String hash = EventHash.of(e.recordId(), e.seq(), e.kind(), e.actor(), e.account(), e.at(), payload, prevRecord, prevSeq, prevHash);
                try (PreparedStatement ps = c.prepareStatement("UPDATE record_event SET payload = ?, prev_hash = ?, hash = ? WHERE id = ?")) {
                    ps.setString(1, payload);
                    ps.setString(2, prevHash);
                    ps.setString(3, hash);
                    ps.setLong(4, e.position());
                    ps.executeUpdate();
                }
                last = new RecordEvent(0, e.recordId(), e.seq(), e.kind(), e.actor(), e.account(), e.at(), payload, prevRecord, prevSeq, prevHash, hash, null);
                prevHash = hash;
                prevRecord = e.recordId();
                prevSeq = e.seq();
            }
            setHead(c, es.size(), last, 3);
        });
        assertTrue(as("erin").get(1).content().reason().contains("cost"), "the edit took");
        assertUndetectedWithoutKeyOrAnchor(verify(UNSEALED, null));
        assertEquals(ChainProblem.Kind.FORGED, firstKind(verify(SEALED, null)), "recomputed hashes do not have the key's HMACs");
        assertEquals(ChainProblem.Kind.ANCHOR_MISMATCH, firstKind(verify(UNSEALED, anchor)));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("stores")
    void aForgedAppend(String name) throws SQLException {
        use(name);
        fileThree();
        Anchor anchor = anchorNow();
        outside(c -> forgeAppend(c, 2, 3, "approved", "M. Manager", "{\"comment\":\"forged\"}"));
        assertEquals(RecordStatus.APPROVED, as("erin").get(2).status(), "the forgery took");
        assertUndetectedWithoutKeyOrAnchor(verify(UNSEALED, null));
        ChainReport keyed = verify(SEALED, null);
        assertEquals(ChainProblem.Kind.FORGED, firstKind(keyed));
        assertEquals(2, keyed.firstProblem().orElseThrow().recordId());
        // an anchor vouches only for what came before it: an append after it is named as not covered, not as an error
        ChainReport anchored = verify(UNSEALED, anchor);
        assertTrue(anchored.intact(), anchored.problems().toString());
        assertEquals(1, anchored.sinceAnchor());
        assertTrue(anchored.limits().stream().anyMatch(l -> l.contains("appended after the anchor")), anchored.limits().toString());
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("stores")
    void anIllegalStatusMoveIsNamedAndTheRegisterStaysReadable(String name) throws SQLException {
        use(name);
        fileThree();
        outside(c -> forgeAppend(c, 1, 4, "rejected", "M. Manager", "{\"comment\":\"reversed\"}"));
        // detected by replaying the status machine, with or without key
        ChainReport plain = verify(UNSEALED, null);
        assertEquals(ChainProblem.Kind.ILLEGAL_MOVE, firstKind(plain));
        assertEquals(1, plain.firstProblem().orElseThrow().recordId());
        assertTrue(plain.firstProblem().orElseThrow().detail().contains("approved to rejected"), plain.firstProblem().orElseThrow().detail());
        // list, show and export still work for the whole register
        List<SubstitutionRecord> all = as("erin").all();
        assertEquals(3, all.size());
        assertNotNull(all.get(0).damage());
        assertEquals(null, all.get(1).damage());
        assertThrows(InvalidInputException.class, () -> as("erin").changeStatus(1, RecordStatus.APPROVED, "E. Someone", "again"),
                "a damaged record takes no further steps");
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("stores")
    void aReplacedDatabaseAndARollback(String name) throws SQLException {
        use(name);
        as("alice").create(draft("first"), "A. Author");
        List<RecordEvent> old;
        org.cohesa.core.records.ChainHead oldHead;
        try (Connection c = store.admin()) {
            old = rows(c);
            oldHead = headRow(c);
        }
        fileThreeMore();
        Anchor anchor = anchorNow();
        // another valid register, sealed with another key, copied over this one's rows
        Path otherKey = dir.resolve("other.key");
        List<RecordEvent> other;
        org.cohesa.core.records.ChainHead otherHead;
        try (RegisterStores.Store second = name.equals("postgresql") ? RegisterStores.postgres() : RegisterStores.sqlite(dir)) {
            second.as("alice", otherKey).create(draft("a different register"), "Z. Other");
            second.as("bob", otherKey).changeStatus(1, RecordStatus.IN_REVIEW, "Y. Other", null);
            try (Connection c = second.admin()) {
                other = rows(c);
                otherHead = headRow(c);
            }
        }
        replaceRows(other, otherHead);
        assertUndetectedWithoutKeyOrAnchor(verify(UNSEALED, null));
        assertEquals(ChainProblem.Kind.OTHER_KEY, firstKind(verify(SEALED, null)));
        assertEquals(ChainProblem.Kind.ANCHOR_MISMATCH, firstKind(verify(UNSEALED, anchor)));
        // a rollback to an old copy of itself: the key cannot tell (every seal is genuine), the later anchor can
        replaceRows(old, oldHead);
        ChainReport keyed = verify(SEALED, null);
        assertTrue(keyed.intact(), "a rollback carries genuine seals: " + keyed.problems());
        assertTrue(keyed.limits().stream().anyMatch(l -> l.contains("rollback")), "and the report says what it cannot see: " + keyed.limits());
        assertEquals(ChainProblem.Kind.ANCHOR_MISMATCH, firstKind(verify(SEALED, anchor)));
    }

    private void fileThreeMore() {
        as("alice").create(draft("second"), "A. Author");
        as("bob").changeStatus(1, RecordStatus.IN_REVIEW, "B. Reviewer", null);
        as("carol").changeStatus(1, RecordStatus.APPROVED, "M. Manager", "ok");
    }

    /** The head row as stored (seal and key id included). */
    private static org.cohesa.core.records.ChainHead headRow(Connection c) throws SQLException {
        try (Statement st = c.createStatement(); ResultSet rs = st.executeQuery("SELECT events, last_hash, last_record_id, last_seq,"
                + " max_record_id, mac, key_id FROM record_chain_head WHERE singleton = 1")) {
            assertTrue(rs.next(), "a head row");
            return new org.cohesa.core.records.ChainHead(rs.getLong(1), rs.getString(2), rs.getLong(3), rs.getInt(4), rs.getLong(5),
                    rs.getString(6), rs.getString(7));
        }
    }

    /** Replaces every event and the head row with those of another copy (as restoring another file or backup would). */
    private void replaceRows(List<RecordEvent> events, org.cohesa.core.records.ChainHead head) throws SQLException {
        outside(c -> {
            try (Statement st = c.createStatement()) {
                st.execute("DELETE FROM record_event");
            }
            for (RecordEvent e : events) {
                try (PreparedStatement ps = c.prepareStatement("INSERT INTO record_event (record_id, seq, kind, payload, actor, account, at,"
                        + " prev_record_id, prev_seq, prev_hash, hash, mac) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)")) {
                    ps.setLong(1, e.recordId());
                    ps.setInt(2, e.seq());
                    ps.setString(3, e.kind());
                    ps.setString(4, e.payload());
                    ps.setString(5, e.actor());
                    ps.setString(6, e.account());
                    ps.setString(7, e.at());
                    ps.setLong(8, e.prevRecordId());
                    ps.setInt(9, e.prevSeq());
                    ps.setString(10, e.prevHash());
                    ps.setString(11, e.hash());
                    ps.setString(12, e.mac());
                    ps.executeUpdate();
                }
            }
            try (PreparedStatement ps = c.prepareStatement("UPDATE record_chain_head SET events = ?, last_hash = ?, last_record_id = ?, last_seq = ?,"
                    + " max_record_id = ?, mac = ?, key_id = ? WHERE singleton = 1")) {
                ps.setLong(1, head.events());
                ps.setString(2, head.lastHash());
                ps.setLong(3, head.lastRecordId());
                ps.setInt(4, head.lastSeq());
                ps.setLong(5, head.maxRecordId());
                ps.setString(6, head.mac());
                ps.setString(7, head.keyId());
                ps.executeUpdate();
            }
        });
    }

    // ---------------------------------------------------------------- concurrency (issue 17: 4 processes × 50 records)

    @ParameterizedTest(name = "{0}")
    @MethodSource("stores")
    void fourWriterProcessesAtOnceLoseNothingAndKeepTheChain(String name) throws Exception {
        use(name);
        // PostgreSQL: writers on one login each; SQLite: each writer process files and reviews under two accounts
        String[] people = {"alice", "bob", "carol", "dave"};
        if (name.equals("postgresql")) {
            // each writer reviews its own records under its one login: the site switches four-eyes off for this run (recorded)
            as("erin").setFourEyes(false, "T. Admin", "load test: each writer process has one login");
        } else {
            as("erin").create(draft("warm-up"), "T. Admin");
        }
        int perWriter = 50;
        String cp = System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
        List<Process> writers = new ArrayList<>();
        long start = System.nanoTime();
        for (String p : people) {
            ProcessBuilder pb = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(), "-XX:TieredStopAtLevel=1",
                    "-Dcohesa.register.key=" + keyFile, "-cp", cp, RecordWriterProcess.class.getName(), store.address(p),
                    String.valueOf(perWriter), p, libraryDb.toString()).redirectErrorStream(true);
            writers.add(pb.start());
        }
        List<String> logs = new ArrayList<>();
        for (Process w : writers) {
            StringBuilder log = new StringBuilder();
            try (BufferedReader r = new BufferedReader(new InputStreamReader(w.getInputStream(), StandardCharsets.UTF_8))) {
                r.lines().forEach(l -> log.append(l).append('\n'));
            }
            assertTrue(w.waitFor(240, TimeUnit.SECONDS), "writer finished");
            logs.add(log.toString());
            assertEquals(0, w.exitValue(), log.toString());
        }
        double seconds = (System.nanoTime() - start) / 1e9;
        ChainReport r = verify(SEALED, null);
        assertTrue(r.intact(), r.problems().toString());
        long expectedEvents = 1 + people.length * (perWriter + perWriter / 2L);
        assertEquals(expectedEvents, r.events(), "nothing lost");
        assertEquals(r.events(), r.sealedEvents());
        List<SubstitutionRecord> all = as("erin").all();
        for (String p : people) {
            assertEquals(perWriter, all.stream().filter(x -> x.author().equals("writer " + p)).count(), p);
        }
        System.out.printf("%s: %d writer processes x %d records: %d events, chain intact, %.1f s%n", name, people.length, perWriter, r.events(), seconds);
    }

}
