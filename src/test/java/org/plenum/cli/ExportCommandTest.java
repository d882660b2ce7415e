package org.plenum.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.plenum.io.LedgerCsv;
import org.plenum.testing.TestWorkspace;

class ExportCommandTest {
    @TempDir
    Path dir;

    @Test
    void exportsEveryFieldAndReadsBackTheSame() throws Exception {
        Path db = TestWorkspace.create(dir);
        String reason = "buyer said \"double it\", then\nconfirmed by mail";
        assertEquals(0, CliRun.of("decide", "--db", db.toString(), "A1", "--cycle", "2026-12", "--period",
                "2026-12,2027-02", "--qty", "200.125", "--reason", reason, "--tag", "customer information",
                "--minutes", "3").code());
        assertEquals(0, CliRun.of("decide", "--db", db.toString(), "A1", "--cycle", "2026-12", "--period", "2026-12",
                "--keep", "--reason", "back to the statistical forecast", "--tag", "other").code());
        Path out = dir.resolve("ledger.csv");
        CliRun run = CliRun.of("export", "ledger", "--db", db.toString(), "--out", out.toString());
        assertEquals(0, run.code(), run.err());
        assertTrue(run.out().contains("exported 3 decisions"), run.out());

        // Read back with Commons CSV's RFC 4180 reader, a parser outside our export code.
        List<CSVRecord> rows = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(new StringReader(Files.readString(out, StandardCharsets.UTF_8))).getRecords();
        assertEquals(3, rows.size());
        assertEquals(LedgerCsv.COLUMNS, rows.get(0).getParser().getHeaderNames());
        CSVRecord first = rows.get(0);
        assertEquals("A1", first.get("item"));
        assertEquals("2026-12", first.get("period"));
        assertEquals("meeting", first.get("step"));
        assertEquals("adjust", first.get("action"));
        assertEquals("100", first.get("prior"));
        assertEquals("200.125", first.get("quantity"));
        assertEquals("100.125", first.get("change"));
        assertEquals(reason, first.get("reason"));
        assertEquals("customer information", first.get("tag"));
        assertEquals("1.5", first.get("minutes"));
        assertEquals("3", first.get("superseded_by"));
        CSVRecord second = rows.get(1);
        assertEquals("0", second.get("prior"));
        assertEquals("200.125", second.get("change"));
        CSVRecord third = rows.get(2);
        assertEquals("keep", third.get("action"));
        assertEquals("0", third.get("change"));
        assertEquals("1", third.get("supersedes"));
        assertEquals("", third.get("minutes"));
    }

    @Test
    void neutralisesCellsASpreadsheetWouldRunAsFormulas() throws Exception {
        // The triggers are those listed by OWASP's "CSV Injection" page: = + - @ tab and carriage return.
        Path db = TestWorkspace.create(dir);
        assertEquals(0, CliRun.of("decide", "--db", db.toString(), "A1", "--cycle", "2026-12", "--period", "2026-12",
                "--qty", "90", "--reason", "=HYPERLINK(\"http://x\")", "--tag", "other").code());
        CliRun run = CliRun.of("export", "ledger", "--db", db.toString());
        assertEquals(0, run.code(), run.err());
        CSVRecord row = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(new StringReader(run.out())).getRecords().get(0);
        assertEquals("'=HYPERLINK(\"http://x\")", row.get("reason"));
        assertEquals("-10", row.get("change")); // a number stays a number
        for (String s : List.of("=1+1", "+1", "-1", "@SUM(A1)", "\tx", "\rx")) {
            assertEquals("'" + s, LedgerCsv.text(s));
        }
        assertEquals("a=1", LedgerCsv.text("a=1"));
    }

    @Test
    void exportsOneCycleOnly() throws Exception {
        Path db = TestWorkspace.create(dir);
        assertEquals(0, CliRun.of("decide", "--db", db.toString(), "A1", "--cycle", "2026-12", "--period", "2026-12",
                "--qty", "90", "--reason", "a reason", "--tag", "other").code());
        assertEquals(1, CliRun.of("export", "ledger", "--db", db.toString(), "--cycle", "2026-12").out().lines()
                .count() - 1);
        assertEquals(0, CliRun.of("export", "ledger", "--db", db.toString(), "--cycle", "2026-11").out().lines()
                .count() - 1);
        assertEquals(2, CliRun.of("export", "ledger", "--db", db.toString(), "--cycle", "2026-1x").code());
    }
}
