package org.plenum.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.plenum.core.Decision;
import org.plenum.core.Period;
import org.plenum.core.Quantity;
import org.plenum.testing.TestWorkspace;

class LedgerTest {
    @TempDir
    Path dir;

    private static DecisionDraft draft(String period, String qty, String reason) {
        return new DecisionDraft("A1", Period.parse("2026-12"), Period.parse(period), "meeting", Quantity.parse("100"),
                Quantity.parse(qty), false, reason, "promotion", "amara", Quantity.parse("2"),
                Instant.parse("2026-12-03T09:00:00Z"), null);
    }

    @Test
    void refusesUpdateAndDeleteIssuedDirectlyThroughSql() throws Exception {
        Path db = TestWorkspace.create(dir);
        try (Workspace ws = Workspace.open(db, TestWorkspace.TIMEOUT)) {
            new Ledger(ws).append(List.of(draft("2026-12", "120", "buyer confirmed the order")));
        }
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + db); Statement st = c.createStatement()) {
            SQLException update = assertThrows(SQLException.class,
                    () -> st.executeUpdate("UPDATE decisions SET quantity = 1"));
            assertTrue(update.getMessage().contains("append-only"), update.getMessage());
            SQLException delete = assertThrows(SQLException.class, () -> st.executeUpdate("DELETE FROM decisions"));
            assertTrue(delete.getMessage().contains("append-only"), delete.getMessage());
            var rs = st.executeQuery("SELECT count(*), max(quantity) FROM decisions");
            rs.next();
            assertEquals(1, rs.getInt(1));
            assertEquals(120_000_000L, rs.getLong(2));
        }
    }

    @Test
    void aCorrectionSupersedesTheStandingDecision() throws Exception {
        Path db = TestWorkspace.create(dir);
        try (Workspace ws = Workspace.open(db, TestWorkspace.TIMEOUT)) {
            Ledger ledger = new Ledger(ws);
            long first = ledger.append(List.of(draft("2026-12", "120", "buyer confirmed"))).get(0);
            long second = ledger.append(List.of(draft("2026-12", "115", "buyer confirmed a smaller order"))).get(0);
            List<Decision> all = ledger.entries(null);
            assertEquals(2, all.size());
            assertEquals(second, all.get(0).supersededBy());
            assertEquals(first, all.get(1).supersedes());
            assertNull(all.get(1).supersededBy());
            assertEquals(2, all.get(1).batch());
            assertEquals(Quantity.parse("115"), ws.stepValues("A1", "meeting", Period.parse("2026-12"))
                    .get(Period.parse("2026-12")));
            // Where nobody decided, the meeting step carries the statistical forecast forward.
            assertEquals(Quantity.parse("110.5"), ws.stepValues("A1", "meeting", Period.parse("2026-12"))
                    .get(Period.parse("2027-01")));
        }
    }

    @Test
    void createsTheDatabaseForOwnerAndGroupOnly() throws Exception {
        Path db = TestWorkspace.create(dir);
        assertEquals("rw-rw----", PosixFilePermissions.toString(Files.getPosixFilePermissions(db)));
    }

    @Test
    void recordsTheSchemaVersionAndRefusesANewerOne() throws Exception {
        Path db = TestWorkspace.create(dir);
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + db); Statement st = c.createStatement()) {
            var rs = st.executeQuery("SELECT value FROM meta WHERE key = 'schema_version'");
            rs.next();
            assertEquals(Integer.toString(Migrations.latest()), rs.getString(1));
            st.executeUpdate("UPDATE meta SET value = '99' WHERE key = 'schema_version'");
        }
        StoreException e = assertThrows(StoreException.class, () -> Workspace.open(db, TestWorkspace.TIMEOUT));
        assertTrue(e.getMessage().contains("newer than this Plenum"), e.getMessage());
    }

    @Test
    void startsWithTheDocumentedTagVocabulary() throws Exception {
        Path db = TestWorkspace.create(dir);
        try (Workspace ws = Workspace.open(db, TestWorkspace.TIMEOUT)) {
            assertEquals(org.plenum.core.EventTags.STARTING, List.copyOf(ws.catalog().tags()));
        }
    }

    @Test
    void usesWalForeignKeysAndTheBusyTimeout() throws Exception {
        Path db = TestWorkspace.create(dir);
        try (Workspace ws = Workspace.open(db, java.time.Duration.ofMillis(1234))) {
            assertEquals("wal", ws.read(c -> pragma(c, "journal_mode")));
            assertEquals("1", ws.read(c -> pragma(c, "foreign_keys")));
            assertEquals("1234", ws.read(c -> pragma(c, "busy_timeout")));
        }
    }

    @Test
    void keepsTheTriggerBodiesWholeWhenSplittingTheScript() {
        List<String> statements = Migrations.statements("CREATE TABLE a(x);\nCREATE TRIGGER t BEFORE DELETE ON a\n"
                + "BEGIN\n  SELECT RAISE(ABORT, 'no');\nEND;\nINSERT INTO a VALUES (1);\n");
        assertEquals(3, statements.size());
        assertTrue(statements.get(1).contains("RAISE") && statements.get(1).strip().endsWith("END;"));
    }

    private static String pragma(Connection c, String name) throws SQLException {
        try (Statement st = c.createStatement(); var rs = st.executeQuery("PRAGMA " + name)) {
            rs.next();
            return rs.getString(1);
        }
    }
}
