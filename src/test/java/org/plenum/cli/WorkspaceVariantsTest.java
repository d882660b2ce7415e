package org.plenum.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.plenum.core.Period;
import org.plenum.testing.TestWorkspace;

/** Workspaces other than the default: own step names, weekly periods, decisions on a later step. */
class WorkspaceVariantsTest {
    @TempDir
    Path dir;

    /** The step names of the scorecard's steps array (the lens after it names its step too). */
    private static String steps(String json) {
        Matcher m = Pattern.compile("\"step\":\"([a-z_]+)\"").matcher(json.substring(0, json.indexOf("\"by\":")));
        StringBuilder out = new StringBuilder();
        while (m.find()) {
            out.append(out.length() == 0 ? "" : ",").append(m.group(1));
        }
        return out.toString();
    }

    @Test
    void scoresAWorkspaceWithItsOwnStepNamesAndLedgerStep() throws Exception {
        Path db = dir.resolve("own.db");
        assertEquals(0, CliRun.of("init", "--db", db.toString(), "--steps", "sys,review,release", "--ledger-step",
                "review").code());
        StringBuilder actuals = new StringBuilder("item,period,quantity\n");
        StringBuilder forecasts = new StringBuilder("item,period,cycle,step,quantity\n");
        Period first = Period.parse("2025-01");
        for (int i = 0; i < 12; i++) {
            actuals.append("A,").append(first.plus(i)).append(',').append(100 + i).append('\n');
            if (i >= 1 && i < 11) {
                Period cycle = first.plus(i);
                forecasts.append("A,").append(cycle.plus(1)).append(',').append(cycle).append(",sys,").append(105)
                        .append('\n');
                forecasts.append("A,").append(cycle.plus(1)).append(',').append(cycle).append(",release,")
                        .append(106).append('\n');
            }
        }
        assertEquals(0, CliRun.of("import", "items", TestWorkspace.write(dir, "i.csv", "item,description\nA,a\n")
                .toString(), "--db", db.toString()).code());
        assertEquals(0, CliRun.of("import", "actuals", TestWorkspace.write(dir, "a.csv", actuals.toString())
                .toString(), "--db", db.toString()).code());
        assertEquals(0, CliRun.of("import", "forecasts", TestWorkspace.write(dir, "f.csv", forecasts.toString())
                .toString(), "--db", db.toString()).code());
        CliRun review = CliRun.of("import", "forecasts", TestWorkspace.write(dir, "r.csv",
                "item,period,cycle,step,quantity\nA,2025-03,2025-02,review,1\n").toString(), "--db", db.toString());
        assertEquals(2, review.code(), "the ledger step is never imported");
        assertEquals(0, CliRun.of("decide", "A", "--db", db.toString(), "--cycle", "2025-03", "--period", "2025-04",
                "--qty", "103", "--reason", "store opening", "--tag", "new listing").code());

        CliRun score = CliRun.of("score", "--db", db.toString(), "--format", "json");
        assertEquals(0, score.code(), score.err());
        assertEquals("naive,sys,review,release", steps(score.out()));
        assertTrue(score.out().contains("\"pairs\":10"), score.out());
    }

    @Test
    void aDecisionOnALaterStepTakesTheLedgerStepsValueAsItsPrior() throws Exception {
        Path db = TestWorkspace.create(dir);
        assertEquals(0, CliRun.of("decide", "A1", "--db", db.toString(), "--cycle", "2026-12", "--period", "2026-12",
                "--qty", "120", "--reason", "meeting raised it", "--tag", "promotion").code());
        CliRun later = CliRun.of("decide", "A1", "--db", db.toString(), "--cycle", "2026-12", "--period",
                "2026-12,2027-01", "--pct", "-10", "--reason", "released lower", "--tag", "other", "--step", "final");
        assertEquals(0, later.code(), later.err());
        // final's prior is the meeting step: the decision (120) where there is one, else stat (110.5).
        assertTrue(later.out().contains("2026-12 120 -> 108"), later.out());
        assertTrue(later.out().contains("2027-01 110.5 -> 99.45"), later.out());
        assertEquals(2, CliRun.of("decide", "A1", "--db", db.toString(), "--cycle", "2026-12", "--period", "2026-12",
                "--qty", "1", "--reason", "x", "--tag", "other", "--step", "stat").code(), "the first step is never decided");
    }

    @Test
    void scoresWeeklyDataAgainstTheSeasonalNaiveAcrossA53WeekYear() throws Exception {
        Path db = dir.resolve("weekly.db");
        assertEquals(0, CliRun.of("init", "--db", db.toString()).code());
        StringBuilder actuals = new StringBuilder("item,period,quantity\n");
        StringBuilder forecasts = new StringBuilder("item,period,cycle,step,quantity\n");
        Period start = Period.parse("2025-W01");
        for (String item : new String[] {"W1", "W2"}) {
            for (int i = 0; i < 120; i++) {
                actuals.append(item).append(',').append(start.plus(i)).append(',').append(50 + (i * 7) % 11)
                        .append('\n');
            }
            for (int i = 60; i < 119; i++) {
                Period cycle = start.plus(i);
                forecasts.append(item).append(',').append(cycle.plus(1)).append(',').append(cycle).append(",stat,55\n");
                forecasts.append(item).append(',').append(cycle.plus(1)).append(',').append(cycle).append(",final,56\n");
            }
        }
        assertEquals(0, CliRun.of("import", "items", TestWorkspace.write(dir, "i.csv", "item,description\nW1,a\nW2,b\n")
                .toString(), "--db", db.toString()).code());
        assertEquals(0, CliRun.of("import", "actuals", TestWorkspace.write(dir, "a.csv", actuals.toString())
                .toString(), "--db", db.toString()).code());
        assertEquals(0, CliRun.of("import", "forecasts", TestWorkspace.write(dir, "f.csv", forecasts.toString())
                .toString(), "--db", db.toString()).code());
        CliRun score = CliRun.of("score", "--db", db.toString(), "--placebo", "seasonal", "--format", "json");
        assertEquals(0, score.code(), score.err());
        assertEquals("seasonal_naive,stat,meeting,final", steps(score.out()));
        // 2 items × 59 cycles, every one with its actual 52 weeks earlier (2026 has 53 ISO weeks).
        assertTrue(score.out().contains("\"pairs\":118"), score.out());
    }
}
