package org.plenum.store;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.Statement;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.plenum.testing.TestWorkspace;

/** A workspace written by an earlier Plenum is brought forward when it is opened. */
class MigrationsTest {
    @TempDir
    Path dir;

    @Test
    void aVersionTwoWorkspaceGainsTheKeptAgendasAndTheMeetingIndex() throws Exception {
        Path db = TestWorkspace.create(dir);
        // What schema v2 left: no meeting_agendas table, no decisions_by_meeting index.
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + db); Statement st = c.createStatement()) {
            st.executeUpdate("DROP TABLE meeting_agendas");
            st.executeUpdate("DROP INDEX decisions_by_meeting");
            st.executeUpdate("UPDATE meta SET value = '2' WHERE key = 'schema_version'");
        }
        Workspace.open(db, TestWorkspace.TIMEOUT).close();
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + db); Statement st = c.createStatement()) {
            assertEquals("3", one(st, "SELECT value FROM meta WHERE key = 'schema_version'"));
            assertEquals("1", one(st, "SELECT count(*) FROM sqlite_master WHERE name = 'meeting_agendas'"));
            assertEquals("1", one(st, "SELECT count(*) FROM sqlite_master WHERE name = 'decisions_by_meeting'"));
        }
    }

    private static String one(Statement st, String sql) throws Exception {
        try (ResultSet rs = st.executeQuery(sql)) {
            rs.next();
            return rs.getString(1);
        }
    }
}
