package org.cohesa.store;

import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;

/** The register inside the local SQLite database (the embedded default: nothing to set up). */
public final class SqliteRegister implements RegisterDb {

    private final Database db;
    private final String account;

    public SqliteRegister(Database db) {
        this(db, osAccount());
    }

    /** With an explicit account (tests that act as several people). */
    public SqliteRegister(Database db, String account) {
        this.db = db;
        this.account = account;
    }

    /** The operating-system user running the program, as the Java runtime reports it. */
    public static String osAccount() {
        String name = System.getProperty("user.name");
        return name == null || name.isBlank() ? "unknown" : name.strip();
    }

    @Override
    public <T> T write(Database.SqlWork<T> work) {
        return db.inTransaction(work);
    }

    @Override
    public <T> T read(Database.SqlWork<T> work) {
        return db.inReadTransaction(work);
    }

    @Override
    public String kind() {
        return "sqlite";
    }

    @Override
    public String location() {
        return db.file().toString();
    }

    @Override
    public String account() {
        return account;
    }

    @Override
    public boolean accountIsAuthenticated() {
        return false;
    }

    @Override
    public boolean guardsInPlace() {
        try (Statement st = db.connection().createStatement();
             ResultSet rs = st.executeQuery("SELECT COUNT(*) FROM sqlite_master WHERE type = 'trigger'"
                     + " AND name IN ('record_event_append_only_update', 'record_event_append_only_delete')")) {
            return rs.next() && rs.getInt(1) == 2;
        } catch (SQLException e) {
            throw new StoreException("cannot read the schema: " + e.getMessage(), e);
        }
    }
}
