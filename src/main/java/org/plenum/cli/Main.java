package org.plenum.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.plenum.store.NativeLibrary;

/** The {@code plenum} program: the only place that calls {@code System.exit}. */
public final class Main {
    private Main() {}

    public static void main(String[] args) {
        useCacheForNativeLibrary();
        PrintWriter out = new PrintWriter(System.out, true, StandardCharsets.UTF_8);
        PrintWriter err = new PrintWriter(System.err, true, StandardCharsets.UTF_8);
        int code = Cli.create(out, err, System.getenv()).execute(args);
        out.flush();
        err.flush();
        System.exit(code);
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
