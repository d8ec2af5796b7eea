package org.cohesa.store;

import com.fasterxml.jackson.databind.JsonNode;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Clock;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.records.ChainHead;
import org.cohesa.core.records.ChainReport;
import org.cohesa.core.records.ChainVerifier;
import org.cohesa.core.records.EventKind;
import org.cohesa.core.records.RecordDraft;
import org.cohesa.core.records.RecordEvent;
import org.cohesa.core.records.RecordStatus;
import org.cohesa.core.records.SubstitutionRecord;

/**
 * The register of substitution records: an append-only table of hash-chained events. Every write is
 * one transaction that reads the chain's newest hash, appends one event and moves the head note, so
 * concurrent writers (other processes included) queue on the database lock and never fork the chain.
 */
public final class RecordRepository {

    private final Database db;
    private final Clock clock;

    public RecordRepository(Database db) {
        this(db, Clock.systemUTC());
    }

    public RecordRepository(Database db, Clock clock) {
        this.db = db;
        this.clock = clock;
    }

    /** Files a new record in draft; returns it as stored. */
    public SubstitutionRecord create(RecordDraft draft, String author) {
        requireName("--author", author);
        long id = db.inTransaction(c -> {
            long next;
            try (Statement st = c.createStatement(); ResultSet rs = st.executeQuery("SELECT MAX(COALESCE((SELECT MAX(record_id) FROM record_event), 0),"
                         + " COALESCE((SELECT max_record_id FROM record_chain_head), 0)) + 1")) {
                next = rs.next() ? rs.getLong(1) : 1;
            }
            append(c, next, 1, EventKind.CREATED, author, draft.toPayload());
            return next;
        });
        return find(id).orElseThrow();
    }

    /**
     * Moves a record to {@code next}; illegal moves and unknown records are refused and nothing is written.
     * The check and the write share one transaction, so two people deciding at once cannot both win.
     */
    public SubstitutionRecord changeStatus(long recordId, RecordStatus next, String by, String comment) {
        requireName("--by", by);
        db.inTransaction(c -> {
            List<RecordEvent> events = eventsOf(c, recordId);
            if (events.isEmpty()) {
                throw unknown(recordId);
            }
            SubstitutionRecord now = SubstitutionRecord.fold(events);
            now.status().requireMoveTo(next, recordId);
            append(c, recordId, events.size() + 1, EventKind.movingTo(next), by, SubstitutionRecord.statusPayload(comment));
            return null;
        });
        return find(recordId).orElseThrow();
    }

    public Optional<SubstitutionRecord> find(long recordId) {
        try {
            List<RecordEvent> events = eventsOf(db.connection(), recordId);
            return events.isEmpty() ? Optional.empty() : Optional.of(SubstitutionRecord.fold(events));
        } catch (SQLException e) {
            throw new StoreException("cannot read record " + recordId + ": " + e.getMessage(), e);
        }
    }

    /** The record, or bad input naming the number. */
    public SubstitutionRecord get(long recordId) {
        return find(recordId).orElseThrow(() -> unknown(recordId));
    }

    /** One record's events, oldest first (empty for an unknown number). */
    public List<RecordEvent> events(long recordId) {
        try {
            return eventsOf(db.connection(), recordId);
        } catch (SQLException e) {
            throw new StoreException("cannot read record " + recordId + ": " + e.getMessage(), e);
        }
    }

    /** Every record, oldest first. */
    public List<SubstitutionRecord> all() {
        Map<Long, List<RecordEvent>> byRecord = new LinkedHashMap<>();
        for (RecordEvent e : readChain().events) {
            byRecord.computeIfAbsent(e.recordId(), k -> new ArrayList<>()).add(e);
        }
        List<SubstitutionRecord> out = new ArrayList<>();
        byRecord.entrySet().stream().sorted(Map.Entry.comparingByKey()).forEach(en -> {
            List<RecordEvent> es = new ArrayList<>(en.getValue());
            es.sort(java.util.Comparator.comparingInt(RecordEvent::seq));
            out.add(SubstitutionRecord.fold(es));
        });
        return out;
    }

    /** Every stored event in storage order (the chain). */
    public List<RecordEvent> chain() {
        return readChain().events;
    }

    /** Walks the whole chain from one consistent snapshot of the database. */
    public ChainReport verify() {
        Snapshot s = readChain();
        return ChainVerifier.verify(s.events, s.head);
    }

    /** True while both append-only guards are in place (a missing guard means someone removed it). */
    public boolean guardsInPlace() {
        try (Statement st = db.connection().createStatement();
             ResultSet rs = st.executeQuery("SELECT COUNT(*) FROM sqlite_master WHERE type = 'trigger'"
                     + " AND name IN ('record_event_append_only_update', 'record_event_append_only_delete')")) {
            return rs.next() && rs.getInt(1) == 2;
        } catch (SQLException e) {
            throw new StoreException("cannot read the schema: " + e.getMessage(), e);
        }
    }

    private record Snapshot(List<RecordEvent> events, ChainHead head) {
    }

    private Snapshot readChain() {
        // one read transaction: in WAL mode it sees a single committed state even while others write
        return db.inReadTransaction(c -> {
            List<RecordEvent> events = new ArrayList<>();
            try (Statement st = c.createStatement(); ResultSet rs = st.executeQuery("SELECT * FROM record_event ORDER BY id")) {
                while (rs.next()) {
                    events.add(row(rs));
                }
            }
            return new Snapshot(events, head(c));
        });
    }

    private static ChainHead head(Connection c) throws SQLException {
        try (Statement st = c.createStatement();
             ResultSet rs = st.executeQuery("SELECT events, last_hash, last_record_id, last_seq, max_record_id FROM record_chain_head WHERE singleton = 1")) {
            return rs.next() ? new ChainHead(rs.getLong(1), rs.getString(2), rs.getLong(3), rs.getInt(4), rs.getLong(5)) : ChainHead.EMPTY;
        }
    }

    private void append(Connection c, long recordId, int seq, EventKind kind, String actor, JsonNode payload) throws SQLException {
        RecordEvent prev = null;
        try (Statement st = c.createStatement(); ResultSet rs = st.executeQuery("SELECT * FROM record_event ORDER BY id DESC LIMIT 1")) {
            if (rs.next()) {
                prev = row(rs);
            }
        }
        RecordEvent e = RecordEvent.next(recordId, seq, kind, actor, clock.instant(), payload, prev);
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO record_event (record_id, seq, kind, payload, actor, at, prev_record_id, prev_seq, prev_hash, hash)"
                + " VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?)")) {
            ps.setLong(1, e.recordId());
            ps.setInt(2, e.seq());
            ps.setString(3, e.kind());
            ps.setString(4, e.payload());
            ps.setString(5, e.actor());
            ps.setString(6, e.at());
            ps.setLong(7, e.prevRecordId());
            ps.setInt(8, e.prevSeq());
            ps.setString(9, e.prevHash());
            ps.setString(10, e.hash());
            ps.executeUpdate();
        }
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO record_chain_head (singleton, events, last_hash, last_record_id, last_seq, max_record_id)"
                + " VALUES (1, 1, ?, ?, ?, ?) ON CONFLICT (singleton) DO UPDATE SET events = events + 1,"
                + " last_hash = excluded.last_hash, last_record_id = excluded.last_record_id, last_seq = excluded.last_seq,"
                + " max_record_id = MAX(max_record_id, excluded.max_record_id)")) {
            ps.setString(1, e.hash());
            ps.setLong(2, e.recordId());
            ps.setInt(3, e.seq());
            ps.setLong(4, e.recordId());
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
                nz(rs.getString("actor")), nz(rs.getString("at")), nz(rs.getString("payload")), rs.getLong("prev_record_id"),
                rs.getInt("prev_seq"), nz(rs.getString("prev_hash")),
                nz(rs.getString("hash")));
    }

    private static String nz(String s) {
        return s == null ? "" : s;
    }

    private static InvalidInputException unknown(long recordId) {
        return new InvalidInputException("ID", String.valueOf(recordId), "no such record");
    }

    private static void requireName(String field, String name) {
        if (name == null || name.isBlank()) {
            throw new InvalidInputException(field, String.valueOf(name), "must name a person");
        }
    }
}
