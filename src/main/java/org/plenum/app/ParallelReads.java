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

    /** The actuals first, then each step's series in order. */
    static List<Series> of(Workspaces workspaces, Path db, List<String> steps, int lag) {
        List<Function<ScoreReads, Series>> reads = new ArrayList<>();
        reads.add(ScoreReads::actuals);
        for (String step : steps) {
            reads.add(r -> r.stepAtLag(step, lag));
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
