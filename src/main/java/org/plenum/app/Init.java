package org.plenum.app;

import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import org.plenum.store.Workspace;

/** Creates an empty workspace with its ordered process steps. */
public final class Init {
    private Init() {}

    public static void run(Workspaces workspaces, Path db, List<String> steps, String ledgerStep) {
        if (steps.size() < 2) {
            throw new UsageException("--steps: expected at least two steps (the statistical forecast and a review),"
                    + " found " + steps.size());
        }
        if (new HashSet<>(steps).size() != steps.size()) {
            throw new UsageException("--steps: expected each step once, found " + String.join(",", steps));
        }
        for (String s : steps) {
            if (!s.matches("[a-z][a-z0-9_]{0,19}")) {
                throw new UsageException("--steps: expected names of lower-case letters, digits and _, found \"" + s + "\"");
            }
        }
        int ledger = steps.indexOf(ledgerStep);
        if (ledger < 1) {
            throw new UsageException("--ledger-step: expected one of the steps after " + steps.get(0) + ", found \""
                    + ledgerStep + "\"");
        }
        try (Workspace ws = workspaces.create(db, steps, ledgerStep)) {
            // created and migrated; nothing more to do
        }
    }
}
