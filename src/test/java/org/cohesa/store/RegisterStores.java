package org.cohesa.store;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Clock;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import java.util.UUID;

/**
 * The two stores the records suite runs on. SQLite: a fresh database file. PostgreSQL: a fresh database on the server
 * named by {@code $COHESA_TEST_POSTGRES} (an administrator's address, e.g. {@code postgresql://postgres@127.0.0.1:54329/postgres};
 * {@code .ci/run} starts one with {@code docs/tools/local-postgres.sh}), with logins alice, bob, carol, dave and erin for
 * the people of the tests (erin also administers the register: {@code cohesa_register_admin}). Without that variable, or when the server does not answer, the PostgreSQL runs are skipped with a message.
 */
public final class RegisterStores {

    /** Environment variable naming the test server. */
    public static final String ENV = "COHESA_TEST_POSTGRES";

    private RegisterStores() {
    }

    /** One store under test: registers as several people, and an administrator's connection for outside edits. */
    public interface Store extends AutoCloseable {
        String name();

        /** The register as {@code person} (an account: the OS name on SQLite, a login on PostgreSQL). */
        RecordRepository as(String person, Path keyFile);

        /** A connection of the database's owner, as someone with a database tool would use it. */
        Connection admin() throws SQLException;

        /** Removes the database's append-only guards (what a determined editor does first). */
        void dropGuards(Connection admin) throws SQLException;

        /** The address a writer process is given (a file path or a postgresql:// address for the login {@code person}). */
        String address(String person);

        @Override
        void close();
    }

    /** Why PostgreSQL runs are skipped here, or null when a server is available. */
    public static String postgresUnavailable() {
        String url = System.getenv(ENV);
        if (url == null || url.isBlank()) {
            return "no PostgreSQL server for the tests: set " + ENV + " (bash .ci/run starts one; or run docs/tools/local-postgres.sh start)";
        }
        try (Connection c = adminConnection(url, null)) {
            return null;
        } catch (SQLException e) {
            return "the PostgreSQL server " + url + " does not answer (" + e.getMessage() + ")";
        }
    }

    static Connection adminConnection(String url, String database) throws SQLException {
        PostgresRegister.Target t = PostgresRegister.parse("test", database == null ? url : url.replaceFirst("/[^/?]+(\\?.*)?$", "/" + database));
        return DriverManager.getConnection(t.jdbcUrl(), t.properties());
    }

    /** A fresh SQLite register in {@code dir}. */
    public static Store sqlite(Path dir) {
        Path file = dir.resolve("register-" + UUID.randomUUID() + ".db");
        List<Database> open = new ArrayList<>();
        return new Store() {
            @Override
            public String name() {
                return "sqlite";
            }

            @Override
            public RecordRepository as(String person, Path keyFile) {
                Database db = Database.openWithoutSync(file);
                open.add(db);
                return new RecordRepository(new SqliteRegister(db, person), Clock.systemUTC(), keyFile);
            }

            @Override
            public Connection admin() throws SQLException {
                return DriverManager.getConnection("jdbc:sqlite:" + file);
            }

            @Override
            public void dropGuards(Connection admin) throws SQLException {
                try (Statement st = admin.createStatement()) {
                    st.execute("DROP TRIGGER IF EXISTS record_event_append_only_update");
                    st.execute("DROP TRIGGER IF EXISTS record_event_append_only_delete");
                }
            }

            @Override
            public String address(String person) {
                return file.toString();
            }

            @Override
            public void close() {
                open.forEach(Database::close);
                try {
                    Files.deleteIfExists(file);
                } catch (java.io.IOException ignored) {
                    // in a temporary folder
                }
            }
        };
    }

    /** A fresh PostgreSQL database on the test server (call only when {@link #postgresUnavailable()} is null). */
    public static Store postgres() {
        String url = System.getenv(ENV);
        String dbName = "cohesa_test_" + UUID.randomUUID().toString().replace("-", "").substring(0, 12).toLowerCase(Locale.ROOT);
        try (Connection c = adminConnection(url, null); Statement st = c.createStatement()) {
            st.execute("CREATE DATABASE " + dbName);
            for (String person : List.of("alice", "bob", "carol", "dave", "erin")) {
                st.execute("DO $$ BEGIN IF NOT EXISTS (SELECT 1 FROM pg_roles WHERE rolname = '" + person + "') THEN CREATE ROLE " + person
                        + " LOGIN; END IF; END $$");
            }
        } catch (SQLException e) {
            throw new IllegalStateException("cannot prepare the test database: " + e.getMessage(), e);
        }
        String admin = url.replaceFirst("/[^/?]+(\\?.*)?$", "/" + dbName);
        // the owner sets the register up; the people are writers, as a site would grant them
        try (PostgresRegister setup = PostgresRegister.open("test", admin); Statement st = setup.connection().createStatement()) {
            for (String person : List.of("alice", "bob", "carol", "dave", "erin")) {
                st.execute("GRANT cohesa_register_writer TO " + person);
            }
            // erin is the site's register administrator: she may switch the register's rules
            st.execute("GRANT cohesa_register_admin TO erin");
        } catch (SQLException e) {
            throw new IllegalStateException("cannot grant the test logins: " + e.getMessage(), e);
        }
        List<PostgresRegister> open = new ArrayList<>();
        return new Store() {
            @Override
            public String name() {
                return "postgresql";
            }

            @Override
            public RecordRepository as(String person, Path keyFile) {
                PostgresRegister r = PostgresRegister.open("test", address(person));
                open.add(r);
                return new RecordRepository(r, Clock.systemUTC(), keyFile);
            }

            @Override
            public Connection admin() throws SQLException {
                return adminConnection(url, dbName);
            }

            @Override
            public void dropGuards(Connection admin) throws SQLException {
                try (Statement st = admin.createStatement()) {
                    st.execute("ALTER TABLE record_event DISABLE TRIGGER USER");
                    st.execute("ALTER TABLE record_chain_head DISABLE TRIGGER USER");
                }
            }

            @Override
            public String address(String person) {
                return admin.replaceFirst("://[^@/]*@", "://").replaceFirst("://", "://" + person + "@");
            }

            @Override
            public void close() {
                open.forEach(PostgresRegister::close);
                try (Connection c = adminConnection(url, null); Statement st = c.createStatement()) {
                    st.execute("DROP DATABASE IF EXISTS " + dbName + " WITH (FORCE)");
                } catch (SQLException ignored) {
                    // a leftover test database on a throwaway server
                }
            }
        };
    }

    /** Both stores' names, for parameterised tests. */
    public static List<String> names() {
        return List.of("sqlite", "postgresql");
    }

}
