package org.plenum.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.plenum.store.NativeLibrary;
import picocli.CommandLine;

/** The {@code plenum} program: the only place that calls {@code System.exit}. */
public final class Main {
    private Main() {}

    public static void main(String[] args) {
        // The driver's native library is found and loaded while picocli reads the commands: both
        // take about a tenth of a second, and there are two cores.
        Thread sqlite = new Thread(Main::loadSqlite, "plenum-sqlite-load");
        sqlite.setDaemon(true);
        sqlite.start();
        PrintWriter out = new PrintWriter(System.out, true, StandardCharsets.UTF_8);
        PrintWriter err = new PrintWriter(System.err, true, StandardCharsets.UTF_8);
        CommandLine cli = Cli.create(out, err, System.getenv(), args);
        try {
            sqlite.join();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
        int code = cli.execute(args);
        out.flush();
        err.flush();
        System.exit(code);
    }

    private static void loadSqlite() {
        useCacheForNativeLibrary();
        try {
            org.sqlite.SQLiteJDBCLoader.initialize();
        } catch (Exception | LinkageError e) {
            // The first connection tries again and reports what is wrong.
        }
    }

    /**
     * sqlite-jdbc unpacks its native library into {@code java.io.tmpdir} at every start; on hosts
     * where /tmp is mounted noexec that fails, and it costs time everywhere, so it is unpacked once
     * into the user's cache directory instead.
     */
    private static void useCacheForNativeLibrary() {
        if (System.getProperty("org.sqlite.tmpdir") != null) {
            return;
        }
        Map<String, String> env = System.getenv();
        String base = env.getOrDefault("XDG_CACHE_HOME", System.getProperty("user.home") + "/.cache");
        Path dir = Path.of(base, "plenum");
        try {
            Files.createDirectories(dir);
            System.setProperty("org.sqlite.tmpdir", dir.toString());
            NativeLibrary.useCopyIn(dir);
        } catch (IOException | SecurityException e) {
            // keep the driver's default; it reports clearly if that fails too
        }
    }
}
