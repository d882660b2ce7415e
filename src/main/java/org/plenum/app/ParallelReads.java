package org.plenum.app;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.function.Function;
import org.plenum.core.Series;
import org.plenum.store.ScoreReads;
import org.plenum.store.Workspace;

/**
 * Reads the actuals and each step's forecasts at a lag on two threads, each with its own
 * connection: reading a million rows is mostly the driver's per-row work, which two cores halve.
 */
final class ParallelReads {
    private ParallelReads() {}

    /**
     * The actuals first, then each step's series in order. The ledger step is its predecessor's
     * series with the standing decisions laid over it, so that series is read once, not twice.
     */
    static List<Series> of(Workspaces workspaces, Path db, List<String> steps, String ledgerStep, int lag) {
        List<Function<ScoreReads, Series>> reads = new ArrayList<>();
        reads.add(ScoreReads::actuals);
        for (String step : steps) {
            reads.add(step.equals(ledgerStep) ? r -> r.decidedAtLag(lag) : r -> r.stepAtLag(step, lag));
        }
        ExecutorService pool = Executors.newFixedThreadPool(2, r -> {
            Thread t = new Thread(r, "plenum-score-read");
            t.setDaemon(true);
            return t;
        });
        try {
            List<Future<Series>> futures = new ArrayList<>();
            for (Function<ScoreReads, Series> read : reads) {
                futures.add(pool.submit(() -> {
                    try (Workspace ws = workspaces.open(db)) {
                        return read.apply(new ScoreReads(ws));
                    }
                }));
            }
            List<Series> out = new ArrayList<>();
            for (Future<Series> f : futures) {
                out.add(f.get());
            }
            int ledger = steps.indexOf(ledgerStep) + 1;
            if (ledger > 1) {
                out.set(ledger, ScoreReads.overlay(out.get(ledger - 1), out.get(ledger)));
            }
            return out;
        } catch (ExecutionException e) {
            throw e.getCause() instanceof RuntimeException r ? r : new IllegalStateException(e.getCause());
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while reading", e);
        } finally {
            pool.shutdownNow();
        }
    }
}
