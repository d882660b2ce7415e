package org.plenum.store;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Duration;
import java.util.List;
import java.util.Set;
import org.plenum.core.Frequency;
import org.plenum.core.Period;
import org.plenum.core.Quantity;
import org.sqlite.SQLiteConfig;
import org.sqlite.SQLiteErrorCode;
import org.sqlite.SQLiteException;

/**
 * One workspace database: a team's items, actuals, forecast snapshots and decision ledger in one
 * SQLite file that several processes on one host share.
 *
 * <p>Connections run in WAL mode with {@code synchronous=NORMAL}, foreign keys on and a busy
 * timeout. They stay in auto-commit mode and write with explicit {@code BEGIN IMMEDIATE}, because
 * a deferred transaction that upgrades from reading to writing cannot wait for the lock and fails
 * at once under contention. Not thread-safe: one thread per workspace object.
 */
public final class Workspace implements AutoCloseable {
    /** Owner and group may read and write; others nothing (a team shares the file on one host). */
    static final Set<PosixFilePermission> FILE_MODE = PosixFilePermissions.fromString("rw-rw----");
    public static final Duration DEFAULT_BUSY_TIMEOUT = Duration.ofSeconds(10);

    private final Path path;
    private final Connection connection;
    private final Duration busyTimeout;

    private Workspace(Path path, Connection connection, Duration busyTimeout) {
        this.path = path;
        this.connection = connection;
        this.busyTimeout = busyTimeout;
    }

    /**
     * Creates a new workspace with the given ordered process steps.
     *
     * @param steps the process steps in order; the first is the system's statistical forecast
     * @param ledgerStep the step whose values come from the decision ledger (the meeting)
     * @throws NoWorkspaceException when a file already exists at {@code db}
     */
    public static Workspace create(Path db, List<String> steps, String ledgerStep, Duration busyTimeout) {
        if (Files.exists(db)) {
            throw NoWorkspaceException.exists(db);
        }
        createPrivateFile(db);
        Workspace ws = connect(db, busyTimeout);
        try {
            ws.write(c -> {
                Migrations.apply(c, 0);
                insertSteps(c, steps);
                Meta.put(c, Meta.LEDGER_STEP, ledgerStep);
                return null;
            });
            return ws;
        } catch (RuntimeException e) {
            ws.close();
            throw e;
        }
    }

    /**
     * Opens an existing workspace and brings its schema up to date.
     *
     * @throws NoWorkspaceException when there is no file at {@code db}
     */
    public static Workspace open(Path db, Duration busyTimeout) {
        if (!Files.isRegularFile(db)) {
            throw NoWorkspaceException.missing(db);
        }
        Workspace ws = connect(db, busyTimeout);
        try {
            ws.migrate();
            return ws;
        } catch (RuntimeException e) {
            ws.close();
            throw e;
        }
    }

    public Path path() {
        return path;
    }

    /** The workspace's frequency, or {@code null} before the first periods are imported. */
    public Frequency frequency() {
        return read(c -> Meta.get(c, Meta.FREQUENCY).map(Frequency::ofWord).orElse(null));
    }

    /** The step whose values are the ledger's decisions. */
    public String ledgerStep() {
        return read(c -> Meta.get(c, Meta.LEDGER_STEP).orElseThrow());
    }

    /** A setting only the demo builder uses to tell whether its workspace is current. */
    public String demoFingerprint() {
        return read(c -> Meta.get(c, Meta.DEMO_FINGERPRINT).orElse(""));
    }

    public void setDemoFingerprint(String fingerprint) {
        write(c -> {
            Meta.put(c, Meta.DEMO_FINGERPRINT, fingerprint);
            return null;
        });
    }

    /** Item codes, steps, tags and frequency as they stand now. */
    public Catalog catalog() {
        return read(c -> Catalogs.of(c, true));
    }

    /** The event tags, built-in first: what a decision's tag must be one of. */
    public Set<String> tags() {
        return read(Catalogs::tags);
    }

    /** Whether the workspace holds the item {@code code}. */
    public boolean hasItem(String code) {
        return read(c -> {
            try (PreparedStatement ps = c.prepareStatement("SELECT 1 FROM items WHERE item = ?")) {
                ps.setString(1, code);
                try (ResultSet rs = ps.executeQuery()) {
                    return rs.next();
                }
            }
        });
    }

    /**
     * The catalog without its items and tags: enough to find steps, and cheap on a workspace of
     * a hundred thousand items.
     */
    public Catalog processSteps() {
        return read(c -> Catalogs.of(c, false));
    }

    /**
     * Starts one file's import: takes the write lock now (waiting up to the busy timeout) and
     * holds it until the session commits or closes.
     */
    public ImportSession beginImport(boolean replace) {
        try {
            return new ImportSession(this, connection, replace);
        } catch (SQLException e) {
            throw translate(e);
        }
    }

    /** Adds an event tag to the workspace's vocabulary; returns false when it was there already. */
    public boolean addTag(String tag) {
        return write(c -> {
            try (PreparedStatement ps = c.prepareStatement(
                    "INSERT INTO tags(name, builtin) VALUES (?, 0) ON CONFLICT(name) DO NOTHING")) {
                ps.setString(1, tag);
                return ps.executeUpdate() == 1;
            }
        });
    }

    /**
     * The values of {@code step} for one item in one cycle, by target period. For the ledger's
     * step that is the standing decision where there is one and the previous step's value where
     * nobody decided.
     */
    public java.util.SortedMap<Period, Quantity> stepValues(String item, String step, Period cycle) {
        return read(c -> StepValues.of(c, Catalogs.of(c, false), item, step, cycle));
    }

    /** Counts of what the workspace holds, for the summary a user sees after building it. */
    public Summary summary() {
        return read(Summary::of);
    }

    /** Runs {@code work} in one {@code BEGIN IMMEDIATE} transaction, rolled back if it throws. */
    <T> T write(SqlWork<T> work) {
        try (Statement st = connection.createStatement()) {
            st.execute("BEGIN IMMEDIATE");
            try {
                T result = work.run(connection);
                st.execute("COMMIT");
                return result;
            } catch (Throwable t) {
                st.execute("ROLLBACK");
                throw t;
            }
        } catch (SQLException e) {
            throw translate(e);
        }
    }

    /** Runs read-only {@code work} in auto-commit mode. */
    <T> T read(SqlWork<T> work) {
        try {
            return work.run(connection);
        } catch (SQLException e) {
            throw translate(e);
        }
    }

    /** Turns SQLite's lock errors into {@link StoreBusyException}; anything else into {@link StoreException}. */
    StoreException translate(SQLException e) {
        if (isBusy(e)) {
            return new StoreBusyException("the workspace " + path + " is busy: another process held it for more than "
                    + busyTimeout.toSeconds() + " s; try again", e);
        }
        return new StoreException("workspace " + path + ": " + e.getMessage(), e);
    }

    static boolean isBusy(SQLException e) {
        if (e instanceof SQLiteException s) {
            SQLiteErrorCode code = s.getResultCode();
            return code == SQLiteErrorCode.SQLITE_BUSY || code == SQLiteErrorCode.SQLITE_LOCKED
                    || code.name().startsWith("SQLITE_BUSY_") || code.name().startsWith("SQLITE_LOCKED_");
        }
        return false;
    }

    @Override
    public void close() {
        try {
            connection.close();
        } catch (SQLException e) {
            throw new StoreException("closing " + path + ": " + e.getMessage(), e);
        }
    }

    private void migrate() {
        int version = read(Meta::schemaVersion);
        if (version > Migrations.latest()) {
            throw new StoreException(path + " has schema version " + version + ", newer than this Plenum ("
                    + Migrations.latest() + "); use a newer Plenum");
        }
        if (version < Migrations.latest()) {
            write(c -> {
                Migrations.apply(c, Meta.schemaVersion(c));
                return null;
            });
        }
    }

    private static Workspace connect(Path db, Duration busyTimeout) {
        SQLiteConfig config = new SQLiteConfig();
        config.setJournalMode(SQLiteConfig.JournalMode.WAL);
        config.setSynchronous(SQLiteConfig.SynchronousMode.NORMAL);
        config.setBusyTimeout((int) busyTimeout.toMillis());
        config.enforceForeignKeys(true);
        config.setGetGeneratedKeys(false);
        try {
            Connection c = config.createConnection("jdbc:sqlite:" + db);
            return new Workspace(db, c, busyTimeout);
        } catch (SQLException e) {
            if (isBusy(e)) {
                throw new StoreBusyException("the workspace " + db + " is busy: another process held it for more than "
                        + busyTimeout.toSeconds() + " s; try again", e);
            }
            throw new StoreException("cannot open workspace " + db + ": " + e.getMessage(), e);
        }
    }

    /** SQLite gives its -wal and -shm files the database file's mode, so setting it here is enough. */
    private static void createPrivateFile(Path db) {
        try {
            Path parent = db.toAbsolutePath().getParent();
            if (parent != null) {
                Files.createDirectories(parent);
            }
            Files.createFile(db);
            // createFile's permission attribute is still masked by the umask: set the mode explicitly.
            Files.setPosixFilePermissions(db, FILE_MODE);
        } catch (UnsupportedOperationException e) {
            // Not a POSIX file system: the platform's own access rules apply.
        } catch (IOException e) {
            throw new StoreException("cannot create workspace " + db + ": " + e.getMessage(), e);
        }
    }

    private static void insertSteps(Connection c, List<String> steps) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO steps(name, position) VALUES (?, ?)")) {
            for (int i = 0; i < steps.size(); i++) {
                ps.setString(1, steps.get(i));
                ps.setInt(2, i + 1);
                ps.executeUpdate();
            }
        }
    }
}
