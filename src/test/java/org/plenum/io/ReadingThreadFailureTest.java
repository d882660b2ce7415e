package org.plenum.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.plenum.io.ImportFixtures.dump;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.plenum.io.ImportFixtures.Setup;
import org.plenum.store.Workspace;

/**
 * The reading thread can fail after it has handed the writer a first batch; the import must then
 * fail as a whole and roll that batch back. The failure is injected through {@link Progress}, which
 * the reading thread calls after each batch of {@link CsvImporter#BATCH} records.
 */
class ReadingThreadFailureTest {
    private static final int ROWS = 2 * CsvImporter.BATCH + CsvImporter.BATCH / 2;

    @TempDir
    Path dir;

    /** Throws {@code failure} at the second batch, when the first one is already with the writer. */
    private static Progress failingAtSecondBatch(Throwable failure) {
        AtomicInteger batches = new AtomicInteger();
        return new Progress() {
            @Override
            public void advance(long bytesRead) {
                if (batches.incrementAndGet() == 2) {
                    if (failure instanceof RuntimeException r) {
                        throw r;
                    }
                    throw (Error) failure;
                }
            }
        };
    }

    private Throwable importFailing(Throwable failure, Path db) throws Exception {
        Path file = dir.resolve("forecasts-" + ROWS + ".csv");
        ImportFixtures.writeForecasts(file, ROWS);
        try (Workspace ws = Workspace.open(db, ImportFixtures.TIMEOUT)) {
            CsvImporter importer = new CsvImporter(ws, failingAtSecondBatch(failure));
            return assertThrows(Throwable.class, () -> importer.importFile(ImportKind.FORECASTS, file, false),
                    "the import went on as if the file had ended where the reading thread failed");
        }
    }

    @Test
    void aRuntimeExceptionWhileReadingRollsBackTheBatchesWritten() throws Exception {
        Path db = Setup.MONTHLY.create(dir);
        List<String> before = dump(db);
        IllegalStateException failure = new IllegalStateException("simulated failure while reading");

        assertSame(failure, importFailing(failure, db));

        assertEquals(before, dump(db));
    }

    @Test
    void anErrorWhileReadingRollsBackTheBatchesWritten() throws Exception {
        Path db = Setup.MONTHLY.create(dir);
        List<String> before = dump(db);

        importFailing(new OutOfMemoryError("simulated: the reading thread ran out of memory"), db);

        assertEquals(before, dump(db));
    }
}
