package org.cohesa.store;

import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;

/** The register inside the local SQLite database (the embedded default: nothing to set up). */
public final class SqliteRegister implements RegisterDb {

    private final Database db;
    private final String account;

    /** The register in {@code db}, acting under the operating-system account of this process ({@link LocalAccount}). */
    public SqliteRegister(Database db) {
        this(db, null);
    }

    /** With an explicit account (tests that act as several people); null: {@link LocalAccount#current()} at each write. */
    public SqliteRegister(Database db, String account) {
        this.db = db;
        this.account = account;
    }

    /** The operating-system account running the program ({@link LocalAccount}). */
    public static String osAccount() {
        return LocalAccount.current();
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
        return account != null ? account : LocalAccount.current();
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
