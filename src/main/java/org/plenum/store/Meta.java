package org.plenum.store;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.Optional;

/** The workspace's key-value settings table. */
final class Meta {
    static final String SCHEMA_VERSION = "schema_version";
    static final String FREQUENCY = "frequency";
    static final String LEDGER_STEP = "ledger_step";
    static final String DEMO_FINGERPRINT = "demo_fingerprint";

    private Meta() {}

    static Optional<String> get(Connection c, String key) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT value FROM meta WHERE key = ?")) {
            ps.setString(1, key);
            try (ResultSet rs = ps.executeQuery()) {
                return rs.next() ? Optional.of(rs.getString(1)) : Optional.empty();
            }
        }
    }

    static void put(Connection c, String key, String value) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement(
                "INSERT INTO meta(key, value) VALUES (?, ?) ON CONFLICT(key) DO UPDATE SET value = excluded.value")) {
            ps.setString(1, key);
            ps.setString(2, value);
            ps.executeUpdate();
        }
    }

    /** The schema version, or 0 for a database that has no tables yet. */
    static int schemaVersion(Connection c) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement(
                "SELECT count(*) FROM sqlite_master WHERE type = 'table' AND name = 'meta'");
                ResultSet rs = ps.executeQuery()) {
            rs.next();
            if (rs.getInt(1) == 0) {
                return 0;
            }
        }
        return get(c, SCHEMA_VERSION).map(Integer::parseInt).orElse(0);
    }
}
