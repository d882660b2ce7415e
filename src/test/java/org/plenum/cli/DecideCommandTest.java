package org.plenum.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import java.util.Map;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.plenum.testing.TestWorkspace;

class DecideCommandTest {
    @TempDir
    Path dir;
    Path db;

    @BeforeEach
    void workspace() throws Exception {
        db = TestWorkspace.create(dir);
    }

    private CliRun decide(String... extra) {
        String[] base = {"decide", "--db", db.toString()};
        String[] args = new String[base.length + extra.length];
        System.arraycopy(base, 0, args, 0, base.length);
        System.arraycopy(extra, 0, args, base.length, extra.length);
        return CliRun.of(args);
    }

    private long count() throws Exception {
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + db); Statement st = c.createStatement()) {
            var rs = st.executeQuery("SELECT count(*) FROM decisions");
            rs.next();
            return rs.getLong(1);
        }
    }

    @Test
    void recordsOneRowPerPeriodWithTheOperatingSystemUser() throws Exception {
        CliRun run = decide("A1", "--cycle", "2026-12", "--period", "2026-12,2027-01", "--pct", "10", "--reason",
                "buyer confirmed a display order", "--tag", "promotion", "--minutes", "5");
        assertEquals(0, run.code(), run.err());
        // 100 × 1.10 = 110 and 110.5 × 1.10 = 121.55, exactly (BigDecimal arithmetic, no binary rounding).
        assertTrue(run.out().contains("2026-12 100 -> 110"), run.out());
        assertTrue(run.out().contains("2027-01 110.5 -> 121.55"), run.out());
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + db); Statement st = c.createStatement()) {
            var rs = st.executeQuery("SELECT author, minutes, batch FROM decisions ORDER BY id");
            rs.next();
            assertEquals(System.getProperty("user.name"), rs.getString(1));
            assertEquals(2_500_000, rs.getLong(2)); // 5 minutes split over two periods, exactly
            long batch = rs.getLong(3);
            rs.next();
            assertEquals(2_500_000, rs.getLong(2));
            assertEquals(batch, rs.getLong(3));
        }
    }

    @Test
    void keepRecordsTheReviewWithoutAChange() throws Exception {
        CliRun run = decide("A2", "--cycle", "2026-12", "--period", "2026-12", "--keep", "--reason",
                "no new information", "--tag", "other");
        assertEquals(0, run.code(), run.err());
        assertTrue(run.out().contains("7 -> 7 (kept)"), run.out());
        assertEquals(1, count());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "A9|2026-12|2026-12|--qty|5|a reason|promotion|item: expected an item of the workspace, found \"A9\"",
        "A1|2026-12|2027-06|--qty|5|a reason|promotion|--period: expected a period of cycle 2026-12's horizon for A1 (2026-12 to 2027-02), found 2027-06",
        "A1|2026-12|2026-12|--qty|5|'  '|promotion|--reason: expected a few words saying why, found an empty reason",
        "A1|2026-12|2026-12|--qty|5|a reason|festival|--tag: expected one of promotion, price change",
        "A1|2026-11|2026-12|--qty|5|a reason|promotion|--cycle: expected a cycle in which A1 has a stat forecast, found 2026-11",
        "A1|2026-12|2026-13|--qty|5|a reason|promotion|--period: expected a month 01..12 in YYYY-MM, found \"2026-13\"",
        "A1|2026-12|2026-12|--qty|-5|a reason|promotion|--qty: expected a non-negative quantity, found \"-5\"",
        "A1|2026-12|2026-12|--pct|-120|a reason|promotion|--pct: expected a change of -100% or more, found -120%",
    })
    void refusesBadDecisionsWithExitTwoAndWritesNothing(String item, String cycle, String period, String mode,
            String value, String reason, String tag, String message) throws Exception {
        CliRun run = decide(item, "--cycle", cycle, "--period", period, mode, value, "--reason", reason, "--tag", tag);
        assertEquals(2, run.code(), run.err());
        assertTrue(run.err().contains(message), run.err());
        assertFalse(run.err().contains("Exception"), run.err());
        assertEquals(0, count());
    }

    @Test
    void aMissingChangeIsAUsageError() {
        CliRun run = decide("A1", "--cycle", "2026-12", "--period", "2026-12", "--reason", "x", "--tag", "other");
        assertEquals(1, run.code());
        assertTrue(run.err().contains("--qty") && run.err().contains("--keep"), run.err());
    }

    @Test
    void aMalformedBusyTimeoutIsAUsageErrorNotACrash() {
        CliRun run = CliRun.of(Map.of("PLENUM_BUSY_TIMEOUT", "abc"), "tags", "--db", db.toString());
        assertEquals(1, run.code());
        assertEquals("plenum: PLENUM_BUSY_TIMEOUT: expected seconds between 0 and 3600, found \"abc\"",
                run.err().strip());
    }

    @Test
    void aLockHeldPastTheTimeoutExitsThreeWithOneLine() throws Exception {
        try (Connection holder = DriverManager.getConnection("jdbc:sqlite:" + db);
                Statement st = holder.createStatement()) {
            st.execute("BEGIN IMMEDIATE");
            long t0 = System.nanoTime();
            CliRun run = CliRun.of(Map.of("PLENUM_BUSY_TIMEOUT", "0.3"), "decide", "--db", db.toString(), "A1",
                    "--cycle", "2026-12", "--period", "2026-12", "--qty", "90", "--reason", "a reason", "--tag",
                    "other");
            long waitedMillis = (System.nanoTime() - t0) / 1_000_000;
            st.execute("ROLLBACK");
            assertEquals(3, run.code(), run.err());
            assertEquals(1, run.err().strip().lines().count(), run.err());
            assertTrue(run.err().contains("busy"), run.err());
            assertTrue(waitedMillis >= 300, "it waits for the lock before giving up: " + waitedMillis + " ms");
        }
        assertEquals(0, count());
    }
}
