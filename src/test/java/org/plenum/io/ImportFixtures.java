package org.plenum.io;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.net.URISyntaxException;
import java.net.URL;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.plenum.cli.Cli;
import org.plenum.core.Period;
import org.plenum.core.Quantity;
import org.plenum.store.DecisionDraft;
import org.plenum.store.Ledger;
import org.plenum.store.Workspace;

/**
 * Fixture files under {@code src/test/resources/org/plenum/io/}, workspaces built from them
 * through the real importer, and a row-for-row dump of every table for "nothing changed" checks.
 */
final class ImportFixtures {
    static final Duration TIMEOUT = Duration.ofSeconds(5);
    static final List<String> STEPS = List.of("stat", "meeting", "final");
    static final String LEDGER_STEP = "meeting";
    /** The tables a failed import must leave alone; the dump covers every table, these at least. */
    static final List<String> TABLES = List.of("actuals", "decisions", "events", "forecasts", "item_attributes",
            "items", "meta", "steps", "tags");

    private ImportFixtures() {}

    /** A fixture file by its path below {@code org/plenum/io/}, e.g. {@code malformed/empty.csv}. */
    static Path fixture(String name) {
        URL url = ImportFixtures.class.getResource(name);
        if (url == null) {
            throw new IllegalArgumentException("no fixture " + name);
        }
        try {
            return Path.of(url.toURI());
        } catch (URISyntaxException e) {
            throw new IllegalStateException(e);
        }
    }

    /** The workspaces the malformed cases start from. */
    enum Setup {
        /** Monthly: items with an attribute, actuals, stat and final forecasts, events and one decision. */
        MONTHLY,
        /** Items only, so no file has fixed the frequency yet. */
        NO_PERIODS;

        Path create(Path dir) {
            Path db = dir.resolve("workspace.db");
            try (Workspace ws = Workspace.create(db, STEPS, LEDGER_STEP, TIMEOUT)) {
                CsvImporter importer = new CsvImporter(ws, Progress.NONE);
                importer.importFile(ImportKind.ITEMS, fixture("setup/items.csv"), false);
                if (this == MONTHLY) {
                    importer.importFile(ImportKind.ACTUALS, fixture("setup/actuals.csv"), false);
                    importer.importFile(ImportKind.FORECASTS, fixture("setup/forecasts.csv"), false);
                    importer.importFile(ImportKind.EVENTS, fixture("setup/events.csv"), false);
                    Period cycle = Period.parse("2026-04");
                    new Ledger(ws).append(List.of(new DecisionDraft("P-100", cycle, cycle, LEDGER_STEP,
                            Quantity.parse("125"), Quantity.parse("122"), false, "leaflet confirmed by the buyer",
                            "promotion", "demo planner", Quantity.parse("2"), Instant.parse("2026-04-02T09:00:00Z"),
                            null)));
                }
            }
            return db;
        }
    }

    /** An empty workspace with the default steps. */
    static Path emptyWorkspace(Path dir) {
        Path db = dir.resolve("empty.db");
        Workspace.create(db, STEPS, LEDGER_STEP, TIMEOUT).close();
        return db;
    }

    static ImportResult importFile(Path db, ImportKind kind, Path file, boolean replace) {
        try (Workspace ws = Workspace.open(db, TIMEOUT)) {
            return new CsvImporter(ws, Progress.NONE).importFile(kind, file, replace);
        }
    }

    /**
     * Every row of every table (and the schema itself), each table ordered by all its columns, as
     * text. Read over a fresh JDBC connection after the workspace is closed, so it sees only what
     * was committed.
     */
    static List<String> dump(Path db) throws SQLException {
        List<String> out = new ArrayList<>();
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + db); Statement st = c.createStatement()) {
            List<String> tables = new ArrayList<>();
            try (ResultSet rs = st.executeQuery("SELECT name FROM sqlite_master WHERE type = 'table' ORDER BY name")) {
                while (rs.next()) {
                    tables.add(rs.getString(1));
                }
            }
            assertTrue(tables.containsAll(TABLES), "tables " + tables);
            tables.add("sqlite_master");
            for (String table : tables) {
                int columns;
                try (ResultSet rs = st.executeQuery("SELECT * FROM " + table + " LIMIT 0")) {
                    columns = rs.getMetaData().getColumnCount();
                }
                StringBuilder order = new StringBuilder();
                for (int i = 1; i <= columns; i++) {
                    order.append(i == 1 ? "" : ",").append(i);
                }
                try (ResultSet rs = st.executeQuery("SELECT * FROM " + table + " ORDER BY " + order)) {
                    while (rs.next()) {
                        StringBuilder row = new StringBuilder(table);
                        for (int i = 1; i <= columns; i++) {
                            Object v = rs.getObject(i);
                            row.append('|').append(v == null ? "NULL" : v.getClass().getSimpleName() + ":" + v);
                        }
                        out.add(row.toString());
                    }
                }
            }
        }
        return out;
    }

    /** How many rows of the dump belong to {@code table}. */
    static long rowsOf(List<String> dump, String table) {
        return dump.stream().filter(r -> r.startsWith(table + "|")).count();
    }

    /** The rows of one query, each row's columns as text joined with {@code |}. */
    static List<String> query(Path db, String sql) throws SQLException {
        List<String> out = new ArrayList<>();
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + db); Statement st = c.createStatement();
                ResultSet rs = st.executeQuery(sql)) {
            int columns = rs.getMetaData().getColumnCount();
            while (rs.next()) {
                StringBuilder row = new StringBuilder();
                for (int i = 1; i <= columns; i++) {
                    row.append(i == 1 ? "" : "|").append(rs.getString(i));
                }
                out.add(row.toString());
            }
        }
        return out;
    }

    /**
     * Writes {@code rows} valid forecasts of the three setup items, all with keys the setup does not
     * hold: item and step cycle fastest, then 12 lags, then monthly cycles from {@code 1970-01}.
     */
    static void writeForecasts(Path file, int rows) throws IOException {
        try (BufferedWriter w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            w.write("item,period,cycle,step,quantity\n");
            Period first = Period.parse("1970-01");
            for (int k = 0; k < rows; k++) {
                Period cycle = first.plus(k / 6 / 12);
                w.write("P-" + (k % 3 + 1) + "00," + cycle.plus(k / 6 % 12) + "," + cycle + ","
                        + (k / 3 % 2 == 0 ? "stat" : "final") + "," + k + "\n");
            }
        }
    }

    /** What one in-process run of the real command line printed. */
    record CliResult(int code, String out, String err) {
        List<String> errLines() {
            return err.lines().toList();
        }
    }

    static CliResult cli(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Cli.create(new PrintWriter(out, true), new PrintWriter(err, true), Map.of()).execute(args);
        return new CliResult(code, out.toString(), err.toString());
    }
}
