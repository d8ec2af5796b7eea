package org.cohesa.store;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.hsp.SolubilitySphere;
import org.cohesa.core.target.Material;
import org.cohesa.core.target.MaterialKind;
import org.cohesa.core.target.MaterialLibrary;

/**
 * Materials in the database: the bundled rows (replaced as a whole when the shipped table changes) and the
 * user's own (typed in or saved from a fit), which bundled-data updates never touch.
 */
public final class MaterialRepository {

    private static final String BUNDLED_HASH_KEY = "bundled_materials_sha256";

    private final Database db;

    public MaterialRepository(Database db) {
        this.db = db;
    }

    /** Every material, sorted by name. */
    public List<Material> all() {
        try (Statement st = db.connection().createStatement();
             ResultSet rs = st.executeQuery("SELECT * FROM material ORDER BY name COLLATE NOCASE")) {
            List<Material> out = new ArrayList<>();
            while (rs.next()) {
                String syn = rs.getString("synonyms");
                List<String> synonyms = syn == null || syn.isBlank() ? List.of()
                        : Arrays.stream(syn.split(";")).map(String::strip).filter(s -> !s.isEmpty()).toList();
                try {
                    out.add(new Material(rs.getString("name"), synonyms, MaterialKind.parse(rs.getString("kind")),
                            SolubilitySphere.of(rs.getDouble("dD"), rs.getDouble("dP"), rs.getDouble("dH"), rs.getDouble("r0")),
                            rs.getString("source"), rs.getString("note"), "user".equals(rs.getString("origin"))));
                } catch (IllegalArgumentException e) {
                    throw new StoreException("the database holds an invalid material '" + rs.getString("name") + "': " + e.getMessage(), e);
                }
            }
            return out;
        } catch (SQLException e) {
            throw new StoreException("cannot read materials: " + e.getMessage(), e);
        }
    }

    public MaterialLibrary library() {
        return new MaterialLibrary(all());
    }

    /** Adds the user's own material; refuses a name or synonym already taken. */
    public void add(Material m) {
        MaterialLibrary existing = library();
        List<String> taken = new ArrayList<>();
        if (!existing.lookup(m.name()).isEmpty()) {
            taken.add(m.name());
        }
        m.synonyms().stream().filter(s -> !existing.lookup(s).isEmpty()).forEach(taken::add);
        if (!taken.isEmpty()) {
            throw new InvalidInputException("name", String.join(", ", taken),
                    "already in the material library; choose another name (nothing was saved)");
        }
        db.inTransaction(c -> {
            insert(c, m.withUserEntry(true), "user");
            return null;
        });
    }

    /** Removes one of the user's own materials; bundled ones cannot be removed. */
    public void remove(String name) {
        Material m = library().resolve("material", name);
        if (!m.userEntry()) {
            throw new InvalidInputException("material", name, "is bundled data and cannot be removed");
        }
        db.inTransaction(c -> {
            try (PreparedStatement ps = c.prepareStatement("DELETE FROM material WHERE name = ?")) {
                ps.setString(1, m.name());
                ps.executeUpdate();
            }
            return null;
        });
    }

    /** The SHA-256 of the bundled table the database was last built from, if any. */
    public Optional<String> bundledHash() {
        return MetaTable.get(db.connection(), BUNDLED_HASH_KEY);
    }

    /**
     * Rebuilds the bundled rows when the shipped table differs from the one the database was built from. The
     * user's materials stay; a bundled material whose name the user already took is left out (the user's wins).
     * Returns true when the database was refreshed.
     */
    public boolean syncBundled(BundledData bundled) {
        String hash = bundled.sha256();
        if (bundledHash().filter(hash::equals).isPresent()) {
            return false;
        }
        List<Material> rows;
        try {
            rows = MaterialCsv.read(bundled.name(), new InputStreamReader(new ByteArrayInputStream(bundled.bytes()),
                    StandardCharsets.UTF_8), false);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        db.inTransaction(c -> {
            Set<String> userNames = new HashSet<>();
            try (Statement st = c.createStatement()) {
                st.executeUpdate("DELETE FROM material WHERE origin = 'bundled'");
                try (ResultSet rs = st.executeQuery("SELECT name FROM material WHERE origin = 'user'")) {
                    while (rs.next()) {
                        userNames.add(rs.getString(1).toLowerCase(Locale.ROOT));
                    }
                }
            }
            for (Material m : rows) {
                if (!userNames.contains(m.name().toLowerCase(Locale.ROOT))) {
                    insert(c, m, "bundled");
                }
            }
            MetaTable.put(c, BUNDLED_HASH_KEY, hash);
            return null;
        });
        return true;
    }

    private static void insert(Connection c, Material m, String origin) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO material (name, origin, synonyms, kind, dD, dP, dH, r0, source, note)"
                + " VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?)")) {
            ps.setString(1, m.name());
            ps.setString(2, origin);
            ps.setString(3, String.join(";", m.synonyms()));
            ps.setString(4, m.kind().key());
            ps.setDouble(5, m.sphere().centre().dD());
            ps.setDouble(6, m.sphere().centre().dP());
            ps.setDouble(7, m.sphere().centre().dH());
            ps.setDouble(8, m.sphere().r0());
            ps.setString(9, m.source());
            ps.setString(10, m.note());
            ps.executeUpdate();
        }
    }
}
