package org.plenum.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import me.tongfei.progressbar.ConsoleProgressBarConsumer;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;
import me.tongfei.progressbar.ProgressBarStyle;
import org.plenum.io.Progress;

/** A progress bar on standard error when it is a terminal; silent otherwise (the summary line says it all). */
final class ProgressBarReporter implements Progress, AutoCloseable {
    private final String task;
    private final boolean enabled;
    private ProgressBar bar;

    private ProgressBarReporter(String task, boolean enabled) {
        this.task = task;
        this.enabled = enabled;
    }

    static ProgressBarReporter forStderr(String task) {
        return new ProgressBarReporter(task, stderrIsTerminal());
    }

    /** Java cannot ask isatty(2) directly; on Linux the descriptor's link names the terminal device. */
    static boolean stderrIsTerminal() {
        try {
            String target = Files.readSymbolicLink(Path.of("/proc/self/fd/2")).toString();
            return target.startsWith("/dev/pts/") || target.startsWith("/dev/tty");
        } catch (Exception e) {
            return false;
        }
    }

    @Override
    public synchronized void start(long totalBytes) {
        if (enabled && bar == null) {
            bar = new ProgressBarBuilder().setTaskName(task).setInitialMax(totalBytes).setUnit(" MB", 1 << 20)
                    .setStyle(ProgressBarStyle.ASCII).setUpdateIntervalMillis(200)
                    .setConsumer(new ConsoleProgressBarConsumer(System.err)).build();
        }
    }

    @Override
    public synchronized void advance(long bytesRead) {
        if (bar != null) {
            bar.stepTo(bytesRead);
        }
    }

    @Override
    public synchronized void finish() {
        if (bar != null) {
            bar.close();
            bar = null;
        }
    }

    @Override
    public void close() {
        finish();
    }
}
