package org.cohesa.store;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Clock;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.function.Consumer;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.TextLimits;
import org.cohesa.core.records.Anchor;
import org.cohesa.core.records.CanonicalJson;
import org.cohesa.core.records.ChainHead;
import org.cohesa.core.records.ChainReport;
import org.cohesa.core.records.ChainSeal;
import org.cohesa.core.records.ChainVerifier;
import org.cohesa.core.records.EventKind;
import org.cohesa.core.records.FourEyesRule;
import org.cohesa.core.records.RecordDraft;
import org.cohesa.core.records.RecordEvent;
import org.cohesa.core.records.RecordStatus;
import org.cohesa.core.records.RegisterKey;
import org.cohesa.core.records.StatusChange;
import org.cohesa.core.records.SubstitutionRecord;

/**
 * The register of substitution records: an append-only table of hash-chained, HMAC-sealed events in the local SQLite
 * database or a shared PostgreSQL register ({@link RegisterDb}). Every write is one transaction that takes the
 * register's write lock, reads the chain's newest event, appends one event and moves the head note, so concurrent
 * writers (other processes included) queue and never fork the chain. Each event records the name typed and the acting
 * account; the four-eyes rule (on unless the site switched it off, itself a sealed event) is checked in the same
 * transaction as the write.
 */
public final class RecordRepository {

    private final RegisterDb register;
    private final Clock clock;
    private final Path keyFile;

    public RecordRepository(Database db) {
        this(new SqliteRegister(db), Clock.systemUTC(), null);
    }

    public RecordRepository(Database db, Clock clock) {
        this(new SqliteRegister(db), clock, null);
    }

    /**
     * @param keyFile the register key file, or null for {@link RegisterKeyFile#defaultPath()}; a write creates it when
     *                missing, a check without it says what it could not detect
     */
    public RecordRepository(RegisterDb register, Clock clock, Path keyFile) {
        this.register = register;
        this.clock = clock;
        this.keyFile = keyFile;
    }

    public RegisterDb register() {
        return register;
    }

    public Path keyFile() {
        return keyFile != null ? keyFile : RegisterKeyFile.defaultPath();
    }

    /** The register key if its file exists (checks never create one). */
    public Optional<RegisterKey> key() {
        return RegisterKeyFile.load("--key", keyFile());
    }

    /**
     * The key a write seals with: the key file's; a new key file only for a register no key has sealed yet; refused
     * when the register is sealed with another key (another person's key file, or the wrong one), so one register is
     * never sealed with two keys.
     */
    private RegisterKey writeKey(ChainHead head) {
        if (register.serverSecretId() != null) {
            // the server seals every event and the head itself (schema step 9); no key file is read or created
            return null;
        }
        Path file = keyFile();
        Optional<RegisterKey> existing = RegisterKeyFile.load("--key", file);
        if (existing.isEmpty() && head.keyId() != null) {
            throw new InvalidInputException("--key", file.toString(), "does not exist, and this register is sealed with key " + head.keyId()
                    + "; use that key file (--key FILE or COHESA_REGISTER_KEY)");
        }
        RegisterKey key = existing.orElseGet(() -> RegisterKeyFile.loadOrCreate("--key", file));
        if (head.keyId() != null && !head.keyId().equals(key.id())) {
            throw new InvalidInputException("--key", file.toString(), "holds key " + key.id() + ", but this register is sealed with key "
                    + head.keyId() + "; use that register's key file (--key FILE or COHESA_REGISTER_KEY)");
        }
        return key;
    }

    /** Files a new record in draft; returns it as stored. */
    public SubstitutionRecord create(RecordDraft draft, String author) {
        String name = requireName("--author", author);
        long id = register.write(c -> {
            ChainHead head = head(c);
            long next = Math.max(head.maxRecordId(), maxRecordId(c)) + 1;
            append(c, head, next, 1, EventKind.CREATED, name, draft.toPayload());
            return next;
        });
        return find(id).orElseThrow();
    }

    /**
     * Moves a record to {@code next}; illegal moves, unknown records and steps the four-eyes rule forbids are refused
     * and nothing is written. The checks and the write share one transaction, so two people deciding at once cannot
     * both win.
     */
    public SubstitutionRecord changeStatus(long recordId, RecordStatus next, String by, String comment) {
        String name = requireName("--by", by);
        String note = TextLimits.text("--comment", comment);
        register.write(c -> {
            List<RecordEvent> events = eventsOf(c, recordId);
            if (events.isEmpty()) {
                throw unknown(recordId);
            }
            SubstitutionRecord now = SubstitutionRecord.fold(events);
            if (now.damage() != null) {
                throw new InvalidInputException("record " + recordId, now.status().label(),
                        "its stored history is damaged (" + now.damage() + "); nothing was written, run cohesa record verify");
            }
            now.status().requireMoveTo(next, recordId);
            FourEyesRule rule = rule(c);
            if (rule.on()) {
                checkFourEyes(now, next, name);
            }
            append(c, head(c), recordId, events.size() + 1, EventKind.movingTo(next), name, SubstitutionRecord.statusPayload(note));
            return null;
        });
        return find(recordId).orElseThrow();
    }

    /** Switches the four-eyes rule on or off for the whole register; the switch is itself a sealed event (record 0). */
    public FourEyesRule setFourEyes(boolean on, String by, String reason) {
        String name = requireName("--by", by);
        String why = TextLimits.text("--reason", reason);
        if (why == null || why.isBlank()) {
            throw new InvalidInputException("--reason", why == null ? "" : why, "switching a register rule needs a reason");
        }
        register.write(c -> {
            register.requireMayChangeRules(c, name);
            int seq = eventsOf(c, 0).size() + 1;
            JsonNode payload = CanonicalJson.object().put("rule", FourEyesRule.NAME).put("value", on ? "on" : "off").put("reason", why.strip());
            append(c, head(c), 0, seq, EventKind.RULE_SET, name, payload);
            return null;
        });
        return fourEyes();
    }

    /** The four-eyes rule as it stands (on unless a sealed event switched it off). */
    public FourEyesRule fourEyes() {
        return register.read(RecordRepository::rule);
    }

    private void checkFourEyes(SubstitutionRecord r, RecordStatus next, String by) {
        if (next != RecordStatus.IN_REVIEW && next != RecordStatus.APPROVED) {
            return;
        }
        String account = register.account();
        String step = next == RecordStatus.IN_REVIEW ? "review" : "approve";
        StatusChange filed = r.history().get(0);
        refuseSamePerson(filed, by, account, "filed record " + r.id() + ", so someone else must " + step + " it");
        if (next == RecordStatus.APPROVED) {
            for (StatusChange c : r.history()) {
                if (c.status() == RecordStatus.IN_REVIEW) {
                    refuseSamePerson(c, by, account, "reviewed record " + r.id() + ", so a third person must approve it");
                }
            }
        }
    }

    /**
     * Refuses a step by the person of an earlier step: the same name as typed (ignoring case and spacing), or the same
     * account at the keyboard (the operating-system account locally, the login on a shared register), whatever name is
     * typed. Events stored before accounts were recorded compare by name only.
     */
    private void refuseSamePerson(StatusChange earlier, String by, String account, String what) {
        String off = register.accountIsAuthenticated()
                ? " (the register's owner or a member of cohesa_register_admin can switch the rule off: cohesa record rule four-eyes off"
                        + " --by NAME --reason TEXT)"
                : " (a site can switch the rule off: cohesa record rule four-eyes off --by NAME --reason TEXT)";
        if (normalise(earlier.by()).equals(normalise(by))) {
            throw new InvalidInputException("--by", by, "four-eyes rule: " + earlier.by() + " " + what + off);
        }
        if (sameAccount(earlier.account(), account)) {
            throw new InvalidInputException("--by", by, "four-eyes rule: " + earlier.by() + " " + what + ", and this " + accountWord()
                    + " (" + account + ") is the one " + earlier.by() + " used; sign in under your own account" + off);
        }
    }

    private String accountWord() {
        return register.accountIsAuthenticated() ? "login" : "operating-system account";
    }

    /** The same account (events stored before accounts were recorded have none and match nothing). */
    static boolean sameAccount(String earlier, String now) {
        return earlier != null && !earlier.isBlank() && earlier.equals(now);
    }

    private static String normalise(String name) {
        return name.strip().replaceAll("\\s+", " ").toLowerCase(Locale.ROOT);
    }

    public Optional<SubstitutionRecord> find(long recordId) {
        if (recordId <= 0) {
            return Optional.empty();
        }
        List<RecordEvent> events = register.read(c -> eventsOf(c, recordId));
        return events.isEmpty() ? Optional.empty() : Optional.of(SubstitutionRecord.fold(events));
    }

    /** The record, or bad input naming the number. */
    public SubstitutionRecord get(long recordId) {
        return find(recordId).orElseThrow(() -> unknown(recordId));
    }

    /** One record's events, oldest first (empty for an unknown number). */
    public List<RecordEvent> events(long recordId) {
        return register.read(c -> eventsOf(c, recordId));
    }

    /** Every record, oldest first. For large registers prefer {@link #forEachRecord}. */
    public List<SubstitutionRecord> all() {
        List<SubstitutionRecord> out = new ArrayList<>();
        forEachRecord(out::add);
        return out;
    }

    /**
     * Hands every record to {@code each}, oldest first, from one consistent snapshot, holding one record at a time (a
     * register of thousands of records with their evidence is listed or exported in little memory). A record whose
     * filing event is gone or unreadable cannot be shown; it is skipped here and named by {@link #verify()}.
     *
     * @return how many records had to be skipped
     */
    public int forEachRecord(Consumer<SubstitutionRecord> each) {
        return register.read(c -> {
            int skipped = 0;
            try (PreparedStatement ps = c.prepareStatement("SELECT * FROM record_event WHERE record_id > 0 ORDER BY record_id, seq")) {
                ps.setFetchSize(200);
                try (ResultSet rs = ps.executeQuery()) {
                    List<RecordEvent> one = new ArrayList<>();
                    while (rs.next()) {
                        RecordEvent e = row(rs);
                        if (!one.isEmpty() && one.get(0).recordId() != e.recordId()) {
                            skipped += emit(one, each);
                            one.clear();
                        }
                        one.add(e);
                    }
                    if (!one.isEmpty()) {
                        skipped += emit(one, each);
                    }
                }
            }
            return skipped;
        });
    }

    private static int emit(List<RecordEvent> events, Consumer<SubstitutionRecord> each) {
        SubstitutionRecord r;
        try {
            r = SubstitutionRecord.fold(events);
        } catch (RuntimeException unreadable) {
            return 1;
        }
        each.accept(r);
        return 0;
    }

    /** Every stored event in storage order (the chain). */
    public List<RecordEvent> chain() {
        List<RecordEvent> out = new ArrayList<>();
        forEachEvent(out::add);
        return out;
    }

    /** Every stored event in storage order, one at a time, from one snapshot; returns the head note of that snapshot. */
    public ChainHead forEachEvent(Consumer<RecordEvent> each) {
        return register.read(c -> {
            streamEvents(c, each);
            return head(c);
        });
    }

    private static void streamEvents(Connection c, Consumer<RecordEvent> each) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT * FROM record_event ORDER BY id")) {
            ps.setFetchSize(200);
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    each.accept(row(rs));
                }
            }
        }
    }

    /** Checks the whole register with the key file when it exists, without an anchor. */
    public ChainReport verify() {
        return verify(key().orElse(null), null);
    }

    /**
     * Checks the whole register from one consistent snapshot, streaming the events.
     *
     * @param key    the register key (null: the SHA-256 chain and the status moves only)
     * @param anchor a state kept elsewhere (null: none)
     */
    public ChainReport verify(RegisterKey key, Anchor anchor) {
        return register.read(c -> {
            ChainHead head = head(c);
            ChainSeal seal = register.serverSecretId() != null ? register.serverSeal(c, head, anchor) : key;
            return check(c, head, seal, anchor);
        });
    }

    /** Checks only what needs no secret (the SHA-256 chain, the head note, the status moves) and the anchor if given. */
    public ChainReport verifyWithoutSeal(Anchor anchor) {
        return register.read(c -> check(c, head(c), null, anchor));
    }

    private static ChainReport check(Connection c, ChainHead head, ChainSeal seal, Anchor anchor) throws SQLException {
        ChainVerifier v = new ChainVerifier(seal, anchor);
        streamEvents(c, v::accept);
        return v.finish(head);
    }

    /**
     * The id of what seals this register: the server's secret when it holds one, else the key file's key (empty when
     * there is none).
     */
    public Optional<String> sealId(RegisterKey fileKey) {
        String server = register.serverSecretId();
        return Optional.ofNullable(server != null ? server : fileKey == null ? null : fileKey.id());
    }

    /** True when the server, not a key file, seals this register. */
    public boolean sealedByServer() {
        return register.serverSecretId() != null;
    }

    /** The seal of an anchor's content line: by the server's secret, or the key file's key (null without either). */
    public String anchorMac(String content, RegisterKey fileKey) {
        if (register.serverSecretId() != null) {
            return register.serverAnchorMac(content);
        }
        return fileKey == null ? null : fileKey.anchorMac(content);
    }

    /** The head note as stored. */
    public ChainHead head() {
        return register.read(RecordRepository::head);
    }

    /** True while the database's append-only guards are in place (a missing guard means someone removed it). */
    public boolean guardsInPlace() {
        return register.guardsInPlace();
    }

    /**
     * Copies every event of {@code source} verbatim (same content, accounts, times, hashes and HMACs) into this register,
     * which must be empty, and writes the head note, sealed with {@code key} when the events are sealed. One transaction:
     * a failed copy leaves this register empty.
     *
     * @return how many events were copied
     */
    public long copyFrom(RecordRepository source, RegisterKey key) {
        List<RecordEvent> events = source.chain();
        return register.write(c -> {
            try (Statement st = c.createStatement(); ResultSet rs = st.executeQuery("SELECT COUNT(*) FROM record_event")) {
                rs.next();
                if (rs.getLong(1) > 0) {
                    throw new InvalidInputException("--to", register.location(), "already holds " + rs.getLong(1)
                            + " events; a register is copied only into an empty one");
                }
            }
            register.beginVerbatimCopy(c);
            // a register whose server holds the secret seals the copied events and head itself
            RegisterKey sealWith = register.serverSecretId() != null ? null : key;
            ChainHead head = ChainHead.EMPTY;
            for (RecordEvent e : events) {
                insert(c, e);
                head = head.after(e, e.mac() == null ? null : sealWith);
            }
            writeHead(c, head);
            return (long) events.size();
        });
    }

    private static FourEyesRule rule(Connection c) throws SQLException {
        FourEyesRule rule = FourEyesRule.DEFAULT;
        for (RecordEvent e : eventsOf(c, 0)) {
            JsonNode p;
            try {
                p = e.payloadTree();
            } catch (RuntimeException damaged) {
                continue;
            }
            if (FourEyesRule.NAME.equals(p.path("rule").asText())) {
                rule = new FourEyesRule(!"off".equals(p.path("value").asText()), e.actor(), e.account(), e.at(), p.path("reason").asText(null));
            }
        }
        return rule;
    }

    private static long maxRecordId(Connection c) throws SQLException {
        try (Statement st = c.createStatement(); ResultSet rs = st.executeQuery("SELECT COALESCE(MAX(record_id), 0) FROM record_event")) {
            return rs.next() ? rs.getLong(1) : 0;
        }
    }

    private static ChainHead head(Connection c) throws SQLException {
        try (Statement st = c.createStatement();
             ResultSet rs = st.executeQuery("SELECT events, last_hash, last_record_id, last_seq, max_record_id, mac, key_id"
                     + " FROM record_chain_head WHERE singleton = 1")) {
            return rs.next() ? new ChainHead(rs.getLong(1), rs.getString(2), rs.getLong(3), rs.getInt(4), rs.getLong(5),
                    rs.getString(6), rs.getString(7)) : ChainHead.EMPTY;
        }
    }

    private void append(Connection c, ChainHead head, long recordId, int seq, EventKind kind, String actor, JsonNode payload)
            throws SQLException {
        RegisterKey key = writeKey(head);
        RecordEvent prev = null;
        try (Statement st = c.createStatement(); ResultSet rs = st.executeQuery("SELECT * FROM record_event ORDER BY id DESC LIMIT 1")) {
            if (rs.next()) {
                prev = row(rs);
            }
        }
        RecordEvent e = RecordEvent.next(recordId, seq, kind, actor, register.account(), clock.instant(), payload, prev, key);
        insert(c, e);
        // the head's count is carried forward from the stored head, so events removed behind its back stay missing
        writeHead(c, head.after(e, key));
    }

    private static void insert(Connection c, RecordEvent e) throws SQLException {
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

    private static void writeHead(Connection c, ChainHead h) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO record_chain_head (singleton, events, last_hash, last_record_id, last_seq,"
                + " max_record_id, mac, key_id) VALUES (1, ?, ?, ?, ?, ?, ?, ?) ON CONFLICT (singleton) DO UPDATE SET events = excluded.events,"
                + " last_hash = excluded.last_hash, last_record_id = excluded.last_record_id, last_seq = excluded.last_seq,"
                + " max_record_id = excluded.max_record_id, mac = excluded.mac, key_id = excluded.key_id")) {
            ps.setLong(1, h.events());
            ps.setString(2, h.lastHash());
            ps.setLong(3, h.lastRecordId());
            ps.setInt(4, h.lastSeq());
            ps.setLong(5, h.maxRecordId());
            ps.setString(6, h.mac());
            ps.setString(7, h.keyId());
            ps.executeUpdate();
        }
    }

    private static List<RecordEvent> eventsOf(Connection c, long recordId) throws SQLException {
        List<RecordEvent> out = new ArrayList<>();
        try (PreparedStatement ps = c.prepareStatement("SELECT * FROM record_event WHERE record_id = ? ORDER BY seq")) {
            ps.setLong(1, recordId);
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    out.add(row(rs));
                }
            }
        }
        return out;
    }

    private static RecordEvent row(ResultSet rs) throws SQLException {
        return new RecordEvent(rs.getLong("id"), rs.getLong("record_id"), rs.getInt("seq"), nz(rs.getString("kind")),
                nz(rs.getString("actor")), rs.getString("account"), nz(rs.getString("at")), nz(rs.getString("payload")),
                rs.getLong("prev_record_id"), rs.getInt("prev_seq"), nz(rs.getString("prev_hash")), nz(rs.getString("hash")),
                rs.getString("mac"));
    }

    private static String nz(String s) {
        return s == null ? "" : s;
    }

    private static InvalidInputException unknown(long recordId) {
        return new InvalidInputException("ID", String.valueOf(recordId), "no such record");
    }

    private static String requireName(String field, String name) {
        if (name == null || name.isBlank()) {
            throw new InvalidInputException(field, String.valueOf(name), "must name a person");
        }
        return TextLimits.name(field, name);
    }
}
