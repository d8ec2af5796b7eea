package org.cohesa.store;

import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.List;

/**
 * The schema history. Append new steps at the end with the next version number; never edit a step
 * that has shipped, since users' databases already ran it.
 */
public final class Migrations {

    /** Every schema step, oldest first. */
    public static final List<Migration> ALL = List.of(
            new Migration(1, "solvent library and metadata", List.of(
                    "CREATE TABLE meta (key TEXT PRIMARY KEY, value TEXT NOT NULL)",
                    "CREATE TABLE solvent ("
                            + " id INTEGER PRIMARY KEY,"
                            + " name TEXT NOT NULL UNIQUE COLLATE NOCASE,"
                            + " origin TEXT NOT NULL CHECK (origin IN ('bundled', 'user')),"
                            + " synonyms TEXT, cas TEXT, formula TEXT, family TEXT,"
                            + " molar_mass REAL, density REAL, molar_volume REAL,"
                            + " dD REAL, dP REAL, dH REAL,"
                            + " boiling_point_c REAL, melting_point_c REAL, flash_point_c REAL, autoignition_c REAL,"
                            + " lfl_pct REAL, ufl_pct REAL,"
                            + " antoine_a REAL, antoine_b REAL, antoine_c REAL, antoine_tmin_k REAL, antoine_tmax_k REAL,"
                            + " hvap_kj_mol REAL,"
                            + " oel_twa_ppm REAL, oel_stel_ppm REAL, oel_ceiling_ppm REAL, oel_skin TEXT, oel_jurisdiction TEXT,"
                            + " hazard_statements TEXT, peroxide_former TEXT, ich_class INTEGER, unifac_groups TEXT,"
                            + " sources TEXT, note TEXT)",
                    "CREATE INDEX solvent_cas ON solvent (cas)")),
            new Migration(2, "user prices per solvent, kept apart so bundled-data updates never touch them", List.of(
                    "CREATE TABLE solvent_price (solvent_name TEXT PRIMARY KEY COLLATE NOCASE,"
                            + " price_per_litre REAL NOT NULL CHECK (price_per_litre >= 0))")),
            new Migration(3, "material library: bundled spheres and the user's own (typed in or saved from a fit)", List.of(
                    "CREATE TABLE material ("
                            + " id INTEGER PRIMARY KEY,"
                            + " name TEXT NOT NULL UNIQUE COLLATE NOCASE,"
                            + " origin TEXT NOT NULL CHECK (origin IN ('bundled', 'user')),"
                            + " synonyms TEXT, kind TEXT NOT NULL,"
                            + " dD REAL NOT NULL CHECK (dD >= 0), dP REAL NOT NULL CHECK (dP >= 0), dH REAL NOT NULL CHECK (dH >= 0),"
                            + " r0 REAL NOT NULL CHECK (r0 > 0),"
                            + " source TEXT NOT NULL, note TEXT)")),
            new Migration(4, "substitution records: append-only hash-chained events and the chain's head note", List.of(
                    "CREATE TABLE record_event ("
                            + " id INTEGER PRIMARY KEY AUTOINCREMENT,"
                            + " record_id INTEGER NOT NULL CHECK (record_id > 0),"
                            + " seq INTEGER NOT NULL CHECK (seq > 0),"
                            + " kind TEXT NOT NULL,"
                            + " payload TEXT NOT NULL,"
                            + " actor TEXT NOT NULL,"
                            + " at TEXT NOT NULL,"
                            + " prev_record_id INTEGER NOT NULL,"
                            + " prev_seq INTEGER NOT NULL,"
                            + " prev_hash TEXT NOT NULL,"
                            + " hash TEXT NOT NULL UNIQUE,"
                            + " UNIQUE (record_id, seq))",
                    "CREATE TABLE record_chain_head (singleton INTEGER PRIMARY KEY CHECK (singleton = 1),"
                            + " events INTEGER NOT NULL, last_hash TEXT NOT NULL, last_record_id INTEGER NOT NULL, last_seq INTEGER NOT NULL,"
                            + " max_record_id INTEGER NOT NULL)",
                    // the app never changes a stored event; these guards stop slips, the hash chain catches the rest
                    "CREATE TRIGGER record_event_append_only_update BEFORE UPDATE ON record_event"
                            + " BEGIN SELECT RAISE(ABORT, 'substitution record events are append-only'); END",
                    "CREATE TRIGGER record_event_append_only_delete BEFORE DELETE ON record_event"
                            + " BEGIN SELECT RAISE(ABORT, 'substitution record events are append-only'); END")),
            new Migration(5, "solvent model: SMILES, every family, and a general vapour-pressure correlation replacing the Antoine columns",
                    List.of(
                    "ALTER TABLE solvent ADD COLUMN smiles TEXT",
                    "ALTER TABLE solvent ADD COLUMN families TEXT",
                    "ALTER TABLE solvent ADD COLUMN vp_equation TEXT",
                    "ALTER TABLE solvent ADD COLUMN vp_c1 REAL",
                    "ALTER TABLE solvent ADD COLUMN vp_c2 REAL",
                    "ALTER TABLE solvent ADD COLUMN vp_c3 REAL",
                    "ALTER TABLE solvent ADD COLUMN vp_c4 REAL",
                    "ALTER TABLE solvent ADD COLUMN vp_c5 REAL",
                    "ALTER TABLE solvent ADD COLUMN vp_tmin_k REAL",
                    "ALTER TABLE solvent ADD COLUMN vp_tmax_k REAL",
                    "ALTER TABLE solvent ADD COLUMN vp_tc_k REAL",
                    "ALTER TABLE solvent ADD COLUMN vp_pc_pa REAL",
                    // the user's Antoine constants become an antoine-log10 correlation, their source key moves along
                    "UPDATE solvent SET vp_equation = 'antoine-log10', vp_c1 = antoine_a, vp_c2 = antoine_b, vp_c3 = antoine_c,"
                            + " vp_tmin_k = antoine_tmin_k, vp_tmax_k = antoine_tmax_k WHERE antoine_a IS NOT NULL",
                    "UPDATE solvent SET sources = json_remove(json_set(sources, '$.vapour_pressure', json_extract(sources, '$.antoine')), '$.antoine')"
                            + " WHERE json_valid(sources) AND json_extract(sources, '$.antoine') IS NOT NULL",
                    "ALTER TABLE solvent DROP COLUMN antoine_a",
                    "ALTER TABLE solvent DROP COLUMN antoine_b",
                    "ALTER TABLE solvent DROP COLUMN antoine_c",
                    "ALTER TABLE solvent DROP COLUMN antoine_tmin_k",
                    "ALTER TABLE solvent DROP COLUMN antoine_tmax_k",
                    // rebuild the bundled rows from the shipped table on the next start, with the new columns filled
                    "DELETE FROM meta WHERE key = 'bundled_solvents_sha256'")),
            new Migration(6, "register: the acting account and an HMAC on every event and on the head; record 0 holds the register's"
                    + " own settings (the four-eyes rule)", List.of(
                    // SQLite cannot relax a CHECK in place: the event table is rebuilt with every row and position kept
                    "DROP TRIGGER IF EXISTS record_event_append_only_update",
                    "DROP TRIGGER IF EXISTS record_event_append_only_delete",
                    "CREATE TABLE record_event_v6 ("
                            + " id INTEGER PRIMARY KEY AUTOINCREMENT,"
                            + " record_id INTEGER NOT NULL CHECK (record_id >= 0),"
                            + " seq INTEGER NOT NULL CHECK (seq > 0),"
                            + " kind TEXT NOT NULL,"
                            + " payload TEXT NOT NULL,"
                            + " actor TEXT NOT NULL,"
                            + " account TEXT,"
                            + " at TEXT NOT NULL,"
                            + " prev_record_id INTEGER NOT NULL,"
                            + " prev_seq INTEGER NOT NULL,"
                            + " prev_hash TEXT NOT NULL,"
                            + " hash TEXT NOT NULL UNIQUE,"
                            + " mac TEXT,"
                            + " UNIQUE (record_id, seq))",
                    "INSERT INTO record_event_v6 (id, record_id, seq, kind, payload, actor, account, at, prev_record_id, prev_seq, prev_hash, hash, mac)"
                            + " SELECT id, record_id, seq, kind, payload, actor, NULL, at, prev_record_id, prev_seq, prev_hash, hash, NULL"
                            + " FROM record_event ORDER BY id",
                    // positions are never reused: carry the old counter over (it may be above the highest stored id)
                    "UPDATE sqlite_sequence SET seq = MAX(seq, COALESCE((SELECT seq FROM sqlite_sequence WHERE name = 'record_event'), 0))"
                            + " WHERE name = 'record_event_v6'",
                    "DROP TABLE record_event",
                    "ALTER TABLE record_event_v6 RENAME TO record_event",
                    "CREATE TRIGGER record_event_append_only_update BEFORE UPDATE ON record_event"
                            + " BEGIN SELECT RAISE(ABORT, 'substitution record events are append-only'); END",
                    "CREATE TRIGGER record_event_append_only_delete BEFORE DELETE ON record_event"
                            + " BEGIN SELECT RAISE(ABORT, 'substitution record events are append-only'); END",
                    "ALTER TABLE record_chain_head ADD COLUMN mac TEXT",
                    "ALTER TABLE record_chain_head ADD COLUMN key_id TEXT")),
            new Migration(7, "substitution cases of the desktop workbench: one row a case, its limits, candidates and checks as JSON",
                    List.of(
                    "CREATE TABLE substitution_case ("
                            + " id INTEGER PRIMARY KEY AUTOINCREMENT,"
                            + " title TEXT NOT NULL CHECK (length(title) BETWEEN 1 AND 200),"
                            + " kind TEXT NOT NULL CHECK (kind IN ('replace', 'find')),"
                            + " replaced TEXT NOT NULL, process TEXT NOT NULL,"
                            + " material_name TEXT, material_source TEXT,"
                            + " dD REAL CHECK (dD >= 0), dP REAL CHECK (dP >= 0), dH REAL CHECK (dH >= 0), r0 REAL CHECK (r0 > 0),"
                            + " limits TEXT NOT NULL, found TEXT NOT NULL, chosen TEXT NOT NULL,"
                            + " record_id INTEGER CHECK (record_id > 0),"
                            + " created_at TEXT NOT NULL, updated_at TEXT NOT NULL)")));

    private Migrations() {
    }

    /** The newest schema version. */
    public static int latest() {
        return ALL.get(ALL.size() - 1).version();
    }

    /** The schema version stored in the database file (0 for a new file). */
    public static int currentVersion(Connection c) throws SQLException {
        try (Statement st = c.createStatement(); ResultSet rs = st.executeQuery("PRAGMA user_version")) {
            return rs.next() ? rs.getInt(1) : 0;
        }
    }

    /** Applies every step above the stored version, each step atomically. */
    public static void migrate(Connection c) throws SQLException {
        int current = currentVersion(c);
        if (current > latest()) {
            throw new SQLException("the database has schema version " + current
                    + ", newer than this program knows (" + latest() + "); use a newer Cohesa");
        }
        boolean auto = c.getAutoCommit();
        c.setAutoCommit(false);
        try {
            for (Migration m : ALL) {
                if (m.version() <= current) {
                    continue;
                }
                try (Statement st = c.createStatement()) {
                    for (String sql : m.statements()) {
                        st.execute(sql);
                    }
                    st.execute("PRAGMA user_version = " + m.version());
                    c.commit();
                } catch (SQLException e) {
                    c.rollback();
                    throw new SQLException("schema step " + m.version() + " (" + m.description() + ") failed: " + e.getMessage(), e);
                }
            }
        } finally {
            c.setAutoCommit(auto);
        }
    }
}
