package org.cohesa.store;

import java.net.URI;
import java.net.URISyntaxException;
import java.net.URLDecoder;
import java.nio.charset.StandardCharsets;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.List;
import java.util.Properties;
import org.cohesa.core.InvalidInputException;

/**
 * The shared register on a PostgreSQL server ({@code --register postgresql://[USER[:PASSWORD]@]HOST[:PORT]/DB}): the
 * same tables, steps and chain as the local register. The server enforces what the program promises: triggers refuse
 * UPDATE, DELETE and TRUNCATE on events, and refuse an event whose account is not the login that inserts it; writers
 * are serialised by a transaction-scoped advisory lock, so parallel writers on many machines queue and never fork the
 * chain; a check reads one REPEATABLE READ snapshot.
 */
public final class PostgresRegister implements RegisterDb, AutoCloseable {

    /** The advisory-lock key of the chain head (any constant; "cohesa" in ASCII). */
    static final long CHAIN_LOCK = 0x636f68657361L;

    private final String location;
    private final Connection connection;
    private final String account;
    private final String secretId;

    private PostgresRegister(String location, Connection connection, String account, String secretId) {
        this.location = location;
        this.connection = connection;
        this.account = account;
        this.secretId = secretId;
    }

    /** True for text that names a PostgreSQL register. */
    public static boolean isAddress(String text) {
        return text != null && (text.startsWith("postgresql://") || text.startsWith("postgres://"));
    }

    /** Connects and migrates the register's tables. */
    public static PostgresRegister open(String field, String address) {
        Target t = parse(field, address);
        try {
            Connection c = DriverManager.getConnection(t.jdbcUrl(), t.properties());
            String login;
            try (Statement st = c.createStatement(); ResultSet rs = st.executeQuery("SELECT session_user")) {
                rs.next();
                login = rs.getString(1);
            }
            PostgresMigrations.migrate(c);
            String secret;
            try (Statement st = c.createStatement(); ResultSet rs = st.executeQuery("SELECT cohesa_register_key_id()")) {
                rs.next();
                secret = rs.getString(1);
            }
            return new PostgresRegister(t.shown(), c, login, secret);
        } catch (SQLException e) {
            throw new StoreException("cannot open the shared register " + t.shown() + ": " + oneLine(e), e);
        }
    }

    /** Where to connect, parsed from the address. */
    record Target(String jdbcUrl, Properties properties, String shown) {
    }

    static Target parse(String field, String address) {
        if (!isAddress(address)) {
            throw new InvalidInputException(field, String.valueOf(address), "a shared register is written postgresql://HOST[:PORT]/DATABASE");
        }
        URI u;
        try {
            u = new URI(address.replaceFirst("^postgres://", "postgresql://"));
        } catch (URISyntaxException e) {
            throw new InvalidInputException(field, address, "not a valid address (" + e.getReason() + ")");
        }
        String db = u.getPath() == null ? "" : u.getPath().replaceFirst("^/", "");
        if (u.getHost() == null || db.isBlank()) {
            throw new InvalidInputException(field, address, "give the server and the database: postgresql://HOST[:PORT]/DATABASE");
        }
        Properties p = new Properties();
        String user = null;
        String password = null;
        if (u.getRawUserInfo() != null) {
            String[] parts = u.getRawUserInfo().split(":", 2);
            user = URLDecoder.decode(parts[0], StandardCharsets.UTF_8);
            password = parts.length > 1 ? URLDecoder.decode(parts[1], StandardCharsets.UTF_8) : null;
        }
        if (user == null || user.isBlank()) {
            user = firstNonBlank(System.getenv("PGUSER"), System.getProperty("user.name"));
        }
        if (password == null) {
            password = System.getenv("PGPASSWORD");
        }
        p.setProperty("user", user);
        if (password != null) {
            p.setProperty("password", password);
        }
        p.setProperty("ApplicationName", "cohesa");
        p.setProperty("connectTimeout", "10");
        int port = u.getPort() > 0 ? u.getPort() : 5432;
        String query = u.getRawQuery() == null ? "" : "?" + u.getRawQuery();
        String jdbc = "jdbc:postgresql://" + u.getHost() + ":" + port + "/" + db + query;
        return new Target(jdbc, p, "postgresql://" + user + "@" + u.getHost() + ":" + port + "/" + db);
    }

    private static String firstNonBlank(String a, String b) {
        return a != null && !a.isBlank() ? a : b;
    }

    static String oneLine(SQLException e) {
        return String.valueOf(e.getMessage()).replaceAll("\\s+", " ").strip();
    }

    @Override
    public synchronized <T> T write(Database.SqlWork<T> work) {
        try {
            connection.setAutoCommit(false);
            connection.setTransactionIsolation(Connection.TRANSACTION_READ_COMMITTED);
            try {
                try (Statement st = connection.createStatement()) {
                    // one writer at a time on the chain head, across every client of the server
                    st.execute("SELECT pg_advisory_xact_lock(" + CHAIN_LOCK + ")");
                }
                T result = work.run(connection);
                connection.commit();
                return result;
            } catch (SQLException | RuntimeException e) {
                try {
                    connection.rollback();
                } catch (SQLException suppressed) {
                    e.addSuppressed(suppressed);
                }
                throw e;
            } finally {
                connection.setAutoCommit(true);
            }
        } catch (SQLException e) {
            throw new StoreException("shared register write failed, nothing was changed: " + oneLine(e), e);
        }
    }

    @Override
    public synchronized <T> T read(Database.SqlWork<T> work) {
        try {
            connection.setAutoCommit(false);
            connection.setTransactionIsolation(Connection.TRANSACTION_REPEATABLE_READ);
            connection.setReadOnly(true);
            try {
                T result = work.run(connection);
                connection.commit();
                return result;
            } catch (SQLException | RuntimeException e) {
                connection.rollback();
                throw e;
            } finally {
                connection.setReadOnly(false);
                connection.setAutoCommit(true);
                connection.setTransactionIsolation(Connection.TRANSACTION_READ_COMMITTED);
            }
        } catch (SQLException e) {
            throw new StoreException("shared register read failed: " + oneLine(e), e);
        }
    }

    @Override
    public String kind() {
        return "postgresql";
    }

    @Override
    public String location() {
        return location;
    }

    @Override
    public String account() {
        return account;
    }

    @Override
    public boolean accountIsAuthenticated() {
        return true;
    }

    /** The register's own triggers (on {@code record_event} and its head), all of which must be enabled. */
    static final List<String> GUARDS = List.of("record_event_append_only", "record_event_no_truncate", "record_event_own_account",
            "record_event_four_eyes", "record_event_seal", "record_chain_head_seal");

    @Override
    public String serverSecretId() {
        return secretId;
    }

    @Override
    public org.cohesa.core.records.ChainSeal serverSeal(Connection c, org.cohesa.core.records.ChainHead head,
                                                        org.cohesa.core.records.Anchor anchor) throws SQLException {
        return ServerSeal.read(c, secretId, head, anchor);
    }

    @Override
    public String serverAnchorMac(String content) {
        return read(c -> {
            try (java.sql.PreparedStatement ps = c.prepareStatement("SELECT cohesa_register_anchor_mac(?)")) {
                ps.setString(1, content);
                try (ResultSet rs = ps.executeQuery()) {
                    rs.next();
                    return rs.getString(1);
                }
            }
        });
    }

    @Override
    public void requireMayChangeRules(Connection c, String by) throws SQLException {
        try (Statement st = c.createStatement();
             ResultSet rs = st.executeQuery("SELECT session_user = record_event_owner() OR pg_has_role(session_user, 'cohesa_register_admin', 'MEMBER')")) {
            rs.next();
            if (!rs.getBoolean(1)) {
                throw new InvalidInputException("--by", by, "the login " + account + " may not switch the rules of the shared register "
                        + location + "; its owner or a member of cohesa_register_admin may (GRANT cohesa_register_admin TO " + account + ")");
            }
        }
    }

    @Override
    public void beginVerbatimCopy(Connection c) throws SQLException {
        try (Statement st = c.createStatement()) {
            // honoured for the register's owner only (trigger record_event_four_eyes): copied events keep their accounts,
            // and a local history kept under one operating-system account is not refused by the server's four-eyes check
            st.execute("SET LOCAL cohesa.copy = 'on'");
        }
    }

    @Override
    public boolean guardsInPlace() {
        try (Statement st = connection.createStatement();
             ResultSet rs = st.executeQuery("SELECT COUNT(*) FROM pg_trigger WHERE NOT tgisinternal AND tgenabled <> 'D' AND tgname IN ("
                     + GUARDS.stream().map(g -> "'" + g + "'").collect(java.util.stream.Collectors.joining(", ")) + ")")) {
            return rs.next() && rs.getInt(1) == GUARDS.size();
        } catch (SQLException e) {
            throw new StoreException("cannot read the shared register's schema: " + oneLine(e), e);
        }
    }

    /** The connection (tests and the copy command). */
    public Connection connection() {
        return connection;
    }

    @Override
    public void close() {
        try {
            connection.close();
        } catch (SQLException e) {
            throw new StoreException("cannot close the shared register: " + oneLine(e), e);
        }
    }

    /** The register's tables on PostgreSQL, by the same step numbers as the local schema ({@link Migrations}). */
    static final class PostgresMigrations {

        /**
         * Step 9: the server seals every event and the head itself, with a 32-byte secret in a table only the register's
         * owner can read; writers never see it, and may only ask whether a seal is genuine. pgcrypto's hmac() computes the
         * HMAC-SHA-256 (RFC 2104); without pgcrypto on the server, or on a register that already holds events sealed with a
         * key file, no secret is created and the register stays sealed by key files.
         */
        static final List<String> SERVER_SECRET = List.of(
                "DO $$ BEGIN IF EXISTS (SELECT 1 FROM pg_available_extensions WHERE name = 'pgcrypto') THEN"
                        + " CREATE EXTENSION IF NOT EXISTS pgcrypto; END IF; END $$",
                "CREATE TABLE cohesa_register_secret (singleton INTEGER PRIMARY KEY CHECK (singleton = 1), secret BYTEA NOT NULL,"
                        + " key_id TEXT NOT NULL)",
                "REVOKE ALL ON cohesa_register_secret FROM PUBLIC",
                "CREATE FUNCTION cohesa_register_mac(msg text) RETURNS text LANGUAGE plpgsql STABLE SECURITY DEFINER"
                        + " SET search_path FROM CURRENT AS $$ DECLARE s bytea; BEGIN"
                        + " SELECT secret INTO s FROM cohesa_register_secret WHERE singleton = 1;"
                        + " IF s IS NULL THEN RETURN NULL; END IF;"
                        + " RETURN encode(hmac(convert_to(msg, 'UTF8'), s, 'sha256'), 'hex'); END $$",
                "CREATE FUNCTION cohesa_register_seal_ok(msg text, mac text) RETURNS boolean LANGUAGE plpgsql STABLE SECURITY DEFINER"
                        + " SET search_path FROM CURRENT AS $$ BEGIN RETURN COALESCE(mac = cohesa_register_mac(msg), false); END $$",
                "CREATE FUNCTION cohesa_register_anchor_mac(content text) RETURNS text LANGUAGE plpgsql STABLE SECURITY DEFINER"
                        + " SET search_path FROM CURRENT AS $$ BEGIN RETURN cohesa_register_mac('anchor:' || content); END $$",
                "CREATE FUNCTION cohesa_register_key_id() RETURNS text LANGUAGE plpgsql STABLE SECURITY DEFINER"
                        + " SET search_path FROM CURRENT AS $$ BEGIN RETURN (SELECT key_id FROM cohesa_register_secret WHERE singleton = 1); END $$",
                // the secret's HMAC is never handed out: writers may only check a seal, seal an anchor, and read the key's id
                "REVOKE ALL ON FUNCTION cohesa_register_mac(text), cohesa_register_seal_ok(text, text), cohesa_register_anchor_mac(text),"
                        + " cohesa_register_key_id() FROM PUBLIC",
                "GRANT EXECUTE ON FUNCTION cohesa_register_seal_ok(text, text), cohesa_register_anchor_mac(text), cohesa_register_key_id()"
                        + " TO cohesa_register_writer",
                // every event inserted is sealed by the server, whatever MAC the client sent
                "CREATE FUNCTION record_event_seal() RETURNS trigger LANGUAGE plpgsql SECURITY DEFINER SET search_path FROM CURRENT AS $$"
                        + " BEGIN IF EXISTS (SELECT 1 FROM cohesa_register_secret) THEN NEW.mac := cohesa_register_mac('event:' || NEW.hash);"
                        + " END IF; RETURN NEW; END $$",
                "CREATE TRIGGER record_event_seal BEFORE INSERT ON record_event FOR EACH ROW EXECUTE FUNCTION record_event_seal()",
                // the head is sealed only as it moves on by one event to the newest one, so a login cannot get a seal for a
                // head that hides events (a verbatim copy by the owner writes the whole head at once)
                "CREATE FUNCTION record_chain_head_seal() RETURNS trigger LANGUAGE plpgsql SECURITY DEFINER SET search_path FROM CURRENT AS $$"
                        + " DECLARE newest record; copying boolean; BEGIN"
                        + " IF NOT EXISTS (SELECT 1 FROM cohesa_register_secret) THEN RETURN NEW; END IF;"
                        + " IF TG_OP = 'INSERT' AND EXISTS (SELECT 1 FROM record_chain_head) THEN RETURN NEW; END IF;"
                        + " copying := session_user = record_event_owner() AND current_setting('cohesa.copy', true) = 'on';"
                        + " SELECT hash, record_id, seq INTO newest FROM record_event ORDER BY id DESC LIMIT 1;"
                        + " IF NOT FOUND OR NEW.last_hash IS DISTINCT FROM newest.hash OR NEW.last_record_id <> newest.record_id"
                        + "  OR NEW.last_seq <> newest.seq THEN"
                        + "  RAISE EXCEPTION 'the register head must name the newest event'; END IF;"
                        + " IF TG_OP = 'UPDATE' AND NOT copying AND (NEW.events <> OLD.events + 1 OR NEW.max_record_id < OLD.max_record_id) THEN"
                        + "  RAISE EXCEPTION 'the register head moves on by one event at a time (% events, not %)', OLD.events + 1, NEW.events; END IF;"
                        + " IF TG_OP = 'INSERT' AND NEW.events <> (SELECT count(*) FROM record_event) THEN"
                        + "  RAISE EXCEPTION 'the register head must count every event'; END IF;"
                        + " NEW.mac := cohesa_register_mac('head:' || NEW.events || ':' || NEW.last_hash || ':' || NEW.max_record_id);"
                        + " NEW.key_id := (SELECT key_id FROM cohesa_register_secret WHERE singleton = 1);"
                        + " RETURN NEW; END $$",
                "CREATE TRIGGER record_chain_head_seal BEFORE INSERT OR UPDATE ON record_chain_head"
                        + " FOR EACH ROW EXECUTE FUNCTION record_chain_head_seal()",
                // a new register gets its secret now; one already sealed by a key file keeps that key
                "DO $$ DECLARE s bytea; BEGIN"
                        + " IF EXISTS (SELECT 1 FROM pg_extension WHERE extname = 'pgcrypto') AND NOT EXISTS (SELECT 1 FROM record_event) THEN"
                        + "  s := gen_random_bytes(32);"
                        + "  INSERT INTO cohesa_register_secret (singleton, secret, key_id) VALUES (1, s,"
                        + "   substr(encode(digest('cohesa register key id:' || encode(s, 'hex'), 'sha256'), 'hex'), 1, 16));"
                        + " END IF; END $$");

        /** Steps 4 and 6 of the local schema, in PostgreSQL's dialect; the solvent-library steps do not apply to a register. */
        static final List<Migration> ALL = List.of(
                new Migration(4, "substitution records: append-only hash-chained events and the chain's head note", List.of(
                        "CREATE TABLE record_event ("
                                + " id BIGINT GENERATED ALWAYS AS IDENTITY PRIMARY KEY,"
                                + " record_id BIGINT NOT NULL CHECK (record_id > 0),"
                                + " seq INTEGER NOT NULL CHECK (seq > 0),"
                                + " kind TEXT NOT NULL, payload TEXT NOT NULL, actor TEXT NOT NULL, at TEXT NOT NULL,"
                                + " prev_record_id BIGINT NOT NULL, prev_seq INTEGER NOT NULL, prev_hash TEXT NOT NULL,"
                                + " hash TEXT NOT NULL UNIQUE, UNIQUE (record_id, seq))",
                        "CREATE TABLE record_chain_head (singleton INTEGER PRIMARY KEY CHECK (singleton = 1),"
                                + " events BIGINT NOT NULL, last_hash TEXT NOT NULL, last_record_id BIGINT NOT NULL, last_seq INTEGER NOT NULL,"
                                + " max_record_id BIGINT NOT NULL)",
                        "CREATE FUNCTION record_event_refuse() RETURNS trigger LANGUAGE plpgsql AS $$ BEGIN"
                                + " RAISE EXCEPTION 'substitution record events are append-only'; END $$",
                        "CREATE TRIGGER record_event_append_only BEFORE UPDATE OR DELETE ON record_event"
                                + " FOR EACH ROW EXECUTE FUNCTION record_event_refuse()",
                        "CREATE TRIGGER record_event_no_truncate BEFORE TRUNCATE ON record_event"
                                + " FOR EACH STATEMENT EXECUTE FUNCTION record_event_refuse()")),
                new Migration(6, "register: the acting account and an HMAC on every event and on the head; record 0 holds the register's"
                        + " own settings (the four-eyes rule)", List.of(
                        "ALTER TABLE record_event DROP CONSTRAINT record_event_record_id_check",
                        "ALTER TABLE record_event ADD CONSTRAINT record_event_record_id_check CHECK (record_id >= 0)",
                        "ALTER TABLE record_event ADD COLUMN account TEXT",
                        "ALTER TABLE record_event ADD COLUMN mac TEXT",
                        "ALTER TABLE record_chain_head ADD COLUMN mac TEXT",
                        "ALTER TABLE record_chain_head ADD COLUMN key_id TEXT",
                        // the server, not the client, vouches for who acted: an event must carry the login that inserts it
                        // (only the register's owner, who set it up and copies registers in, may insert others' events)
                        "CREATE FUNCTION record_event_check_account() RETURNS trigger LANGUAGE plpgsql AS $$ BEGIN"
                                + " IF NEW.account IS DISTINCT FROM session_user AND session_user <> (SELECT tableowner FROM pg_tables"
                                + " WHERE schemaname = current_schema() AND tablename = 'record_event') THEN"
                                + " RAISE EXCEPTION 'an event must carry the account that inserts it (%), not %', session_user, NEW.account;"
                                + " END IF; RETURN NEW; END $$",
                        "CREATE TRIGGER record_event_own_account BEFORE INSERT ON record_event"
                                + " FOR EACH ROW EXECUTE FUNCTION record_event_check_account()",
                        // a role for the people who file and decide: they may add events and move the head, nothing else
                        "DO $$ BEGIN IF NOT EXISTS (SELECT 1 FROM pg_roles WHERE rolname = 'cohesa_register_writer') THEN"
                                + " CREATE ROLE cohesa_register_writer NOLOGIN; END IF; END $$",
                        "GRANT SELECT, INSERT ON record_event TO cohesa_register_writer",
                        "GRANT SELECT, INSERT, UPDATE ON record_chain_head TO cohesa_register_writer",
                        "GRANT SELECT ON cohesa_schema TO cohesa_register_writer")),
                new Migration(8, "register: the server enforces the four-eyes rule by login, and only its owner or cohesa_register_admin"
                        + " switches register rules", List.of(
                        "DO $$ BEGIN IF NOT EXISTS (SELECT 1 FROM pg_roles WHERE rolname = 'cohesa_register_admin') THEN"
                                + " CREATE ROLE cohesa_register_admin NOLOGIN; END IF; END $$",
                        "GRANT cohesa_register_writer TO cohesa_register_admin",
                        "CREATE FUNCTION record_event_owner() RETURNS name LANGUAGE sql STABLE AS $$ SELECT tableowner FROM pg_tables"
                                + " WHERE schemaname = current_schema() AND tablename = 'record_event' $$",
                        // the same rule the program checks, held by the server against every client: the login that filed a
                        // record may not review or approve it, the login that reviewed it may not approve it, unless the rule's
                        // newest setting (record 0) is off; a verbatim copy by the owner keeps the copied history's accounts
                        "CREATE FUNCTION record_event_four_eyes() RETURNS trigger LANGUAGE plpgsql AS $$"
                                + " DECLARE rule_value text; clash record; BEGIN"
                                + " IF session_user = record_event_owner() AND current_setting('cohesa.copy', true) = 'on' THEN RETURN NEW; END IF;"
                                + " IF NEW.kind = 'rule_set' THEN"
                                + "  IF session_user <> record_event_owner() AND NOT pg_has_role(session_user, 'cohesa_register_admin', 'MEMBER') THEN"
                                + "   RAISE EXCEPTION 'the login % may not switch register rules (owner or cohesa_register_admin only)', session_user;"
                                + "  END IF; RETURN NEW; END IF;"
                                + " IF NEW.kind NOT IN ('sent_to_review', 'approved') THEN RETURN NEW; END IF;"
                                + " SELECT payload::jsonb ->> 'value' INTO rule_value FROM record_event WHERE record_id = 0 AND kind = 'rule_set'"
                                + "  AND payload::jsonb ->> 'rule' = 'four_eyes' ORDER BY seq DESC LIMIT 1;"
                                + " IF rule_value = 'off' THEN RETURN NEW; END IF;"
                                + " SELECT kind INTO clash FROM record_event WHERE record_id = NEW.record_id"
                                + "  AND (account = NEW.account OR account = session_user)"
                                + "  AND (kind = 'created' OR (NEW.kind = 'approved' AND kind = 'sent_to_review')) ORDER BY seq LIMIT 1;"
                                + " IF FOUND THEN RAISE EXCEPTION 'four-eyes rule: the login % % record %, so another login must %',"
                                + "  session_user, CASE clash.kind WHEN 'created' THEN 'filed' ELSE 'reviewed' END, NEW.record_id,"
                                + "  CASE NEW.kind WHEN 'approved' THEN 'approve it' ELSE 'review it' END; END IF;"
                                + " RETURN NEW; END $$",
                        "CREATE TRIGGER record_event_four_eyes BEFORE INSERT ON record_event"
                                + " FOR EACH ROW EXECUTE FUNCTION record_event_four_eyes()")),
                new Migration(9, "register: a chain secret held by the server (HMAC by pgcrypto, the key in a table only the owner reads)",
                        SERVER_SECRET));

        private PostgresMigrations() {
        }

        static int latest() {
            return ALL.get(ALL.size() - 1).version();
        }

        static void migrate(Connection c) throws SQLException {
            boolean auto = c.getAutoCommit();
            c.setAutoCommit(false);
            try (Statement st = c.createStatement()) {
                // two clients starting at once must not both create the tables
                st.execute("SELECT pg_advisory_xact_lock(" + (CHAIN_LOCK + 1) + ")");
                boolean exists;
                try (ResultSet rs = st.executeQuery("SELECT to_regclass('cohesa_schema') IS NOT NULL")) {
                    rs.next();
                    exists = rs.getBoolean(1);
                }
                int current = 0;
                if (exists) {
                    try (ResultSet rs = st.executeQuery("SELECT version FROM cohesa_schema WHERE singleton = 1")) {
                        current = rs.next() ? rs.getInt(1) : 0;
                    }
                }
                if (current == latest()) {
                    // up to date: people who only file and decide need no right to change the schema
                    c.commit();
                    return;
                }
                if (!exists) {
                    st.execute("CREATE TABLE cohesa_schema (singleton INTEGER PRIMARY KEY CHECK (singleton = 1), version INTEGER NOT NULL)");
                }
                if (current > latest()) {
                    throw new SQLException("the shared register has schema version " + current + ", newer than this program knows ("
                            + latest() + "); use a newer Cohesa");
                }
                for (Migration m : ALL) {
                    if (m.version() <= current) {
                        continue;
                    }
                    for (String sql : m.statements()) {
                        st.execute(sql);
                    }
                    st.execute("INSERT INTO cohesa_schema (singleton, version) VALUES (1, " + m.version() + ")"
                            + " ON CONFLICT (singleton) DO UPDATE SET version = excluded.version");
                }
                c.commit();
            } catch (SQLException e) {
                c.rollback();
                throw new SQLException("the shared register's schema could not be set up: " + oneLine(e), e);
            } finally {
                c.setAutoCommit(auto);
            }
        }
    }
}
