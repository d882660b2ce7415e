package org.plenum.io;

import java.io.BufferedInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.concurrent.ArrayBlockingQueue;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicReference;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.apache.commons.io.input.BOMInputStream;
import org.plenum.core.BadInputException;
import org.plenum.store.Catalog;
import org.plenum.store.ImportSession;
import org.plenum.store.Workspace;

/**
 * Imports one CSV file (DESIGN §3) in one transaction: every record is checked, and a file with
 * any bad record changes nothing and is refused with messages {@code FILE:LINE:COLUMN: expected
 * ..., found ...}.
 *
 * <p>Reading and writing overlap on two threads: a reader thread parses and checks records into
 * batches, and the calling thread, which owns the database connection, inserts them. Memory stays
 * flat however long the file: only a few batches are in flight at once.
 */
public final class CsvImporter {
    static final int BATCH = 10_000;
    private static final CSVFormat FORMAT = CSVFormat.RFC4180.builder().get();

    private final Workspace workspace;
    private final Progress progress;

    public CsvImporter(Workspace workspace, Progress progress) {
        this.workspace = workspace;
        this.progress = progress;
    }

    /**
     * @throws BadInputException when the file cannot be read or holds any bad record
     */
    public ImportResult importFile(ImportKind kind, Path file, boolean replace) {
        long started = System.nanoTime();
        String name = file.toString();
        ImportErrors errors = new ImportErrors(name);
        try (Utf8CheckedInputStream bytes = open(file);
                CSVParser parser = CSVParser.builder().setReader(reader(bytes)).setFormat(FORMAT).get()) {
            Iterator<CSVRecord> records = parser.iterator();
            Header header = readHeader(kind, file, records, errors);
            errors.throwIfAny();
            progress.start(Files.size(file));
            long rows = load(kind, header, new Source(file, parser, records, bytes), errors, replace);
            return new ImportResult(kind, file, rows, Duration.ofNanos(System.nanoTime() - started));
        } catch (NoSuchFileException e) {
            throw new BadInputException(name + ": no such file");
        } catch (IOException e) {
            throw new BadInputException(name + ": cannot read: " + e.getMessage());
        } finally {
            progress.finish();
        }
    }

    private static Utf8CheckedInputStream open(Path file) throws IOException {
        if (Files.isDirectory(file)) {
            throw new IOException("it is a directory");
        }
        InputStream in = new BufferedInputStream(Files.newInputStream(file), 1 << 16);
        return new Utf8CheckedInputStream(BOMInputStream.builder().setInputStream(in).get());
    }

    /** The bytes are checked as UTF-8 before decoding, so the decoder never meets a bad one. */
    private static Reader reader(InputStream in) {
        return new InputStreamReader(in, StandardCharsets.UTF_8);
    }

    private static Header readHeader(ImportKind kind, Path file, Iterator<CSVRecord> records, ImportErrors errors) {
        Source.Failure failure = Source.failure(file, () -> records.hasNext());
        if (failure != null) {
            errors.add(Math.max(failure.line(), 1), failure.column(), failure.message());
            return null;
        }
        if (!records.hasNext()) {
            errors.add(1, 1, "expected a header row " + String.join(",", kind.required()) + ", found an empty file");
            return null;
        }
        List<String> names = records.next().toList();
        return Header.check(names, kind, errors);
    }

    private <R> long load(ImportKind kind, Header header, Source source, ImportErrors errors, boolean replace) {
        Catalog catalog = workspace.catalog();
        @SuppressWarnings("unchecked")
        RowReader<R> rows = (RowReader<R>) Readers.of(kind, catalog, header);
        Record.Periods periods = new Record.Periods(catalog.frequency());
        try (ImportSession session = workspace.beginImport(replace)) {
            ReadingThread<R> reading = new ReadingThread<>(rows, header, periods, source, errors, progress);
            reading.start();
            long written = write(rows, header.position(rows.keyColumn()) + 1, session, reading, errors);
            reading.await();
            if (written == 0 && !errors.any()) {
                errors.add(source.lastLine(), 1, "expected at least one data row after the header, found none");
            }
            errors.throwIfAny();
            if (periods.newFrequency() != null) {
                session.setFrequency(periods.newFrequency());
            }
            session.commit();
            return written;
        }
    }

    private static <R> long write(RowReader<R> rows, int keyColumn, ImportSession session, ReadingThread<R> reading,
            ImportErrors errors) {
        long written = 0;
        try {
            for (List<R> batch = reading.next(); batch != null; batch = reading.next()) {
                for (int line : rows.write(session, batch)) {
                    errors.add(line, keyColumn, "expected an " + rows.keyWords() + " not yet in the workspace, found one it"
                            + " already holds (use --replace to overwrite it)");
                }
                written += batch.size();
            }
            return written;
        } catch (RuntimeException e) {
            reading.cancel();
            throw e;
        }
    }

    /** The parser with what it has read so far. */
    record Source(Path file, CSVParser parser, Iterator<CSVRecord> records, Utf8CheckedInputStream bytes) {
        /** A failure of the input itself: bad quoting or a byte that is not UTF-8. */
        record Failure(int line, int column, String message) {}

        int lastLine() {
            return (int) parser.getCurrentLineNumber();
        }

        /** Runs one read step; returns its failure instead of throwing, or null when it went well. */
        static Failure failure(Path file, Runnable step) {
            try {
                step.run();
                return null;
            } catch (UncheckedIOException e) {
                if (e.getCause() instanceof Utf8CheckedInputStream.MalformedUtf8Exception m) {
                    return new Failure(m.line, m.column, "expected UTF-8 text, found " + m.found);
                }
                String message = e.getCause().getMessage();
                int line = QuotingProblem.line(message);
                int column = line == 0 ? 1 : QuotingProblem.field(file, line);
                return new Failure(line, column, QuotingProblem.unterminated(message)
                        ? "expected a closing quote for the field opened here, found the end of the file"
                        : "expected a comma or the end of the line after a closing quote, found more text");
            }
        }
    }

    /** Reads and checks records on its own thread, handing over batches through a short queue. */
    static final class ReadingThread<R> extends Thread {
        private static final List<Object> END = new ArrayList<>();
        private final RowReader<R> rows;
        private final Header header;
        private final Record record;
        private final Source source;
        private final ImportErrors errors;
        private final Progress progress;
        private final BlockingQueue<List<?>> queue = new ArrayBlockingQueue<>(4);
        private final AtomicBoolean cancelled = new AtomicBoolean();
        private final AtomicReference<Throwable> crash = new AtomicReference<>();

        ReadingThread(RowReader<R> rows, Header header, Record.Periods periods, Source source, ImportErrors errors,
                Progress progress) {
            super("plenum-import-reader");
            setDaemon(true);
            this.rows = rows;
            this.header = header;
            this.record = new Record(header, periods);
            this.source = source;
            this.errors = errors;
            this.progress = progress;
        }

        @Override
        public void run() {
            try {
                readAll();
            } catch (Throwable e) {
                // Even an Error must fail the import: the end marker alone would commit a partial file.
                crash.set(e);
            } finally {
                hand(END);
            }
        }

        private void readAll() {
            List<R> batch = new ArrayList<>(BATCH);
            int previousEnd = source.lastLine();
            while (!cancelled.get()) {
                Source.Failure failure = Source.failure(source.file(), () -> source.records().hasNext());
                if (failure != null) {
                    errors.add(failure.line() == 0 ? previousEnd + 1 : failure.line(), failure.column(),
                            failure.message());
                    return;
                }
                if (!source.records().hasNext()) {
                    break;
                }
                CSVRecord csv = source.records().next();
                int line = previousEnd + 1;
                previousEnd = source.lastLine();
                if (csv.size() == 1 && csv.get(0).isEmpty()) {
                    continue; // a blank line
                }
                readOne(csv, line, batch);
                if (batch.size() == BATCH) {
                    progress.advance(source.bytes().bytesRead());
                    batch = handOver(batch);
                }
            }
            handOver(batch);
            progress.advance(source.bytes().bytesRead());
        }

        private void readOne(CSVRecord csv, int line, List<R> batch) {
            if (csv.size() != header.width()) {
                errors.add(line, Math.min(csv.size(), header.width()) + 1,
                        "expected " + header.width() + " fields as in the header, found " + csv.size());
                return;
            }
            record.reset(csv, line);
            try {
                batch.add(rows.read(record));
            } catch (FieldException e) {
                errors.add(line, e.column + 1, e.getMessage());
            }
        }

        /** Once any record is bad nothing will be written, so batches are only checked, not handed on. */
        private List<R> handOver(List<R> batch) {
            if (!batch.isEmpty() && !errors.any()) {
                hand(batch);
                return new ArrayList<>(BATCH);
            }
            batch.clear();
            return batch;
        }

        private void hand(List<?> item) {
            try {
                while (!cancelled.get() && !queue.offer(item, 100, TimeUnit.MILLISECONDS)) {
                    // the writer is busy; look again whether it has given up
                }
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }

        /** The next batch to write, or null when the file is read. */
        @SuppressWarnings("unchecked")
        List<R> next() {
            try {
                List<?> item = queue.take();
                if (item == END) {
                    Throwable e = crash.get();
                    if (e instanceof RuntimeException r) {
                        throw r;
                    }
                    if (e instanceof Error error) {
                        throw error;
                    }
                    if (e != null) {
                        throw new IllegalStateException("reading failed", e);
                    }
                    return null;
                }
                return (List<R>) item;
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IllegalStateException("import interrupted", e);
            }
        }

        void cancel() {
            cancelled.set(true);
        }

        void await() {
            try {
                join();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }
    }
}
