package org.plenum.cli;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

/** Runs Plenum as a separate operating-system process, the way users and scripts do. */
final class Processes {
    private Processes() {}

    record Result(int code, String out, String err) {}

    static Path jar() {
        return Path.of(System.getProperty("plenum.jar", "target/plenum.jar")).toAbsolutePath();
    }

    static Path root() {
        return Path.of(System.getProperty("plenum.root", ".")).toAbsolutePath();
    }

    /** {@code java -jar plenum.jar ARGS}, in {@code dir}. */
    static Result plenum(Path dir, List<String> args) throws IOException, InterruptedException {
        List<String> cmd = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-XX:TieredStopAtLevel=1", "-XX:+UseSerialGC", "-Djava.awt.headless=true", "-jar", jar().toString()));
        cmd.addAll(args);
        return run(dir, cmd, 120);
    }

    static Result run(Path dir, List<String> cmd, int timeoutSeconds) throws IOException, InterruptedException {
        Path out = java.nio.file.Files.createTempFile("plenum-out-", ".txt");
        Path err = java.nio.file.Files.createTempFile("plenum-err-", ".txt");
        try {
            Process p = new ProcessBuilder(cmd).directory(dir.toFile()).redirectOutput(out.toFile())
                    .redirectError(err.toFile()).redirectInput(ProcessBuilder.Redirect.from(new java.io.File("/dev/null")))
                    .start();
            if (!p.waitFor(timeoutSeconds, TimeUnit.SECONDS)) {
                p.destroyForcibly();
                throw new AssertionError("timed out after " + timeoutSeconds + " s: " + cmd);
            }
            return new Result(p.exitValue(), java.nio.file.Files.readString(out, StandardCharsets.UTF_8),
                    java.nio.file.Files.readString(err, StandardCharsets.UTF_8));
        } finally {
            java.nio.file.Files.deleteIfExists(out);
            java.nio.file.Files.deleteIfExists(err);
        }
    }
}
