package org.cohesa.store;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.type.TypeReference;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Types;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.cohesa.core.InvalidInputException;
import org.cohesa.core.cases.SubstitutionCase;
import org.cohesa.core.cases.SubstitutionCase.CaseMaterial;
import org.cohesa.core.cases.SubstitutionCase.ChosenCandidate;

/**
 * The desktop's substitution cases in the local database. Each save writes the whole case in one transaction, so a
 * failed save leaves the case as it was last stored; the limits, candidates and checks are JSON columns (Jackson).
 */
public final class CaseRepository {

    private static final ObjectMapper JSON = new ObjectMapper();

    /** One line of the case list: enough to pick a case without reading its candidates. */
    public record Summary(long id, String title, SubstitutionCase.Kind kind, String replaced, String material, Instant updated) {
    }

    private final Database db;

    public CaseRepository(Database db) {
        this.db = db;
    }

    /** Stores {@code c}: a new case gets its number, a saved one is overwritten as a whole. Returns the case as stored. */
    public SubstitutionCase save(SubstitutionCase c, Instant now) {
        return db.inTransaction(conn -> {
            if (c.id() == 0) {
                long id;
                try (PreparedStatement ps = conn.prepareStatement("INSERT INTO substitution_case (title, kind, replaced, process, material_name,"
                        + " material_source, dD, dP, dH, r0, limits, found, chosen, record_id, created_at, updated_at)"
                        + " VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)", PreparedStatement.RETURN_GENERATED_KEYS)) {
                    bind(ps, c, now);
                    ps.setString(15, c.created().toString());
                    ps.executeUpdate();
                    try (ResultSet keys = ps.getGeneratedKeys()) {
                        keys.next();
                        id = keys.getLong(1);
                    }
                }
                return c.withId(id, now);
            }
            try (PreparedStatement ps = conn.prepareStatement("UPDATE substitution_case SET title = ?, kind = ?, replaced = ?, process = ?,"
                    + " material_name = ?, material_source = ?, dD = ?, dP = ?, dH = ?, r0 = ?, limits = ?, found = ?, chosen = ?, record_id = ?,"
                    + " created_at = ?, updated_at = ? WHERE id = ?")) {
                bind(ps, c, now);
                ps.setString(15, c.created().toString());
                ps.setLong(17, c.id());
                if (ps.executeUpdate() != 1) {
                    throw new InvalidInputException("case", String.valueOf(c.id()), "no such case in this database (it was deleted?); nothing was saved");
                }
            }
            return c.withId(c.id(), now);
        });
    }

    /** Every case, the most recently saved first. */
    public List<Summary> list() {
        return db.inReadTransaction(conn -> {
            List<Summary> out = new ArrayList<>();
            try (PreparedStatement ps = conn.prepareStatement(
                    "SELECT id, title, kind, replaced, material_name, updated_at FROM substitution_case ORDER BY updated_at DESC, id DESC");
                 ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    out.add(new Summary(rs.getLong(1), rs.getString(2), kind(rs.getString(3)), rs.getString(4), rs.getString(5),
                            Instant.parse(rs.getString(6))));
                }
            }
            return out;
        });
    }

    public Optional<SubstitutionCase> find(long id) {
        return db.inReadTransaction(conn -> {
            try (PreparedStatement ps = conn.prepareStatement("SELECT * FROM substitution_case WHERE id = ?")) {
                ps.setLong(1, id);
                try (ResultSet rs = ps.executeQuery()) {
                    return rs.next() ? Optional.of(read(rs)) : Optional.<SubstitutionCase>empty();
                }
            }
        });
    }

    /** Removes a case (its filed record stays in the register, which is append-only). */
    public void delete(long id) {
        db.inTransaction(conn -> {
            try (PreparedStatement ps = conn.prepareStatement("DELETE FROM substitution_case WHERE id = ?")) {
                ps.setLong(1, id);
                return ps.executeUpdate();
            }
        });
    }

    private static void bind(PreparedStatement ps, SubstitutionCase c, Instant now) throws SQLException {
        ps.setString(1, c.title());
        ps.setString(2, c.kind() == SubstitutionCase.Kind.REPLACE ? "replace" : "find");
        ps.setString(3, c.replaced());
        ps.setString(4, c.process());
        CaseMaterial m = c.material();
        ps.setString(5, m == null ? null : m.name());
        ps.setString(6, m == null ? null : m.source());
        setDouble(ps, 7, m == null ? null : m.dD());
        setDouble(ps, 8, m == null ? null : m.dP());
        setDouble(ps, 9, m == null ? null : m.dH());
        setDouble(ps, 10, m == null ? null : m.r0());
        ps.setString(11, write(c.limits()));
        ps.setString(12, write(c.found()));
        ps.setString(13, write(c.chosen()));
        if (c.recordId() == null) {
            ps.setNull(14, Types.INTEGER);
        } else {
            ps.setLong(14, c.recordId());
        }
        ps.setString(16, now.toString());
    }

    private static void setDouble(PreparedStatement ps, int i, Double v) throws SQLException {
        if (v == null) {
            ps.setNull(i, Types.REAL);
        } else {
            ps.setDouble(i, v);
        }
    }

    private static SubstitutionCase read(ResultSet rs) throws SQLException {
        try {
            CaseMaterial m = rs.getString("material_name") == null ? null : new CaseMaterial(rs.getString("material_name"),
                    rs.getString("material_source"), rs.getDouble("dD"), rs.getDouble("dP"), rs.getDouble("dH"), rs.getDouble("r0"));
            long rec = rs.getLong("record_id");
            Long recordId = rs.wasNull() ? null : rec;
            Map<String, String> limits = JSON.readValue(rs.getString("limits"), new TypeReference<LinkedHashMap<String, String>>() { });
            List<String> found = JSON.readValue(rs.getString("found"), new TypeReference<List<String>>() { });
            List<ChosenCandidate> chosen = JSON.readValue(rs.getString("chosen"), new TypeReference<List<ChosenCandidate>>() { });
            return new SubstitutionCase(rs.getLong("id"), rs.getString("title"), kind(rs.getString("kind")), rs.getString("replaced"),
                    rs.getString("process"), m, limits, found, chosen, recordId, Instant.parse(rs.getString("created_at")),
                    Instant.parse(rs.getString("updated_at")));
        } catch (JsonProcessingException | IllegalArgumentException e) {
            throw new StoreException("case " + rs.getLong("id") + " in the database is damaged: " + e.getMessage(), e);
        }
    }

    private static SubstitutionCase.Kind kind(String k) {
        return "replace".equals(k) ? SubstitutionCase.Kind.REPLACE : SubstitutionCase.Kind.FIND;
    }

    private static String write(Object o) {
        try {
            return JSON.writeValueAsString(o);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("case values always serialise", e);
        }
    }
}
