package org.plenum.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;

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
     * sqlite-jdbc unpacks its native library into {@code java.io.tmpdir}; on hosts where /tmp is
     * mounted noexec that fails, so it goes to the user's cache directory instead.
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
        } catch (IOException | SecurityException e) {
            // keep the driver's default; it reports clearly if that fails too
        }
    }
}
