package org.plenum.app;

import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Map;
import org.plenum.store.Workspace;

/**
 * Opens workspaces with the settings of the environment: the busy timeout comes from
 * {@code PLENUM_BUSY_TIMEOUT} (seconds, decimals allowed) when set.
 */
public final class Workspaces {
    public static final List<String> DEFAULT_STEPS = List.of("stat", "meeting", "final");
    public static final String DEFAULT_LEDGER_STEP = "meeting";

    private final String busyTimeoutSetting;

    public Workspaces(Map<String, String> env) {
        this.busyTimeoutSetting = env.get("PLENUM_BUSY_TIMEOUT");
    }

    public Workspace open(Path db) {
        return Workspace.open(db, busyTimeout());
    }

    public Workspace create(Path db, List<String> steps, String ledgerStep) {
        return Workspace.create(db, steps, ledgerStep, busyTimeout());
    }

    /** Read when a workspace is opened, so that a bad setting is reported like any usage error. */
    public Duration busyTimeout() {
        return busyTimeout(busyTimeoutSetting);
    }

    private static Duration busyTimeout(String seconds) {
        if (seconds == null || seconds.isBlank()) {
            return Workspace.DEFAULT_BUSY_TIMEOUT;
        }
        try {
            double s = Double.parseDouble(seconds);
            if (s >= 0 && s <= 3600) {
                return Duration.ofMillis(Math.round(s * 1000));
            }
        } catch (NumberFormatException e) {
            // fall through to the message below
        }
        throw new UsageException("PLENUM_BUSY_TIMEOUT: expected seconds between 0 and 3600, found \"" + seconds + "\"");
    }
}
