package org.cohesa.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.Optional;

/** The {@code meta} key/value table (schema step 1): e.g. the SHA-256 of each bundled table a database was built from. */
final class MetaTable {

    private MetaTable() {
    }

    static Optional<String> get(Connection c, String key) {
        try (PreparedStatement ps = c.prepareStatement("SELECT value FROM meta WHERE key = ?")) {
            ps.setString(1, key);
            try (ResultSet rs = ps.executeQuery()) {
                return rs.next() ? Optional.of(rs.getString(1)) : Optional.empty();
            }
        } catch (SQLException e) {
            throw new StoreException("cannot read metadata: " + e.getMessage(), e);
        }
    }

    /** Sets {@code key} inside the caller's transaction. */
    static void put(Connection c, String key, String value) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO meta (key, value) VALUES (?, ?)"
                + " ON CONFLICT (key) DO UPDATE SET value = excluded.value")) {
            ps.setString(1, key);
            ps.setString(2, value);
            ps.executeUpdate();
        }
    }
}
