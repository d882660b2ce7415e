package org.plenum.app;

import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.nio.file.Path;
import org.plenum.agenda.AgendaSettings;
import org.plenum.core.Period;
import org.plenum.store.AgendaBenchData;
import org.plenum.store.Sqlite3Shell;
import org.plenum.store.Workspace;

/**
 * The agenda benchmark (issue 4): a workspace of {@code items} items with 36 months of actuals,
 * 24 cycles of stat forecasts at lags 0–5 and a ledger of one past decision per two items
 * (50,000 for 100,000 items); one run ranks the last cycle at lags 1–3, from opening the database
 * to the sorted agenda.
 */
public final class AgendaBenchmark {
    static final Period FIRST_PERIOD = Period.month(2024, 1);
    static final int MONTHS = 36;
    static final int CYCLES = 24;
    static final int MAX_LAG = 5;
    static final int[] LAGS = {1, 2, 3};
    /** The ranked cycle: the last one. */
    public static final Period CYCLE = FIRST_PERIOD.plus(MONTHS - 1);

    private AgendaBenchmark() {}

    /** Stat forecast rows the workspace holds. */
    public static long forecastRows(int items) {
        return (long) items * CYCLES * (MAX_LAG + 1);
    }

    public static void generate(Workspaces workspaces, Path db, int items) {
        try (Workspace ws = workspaces.create(db, Workspaces.DEFAULT_STEPS, Workspaces.DEFAULT_LEDGER_STEP)) {
            AgendaBenchData.fill(ws, new AgendaBenchData.Shape(items, FIRST_PERIOD.index(), MONTHS, CYCLES, MAX_LAG,
                    items / 2));
        }
    }

    /** One timed run in this JVM: candidates ranked, nanoseconds and peak heap bytes. */
    public static ImportBenchmark.Run runOnce(Workspaces workspaces, Path db) {
        System.gc();
        ManagementFactory.getMemoryPoolMXBeans().forEach(MemoryPoolMXBean::resetPeakUsage);
        long t0 = System.nanoTime();
        Agenda.Report report = Agenda.run(workspaces, db, CYCLE.toString(), LAGS, AgendaSettings.defaults());
        long nanos = System.nanoTime() - t0;
        return new ImportBenchmark.Run(report.rows().size(), nanos, ImportBenchmark.peakHeap());
    }

    /** The sqlite3 shell reading the same window of stat forecasts the agenda reads; nanoseconds. */
    public static long sqlite3Floor(Workspaces workspaces, Path db) {
        int stat;
        try (Workspace ws = workspaces.open(db)) {
            stat = ws.processSteps().steps().get(0).id();
        }
        return Sqlite3Shell.agendaForecastRows(db, stat, Agenda.windowStart(CYCLE.index(), LAGS), CYCLE.index(), LAGS);
    }
}
