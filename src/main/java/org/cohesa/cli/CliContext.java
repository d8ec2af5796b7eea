package org.cohesa.cli;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.solvent.SolventLibrary;
import org.cohesa.store.Database;
import org.cohesa.store.DataHome;
import org.cohesa.store.MaterialRepository;
import org.cohesa.store.SolventRepository;

/** What the commands share: where the database is, opened lazily once per run. */
public final class CliContext implements AutoCloseable {

    private final Path dbOverride;
    private Database db;

    public CliContext(Path dbOverride) {
        this.dbOverride = dbOverride;
    }

    public Path databaseFile() {
        return dbOverride != null ? dbOverride : DataHome.defaultDatabase();
    }

    public Database database() {
        if (db == null) {
            if (dbOverride != null) {
                checkDatabaseOption(dbOverride);
            }
            db = Database.open(databaseFile());
        }
        return db;
    }

    /**
     * A file named with {@code --db} must sit in an existing folder and, if it exists, be an SQLite file: a typo must
     * not create folders (even at the file-system root) and an empty database, and a wrong file must not be opened.
     */
    static void checkDatabaseOption(Path file) {
        Path abs = file.toAbsolutePath();
        Path parent = abs.getParent();
        if (parent != null && !Files.isDirectory(parent)) {
            throw new InvalidInputException("--db", file.toString(), "the folder " + parent + " does not exist (create it first)");
        }
        if (Files.isDirectory(abs)) {
            throw new InvalidInputException("--db", file.toString(), "is a folder; give a database file inside it, e.g. "
                    + abs.resolve("cohesa.db"));
        }
        if (!Files.exists(abs)) {
            return;
        }
        if (!Files.isRegularFile(abs)) {
            throw new InvalidInputException("--db", file.toString(), "is not a regular file");
        }
        if (!Files.isReadable(abs)) {
            throw new InvalidInputException("--db", file.toString(), "cannot be read (permission denied)");
        }
        try (InputStream in = Files.newInputStream(abs)) {
            byte[] head = in.readNBytes(SQLITE_MAGIC.length);
            if (head.length == 0) {
                throw new InvalidInputException("--db", file.toString(), "is an empty file (0 bytes), not a Cohesa database;"
                        + " restore it from a backup, or remove it to start a new one");
            }
            if (!Arrays.equals(head, SQLITE_MAGIC)) {
                throw new InvalidInputException("--db", file.toString(), "is not a Cohesa database (not an SQLite file)");
            }
        } catch (IOException e) {
            throw new InvalidInputException("--db", file.toString(), "cannot be read: " + e.getMessage());
        }
    }

    /** The first 16 bytes of every SQLite 3 database file ("SQLite format 3" and a NUL; sqlite.org/fileformat.html). */
    private static final byte[] SQLITE_MAGIC = "SQLite format 3\0".getBytes(StandardCharsets.US_ASCII);

    public SolventRepository solvents() {
        return new SolventRepository(database());
    }

    public MaterialRepository materials() {
        return new MaterialRepository(database());
    }

    public SolventLibrary library() {
        return solvents().library();
    }

    @Override
    public void close() {
        if (db != null) {
            db.close();
            db = null;
        }
    }
}
