package org.cohesa.store;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;

/**
 * The local SQLite database: opened in WAL mode with a busy timeout so the desktop app and the command
 * line can use it at once; schema migrated on open; bundled solvents and materials refreshed when the shipped
 * tables change (the user's own entries are never touched).
 */
public final class Database implements AutoCloseable {

    /** How long a writer waits for another process's lock before giving up, ms. */
    public static final int BUSY_TIMEOUT_MS = 15_000;

    private final Path file;
    private final Connection connection;

    private Database(Path file, Connection connection) {
        this.file = file;
        this.connection = connection;
    }

    /** Opens (creating if needed) the database at {@code file} with the program's bundled data. */
    public static Database open(Path file) {
        return open(file, BundledData.resource("solvents.csv"));
    }

    /** Opens the database, migrating it and syncing it with {@code bundledSolvents} and the bundled materials. */
    public static Database open(Path file, BundledData bundledSolvents) {
        return open(file, bundledSolvents, BundledData.resource("materials.csv"));
    }

    /** Opens the database, migrating it and syncing it with the given bundled solvent and material tables. */
    public static Database open(Path file, BundledData bundledSolvents, BundledData bundledMaterials) {
        Database db = openWithoutSync(file);
        try {
            new SolventRepository(db).syncBundled(bundledSolvents);
            new MaterialRepository(db).syncBundled(bundledMaterials);
        } catch (RuntimeException e) {
            db.close();
            throw e;
        }
        return db;
    }

    /** Opens and migrates without touching the solvent data (tests of migrations, tools). */
    public static Database openWithoutSync(Path file) {
        try {
            Path parent = file.toAbsolutePath().getParent();
            if (parent != null) {
                Files.createDirectories(parent);
            }
        } catch (IOException e) {
            throw new StoreException("cannot create the folder for the database " + file + ": " + e.getMessage(), e);
        }
        requireNotEmptyFile(file);
        try {
            Connection c = DriverManager.getConnection("jdbc:sqlite:" + file.toAbsolutePath());
            try (Statement st = c.createStatement()) {
                st.execute("PRAGMA busy_timeout = " + BUSY_TIMEOUT_MS);
                st.execute("PRAGMA journal_mode = WAL");
                st.execute("PRAGMA synchronous = FULL");
                st.execute("PRAGMA foreign_keys = ON");
            }
            Migrations.migrate(c);
            return new Database(file, c);
        } catch (SQLException e) {
            throw new StoreException("cannot open the database " + file + ": " + explain(e), e);
        }
    }

    /**
     * A zero-length file is not an empty register: SQLite would take it as a new database and the register's history
     * would silently start again (a truncated or replaced file looks exactly like this). It is refused instead.
     */
    static void requireNotEmptyFile(Path file) {
        try {
            if (Files.isRegularFile(file) && Files.size(file) == 0) {
                throw new org.cohesa.core.InvalidInputException("database", file.toString(),
                        "is an empty file (0 bytes), not a Cohesa database; restore it from a backup, or remove it to start a new one");
            }
        } catch (IOException e) {
            throw new StoreException("cannot read the database " + file + ": " + e.getMessage(), e);
        }
    }

    /** A database failure in plain words: a full disk is said to be one (SQLite reports it under several codes). */
    static String explain(SQLException e) {
        String m = String.valueOf(e.getMessage());
        String upper = m.toUpperCase(java.util.Locale.ROOT);
        if (upper.contains("SQLITE_FULL") || upper.contains("SQLITE_IOERR_SHMSIZE") || upper.contains("DATABASE OR DISK IS FULL")
                || upper.contains("NO SPACE LEFT")) {
            return "the disk is full (" + m.replaceAll("\\s+", " ").strip() + ")";
        }
        return m;
    }

    public Path file() {
        return file;
    }

    public Connection connection() {
        return connection;
    }

    /** Work done inside one transaction. */
    @FunctionalInterface
    public interface SqlWork<T> {
        T run(Connection c) throws SQLException;
    }

    /**
     * Runs {@code work} in one transaction (BEGIN IMMEDIATE, so concurrent writers queue on the busy
     * timeout instead of failing mid-way); rolls everything back on any failure.
     */
    public synchronized <T> T inTransaction(SqlWork<T> work) {
        try {
            // autocommit stays on; we frame the transaction ourselves so the write lock is taken up front
            // and released at once (the driver's own begin-after-commit would hold it between calls)
            try (Statement st = connection.createStatement()) {
                st.execute("BEGIN IMMEDIATE");
            }
            try {
                T result = work.run(connection);
                try (Statement st = connection.createStatement()) {
                    st.execute("COMMIT");
                }
                return result;
            } catch (SQLException | RuntimeException e) {
                try (Statement st = connection.createStatement()) {
                    st.execute("ROLLBACK");
                } catch (SQLException suppressed) {
                    e.addSuppressed(suppressed);
                }
                throw e;
            }
        } catch (SQLException e) {
            throw new StoreException("database write failed, nothing was changed: " + explain(e), e);
        }
    }

    /**
     * Runs read-only {@code work} in one read transaction: in WAL mode it sees one committed state of the
     * database even while other connections write.
     */
    public synchronized <T> T inReadTransaction(SqlWork<T> work) {
        try {
            try (Statement st = connection.createStatement()) {
                st.execute("BEGIN DEFERRED");
            }
            try {
                return work.run(connection);
            } finally {
                try (Statement st = connection.createStatement()) {
                    st.execute("COMMIT");
                }
            }
        } catch (SQLException e) {
            throw new StoreException("database read failed: " + explain(e), e);
        }
    }

    /**
     * Writes a consistent copy of the whole database to {@code target} with SQLite's {@code VACUUM INTO}
     * (a read transaction: other processes keep reading and writing meanwhile). The target must not exist.
     */
    public synchronized void backupTo(Path target) {
        Path abs = target.toAbsolutePath();
        Path parent = abs.getParent();
        if (Files.isDirectory(abs)) {
            throw new org.cohesa.core.InvalidInputException("FILE", target.toString(), "is a folder; give a new file name inside it");
        }
        if (Files.exists(abs, java.nio.file.LinkOption.NOFOLLOW_LINKS)) {
            throw new org.cohesa.core.InvalidInputException("FILE", target.toString(), "already exists; choose a new file name");
        }
        if (parent == null || !Files.isDirectory(parent)) {
            throw new org.cohesa.core.InvalidInputException("FILE", target.toString(), "its folder does not exist");
        }
        // the copy is written under a temporary name and moved into place only when complete: a failure (a full disk)
        // leaves no file behind that would block the retry
        Path tmp;
        try {
            tmp = Files.createTempFile(parent, "." + abs.getFileName(), ".part");
            Files.delete(tmp); // VACUUM INTO wants to create the file itself
        } catch (IOException e) {
            throw new org.cohesa.core.InvalidInputException("FILE", target.toString(), "cannot create a file in " + parent + ": "
                    + (e instanceof java.nio.file.FileSystemException fs && fs.getReason() != null ? fs.getReason() : e.getMessage()));
        }
        try {
            try (java.sql.PreparedStatement ps = connection.prepareStatement("VACUUM INTO ?")) {
                ps.setString(1, tmp.toString());
                ps.execute();
            }
            Files.move(tmp, abs, java.nio.file.StandardCopyOption.ATOMIC_MOVE);
        } catch (SQLException e) {
            throw new StoreException("backup to " + target + " failed, no file was written: " + explain(e), e);
        } catch (IOException e) {
            throw new StoreException("backup to " + target + " failed, no file was written: " + e.getMessage(), e);
        } finally {
            try {
                Files.deleteIfExists(tmp);
            } catch (IOException ignored) {
                // a leftover temporary file is hidden and named .part; nothing else to do
            }
        }
    }

    @Override
    public void close() {
        try {
            connection.close();
        } catch (SQLException e) {
            throw new StoreException("cannot close the database: " + e.getMessage(), e);
        }
    }
}
