package org.cohesa.cli;

import java.nio.file.Path;
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
            db = Database.open(databaseFile());
        }
        return db;
    }

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
