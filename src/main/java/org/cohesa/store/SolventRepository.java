package org.cohesa.store;

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
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Collectors;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.RowError;
import org.cohesa.core.solvent.Solvent;
import org.cohesa.core.solvent.SolventLibrary;

/**
 * Solvents in the database: the bundled rows (replaced as a whole when the shipped table changes) and
 * the user's own rows (added, edited, removed and imported by the user, never touched by updates).
 */
public final class SolventRepository {

    private static final String BUNDLED_HASH_KEY = "bundled_solvents_sha256";

    private final Database db;

    public SolventRepository(Database db) {
        this.db = db;
    }

    /** Every solvent with the user's prices applied, sorted by name. */
    public List<Solvent> all() {
        List<Solvent> out = new ArrayList<>();
        forEach(false, out::add);
        return out;
    }

    /**
     * Hands every solvent (only the user's own with {@code userOnly}), sorted by name, to {@code each}, one at a time
     * straight from the database: a library of any size is listed in little memory.
     */
    public void forEach(boolean userOnly, java.util.function.Consumer<Solvent> each) {
        try (Statement st = db.connection().createStatement();
             ResultSet rs = st.executeQuery("SELECT s.*, p.price_per_litre FROM solvent s"
                     + " LEFT JOIN solvent_price p ON p.solvent_name = s.name" + (userOnly ? " WHERE s.origin = 'user'" : "")
                     + " ORDER BY s.name COLLATE NOCASE")) {
            List<RowError> errors = new ArrayList<>();
            while (rs.next()) {
                Map<String, String> row = new HashMap<>();
                for (String col : SolventFields.VALUES) {
                    row.put(col, text(rs, col));
                }
                row.put("price_per_litre", text(rs, "price_per_litre"));
                row.put("note", rs.getString("note"));
                Map<String, String> sources = JsonText.readMap(rs.getString("sources"));
                sources.forEach((k, v) -> row.put("src_" + k, v));
                Solvent s = SolventFields.fromRow(row, rs.getLong("id"), "user".equals(rs.getString("origin")), errors);
                if (!errors.isEmpty()) {
                    throw new StoreException("the database holds invalid solvent data: " + errors.get(0).describe());
                }
                if (s != null) {
                    each.accept(s);
                }
            }
        } catch (SQLException e) {
            throw new StoreException("cannot read solvents: " + e.getMessage(), e);
        }
    }

    /** How many solvents the library holds. */
    public int count() {
        try (Statement st = db.connection().createStatement(); ResultSet rs = st.executeQuery("SELECT COUNT(*) FROM solvent")) {
            return rs.next() ? rs.getInt(1) : 0;
        } catch (SQLException e) {
            throw new StoreException("cannot read solvents: " + e.getMessage(), e);
        }
    }

    /** The library view used by the workflows. */
    public SolventLibrary library() {
        return new SolventLibrary(all());
    }

    /** Adds the user's own solvent; refuses a name, synonym or CAS already taken. */
    public void add(Solvent s) {
        importAll(List.of(s));
    }

    /**
     * Adds user solvents in one transaction: all or none. Every clash with an existing name is listed.
     */
    public void importAll(List<Solvent> solvents) {
        SolventLibrary existing = library();
        List<String> clashes = solvents.stream().filter(s -> !existing.lookup(s.name()).isEmpty())
                .map(Solvent::name).toList();
        if (!clashes.isEmpty()) {
            throw new InvalidInputException("name", String.join(", ", clashes),
                    "already in the library; remove or rename it first (nothing was imported)");
        }
        db.inTransaction(c -> {
            for (Solvent s : solvents) {
                insert(c, s.withUserEntry(true), "user");
                if (s.pricePerLitre() != null) {
                    setPrice(c, s.name(), s.pricePerLitre());
                }
            }
            return null;
        });
    }

    /** Replaces a user entry by a new version (same or new name). Bundled rows cannot be edited. */
    public void update(String name, Solvent replacement) {
        Solvent old = requireUserEntry(name);
        db.inTransaction(c -> {
            delete(c, old.name());
            insert(c, replacement.withUserEntry(true), "user");
            if (replacement.pricePerLitre() != null) {
                setPrice(c, replacement.name(), replacement.pricePerLitre());
            }
            return null;
        });
    }

    /** Removes one of the user's own solvents. */
    public void remove(String name) {
        Solvent old = requireUserEntry(name);
        db.inTransaction(c -> {
            delete(c, old.name());
            try (PreparedStatement ps = c.prepareStatement("DELETE FROM solvent_price WHERE solvent_name = ?")) {
                ps.setString(1, old.name());
                ps.executeUpdate();
            }
            return null;
        });
    }

    /** Sets (or with null clears) the user's price per litre for any solvent. */
    public void setPrice(String name, Double pricePerLitre) {
        Solvent s = library().resolve("solvent", name);
        if (pricePerLitre != null && (!Double.isFinite(pricePerLitre) || pricePerLitre < 0)) {
            throw new InvalidInputException("price", String.valueOf(pricePerLitre), "must be a number ≥ 0");
        }
        db.inTransaction(c -> {
            if (pricePerLitre == null) {
                try (PreparedStatement ps = c.prepareStatement("DELETE FROM solvent_price WHERE solvent_name = ?")) {
                    ps.setString(1, s.name());
                    ps.executeUpdate();
                }
            } else {
                setPrice(c, s.name(), pricePerLitre);
            }
            return null;
        });
    }

    /** The SHA-256 of the bundled table the database was last built from, if any. */
    public Optional<String> bundledHash() {
        return MetaTable.get(db.connection(), BUNDLED_HASH_KEY);
    }

    /**
     * Rebuilds the bundled rows when the shipped table differs from the one the database was built from.
     * User rows are untouched; a bundled solvent whose name the user already took is left out, since the
     * user's entry wins. Returns true when the database was refreshed.
     */
    public boolean syncBundled(BundledData bundled) {
        String hash = bundled.sha256();
        if (bundledHash().filter(hash::equals).isPresent()) {
            return false;
        }
        List<Solvent> rows;
        try {
            rows = SolventCsv.read(bundled.name(), new InputStreamReader(new java.io.ByteArrayInputStream(bundled.bytes()),
                    StandardCharsets.UTF_8), false);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        db.inTransaction(c -> {
            List<String> userNames = new ArrayList<>();
            try (Statement st = c.createStatement()) {
                st.executeUpdate("DELETE FROM solvent WHERE origin = 'bundled'");
                try (ResultSet rs = st.executeQuery("SELECT name FROM solvent WHERE origin = 'user'")) {
                    while (rs.next()) {
                        userNames.add(rs.getString(1).toLowerCase(java.util.Locale.ROOT));
                    }
                }
            }
            for (Solvent s : rows) {
                if (!userNames.contains(s.name().toLowerCase(java.util.Locale.ROOT))) {
                    insert(c, s, "bundled");
                }
            }
            MetaTable.put(c, BUNDLED_HASH_KEY, hash);
            return null;
        });
        return true;
    }

    private Solvent requireUserEntry(String name) {
        Solvent s = library().resolve("solvent", name);
        if (!s.userEntry()) {
            throw new InvalidInputException("solvent", name, "is bundled data and cannot be changed; add your own entry under another name");
        }
        return s;
    }

    private static void insert(Connection c, Solvent s, String origin) throws SQLException {
        Map<String, String> row = SolventFields.toRow(s);
        List<String> cols = new ArrayList<>(SolventFields.VALUES);
        String sql = "INSERT INTO solvent (origin, " + String.join(", ", cols) + ", sources, note) VALUES (?, "
                + cols.stream().map(x -> "?").collect(Collectors.joining(", ")) + ", ?, ?)";
        try (PreparedStatement ps = c.prepareStatement(sql)) {
            int i = 1;
            ps.setString(i++, origin);
            for (String col : cols) {
                String v = row.get(col);
                if (v == null || v.isEmpty()) {
                    ps.setObject(i++, null);
                } else if (SolventFields.isNumeric(col)) {
                    ps.setDouble(i++, Double.parseDouble(v));
                } else {
                    ps.setString(i++, v);
                }
            }
            Map<String, String> sources = new LinkedHashMap<>(s.sources());
            ps.setString(i++, JsonText.writeMap(sources));
            ps.setString(i, s.note());
            ps.executeUpdate();
        }
    }

    private static void delete(Connection c, String name) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("DELETE FROM solvent WHERE name = ?")) {
            ps.setString(1, name);
            ps.executeUpdate();
        }
    }

    private static void setPrice(Connection c, String name, double price) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO solvent_price (solvent_name, price_per_litre) VALUES (?, ?)"
                + " ON CONFLICT (solvent_name) DO UPDATE SET price_per_litre = excluded.price_per_litre")) {
            ps.setString(1, name);
            ps.setDouble(2, price);
            ps.executeUpdate();
        }
    }

    private static String text(ResultSet rs, String col) throws SQLException {
        Object o = rs.getObject(col);
        if (o == null) {
            return "";
        }
        if (o instanceof Number n && SolventFields.isNumeric(col)) {
            return SolventFields.num(n.doubleValue());
        }
        return o.toString();
    }
}
