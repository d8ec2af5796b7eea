package org.cohesa.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.HashSet;
import java.util.Objects;
import java.util.Set;
import org.cohesa.core.records.Anchor;
import org.cohesa.core.records.ChainHead;
import org.cohesa.core.records.ChainSeal;

/**
 * The seal check of a shared register whose secret the server holds (schema step 9): the server answers, for one
 * snapshot, which events' seals are not genuine, whether the head's seal is, and whether an anchor's is; the secret
 * itself never leaves the server (only its owner can read it). Built inside the same read transaction as the events it
 * judges, so the answers and the events belong to one state.
 */
record ServerSeal(String id, Set<String> forgedEventHashes, ChainHead head, boolean headGenuine, String anchorContent,
                  String anchorMac, boolean anchorGenuine) implements ChainSeal {

    /** Asks the server in snapshot {@code c}; {@code anchor} may be null. */
    static ServerSeal read(Connection c, String id, ChainHead head, Anchor anchor) throws SQLException {
        Set<String> forged = new HashSet<>();
        try (PreparedStatement ps = c.prepareStatement("SELECT hash FROM record_event WHERE mac IS NOT NULL"
                + " AND NOT cohesa_register_seal_ok('event:' || hash, mac)")) {
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    forged.add(rs.getString(1));
                }
            }
        }
        boolean headOk = head.mac() != null && genuine(c, "head:" + head.events() + ":" + head.lastHash() + ":" + head.maxRecordId(), head.mac());
        boolean anchorOk = anchor != null && anchor.mac() != null && genuine(c, "anchor:" + anchor.content(), anchor.mac());
        return new ServerSeal(id, Set.copyOf(forged), head, headOk, anchor == null ? null : anchor.content(),
                anchor == null ? null : anchor.mac(), anchorOk);
    }

    private static boolean genuine(Connection c, String message, String mac) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT cohesa_register_seal_ok(?, ?)")) {
            ps.setString(1, message);
            ps.setString(2, mac);
            try (ResultSet rs = ps.executeQuery()) {
                return rs.next() && rs.getBoolean(1);
            }
        }
    }

    @Override
    public boolean eventSealed(String hash, String mac) {
        return mac != null && !forgedEventHashes.contains(hash);
    }

    @Override
    public boolean headSealed(long events, String lastHash, long maxRecordId, String mac) {
        return headGenuine && events == head.events() && Objects.equals(lastHash, head.lastHash()) && maxRecordId == head.maxRecordId()
                && Objects.equals(mac, head.mac());
    }

    @Override
    public boolean anchorSealed(String content, String mac) {
        return anchorGenuine && Objects.equals(content, anchorContent) && Objects.equals(mac, anchorMac);
    }
}
