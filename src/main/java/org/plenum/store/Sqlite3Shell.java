package org.plenum.store;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;

/**
 * The sqlite3 command-line shell as the benchmarks' reference: the same engine doing the plain
 * version of our work, timed from process start to exit in the same run as ours.
 */
public final class Sqlite3Shell {
    private Sqlite3Shell() {}

    public static boolean installed() {
        try {
            return new ProcessBuilder("sqlite3", "-version").redirectErrorStream(true)
                    .redirectOutput(ProcessBuilder.Redirect.DISCARD).start().waitFor() == 0;
        } catch (IOException e) {
            return false;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return false;
        }
    }

    /**
     * Loads a forecasts CSV with {@code .import} into a fresh table of the same columns and the
     * same primary key order as ours, in WAL mode with synchronous=NORMAL; returns nanoseconds.
     */
    public static long importForecasts(Path csv, Path db) {
        return run(db, "PRAGMA journal_mode=WAL;\nPRAGMA synchronous=NORMAL;\n"
                + "CREATE TABLE forecasts(item TEXT NOT NULL, period TEXT NOT NULL, cycle TEXT NOT NULL,"
                + " step TEXT NOT NULL, quantity NUMERIC NOT NULL CHECK (quantity >= 0),"
                + " PRIMARY KEY (step, item, cycle, period)) WITHOUT ROWID;\n"
                + ".import --csv --skip 1 " + csv + " forecasts\n");
    }

    /** The plain per-step sums Σ|e|, Σ(F − A) and ΣA over a workspace's pairs at one lag; returns nanoseconds. */
    public static long perStepSums(Path db, int lag) {
        return run(db, "SELECT f.step_id, count(*), sum(abs(a.quantity - f.quantity)), sum(f.quantity - a.quantity),"
                + " sum(a.quantity) FROM forecasts f JOIN actuals a ON a.item_id = f.item_id AND a.period = f.period"
                + " WHERE f.period - f.cycle = " + lag + " GROUP BY f.step_id;\n");
    }

    /**
     * Reads what a scorecard at one lag reads (every actual, each imported step's forecasts at
     * the lag, packed per item as {@code plenum score} reads them, and the standing decisions),
     * printing it to nowhere; returns nanoseconds. The floor under any scorecard on this engine.
     */
    public static long scoreInputs(Path db, int lag) {
        // The ledger step is never imported: every forecasts row is an imported step's.
        return run(db, "SELECT item_id, group_concat(period || ',' || quantity, ';') FROM actuals GROUP BY item_id"
                + " ORDER BY item_id;\n"
                + "SELECT step_id, item_id, group_concat(period || ',' || quantity, ';') FROM forecasts WHERE period"
                + " - cycle = " + lag + " GROUP BY step_id, item_id ORDER BY step_id, item_id;\n"
                + "SELECT d.item_id, d.period, d.quantity FROM decisions d WHERE d.period - d.cycle = " + lag
                + " AND NOT EXISTS (SELECT 1 FROM decisions n WHERE n.supersedes = d.id) ORDER BY d.item_id, d.period;\n");
    }

    /** Reads the forecast rows the agenda reads around a cycle, printing them to nowhere; returns nanoseconds. */
    public static long agendaForecastRows(Path db, int stepId, int fromCycle, int cycle, int[] lags) {
        return run(db, AgendaReads.forecastsAroundPlain(stepId, fromCycle, cycle, lags) + ";\n");
    }

    private static long run(Path db, String script) {
        try {
            ProcessBuilder pb = new ProcessBuilder("sqlite3", "-batch", db.toString()).redirectErrorStream(true)
                    .redirectOutput(ProcessBuilder.Redirect.DISCARD);
            long t0 = System.nanoTime();
            Process p = pb.start();
            p.getOutputStream().write(script.getBytes(StandardCharsets.UTF_8));
            p.getOutputStream().close();
            int code = p.waitFor();
            long nanos = System.nanoTime() - t0;
            if (code != 0) {
                throw new IllegalStateException("sqlite3 exited with " + code);
            }
            return nanos;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException(e);
        }
    }
}
